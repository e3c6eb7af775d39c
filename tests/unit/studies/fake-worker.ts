// A stand-in for the studies' web worker: it records the jobs it is sent and answers only when
// the test says so, either with messages the test writes or by running the job for real.
import { SketchInputError, type StudyMessage } from "@/canvas/studies/run";
import { runStudyJob, type AnyStudyJob } from "@/canvas/studies/keptSweep";

type Listener = (e: { data?: unknown; message?: string; preventDefault?: () => void }) => void;

export class FakeWorker {
  received: Array<{ id: number; job: AnyStudyJob }> = [];
  terminated = false;
  /** messages made by `compute` and not yet delivered */
  queued: StudyMessage[] = [];
  private listeners = new Map<string, Listener[]>();

  addEventListener(type: string, fn: Listener) {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), fn]);
  }

  removeEventListener(type: string, fn: Listener) {
    this.listeners.set(type, (this.listeners.get(type) ?? []).filter((f) => f !== fn));
  }

  postMessage(m: { id: number; job: AnyStudyJob }) {
    if (this.terminated) throw new Error("posted to a terminated worker");
    this.received.push(m);
  }

  terminate() {
    this.terminated = true;
  }

  /** Answer as the worker would (a terminated worker says nothing). */
  reply(m: StudyMessage) {
    if (this.terminated) return;
    for (const fn of this.listeners.get("message") ?? []) fn({ data: m });
  }

  /** The worker dies, as on an uncaught error or a script that fails to load. */
  fail(message: string) {
    for (const fn of this.listeners.get("error") ?? []) fn({ message, preventDefault: () => {} });
  }

  /** Run the k-th job received for real and queue its progress and answer, for `deliver`. */
  compute(k = this.received.length - 1) {
    const { id, job } = this.received[k];
    try {
      const data = runStudyJob(job, (done, total) => this.queued.push({ id, done, total }));
      this.queued.push({ id, data: structuredClone(data) });
    } catch (err) {
      // as the worker says it: the message, and a sketch's field errors for the page's own words
      this.queued.push({ id, error: (err as Error).message, ...(err instanceof SketchInputError ? { fields: err.fields, ...(err.on ? { on: err.on } : {}) } : {}) });
    }
  }

  /** Deliver the next `n` queued messages (all of them by default). */
  deliver(n = this.queued.length) {
    for (const m of this.queued.splice(0, n)) this.reply(m);
  }
}
