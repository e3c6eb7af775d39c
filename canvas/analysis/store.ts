// The live analysis beside the editor store: every change of the sketch is parsed and solved
// (in a worker when the browser has one; measured at ~2–4 ms for 200 elements, which would
// otherwise sit between a pointer move and its frame). An input error keeps the last good
// result on screen, marked stale.
import { createStore, type StoreApi } from "zustand/vanilla";
import type { SketchFile } from "@/solver/schema";
import type { SolveResult, Sketch } from "@/solver/types";
import type { BodyStability } from "@/solver/stability";
import { fieldValuesById, NO_VALUES, type FieldValues } from "../scene";
import type { EditorStore } from "../store";
import { analyseCore, type AnalysisCore } from "./core";

export interface Analysis {
  /** the sketch this analysis is of */
  sketch: SketchFile | null;
  core: AnalysisCore | null;
  /** expression values and errors by element id */
  fieldValues: FieldValues;
  /** the result on screen: this sketch's, or the last good one when this sketch has errors */
  shown: SolveResult | null;
  /** the numeric sketch `shown` belongs to */
  shownSketch: Sketch | null;
  /** the factors of safety as drawn that go with `shown` */
  shownStability: Record<string, BodyStability> | null;
  /** true when `shown` is an earlier sketch's result */
  stale: boolean;
  /** the editor's `fitRequest` when `shown` was solved: it moves on when the sketch is replaced as
   *  a whole, and a result from before that belongs to another sketch */
  shownGeneration: number;
  /** true while a newer sketch is being solved */
  pending: boolean;
}

export type AnalysisStore = StoreApi<Analysis>;

export const EMPTY_ANALYSIS: Analysis = {
  sketch: null,
  core: null,
  fieldValues: NO_VALUES,
  shown: null,
  shownSketch: null,
  shownStability: null,
  stale: false,
  shownGeneration: -1,
  pending: false,
};

/** Fold a new core into the previous analysis. */
function sameMap<V>(a: ReadonlyMap<string, V>, b: ReadonlyMap<string, V>): boolean {
  if (a.size !== b.size) return false;
  for (const [k, v] of a) if (b.get(k) !== v) return false;
  return true;
}

/** `generation`: the editor's `fitRequest` the sketch was taken at. An input error keeps the last
 *  good result (stale) only if it is of the same generation: a sketch opened, imported or replaced
 *  by an example is another sketch, and an earlier one's result is not shown as its own. */
export function nextAnalysis(prev: Analysis, sketch: SketchFile, core: AnalysisCore, generation = prev.shownGeneration): Analysis {
  const fresh = fieldValuesById(sketch, core.fields, core.errors);
  // unchanged values keep their identity: the scene (and the drawing) need not be rebuilt
  const fieldValues = sameMap(fresh.values, prev.fieldValues.values) && sameMap(fresh.errors, prev.fieldValues.errors) ? prev.fieldValues : fresh;
  if (core.ok && core.result) {
    return { sketch, core, fieldValues, shown: core.result, shownSketch: core.numeric, shownStability: core.stability, stale: false, shownGeneration: generation, pending: false };
  }
  if (prev.shownGeneration !== generation) return { sketch, core, fieldValues, shown: null, shownSketch: null, shownStability: null, stale: false, shownGeneration: generation, pending: false };
  return { sketch, core, fieldValues, shown: prev.shown, shownSketch: prev.shownSketch, shownStability: prev.shownStability, stale: prev.shown !== null, shownGeneration: prev.shownGeneration, pending: false };
}

export type Runner = (sketch: SketchFile, done: (core: AnalysisCore) => void) => void;

/** Parse and solve on the calling thread. */
export const syncRunner: Runner = (sketch, done) => done(analyseCore(sketch));

/**
 * A runner backed by a worker: one sketch in flight at a time; while it is solved, only the
 * newest change waits (a drag's intermediate frames are skipped, never queued). If the worker
 * fails (its script does not load, or it throws), the solve moves to the main thread for good:
 * slower, but the results keep following the sketch instead of freezing.
 */
