// Renaming a parameter in the parameters table: the operating cases that set it set the new name
// (before, they kept the old one and every such case failed: "the sketch has no parameter v to
// override"), the kept sweep sweeps the new name, and the limit found is the same. The exhaust-stack
// example's upwind edge lifts with the engine stopped where the wind's moment about the downwind
// edge reaches the weight's: w(v)·L·h = W·(2.9 − 1.5) m, w = ½ρv²·D·Cd per metre (statics and the
// dynamic pressure of the wind, common practice).
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { renameParameter } from "@/canvas/commands/fields";
import { runLimit } from "@/canvas/studies/run";
import { parseSketch, solveCases } from "@/solver";

const g = 9.80665; // standard gravity, m/s² (CGPM 1901)
const stack = exampleById("exhaust-stack")!.sketch;

describe("renaming a parameter the cases set and a kept sweep sweeps", () => {
  const renamed = renameParameter.run(stack, { from: "v", to: "wind_speed" });

  it("moves each case's value to the new name, in its place, and the sweep with it", () => {
    expect(renamed.parameters).toMatchObject({ wind_speed: "30 m/s", w_wind: "0.5 * rho_air * wind_speed^2 * 0.6 m * 0.7" });
    expect(Object.keys(renamed.parameters!)[0]).toBe("wind_speed");
    const stopped = renamed.cases!.find((c) => c.id === "stopped")!;
    expect(stopped.parameters).toEqual({ wind_speed: "30 m/s", p_duct: "0 kPa" });
    expect(Object.keys(stopped.parameters!)).toEqual(["wind_speed", "p_duct"]);
    // a case that does not set it is left as it was
    expect(renamed.cases!.find((c) => c.id === "weight")).toEqual(stack.cases!.find((c) => c.id === "weight"));
    expect(renamed.sweeps![0].parameter).toBe("wind_speed");
  });

  it("still reads, and every case solves as before", () => {
    const parsed = parseSketch(renamed);
    expect(parsed.ok ? [] : parsed.errors).toEqual([]);
    const before = solveCases(stack);
    const after = solveCases(renamed);
    expect(after.runs.map((r) => [r.id, r.ok])).toEqual(before.runs.map((r) => [r.id, true]));
    // the same reactions, case by case
    after.runs.forEach((r, i) => {
      const b = before.runs[i];
      if (!r.ok || !b.ok) throw new Error(`${r.id} did not solve`);
      expect(r.result.reactions).toEqual(b.result.reactions);
    });
  });

  it("finds the same lift-off speed under the new name: √(W·1.4 m / (½ρ·D·Cd·L·h))", () => {
    const vLift = Math.sqrt((900 * g * (2.9 - 1.5)) / (0.5 * 1.25 * 0.6 * 0.7 * 8 * (0.7 + 8 / 2)));
    const lim = runLimit(renamed, { parameter: "wind_speed", from: 20, to: 45, caseId: "stopped", quantity: { support: "upwind", component: "margin" }, target: 0 });
    if (!lim.found) throw new Error(lim.reason);
    expect(lim.value).toBeCloseTo(vLift, 4);
    expect(lim.unit).toBe("m / s");
  });
});
