// Round axis ticks for the plots on screen and in the calc sheet: a step of 1, 2 or 5 times a power
// of ten, the one nearest the range over the count (Heckbert, "Nice numbers for graph labels",
// Graphics Gems, 1990), each tick a whole multiple of the step (−80, −60, −40…, not −90, −67.5…).

/** About `count` round ticks from `lo` to `hi` (both included when they fall on a tick). */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) return [];
  if (!(hi > lo)) return [lo];
  const step0 = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(step0));
  const f = step0 / mag;
  const step = (f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10) * mag;
  const out: number[] = [];
  // multiples of the step, rounded to its precision so 0.1 + 0.2 does not print as 0.30000000000000004
  for (let k = Math.ceil(lo / step - 1e-9); k * step <= hi + step * 1e-9; k++) out.push(k === 0 ? 0 : Number((k * step).toPrecision(12)));
  return out;
}

/** A range widened to the round ticks just outside it, with those ticks, so the top and bottom of a
 *  plot are labelled (a curve up to 7.4 on an axis from 0 to 8, not one whose last label is 6). */
export function niceDomain(lo: number, hi: number, count = 5): { lo: number; hi: number; ticks: number[] } {
  const inner = niceTicks(lo, hi, count);
  if (inner.length < 2) return { lo, hi, ticks: inner };
  const step = inner[1] - inner[0];
  const a = Math.floor(lo / step + 1e-9);
  const b = Math.ceil(hi / step - 1e-9);
  const ticks: number[] = [];
  for (let k = a; k <= b; k++) ticks.push(k === 0 ? 0 : Number((k * step).toPrecision(12)));
  return { lo: ticks[0], hi: ticks[ticks.length - 1], ticks };
}
