// The roof-fan example and demo (an invented scenario: a 1 m axial fan on a roof frame; its figures
// are typical of such a fan, from memory) against a hand calculation, the textbook control-volume
// momentum balance (any fluid mechanics text):
//
//   ΣF(reactions) + W + ΣF(wind) + ΣF(pressure) = Σ_out ṁ·V − Σ_in ṁ·V
//   ΣM_P(the same forces)                        = Σ_out r × ṁ·V − Σ_in r × ṁ·V
//
// with ṁ = ρ·Q, V = Q/A at each port, the gauge pressure's force p·A pushing inward (along the flow
// at an inlet), r × F = x·Fy − y·Fx, moments counter-clockwise positive, and the wind as q·Cf per
// square metre of the casing's end, q = ½ρv² (common practice). g0 = 9.80665 m/s² (CGPM 1901).
// Every figure is worked from the drawing's own numbers, never read from the solver.
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { runLimit } from "@/canvas/studies/run";
import { DEMO_SKETCHES, demoVersions } from "@/db/seed-sketches";
import { parseSketch, solve, solveCases, type SolveResult } from "@/solver";
import { handCheckTable } from "@/solver/report";

const g = 9.80665;
const example = exampleById("roof-fan")!;
type V2 = [number, number];
const moment = (r: V2, F: V2, P: V2): number => (r[0] - P[0]) * F[1] - (r[1] - P[1]) * F[0];

// the drawing: 340 kg at (0.65, 0.75) m; feet at x = 0.15 and 1.05 m on y = 0, μ = 0.6; the
// bell-mouth (1 m bore) at (0, 0.75) m drawing air in along +x; the 0.8 m cowl at (0.8, 1.6) m
// blowing straight up (θ = 90°); the wind on the discharge end, 1.1 m wide from y = 0.2 to 1.6 m, along −x
const rho = 1.2;
const W = 340 * g; // 3334 N
const cg: V2 = [0.65, 0.75];
const bell: V2 = [0, 0.75];
const cowl: V2 = [0.8, 1.6];
const inletFoot: V2 = [0.15, 0];
const span = 1.05 - 0.15;
const Abell = (Math.PI / 4) * 1 ** 2; // 0.7854 m²
const Acowl = (Math.PI / 4) * 0.8 ** 2; // 0.5027 m²
const Cf = 1.1;
const windAt: V2 = [1.2, (0.2 + 1.6) / 2]; // the resultant of a uniform load: mid-height

/** The hand calculation at flow Q (m³/s) and wind v (m/s), the cowl blowing straight up. */
function byHand(Q: number, v: number) {
  const mdot = rho * Q; // ṁ = ρ·Q
  const Vin = Q / Abell; // V = Q/A
  const Vout = Q / Acowl;
  const pBell = -1.05 * 0.5 * rho * Vin ** 2; // the bell-mouth's gauge pressure, −1.05 velocity pressures
  const Pbell: V2 = [pBell * Abell, 0]; // p·A along the flow at an inlet: negative, so toward −x
  const fluxIn: V2 = [mdot * Vin, 0]; // ṁ·V entering along +x
  const fluxOut: V2 = [0, mdot * Vout]; // ṁ·V leaving along +y
  const wind: V2 = [-0.5 * rho * v ** 2 * Cf * 1.1 * (1.6 - 0.2), 0]; // q·Cf·width per metre × height
  const weight: V2 = [0, -W];
  // ΣFx: t_in + t_out + wind + Pbell = fluxOut_x − fluxIn_x; both feet on y = 0 with one stiffness
  // move alike, so each takes half (indeterminate to degree 1, the share of equal springs)
  const fluxX = fluxOut[0] - fluxIn[0];
  const fluxY = fluxOut[1];
  const T = fluxX - wind[0] - Pbell[0];
  // ΣFy: N_in + N_out − W = fluxOut_y
  const N = fluxY + W;
  // ΣM about the inlet-end foot: span·N_out + M(W) + M(wind) + M(Pbell) = M(flux out) − M(flux in)
  const mFlux = moment(cowl, fluxOut, inletFoot) - moment(bell, fluxIn, inletFoot);
  const mLoads = moment(cg, weight, inletFoot) + moment(windAt, wind, inletFoot) + moment(bell, Pbell, inletFoot);
  const Nout = (mFlux - mLoads) / span;
  return { mdot, Vin, Vout, pBell, Pbell, fluxIn, fluxOut, wind, fluxX, fluxY, t: T / 2, Nout, Nin: N - Nout, mFlux };
}

