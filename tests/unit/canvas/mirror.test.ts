// Mirroring left–right and up–down: what the command writes (positions, outlines, directions,
// signs, expressions), one undo step in the store, and the solve of a mirrored sketch giving the
// mirrored reactions. Reflection symmetry of statics (common practice; any statics textbook, e.g.
// Meriam & Kraige, Engineering Mechanics: Statics, ch. 3): the mirror image of a body in equilibrium
// is in equilibrium under the mirrored loads, so a left–right mirror flips every Fx and every
// moment and keeps every Fy; an up–down one flips every Fy and every moment and keeps every Fx.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { solveFile } from "@/solver";
import { EXAMPLES } from "@/canvas/examples";
import { createEditorStore } from "@/canvas/store";
import { mirrorElements, mirrorKeeps, mirrorLeavesAlone, mirrorLine, reflectedText, type MirrorAxis } from "@/canvas/commands/mirror";
import { replacedWords } from "@/canvas/commands/move";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { polygonArea } from "@/canvas/geometry/polygon";

/** A pump skid (our own scenario): two bearers, a suction inlet and a discharge jet up and to the right, a wind load, a couple and a tie. */
function skid(): SketchFile {
  return {
    ...emptySketch("Skid, right-hand discharge"),
    parameters: { theta: "30 deg", mdot: "12 kg/s", xd: "2.6 m", wind: "400 N" },
    bodies: [{ id: "b1", label: "Skid", outline: [[0, 0], [3, 0], [3, 1.2], [0, 1.2]], mass: 850, cg: [1.4, 0.6] }],
    supports: [
      { id: "s1", body: "b1", kind: "contact", at: [0.4, 0], angle: 90, mu: 0.4, label: "left bearer" },
      { id: "s2", body: "b1", kind: "contact", at: [2.6, 0], angle: 90, mu: 0.4, label: "right bearer" },
      { id: "s3", body: "b1", kind: "tie", at: [3, 1.2], angle: -60, label: "guy" },
    ],
    loads: [
      { id: "l1", body: "b1", kind: "force", at: [0, 1], fx: "wind", fy: -50, label: "wind" },
      { id: "l2", body: "b1", kind: "couple", value: "1.5 kN m", label: "motor torque" },
      { id: "l3", body: "b1", kind: "distributed", from: [0, 1.2], to: [1.5, 1.2], w1: 200, w2: 600, label: "snow" },
      { id: "l4", body: "b1", kind: "force", at: [1, 1.2], magnitude: 300, angle: -80, label: "hose pull" },
    ],
    ports: [
      { id: "p1", body: "b1", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: "mdot", velocity: 3, label: "suction" },
      { id: "p2", body: "b1", kind: "outlet", at: ["xd", 1.2], angle: "theta + 5 deg", massFlow: "mdot", velocity: 25, label: "discharge" },
    ],
  };
}

/** A weightless pipe bend (our own scenario) on a pin and a roller, with pressure at both ends. */
function bend(): SketchFile {
  return {
    ...emptySketch("Bend, weightless"),
    gravity: 0,
    bodies: [{ id: "b1", label: "Bend", outline: [[0, 0], [1, 0], [1.4, 0.6], [1.4, 1.6], [0.9, 1.6], [0.9, 0.7], [0, 0.5]], mass: 120 }],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [0.2, 0] },
      { id: "s2", body: "b1", kind: "roller", at: [1.4, 1.2], angle: 160 },
    ],
    loads: [{ id: "l1", body: "b1", kind: "couple", value: -800, at: [0.6, 0.3] }],
    ports: [
      { id: "p1", body: "b1", kind: "inlet", at: [0, 0.25], angle: 0, massFlow: 40, density: 1000, area: 0.0177, pressure: 8e5 },
      { id: "p2", body: "b1", kind: "outlet", at: [1.15, 1.6], angle: 90, massFlow: 40, density: 1000, area: 0.0177, pressure: 7.8e5 },
    ],
    massSources: [{ id: "ms1", body: "b1", massFlow: 0, at: [0.5, 0.3] }],
  };
}

type Reaction = { fx: number; fy: number; m: number; n?: number; state: string };
function reactions(file: SketchFile): Record<string, Reaction> {
  const r = solveFile(file);
  if (!r.ok) throw new Error(`does not solve: ${JSON.stringify(r.errors)}`);
  return r.reactions as unknown as Record<string, Reaction>;
}

