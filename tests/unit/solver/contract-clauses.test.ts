// Clauses of the sketch-file contract (../shared/spec/sketch-file.md) that no other test pins down,
// each against a hand calculation written out beside it (statics of a rigid body on springs, and
// the control-volume momentum equation: any statics or fluid mechanics text).
import { describe, expect, it } from "vitest";
import { parseSketch, type SketchFileInput } from "@/solver";
import { box, expectRel, sketch, solved } from "./helpers";

const g = 9.80665;
const codes = (doc: SketchFileInput) => solved(doc).warnings.map((w) => w.code);
const errorsOf = (doc: unknown) => {
  const p = parseSketch(doc);
  return p.ok ? [] : p.errors;
};

describe("motion: a prescribed acceleration (d'Alembert: −m·a at the centre of gravity)", () => {
  it("a 100 kg box on a pin and a roller, accelerated at (2, 1) m/s²", () => {
    const r = solved(
      sketch({
        bodies: [{ id: "b", outline: box(2, 1), mass: 100 }],
        supports: [
          { id: "pin", body: "b", kind: "pin", at: [0, 0] },
          { id: "roller", body: "b", kind: "roller", at: [2, 0], angle: 90 },
        ],
        motion: { ax: 2, ay: 1 },
      }),
    );
    // inertial force −m·a = (−200, −100) N and weight (0, −980.665) N, both at the centroid (1, 0.5)
    // ΣFx: fx − 200 = 0                                   → fx = 200 N
    // ΣM about the pin: 2·n − 1·980.665 + [1·(−100) − 0.5·(−200)] = 0 → n = 490.3 N
    // ΣFy: fy + n − 980.665 − 100 = 0                     → fy = 590.3 N
    const n = (1 * 100 * g) / 2;
    expectRel(r.reactions.pin.fx, 200, 1e-9);
    expectRel(r.reactions.roller.n!, n, 1e-9);
    expectRel(r.reactions.pin.fy, 100 * g + 100 - n, 1e-9);
    expect(r.bodies.b.acceleration).toEqual({ ax: 2, ay: 1 });
    expect(r.bodies.b.status).toBe("holds");
  });

  it("applies to every body of the sketch (format version 1), each solved on its own", () => {
    // two bodies of 100 kg and 300 kg, each on its own pin and roller, gravity 0, ax = 1.5 m/s²:
    // each pin takes m·a = 150 N and 450 N in x; the inertial force acts at each centroid (y = 0.5),
    // so each roller carries m·a·0.5/2 = 37.5 N and 112.5 N, the pin the opposite in y
    const body = (id: string, x: number, mass: number) => ({ id, outline: box(2, 1, x, 0), mass });
    const held = (id: string, x: number) => [
      { id: `${id}-pin`, body: id, kind: "pin" as const, at: [x, 0] as [number, number] },
      { id: `${id}-rol`, body: id, kind: "roller" as const, at: [x + 2, 0] as [number, number], angle: 90 },
    ];
    const r = solved(sketch({ gravity: 0, bodies: [body("a", 0, 100), body("c", 5, 300)], supports: [...held("a", 0), ...held("c", 5)], motion: { ax: 1.5, ay: 0 } }));
    expectRel(r.reactions["a-pin"].fx, 150, 1e-9);
    expectRel(r.reactions["c-pin"].fx, 450, 1e-9);
    // ΣM about the pin: 2·n − 0.5·(−m·a) = 0 → n = −m·a/4
    expectRel(r.reactions["a-rol"].n!, -37.5, 1e-9);
    expectRel(r.reactions["c-rol"].n!, -112.5, 1e-9);
    expect(r.bodies.c.acceleration).toEqual({ ax: 1.5, ay: 0 });
  });
});

