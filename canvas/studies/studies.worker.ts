// Long studies off the main thread: all cases, a sweep (with progress), the limit finder.
// The page stops a run by terminating this worker and starting a fresh one.
import { runJob, SketchInputError, type StudyJob, type StudyMessage } from "./run";

export type { StudyJob };

const scope = self as unknown as { onmessage: ((e: MessageEvent<{ id: number; job: StudyJob }>) => void) | null; postMessage: (m: StudyMessage) => void };

scope.onmessage = (e) => {
  const { id, job } = e.data;
  try {
    const data = runJob(job, (done, total) => scope.postMessage({ id, done, total }));
    scope.postMessage({ id, data });
  } catch (err) {
    // a sketch that does not parse: its field errors go too, for the page to say in its own words
    scope.postMessage({ id, error: err instanceof Error ? err.message : String(err), ...(err instanceof SketchInputError ? { fields: err.fields, ...(err.on ? { on: err.on } : {}) } : {}) });
  }
};
