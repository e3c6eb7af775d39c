// A stand-in for the studies' web worker: it records the jobs it is sent and answers only when
// the test says so, either with messages the test writes or by running the job for real.
import { runJob, type StudyJob, type StudyMessage } from "@/canvas/studies/run";

type Listener = (e: { data?: unknown; message?: string; preventDefault?: () => void }) => void;

export class FakeWorker {
  received: Array<{ id: number; job: StudyJob }> = [];
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

  postMessage(m: { id: number; job: StudyJob }) {
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
      const data = runJob(job, (done, total) => this.queued.push({ id, done, total }));
      this.queued.push({ id, data: structuredClone(data) });
    } catch (err) {
      this.queued.push({ id, error: (err as Error).message });
    }
  }

  /** Deliver the next `n` queued messages (all of them by default). */
  deliver(n = this.queued.length) {
    for (const m of this.queued.splice(0, n)) this.reply(m);
  }
}
