// What the limit finder says when the quantity does not reach its target in the range searched:
// where it came closest, whether it is still heading for the target at an end of the range (so a
// wider search may find it), and the wider range to search. Pure: the Sweep tab shows the words and
// offers the range as a button; the calc sheet's and a version page's limits table
// (lib/calcsheet/sweeps.ts) and `npm run solve -- --limit` (cli.ts) say the compact words.
import type { EndTrend, LimitResult } from "./limit";
import { limitWithUnit } from "./limit";
import { FLOW_FACTOR } from "./sweep";
import { kindOfUnit, type FieldKind } from "./expressions";
import { formatNumber, prettyUnit } from "./units";
import type { QuantitySpec } from "./quantity";
import type { SketchFile } from "./schema";

export interface NoLimitHint {
  /** the sentences after "No crossing in this range: …" */
  words: string;
  /** a wider range worth searching (in the parameter's unit), when the quantity heads for the target past an end */
  wider?: { from: number; to: number };
}

/** How far past an end a wider search goes at most: ten times the range searched. */
const MAX_WIDEN = 10;

interface HintOpts {
  parameter: string;
  pName: string;
  target: string;
  shown: (si: number) => string;
  /** a contact's or tie's margin below zero all through the range: lifted off (slack) throughout,
   *  carrying nothing, where the margin's size is no force (see `carriesNothing`): no "closest" figure */
  released?: "lifted off" | "slack";
}

/** An end of the range past which the quantity heads for the target, and where a line reaches it. */
interface Heading {
  side: "below" | "above";
  end: number;
  estimate: number;
  /** the line reaches the target only more than ten ranges out */
  far: boolean;
  /** the line reaches it only below zero, which the parameter cannot be (`NON_NEGATIVE`): no value to quote */
  belowZero: boolean;
}

/** Quantities that have no meaning below zero: a range that starts at or above zero in one of these
 *  (a wind speed, a mass flow, a mass) is not widened, nor its trend told, below zero. */
const NON_NEGATIVE = new Set<FieldKind>(["mass", "massFlow", "velocity", "area", "density", "volumeFlow", "stiffness", "rotationalStiffness"]);

/** What both renderings say, read once from the result: the closest point, the ends heading for the target, the wider range. */
function hintParts(result: Extract<LimitResult, { found: false }>, range: { from: number; to: number }, opts: HintOpts) {
  const lo = Math.min(range.from, range.to);
  const hi = Math.max(range.from, range.to);
  const closest = result.closest && !opts.released ? result.closest : undefined;
  const ends = result.ends;
  const kind = kindOfUnit(result.unit);
  const floor = lo >= 0 && (opts.parameter === FLOW_FACTOR || (kind !== null && NON_NEGATIVE.has(kind))) ? 0 : -Infinity;
  // a flow factor (or a speed, a mass flow…) searched from 0: there is nothing below it, so no way to go there
  const floored = lo === floor;
  if (!ends) return { closest, headings: null as Heading[] | null, wider: undefined, floored, hi };
  const width = hi - lo;
  const headings: Heading[] = [];
  const heading = (trend: EndTrend, end: number, side: "below" | "above"): number | null => {
    if (!trend.toward || trend.estimate === undefined) return null;
    const past = Math.abs(trend.estimate - end);
    headings.push({ side, end, estimate: trend.estimate, far: past > MAX_WIDEN * width, belowZero: trend.estimate < floor });
    // half as far again as the line says (the curve may bend away), at most ten ranges out
    const step = Math.min(1.5 * past, MAX_WIDEN * width);
    return side === "above" ? end + step : Math.max(floor, end - step);
  };
  const newLo = floored ? null : heading(ends.lo, lo, "below");
  const newHi = heading(ends.hi, hi, "above");
  if (newLo === null && newHi === null) return { closest, headings, wider: undefined, floored, hi };
  const w = roundOut(newLo ?? lo, newHi ?? hi);
  const wider = w.from === lo && w.to === hi ? undefined : range.from <= range.to ? w : { from: w.to, to: w.from };
  return { closest, headings, wider, floored, hi };
}

