// Long studies off the main thread: all cases, a sweep (with progress), the limit finder, and a
// version page's kept sweeps (their charts, then their tables of limits).
// The page stops a run by terminating this worker and starting a fresh one.
import { SketchInputError, type StudyJob, type StudyMessage } from "./run";
import { runStudyJob, type AnyStudyJob } from "./keptSweep";

export type { StudyJob, AnyStudyJob };

const scope = self as unknown as { onmessage: ((e: MessageEvent<{ id: number; job: AnyStudyJob }>) => void) | null; postMessage: (m: StudyMessage) => void };

scope.onmessage = (e) => {
  const { id, job } = e.data;
  try {
    const data = runStudyJob(job, (done, total) => scope.postMessage({ id, done, total }));
    scope.postMessage({ id, data });
  } catch (err) {
    // a sketch that does not parse: its field errors go too, for the page to say in its own words
    scope.postMessage({ id, error: err instanceof Error ? err.message : String(err), ...(err instanceof SketchInputError ? { fields: err.fields, ...(err.on ? { on: err.on } : {}) } : {}) });
  }
};
