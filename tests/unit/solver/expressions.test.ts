// Expressions with units: the traps of a general-purpose unit parser, closed.
import { describe, expect, it } from "vitest";
import { parseSketch } from "@/solver";
import { evaluateToNumber, compileExpression, reservedNameReason, normaliseExpressionText } from "@/solver/expressions";
import { box, sketch } from "./helpers";

const withParams = (parameters: Record<string, string | number>, mass: string | number = 0) =>
  sketch({
    parameters,
    bodies: [{ id: "b", outline: box(1, 1), mass }],
    supports: [{ id: "s", body: "b", kind: "fixed", at: [0, 0] }],
    ports: [
      { id: "p1", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, massFlow: "rho * A * V", velocity: "V" },
    ],
    massSources: [{ id: "m1", body: "b", massFlow: "rho * A * V" }],
  });

describe("the traps (stack notes: a scope variable shadows a unit; an unknown unit name silently becomes a unit)", () => {
  it("with parameters rho, A and V, rho*A*V is a mass flow in kg/s", () => {
    const p = parseSketch(withParams({ rho: "998.2 kg/m^3", A: "0.01 m^2", V: "3 m/s" }));
    expect(p.ok).toBe(true);
    if (!p.ok) return;
    expect(p.fields["ports[0].massFlow"]).toEqual({ value: 998.2 * 0.01 * 3 });
    expect(p.sketch.ports[0].massFlow).toBeCloseTo(29.946, 12);
  });

  it("without A and V defined, rho*A*V is an error naming the unknown names, not kg·A·V/m³", () => {
    const p = parseSketch(withParams({ rho: "998.2 kg/m^3" }));
    expect(p.ok).toBe(false);
    if (p.ok) return;
    const e = p.errors.find((x) => x.path === "ports[0].massFlow")!;
    expect(e.message).toMatch(/unknown name "A"/);
    expect(e.message).toMatch(/unknown name "V"/);
  });

  it("a parameter may not take a unit's name, so '2 m' is always two metres", () => {
    const p = parseSketch(sketch({ parameters: { m: "850 kg" }, bodies: [{ id: "b", outline: box(1, 1), mass: "m" }] }));
    expect(p.ok).toBe(false);
    if (p.ok) return;
    expect(p.errors).toContainEqual({
      path: "parameters.m",
      message: '"m" is a unit here, so "2 m" would be ambiguous; name the parameter something else (e.g. m_1)',
    });
    expect(evaluateToNumber("2 m", "length")).toBe(2);
  });

  it("common engineering symbols that mathjs knows as units (A, V, L, h, t, d) are free for parameters", () => {
    for (const name of ["A", "V", "L", "h", "t", "d", "T", "P", "H"]) expect(reservedNameReason(name)).toBeNull();
    const p = parseSketch(
      sketch({
        parameters: { L: "2.5 m", h: "0.8 m", t: "12 mm", d: "50 mm" },
        bodies: [{ id: "b", outline: [[0, 0], ["L", 0], ["L", "h"], [0, "h + t + d"]], mass: 0 }],
      }),
    );
    expect(p.ok).toBe(true);
    if (p.ok) expect(p.sketch.bodies[0].outline[3][1]).toBeCloseTo(0.862, 12);
  });

  it("an unknown name is an error, whatever mathjs would make of it", () => {
    expect(() => compileExpression("2 * hour_count", new Set())).toThrow(/unknown name "hour_count"/);
    expect(() => compileExpression("5 h", new Set())).toThrow(/does not read "h" as a unit/);
    expect(() => compileExpression("foo(3)", new Set())).toThrow(/unknown function "foo"/);
  });

  it("a unit of the wrong dimension is an error naming both", () => {
    expect(() => evaluateToNumber("3 kg", "area")).toThrow("3 kg is a mass (kg), but this field needs an area (m²)");
    expect(() => evaluateToNumber("3", "area")).not.toThrow();
  });
});

