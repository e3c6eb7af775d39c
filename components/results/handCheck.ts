// The hand check as lines a person can follow: ΣFx, ΣFy and ΣM about a chosen point, each the
// sum of labelled terms on the control volume, set against the momentum flux out minus in.
import { handCheckSums, termMomentAbout } from "@/solver/equations";
import { HAND_CHECK_FIGURES, handCheckClean, handCheckDifferenceText, handCheckNumber, handCheckSides, notHeldAgreement, type Scale } from "@/solver/report";
import type { BodyEquations, EquationTerm, Status, Vec2 } from "@/solver/types";

export interface HandCheckLine {
  id: string;
  label: string;
  value: number;
  /** where the force acts (m), for the moment lines */
  at?: Vec2;
  couple?: boolean;
  /** a force that brings a couple of its own (a fixed support's m): in its moment line beside r × F */
  ownCouple?: number;
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

const line = (t: EquationTerm, value: number): HandCheckLine => ({
  id: t.id,
  label: t.label,
  value,
  at: t.at,
  couple: t.kind === "couple",
  ...(t.kind !== "couple" && t.at && t.m ? { ownCouple: t.m } : {}),
});

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

/** A block of the hand check as printed, every number by the one rule of the check (4 significant figures, trailing zeros kept). */
export interface HandCheckText {
  forces: string[];
  forcesSum: string;
  momentum: string[];
  momentumSum: string;
  /** forces − momentum: "0 kN", "1.2e-12 kN·m (rounding)", or the figure */
  difference: string;
  /** what the two sums come to side by side, in words */
  verdict: string;
}

/**
 * The numbers of a block in a shown unit. `scale` is the check's largest force and moment (SI),
 * against which floating-point noise is told from a figure; `show` converts an SI value to the unit.
 * Each Σ is of the unrounded terms; two sums that differ by rounding only print alike (see
 * `handCheckSides`), and their difference is said to be rounding, never a bare 0 beside them.
 * `status` is the body's: one that tips balances only with a support giving what it cannot (a contact
 * pulling), so two sides that agree are never said to agree without saying the body is not held.
 */
export function handCheckText(b: HandCheckBlock, scale: Scale, show: (si: number) => number, unit: string, status?: Status): HandCheckText {
  const figure = (si: number) => `${handCheckNumber(show(handCheckClean(si, scale)))} ${unit}`;
  const sides = handCheckSides(b.forcesSum, b.momentumSum, b.imbalance, scale);
  const forcesSum = `${handCheckNumber(show(sides.forces))} ${unit}`;
  const momentumSum = `${handCheckNumber(show(sides.momentum))} ${unit}`;
  return {
    forces: b.forces.map((t) => figure(t.value)),
    forcesSum,
    momentum: b.momentum.map((t) => figure(t.value)),
    momentumSum,
    difference: handCheckDifferenceText(show(sides.difference), sides.rounding, unit),
    verdict:
      forcesSum !== momentumSum
        ? "the two sides differ: the body is not in equilibrium on its supports as drawn"
        : `the two sides agree to ${HAND_CHECK_FIGURES} significant figures${notHeldAgreement(status)}`,
  };
}
