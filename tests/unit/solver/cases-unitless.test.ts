// A case's parameter change typed without a unit ("v = 30" where the sketch gives v in m/s) is said
// plainly at the change, with the unit to write, before what the bare number breaks elsewhere.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { caseInputErrors, NO_UNIT } from "@/solver/cases";
import { parseSketch } from "@/solver";
import type { SketchFile } from "@/solver/schema";

function example(name: string): SketchFile {
  const r = parseSketch(JSON.parse(readFileSync(`canvas/examples/${name}.json`, "utf8")));
  if (!r.ok) throw new Error(`${name} does not parse`);
  return r.file;
}

describe("a case's change typed without a unit", () => {
  it("a wind speed v = 30 (the sketch gives v in m/s): no unit, and what to write, first", () => {
    const stack = example("exhaust-stack");
    const errors = caseInputErrors(stack, { id: "w", name: "Wind", parameters: { v: "30" } });
    expect(errors[0]).toEqual({ path: "cases[w].parameters.v", message: `${NO_UNIT}; the sketch gives v in m/s: write 30 m/s` });
    // and what it breaks, after it: q = ½ρv² × 0.6 m × 0.7 with v bare is kg/m³ × m = kg/m²
    // (0.5 × 1.25 × 30² × 0.42 = 236.25: q = ½ρv², common practice)
    expect(errors.slice(1).map((e) => e.path)).toEqual(["loads[0].w1", "loads[0].w2"]);
    expect(errors[1].message).toMatch(/^236\.25 kg \/ m\^2 is in other units/);
  });

  it("a density rho = 1000 is told its unit as the sketch writes it; 0 and a value with its unit read", () => {
    const skid = example("pump-skid");
    expect(caseInputErrors(skid, { id: "c", name: "C", parameters: { rho: "1000" } })[0].message).toBe(`${NO_UNIT}; the sketch gives rho in kg/m³: write 1000 kg/m³`);
    expect(caseInputErrors(skid, { id: "c", name: "C", parameters: { rho: "1000 kg/m^3" } })).toEqual([]);
    // what it says to write reads: the unit as shown
    expect(caseInputErrors(skid, { id: "c", name: "C", parameters: { rho: "1000 kg/m³" } })).toEqual([]);
    // a bare number that breaks nothing would be read in SI units (1800 m³/s for a flow in L/min): refused too
    expect(caseInputErrors(skid, { id: "c", name: "C", parameters: { Q: "1800" } })).toEqual([
      { path: "cases[c].parameters.Q", message: `${NO_UNIT}; the sketch gives Q in L/min: write 1800 L/min` },
    ]);
    expect(caseInputErrors(skid, { id: "c", name: "C", parameters: { Q: "1800 L/min" } })).toEqual([]);
    // a flow per hour is said and written with h, and what it says reads back
    const perHour = { ...skid, parameters: { ...skid.parameters, Q: "108 m3/hr" } };
    expect(caseInputErrors(perHour, { id: "c", name: "C", parameters: { Q: "90" } })[0].message).toBe(`${NO_UNIT}; the sketch gives Q in m³/h: write 90 m³/h`);
    expect(caseInputErrors(perHour, { id: "c", name: "C", parameters: { Q: "90 m³/h" } })).toEqual([]);
    // zero is zero in any unit
    expect(caseInputErrors(skid, { id: "c", name: "C", parameters: { Q: "0" } })).toEqual([]);
  });

  it("a change in a unit of another kind names its kind and the sketch's unit, before what it breaks", () => {
    const stack = example("exhaust-stack");
    const errors = caseInputErrors(stack, { id: "w", name: "Wind", parameters: { v: "30 psi" } });
    expect(errors[0]).toEqual({ path: "cases[w].parameters.v", message: "is a pressure, but the sketch gives v in m/s, a speed" });
    expect(errors.length).toBe(3);
  });
});
