// Escape leaves a field of the properties panel for the drawing: the focus stays visible and on
// the editor (the arrows then move the selection), never falling to the page; where the panel
// lies over the drawing (a narrow window) it only leaves the field, for the panel's own Escape.
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { beam, renderEditor } from "./editor-helpers";

const row = (name: RegExp) => within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name });

afterEach(() => vi.unstubAllGlobals());

describe("Escape in a field", () => {
  it("puts the focus on the drawing, where an arrow key then moves the selected pin", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    const canvas = await screen.findByTestId("sketch-canvas", undefined, { timeout: 15_000 });
    row(/^Pin s1/).focus();
    await user.keyboard("{Enter}");
    const x = screen.getByLabelText("Position x");
    await user.click(x);
    await user.keyboard("{Escape}");
    expect(canvas).toHaveFocus();
    await user.keyboard("{ArrowRight}");
    await waitFor(() => expect(Number(screen.getByLabelText<HTMLInputElement>("Position x").value)).toBeGreaterThan(0));
  }, 30_000);

  it("where the panel lies over the drawing, only leaves the field", async () => {
    vi.stubGlobal("matchMedia", (q: string) => ({ matches: q.includes("1179px"), media: q, addEventListener() {}, removeEventListener() {}, addListener() {}, removeListener() {} }));
    const user = userEvent.setup();
    await renderEditor(beam());
    const canvas = await screen.findByTestId("sketch-canvas", undefined, { timeout: 15_000 });
    row(/^Pin s1/).focus();
    await user.keyboard("{Enter}");
    await user.click(screen.getByLabelText("Position x"));
    await user.keyboard("{Escape}");
    expect(canvas).not.toHaveFocus();
    expect(screen.getByLabelText("Position x")).not.toHaveFocus();
  }, 30_000);
});
