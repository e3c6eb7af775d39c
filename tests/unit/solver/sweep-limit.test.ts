// Sweeps and the limit finder.
import { describe, expect, it } from "vitest";
import { findLimit, linspace, parseSketch, solve, solveSweep, brent } from "@/solver";
import { G0 } from "@/solver/constants";
import { box, expectRel, loadFixture, sketch } from "./helpers";

const parse = (doc: unknown) => {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.sketch;
};

describe("solveSweep", () => {
  it("re-evaluates the swept parameter and what depends on it, and leaves the sketch as parsed", () => {
    const sk = parse(loadFixture("pipe-bend-anchor.json"));
    const before = JSON.stringify(sk);
    const sweep = solveSweep(sk, "theta", [30, 60, 90]);
    expect(sweep.unit).toBe("deg");
    expect(sweep.points).toHaveLength(3);
    const at60 = sweep.points[1];
    expect(at60.ok).toBe(true);
    if (at60.ok) expect(at60.result.reactions.anchor.fx).toBeCloseTo(solve(sk).reactions.anchor.fx, 9);
    // the outlet moved with theta (its position is an expression of theta)
    const at90 = sweep.points[2];
    if (at90.ok) expect(at90.result.equations.bend.momentum[1].at).toEqual([expect.closeTo(0, 12), 0.6]);
    expect(JSON.stringify(sk)).toBe(before);
  });

  it("each point equals a fresh parse with that value", () => {
    const doc = loadFixture("fire-monitor-trailer.json");
    const sk = parse(doc);
    const values = [5, 25, 45];
    const sweep = solveSweep(sk, "theta", values);
    values.forEach((v, i) => {
      const fresh = solve(parse({ ...doc, parameters: { ...doc.parameters, theta: `${v} deg` } }));
      const p = sweep.points[i];
      if (!p.ok) throw new Error();
      for (const id of ["leg", "wheel", "jack"]) {
        expect(p.result.reactions[id].fx).toBeCloseTo(fresh.reactions[id].fx, 6);
        expect(p.result.reactions[id].fy).toBeCloseTo(fresh.reactions[id].fy, 6);
        expect(p.result.reactions[id].state).toBe(fresh.reactions[id].state);
      }
    });
  });

  it("a value that makes a field invalid gives that point's errors, not an exception", () => {
    const sk = parse(sketch({ parameters: { a: "0.01 m^2" }, bodies: [{ id: "b", outline: box(1, 1), mass: 0 }], supports: [{ id: "s", body: "b", kind: "fixed", at: [0, 0] }], ports: [{ id: "p", body: "b", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: 0, pressure: 1e5, area: "a" }] }));
    const sweep = solveSweep(sk, "a", [0.02, -0.01]);
    expect(sweep.points[0].ok).toBe(true);
    expect(sweep.points[1]).toEqual({ value: -0.01, ok: false, errors: [{ path: "ports[0].area", message: "must be more than zero" }] });
  });

  it("points share the terms and warnings the swept parameter leaves alone, and each still equals a fresh solve", () => {
    const doc = loadFixture("fire-monitor-trailer.json");
    const sk = parse(doc);
    const sweep = solveSweep(sk, "theta", [10, 20]);
    const [a, b] = sweep.points;
    if (!a.ok || !b.ok) throw new Error("does not solve");
    const termsA = Object.values(a.result.equations).flatMap((e) => [...e.forces, ...e.momentum]);
    const termsB = Object.values(b.result.equations).flatMap((e) => [...e.forces, ...e.momentum]);
    // the weight does not depend on the jet's angle: one object; the jet's momentum term does
    const weight = (ts: typeof termsA) => ts.find((t) => t.kind === "weight")!;
    const jet = (ts: typeof termsA) => ts.find((t) => t.kind === "momentum" && t.label.startsWith("momentum out"))!;
    expect(weight(termsB)).toBe(weight(termsA));
    expect(jet(termsB)).not.toBe(jet(termsA));
    expect(jet(termsB).fx).not.toBeCloseTo(jet(termsA).fx, 3);
    // sharing changes no value: each point is what a fresh parse and solve gives
    [10, 20].forEach((v, i) => {
      const p = sweep.points[i];
      if (!p.ok) throw new Error("does not solve");
      const fresh = solve(parse({ ...doc, parameters: { ...doc.parameters, theta: `${v} deg` } }));
      expect(p.result.equations).toEqual(fresh.equations);
      expect(p.result.warnings).toEqual(fresh.warnings);
    });
  });

  it("only a sweep shares: single solves, before and after one, make their own terms", () => {
    const sk = parse(loadFixture("fire-monitor-trailer.json"));
    const weightOf = () => Object.values(solve(sk).equations).flatMap((e) => e.forces).find((t) => t.kind === "weight")!;
    expect(weightOf()).not.toBe(weightOf());
    solveSweep(sk, "theta", [10, 20]);
    expect(weightOf()).not.toBe(weightOf());
    expect(weightOf()).toEqual(weightOf());
  });

  it("refuses a parameter the sketch does not have", () => {
    const sk = parse(loadFixture("pipe-bend-anchor.json"));
    expect(() => solveSweep(sk, "phi", [1])).toThrow(/no parameter "phi" \(it has rho, Q, D1, D2, A1, A2, p1, p2, theta, flowFactor\)/);
  });
});

