// Long studies off the main thread: all cases, a sweep (with progress), the limit finder.
// The page stops a run by terminating this worker and starting a fresh one.
import { runCases, runLimit, runSweep, type LimitSpec, type SweepSpec } from "./run";

export type StudyJob = { kind: "cases"; text: string } | { kind: "sweep"; text: string; spec: SweepSpec } | { kind: "limit"; text: string; spec: LimitSpec };

const scope = self as unknown as { onmessage: ((e: MessageEvent<{ id: number; job: StudyJob }>) => void) | null; postMessage: (m: unknown) => void };

scope.onmessage = (e) => {
  const { id, job } = e.data;
  try {
    const file = JSON.parse(job.text);
    let data: unknown;
    if (job.kind === "cases") data = runCases(file);
    else if (job.kind === "sweep") data = runSweep(file, job.spec, (done) => (scope.postMessage({ id, progress: done }), true));
    else data = runLimit(file, job.spec);
    scope.postMessage({ id, data });
  } catch (err) {
    scope.postMessage({ id, error: err instanceof Error ? err.message : String(err) });
  }
};
