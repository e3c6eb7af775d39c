// Mirror follow-ups: the hand check's point P goes with a mirror of the whole sketch (and with the
// part it was picked on), and undo puts it back; a mirror whose "180 − x" could not be written for
// the sketch and an operating case at once (x a plain number in one, with a unit in the other) is
// refused with the field and the case named. Reflection symmetry of statics (common practice; e.g.
// Meriam & Kraige, Engineering Mechanics: Statics, ch. 3): the moment of the mirrored loads about
// the mirrored point is minus the moment of the loads about the point.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { solveFile } from "@/solver";
import { caseSketch } from "@/solver/cases";
import { actionById, type ActionContext } from "@/canvas/actions";
import { createEditorStore } from "@/canvas/store";
import { mirrorElements, mirrorMixedKinds, mirroredMomentPoint } from "@/canvas/commands/mirror";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { termMomentAbout } from "@/solver/equations";
import { fitScene } from "@/canvas/geometry/fit";
import { buildScene } from "@/canvas/scene";

/** A hose reel on a frame (our own scenario), and a second, separate frame beside it. */
function reel(): SketchFile {
  return {
    ...emptySketch("Reel"),
    parameters: { tilt: 35 },
    bodies: [
      { id: "b1", label: "Frame", outline: [[0, 0], [2, 0], [2, 1], [0, 1]], mass: 200, cg: [0.8, 0.5] },
      { id: "b2", label: "Stand", outline: [[4, 0], [5, 0], [5, 1], [4, 1]], mass: 50 },
    ],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [0.2, 0] },
      { id: "s2", body: "b1", kind: "roller", at: [1.8, 0], angle: 90 },
      { id: "s3", body: "b2", kind: "fixed", at: [4.5, 0] },
    ],
    loads: [{ id: "l1", body: "b1", kind: "force", at: [2, 1], magnitude: 400, angle: "tilt * 2", label: "hose pull" }],
    ports: [],
  };
}

function editor(sketch: SketchFile) {
  const store = createEditorStore({ sketch });
  const analysis = { getState: () => ({ fieldValues: { values: new Map() } }) };
  const ctx = { stores: { editor: store, analysis }, controller: null, ui: {} } as unknown as ActionContext;
  return { store, ctx };
}

describe("the hand check's point P and a mirror", () => {
  it("goes with the whole sketch mirrored, and undo and redo take it back and forth", () => {
    const s = { ...reel(), bodies: [reel().bodies[0]], supports: reel().supports.slice(0, 2) };
    const { store, ctx } = editor(s);
    store.getState().setMomentPoint([0.5, 0.25]);
    actionById("edit.mirrorLeftRight").run(ctx);
    // the frame spans x 0…2: about x = 1 m, P at x 0.5 goes to 1.5
    expect(store.getState().momentPoint).toEqual([1.5, 0.25]);
    expect(store.getState().notice).toContain("The hand check's point P went with it, to (1.5 m, 0.25 m).");
    store.getState().undo();
    expect(store.getState().momentPoint).toEqual([0.5, 0.25]);
    store.getState().redo();
    expect(store.getState().momentPoint).toEqual([1.5, 0.25]);
  });

  it("the mirrored sketch's moment about the mirrored P is minus the original's about P", () => {
    const s = { ...reel(), gravity: 0, bodies: [reel().bodies[0]], supports: reel().supports.slice(0, 2) };
    const p: [number, number] = [0.5, 0.25];
    const m = mirrorElements.run(s, { ids: [], axis: "leftRight" });
    const q = mirroredMomentPoint(s, [], "leftRight", 1, p)!;
    const a = solveFile(s);
    const b = solveFile(m);
    if (!a.ok || !b.ok) throw new Error("does not solve");
    // term by term (each load and each reaction): its moment about the mirrored P flips sign
    for (const id of ["l1", "s1", "s2"]) {
      const ta = a.equations.b1.forces.filter((t) => t.id === id);
      const tb = b.equations.b1.forces.filter((t) => t.id === id);
      const ma = ta.reduce((acc, t) => acc + termMomentAbout(t, p), 0);
      const mb = tb.reduce((acc, t) => acc + termMomentAbout(t, q), 0);
      expect(Math.abs(ma), id).toBeGreaterThan(1);
      expect(mb, id).toBeCloseTo(-ma, 6);
    }
  });

  it("with a selection mirrored, follows only a P picked on a point of what is mirrored", () => {
    const s = reel();
    // on the frame's roller: the frame (b1) mirrored about x = 1 takes it to x 0.2
    expect(mirroredMomentPoint(s, ["b1"], "leftRight", 1, [1.8, 0])).toEqual([0.2, 0]);
    // on the frame's centre of gravity
    expect(mirroredMomentPoint(s, ["b1"], "leftRight", 1, [0.8, 0.5])).toEqual([1.2, 0.5]);
    // on the stand, which stays, or in open space: stays
    expect(mirroredMomentPoint(s, ["b1"], "leftRight", 1, [4.5, 0])).toEqual([4.5, 0]);
    expect(mirroredMomentPoint(s, ["b1"], "leftRight", 1, [3, 2])).toEqual([3, 2]);
    // none picked (the first support by default): none still, the support itself moves
    expect(mirroredMomentPoint(s, ["b1"], "leftRight", 1, null)).toBeNull();
    // up–down: the y is mirrored
    expect(mirroredMomentPoint(s, [], "upDown", 0.5, [3, 2])).toEqual([3, -1]);
  });

  it("a P that stays makes the mirror's undo step no different", () => {
    const { store, ctx } = editor(reel());
    store.getState().setMomentPoint([3, 2]);
    store.getState().select(["b1"]);
    actionById("edit.mirrorLeftRight").run(ctx);
    expect(store.getState().momentPoint).toEqual([3, 2]);
    expect(store.getState().past[0].momentPoint).toBeUndefined();
    expect(store.getState().notice).not.toContain("point P");
  });
});

