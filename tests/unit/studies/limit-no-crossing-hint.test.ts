// The limit finder when the target is not reached in the range: where the quantity came closest,
// which way it goes at each end, and the wider range worth a search — checked against statics
// worked by hand for a stand on a front pin and a rear contact (common practice).
import { describe, expect, it } from "vitest";
import { findLimit } from "@/solver";
import { G0 } from "@/solver/constants";
import { compactNoLimitHint, noLimitHint, rangeWords, roundOut, widestOf } from "@/solver/limitHint";
import { box, expectRel, parsed, sketch } from "../solver/helpers";
import { tieBeam } from "./tie-beam";

// A 200 kg stand (weight at x = 1 m) on a front pin at x = 2 m and a rear contact at x = 0 facing
// up. Moments about the pin: −2·n + W·1 + M_load = 0, so n = (W + M_load)/2.
const W = 200 * G0;
const shown = (si: number) => `${(si / 1000).toFixed(4)} kN`;

describe("a thrust T in +x at 1.2 m: the rear lifts at T = W·d/h (common practice)", () => {
  // M_load = −1.2·T → n = (W − 1.2·T)/2, zero at T* = W/1.2 = 1634.4 N (d = 1 m from the pin to
  // the weight, h = 1.2 m)
  const sk = parsed(
    sketch({
      parameters: { T: "500 N" },
      bodies: [{ id: "s", outline: box(2, 1.5), mass: 200, cg: [1, 0.7] }],
      supports: [
        { id: "front", body: "s", kind: "pin", at: [2, 0] },
        { id: "rear", body: "s", kind: "contact", at: [0, 0], angle: 90 },
      ],
      loads: [{ id: "thrust", body: "s", kind: "force", at: [0, 1.2], fx: "T", fy: 0 }],
    }),
  );
  const Tstar = W / 1.2;

  it("searched from 0 to 1000 N: no crossing, closest at 1000 N with n = (W − 1200)/2, heading for zero near T*", () => {
    const r = findLimit(sk, "T", [0, 1000], { support: "rear", component: "margin" });
    if (r.found) throw new Error("found");
    expectRel(r.closest!.at, 1000, 1e-12);
    expectRel(r.closest!.value, (W - 1200) / 2, 1e-9);
    expect(r.ends!.lo).toEqual({ toward: false });
    expect(r.ends!.hi.toward).toBe(true);
    // n is linear in T: the line through the last two samples is the exact one
    expectRel(r.ends!.hi.estimate!, Tstar, 1e-9);
    const hint = noLimitHint(r, { from: 0, to: 1000 }, { parameter: "T", pName: "T", target: "0 kN", shown });
    expect(hint.words).toBe(
      "It comes closest at T = 1,000 N, where it is 0.3807 kN. Past 1,000 N it is still heading for 0 kN: a straight line through the last samples reaches it near T = 1,634 N (an extrapolation, not a finding).",
    );
    // half as far again past the end as the line says (1.5 × 634.4 = 951.7 N), rounded out to 10 N
    expect(hint.wider).toEqual({ from: 0, to: 1960 });
    expect(rangeWords(hint.wider!, "N")).toBe("from 0 to 1,960 N");
    // and the wider search finds it
    const again = findLimit(sk, "T", [hint.wider!.from, hint.wider!.to], { support: "rear", component: "margin" });
    if (!again.found) throw new Error("not found");
    expectRel(again.value, Tstar, 1e-8);
  });

  it("a range typed high to low is offered high to low", () => {
    const r = findLimit(sk, "T", [1000, 0], { support: "rear", component: "margin" });
    if (r.found) throw new Error("found");
    expect(noLimitHint(r, { from: 1000, to: 0 }, { parameter: "T", pName: "T", target: "0 kN", shown }).wider).toEqual({ from: 1960, to: 0 });
  });
});