describe("stiffness", () => {
  // three vertical rollers at x = 0, 1, 2 and a horizontal one, all on y = 0; 1000 N down at x = 0.
  // A rigid bar on springs k_i: the compression is d(x) = a + b·x and R_i = k_i·d(x_i):
  //   Σ k_i (a + b·x_i) = P,   Σ k_i x_i (a + b·x_i) = P·x_P = 0
  const row = (k: [number | undefined, number | undefined, number | undefined]) =>
    sketch({
      bodies: [{ id: "b", outline: box(2, 1), mass: 0 }],
      supports: [
        { id: "r0", body: "b", kind: "roller", at: [0, 0], angle: 90, ...(k[0] === undefined ? {} : { stiffness: k[0] }) },
        { id: "r1", body: "b", kind: "roller", at: [1, 0], angle: 90, ...(k[1] === undefined ? {} : { stiffness: k[1] }) },
        { id: "r2", body: "b", kind: "roller", at: [2, 0], angle: 90, ...(k[2] === undefined ? {} : { stiffness: k[2] }) },
        { id: "h", body: "b", kind: "roller", at: [1, 0], angle: 0 },
      ],
      loads: [{ id: "P", body: "b", kind: "force", at: [0, 0], fx: 0, fy: -1000 }],
    });

  it("a support without one takes the mean of the given ones", () => {
    // k = (1, 2, 3)·1e9 — the middle one has none and takes (1 + 3)/2:
    //   6a + 8b = P, 8a + 14b = 0  →  b = −0.4·P, a = 0.7·P
    //   R0 = 1·0.7P = 700 N, R1 = 2·0.3P = 600 N, R2 = 3·(−0.1P) = −300 N
    const r = solved(row([1e9, undefined, 3e9]));
    expectRel(r.reactions.r0.n!, 700, 1e-6);
    expectRel(r.reactions.r1.n!, 600, 1e-6);
    expectRel(r.reactions.r2.n!, -300, 1e-6);
    // the same as writing the mean out
    const written = solved(row([1e9, 2e9, 3e9]));
    expectRel(written.reactions.r1.n!, r.reactions.r1.n!, 1e-9);
  });

  it("none given: all share one, the elastic method R_i = P/n + M·x_i/Σx²", () => {
    // about the middle roller: M = −1000·(0 − 1) = +1000 N·m, Σx² = 2:
    // R0 = 333.3 + 1000·(−1)/2 = 833.3 N, R1 = 333.3 N, R2 = 333.3 − 500 = −166.7 N
    const r = solved(row([undefined, undefined, undefined]));
    expectRel(r.reactions.r0.n!, 1000 / 3 + 500, 1e-6);
    expectRel(r.reactions.r1.n!, 1000 / 3, 1e-6);
    expectRel(r.reactions.r2.n!, 1000 / 3 - 500, 1e-6);
  });

  it("a fixed support's default rotational stiffness is k·L², L the diagonal of the outline's bounding box", () => {
    // a 2 × 1 body (L² = 5) on a fixed support at (0, 0) and a vertical roller at (2, 0), equal k,
    // 1000 N down at x = 0.5. Unknowns uy, θ: fixed fy = −k·uy, its couple −k·L²·θ, roller −k(uy + 2θ)
    //   ΣFy: −k·uy − k(uy + 2θ) − P = 0                   → 2uy + 2θ = −P/k
    //   ΣM about (0, 0): −5k·θ − 2k(uy + 2θ) − 0.5·P = 0  → −2uy − 9θ = 0.5·P/k
    //   → θ = P/(14k), uy = −4P/(7k): fy = 4P/7 = 571.4 N, roller 3P/7 = 428.6 N, m = −5P/14 = −357.1 N·m
    const doc = (rotationalStiffness?: number) =>
      sketch({
        bodies: [{ id: "b", outline: box(2, 1), mass: 0 }],
        supports: [
          { id: "fix", body: "b", kind: "fixed", at: [0, 0], ...(rotationalStiffness === undefined ? {} : { rotationalStiffness }) },
          { id: "rol", body: "b", kind: "roller", at: [2, 0], angle: 90 },
        ],
        loads: [{ id: "P", body: "b", kind: "force", at: [0.5, 0], fx: 0, fy: -1000 }],
      });
    const r = solved(doc());
    expectRel(r.reactions.fix.fy, 4000 / 7, 1e-6);
    expectRel(r.reactions.rol.n!, 3000 / 7, 1e-6);
    expectRel(r.reactions.fix.m, -5000 / 14, 1e-6);
    // the default stiffness is 1e9 N/m, so writing k·L² = 5e9 N·m/rad out gives the same
    const written = solved(doc(5e9));
    expectRel(written.reactions.fix.m, r.reactions.fix.m, 1e-9);
  });

  it("a friction contact's tangential stiffness equals its normal stiffness", () => {
    // two friction contacts at (0, 0) k = 1e9 and (2, 0) k = 3e9, 400 N along +x through y = 0:
    // a rigid body slides both alike, so t splits as the stiffnesses: −100 N and −300 N
    // (the normals are statics: the 1000 kg weight at x = 1 halves, 4903 N each)
    const r = solved(
      sketch({
        bodies: [{ id: "b", outline: box(2, 1), mass: 1000 }],
        supports: [
          { id: "a", body: "b", kind: "contact", at: [0, 0], angle: 90, mu: 0.5, stiffness: 1e9 },
          { id: "c", body: "b", kind: "contact", at: [2, 0], angle: 90, mu: 0.5, stiffness: 3e9 },
        ],
        loads: [{ id: "F", body: "b", kind: "force", at: [1, 0], fx: 400, fy: 0 }],
      }),
    );
    expectRel(r.reactions.a.fx, -100, 1e-6);
    expectRel(r.reactions.c.fx, -300, 1e-6);
    expectRel(r.reactions.a.n!, (1000 * g) / 2, 1e-6);
    expectRel(r.reactions.c.n!, (1000 * g) / 2, 1e-6);
  });
});

