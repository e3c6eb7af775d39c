// One analysis of a sketch: parse (expressions evaluated once) and solve. Pure and
// serialisable, so it runs the same on the main thread, in the worker and on the server.
import { parseSketch, requirementsOf, solveWithStability, type BodyStability, type FieldError, type SolveResult, type SolveWarning, type Sketch } from "@/solver/index";
import type { FieldValue } from "@/solver/resolve";
import type { SketchFile } from "@/solver/schema";

export interface AnalysisCore {
  ok: boolean;
  errors: FieldError[];
  warnings: SolveWarning[];
  fields: Record<string, FieldValue>;
  parameterValues: Record<string, { value: number; unit: string; si: number } | { error: string }>;
  /** the numeric sketch (SI numbers) when the input is valid */
  numeric: Sketch | null;
  result: SolveResult | null;
  /** each body's factors of safety as drawn, against the sketch's required values */
  stability: Record<string, BodyStability> | null;
  /** milliseconds spent parsing and solving */
  timeMs: number;
}

/** The raw value at a field path of the file ("supports[2].at[0]"). */
function rawAt(file: unknown, path: string): unknown {
  let cur: unknown = file;
  for (const m of path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) {
    if (cur === null || typeof cur !== "object") return undefined;
    cur = (cur as Record<string, unknown>)[m[1] ?? Number(m[2])];
  }
  return cur;
}

/**
 * Only the fields the editor cannot read by itself: expressions (a plain number is its own
 * value). Keeps the worker's answer small — a drag sends one per frame.
 */
export function expressionFields(file: SketchFile, fields: AnalysisCore["fields"]): AnalysisCore["fields"] {
  const out: AnalysisCore["fields"] = {};
  for (const [path, v] of Object.entries(fields)) if ("error" in v || typeof rawAt(file, path) === "string") out[path] = v;
  return out;
}

export function analyseCore(file: SketchFile): AnalysisCore {
  const t0 = typeof performance !== "undefined" ? performance.now() : Date.now();
  let core: Omit<AnalysisCore, "timeMs">;
  try {
    const parsed = parseSketch(file);
    if (!parsed.ok) {
      core = { ok: false, errors: parsed.errors, warnings: parsed.warnings, fields: parsed.fields, parameterValues: parsed.parameterValues, numeric: null, result: null, stability: null };
    } else {
      const { result, stability } = solveWithStability(parsed.sketch, requirementsOf(parsed.file));
      result.warnings.unshift(...parsed.warnings);
      core = { ok: true, errors: [], warnings: result.warnings, fields: parsed.fields, parameterValues: parsed.parameterValues, numeric: parsed.sketch, result, stability };
    }
  } catch (err) {
    // the solver should never throw; if it does, the editor keeps working and says so
    core = { ok: false, errors: [{ path: "", message: `the solve failed: ${(err as Error).message}` }], warnings: [], fields: {}, parameterValues: {}, numeric: null, result: null, stability: null };
  }
  const t1 = typeof performance !== "undefined" ? performance.now() : Date.now();
  return { ...core, timeMs: t1 - t0 };
}
