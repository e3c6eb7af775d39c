// The momentum-flux correction factor β of a port: the momentum a non-uniform velocity profile
// carries is β·ṁ·V with V the mean velocity, β = (1/A)∫(u/V)² dA ≥ 1.
// Source for the values: Çengel & Cimbala, Fluid Mechanics: Fundamentals and Applications, the
// section on the momentum-flux correction factor — β = 4/3 for fully developed laminar pipe flow,
// about 1.02 for turbulent pipe flow with a one-seventh power-law profile (from memory). Both are
// derived again below by integrating the profiles, so the check does not rest on memory alone.
import { describe, expect, it } from "vitest";
import { handCheckTable } from "@/solver/report";
import { FLOW_FACTOR, parseSketch, solveSweep } from "@/solver";
import { box, expectRel, parsed, sketch, solved } from "./helpers";

/** β of an axisymmetric profile u(r/R), by Simpson's rule on ∫ u² 2πr dr / (A·V²), V = ∫ u 2πr dr / A. */
function betaOfProfile(u: (s: number) => number, n = 20000): number {
  const simpson = (f: (s: number) => number) => {
    const h = 1 / n;
    let t = f(0) + f(1);
    for (let i = 1; i < n; i++) t += (i % 2 ? 4 : 2) * f(i * h);
    return (t * h) / 3;
  };
  const mean = 2 * simpson((s) => u(s) * s); // (1/πR²)∫u·2πr dr with s = r/R
  const meanSquare = 2 * simpson((s) => u(s) ** 2 * s);
  return meanSquare / mean ** 2;
}

describe("β of a velocity profile (derived, against the textbook values)", () => {
  it("laminar, fully developed: u = 2V(1 − r²/R²) gives β = 4/3", () => {
    expectRel(betaOfProfile((s) => 1 - s * s), 4 / 3, 1e-9);
  });
  it("turbulent, one-seventh power law: u = Umax(1 − r/R)^(1/7) gives β ≈ 1.02", () => {
    const b = betaOfProfile((s) => Math.pow(Math.max(1 - s, 0), 1 / 7));
    expect(b).toBeGreaterThan(1.015);
    expect(b).toBeLessThan(1.025);
  });
  it("uniform flow: β = 1", () => {
    expectRel(betaOfProfile(() => 1), 1, 1e-12);
  });
});

// A nozzle on a stiff post: fixed support at the origin, an outlet jet at height h pointing +x.
// Linear momentum: R_x = β·ṁ·V (the support pushes the body forward; the jet's reaction is aft).
// Moment of momentum about the support: M = r × (β·ṁ·V) = −h·β·ṁ·V (clockwise).
const mdot = 4.2; // kg/s
const V = 28; // m/s
const h = 1.6; // m
const post = (beta?: number | string, kind: "outlet" | "inlet" = "outlet") =>
  sketch({
    gravity: 0,
    bodies: [{ id: "post", outline: box(0.3, 1.8, -0.15, 0), mass: 0 }],
    supports: [{ id: "base", body: "post", kind: "fixed", at: [0, 0] }],
    ports: [{ id: "jet", body: "post", kind, at: [0.15, h], angle: 0, massFlow: mdot, velocity: V, ...(beta === undefined ? {} : { beta }) }],
  });

describe("β in the momentum and moment-of-momentum equations", () => {
  it("an outlet's reaction and moment are β·ṁ·V and −h·β·ṁ·V", () => {
    for (const beta of [1, 1.02, 4 / 3]) {
      const r = solved(post(beta)).reactions.base;
      expectRel(r.fx, beta * mdot * V, 1e-9);
      expect(Math.abs(r.fy)).toBeLessThan(1e-9);
      expectRel(r.m, -h * beta * mdot * V, 1e-9);
    }
  });

  it("an inlet's too: the flux in carries β the same way (sign reversed)", () => {
    const r = solved(post(4 / 3, "inlet")).reactions.base;
    expectRel(r.fx, -(4 / 3) * mdot * V, 1e-9);
    expectRel(r.m, h * (4 / 3) * mdot * V, 1e-9);
  });

  it("absent β is 1: the result is identical to β = 1 written out", () => {
    expect(JSON.stringify(solved(post()).reactions)).toBe(JSON.stringify(solved(post(1)).reactions));
  });

  it("takes an expression (a ratio): 4/3 and a parameter", () => {
    expectRel(solved(post("4/3")).reactions.base.fx, (4 / 3) * mdot * V, 1e-12);
    const withParam = { ...post("b_lam"), parameters: { b_lam: "4/3" } };
    expectRel(solved(withParam).reactions.base.fx, (4 / 3) * mdot * V, 1e-12);
  });

  it("the flow factor f scales β·ṁ·V by f² (ṁ and V both × f)", () => {
    const sweep = solveSweep(parsed(post(1.05)), FLOW_FACTOR, [1, 1.5]);
    const fx = sweep.points.map((pt) => (pt.ok ? pt.result.reactions.base.fx : Number.NaN));
    expectRel(fx[0], 1.05 * mdot * V, 1e-12);
    expectRel(fx[1], 1.05 * 1.5 ** 2 * mdot * V, 1e-12);
  });

  it("the hand check names β in the port's term", () => {
    const r = solved(post(1.02));
    const t = handCheckTable(r, "post", [0, 0], "SI");
    const labels = t.rows.map((row) => String(row[1]));
    expect(labels.some((l) => /momentum out at jet \(β = 1\.02\)/.test(l))).toBe(true);
  });
});

describe("β outside 1 to 2 is refused, naming the field", () => {
  it.each([
    [0.9, /must be from 1 to 2/],
    [2.5, /must be from 1 to 2/],
    ["2 m", /plain number/],
  ])("β = %s", (beta, message) => {
    const p = parseSketch(post(beta as number | string));
    expect(p.ok).toBe(false);
    if (p.ok) return;
    const e = p.errors.find((x) => x.path === "ports[0].beta");
    expect(e, JSON.stringify(p.errors)).toBeDefined();
    expect(e!.message).toMatch(message);
  });
});
