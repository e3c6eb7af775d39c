// The hand check's point P on the drawing: its mark, and its words put where they cover none of
// the result's labels and arrows (the weight's arrow starts at the centre of gravity, a common P).
// Pure: screen pixels in, primitives out.
import { REACTION } from "./palette";
import { textExtent, type Prim, type Pt } from "./prims";

export const MOMENT_POINT_WORDS = "moments about P";
const SIZE = 10.5;

type Box = { x0: number; y0: number; x1: number; y1: number };

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

const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/** Whether segment pq passes through the box (Liang–Barsky clipping). */
function crosses(p: Pt, q: Pt, b: Box): boolean {
  const d = [q[0] - p[0], q[1] - p[1]];
  let t0 = 0;
  let t1 = 1;
  for (const [den, num] of [
    [-d[0], p[0] - b.x0],
    [d[0], b.x1 - p[0]],
    [-d[1], p[1] - b.y0],
    [d[1], b.y1 - p[1]],
  ]) {
    if (den === 0) {
      if (num < 0) return false;
    } else {
      const t = num / den;
      if (den < 0) t0 = Math.max(t0, t);
      else t1 = Math.min(t1, t);
      if (t0 > t1) return false;
    }
  }
  return true;
}

/** How much of `avoid` a box at this place covers: a label counts more than a stroke. */
function cost(box: Box, avoid: readonly Prim[]): number {
  let c = 0;
  for (const p of avoid) {
    if (p.t === "text") c += overlaps(box, textExtent(p)) ? 3 : 0;
    else if (p.t === "circle") c += overlaps(box, { x0: p.c[0] - p.r, y0: p.c[1] - p.r, x1: p.c[0] + p.r, y1: p.c[1] + p.r }) ? 1 : 0;
    else {
      const n = p.closed ? p.pts.length : p.pts.length - 1;
      for (let i = 0; i < n; i++) {
        if (crosses(p.pts[i], p.pts[(i + 1) % p.pts.length], box)) {
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
