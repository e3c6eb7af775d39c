// The hand check as lines a person can follow: ΣFx, ΣFy and ΣM about a chosen point, each the
// sum of labelled terms on the control volume, set against the momentum flux out minus in.
import { handCheckSums, termMomentAbout } from "@/solver/equations";
import type { BodyEquations, EquationTerm, Vec2 } from "@/solver/types";

export interface HandCheckLine {
  id: string;
  label: string;
  value: number;
  /** where the force acts (m), for the moment lines */
  at?: Vec2;
  couple?: boolean;
}

export interface HandCheckBlock {
  key: "fx" | "fy" | "m";
  /** "ΣFx", "ΣFy", "ΣM about P" */
  title: string;
  forces: HandCheckLine[];
  forcesSum: number;
  momentum: HandCheckLine[];
  momentumSum: number;
  /** forces − momentum: zero when the body is in equilibrium */
  imbalance: number;
}

const line = (t: EquationTerm, value: number): HandCheckLine => ({ id: t.id, label: t.label, value, at: t.at, couple: t.kind === "couple" });

export function handCheckBlocks(eq: BodyEquations, about: Vec2): HandCheckBlock[] {
  const sums = handCheckSums(eq, about);
  const block = (key: "fx" | "fy" | "m", title: string, pick: (t: EquationTerm) => number): HandCheckBlock => ({
    key,
    title,
    forces: eq.forces.map((t) => line(t, pick(t))),
    forcesSum: sums.forces[key],
    momentum: eq.momentum.map((t) => line(t, pick(t))),
    momentumSum: sums.momentum[key],
    imbalance: sums.imbalance[key],
  });
  return [
    block("fx", "ΣFx", (t) => t.fx),
    block("fy", "ΣFy", (t) => t.fy),
    block("m", "ΣM about P", (t) => termMomentAbout(t, about)),
  ];
}

/** Where the hand check takes moments by default: the first support of the body, else its centre of gravity. */
export function defaultMomentPoint(eq: BodyEquations | undefined, cg: Vec2 | undefined): Vec2 {
  const support = eq?.forces.find((t) => t.kind === "reaction" && t.at);
  return support?.at ?? cg ?? [0, 0];
}
