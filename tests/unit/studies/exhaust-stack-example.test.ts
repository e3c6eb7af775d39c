// The exhaust-stack example against hand calculations: wind on a stack as q·Cd·D per metre with
// q = ½ρv² (the dynamic pressure of the wind: common practice), and the upwind edge of an unbolted
// skid lifting when the wind's moment about the downwind edge reaches the weight's (statics,
// common practice). The duct's pressure is the gauge pressure times its area (common practice).
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { runLimit } from "@/canvas/studies/run";
import { parseSketch, solve, solveCases } from "@/solver";

const g = 9.80665; // standard gravity, m/s² (CGPM 1901)
const stack = exampleById("exhaust-stack")!.sketch;
// the example's own numbers: 900 kg on a skid whose edges are at x = 0.1 and 2.9 m, the weight at
// x = 1.5 m; the stack 0.6 m wide from y = 0.7 to 8.7 m (its wind acts at mid-height, 4.7 m)
const W = 900 * g;
const wPerV2 = 0.5 * 1.25 * 0.6 * 0.7; // N/m per (m/s)²
const L = 8;
const h = 0.7 + L / 2;

describe("the exhaust-stack example", () => {
  it("with the engine stopped, the upwind edge lifts where w(v)·L·h = W·(2.9 − 1.5) m", () => {
    const vLift = Math.sqrt((W * (2.9 - 1.5)) / (wPerV2 * L * h));
    expect(vLift).toBeCloseTo(35.38, 2);
    const lim = runLimit(stack, { parameter: "v", from: 20, to: 45, caseId: "stopped", quantity: { support: "upwind", component: "margin" }, target: 0 });
    if (!lim.found) throw new Error(lim.reason);
    expect(lim.value).toBeCloseTo(vLift, 4);
    // the menu's summary and the sketch's notes give the same speed
    const shown = `${vLift.toFixed(1)} m/s`;
    expect(exampleById("exhaust-stack")!.summary).toContain(`lifts at ${shown}`);
    expect(stack.description).toContain(`lifts at ${shown}`);
  });

  it("the cases: as drawn it holds, the stopped case holds but falls short of 1.5 against overturning, the storm tips", () => {
    const p = parseSketch(stack);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const study = solveCases(p.file);
    const run = (id: string) => {
      const r = study.runs.find((x) => x.id === id);
      if (!r?.ok) throw new Error(`case ${id} did not solve`);
      return r;
    };
    // stopped at 30 m/s: restoring W·1.4 over the wind's w·L·h
    const stopped = run("stopped").stability.stack.overturning;
    const factor = (W * 1.4) / (wPerV2 * 30 ** 2 * L * h);
    expect("factor" in stopped && stopped.factor).toBeCloseTo(factor, 9);
    expect(factor).toBeCloseTo(1.391, 3);
    expect("pass" in stopped && stopped.pass).toBe(false);
    expect(run("stopped").result.bodies.stack.status).toBe("holds");
    expect(run("running").result.bodies.stack.status).toBe("holds");
    expect(run("storm").result.bodies.stack.status).toBe("tips");
    // running: the duct pushes against the wind with its pressure p·A and the gas's momentum ṁ·V
    // entering, so the skid's friction carries less than the wind's w·L
    const r = solve(p.sketch);
    const shear = r.reactions.upwind.fx + r.reactions.downwind.fx;
    const A = (Math.PI / 4) * 0.5 ** 2;
    const Vin = 4.2 / (0.6 * A);
    expect(-shear).toBeCloseTo(wPerV2 * 30 ** 2 * L - 2000 * A - 4.2 * Vin, 6);
  });

  it("the uplift check, swept on its combination: the upwind edge lifts where 1.5·w(v)·L·h = 0.9·W·1.4 m", () => {
    // the same moment balance about the downwind edge with the wind × 1.5 and the weight × 0.9:
    // v = v_lift·√(0.9 / 1.5) (statics, common practice)
    const vLift = Math.sqrt((W * (2.9 - 1.5)) / (wPerV2 * L * h));
    const vFactored = vLift * Math.sqrt(0.9 / 1.5);
    const lim = runLimit(stack, { parameter: "v", from: 20, to: 45, combinationId: "uplift", quantity: { support: "upwind", component: "margin" }, target: 0 });
    if (!lim.found) throw new Error(lim.reason);
    expect(lim.value).toBeCloseTo(vFactored, 4);
    expect(stack.description).toContain(`lifts at ${vFactored.toFixed(1)} m/s`);
    expect(exampleById("exhaust-stack")!.summary).toContain(`at ${vFactored.toFixed(1)} m/s in the factored uplift check`);
    // at 30 m/s, past that speed, the factored load set tips the skid
    const p = parseSketch(stack);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const study = solveCases(p.file);
    // its two load cases are solved only within it
    expect(study.runs.map((r) => r.id)).toEqual(["running", "stopped", "storm", "uplift"]);
    const run = study.runs.find((r) => r.id === "uplift");
    if (!run?.ok) throw new Error("the combination did not solve");
    expect(run.result.bodies.stack.status).toBe("tips");
  });
});
