// Sketch parameters: name → expression. A parameter may read other parameters in any order;
// a cycle, an unknown name or a reserved name is an error naming the parameter.
import { compileExpression, ExpressionError, reservedNameReason, type CompiledExpression, type MathValue } from "./expressions";
import type { FieldError } from "./types";

export interface ParameterPlan {
  name: string;
  expr: CompiledExpression | null;
  literal?: number;
}

export interface ResolvedParameters {
  /** in evaluation order (every parameter after the ones it reads) */
  order: ParameterPlan[];
  scope: Map<string, MathValue>;
  errors: FieldError[];
}

export function resolveParameters(params: Record<string, number | string> | undefined): ResolvedParameters {
  const errors: FieldError[] = [];
  const scope = new Map<string, MathValue>();
  const entries = Object.entries(params ?? {});
  const names = new Set(entries.map(([n]) => n));
  const plans = new Map<string, ParameterPlan>();

  for (const [name, raw] of entries) {
    const path = `parameters.${name}`;
    const reserved = reservedNameReason(name);
    if (reserved) {
      errors.push({ path, message: reserved });
      continue;
    }
    if (typeof raw === "number") {
      plans.set(name, { name, expr: null, literal: raw });
      continue;
    }
    try {
      plans.set(name, { name, expr: compileExpression(raw, names) });
    } catch (err) {
      errors.push({ path, message: (err as Error).message });
    }
  }

  // Depth-first ordering with cycle detection.
  const order: ParameterPlan[] = [];
  const state = new Map<string, "visiting" | "done">();
  const visit = (name: string, trail: string[]): boolean => {
    const s = state.get(name);
    if (s === "done") return true;
    if (s === "visiting") {
      const cycle = [...trail.slice(trail.indexOf(name)), name].join(" → ");
      errors.push({ path: `parameters.${name}`, message: `depends on itself: ${cycle}` });
      return false;
    }
    const plan = plans.get(name);
    if (!plan) return false; // already reported
    state.set(name, "visiting");
    for (const dep of plan.expr?.deps ?? []) {
      if (!visit(dep, [...trail, name])) {
        state.set(name, "done");
        return false;
      }
    }
    state.set(name, "done");
    order.push(plan);
    return true;
  };
  for (const name of plans.keys()) visit(name, []);

  for (const plan of order) {
    if (plan.expr === null) {
      scope.set(plan.name, plan.literal!);
      continue;
    }
    if (plan.expr.deps.some((d) => !scope.has(d))) continue; // a dependency failed
    try {
      const v = plan.expr.evaluate(scope);
      if (typeof v !== "number" && (typeof v !== "object" || v === null)) throw new ExpressionError("does not give a number");
      scope.set(plan.name, v);
    } catch (err) {
      errors.push({ path: `parameters.${plan.name}`, message: (err as Error).message });
    }
  }
  return { order, scope, errors };
}