/** Where the line through the last samples reaches the target: "near T = 1,634 N", "only far out, near …",
 *  or "only below 0 m/s" for a speed or a mass flow (no value it can take, so none is quoted). */
function lineWords(h: Heading, pName: string, unit: string): string {
  if (h.belowZero) return `only below ${endWithUnit(0, unit)}`;
  return `${h.far ? "only far out, " : ""}near ${pName} = ${limitWithUnit(h.estimate, unit)}`;
}

/** What the quantity is heading back toward when released all through: "bearing" or "taking load". */
const backToward = (released: "lifted off" | "slack") => (released === "slack" ? "taking load" : "bearing");

/**
 * The hint under a search that found no crossing. `shown` writes a value of the quantity (SI) in
 * the unit on screen; `target` is the target as shown; `pName` the parameter in words.
 * A range that starts at or above zero for the flow factor, or for a quantity with no meaning below
 * zero (`NON_NEGATIVE`: a speed, a mass flow…), is not widened below zero; one that starts at zero
 * says nothing of where the quantity heads below it, and a line that meets the target only below
 * zero is said so, with no value.
 */
export function noLimitHint(result: Extract<LimitResult, { found: false }>, range: { from: number; to: number }, opts: HintOpts): NoLimitHint {
  const unit = result.unit;
  const { closest, headings, wider, floored, hi } = hintParts(result, range, opts);
  const out: string[] = [];
  if (closest) out.push(`It comes closest at ${opts.pName} = ${limitWithUnit(closest.at, unit)}, where it is ${opts.shown(closest.value)}.`);
  if (!headings) return { words: out.join(" ") };
  for (const h of headings) {
    const endWords = `${h.side === "above" ? "Past" : "Below"} ${endWithUnit(h.end, unit)}`;
    // a released support's margin (−k·gap) changes with the support stiffnesses and with which other
    // supports bear, so a line through it gives no value to quote: only the way it goes
    out.push(
      opts.released
        ? `${endWords} it is heading back toward ${backToward(opts.released)}: a wider range may find where it does.`
        : `${endWords} it is still heading for ${opts.target}: a straight line through the last samples reaches it ${lineWords(h, opts.pName, unit)} (an extrapolation, not a finding).`,
    );
  }
  if (!headings.length)
    out.push(
      `${floored ? `Past ${endWithUnit(hi, unit)}` : "At both ends"} it is moving ${opts.released ? "further from" : "away from"} ${opts.released ? backToward(opts.released) : opts.target}: a wider range finds a crossing only if the curve turns back (the plot shows its shape).`,
    );
  return { words: out.join(" "), ...(wider ? { wider } : {}) };
}

/**
 * The same hint for a row of "In every case", in a few words after "no crossing in this range":
 * "closest 0.3807 kN at T = 1,000 N; past 1,000 N heading for 0 kN (a line reaches it near T =
 * 1,634 N)". Read from the result as `noLimitHint` reads it, with the same wider range.
 */
export function compactNoLimitHint(result: Extract<LimitResult, { found: false }>, range: { from: number; to: number }, opts: HintOpts): NoLimitHint {
  const unit = result.unit;
  const { closest, headings, wider, floored, hi } = hintParts(result, range, opts);
  const out: string[] = [];
  if (closest) out.push(`closest ${opts.shown(closest.value)} at ${opts.pName} = ${limitWithUnit(closest.at, unit)}`);
  for (const h of headings ?? [])
    out.push(
      `${h.side === "above" ? "past" : "below"} ${endWithUnit(h.end, unit)} heading ${
        opts.released ? `back toward ${backToward(opts.released)}` : `for ${opts.target} (a line reaches it ${lineWords(h, opts.pName, unit)})`
      }`,
    );
  if (headings && !headings.length) out.push(`moving ${opts.released ? `further from ${backToward(opts.released)}` : `away from ${opts.target}`} ${floored ? `past ${endWithUnit(hi, unit)}` : "at both ends"}`);
  return { words: out.join("; "), ...(wider ? { wider } : {}) };
}

