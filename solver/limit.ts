// The limit finder: where does a quantity (a reaction component, a margin, a friction ratio)
// reach a target as one parameter varies? The range is scanned for sign changes of
// quantity − target, and each bracket is refined with Brent's method (bracketing root finder).
import { readQuantity, type QuantitySpec } from "./quantity";
import { createSweeper } from "./sweep";
import type { Sketch } from "./types";

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
    }
  | {
      found: false;
      unit: string;
      reason: string;
      /** the least and largest value of the quantity seen in the range */
      min: number;
      max: number;
    };

export function findLimit(
  sketch: Sketch,
  parameter: string,
  range: readonly [number, number],
  quantity: QuantitySpec,
  target = 0,
  options: LimitOptions = {},
): LimitResult {
  const [lo, hi] = range[0] <= range[1] ? range : [range[1], range[0]];
  const samples = Math.max(2, options.samples ?? 64);
  const tol = options.tolerance ?? Math.max(1e-12, 1e-9 * (hi - lo || 1));
  const sweeper = createSweeper(sketch, parameter);
  let iterations = 0;
  const f = (x: number): number => {
    iterations++;
    const p = sweeper.at(x);
    return p.ok ? readQuantity(p.result, quantity) - target : Number.NaN;
  };
  try {
    const xs: number[] = [];
    const fs: number[] = [];
    for (let i = 0; i <= samples; i++) {
      const x = lo + ((hi - lo) * i) / samples;
      xs.push(x);
      fs.push(f(x));
    }
    const crossings: number[] = [];
    for (let i = 0; i < samples; i++) {
      const a = fs[i];
      const b = fs[i + 1];
      if (!Number.isFinite(a) || !Number.isFinite(b)) continue;
      if (a === 0) {
        if (!crossings.length || crossings[crossings.length - 1] !== xs[i]) crossings.push(xs[i]);
        continue;
      }
      if (b === 0) continue; // counted at the next interval's start
      if (Math.sign(a) !== Math.sign(b)) crossings.push(brent(f, xs[i], xs[i + 1], a, b, tol));
    }
    if (fs[samples] === 0) crossings.push(xs[samples]);
    if (crossings.length) return { found: true, value: crossings[0], unit: sweeper.unit, crossings, iterations };
    const finite = fs.filter(Number.isFinite);
    return {
      found: false,
      unit: sweeper.unit,
      reason: finite.length
        ? `no crossing in this range: the quantity stays ${finite[0] + target > target ? "above" : "below"} ${target} from ${lo} to ${hi}`
        : "no crossing in this range: the quantity is undefined there",
      min: finite.length ? Math.min(...finite) + target : Number.NaN,
      max: finite.length ? Math.max(...finite) + target : Number.NaN,
    };
  } finally {
    sweeper.restore();
  }
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
