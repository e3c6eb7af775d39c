// Units as engineers type them: per hour (km/h, m³/h, kg/h, L/h), powers as digits (m3, mm2),
// torques with a hyphen (kN-m, ft-lb), feet and inches together, digits grouped by spaces, and the
// thousands comma told apart from a decimal comma. Beside a parameter of the same name, a unit
// right after a number or tight inside a compound unit stays the unit; anywhere else the parameter wins.
import { describe, expect, it } from "vitest";
import { compileExpression, evaluateToNumber, evaluateTyped, normaliseExpressionText } from "@/solver/expressions";
import { typedValueWords } from "@/canvas/studies/display";
import { box, errorsOf, parsed, sketch } from "./helpers";

/** A sketch whose body mass is the given field. */
const withMass = (parameters: Record<string, string | number>, mass: string | number) =>
  sketch({
    parameters,
    bodies: [{ id: "b", outline: box(1, 1), mass }],
    supports: [
      { id: "left", body: "b", kind: "pin", at: [0, 0] },
      { id: "right", body: "b", kind: "roller", at: [1, 0], angle: 90 },
    ],
  });

const massOf = (doc: unknown): number => parsed(doc).bodies[0].mass;

/** One body on a pin with the parameter h = 2 m, and the given jet speed or push. */
const besideH = (part: { velocity?: string; push?: string }) =>
  sketch({
    parameters: { h: "2 m" },
    bodies: [{ id: "b", outline: box(1, 1), mass: 10 }],
    supports: [{ id: "left", body: "b", kind: "pin", at: [0, 0] }],
    ...(part.velocity ? { ports: [{ id: "jet", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, massFlow: "2 kg/s", velocity: part.velocity }] } : {}),
    ...(part.push ? { loads: [{ id: "push", body: "b", kind: "force", at: [1, 1], magnitude: part.push, angle: 0 }] } : {}),
  });

describe("per hour after a unit, when no parameter is called h", () => {
  // 1 h = 3600 s, 1 km = 1000 m (NIST SP 811, Table 6 and the SI prefixes); 1 L = 0.001 m³ (SI Brochure, 9th ed., Table 8)
  it("3.6 km/h is 1 m/s", () => {
    expect(evaluateToNumber("3.6 km/h", "velocity")).toBeCloseTo(1, 14);
    expect(evaluateToNumber("90 km / h", "velocity")).toBeCloseTo(25, 12);
  });

  it("1 m³/h is 1/3600 m³/s however the cube is written", () => {
    for (const text of ["1 m³/h", "1 m3/h", "1 m^3/h", "1 m^3 / h", "1000 L/h", "1000 l/h"]) {
      expect(evaluateToNumber(text, "volumeFlow"), text).toBeCloseTo(1 / 3600, 18);
    }
    expect(evaluateToNumber("1500 m³/h", "volumeFlow")).toBeCloseTo(0.41666666666666667, 14);
  });

  it("3600 kg/h is 1 kg/s; the app's own hr still reads", () => {
    expect(evaluateToNumber("3600 kg/h", "massFlow")).toBeCloseTo(1, 14);
    expect(evaluateToNumber("3.6 km/hr", "velocity")).toBeCloseTo(1, 14);
  });

  it("a parameter flow in m³/h feeds a field in m³/s", () => {
    // 72/3600 m³/s × 1000 kg/m³ × 1 s = 20 kg
    expect(massOf(withMass({ Q: "72 m³/h", rho: "1000 kg/m3" }, "Q * rho * 1 s"))).toBeCloseTo(20, 12);
  });

  it("with a parameter called h, h used as a value divides: x/h, W / h, and a unit / h with spaces", () => {
    expect(massOf(withMass({ h: "2 m", W: "10 kg*m" }, "W/h"))).toBe(5);
    expect(massOf(withMass({ h: 4, W: "10 kg" }, "W / h"))).toBe(2.5);
    expect(massOf(withMass({ h: 4 }, "(10 kg)/h"))).toBe(2.5);
    // a moment over a height (kg·m / m), the slash spaced: the parameter
    expect(normaliseExpressionText("6 kg*m / h", new Set(["h"]))).toBe("6 kg*m / h");
    expect(massOf(withMass({ h: "2 m" }, "6 kg*m / h"))).toBe(3);
  });

  it("with a parameter called h, /h tight against a unit is still per hour: 3.6 km/h, 50 m³/h, 3600 kg/h, 1000 L/h", () => {
    const h = new Set(["h"]);
    expect(normaliseExpressionText("3.6 km/h", h)).toBe("3.6 km/hr");
    expect(normaliseExpressionText("50 m³/h", h)).toBe("50 m^3/hr");
    expect(normaliseExpressionText("50 m3/h", h)).toBe("50 m^3/hr");
    expect(normaliseExpressionText("1000 L/h", h)).toBe("1000 litre/hr");
    expect(massOf(withMass({ h: "2 m" }, "3600 kg/h * 1 s"))).toBeCloseTo(1, 14);
    // 1 h = 3600 s (NIST SP 811, Table 6)
    expect(massOf(withMass({ h: "2 m", Q: "50 m³/h" }, "Q * 1000 kg/m3 * 72 s"))).toBeCloseTo(1000, 10);
  });

  it("h followed by a call or a power is never an hour", () => {
    expect(normaliseExpressionText("2 m/h^2")).toBe("2 m/h^2");
    expect(normaliseExpressionText("2 m/h(3)")).toBe("2 m/h(3)");
    // not a name ending in a unit: "xkm/h" is no kilometre
    expect(normaliseExpressionText("xkm/h")).toBe("xkm/h");
  });

  it("h after a name that is no unit is not guessed: the error says how to write hours", () => {
    expect(errorsOf(withMass({ x: "10 kg" }, "x/h"))).toEqual([
      { path: "bodies[0].mass", message: 'unknown name "h": it is not a parameter, and Counterpoise does not read "h" as a unit on its own (write hours as hr: 5 hr, x/hr; after a unit, /h is per hour: 3.6 km/h, 50 m³/h)' },
    ]);
  });
});

