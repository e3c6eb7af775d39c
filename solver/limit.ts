// The limit finder: where does a quantity (a reaction component, a margin, a friction ratio)
// reach a target as one parameter varies? The range is sampled; each sign change of
// quantity − target is refined with Brent's method (bracketing root finder), and each run of
// samples exactly at the target (a contact's n once it has lifted) counts once, at the first
// point where it starts, found by bisection — or, for a run the range starts in, where it ends.
//
// Where the body starts or stops tipping the reported reactions switch from the one-sided
// solution to the ones equilibrium would require with every support bilateral, so the quantity
// jumps. Such a change of status is found by bisection too; it is a crossing when the quantity
// jumps across the target there, or when it reaches the target on the side where the body
// holds (the contact whose lift-off starts the tipping: its n falls to zero just before).
//
// A contact's friction is read only where it has any (`sweptQuantity`): off the ground, or on a
// body that tips, its friction margin is undefined, so lifting off is never taken for slipping.
import { formatFigures, formatTiny, type QuantitySpec } from "./quantity";
import { createSweeper, sweptQuantity, type Sweeper } from "./sweep";
import type { Sketch, SolveResult } from "./types";
import { prettyUnit } from "./units";

export interface LimitOptions {
  /** samples across the range when looking for brackets (default 64) */
  samples?: number;
  /** absolute tolerance on the parameter (default 1e-9 of the range) */
  tolerance?: number;
}

export type LimitResult =
  | {
      found: true;
      /** the first crossing, in the parameter's unit */
      value: number;
      unit: string;
      /** every crossing found in the range, ascending */
      crossings: number[];
      iterations: number;
      /** the search's tolerance on the parameter: each crossing is found to within ± this (absent on results made by hand) */
      tolerance?: number;
    }
  | {
      found: false;
      unit: string;
      reason: string;
      /** the least and largest value of the quantity seen in the range */
      min: number;
      max: number;
      /** where in the range the quantity comes closest to the target, and its value there (a
       *  support's quantity searched by `findLimitWith`; absent where it is undefined throughout) */
      closest?: { at: number; value: number };
      /** at each end of the range, which way the quantity goes (see `EndTrend`) */
      ends?: { lo: EndTrend; hi: EndTrend };
      /** whether the body was held (holds or lifts) at every sample where the quantity is defined,
       *  at none of them (it tips, or nothing holds it, all through), or at some */
      held?: "all" | "none" | "some";
    };

/**
 * The quantity at one end of a range searched without a crossing: whether, going out past that
 * end, it is heading for the target (the gap to it shrinks over the last step of the samples), and
 * if so where a straight line through the last two samples would reach the target. That line is an
 * extrapolation, not a finding: it says whether a wider range is worth a search, and how wide.
 */
export interface EndTrend {
  toward: boolean;
  /** the parameter value where the line through the last two samples reaches the target (only when `toward`) */
  estimate?: number;
}

/** How close to the target, relative to the quantity's size in the range, counts as reaching it at a change of status. */
const TOUCH = 1e-6;

interface Sample {
  x: number;
  /** quantity − target (NaN where the sketch is invalid or the quantity undefined) */
  f: number;
  /** the support's body holds or lifts (its reactions are the one-sided solution) */
  held: boolean;
  /** this sample and the next one sit either side of a change of status, closer than the tolerance */
  boundary?: boolean;
}

export function findLimit(
  sketch: Sketch,
  parameter: string,
  range: readonly [number, number],
  quantity: QuantitySpec,
  target = 0,
  options: LimitOptions = {},
): LimitResult {
  return findLimitWith(createSweeper(sketch, parameter), range, quantity, target, options);
}

/** The limit search with a sweeper made for it (of a sketch, or of a combination: solver/studySweep.ts); restores it after. */
export function findLimitWith(
  sweeper: Sweeper,
  range: readonly [number, number],
  quantity: QuantitySpec,
  target = 0,
  options: LimitOptions = {},
): LimitResult {
  return searchWith(
    sweeper,
    range,
    (result) => {
      const body = result.reactions[quantity.support]?.body;
      return { value: sweptQuantity(result, quantity), held: body !== undefined && isHeld(result, body) };
    },
    target,
    options,
  );
}

const isHeld = (result: SolveResult, body: string): boolean => {
  const status = result.bodies[body]?.status;
  return status === "holds" || status === "lifts";
};

