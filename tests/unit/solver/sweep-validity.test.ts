// A sweep applies the value rules a parsed file must meet at every point: a point where the
// swept parameter makes the sketch invalid (gravity or a mass below zero) reports its value and
// the field's message and is not solved.
import { describe, expect, it } from "vitest";
import { parseSketch, solveSweep } from "@/solver";
import { NEGATIVE_GRAVITY } from "@/solver/validate";
import { runSweep } from "@/canvas/studies/run";
import { box, sketch } from "./helpers";

/** A 2 m block on two contacts at its bottom corners, its weight m·g at the middle. */
const block = (parameters: Record<string, string>, gravity: string | undefined, mass: string) =>
  sketch({
    parameters,
    ...(gravity === undefined ? {} : { gravity }),
    bodies: [{ id: "b", outline: box(2, 1), mass }],
    supports: [
      { id: "left", body: "b", kind: "contact", at: [0, 0], angle: 90 },
      { id: "right", body: "b", kind: "contact", at: [2, 0], angle: 90 },
    ],
  });

const parse = (doc: unknown) => {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.sketch;
};

describe("sweep points where the sketch is invalid", () => {
  it("gravity swept through zero to negative: the negative points give gravity's parse-time message", () => {
    const doc = block({ grav: "9.81 m/s^2" }, "grav", "100 kg");
    const sweep = solveSweep(parse(doc), "grav", [9.81, 0, -9.81]);
    // at grav = 9.81 each contact carries half of m·g = 100 · 9.81 = 981 N (statics, symmetric block)
    const [pos, zero, neg] = sweep.points;
    if (!pos.ok) throw new Error(JSON.stringify(pos.errors));
    expect(pos.result.reactions.left.n).toBeCloseTo(490.5, 9);
    // zero gravity is allowed (it turns weights off): nothing to carry
    if (!zero.ok) throw new Error(JSON.stringify(zero.errors));
    expect(zero.result.reactions.left.n).toBeCloseTo(0, 9);
    expect(neg).toEqual({ value: -9.81, ok: false, errors: [{ path: "gravity", message: NEGATIVE_GRAVITY }] });
  });

  it("says what parsing says for the same value", () => {
    const p = parseSketch(block({ grav: "-1 m/s^2" }, "grav", "100 kg"));
    expect(p.ok).toBe(false);
    if (p.ok) return;
    expect(p.errors).toEqual([{ path: "gravity", message: NEGATIVE_GRAVITY }]);
  });

  it("gravity read through another parameter is checked too", () => {
    const doc = block({ k: "1", grav: "k * 9.81 m/s^2" }, "grav", "100 kg");
    const sweep = solveSweep(parse(doc), "k", [1, -0.5]);
    expect(sweep.points[0].ok).toBe(true);
    expect(sweep.points[1]).toEqual({ value: -0.5, ok: false, errors: [{ path: "gravity", message: NEGATIVE_GRAVITY }] });
  });

  it("a mass swept negative is refused at that point with the mass field's message", () => {
    const sweep = solveSweep(parse(block({ mass: "100 kg" }, undefined, "mass")), "mass", [50, -50]);
    const [ok, bad] = sweep.points;
    if (!ok.ok) throw new Error(JSON.stringify(ok.errors));
    // 50 kg · 9.80665 m/s² (standard gravity, the default) / 2 contacts
    expect(ok.result.reactions.right.n).toBeCloseTo((50 * 9.80665) / 2, 9);
    expect(bad).toEqual({ value: -50, ok: false, errors: [{ path: "bodies[0].mass", message: "must be zero or more (kg)" }] });
  });

  it("the studies' sweep leaves those points unplotted and lists each with its value and message", () => {
    const doc = block({ grav: "9.81 m/s^2" }, "grav", "100 kg");
    const data = runSweep(doc, { parameter: "grav", from: 2, to: -2, points: 5, quantities: [{ support: "left", component: "n" }] });
    expect(data.unit).toBe("m / s^2");
    expect(data.xs).toEqual([2, 1, 0, -1, -2]);
    // n = m·g/2 = 100 kg · g / 2 (statics) where gravity is allowed; nothing where it is not
    expect(data.series[0].slice(0, 3)).toEqual([expect.closeTo(100, 9), expect.closeTo(50, 9), expect.closeTo(0, 9)]);
    expect(data.series[0].slice(3)).toEqual([Number.NaN, Number.NaN]);
    expect(data.statuses.slice(3)).toEqual(["error", "error"]);
    expect(data.errors).toEqual([
      { value: -1, errors: [{ path: "gravity", message: NEGATIVE_GRAVITY }] },
      { value: -2, errors: [{ path: "gravity", message: NEGATIVE_GRAVITY }] },
    ]);
  });
});
