// The limit finder on a range that starts where the quantity already sits at the target: a front
// contact off the ground at the low end of a jet-angle range has n = 0 there, and "where does n
// reach zero?" is where it lifts (the end of that run), not the range's first value.
import { describe, expect, it } from "vitest";
import { findLimit } from "@/solver/limit";
import { G0 } from "@/solver/constants";
import { box, expectRel, parsed, sketch } from "./helpers";

// A 4 m × 2 m block on three equal contacts at x = 0, 2 and 4 (μ 0.8 each), its weight W at
// x = 2.4, and a jet leaving at (1, 2), angle θ up from +x, with ṁV = 1000 N.
const m = 100;
const W = m * G0;
const mV = 1000;
const block = () =>
  sketch({
    parameters: { theta: "30 deg" },
    bodies: [{ id: "b", outline: box(4, 2), mass: m, cg: [2.4, 1] }],
    supports: [
      { id: "rear", body: "b", kind: "contact", at: [0, 0], angle: 90, mu: 0.8 },
      { id: "mid", body: "b", kind: "contact", at: [2, 0], angle: 90, mu: 0.8 },
      { id: "front", body: "b", kind: "contact", at: [4, 0], angle: 90, mu: 0.8 },
    ],
    ports: [{ id: "jet", body: "b", kind: "outlet", at: [1, 2], angle: "theta", massFlow: 10, velocity: mV / 10 }],
    massSources: [{ id: "feed", body: "b", massFlow: 10 }],
  });

/**
 * The front contact's normal force with all three contacts bearing. Equal springs under a rigid
 * base share the load linearly in x (the rigid-base rule, common practice):
 * n_i = N/3 − M·(x_i − 2)/Σ(x_j − 2)², with N = W + ṁV·sin θ the vertical load and
 * M = ṁV·(sin θ + 2·cos θ) − 0.4·W the moment of the loads about (2, 0), counter-clockwise (the jet's
 * reaction −ṁV(cos θ, sin θ) acts at r = (−1, 2); the weight 0.4 m ahead). Σ(x_j − 2)² = 8, so
 * n_front = N/3 − M/4; the contacts' tangential springs act at y = 0 and add no moment.
 */
function frontN(thetaDeg: number): number {
  const t = (thetaDeg * Math.PI) / 180;
  const N = W + mV * Math.sin(t);
  const M = mV * (Math.sin(t) + 2 * Math.cos(t)) - 0.4 * W;
  return N / 3 - M / 4;
}

/** θ at which n_front = 0, by bisection of the closed form (negative below it: the contact lifts). */
function liftAngle(): number {
  let lo = 0;
  let hi = 90;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (frontN(mid) < 0) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe("a limit search that starts inside a run at the target", () => {
  it("answers where the front contact's normal force reaches zero, not the range's start", () => {
    const exact = liftAngle();
    // the closed form lifts the front contact at θ = 0 and lets it bear at 90°: the range starts off the ground
    expect(frontN(0)).toBeLessThan(0);
    expect(frontN(90)).toBeGreaterThan(0);
    expect(exact).toBeGreaterThan(5);
    const sk = parsed(block());
    const n = findLimit(sk, "theta", [0, 90], { support: "front", component: "n" });
    if (!n.found) throw new Error("expected a crossing");
    // within the solver's force tolerance of the closed form (n snaps to 0 just before it lifts)
    expectRel(n.value, exact, 1e-6);
    expect(n.crossings).toHaveLength(1);
    // the margin (negative while lifted) crosses at the same angle
    const margin = findLimit(sk, "theta", [0, 90], { support: "front", component: "margin" });
    if (!margin.found) throw new Error("expected a crossing");
    expectRel(margin.value, exact, 1e-6);
  });

  it("still answers the range's start when the quantity is at the target all the way", () => {
    const exact = liftAngle();
    const n = findLimit(parsed(block()), "theta", [0, exact / 2], { support: "front", component: "n" });
    expect(n).toMatchObject({ found: true, value: 0, crossings: [0] });
  });
});
