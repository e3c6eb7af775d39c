// Evaluate every numeric field of a validated sketch file once, to plain SI numbers.
// The plan it keeps (compiled expressions and where each value goes) lets a sweep
// re-evaluate only the fields that depend on the swept parameter.
import {
  compileExpression,
  describeValue,
  FIELD_UNIT_LABELS,
  readingNote,
  toFieldNumber,
  twoReadings,
  unitlessTrigWarning,
  type CompiledExpression,
  type FieldKind,
  type MathValue,
} from "./expressions";
import { resolveParameters, type ParameterPlan } from "./parameters";
import type { SketchFile } from "./schema";
import type { FieldError, Sketch, SolveWarning } from "./types";
import { G0 } from "./constants";
import { suggestUnitsFor } from "./expressionErrors";
import { NEGATIVE_GRAVITY } from "./validate";

/** A field whose text reads as two different valid values beside a parameter of the same name. */
class TwoWays extends Error {}

/** Where an evaluated expression is written, and how to evaluate it again. */
export interface FieldSlot {
  path: string;
  kind: FieldKind;
  expr: CompiledExpression;
  target: Record<string | number, unknown>;
  key: string | number;
}

export interface EvaluationPlan {
  parameters: ParameterPlan[];
  scope: Map<string, MathValue>;
  /** unit each parameter was written in (for sweeps given in that unit) */
  parameterUnits: Record<string, string>;
  slots: FieldSlot[];
}

export type FieldValue = { value: number } | { error: string };

export interface ResolveOutput {
  sketch: Sketch;
  plan: EvaluationPlan;
  errors: FieldError[];
  warnings: SolveWarning[];
  /** every numeric field by path: its SI value (degrees for angles) or its error */
  fields: Record<string, FieldValue>;
  /** every parameter: its value in the unit it was written in, and in SI */
  parameterValues: Record<string, { value: number; unit: string; si: number } | { error: string }>;
}

/** The kind of each numeric field, by element and field name. */
const FIELD_KINDS: Record<string, Record<string, FieldKind>> = {
  body: { mass: "mass" },
  support: { angle: "angle", mu: "ratio", stiffness: "stiffness", rotationalStiffness: "rotationalStiffness" },
  load: { magnitude: "force", angle: "angle", fx: "force", fy: "force", value: "moment", w1: "lineLoad", w2: "lineLoad" },
  port: {
    angle: "angle",
    massFlow: "massFlow",
    velocity: "velocity",
    pressure: "pressure",
    area: "area",
    density: "density",
    volumeFlow: "volumeFlow",
    beta: "ratio",
  },
  massSource: { massFlow: "massFlow" },
  motion: { ax: "acceleration", ay: "acceleration" },
};
const POINT_FIELDS = new Set(["at", "from", "to", "cg"]);

/** The kind of a numeric field by its name alone (no name means two things in the format). */
export const FIELD_KIND_BY_NAME: Readonly<Record<string, FieldKind>> = Object.assign({ gravity: "acceleration" as FieldKind, gravityAngle: "angle" as FieldKind }, ...Object.values(FIELD_KINDS));

