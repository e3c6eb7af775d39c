// Every editor command is a pure (sketch, args) → sketch: these check each one's effect, that the
// input is never changed, and that untouched elements keep their identity (narrow redraws).
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { parseSketch, type SolveWarning } from "@/solver/index";
import { portFlow } from "@/solver/ports";
import {
  addElement,
  attachToBody,
  deleteElements,
  deleteParameter,
  duplicateElements,
  insertCorner,
  moveCentreOfGravity,
  moveElement,
  removeCorner,
  renameParameter,
  replaceSketch,
  reshapeBody,
  rotateElement,
  setField,
  setForceForm,
  setMotion,
  setOutline,
  setParameter,
  setSketchField,
} from "@/canvas/commands";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { runCommand } from "@/canvas/commands/define";
import { newAttached, newBody } from "@/canvas/model/factory";

function base(): SketchFile {
  const s = emptySketch("Test");
  return {
    ...s,
    parameters: { L: "2 m", theta: "30 deg" },
    bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]], "Skid"), newBody("b2", [[5, 0], [6, 0], [6, 1], [5, 1]], "Other")],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [0, 0] },
      { id: "s2", body: "b1", kind: "contact", at: ["L", 0], angle: 90 },
    ],
    loads: [
      { id: "l1", body: "b1", kind: "force", at: [1, 1], magnitude: "1 kN", angle: -90 },
      { id: "l2", body: "b1", kind: "force", at: [1.5, 1], fx: 3, fy: 4 },
    ],
    ports: [{ id: "p1", body: "b2", kind: "outlet", at: [6, 0.5], angle: "theta", massFlow: 2, velocity: 10 }],
    massSources: [],
  };
}

const frozen = () => Object.freeze(base()) as SketchFile;
const el = (s: SketchFile, id: string) => findElement(s, id)!.el as unknown as Record<string, unknown>;

describe("addElement", () => {
  it("adds an element to its list, keeping a free id or choosing the next", () => {
    const s = base();
    const pin = newAttached("pin", "s9", { at: [1, 0], body: "b1" });
    const a = addElement.run(s, { kind: "pin", element: pin });
    expect(a.supports.map((x) => x.id)).toEqual(["s1", "s2", "s9"]);
    const clash = addElement.run(s, { kind: "pin", element: { ...pin, id: "s1" } });
    expect(clash.supports.map((x) => x.id)).toEqual(["s1", "s2", "s3"]);
    expect(addElement.def.select!(s, clash, { kind: "pin", element: pin }, [])).toEqual(["s3"]);
    expect(s.supports).toHaveLength(2);
    // untouched lists and elements keep their identity
    expect(a.loads).toBe(s.loads);
    expect(a.supports[0]).toBe(s.supports[0]);
  });
});

describe("deleteElements", () => {
  it("deletes the elements, and with a body everything attached to it", () => {
    const s = base();
    const a = deleteElements.run(s, { ids: ["l1"] });
    expect(a.loads.map((l) => l.id)).toEqual(["l2"]);
    const b = deleteElements.run(s, { ids: ["b1"] });
    expect(b.bodies.map((x) => x.id)).toEqual(["b2"]);
    expect(b.supports).toHaveLength(0);
    expect(b.loads).toHaveLength(0);
    expect(b.ports.map((p) => p.id)).toEqual(["p1"]);
    expect(deleteElements.def.label({ ids: ["b1"] }, s)).toBe("Delete 5 elements");
    expect(deleteElements.run(s, { ids: ["nope"] })).toBe(s);
  });
});