function solved(doc: unknown): SolveResult {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return solve(p.sketch);
}

/** The solver's reaction equal to the hand value within 1e-9 relative, and the hand value to 4 figures. */
function agree(solver: number, hand: number, fourFigures: string) {
  expect(hand.toPrecision(4), `hand value ${hand}`).toBe(fourFigures);
  expect(Math.abs(solver - hand), `solver ${solver} vs hand ${hand}`).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(hand)));
}

describe("the roof-fan example by hand", () => {
  it("the flows: ṁ = ρQ = 9.6 kg/s, 10.19 m/s at the bell-mouth at −65.36 Pa, 15.92 m/s out of the cowl", () => {
    const h = byHand(8, 30);
    expect(h.mdot).toBeCloseTo(9.6, 12);
    expect(h.Vin.toPrecision(4)).toBe("10.19");
    expect(h.Vout.toPrecision(4)).toBe("15.92");
    expect(h.pBell.toPrecision(4)).toBe("-65.36");
    expect(h.Pbell[0].toPrecision(4)).toBe("-51.34"); // p·A
    expect(h.fluxIn[0].toPrecision(4)).toBe("97.78"); // ṁ·V in
    expect(h.fluxOut[1].toPrecision(4)).toBe("152.8"); // ṁ·V out, straight up
    expect(h.wind[0].toPrecision(4)).toBe("-914.8");
    const r = solved(example.sketch);
    const m = r.bodies.fan.momentum;
    expect(m.fx).toBeCloseTo(h.fluxX, 9);
    expect(m.fy).toBeCloseTo(h.fluxY, 9);
  });

  it("as drawn (running, 30 m/s wind): every reaction, from ΣFx, ΣFy and ΣM about the inlet-end foot", () => {
    const h = byHand(8, 30);
    const r = solved(example.sketch);
    expect(r.bodies.fan.status).toBe("holds");
    agree(r.reactions.inlet_foot.fx, h.t, "434.2");
    agree(r.reactions.outlet_foot.fx, h.t, "434.2");
    agree(r.reactions.inlet_foot.fy, h.Nin, "2400");
    agree(r.reactions.outlet_foot.fy, h.Nout, "1087");
    expect(r.reactions.inlet_foot.state).toBe("bearing");
    expect(r.reactions.outlet_foot.state).toBe("bearing");
  });

  it("each case: the fan running without wind, running in 30 m/s, stopped in 30 m/s (Q = 0: no flow and no suction)", () => {
    const p = parseSketch(example.sketch);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const study = solveCases(p.file);
    const run = (id: string) => {
      const x = study.runs.find((c) => c.id === id);
      if (!x?.ok) throw new Error(`case ${id} did not solve`);
      return x;
    };
    const expected: Array<[string, ReturnType<typeof byHand>, [string, string, string]]> = [
      ["running", byHand(8, 0), ["-23.22", "1486", "2001"]],
      ["running-wind", byHand(8, 30), ["434.2", "2400", "1087"]],
      ["stopped-wind", byHand(0, 30), ["457.4", "2397", "937.6"]],
    ];
    for (const [id, h, [t, nIn, nOut]] of expected) {
      const res = run(id).result;
      expect(res.bodies.fan.status, id).toBe("holds");
      agree(res.reactions.inlet_foot.fx, h.t, t);
      agree(res.reactions.outlet_foot.fx, h.t, t);
      agree(res.reactions.inlet_foot.fy, h.Nin, nIn);
      agree(res.reactions.outlet_foot.fy, h.Nout, nOut);
    }
    // the factors as drawn at 30 m/s: sliding μ·ΣN over ΣT (common practice); overturning about the
    // inlet-end foot, each force's components taken apart as restoring (clockwise here) or
    // overturning (counter-clockwise), the inflow's momentum acting on the fan along +x and the jet's as −ṁV
    const h = byHand(8, 30);
    const slidingByHand = (0.6 * (h.Nin + h.Nout)) / Math.abs(2 * h.t);
    const sliding = run("running-wind").stability.fan.sliding;
    expect("factor" in sliding && sliding.factor).toBeCloseTo(slidingByHand, 9);
    const P = inletFoot;
    const restoring = W * (cg[0] - P[0]) + h.fluxIn[0] * bell[1] + h.fluxOut[1] * (cowl[0] - P[0]);
    const overturning = -h.wind[0] * windAt[1] - h.Pbell[0] * bell[1];
    const ot = run("running-wind").stability.fan.overturning;
    expect("factor" in ot && ot.factor).toBeCloseTo(restoring / overturning, 9);
    expect((restoring / overturning).toFixed(2)).toBe("2.13");
    expect(example.sketch.description).toContain(`factors of ${(restoring / overturning).toFixed(2)} against overturning and ${slidingByHand.toFixed(2)} against sliding`);
  });

  it("the notes' figures: the fan's pull toward its inlet, the jet's push down, and the bell-mouth's pressure", () => {
    const h = byHand(8, 30);
    const d = example.sketch.description ?? "";
    // the flow's net force on the fan: p·A − (Σout − Σin) ṁV
    expect(`${Math.round(h.Pbell[0] - h.fluxX)} N toward its discharge end`).toBe("46 N toward its discharge end");
    expect(d).toContain("46 N toward its discharge end");
    expect(d).toContain(`${Math.round(h.fluxOut[1])} N down`);
    expect(d).toContain(`−${Math.round(-h.pBell)} Pa gauge`);
    expect(d).toContain(`${h.Vin.toFixed(1)} m/s`);
    expect(d).toContain(`${h.Vout.toFixed(1)} m/s`);
  });

  it("where the wind lifts the discharge-end foot and where that foot slips: closed forms against the limit finder", () => {
    // N_out = 0: the wind's moment about the inlet-end foot reaches what holds the discharge end down
    const k = 0.5 * rho * Cf * 1.1 * (1.6 - 0.2); // N of wind per (m/s)²
    const windMomentPerV2 = k * windAt[1]; // N·m per (m/s)²
    const stopped = byHand(0, 0);
    const running = byHand(8, 0);
    // at v = 0 the discharge-end foot carries N_out(0)·span of moment to spare
    const vLiftStopped = Math.sqrt((stopped.Nout * span) / windMomentPerV2);
    const vLiftRunning = Math.sqrt((running.Nout * span) / windMomentPerV2);
    expect(vLiftStopped.toFixed(1)).toBe("42.7");
    expect(vLiftRunning.toFixed(1)).toBe("44.4");
    for (const [caseId, v] of [["stopped-wind", vLiftStopped], ["running-wind", vLiftRunning]] as const) {
      const lim = runLimit(example.sketch, { parameter: "v", from: 20, to: 50, caseId, quantity: { support: "outlet_foot", component: "margin" }, target: 0 });
      if (!lim.found) throw new Error(lim.reason);
      expect(lim.value, caseId).toBeCloseTo(v, 4);
    }
    // stopped, that foot slips where its half of the wind reaches μ·N_out: k·v²/2 = 0.6·(N_out(0) − k·h·v²/span)
    const vSlip = Math.sqrt((0.6 * stopped.Nout) / (k / 2 + (0.6 * windMomentPerV2) / span));
    expect(vSlip.toFixed(1)).toBe("31.5");
    const slip = runLimit(example.sketch, { parameter: "v", from: 20, to: 50, caseId: "stopped-wind", quantity: { support: "outlet_foot", component: "frictionMargin" }, target: 0 });
    if (!slip.found) throw new Error(slip.reason);
    expect(slip.value).toBeCloseTo(vSlip, 4);
    const d = example.sketch.description ?? "";
    expect(d).toContain(`slips on its pad at ${vSlip.toFixed(1)} m/s and lifts at ${vLiftStopped.toFixed(1)} m/s`);
    expect(d).toContain(`until ${vLiftRunning.toFixed(1)} m/s`);
    expect(example.summary).toContain(`lifts at ${vLiftStopped.toFixed(1)} m/s`);
  });

  it("its terms read as a checker writes them in the hand-check lines", () => {
    const r = solved(example.sketch);
    const eq = r.equations.fan;
    expect([...eq.forces, ...eq.momentum].map((t) => t.label)).toEqual([
      "reaction at “inlet-end foot”",
      "reaction at “discharge-end foot”",
      "weight of “Axial fan”",
      "distributed load “wind” (resultant)",
      "pressure at “bell-mouth inlet”",
      "momentum in at “bell-mouth inlet”, as −ṁV",
      "momentum out at “discharge cowl”",
    ]);
    // ΣM about the inlet-end foot, as the hand-check view prints it: both sides agree
    const h = byHand(8, 30);
    const table = handCheckTable(r, "fan", inletFoot, "SI");
    const kNm = (h.mFlux / 1000).toPrecision(4);
    expect(kNm).toBe("0.1727");
    expect(table.notes?.[0]).toContain(`ΣM about (0.1500, 0) m = ${kNm} kN·m and Σ r × ṁV = ${kNm} kN·m`);
    expect(table.notes?.[2]).toContain("agree to 4 significant figures in ΣFx, ΣFy and ΣM");
  });
});

