// The study runner: Stop replaces the shared worker, and every job that worker held settles
// (a limit search started beside a sweep must not hang); the next job gets a fresh worker.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { CancelledError, StudyRunner } from "@/canvas/studies/client";
import { FakeWorker } from "./fake-worker";

const trailer = readFileSync("tests/fixtures/sketches/fire-monitor-trailer.json", "utf8");

const sweepJob = { kind: "sweep" as const, text: trailer, spec: { parameter: "theta", from: 0, to: 80, points: 200, quantities: [{ support: "jack", component: "margin" as const }] } };
const limitJob = { kind: "limit" as const, text: trailer, spec: { parameter: "theta", from: 0, to: 80, quantity: { support: "jack", component: "margin" as const }, target: 0 } };

function withFakes() {
  const workers: FakeWorker[] = [];
  const runner = new StudyRunner(() => {
    const w = new FakeWorker();
    workers.push(w);
    return w as unknown as Worker;
  });
  return { runner, workers };
}

describe("StudyRunner with a worker", () => {
  it("stopping a sweep settles the limit search on the same worker, and the next job runs on a fresh one", async () => {
    const { runner, workers } = withFakes();
    expect(workers).toHaveLength(1);
    const heard: Array<[number, number]> = [];
    const sweep = runner.run(sweepJob, (done, total) => heard.push([done, total]));
    const limit = runner.run(limitJob);
    expect(workers[0].received.map((m) => m.job.kind)).toEqual(["sweep", "limit"]);
    const [sweepId, limitId] = workers[0].received.map((m) => m.id);
    workers[0].reply({ id: sweepId, done: 100, total: 200 });
    expect(heard).toEqual([[100, 200]]);

    sweep.cancel();
    expect(workers[0].terminated).toBe(true);
    await expect(sweep.promise).rejects.toBeInstanceOf(CancelledError);
    await expect(limit.promise).rejects.toBeInstanceOf(CancelledError);
    await expect(limit.promise).rejects.toThrow("stopped");
    // an answer the old worker had already sent is ignored
    workers[0].reply({ id: limitId, data: { found: false } });

    expect(workers).toHaveLength(2);
    const again = runner.run(limitJob);
    expect(workers[1].received.map((m) => m.job.kind)).toEqual(["limit"]);
    workers[1].compute();
    workers[1].deliver();
    const result = await again.promise;
    // the fixture's jack lifts off between theta = 18 and 19 deg (tests/unit/studies/run.test.ts)
    expect(result.found).toBe(true);
    if (result.found) expect(result.value).toBeGreaterThan(18);
    if (result.found) expect(result.value).toBeLessThan(19);
  });

  it("a job that has answered cannot stop the worker any more", async () => {
    const { runner, workers } = withFakes();
    const done = runner.run(limitJob);
    const other = runner.run(sweepJob);
    workers[0].reply({ id: workers[0].received[0].id, data: { found: false, unit: "deg", reason: "x", min: 0, max: 0 } });
    await done.promise;
    done.cancel();
    expect(workers[0].terminated).toBe(false);
    expect(workers).toHaveLength(1);
    workers[0].compute(1);
    workers[0].deliver();
    expect((await other.promise).xs).toHaveLength(200);
  });

  it("an error the worker reports rejects only that job", async () => {
    const { runner, workers } = withFakes();
    const bad = runner.run({ ...limitJob, spec: { ...limitJob.spec, parameter: "phi" } });
    const good = runner.run(limitJob);
    workers[0].compute(0);
    workers[0].deliver();
    await expect(bad.promise).rejects.toThrow(/no parameter "phi"/);
    workers[0].compute(1);
    workers[0].deliver();
    expect((await good.promise).found).toBe(true);
  });

  it("a worker that dies settles every job it held with an error and is replaced", async () => {
    const { runner, workers } = withFakes();
    const a = runner.run(sweepJob);
    const b = runner.run(limitJob);
    workers[0].fail("out of memory");
    await expect(a.promise).rejects.toThrow("the study could not run: out of memory");
    await expect(b.promise).rejects.toThrow("the study could not run: out of memory");
    expect(workers[0].terminated).toBe(true);
    expect(workers).toHaveLength(2);
  });

  it("closing the panel settles what is running and starts no worker", async () => {
    const { runner, workers } = withFakes();
    const a = runner.run(sweepJob);
    runner.dispose();
    await expect(a.promise).rejects.toBeInstanceOf(CancelledError);
    expect(workers).toHaveLength(1);
    await expect(runner.run(limitJob).promise).rejects.toBeInstanceOf(CancelledError);
  });

  it("a sweep's progress is its points done of the total", () => {
    const { runner, workers } = withFakes();
    runner.run({ ...sweepJob, spec: { ...sweepJob.spec, points: 250 } });
    workers[0].compute();
    // runSweep reports after each chunk of 100 points and at the end
    expect(workers[0].queued.filter((m) => "done" in m)).toEqual([
      { id: 1, done: 100, total: 250 },
      { id: 1, done: 200, total: 250 },
      { id: 1, done: 250, total: 250 },
    ]);
  });
});

describe("StudyRunner without a worker (on this thread)", () => {
  it("runs the cases with their progress: runs done of cases + combinations", async () => {
    const runner = new StudyRunner(() => null);
    const file = {
      ...JSON.parse(trailer),
      version: 3,
      cases: [
        { id: "a", name: "A", parameters: { theta: "10 deg" } },
        { id: "b", name: "B", parameters: { theta: "30 deg" } },
        { id: "c", name: "C", flowFactor: 0.5 },
      ],
      combinations: [{ id: "ab", name: "A + B", terms: [{ case: "a", factor: 1 }, { case: "b", factor: 1 }] }],
    };
    const heard: Array<[number, number]> = [];
    const result = await runner.run({ kind: "cases", text: JSON.stringify(file) }, (d, t) => heard.push([d, t])).promise;
    expect(result.runs.map((r) => r.id)).toEqual(["a", "b", "c", "ab"]);
    expect(heard).toEqual([[1, 4], [2, 4], [3, 4], [4, 4]]);
  });

  it("a job stopped before it starts is settled as stopped", async () => {
    const runner = new StudyRunner(() => null);
    const job = runner.run(limitJob);
    job.cancel();
    await expect(job.promise).rejects.toBeInstanceOf(CancelledError);
  });
});
