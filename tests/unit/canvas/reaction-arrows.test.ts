// Reactions on the drawing: each support's arrow is scaled to the largest reaction (26 px plus
// 50 px × R / Rmax), drawn as double lines (given loads are one solid line with a filled head),
// and labelled with its value and unit.
import { describe, expect, it } from "vitest";
import { parseSketch, solve } from "@/solver";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { resultPrims } from "@/canvas/render/results";
import { elementGroups } from "@/canvas/render/scenePrims";
import { REACTION } from "@/canvas/render/palette";
import type { Prim, Pt } from "@/canvas/render/prims";

// a 3 m beam of no mass on a pin (x = 0) and a pad (x = 3 m), 3 kN down at x = 1 m: moments about
// the pin give the pad 3 kN × 1 m / 3 m = 1 kN, and the pin the other 2 kN (hand calculation)
const BEAM = {
  format: "counterpoise.sketch",
  version: 1,
  title: "Beam on a pin and a pad",
  bodies: [{ id: "beam", mass: 0, outline: [[0, 0], [3, 0], [3, 0.5], [0, 0.5]] }],
  supports: [
    { id: "pin", body: "beam", kind: "pin", at: [0, 0] },
    { id: "pad", body: "beam", kind: "contact", at: [3, 0], angle: 90 },
  ],
  loads: [{ id: "push", body: "beam", kind: "force", at: [1, 0.5], magnitude: "3 kN", angle: -90 }],
  ports: [],
  massSources: [],
};
const SCALE = 100;

function drawn() {
  const parsed = parseSketch(BEAM);
  if (!parsed.ok) throw new Error(`the test sketch does not parse: ${JSON.stringify(parsed.errors)}`);
  const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
  const result = solve(parsed.sketch);
  return { scene, result, prims: resultPrims(scene, result, { units: "SI", scale: SCALE }).prims };
}

type Line = Extract<Prim, { t: "poly" }>;
const isLine = (p: Prim): p is Line => p.t === "poly" && p.pts.length === 2;
const length = (l: Line) => Math.hypot(l.pts[1][0] - l.pts[0][0], l.pts[1][1] - l.pts[0][1]);
const nearest = (l: Line, at: Pt) => Math.min(...l.pts.map((p) => Math.hypot(p[0] - at[0], p[1] - at[1])));
/** a support's point in content pixels (world × scale, y down) */
const px = (x: number, y: number): Pt => [x * SCALE, -y * SCALE];

describe("reaction arrows", () => {
  it("are scaled to the largest reaction: the pin's 2 kN is 76 px long, the pad's 1 kN 51 px", () => {
    const { result, prims } = drawn();
    expect(result.reactions.pin.fy).toBeCloseTo(2000, 6);
    expect(result.reactions.pad.fy).toBeCloseTo(1000, 6);
    const lines = prims.filter(isLine).filter((l) => l.stroke === REACTION && !l.dash);
    // two parallel lines per support, each stopping short of the head by 0.95 × its 11 px size
    const of = (at: Pt) => lines.filter((l) => nearest(l, at) < 40);
    for (const [at, L] of [[px(0, 0), 76], [px(3, 0), 26 + 50 * (1000 / 2000)]] as const) {
      const pair = of(at);
      expect(pair).toHaveLength(2);
      for (const l of pair) expect(length(l)).toBeCloseTo(L - 11 * 0.95, 6);
      // 2 × 2.6 px apart, side by side
      const gap = Math.hypot(pair[0].pts[0][0] - pair[1].pts[0][0], pair[0].pts[0][1] - pair[1].pts[0][1]);
      expect(gap).toBeCloseTo(5.2, 6);
    }
  });

  it("are labelled with value and unit, and drawn unlike the given load's single solid arrow", () => {
    const { scene, prims } = drawn();
    const texts = prims.flatMap((p) => (p.t === "text" ? [p.text] : []));
    expect(texts).toEqual(expect.arrayContaining([expect.stringMatching(/^2(\.0+)? kN$/), expect.stringMatching(/^1(\.0+)? kN$/)]));
    // the given load: one shaft line and a filled head, in another colour than the reactions
    const push = elementGroups(scene, SCALE, "SI", null).find((g) => g.id === "push")!;
    const shafts = push.prims.filter(isLine);
    expect(shafts).toHaveLength(1);
    expect(shafts[0].stroke).not.toBe(REACTION);
    expect(push.prims.some((p) => p.t === "poly" && p.pts.length === 3 && p.fill === shafts[0].stroke)).toBe(true);
  });
});
