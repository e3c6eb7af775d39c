// When no engagement of the one-sided supports can hold the body, find the motion that shows it:
// a direction d with Qᵀd > 0 that every bilateral spring allows (gᵀd = 0) and that opens or keeps
// every contact and tie (gᵀd ≥ 0).
//  - "proof": d also slides along no friction contact. Friction is checked, not enforced, so a
//    contact with μ can hold any tangential force under a vanishing normal one; with that, such
//    a d exists exactly when no equilibrium with pushing contacts and pulling ties exists
//    (Farkas' lemma).
//  - "motion": d may slide along a friction contact that it opens (open, it carries nothing).
//    Not a proof; it describes the motion once the engagements have all been tried and failed.
// The cones live in three dimensions, so their extreme rays lie on intersections of two constraint
// planes: try those, the load's own direction, and its projections onto each plane, and keep the
// feasible one doing most work.
import { dot3, norm3, type Vec3 } from "./linalg";
import type { BodyModel } from "./model";

const cross = (a: ArrayLike<number>, b: ArrayLike<number>): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];

/** Remove from v its components along the orthonormal rows `basis`. */
function projectOut(v: Vec3, basis: Vec3[]): Vec3 {
  const out: Vec3 = [...v] as Vec3;
  for (const b of basis) {
    const p = dot3(out, b);
    out[0] -= p * b[0];
    out[1] -= p * b[1];
    out[2] -= p * b[2];
  }
  return out;
}

/** Gram–Schmidt: an orthonormal basis of the span of `rows`. */
function orthonormal(rows: ArrayLike<number>[]): Vec3[] {
  const basis: Vec3[] = [];
  for (const r of rows) {
    const v = projectOut([r[0], r[1], r[2]], basis);
    const n = norm3(v);
    if (n > 1e-9 * Math.max(norm3(r), 1e-300)) basis.push([v[0] / n, v[1] / n, v[2] / n]);
    if (basis.length === 3) break;
  }
  return basis;
}

export function findRay(model: BodyModel, kind: "proof" | "motion" = "proof"): Vec3 | null {
  const bilateral: number[][] = [];
  const oneSided: number[][] = [];
  /** friction springs, by the index of their contact's normal in `oneSided` */
  const friction: Array<number[] | null> = [];
  for (const g of model.groups) {
    oneSided.push(model.springs[g.normal].g);
    friction.push(g.tangent >= 0 ? model.springs[g.tangent].g : null);
  }
  for (const s of model.springs) if (s.group < 0) bilateral.push(s.g);
  const eq = orthonormal(bilateral);
  if (eq.length === 3) return null;
  const Q = model.Q as Vec3;
  const qNorm = norm3(Q);
  if (qNorm === 0) return null;

  const feasible = (d: Vec3): number => {
    const n = norm3(d);
    if (n < 1e-12) return -Infinity;
    for (const e of eq) if (Math.abs(dot3(e, d)) > 1e-9 * n) return -Infinity;
    for (let i = 0; i < oneSided.length; i++) {
      const g = oneSided[i];
      const opening = dot3(g, d);
      const eps = 1e-9 * n * norm3(g);
      if (opening < -eps) return -Infinity;
      const t = friction[i];
      if (t && (kind === "proof" || opening <= eps) && Math.abs(dot3(t, d)) > 1e-9 * n * norm3(t)) return -Infinity;
    }
    return dot3(Q, d) / n;
  };

  let best: Vec3 | null = null;
  let bestWork = 1e-9 * qNorm;
  const consider = (d: Vec3) => {
    const w = feasible(d);
    if (w > bestWork) {
      bestWork = w;
      best = d;
    }
  };
  const qFree = projectOut(Q, eq);
  consider(qFree);
  for (const g of oneSided) {
    const gFree = projectOut([g[0], g[1], g[2]], eq);
    const gn = norm3(gFree);
    if (gn === 0) continue;
    const onPlane = projectOut(qFree, [[gFree[0] / gn, gFree[1] / gn, gFree[2] / gn]]);
    consider(onPlane);
  }
  const planes: ArrayLike<number>[] = [...eq, ...oneSided, ...friction.filter((t): t is number[] => t !== null)];
  for (let i = 0; i < planes.length; i++) {
    for (let j = i + 1; j < planes.length; j++) {
      const c = cross(planes[i], planes[j]);
      consider(c);
      consider([-c[0], -c[1], -c[2]]);
    }
  }
  return best;
}
