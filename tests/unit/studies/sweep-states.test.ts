// A sweep says where a plotted contact is off the ground, and plots no friction margin where a
// contact has none: off the ground, or on a body that tips (its reactions are only what would
// hold it). The washing cart tips back off its front caster as its lance is raised; its braked
// rear wheels carry the friction. Also: the limit finder's figures, in the unit on screen and
// with its precision as the figures show it.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { runLimit, runSweep, stretchesOf } from "@/canvas/studies/run";
import { parseTarget } from "@/canvas/studies/display";
import { limitPrecisionWords } from "@/solver/limit";
import { G0 } from "@/solver/constants";

const cart = () => JSON.parse(readFileSync("canvas/examples/washing-cart.json", "utf8"));
const front = { support: "front", component: "margin" as const };
const rearFriction = { support: "rear", component: "frictionMargin" as const };

describe("a contact off the ground in a sweep", () => {
  it("over the whole range: said, and the friction margin where the cart tips is a gap, not a number", () => {
    // from −58° up the cart tips back: its front caster lifts at about −59° (the example's notes)
    const data = runSweep(cart(), { parameter: "theta", from: -58, to: 0, points: 30, quantities: [front, rearFriction] });
    expect(data.crossings).toEqual([]);
    expect(data.statuses.every((s) => s === "tips")).toBe(true);
    // the caster is off the ground at every point: one stretch, the whole range
    expect(data.off).toEqual([{ support: "front", kind: "contact", from: -58, to: 0, points: 30, whole: true }]);
    // the rear wheels bear, but on a body that tips: no friction margin is plotted (it read 292.9 N at −58° before)
    expect(data.series[1].every((y) => Number.isNaN(y))).toBe(true);
    expect(data.notHeld).toEqual([{ support: "rear", body: "cart", status: "tips", from: -58, to: 0, points: 30, whole: true }]);
    // the margin of the lifted caster is still plotted, below zero: what it would have to pull
    expect(data.series[0].every((y) => y < 0)).toBe(true);
  });

  it("over part of the range: from where to where, at the points plotted", () => {
    const data = runSweep(cart(), { parameter: "theta", from: -90, to: 0, points: 19, quantities: [front, rearFriction] });
    // the caster lifts between −60° and −55° (the crossing marked), and stays off to 0°
    expect(data.crossings).toEqual([{ quantity: 0, between: [-60, -55] }]);
    expect(data.off).toEqual([{ support: "front", kind: "contact", from: -55, to: 0, points: 12, whole: false }]);
    expect(data.notHeld).toEqual([{ support: "rear", body: "cart", status: "tips", from: -55, to: 0, points: 12, whole: false }]);
    // while the cart holds, the rear friction margin is μ·n − |t| with the reactions of statics:
    // at −90° the jet points straight down (no sideways thrust), t = 0 and n = W + ṁV at the rear
    // share; the margin is positive up to the lift-off and a gap after it
    const held = data.series[1].slice(0, 7);
    expect(held.every((y) => Number.isFinite(y) && y > 0)).toBe(true);
    expect(data.series[1].slice(7).every((y) => Number.isNaN(y))).toBe(true);
  });

  it("a lifted friction contact has no friction margin: a box pinned at one end, its other end lifted and held down", () => {
    // a 1 m × 1 m box of 10 kg, pinned at (1, 0), on a friction contact (μ = 0.5) at (0, 0) with a
    // hold-down strap pulling down on the same line (at (0, 0.5)); a force F straight up at (0, 1).
    // Moments about the pin (statics, common practice): the contact bears n = W·0.5 m / 1 m − F
    // (the strap slack) up to F = W/2 = 49.03 N; past it the contact lifts and the strap holds the
    // box down with F − W/2. No sideways load: t = 0, the friction margin is μ·n while it bears.
    const W = 10 * G0;
    const file = {
      format: "counterpoise.sketch",
      version: 2,
      title: "box",
      parameters: { F: "10 N" },
      bodies: [{ id: "b", mass: "10 kg", cg: [0.5, 0.5], outline: [[0, 0], [1, 0], [1, 1], [0, 1]] }],
      supports: [
        { id: "L", body: "b", kind: "contact", at: [0, 0], angle: 90, mu: 0.5 },
        { id: "pin", body: "b", kind: "pin", at: [1, 0] },
        { id: "strap", body: "b", kind: "tie", at: [0, 0.5], angle: 270 },
      ],
      loads: [{ id: "f", body: "b", kind: "force", at: [0, 1], fx: 0, fy: "F" }],
      ports: [],
      massSources: [],
    };
    const L = { support: "L", component: "frictionMargin" as const };
    const below = runSweep(file, { parameter: "F", from: 0, to: 45, points: 4, quantities: [L] });
    below.xs.forEach((F, i) => expect(below.series[0][i]).toBeCloseTo(0.5 * (W / 2 - F), 6));
    expect(below.off).toEqual([]);
    const beyond = runSweep(file, { parameter: "F", from: 51, to: 60, points: 4, quantities: [L] });
    expect(beyond.statuses).toEqual(["lifts", "lifts", "lifts", "lifts"]);
    expect(beyond.series[0].every((y) => Number.isNaN(y))).toBe(true);
    expect(beyond.off).toEqual([{ support: "L", kind: "contact", from: 51, to: 60, points: 4, whole: true }]);
    expect(beyond.notHeld).toEqual([]);
    // the limit finder does not take lifting off for slipping: no crossing of the friction margin
    const lim = runLimit(file, { parameter: "F", from: 0, to: 60, quantity: L, target: 0 });
    expect(lim.found).toBe(false);
  });

  it("stretches split at a point that did not solve, and count their points", () => {
    expect(stretchesOf([1, 2, 3, 4, 5], ["a", "a", null, "a", "b"])).toEqual([
      { key: "a", from: 1, to: 2, points: 2, whole: false },
      { key: "a", from: 4, to: 4, points: 1, whole: false },
      { key: "b", from: 5, to: 5, points: 1, whole: false },
    ]);
    expect(stretchesOf([1, 2], ["a", "a"])[0].whole).toBe(true);
  });
});