describe("the roof-fan demo (a7) by hand, version by version", () => {
  const demo = DEMO_SKETCHES.find((s) => s.id === "6d656d6f-0000-4000-8000-0000000000a7")!;
  const versions = demoVersions(demo);
  const runOf = (doc: unknown, id: string) => {
    const p = parseSketch(doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const x = solveCases(p.file).runs.find((c) => c.id === id);
    if (!x?.ok) throw new Error(`case ${id} did not solve`);
    return x;
  };

  it("v1 is the example as the menu opens it, under the demo's name", () => {
    const fileOf = (doc: unknown) => {
      const p = parseSketch(doc);
      if (!p.ok) throw new Error(JSON.stringify(p.errors));
      return p.file;
    };
    expect(versions).toHaveLength(3);
    expect(versions[0].doc.title).toBe(demo.title);
    expect({ ...fileOf(versions[0].doc), title: example.sketch.title }).toEqual(fileOf(example.sketch));
  });

  it("v2 at the 45 m/s design wind: the discharge-end foot would have to pull, running or stopped, so the fan tips", () => {
    const doc = versions[1].doc;
    for (const [id, Q, pull] of [["stopped-wind", 0, "-205.8"], ["running-wind", 8, "-56.79"]] as const) {
      const run = runOf(doc, id);
      expect(run.name).toBe(`Fan ${Q ? "running" : "stopped"}, 45 m/s design wind`);
      expect(run.result.bodies.fan.status, id).toBe("tips");
      expect(run.result.reactions.outlet_foot.state, id).toBe("lifted");
      expect(byHand(Q, 45).Nout.toPrecision(4), id).toBe(pull);
    }
  });

  it("v3 bolted (a pin and a roller): the pin takes every sideways newton, the roller holds the discharge end down", () => {
    const doc = versions[2].doc;
    const expected = [["running-wind", 8, "2012", "3544", "-56.79"], ["stopped-wind", 0, "2058", "3540", "-205.8"]] as const;
    for (const [id, Q, pinFx, pinFy, rollerN] of expected) {
      const h = byHand(Q, 45);
      const res = runOf(doc, id).result;
      expect(res.bodies.fan.status, id).toBe("holds");
      agree(res.reactions.inlet_foot.fx, 2 * h.t, pinFx);
      agree(res.reactions.inlet_foot.fy, h.Nin, pinFy);
      agree(res.reactions.outlet_foot.fy, h.Nout, rollerN);
      expect(res.reactions.outlet_foot.fx).toBe(0);
    }
    const stopped = byHand(0, 45);
    expect(String(doc.description)).toContain(`${((2 * stopped.t) / 1000).toFixed(1)} kN with the fan stopped, and the discharge-end bolts hold that foot down with ${Math.round(-stopped.Nout)} N`);
  });
});