describe("a power written as a digit after a length unit, when no parameter has that name", () => {
  it("1000 kg/m3 is a density, 0.5 mm2 an area, 2m3 a volume", () => {
    expect(evaluateToNumber("1000 kg/m3", "density")).toBe(1000);
    expect(evaluateToNumber("0.5 mm2", "area")).toBeCloseTo(5e-7, 20);
    // 1 ft = 0.3048 m exactly (NIST SP 811, Appendix B)
    expect(evaluateToNumber("10 ft2", "area")).toBeCloseTo(10 * 0.3048 ** 2, 14);
    expect(evaluateToNumber("2 m3/s", "volumeFlow")).toBe(2);
  });

  it("a parameter called m3 is read as itself", () => {
    expect(normaliseExpressionText("2*m3", new Set(["m3"]))).toBe("2*m3");
    expect(massOf(withMass({ m3: "4 kg" }, "m3 / 2"))).toBe(2);
    // and longer names ending in m3 are names
    expect(normaliseExpressionText("qm3 + am3")).toBe("qm3 + am3");
  });
});

describe("torques with a hyphen between force and length", () => {
  // 1 lbf = 4.4482216152605 N, 1 ft = 0.3048 m, 1 kip = 1000 lbf (NIST SP 811, Appendix B)
  it("200 N-m, 2 kN-m, 1500 ft-lb (a foot-pound of torque: lbf, common practice), 2 kip-ft", () => {
    expect(evaluateToNumber("200 N-m", "moment")).toBe(200);
    expect(evaluateToNumber("2 kN-m", "moment")).toBe(2000);
    expect(evaluateToNumber("1500 ft-lb", "moment")).toBeCloseTo(1500 * 0.3048 * 4.4482216152605, 9);
    expect(evaluateToNumber("1500 lbf-ft", "moment")).toBeCloseTo(1500 * 0.3048 * 4.4482216152605, 9);
    expect(evaluateToNumber("2 kip-ft", "moment")).toBeCloseTo(2000 * 0.3048 * 4.4482216152605, 9);
    // a kip is 1000 lbf exactly, to the last figure (mathjs's own stops at 4448.2216 N)
    expect(evaluateToNumber("1 kip", "force")).toBeCloseTo(4448.2216152605, 9);
  });

  it("a minus between numbers and units stays a minus", () => {
    expect(evaluateToNumber("2 m - 500 mm", "length")).toBe(1.5);
    expect(evaluateToNumber("5 kN-2 kN", "force")).toBe(3000);
    expect(() => evaluateToNumber("2 m-ft", "length")).toThrow("m and ft cannot be subtracted");
  });
});

