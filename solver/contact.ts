// Reactions of a rigid body on stiff springs, some of them one-sided (contacts push, ties pull).
//
// With the engaged springs H = Σ k g gᵀ, the body's small displacement solves H q = Q and each
// spring carries r = −k gᵀq. A one-sided group (a contact with its friction spring, or a tie) is
// engaged while it carries n ≥ 0 and released while its gap gᵀq ≥ 0. The active set is searched
// one change at a time from "everything engaged": release the most negative, or engage the one
// that penetrates most; when the engaged springs cannot hold Q, follow the motion Q drives —
// it closes released groups (engage them) or closes none, and then nothing can hold the body:
// that motion is the free motion of a body that tips.
import { addOuter, dot3, norm3, solvePsd, zeroMat3, type Vec3 } from "./linalg";
import type { BodyModel } from "./model";
import { findRay } from "./ray";
import { frictionCanHold, solveWithSlip } from "./slip";

export interface SpringSolution {
  /** force in each spring (N, or N·m for a rotational spring) */
  r: number[];
  /** generalized displacement */
  q: Vec3;
  /** per group: engaged? */
  engaged: boolean[];
  /** when nothing can hold the body: the motion the loads drive (scaled generalized direction) */
  ray?: Vec3;
  /** Q's part that the engaged springs cannot balance (non-zero only with a ray) */
  unbalanced: Vec3;
  /**
   * with a ray from the search: the last engagement it tried that balances the body, in which the
   * supports that would have to pull still do. Its n and gaps continue those of the held body
   * through the onset of tipping (the margins).
   */
  pull?: { r: number[]; q: Vec3 };
  /** per group: sliding at the friction limit (t = ±μ·n), when only Coulomb's law settles it */
  sliding?: boolean[];
  /** with a ray: friction contacts the motion slides along while closed (friction cannot hold it) */
  slides?: boolean[];
  /** with `slides`: forces inside the friction cones could balance the loads (a preload could jam it) */
  couldJam?: boolean;
  /** set when no consistent engagement was found (a degenerate case); the result is the last tried */
  inconsistent?: boolean;
}

const MAX_ITERATIONS = 200;
const ENUMERATE_UP_TO = 12;

/** Solve with a given engagement; springs of released groups carry nothing. */
export function solveEngaged(model: BodyModel, engaged: boolean[]): SpringSolution {
  const h = zeroMat3();
  const { springs } = model;
  for (const s of springs) if (s.group < 0 || engaged[s.group]) addOuter(h, s.g, s.k);
  const { x: q, nullPart } = solvePsd(h, model.Q);
  const r: number[] = new Array(springs.length).fill(0);
  for (let i = 0; i < springs.length; i++) {
    const s = springs[i];
    if (s.group < 0 || engaged[s.group]) r[i] = -s.k * dot3(s.g, q);
  }
  return { r, q, engaged, unbalanced: nullPart };
}

/** Every support bilateral (the "required" reactions, and the unrestrained check). */
export function solveBilateral(model: BodyModel): SpringSolution {
  return solveEngaged(model, model.groups.map(() => true));
}

