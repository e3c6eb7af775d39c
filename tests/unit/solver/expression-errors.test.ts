// Expression mistakes get words an engineer understands, naming the field and the part at fault;
// names the parser reads as something else cannot be parameters; L/min; gravity's sign.
import { describe, expect, it } from "vitest";
import { parseSketch } from "@/solver";
import { compileExpression, evaluateToNumber, evaluateTyped, normaliseExpressionText, reservedNameReason } from "@/solver/expressions";
import type { Unit } from "mathjs";
import { box, sketch } from "./helpers";

/** A sketch whose body mass and roller angle are the given fields. */
const withFields = (parameters: Record<string, string | number>, fields: { mass?: string | number; angle?: string | number } = {}) =>
  sketch({
    parameters,
    bodies: [{ id: "b", outline: box(1, 1), mass: fields.mass ?? 10 }],
    supports: [
      { id: "left", body: "b", kind: "pin", at: [0, 0] },
      { id: "right", body: "b", kind: "roller", at: [1, 0], angle: fields.angle ?? 90 },
    ],
  });

const errorsOf = (doc: unknown) => {
  const p = parseSketch(doc);
  if (p.ok) throw new Error("expected errors");
  return p.errors;
};

/** mathjs's own words, which must never reach an engineer */
const MATHJS_WORDS = /Unexpected type|addScalar|subtractScalar|multiplyScalar|typed-function|Too (many|few) arguments|missing in provided namespace|NaN|Units do not match|Cannot (calculate|compare)/;

describe("a failing expression says what is wrong in words, at its field", () => {
  it("a plain-number parameter added to an angle names the parameter and the fix", () => {
    expect(errorsOf(withFields({ theta: "20" }, { angle: "theta + 5 deg" }))).toEqual([
      { path: "supports[1].angle", message: '"theta + 5 deg" adds a plain number to a quantity with units — give theta a unit (20 deg) or drop the unit here' },
    ]);
  });

  it("a decimal comma says to write a point, at its field", () => {
    expect(errorsOf(withFields({}, { mass: "1,5 kg" }))).toEqual([{ path: "bodies[0].mass", message: 'cannot read "1,5 kg": write decimals with a point (1.5, not 1,5)' }]);
    expect(errorsOf(withFields({ mu: "0,55" }))).toEqual([{ path: "parameters.mu", message: 'cannot read "0,55": write decimals with a point (0.55, not 0,55)' }]);
    // a comma between a function's arguments is no decimal comma
    expect(parseSketch(withFields({ r: "max(2, 3) m" })).ok).toBe(true);
    expect(errorsOf(withFields({ r: "max(2,3 m" }))[0].message).not.toContain("decimals");
  });

  it("a plain number added to a mass", () => {
    expect(errorsOf(withFields({}, { mass: "2 kg + 3" }))).toEqual([
      { path: "bodies[0].mass", message: '"2 kg + 3" adds a plain number to a quantity with units — give 3 a unit (3 kg) or drop the unit here' },
    ]);
  });

  it("a subtraction says which way round", () => {
    expect(() => evaluateToNumber("3 - 2 kg", "mass")).toThrow('"3 - 2 kg" subtracts a quantity with units from a plain number — give 3 a unit (3 kg) or drop the unit here');
  });

  it("two units of different kinds cannot be added", () => {
    expect(errorsOf(withFields({}, { mass: "2 kg + 3 m" }))).toEqual([{ path: "bodies[0].mass", message: '"2 kg + 3 m": kg and m cannot be added: units do not match' }]);
  });

  it("asin outside −1…1 has no real value (not 'NaN rad')", () => {
    expect(errorsOf(withFields({}, { angle: "asin(2)" }))).toEqual([
      { path: "supports[1].angle", message: '"asin(2)" has no real value: its argument must be between −1 and 1' },
    ]);
  });

  it("a parameter that has no real value is the parameter's error", () => {
    expect(errorsOf(withFields({ r: "sqrt(-4)" }))).toContainEqual({ path: "parameters.r", message: '"sqrt(-4)" has no real value: its argument must not be negative' });
  });

  it.each([
    ["hypot(3 m, 4)", "length", '"hypot(3 m, 4)": mixes quantities with units and plain numbers: give every argument a unit of the same kind'],
    ["max(2 m, 3)", "length", '"max(2 m, 3)" compares quantities with units and plain numbers — give every argument a unit of the same kind'],
    ["min(1 m, 2 s)", "length", '"min(1 m, 2 s)" compares quantities whose units do not match (m, s)'],
    ["sin(2 m)", "ratio", '"sin(2 m)": sin needs an angle (deg or rad) or a plain number, not m'],
    ["exp(2 m)", "ratio", '"exp(2 m)": exp needs a plain number, not a quantity with units (m)'],
    ["log(1 m)", "ratio", '"log(1 m)": log needs a plain number, not a quantity with units (m)'],
    ["(2 m) ^ (1 m)", "length", '"(2 m) ^ (1 m)": a power must be a plain number, not m'],
    ["2 kg to m", "length", '"2 kg to m": kg cannot be converted to m: units do not match'],
    ["sin(1, 2)", "ratio", '"sin(1, 2)": sin takes 1 argument'],
    ["1 / 0", "ratio", '"1 / 0" divides by zero'],
    ["acos(-3)", "angle", '"acos(-3)" has no real value: its argument must be between −1 and 1'],
    ["(-8) ^ (1/3)", "ratio", '"(-8) ^ (1 / 3)" has no real value: a negative number to a fractional power has none'],
  ] as const)("%s", (text, kind, message) => {
    expect(() => evaluateToNumber(text, kind)).toThrow(message);
  });

  it("an error inside a larger expression names the part at fault", () => {
    expect(() => evaluateToNumber("2 * (3 m + 4)", "length")).toThrow('"3 m + 4" adds a plain number to a quantity with units — give 4 a unit (4 m) or drop the unit here');
  });

  it("none of mathjs's own words get through", () => {
    const texts = ["theta + 5 deg", "2 kg + 3", "hypot(3 m, 4)", "asin(2)", "2 kg + 3 m", "max(2 m, 3)", "min(1 m, 2 s)", "round(2 m)", "log(1 m)", "sin(1, 2)", "atan2(1 m, 1 s)", "2 mod 3", "sqrt(-1)"];
    const scope = new Map([["theta", 20]]);
    for (const text of texts) {
      let message = "";
      try {
        evaluateToNumber(text, "length", scope);
      } catch (err) {
        message = (err as Error).message;
      }
      expect(message, text).not.toBe("");
      expect(message, text).not.toMatch(MATHJS_WORDS);
    }
  });
});