describe("more of what engineers type", () => {
  it("kN.m and N.m (a point between units) are torques; m/s2 an acceleration", () => {
    expect(evaluateToNumber("2 kN.m", "moment")).toBe(2000);
    expect(evaluateToNumber("350 N.m", "moment")).toBe(350);
    expect(evaluateToNumber("9.81 m/s2", "acceleration")).toBeCloseTo(9.81, 14);
    expect(massOf(withMass({ s2: "3 kg" }, "2*s2"))).toBe(6);
  });

  // 12 in = 1 ft = 0.3048 m (NIST SP 811, Appendix B)
  it("feet and inch marks: 5' 3\" and 5′ 3″ are 1.6002 m, 6\" is 0.1524 m", () => {
    expect(evaluateToNumber("5' 3\"", "length")).toBeCloseTo(1.6002, 12);
    expect(evaluateToNumber("5′ 3″", "length")).toBeCloseTo(1.6002, 12);
    expect(evaluateToNumber("6\"", "length")).toBeCloseTo(0.1524, 14);
    expect(evaluateToNumber("12'", "length")).toBeCloseTo(3.6576, 12);
  });

  // every pressure a sketch takes is gauge (solver/cautions.ts); 1 psi = 6894.757 Pa (NIST SP 811, Appendix B)
  it("psig and barg are gauge psi and bar; psia and bara say that pressures here are gauge", () => {
    expect(evaluateToNumber("150 psig", "pressure")).toBeCloseTo(150 * 6894.757293168, 5);
    expect(evaluateToNumber("2 barg", "pressure")).toBe(200000);
    expect(() => evaluateTyped("150 psia")).toThrow('unknown name "psia": it is not a parameter or a unit here: every pressure here is gauge: write psi (gauge), the absolute value less the atmosphere (1 atm = 14.696 psi)');
    expect(() => evaluateTyped("3 bara")).toThrow("every pressure here is gauge: write bar (gauge)");
    expect(normaliseExpressionText("2*psig", new Set(["psig"]))).toBe("2*psig");
  });

  it("lbs, tons and kips say what to write", () => {
    expect(() => evaluateTyped("2 lbs")).toThrow('unknown name "lbs": it is not a parameter or a unit here: write lb for a mass or lbf for a force');
    expect(() => evaluateTyped("2 tons")).toThrow("write tonne (1000 kg), or lb (1 short ton = 2000 lb)");
    expect(() => evaluateTyped("2 kips")).toThrow("write kip (1000 lbf)");
  });
});

describe("feet and inches together", () => {
  // 12 in = 1 ft = 0.3048 m (NIST SP 811, Appendix B)
  it("5 ft 3 in is 1.6002 m, not 15 ft·in", () => {
    expect(evaluateToNumber("5 ft 3 in", "length")).toBeCloseTo(1.6002, 12);
    expect(evaluateToNumber("-5 ft 3 in", "length")).toBeCloseTo(-1.6002, 12);
    expect(evaluateToNumber("6 feet 1.5 inch", "length")).toBeCloseTo(6 * 0.3048 + 1.5 * 0.0254, 12);
    // before, "5 ft 3 in" in an area field was silently 180 in²
    expect(() => evaluateToNumber("5 ft 3 in", "area")).toThrow("needs an area");
  });
});

describe("digits grouped as the SI writes them, and the comma", () => {
  // SI Brochure, 9th ed., 5.4.4: digits may be grouped in threes by a space
  it("12 500 N, 1 000 000 N and a thin space read as the whole number", () => {
    expect(evaluateToNumber("12 500 N", "force")).toBe(12500);
    expect(evaluateToNumber("1 000 000 N", "force")).toBe(1e6);
    expect(evaluateToNumber("2\u2009500.5 kg", "mass")).toBe(2500.5);
    // not three digits: no grouping, the parser's error stands
    expect(() => evaluateTyped("12 50 N")).toThrow('cannot read "12 50 N"');
  });

  it("1,000 N says both readings; 1,5 kg says to write a point", () => {
    expect(() => evaluateTyped("1,000 N")).toThrow('cannot read "1,000 N": write 1000 if the comma groups thousands, or 1.000 if it is a decimal comma (no separators here)');
    expect(() => evaluateTyped("1,5 kg")).toThrow('cannot read "1,5 kg": write decimals with a point (1.5, not 1,5)');
    expect(() => evaluateTyped("0,5500 kg")).toThrow("write decimals with a point (0.5500, not 0,5500)");
  });

  it("30deg with no space is 30°", () => {
    expect(evaluateToNumber("30deg", "angle")).toBeCloseTo(30, 12);
    expect(evaluateToNumber("30°", "angle")).toBeCloseTo(30, 12);
  });
});

