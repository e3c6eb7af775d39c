// Sweeps: solve a parsed sketch for many values of one parameter, re-evaluating only the
// expressions that depend on it (their compiled form is kept from parsing).
import { makeValue, toFieldNumber, type MathValue } from "./expressions";
import { planOf } from "./parse";
import { solve } from "./solve";
import type { FieldError, Sketch, SolveResult } from "./types";
import { MAX_MAGNITUDE, TOO_LARGE, validateValues } from "./validate";
import { shareAcrossSolves } from "./reuse";
import { readQuantity, type QuantitySpec } from "./quantity";

export type SweepPoint = { value: number; ok: true; result: SolveResult } | { value: number; ok: false; errors: FieldError[] };

export interface SweepResult {
  parameter: string;
  /** the unit the parameter was written in; sweep values are in this unit */
  unit: string;
  points: SweepPoint[];
}

export interface Sweeper {
  parameter: string;
  unit: string;
  /** solve with the parameter at `value` (in `unit`) */
  at(value: number): SweepPoint;
  /** put every swept value back as parsed */
  restore(): void;
}

/** The built-in parameter that scales every port's flow (ṁ and V × f, momentum flux × f²); in a
 *  case it multiplies the case's own flow factor. */
export const FLOW_FACTOR = "flowFactor";

/** What a sweep changes in one sketch: the swept value goes in, the sketch is left ready to solve. */
export interface ParameterSetter {
  sketch: Sketch;
  /** the unit the parameter is written in, in this sketch */
  unit: string;
  /** put `value` (in `unit`, this sketch's own unit when absent) in its place; the errors it leaves */
  set(value: number, unit?: string): FieldError[];
  /** put every swept value back as parsed */
  restore(): void;
}

export function createSetter(sketch: Sketch, parameter: string): ParameterSetter {
  const plan = planOf(sketch);
  if (!plan) throw new Error("a sweep needs a sketch returned by parseSketch");
  if (parameter === FLOW_FACTOR && !plan.scope.has(FLOW_FACTOR)) {
    const saved = sketch.scaling;
    // a case's own flow factor is a scale too, and the swept one scales it: a "pump off" case
    // (× 0) stays without flow and a test case (× 1.22) runs at 1.22·f, so a combination of a
    // weight-only case and a flow case never counts the flow in both
    const own = saved?.flowFactor ?? 1;
    // the points share the terms and warnings the swept value leaves alone (reuse.ts)
    shareAcrossSolves(sketch, true);
    return {
      sketch,
      unit: "",
      set(value: number): FieldError[] {
        sketch.scaling = { ...saved, flowFactor: value * own };
        return value >= 0 ? [] : [{ path: FLOW_FACTOR, message: "must be zero or more" }];
      },
      restore() {
        sketch.scaling = saved;
        shareAcrossSolves(sketch, false);
      },
    };
  }
  if (!plan.scope.has(parameter)) {
    const names = [...plan.scope.keys()];
    throw new Error(`the sketch has no parameter "${parameter}" (it has ${[...names, FLOW_FACTOR].join(", ")})`);
  }
  const own = plan.parameterUnits[parameter] ?? "";
  const affected = new Set([parameter]);
  const params = plan.parameters.filter((p) => {
    if (p.expr && p.expr.deps.some((d) => affected.has(d))) {
      affected.add(p.name);
      return true;
    }
    return false;
  });
  const slots = plan.slots.filter((s) => s.expr.deps.some((d) => affected.has(d)));
  const savedScope = new Map<string, MathValue>([...affected].map((n) => [n, plan.scope.get(n)!]));
  const savedSlots = slots.map((s) => s.target[s.key]);

  shareAcrossSolves(sketch, true);
  return {
    sketch,
    unit: own,
    set(value: number, unit = own): FieldError[] {
      const errors: FieldError[] = [];
      plan.scope.set(parameter, makeValue(value, unit));
      for (const p of params) {
        try {
          plan.scope.set(p.name, p.expr!.evaluate(plan.scope));
        } catch (err) {
          errors.push({ path: `parameters.${p.name}`, message: (err as Error).message });
        }
      }
      for (const s of slots) {
        try {
          const v = toFieldNumber(s.expr.evaluate(plan.scope), s.kind);
          s.target[s.key] = v;
          // parsing checked every other value's size (validateSizes)
          if (Math.abs(v) > MAX_MAGNITUDE) errors.push({ path: s.path, message: TOO_LARGE });
        } catch (err) {
          errors.push({ path: s.path, message: (err as Error).message });
        }
      }
      if (errors.length === 0) errors.push(...validateValues(sketch));
      return errors;
    },
    restore() {
      shareAcrossSolves(sketch, false);
      for (const [n, v] of savedScope) plan.scope.set(n, v);
      slots.forEach((s, i) => (s.target[s.key] = savedSlots[i]));
    },
  };
}

