// A turbojet ground-run cart held by a wheel chock (an invented scenario): the cart rolls freely
// on its rear and front wheels, the chock ahead of the front wheel takes the thrust along its face
// normal (150°, back and up). Which contact lets go first as the throttle opens, and at what
// throttle; the factor of safety against overturning about the mode the cart really has.
//
// Hand calculation, common practice equations: steady-flow linear momentum and moment of momentum
// for a control volume fixed to the cart (any fluid mechanics text), ΣF = Σout ṁV − Σin ṁV with
// the outlet's gauge pressure p·A pushing into the control volume; the air and the fuel enter at
// rest (mass sources). g0 = 9.80665 m/s² (CGPM 1901).
//
//   thrust T = ṁe·Ve + pe·Ae (forward, on the engine axis y = 0.75 m)
//   chock:   T + Nc·cos150° = 0  →  Nc = T / cos30°, lifting the front by Nc·sin150° = T·tan30°
//   moments about the rear wheel (0.4, 0):
//     nF·2.2 − W·1.05 − 0.75·T + Mc = 0, Mc = Nc·(2.2·sin150° − 0.25·cos150°) (the chock's line
//     passes the wheel centre (2.6, 0.25)) = 1.52017·T
//   nF = (1.05·W − 0.77017·T)/2.2 ; nR = W − T·tan30° − nF
// The front wheel lets go (climbs the chock) at T = 1.05·W/0.77017 = 8022 N, thr = 0.9242 (T grows
// with thr², 9391.8 N at thr = 1); the rear would at thr = 1.2004. With the front off, the rear
// wheel and the chock cannot hold it: it tips, turning about the point where their lines of action
// meet, (0.4, 0.125 + 2.4165·tan30°) = (0.4, 1.5202) — not about any support.
import { describe, expect, it } from "vitest";
import { findLimit, parseSketch, solve, solveCases, type OverturningCheck, type SketchFileInput } from "@/solver";
import { createSweeper } from "@/solver/sweep";
import { findTippingWith } from "@/solver/limit";
import { stabilitySentence, statusSentences } from "@/components/results/statusSentence";
import { stabilityLines } from "@/components/results/stabilityCheck";
import { stabilityTable } from "@/solver/report";
import { parsed } from "./helpers";

const g = 9.80665;
const W = 600 * g;
const cos30 = Math.cos(Math.PI / 6);
const tan30 = Math.tan(Math.PI / 6);
const chock: [number, number] = [2.6 + 0.25 * cos30, 0.125];
/** the chock's moment about the rear wheel per newton of thrust: Nc = T/cos30 at lever 2.2·sin150° − 0.25·cos150° */
const kChock = (2.2 * 0.5 + 0.25 * cos30) / cos30;
const thrust = (thr: number) => 1.02 * 14 * thr * 560 * thr + 31000 * thr ** 2 * 0.045;

const cart = (thr: string): SketchFileInput =>
  ({
    format: "counterpoise.sketch",
    version: 1,
    title: "Turbojet ground-run cart on a wheel chock",
    gravity: g,
    parameters: { thr, mda: "14 kg/s * thr", Ve: "560 m/s * thr", pe: "31 kPa * thr^2", Ae: "0.045 m^2" },
    bodies: [{ id: "cart", label: "Cart and engine", mass: 600, cg: [1.45, 0.6], outline: [[0, 0], [3, 0], [3, 0.5], [2.8, 0.5], [2.8, 1], [0.2, 1], [0.2, 0.5], [0, 0.5]] }],
    supports: [
      { id: "rear", label: "rear wheel", body: "cart", kind: "contact", at: [0.4, 0], angle: 90 },
      { id: "front", label: "front wheel", body: "cart", kind: "contact", at: [2.6, 0], angle: 90 },
      { id: "chock", label: "chock", body: "cart", kind: "contact", at: ["2.6 + 0.25*cos(30 deg)", 0.125], angle: 150 },
    ],
    loads: [],
    ports: [{ id: "exhaust", label: "exhaust nozzle", body: "cart", kind: "outlet", at: [0.2, 0.75], angle: 180, massFlow: "1.02 * mda", velocity: "Ve", pressure: "pe", area: "Ae" }],
    massSources: [
      { id: "air", label: "air drawn from still air", body: "cart", massFlow: "mda" },
      { id: "fuel", label: "fuel from the tank", body: "cart", massFlow: "0.02 * mda" },
    ],
  }) as unknown as SketchFileInput;

