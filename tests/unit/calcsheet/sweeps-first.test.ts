// "(first)" marks the run where a swept margin reaches zero first; runs that reach it at the same
// value are named as a tie, and when every run does, that is said once. (The stand: lift-off at
// T = W·d/h, common practice.)
import { describe, expect, it } from "vitest";
import { sweepEverywhere } from "@/lib/calcsheet/sweeps";
import { parseSketch, type SketchFileInput } from "@/solver";
import { G0 } from "@/solver/constants";
import { loadFixture } from "../solver/helpers";

const fileWith = (cases: SketchFileInput["cases"]) => {
  const doc = loadFixture("thrust-stand-tips.json");
  doc.cases = cases;
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
};
const sweep = { id: "s", parameter: "T", from: 0, to: 3000, points: 31, quantities: [{ support: "rear", component: "margin" as const }] };
// the rear pad lifts when T·1.5 = W·0.8 (moments about the front pin): T = 200·g0·0.8/1.5
const T0 = (200 * G0 * 0.8) / 1.5;
/** the value a run's entry gives, in N */
const at = (line: string, name: string) => {
  const m = new RegExp(`${name} — ([\\d,.]+) (k?N)`).exec(line)!;
  return Number(m[1].replace(/,/g, "")) * (m[2] === "kN" ? 1000 : 1);
};

describe("the sweep's line over every case", () => {
  it("marks the case that reaches zero first", () => {
    // throttled to a flow factor of 0.8 the thrust is 0.64·T: it lifts at T0 / 0.64
    const [line] = sweepEverywhere(fileWith([{ id: "a", name: "Full flow" }, { id: "b", name: "Throttled", flowFactor: 0.8 }]), sweep, sweep.quantities);
    expect(at(line, "Full flow")).toBeCloseTo(T0, -1);
    expect(at(line, "Throttled")).toBeCloseTo(T0 / 0.64, -1);
    // each value to 4 significant figures; the search's tolerance (1e-9 of the 3,000 N range, ±3e-6 kN)
    // is finer than the 0.001 kN the figures show, so it is not said
    expect(line).toMatch(/Full flow — [\d.]+ kN \(first\); Throttled — [\d.]+ kN; each to 4 significant figures$/);
  });

  it("says once that every case reaches it at the same value: a tie", () => {
    const [line] = sweepEverywhere(fileWith([{ id: "a", name: "Bench A" }, { id: "b", name: "Bench B" }]), sweep, sweep.quantities);
    expect(at(line, "Bench A")).toBeCloseTo(T0, -1);
    expect(at(line, "Bench B")).toBeCloseTo(T0, -1);
    expect(line).toMatch(/^rear pad lift-off in each case and combination: Bench A — 1\.046 kN; Bench B — 1\.046 kN; the same in every one \(a tie\); each to 4 significant figures$/);
    expect(line).not.toContain("(first");
  });

  it("names every case of a tie for first, as the Sweep tab's In every case does", () => {
    // two benches at full flow lift at T0; throttled to f = 0.8 the thrust is 0.64·T: later, at T0 / 0.64
    const [line] = sweepEverywhere(
      fileWith([{ id: "a", name: "Bench A" }, { id: "b", name: "Bench B" }, { id: "c", name: "Throttled", flowFactor: 0.8 }]),
      sweep,
      sweep.quantities,
    );
    expect(at(line, "Throttled")).toBeCloseTo(T0 / 0.64, -1);
    expect(line).toMatch(/^rear pad lift-off in each case and combination: Bench A — 1\.046 kN \(first, a tie\); Bench B — 1\.046 kN \(first, a tie\); Throttled — 1\.634 kN; each to 4 significant figures$/);
  });
});