function expectMirrored(before: SketchFile, after: SketchFile, axis: MirrorAxis) {
  const a = reactions(before);
  const b = reactions(after);
  expect(Object.keys(b).sort()).toEqual(Object.keys(a).sort());
  const tol = (x: number) => 1e-6 * Math.max(1, Math.abs(x));
  for (const [id, r] of Object.entries(a)) {
    const m = b[id];
    const fx = axis === "leftRight" ? -r.fx : r.fx;
    const fy = axis === "leftRight" ? r.fy : -r.fy;
    expect(Math.abs(m.fx - fx), `${id}.fx`).toBeLessThan(tol(fx));
    expect(Math.abs(m.fy - fy), `${id}.fy`).toBeLessThan(tol(fy));
    expect(Math.abs(m.m + r.m), `${id}.m`).toBeLessThan(tol(r.m));
    if (r.n !== undefined) expect(Math.abs(m.n! - r.n), `${id}.n`).toBeLessThan(tol(r.n));
    expect(m.state, `${id}.state`).toBe(r.state);
  }
}

const mirrorAll = (s: SketchFile, axis: MirrorAxis) => mirrorElements.run(s, { ids: [], axis });
const el = (s: SketchFile, id: string) => findElement(s, id)!.el as unknown as Record<string, unknown>;

describe("mirror left–right", () => {
  it("reflects positions, outlines, directions and signs about the middle of the sketch", () => {
    const s = skid();
    // the skid spans x 0…3 (the discharge at xd = 2.6 m is inside): the line is x = 1.5 m
    expect(mirrorLine(s, [], "leftRight", (id, f) => (id === "p2" && f === "at[0]" ? 2.6 : undefined))).toBe(1.5);
    const m = mirrorAll(s, "leftRight");
    // the first corner stays first, the rest are listed backwards: still counter-clockwise
    expect(el(m, "b1").outline).toEqual([[3, 0], [3, 1.2], [0, 1.2], [0, 0]]);
    expect(polygonArea(el(m, "b1").outline as [number, number][])).toBeCloseTo(3.6, 9);
    expect(el(m, "b1").cg).toEqual([1.6, 0.6]);
    expect(el(m, "s1")).toMatchObject({ at: [2.6, 0], angle: 90, mu: 0.4 });
    expect(el(m, "s2")).toMatchObject({ at: [0.4, 0], angle: 90 });
    // a guy pulling down and to the right now pulls down and to the left: 180 − (−60) = 240 ≡ −120
    expect(el(m, "s3")).toMatchObject({ at: [0, 1.2], angle: -120 });
    // components: fx changes sign (an expression stays one), fy stays
    expect(el(m, "l1")).toMatchObject({ at: [3, 1], fx: "-wind", fy: -50 });
    expect(el(m, "l2")).toMatchObject({ value: "-(1.5 kN m)" });
    // w1 stays at `from`, which has moved to the other side; a downward load stays downward
    expect(el(m, "l3")).toMatchObject({ from: [3, 1.2], to: [1.5, 1.2], w1: 200, w2: 600 });
    expect(el(m, "l3").angle).toBeUndefined();
    expect(el(m, "l4")).toMatchObject({ at: [2, 1.2], magnitude: 300, angle: -100 });
    expect(el(m, "p1")).toMatchObject({ at: [3, 0.5], angle: 180 });
    // expressions stay expressions: the parameter link survives
    expect(el(m, "p2")).toMatchObject({ at: ["3 m - xd", 1.2], angle: "180 deg - (theta + 5 deg)" });
    // the parameters, the title and the other sketch fields are not touched
    expect(m.parameters).toEqual(s.parameters);
  });

  it("mirrored twice is the sketch again, expressions included", () => {
    const s = skid();
    expect(mirrorAll(mirrorAll(s, "leftRight"), "leftRight")).toEqual(s);
    // up–down twice: the snow load's direction is written out as −90, the default it had
    const twice = mirrorAll(mirrorAll(s, "upDown"), "upDown");
    expect(el(twice, "l3").angle).toBe(-90);
    expect({ ...twice, loads: twice.loads.map((l) => (l.id === "l3" ? { ...l, angle: undefined } : l)) }).toEqual({ ...s, loads: s.loads.map((l) => (l.id === "l3" ? { ...l, angle: undefined } : l)) });
  });

  it("the mirrored skid's reactions are the mirror of the original's (Fx and M flip, Fy stays)", () => {
    const s = skid();
    const m = mirrorAll(s, "leftRight");
    expectMirrored(s, m, "leftRight");
    // and the values are real ones: the left bearer, nearer the centre of gravity, carries more
    // in the original; mirrored, it stands on the right and still carries the same
    const a = reactions(s);
    const b = reactions(m);
    expect(a.s1.fy).toBeGreaterThan(a.s2.fy);
    expect(b.s1.fy).toBeCloseTo(a.s1.fy, 6);
    expect(b.s2.fx).toBeCloseTo(-a.s2.fx, 6);
  });

  it("every example mirrored left–right solves to the mirrored reactions", () => {
    for (const ex of EXAMPLES) expectMirrored(ex.sketch, mirrorAll(ex.sketch, "leftRight"), "leftRight");
  });

  it("a unitless angle expression is written against a unitless 180", () => {
    const s = { ...skid(), parameters: { ...skid().parameters, a: 35 } };
    s.ports[1] = { ...s.ports[1], angle: "a * 2" };
    const m = mirrorAll(s, "leftRight");
    expect(el(m, "p2").angle).toBe("180 - (a * 2)");
    // evaluates: 180 − 70 = 110°, the mirror of 70°
    expect(solveFile(m).ok).toBe(true);
  });
});