const near = (got: number | undefined, want: number, scale = Math.abs(want)) => expect(Math.abs((got ?? NaN) - want)).toBeLessThanOrEqual(1e-9 * Math.max(scale, 1));

describe("turbojet cart on a wheel chock, by hand", () => {
  it("at 80 % throttle: the chock takes the thrust, both wheels bear (4 significant figures by hand)", () => {
    const T = thrust(0.8);
    expect(T).toBeCloseTo(6010.752, 3); // 5117.952 of ṁV and 892.8 of p·A
    const nF = (1.05 * W + 0.75 * T - kChock * T) / 2.2;
    const nR = W - T * tan30 - nF;
    const r = solve(parsed(cart("0.8")));
    expect(r.bodies.cart.status).toBe("holds");
    expect(r.bodies.cart.determinacy).toEqual({ kind: "determinate", degree: 0 });
    near(r.reactions.chock.fx, -T, W);
    near(r.reactions.chock.fy, T * tan30, W);
    near(r.reactions.chock.n, T / cos30, W);
    near(r.reactions.front.n, nF, W);
    near(r.reactions.rear.n, nR, W);
    // the hand figures, rounded as written in the calculation
    expect(r.reactions.chock.n).toBeCloseTo(6940.6, 1);
    expect(r.reactions.chock.fy).toBeCloseTo(3470.3, 1);
    expect(r.reactions.front.n).toBeCloseTo(704.04, 2);
    expect(r.reactions.rear.n).toBeCloseTo(1709.6, 1);
    // momentum: Σout ṁV = 11.424 kg/s × 448 m/s toward −x, its moment about the origin −0.75 × (−5117.952)
    near(r.bodies.cart.momentum.fx, -5117.952, W);
    near(r.bodies.cart.momentum.m, 0.75 * 5117.952, W);
    expect(r.warnings).toEqual([]);
  });

  it("the front wheel climbs the chock first, at 92.42 % throttle; the rear would only at 120.0 %", () => {
    const Tfront = (1.05 * W) / (kChock - 0.75);
    const full = thrust(1);
    expect(full).toBeCloseTo(9391.8, 6);
    expect(Tfront).toBeCloseTo(8021.85, 1);
    const thrFront = Math.sqrt(Tfront / full);
    expect(thrFront).toBeCloseTo(0.9242, 4);
    // nR = W·(1 − 1.05/2.2) − T·(tan30 + (0.75 − kChock)/2.2)
    const thrRear = Math.sqrt((W * (1 - 1.05 / 2.2)) / (tan30 + (0.75 - kChock) / 2.2) / full);
    expect(thrRear).toBeCloseTo(1.2004, 4);
    const sk = parsed(cart("0.8"));
    const front = findLimit(sk, "thr", [0.5, 1], { support: "front", component: "n" });
    const rear = findLimit(sk, "thr", [0.5, 1.3], { support: "rear", component: "n" });
    if (!front.found || !rear.found) throw new Error("expected both crossings");
    expect(Math.abs(front.value - thrFront)).toBeLessThanOrEqual(1e-8);
    expect(Math.abs(rear.value - thrRear)).toBeLessThanOrEqual(1e-8);
    // the body's own limit: it stops being held where the front lets go
    const tips = findTippingWith(createSweeper(sk, "thr"), [0.5, 1], "cart");
    if (!tips.found) throw new Error("expected the cart to tip in range");
    expect(Math.abs(tips.value - thrFront)).toBeLessThanOrEqual(1e-7);
  });

  it("at full throttle it tips, turning about where the rear wheel's and the chock's lines of action meet", () => {
    const T = thrust(1);
    const r = solve(parsed(cart("1")));
    expect(r.bodies.cart.status).toBe("tips");
    // the front would have to pull (1.05·W − 0.77017·T)/2.2 = −479.6 N
    near(r.reactions.front.n, (1.05 * W - (kChock - 0.75) * T) / 2.2, W);
    expect(r.reactions.front.n).toBeCloseTo(-479.59, 2);
    expect(r.reactions.front.state).toBe("lifted");
    expect(r.warnings.map((w) => [w.code, w.ids])).toEqual([["LIFTOFF", ["front"]]]);
    const fm = r.bodies.cart.freeMotion;
    if (fm?.kind !== "rotation") throw new Error("expected a rotation");
    near(fm.about[0], 0.4, 1);
    near(fm.about[1], 0.125 + (chock[0] - 0.4) * tan30, 1);
    expect(fm.about[1]).toBeCloseTo(1.5202, 4);
    // in words: the point, and which two supports stay closed while it turns
    expect(statusSentences(parsed(cart("1")), r)[0].headline).toBe(
      "Tips about the point (0.4, 1.52) m, where the lines of action of the rear wheel and the chock meet — the front wheel would have to pull 479.6 N",
    );
  });

  it("against overturning: the factor about that instant centre, W·1.05 over 0.77017·T — the thrust margin to the limit", () => {
    const p = parseSketch(cart("0.8"));
    if (!p.ok) throw new Error("parse");
    const ot = solveCases(p.file).runs[0];
    if (!ot.ok) throw new Error("run");
    const check = ot.stability.cart.overturning as OverturningCheck;
    const T = thrust(0.8);
    const lever = 0.125 + (chock[0] - 0.4) * tan30 - 0.75; // the pivot above the engine axis
    expect(check.about).toBe("rear");
    expect(check.with).toBe("chock");
    expect(check.sense).toBe(1);
    near(check.pivot[1], 0.125 + (chock[0] - 0.4) * tan30, 1);
    near(check.restoring, W * 1.05, W);
    near(check.overturning, lever * T, W);
    expect(check.restoring).toBeCloseTo(6178.2, 1);
    expect(check.overturning).toBeCloseTo(4629.3, 1);
    expect(check.factor).toBeCloseTo(1.3346, 4);
    // T grows with thr², so the factor is (thr at the limit / thr)²: the same finding twice
    expect(check.factor).toBeCloseTo(((1.05 * W) / (kChock - 0.75) / thrust(1) / 0.64), 9);
    expect(check.pass).toBe(false);
    // about the chock alone (both wheels lifting) it is steadier; that mode no longer hides this one
    expect(check.factor).toBeLessThan(1.5);
  });

  it("says so in words: about the instant centre of the rear wheel and the chock, in the sentence, the hand check and the calc sheet's table", () => {
    const p = parseSketch(cart("0.8"));
    if (!p.ok) throw new Error("parse");
    const study = solveCases(p.file);
    const run = study.runs[0];
    if (!run.ok) throw new Error("run");
    const sk = parsed(cart("0.8"));
    expect(stabilitySentence(sk, "cart", run.stability.cart)?.text).toBe(
      "Factors of safety as drawn: against overturning about the instant centre of the rear wheel and the chock 1.33, below the required 1.5",
    );
    const lines = stabilityLines(sk, "cart", run.result.reactions, run.stability.cart);
    expect(lines && "about" in lines.overturning ? lines.overturning.about : null).toBe(
      "the instant centre of the rear wheel and the chock (where their lines of action meet), turning counter-clockwise",
    );
    const table = stabilityTable(study);
    const row = table.rows.find((r) => r.includes("overturning"))!;
    expect(row[row.length - 1]).toBe("the instant centre of rear wheel and chock at (0.4000, 1.520) m");
  });
});