describe("hypot takes quantities of one kind", () => {
  it("hypot(3 m, 4 m) is 5 m (Pythagoras, common practice)", () => {
    expect(evaluateToNumber("hypot(3 m, 4 m)", "length")).toBeCloseTo(5, 12);
  });
  it("hypot(3 ft, 4 ft) is 5 ft = 1.524 m (1 ft = 0.3048 m exactly, NIST SP 811)", () => {
    expect(evaluateToNumber("hypot(3 ft, 4 ft)", "length")).toBeCloseTo(1.524, 12);
  });
  it("plain numbers as before", () => {
    expect(evaluateToNumber("hypot(5, 12)", "ratio")).toBe(13);
  });
});

describe("an expression holds plain arithmetic only", () => {
  it.each([
    ["2 mod 3", /the operator "mod" is not available here/],
    ["a < 2", /the operator "<" is not available here/],
    ["a = 3", /assigns a value/],
    ["[1, 2]", /is not arithmetic/],
    ["a ? 1 : 2", /is not arithmetic/],
    ["true", /"true" is not a number/],
    ["Infinity", /"Infinity" is not a finite number/],
  ])("%s is refused when it is read", (text, message) => {
    expect(() => compileExpression(text, new Set(["a"]))).toThrow(message);
  });

  it("an assignment cannot change a parameter that later fields read", () => {
    const p = parseSketch(withFields({ w: "10 kg" }, { mass: "w", angle: "w = 5" }));
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.errors.map((e) => e.path)).toEqual(["supports[1].angle"]);
    expect(p.fields["bodies[0].mass"]).toEqual({ value: 10 });
  });
});

describe("names the parser reads as something else cannot be parameters", () => {
  it("with { true: '5 kg' }, the parameter is refused instead of '2 * true' silently being 2", () => {
    const errors = errorsOf(withFields({ true: "5 kg" }, { mass: "2 * true" }));
    expect(errors).toContainEqual({
      path: "parameters.true",
      message: '"true" is a fixed word in expressions (it always means true), so the parameter could never be read; name it something else',
    });
    expect(errors).toContainEqual({ path: "bodies[0].mass", message: '"true" is not a number' });
  });

  it.each(["true", "false", "null", "undefined", "NaN", "Infinity"])("keyword %s", (name) => {
    expect(reservedNameReason(name)).toMatch(/is a fixed word in expressions/);
  });

  it.each(["mod", "to", "and", "or", "not", "xor"])("operator word %s", (name) => {
    expect(reservedNameReason(name)).toMatch(/is an operator word in expressions/);
  });

  it("in stays refused as a unit (inches)", () => {
    expect(reservedNameReason("in")).toMatch(/"in" is a unit here/);
  });

  it.each(["pi", "e", "PI", "LN2", "LN10", "LOG2E", "LOG10E", "SQRT1_2", "SQRT2"])("constant %s", (name) => {
    expect(reservedNameReason(name)).toMatch(/is a mathematical constant/);
  });

  it("E, i, phi and tau stay free, and the parameter is what is read", () => {
    for (const name of ["E", "i", "phi", "tau"]) expect(reservedNameReason(name)).toBeNull();
    const p = parseSketch(withFields({ E: "2 kg", i: "3", phi: "30 deg", tau: "4" }, { mass: "E * i * tau", angle: "phi + 60 deg" }));
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    expect(p.fields["bodies[0].mass"]).toEqual({ value: 24 });
    expect(p.fields["supports[1].angle"]).toEqual({ value: expect.closeTo(90, 12) });
  });
});