describe("margin of a lifted contact is −stiffness·gap", () => {
  it("three equal contacts, the unloaded end one lifts", () => {
    // contacts at x = 0, 1 (with μ, for x) and 2; 1000 N down at x = 1.8. Bilateral, the elastic
    // method gives R0 = 333.3 − 800/2 < 0: it lifts. The other two then carry it by statics:
    // n1 = 1000·(2 − 1.8)/1 = 200 N, n2 = 800 N. Their compressions n/k lie on the rigid body's
    // line, so at x = 0 the compression is 2·n1/k − n2/k = −400/k: a gap of 400/k, margin −400 N
    const r = solved(
      sketch({
        bodies: [{ id: "b", outline: box(2, 1), mass: 0 }],
        supports: [
          { id: "c0", body: "b", kind: "contact", at: [0, 0], angle: 90 },
          { id: "c1", body: "b", kind: "contact", at: [1, 0], angle: 90, mu: 0.3 },
          { id: "c2", body: "b", kind: "contact", at: [2, 0], angle: 90 },
        ],
        loads: [{ id: "P", body: "b", kind: "force", at: [1.8, 0], fx: 0, fy: -1000 }],
      }),
    );
    expect(r.bodies.b.status).toBe("lifts");
    expect(r.reactions.c0.state).toBe("lifted");
    expect(r.reactions.c0.n).toBe(0);
    expectRel(r.reactions.c1.n!, 200, 1e-6);
    expectRel(r.reactions.c2.n!, 800, 1e-6);
    expectRel(r.reactions.c0.margin!, -400, 1e-6);
    expectRel(r.reactions.c1.margin!, 200, 1e-6);
  });
});

describe("a tie pulls along its angle, toward its anchor, and its margin is −stiffness·slack once slack", () => {
  it("a bar on a pin with two ties overhead: the inner tie would push, goes slack, and the outer one carries it", () => {
    // pin at x = 0, ties at x = 1 and 2 pulling up (angle 90), equal springs; 1500 N up at x = 1
    // and 1000 N down at x = 2. Bilateral (rigid bar, deflection a + b·x up): a = 2000/(3k),
    // b = −500/k, so the inner tie would carry −k(a + b) = −166.7 N: it would push → slack.
    // Released: ΣM about the pin: 2·T2 + 1500·1 − 1000·2 = 0 → T2 = 250 N; ΣFy: fy = −750 N.
    // Then a = 750/k (the pin's spring), a + 2b = −250/k: the bar rises 250/k at x = 1 toward the
    // inner tie's anchor, a slack of 250/k: margin −250 N.
    const r = solved(
      sketch({
        bodies: [{ id: "b", outline: box(2, 0.2), mass: 0 }],
        supports: [
          { id: "pin", body: "b", kind: "pin", at: [0, 0] },
          { id: "t1", body: "b", kind: "tie", at: [1, 0.2], angle: 90 },
          { id: "t2", body: "b", kind: "tie", at: [2, 0.2], angle: 90 },
        ],
        loads: [
          { id: "up", body: "b", kind: "force", at: [1, 0.2], fx: 0, fy: 1500 },
          { id: "down", body: "b", kind: "force", at: [2, 0.2], fx: 0, fy: -1000 },
        ],
      }),
    );
    expect(r.bodies.b.status).toBe("lifts");
    expect(r.reactions.t1.state).toBe("slack");
    expect(r.reactions.t1.n).toBe(0);
    expect(r.reactions.t2.state).toBe("taut");
    expectRel(r.reactions.t2.n!, 250, 1e-6);
    expectRel(r.reactions.t2.fy, 250, 1e-6); // along 90°: up, toward the anchor
    expectRel(r.reactions.pin.fy, -750, 1e-6);
    expectRel(r.reactions.t1.margin!, -250, 1e-6);
    expect(r.warnings.map((w) => w.code)).toContain("SLACK");
  });
});

