// Six of the demo sketches (invented demo scenarios, db/seed-sketches.ts; the roof fan, a7, has its own hand calculation in roof-fan-example.test.ts), each reaction re-derived by
// hand from the control-volume equations, as a checker does before signing a calc off:
//
//   linear momentum     ΣF(reactions) + ΣF(loads) + W + ΣF(pressure) = Σ_out ṁ·V − Σ_in ṁ·V
//   moment of momentum  ΣM_P(same forces)                             = Σ_out r × ṁ·V − Σ_in r × ṁ·V
//
// with gauge-pressure forces p·A pushing inward on the control surface (along the flow at an inlet,
// against it at an outlet), r × F = x·Fy − y·Fx about the point P named in each block, and moments
// positive counter-clockwise (the control-volume momentum equations, any fluid mechanics text).
// Units as NIST SP 811 defines them: g0 = 9.80665 m/s², 1 bar = 1e5 Pa, 1 L/min = 1/60 000 m³/s,
// 1 US gal = 3.785411784 L, 1 in = 0.0254 m.
//
// Every figure below is worked from the drawing's own numbers, never read from the solver; each
// reaction is then held to the solver's (relative 1e-9) and stated to 4 significant figures.
import { describe, expect, it } from "vitest";
import { DEMO_SKETCHES, demoVersions } from "@/db/seed-sketches";
import { parseSketch, solve, solveCases, type SolveResult } from "@/solver";
import { limitEverywhere } from "@/solver/studySweep";

const g = 9.80665;
const bar = 1e5;
const lpm = 1e-3 / 60;
const gpm = 3.785411784e-3 / 60;
const inch = 0.0254;
const deg = Math.PI / 180;
type V2 = [number, number];
/** r × F about P, the 2-D cross product x·Fy − y·Fx of (r − P) and F. */
const moment = (r: V2, F: V2, P: V2): number => (r[0] - P[0]) * F[1] - (r[1] - P[1]) * F[0];
const along = (size: number, angleDeg: number): V2 => [size * Math.cos(angleDeg * deg), size * Math.sin(angleDeg * deg)];
const circle = (d: number) => (Math.PI / 4) * d * d;

/** The demo's version (1-based) as seeded, solved as `npm run solve` solves it. */
function solvedDemo(id: string, version: number): SolveResult {
  const demo = DEMO_SKETCHES.find((s) => s.id.endsWith(id))!;
  const doc = demoVersions(demo)[version - 1].doc;
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return solve(p.sketch);
}

/** The hand value to 4 significant figures, and the solver's equal to it within 1e-9 relative. */
function agree(solver: number | undefined, hand: number, fourFigures: string) {
  expect(hand.toPrecision(4), `hand value ${hand}`).toBe(fourFigures);
  expect(solver, "solver value").toBeDefined();
  expect(Math.abs(solver! - hand), `solver ${solver} vs hand ${hand}`).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(hand)));
}

