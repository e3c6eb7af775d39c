"use client";
// The results of all operating cases at once: reactions per case with the governing case marked,
// the envelope, each support's design load, and the factors of safety. The editor's Cases tab and
// a version's review page show the same tables.
import type { StudyResult } from "@/solver/cases";
import type { SketchFile } from "@/solver/schema";
import { errorInWords } from "@/components/results/errorPlace";
import { type Cell, type Scale, type Table, caseReactionTable, designCaseWords, designLoadTable, envelopeTable, excludedWords, nameIn, slipWords, stabilityTable, unsolvedWords, withRunName } from "@/solver/report";
import type { UnitSystem } from "@/solver/units";
import { withoutAbsentMoment } from "@/canvas/studies/tables";
import { ReportTable } from "./ReportTable";
import { SLIP_NOTE, SLIP_NOTE_MARK, slipRowKey, slipsWithFrictionToSpare } from "./slipNote";

/** The stability table's mark on a failed factor: the required one it falls below. */
export function belowRequired(table: Table) {
  const verdict = table.columns.findIndex((c) => c.key === "verdict");
  const required = table.columns.findIndex((c) => c.key === "required");
  return function markFailed(row: readonly Cell[], key: string) {
    return key === "verdict" && row[verdict] === "FAIL" ? <span className="ml-1 font-semibold text-caution">(below {row[required]})</span> : null;
  };
}

export { SLIP_NOTE_MARK, slipsWithFrictionToSpare } from "./slipNote";

/** "<case name>, as drawn": the case whose run is the sketch as drawn over again, said once (as the calc sheet says it). */
export const asDrawnName = (name: string) => `${name}, as drawn`;

/**
 * `asDrawn`: the id of the case whose run is the sketch as drawn over again (`asDrawnTwin`): its
 * factors of safety are the drawing's, so its group says so ("<case name>, as drawn") and the page
 * gives no separate group for the drawing. The reaction tables keep the case's own name.
 * `sketch`: the sketch the study ran on, so a run that could not be solved names its errors'
 * places as the editor does.
 */
/** `scale`: the unit family of the page the tables are on (a version's page: the calc sheet's,
 *  `versionScale`); by default each table's own. */
export function CaseTables({ result, units, asDrawn, sketch = null, scale }: { result: StudyResult; units: UnitSystem; asDrawn?: string | null; sketch?: SketchFile | null; scale?: Scale }) {
  const unsolved = unsolvedWords(result);
  const twin = asDrawn ? result.runs.find((r) => r.id === asDrawn) : undefined;
  const stability = stabilityTable(twin ? withRunName(result, twin.id, asDrawnName(twin.name)) : result, units, scale);
  const reactions = withoutAbsentMoment(caseReactionTable(result, units, scale), result);
  const spare = slipsWithFrictionToSpare(result);
  const col = (key: string) => reactions.columns.findIndex((c) => c.key === key);
  const markSlip = (row: readonly Cell[], key: string) =>
    key === "state" && spare.has(slipRowKey(row[col("case")], row[col("support")])) ? (
      <sup className="ml-0.5 font-semibold text-ink" title="One contact over its own μ while the body has friction to spare: see the note under the table">
        {SLIP_NOTE_MARK}
      </sup>
    ) : null;
  return (
    <>
      {result.runs.filter((r) => !r.ok).map((r) => (
        <p key={r.id} className="text-[12px] text-caution" role="alert">
          {/* each error at its place in the form's words ("Distributed load wind — w₁ at from: …"), the file's path without the sketch */}
          {r.name} could not be solved: {!r.ok && r.errors.map((e) => errorInWords(sketch, e)).join("; ")}
        </p>
      ))}
      {excludedWords(result).map((w) => (
        <p key={w} className="mb-1 text-[12px] font-medium text-caution" data-testid="not-in-envelope">
          <span aria-hidden="true">⚠ </span>
          {w}
        </p>
      ))}
      {slipWords(result).map((w) => (
        <p key={w} className="mb-1 text-[12px] font-medium text-caution" data-testid="slips-in-envelope">
          <span aria-hidden="true">⚠ </span>
          {w}
        </p>
      ))}
      {/* one group of rows a case, the key to ▲ / ▼ above the table: it fits the panel, and its key is never cut */}
      <ReportTable table={reactions} fileName="reactions-per-case" testId="case-reactions" groupBy={["case"]} notesAbove mark={markSlip} />
      {spare.size > 0 && (
        <p className="mt-1 text-[11.5px] text-ink-faint" data-testid="slips-note">
          {SLIP_NOTE_MARK} {SLIP_NOTE}
        </p>
      )}
      {unsolved ? (
        <p className="mt-3 rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-[12.5px] font-medium text-ink" data-testid="no-envelope">
          {unsolved}
        </p>
      ) : (
        <>
          <div className="mt-3">
            {/* cases that tie for a governing value are named in its row ("A and B (equal)") and each marked in the table above */}
            <ReportTable table={withoutAbsentMoment(envelopeTable(result, units, scale), result)} fileName="envelope" testId="envelope" groupBy={["support"]} />
          </div>
          <div className="mt-3">
            <ReportTable table={withoutAbsentMoment(designLoadTable(result, units, scale), result)} fileName="design-loads" testId="design-loads" />
          </div>
        </>
      )}
      <div className="mt-3">
        <ReportTable table={stability} fileName="factors-of-safety" testId="stability" mark={belowRequired(stability)} groupBy={["case", "body"]} />
      </div>
      {unsolved ? null : (
        <p className="mt-2 text-[11.5px] text-ink-faint">
          Design load from —{" "}
          {Object.keys(result.envelope)
            .map((id) => `${nameIn(result, id)}: ${designCaseWords(result, id)}`)
            .join(" · ")}
        </p>
      )}
    </>
  );
}