describe("duplicateElements", () => {
  it("copies an element with a new id, offset", () => {
    const s = base();
    const a = duplicateElements.run(s, { ids: ["s1"], offset: [0.5, 0.25] });
    expect(a.supports).toHaveLength(3);
    expect(a.supports[2]).toEqual({ id: "s3", body: "b1", kind: "pin", at: [0.5, 0.25] });
    expect(duplicateElements.def.select!(s, a, { ids: ["s1"], offset: [0.5, 0.25] }, [])).toEqual(["s3"]);
  });
  it("copies a body with its elements, which belong to the copy", () => {
    const s = base();
    const a = duplicateElements.run(s, { ids: ["b2"], offset: [0, 2] });
    expect(a.bodies.map((b) => b.id)).toEqual(["b1", "b2", "b3"]);
    expect(a.bodies[2].outline[0]).toEqual([5, 2]);
    const copy = a.ports[1];
    expect(copy).toMatchObject({ id: "p2", body: "b3", at: [6, 2.5], angle: "theta" });
    expect(duplicateElements.def.select!(s, a, { ids: ["b2"], offset: [0, 2] }, [])).toEqual(["b3"]);
  });
});

describe("attachToBody", () => {
  it("moves elements to another body, and ignores bodies and unknown targets", () => {
    const s = base();
    const a = attachToBody.run(s, { ids: ["l1", "b2"], body: "b2" });
    expect((el(a, "l1") as { body: string }).body).toBe("b2");
    expect(attachToBody.run(s, { ids: ["l1"], body: "s1" })).toBe(s);
    expect(attachToBody.run(s, { ids: ["l1"], body: "b1" })).toBe(s);
  });
});

describe("moveElement", () => {
  it("moves a support by the delta, rounding away float noise", () => {
    const s = frozen();
    const a = moveElement.run(s, { ids: ["s1"], delta: [0.1, 0.2] });
    expect(el(a, "s1").at).toEqual([0.1, 0.2]);
    expect(moveElement.run(s, { ids: ["s1"], delta: [0, 0] })).toBe(s);
  });
  it("moves a body with everything attached to it, once", () => {
    const s = base();
    const a = moveElement.run(s, { ids: ["b1", "s1"], delta: [1, 0] });
    expect(a.bodies[0].outline).toEqual([[1, 0], [3, 0], [3, 1], [1, 1]]);
    expect(el(a, "s1").at).toEqual([1, 0]);
    expect(el(a, "l2").at).toEqual([2.5, 1]);
    expect(a.bodies[1]).toBe(s.bodies[1]);
    expect(a.ports).toBe(s.ports);
  });
  it("turns a moved expression coordinate into its value plus the move; without a value it stays", () => {
    const s = base();
    const lookup = (id: string, field: string) => (id === "s2" && field === "at[0]" ? 2 : undefined);
    expect(el(moveElement.run(s, { ids: ["s2"], delta: [0.5, 0.1], lookup }), "s2").at).toEqual([2.5, 0.1]);
    expect(el(moveElement.run(s, { ids: ["s2"], delta: [0.5, 0.1] }), "s2").at).toEqual(["L", 0.1]);
  });
  it("moves both ends of a distributed load", () => {
    const s = addElement.run(base(), { kind: "distributed", element: newAttached("distributed", "l3", { at: [1, 1], body: "b1" }) });
    const a = moveElement.run(s, { ids: ["l3"], delta: [0, -0.5] });
    expect(el(a, "l3")).toMatchObject({ from: [0.5, 0.5], to: [1.5, 0.5] });
  });
});

describe("moveCentreOfGravity", () => {
  it("gives the body a centre of gravity, or takes it back to the centroid", () => {
    const s = base();
    const a = moveCentreOfGravity.run(s, { id: "b1", to: [0.7, 0.4] });
    expect(a.bodies[0].cg).toEqual([0.7, 0.4]);
    expect(moveCentreOfGravity.run(a, { id: "b1", to: null }).bodies[0].cg).toBeUndefined();
    expect(moveCentreOfGravity.run(s, { id: "s1", to: [0, 0] })).toBe(s);
  });
});

describe("rotateElement", () => {
  it("sets the direction in (−180, 180]", () => {
    const s = base();
    expect(el(rotateElement.run(s, { id: "s2", angle: 450 }), "s2").angle).toBe(90);
    expect(el(rotateElement.run(s, { id: "p1", angle: 200 }), "p1").angle).toBe(-160);
    expect(rotateElement.run(s, { id: "s1", angle: 30 })).toBe(s);
  });
  it("turns a force given as components, keeping its magnitude", () => {
    const a = rotateElement.run(base(), { id: "l2", angle: 90 });
    expect(el(a, "l2")).toMatchObject({ fx: 0, fy: 5 });
  });
});

