// Plane geometry for the editor: hit tests, nearest points, edges and their normals.
import { nearestOnOutline, nearestOnSegment, pointInPolygon, polygonArea, polygonCentroid, type EdgeHit } from "@/solver/geometry";
import type { Vec2 } from "@/solver/types";

export { nearestOnOutline, nearestOnSegment, pointInPolygon, polygonArea, polygonCentroid, type EdgeHit };



/** Outward unit normal of edge i (whichever way the corners run). */
export function outwardNormal(poly: Vec2[], edge: number): Vec2 {
  const a = poly[edge];
  const b = poly[(edge + 1) % poly.length];
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy) || 1;
  const ccw = polygonArea(poly) >= 0;
  // for a counter-clockwise outline the outside is to the right of each edge
  const n: Vec2 = ccw ? [dy / len, -dx / len] : [-dy / len, dx / len];
  return [n[0] || 0, n[1] || 0];
}

/** Angle in degrees, counter-clockwise from +x, of a vector. */
export function angleOf(v: Vec2): number {
  return (Math.atan2(v[1], v[0]) * 180) / Math.PI;
}

/** Normalise an angle to (−180, 180]. */
export function normaliseAngle(a: number): number {
  let r = ((a % 360) + 360) % 360;
  if (r > 180) r -= 360;
  return r === -0 ? 0 : r;
}

/** Is the outline an axis-aligned rectangle (four corners, right angles on the axes)? */
export function isAxisRectangle(poly: Vec2[]): boolean {
  if (poly.length !== 4) return false;
  const xs = new Set(poly.map((p) => p[0]));
  const ys = new Set(poly.map((p) => p[1]));
  if (xs.size !== 2 || ys.size !== 2) return false;
  for (let i = 0; i < 4; i++) {
    const a = poly[i];
    const b = poly[(i + 1) % 4];
    if (a[0] !== b[0] && a[1] !== b[1]) return false;
  }
  return true;
}

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function boxOf(points: Vec2[]): Box {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of points) {
    if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
    minX = Math.min(minX, x);
    minY = Math.min(minY, y);
    maxX = Math.max(maxX, x);
    maxY = Math.max(maxY, y);
  }
  return { minX, minY, maxX, maxY };
}

export function boxContains(b: Box, p: Vec2): boolean {
  return p[0] >= b.minX && p[0] <= b.maxX && p[1] >= b.minY && p[1] <= b.maxY;
}

export const isFinitePoint = (p: Vec2 | undefined): p is Vec2 => !!p && Number.isFinite(p[0]) && Number.isFinite(p[1]);
