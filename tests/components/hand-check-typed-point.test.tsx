// The hand check's point P typed field by field: Px, then Tab to Py, then Enter. Before, taking
// Px moved P, the Py field opened a draft from the point as it was a moment earlier and the move
// then cleared that draft, so Py's typing started from an empty Px: P landed at (0, Py), the Px
// typed lost. Now each field's draft starts from P as the store has it.
import { act, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { beam, mountResultsDock } from "./editor-helpers";

describe("the hand check's P typed", () => {
  it("Px, Tab, Py, Enter: P is both values", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(beam());
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    const x = screen.getByTestId("moment-x");
    const y = screen.getByTestId("moment-y");
    await user.clear(x);
    await user.type(x, "2.6");
    await user.tab();
    expect(y).toHaveFocus();
    await user.clear(y);
    await user.type(y, "2.2{Enter}");
    expect(editor.getState().momentPoint).toEqual([2.6, 2.2]);
    expect(x).toHaveValue("2.6");
    expect(y).toHaveValue("2.2");
  });

  it("P set elsewhere while Py waits (a mirror, a pick) is what Py's typing starts from", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(beam());
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    act(() => editor.getState().setMomentPoint([1, 0.5]));
    const y = screen.getByTestId("moment-y");
    await user.clear(y);
    await user.type(y, "0.25{Enter}");
    expect(editor.getState().momentPoint).toEqual([1, 0.25]);
  });
});
