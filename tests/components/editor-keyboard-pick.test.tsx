// The hand check's point for moments without a pointer: K turns the pick on, Enter takes the
// selected element's point (here the right pad's, at x = 4 m), and the Hand check shows it.
import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { beam, renderEditor } from "./editor-helpers";

const row = (name: RegExp) => within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name });

describe("picking the point for moments from the keyboard", () => {
  it("K then Enter on the selected contact's row takes moments about that contact", async () => {
    const user = userEvent.setup();
    await renderEditor(beam("F1"));
    row(/^Contact s2/).focus();
    await user.keyboard("{Enter}");
    await user.keyboard("k");
    expect(screen.getByTestId("notice")).toHaveTextContent(/Enter takes the selected element's point\. Esc to stop\./);
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent("The hand check takes moments about Contact s2 (right pad) (x = 4 m, y = 0 m).");
    // the row kept its selection: the Enter went to the pick, not to the row
    expect(row(/^Contact s2/)).toHaveAttribute("aria-pressed", "true");
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    await waitFor(() => expect(screen.getByTestId("moment-x")).toHaveValue("4"));
    expect(screen.getByTestId("moment-y")).toHaveValue("0");
  });

  it("with nothing selected, Enter says how to choose the point instead", async () => {
    await renderEditor(beam());
    fireEvent.keyDown(document.body, { key: "k" });
    fireEvent.keyDown(document.body, { key: "Enter" });
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Select one element first .*type Px and Py in the Hand check tab\.$/);
  });
});