/**
 * Where a body starts to slide as a whole as the parameter goes across the range: its sliding
 * margin (`bodySlidingMargin`) reaches zero, found as `findLimitWith` finds a friction margin's
 * (sampled, each sign change refined with Brent's method, to the same tolerance).
 */
export function findBodySlidingWith(sweeper: Sweeper, range: readonly [number, number], body: string, options: LimitOptions = {}): LimitResult {
  return searchWith(sweeper, range, (result) => ({ value: bodySlidingMargin(result, body), held: isHeld(result, body) }), 0, options);
}

/**
 * The friction a body has to spare against sliding as a whole (N): Σ μ·n − |Σ t| over its bearing
 * contacts with a μ, the vector sum of their tangential forces. It reaches zero where the stability
 * check's factor against sliding (Σ μ·n over |Σ t|, solver/stability.ts) reaches 1 and where the
 * solve starts to warn `SLIP` for the body itself (ids `[body]`: its friction contacts together
 * cannot give the friction it needs), both read from the same sums (the body's `friction`). It is
 * the limit itself, a factor of 1, as a lift-off is n = 0: the required factor (1.5, say) is the
 * stability table's check.
 *
 * A contact over its own μ while the others have friction to spare slips alone: its share goes to
 * the others and the body holds (|Σ t| ≤ Σ μ·n), so this, not a contact's own margin, says where
 * the body itself starts to move along its base. Read, as those checks read it, only where:
 *  - the body holds or lifts: a body that tips (or is unrestrained) has no reactions of its own,
 *    only those that would hold it, and its tipping is its limit (`findTippingWith`);
 *  - nothing bilateral holds it (a pin, roller or fixed support resists sliding, as the stability
 *    check says) and a contact with a μ bears.
 * Elsewhere NaN (a gap, never a crossing).
 */
export function bodySlidingMargin(result: SolveResult, body: string): number {
  const b = result.bodies[body];
  if (!b?.friction || !isHeld(result, body)) return Number.NaN;
  let sumN = 0;
  let sumMuN = 0;
  for (const r of Object.values(result.reactions)) {
    if (r.body !== body) continue;
    if (r.kind === "pin" || r.kind === "roller" || r.kind === "fixed") return Number.NaN;
    // `friction` is on a contact with a μ exactly while it bears: the sums of the body's `friction`
    if (r.kind !== "contact" || !r.friction) continue;
    sumN += r.n ?? 0;
    sumMuN += r.friction.mu * (r.n ?? 0);
  }
  if (!(sumN > 0)) return Number.NaN;
  // the body's friction is (needed, available) = (|Σ t|, Σ μ·n) / Σ n
  return sumMuN - b.friction.needed * sumN;
}

/**
 * The search of `findLimitWith` on any reading of a solve: `read` gives the value and whether the
 * body it belongs to is held (holds or lifts: its reactions are the one-sided solution).
 */
