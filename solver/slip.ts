// Coulomb's law enforced, for the bodies the gripping model cannot settle.
//
// The one-sided search treats an engaged friction contact as gripping (a tangential spring) and
// only checks |t| ≤ μ·n afterwards. Now and then no engagement is consistent that way: engaged,
// the grip makes a contact pull; released, the body closes it. Coulomb's law then decides:
//  - `solveWithSlip`: a contact may also slide at the limit, t = ±μ·n, while it presses. Every
//    state (open, gripping, sliding either way) is tried with the loads applied together from
//    zero, and the first consistent one is kept. Such an answer depends on the order of loading
//    and on the stiffnesses (elastic contact with friction is path dependent: common practice).
//  - `frictionCanHold`: whether the loads can be balanced by forces inside the friction cones
//    at all (n ≥ 0, |t| ≤ μ·n; the rigid-body check, blind to stiffness). When it can but no
//    state above is consistent, the body could only be held by forces its springs do not give
//    when loaded from zero — wedged or jammed by a preload — and whether it holds is a question
//    of stiffness and history, not of statics.
import { dot3, norm3, solvePsd, type Vec3 } from "./linalg";
import { frictionCoefficient, type BodyModel, type Group, type Spring } from "./model";
import { findRay } from "./ray";

/** A state per group: 0 open, 1 engaged (gripping), 2 sliding with t = +μ·n, 3 with t = −μ·n. */
type State = 0 | 1 | 2 | 3;

/** Trying more states than this is not worth it in a fallback (4⁶: six friction contacts). */
const MAX_STATES = 4096;

export interface SlipSolution {
  r: number[];
  q: Vec3;
  engaged: boolean[];
  /** per group: sliding at the friction limit */
  sliding: boolean[];
}

const muOf = (model: BodyModel, g: Group): number => frictionCoefficient(model.supports[g.support]);

/** The first state of every contact and tie that meets equilibrium and Coulomb's law, or null. */
export function solveWithSlip(model: BodyModel): SlipSolution | null {
  const { groups, scale } = model;
  const radix = groups.map((g) => (g.tangent >= 0 ? 4 : 2));
  if (radix.reduce((a, b) => a * b, 1) > MAX_STATES) return null;
  const tol = 1e-9 * scale;
  const states: State[] = groups.map(() => 0);
  for (;;) {
    const sol = trySlipState(model, states, tol);
    if (sol) return sol;
    // next state, as a mixed-radix counter
    let i = 0;
    while (i < states.length && states[i] === radix[i] - 1) states[i++] = 0;
    if (i === states.length) return null;
    states[i]++;
  }
}

function trySlipState(model: BodyModel, states: State[], tol: number): SlipSolution | null {
  const { groups, springs, Q } = model;
  // The stiffness: Σ k g gᵀ over the engaged springs; a sliding contact pushes along n + s·μ·t
  // with the force its normal spring carries, so its column is k (gn + s·μ·gt) gnᵀ (not symmetric).
  const h = [0, 0, 0, 0, 0, 0, 0, 0, 0];
  const add = (a: ArrayLike<number>, b: ArrayLike<number>, k: number) => {
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) h[3 * i + j] += k * a[i] * b[j];
  };
  for (const s of springs) if (s.group < 0) add(s.g, s.g, s.k);
  groups.forEach((g, gi) => {
    const st = states[gi];
    if (st === 0) return;
    const sn = springs[g.normal];
    if (st === 1) {
      add(sn.g, sn.g, sn.k);
      if (g.tangent >= 0) add(springs[g.tangent].g, springs[g.tangent].g, springs[g.tangent].k);
      return;
    }
    const sign = st === 2 ? 1 : -1;
    const mu = muOf(model, g);
    const gt = springs[g.tangent].g;
    add([sn.g[0] + sign * mu * gt[0], sn.g[1] + sign * mu * gt[1], sn.g[2] + sign * mu * gt[2]], sn.g, sn.k);
  });
  const q = leastSquares(h, Q);
  const hq = [0, 1, 2].map((i) => h[3 * i] * q[0] + h[3 * i + 1] * q[1] + h[3 * i + 2] * q[2]);
  if (Math.hypot(hq[0] - Q[0], hq[1] - Q[1], hq[2] - Q[2]) > tol) return null;

  const r: number[] = springs.map((s: Spring) => (s.group < 0 ? -s.k * dot3(s.g, q) : 0));
  const sliding = groups.map(() => false);
  for (let gi = 0; gi < groups.length; gi++) {
    const g = groups[gi];
    const st = states[gi];
    const sn = springs[g.normal];
    const n = -sn.k * dot3(sn.g, q);
    if (st === 0) {
      if (n > tol) return null; // overlapping: the gap k·gᵀq must not be negative
      continue;
    }
    if (n < -tol) return null;
    r[g.normal] = n;
    if (g.tangent < 0) continue;
    const sTan = springs[g.tangent];
    const trial = -sTan.k * dot3(sTan.g, q);
    const limit = muOf(model, g) * Math.max(n, 0);
    if (st === 1) {
      if (Math.abs(trial) > limit + tol) return null;
      r[g.tangent] = trial;
    } else {
      // it slides when the grip would need more than the limit, the same way round
      const sign = st === 2 ? 1 : -1;
      if (sign * trial < limit - tol) return null;
      r[g.tangent] = sign * limit;
      sliding[gi] = true;
    }
  }
  return { r, q, engaged: states.map((s) => s !== 0), sliding };
}

