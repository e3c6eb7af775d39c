// A version's kept sweeps as worker jobs: the chart with its crossings, then the table of every
// limit in every case and combination, each the calc sheet's own functions (lib/calcsheet/sweeps.ts,
// browser-safe), so the version page shows what the PDF prints without freezing while it is worked
// out. Every answer is plain data, for structured cloning out of the worker.
import { MAX_POINTS, sweepLimitTable, sweepMarkers, sweepQuantities, type SweepMarker } from "@/lib/calcsheet/sweeps";
import { marksZero } from "./display";
import { runJob, runSweep, type OnProgress, type StudyJob, type SweepData } from "./run";
import type { SketchFile, SweepFile } from "@/solver/schema";
import type { Table } from "@/solver/report";
import type { StudyResult } from "@/solver/cases";
import type { BodyLimitResult, LimitEverywhere } from "@/solver/studySweep";

/** `text`: the saved version's sketch file as JSON; `sweep`: the kept sweep's id in it. */
export type KeptSweepJob = { kind: "kept-sweep"; text: string; sweep: string } | { kind: "kept-sweep-limits"; text: string; sweep: string };

/** Any job the studies' worker runs: the editor's, or a version page's kept sweep. */
export type AnyStudyJob = StudyJob | KeptSweepJob;

/** A kept sweep plotted: its data, and where each plotted margin reaches zero (the limit finder's value). */
export interface KeptSweepPlot {
  data: SweepData;
  markers: SweepMarker[];
}

/** The calc sheet's table of every limit searched in every run, and its one-line summary. */
export interface KeptSweepLimits {
  table: Table;
  summary: string;
}

export type JobResult<J extends AnyStudyJob> = J extends { kind: "cases" }
  ? StudyResult
  : J extends { kind: "sweep" }
    ? SweepData
    : J extends { kind: "limits" }
      ? LimitEverywhere[]
      : J extends { kind: "kept-sweep" }
        ? KeptSweepPlot
        : J extends { kind: "kept-sweep-limits" }
          ? KeptSweepLimits
          : BodyLimitResult;

/** Points between progress messages: often enough for the bar to move, rare enough to cost nothing. */
const CHUNK = 20;

function keptSweep(file: SketchFile, id: string): SweepFile {
  const sw = file.sweeps?.find((s) => s.id === id);
  if (!sw) throw new Error(`sweeps: there is no kept sweep "${id}"`);
  return sw;
}

/**
 * The chart's data and its crossings. `onProgress` hears steps done of the total: each point
 * solved (at most `MAX_POINTS`, as on the calc sheet), then each plotted margin searched.
 */
export function runKeptSweep(file: SketchFile, id: string, onProgress: OnProgress = () => {}): KeptSweepPlot {
  const sw = keptSweep(file, id);
  const quantities = sweepQuantities(sw, file.supports.map((s) => s.id));
  const points = Math.min(sw.points, MAX_POINTS);
  const marking = quantities.filter((q) => marksZero(q.component));
  const total = points + marking.length;
  const data = runSweep(file, { parameter: sw.parameter, from: sw.from, to: sw.to, points, caseId: sw.case, combinationId: sw.combination, quantities }, (fraction) => (onProgress(Math.round(fraction * points), total), true), CHUNK);
  // one margin at a time, so the bar moves: `sweepMarkers` lists them in this order
  const markers = marking.flatMap((q, k) => {
    const found = sweepMarkers(file, sw, [q]);
    onProgress(points + k + 1, total);
    return found;
  });
  return { data, markers };
}

/** The calc sheet's table of the kept sweep's limits (`sweepLimitTable`), as it prints it; `onProgress` hears each limit searched (in every run) of all. */
export function runKeptSweepLimits(file: SketchFile, id: string, onProgress: OnProgress = () => {}): KeptSweepLimits {
  return sweepLimitTable(file, keptSweep(file, id), onProgress);
}

/** One job of either kind, as the worker runs it (or the page, where no worker can run). */
export function runStudyJob<J extends AnyStudyJob>(job: J, onProgress: OnProgress): JobResult<J> {
  if (job.kind === "kept-sweep") return runKeptSweep(JSON.parse(job.text), job.sweep, onProgress) as JobResult<J>;
  if (job.kind === "kept-sweep-limits") return runKeptSweepLimits(JSON.parse(job.text), job.sweep, onProgress) as JobResult<J>;
  return runJob(job as StudyJob, onProgress) as JobResult<J>;
}
