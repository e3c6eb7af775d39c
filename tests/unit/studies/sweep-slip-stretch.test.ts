// A sweep says where a plotted friction margin is below zero, as it says where a contact is off
// the ground: the crossing alone ("slip at 49.03 N") does not tell on which side of it the contact
// slips, and a margin that rises through zero (slipping below, holding above) reads the other way.
import { describe, expect, it } from "vitest";
import { sweepStateLines } from "@/canvas/studies/display";
import { runSweep } from "@/canvas/studies/run";
import { sweepCharts } from "@/lib/calcsheet/sweeps";
import { parseSketch } from "@/solver";
import { G0 } from "@/solver/constants";
import { elementNames } from "@/solver/cases";

// A 1 m × 1 m box of 10 kg on two contacts at (0, 0) and (1, 0), μ = 0.5 each, pushed sideways by
// F along its base (at (0, 0): no moment about the base line). Each contact bears n = W/2 and, with
// equal tangential springs, takes t = F/2: its friction margin μ·n − |t| = (μ·W − F)/2 reaches zero
// at F = μ·W = 49.03 N (Coulomb friction, common practice) and is below zero beyond it.
const W = 10 * G0;
const pushedBox = (sign = 1) => {
  const p = parseSketch({
    format: "counterpoise.sketch",
    version: 2,
    title: "pushed box",
    parameters: { F: "10 N" },
    bodies: [{ id: "b", mass: "10 kg", cg: [0.5, 0.5], outline: [[0, 0], [1, 0], [1, 1], [0, 1]] }],
    supports: [
      { id: "L", label: "left foot", body: "b", kind: "contact", at: [0, 0], angle: 90, mu: 0.5 },
      { id: "R", label: "right foot", body: "b", kind: "contact", at: [1, 0], angle: 90, mu: 0.5 },
    ],
    loads: [{ id: "push", body: "b", kind: "force", at: [0, 0], fx: sign > 0 ? "F" : "100 N - F", fy: 0 }],
    ports: [],
    massSources: [],
    sweeps: [{ id: "s", parameter: "F", from: 0, to: 100, points: 11, quantities: [{ support: "L", component: "frictionMargin" }] }],
  });
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
};

describe("where a sweep's contact slips", () => {
  it("is kept as a stretch of the points whose friction margin is below zero", () => {
    const file = pushedBox();
    const data = runSweep(file, { parameter: "F", from: 0, to: 100, points: 11, quantities: [{ support: "L", component: "frictionMargin" }] });
    data.xs.forEach((F, i) => expect(data.series[0][i]).toBeCloseTo((0.5 * W - F) / 2, 6));
    // F = 50 … 100 N are past μ·W = 49.03 N
    expect(data.slips).toEqual([{ support: "L", from: 50, to: 100, points: 6, whole: false }]);
    // both feet have μ = 0.5: past μ·W the box itself slides as a whole over the same stretch
    expect(sweepStateLines(data, elementNames(file)).map((l) => l.words)).toEqual([
      "left foot slips from F = 50 to 100 N: it needs more friction than μ·n gives there (its friction margin is below zero). b slides as a whole there too (Σμ·n − |Σt| below zero).",
      "b slides as a whole from F = 50 to 100 N: its friction contacts together cannot give the friction it needs (Σμ·n − |Σt| below zero), so the body itself moves along its base.",
    ]);
  });

  it("says the side when the margin rises through zero, on the calc sheet too", () => {
    // the push is 100 N − F: it slips for F up to 50.97 N and holds beyond
    const file = pushedBox(-1);
    const { markers, states } = sweepCharts(file, file.sweeps![0], "SI", []);
    expect(markers).toHaveLength(1);
    expect(markers[0].x).toBeCloseTo(100 - 0.5 * W, 6);
    expect(states).toEqual([
      "left foot slips from F = 0 to 50 N: it needs more friction than μ·n gives there (its friction margin is below zero). b slides as a whole there too (Σμ·n − |Σt| below zero).",
      "b slides as a whole from F = 0 to 50 N: its friction contacts together cannot give the friction it needs (Σμ·n − |Σt| below zero), so the body itself moves along its base.",
    ]);
  });
});