describe("mirror up–down", () => {
  it("reflects a weightless bend and its reactions mirror (Fy and M flip, Fx stays)", () => {
    const s = bend();
    const m = mirrorAll(s, "upDown");
    // the bend spans y 0…1.6: the line is y = 0.8
    expect(el(m, "s1")).toMatchObject({ at: [0.2, 1.6] });
    expect(el(m, "s2")).toMatchObject({ at: [1.4, 0.4], angle: -160 });
    expect(el(m, "p2")).toMatchObject({ at: [1.15, 0], angle: -90 });
    expect(el(m, "l1")).toMatchObject({ value: 800, at: [0.6, 1.3] });
    expect(el(m, "ms1")).toMatchObject({ at: [0.5, 1.3] });
    expect(polygonArea(el(m, "b1").outline as [number, number][])).toBeCloseTo(polygonArea(el(s, "b1").outline as [number, number][]), 9);
    expectMirrored(s, m, "upDown");
    expectMirrored(s, mirrorAll(s, "leftRight"), "leftRight");
  });

  it("a distributed load's default downward direction becomes upward; a force's components flip fy", () => {
    const m = mirrorAll(skid(), "upDown");
    expect(el(m, "l3").angle).toBe(90);
    expect(el(m, "l1")).toMatchObject({ fx: "wind", fy: 50 });
    expect(el(m, "l4").angle).toBe(80);
    expect(el(m, "p2")).toMatchObject({ at: ["xd", 0], angle: "-(theta + 5 deg)" });
  });

  it("the status words say gravity still acts down the page", () => {
    expect(mirrorKeeps(skid(), [], "upDown")).toBe(" Gravity still acts down the page.");
    expect(mirrorKeeps(bend(), [], "upDown")).toBe("");
    expect(mirrorKeeps(skid(), [], "leftRight")).toBe("");
    expect(mirrorKeeps({ ...skid(), motion: { ax: 2 } }, [], "leftRight")).toBe(" The body's acceleration ax keeps its sign.");
    // an image under the sketch cannot be mirrored: the whole sketch's mirror says so, a selection's does not
    const traced = { ...bend(), underlay: { upload: "u1", width: 800, height: 600, origin: [0, 2] as [number, number], metresPerPixel: 0.0025, rotation: 0, opacity: 0.6 } };
    expect(mirrorKeeps(traced, [], "leftRight")).toBe(" The underlay is not mirrored.");
    expect(mirrorKeeps(traced, ["b1"], "leftRight")).toBe("");
  });
});

