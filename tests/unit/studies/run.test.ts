// The studies' jobs: a sweep's marked crossings agree with the limit finder to the sweep's
// resolution; a sweep can stop; a case's overrides apply.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { runCases, runLimit, runSweep } from "@/canvas/studies/run";
import { G0 } from "@/solver/constants";

const load = (n: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${n}.json`, "utf8"));

describe("studies jobs", () => {
  it("the sweep's crossing agrees with findLimit to the sweep's resolution", () => {
    const file = load("fire-monitor-trailer");
    const spec = { parameter: "theta", from: 0, to: 80, points: 81, quantities: [{ support: "jack", component: "margin" as const }] };
    const data = runSweep(file, spec);
    expect(data.unit).toBe("deg");
    expect(data.crossings).toHaveLength(1);
    const [a, b] = data.crossings[0].between;
    expect(b - a).toBeCloseTo(1, 12);
    const lim = runLimit(file, { parameter: "theta", from: 0, to: 80, quantity: spec.quantities[0], target: 0 });
    expect(lim.found).toBe(true);
    if (lim.found) {
      expect(lim.value).toBeGreaterThanOrEqual(a);
      expect(lim.value).toBeLessThanOrEqual(b);
    }
    // below the crossing the jack is lifted, above it bears
    expect(data.statuses[0]).toBe("lifts");
    expect(data.statuses[80]).toBe("holds");
  });

  it("the flow factor crossing for a thrust stand: T = W·d/h (common practice)", () => {
    const file = load("thrust-stand-tips");
    // the jet's thrust is 2.2 kN at f = 1; it scales with f²; lift-off where f²·2200·1.5 = W·0.8
    const f = Math.sqrt((200 * G0 * 0.8) / (1.5 * 2200));
    const data = runSweep(file, { parameter: "flowFactor", from: 0, to: 1.5, points: 151, quantities: [{ support: "rear", component: "margin" }] });
    const [a, b] = data.crossings[0].between;
    expect(f).toBeGreaterThanOrEqual(a);
    expect(f).toBeLessThanOrEqual(b);
  });

  it("a sweep stops when asked and returns what it has", () => {
    const file = load("fire-monitor-trailer");
    let calls = 0;
    const data = runSweep(file, { parameter: "theta", from: 0, to: 80, points: 1000, quantities: [{ support: "leg", component: "n" }] }, () => ++calls < 3, 100);
    expect(data.xs).toHaveLength(300);
  });

  it("sweeps a case: its overrides and factors apply", () => {
    const file = { ...load("fire-monitor-trailer"), version: 3, cases: [{ id: "half", name: "Half flow", flowFactor: 0.5 }] };
    const all = runSweep(file, { parameter: "theta", from: 10, to: 10, points: 2, quantities: [{ support: "wheel", component: "n" }] });
    const half = runSweep(file, { parameter: "theta", from: 10, to: 10, points: 2, caseId: "half", quantities: [{ support: "wheel", component: "n" }] });
    const study = runCases(file);
    const run = study.runs.find((r) => r.id === "half")!;
    if (!run.ok) throw new Error();
    expect(half.series[0][0]).not.toBeCloseTo(all.series[0][0], 3);
    // at theta = 15° (the file's own value) the case run and the case sweep agree
    const at15 = runSweep(file, { parameter: "theta", from: 15, to: 15, points: 2, caseId: "half", quantities: [{ support: "wheel", component: "n" }] });
    expect(at15.series[0][0]).toBeCloseTo(run.result.reactions.wheel.n!, 9);
  });
});