describe("a distributed load is N/m of the line's true length, downward by default", () => {
  it("a triangular load on a 3-4-5 line: ½·300·5 = 750 N at two thirds of the way, x = 2 m", () => {
    const r = solved(
      sketch({
        bodies: [{ id: "b", outline: box(3, 4), mass: 0 }],
        supports: [
          { id: "pin", body: "b", kind: "pin", at: [0, 0] },
          { id: "rol", body: "b", kind: "roller", at: [3, 0], angle: 90 },
        ],
        loads: [{ id: "w", body: "b", kind: "distributed", from: [0, 0], to: [3, 4], w1: 0, w2: 300 }],
      }),
    );
    // ΣM about the pin: 3·n − 750·2 = 0 → n = 500 N; ΣFy: fy = 750 − 500 = 250 N; ΣFx: 0
    expectRel(r.reactions.rol.n!, 500, 1e-9);
    expectRel(r.reactions.pin.fy, 250, 1e-9);
    expect(Math.abs(r.reactions.pin.fx)).toBeLessThan(1e-9);
  });
});

describe("a roller is bilateral: either sign, never lifted", () => {
  it("a CCW couple of 100 N·m on a pin and a roller 1 m away: the roller pulls 100 N", () => {
    const r = solved(
      sketch({
        bodies: [{ id: "b", outline: box(1, 1), mass: 0 }],
        supports: [
          { id: "pin", body: "b", kind: "pin", at: [0, 0] },
          { id: "rol", body: "b", kind: "roller", at: [1, 0], angle: 90 },
        ],
        loads: [{ id: "C", body: "b", kind: "couple", value: 100 }],
      }),
    );
    // ΣM about the pin: 1·n + 100 = 0 → n = −100 N; the pin pushes +100 N
    expectRel(r.reactions.rol.n!, -100, 1e-9);
    expectRel(r.reactions.pin.fy, 100, 1e-9);
    expect(r.reactions.rol.state).toBe("active");
    expect(r.bodies.b.status).toBe("holds");
    expect(r.warnings).toEqual([]);
  });
});

describe("freeX with a support that restrains x is an error naming that support", () => {
  const doc = (support: Record<string, unknown>) =>
    sketch({
      bodies: [{ id: "b", outline: box(2, 1), mass: 10 }],
      supports: [{ id: "w1", body: "b", kind: "contact", at: [0, 0], angle: 90 }, { id: "s", body: "b", at: [2, 0], ...support } as never],
      motion: { freeX: true },
    });
  it.each([
    ["a friction contact", { kind: "contact", angle: 90, mu: 0.3 }],
    ["a roller whose line has an x-component", { kind: "roller", angle: 60 }],
    ["a tie at an angle", { kind: "tie", angle: -45 }],
    ["a fixed support", { kind: "fixed" }],
  ])("%s", (_name, support) => {
    expect(errorsOf(doc(support)).map((e) => e.path)).toEqual(["supports[1]"]);
  });
  it("a frictionless contact or roller along y is allowed", () => {
    expect(errorsOf(doc({ kind: "contact", angle: 90 }))).toEqual([]);
    expect(errorsOf(doc({ kind: "roller", angle: -90 }))).toEqual([]);
  });
});