export function workerRunner(worker: Worker, schedule: (fn: () => void) => void = afterFrame, warn: (message: string) => void = console.warn): Runner {
  type Job = { sketch: SketchFile; done: (c: AnalysisCore) => void };
  let seq = 0;
  let failed = false;
  let inFlight: (Job & { seq: number }) | null = null;
  let waiting: Job | null = null;
  let posting = false;
  const send = (job: Job) => {
    inFlight = { ...job, seq: ++seq };
    worker.postMessage({ seq: inFlight.seq, text: JSON.stringify(job.sketch) });
  };
  const fallBack = (why: string) => {
    if (failed) return;
    failed = true;
    warn(`Counterpoise: the live solve now runs on the main thread, because its worker failed (${why}).`);
    worker.onmessage = null;
    worker.onerror = null;
    worker.onmessageerror = null;
    worker.terminate();
    // the sketches it held are solved here, oldest first, so the newest ends on screen
    const jobs = [inFlight, waiting].filter((j): j is Job => j !== null);
    inFlight = null;
    waiting = null;
    for (const j of jobs) syncRunner(j.sketch, j.done);
  };
  // copying the sketch to the worker costs ~1 ms for 200 elements: do it after the frame
  // that shows the change, not between the pointer move and that frame
  const post = () => {
    posting = false;
    if (failed || inFlight || !waiting) return;
    const w = waiting;
    waiting = null;
    send(w);
  };
  worker.onmessage = (e: MessageEvent<{ seq: number; core?: AnalysisCore; error?: string }>) => {
    if (!inFlight || e.data.seq !== inFlight.seq) return;
    if (!e.data.core) return fallBack(e.data.error ?? "it gave no answer");
    const finished = inFlight;
    inFlight = null;
    // deliver every answer (it is newer than what is on screen), then solve the newest change
    finished.done(e.data.core);
    if (waiting && !posting) {
      posting = true;
      schedule(post);
    }
  };
  worker.onerror = (e: ErrorEvent) => {
    // handled here: the browser need not report it as uncaught as well
    e.preventDefault?.();
    fallBack(e.message || "its script could not be loaded");
  };
  worker.onmessageerror = () => fallBack("an answer could not be read");
  return (sketch, done) => {
    if (failed) return syncRunner(sketch, done);
    waiting = { sketch, done };
    if (!inFlight && !posting) {
      posting = true;
      schedule(post);
    }
  };
}

/** Run after the next frame has been drawn. */
export function afterFrame(fn: () => void): void {
  if (typeof requestAnimationFrame === "undefined") setTimeout(fn, 0);
  else requestAnimationFrame(() => setTimeout(fn, 0));
}

export function createAnalysisStore(): AnalysisStore {
  return createStore<Analysis>(() => EMPTY_ANALYSIS);
}

/** Keep an analysis store in step with the editor's sketch; returns the function that stops it. */
export function linkAnalysis(editor: EditorStore, store: AnalysisStore, runner: Runner = syncRunner): () => void {
  let latest: SketchFile | null = null;
  let live = true;
  const start = (sketch: SketchFile) => {
    latest = sketch;
    const generation = editor.getState().fitRequest;
    if (!store.getState().pending) store.setState({ pending: true });
    runner(sketch, (core) => {
      if (!live) return;
      const next = nextAnalysis(store.getState(), sketch, core, generation);
      store.setState({ ...next, pending: latest !== sketch }, true);
    });
  };
  if (store.getState().sketch !== editor.getState().sketch) start(editor.getState().sketch);
  const unsubscribe = editor.subscribe((s, prev) => {
    if (s.sketch !== prev.sketch) start(s.sketch);
  });
  return () => {
    live = false;
    unsubscribe();
  };
}

/** An analysis store already linked (tests and scripts). */
export function connectAnalysis(editor: EditorStore, runner: Runner = syncRunner): { store: AnalysisStore; stop: () => void } {
  const store = createAnalysisStore();
  return { store, stop: linkAnalysis(editor, store, runner) };
}

/** The last analysis's value of an element's expression field ("s2", "at[0]"), for commands that
 *  move or copy an element placed by an expression (it becomes a number there). */
export function valueLookup(store: AnalysisStore) {
  return (id: string, field: string): number | undefined => store.getState().fieldValues.values.get(`${id}.${field}`);
}
