// The focus never lands on the page itself after an action taken from the keyboard: a deleted
// element's row (Delete in the Elements list, or the panel's Delete button) hands the focus to the
// row now in its place, and so does a row that an undo takes away.
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { beam, renderEditor } from "./editor-helpers";

const list = () => screen.getByRole("list", { name: "Elements of the sketch" });
const row = (name: RegExp) => within(list()).getByRole("button", { name });
const rowNames = () => within(list()).getAllByRole("button").map((b) => b.getAttribute("aria-label"));

describe("the focus after a deletion or an undo", () => {
  it("Delete on a row of the Elements list leaves the focus on the row that takes its place", async () => {
    const user = userEvent.setup();
    await renderEditor(beam("F1"));
    expect(rowNames()).toEqual(["Body b1, Beam", "Pin s1, left pin", "Contact s2, right pad", "Point force l1, F1"]);
    row(/^Pin s1/).focus();
    await user.keyboard("{Enter}");
    expect(row(/^Pin s1/)).toHaveAttribute("aria-pressed", "true");
    await user.keyboard("{Delete}");
    await waitFor(() => expect(rowNames()).toHaveLength(3));
    // the contact is now where the pin was listed
    expect(row(/^Contact s2/)).toHaveFocus();
    expect(document.activeElement).not.toBe(document.body);
  });

  it("the last row deleted hands the focus to the row above it", async () => {
    const user = userEvent.setup();
    await renderEditor(beam("F1"));
    row(/^Point force l1/).focus();
    await user.keyboard("{Enter}{Delete}");
    await waitFor(() => expect(rowNames()).toHaveLength(3));
    expect(row(/^Contact s2/)).toHaveFocus();
  });

  it("the panel's Delete button hands the focus to the Elements list, where the deleted element was", async () => {
    const user = userEvent.setup();
    await renderEditor(beam("F1"));
    row(/^Contact s2/).focus();
    await user.keyboard("{Enter}");
    const del = within(screen.getByTestId("selection-actions")).getByRole("button", { name: "Delete" });
    del.focus();
    await user.keyboard("{Enter}");
    await waitFor(() => expect(rowNames()).toHaveLength(3));
    await waitFor(() => expect(row(/^Point force l1/)).toHaveFocus());
  });

  it("an undo that takes away the focused row (Ctrl+Z on a duplicate) leaves the focus in the list", async () => {
    const user = userEvent.setup();
    await renderEditor(beam("F1"));
    row(/^Point force l1/).focus();
    await user.keyboard("{Enter}{Control>}d{/Control}");
    await waitFor(() => expect(rowNames()).toHaveLength(5));
    // the copy is selected; walk to its row, then undo the duplicate from there
    await user.keyboard("{End}");
    expect(document.activeElement?.getAttribute("aria-label")).toMatch(/^Point force l2/);
    await user.keyboard("{Control>}z{/Control}");
    await waitFor(() => expect(rowNames()).toHaveLength(4));
    expect(row(/^Point force l1/)).toHaveFocus();
  });
});