describe("a1 pump skid on two timber bearers (μ = 0.4)", () => {
  // v1: 1800 L/min, rear bearer at x = 0.3 m; v2: 3600 L/min; v3: the rear bearer moved to x = 0.6 m
  const worked = (lpmFlow: number, xRear: number) => {
    const rho = 998;
    const Q = lpmFlow * lpm;
    const mdot = rho * Q;
    const As = circle(0.1); // suction, 100 mm bore: 7.854e-3 m²
    const Ad = circle(0.08); // discharge, 80 mm bore: 5.027e-3 m²
    const Vs = Q / As; // into the skid along +x at (0, 0.3)
    const Vd = Q / Ad; // out of it along +y at (1.95, 1.6)
    // momentum flux out − in: (0, ṁVd) − (ṁVs, 0)
    const flux: V2 = [-mdot * Vs, mdot * Vd];
    // pressure forces, inward: suction −0.4 bar along the flow (+x) → −314.2 N in x;
    // discharge 2.5 bar against the flow (−y) → −1257 N in y
    const Ps: V2 = [-0.4 * bar * As, 0];
    const Pd: V2 = [0, -2.5 * bar * Ad];
    const W: V2 = [0, -850 * g]; // at the drawn cg (1.35, 0.55)
    // ΣFx: t_rear + t_front + Ps = flux_x; both bearers lie on y = 0 with equal stiffness, so a
    // rigid skid moves them alike: each takes half (a statically indeterminate share, degree 1)
    const Rx = flux[0] - Ps[0];
    // ΣFy: N_rear + N_front + W + Pd = flux_y
    const Ry = flux[1] - W[1] - Pd[1];
    // ΣM about the rear bearer: (2.3 − x_rear)·N_front + M(W) + M(Ps) + M(Pd) = M(flux)
    const P: V2 = [xRear, 0];
    const mFlux = moment([1.95, 1.6], [0, mdot * Vd], P) - moment([0, 0.3], [mdot * Vs, 0], P);
    const mLoads = moment([1.35, 0.55], W, P) + moment([0, 0.3], Ps, P) + moment([1.95, 1.6], Pd, P);
    const Nfront = (mFlux - mLoads) / (2.3 - xRear);
    return { flux, t: Rx / 2, Nfront, Nrear: Ry - Nfront };
  };

  it.each([
    // version, flow, rear x, then the hand figures: flux x, flux y, t, N_rear, N_front
    [1, 1800, 0.3, "-114.4", "178.7", "99.90", "4241", "5530"],
    [2, 3600, 0.3, "-457.4", "714.8", "-71.65", "4283", "6024"],
    [3, 3600, 0.6, "-457.4", "714.8", "-71.65", "5039", "5268"],
  ] as const)("v%i (%i L/min, rear bearer at x = %f m): bearer loads from ΣFy and ΣM, the friction shared equally", (v, flow, xRear, fx, fy, t, nRear, nFront) => {
    const r = solvedDemo("a1", v);
    const h = worked(flow, xRear);
    agree(r.bodies.skid.momentum.fx, h.flux[0], fx);
    agree(r.bodies.skid.momentum.fy, h.flux[1], fy);
    agree(r.reactions.rear.fx, h.t, t);
    agree(r.reactions.front.fx, h.t, t);
    agree(r.reactions.rear.n, h.Nrear, nRear);
    agree(r.reactions.front.n, h.Nfront, nFront);
    // friction needed, |t|/n, against μ = 0.4
    agree(r.reactions.rear.friction?.needed, Math.abs(h.t) / h.Nrear, (Math.abs(h.t) / h.Nrear).toPrecision(4));
    expect(r.bodies.skid.status).toBe("holds");
  });

  it("v3: the friction each bearer needs, 0.01422 and 0.01360 of its μ = 0.4", () => {
    const r = solvedDemo("a1", 3);
    const h = worked(3600, 0.6);
    agree(r.reactions.rear.friction?.needed, Math.abs(h.t) / h.Nrear, "0.01422");
    agree(r.reactions.front.friction?.needed, Math.abs(h.t) / h.Nfront, "0.01360");
  });
});

