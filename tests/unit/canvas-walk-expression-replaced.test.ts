// Turning or moving an element whose direction or position is an expression writes a number (as
// documented), so the element no longer follows the parameters that expression read. The operating
// cases and kept sweeps that change those parameters then silently stop turning it: the lance of the
// washing-cart example ("angle": "theta") dragged by its handle no longer rises in the "Lance raised"
// case nor along the kept sweep of theta. The status line now says so, and how to get it back.
import { describe, expect, it } from "vitest";
import { actionById, type ActionContext } from "@/canvas/actions";
import { expressionsReplaced, replacedWords } from "@/canvas/commands/move";
import { rotateElement } from "@/canvas/commands/shape";
import { moveElement } from "@/canvas/commands/move";
import { runCommand } from "@/canvas/commands/define";
import { EXAMPLES } from "@/canvas/examples";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { resolveSketch } from "@/solver/resolve";
import { createEditorStore } from "@/canvas/store";
import type { SketchFile } from "@/solver/schema";

const cart = (): SketchFile => structuredClone(EXAMPLES.find((e) => e.id === "washing-cart")!.sketch);

describe("an expression a turn or a move replaces", () => {
  it("is found with the parameters it read", () => {
    const before = cart();
    const after = runCommand(before, rotateElement({ id: "lance", angle: -60 }));
    expect(expressionsReplaced(before, after, ["lance"])).toEqual([{ id: "lance", field: "angle", was: "theta", parameters: ["theta"] }]);
    // a move of the cart writes numbers only where there were numbers: nothing is replaced
    const moved = runCommand(before, moveElement({ ids: ["cart"], delta: [0.2, 0] }));
    expect(expressionsReplaced(before, moved, ["cart"])).toEqual([]);
  });

  it("the words name the field, the expression, and the cases and sweeps that no longer reach it", () => {
    const before = cart();
    const after = runCommand(before, rotateElement({ id: "lance", angle: -60 }));
    expect(replacedWords(before, after, ["lance"])).toBe(
      "Lance tip's direction is now a number, not “theta”: 3 cases and the kept sweep that set theta no longer change it. Undo brings “theta” back.",
    );
    expect(replacedWords(before, before, ["lance"])).toBe("");
  });

  it("] on the lance turns it and says so; Undo puts “theta” back", () => {
    const editor = createEditorStore({ sketch: cart() });
    const scene = { getState: () => { const sk = editor.getState().sketch; return buildScene(sk, fieldValuesById(sk, resolveSketch(sk).fields)); } };
    const ctx = { stores: { editor, scene } as never, controller: null, ui: {} as ActionContext["ui"] } as ActionContext;
    editor.getState().select(["lance"]);
    actionById("edit.turnLeft").run(ctx);
    // −75° + 15° (common practice: a turn key steps 15°)
    expect(editor.getState().sketch.ports.find((p) => p.id === "lance")!.angle).toBe(-60);
    expect(editor.getState().notice).toMatch(/^Lance tip's direction is now a number, not “theta”/);
    editor.getState().undo();
    expect(editor.getState().sketch.ports.find((p) => p.id === "lance")!.angle).toBe("theta");
  });
});
