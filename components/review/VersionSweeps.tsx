"use client";
// The sweeps a version keeps for its calc sheet, plotted on its page as the editor plots them, with
// where each margin reaches zero (the limit finder's value), where a plotted contact is off the
// ground (in the Sweep tab's words), and the calc sheet's table of every limit searched in every
// case and combination: a checker reads them without the PDF. All of it is worked out in the
// studies' worker (`useKeptSweeps`): the page stays responsive, says how far it is, and can stop.
import { memo, useMemo } from "react";
import { sweepStateLines } from "@/canvas/studies/display";
import type { SketchFile, SweepFile } from "@/solver/schema";
import { elementNames } from "@/solver/cases";
import { parameterWords } from "@/canvas/studies/display";
import { formatNumber, prettyUnit, type UnitSystem } from "@/solver/units";
import { SweepChart, type ChartFamily } from "@/components/studies/SweepChart";
import { ReportTable } from "@/components/studies/ReportTable";
import { planOf } from "@/solver/parse";
import { useSolved } from "./ReviewDrawing";
import { versionScaleOf } from "./versionScale";
import { unitFamily } from "@/solver/report";
import { Button } from "@/components/shell/controls";
import { useKeptSweeps, type KeptSweepState, type KeptSweepsRun } from "./useKeptSweeps";

function onWords(doc: SketchFile, sw: SweepFile): string {
  if (sw.combination) return `combination ${doc.combinations?.find((k) => k.id === sw.combination)?.name ?? sw.combination}`;
  if (sw.case) return `case ${doc.cases?.find((c) => c.id === sw.case)?.name ?? sw.case}`;
  return "as drawn";
}


/** "the sweep of v from 20 to 45 m/s on case Engine stopped", for a status or an error */
function sweepWords(doc: SketchFile, sw: SweepFile, unit = ""): string {
  return `the sweep of ${parameterWords(sw.parameter)} from ${formatNumber(sw.from, 6)} to ${formatNumber(sw.to, 6)}${unit ? ` ${prettyUnit(unit)}` : ""} ${sw.case || sw.combination ? `on ${onWords(doc, sw)}` : "as drawn"}`;
}

/** What the worker is doing now, in words, for the section's status line. */
function currentWords(doc: SketchFile, run: KeptSweepsRun, units: Readonly<Record<string, string>>): string {
  const c = run.current;
  const sw = c && doc.sweeps?.find((s) => s.id === c.sweep);
  if (!c || !sw) return "";
  const which = sweepWords(doc, sw, units[sw.parameter]);
  // the live region changes once a job, not with every point (the figure's bar counts those)
  return c.step === "limits" ? `Searching every limit of ${which} in each case and combination` : `Plotting ${which}`;
}

/** A progress bar: steps done of the total, or one that only says work is going on. */
function Bar({ done, total, label }: { done?: number; total?: number; label: string }) {
  return total ? <progress className="h-2 w-28" max={total} value={done} aria-label={label} /> : <progress className="h-2 w-28" aria-label={label} />;
}

export function VersionSweeps({ document, units }: { document: SketchFile; units: UnitSystem }) {
  const names = useMemo(() => elementNames(document), [document]);
  const run = useKeptSweeps(document);
  // the unit the sketch writes each parameter in, from the page's own solve of the version (cached
  // per document): the captions say it before the worker answers, and the sweeps are in that unit
  const { sketch } = useSolved(document);
  const parameterUnits = useMemo(() => (sketch ? (planOf(sketch)?.parameterUnits ?? {}) : {}), [sketch]);
  // the charts' forces and moments in the one family of the rest of the page and of the calc sheet's
  // charts (`versionScaleOf`: the page's own solves, cached per document), not one of their own
  const family = useMemo(() => {
    const scale = document.sweeps?.length ? versionScaleOf(document) : null;
    return scale ? unitFamily(units, scale) : undefined;
  }, [document, units]);
  const sweeps = document.sweeps ?? [];
  if (!sweeps.length) return null;
  const busy = run.current !== null;
  return (
    <section aria-label="Sweeps" className="space-y-3 pt-2" data-testid="version-sweeps" aria-busy={busy}>
      <h2 className="text-base font-semibold">Sweeps</h2>
      {busy || run.stopped ? (
        // one button that turns from Stop into its way back, so the keyboard's focus stays on it
        <div className="flex flex-wrap items-center gap-2 rounded-md border border-rule-soft bg-paper-card px-3 py-2 text-xs text-ink-soft" data-testid="version-sweeps-progress">
          <span role="status">
            {busy
              ? `${currentWords(document, run, parameterUnits)} — step ${run.settled + 1} of ${run.jobs}. The page stays usable meanwhile.`
              : `Stopped: ${run.settled ? `${run.jobs - run.settled} of the ${run.jobs} charts and tables were left out` : "nothing was worked out"}.`}
          </span>
          <Button size="sm" tone="secondary" onClick={busy ? run.stop : run.again}>
            {busy ? "Stop" : "Work out the rest"}
          </Button>
        </div>
      ) : null}
      {sweeps.map((sw) => (
        <KeptSweep
          key={sw.id}
          document={document}
          sw={sw}
          state={run.results[sw.id]}
          // a figure re-renders for its own progress only, not for another's
          progress={run.current?.sweep === sw.id ? run.current : null}
          stopped={run.stopped}
          drawnUnit={parameterUnits[sw.parameter] ?? ""}
          units={units}
          family={family}
          names={names}
        />
      ))}
    </section>
  );
}