describe("body shape", () => {
  it("keeps a rectangle a rectangle when a corner is dragged", () => {
    const a = reshapeBody.run(base(), { id: "b1", corner: 2, to: [3, 1.5] });
    expect(a.bodies[0].outline).toEqual([[0, 0], [3, 0], [3, 1.5], [0, 1.5]]);
  });
  it("moves one corner of a polygon (or of a rectangle when asked)", () => {
    const a = reshapeBody.run(base(), { id: "b1", corner: 2, to: [3, 1.5], keepRectangle: false });
    expect(a.bodies[0].outline).toEqual([[0, 0], [2, 0], [3, 1.5], [0, 1]]);
  });
  it("adds and removes corners, never below three", () => {
    const a = insertCorner.run(base(), { id: "b1", after: 1 });
    expect(a.bodies[0].outline).toEqual([[0, 0], [2, 0], [2, 0.5], [2, 1], [0, 1]]);
    const b = removeCorner.run(removeCorner.run(base(), { id: "b1", corner: 0 }), { id: "b1", corner: 0 });
    expect(b.bodies[0].outline).toHaveLength(3);
    expect(setOutline.run(base(), { id: "b1", outline: [[0, 0], [1, 1]] })).toEqual(base());
    expect(setOutline.run(base(), { id: "b1", outline: [[0, 0], [1, 0], [0, 1]] }).bodies[0].outline).toEqual([[0, 0], [1, 0], [0, 1]]);
  });
});