describe("what the app shows flows in can be typed back", () => {
  // the flows' display units (solver/units.ts): m³/s, L/s, gpm; parameters show "m^3 / hr" as m³/hr
  it("0.05 m³/s, 50 L/s, 792.5 gpm and 180 m³/hr", () => {
    expect(evaluateToNumber("0.05 m³/s", "volumeFlow")).toBeCloseTo(0.05, 15);
    expect(evaluateToNumber("50 L/s", "volumeFlow")).toBeCloseTo(0.05, 15);
    // 1 US gal = 3.785411784 L (NIST SP 811, Appendix B)
    expect(evaluateToNumber("792.5 gpm", "volumeFlow")).toBeCloseTo((792.5 * 3.785411784e-3) / 60, 12);
    expect(evaluateToNumber("180 m³/hr", "volumeFlow")).toBeCloseTo(0.05, 15);
  });

  it("a compiled text keeps the text as typed", () => {
    expect(compileExpression("3.6 km/h", new Set()).text).toBe("3.6 km/h");
  });
});

describe("a value as a case writes it, in words", () => {
  it("its minus signs are the true minus; the stored text is untouched", () => {
    const stored = "-75 deg";
    expect(typedValueWords(stored)).toBe("−75 deg");
    expect(typedValueWords(-50)).toBe("−50");
    expect(typedValueWords("theta0 - 5 deg")).toBe("theta0 − 5 deg");
    expect(stored).toBe("-75 deg");
    // and what it shows reads back as the same value
    expect(evaluateToNumber(typedValueWords(stored), "angle")).toBeCloseTo(-75, 12);
  });
});

describe("km/h beside a parameter h", () => {
  it("3.6 km/h reads 1 m/s, as km/hr does", () => {
    expect(parsed(besideH({ velocity: "3.6 km/h" })).ports[0].velocity).toBeCloseTo(1, 14);
    expect(parsed(besideH({ velocity: "3.6 km/hr" })).ports[0].velocity).toBeCloseTo(1, 14);
  });

  it("spaced, km / h divides by the parameter: the field fails as a plain number, and the words say how to write per hour", () => {
    const errors = errorsOf(besideH({ velocity: "3.6 km / h" }));
    expect(errors).toEqual([
      {
        path: "ports[0].velocity",
        message: '"3.6 km / h" gives a plain number here (1800); "km / h" divides by the parameter h here (with spaces); for per hour write km/h with no spaces',
      },
    ]);
  });

  it("a moment over the lever h: spaced it divides (6 kN·m over 2 m is 3 kN); tight it is per hour, and the error says how to divide", () => {
    expect(parsed(besideH({ push: "6 kN*m / h" })).loads[0]).toMatchObject({ magnitude: 3000 });
    const errors = errorsOf(besideH({ push: "6 kN*m/h" }));
    expect(errors).toHaveLength(1);
    expect(errors[0].path).toBe("loads[0].magnitude");
    expect(errors[0].message).toMatch(/; "m\/h" is per hour here \(h written tight against a unit is the hour\); to divide by the parameter h, write m \/ h with spaces$/);
  });
});

