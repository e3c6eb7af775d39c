// Numeric fields hold a number (SI) or an expression string. These helpers move between the
// text a user types and what the file stores.
import type { Numeric } from "@/solver/schema";

const PLAIN_NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/** What a typed text stores: a plain number as a number, anything else as an expression, blank as nothing. */
export function toNumeric(text: string): Numeric | undefined {
  const t = text.trim().replace(/^−/, "-");
  if (!t) return undefined;
  if (PLAIN_NUMBER.test(t)) {
    const n = Number(t);
    if (Number.isFinite(n)) return n;
  }
  return t;
}

/** The text an input shows for a stored value. */
export function numericText(v: Numeric | undefined | null): string {
  if (v === undefined || v === null) return "";
  if (typeof v === "number") return Number.isFinite(v) ? String(roundTo(v, 1e-9)) : "";
  return v;
}

/** How far a quotient may be from a half, relative to it, and still count as one: a few dozen
 *  units of floating round-off (64 ε ≈ 1.4e-14), never a real difference in the value. */
const HALF_TOLERANCE = 64 * Number.EPSILON;

/**
 * The whole number nearest q, a half going away from zero (2.5 → 3, −2.5 → −3: a drawing mirrored
 * about an axis snaps as its mirror image does). A quotient within floating error of a half counts
 * as that half: 0.3 / 0.2 computes as 1.4999999999999998 and rounds as 1.5 does, to 2. Every
 * rounding of a typed or snapped value in the editor goes through here.
 */
export function roundHalfAway(q: number): number {
  if (!Number.isFinite(q)) return q;
  const a = Math.abs(q);
  const whole = Math.floor(a);
  const up = a - whole >= 0.5 - HALF_TOLERANCE * Math.max(1, a);
  return Math.sign(q) * (up ? whole + 1 : whole) || 0;
}

/** The decimals a multiple of this step needs at most (0.2 → 1, 0.25 → 2, 1e-6 → 6, 5 → 0). */
export function decimalsOf(step: number): number {
  const [mantissa, exponent] = step.toExponential().split("e");
  return Math.max(0, (mantissa.split(".")[1]?.length ?? 0) - Number(exponent));
}

/** Round to a step (a half away from zero, see `roundHalfAway`), without the 0.30000000000000004 noise. */
export function roundTo(x: number, step = 1e-6): number {
  if (!Number.isFinite(x) || !(step > 0)) return x;
  const r = roundHalfAway(x / step) * step;
  return Number(r.toFixed(Math.min(decimalsOf(step), 15))) || 0;
}

/** A stored value as a plain number when it is one (or a string holding only a number). */
export function plainNumber(v: Numeric | undefined): number | undefined {
  if (typeof v === "number") return v;
  if (typeof v === "string" && PLAIN_NUMBER.test(v.trim())) return Number(v.trim());
  return undefined;
}
