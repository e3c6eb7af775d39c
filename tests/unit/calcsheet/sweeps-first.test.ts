// "(first)" marks the run where a swept margin reaches zero first; runs that reach it at the same
// value share it, and none is marked. (The stand: lift-off at T = W·d/h, common practice.)
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
    // each value to 4 significant figures, with the search's tolerance: 1e-9 of the 3,000 N range
    expect(line).toMatch(/Full flow — [\d.]+ kN \(first\); Throttled — [\d.]+ kN; each to 4 significant figures, found to within ±3e-6 kN$/);
  });

  it("marks none when every case reaches it at the same value", () => {
    const [line] = sweepEverywhere(fileWith([{ id: "a", name: "Bench A" }, { id: "b", name: "Bench B" }]), sweep, sweep.quantities);
    expect(at(line, "Bench A")).toBeCloseTo(T0, -1);
    expect(at(line, "Bench B")).toBeCloseTo(T0, -1);
    expect(line).not.toContain("(first)");
  });
});
