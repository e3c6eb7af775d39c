// Deleting a support that a kept sweep plots: the sweep stops naming it in the same undo step (a
// sweep left plotting nothing goes, as a removed case takes the sweeps run on it), and the status
// line says which sweeps changed and that Undo brings them back. Before, the sweep kept the id of a
// support the sketch no longer had: the Sweep tab dropped it without a word and the calc sheet
// plotted an empty series for it.
import { describe, expect, it } from "vitest";
import { actionById, copySelection, type ActionContext } from "@/canvas/actions";
import { deleteElements, deletionEffects } from "@/canvas/commands/elements";
import { runCommand } from "@/canvas/commands/define";
import { createEditorStore } from "@/canvas/store";
import { parseSketch } from "@/solver";
import type { SketchFile } from "@/solver/schema";
import { skidWithKeptSweeps } from "../fixtures/skid-kept-sweeps";

const skid = () => skidWithKeptSweeps();

const ctxOf = (sketch: SketchFile) => {
  const editor = createEditorStore({ sketch });
  const ctx = { stores: { editor } as never, controller: null, ui: {} as ActionContext["ui"] } as ActionContext;
  return { editor, ctx };
};

describe("deleting a support a kept sweep plots", () => {
  it("the command takes it out of the sweeps that plot it, and a sweep left plotting nothing goes", () => {
    const before = skid();
    expect(deletionEffects(before, ["front"])).toEqual({ sweepsChanged: ["sweep-1"], sweepsRemoved: ["sweep-2"] });
    const after = runCommand(before, deleteElements({ ids: ["front"] }));
    expect(after.supports.map((s) => s.id)).toEqual(["rear"]);
    expect(after.sweeps).toEqual([{ ...before.sweeps![0], quantities: [{ support: "rear", component: "frictionMargin" }] }]);
    // what is left names only what the sketch has, and still reads as a sketch file
    expect(parseSketch(after).ok).toBe(true);
  });

  it("deleting the body takes its supports, so every sweep that plotted them goes; the last one leaves no empty list", () => {
    const after = runCommand(skid(), deleteElements({ ids: ["b1"] }));
    expect(deletionEffects(skid(), ["b1"])).toEqual({ sweepsChanged: [], sweepsRemoved: ["sweep-1", "sweep-2"] });
    expect(after.sweeps).toBeUndefined();
    expect("sweeps" in after).toBe(false);
  });

  it("a sweep that plots every support (no list) and a delete of a port leave the sweeps as they were", () => {
    const s = skid();
    s.sweeps!.push({ id: "sweep-3", parameter: "p", from: 0, to: 5, points: 6 });
    expect(deletionEffects(s, ["out"])).toEqual({ sweepsChanged: [], sweepsRemoved: [] });
    expect(runCommand(s, deleteElements({ ids: ["out"] })).sweeps).toBe(s.sweeps);
    expect(runCommand(s, deleteElements({ ids: ["front"] })).sweeps!.map((w) => w.id)).toEqual(["sweep-1", "sweep-3"]);
  });

  it("Delete says which kept sweeps changed, and one Undo brings the support and both sweeps back", () => {
    const { editor, ctx } = ctxOf(skid());
    editor.getState().select(["front"]);
    actionById("edit.delete").run(ctx);
    expect(editor.getState().sketch.supports.map((s) => s.id)).toEqual(["rear"]);
    expect(editor.getState().notice).toBe(
      "Deleted 1 element. The kept sweep of p from 0 to 10 bar no longer plots front; the kept sweep of p from 0 to 20 bar plotted only front and is gone. Undo brings them back.",
    );
    editor.getState().undo();
    expect(editor.getState().sketch).toEqual(skid());
  });

  it("Cut says the same", () => {
    const { editor, ctx } = ctxOf(skid());
    editor.getState().select(["front"]);
    expect(copySelection(ctx, true)).not.toBeNull();
    expect(editor.getState().notice).toBe(
      "Cut 1 element: paste them here or in another sketch. The kept sweep of p from 0 to 10 bar no longer plots front; the kept sweep of p from 0 to 20 bar plotted only front and is gone. Undo brings them back.",
    );
  });

  it("a delete no sweep is touched by says nothing more than before", () => {
    const { editor, ctx } = ctxOf(skid());
    editor.getState().select(["out"]);
    actionById("edit.delete").run(ctx);
    expect(editor.getState().sketch.ports).toEqual([]);
    expect(editor.getState().notice).toBeNull();
  });
});