describe("how a port's ṁ and V are found, and the 0.5 % agreement", () => {
  const body = { id: "b", outline: box(1, 1), mass: 0 };
  const held = [{ id: "fix", body: "b", kind: "fixed" as const, at: [0, 0] as [number, number] }];
  const jet = (port: Record<string, unknown>) =>
    sketch({ bodies: [body], supports: held, ports: [{ id: "p", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, ...port } as never] });

  it("ṁ: massFlow first, then density·volumeFlow, then density·area·velocity", () => {
    // ρ·Q = 1000·0.03 = 30 kg/s is used before ρ·A·V = 1000·0.01·2 = 20 kg/s; V = 2 m/s given → ṁV = 60 N
    expectRel(solved(jet({ density: 1000, volumeFlow: 0.03, area: 0.01, velocity: 2 })).bodies.b.momentum.fx, 60, 1e-9);
    // massFlow 10 kg/s over both; V = 2 → 20 N
    expectRel(solved(jet({ massFlow: 10, density: 1000, volumeFlow: 0.03, area: 0.01, velocity: 2 })).bodies.b.momentum.fx, 20, 1e-9);
  });

  it("V: velocity first, then ṁ/(density·area), then volumeFlow/area", () => {
    // ṁ = 10 kg/s; ṁ/(ρA) = 10/(1000·0.01) = 1 m/s is used before Q/A = 0.012/0.01 = 1.2 m/s → ṁV = 10 N
    expectRel(solved(jet({ massFlow: 10, density: 1000, area: 0.01, volumeFlow: 0.012 })).bodies.b.momentum.fx, 10, 1e-9);
    // only volumeFlow/area: V = 0.012/0.01 = 1.2 m/s → 12 N
    expectRel(solved(jet({ massFlow: 10, area: 0.01, volumeFlow: 0.012 })).bodies.b.momentum.fx, 12, 1e-9);
  });

  it("PORT_INCONSISTENT only past 0.5 %", () => {
    // ṁ = 10 kg/s against ρ·A·V = 1000·0.01·V: 0.4 % off is within, 0.6 % off warns
    expect(codes(jet({ massFlow: 10, density: 1000, area: 0.01, velocity: 1.004 }))).not.toContain("PORT_INCONSISTENT");
    expect(codes(jet({ massFlow: 10, density: 1000, area: 0.01, velocity: 1.006 }))).toContain("PORT_INCONSISTENT");
  });

  it("MASS_IMBALANCE only past 0.5 % of the larger side", () => {
    const through = (out: number) =>
      sketch({
        bodies: [body],
        supports: held,
        ports: [
          { id: "i", body: "b", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: 10, velocity: 1 },
          { id: "o", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, massFlow: out, velocity: 1 },
        ],
      });
    expect(codes(through(10.04))).not.toContain("MASS_IMBALANCE"); // 0.04/10.04 = 0.40 %
    expect(codes(through(10.06))).toContain("MASS_IMBALANCE"); // 0.06/10.06 = 0.60 %
    // a mass source counts on the inlet side
    const fed = sketch({
      bodies: [body],
      supports: held,
      ports: [{ id: "o", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, massFlow: 10, velocity: 1 }],
      massSources: [{ id: "m", body: "b", massFlow: 10 }],
    });
    expect(codes(fed)).not.toContain("MASS_IMBALANCE");
  });
});

describe("a unitless number is already in the field's SI unit (degrees for an angle)", () => {
  it("a force of \"100\" at \"30\" is 100 N at 30°", () => {
    const r = solved(
      sketch({
        bodies: [{ id: "b", outline: box(1, 1), mass: 0 }],
        supports: [{ id: "fix", body: "b", kind: "fixed", at: [0, 0] }],
        loads: [{ id: "F", body: "b", kind: "force", at: [0, 0], magnitude: "100", angle: "30" }],
      }),
    );
    // the fixed support balances it: (−86.60, −50.00) N
    expectRel(r.reactions.fix.fx, -100 * Math.cos(Math.PI / 6), 1e-9);
    expectRel(r.reactions.fix.fy, -50, 1e-9);
  });

  it("a result with a unit is converted to the field's SI unit: an angle in rad to degrees, a force in lbf to N", () => {
    // 0.5 rad = 28.648° (180/π per rad); 100 lbf = 444.82 N (NIST SP 811: 1 lbf = 4.4482216152605 N)
    const r = solved(
      sketch({
        bodies: [{ id: "b", outline: box(1, 1), mass: 0 }],
        supports: [{ id: "fix", body: "b", kind: "fixed", at: [0, 0] }],
        loads: [{ id: "F", body: "b", kind: "force", at: [0, 0], magnitude: "100 lbf", angle: "0.5 rad" }],
      }),
    );
    expectRel(r.reactions.fix.fx, -444.82216152605 * Math.cos(0.5), 1e-9);
    expectRel(r.reactions.fix.fy, -444.82216152605 * Math.sin(0.5), 1e-9);
  });
});
