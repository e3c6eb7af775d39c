// The point moments are taken about inside the solver comes from the supports as drawn, never
// from the mass or the centre of gravity: determinacy is a property of the supports, and the
// least-squares reactions of an unrestrained body do not move with an arbitrary cg.
import { describe, expect, it } from "vitest";
import type { SketchFileInput } from "@/solver";
import { box, expectRel, loadFixture, solved, sketch } from "./helpers";

const G = 10;

/** A unit square on a pin at (0, 0) and a vertical roller at (1, 0), its weight at `cg`. */
const pinAndRoller = (cg: [number, number], mass = 1): SketchFileInput =>
  sketch({
    gravity: G,
    bodies: [{ id: "b", outline: box(1, 1), mass, cg }],
    supports: [
      { id: "pin", body: "b", kind: "pin", at: [0, 0] },
      { id: "r", body: "b", kind: "roller", at: [1, 0], angle: 90 },
    ],
  });

describe("a pin and a roller with the centre of gravity far outside the outline", () => {
  it.each([300, 1e4, -1e4])("cg at x = %s m: determinate, and holds", (x) => {
    const r = solved(pinAndRoller([x, 0.5]));
    expect(r.bodies.b.determinacy).toEqual({ kind: "determinate", degree: 0 });
    expect(r.bodies.b.status).toBe("holds");
    // hand calculation: moments about the pin, R·1 − m·g·x = 0; ΣFy: pin fy + R − m·g = 0
    expectRel(r.reactions.r.n!, 1 * G * x, 1e-9);
    expectRel(r.reactions.pin.fy, 1 * G - 1 * G * x, 1e-9);
    expect(r.reactions.pin.fx).toBe(0);
    expect(r.bodies.b.residual).toEqual({ fx: 0, fy: 0, m: 0 });
  });

  it("determinacy does not change with the mass or the cg (it is the supports' alone)", () => {
    for (const mass of [0, 1, 1e6]) {
      for (const cg of [[0.5, 0.5], [300, 0.5], [1e4, -1e4], [-50, 2e3]] as [number, number][]) {
        expect(solved(pinAndRoller(cg, mass)).bodies.b.determinacy, `mass ${mass}, cg ${cg}`).toEqual({ kind: "determinate", degree: 0 });
      }
    }
  });
});

describe("least-squares reactions of an unrestrained body", () => {
  // a massless unit square on one pin at (0, 0): a downward 50 N at the pin and a 100 N·m couple
  const pinWithCouple = (cg?: [number, number]): SketchFileInput =>
    sketch({
      gravity: 0,
      bodies: [{ id: "b", outline: box(1, 1), mass: 0, ...(cg ? { cg } : {}) }],
      supports: [{ id: "pin", body: "b", kind: "pin", at: [0, 0] }],
      loads: [
        { id: "F", body: "b", kind: "force", at: [0, 0], fx: 0, fy: -50 },
        { id: "C", body: "b", kind: "couple", value: 100 },
      ],
    });

  it.each([undefined, [0, 0], [0, 1], [1, 1], [0.5, 0.5]] as ([number, number] | undefined)[])("a massless body's cg (%s) changes nothing", (cg) => {
    const r = solved(pinWithCouple(cg));
    expect(r.bodies.b.status).toBe("unrestrained");
    expect(r.bodies.b.freeMotion).toEqual({ kind: "rotation", about: [0, 0] });
    // hand calculation: a pin takes any force through it, so it carries the 50 N and only the
    // couple, which no pin resists, is left unbalanced
    expect(r.reactions.pin.fx).toBe(0);
    expectRel(r.reactions.pin.fy, 50, 1e-12);
    expect(r.bodies.b.residual.fx).toBe(0);
    expect(r.bodies.b.residual.fy).toBe(0);
    expectRel(r.bodies.b.residual.m, 100, 1e-12);
  });

  it("a body with mass on one pin: the pin carries its weight, the weight's moment about the pin is left over", () => {
    const r = solved(
      sketch({
        gravity: G,
        bodies: [{ id: "b", outline: box(1, 1), mass: 10, cg: [1, 1] }],
        supports: [{ id: "pin", body: "b", kind: "pin", at: [0, 0] }],
      }),
    );
    expect(r.bodies.b.status).toBe("unrestrained");
    // hand calculation: pin fy = m·g = 100 N; unbalanced moment about (0, 0) = x_cg·(−m·g) = −100 N·m
    expect(r.reactions.pin.fx).toBe(0);
    expectRel(r.reactions.pin.fy, 100, 1e-12);
    expect(r.bodies.b.residual.fy).toBe(0);
    expectRel(r.bodies.b.residual.m, -100, 1e-12);
  });

  it("a pin and a roller at one point: they carry the force, the moment about that point is left over", () => {
    // a unit square of 10 kg (g = 9.81) on a pin and a vertical roller both at (0, 0); 10 N in +x at
    // (0.5, 1), an inlet at (0, 0.5) with 1000 Pa on 0.01 m² (10 N in +x) and equal momentum in and out
    const r = solved(
      sketch({
        gravity: 9.81,
        bodies: [{ id: "b", outline: box(1, 1), mass: 10 }],
        supports: [
          { id: "pin", body: "b", kind: "pin", at: [0, 0] },
          { id: "r", body: "b", kind: "roller", at: [0, 0], angle: 90 },
        ],
        loads: [{ id: "F", body: "b", kind: "force", at: [0.5, 1], fx: 10, fy: 0 }],
        ports: [
          { id: "i", body: "b", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: 1, velocity: 2, pressure: 1000, area: 0.01 },
          { id: "o", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, massFlow: 1, velocity: 2 },
        ],
      }),
    );
    expect(r.bodies.b.status).toBe("unrestrained");
    expect(r.bodies.b.determinacy).toEqual({ kind: "mechanism", degree: 1 });
    expect(r.bodies.b.freeMotion).toEqual({ kind: "rotation", about: [0, 0] });
    // hand calculation: ΣFx = 10 + 10 = 20 N, so pin fx = −20 N; ΣFy: pin fy + roller = m·g = 98.1 N,
    // shared equally by two springs of equal stiffness along y (the contract's least elastic energy)
    expectRel(r.reactions.pin.fx, -20, 1e-12);
    expectRel(r.reactions.pin.fy, 49.05, 1e-12);
    expectRel(r.reactions.r.n!, 49.05, 1e-12);
    // moments about (0, 0): 10 N at height 1 → −10; 10 N at height 0.5 → −5; weight at x 0.5 → −49.05
    expect(r.bodies.b.residual.fx).toBe(0);
    expect(r.bodies.b.residual.fy).toBe(0);
    expectRel(r.bodies.b.residual.m, -64.05, 1e-12);
  });

  it("a body on two frictionless feet pushed sideways: the unbalanced force acts through the feet's centroid", () => {
    const d = loadFixture("skid-on-rollers-unrestrained.json");
    const at = (cg: [number, number]) => solved({ ...d, bodies: [{ ...d.bodies![0], cg }] });
    // hand calculation (fixtures.test.ts): moments about (1, 0), 0.8·(N_right − N_left) − 0.6·100 = 0,
    // the weight through (1, ·) adds none; moving the cg along the same vertical changes nothing
    expect(at([1, 0.5]).reactions.right.n).toBeCloseTo(at([1, 3]).reactions.right.n!, 9);
  });
});
