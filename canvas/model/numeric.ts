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

/** Round to a step, without the 0.30000000000000004 noise. */
export function roundTo(x: number, step = 1e-6): number {
  if (!Number.isFinite(x)) return x;
  const r = Math.round(x / step) * step;
  const digits = Math.max(0, Math.ceil(-Math.log10(step)));
  return Number(r.toFixed(Math.min(digits, 12))) || 0;
}

/** A stored value as a plain number when it is one (or a string holding only a number). */
export function plainNumber(v: Numeric | undefined): number | undefined {
  if (typeof v === "number") return v;
  if (typeof v === "string" && PLAIN_NUMBER.test(v.trim())) return Number(v.trim());
  return undefined;
}