describe("a2 monitor trailer on foot, axle and jack (2000 gpm, 1¾ in tip at 32°)", () => {
  const rho = 998;
  const Q = 2000 * gpm; // 0.1262 m³/s
  const mdot = rho * Q; // 125.9 kg/s, fed by the supply hose as a mass source (no momentum of its own)
  const V = Q / circle(1.75 * inch); // 81.31 m/s
  const flux = along(mdot * V, 32); // out at the tip (1.05, 2.4); nothing flows in through a port
  const xs = [0, 1.7, 3.8]; // foot, axle, jack, all on y = 0.35, pushing up

  it("v3 (1250 kg with ballast): the elastic method for three equal springs, friction on foot and axle", () => {
    const r = solvedDemo("a2", 3);
    agree(r.bodies.trailer.momentum.fx, flux[0], "8684");
    agree(r.bodies.trailer.momentum.fy, flux[1], "5426");
    const W = 1250 * g;
    // ΣFx: t_foot + t_axle = flux_x; the two friction contacts are equal springs on one line: half each
    agree(r.reactions.foot.fx, flux[0] / 2, "4342");
    agree(r.reactions.axle.fx, flux[0] / 2, "4342");
    expect(r.reactions.jack.fx).toBe(0);
    // ΣFy: ΣN = W + flux_y. Three equal vertical springs under a rigid body (degree 2 overall): the
    // elastic method of a rigid cap on a row of equal supports, N_i = ΣN/3 + M·(x_i − x̄)/Σ(x_i − x̄)²,
    // with M the moment the springs must give about x̄ = 1.833 m on their line (foundation and
    // steel design handbooks, the elastic method for pile and bolt groups)
    const N = W + flux[1];
    const xbar = (xs[0] + xs[1] + xs[2]) / 3;
    const P: V2 = [xbar, 0.35];
    // ΣM about P: Σ N_i (x_i − x̄) + M(W at (2.1, 0.85)) = M(flux at the tip); the tangential forces act on y = 0.35
    const M = moment([1.05, 2.4], flux, P) - moment([2.1, 0.85], [0, -W], P);
    const S = xs.reduce((s, x) => s + (x - xbar) ** 2, 0);
    const n = xs.map((x) => N / 3 + (M * (x - xbar)) / S);
    agree(r.reactions.foot.n, n[0], "1.065e+4");
    agree(r.reactions.axle.n, n[1], "6240");
    agree(r.reactions.jack.n, n[2], "797.3");
    // the axle needs |t|/n = 4342/6240 = 0.6958 > μ = 0.55: SLIP; the whole body 8684/(10650 + 6240) = 0.5142 ≤ 0.55
    agree(r.reactions.axle.friction?.needed, flux[0] / 2 / n[1], "0.6958");
    agree(r.bodies.trailer.friction?.needed, flux[0] / (n[0] + n[1]), "0.5142");
    expect(r.bodies.trailer.status).toBe("holds");
    expect(r.warnings.filter((w) => w.code === "SLIP").map((w) => w.ids)).toEqual([["axle"]]);
  });

  it("v1 (950 kg at 1250 gpm): all three bear, by the same elastic method", () => {
    const r = solvedDemo("a2", 1);
    const Q1 = 1250 * gpm;
    const f1 = along(rho * Q1 * (Q1 / circle(1.75 * inch)), 32); // ṁV = 4000 N at 32°
    const W = 950 * g;
    const xbar = (xs[0] + xs[1] + xs[2]) / 3;
    const P: V2 = [xbar, 0.35];
    const M = moment([1.05, 2.4], f1, P) - moment([1.75, 0.85], [0, -W], P);
    const S = xs.reduce((s, x) => s + (x - xbar) ** 2, 0);
    const n = xs.map((x) => (W + f1[1]) / 3 + (M * (x - xbar)) / S);
    agree(r.bodies.trailer.momentum.fx, f1[0], "3392");
    agree(r.reactions.foot.fx, f1[0] / 2, "1696");
    agree(r.reactions.foot.n, n[0], "6188");
    agree(r.reactions.axle.n, n[1], "3985");
    agree(r.reactions.jack.n, n[2], "1264");
    expect(r.bodies.trailer.status).toBe("holds");
  });

  it("v2 (950 kg): the jack lifts; foot and axle carry it, statically determinate", () => {
    const r = solvedDemo("a2", 2);
    const W = 950 * g;
    // with the jack released: ΣM about the foot (0, 0.35): 1.7·N_axle + M(W at (1.75, 0.85)) = M(flux)
    const P: V2 = [0, 0.35];
    const Naxle = (moment([1.05, 2.4], flux, P) - moment([1.75, 0.85], [0, -W], P)) / 1.7;
    const Nfoot = W + flux[1] - Naxle;
    agree(r.reactions.axle.n, Naxle, "2470");
    agree(r.reactions.foot.n, Nfoot, "1.227e+4");
    expect(r.reactions.jack.state).toBe("lifted");
    expect(r.reactions.jack.n).toBe(0);
    expect(r.bodies.trailer.status).toBe("lifts");
    // the wheels would need 4342/2470 = 1.758, the body as a whole 8684/(12270 + 2470) = 0.5890
    agree(r.reactions.axle.friction?.needed, flux[0] / 2 / Naxle, "1.758");
    agree(r.bodies.trailer.friction?.needed, flux[0] / (Nfoot + Naxle), "0.5890");
    // both over μ = 0.55: the axle on its own, and the trailer as a whole (ids [body])
    expect(r.warnings.filter((w) => w.code === "SLIP").map((w) => w.ids)).toEqual([["axle"], ["trailer"]]);
    expect(r.warnings.filter((w) => w.code === "LIFTOFF").map((w) => w.ids)).toEqual([["jack"]]);
  });
});