describe("units this trade types", () => {
  it.each([
    ["350 psi", "pressure", 350 * 6894.757293168361],
    // a fan's and a duct's pressures, from their definitions (NIST SP 811 Appendix B.8 lists 2.490 889 E+02 Pa for the conventional inch of water,
    // pound-force per square foot 4.788 026 E+01 Pa; millimetre of water, conventional, 9.806 65 Pa — from memory)
    ["-1.5 inH2O", "pressure", -1.5 * 1000 * 9.80665 * 0.0254],
    ["20 psf", "pressure", (20 * 4.4482216152605) / 0.3048 ** 2],
    ["25 mmH2O", "pressure", 25 * 9.80665],
    ["12 kN", "force", 12000],
    ["3 kN m", "moment", 3000],
    ["3 kN·m", "moment", 3000],
    ["100 gpm", "volumeFlow", (100 * 3.785411784e-3) / 60],
    ["600 L/min", "volumeFlow", 0.01],
    ["30°", "angle", 30],
    ["0.5 rad", "angle", (0.5 * 180) / Math.PI],
    ["2 tonne", "mass", 2000],
    ["150 lbm / 1 s", "massFlow", 150 * 0.45359237],
    ["6 in", "length", 0.1524],
    ["20 mm^2", "area", 20e-6],
    ["1.2 kg/m³", "density", 1.2],
    ["5e6 N m", "rotationalStiffness", 5e6],
    ["5e6 N m / rad", "rotationalStiffness", 5e6],
    ["2 kN/mm", "stiffness", 2e6],
  ] as const)("%s → %s", (text, kind, si) => {
    expect(evaluateToNumber(text, kind)).toBeCloseTo(si, 9);
  });

  it("inverse trigonometry returns an angle, so atan(0.5) in an angle field is degrees", () => {
    expect(evaluateToNumber("atan(0.5)", "angle")).toBeCloseTo((Math.atan(0.5) * 180) / Math.PI, 12);
    expect(evaluateToNumber("atan2(3 m, 4 m)", "angle")).toBeCloseTo((Math.atan2(3, 4) * 180) / Math.PI, 12);
  });

  it("sin(30 deg) is 0.5; sin(30) warns and suggests degrees", () => {
    expect(evaluateToNumber("sin(30 deg)", "ratio")).toBeCloseTo(0.5, 15);
    const p = parseSketch(sketch({ parameters: { k: "sin(30)" } }));
    expect(p.warnings).toContainEqual({ code: "TRIG_UNITLESS", message: "parameters.k: sin(30) reads 30 as radians: did you mean 30 deg?", ids: [] });
  });

  it("normalises what people type", () => {
    expect(normaliseExpressionText("2·3 × 4 − 1 m² ")).toBe("2*3 * 4 - 1 m^2");
  });
});

describe("parameters", () => {
  it("may read each other in any order", () => {
    const p = parseSketch(sketch({ parameters: { b: "a * 2", a: "3 m" } }));
    expect(p.ok).toBe(true);
    if (p.ok) expect(p.parameterValues.b).toEqual({ value: 6, unit: "m", si: 6 });
  });
  it("a cycle is an error naming the parameter and the cycle", () => {
    const p = parseSketch(sketch({ parameters: { a: "b + 1", b: "a + 1" } }));
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.errors[0]).toEqual({ path: "parameters.a", message: "depends on itself: a → b → a" });
  });
  it("a parameter reading a broken one names its own problem", () => {
    const p = parseSketch(sketch({ parameters: { a: "2 *", b: "a + 1" }, bodies: [{ id: "x", outline: box(1, 1), mass: "b" }] }));
    expect(p.ok).toBe(false);
    if (!p.ok) {
      expect(p.errors.map((e) => e.path)).toEqual(["parameters.a", "bodies[0].mass"]);
      expect(p.parameterValues.b).toEqual({ error: "could not be evaluated (a parameter it reads failed)" });
    }
  });
});

describe("compiled expressions are kept", () => {
  it("the same text and names give the same compiled expression; other names compile anew", () => {
    const a = compileExpression("rho * A * V", new Set(["rho", "A", "V"]));
    const b = compileExpression("rho * A * V", new Set(["V", "A", "rho"]));
    expect(b).toBe(a);
    expect(() => compileExpression("rho * A * V", new Set(["rho"]))).toThrow(/unknown name "A"/);
    // an error is kept too, and thrown again
    expect(() => compileExpression("2 *", new Set())).toThrow(/cannot read/);
    expect(() => compileExpression("2 *", new Set())).toThrow(/cannot read/);
  });

  it("a parameter in tangled units is shown in the SI unit of its kind", () => {
    const p = parseSketch(sketch({ parameters: { P: "5 bar", rho: "998 kg/m^3", V: "sqrt(2 * P / rho)" } }));
    expect(p.parameterValues.V).toEqual({ value: expect.closeTo(Math.sqrt((2 * 5e5) / 998), 12), unit: "m/s", si: expect.closeTo(Math.sqrt((2 * 5e5) / 998), 12) });
    expect(p.parameterValues.P).toEqual({ value: 5, unit: "bar", si: 500000 });
  });
});
