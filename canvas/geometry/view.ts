// The view: world metres (y up) to screen pixels (y down). screen = (x + wx·scale, y − wy·scale).
import type { Vec2 } from "@/solver/types";
import type { Box } from "./polygon";

export interface View {
  /** pixels per metre */
  scale: number;
  /** screen position of the world origin */
  x: number;
  y: number;
}

export const MIN_SCALE = 2;
export const MAX_SCALE = 5000;
export const DEFAULT_VIEW: View = { scale: 120, x: 160, y: 420 };

export function toScreen(v: View, p: Vec2): Vec2 {
  return [v.x + p[0] * v.scale, v.y - p[1] * v.scale];
}

export function toWorld(v: View, s: Vec2): Vec2 {
  return [(s[0] - v.x) / v.scale, (v.y - s[1]) / v.scale];
}

/** Zoom by a factor keeping the world point under the screen point `at` still. */
export function zoomAt(v: View, factor: number, at: Vec2): View {
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, v.scale * factor));
  const w = toWorld(v, at);
  return { scale, x: at[0] - w[0] * scale, y: at[1] + w[1] * scale };
}

export type Margins = number | { top: number; right: number; bottom: number; left: number };

/**
 * Two opposite margins, cut when together they take more than 70% of `size`: the smaller keeps
 * what it needs (up to half the room), the larger gets the rest — so only one side's labels reach
 * past the edge, not both.
 */
function squeeze(a: number, b: number, size: number, room = size * 0.7): [number, number] {
  if (a + b <= room) return [a, b];
  const small = Math.min(Math.min(a, b), room / 2);
  return a <= b ? [small, room - small] : [room - small, small];
}

/** The view that shows a box of the world inside a screen of width × height, leaving margins (px). */
export function fitView(box: Box, width: number, height: number, margin: Margins = 64): View {
  const given = typeof margin === "number" ? { top: margin, right: margin, bottom: margin, left: margin } : margin;
  if (!Number.isFinite(box.minX) || width <= 0 || height <= 0) return { ...DEFAULT_VIEW, y: Math.max(200, height * 0.7) };
  // on a small drawing area the labels' room could leave the body a sliver off to one side: the
  // margins then shrink to leave it at least 30% of each direction (the labels of one side may
  // then reach past the edge, but the body is drawn whole)
  const [left, right] = squeeze(given.left, given.right, width);
  // a short, wide area (a laptop or a landscape tablet with the results below): the words and
  // arrows above and below the body take most of the height, and there is width to spare; the body
  // is drawn smaller rather than have them cut by the edges, down to 15% of the height (48 px at least)
  const landscape = width >= 2 * height;
  const [top, bottom] = squeeze(given.top, given.bottom, height, landscape ? height - Math.max(48, 0.15 * height) : height * 0.7);
  const m = { left, right, top, bottom };
  const w = Math.max(box.maxX - box.minX, 0.5);
  const h = Math.max(box.maxY - box.minY, 0.5);
  const availW = Math.max(40, width - m.left - m.right);
  const availH = Math.max(40, height - m.top - m.bottom);
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, Math.min(availW / w, availH / h)));
  const cx = (box.minX + box.maxX) / 2;
  const cy = (box.minY + box.maxY) / 2;
  return { scale, x: m.left + availW / 2 - cx * scale, y: m.top + availH / 2 + cy * scale };
}

const STEPS = [0.001, 0.002, 0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.25, 0.5, 1, 2, 5, 10, 20, 50, 100, 200, 500, 1000];

/** A round grid step (m) whose spacing on screen is at least `minPx` pixels. */
export function gridStep(scale: number, minPx = 18): number {
  for (const s of STEPS) if (s * scale >= minPx) return s;
  return STEPS[STEPS.length - 1];
}