describe("an operating case that gives a mirrored expression's parameter with another kind of unit", () => {
  const withCase = (value: string): SketchFile => ({ ...reel(), cases: [{ id: "c1", name: "Gusty", parameters: { tilt: value } }] });

  it("is a real break: the rewritten 180 − (tilt * 2) fails in the case although tilt * 2 read there", () => {
    const s = withCase("35 deg");
    // before the mirror the case reads: 35 deg * 2 is an angle, as the field wants
    expect(caseSketch(s, s.cases![0]).ok).toBe(true);
    const m = mirrorElements.run(s, { ids: [], axis: "leftRight" });
    expect(findElement(m, "l1")!.el).toMatchObject({ angle: "180 - (tilt * 2)" });
    expect(caseSketch(m, m.cases![0]).ok).toBe(false);
  });

  it("is named, and the mirror refused with the sketch unchanged and no undo step", () => {
    const s = withCase("35 deg");
    expect(mirrorMixedKinds(s, [], "leftRight", 2.5)).toEqual([{ field: "hose pull's direction", caseName: "Gusty", unitInSketch: false, parameters: ["tilt"] }]);
    const { store, ctx } = editor(s);
    actionById("edit.mirrorLeftRight").run(ctx);
    expect(store.getState().sketch).toBe(s);
    expect(store.getState().past).toHaveLength(0);
    expect(store.getState().notice).toBe(
      "Nothing was mirrored: hose pull's direction reads tilt as a plain number in the sketch but with a unit in case “Gusty”, and no one mirror (“180 deg - x” or “180 - x”) is right in both. Give tilt a unit in the sketch and in every case, or in none, then mirror again.",
    );
  });

  it("a case of the same kind, and an up–down mirror (a negation fits both), mirror as before", () => {
    expect(mirrorMixedKinds(withCase("40"), [], "leftRight", 2.5)).toEqual([]);
    expect(mirrorMixedKinds(withCase("35 deg"), [], "upDown", 0.5)).toEqual([]);
    const m = mirrorElements.run(withCase("40"), { ids: [], axis: "leftRight" });
    expect(caseSketch(m, m.cases![0]).ok).toBe(true);
  });
});

describe("the view after a mirror", () => {
  it("a fitted view is fitted again after the whole sketch is mirrored, and after its undo and redo", () => {
    const { store, ctx } = editor(reel());
    store.getState().setView(fitScene(buildScene(reel()), 800, 500));
    const n = store.getState().fitRequest;
    actionById("edit.mirrorLeftRight").run(ctx);
    expect(store.getState().fitRequest).toBe(n + 1);
    store.getState().undo();
    expect(store.getState().fitRequest).toBe(n + 2);
    store.getState().redo();
    expect(store.getState().fitRequest).toBe(n + 3);
  });

  it("a zoomed or panned view stays, and so does any view when only a selection is mirrored", () => {
    const { store, ctx } = editor(reel());
    store.getState().setView({ scale: 90, x: 100, y: 300 });
    const n = store.getState().fitRequest;
    actionById("edit.mirrorLeftRight").run(ctx);
    expect(store.getState().fitRequest).toBe(n);
    store.getState().setView(fitScene(buildScene(store.getState().sketch), 800, 500));
    store.getState().select(["b1"]);
    actionById("edit.mirrorUpDown").run(ctx);
    expect(store.getState().past).toHaveLength(2);
    expect(store.getState().fitRequest).toBe(n);
  });
});