function searchWith(
  sweeper: Sweeper,
  range: readonly [number, number],
  read: (result: SolveResult) => { value: number; held: boolean },
  target: number,
  options: LimitOptions,
): LimitResult {
  const [lo, hi] = range[0] <= range[1] ? range : [range[1], range[0]];
  const samples = Math.max(2, options.samples ?? 64);
  const tol = options.tolerance ?? limitTolerance([lo, hi]);
  let iterations = 0;
  const at = (x: number): Sample => {
    iterations++;
    const p = sweeper.at(x);
    if (!p.ok) return { x, f: Number.NaN, held: false };
    const { value, held } = read(p.result);
    return { x, f: value - target, held };
  };
  const f = (x: number) => at(x).f;
  try {
    const grid: Sample[] = [];
    for (let i = 0; i <= samples; i++) grid.push(at(lo + ((hi - lo) * i) / samples));
    const finite = grid.map((s) => s.f).filter(Number.isFinite);
    const size = finite.reduce((m, v) => Math.max(m, Math.abs(v), Math.abs(v + target)), 0);

    // Between samples of different status, insert the two points either side of the change.
    const points: Sample[] = [grid[0]];
    for (let i = 0; i < samples; i++) {
      const a = grid[i];
      const b = grid[i + 1];
      if (Number.isFinite(a.f) && Number.isFinite(b.f) && a.held !== b.held) {
        let u = a;
        let v = b;
        while (v.x - u.x > tol) {
          const m = at((u.x + v.x) / 2);
          if (m.held === a.held && Number.isFinite(m.f)) u = m;
          else v = m;
        }
        if (u === a) points[points.length - 1] = { ...a, boundary: true };
        else points.push({ ...u, boundary: true });
        if (v !== b) points.push(v);
      }
      points.push(b);
    }

    const crossings: number[] = [];
    // crossings closer than this are one event (a support's state and the body's status can
    // change a few tolerances apart, as the solver's own force tolerance allows)
    const merge = Math.max(10 * tol, 1e-6 * (hi - lo));
    const add = (x: number) => {
      if (!crossings.length || x > crossings[crossings.length - 1] + merge) crossings.push(x);
    };
    /** the first point of (a, b] where the quantity reaches or passes the target, given f(a) ≠ 0 = f(b) */
    const firstZero = (a: number, fa: number, b: number): number => {
      while (b - a > tol) {
        const m = (a + b) / 2;
        const fm = f(m);
        if (fm === 0 || Math.sign(fm) === -Math.sign(fa)) b = m;
        else a = m;
      }
      return b;
    };
    /** the last point of [a, b) still at the target, given f(a) = 0 ≠ f(b) */
    const lastZero = (a: number, b: number): number => {
      while (b - a > tol) {
        const m = (a + b) / 2;
        if (f(m) === 0) a = m;
        else b = m;
      }
      return a;
    };
    if (points[0].f === 0) {
      // the range starts inside a run at the target (a contact already off the ground): the run
      // began before the range, so where it is reached is where the run ends, not the range's start
      const j = points.findIndex((p) => Number.isFinite(p.f) && p.f !== 0);
      add(j < 0 || !points.slice(0, j).every((p) => p.f === 0) ? points[0].x : lastZero(points[j - 1].x, points[j].x));
    }
    for (let i = 0; i + 1 < points.length; i++) {
      const a = points[i];
      const b = points[i + 1];
      if (!Number.isFinite(a.f) || !Number.isFinite(b.f)) {
        if (b.f === 0) add(b.x);
        continue;
      }
      if (a.f === 0) continue; // inside a run at the target, counted where it began
      if (a.boundary) {
        // a change of status: the quantity jumps across the target, or reaches it where the body holds
        const heldSide = a.held ? a : b;
        if (b.f === 0 || Math.sign(a.f) !== Math.sign(b.f) || Math.abs(heldSide.f) <= TOUCH * size) add(heldSide.x);
        continue;
      }
      if (b.f === 0) add(firstZero(a.x, a.f, b.x));
      else if (Math.sign(a.f) !== Math.sign(b.f)) {
        const root = brent(f, a.x, b.x, a.f, b.f, tol);
        // Brent stops at any point where the quantity is exactly at the target: if it sits on
        // a flat run, move to where the run starts
        add(f(root) === 0 ? firstZero(a.x, a.f, root) : root);
      }
    }
    if (crossings.length) return { found: true, value: crossings[0], unit: sweeper.unit, crossings, iterations, tolerance: tol };
    return {
      found: false,
      unit: sweeper.unit,
      reason: finite.length
        ? `no crossing in this range: the quantity stays ${finite[0] + target > target ? "above" : "below"} ${target} from ${lo} to ${hi}`
        : "no crossing in this range: the quantity is undefined there",
      min: finite.length ? Math.min(...finite) + target : Number.NaN,
      max: finite.length ? Math.max(...finite) + target : Number.NaN,
      ...(finite.length ? { closest: closestIn(grid, f, tol, target), ends: { lo: endTrend(grid[0], grid[1]), hi: endTrend(grid[samples], grid[samples - 1]) }, held: heldIn(grid) } : {}),
    };
  } finally {
    sweeper.restore();
  }
}

/**
 * Where a body starts to tip as the parameter goes from `range[0]` to `range[1]` (either way): no
 * set of its one-sided reactions holds it (`status` "tips"). The range is sampled and each change
 * into tipping bisected to the tolerance; a range that starts with the body tipping counts its
 * start. The crossings are ascending, as `findLimitWith`'s. Not found, `min`/`max` say what it
 * did throughout: 1 held (or lifted clear), −1 tipping, NaN nowhere solved (a margin's sign).
 */
