// What a version's own results say that a checker or approver must not miss: the sketch as drawn
// not holding or slipping, a case in which a body is not held, a factor of safety below its
// required value. The sign-off dialogs list them; the calc sheet's first page says the same.
import { parseSketch, solve, solveCases } from "@/solver";
import { caseFindings } from "@/solver/report";
import { statusSentences } from "@/components/results/statusSentence";

/** `doc`: a sketch file as saved (any format version; it is read as the CLI reads it). */
export function versionConcerns(doc: unknown): string[] {
  const parsed = parseSketch(doc);
  if (!parsed.ok) return [`The sketch does not solve: ${parsed.errors.map((e) => `${e.path} ${e.message}`).join("; ")}`];
  const study = solveCases(parsed.file);
  const hasCases = !!(parsed.file.cases?.length || parsed.file.combinations?.length);
  const out: string[] = [];
  for (const s of statusSentences(parsed.sketch, solve(parsed.sketch))) if (s.tone !== "holds") out.push(`As drawn: ${s.headline}`);
  out.push(...caseFindings(study, hasCases));
  return out;
}
