// The calc sheet's kept sweeps read a contact's friction as the Sweep tab does (`sweptQuantity`):
// no friction margin where the contact is off the ground, or where its body tips (its reactions
// are then only what would hold it): a gap in the line, and the sheet says where, in the tab's words.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { sweepStateLines } from "@/canvas/studies/display";
import { runSweep } from "@/canvas/studies/run";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { sweepCharts } from "@/lib/calcsheet/sweeps";
import { parseSketch } from "@/solver";
import { G0 } from "@/solver/constants";
import { elementNames } from "@/solver/cases";
import { pdfText } from "../../support/pdf-text";

const fileOf = (doc: unknown) => {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
};

// A 1 m × 1 m box of 10 kg, pinned at (1, 0), on a friction contact (μ = 0.5) at (0, 0) with a
// hold-down strap on the same line; a force F straight up at (0, 1). Moments about the pin (statics,
// common practice): the contact bears n = W·0.5 m / 1 m − F up to F = W/2 = 49.03 N, then lifts and
// the strap holds the box down. No sideways load: t = 0, so the friction margin is μ·n while it bears.
const W = 10 * G0;
const strappedBox = () =>
  fileOf({
    format: "counterpoise.sketch",
    version: 2,
    title: "strapped box",
    parameters: { F: "10 N" },
    bodies: [{ id: "b", mass: "10 kg", cg: [0.5, 0.5], outline: [[0, 0], [1, 0], [1, 1], [0, 1]] }],
    supports: [
      { id: "L", label: "left foot", body: "b", kind: "contact", at: [0, 0], angle: 90, mu: 0.5 },
      { id: "pin", body: "b", kind: "pin", at: [1, 0] },
      { id: "strap", body: "b", kind: "tie", at: [0, 0.5], angle: 270 },
    ],
    loads: [{ id: "f", body: "b", kind: "force", at: [0, 1], fx: 0, fy: "F" }],
    ports: [],
    massSources: [],
    sweeps: [{ id: "s", parameter: "F", from: 0, to: 60, points: 13, quantities: [{ support: "L", component: "frictionMargin" }, { support: "L", component: "margin" }] }],
  });

const cart = () => fileOf(JSON.parse(readFileSync("canvas/examples/washing-cart.json", "utf8")));

describe("a kept sweep's friction margin on the calc sheet", () => {
  it("is a gap where the contact is off the ground, and the sheet says from where to where", () => {
    const file = strappedBox();
    const { charts, markers, states } = sweepCharts(file, file.sweeps![0], "SI", []);
    const friction = charts[0].series.find((s) => s.label.startsWith("friction margin"))!;
    for (const [F, y] of friction.points) {
      // μ·n = 0.5·(W/2 − F) while it bears (F = 0 … 45 N); off the ground from 50 N: no number
      if (F < W / 2) expect(y).toBeCloseTo(0.5 * (W / 2 - F), 9);
      else expect(y).toBeNull();
    }
    // the margin itself is still plotted below zero: what the lifted foot would have to pull
    const margin = charts[0].series.find((s) => s.label.startsWith("margin"))!;
    expect(margin.points.at(-1)![1]).toBeCloseTo(W / 2 - 60, 9);
    expect(markers.map((m) => m.x)).toHaveLength(1);
    expect(markers[0].x).toBeCloseTo(W / 2, 6);
    expect(states).toEqual(["left foot is off the ground from F = 50 to 60 N: it has no friction margin there, and none is plotted."]);
  });

  it("is a gap where its body tips, in the words the Sweep tab and a version's page use", () => {
    // the washing cart's kept sweep: its front caster lifts at about −59° as the lance is raised and
    // the cart tips back onto its braked rear wheels (the example's notes)
    const file = cart();
    const sw = file.sweeps![0];
    const { charts, states } = sweepCharts(file, sw, "SI", []);
    const rear = charts[0].series.find((s) => s.label.startsWith("friction margin"))!;
    const held = rear.points.filter(([x]) => x <= -60);
    const tipping = rear.points.filter(([x]) => x >= -59);
    expect(held.every(([, y]) => y !== null && y > 0)).toBe(true);
    expect(tipping.length).toBe(60);
    expect(tipping.every(([, y]) => y === null)).toBe(true);
    expect(states).toEqual([
      "front caster is off the ground from theta = −59 to 0 deg.",
      "Washing cart tips about rear wheels (braked) from theta = −59 to 0 deg: no set of its contacts and ties holds it.",
      "The friction margin at rear wheels (braked) is not plotted from theta = −59 to 0 deg, where Washing cart tips: a body that is not held has no friction margin (its reactions are only what would hold it).",
    ]);
    // one function says it for the Sweep tab too
    const data = runSweep(file, { parameter: sw.parameter, from: sw.from, to: sw.to, points: sw.points, quantities: sw.quantities! });
    expect(sweepStateLines(data, elementNames(file)).map((l) => l.words)).toEqual(states);
  });

  it("is printed so: the sheet of the washing cart says where the caster is off the ground", async () => {
    const { text } = await pdfText(await buildCalcSheet({ workspace: "W", sketchTitle: "Washing cart", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file: cart() }));
    expect(text).toContain("front caster is off the ground from theta = −59 to 0 deg.");
    expect(text).toContain("The friction margin at rear wheels (braked) is not plotted from theta = −59 to 0 deg, where Washing cart tips");
    // the crossing to the figures it is given to, never with the search's noise (±9e-8 deg)
    expect(text).toMatch(/Crossing: front caster: lift-off \(its normal force reaches zero\) at theta = −59\.0\d deg \(to 4 significant figures\)\./);
    expect(text).not.toMatch(/±\d(\.\d+)?e-\d+/);
  }, 60000);
});
