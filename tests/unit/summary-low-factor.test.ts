// A version's summary keeps the factor of safety furthest below its required value (as drawn, or
// in any case or combination), so the sketch list can mark a body that "holds" yet is short of its
// required factor. The factors are the stability checks' own (restoring over overturning moment,
// friction available over friction needed); 1.5 required for each is common practice.
import { describe, expect, it } from "vitest";
import { parseSketch, solveCases } from "@/solver";
import { lowestFactor, OVER_MU, summarizeSolve } from "@/lib/sketch-document";
import { loadFixture } from "./solver/helpers";

const parsed = (doc: unknown) => {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p;
};

describe("the lowest factor of safety in a version's summary", () => {
  it("the monitor trailer as drawn overturns with a factor below 1.5: named, with its run", () => {
    const p = parsed(loadFixture("fire-monitor-trailer.json"));
    const run = solveCases(p.file).runs[0];
    if (!run.ok) throw new Error("as drawn did not solve");
    const check = Object.values(run.stability)[0].overturning;
    if ("notApplicable" in check) throw new Error("no overturning check");
    // the same factor the stability check gives: restoring ÷ overturning moment about the rear leg
    expect(check.factor).toBeCloseTo(check.restoring / check.overturning, 12);
    expect(check.factor).toBeLessThan(1.5);
    const low = lowestFactor(p)!;
    expect(low).toEqual({ check: "overturning", body: "Trailer", factor: check.factor, required: 1.5, run: run.name });
    expect(summarizeSolve(p).lowestFactor).toEqual(low);
  });

  it("the worst of the sketch as drawn and its cases is kept", () => {
    const doc = loadFixture("fire-monitor-trailer.json");
    doc.cases = [
      { id: "steep", name: "Steep throw", parameters: { theta: "40 deg" } },
      { id: "flat", name: "Flat throw", parameters: { theta: "5 deg" } },
    ];
    const p = parsed(doc);
    const low = lowestFactor(p)!;
    expect(low).not.toBeNull();
    const runs = [...solveCases({ ...p.file, cases: undefined }).runs, ...solveCases(p.file).runs];
    const factors = runs
      .flatMap((r) => (r.ok ? Object.values(r.stability).flatMap((st) => [st.overturning, st.sliding]) : []))
      .flatMap((c) => ("notApplicable" in c || c.pass ? [] : [c.factor / c.required]));
    expect(low.factor / low.required).toBeCloseTo(Math.min(...factors), 12);
  });

  it("none below: null", () => {
    expect(lowestFactor(parsed(loadFixture("pump-skid-discharge.json")))).toBeNull();
  });
});

describe("a slip in a version's summary", () => {
  it("is a slip when the body needs more friction as a whole than its contacts give, 'over μ' when one contact alone does", () => {
    // the skid that slides as a whole keeps SLIP (the listing's "slips" filter finds it)
    const slides = summarizeSolve(parsed(loadFixture("pump-skid-slip.json")));
    expect(slides.warnings).toContain("SLIP");
    expect(slides.warnings).not.toContain(OVER_MU);
    // the monitor thrown back at 150°: the rear leg needs 0.7004 of its μ = 0.7, the trailer as a
    // whole less than the 0.7 its contacts give (Coulomb friction, common practice)
    const doc = loadFixture("fire-monitor-trailer.json") as { parameters: Record<string, string> };
    doc.parameters.theta = "150 deg";
    const one = summarizeSolve(parsed(doc));
    expect(one.warnings).toContain(OVER_MU);
    expect(one.warnings).not.toContain("SLIP");
  });
});
