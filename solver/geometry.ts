// Plane geometry on plain [x, y] pairs.
import type { Vec2 } from "./types";

export const DEG = Math.PI / 180;

/** Unit vector at an angle in degrees, counter-clockwise from +x. */
export function direction(angleDeg: number): Vec2 {
  // exact zeros at the quarter turns keep reactions clean (cos 90° is not 6e-17). Most angles
  // drawn are whole quarter turns (−90, 0, 90, 180), told here by integer arithmetic: every solve
  // turns each support, load and port through this, and the float remainder below costs more.
  // q·90 === angle proves the angle an exact multiple of 90°; anything else (other angles, and
  // turns past 2³¹ quarters) takes the remainder as before, with the same answers.
  const q = angleDeg / 90;
  if (q === Math.trunc(q) && q < 2147483648 && q >= -2147483648 && q * 90 === angleDeg) {
    const k = q & 3; // the quarter turn, 0…3, for negative q too (two's complement)
    return k === 0 ? [1, 0] : k === 1 ? [0, 1] : k === 2 ? [-1, 0] : [0, -1];
  }
  const a = angleDeg * DEG;
  const r = ((angleDeg % 360) + 360) % 360;
  if (r === 0) return [1, 0];
  if (r === 90) return [0, 1];
  if (r === 180) return [-1, 0];
  if (r === 270) return [0, -1];
  return [Math.cos(a), Math.sin(a)];
}

/** Signed area (counter-clockwise positive), shoelace formula. */
export function polygonArea(pts: Vec2[]): number {
  let a = 0;
  for (let i = 0, n = pts.length; i < n; i++) {
    const [x1, y1] = pts[i];
    const [x2, y2] = pts[(i + 1) % n];
    a += x1 * y2 - x2 * y1;
  }
  return a / 2;
}

/** Area centroid of a simple polygon. */
export function polygonCentroid(pts: Vec2[]): Vec2 {
  let a = 0;
  let cx = 0;
  let cy = 0;
  // Shift to the first corner to keep the sums well conditioned far from the origin.
  const [ox, oy] = pts[0];
  for (let i = 0, n = pts.length; i < n; i++) {
    const x1 = pts[i][0] - ox;
    const y1 = pts[i][1] - oy;
    const x2 = pts[(i + 1) % n][0] - ox;
    const y2 = pts[(i + 1) % n][1] - oy;
    const c = x1 * y2 - x2 * y1;
    a += c;
    cx += (x1 + x2) * c;
    cy += (y1 + y2) * c;
  }
  if (Math.abs(a) < 1e-300) return [ox, oy];
  return [cx / (3 * a) + ox, cy / (3 * a) + oy];
}

export function boundingBox(pts: Vec2[]): { minX: number; minY: number; maxX: number; maxY: number } {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of pts) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

/** Moment about the origin of a force (fx, fy) acting at (x, y): x·Fy − y·Fx. */
export function momentOf(x: number, y: number, fx: number, fy: number): number {
  return x * fy - y * fx;
}

/** Largest distance between two corners. */
export function polygonDiameter(pts: Vec2[]): number {
  let d2 = 0;
  for (let i = 0; i < pts.length; i++) {
    for (let j = i + 1; j < pts.length; j++) {
      const dx = pts[i][0] - pts[j][0];
      const dy = pts[i][1] - pts[j][1];
      if (dx * dx + dy * dy > d2) d2 = dx * dx + dy * dy;
    }
  }
  return Math.sqrt(d2);
}

/** Whether p lies inside the polygon (even–odd rule; a point on an edge may go either way). */
export function pointInPolygon(p: Vec2, poly: Vec2[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const [xi, yi] = poly[i];
    const [xj, yj] = poly[j];
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/**
 * The first two edges of an outline that cross (edge i runs from corner i to corner i + 1, the
 * last back to the first), with the point where they do; undefined when none do. Only edges
 * that are not neighbours are compared, and only a true crossing counts: edges that merely
 * touch (a repeated corner, a corner on another edge) are let through.
 */
export function selfCrossing(pts: Vec2[]): { edges: [number, number]; at: Vec2 } | undefined {
  const n = pts.length;
  if (n < 4) return undefined;
  const { minX, minY, maxX, maxY } = boundingBox(pts);
  // turns smaller than this are taken as none (a touch, not a crossing)
  const tol = 1e-12 * ((maxX - minX) ** 2 + (maxY - minY) ** 2);
  const side = (o: Vec2, a: Vec2, b: Vec2) => {
    const c = turn(o, a, b);
    return c > tol ? 1 : c < -tol ? -1 : 0;
  };
  for (let i = 0; i < n; i++) {
    const a = pts[i];
    const b = pts[(i + 1) % n];
    // j = i + 1 shares a corner with i; so does j = n − 1 with i = 0, through the closing edge
    for (let j = i + 2; j < (i === 0 ? n - 1 : n); j++) {
      const c = pts[j];
      const d = pts[(j + 1) % n];
      if (side(a, b, c) * side(a, b, d) < 0 && side(c, d, a) * side(c, d, b) < 0) {
        const s = turn(a, b, c);
        const t = s / (s - turn(a, b, d));
        return { edges: [i, j], at: [c[0] + t * (d[0] - c[0]), c[1] + t * (d[1] - c[1])] };
      }
    }
  }
  return undefined;
}

/** (a − o) × (b − o): positive when o → a → b turns counter-clockwise. */
const turn = (o: Vec2, a: Vec2, b: Vec2) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);

/** The nearest point on segment ab to p, with its parameter t in [0, 1]. */
export function nearestOnSegment(p: Vec2, a: Vec2, b: Vec2): { point: Vec2; t: number; distance: number } {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  const point: Vec2 = [a[0] + t * dx, a[1] + t * dy];
  return { point, t, distance: Math.hypot(p[0] - point[0], p[1] - point[1]) };
}

export interface EdgeHit {
  edge: number;
  point: Vec2;
  distance: number;
}

/** The nearest point on a closed polygon's boundary. */
export function nearestOnOutline(p: Vec2, poly: Vec2[]): EdgeHit {
  let best: EdgeHit = { edge: -1, point: p, distance: Infinity };
  for (let i = 0; i < poly.length; i++) {
    const h = nearestOnSegment(p, poly[i], poly[(i + 1) % poly.length]);
    if (h.distance < best.distance) best = { edge: i, point: h.point, distance: h.distance };
  }
  return best;
}
