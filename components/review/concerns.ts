// What a version's own results say that a checker or approver must not miss: the sketch as drawn
// not holding or slipping, a case in which a body is not held, a factor of safety below its
// required value, and a case in which a contact lifts, a tie goes slack or one contact needs more
// friction than its μ while the body holds (as the sketch as drawn says of itself). The sign-off
// dialogs list them; the calc sheet's first page says the same.
import { parseSketch, requirementsOf, solveWithStability, type ParseResult } from "@/solver";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import { asDrawnOfDocument, solveDocument, studyOfDocument } from "@/lib/review/compare";
import type { StudyResult } from "@/solver/cases";
import { caseFindings, nameIn, stateWord } from "@/solver/report";
import { statusSentences } from "@/components/results/statusSentence";
import type { OpenThreads } from "@/lib/review/rules";

/** `doc`: a sketch file as saved (any format version; it is read as the CLI reads it). `units` and
 *  `forceUnit`: the page's, so a force in a finding reads as in the tables beside it and on the
 *  calc sheet (`unitFamily(units, versionScale(…)).force`); by default SI, each force its own unit. */
export function versionConcerns(doc: unknown, units: UnitSystem = "SI", forceUnit?: string): string[] {
  // a document object is parsed and solved once for the whole page (its drawing and tables too)
  if (typeof doc !== "object" || doc === null) return notSolved(parseSketch(doc));
  const file = doc as SketchFile;
  const { parsed } = solveDocument(file);
  if (!parsed.ok) return notSolved(parsed);
  const study = studyOfDocument(file);
  const hasCases = !!(parsed.file.cases?.length || parsed.file.combinations?.length);
  const out: string[] = [];
  // with the factors of safety, so a body that tips and slides says which comes first, as on screen
  const solved = solveWithStability(parsed.sketch, requirementsOf(parsed.file));
  for (const s of statusSentences(parsed.sketch, solved.result, units, forceUnit, solved.stability, parsed.file)) if (s.tone !== "holds") out.push(`As drawn: ${s.headline}`);
  // with cases, the values on the drawing are a state of their own: its factors of safety too
  const asDrawn = hasCases ? asDrawnOfDocument(file) : null;
  if (asDrawn) out.push(...caseFindings(asDrawn, false).map((f) => `As drawn: ${f}`));
  if (study) out.push(...caseFindings(study, hasCases));
  if (study && hasCases) out.push(...caseStateFindings(study));
  return out;
}

/**
 * A line for each case or combination in which a body is held but one of its supports is not as
 * drawn: a contact lifts off, a tie goes slack, or a contact needs more friction than its own μ
 * gives while the body as a whole has friction to spare. The sketch as drawn says the same of
 * itself in its status sentence ("Lifts", "Over μ"); a case's own would otherwise be said only in
 * its row of the reactions per case. A body that tips, is unrestrained or fails its sliding check
 * is said by `caseFindings` and the envelope's notes instead.
 */
export function caseStateFindings(study: StudyResult): string[] {
  const out: string[] = [];
  for (const run of study.runs) {
    if (!run.ok) continue;
    const bits: string[] = [];
    for (const [id, r] of Object.entries(run.result.reactions)) {
      const status = run.result.bodies[r.body]?.status;
      if (status === "tips" || status === "unrestrained") continue;
      const name = nameIn(study, id);
      if (r.state === "lifted") bits.push(`${name} lifts off (its body is held by the other supports)`);
      else if (r.state === "slack") bits.push(`${name} goes slack (its body is held by the other supports)`);
      else if (stateWord(r, status) === "slips") {
        // the body as a whole holds where the solve warns no SLIP on the body itself (Σ μ·n at least
        // |Σ t|), as the case table's slip note reads it: whether its factor against sliding also
        // meets the required one is the stability table's finding, said with it
        if (!run.result.warnings.some((w) => w.code === "SLIP" && w.ids.includes(r.body))) bits.push(`${name} needs more friction than its own μ gives (the body as a whole holds: its other contacts take up the rest)`);
      }
    }
    if (bits.length) out.push(`${run.name} — ${bits.join("; ")}`);
  }
  return out;
}

function notSolved(parsed: ParseResult): string[] {
  return parsed.ok ? [] : [`The sketch does not solve: ${parsed.errors.map((e) => `${e.path} ${e.message}`).join("; ")}`];
}

/** The results' concerns and, when comment threads are still open on the version or on other
 *  versions of the sketch that are not approved (`openThreads`, as the sign-off reads them), how
 *  many and where: a question not yet answered is said before a check or an approval, which then
 *  needs a note (`noteForOpenThreads`). */
export function withOpenThreads(concerns: string[], openThreads: OpenThreads, number: number): string[] {
  const out = [...concerns];
  const here = openThreads.find((v) => v.number === number)?.open ?? 0;
  if (here) out.push(`${here} open comment thread${here === 1 ? "" : "s"} on this version: answer or resolve ${here === 1 ? "it" : "them"} first, or say why not`);
  const say = (list: OpenThreads, [one, many]: [string, string], what: (n: number) => string) => {
    const n = list.reduce((sum, v) => sum + v.open, 0);
    if (n) out.push(`${n} comment thread${n === 1 ? "" : "s"} still open on ${list.length === 1 ? one : many} (${list.map((v) => `v${v.number}`).join(", ")}): ${what(n)}`);
  };
  const them = (n: number) => (n === 1 ? "it" : "them");
  say(
    openThreads.filter((v) => v.number < number && v.open > 0),
    ["an earlier version", "earlier versions"],
    (n) => `resolve ${them(n)} there if this version settles ${them(n)}, or say why not`,
  );
  say(
    openThreads.filter((v) => v.number > number && v.open > 0),
    ["a later version", "later versions"],
    (n) => `asked of the drawing as it went on; if ${n === 1 ? "it applies" : "they apply"} to this version too, resolve ${them(n)} or say why not`,
  );
  return out.length === concerns.length ? concerns : out;
}
