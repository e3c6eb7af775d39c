"use client";
// A version's kept sweeps worked out in the studies' worker (canvas/studies/keptSweep.ts), so the
// page stays responsive: every chart with its crossings first, then every table of limits (the
// longest part: each limit searched in every case and combination). The worker takes the jobs in
// that order and says how far the current one is; Stop ends it, a new version or leaving the page
// ends it too, and nothing worked out for one version is ever shown for another.
import { useCallback, useEffect, useRef, useState } from "react";
import { CancelledError, StudyRunner } from "@/canvas/studies/client";
import type { KeptSweepLimits, KeptSweepPlot } from "@/canvas/studies/keptSweep";
import { studyErrorWords } from "@/components/studies/studyError";
import type { SketchFile } from "@/solver/schema";

export type KeptStep = "plot" | "limits";

/** What is known of one kept sweep: its chart and its table, or why either could not be made. */
export interface KeptSweepState {
  plot?: KeptSweepPlot;
  plotError?: string;
  limits?: KeptSweepLimits;
  limitsError?: string;
}

export interface KeptSweepsRun {
  results: Readonly<Record<string, KeptSweepState>>;
  /** the job the worker is on, and how far it is (steps done of the total; 0 of 0 before it says) */
  current: { sweep: string; step: KeptStep; done: number; total: number } | null;
  /** jobs settled, of all of them (a chart and a table a sweep) */
  settled: number;
  jobs: number;
  /** Stop was pressed: what was not worked out by then stays out */
  stopped: boolean;
  stop: () => void;
  /** run what Stop left out */
  again: () => void;
}

interface Held {
  text: string;
  results: Record<string, KeptSweepState>;
  progress: Record<string, { done: number; total: number }>;
  stopped: boolean;
}

const EMPTY: Held = { text: "", results: {}, progress: {}, stopped: false };
const jobKey = (sweep: string, step: KeptStep) => `${sweep}:${step}`;
const settledStep = (s: KeptSweepState | undefined, step: KeptStep) => (step === "plot" ? !!(s?.plot || s?.plotError) : !!(s?.limits || s?.limitsError));

/** The jobs in the order the worker takes them: every chart, then every table. */
function jobOrder(ids: readonly string[]): Array<[string, KeptStep]> {
  return [...ids.map((id): [string, KeptStep] => [id, "plot"]), ...ids.map((id): [string, KeptStep] => [id, "limits"])];
}

export function useKeptSweeps(document: SketchFile): KeptSweepsRun {
  // the run is of the document's text: a refetch that brings the same version back starts nothing
  const text = JSON.stringify(document);
  const ids = (document.sweeps ?? []).map((s) => s.id);
  const [held, setHeld] = useState<Held>(EMPTY);
  const [attempt, setAttempt] = useState(0);
  const stopRun = useRef<() => void>(() => {});
  /** what is settled for the text now shown, read by a new run so Run again keeps it */
  const kept = useRef<Held>(EMPTY);

  useEffect(() => {
    const doc = JSON.parse(text) as SketchFile;
    const sweeps = (doc.sweeps ?? []).map((s) => s.id);
    if (!sweeps.length) return;
    let live = true;
    const before = kept.current.text === text ? kept.current.results : {};
    const update = (f: (h: Held) => Held) => {
      if (!live) return;
      setHeld((h) => {
        const next = f(h.text === text ? h : { ...EMPTY, text, results: before });
        kept.current = next;
        return next;
      });
    };
    update((h) => ({ ...h, progress: {}, stopped: false }));
    const put = (id: string, s: KeptSweepState) => update((h) => ({ ...h, results: { ...h.results, [id]: { ...h.results[id], ...s } } }));
    // said after "could not be run:", so a sentence's capital goes ("The sketch has …" → "the sketch has …")
    const failed = (err: unknown) => (err instanceof CancelledError ? null : studyErrorWords(doc, err).replace(/^[A-Z](?=[a-z])/, (c) => c.toLowerCase()));
    const runner = new StudyRunner();
    for (const [id, step] of jobOrder(sweeps)) {
      if (settledStep(before[id], step)) continue;
      const progress = (done: number, total: number) => update((h) => ({ ...h, progress: { ...h.progress, [jobKey(id, step)]: { done, total } } }));
      // each settles its own half of the sweep's state: the chart, or the limits table
      const settle = <T,>(promise: Promise<T>, ok: (r: T) => KeptSweepState, bad: (words: string) => KeptSweepState) =>
        promise
          .then((r) => put(id, ok(r)))
          .catch((err) => {
            const words = failed(err);
            if (words) put(id, bad(words));
          });
      if (step === "plot")
        settle(
          runner.run({ kind: "kept-sweep", text, sweep: id }, progress).promise,
          (plot) => ({ plot }),
          (plotError) => ({ plotError }),
        );
      else
        settle(
          runner.run({ kind: "kept-sweep-limits", text, sweep: id }, progress).promise,
          (limits) => ({ limits }),
          (limitsError) => ({ limitsError }),
        );
    }
    stopRun.current = () => {
      update((h) => ({ ...h, stopped: true }));
      runner.dispose();
    };
    return () => {
      live = false;
      stopRun.current = () => {};
      runner.dispose();
    };
  }, [text, attempt]);

  const stop = useCallback(() => stopRun.current(), []);
  const again = useCallback(() => setAttempt((n) => n + 1), []);
  // another version's results are never shown, not even for the render before its run starts
  const mine = held.text === text ? held : EMPTY;
  const order = jobOrder(ids);
  const settled = order.filter(([id, step]) => settledStep(mine.results[id], step)).length;
  const next = mine.stopped ? undefined : order.find(([id, step]) => !settledStep(mine.results[id], step));
  const current = next ? { sweep: next[0], step: next[1], ...(mine.progress[jobKey(next[0], next[1])] ?? { done: 0, total: 0 }) } : null;
  return { results: mine.results, current, settled, jobs: order.length, stopped: mine.stopped && settled < order.length, stop, again };
}