export function findTippingWith(sweeper: Sweeper, range: readonly [number, number], body: string, options: LimitOptions = {}): LimitResult {
  const [from, to] = range;
  const samples = Math.max(2, options.samples ?? 64);
  const tol = options.tolerance ?? limitTolerance([from, to]);
  let iterations = 0;
  /** true: tips; false: held; null: not solved there */
  const tips = (x: number): boolean | null => {
    iterations++;
    const p = sweeper.at(x);
    if (!p.ok || !p.result.bodies[body]) return null;
    return p.result.bodies[body].status === "tips";
  };
  try {
    const xs = Array.from({ length: samples + 1 }, (_, i) => from + ((to - from) * i) / samples);
    const st = xs.map(tips);
    const entries: number[] = [];
    if (st[0] === true) entries.push(from);
    for (let i = 0; i < samples; i++) {
      if (st[i] !== false || st[i + 1] !== true) continue;
      // held at a, tipping at b: the first point going from a towards b where it tips
      let a = xs[i];
      let b = xs[i + 1];
      while (Math.abs(b - a) > tol) {
        const m = (a + b) / 2;
        if (tips(m) === true) b = m;
        else a = m;
      }
      entries.push(b);
    }
    if (entries.length) return { found: true, value: Math.min(...entries), unit: sweeper.unit, crossings: [...entries].sort((u, v) => u - v), iterations, tolerance: tol };
    const solved = st.filter((v) => v !== null);
    const sign = !solved.length ? Number.NaN : solved.every((v) => v) ? -1 : 1;
    return { found: false, unit: sweeper.unit, reason: solved.length ? "no crossing in this range: the body does not start to tip" : "no crossing in this range: the quantity is undefined there", min: sign, max: sign };
  } finally {
    sweeper.restore();
  }
}

/**
 * Where the samples come closest to the target (least |quantity − target|), refined by a golden-
 * section search between that sample's neighbours (a local minimum of the gap; the sample itself
 * when the refinement finds nothing closer, as at a kink where a support's state changes).
 */
function closestIn(grid: readonly Sample[], f: (x: number) => number, tol: number, target: number): { at: number; value: number } {
  let best = -1;
  grid.forEach((s, i) => {
    if (Number.isFinite(s.f) && (best < 0 || Math.abs(s.f) < Math.abs(grid[best].f))) best = i;
  });
  let at = grid[best].x;
  let gap = grid[best].f;
  const a0 = grid[Math.max(0, best - 1)];
  const b0 = grid[Math.min(grid.length - 1, best + 1)];
  if (Number.isFinite(a0.f) && Number.isFinite(b0.f) && b0.x > a0.x) {
    const r = (Math.sqrt(5) - 1) / 2;
    let a = a0.x;
    let b = b0.x;
    let c = b - r * (b - a);
    let d = a + r * (b - a);
    // an undefined point (NaN) counts as far from the target
    const g = (x: number) => {
      const v = Math.abs(f(x));
      return Number.isFinite(v) ? v : Infinity;
    };
    let fc = g(c);
    let fd = g(d);
    for (let i = 0; i < 80 && b - a > tol; i++) {
      if (fc <= fd) {
        b = d;
        d = c;
        fd = fc;
        c = b - r * (b - a);
        fc = g(c);
      } else {
        a = c;
        c = d;
        fc = fd;
        d = a + r * (b - a);
        fd = g(d);
      }
    }
    const x = (a + b) / 2;
    const fx = f(x);
    if (Number.isFinite(fx) && Math.abs(fx) < Math.abs(gap)) {
      at = x;
      gap = fx;
    }
  }
  return { at, value: gap + target };
}

/** Whether the body is held at all, none or some of the samples where the quantity is defined. */
function heldIn(grid: readonly Sample[]): "all" | "none" | "some" {
  const defined = grid.filter((s) => Number.isFinite(s.f));
  return defined.every((s) => s.held) ? "all" : defined.every((s) => !s.held) ? "none" : "some";
}

/** The trend at an end of the range from its sample and the one next to it (`EndTrend`). */
function endTrend(end: Sample, inner: Sample): EndTrend {
  if (!Number.isFinite(end.f) || !Number.isFinite(inner.f) || end.f === inner.f) return { toward: false };
  // the line through the two samples reaches the target at x*; heading for it when x* lies outward
  const estimate = end.x - (end.f * (end.x - inner.x)) / (end.f - inner.f);
  return (estimate - end.x) * (end.x - inner.x) > 0 ? { toward: true, estimate } : { toward: false };
}

/** The search's tolerance on the parameter over a range, unless one is given: a billionth of the range. */
export function limitTolerance(range: readonly [number, number]): number {
  return Math.max(1e-12, 1e-9 * (Math.abs(range[1] - range[0]) || 1));
}

/** Significant figures a found limit is given to, wherever it is shown (the Sweep tab, its plot, the calc sheet, a version's page). */
export const LIMIT_FIGURES = 4;