describe("a3 jet thrust stand: pin at the front edge, rear pad (T = 2.2 kN at 300 m/s)", () => {
  const T = 2200;
  const W = 200 * g;

  it("v1 (jet at 1.5 m) tips about the front pin: the rear pad would have to pull", () => {
    const r = solvedDemo("a3", 1);
    // jet out along 180° at (0, 1.5): flux (−2200, 0); propellant added inside as a mass source
    const flux: V2 = [-T, 0];
    const pin: V2 = [1.6, 0];
    // ΣM about the pin: −1.6·n + M(W at (0.8, 0.7)) = M(flux)  →  n = (M(W) − M(flux))/1.6
    const n = (moment([0.8, 0.7], [0, -W], pin) - moment([0, 1.5], flux, pin)) / 1.6;
    agree(r.reactions.rear.n, n, "-1082");
    // ΣFx: pin fx = −2200 N; ΣFy: pin fy = W − n
    agree(r.reactions.front.fx, flux[0], "-2200");
    agree(r.reactions.front.fy, W - n, "3043");
    expect(r.bodies.stand.status).toBe("tips");
    expect(r.bodies.stand.freeMotion).toEqual({ kind: "rotation", about: [1.6, 0] });
    // the momentum's moment about the origin: r × ṁV = −1.5·(−2200) = 3300 N·m
    agree(r.bodies.stand.momentum.m, 3300, "3300");
  });

  it("v2 (jet lowered to 0.6 m): the rear pad bears", () => {
    const r = solvedDemo("a3", 2);
    const pin: V2 = [1.6, 0];
    const n = (moment([0.8, 0.7], [0, -W], pin) - moment([0, 0.6], [-T, 0], pin)) / 1.6;
    agree(r.reactions.rear.n, n, "155.7");
    agree(r.reactions.front.fy, W - n, "1806");
    agree(r.bodies.stand.momentum.m, 0.6 * T, "1320");
    expect(r.bodies.stand.status).toBe("holds");
  });

  it("v3 (jet at 0.6 m, gravity turned 3° toward the pin)", () => {
    const r = solvedDemo("a3", 3);
    const Wv = along(W, -87); // (102.6, −1959) N
    const flux: V2 = [-T, 0];
    const pin: V2 = [1.6, 0];
    const n = (moment([0.8, 0.7], Wv, pin) - moment([0, 0.6], flux, pin)) / 1.6;
    agree(r.reactions.rear.n, n, "109.4");
    agree(r.reactions.front.fx, flux[0] - Wv[0], "-2303");
    agree(r.reactions.front.fy, flux[1] - Wv[1] - n, "1849");
    expect(r.bodies.stand.status).toBe("holds");
  });
});

describe("a4 DN150 bend on one anchor (2700 L/min; v1 at 10 bar, v2 the 15 bar hydrotest)", () => {
  it.each([
    // version, inlet bar, then the hand figures: anchor fx, fy, m
    [1, 10, "-1.779e+4", "1.860e+4", "-1771"],
    [2, 15, "-2.662e+4", "2.743e+4", "-2566"],
  ] as const)("v%i (%i bar): pressure thrust on both faces, the momentum change and the weight, all on the fixed anchor", (v, pBar, fx, fy, mm) => {
    const r = solvedDemo("a4", v);
    const rho = 998;
    const A = circle(0.15); // 0.01767 m²
    const Q = 2700 * lpm; // 0.045 m³/s
    const V = Q / A; // 2.546 m/s
    const mdot = rho * Q; // 44.91 kg/s
    const pIn = pBar * bar;
    const pOut = pIn - rho * 9.81 * 0.45 - (0.25 * rho * V * V) / 2; // the 0.45 m rise and K = 0.25: 5.215 kPa less
    // inlet at (−0.45, 0) flowing +x: pressure along the flow (+pIn·A, 0); outlet at (0, 0.45)
    // flowing +y: pressure against the flow (0, −pOut·A)
    const Pin: V2 = [pIn * A, 0];
    const Pout: V2 = [0, -pOut * A];
    // the weight at the centroid of the L outline: arms 0.54 × 0.18 at (−0.18, 0) and 0.18 × 0.36 at (0, 0.27)
    const a1 = 0.54 * 0.18;
    const a2 = 0.18 * 0.36;
    const cg: V2 = [(a1 * -0.18) / (a1 + a2), (a2 * 0.27) / (a1 + a2)]; // (−0.108, 0.108)
    const W: V2 = [0, -92 * g];
    const flux: V2 = [-mdot * V, mdot * V]; // out (0, ṁV) − in (ṁV, 0)
    agree(r.bodies.bend.momentum.fx, flux[0], "-114.4");
    agree(r.bodies.bend.momentum.fy, flux[1], "114.4");
    agree(r.bodies.bend.momentum.m, 0, "0.000"); // both ports' flux lines pass through the origin
    // ΣF: R + Pin + Pout + W = flux
    agree(r.reactions.anchor.fx, flux[0] - Pin[0], fx);
    agree(r.reactions.anchor.fy, flux[1] - Pout[1] - W[1], fy);
    // ΣM about the anchor (0.09, 0): m + M(Pin) + M(Pout) + M(W) = M(flux)
    const P: V2 = [0.09, 0];
    const mFlux = moment([0, 0.45], [0, mdot * V], P) - moment([-0.45, 0], [mdot * V, 0], P);
    const m = mFlux - moment([-0.45, 0], Pin, P) - moment([0, 0.45], Pout, P) - moment(cg, W, P);
    agree(r.reactions.anchor.m, m, mm);
    expect(r.bodies.bend.status).toBe("holds");
  });
});