describe("a force of 500 N turned through θ at the rear top corner: the margin dips inside the range and rises at both ends", () => {
  // F·(cos θ, sin θ) at (0, 1.2): its moment about the pin (2, 0) is −F·(2·sin θ + 1.2·cos θ), so
  // n = (W − F·(2·sin θ + 1.2·cos θ))/2, least where 2·sin θ + 1.2·cos θ is largest: at
  // θ = atan2(2, 1.2) = 59.04°, n = (W − F·√(2² + 1.2²))/2 = 397.6 N
  const F = 500;
  const sk = parsed(
    sketch({
      parameters: { theta: "30 deg" },
      bodies: [{ id: "s", outline: box(2, 1.5), mass: 200, cg: [1, 0.7] }],
      supports: [
        { id: "front", body: "s", kind: "pin", at: [2, 0] },
        { id: "rear", body: "s", kind: "contact", at: [0, 0], angle: 90 },
      ],
      loads: [{ id: "pull", body: "s", kind: "force", at: [0, 1.2], magnitude: F, angle: "theta" }],
    }),
  );

  it("finds the least margin and where, and offers no wider range", () => {
    const r = findLimit(sk, "theta", [20, 100], { support: "rear", component: "margin" });
    if (r.found) throw new Error("found");
    const at = (Math.atan2(2, 1.2) * 180) / Math.PI;
    expect(Math.abs(r.closest!.at - at)).toBeLessThan(1e-4);
    expectRel(r.closest!.value, (W - F * Math.hypot(2, 1.2)) / 2, 1e-9);
    expect(r.ends).toEqual({ lo: { toward: false }, hi: { toward: false } });
    const hint = noLimitHint(r, { from: 20, to: 100 }, { parameter: "theta", pName: "θ", target: "0 kN", shown });
    expect(hint.wider).toBeUndefined();
    expect(hint.words).toBe(
      "It comes closest at θ = 59.04 deg, where it is 0.3976 kN. At both ends it is moving away from 0 kN: a wider range finds a crossing only if the curve turns back (the plot shows its shape).",
    );
    // a row of "In every case" says the same in a few words
    expect(compactNoLimitHint(r, { from: 20, to: 100 }, { parameter: "theta", pName: "θ", target: "0 kN", shown })).toEqual({
      words: "closest 0.3976 kN at θ = 59.04 deg; moving away from 0 kN at both ends",
    });
  });
});

describe("the wider range", () => {
  it("is rounded outward to three figures of its width", () => {
    // a width of 162: whole units; of 1.62: hundredths
    expect(roundOut(-91.234, 71.02)).toEqual({ from: -92, to: 72 });
    expect(roundOut(-0.91234, 0.7102)).toEqual({ from: -0.92, to: 0.72 });
    expect(roundOut(0, 1951.66)).toEqual({ from: 0, to: 1960 });
  });

  it("does not take the flow factor below zero, and goes at most ten ranges past an end", () => {
    const base = { found: false as const, unit: "", reason: "", min: 1, max: 2, closest: { at: 0.5, value: 1 } };
    const down = noLimitHint({ ...base, ends: { lo: { toward: true, estimate: -3 }, hi: { toward: false } } }, { from: 0.5, to: 1.5 }, { parameter: "flowFactor", pName: "flow factor", target: "0 kN", shown });
    expect(down.wider).toEqual({ from: 0, to: 1.5 });
    const far = noLimitHint({ ...base, ends: { lo: { toward: false }, hi: { toward: true, estimate: 500 } } }, { from: 0, to: 1 }, { parameter: "p", pName: "p", target: "0 kN", shown });
    expect(far.wider).toEqual({ from: 0, to: 11 });
    expect(far.words).toContain("reaches it only far out, near p = 500");
  });
});

describe("one range covering the wider ranges of every case", () => {
  it("spans them all, in the direction searched; none offered, none", () => {
    expect(widestOf([{ from: 0, to: 1960 }, undefined, { from: -40, to: 1000 }], { from: 0, to: 1000 })).toEqual({ from: -40, to: 1960 });
    expect(widestOf([{ from: 1960, to: 0 }], { from: 1000, to: 0 })).toEqual({ from: 1960, to: 0 });
    expect(widestOf([undefined], { from: 0, to: 1 })).toBeUndefined();
  });
});

