// The range a sweep starts with when the user picks a parameter: around the value it has now, in
// the unit it is written in — an angle ±90° about it, any other quantity from zero to twice it
// (or from where the sketch first solves, when it does not at zero), the flow factor from 0 to 2 —
// so the first run already says something about the design.
import { evaluateTyped } from "@/solver/expressions";
import { parseSketch } from "@/solver/parse";
import type { SketchFile } from "@/solver/schema";
import { sweeperOn } from "@/solver/studySweep";
import { FLOW_FACTOR } from "@/solver/sweep";
import { prettyUnit } from "@/solver/units";

export type ParameterValue = { value: number; unit: string } | { error: string } | undefined;

const ANGLE_SPAN: Record<string, number> = { deg: 90, rad: Math.PI / 2 };
const tidy = (x: number) => Number(x.toPrecision(4));

/** Whether the sketch solves with the swept parameter at `value` (in the unit it is written in):
 *  false where that value is an input error (a density, an area or a diameter of 0). */
export type SolvesAt = (value: number) => boolean;

/**
 * The range a new sweep of `parameter` starts with. Any quantity but an angle or the flow factor runs
 * from zero to twice its value (a negative one from twice it to zero), because zero is usually the
 * meaningful other end: no flow, no pressure, no offset. But many quantities cannot be zero — a
 * density, a port's area or diameter, a mass something is divided by — and a range that starts on an
 * input error opens the tab on "Not solved" at the plot's start. So when `solvesAt` says the sketch
 * does not solve at zero, the end at zero moves to a tenth of the value, rounded to two significant
 * figures (998 kg/m³ → 100 kg/m³: a tenfold span still shows the trend), if the sketch solves there,
 * else to the value itself (the sketch as drawn). At most two solves, never a sweep. Our own rule.
 */
export function defaultSweepRange(parameter: string, current: ParameterValue, solvesAt?: SolvesAt): { from: number; to: number } {
  if (parameter === FLOW_FACTOR) return { from: 0, to: 2 };
  if (!current || "error" in current || !Number.isFinite(current.value)) return { from: 0, to: 1 };
  const { value, unit } = current;
  const span = ANGLE_SPAN[unit];
  if (span !== undefined) return { from: tidy(value - span), to: tidy(value + span) };
  if (value === 0) return { from: 0, to: 1 };
  const far = tidy(2 * value);
  let near = 0;
  if (solvesAt && !solvesAt(0)) {
    const tenth = Number((value / 10).toPrecision(2));
    near = solvesAt(tenth) ? tenth : tidy(value);
  }
  return value > 0 ? { from: near, to: far } : { from: far, to: near };
}

/**
 * `SolvesAt` for `parameter` of the sketch as drawn: each call is one solve of a fresh parse of the
 * file (parsed on the first call), so the analysis's own sketch is never touched. A sketch that does
 * not read says yes: its errors are the tab's to say, not a reason to move the range.
 */
export function solvesAtIn(file: SketchFile, parameter: string): SolvesAt {
  let sweeper: ReturnType<typeof sweeperOn> | null | undefined;
  return (value) => {
    if (sweeper === undefined) {
      const p = parseSketch(file);
      try {
        sweeper = p.ok ? sweeperOn(p.file, {}, parameter, p.sketch) : null;
      } catch {
        sweeper = null;
      }
    }
    if (!sweeper) return true;
    try {
      return sweeper.at(value).ok;
    } catch {
      return false;
    } finally {
      sweeper.restore();
    }
  };
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