export function resolveSketch(file: SketchFile): ResolveOutput {
  const params = resolveParameters(file.parameters);
  const errors: FieldError[] = [...params.errors];
  const warnings: SolveWarning[] = [];
  const fields: Record<string, FieldValue> = {};
  const slots: FieldSlot[] = [];
  const names = new Set(Object.keys(file.parameters ?? {}));
  const scope = params.scope;
  const trigWarned = new Set<string>();

  const parameterValues: ResolveOutput["parameterValues"] = {};
  const parameterUnits: Record<string, string> = {};
  for (const name of Object.keys(file.parameters ?? {})) {
    const v = scope.get(name);
    const err = params.errors.find((e) => e.path === `parameters.${name}`);
    if (v === undefined) parameterValues[name] = { error: err?.message ?? "could not be evaluated (a parameter it reads failed)" };
    else {
      const d = describeValue(v);
      parameterValues[name] = d;
      parameterUnits[name] = d.unit;
    }
  }
  // A parameter belongs to no element: its warning names the elements whose fields read it
  // (filled in once every field has been compiled).
  const parameterWarnings: Array<{ name: string; ids: string[] }> = [];
  for (const p of params.order) {
    const w = p.expr && scope.has(p.name) ? unitlessTrigWarning(p.expr, scope) : null;
    if (!w) continue;
    const ids: string[] = [];
    warnings.push({ code: "TRIG_UNITLESS", message: `parameters.${p.name}: ${w}`, ids });
    parameterWarnings.push({ name: p.name, ids });
  }
  /** parameter name → ids of the elements whose fields read it directly */
  const readers = new Map<string, Set<string>>();

  /**
   * Beside a parameter h or L, a text that reads as a valid value of the field both ways
   * ("600 L/min" with L a volume: litres per minute, or 600 × L per minute) is refused, naming both
   * values: the reading taken by the rule is not silently assumed to be the one meant.
   */
  const twoWays = (raw: string, value: number, kind: FieldKind) => {
    const two = twoReadings(raw, names);
    if (!two) return;
    let other: number;
    try {
      const evaluated = compileExpression(two.other, names).evaluate(scope);
      // units that cancel to a plain number are no value of a field with a unit (see evalField)
      if (typeof evaluated === "number" && kind !== "ratio") return;
      other = toFieldNumber(evaluated, kind);
    } catch {
      return; // the other reading is no value of this field: nothing to choose between
    }
    if (!Number.isFinite(other) || Math.abs(other - value) <= 1e-9 * Math.max(Math.abs(other), Math.abs(value))) return;
    const unit = FIELD_UNIT_LABELS[kind];
    const say = (v: number) => `${Number(v.toPrecision(4))}${unit && unit !== "°" ? ` ${unit}` : unit}`;
    throw new TwoWays(`"${raw}" reads two ways here: ${say(value)} as ${two.taken}, or ${say(other)} as ${two.otherWords}; write ${two.takenText} for the first`);
  };

  /** Evaluate one field value in place; `ids` names the element it belongs to (for warnings). */
  const evalField = (raw: unknown, kind: FieldKind, path: string, target: Record<string | number, unknown>, key: string | number, ids: string[] = []) => {
    if (typeof raw === "number") {
      if (!Number.isFinite(raw)) {
        errors.push({ path, message: "must be a finite number" });
        fields[path] = { error: "must be a finite number" };
        return;
      }
      // A plain number in an angle field is degrees; everything else SI.
      target[key] = raw;
      fields[path] = { value: raw };
      return;
    }
    if (typeof raw !== "string") return;
    try {
      const expr = compileExpression(raw, names);
      const missing = expr.deps.filter((d) => !scope.has(d));
      for (const d of expr.deps) for (const id of ids) (readers.get(d) ?? readers.set(d, new Set()).get(d)!).add(id);
      if (missing.length) throw new Error(`reads parameter ${missing.join(", ")}, which has an error`);
      const evaluated = expr.evaluate(scope);
      // "3.6 km / h" with a parameter h of length cancels to a plain number, which a field would take as SI
      if (typeof evaluated === "number" && kind !== "ratio" && readingNote(raw, names)) throw new Error(`"${raw}" gives a plain number here (${Number(evaluated.toPrecision(6))})`);
      const value = toFieldNumber(evaluated, kind);
      if (names.has("h") || names.has("L") || names.has("l")) twoWays(raw, value, kind);
      target[key] = value;
      fields[path] = { value };
      if (expr.deps.length) slots.push({ path, kind, expr, target, key });
      const w = unitlessTrigWarning(expr, scope);
      if (w && !trigWarned.has(path)) {
        trigWarned.add(path);
        warnings.push({ code: "TRIG_UNITLESS", message: `${path}: ${w}`, ids });
      }
    } catch (err) {
      // an unknown name's error suggests units of the field's own kind ("kg, tonne, lb" for a mass)
      const said = suggestUnitsFor((err as Error).message, kind);
      // "6 kN*m/h" beside a parameter h is per hour, "600 L/min" beside a parameter L litres: say
      // which reading was taken, and how to write the other, where the field fails
      const note = err instanceof TwoWays ? null : readingNote(raw, names);
      const message = note ? `${said}; ${note}` : said;
      errors.push({ path, message });
      fields[path] = { error: message };
      target[key] = Number.NaN;
    }
  };

  const evalPoint = (raw: unknown, path: string, ids: string[]): [number, number] => {
    const pt: [number, number] = [Number.NaN, Number.NaN];
    const arr = raw as unknown[];
    evalField(arr[0], "length", `${path}[0]`, pt as unknown as Record<number, unknown>, 0, ids);
    evalField(arr[1], "length", `${path}[1]`, pt as unknown as Record<number, unknown>, 1, ids);
    return pt;
  };

  const evalElement = <T extends Record<string, unknown>>(el: T, group: string, path: string): Record<string, unknown> => {
    const out: Record<string, unknown> = {};
    const kinds = FIELD_KINDS[group] ?? {};
    const ids = typeof el.id === "string" ? [el.id] : [];
    for (const [k, v] of Object.entries(el)) {
      const p = `${path}.${k}`;
      if (POINT_FIELDS.has(k)) out[k] = evalPoint(v, p, ids);
      else if (k === "outline") out[k] = (v as unknown[]).map((pt, i) => evalPoint(pt, `${p}[${i}]`, ids));
      else if (kinds[k]) evalField(v, kinds[k], p, out, k, ids);
      else out[k] = v;
    }
    return out;
  };

  const top: Record<string, unknown> = {};
  evalField(file.gravity ?? G0, "acceleration", "gravity", top, "gravity");
  if (typeof top.gravity === "number" && top.gravity < 0) {
    // the format fixes gravity's direction; a negative value would silently turn every weight upward
    errors.push({ path: "gravity", message: NEGATIVE_GRAVITY });
    fields.gravity = { error: NEGATIVE_GRAVITY };
  }
  if (file.gravityAngle !== undefined) evalField(file.gravityAngle, "angle", "gravityAngle", top, "gravityAngle");

  const sketch: Sketch = {
    format: file.format,
    version: file.version,
    title: file.title,
    description: file.description,
    gravity: top.gravity as number,
    ...(file.gravityAngle !== undefined ? { gravityAngle: top.gravityAngle as number } : {}),
    parameters: Object.fromEntries(
      Object.entries(parameterValues).flatMap(([n, v]) => ("si" in v ? [[n, v.si]] : [])),
    ),
    bodies: file.bodies.map((b, i) => evalElement(b, "body", `bodies[${i}]`)) as unknown as Sketch["bodies"],
    supports: file.supports.map((s, i) => evalElement(s, "support", `supports[${i}]`)) as unknown as Sketch["supports"],
    loads: file.loads.map((l, i) => evalElement(l, "load", `loads[${i}]`)) as unknown as Sketch["loads"],
    ports: file.ports.map((p, i) => evalElement(p, "port", `ports[${i}]`)) as unknown as Sketch["ports"],
    massSources: file.massSources.map((m, i) => evalElement(m, "massSource", `massSources[${i}]`)) as unknown as Sketch["massSources"],
  };
  if (file.motion) sketch.motion = evalElement(file.motion, "motion", "motion") as Sketch["motion"];
  for (const w of parameterWarnings) w.ids.push(...elementsReading(w.name, params.order, readers));
  // gravity is a top-level slot: re-point its target at the sketch itself
  for (const s of slots) if (s.path === "gravity" || s.path === "gravityAngle") s.target = sketch as unknown as Record<string, unknown>;

  return {
    sketch,
    plan: { parameters: params.order, scope, parameterUnits, slots },
    errors,
    warnings,
    fields,
    parameterValues,
  };
}

/** Ids of the elements whose fields read a parameter, directly or through other parameters. */
function elementsReading(name: string, order: ParameterPlan[], readers: Map<string, Set<string>>): string[] {
  const reach = new Set([name]);
  // `order` puts every parameter after the ones it reads, so one pass finds every reader
  for (const p of order) if (p.expr?.deps.some((d) => reach.has(d))) reach.add(p.name);
  const ids = new Set<string>();
  for (const n of reach) for (const id of readers.get(n) ?? []) ids.add(id);
  return [...ids];
}
