// The range a sweep starts with when the user picks a parameter: around the value it has now, in
// the unit it is written in — an angle ±90° about it, any other quantity from zero to twice it,
// the flow factor from 0 to 2 — so the first run already says something about the design.
import { evaluateTyped } from "@/solver/expressions";
import { FLOW_FACTOR } from "@/solver/sweep";
import { prettyUnit } from "@/solver/units";

export type ParameterValue = { value: number; unit: string } | { error: string } | undefined;

const ANGLE_SPAN: Record<string, number> = { deg: 90, rad: Math.PI / 2 };
const tidy = (x: number) => Number(x.toPrecision(4));

export function defaultSweepRange(parameter: string, current: ParameterValue): { from: number; to: number } {
  if (parameter === FLOW_FACTOR) return { from: 0, to: 2 };
  if (!current || "error" in current || !Number.isFinite(current.value)) return { from: 0, to: 1 };
  const { value, unit } = current;
  const span = ANGLE_SPAN[unit];
  if (span !== undefined) return { from: tidy(value - span), to: tidy(value + span) };
  if (value === 0) return { from: 0, to: 1 };
  return value > 0 ? { from: 0, to: tidy(2 * value) } : { from: tidy(2 * value), to: 0 };
}

/** The parameter a sweep offers first: an angle (what is usually turned), else the first one, else the flow factor. */
export function defaultSweepParameter(names: string[], values: Record<string, ParameterValue>): string {
  const angle = names.find((n) => {
    const v = values[n];
    return v !== undefined && !("error" in v) && v.unit in ANGLE_SPAN;
  });
  return angle ?? names[0] ?? FLOW_FACTOR;
}

/**
 * An end of the range as typed: a plain number is in the unit the parameter is written in (`unit`,
 * e.g. "m / s"); a value with its own unit ("90 km/hr", "0.3 rad") is converted to it. Throws an
 * error in words when the text is not a value of the parameter's kind.
 */
export function parseRangeValue(text: string, unit: string): number {
  const v = evaluateTyped(text);
  if (typeof v === "number") return v;
  if (!unit) throw new Error(`${text.trim()} has a unit, but this parameter is a plain number`);
  try {
    return v.toNumber(unit);
  } catch {
    throw new Error(`${text.trim()} cannot be written in ${prettyUnit(unit)}`);
  }
}
