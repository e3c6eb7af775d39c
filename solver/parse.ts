// parseSketch: JSON text or value → the validated sketch with every expression evaluated, or
// errors that name the field. Stages: read JSON, migrate to the current version, check the
// structure (zod), evaluate expressions (mathjs, once), check references and value ranges.
import type { z } from "zod";
import { migrateSketch } from "./migrations";
import { resolveSketch, type EvaluationPlan, type FieldValue, type ResolveOutput } from "./resolve";
import { formatPath, sketchSchema, type SketchFile } from "./schema";

import type { FieldError, Sketch, SolveWarning } from "./types";
import { MAX_MAGNITUDE, TOO_LARGE, validateReferences, validateSizes, validateValues } from "./validate";

export type ParseResult =
  | {
      ok: true;
      sketch: Sketch;
      /** the file as validated (expressions kept), at the current version */
      file: SketchFile;
      warnings: SolveWarning[];
      fields: Record<string, FieldValue>;
      parameterValues: ResolveOutput["parameterValues"];
      /** format versions migrated through, e.g. [1] for a version-1 file read as version 2 */
      migratedFrom: number[];
    }
  | {
      ok: false;
      errors: FieldError[];
      warnings: SolveWarning[];
      fields: Record<string, FieldValue>;
      parameterValues: ResolveOutput["parameterValues"];
    };

const plans = new WeakMap<Sketch, EvaluationPlan>();

/** The compiled expressions behind a parsed sketch (for sweeps). */
export function planOf(sketch: Sketch): EvaluationPlan | undefined {
  return plans.get(sketch);
}

export function zodErrors(error: z.ZodError): FieldError[] {
  const out: FieldError[] = [];
  for (const issue of error.issues) {
    if (issue.code === "unrecognized_keys") {
      for (const key of issue.keys) out.push({ path: formatPath([...issue.path, key]), message: "is not a field here (check the spelling)" });
      continue;
    }
    out.push({ path: formatPath(issue.path), message: issue.message });
  }
  return out;
}

function dedupe(errors: FieldError[]): FieldError[] {
  const seen = new Set<string>();
  return errors.filter((e) => {
    const k = `${e.path}\u0000${e.message}`;
    if (seen.has(k)) return false;
    seen.add(k);
    return true;
  });
}

export function parseSketch(input: unknown): ParseResult {
  const empty = { warnings: [], fields: {}, parameterValues: {} };
  let json = input;
  if (typeof input === "string") {
    try {
      json = JSON.parse(input);
    } catch (err) {
      return { ok: false, errors: [{ path: "", message: `not valid JSON: ${(err as Error).message}` }], ...empty };
    }
  }
  const migrated = migrateSketch(json);
  if (!migrated.ok) return { ok: false, errors: migrated.errors, ...empty };
  const parsed = sketchSchema.safeParse(migrated.doc);
  if (!parsed.success) return { ok: false, errors: dedupe(zodErrors(parsed.error)), ...empty };

  const r = resolveFile(parsed.data);
  if (!r.ok) return r;
  return { ...r, migratedFrom: migrated.applied };
}

/** Evaluate and check a file that already passed the schema (also used for operating cases). */
export function resolveFile(file: SketchFile): Exclude<ParseResult, { ok: true }> | (Omit<Extract<ParseResult, { ok: true }>, "migratedFrom">) {
  const resolved = resolveSketch(file);
  const errors = [...resolved.errors];
  errors.push(...validateReferences(resolved.sketch));
  if (resolved.errors.length === 0) errors.push(...validateSizes(resolved.sketch), ...validateValues(resolved.sketch));
  errors.push(...validateCases(file));
  const { warnings, fields, parameterValues } = resolved;
  if (errors.length) return { ok: false, errors: dedupe(errors), warnings, fields, parameterValues };
  plans.set(resolved.sketch, resolved.plan);
  return { ok: true, sketch: resolved.sketch, file, warnings, fields, parameterValues };
}

/** Case ids unique, combinations name existing cases, overridden parameters exist. */
function validateCases(file: SketchFile): FieldError[] {
  const errors: FieldError[] = [];
  const names = new Set(Object.keys(file.parameters ?? {}));
  const ids = new Map<string, string>();
  (file.cases ?? []).forEach((c, i) => {
    if (ids.has(c.id)) errors.push({ path: `cases[${i}].id`, message: `id "${c.id}" is already used by ${ids.get(c.id)}` });
    ids.set(c.id, `cases[${i}]`);
    for (const [g, f] of Object.entries(c.factors ?? {})) if (Math.abs(f) > MAX_MAGNITUDE) errors.push({ path: `cases[${i}].factors.${g}`, message: TOO_LARGE });
    if (c.flowFactor !== undefined && c.flowFactor > MAX_MAGNITUDE) errors.push({ path: `cases[${i}].flowFactor`, message: TOO_LARGE });
    for (const p of Object.keys(c.parameters ?? {})) {
      if (!names.has(p)) errors.push({ path: `cases[${i}].parameters.${p}`, message: `the sketch has no parameter "${p}" to override` });
    }
  });
  const caseIds = new Set((file.cases ?? []).map((c) => c.id));
  (file.combinations ?? []).forEach((k, i) => {
    if (ids.has(k.id)) errors.push({ path: `combinations[${i}].id`, message: `id "${k.id}" is already used by ${ids.get(k.id)}` });
    ids.set(k.id, `combinations[${i}]`);
    k.terms.forEach((t, j) => {
      if (Math.abs(t.factor) > MAX_MAGNITUDE) errors.push({ path: `combinations[${i}].terms[${j}].factor`, message: TOO_LARGE });
      if (!caseIds.has(t.case)) errors.push({ path: `combinations[${i}].terms[${j}].case`, message: `names case "${t.case}", which does not exist` });
    });
  });
  (file.sweeps ?? []).forEach((sw, i) => {
    if (sw.case !== undefined && sw.combination !== undefined)
      errors.push({ path: `sweeps[${i}].combination`, message: "a sweep runs on a case or on a combination, not both (remove one)" });
  });
  return errors;
}