describe("findLimit", () => {
  it("the jet angle at which a contact's normal force reaches zero, against a closed form", () => {
    // A block of weight W on a pin at x = 0 and a contact at x = b, with one jet of thrust J at
    // (x0, y0) leaving at angle θ. The jet's reaction on the block is −J(cos θ, sin θ). Moments
    // about the pin: b·N − W·xg + [x0·(−J sin θ) − y0·(−J cos θ)] = 0, so
    //   N(θ) = (W·xg + J·(x0·sin θ − y0·cos θ)) / b,
    // and N = 0 where x0·sin θ − y0·cos θ = −W·xg/J, i.e. R·sin(θ − φ) = −W·xg/J with
    // R = √(x0² + y0²), φ = atan2(y0, x0):  θ = φ + asin(−W·xg/(J·R)).
    const W = 120 * G0;
    const xg = 0.5;
    const b = 1.0;
    const J = 1500;
    const [x0, y0] = [0.2, 0.9];
    const doc = sketch({
      parameters: { theta: "0 deg" },
      bodies: [{ id: "blk", outline: box(1, 1), mass: 120, cg: [xg, 0.5] }],
      supports: [
        { id: "pin", body: "blk", kind: "pin", at: [0, 0] },
        { id: "pad", body: "blk", kind: "contact", at: [b, 0], angle: 90 },
      ],
      ports: [{ id: "jet", body: "blk", kind: "outlet", at: [x0, y0], angle: "theta", massFlow: 15, velocity: 100 }],
      massSources: [{ id: "feed", body: "blk", massFlow: 15 }],
    });
    const R = Math.hypot(x0, y0);
    const phi = Math.atan2(y0, x0);
    const theta = ((phi + Math.asin((-W * xg) / (J * R))) * 180) / Math.PI;
    const lim = findLimit(parse(doc), "theta", [-10, 60], { support: "pad", component: "margin" });
    expect(lim.found).toBe(true);
    if (lim.found) {
      expectRel(lim.value, theta, 1e-8);
      expect(lim.unit).toBe("deg");
    }
  });

  it("the flow at which friction is used up (μ·n − |t| = 0)", () => {
    // A skid on one friction contact and one frictionless contact under a horizontal jet J = ṁ·V:
    // the friction contact carries all of J. Friction is used up where μ·n = J.
    const doc = sketch({
      parameters: { mdot: "5 kg/s" },
      bodies: [{ id: "s", outline: box(2, 1), mass: 400, cg: [1, 0.5] }],
      supports: [
        { id: "grip", body: "s", kind: "contact", at: [0, 0], angle: 90, mu: 0.3 },
        { id: "slide", body: "s", kind: "contact", at: [2, 0], angle: 90 },
      ],
      ports: [{ id: "jet", body: "s", kind: "outlet", at: [2, 0], angle: 0, massFlow: "mdot", velocity: 40 }],
      massSources: [{ id: "m", body: "s", massFlow: "mdot" }],
    });
    const sk = parse(doc);
    const lim = findLimit(sk, "mdot", [0, 100], { support: "grip", component: "frictionMargin" });
    // the jet acts on the line of the contacts (y = 0): n = W/2 whatever the flow
    const expected = (0.3 * (400 * G0) / 2) / 40;
    expect(lim.found).toBe(true);
    if (lim.found) expectRel(lim.value, expected, 1e-8);
  });

  it("no crossing in the range is a clear answer, with the range of the quantity", () => {
    const sk = parse(loadFixture("pump-skid-discharge.json"));
    const lim = findLimit(sk, "mdot", [0, 20], { support: "front", component: "n" });
    expect(lim.found).toBe(false);
    if (!lim.found) {
      expect(lim.reason).toBe("no crossing in this range: the quantity stays above 0 from 0 to 20");
      expect(lim.min).toBeGreaterThan(0);
    }
  });

  it("a sweep's sign changes agree with findLimit to the sweep's resolution", () => {
    const sk = parse(loadFixture("thrust-stand-tips.json"));
    const values = linspace(0, 3, 61); // kN, step 0.05
    const sweep = solveSweep(sk, "T", values);
    const margins = sweep.points.map((p) => (p.ok ? p.result.reactions.rear.margin! : NaN));
    const i = margins.findIndex((m, k) => k > 0 && Math.sign(m) !== Math.sign(margins[k - 1]));
    const lim = findLimit(sk, "T", [0, 3], { support: "rear", component: "margin" });
    expect(lim.found).toBe(true);
    if (lim.found) {
      expect(lim.value).toBeGreaterThanOrEqual(values[i - 1]);
      expect(lim.value).toBeLessThanOrEqual(values[i]);
      // and against T = W·d/h (common practice): 200·g0·0.8/1.5 N
      expectRel(lim.value * 1000, (200 * G0 * 0.8) / 1.5, 1e-8);
    }
  });

  // A 4 m × 1 m block of 1000 kg (cg at x = 2) on three level frictionless contacts at x = 0, 2
  // and 4 of equal stiffness, lifted by an upward force T at x = 0.5.
  const W = 1000 * G0;
  const threeFeet = () =>
    parse(
      sketch({
        parameters: { T: "1 kN" },
        bodies: [{ id: "b", outline: box(4, 1), mass: 1000 }],
        supports: [0, 2, 4].map((x, i) => ({ id: `c${i}`, body: "b", kind: "contact" as const, at: [x, 0] as [number, number], angle: 90 })),
        loads: [{ id: "lift", body: "b", kind: "force", at: [0.5, 1], fx: 0, fy: "T" }],
      }),
    );

  it("finds where the body starts to tip, and the margin crosses zero there", () => {
    // Once c0 has lifted, the block stands on c1 and c2. Moments about c2 (x = 4), statics:
    //   n1·(2 − 4) + T·(0.5 − 4) − W·(2 − 4) = 0  →  n1 = (2W − 3.5T)/2,
    // so c1 lifts, and with it the block tips about c2, at T = 2W/3.5 = 5603.8 N. Past it the
    // result reports the reactions every support bilateral would need (c1 then carries about
    // 1.4 kN), but the margin goes on as n1 = (2W − 3.5T)/2, the pull c1 would need.
    const sk = threeFeet();
    const before = solveSweep(sk, "T", [5.6, 5.61]).points.map((p) => (p.ok ? p.result : null)!);
    expect(before[0].bodies.b.status).toBe("lifts");
    expect(before[1].bodies.b.status).toBe("tips");
    expectRel(before[0].reactions.c1.margin!, (2 * W - 3.5 * 5600) / 2, 1e-6);
    expectRel(before[1].reactions.c1.margin!, (2 * W - 3.5 * 5610) / 2, 1e-6);
    const lim = findLimit(sk, "T", [5, 6], { support: "c1", component: "margin" });
    expect(lim.found).toBe(true);
    if (lim.found) {
      expectRel(lim.value * 1000, (2 * W) / 3.5, 1e-8);
      expect(lim.crossings).toHaveLength(1);
    }
    // c2 bears on both sides of the change and never reaches zero: no limit there
    expect(findLimit(sk, "T", [5, 6], { support: "c2", component: "n" }).found).toBe(false);
  });

  it("a quantity that falls to zero and stays there: its limit is where it gets there, counted once", () => {
    // All three bear while T is small. Equal springs under a rigid block share the load as
    // n_i = P/3 + M·(x_i − x̄)/Σ(x_j − x̄)² (the elastic method, common practice), with the net
    // downward load P = W − T and the moment of T about x̄ = 2 giving M·(x_i − x̄)/8 = −1.5·T·(x_i − 2)/8:
    //   n0 = (W − T)/3 − 1.5·T·2/8 = 0  at  T = W/(1 + 9/8) = 8W/17 = 4614.9 N.
    // Past it c0 has lifted and its n stays exactly 0.
    const sk = threeFeet();
    const expected = (8 * W) / 17;
    for (const component of ["n", "margin"] as const) {
      const lim = findLimit(sk, "T", [0, 5], { support: "c0", component });
      expect(lim.found).toBe(true);
      if (lim.found) {
        expectRel(lim.value * 1000, expected, 1e-8);
        expect(lim.crossings).toEqual([lim.value]);
      }
    }
  });

  it("Brent's method on a function with a known root", () => {
    const f = (x: number) => x ** 3 - 2 * x - 5; // root 2.0945514815423265 (Wallis's example)
    expect(brent(f, 2, 3, f(2), f(3), 1e-14)).toBeCloseTo(2.0945514815423265, 12);
  });
});