describe("the limit finder's figures", () => {
  it("quotes a target typed in another unit in the unit on screen (1 lbf = 4.4482216152605 N, NIST SP 811)", () => {
    const t = parseTarget("100 lbf", "margin", "SI", 500);
    expect(t.si).toBeCloseTo(444.82216152605, 9);
    expect(t.shown).toBe("444.8 N");
    expect(parseTarget("100 lbf", "margin", "US", 500).shown).toBe("100 lbf");
    expect(parseTarget("2 kN", "margin", "US", 500).shown).toBe("449.6 lbf");
    expect(parseTarget("20", "m", "SI", 100)).toEqual({ si: 20, shown: "20 N·m" });
  });

  it("leaves out a tolerance finer than the figures it is said of, and writes a coarser one as they are", () => {
    // −58.93 deg is written to 0.01 deg: a search to ±9e-8 deg is far finer
    expect(limitPrecisionWords(9e-8, "deg", [-58.9321])).toBe("to 4 significant figures");
    // 1,046 N is written whole: ±0.3 N is finer than half a newton
    expect(limitPrecisionWords(0.3, "N", [1046.2])).toBe("to 4 significant figures");
    // a coarse search shows, as a plain decimal: ±0.00008 deg on 0.01234 deg (written to 0.00001)
    expect(limitPrecisionWords(8e-5, "deg", [0.01234])).toBe("to 4 significant figures, found to within ±0.00008 deg");
    expect(limitPrecisionWords(9.5e-5, "deg", [0.01234])).toBe("to 4 significant figures, found to within ±0.0001 deg");
    // the finest figure of several decides
    // 12.50 m and 0.5000 m: the finer is written to 0.0001 m, so ±4e-5 m does not show and ±6e-5 m does
    expect(limitPrecisionWords(4e-5, "m", [12.5, 0.5])).toBe("to 4 significant figures");
    expect(limitPrecisionWords(6e-5, "m", [12.5, 0.5])).toBe("to 4 significant figures, found to within ±0.00006 m");
    // nothing found: nothing to say it of
    expect(limitPrecisionWords(9e-8, "deg", [])).toBe("to 4 significant figures");
    // without values, as before: the tolerance to one figure
    expect(limitPrecisionWords(8e-8, "deg")).toBe("to 4 significant figures, found to within ±8e-8 deg");
  });
});
