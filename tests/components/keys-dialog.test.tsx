// The keys list: opened with "?" or the toolbar's button, generated from the registered actions
// so every shortcut the editor answers to is listed with its key, and closed again.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeAll, describe, expect, it } from "vitest";
import { ACTIONS, shortcutLabel } from "@/canvas/actions";
import { GESTURES } from "@/components/editor/KeysDialog";
import { withModalDialogs } from "./dialog-support";
import { beam, renderEditor } from "./editor-helpers";

beforeAll(withModalDialogs);

describe("keys and gestures", () => {
  it("? lists every shortcut of every registered action, with its key, and the pointer gestures", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    expect(screen.queryByText("Keys and gestures", { selector: "h2" })).toBeNull();
    await user.keyboard("?");
    const dialog = await screen.findByTestId("keys-dialog");
    expect(dialog).toHaveAttribute("open");
    expect(within(dialog).getByRole("heading", { name: "Keys and gestures" })).toBeInTheDocument();

    const withKeys = ACTIONS.filter((a) => a.shortcuts?.length);
    expect(withKeys.length).toBeGreaterThan(20);
    for (const a of withKeys) {
      const row = within(dialog).getByTestId(`key-${a.id}`);
      expect(row, a.id).toHaveTextContent(a.label);
      for (const k of a.shortcuts!) expect(row, `${a.id} ${k}`).toHaveTextContent(shortcutLabel(k));
    }
    // a few read as a person would look for them
    expect(within(dialog).getByTestId("key-edit.undo")).toHaveTextContent(/Undo\s*Ctrl\+Z/);
    expect(within(dialog).getByTestId("key-edit.redo")).toHaveTextContent("Shift+Ctrl+Z");
    expect(within(dialog).getByTestId("key-view.fit")).toHaveTextContent(/Fit to view\s*F/);
    for (const g of GESTURES) expect(dialog).toHaveTextContent(g.what);

    await user.click(within(dialog).getByRole("button", { name: "Close" }));
    expect(screen.getByTestId("keys-dialog")).not.toHaveAttribute("open");
  });

  it("the toolbar's ? buttons (the wide toolbar's, and the phone's last one) open the same list", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    for (const id of ["show-keys", "show-keys-narrow"]) {
      const button = screen.getByTestId(id);
      expect(button).toHaveAccessibleName("Keys and gestures");
      await user.click(button);
      const dialog = await screen.findByTestId("keys-dialog");
      expect(within(dialog).getByTestId("key-view.units")).toHaveTextContent(/Switch SI \/ US units\s*U/);
      // closed, the focus goes back to the button that opened it: the keyboard carries on from there
      await user.click(within(dialog).getByRole("button", { name: "Close" }));
      expect(button).toHaveFocus();
    }
  });
});