describe("setField", () => {
  it("sets a value, a coordinate, a label; a blank removes an optional field only", () => {
    const s = base();
    expect(el(setField.run(s, { id: "p1", field: "pressure", value: "350 psi" }), "p1").pressure).toBe("350 psi");
    expect(el(setField.run(s, { id: "s1", field: ["at", 1], value: "L/2" }), "s1").at).toEqual([0, "L/2"]);
    expect(el(setField.run(s, { id: "s1", field: "label", value: "rear foot" }), "s1").label).toBe("rear foot");
    const withMu = setField.run(s, { id: "s2", field: "mu", value: 0.3 });
    expect(el(setField.run(withMu, { id: "s2", field: "mu", value: undefined }), "s2").mu).toBeUndefined();
    expect(el(setField.run(s, { id: "s2", field: "angle", value: undefined }), "s2").angle).toBe(90);
    expect(setField.run(s, { id: "s2", field: "id", value: "x" })).toBe(s);
  });
  it("a new port's placed ṁ and V stand aside when its flow is described by a volume flow or a density", () => {
    const placed = newAttached("inlet", "p9", { body: "b1", at: [0, 0.3], angle: 0 });
    expect(placed).toMatchObject({ massFlow: "10 kg/s", velocity: "5 m/s" });
    let s: SketchFile = { ...base(), ports: [placed as SketchFile["ports"][number]] };
    s = setField.run(s, { id: "p9", field: "volumeFlow", value: "40 litre/s" });
    expect(el(s, "p9").massFlow).toBeUndefined();
    expect(el(s, "p9").velocity).toBeUndefined();
    s = setField.run(s, { id: "p9", field: "density", value: "998 kg/m^3" });
    s = setField.run(s, { id: "p9", field: "area", value: "pi/4 * (100 mm)^2" });
    const parsed = parseSketch(s);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const warnings: SolveWarning[] = [];
    const flow = portFlow(parsed.sketch.ports.find((p) => p.id === "p9")!, warnings);
    // ṁ = ρ·Q = 998 × 0.040 = 39.92 kg/s; V = Q/A = 0.040 / (π/4 · 0.1²) = 5.093 m/s (continuity, any fluids text)
    expect(flow.massFlow).toBeCloseTo(39.92, 9);
    expect(flow.velocity).toBeCloseTo(0.04 / ((Math.PI / 4) * 0.01), 9);
    expect([...parsed.warnings, ...warnings].filter((w) => w.code === "PORT_INCONSISTENT")).toEqual([]);
  });
  it("a mass flow or velocity the user typed stays when a volume flow is added; a density alone keeps the velocity", () => {
    let s: SketchFile = { ...base(), ports: [{ ...(newAttached("outlet", "p9", { body: "b1", at: [2, 0.5], angle: 0 }) as SketchFile["ports"][number]), massFlow: "12 kg/s" }] };
    s = setField.run(s, { id: "p9", field: "volumeFlow", value: "0.01 m^3/s" });
    expect(el(s, "p9").massFlow).toBe("12 kg/s");
    expect(el(s, "p9").velocity).toBeUndefined();
    let d: SketchFile = { ...base(), ports: [newAttached("outlet", "p8", { body: "b1", at: [2, 0.5], angle: 0 }) as SketchFile["ports"][number]] };
    d = setField.run(d, { id: "p8", field: "density", value: "1.2 kg/m^3" });
    expect(el(d, "p8").massFlow).toBeUndefined();
    expect(el(d, "p8").velocity).toBe("5 m/s");
  });
  it("a typed ṁ with ρ and A sends the placed V aside (V = ṁ/(ρA)), in any order; a typed V does the same for the placed ṁ", () => {
    for (const order of [["massFlow", "area", "density"], ["density", "area", "massFlow"], ["area", "massFlow", "density"]] as const) {
      const typed = { massFlow: "12 kg/s", area: "0.25 m^2", density: "1.2 kg/m^3" };
      let s: SketchFile = { ...base(), ports: [newAttached("outlet", "p7", { body: "b1", at: [2, 0.5], angle: 0 }) as SketchFile["ports"][number]] };
      for (const f of order) s = setField.run(s, { id: "p7", field: f, value: typed[f] });
      expect(el(s, "p7").velocity, order.join(",")).toBeUndefined();
      const parsed = parseSketch(s);
      if (!parsed.ok) throw new Error("does not parse");
      const warnings: SolveWarning[] = [];
      // V = ṁ/(ρA) = 12 / (1.2 × 0.25) = 40 m/s (continuity, common practice)
      expect(portFlow(parsed.sketch.ports[0], warnings).velocity).toBeCloseTo(40, 9);
      expect(warnings.filter((w) => w.code === "PORT_INCONSISTENT")).toEqual([]);
    }
    let v: SketchFile = { ...base(), ports: [newAttached("inlet", "p6", { body: "b1", at: [0, 0.3], angle: 0 }) as SketchFile["ports"][number]] };
    for (const [f, value] of [["velocity", "20 m/s"], ["area", "0.5 m^2"], ["density", "1.2 kg/m^3"]] as const) v = setField.run(v, { id: "p6", field: f, value });
    expect(el(v, "p6").massFlow).toBeUndefined();
    expect(el(v, "p6").velocity).toBe("20 m/s");
  });
  it("switches a force between magnitude + angle and components", () => {
    const a = setForceForm.run(base(), { id: "l1", form: "components", magnitude: 1000, angle: -90 });
    expect(el(a, "l1")).toMatchObject({ fx: 0, fy: -1000 });
    expect(el(a, "l1").magnitude).toBeUndefined();
    const b = setForceForm.run(a, { id: "l1", form: "polar", magnitude: 1000, angle: -90 });
    expect(el(b, "l1")).toMatchObject({ magnitude: 1000, angle: -90 });
  });
  it("edits the sketch's own fields and motion", () => {
    const s = base();
    expect(setSketchField.run(s, { field: "gravity", value: 0 }).gravity).toBe(0);
    expect(setSketchField.run(s, { field: "title", value: undefined }).title).toBeUndefined();
    expect(setMotion.run(s, { motion: { ax: "0.5 m/s^2", freeX: false } }).motion).toEqual({ ax: "0.5 m/s^2" });
    expect(setMotion.run(s, { motion: { freeX: false } }).motion).toBeUndefined();
  });
});