/** A sweeper of one sketch; its values are in `unit` (default: the unit the sketch writes the parameter in). */
export function createSweeper(sketch: Sketch, parameter: string, unit?: string): Sweeper {
  const setter = createSetter(sketch, parameter);
  const u = unit ?? setter.unit;
  return {
    parameter,
    unit: u,
    at(value: number): SweepPoint {
      const errors = setter.set(value, u);
      return errors.length ? { value, ok: false, errors } : { value, ok: true, result: solve(sketch) };
    },
    restore: setter.restore,
  };
}

/** Solve the sketch at each value of `parameter` (values in the unit the parameter was written in). */
export function solveSweep(sketch: Sketch, parameter: string, values: readonly number[]): SweepResult {
  return sweepWith(createSweeper(sketch, parameter), values);
}

/** Solve at each value with a sweeper made for it (of a sketch, or of a combination: solver/studySweep.ts); restores it after. */
export function sweepWith(sweeper: Sweeper, values: readonly number[]): SweepResult {
  try {
    return { parameter: sweeper.parameter, unit: sweeper.unit, points: values.map((v) => sweeper.at(v)) };
  } finally {
    sweeper.restore();
  }
}

/** Whether a support is off its seat in a result: a contact lifted (or a tie slack), also one
 *  that bears on a body that tips while its margin is below zero (it leaves its base as the body
 *  turns). Undefined for a support that is neither a contact nor a tie. */
export function supportOff(result: SolveResult, support: string): boolean | undefined {
  const r = result.reactions[support];
  if (!r || (r.kind !== "contact" && r.kind !== "tie")) return undefined;
  if (r.state === "lifted" || r.state === "slack") return true;
  const status = result.bodies[r.body]?.status;
  return (status === "tips" || status === "unrestrained") && r.margin !== undefined && r.margin < 0;
}

/** Whether the body a support holds is held in a result (it holds, or holds with a contact lifted). */
export function supportBodyHeld(result: SolveResult, support: string): boolean {
  const r = result.reactions[support];
  const status = r ? result.bodies[r.body]?.status : undefined;
  return status === "holds" || status === "lifts";
}

/**
 * A quantity as a sweep and the limit finder read it: `readQuantity`, but a contact's friction
 * (its friction margin μ·n − |t|, or the friction it needs) only where it has any. A contact off
 * the ground has no friction to use up, and on a body that tips (or is unrestrained) the reactions
 * are only what every support would need to hold it, which says nothing of friction: NaN there, a
 * gap in the plot. Every other quantity is read as it is (a lifted contact's margin below zero is
 * what it would have to pull).
 */
export function sweptQuantity(result: SolveResult, q: QuantitySpec): number {
  const v = readQuantity(result, q);
  if (q.component !== "frictionMargin" && q.component !== "frictionRatio") return v;
  return supportOff(result, q.support) || !supportBodyHeld(result, q.support) ? Number.NaN : v;
}

/** `count` evenly spaced values from `lo` to `hi` inclusive. */
export function linspace(lo: number, hi: number, count: number): number[] {
  if (count < 2) return [lo];
  return Array.from({ length: count }, (_, i) => lo + ((hi - lo) * i) / (count - 1));
}