describe("L/min is litres per minute only when it can be nothing else", () => {
  it("600 L/min is 0.01 m³/s (1 L = 0.001 m³, common practice)", () => {
    expect(evaluateToNumber("600 L/min", "volumeFlow")).toBeCloseTo(0.01, 15);
    expect(evaluateToNumber("600 l / min", "volumeFlow")).toBeCloseTo(0.01, 15);
  });

  it("L / min(a, b) with a parameter L is L divided by the smaller of a and b", () => {
    expect(normaliseExpressionText("L/min(a, b)")).toBe("L/min(a, b)");
    const p = parseSketch(withFields({ L: "6 kg", a: 2, b: 3 }, { mass: "L/min(a, b)" }));
    expect(p.ok).toBe(true);
    if (p.ok) expect(p.fields["bodies[0].mass"]).toEqual({ value: 3 });
  });

  it("with a parameter called L, 'L/min' right after a number is still litres per minute; elsewhere L is the parameter, and the error says why", () => {
    expect(normaliseExpressionText("600 L/min", new Set(["L"]))).toBe("600 lpm");
    expect(normaliseExpressionText("600L/min", new Set(["L"]))).toBe("600lpm");
    expect(normaliseExpressionText("600 L/min", new Set(["a"]))).toBe("600 lpm");
    expect(normaliseExpressionText("2*L/min", new Set(["L"]))).toBe("2*L/min");
    expect(() => compileExpression("2*L/min", new Set(["L"]))).toThrow(
      '"L/min" reads the parameter L divided by min here, not litres per minute: litres per minute are L/min right after a number (600 L/min), or lpm',
    );
  });
});

describe("litres per second, as the app writes flows", () => {
  // 1 L = 0.001 m³ exactly (SI Brochure, 9th ed., Table 8: the litre)
  it("40 L/s, 40 l/s and 40 lps are 0.04 m³/s; 600 L/min is 0.01 m³/s", () => {
    for (const text of ["40 L/s", "40 l/s", "40 lps", "40 L / s"]) expect((evaluateTyped(text) as Unit).toNumber("m^3/s")).toBeCloseTo(0.04, 12);
    expect((evaluateTyped("600 L/min") as Unit).toNumber("m^3/s")).toBeCloseTo(0.01, 12);
  });

  it("with a parameter called L, 'L/s' right after a number is litres per second; elsewhere L divided by seconds", () => {
    expect(normaliseExpressionText("40 L/s", new Set(["L"]))).toBe("40 lps");
    expect(normaliseExpressionText("rho*L/s", new Set(["L", "rho"]))).toBe("rho*L/s");
    expect(normaliseExpressionText("40 L/s", new Set(["a"]))).toBe("40 lps");
    // a power of a second is not a flow
    expect(normaliseExpressionText("L/s^2", new Set())).toBe("L/s^2");
  });
});

describe("TRIG_UNITLESS names the element whose field it is", () => {
  it("a field's warning carries the element id and the field path", () => {
    const p = parseSketch(withFields({}, { angle: "90 + 0 * sin(30)" }));
    expect(p.warnings).toContainEqual({ code: "TRIG_UNITLESS", message: "supports[1].angle: sin(30) reads 30 as radians: did you mean 30 deg?", ids: ["right"] });
  });

  it("a parameter's warning names the elements that read it, directly or through another parameter", () => {
    const p = parseSketch(withFields({ k: "sin(30)", k2: "k + 1" }, { mass: "10 kg * k2 / k2", angle: "90" }));
    expect(p.warnings).toContainEqual({ code: "TRIG_UNITLESS", message: "parameters.k: sin(30) reads 30 as radians: did you mean 30 deg?", ids: ["b"] });
  });
});

describe("gravity acts in −y", () => {
  it.each([-9.81, "-9.81 m/s^2", "-1 * g0"])("a negative gravity (%s) is refused", (gravity) => {
    const doc = { ...withFields(gravity === "-1 * g0" ? { g0: "9.80665 m/s^2" } : {}), gravity };
    expect(errorsOf(doc)).toEqual([
      { path: "gravity", message: "must not be negative: to have gravity act another way, give its direction (gravityAngle, −90° by default); 0 turns weights off" },
    ]);
  });

  it("zero turns weights off and is accepted", () => {
    const p = parseSketch({ ...withFields({}), gravity: 0 });
    expect(p.ok).toBe(true);
    if (p.ok) expect(p.sketch.gravity).toBe(0);
  });
});