describe("mirroring a selection", () => {
  it("a lone port turns about its own point (it is its own bounding box)", () => {
    const m = mirrorElements.run(skid(), { ids: ["p1"], axis: "leftRight" });
    expect(el(m, "p1")).toMatchObject({ at: [0, 0.5], angle: 180 });
    expect(el(m, "s1")).toEqual(el(skid(), "s1"));
  });

  it("two bodies: only the selected one and what sits on it move, about its own middle", () => {
    const s = skid();
    s.bodies.push({ id: "b2", outline: [[5, 0], [6, 0], [6, 1], [5, 1]], mass: 10 });
    s.supports.push({ id: "s9", body: "b2", kind: "pin", at: [5, 0] });
    const m = mirrorElements.run(s, { ids: ["b2"], axis: "leftRight" });
    expect(el(m, "s9").at).toEqual([6, 0]);
    expect(el(m, "b2").outline).toEqual([[6, 0], [6, 1], [5, 1], [5, 0]]);
    expect(el(m, "s1")).toEqual(el(s, "s1"));
  });

  it("an expression in error is written as its last value, and the words say so", () => {
    const s = skid();
    s.ports[1] = { ...s.ports[1], angle: "theta + nope" };
    const lookup = (id: string, f: string) => (id === "p2" && f === "angle" ? 35 : id === "p2" && f === "at[0]" ? 2.6 : undefined);
    const m = mirrorElements.run(s, { ids: ["b1"], axis: "leftRight", lookup });
    expect(el(m, "p2").angle).toBe(145);
    expect(replacedWords(s, m, ["b1"])).toBe("Discharge's direction is now a number, not “theta + nope”. Undo brings “theta + nope” back.");
  });

  it("is one undo step in the store, with its words; redo mirrors again", () => {
    const store = createEditorStore({ sketch: skid() });
    store.getState().select(["b1"]);
    expect(store.getState().apply(mirrorElements({ ids: ["b1"], axis: "leftRight" }))).toBeTruthy();
    expect(store.getState().past).toHaveLength(1);
    expect(store.getState().past[0].label).toBe("Mirror b1 left–right");
    expect(el(store.getState().sketch, "s1").at).toEqual([2.6, 0]);
    expect(store.getState().selection).toEqual(["b1"]);
    store.getState().undo();
    expect(store.getState().sketch).toEqual(skid());
    store.getState().redo();
    expect(el(store.getState().sketch, "s1").at).toEqual([2.6, 0]);
    expect(mirrorElements.def.label({ ids: [], axis: "upDown" }, skid())).toBe("Mirror the whole sketch up–down");
  });
});

describe("reflectedText", () => {
  it("writes k − x so that a second mirror gives x back", () => {
    expect(reflectedText("theta", 180, "deg")).toBe("180 deg - theta");
    expect(reflectedText("180 deg - theta", 180, "deg")).toBe("theta");
    expect(reflectedText("(a) * (b)", 0, "")).toBe("-((a) * (b))");
    expect(reflectedText("-((a) * (b))", 0, "")).toBe("(a) * (b)");
    expect(reflectedText("-(a) * (b)", 0, "")).toBe("-(-(a) * (b))");
  });
});

describe("what a mirror cannot rewrite", () => {
  it("names an expression in error that has no value (it stays as it was)", () => {
    const s = skid();
    s.ports[1] = { ...s.ports[1], angle: "theta + nope" };
    expect(mirrorLeavesAlone(s, [], "leftRight", 1.5)).toEqual(["discharge's direction"]);
    // up–down writes −(…), which needs no value
    expect(mirrorLeavesAlone(s, [], "upDown", 0.6)).toEqual([]);
    expect(el(mirrorAll(s, "upDown"), "p2").angle).toBe("-(theta + nope)");
  });
});

describe("every example, weightless, mirrored up–down", () => {
  it("solves to the mirrored reactions", () => {
    for (const ex of EXAMPLES) {
      const s = { ...ex.sketch, gravity: 0 };
      expectMirrored(s, mirrorAll(s, "upDown"), "upDown");
    }
  });
});

describe("a selection that is its own mirror image", () => {
  it("a lone pin mirrored changes nothing and makes no undo step", () => {
    const s = bend();
    expect(mirrorElements.run(s, { ids: ["s1"], axis: "leftRight" })).toBe(s);
    const store = createEditorStore({ sketch: s });
    expect(store.getState().apply(mirrorElements({ ids: ["s1"], axis: "upDown" }))).toBe(false);
    expect(store.getState().past).toHaveLength(0);
    // a roller on its own turns: 160° mirrored left–right is 20°
    expect(el(mirrorElements.run(s, { ids: ["s2"], axis: "leftRight" }), "s2")).toMatchObject({ at: [1.4, 1.2], angle: 20 });
  });
});
