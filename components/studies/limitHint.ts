// What the limit finder says when the quantity does not reach its target in the range searched:
// where it came closest, whether it is still heading for the target at an end of the range (so a
// wider search may find it), and the wider range to search. Pure: the Sweep tab shows the words and
// offers the range as a button.
import type { EndTrend, LimitResult } from "@/solver/limit";
import { limitWithUnit } from "@/solver/limit";
import { FLOW_FACTOR } from "@/solver/sweep";
import { formatNumber, prettyUnit } from "@/solver/units";

export interface NoLimitHint {
  /** the sentences after "No crossing in this range: …" */
  words: string;
  /** a wider range worth searching (in the parameter's unit), when the quantity heads for the target past an end */
  wider?: { from: number; to: number };
}

/** How far past an end a wider search goes at most: ten times the range searched. */
const MAX_WIDEN = 10;

/**
 * The hint under a search that found no crossing. `shown` writes a value of the quantity (SI) in
 * the unit on screen; `target` is the target as shown; `pName` the parameter in words.
 * A range that starts at or above zero for the flow factor is not widened below zero (no flow).
 */
export function noLimitHint(
  result: Extract<LimitResult, { found: false }>,
  range: { from: number; to: number },
  opts: {
    parameter: string;
    pName: string;
    target: string;
    shown: (si: number) => string;
    /** a contact's or tie's margin below zero all through the range: lifted off (slack) throughout,
     *  carrying nothing, where the margin's size is no force (see `carriesNothing`): no "closest" figure */
    released?: "lifted off" | "slack";
  },
): NoLimitHint {
  const lo = Math.min(range.from, range.to);
  const hi = Math.max(range.from, range.to);
  const unit = result.unit;
  const out: string[] = [];
  if (result.closest && !opts.released) out.push(`It comes closest at ${opts.pName} = ${limitWithUnit(result.closest.at, unit)}, where it is ${opts.shown(result.closest.value)}.`);
  const ends = result.ends;
  if (!ends) return { words: out.join(" ") };
  const width = hi - lo;
  const floor = opts.parameter === FLOW_FACTOR && lo >= 0 ? 0 : -Infinity;
  const heading = (trend: EndTrend, end: number, side: "below" | "above"): number | null => {
    if (!trend.toward || trend.estimate === undefined) return null;
    const past = Math.abs(trend.estimate - end);
    const far = past > MAX_WIDEN * width;
    const endWords = `${side === "above" ? "Past" : "Below"} ${formatNumber(end, 5)}${unit ? ` ${prettyUnit(unit)}` : ""}`;
    // a released support's margin (−k·gap) changes with the support stiffnesses and with which other
    // supports bear, so a line through it gives no value to quote: only the way it goes
    out.push(
      opts.released
        ? `${endWords} it is heading back toward ${opts.released === "slack" ? "taking load" : "bearing"}: a wider range may find where it does.`
        : `${endWords} it is still heading for ${opts.target}: a straight line through the last samples reaches it ${far ? "only far out, " : ""}near ${opts.pName} = ${limitWithUnit(trend.estimate, unit)} (an extrapolation, not a finding).`,
    );
    // half as far again as the line says (the curve may bend away), at most ten ranges out
    const step = Math.min(1.5 * past, MAX_WIDEN * width);
    return side === "above" ? end + step : Math.max(floor, end - step);
  };
  const newLo = heading(ends.lo, lo, "below");
  const newHi = heading(ends.hi, hi, "above");
  if (newLo === null && newHi === null) {
    out.push(
      opts.released
        ? `At both ends it is moving further from ${opts.released === "slack" ? "taking load" : "bearing"}: a wider range finds a crossing only if the curve turns back (the plot shows its shape).`
        : `At both ends it is moving away from ${opts.target}: a wider range finds a crossing only if the curve turns back (the plot shows its shape).`,
    );
    return { words: out.join(" ") };
  }
  const wider = roundOut(newLo ?? lo, newHi ?? hi);
  if (wider.from === lo && wider.to === hi) return { words: out.join(" ") };
  return { words: out.join(" "), wider: range.from <= range.to ? wider : { from: wider.to, to: wider.from } };
}

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