/** A found limit as every view writes it: 4 significant figures, trailing zeros kept ("18.14", "1.200"). */
export function formatLimit(x: number): string {
  return formatFigures(x, LIMIT_FIGURES);
}

/** A found limit with the parameter's unit: "18.14 deg", "27.77 kg/s", "1.200" (a plain number). */
export function limitWithUnit(x: number, unit: string): string {
  return `${formatLimit(x)}${unit ? ` ${prettyUnit(unit)}` : ""}`;
}

/**
 * How far a found limit is given, in words: "to 4 significant figures, found to within ±8e-8 deg".
 * The tolerance is rounded up to one figure, so it never claims more than the search did.
 *
 * Given `values` (the limits the words are said of), the tolerance is said only where it shows in
 * them: finer than half a unit in the last figure they are written to, it is left out ("to 4
 * significant figures"); coarser, it is written as they are, a plain decimal ("±0.0001 deg"),
 * not as the search's noise ("±9e-8 deg").
 */
export function limitPrecisionWords(tolerance: number, unit: string, values?: readonly number[]): string {
  const e = Math.floor(Math.log10(tolerance));
  let m = Math.ceil(tolerance / 10 ** e - 1e-9);
  let exp = e;
  if (m >= 10) {
    m = 1;
    exp += 1;
  }
  const u = unit ? ` ${prettyUnit(unit)}` : "";
  if (values) {
    // no limit found: nothing the tolerance could be said of
    if (!values.length) return `to ${LIMIT_FIGURES} significant figures`;
    const steps = values.filter((v) => Number.isFinite(v) && v !== 0).map(figureStep);
    if (steps.length && tolerance <= Math.min(...steps) / 2) return `to ${LIMIT_FIGURES} significant figures`;
    const within = exp >= -6 ? (m * 10 ** exp).toFixed(Math.max(0, -exp)) : formatTiny(m * 10 ** exp, 0);
    return `to ${LIMIT_FIGURES} significant figures, found to within ±${within}${u}`;
  }
  return `to ${LIMIT_FIGURES} significant figures, found to within ±${formatTiny(m * 10 ** exp, 0)}${u}`;
}

/** A unit in the last figure `formatLimit` writes of x: its 4th significant figure, or 1 from 1,000 on (whole numbers). */
function figureStep(x: number): number {
  const a = Math.abs(Number(x.toPrecision(LIMIT_FIGURES)));
  if (a >= 1000) return 1;
  return 10 ** (Math.floor(Math.log10(a)) - (LIMIT_FIGURES - 1));
}

/** Brent's method on a bracket [a, b] with f(a)·f(b) < 0 (Brent 1973, "Algorithms for Minimization without Derivatives", ch. 4). */
export function brent(f: (x: number) => number, a: number, b: number, fa: number, fb: number, tol: number, maxIter = 100): number {
  if (Math.abs(fa) < Math.abs(fb)) {
    [a, b] = [b, a];
    [fa, fb] = [fb, fa];
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let mflag = true;
  for (let i = 0; i < maxIter; i++) {
    if (fb === 0 || Math.abs(b - a) < tol) return b;
    let s: number;
    if (fa !== fc && fb !== fc) {
      s = (a * fb * fc) / ((fa - fb) * (fa - fc)) + (b * fa * fc) / ((fb - fa) * (fb - fc)) + (c * fa * fb) / ((fc - fa) * (fc - fb));
    } else {
      s = b - (fb * (b - a)) / (fb - fa);
    }
    const lo = (3 * a + b) / 4;
    const outside = !((s > Math.min(lo, b) && s < Math.max(lo, b)));
    if (
      outside ||
      (mflag && Math.abs(s - b) >= Math.abs(b - c) / 2) ||
      (!mflag && Math.abs(s - b) >= Math.abs(c - d) / 2) ||
      (mflag && Math.abs(b - c) < tol) ||
      (!mflag && Math.abs(c - d) < tol)
    ) {
      s = (a + b) / 2;
      mflag = true;
    } else mflag = false;
    let fs = f(s);
    if (!Number.isFinite(fs)) {
      s = (a + b) / 2;
      fs = f(s);
    }
    d = c;
    c = b;
    fc = fb;
    if (Math.sign(fa) !== Math.sign(fs)) {
      b = s;
      fb = fs;
    } else {
      a = s;
      fa = fs;
    }
    if (Math.abs(fa) < Math.abs(fb)) {
      [a, b] = [b, a];
      [fa, fb] = [fb, fa];
    }
  }
  return b;
}
