// Runs study jobs in a worker, with progress and cancel; directly on the calling thread where
// no worker exists (tests).
import { SketchInputError, type OnProgress, type StudyMessage } from "./run";
import { runStudyJob, type AnyStudyJob, type JobResult } from "./keptSweep";

export interface Running<T> {
  promise: Promise<T>;
  cancel: () => void;
}

type Result<J extends AnyStudyJob> = JobResult<J>;

export class CancelledError extends Error {
  constructor(message = "stopped") {
    super(message);
  }
}

/** Makes the worker, or null where none can run (the jobs then run on the calling thread). */
export type WorkerFactory = () => Worker | null;

function makeWorker(): Worker | null {
  if (typeof Worker === "undefined" || process.env.NODE_ENV === "test") return null;
  try {
    return new Worker(new URL("./studies.worker.ts", import.meta.url), { type: "module" });
  } catch {
    return null;
  }
}

interface Pending {
  resolve: (data: unknown) => void;
  reject: (err: Error) => void;
  onProgress: OnProgress;
}

export class StudyRunner {
  private worker: Worker | null;
  /** every job sent to the current worker and not yet answered */
  private pending = new Map<number, Pending>();
  private seq = 0;
  private disposed = false;

  constructor(private readonly createWorker: WorkerFactory = makeWorker) {
    this.worker = this.start();
  }

  run<J extends AnyStudyJob>(job: J, onProgress: OnProgress = () => {}): Running<Result<J>> {
    if (this.disposed) return { promise: Promise.reject(new CancelledError()), cancel: () => {} };
    const id = ++this.seq;
    const worker = this.worker;
    if (!worker) return runHere(job, onProgress);
    const promise = new Promise<Result<J>>((resolve, reject) => {
      this.pending.set(id, { resolve: resolve as (d: unknown) => void, reject, onProgress });
    });
    worker.postMessage({ id, job });
    // A running job cannot be interrupted inside the worker: the worker is replaced, and every
    // job it held is settled, or a limit search sharing it with a stopped sweep would never answer.
    const cancel = () => {
      if (this.worker === worker && this.pending.has(id)) this.restart(() => new CancelledError());
    };
    return { promise, cancel };
  }

  dispose() {
    this.disposed = true;
    this.restart(() => new CancelledError());
  }

  private start(): Worker | null {
    const worker = this.disposed ? null : this.createWorker();
    if (!worker) return null;
    worker.addEventListener("message", (e: MessageEvent<StudyMessage>) => {
      const m = e.data;
      const p = worker === this.worker ? this.pending.get(m.id) : undefined;
      if (!p) return;
      if ("done" in m) return p.onProgress(m.done, m.total);
      this.pending.delete(m.id);
      if ("error" in m) p.reject(m.fields ? new SketchInputError(m.fields, m.on) : new Error(m.error));
      else p.resolve(m.data);
    });
    // the worker failed to load or died: its jobs will never answer
    worker.addEventListener("error", (e: ErrorEvent) => {
      if (worker !== this.worker) return;
      e.preventDefault?.();
      this.restart(() => new Error(`the study could not run${e.message ? `: ${e.message}` : ""}`));
    });
    return worker;
  }

  /** End the current worker, settle every job it held with `reason`, and start a fresh one. */
  private restart(reason: () => Error) {
    const held = [...this.pending.values()];
    this.pending.clear();
    this.worker?.terminate();
    this.worker = this.start();
    for (const p of held) p.reject(reason());
  }
}

/** The same work on this thread, a turn of the event loop later (as a worker would answer). */
function runHere<J extends AnyStudyJob>(job: J, onProgress: OnProgress): Running<Result<J>> {
  let rejectIt: ((err: Error) => void) | null = null;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const promise = new Promise<Result<J>>((resolve, reject) => {
    rejectIt = reject;
    timer = setTimeout(() => {
      rejectIt = null;
      try {
        resolve(runStudyJob(job, onProgress));
      } catch (err) {
        reject(err);
      }
    }, 0);
  });
  const cancel = () => {
    if (!rejectIt) return;
    clearTimeout(timer);
    rejectIt(new CancelledError());
    rejectIt = null;
  };
  return { promise, cancel };
}

export type { OnProgress };
