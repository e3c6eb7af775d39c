// Mirror without a mouse: a body chosen in the Elements list and Shift+H mirrors it left–right
// (one undo step, the status line says about which line); with nothing selected the properties
// panel offers "Mirror the whole sketch" and Shift+V mirrors everything up–down. Every shortcut of
// the registered actions is its own (the mirror keys clash with nothing).
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { ACTIONS } from "@/canvas/actions";
import { beam, renderEditor, storedSketch } from "./editor-helpers";

const row = (name: RegExp) => within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name });

describe("mirroring from the keyboard", () => {
  it("Shift+H mirrors the selected body and what sits on it left–right; Ctrl+Z undoes it in one step", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam("F1"));
    row(/^Body b1/).focus();
    await user.keyboard("{Enter}");
    await user.keyboard("{Shift>}H{/Shift}");
    // the beam spans x 0…4: mirrored about x = 2 m, the pin goes to the right end and the pad to the left
    expect(screen.getByTestId("notice")).toHaveTextContent("Mirrored 4 elements left–right about x = 2 m.");
    await waitFor(() => expect(storedSketch(mem)?.supports.map((s) => s.at)).toEqual([[4, 0], [0, 0]]), { timeout: 3000 });
    expect(storedSketch(mem)?.bodies[0].outline).toEqual([[4, 0], [4, 0.5], [0, 0.5], [0, 0]]);
    await user.keyboard("{Control>}z{/Control}");
    await waitFor(() => expect(storedSketch(mem)?.supports.map((s) => s.at)).toEqual([[0, 0], [4, 0]]), { timeout: 3000 });
  }, 15_000);

  it("with nothing selected the panel says the whole sketch is mirrored, and its button and Shift+V do it", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam("F1"));
    const group = screen.getByRole("group", { name: "Mirror the whole sketch" });
    const upDown = within(group).getByRole("button", { name: "Mirror the whole sketch up–down" });
    expect(upDown).toHaveAttribute("title", "Mirror the whole sketch up–down (Shift+V)");
    upDown.focus();
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent(
      "Nothing was selected: mirrored the whole sketch up–down about y = 0.25 m. Gravity still acts down the page.",
    );
    // the pad now pushes down from above (angle −90), the load points up
    await waitFor(() => expect(storedSketch(mem)?.supports[1]).toMatchObject({ at: [4, 0.5], angle: -90 }), { timeout: 3000 });
    expect(storedSketch(mem)?.loads[0]).toMatchObject({ at: [2, 0], angle: 90 });
    // Shift+V on the page mirrors it back
    (document.activeElement as HTMLElement).blur();
    await user.keyboard("{Shift>}V{/Shift}");
    await waitFor(() => expect(storedSketch(mem)?.supports[1]).toMatchObject({ at: [4, 0], angle: 90 }), { timeout: 3000 });
  }, 15_000);

  it("the selection's actions list Mirror left–right and Mirror up–down with their keys", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    row(/^Contact s2/).focus();
    await user.keyboard("{Enter}");
    const actions = within(screen.getByTestId("selection-actions"));
    expect(actions.getByRole("button", { name: "Mirror left–right" })).toHaveAttribute("title", "Mirror left–right (Shift+H)");
    await user.click(actions.getByRole("button", { name: "Mirror up–down" }));
    // a lone contact is its own bounding box: it stays put and turns to push down
    expect(screen.getByTestId("notice")).toHaveTextContent("Mirrored 1 element up–down about y = 0 m.");
    // a lone pin is its own mirror image: said, and no undo step
    row(/^Pin s1/).focus();
    await user.keyboard("{Enter}");
    await user.keyboard("{Shift>}H{/Shift}");
    expect(screen.getByTestId("notice")).toHaveTextContent("The selection is its own mirror image: nothing changed. Select the body to mirror it with what sits on it.");
  }, 15_000);

  it("no two actions share a key", () => {
    const keys = ACTIONS.flatMap((a) => (a.shortcuts ?? []).map((k) => k.toLowerCase()));
    expect(keys.filter((k, i) => keys.indexOf(k) !== i)).toEqual([]);
    expect(keys).toContain("shift+h");
    expect(keys).toContain("shift+v");
  });
});
