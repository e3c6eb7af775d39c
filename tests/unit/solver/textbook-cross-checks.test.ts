// More checks of the method against published worked examples, for cases published.test.ts does
// not cover: a reducing elbow that discharges to the atmosphere with β ≠ 1 and a gauge pressure at
// its inlet only, the 180° reversing elbow, the holding torque of a sprinkler (moment of momentum),
// and a free jet on an inclined flat plate. Each names its source; values recalled rather than read
// are marked "from memory", and each is also derived in the test so it does not rest on memory alone.
import { describe, expect, it } from "vitest";
import type { SketchFileInput } from "@/solver";
import { expectRel, sketch, solved } from "./helpers";

/** A file at format version 6 (a port's β needs version 4 or later), gravity off. */
const v6 = (parts: Partial<SketchFileInput>): SketchFileInput => sketch({ gravity: 0, ...parts }, 6);

describe("Çengel & Cimbala, Fluid Mechanics: Fundamentals and Applications, Examples 6-1 and 6-2 (values from memory)", () => {
  // Water at 14 kg/s (ρ = 1000 kg/m³) through a reducing elbow, 113 cm² in, 7 cm² out, the outlet
  // 0.30 m above the inlet and open to the atmosphere; weight neglected; β = 1.03 at both ports.
  // V1 = 14/(1000·0.0113) = 1.239 m/s, V2 = 14/(1000·0.0007) = 20.0 m/s;
  // Bernoulli: P1,gage = ρ(V2² − V1²)/2 + ρ·g·Δz = 202.2 kPa (g = 9.81 m/s² as the book takes it).
  // The anchoring force, with the inlet's pressure force +P1·A1 along the flow (+x):
  //   F_Rx = β·ṁ(V2·cos θ − V1) − P1·A1,   F_Ry = β·ṁ·V2·sin θ
  const mdot = 14;
  const A1 = 0.0113;
  const A2 = 0.0007;
  const V1 = mdot / (1000 * A1);
  const V2 = mdot / (1000 * A2);
  const P1 = (1000 * (V2 * V2 - V1 * V1)) / 2 + 1000 * 9.81 * 0.3;
  const elbow = (theta: number) => {
    const t = (theta * Math.PI) / 180;
    return v6({
      bodies: [{ id: "elbow", outline: [[0, -0.1], [0.5, -0.1], [0.5, 0.5], [0, 0.5]], mass: 0 }],
      supports: [{ id: "anchor", body: "elbow", kind: "fixed", at: [0.25, 0] }],
      ports: [
        { id: "in", body: "elbow", kind: "inlet", at: [0, 0], angle: 0, massFlow: mdot, area: A1, density: 1000, pressure: P1, beta: 1.03 },
        { id: "out", body: "elbow", kind: "outlet", at: [0.25 + 0.2 * Math.cos(t), 0.3], angle: theta, massFlow: mdot, area: A2, density: 1000, beta: 1.03 },
      ],
    });
  };

  it("the inlet gauge pressure is 202.2 kPa", () => {
    expect((P1 / 1000).toFixed(1)).toBe("202.2"); // Example 6-1 (a), from memory
  });

  it("Example 6-1, the elbow deflecting the flow up 30°: F_Rx = −2053 N, F_Ry = 144.2 N", () => {
    const r = solved(elbow(30)).reactions.anchor;
    expectRel(r.fx, -2053, 5e-4); // Example 6-1 (b), from memory
    expectRel(r.fy, 144.2, 5e-4); // Example 6-1 (b), from memory
    // and exactly the hand formula above
    expectRel(r.fx, 1.03 * mdot * (V2 * Math.cos(Math.PI / 6) - V1) - P1 * A1, 1e-9);
    expectRel(r.fy, 1.03 * mdot * V2 * 0.5, 1e-9);
  });

  it("Example 6-2, the reversing elbow (θ = 180°): F_Rx = −β·ṁ(V2 + V1) − P1·A1 = −2591 N, F_Ry = 0", () => {
    const r = solved(elbow(180)).reactions.anchor;
    expectRel(r.fx, -2591, 5e-4); // Example 6-2, from memory
    expectRel(r.fx, -1.03 * mdot * (V2 + V1) - P1 * A1, 1e-9);
    expect(Math.abs(r.fy)).toBeLessThan(1e-9);
  });
});

