// Our worked examples (invented scenarios, tests/fixtures/sketches), each against a hand calculation
// written out here. Together they cover every status and every warning code.
import { readdirSync, readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { solveFile, type SolveResult } from "@/solver";
import { portDirectionNotes } from "@/solver/ports";
import { G0 } from "@/solver/constants";
import { expectRel, loadFixture, parsed } from "./helpers";

const DEG = Math.PI / 180;
const run = (name: string): SolveResult => {
  const r = solveFile(loadFixture(name));
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r;
};
const codes = (r: SolveResult) => r.warnings.map((w) => w.code).sort();

describe("pump-skid-discharge: holds, INDETERMINATE", () => {
  it("feet loads from ΣFy and ΣM; equal stiffness shares the friction", () => {
    const r = run("pump-skid-discharge.json");
    const W = 850 * G0;
    // momentum flux out − in (N): discharge 12 kg/s · 24 m/s at 120°, suction 12 · 2.4 at 180°
    const out = [12 * 24 * Math.cos(120 * DEG), 12 * 24 * Math.sin(120 * DEG)];
    const inn = [-12 * 2.4, 0];
    const rhs = [out[0] - inn[0], out[1] - inn[1]];
    // suction gauge pressure −20 kPa on 0.005 m² at an inlet flowing in −x: p·A·e = (+100, 0) N
    const P = [-20e3 * 0.005 * -1, 0];
    // ΣF: R + W + P = rhs
    const Rx = rhs[0] - P[0];
    const Ry = rhs[1] + W;
    // ΣM about the origin: 0.2·N1 + 2.8·N2 − 1.4·W + M(P) = M(out) − M(in)
    const mOut = 0.3 * out[1] - 1.8 * out[0];
    const mIn = 3 * inn[1] - 0.35 * inn[0];
    const mP = 3 * P[1] - 0.35 * P[0];
    const sumXN = mOut - mIn + 1.4 * W - mP;
    const N1 = (2.8 * Ry - sumXN) / 2.6;
    const N2 = Ry - N1;
    expectRel(r.reactions.rear.n!, N1, 1e-9);
    expectRel(r.reactions.front.n!, N2, 1e-9);
    expectRel(r.reactions.rear.fx + r.reactions.front.fx, Rx, 1e-9);
    expectRel(r.reactions.rear.fx, Rx / 2, 1e-9);
    expect(r.bodies.skid.status).toBe("holds");
    expect(r.bodies.skid.determinacy).toEqual({ kind: "indeterminate", degree: 1 });
    expect(codes(r)).toEqual(["INDETERMINATE"]);
    expect(r.reactions.rear.state).toBe("bearing");
    expect(r.reactions.rear.margin).toBe(r.reactions.rear.n);
    // N1 ≈ 4619 N, N2 ≈ 3966 N, Rx ≈ −215 N
    expect(Math.round(N1)).toBe(4619);
    expect(Math.round(N2)).toBe(3966);
  });
});

describe("pump-skid-slip: SLIP at each foot", () => {
  it("each foot needs |t|/n > μ = 0.02 and says so", () => {
    const r = run("pump-skid-slip.json");
    // The discharge-test skid above with μ = 0.02 (friction is checked, not enforced, so the
    // reactions are the same). Statics, as worked above:
    //   momentum flux out − in, x: 12·24·cos 120° − (−12·2.4) = −144 + 28.8 = −115.2 N
    //   suction pressure force, x: −20 kPa · 0.005 m² · (−1) = +100 N
    //   ΣFx: Rx + 100 = −115.2  →  Rx = −215.2 N, shared equally by the two equal feet
    //   (indeterminate, equal stiffness): fx = −107.6 N each. The tangent of a contact at 90°
    //   points along 180°, so t = −fx = +107.6 N.
    //   n from ΣFy and ΣM: rear N1 = 4619 N, front N2 = 3966 N (rounded, as above).
    // needed = |t|/n: rear 107.6/4619 = 0.0233, front 107.6/3966 = 0.0271, both above 0.02.
    const rear = r.reactions.rear;
    const front = r.reactions.front;
    const W = 850 * G0;
    const out = [12 * 24 * Math.cos(120 * DEG), 12 * 24 * Math.sin(120 * DEG)];
    const inn = [-12 * 2.4, 0];
    const P = [100, 0];
    const Rx = out[0] - inn[0] - P[0];
    const Ry = out[1] - inn[1] + W;
    const sumXN = 0.3 * out[1] - 1.8 * out[0] - (3 * inn[1] - 0.35 * inn[0]) + 1.4 * W - (3 * P[1] - 0.35 * P[0]);
    const N1 = (2.8 * Ry - sumXN) / 2.6;
    const N2 = Ry - N1;
    expectRel(Rx, -215.2, 1e-9);
    expectRel(rear.t!, -Rx / 2, 1e-9);
    expectRel(front.t!, -Rx / 2, 1e-9);
    expectRel(rear.n!, N1, 1e-9);
    expectRel(front.n!, N2, 1e-9);
    expect(Math.round(rear.n!)).toBe(4619);
    expect(Math.round(front.n!)).toBe(3966);
    expect(rear.friction!.needed).toBeCloseTo(107.6 / N1, 12);
    expect(front.friction!.needed).toBeCloseTo(107.6 / N2, 12);
    expect(rear.friction!.needed).toBeCloseTo(0.0233, 4);
    expect(front.friction!.needed).toBeCloseTo(0.0271, 4);
    const slips = r.warnings.filter((w) => w.code === "SLIP");
    // each foot, and the skid as a whole: |Σt|/Σn = 215.2 / (N1 + N2) = 0.0251 > 0.02
    expect(slips.map((w) => w.ids[0]).sort()).toEqual(["front", "rear", "skid"]);
    expect(slips[0].message).toMatch(/needs a friction coefficient of 0\.0\d+, and has μ = 0\.02/);
    expect(215.2 / (N1 + N2)).toBeCloseTo(0.0251, 4);
    expect(slips.find((w) => w.ids[0] === "skid")!.message).toBe("Skid slides as a whole: its friction contacts must give a friction coefficient of 0.0251 together, and give 0.02");
    expect(r.bodies.skid.status).toBe("holds");
  });
});

describe("pipe-bend-anchor: holds, determinate, gravity 0", () => {
  it("has no weight term and no warnings", () => {
    const r = run("pipe-bend-anchor.json");
    expect(r.bodies.bend.status).toBe("holds");
    expect(r.equations.bend.forces.some((t) => t.kind === "weight")).toBe(false);
    expect(r.warnings).toEqual([]);
  });
});

describe("fire-monitor-trailer: lifts (LIFTOFF at the jack), INDETERMINATE", () => {
  it("on three equal supports the jack would pull; released, the leg and the wheel carry it by statics", () => {
    const r = run("fire-monitor-trailer.json");
    const rho = 998.2;
    const Q = (2000 * 3.785411784e-3) / 60;
    const A = (Math.PI / 4) * (2.5 * 0.0254) ** 2;
    const mdot = rho * Q;
    const V = Q / A;
    const th = 15 * DEG;
    const W = 1100 * G0;
    // jet reaction on the trailer: −ṁV(cos θ, sin θ) at (1.0, 2.8); its moment about the origin
    const F = [-mdot * V * Math.cos(th), -mdot * V * Math.sin(th)];
    const MF = 1.0 * F[1] - 2.8 * F[0];
    // Three equal springs at x = 0, 1.2, 3.4 (elastic method): the jack's share
    const xs = [0, 1.2, 3.4];
    const xbar = xs.reduce((a, b) => a + b) / 3;
    const Pv = W - F[1]; // downward load on the supports
    // moment of the loads about (xbar, 0.3), clockwise positive pressing the +x side
    const Mc = W * (1.5 - xbar) - (MF - F[1] * 0 + 0.3 * F[0] - xbar * F[1]);
    const sumX2 = xs.reduce((s, x) => s + (x - xbar) ** 2, 0);
    const jackIfBearing = Pv / 3 + (Mc * (3.4 - xbar)) / sumX2;
    expect(jackIfBearing).toBeLessThan(0); // so it lifts
    // With the jack off: N_leg + N_wheel = W − Fy, and moments about the leg (0, 0.3):
    // 1.2·N_wheel − 1.5·W + (1.0·Fy − (2.8 − 0.3)·Fx) = 0
    const Nwheel = (1.5 * W - (1.0 * F[1] - 2.5 * F[0])) / 1.2;
    const Nleg = W - F[1] - Nwheel;
    expectRel(r.reactions.wheel.n!, Nwheel, 1e-9);
    expectRel(r.reactions.leg.n!, Nleg, 1e-9);
    expect(r.reactions.jack).toMatchObject({ state: "lifted", n: 0, t: 0, fx: 0, fy: 0 });
    expect(r.reactions.jack.margin!).toBeLessThan(0);
    expect(r.bodies.trailer.status).toBe("lifts");
    expect(codes(r)).toEqual(["INDETERMINATE", "LIFTOFF"]);
    // with the jack off, the leg and the wheel (n and t each, both with μ: 4 unknowns) are still
    // indeterminate, degree 1: the friction they share follows their stiffnesses; as drawn, degree 3
    expect(r.bodies.trailer.determinacy).toEqual({ kind: "indeterminate", degree: 3 });
    expect(r.bodies.trailer.activeDeterminacy).toEqual({ kind: "indeterminate", degree: 1 });
    const ind = r.warnings.find((w) => w.code === "INDETERMINATE")!;
    expect(ind.message).toMatch(/degree 1 with the supports that carry load/);
    expect(ind.ids.sort()).toEqual(["leg", "wheel"]);
    // the friction is shared equally by the two bearing contacts
    expectRel(r.reactions.leg.fx, -F[0] / 2, 1e-9);
  });
});

describe("thrust-cart-free: freeX, determinate, holds", () => {
  it("ax = ṁV/m, and the wheel loads carry the inertial couple", () => {
    const r = run("thrust-cart-free.json");
    const m = 400;
    const T = 2.5 * 800; // jet rearward → thrust forward
    const ax = T / m;
    expect(r.bodies.cart.acceleration.ax).toBeCloseTo(ax, 12);
    const W = m * G0;
    // about the rear wheel (0.3, 0), with M = x·Fy − y·Fx:
    //   front wheel 1.4·N_front; weight −0.7·W; thrust (+T at 0.9 m) −0.9·T;
    //   inertial force (−m·ax at the cg, 0.5 m) +0.5·m·ax
    const Nfront = (W * 0.7 + T * 0.9 - m * ax * 0.5) / 1.4;
    expectRel(r.reactions.frontWheel.n!, Nfront, 1e-9);
    expectRel(r.reactions.rearWheel.n!, W - Nfront, 1e-9);
    expect(r.bodies.cart.determinacy).toEqual({ kind: "determinate", degree: 0 });
    expect(r.bodies.cart.status).toBe("holds");
    expect(r.warnings).toEqual([]);
  });
});

describe("thrust-stand-tips: tips about the front pin (LIFTOFF, would have to pull)", () => {
  it("reports the pull the rear pad would need and the rotation about the pin", () => {
    const r = run("thrust-stand-tips.json");
    const T = 2200;
    const W = 200 * G0;
    // bilateral: about the pin (1.6, 0): N_rear·(−1.6) + W·(1.6 − 0.8) − T·1.5 = 0
    // the jet leaves in −x, so the stand is pushed +x at 1.5 m: moment about the pin = −1.5·T
    const Nrear = (W * 0.8 - T * 1.5) / 1.6;
    expect(Nrear).toBeLessThan(0);
    expectRel(r.reactions.rear.n!, Nrear, 1e-9);
    expect(r.reactions.rear.state).toBe("lifted");
    expectRel(r.reactions.rear.margin!, Nrear, 1e-9);
    expect(r.bodies.stand.status).toBe("tips");
    expect(r.bodies.stand.freeMotion).toEqual({ kind: "rotation", about: [1.6, 0] });
    const w = r.warnings.find((x) => x.code === "LIFTOFF")!;
    expect(w.ids).toEqual(["rear"]);
    expect(w.message).toMatch(/would have to pull 1\.08\d? kN/);
    // W·d/h = 200·9.80665·0.8/1.5 = 1046 N < 2200 N: the common-practice rule agrees
    expect(T).toBeGreaterThan((W * 0.8) / 1.5);
  });
});

describe("skid-on-rollers-unrestrained: unrestrained in x", () => {
  it("least-squares reactions, the unbalanced jet force in the residual, free translation in +x", () => {
    const r = run("skid-on-rollers-unrestrained.json");
    expect(r.bodies.skid.status).toBe("unrestrained");
    expect(r.bodies.skid.freeMotion).toEqual({ kind: "translation", angle: 0 });
    // the jet leaves in −x: 5 kg/s · 20 m/s = 100 N pushes the skid in +x
    expectRel(r.bodies.skid.residual.fx, 100, 1e-9);
    expect(r.bodies.skid.residual.fy).toBe(0);
    expect(r.bodies.skid.determinacy).toEqual({ kind: "mechanism", degree: 1 });
    // The unbalanced 100 N is reported through the centroid of the feet (1, 0), a point of the
    // supports as drawn (not the cg); the feet balance the rest. Hand calculation, moments about
    // (1, 0): 0.8·(N_right − N_left) − 0.6·100 = 0 (jet reaction at 0.6 m), N_left + N_right = W
    const W = 300 * G0;
    const Nright = (W + 60 / 0.8) / 2;
    expectRel(r.reactions.right.n!, Nright, 1e-9);
  });
});

describe("skid-vertical-mechanism: holds with MECHANISM", () => {
  it("x is free but unloaded", () => {
    const r = run("skid-vertical-mechanism.json");
    expect(r.bodies.skid.status).toBe("holds");
    expect(r.bodies.skid.determinacy).toEqual({ kind: "mechanism", degree: 1 });
    expect(codes(r)).toEqual(["MECHANISM"]);
    const W = 300 * G0;
    const T = 100; // vent reaction, downward at x = 1.5
    const Nright = ((W * 0.8 + T * 1.3)) / 1.6;
    expectRel(r.reactions.right.n!, Nright, 1e-9);
    expectRel(r.reactions.left.n!, W + T - Nright, 1e-9);
  });
});

describe("exhaust-stack-guyed: lifts (SLACK east guy), determinate as solved", () => {
  it("with the east guy slack, the pin and the west guy are determinate", () => {
    const r = run("exhaust-stack-guyed.json");
    const W = 1800 * G0;
    const wind = 600 * 12; // resultant at 6 m, +x
    // momentum out − in: outlet 8·25 up at (0.4, 12); inlet 8·15 in −x at (0.8, 1.5)
    const outF = [0, 200];
    const inF = [-120, 0];
    // west guy tension T along 225° from (0, 10): (−T/√2, −T/√2)
    // ΣM about the pin (0.4, 0):
    //   guy: (0 − 0.4)(−T/√2) − 10(−T/√2) = T(0.4 + 10)/√2
    //   wind: −6·wind; weight: 0; momentum: out (0)(200) − 12·0 = 0; in: −(1.5)(−120) about pin → (0.8−0.4)·0 − 1.5·(−120) = 180
    //   ΣM(forces) = ΣM(out) − ΣM(in)
    const mIn = (0.8 - 0.4) * inF[1] - 1.5 * inF[0];
    const T = (0 - mIn + 6 * wind) / (10.4 / Math.SQRT2);
    expectRel(r.reactions.westGuy.n!, T, 1e-9);
    expect(r.reactions.eastGuy).toMatchObject({ state: "slack", n: 0 });
    expect(r.reactions.eastGuy.margin!).toBeLessThan(0);
    // pin: ΣF = out − in
    expectRel(r.reactions.base.fx, outF[0] - inF[0] - wind + T / Math.SQRT2, 1e-9);
    expectRel(r.reactions.base.fy, outF[1] - inF[1] + W + T / Math.SQRT2, 1e-9);
    expect(r.bodies.stack.status).toBe("lifts");
    // three supports as drawn (4 unknowns) are indeterminate; the slack guy carries nothing, and the
    // pin and the west guy (3 unknowns) are determinate: the reactions above come from statics alone
    expect(r.bodies.stack.determinacy).toEqual({ kind: "indeterminate", degree: 1 });
    expect(r.bodies.stack.activeDeterminacy).toEqual({ kind: "determinate", degree: 0 });
    expect(codes(r)).toEqual(["SLACK"]);
  });
});

describe("exhaust-stack-one-guy-tips: tips (SLACK, would have to push)", () => {
  it("the only guy would have to push", () => {
    const r = run("exhaust-stack-one-guy-tips.json");
    expect(r.bodies.stack.status).toBe("tips");
    expect(r.bodies.stack.freeMotion).toEqual({ kind: "rotation", about: [0.4, 0] });
    const wind = 600 * 12; // now in −x, on the east face
    const mIn = -1.5 * -120;
    const T = (0 - mIn - 6 * wind) / (10.4 / Math.SQRT2);
    expect(T).toBeLessThan(0);
    expectRel(r.reactions.westGuy.n!, T, 1e-9);
    const w = r.warnings.find((x) => x.code === "SLACK")!;
    expect(w.message).toMatch(/would have to push 5\.\d+ kN/);
  });
});

describe("pump-set-hold-down: the strap re-engages when a pad lifts", () => {
  it("the strap that the weight alone would push carries the tipping moment", () => {
    const r = run("pump-set-hold-down.json");
    const W = 900 * G0;
    const J = 40 * 80; // jet in +x: pushes the set in −x at 2.2 m
    // about the left pad (0.1, 0): 2.2·J − 0.7·W − 1.2·T = 0
    const T = (2.2 * J - 0.7 * W) / 1.2;
    expectRel(r.reactions.strap.n!, T, 1e-9);
    expect(r.reactions.strap.state).toBe("taut");
    expectRel(r.reactions.leftPad.n!, W + T, 1e-9);
    expectRel(r.reactions.leftPad.fx, J, 1e-9);
    expect(r.reactions.rightPad.state).toBe("lifted");
    expect(r.bodies.set.status).toBe("lifts");
    // the left pad (n and t: it has μ) and the strap carry load, 3 unknowns: determinate as solved
    expect(r.bodies.set.activeDeterminacy).toEqual({ kind: "determinate", degree: 0 });
    expect(codes(r)).toEqual(["LIFTOFF"]);
  });

  it("the answer does not depend on the strap's stiffness, even when it is released first", async () => {
    const { solveFile: sf } = await import("@/solver");
    for (const k of [1e7, 1e8, 1e10, 1e11]) {
      const doc = loadFixture("pump-set-hold-down.json");
      (doc.supports![2] as { stiffness?: number }).stiffness = k;
      const r = sf(doc);
      if (!r.ok) throw new Error();
      expectRel(r.reactions.strap.n!, run("pump-set-hold-down.json").reactions.strap.n!, 1e-9);
    }
  });
});

describe("ducted-fan-checks: PORT_INCONSISTENT and MASS_IMBALANCE, still solved", () => {
  it("uses the first-listed values and warns", () => {
    const r = run("ducted-fan-checks.json");
    expect(codes(r)).toEqual(["MASS_IMBALANCE", "PORT_INCONSISTENT"]);
    expect(r.warnings.find((w) => w.code === "PORT_INCONSISTENT")!.ids).toEqual(["intake"]);
    // ṁ = 20 (massFlow first), V = 40 (velocity first); out 21·45
    const fx = 21 * 45 - 20 * 40;
    expectRel(r.reactions.frame.fx, fx, 1e-12);
    expectRel(r.reactions.frame.fy, 45 * G0, 1e-12);
    // moment about the frame point (0.6, 0): momentum flux acts at y = 0.4 → −0.4·fx
    expectRel(r.reactions.frame.m, -0.4 * fx, 1e-9);
  });
});

describe("trig-unitless: TRIG_UNITLESS", () => {
  it("sin(30) is read as radians and the warning suggests degrees", () => {
    const r = run("trig-unitless.json");
    const w = r.warnings.find((x) => x.code === "TRIG_UNITLESS")!;
    expect(w.message).toBe("loads[0].fy: sin(30) reads 30 as radians: did you mean 30 deg?");
    expectRel(r.reactions.A.fy + r.reactions.B.fy, 5000 * Math.sin(30), 1e-12);
  });
});

describe("the fixtures cover every status and every warning code", () => {
  it("collects them all", async () => {
    const { readdirSync } = await import("node:fs");
    const { FIXTURES } = await import("./helpers");
    const statuses = new Set<string>();
    const warnings = new Set<string>();
    for (const f of readdirSync(FIXTURES).filter((n) => n.endsWith(".json"))) {
      const r = run(f);
      Object.values(r.bodies).forEach((b) => statuses.add(b.status));
      r.warnings.forEach((w) => warnings.add(w.code));
    }
    expect([...statuses].sort()).toEqual(["holds", "lifts", "tips", "unrestrained"]);
    expect([...warnings].sort()).toEqual(
      ["INDETERMINATE", "LIFTOFF", "MASS_IMBALANCE", "MECHANISM", "PORT_INCONSISTENT", "SLACK", "SLIP", "TRIG_UNITLESS"].sort(),
    );
  });
});

describe("the hand-check sums", () => {
  it("ΣF and ΣM about any point balance for every fixture that holds, lifts or tips", async () => {
    const { readdirSync } = await import("node:fs");
    const { FIXTURES } = await import("./helpers");
    const { handCheckSums } = await import("@/solver");
    for (const f of readdirSync(FIXTURES).filter((n) => n.endsWith(".json"))) {
      const r = run(f);
      for (const [id, b] of Object.entries(r.bodies)) {
        for (const p of [[0, 0], [3.7, -1.2], [-20, 40]] as [number, number][]) {
          const s = handCheckSums(r.equations[id], p);
          const scale = r.equations[id].forces.reduce((a, t) => a + Math.abs(t.fx) + Math.abs(t.fy), 1);
          if (b.status === "unrestrained") {
            // the imbalance is the residual the result reports
            expect(s.imbalance.fx).toBeCloseTo(b.residual.fx, 6);
          } else {
            expect(Math.abs(s.imbalance.fx), `${f} ΣFx`).toBeLessThan(1e-9 * scale);
            expect(Math.abs(s.imbalance.fy), `${f} ΣFy`).toBeLessThan(1e-9 * scale);
            expect(Math.abs(s.imbalance.m), `${f} ΣM about ${p}`).toBeLessThan(1e-9 * scale * 50);
          }
        }
      }
    }
  });

  it("names free motions in words", async () => {
    const { describeFreeMotion } = await import("@/solver");
    expect(describeFreeMotion({ kind: "translation", angle: 180 })).toBe("nothing resists motion in x");
    expect(describeFreeMotion({ kind: "translation", angle: 90 })).toBe("nothing resists motion in y");
    expect(describeFreeMotion({ kind: "translation", angle: 35 })).toBe("nothing resists motion along 35°");
    expect(describeFreeMotion({ kind: "rotation", about: [1.6, 0] }, [{ kind: "pin", id: "front", label: "front pin", at: [1.6, 0] }])).toBe(
      "nothing resists rotation about pin front pin (1.6, 0)",
    );
    expect(describeFreeMotion({ kind: "rotation", about: [1.6, 0] }, [{ kind: "pin", id: "s2", label: "nose pin", at: [1.6, 0] }])).toBe(
      "nothing resists rotation about pin s2 (nose pin) (1.6, 0)",
    );
    // a label that starts with the id is not said twice
    const { describeSupport } = await import("@/solver/words");
    expect(describeSupport({ kind: "contact", id: "axle", label: "axle (both wheels)" })).toBe("Contact axle (both wheels)");
    expect(describeSupport({ kind: "contact", id: "rear", label: "rearward pad" })).toBe("Contact rear (rearward pad)");
    expect(describeSupport({ kind: "tie", id: "g1", label: "" })).toBe("Tie g1");
    expect(run("skid-vertical-mechanism.json").warnings[0].message).toBe("Skid: nothing resists motion in x, but the loads do not push that way");
  });
});

describe("every worked example and demo draws its ports where the fluid crosses", () => {
  it("no port of a fixture or an editor example is off its body's outline or drawn against its kind", () => {
    const dirs = ["tests/fixtures/sketches", "canvas/examples"];
    const notes = dirs.flatMap((dir) =>
      readdirSync(dir)
        .filter((f) => f.endsWith(".json") && !f.startsWith("bad-"))
        .flatMap((f) => portDirectionNotes(parsed(JSON.parse(readFileSync(`${dir}/${f}`, "utf8")))).map((n) => `${dir}/${f}: ${n.message}`)),
    );
    expect(notes).toEqual([]);
  });
});
