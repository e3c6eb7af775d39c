// Runs study jobs in a worker, with progress and cancel; directly on the calling thread where
// no worker exists (tests).
import type { LimitResult } from "@/solver/limit";
import type { StudyResult } from "@/solver/cases";
import { runCases, runLimit, runSweep, type LimitSpec, type SweepData, type SweepSpec } from "./run";
import type { StudyJob } from "./studies.worker";

export interface Running<T> {
  promise: Promise<T>;
  cancel: () => void;
}

type Result<J extends StudyJob> = J extends { kind: "cases" } ? StudyResult : J extends { kind: "sweep" } ? SweepData : LimitResult;

export class CancelledError extends Error {
  constructor() {
    super("stopped");
  }
}

function makeWorker(): Worker | null {
  if (typeof Worker === "undefined" || process.env.NODE_ENV === "test") return null;
  try {
    return new Worker(new URL("./studies.worker.ts", import.meta.url), { type: "module" });
  } catch {
    return null;
  }
}

export class StudyRunner {
  private worker: Worker | null = makeWorker();
  private seq = 0;

  run<J extends StudyJob>(job: J, onProgress: (done: number) => void = () => {}): Running<Result<J>> {
    const id = ++this.seq;
    const worker = this.worker;
    if (!worker) {
      const promise = new Promise<Result<J>>((resolve, reject) => {
        setTimeout(() => {
          try {
            const file = JSON.parse(job.text);
            const data = job.kind === "cases" ? runCases(file) : job.kind === "sweep" ? runSweep(file, (job as { spec: SweepSpec }).spec, (d) => (onProgress(d), true)) : runLimit(file, (job as { spec: LimitSpec }).spec);
            resolve(data as Result<J>);
          } catch (err) {
            reject(err);
          }
        }, 0);
      });
      return { promise, cancel: () => {} };
    }
    let cancel = () => {};
    const promise = new Promise<Result<J>>((resolve, reject) => {
      const onMessage = (e: MessageEvent<{ id: number; progress?: number; data?: unknown; error?: string }>) => {
        if (e.data.id !== id) return;
        if (e.data.progress !== undefined) return onProgress(e.data.progress);
        worker.removeEventListener("message", onMessage);
        if (e.data.error) reject(new Error(e.data.error));
        else resolve(e.data.data as Result<J>);
      };
      worker.addEventListener("message", onMessage);
      cancel = () => {
        worker.removeEventListener("message", onMessage);
        // a running job cannot be interrupted inside the worker: replace the worker
        worker.terminate();
        this.worker = makeWorker();
        reject(new CancelledError());
      };
      worker.postMessage({ id, job });
    });
    return { promise, cancel };
  }

  dispose() {
    this.worker?.terminate();
    this.worker = null;
  }
}