describe("a5 pressure-washing cart (40 L/min at 500 bar, lance at (0.5, 1.15))", () => {
  const rho = 998;
  const Q = 40 * lpm; // at 500 bar, Q = 40 L/min · √(500/500)
  const mdot = rho * Q; // 0.6653 kg/s, fed by the hose as a mass source
  const V = 0.96 * Math.sqrt((2 * 500 * bar) / rho); // 303.9 m/s, Cv = 0.96 on Bernoulli
  const rear: V2 = [0.06, 0.12];

  const worked = (mass: number) => {
    const flux = along(mdot * V, -50); // out at −50°
    const W = mass * g;
    // ΣFx: t_rear = flux_x (the caster is free); ΣM about the rear wheels: 0.52·N_front + M(W) = M(flux)
    const Nfront = (moment([0.5, 1.15], flux, rear) - moment([0.28, 0.42], [0, -W], rear)) / 0.52;
    return { flux, Nfront, Nrear: W + flux[1] - Nfront };
  };

  it("v3 (145 kg with ballast, lance at −50°): the caster bears", () => {
    const r = solvedDemo("a5", 3);
    const h = worked(145);
    agree(r.bodies.cart.momentum.fx, h.flux[0], "130.0");
    agree(r.bodies.cart.momentum.fy, h.flux[1], "-154.9");
    agree(r.reactions.rear.fx, h.flux[0], "130.0");
    agree(r.reactions.front.n, h.Nfront, "213.1");
    agree(r.reactions.rear.n, h.Nrear, "1054");
    agree(r.reactions.rear.friction?.needed, h.flux[0] / h.Nrear, "0.1233");
    expect(r.bodies.cart.status).toBe("holds");
  });

  it("v1 (85 kg, lance aimed down at −75°): both bear", () => {
    const r = solvedDemo("a5", 1);
    const flux = along(mdot * V, -75);
    const W = 85 * g;
    const Nfront = (moment([0.5, 1.15], flux, rear) - moment([0.28, 0.42], [0, -W], rear)) / 0.52;
    agree(r.reactions.rear.fx, flux[0], "52.33");
    agree(r.reactions.front.n, Nfront, "83.76");
    agree(r.reactions.rear.n, W + flux[1] - Nfront, "554.5");
    expect(r.bodies.cart.status).toBe("holds");
  });

  it("v2 (85 kg, lance at −50°): tips back about the rear wheels", () => {
    const r = solvedDemo("a5", 2);
    const h = worked(85);
    agree(r.reactions.front.n, h.Nfront, "-35.81");
    agree(r.reactions.rear.n, h.Nrear, "714.5");
    expect(r.bodies.cart.status).toBe("tips");
    expect(r.bodies.cart.freeMotion).toEqual({ kind: "rotation", about: rear });
  });
});

