// The editor's examples (canvas/examples, also the demo workspace's sketches) solved by hand: every
// reaction from the control-volume momentum equations, ΣF = Σ(ṁV)out − Σ(ṁV)in and
// ΣM = Σ r × ṁV out − in (any fluid mechanics text), with the port's pressure p·A pushing into the
// control volume, the weight m·g at the centre of gravity, and for the indeterminate ones the
// elastic method for a rigid cap on equal springs, R_i = P/n + M·x_i/Σx² (foundation and
// steel design handbooks, the AISC manual's elastic method for bolt groups in its in-plane form).
// Unit factors: NIST SP 811 (US gal = 3.785411784 L, in = 0.0254 m); g0 = 9.80665 m/s² (CGPM).
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { parseSketch, solve, type SolveResult } from "@/solver";

const g = 9.80665;

function solved(id: string): SolveResult {
  const p = parseSketch(exampleById(id)!.sketch);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return solve(p.sketch);
}

/** relative agreement to 1e-6 of the larger of the two (the hand numbers carry no rounding) */
const near = (got: number | undefined, want: number, scale = Math.abs(want)) => expect(Math.abs((got ?? NaN) - want)).toBeLessThanOrEqual(1e-6 * Math.max(scale, 1));

describe("the examples, reaction by reaction by hand", () => {
  it("pump skid: suction −0.4 bar at the rear, discharge 2.5 bar up, two bearers sharing x equally", () => {
    const rho = 998;
    const Q = 1800 / 60000; // 1800 L/min in m³/s
    const mdot = rho * Q;
    const A1 = (Math.PI / 4) * 0.1 ** 2;
    const A2 = (Math.PI / 4) * 0.08 ** 2;
    const [V1, V2] = [Q / A1, Q / A2];
    const W = 850 * g;
    // inlet at (0, 0.3) flowing +x: p·A along the flow = −40 kPa × A1 (a pull toward −x); −ṁV1 in x
    const Fsuction = -40000 * A1;
    // outlet at (1.95, 1.6) flowing +y: p·A against the flow, down
    const Fdischarge = -250000 * A2;
    const Rx = -mdot * V1 - Fsuction; // ΣRx = (ṁV)out,x − (ṁV)in,x − ΣFx(loads)
    const Ry = mdot * V2 + W - Fdischarge;
    // moments about the rear bearer (0.3, 0): front·2.0 + M(loads) = M(flux)
    const Mloads = -W * (1.35 - 0.3) - 0.3 * Fsuction + (1.95 - 0.3) * Fdischarge;
    const Mflux = (1.95 - 0.3) * mdot * V2 - (0 - 0.3 * mdot * V1);
    const front = (Mflux - Mloads) / 2.0;
    const r = solved("pump-skid");
    near(r.reactions.front.fy, front, Ry);
    near(r.reactions.rear.fy, Ry - front, Ry);
    // the tangential springs share Rx equally (equal stiffness, both on y = 0)
    near(r.reactions.rear.fx, Rx / 2, Ry);
    near(r.reactions.front.fx, Rx / 2, Ry);
    expect(front).toBeCloseTo(5530.39, 1);
    expect(Ry - front).toBeCloseTo(4240.59, 1);
    expect(Rx / 2).toBeCloseTo(99.90, 2);
  });

  it("pipe bend: 10 bar in, the riser's pressure less the rise and the bend's loss out, one anchor", () => {
    const rho = 998;
    const A = (Math.PI / 4) * 0.15 ** 2;
    const Q = 2700 / 60000;
    const V = Q / A;
    const mdot = rho * Q;
    const pIn = 1e6;
    const pOut = pIn - rho * 9.81 * 0.45 - (0.25 * rho * V ** 2) / 2;
    const W = 92 * g;
    // the L-shaped outline's area centroid: (−0.108, 0.108)
    const cg = [-0.108, 0.108];
    const Rx = -mdot * V - pIn * A;
    const Ry = mdot * V + W + pOut * A;
    // about the anchor (0.09, 0): the inlet's force and flux lie on y = 0; the outlet at (0, 0.45)
    const Mflux = (0 - 0.09) * mdot * V; // x·Fy of the outflow (0, ṁV) at r = (−0.09, 0.45)
    const Mloads = (cg[0] - 0.09) * -W + (0 - 0.09) * -(pOut * A);
    const M = Mflux - Mloads;
    const r = solved("pipe-bend-anchor");
    near(r.reactions.anchor.fx, Rx);
    near(r.reactions.anchor.fy, Ry);
    near(r.reactions.anchor.m, M, Ry);
    expect(Rx).toBeCloseTo(-17785.8, 1);
    expect(Ry).toBeCloseTo(18595.9, 1);
    expect(M).toBeCloseTo(-1771.07, 2);
  });

  it("fire monitor trailer: the jet's 4.0 kN at 32° from 2.4 m over three contacts (elastic method)", () => {
    const rho = 998;
    const Q = (1250 * 3.785411784) / 1000 / 60;
    const A = (Math.PI / 4) * (1.75 * 0.0254) ** 2;
    const F = (rho * Q * Q) / A; // ṁV
    const th = (32 * Math.PI) / 180;
    const [Fx, Fy] = [F * Math.cos(th), F * Math.sin(th)];
    const W = 950 * g;
    const xs = [0, 1.7, 3.8];
    const xc = (xs[0] + xs[1] + xs[2]) / 3;
    const d = xs.map((x) => x - xc);
    const sumD2 = d.reduce((a, x) => a + x * x, 0);
    const P = W + Fy; // what the three normals carry together
    // the moment the normals must give about (xc, 0.35): the flux's moment less the weight's
    const Mflux = (1.05 - xc) * Fy - (2.4 - 0.35) * Fx;
    const Mweight = -(1.75 - xc) * W;
    const M = Mflux - Mweight;
    const n = d.map((x) => P / 3 + (M * x) / sumD2);
    const r = solved("fire-monitor-trailer");
    near(r.reactions.foot.n, n[0], P);
    near(r.reactions.axle.n, n[1], P);
    near(r.reactions.jack.n, n[2], P);
    // the foot and the axle, with friction, share Fx equally; the jack has none
    near(r.reactions.foot.fx, Fx / 2, P);
    near(r.reactions.axle.fx, Fx / 2, P);
    expect(F).toBeCloseTo(3999.9, 0);
    expect(n.map((x) => Math.round(x))).toEqual([6188, 3985, 1264]);
  });

  it("washing cart: a 500 bar jet at −75° from the lance, braked rear wheels and a free caster (determinate)", () => {
    const rho = 998;
    const Q = 40 / 60000;
    const V = 0.96 * Math.sqrt((2 * 500e5) / rho);
    const F = rho * Q * V;
    const th = (-75 * Math.PI) / 180;
    const [Fx, Fy] = [F * Math.cos(th), F * Math.sin(th)];
    const W = 85 * g;
    // about the rear wheels (0.06, 0.12): caster·0.52 − W·0.22 = r × ṁV with r = (0.44, 1.03)
    const caster = (0.44 * Fy - 1.03 * Fx + W * 0.22) / 0.52;
    const r = solved("washing-cart");
    near(r.reactions.front.n, caster, W);
    near(r.reactions.rear.n, W + Fy - caster, W);
    near(r.reactions.rear.fx, Fx, W);
    expect(caster).toBeCloseTo(83.76, 2);
    expect(W + Fy - caster).toBeCloseTo(554.51, 2);
  });

  it("exhaust stack: wind 236.25 N/m on 8 m, the duct's 2 kPa and flux against it, two edges", () => {
    const w = 0.5 * 1.25 * 30 ** 2 * 0.6 * 0.7;
    const Wind = w * 8; // at mid-height y = 4.7
    const A1 = (Math.PI / 4) * 0.5 ** 2;
    const A2 = (Math.PI / 4) * 0.6 ** 2;
    const mdot = 4.2;
    const [V1, V2] = [mdot / (0.6 * A1), mdot / (0.6 * A2)];
    const Fduct = -2000 * A1; // an inlet flowing −x at (1.8, 1.6): p·A along the flow
    const W = 900 * g;
    // the inflow's velocity is −x: Σ(ṁV)out,x − Σ(ṁV)in,x = 0 − (−ṁV1) = +ṁV1
    const Rx = mdot * V1 - (Wind + Fduct);
    const Ry = mdot * V2 + W;
    // about the upwind edge (0.1, 0): downwind·2.8 + M(loads) = M(flux); the outflow (0, ṁV2) at
    // r = (1.4, 8.7) gives 1.4·ṁV2, the inflow (−ṁV1, 0) at r = (1.7, 1.6) gives +1.6·ṁV1, taken away
    const Mloads = -1.4 * W - 4.7 * Wind - 1.6 * Fduct;
    const Mflux = 1.4 * mdot * V2 - 1.6 * mdot * V1;
    const down = (Mflux - Mloads) / 2.8;
    const r = solved("exhaust-stack");
    near(r.reactions.downwind.n, down, Ry);
    near(r.reactions.upwind.n, Ry - down, Ry);
    near(r.reactions.upwind.fx, Rx / 2, Ry);
    expect(down).toBeCloseTo(7327.52, 1);
    expect(Rx / 2).toBeCloseTo(-673.78, 1);
    // factor against overturning about the downwind edge as drawn: restoring W·1.4 + duct p·A·1.6
    // + inflow ṁV1·1.6 + outflow ṁV2·1.4 over the wind's 1890 N × 4.7 m (common practice)
    expect(((1.4 * W - 1.6 * Fduct + 1.6 * mdot * V1 + 1.4 * mdot * V2) / (4.7 * Wind)).toFixed(3)).toBe("1.505");
  });
});
