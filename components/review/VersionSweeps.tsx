"use client";
// The sweeps a version keeps for its calc sheet, plotted on its page as the editor plots them, with
// where each margin reaches zero (the limit finder's value), where a plotted contact is off the
// ground (in the Sweep tab's words), and the calc sheet's table of every limit searched in every
// case and combination: a checker reads them without the PDF.
import { useMemo } from "react";
import { runSweep, type SweepData } from "@/canvas/studies/run";
import { sweepStateLines } from "@/canvas/studies/display";
import { MAX_POINTS, sweepLimitTable, sweepMarkers, sweepQuantities, type SweepMarker } from "@/lib/calcsheet/sweeps";
import type { SketchFile, SweepFile } from "@/solver/schema";
import type { Table } from "@/solver/report";
import { elementNames } from "@/solver/cases";
import { FLOW_FACTOR } from "@/solver/sweep";
import { formatNumber, prettyUnit, type UnitSystem } from "@/solver/units";
import { SweepChart } from "@/components/studies/SweepChart";
import { ReportTable } from "@/components/studies/ReportTable";

type Plotted = { sw: SweepFile; data: SweepData; markers: SweepMarker[]; everywhere: { table: Table; summary: string } } | { sw: SweepFile; error: string };

function onWords(doc: SketchFile, sw: SweepFile): string {
  if (sw.combination) return `combination ${doc.combinations?.find((k) => k.id === sw.combination)?.name ?? sw.combination}`;
  if (sw.case) return `case ${doc.cases?.find((c) => c.id === sw.case)?.name ?? sw.case}`;
  return "as drawn";
}

export function VersionSweeps({ document, units }: { document: SketchFile; units: UnitSystem }) {
  const names = useMemo(() => elementNames(document), [document]);
  const plotted = useMemo(
    () =>
      (document.sweeps ?? []).map((sw): Plotted => {
        try {
          const quantities = sweepQuantities(sw, document.supports.map((s) => s.id));
          const data = runSweep(document, { parameter: sw.parameter, from: sw.from, to: sw.to, points: Math.min(sw.points, MAX_POINTS), caseId: sw.case, combinationId: sw.combination, quantities });
          return { sw, data, markers: sweepMarkers(document, sw, quantities), everywhere: sweepLimitTable(document, sw) };
        } catch (err) {
          return { sw, error: (err as Error).message };
        }
      }),
    [document],
  );
  if (!plotted.length) return null;
  return (
    <section aria-label="Sweeps" className="space-y-3 pt-2" data-testid="version-sweeps">
      <h2 className="text-base font-semibold">Sweeps</h2>
      {plotted.map((p) => {
        const name = p.sw.parameter === FLOW_FACTOR ? "flow factor" : p.sw.parameter;
        const unit = "data" in p && p.data.unit ? ` ${prettyUnit(p.data.unit)}` : "";
        return (
          <figure key={p.sw.id} className="space-y-1" data-sweep={p.sw.id}>
            <figcaption className="text-sm font-medium">
              {name} from {formatNumber(p.sw.from, 6)} to {formatNumber(p.sw.to, 6)}
              {unit} — {onWords(document, p.sw)}
            </figcaption>
            {"error" in p ? (
              <p className="text-sm text-caution" role="alert">
                This sweep could not be run: {p.error}
              </p>
            ) : (
              <>
                <SweepChart data={p.data} units={units} parameterLabel={name} limit={null} run={0} names={names} />
                <ul className="text-xs text-ink-soft">
                  {p.markers.length ? (
                    p.markers.map((m) => <li key={m.words}>Crossing: {m.words}.</li>)
                  ) : (
                    <li>No plotted margin reaches zero in this range.</li>
                  )}
                  {sweepStateLines(p.data, names).map((l) => (
                    <li key={l.words} data-testid="sweep-state">
                      {l.words}
                    </li>
                  ))}
                </ul>
                <p className="text-xs text-ink-soft" data-testid="sweep-limits-summary">
                  {p.everywhere.summary}
                </p>
                <ReportTable table={p.everywhere.table} fileName={`sweep-${p.sw.id}-limits`} testId="sweep-limits" />
              </>
            )}
          </figure>
        );
      })}
    </section>
  );
}