describe("a tie slack all through the range: it carries nothing, and no figure of its margin is said", () => {
  // the tie beam (./tie-beam.ts): the pad bears n = (W − 1.5·P)/2 and lifts at P = W/1.5 = 1307.6 N
  const sk = parsed(tieBeam());

  it("searched from 0 to 1000 N: held all through, slack all through, heading back toward taking load; the wider range finds P = W/1.5", () => {
    const r = findLimit(sk, "P", [0, 1000], { support: "bolt", component: "margin" });
    if (r.found) throw new Error("found");
    expect(r.held).toBe("all");
    expect(r.max).toBeLessThan(0);
    expect(r.ends!.hi.toward).toBe(true);
    const hint = noLimitHint(r, { from: 0, to: 1000 }, { parameter: "P", pName: "P", target: "0 kN", shown, released: "slack" });
    expect(hint.words).toBe("Past 1,000 N it is heading back toward taking load: a wider range may find where it does.");
    // the row of "In every case": no figure of the margin either, and the same wider range
    const row = compactNoLimitHint(r, { from: 0, to: 1000 }, { parameter: "P", pName: "P", target: "0 kN", shown, released: "slack" });
    expect(row).toEqual({ words: "past 1,000 N heading back toward taking load", wider: hint.wider });
    expect(hint.wider!.from).toBe(0);
    expect(hint.wider!.to).toBeGreaterThan(W / 1.5);
    const again = findLimit(sk, "P", [hint.wider!.from, hint.wider!.to], { support: "bolt", component: "margin" });
    if (!again.found) throw new Error("not found");
    expectRel(again.value, W / 1.5, 1e-7);
  });
});

describe("a flow factor searched from 0", () => {
  it("says nothing of where the quantity heads below no flow, and offers no range below it", () => {
    // a margin rising from the end at no flow, falling past the other: the line below 0 is no finding
    const r = { found: false as const, unit: "", reason: "", min: -0.3, max: -0.1, closest: { at: 0, value: -100 }, ends: { lo: { toward: true, estimate: -2 }, hi: { toward: false } } };
    const o = { parameter: "flowFactor", pName: "flow factor", target: "0 kN", shown };
    expect(compactNoLimitHint(r, { from: 0, to: 3 }, o)).toEqual({ words: "closest -0.1000 kN at flow factor = 0; moving away from 0 kN past 3" });
    expect(noLimitHint(r, { from: 0, to: 3 }, o).words).toBe(
      "It comes closest at flow factor = 0, where it is -0.1000 kN. Past 3 it is moving away from 0 kN: a wider range finds a crossing only if the curve turns back (the plot shows its shape).",
    );
    // from 0.5 the factor may go lower: the line's estimate is said and the range goes down to 0
    const from = noLimitHint({ ...r, closest: { at: 0.5, value: -100 } }, { from: 0.5, to: 3 }, o);
    expect(from.words).toContain("Below 0.5 it is still heading for 0 kN");
    expect(from.wider).toEqual({ from: 0, to: 3 });
  });
});

describe("a quantity that cannot be below zero (common practice: a wind speed or a mass flow is a size)", () => {
  // a margin falling toward the low end of a wind-speed range: its line meets zero only at a negative speed
  const r = { found: false as const, unit: "m/s", reason: "", min: 5, max: 9, closest: { at: 20, value: 5565 }, ends: { lo: { toward: true, estimate: -19.09 }, hi: { toward: false } } };
  const o = { parameter: "v", pName: "v", target: "0 kN", shown };

  it("quotes no negative speed, and widens the range down to zero at most", () => {
    const compact = compactNoLimitHint(r, { from: 20, to: 45 }, o);
    expect(compact.words).toBe("closest 5.5650 kN at v = 20.00 m/s; below 20 m/s heading for 0 kN (a line reaches it only below 0 m/s)");
    expect(compact.wider).toEqual({ from: 0, to: 45 });
    expect(noLimitHint(r, { from: 20, to: 45 }, o).words).toContain("reaches it only below 0 m/s (an extrapolation, not a finding)");
  });

  it("an angle may go below zero: its line's value is quoted", () => {
    const deg = { ...r, unit: "deg", closest: { at: 20, value: 5565 } };
    expect(compactNoLimitHint(deg, { from: 20, to: 45 }, { ...o, parameter: "theta", pName: "θ" }).words).toContain("(a line reaches it near θ = −19.09 deg)");
  });
});