describe("parameters", () => {
  it("sets, renames (rewriting every expression that reads it) and deletes", () => {
    const s = base();
    expect(setParameter.run(s, { name: "rho", expression: "998 kg/m^3" }).parameters).toMatchObject({ rho: "998 kg/m^3" });
    expect(setParameter.run(s, { name: "2x", expression: 1 })).toBe(s);
    const r = renameParameter.run(s, { from: "L", to: "span" });
    expect(Object.keys(r.parameters!)).toEqual(["span", "theta"]);
    expect(el(r, "s2").at).toEqual(["span", 0]);
    // a label and an id are words, not expressions
    const labelled = setField.run(s, { id: "s1", field: "label", value: "L" });
    expect(el(renameParameter.run(labelled, { from: "L", to: "span" }), "s1").label).toBe("L");
    expect(renameParameter.run(s, { from: "L", to: "theta" })).toBe(s);
    expect(deleteParameter.run(s, { name: "theta" }).parameters).toEqual({ L: "2 m" });
  });
  it("keeps the renamed sketch solving the same", () => {
    const r = renameParameter.run(base(), { from: "theta", to: "jet_angle" });
    const a = parseSketch(base());
    const b = parseSketch(r);
    expect(a.ok && b.ok).toBe(true);
    if (a.ok && b.ok) expect(b.sketch.ports[0].angle).toBeCloseTo(a.sketch.ports[0].angle, 12);
  });
});

describe("replaceSketch", () => {
  it("replaces the document and clears the selection", () => {
    const other = emptySketch("Other");
    expect(replaceSketch.run(base(), { sketch: other, label: "New" })).toBe(other);
    expect(replaceSketch.def.select!(base(), other, { sketch: other, label: "New" }, ["s1"])).toEqual([]);
  });
});

describe("removing a case or a combination", () => {
  const studies = (): SketchFile => ({
    ...emptySketch("Studies"),
    cases: [
      { id: "dead", name: "Dead", factors: { flow: 0 } },
      { id: "jet", name: "Jet", factors: { dead: 0 } },
      { id: "low", name: "Low" },
    ],
    combinations: [
      { id: "k", name: "K", terms: [{ case: "dead", factor: 0.9 }, { case: "jet", factor: 1.4 }] },
      { id: "j", name: "Jet alone", terms: [{ case: "jet", factor: 1.6 }] },
    ],
    sweeps: [
      { id: "s1", parameter: "theta", from: 0, to: 60, points: 11, case: "jet" },
      { id: "s2", parameter: "theta", from: 0, to: 60, points: 11, combination: "j" },
      { id: "s3", parameter: "theta", from: 0, to: 60, points: 11, combination: "k" },
    ],
  });

  it("a case takes its terms, a combination left with none, and the kept sweeps on either; the file still reads", async () => {
    const { caseRemovalEffects, removeCase } = await import("@/canvas/commands/studies");
    const before = studies();
    expect(caseRemovalEffects(before, "jet")).toEqual({ combinationsChanged: ["k"], combinationsRemoved: ["j"], sweepsRemoved: ["s1", "s2"] });
    const after = runCommand(before, removeCase({ id: "jet" }));
    expect(after.cases!.map((c) => c.id)).toEqual(["dead", "low"]);
    expect(after.combinations).toEqual([{ id: "k", name: "K", terms: [{ case: "dead", factor: 0.9 }] }]);
    expect(after.sweeps!.map((s) => s.id)).toEqual(["s3"]);
    expect(parseSketch(after).ok).toBe(true);
    // a case no combination uses takes nothing else
    const low = runCommand(before, removeCase({ id: "low" }));
    expect(low.combinations).toBe(before.combinations);
    expect(low.sweeps).toEqual(before.sweeps);
  });

  it("a combination takes the kept sweeps on it; the last one leaves no empty lists", async () => {
    const { removeCombination } = await import("@/canvas/commands/studies");
    const after = runCommand(studies(), removeCombination({ id: "k" }));
    expect(after.combinations!.map((k) => k.id)).toEqual(["j"]);
    expect(after.sweeps!.map((s) => s.id)).toEqual(["s1", "s2"]);
    const none = runCommand(runCommand({ ...studies(), sweeps: undefined }, removeCombination({ id: "k" })), removeCombination({ id: "j" }));
    expect(none).not.toHaveProperty("combinations");
    expect(none).not.toHaveProperty("sweeps");
  });
});
