// Undo and redo of a whole-sketch replacement (opening an example over one's own sketch,
// importing a file) bring back a view that shows the sketch brought back, not the other
// drawing's zoom and pan.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { createEditorStore, type EditorStore } from "@/canvas/store";
import { moveElement, replaceSketch, type Command } from "@/canvas/commands";
import type { Runner } from "@/canvas/analysis/store";
import { analyseCore } from "@/canvas/analysis/core";
import { followFitRequests } from "@/canvas/fitRequests";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { exampleById } from "@/canvas/examples";
import { toScreen } from "@/canvas/geometry/view";
import { linkStores } from "../support/linked-stores";

const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;

/** A small crate far from the origin: a view fitted to something else does not show it. */
function farCrate(): SketchFile {
  return {
    ...emptySketch("Crate far out"),
    bodies: [newBody("b1", [[40, 30], [41, 30], [41, 30.5], [40, 30.5]], "Crate")],
    supports: [{ id: "s1", body: "b1", kind: "pin", at: [40, 30] }],
  };
}

const VIEWPORT = { width: 900, height: 600 };

function linked(sketch: SketchFile, runner?: Runner) {
  const editor = createEditorStore({ sketch });
  editor.getState().setViewport(VIEWPORT);
  const { stores, stops } = linkStores(editor, runner);
  stops.push(followFitRequests(stores));
  return { stores, editor, stop: () => stops.forEach((s) => s()) };
}

/** every corner of every body is on the canvas */
function showsAllBodies(editor: EditorStore): boolean {
  const { view, sketch } = editor.getState();
  return sketch.bodies.every((b) =>
    (b.outline as Vec2[]).every((p) => {
      const [x, y] = toScreen(view, p);
      return x >= 0 && x <= VIEWPORT.width && y >= 0 && y <= VIEWPORT.height;
    }),
  );
}

describe("fit requests", () => {
  it("the store asks for a fit when a whole sketch is replaced, undone or redone, and not for an ordinary edit", () => {
    const store = createEditorStore({ sketch: farCrate() });
    const n0 = store.getState().fitRequest;
    store.getState().apply(c(moveElement({ ids: ["s1"], delta: [0.5, 0] })));
    expect(store.getState().fitRequest).toBe(n0);
    store.getState().undo();
    expect(store.getState().fitRequest).toBe(n0);
    store.getState().apply(c(replaceSketch({ sketch: exampleById("pipe-bend-anchor")!.sketch, label: "Open the example" })));
    expect(store.getState().fitRequest).toBe(n0 + 1);
    expect(store.getState().past.at(-1)?.replacesSketch).toBe(true);
    store.getState().undo();
    expect(store.getState().fitRequest).toBe(n0 + 2);
    store.getState().redo();
    expect(store.getState().fitRequest).toBe(n0 + 3);
    store.getState().reset(emptySketch());
    expect(store.getState().fitRequest).toBe(n0 + 4);
  });

  it("undo of opening an example shows the sketch brought back; redo shows the example again", () => {
    const { editor, stop } = linked(farCrate());
    // the user's view of their own crate
    editor.getState().setView({ scale: 200, x: -7900, y: 6400 });
    expect(showsAllBodies(editor)).toBe(true);
    editor.getState().apply(c(replaceSketch({ sketch: exampleById("pipe-bend-anchor")!.sketch, label: "Open the example" })));
    const exampleView = editor.getState().view;
    expect(showsAllBodies(editor)).toBe(true);
    editor.getState().undo();
    expect(editor.getState().sketch.title).toBe("Crate far out");
    expect(editor.getState().view).not.toEqual(exampleView);
    expect(showsAllBodies(editor)).toBe(true);
    editor.getState().redo();
    expect(editor.getState().sketch.title).toBe(exampleById("pipe-bend-anchor")!.sketch.title);
    expect(showsAllBodies(editor)).toBe(true);
    stop();
  });

  it("waits for the analysis of the new sketch, so a body placed by expressions is fitted too", () => {
    const held: Array<() => void> = [];
    const runner: Runner = (sketch, done) => held.push(() => done(analyseCore(sketch)));
    const start = farCrate();
    const { editor, stop } = linked(start, runner);
    held.splice(0).forEach((f) => f());
    // the same crate, but its corners are expressions read through a parameter
    const byExpression: SketchFile = {
      ...emptySketch("Crate by expression"),
      parameters: { x0: "-60 m" },
      bodies: [newBody("b1", [["x0", -20], ["x0 + 1 m", -20], ["x0 + 1 m", -19.5], ["x0", -19.5]] as never, "Crate")],
      supports: [{ id: "s1", body: "b1", kind: "pin", at: ["x0", -20] as never }],
    };
    editor.getState().apply(c(replaceSketch({ sketch: byExpression, label: "Import" })));
    const before = editor.getState().view;
    expect(editor.getState().view).toBe(before); // nothing yet: the worker has not answered
    held.splice(0).forEach((f) => f());
    const { view } = editor.getState();
    const [x] = toScreen(view, [-60, -20]);
    const [x1] = toScreen(view, [-59, -20]);
    expect(x).toBeGreaterThanOrEqual(0);
    expect(x1).toBeLessThanOrEqual(VIEWPORT.width);
    stop();
  });
});
