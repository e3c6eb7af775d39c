// The one unit family of a version's page: its reactions, factors of safety, case tables, sign-off
// findings and kept sweeps' charts, chosen as its calc sheet chooses it.
import { asDrawnOfDocument, solveDocument, studyOfDocument } from "@/lib/review/compare";
import { versionScale, type Scale } from "@/solver/report";
import type { SketchFile } from "@/solver/schema";

/** The scale of every force and moment a version's page shows, chosen as its calc sheet chooses it
 *  (`versionScale`: its cases, the sketch as drawn with its factors of safety, and the result as
 *  drawn), so a figure reads in the same unit on the page and on the sheet; null when it does not solve. */
export function versionScaleOf(document: SketchFile): Scale | null {
  const { result } = solveDocument(document);
  if (!result) return null;
  const asDrawn = asDrawnOfDocument(document);
  const run = asDrawn?.runs[0];
  return versionScale(result, studyOfDocument(document), asDrawn, run?.ok ? run.stability : null);
}
