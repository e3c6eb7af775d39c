// A scalar read from a solve result, for sweeps and the limit finder.
import type { SolveResult } from "./types";

export type QuantityComponent =
  | "fx"
  | "fy"
  | "m"
  | "n"
  | "t"
  | "resultant"
  | "margin"
  | "frictionRatio"
  | "frictionMargin";

export interface QuantitySpec {
  /** a support id */
  support: string;
  component: QuantityComponent;
}

/** The value of a quantity, or NaN when the result does not have it. */
export function readQuantity(result: SolveResult, q: QuantitySpec): number {
  const r = result.reactions[q.support];
  if (!r) return Number.NaN;
  switch (q.component) {
    case "fx":
    case "fy":
    case "m":
      return r[q.component];
    case "n":
    case "t":
      return r[q.component] ?? Number.NaN;
    case "resultant":
      return Math.hypot(r.fx, r.fy);
    case "margin":
      return r.margin ?? Number.NaN;
    case "frictionRatio":
      // |t| / n, and for a lifted contact the ratio it would need is unbounded
      return r.friction ? r.friction.needed : Number.NaN;
    case "frictionMargin": {
      // μ·n − |t|: positive while friction holds, crossing zero where it is used up
      // a bearing contact without friction data has no μ (frictionless): nothing to use up
      if (r.kind !== "contact" || r.t === undefined || r.n === undefined || (r.state === "bearing" && !r.friction)) return Number.NaN;
      const mu = r.friction?.mu ?? 0;
      return mu * Math.max(r.n, 0) - Math.abs(r.t);
    }
  }
}

/** "margin at front jack": `names` gives the supports' labels (by id); without, the id. */
export function describeQuantity(q: QuantitySpec, names: Readonly<Record<string, string>> = {}): string {
  const words: Record<QuantityComponent, string> = {
    fx: "x-reaction",
    fy: "y-reaction",
    m: "moment",
    n: "normal force",
    t: "tangential force",
    resultant: "resultant",
    margin: "margin",
    frictionRatio: "friction needed",
    frictionMargin: "friction margin (μ·n − |t|)",
  };
  return `${words[q.component]} at ${names[q.support] ?? q.support}`;
}

/**
 * A figure of a check or a limit: `sig` significant figures with trailing zeros kept ("12.50",
 * "3.100", "0.09818", "18.14"), so every number says how far it is given; whole numbers from 1,000
 * with separators ("1,235"); below 1e-6, in e-notation ("1.200e-7"). The value is rounded to 10
 * figures first, so a value and the same value with floating-point noise on it (0.098175 and
 * 0.0981749999999) are written alike.
 */
export function formatFigures(x: number, sig = 4): string {
  if (!Number.isFinite(x)) return x > 0 ? "∞" : x < 0 ? "−∞" : "—";
  const v = Number(x.toPrecision(10));
  const r = Number(v.toPrecision(sig));
  if (r === 0) return "0";
  const s = Math.abs(r) >= 1000 ? Math.round(v).toLocaleString("en-US") : r.toPrecision(sig);
  return s.replace(/^-/, "−");
}

/** A small figure that is not a result but its noise or tolerance, to one or two figures in e-notation: "1.2e-12", "−3e-9". */
export function formatTiny(x: number, digits = 1): string {
  if (x === 0) return "0";
  return x.toExponential(digits).replace(/\.?0+e/, "e").replace(/e\+/, "e").replace(/^-/, "−");
}