describe("litres and digit powers beside a parameter of the same name", () => {
  const flowWith = (parameters: Record<string, string>, volumeFlow: string) =>
    sketch({
      parameters,
      bodies: [{ id: "b", outline: box(1, 1), mass: 10 }],
      supports: [{ id: "left", body: "b", kind: "fixed", at: [0, 0] }],
      ports: [{ id: "jet", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, density: 1000, volumeFlow, area: 0.01 }],
    });

  it("600 L/min and 40 L/s right after a number are litres whatever L is (1 L = 0.001 m³, SI Brochure, 9th ed., Table 8)", () => {
    expect(parsed(flowWith({ L: "3 m" }, "600 L/min")).ports[0].volumeFlow).toBeCloseTo(0.01, 15);
    expect(parsed(flowWith({ L: "3 m" }, "40 L/s")).ports[0].volumeFlow).toBeCloseTo(0.04, 15);
  });

  it("L used as a value is the parameter: 0.02 m² times L = 3 m per minute is 0.001 m³/s", () => {
    expect(parsed(flowWith({ L: "3 m" }, "0.02 m^2 * L/(60 s)")).ports[0].volumeFlow).toBeCloseTo(0.001, 15);
  });

  it("a failing field with litres after a number beside the parameter L says how to multiply by it", () => {
    const errors = errorsOf(
      sketch({
        parameters: { L: "3 m" },
        bodies: [{ id: "b", outline: box(1, 1), mass: "600 L/min" }],
        supports: [{ id: "left", body: "b", kind: "fixed", at: [0, 0] }],
      }),
    );
    expect(errors).toHaveLength(1);
    expect(errors[0].message).toMatch(/; "600 L\/min" is litres per minute here \(a unit right after a number\); to multiply by the parameter L, write 600\*L\/min$/);
  });

  it("with a parameter called m3, 1000 kg/m3 and 2 m3 are still the units; m3 on its own is the parameter", () => {
    const names = new Set(["m3"]);
    expect(normaliseExpressionText("1000 kg/m3", names)).toBe("1000 kg/m^3");
    expect(normaliseExpressionText("2 m3", names)).toBe("2 m^3");
    expect(normaliseExpressionText("2*m3 + x/m3", names)).toBe("2*m3 + x/m3");
    // a parameter density 1000 kg/m3 times 0.002 m3: 2 kg, with m3 = 5 kg beside it
    expect(massOf(withMass({ m3: "5 kg", rho: "1000 kg/m3" }, "rho * 0.002 m3"))).toBeCloseTo(2, 12);
  });

  it("both readings valid for the field (L a volume, h a time): refused, naming both values and how to write the first", () => {
    // 600 L/min = 0.01 m³/s (1 L = 0.001 m³); 600 × 2 m³ per 60 s = 20 m³/s
    expect(errorsOf(flowWith({ L: "2 m^3" }, "600 L/min"))).toEqual([
      {
        path: "ports[0].volumeFlow",
        message: '"600 L/min" reads two ways here: 0.01 m³/s as litres per minute, or 20 m³/s as 600 times the parameter L per minute (600*L/min); write 600 lpm for the first',
      },
    ]);
    // 50 m³/h = 0.01389 m³/s (1 h = 3600 s); 50 m³ over h = 2 s is 25 m³/s
    expect(errorsOf(flowWith({ h: "2 s" }, "50 m³/h"))[0].message).toBe(
      '"50 m³/h" reads two ways here: 0.01389 m³/s as m³ per hour, or 25 m³/s as m³ divided by the parameter h (m^3 / h); write 50 m^3/hr for the first',
    );
    expect(errorsOf(flowWith({ h: "2 s" }, "50 m³ / h"))[0].message).toBe(
      '"50 m³ / h" reads two ways here: 25 m³/s as m³ divided by the parameter h, or 0.01389 m³/s as m³ per hour (m^3/h); write (50 m^3) / h for the first',
    );
    // written unmistakably, each reads
    expect(parsed(flowWith({ L: "2 m^3" }, "600 lpm")).ports[0].volumeFlow).toBeCloseTo(0.01, 15);
    expect(parsed(flowWith({ L: "2 m^3" }, "600*L/(60 s)")).ports[0].volumeFlow).toBeCloseTo(20, 12);
    expect(parsed(flowWith({ h: "2 s" }, "50 m^3/hr")).ports[0].volumeFlow).toBeCloseTo(50 / 3600, 15);
    expect(parsed(flowWith({ h: "2 s" }, "(50 m^3) / h")).ports[0].volumeFlow).toBeCloseTo(25, 12);
  });

  it("50 psig right after a number is psi whatever psig is; psig alone is the parameter", () => {
    const names = new Set(["psig"]);
    expect(normaliseExpressionText("50 psig", names)).toBe("50 psi");
    expect(normaliseExpressionText("2*psig", names)).toBe("2*psig");
  });
});