const KeptSweep = memo(function KeptSweep({
  document,
  sw,
  state,
  progress,
  stopped,
  drawnUnit,
  units,
  family,
  names,
}: {
  document: SketchFile;
  sw: SweepFile;
  state: KeptSweepState | undefined;
  progress: KeptSweepsRun["current"];
  stopped: boolean;
  /** the unit the sketch writes the swept parameter in ("" for none), until the sweep says its own */
  drawnUnit: string;
  units: UnitSystem;
  family: ChartFamily | undefined;
  names: Readonly<Record<string, string>>;
}) {
  const name = parameterWords(sw.parameter);
  const plot = state?.plot;
  const parameterUnit = plot ? plot.data.unit : drawnUnit;
  const unit = parameterUnit ? ` ${prettyUnit(parameterUnit)}` : "";
  const plotting = progress?.step === "plot";
  const searching = progress?.step === "limits";
  return (
    <figure className="space-y-1" data-sweep={sw.id}>
      <figcaption className="text-sm font-medium">
        {name} from {formatNumber(sw.from, 6)} to {formatNumber(sw.to, 6)}
        {unit} — {onWords(document, sw)}
      </figcaption>
      {state?.plotError ? (
        <p className="text-sm text-caution" role="alert">
          {`${capital(sweepWords(document, sw, drawnUnit))} could not be run: ${state.plotError}`}
        </p>
      ) : plot ? (
        <>
          <SweepChart data={plot.data} units={units} parameterLabel={name} limit={null} run={0} names={names} family={family} />
          <ul className="text-xs text-ink-soft">
            {plot.markers.length ? plot.markers.map((m) => <li key={m.words}>Crossing: {m.words}.</li>) : <li>No plotted margin reaches zero in this range.</li>}
            {sweepStateLines(plot.data, names).map((l) => (
              <li key={l.words} data-testid="sweep-state">
                {l.words}
              </li>
            ))}
          </ul>
          {state?.limitsError ? (
            <p className="text-sm text-caution" role="alert">
              {`The limits of ${sweepWords(document, sw, parameterUnit)} could not be searched: ${state.limitsError}`}
            </p>
          ) : state?.limits ? (
            <>
              <p className="text-xs text-ink-soft" data-testid="sweep-limits-summary">
                {state.limits.summary}
              </p>
              <ReportTable table={state.limits.table} fileName={`sweep-${sw.id}-limits`} testId="sweep-limits" />
            </>
          ) : (
            <Waiting testId="sweep-limits-waiting" stopped={stopped}>
              {searching ? (
                <>
                  <Bar done={progress.done} total={progress.total} label="Limits search progress" />
                  <span>
                    Searching every limit (lift-off, slack, slip, tipping, sliding as a whole) in each case and combination
                    {progress.total ? `: ${progress.done} of ${progress.total} limits` : "…"}
                  </span>
                </>
              ) : (
                <span>The table of every limit in each case and combination comes once the charts are drawn.</span>
              )}
            </Waiting>
          )}
        </>
      ) : (
        <Waiting testId="sweep-plot-waiting" stopped={stopped} tall>
          {plotting ? (
            <>
              <Bar done={progress.done} total={progress.total} label="Sweep progress" />
              <span>{progress.total ? `Plotting: ${progress.done} of ${progress.total} steps (points solved, then the crossings searched)` : "Plotting…"}</span>
            </>
          ) : (
            <span>Waiting for the sweep before it…</span>
          )}
        </Waiting>
      )}
    </figure>
  );
});

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** The place a chart or a table will take, while it is worked out (or after Stop left it out). */
function Waiting({ children, stopped, tall = false, testId }: { children: React.ReactNode; stopped: boolean; tall?: boolean; testId: string }) {
  return (
    <div className={`drafting-grid flex flex-wrap items-center justify-center gap-2 rounded-md border border-dashed border-rule px-3 text-xs text-ink-soft ${tall ? "h-56" : "py-4"}`} data-testid={testId}>
      {stopped ? <span>Not worked out: stopped.</span> : children}
    </div>
  );
}
