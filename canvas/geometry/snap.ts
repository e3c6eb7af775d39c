// Snapping a point while placing or dragging: body corners first, then body edges, then the grid.
import type { Vec2 } from "@/solver/types";
import { roundTo } from "../model/numeric";
import { nearestOnOutline, nearestOnSegment } from "./polygon";

export type SnapKind = "corner" | "edge" | "grid" | "none";

export interface SnapResult {
  point: Vec2;
  kind: SnapKind;
  /** the body whose corner or edge was used */
  body?: string;
  /** edge index on that body */
  edge?: number;
}

export interface SnapOptions {
  bodies: ReadonlyArray<{ id: string; outline: Vec2[] }>;
  /** grid step, m (0: no grid) */
  grid: number;
  /** capture distance, m (a few pixels at the current zoom) */
  tolerance: number;
  /** bodies whose corners and edges are not targets (the one being dragged) */
  exclude?: ReadonlySet<string>;
  /** false while the user holds the key that turns snapping off */
  enabled?: boolean;
  /**
   * Where the dragged point was when the drag began (a corner or a position maybe typed in the
   * panel, off the grid): while the pointer is within the tolerance of it, it is kept exactly,
   * before the grid (also the grid along an edge it sits on or next to), and before a corner or
   * another edge only when it is nearer. A press that wobbles a few pixels leaves a typed value as
   * typed; snapping is for moving.
   */
  keep?: Vec2;
}

/** Nearer than this (m) to an outline, a kept point sits on it. */
const ON_EDGE = 1e-7;

export function snapPoint(p: Vec2, o: SnapOptions): SnapResult {
  if (o.enabled === false) return { point: p, kind: "none" };
  const keep = o.keep;
  const keepD = keep ? Math.hypot(keep[0] - p[0], keep[1] - p[1]) : Infinity;
  const kept = keep && keepD <= o.tolerance ? ({ point: [keep[0], keep[1]], kind: "none" } satisfies SnapResult) : null;
  let best: SnapResult | null = null;
  let bestD = o.tolerance;
  for (const b of o.bodies) {
    if (o.exclude?.has(b.id)) continue;
    for (const c of b.outline) {
      const d = Math.hypot(c[0] - p[0], c[1] - p[1]);
      if (d <= bestD) {
        bestD = d;
        best = { point: [c[0], c[1]], kind: "corner", body: b.id };
      }
    }
  }
  if (best) return kept && keepD < bestD ? kept : best;
  bestD = o.tolerance;
  let ends: [Vec2, Vec2] | null = null;
  for (const b of o.bodies) {
    if (o.exclude?.has(b.id) || b.outline.length < 2) continue;
    const h = nearestOnOutline(p, b.outline);
    if (h.distance <= bestD) {
      bestD = h.distance;
      // on an edge that runs along an axis, keep the other coordinate on the grid
      const a = b.outline[h.edge];
      const c = b.outline[(h.edge + 1) % b.outline.length];
      const pt: Vec2 = [h.point[0], h.point[1]];
      if (o.grid > 0 && a[1] === c[1]) pt[0] = clamp(snapTo(pt[0], o.grid), Math.min(a[0], c[0]), Math.max(a[0], c[0]));
      if (o.grid > 0 && a[0] === c[0]) pt[1] = clamp(snapTo(pt[1], o.grid), Math.min(a[1], c[1]), Math.max(a[1], c[1]));
      best = { point: pt, kind: "edge", body: b.id, edge: h.edge };
      ends = [a, c];
    }
  }
  if (best && ends) {
    if (!kept) return best;
    // a kept point on that edge still says "on edge"; one just off it (typed so) stays off it
    const off = nearestOnSegment(kept.point, ends[0], ends[1]).distance;
    if (off <= ON_EDGE) return { ...best, point: kept.point };
    return off <= o.tolerance || keepD < bestD ? kept : best;
  }
  if (kept) return kept;
  if (o.grid > 0) return { point: [snapTo(p[0], o.grid), snapTo(p[1], o.grid)], kind: "grid" };
  return { point: p, kind: "none" };
}

/**
 * The grid point nearest x: a half step goes away from zero, with floating error forgiven (0.3 on
 * a 0.2 grid → 0.4, −0.3 → −0.4); grid values stay clean in the file (0.30000000000000004 → 0.3).
 */
export function snapTo(x: number, step: number): number {
  return roundTo(x, step);
}

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));

/**
 * Moving whole bodies: the corner of the moving outlines (already moved by the raw delta) that
 * lands nearest another body's corner, or else its edge, within the tolerance; `from` is that
 * corner, so the snapped delta is the raw one plus `point - from`. Null when nothing is near:
 * the caller falls back to the grid.
 */
export function snapCorners(corners: readonly Vec2[], o: SnapOptions): (SnapResult & { from: Vec2 }) | null {
  if (o.enabled === false) return null;
  let best: (SnapResult & { from: Vec2 }) | null = null;
  let bestD = Infinity;
  for (const c of corners) {
    const r = snapPoint(c, o);
    if (r.kind !== "corner" && r.kind !== "edge") continue;
    const d = Math.hypot(r.point[0] - c[0], r.point[1] - c[1]);
    // a corner on a corner beats any corner on an edge, as for a single point
    const better = !best || (r.kind === "corner" && best.kind === "edge") || (r.kind === best.kind && d < bestD);
    if (better) {
      best = { ...r, from: c };
      bestD = d;
    }
  }
  return best;
}