describe("a6 exhaust stack on an unbolted skid", () => {
  // wind: q = ½ρv², Cd = 0.7 on the 0.6 m width: at 40 m/s w = ½·1.25·40²·0.6·0.7 = 420 N/m,
  // over the 8 m stack 3360 N at mid-height (1.2, 4.7), along +x
  const windAt = (v: number) => 0.5 * 1.25 * v * v * 0.6 * 0.7 * 8;
  const mdot = 4.2;
  const Vin = mdot / (0.6 * circle(0.5)); // 35.65 m/s, in at (1.8, 1.6) along 180°
  const Vout = mdot / (0.6 * circle(0.6)); // 24.76 m/s, out at (1.5, 8.7) along 90°
  const up: V2 = [0.1, 0];

  /** Each edge's n and the shared t; `dead`, `wind` and `flow` scale the load groups (a case's factors). */
  const worked = (v: number, mass: number, cg: V2, { dead = 1, wind = 1, flow = 1, pDuct = 2000 } = {}) => {
    const Fw = wind * windAt(v);
    const W = dead * mass * g;
    const flux: V2 = [flow * mdot * Vin, flow * mdot * Vout]; // out (0, ṁVout) − in (−ṁVin, 0)
    const Pduct: V2 = [-flow * pDuct * circle(0.5), 0]; // gauge pressure inward, along the flow (180°)
    // ΣFx: t_up + t_down + wind + Pduct = flux_x, half each (equal springs on y = 0)
    const t = (flux[0] - Fw - Pduct[0]) / 2;
    // ΣM about the upwind edge: 2.8·N_down + M(W) + M(wind) + M(Pduct) = M(flux)
    const mFlux = flow * (moment([1.5, 8.7], [0, mdot * Vout], up) - moment([1.8, 1.6], [-mdot * Vin, 0], up));
    const Ndown = (mFlux - moment(cg, [0, -W], up) - moment([1.2, 4.7], [Fw, 0], up) - moment([1.8, 1.6], Pduct, up)) / 2.8;
    return { flux, t, Ndown, Nup: W + flux[1] - Ndown };
  };
  const cg3: V2 = [1.5, (900 * 3.6 + 1200 * 0.45) / 2100]; // v3: 1200 kg of blocks 0.45 m up: 1.8 m

  it("v1 (30 m/s, no ballast): both edges bear", () => {
    const r = solvedDemo("a6", 1);
    const h = worked(30, 900, [1.5, 3.6]);
    agree(r.reactions.upwind.fx, h.t, "-673.8");
    agree(r.reactions.upwind.n, h.Nup, "1602");
    agree(r.reactions.downwind.n, h.Ndown, "7328");
    expect(r.bodies.stack.status).toBe("holds");
  });

  it("v2 (40 m/s, no ballast): the upwind edge would have to pull", () => {
    const r = solvedDemo("a6", 2);
    const h = worked(40, 900, [1.5, 3.6]);
    agree(r.reactions.upwind.n, h.Nup, "-865.1");
    agree(r.reactions.downwind.n, h.Ndown, "9795");
    expect(r.bodies.stack.status).toBe("tips");
    expect(r.bodies.stack.freeMotion).toEqual({ kind: "rotation", about: [2.9, 0] });
  });

  it("v3 (40 m/s, 1200 kg of blocks): both edges bear", () => {
    const r = solvedDemo("a6", 3);
    const h = worked(40, 2100, cg3);
    agree(r.bodies.stack.momentum.fx, h.flux[0], "149.7");
    agree(r.bodies.stack.momentum.fy, h.flux[1], "104.0");
    agree(r.reactions.upwind.fx, h.t, "-1409");
    agree(r.reactions.downwind.fx, h.t, "-1409");
    agree(r.reactions.downwind.n, h.Ndown, "1.568e+4");
    agree(r.reactions.upwind.n, h.Nup, "5019");
    agree(r.reactions.upwind.friction?.needed, -h.t / h.Nup, "0.2807");
    expect(r.bodies.stack.status).toBe("holds");
  });

  it("v3's cases: engine stopped (no flow, no duct pressure), and the uplift check solved as one factored load set", () => {
    const demo = DEMO_SKETCHES.find((s) => s.id.endsWith("a6"))!;
    const p = parseSketch(demoVersions(demo)[2].doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const runs = solveCases(p.file).runs;
    const run = (id: string) => {
      const x = runs.find((r) => r.id === id);
      if (!x?.ok) throw new Error(`no run ${id}`);
      return x.result;
    };
    // engine stopped at 40 m/s: flow factor 0 and p_duct = 0; the wind alone against the weight
    const stopped = worked(40, 2100, cg3, { flow: 0 });
    agree(run("stopped").reactions.upwind.fx, stopped.t, "-1680");
    agree(run("stopped").reactions.upwind.n, stopped.Nup, "4657");
    agree(run("stopped").reactions.downwind.n, stopped.Ndown, "1.594e+4");
    // 0.9 × weight (wind and flow off) + 1.5 × wind at 40 m/s (weight and flow off), as one load set:
    // t = −1.5·3360/2 = −2520 N; 2.8·N_down = 0.9·W·1.4 + 1.5·3360·4.7
    const uplift = worked(40, 2100, cg3, { dead: 0.9, wind: 1.5, flow: 0 });
    agree(run("uplift").reactions.upwind.fx, uplift.t, "-2520");
    agree(run("uplift").reactions.upwind.n, uplift.Nup, "807.3");
    agree(run("uplift").reactions.downwind.n, uplift.Ndown, "1.773e+4");
  });
});

describe("a6 v3: where the calc sheet says the upwind edge lifts or slips as the wind rises (the limit finder against closed forms)", () => {
  // The wind force is F = ½·1.25·v²·0.6·0.7·8 = 2.1·v² N at (1.2, 4.7); W = 2100 kg·g at (1.5, 1.8);
  // the edges 2.8 m apart. From the hand calculation above, N_up = W/2 − F·4.7/2.8 (no flow) and
  // each edge takes t = F/2 (half the wind). "Slip" is μ·N_up − |t| = 0 with μ = 0.5; "lift-off" N_up = 0.
  const W = 2100 * g;
  const v = (F: number) => Math.sqrt(F / 2.1);
  const doc = () => {
    const p = parseSketch(demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith("a6"))!)[2].doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    return p.file;
  };
  const limitIn = (id: string, component: "margin" | "frictionMargin") => {
    const row = limitEverywhere(doc(), "v", [20, 45], { support: "upwind", component }).find((r) => r.id === id);
    if (!row || !("found" in row.result) || !row.result.found) throw new Error(`no crossing in ${id}`);
    return row.result.value;
  };

  it("engine stopped: slips at 42.79 m/s", () => {
    // 0.5·(W/2 − F·4.7/2.8) = F/2  →  F = (W/2)/(1 + 4.7/2.8)
    const F = W / 2 / (1 + 4.7 / 2.8);
    const at = limitIn("stopped", "frictionMargin");
    expect(v(F).toPrecision(4)).toBe("42.79");
    expect(at.toPrecision(4)).toBe(v(F).toPrecision(4));
  });

  it("the uplift check (0.9 × weight + 1.5 × wind): lifts at 41.86 m/s and slips at 33.14 m/s", () => {
    // lift-off: 0.9·W·1.4 = 1.5·F·4.7; slip: 0.5·(0.45·W − 1.5·F·4.7/2.8) = 1.5·F/2
    const Flift = (0.9 * W * 1.4) / (1.5 * 4.7);
    const Fslip = (0.5 * 0.45 * W) / (0.75 + (0.5 * 1.5 * 4.7) / 2.8);
    expect(v(Flift).toPrecision(4)).toBe("41.86");
    expect(v(Fslip).toPrecision(4)).toBe("33.14");
    expect(limitIn("uplift", "margin").toPrecision(4)).toBe(v(Flift).toPrecision(4));
    expect(limitIn("uplift", "frictionMargin").toPrecision(4)).toBe(v(Fslip).toPrecision(4));
  });
});

describe("a3 v3: the slope at which the rear pad unloads (the limit finder against a closed form)", () => {
  it("9.53°: W·(0.8·cos s − 0.7·sin s) = 2200·0.6 about the pin", () => {
    // ΣM about the pin with the pad's n = 0: the weight at (0.8, 0.7) behind and above the pin,
    // turned s toward it, gives W·(0.8·cos s − 0.7·sin s); the jet's flux moment is 2200·0.6.
    // With R = √(0.8² + 0.7²) and φ = atan(0.7/0.8): R·cos(s + φ) = 1320/W
    const W = 200 * g;
    const R = Math.hypot(0.8, 0.7);
    const s = Math.acos(1320 / (W * R)) / deg - Math.atan2(0.7, 0.8) / deg;
    expect(s.toPrecision(3)).toBe("9.53");
    const p = parseSketch(demoVersions(DEMO_SKETCHES.find((d) => d.id.endsWith("a3"))!)[2].doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const [row] = limitEverywhere(p.file, "slope", [0, 20], { support: "rear", component: "n" });
    if (!("found" in row.result) || !row.result.found) throw new Error("no crossing");
    expect(row.result.value.toPrecision(4)).toBe(s.toPrecision(4));
  });
});