/** The widest of the ranges offered (in the direction searched): one search that covers them all. */
export function widestOf(ranges: readonly ({ from: number; to: number } | undefined)[], range: { from: number; to: number }): { from: number; to: number } | undefined {
  const some = ranges.filter((r): r is { from: number; to: number } => r !== undefined);
  if (!some.length) return undefined;
  const lo = Math.min(...some.map((r) => Math.min(r.from, r.to)));
  const hi = Math.max(...some.map((r) => Math.max(r.from, r.to)));
  return range.from <= range.to ? { from: lo, to: hi } : { from: hi, to: lo };
}

const endWithUnit = (end: number, unit: string) => `${formatNumber(end, 5)}${unit ? ` ${prettyUnit(unit)}` : ""}`;

/** The ends of a range rounded outward to three figures of its width: values a person would type. */
export function roundOut(lo: number, hi: number): { from: number; to: number } {
  const width = hi - lo;
  if (!(width > 0)) return { from: lo, to: hi };
  const step = 10 ** (Math.floor(Math.log10(width)) - 2);
  const clean = (x: number) => Number(x.toPrecision(12));
  return { from: clean(Math.floor(lo / step + 1e-9) * step), to: clean(Math.ceil(hi / step - 1e-9) * step) };
}

/** A range as the button says it: "from −90 to 70 deg". */
export function rangeWords(r: { from: number; to: number }, unit: string): string {
  return `from ${formatNumber(r.from, 5)} to ${formatNumber(r.to, 5)}${unit ? ` ${prettyUnit(unit)}` : ""}`;
}

/**
 * How a search of a support's quantity without a crossing is read, in the single search and in
 * each row of "In every case" alike: a contact's or tie's margin below zero all through on a held
 * body is `released` (lifted off, or slack: it carries nothing, and its size is no force); a body
 * not held anywhere in the range is `loose` (its name: the quantity is what its supports would
 * need); `shown` writes a value (SI), "lifted off" ("slack") for a held body's margin below zero.
 */
export function noLimitReading(
  result: Extract<LimitResult, { found: false }>,
  q: QuantitySpec,
  supports: SketchFile["supports"],
  names: Readonly<Record<string, string>>,
  targetSI: number,
  inShown: (si: number) => string,
): { released?: "lifted off" | "slack"; loose?: string; shown: (si: number) => string } {
  const support = supports.find((x) => x.id === q.support);
  const released = q.component === "margin" && result.held === "all" && result.max < 0 && targetSI <= 0 ? (support?.kind === "tie" ? ("slack" as const) : ("lifted off" as const)) : undefined;
  const loose = result.held === "none" && support ? names[support.body] ?? support.body : undefined;
  const shown = (si: number) => (q.component === "margin" && si < 0 && loose === undefined ? (support?.kind === "tie" ? "slack" : "lifted off") : inShown(si));
  return { ...(released ? { released } : {}), ...(loose !== undefined ? { loose } : {}), shown };
}

/**
 * A run of a support's quantity without a crossing, in the compact words of a row of "In every
 * case" (`noLimitReading`, then `compactNoLimitHint`): the calc sheet's and a version page's limits
 * table and `npm run solve -- --limit` say it so. `shown` writes a value (SI) with its unit, `target`
 * is the target as shown. Nothing for a body held nowhere in the range (`loose`: its quantity is what
 * its supports would need, not a figure to quote) or a run with nothing sampled.
 */
export function runNoLimitWords(
  result: Extract<LimitResult, { found: false }>,
  q: QuantitySpec,
  supports: SketchFile["supports"],
  names: Readonly<Record<string, string>>,
  range: { from: number; to: number },
  o: { parameter: string; pName: string; targetSI: number; target: string; shown: (si: number) => string },
): { words: string; released?: "lifted off" | "slack"; wider?: { from: number; to: number } } | undefined {
  if (!Number.isFinite(result.min)) return undefined;
  const reading = noLimitReading(result, q, supports, names, o.targetSI, o.shown);
  if (reading.loose !== undefined) return undefined;
  const hint = compactNoLimitHint(result, range, { parameter: o.parameter, pName: o.pName, target: o.target, shown: reading.shown, released: reading.released });
  if (!hint.words) return undefined;
  return { words: hint.words, ...(reading.released ? { released: reading.released } : {}), ...(hint.wider ? { wider: hint.wider } : {}) };
}
