// A fire-fighting monitor on a two-axle trailer (our own scenario), built as a user builds it:
// parameters with units ("Q = 1500 gpm", "theta = 30 deg"), fields typed with units. The support
// reactions are checked against a hand calculation with the steady control-volume momentum
// equations, ΣF = Σ ṁV(out) − Σ ṁV(in) and ΣM = Σ r × ṁV(out) − Σ r × ṁV(in), with the inlet's
// gauge pressure force p·A pushing into the control volume (Fox & McDonald, Introduction to Fluid
// Mechanics, ch. 4, linear momentum and moment of momentum for a control volume; White, Fluid
// Mechanics, ch. 3 — from memory). 1 US gal = 3.785411784 L and 1 in = 25.4 mm exactly (NIST SP
// 811); g = 9.80665 m/s² (standard gravity).
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { solveFile } from "@/solver";
import { solveCases } from "@/solver/cases";
import { emptySketch } from "@/canvas/model/elements";
import { mirrorElements } from "@/canvas/commands/mirror";

const G = 9.80665;
const GAL = 3.785411784e-3;
const IN = 0.0254;

/** The trailer as drawn in the editor: 5 m long, 1.4 m to the deck (wheels inside the control volume), a riser for the monitor; braked rear axle a pin, front axle a roller. */
function trailer(extra: Partial<SketchFile> = {}): SketchFile {
  return {
    ...emptySketch("Monitor trailer"),
    parameters: { Q: "1500 gpm", theta: "30 deg", p_in: "100 psi", rho: "998 kg/m^3" },
    bodies: [
      {
        id: "b1",
        label: "Trailer",
        outline: [[0, 0], [5, 0], [5, 1.4], [3.2, 1.4], [3, 2.2], [2.2, 2.2], [2, 1.4], [0, 1.4]],
        mass: "1800 kg",
        cg: [2.4, 1],
      },
    ],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [1.2, 0], label: "rear axle" },
      { id: "s2", body: "b1", kind: "roller", at: [3.8, 0], angle: 90, label: "front axle" },
    ],
    loads: [],
    ports: [
      // the supply hose comes in from behind, level, at 100 psi gauge: a 5 in hose
      { id: "p1", body: "b1", kind: "inlet", at: [0, 0.9], angle: 0, volumeFlow: "Q", density: "rho", area: "pi / 4 * (5 in)^2", pressure: "p_in", label: "supply hose" },
      // the nozzle: a 2 in tip, a free jet (0 gauge) at theta above the horizontal, forward
      { id: "p2", body: "b1", kind: "outlet", at: [2.6, 2.2], angle: "theta", volumeFlow: "Q", density: "rho", area: "pi / 4 * (2 in)^2", label: "nozzle" },
    ],
    ...extra,
  } as SketchFile;
}

/** The hand calculation, in SI, step by step. */
function hand(thetaDeg = 30) {
  const Q = (1500 * GAL) / 60; // m³/s
  const rho = 998;
  const mdot = rho * Q; // kg/s
  const aIn = (Math.PI / 4) * (5 * IN) ** 2;
  const aOut = (Math.PI / 4) * (2 * IN) ** 2;
  const vIn = Q / aIn;
  const vOut = Q / aOut;
  const p = (100 * 4.4482216152605) / (IN * IN); // Pa
  const th = (thetaDeg * Math.PI) / 180;
  const W = 1800 * G;
  // momentum flux out minus in (vectors)
  const outX = mdot * vOut * Math.cos(th);
  const outY = mdot * vOut * Math.sin(th);
  const inX = mdot * vIn;
  const pA = p * aIn; // along +x, into the control volume
  // ΣFx: Rx + pA = outX − inX
  const rx = outX - inX - pA;
  // moments about the pin (1.2, 0), counter-clockwise positive; r × F = rx·Fy − ry·Fx
  const mW = (2.4 - 1.2) * -W;
  const mP = -(0.9 - 0) * pA;
  const mOut = (2.6 - 1.2) * outY - (2.2 - 0) * outX;
  const mIn = -(0.9 - 0) * inX;
  // 2.6·N + mW + mP = mOut − mIn
  const n = (mOut - mIn - mW - mP) / (3.8 - 1.2);
  // ΣFy: Ry + N − W = outY
  const ry = outY + W - n;
  return { mdot, vIn, vOut, pA, rx, ry, n };
}

describe("a fire-fighting monitor on a two-axle trailer", () => {
  it("the hand calculation's own numbers are what they should be", () => {
    const h = hand();
    // 1500 gpm = 0.09464 m³/s; ρQ = 94.45 kg/s; 5 in hose 7.47 m/s, 2 in tip 46.7 m/s; p·A = 689.5 kPa × 0.01267 m² = 8.73 kN
    expect(h.mdot).toBeCloseTo(94.446, 3);
    expect(h.vIn).toBeCloseTo(7.471, 3);
    expect(h.vOut).toBeCloseTo(46.69, 2);
    expect(h.pA).toBeCloseTo(8734.1, 0);
  });

  it("the solver's reactions agree with the hand calculation", () => {
    const r = solveFile(trailer());
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    const h = hand();
    const pin = r.reactions.s1 as unknown as { fx: number; fy: number };
    const roller = r.reactions.s2 as unknown as { fx: number; fy: number };
    // rear axle: Fx −5.62 kN (the hose's pressure pushes the trailer forward, the jet's reaction
    // pulls it back), Fy 10.49 kN; front axle 9.37 kN up
    expect(pin.fx).toBeCloseTo(h.rx, 3);
    expect(pin.fy).toBeCloseTo(h.ry, 3);
    expect(roller.fy).toBeCloseTo(h.n, 3);
    expect(roller.fx).toBeCloseTo(0, 6);
    expect(h.rx).toBeCloseTo(-5620.6, 0);
    expect(h.ry).toBeCloseTo(10486.5, 0);
    expect(h.n).toBeCloseTo(9370.4, 0);
  });

  it("an operating case that raises the nozzle to 60° moves the reactions as the hand calculation says", () => {
    const s = trailer({ cases: [{ id: "c1", name: "High lob", parameters: { theta: "60 deg" } }] });
    const run = solveCases(s).runs.find((c) => c.id === "c1")!;
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    const h = hand(60);
    expect((run.result.reactions.s1 as unknown as { fx: number }).fx).toBeCloseTo(h.rx, 3);
    expect((run.result.reactions.s2 as unknown as { fy: number }).fy).toBeCloseTo(h.n, 3);
    // raised, the jet's reaction pushes less back high up (which lifts the front about the rear
    // axle) and more down ahead of the rear axle: the front axle takes more than at 30° (11.6 kN)
    expect(h.n).toBeGreaterThan(hand(30).n);
    expect(h.n).toBeCloseTo(11605.3, 0);
  });

  it("mirrored left–right (the hose from the front, the jet back over the tow bar) the reactions mirror", () => {
    const m = mirrorElements.run(trailer(), { ids: [], axis: "leftRight" });
    const r = solveFile(m);
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    const h = hand();
    const pin = r.reactions.s1 as unknown as { fx: number; fy: number };
    expect(pin.fx).toBeCloseTo(-h.rx, 3);
    expect(pin.fy).toBeCloseTo(h.ry, 3);
    expect((r.reactions.s2 as unknown as { fy: number }).fy).toBeCloseTo(h.n, 3);
  });
});
