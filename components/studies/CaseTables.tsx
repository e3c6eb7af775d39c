"use client";
// The results of all operating cases at once: reactions per case with the governing case marked,
// the envelope, each support's design load, and the factors of safety. The editor's Cases tab and
// a version's review page show the same tables.
import type { StudyResult } from "@/solver/cases";
import { type Cell, type Table, caseReactionTable, designLoadTable, envelopeTable, excludedWords, nameIn, slipWords, stabilityTable, unsolvedWords } from "@/solver/report";
import type { UnitSystem } from "@/solver/units";
import { withoutAbsentMoment } from "@/canvas/studies/tables";
import { ReportTable } from "./ReportTable";

/** The stability table's mark on a failed factor: the required one it falls below. */
export function belowRequired(table: Table) {
  const verdict = table.columns.findIndex((c) => c.key === "verdict");
  const required = table.columns.findIndex((c) => c.key === "required");
  return function markFailed(row: readonly Cell[], key: string) {
    return key === "verdict" && row[verdict] === "FAIL" ? <span className="ml-1 font-semibold text-caution">(below {row[required]})</span> : null;
  };
}

export function CaseTables({ result, units }: { result: StudyResult; units: UnitSystem }) {
  const nameOf = (id: string) => result.runs.find((r) => r.id === id)?.name ?? id;
  const unsolved = unsolvedWords(result);
  const stability = stabilityTable(result, units);
  return (
    <>
      {result.runs.filter((r) => !r.ok).map((r) => (
        <p key={r.id} className="text-[12px] text-caution" role="alert">
          {r.name} could not be solved: {!r.ok && r.errors.map((e) => `${e.path} ${e.message}`).join("; ")}
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
      <ReportTable
        table={withoutAbsentMoment(caseReactionTable(result, units), result)}
        fileName="reactions-per-case"
        testId="case-reactions"
        caption="▲ / ▼ beside a value: this case governs that component (largest magnitude; ▲ its maximum, ▼ its minimum). “design load”: the case of the support's largest resultant."
      />
      {unsolved ? (
        <p className="mt-3 rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-[12.5px] font-medium text-ink" data-testid="no-envelope">
          {unsolved}
        </p>
      ) : (
        <>
          <div className="mt-3">
            <ReportTable table={withoutAbsentMoment(envelopeTable(result, units), result)} fileName="envelope" testId="envelope" />
          </div>
          <div className="mt-3">
            <ReportTable table={withoutAbsentMoment(designLoadTable(result, units), result)} fileName="design-loads" testId="design-loads" />
          </div>
        </>
      )}
      <div className="mt-3">
        <ReportTable table={stability} fileName="factors-of-safety" testId="stability" mark={belowRequired(stability)}
        />
      </div>
      {unsolved ? null : (
        <p className="mt-2 text-[11.5px] text-ink-faint">
          Design load from — {Object.entries(result.envelope).map(([id, e]) => `${nameIn(result, id)}: ${nameOf(e.design.case)}`).join(" · ")}
        </p>
      )}
    </>
  );
}