export function solveOneSided(model: BodyModel): SpringSolution {
  const { groups, springs, scale } = model;
  const forceTol = 1e-9 * scale;
  let engaged = groups.map(() => true);
  if (groups.length === 0) return solveEngaged(model, engaged);
  const seen = new Set<string>();
  let lastBalanced: SpringSolution | null = null;

  for (let iter = 0; iter < MAX_ITERATIONS; iter++) {
    const key = engaged.map((e) => (e ? "1" : "0")).join("");
    if (seen.has(key)) break;
    seen.add(key);
    const sol = solveEngaged(model, engaged);

    if (norm3(sol.unbalanced) > forceTol) {
      // The engaged springs cannot hold Q: the body moves along z (Qᵀz > 0, z in H's null space).
      const z = sol.unbalanced;
      const zn = norm3(z);
      const closing: number[] = [];
      groups.forEach((g, gi) => {
        if (engaged[gi]) return;
        const gn = springs[g.normal].g;
        // closes, or (a friction contact) would grip the sliding motion: even one that the motion
        // opens may hold, engaged, by friction under a small normal force
        const gt = g.tangent >= 0 ? springs[g.tangent].g : null;
        if (dot3(gn, z) < -1e-9 * norm3(gn) * zn || (gt && Math.abs(dot3(gt, z)) > 1e-9 * norm3(gt) * zn)) closing.push(gi);
      });
      if (closing.length === 0) return { ...sol, ray: z, ...(lastBalanced ? { pull: { r: lastBalanced.r, q: lastBalanced.q } } : {}) };
      engaged = engaged.slice();
      for (const gi of closing) engaged[gi] = true;
      continue;
    }
    lastBalanced = sol;

    // Most negative engaged group, and most penetrating released group (as a force: k × overlap).
    let worstPull = -forceTol;
    let release = -1;
    let worstPen = -forceTol;
    let engage = -1;
    groups.forEach((g, gi) => {
      const s = springs[g.normal];
      if (engaged[gi]) {
        if (sol.r[g.normal] < worstPull) {
          worstPull = sol.r[g.normal];
          release = gi;
        }
      } else {
        const pen = s.k * dot3(s.g, sol.q); // gap × k; negative when overlapping
        if (pen < worstPen) {
          worstPen = pen;
          engage = gi;
        }
      }
    });
    if (release < 0 && engage < 0) return sol;
    engaged = engaged.slice();
    if (release >= 0) engaged[release] = false;
    else engaged[engage] = true;
  }
  // The search cycled: settle it exactly, by a proof that nothing holds the body, or by trying
  // every engagement when there are few.
  const released = () => solveEngaged(model, groups.map(() => false));
  const proof = findRay(model, "proof");
  if (proof) return { ...released(), ray: proof };
  const found = enumerate(model);
  if (found && found !== "none") return found;
  // No engagement is consistent with the friction springs (engaged, a friction contact's
  // tangential spring makes it pull; released, the body closes it), or there are too many to try.
  // Normal forces alone may still hold the body: that answer (t = 0) meets equilibrium, n ≥ 0,
  // the gaps and |t| ≤ μ·n, so it stands — a body on a fixed support never "tips".
  const frictionless = withoutFriction(model);
  const held = frictionless ? solveOneSided(frictionless) : null;
  if (held && !held.ray && !held.inconsistent) return held;
  // Coulomb's law itself: contacts may slide at the limit (see slip.ts).
  const slip = frictionless ? solveWithSlip(model) : null;
  if (slip) return { ...slip, unbalanced: [0, 0, 0] };
  // Friction contacts spoil the proof that nothing holds the body (engaged, one can hold any
  // tangential force under a vanishing normal one). The motion that opens them and slides along
  // them describes how the body goes.
  const motion = found === "none" ? findRay(model, "motion") : null;
  if (motion) return { ...released(), ray: motion };
  // Nothing holds it, so it must slide along a closed friction contact: the motion is the one the
  // loads drive with the friction left out (a proof that normal forces alone cannot hold it).
  if (held?.ray) return { ...released(), ray: held.ray, slides: slidesAlong(model, held.ray), couldJam: frictionCanHold(model) };
  return { ...solveEngaged(model, engaged), inconsistent: true };
}

/** Per group: a friction contact that the motion z slides along while keeping it closed. */
function slidesAlong(model: BodyModel, z: Vec3): boolean[] {
  const zn = norm3(z);
  return model.groups.map((g) => {
    if (g.tangent < 0) return false;
    const gn = model.springs[g.normal].g;
    const gt = model.springs[g.tangent].g;
    return dot3(gn, z) <= 1e-9 * norm3(gn) * zn && Math.abs(dot3(gt, z)) > 1e-9 * norm3(gt) * zn;
  });
}

/** The model with its friction springs left out: contacts carry normal force only (null without any). */
function withoutFriction(model: BodyModel): BodyModel | null {
  if (!model.groups.some((g) => g.tangent >= 0)) return null;
  return {
    ...model,
    springs: model.springs.map((s) => (s.role === "t" ? { ...s, k: 0 } : s)),
    groups: model.groups.map((g) => ({ ...g, tangent: -1 })),
  };
}

/**
 * Last resort after a cycle: try every engagement (few groups only) and keep a consistent one;
 * "none" when every one was tried, null when there are too many to try.
 */
function enumerate(model: BodyModel): SpringSolution | "none" | null {
  const { groups, springs, scale } = model;
  if (groups.length > ENUMERATE_UP_TO) return null;
  const forceTol = 1e-9 * scale;
  for (let mask = (1 << groups.length) - 1; mask >= 0; mask--) {
    const engaged = groups.map((_, i) => (mask & (1 << i)) !== 0);
    const sol = solveEngaged(model, engaged);
    if (norm3(sol.unbalanced) > forceTol) continue;
    const ok = groups.every((g, gi) => {
      const s = springs[g.normal];
      return engaged[gi] ? sol.r[g.normal] >= -forceTol : s.k * dot3(s.g, sol.q) >= -forceTol;
    });
    if (ok) return sol;
  }
  return "none";
}
