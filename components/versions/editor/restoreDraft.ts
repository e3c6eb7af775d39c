// Kept work (after a save conflict) brought back on top of the newest version: what the user
// changed since the version they started from is merged into the newest one, so a colleague's
// save in between is kept, not silently undone. Fields both changed are named.
import { mergeSketch } from "@/canvas/model/merge";
import { apiFetch } from "@/lib/api-client";
import { clashList } from "@/lib/review/mergeWords";
import type { UnitSystem } from "@/solver/units";
import { migrateSketch } from "@/solver/migrations";
import type { SketchFile } from "@/solver/schema";
import type { Draft } from "./drafts";

type VersionResponse = { version: { number: number; document: SketchFile } };
type SketchResponse = { sketch: { latestVersion: number } };

/** A document in the current format (the merge and the no-change check compare like with like). */
export function current(doc: SketchFile): SketchFile {
  const m = migrateSketch(doc);
  return m.ok ? (m.doc as SketchFile) : doc;
}

export interface DraftOnNewest {
  sketch: SketchFile;
  /** the version the kept work now sits on */
  newest: number;
  /** fields both the kept work and the newer versions changed: the kept work's value is used */
  conflicts: string[];
  /** v{newest} as saved (the kept work's own document when nothing newer was saved) */
  theirs: SketchFile;
}

export async function draftOnNewest(draft: Draft, newest?: number): Promise<DraftOnNewest> {
  const latest = newest ?? (await apiFetch<SketchResponse>(`/api/sketches/${draft.sketchId}`)).sketch.latestVersion;
  if (draft.baseVersion >= latest) return { sketch: draft.sketch, newest: latest, conflicts: [], theirs: draft.sketch };
  const { sketch, conflicts, theirs } = await mergeOntoNewest(draft.sketchId, draft.baseVersion, draft.sketch, latest);
  return { sketch, newest: latest, conflicts, theirs };
}

/**
 * Unsaved work made on v{base} with v{newest}'s changes merged in (`mergeSketch`: a field both
 * changed keeps mine and is named), and v{newest} as saved (what the work is now based on).
 */
export async function mergeOntoNewest(sketchId: string, base: number, mine: SketchFile, newest: number): Promise<{ sketch: SketchFile; conflicts: string[]; theirs: SketchFile }> {
  const version = (n: number) => apiFetch<VersionResponse>(`/api/sketches/${sketchId}/versions/${n}`).then((r) => current(r.version.document));
  const [baseDoc, theirs] = await Promise.all([version(base), version(newest)]);
  const { sketch, conflicts } = mergeSketch(baseDoc, current(mine), theirs);
  return { sketch, conflicts, theirs };
}

/** How many clashes a notice names before "and N more". */
const NAMED = 4;

/**
 * What the editor says once v{newest} is merged into the work open in it (the conflict dialog's
 * "stay"). `merged`: the merge (its clashes named in words, with both values in `units`).
 */
export function mergedHereNotice(newest: number, base: number, merged: { conflicts: readonly string[]; sketch: SketchFile; theirs: SketchFile }, units: UnitSystem = "SI"): string {
  const { conflicts } = merged;
  const head = `v${newest} is merged into your changes: what it changed since v${base} is here too, and the next save goes on top of v${newest}.`;
  if (!conflicts.length) return `${head} Check, then save. Undo takes the merge back out.`;
  const named = clashList(conflicts, merged.sketch, merged.theirs, `v${newest}`, units, NAMED);
  return `${head} You and v${newest} both changed these, and yours are kept — check them before saving: ${named}. Undo takes the merge back out.`;
}

/** What the editor says once the kept work is back (clashes named in words, values in `units`). */
export function restoredNotice(r: DraftOnNewest, baseVersion: number, units: UnitSystem = "SI"): string {
  if (baseVersion >= r.newest) return `Your kept changes are back (made on v${baseVersion}). Save them as the next version.`;
  if (!r.conflicts.length) return `Your kept changes are back on top of v${r.newest}; what was saved since v${baseVersion} is kept too. Check, then save.`;
  const named = clashList(r.conflicts, r.sketch, r.theirs, `v${r.newest}`, units, NAMED);
  return `Your kept changes are back on top of v${r.newest}. You and a later version both changed these, and yours are used — check them before saving: ${named}.`;
}
