// A sketch document as the API receives it: validated and migrated by the solver's parseSketch,
// and the summary of its solve that listings show. Browser-safe (the solver is pure).
import { z } from "zod";
import { asDrawnStudy, parseSketch, solve, solveCases, type ParseResult } from "@/solver";
import { CURRENT_VERSION, FORMAT, type SketchFile } from "@/solver/schema";
import type { LowFactor, SolveSummary } from "@/db/tables/sketches";
import { sketchDescriptionSchema, sketchTitleSchema, tagsSchema, versionMessageSchema, versionNumberSchema, STATUS_ORDER } from "./sketch-schemas";

export type ParsedSketch = Extract<ParseResult, { ok: true }>;

/** A sketch is at most 1 MB of JSON. */
export const MAX_SKETCH_BYTES = 1024 * 1024;


/**
 * The zod schema of a sketch document field: parseSketch's errors become field issues whose
 * path is the contract's (`document.ports[1].area`), so a bad sketch is a 400 like any bad field.
 */
export const sketchDocumentSchema = z.unknown().transform((value, ctx): ParsedSketch => {
  if (value === undefined || value === null) {
    ctx.addIssue({ code: "custom", message: "Send the sketch file (format counterpoise.sketch)." });
    return z.NEVER;
  }
  const parsed = parseSketch(value);
  if (!parsed.ok) {
    for (const e of parsed.errors.slice(0, 50)) ctx.addIssue({ code: "custom", message: e.message, path: e.path ? [e.path] : [] });
    return z.NEVER;
  }
  return parsed;
});

/** An empty sketch file with a title (a sketch created without a document starts from this). */
export function emptySketchFile(title: string): SketchFile {
  return { format: FORMAT, version: CURRENT_VERSION, title, bodies: [], supports: [], loads: [], ports: [], massSources: [] } as SketchFile;
}

/** The factor of safety furthest below its required value (smallest factor ÷ required) over the
 *  sketch as drawn and every case and combination, for the list's mark; null when all pass. */
export function lowestFactor(parsed: ParsedSketch): LowFactor | null {
  let worst: LowFactor | null = null;
  // the sketch as drawn is a run of its own only without cases: with them, it is solved on its own too
  const file = parsed.file;
  const hasCases = !!(file.cases?.length || file.combinations?.length);
  for (const run of [...(hasCases ? asDrawnStudy(file).runs : []), ...solveCases(file).runs]) {
    if (!run.ok) continue;
    for (const [body, st] of Object.entries(run.stability)) {
      for (const check of ["overturning", "sliding"] as const) {
        const c = st[check];
        if ("notApplicable" in c || c.pass || !Number.isFinite(c.factor)) continue;
        if (!worst || c.factor / c.required < worst.factor / worst.required) worst = { check, body: file.bodies.find((b) => b.id === body)?.label || body, factor: c.factor, required: c.required, run: run.name };
      }
    }
  }
  return worst;
}

/** The summary's mark of a contact over its own μ on a body that does not slide as a whole. */
export const OVER_MU = "OVER_MU";

/** Solve once and keep what listings need. Never throws: a solver failure is recorded, not raised. */
export function summarizeSolve(parsed: ParsedSketch): SolveSummary {
  try {
    const result = solve(parsed.sketch);
    const bodies: SolveSummary["bodies"] = {};
    let worst = -1;
    let largest: number | null = null;
    for (const [id, b] of Object.entries(result.bodies)) {
      bodies[id] = { status: b.status, largestReaction: b.largestReaction };
      worst = Math.max(worst, STATUS_ORDER.indexOf(b.status));
      if (Number.isFinite(b.largestReaction)) largest = Math.max(largest ?? 0, b.largestReaction);
    }
    let warnings: string[] = [...new Set([...parsed.warnings, ...result.warnings].map((w) => w.code))];
    // a contact over its own μ while every body has friction to spare as a whole: the listing says
    // "over μ" beside the status (as the results panel's badge does), not that the body slips
    const slidesAsWhole = Object.values(result.bodies).some((b) => b.friction && b.friction.needed > b.friction.available * (1 + 1e-9));
    if (warnings.includes("SLIP") && !slidesAsWhole) warnings = warnings.map((w) => (w === "SLIP" ? OVER_MU : w));
    return { status: worst >= 0 ? STATUS_ORDER[worst] : null, largestReaction: largest, bodies, warnings, lowestFactor: lowestFactor(parsed) };
  } catch (err) {
    return { status: null, largestReaction: null, bodies: {}, warnings: [], error: err instanceof Error ? err.message.slice(0, 200) : "the solve failed" };
  }
}

/** A new sketch in a workspace; without a document it starts empty. Its first version is v1. */
export const createSketchInput = z.strictObject({
  title: sketchTitleSchema.optional(),
  description: sketchDescriptionSchema.optional(),
  tags: tagsSchema.optional(),
  message: versionMessageSchema.optional(),
  document: sketchDocumentSchema.optional(),
});

/** A new version, naming the version the edits started from. */
export const saveVersionInput = z.strictObject({
  baseVersion: versionNumberSchema,
  message: versionMessageSchema.optional(),
  document: sketchDocumentSchema,
});