describe("the holding torque of a sprinkler: moment of momentum (Çengel & Cimbala, Fluid Mechanics: Fundamentals and Applications, chapter 6, the example of power generation from a sprinkler, values from memory)", () => {
  // Four arms, the nozzles 0.6 m from the axis, 1 cm jets pointing tangentially, 20 L/s entering
  // along the axis (a mass source at the centre: no momentum in the plane). Plan view, no gravity.
  // V_jet = Q/(4·A) = 0.02/(4·π/4·0.01²) = 63.66 m/s.
  // Held still: T0 = Σ r × ṁV = 4·r·(ρQ/4)·V_jet = ρ·Q·V_jet·r = 763.9 N·m.
  // Turning at 300 rpm the jets leave at V_jet − ω·r = 63.66 − 18.85 = 44.81 m/s in a fixed frame:
  // T = ρ·Q·(V_jet − ω·r)·r = 537.7 N·m, and the power T·ω = 16.9 kW.
  const rho = 1000;
  const Q = 0.02;
  const r0 = 0.6;
  const Vjet = Q / (4 * (Math.PI / 4) * 0.01 ** 2);
  const omega = (300 * 2 * Math.PI) / 60;
  const head = (V: number) =>
    v6({
      bodies: [{ id: "head", outline: [[-0.7, -0.7], [0.7, -0.7], [0.7, 0.7], [-0.7, 0.7]], mass: 0 }],
      supports: [{ id: "shaft", body: "head", kind: "fixed", at: [0, 0] }],
      ports: [
        [r0, 0, 90],
        [0, r0, 180],
        [-r0, 0, 270],
        [0, -r0, 0],
      ].map(([x, y, a], i) => ({ id: `n${i}`, body: "head", kind: "outlet" as const, at: [x, y] as [number, number], angle: a, massFlow: (rho * Q) / 4, velocity: V })),
      massSources: [{ id: "supply", body: "head", massFlow: rho * Q }],
    });

  it("held still: 763.9 N·m, and no net force", () => {
    const s = solved(head(Vjet)).reactions.shaft;
    expect(Vjet.toFixed(2)).toBe("63.66");
    expectRel(s.m, 763.9, 1e-4); // the stationary (maximum) torque, from memory
    expectRel(s.m, rho * Q * Vjet * r0, 1e-9);
    expect(Math.hypot(s.fx, s.fy)).toBeLessThan(1e-9);
  });

  it("at 300 rpm: 537.7 N·m and 16.9 kW", () => {
    const s = solved(head(Vjet - omega * r0)).reactions.shaft;
    expectRel(s.m, 537.7, 2e-4); // from memory
    expect(((s.m * omega) / 1000).toFixed(1)).toBe("16.9"); // the electric power, from memory
  });
});

describe("a free jet on an inclined flat plate (the classic result, from memory: F = ṁ·V·sin θ normal to the plate, the flow split Q(1 ± cos θ)/2)", () => {
  // A 50 mm water jet at 20 m/s along +x strikes a plate inclined at θ = 60° to it. Without
  // friction along the plate there is no tangential force, so the tangential momentum is conserved:
  //   ṁ·V·cos θ = ṁ1·V − ṁ2·V and ṁ1 + ṁ2 = ṁ  →  ṁ1 = ṁ(1 + cos θ)/2, ṁ2 = ṁ(1 − cos θ)/2,
  // every stream at V (Bernoulli, open to the air). The plate's support then takes ṁ·V·sin θ, normal to it.
  const rho = 1000;
  const V = 20;
  const mdot = rho * (Math.PI / 4) * 0.05 ** 2 * V; // 39.27 kg/s
  const theta = 60;
  const c = Math.cos((theta * Math.PI) / 180);
  const plate = v6({
    bodies: [{ id: "plate", outline: [[-0.3, -0.5], [0.3, -0.5], [0.3, 0.5], [-0.3, 0.5]], mass: 0 }],
    supports: [{ id: "post", body: "plate", kind: "fixed", at: [0, 0] }],
    ports: [
      { id: "jet", body: "plate", kind: "inlet", at: [-0.3, 0], angle: 0, massFlow: mdot, velocity: V },
      { id: "up", body: "plate", kind: "outlet", at: [0.25, 0.433], angle: theta, massFlow: (mdot * (1 + c)) / 2, velocity: V },
      { id: "down", body: "plate", kind: "outlet", at: [-0.25, -0.433], angle: theta + 180, massFlow: (mdot * (1 - c)) / 2, velocity: V },
    ],
  });

  it("680.2 N normal to the plate, nothing along it", () => {
    const s = solved(plate).reactions.post;
    const F = mdot * V * Math.sin((theta * Math.PI) / 180);
    expect(F.toPrecision(4)).toBe("680.2");
    expectRel(Math.hypot(s.fx, s.fy), F, 1e-9);
    // along the plate (60°): zero; across it the support pushes the plate back toward the jet, at 150°
    const t = ((theta * Math.PI) / 180) as number;
    expect(Math.abs(s.fx * Math.cos(t) + s.fy * Math.sin(t))).toBeLessThan(1e-9 * F);
    expectRel(s.fx * Math.cos(t + Math.PI / 2) + s.fy * Math.sin(t + Math.PI / 2), F, 1e-9);
  });
});
