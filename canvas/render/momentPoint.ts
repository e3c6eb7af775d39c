// The hand check's point P on the drawing: its mark, and its words put where they cover none of
// the result's labels and arrows (the weight's arrow starts at the centre of gravity, a common P).
// Pure: screen pixels in, primitives out.
import { REACTION } from "./palette";
import { boxesOverlap, segmentHits, type Box } from "./labels";
import { textExtent, type Prim, type Pt } from "./prims";

export const MOMENT_POINT_WORDS = "moments about P";
const SIZE = 10.5;

/** Where the words may go about P (px): right of it above, below, then left of it, then farther out. */
const PLACES: Array<{ dx: number; dy: number; align: "left" | "right" }> = [
  { dx: 11, dy: -14, align: "left" },
  { dx: 11, dy: 14, align: "left" },
  { dx: -11, dy: -14, align: "right" },
  { dx: -11, dy: 14, align: "right" },
  { dx: 0, dy: -26, align: "left" },
  { dx: 0, dy: 26, align: "left" },
  { dx: 0, dy: -26, align: "right" },
  { dx: 0, dy: 26, align: "right" },
];

/** How much of `avoid` a box at this place covers: a label counts more than a stroke. */
function cost(box: Box, avoid: readonly Prim[]): number {
  let c = 0;
  for (const p of avoid) {
    if (p.t === "text") c += boxesOverlap(box, textExtent(p)) ? 3 : 0;
    else if (p.t === "circle") c += boxesOverlap(box, { x0: p.c[0] - p.r, y0: p.c[1] - p.r, x1: p.c[0] + p.r, y1: p.c[1] + p.r }) ? 1 : 0;
    else {
      const n = p.closed ? p.pts.length : p.pts.length - 1;
      for (let i = 0; i < n; i++) {
        if (segmentHits(p.pts[i], p.pts[(i + 1) % p.pts.length], box)) {
          c += 1;
          break;
        }
      }
    }
  }
  return c;
}

/**
 * P's mark (a dashed ring with a cross) at `at` (content px) and its words at the first place
 * about it that covers nothing in `avoid` (the result's drawing and the elements' words), else
 * the place that covers least.
 */
export function momentPointPrims(at: Pt, avoid: readonly Prim[]): Prim[] {
  let best: Prim | null = null;
  let bestCost = Infinity;
  for (const { dx, dy, align } of PLACES) {
    const words: Prim = { t: "text", at: [at[0] + dx, at[1] + dy], text: MOMENT_POINT_WORDS, size: SIZE, color: REACTION, align, baseline: "middle", halo: true };
    const c = cost(textExtent(words), avoid);
    if (c < bestCost) {
      best = words;
      bestCost = c;
      if (c === 0) break;
    }
  }
  return [
    { t: "circle", c: at, r: 7, stroke: REACTION, width: 1.5, dash: [2, 2] },
    { t: "poly", pts: [[at[0] - 11, at[1]], [at[0] + 11, at[1]]], stroke: REACTION, width: 1 },
    { t: "poly", pts: [[at[0], at[1] - 11], [at[0], at[1] + 11]], stroke: REACTION, width: 1 },
    best!,
  ];
}
