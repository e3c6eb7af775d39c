// The public surface of the solver. Pure TypeScript: no React, Konva, Next or database.
import { parseSketch } from "./parse";
import { solveCases, type StudyResult } from "./cases";
import { solve } from "./solve";
import type { SolveFailure, SolveResult } from "./types";

export { parseSketch, planOf, zodErrors, type ParseResult } from "./parse";
export { solve, solveWithStability } from "./solve";
export { solveSweep, createSweeper, linspace, FLOW_FACTOR, type SweepResult, type SweepPoint } from "./sweep";
export { solveCases, asDrawnStudy, withAsDrawnRun, envelopeOf, combineModels, COMPONENTS, type StudyResult, type CaseRun, type SupportEnvelope, type EnvelopeEntry, type Component } from "./cases";
export { bodyStability, DEFAULT_REQUIREMENTS, requirementsOf, type BodyStability, type OverturningCheck, type SlidingCheck, type Requirements } from "./stability";
export { findLimit, brent, type LimitResult, type LimitOptions } from "./limit";
export { readQuantity, describeQuantity, type QuantitySpec, type QuantityComponent } from "./quantity";
export { handCheckSums, termMomentAbout, type HandCheckSums } from "./equations";
export { reactionTable, caseReactionTable, envelopeTable, stabilityTable, handCheckTable, inputsTable, parametersTable, tableToCsv, columnUnit, type Table, type Cell } from "./report";
export { describeFreeMotion, describeSupport } from "./words";
export { formatQuantity, formatNumber, convert, unitsFor, type UnitSystem, type Quantity } from "./units";
export { sketchSchema, CURRENT_VERSION, FORMAT, formatPath } from "./schema";
export type { SketchFile, SketchFileInput, SupportKind, LoadKind, CaseFile, CombinationFile, SweepFile, UnderlayFile } from "./schema";
export { migrateSketch, MIGRATIONS } from "./migrations";
export { CAUTIONS, CAUTION_SHORT, ASSUMPTIONS, CONVENTIONS } from "./cautions";
export * from "./types";

/**
 * Parse and solve in one step: the contract's output of `npm run solve`. A sketch with operating
 * cases or combinations also gets `study`: each case's result, stability and the envelope.
 */
export function solveFile(input: unknown): (SolveResult & { study?: StudyResult }) | SolveFailure {
  const parsed = parseSketch(input);
  if (!parsed.ok) return { ok: false, errors: parsed.errors };
  const result: SolveResult & { study?: StudyResult } = solve(parsed.sketch);
  result.warnings.unshift(...parsed.warnings);
  if (parsed.file.cases?.length || parsed.file.combinations?.length) result.study = solveCases(parsed.file);
  return result;
}
export { calibrate, imageToWorld, worldToImage, rescaleAbout, type UnderlayPlacement } from "./underlay";