/**
 * Solution of a general 3 × 3 system: by Cramer's rule when it is clearly regular (exact to
 * rounding), else in the least-squares sense through the normal equations.
 */
function leastSquares(h: number[], b: ArrayLike<number>): Vec3 {
  const c = [h[4] * h[8] - h[5] * h[7], h[5] * h[6] - h[3] * h[8], h[3] * h[7] - h[4] * h[6]];
  const det = h[0] * c[0] + h[1] * c[1] + h[2] * c[2];
  const size = Math.max(...h.map(Math.abs));
  if (Math.abs(det) > 1e-9 * size * size * size) {
    const col = (j: number, m: number[]) => m.map((v, i) => (i % 3 === j ? b[Math.floor(i / 3)] : v));
    const d = (m: number[]) => m[0] * (m[4] * m[8] - m[5] * m[7]) - m[1] * (m[3] * m[8] - m[5] * m[6]) + m[2] * (m[3] * m[7] - m[4] * m[6]);
    return [d(col(0, h)) / det, d(col(1, h)) / det, d(col(2, h)) / det];
  }
  const hth = [0, 0, 0, 0, 0, 0, 0, 0, 0];
  const htb: Vec3 = [0, 0, 0];
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) for (let k = 0; k < 3; k++) hth[3 * i + j] += h[3 * k + i] * h[3 * k + j];
    for (let k = 0; k < 3; k++) htb[i] += h[3 * k + i] * b[k];
  }
  return solvePsd(hth, htb).x;
}

/**
 * Can forces inside the friction cones (n ≥ 0, |t| ≤ μ·n at every contact, ties pulling, the
 * bilateral supports free) balance the loads? Each cone is spanned by its two edges n ± μ·t, so
 * this is the proof of `findRay` with every friction contact replaced by its two edges.
 */
export function frictionCanHold(model: BodyModel): boolean {
  const springs: Spring[] = model.springs.filter((s) => s.group < 0);
  const groups: Group[] = [];
  const oneSided = (support: number, g: number[], kind: Group["kind"]) => {
    springs.push({ support, role: "n", g, k: 1, group: groups.length });
    groups.push({ support, normal: springs.length - 1, tangent: -1, kind });
  };
  for (const g of model.groups) {
    const gn = model.springs[g.normal].g;
    if (g.tangent < 0) {
      oneSided(g.support, gn, g.kind);
      continue;
    }
    const gt = model.springs[g.tangent].g;
    const mu = muOf(model, g);
    for (const sign of [1, -1]) oneSided(g.support, [gn[0] + sign * mu * gt[0], gn[1] + sign * mu * gt[1], gn[2] + sign * mu * gt[2]], g.kind);
  }
  if (norm3(model.Q) === 0) return true;
  return findRay({ ...model, springs, groups }, "proof") === null;
}
