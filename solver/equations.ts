// The hand-check sums: ΣFx, ΣFy and ΣM about any point, from the labelled terms of a result.
import type { BodyEquations, EquationTerm, Vec2 } from "./types";

/** Moment of one term about point p: (r − p) × F plus its couple. */
export function termMomentAbout(t: EquationTerm, p: Vec2): number {
  const arm = t.at ? (t.at[0] - p[0]) * t.fy - (t.at[1] - p[1]) * t.fx : 0;
  return arm + t.m;
}

export interface HandCheckSums {
  about: Vec2;
  forces: { fx: number; fy: number; m: number };
  momentum: { fx: number; fy: number; m: number };
  /** forces − momentum: zero when the body is in equilibrium */
  imbalance: { fx: number; fy: number; m: number };
}

export function handCheckSums(eq: BodyEquations, about: Vec2): HandCheckSums {
  const sum = (terms: EquationTerm[]) =>
    terms.reduce((acc, t) => ({ fx: acc.fx + t.fx, fy: acc.fy + t.fy, m: acc.m + termMomentAbout(t, about) }), { fx: 0, fy: 0, m: 0 });
  const forces = sum(eq.forces);
  const momentum = sum(eq.momentum);
  return {
    about,
    forces,
    momentum,
    imbalance: { fx: forces.fx - momentum.fx, fy: forces.fy - momentum.fy, m: forces.m - momentum.m },
  };
}
