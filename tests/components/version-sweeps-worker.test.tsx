// A version's kept sweeps are worked out in the studies' worker, not during the page's render: the
// chart and its crossings first, then the table of every limit; the page says how far it is, can
// stop, stops when it is left or shows another version, and keeps its results across a change of
// units. The worker is a stand-in the test answers step by step (it runs the jobs for real).
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { exampleById } from "@/canvas/examples";
import { VersionSweeps } from "@/components/review/VersionSweeps";
import type { SketchFile } from "@/solver/schema";
import type { FakeWorker } from "../unit/studies/fake-worker";

const workers = vi.hoisted(() => [] as FakeWorker[]);

vi.mock("@/canvas/studies/client", async (importOriginal) => {
  const mod = await importOriginal<typeof import("@/canvas/studies/client")>();
  const { FakeWorker } = await import("../unit/studies/fake-worker");
  class Runner extends mod.StudyRunner {
    constructor() {
      super(() => {
        const w = new FakeWorker();
        workers.push(w);
        return w as unknown as Worker;
      });
    }
  }
  return { ...mod, StudyRunner: Runner };
});

/** The exhaust stack's kept sweep: v from 20 to 45 m/s in 101 points on case "stopped", two quantities plotted (both margins). */
const stack = () => structuredClone(exampleById("exhaust-stack")!.sketch) as unknown as SketchFile;
const live = () => workers.filter((w) => !w.terminated);
const kinds = (w: FakeWorker) => w.received.map((m) => m.job.kind);

// the stand-in worker runs the jobs for real: more than vitest's 5 s on a busy machine
describe("a version's kept sweeps, in the worker", { timeout: 30000 }, () => {
  it("plots first, with its progress, then searches the limits, then shows the table", async () => {
    workers.length = 0;
    render(<VersionSweeps document={stack()} units="SI" />);
    const [w] = live();
    expect(kinds(w)).toEqual(["kept-sweep", "kept-sweep-limits"]);
    // the jobs carry the version's own sketch file, and name the kept sweep
    expect(JSON.parse(w.received[0].job.text)).toEqual(stack());
    w.compute(0);
    // progress after every 20 points, the last point, then each of the two plotted margins searched
    expect(w.queued.map((m) => ("done" in m ? `${m.done}/${m.total}` : "result"))).toEqual(["20/103", "40/103", "60/103", "80/103", "100/103", "101/103", "102/103", "103/103", "result"]);
    act(() => w.deliver(3));
    const bar = screen.getByRole("progressbar", { name: "Sweep progress" });
    expect(bar).toHaveAttribute("max", "103");
    expect(bar).toHaveAttribute("value", "60");
    expect(screen.getByTestId("sweep-plot-waiting").textContent).toBe("Plotting: 60 of 103 steps (points solved, then the crossings searched)");
    expect(screen.getByRole("status").textContent).toBe("Plotting the sweep of v from 20 to 45 m/s on case Engine stopped, 30 m/s wind — step 1 of 2. The page stays usable meanwhile.");
    await act(async () => w.deliver());
    // the chart and its crossings, while the limits are searched (no limit searched yet: a bar that says work goes on)
    expect(within(screen.getByTestId("version-sweeps")).getByTestId("sweep-chart")).toBeTruthy();
    expect(screen.getByText(/^Crossing: upwind edge: lift-off/)).toBeTruthy();
    expect(screen.getByRole("progressbar", { name: "Limits search progress" })).not.toHaveAttribute("value");
    expect(screen.getByTestId("sweep-limits-waiting").textContent).toBe("Searching every limit (lift-off, slack, slip, tipping, sliding as a whole) in each case and combination…");
    expect(screen.getByRole("status").textContent).toBe("Searching every limit of the sweep of v from 20 to 45 m/s on case Engine stopped, 30 m/s wind in each case and combination — step 2 of 2. The page stays usable meanwhile.");
    expect(screen.queryByTestId("sweep-limits")).toBeNull();
    w.compute(1);
    // a step per limit searched in every run: both edges' lift-off and slip, the stack's tipping and its sliding as a whole
    expect(w.queued.map((m) => ("done" in m ? `${m.done}/${m.total}` : "result"))).toEqual(["1/6", "2/6", "3/6", "4/6", "5/6", "6/6", "result"]);
    act(() => w.deliver(2));
    const limitsBar = screen.getByRole("progressbar", { name: "Limits search progress" });
    expect(limitsBar).toHaveAttribute("max", "6");
    expect(limitsBar).toHaveAttribute("value", "2");
    expect(screen.getByTestId("sweep-limits-waiting").textContent).toBe("Searching every limit (lift-off, slack, slip, tipping, sliding as a whole) in each case and combination: 2 of 6 limits");
    await act(async () => w.deliver());
    expect(screen.getByTestId("sweep-limits")).toBeTruthy();
    expect(screen.getByTestId("sweep-limits-summary").textContent).toMatch(/^Governs over 20 … 45 m\/s: /);
    expect(screen.queryByTestId("version-sweeps-progress")).toBeNull();
    expect(screen.getByTestId("version-sweeps")).toHaveAttribute("aria-busy", "false");
  });

  it("stops the worker when the page is left", () => {
    workers.length = 0;
    const { unmount } = render(<VersionSweeps document={stack()} units="SI" />);
    const [w] = live();
    expect(w.terminated).toBe(false);
    unmount();
    expect(w.terminated).toBe(true);
    expect(live()).toHaveLength(0);
  });

  it("a new version stops the old run, and nothing of the old version is shown for it", async () => {
    workers.length = 0;
    const v1 = stack();
    const { rerender } = render(<VersionSweeps document={v1} units="SI" />);
    const [first] = live();
    first.compute(0);
    await act(async () => first.deliver());
    expect(screen.getByTestId("sweep-chart")).toBeTruthy();
    const v2 = stack();
    v2.sweeps![0] = { ...v2.sweeps![0], from: 25, to: 40 };
    rerender(<VersionSweeps document={v2} units="SI" />);
    expect(first.terminated).toBe(true);
    const [second] = live();
    expect(JSON.parse(second.received[0].job.text).sweeps[0]).toMatchObject({ from: 25, to: 40 });
    // v1's chart is gone at once: the figure waits for v2's
    expect(screen.queryByTestId("sweep-chart")).toBeNull();
    expect(screen.getByTestId("sweep-plot-waiting")).toBeTruthy();
    expect(document.querySelector("[data-sweep] figcaption")!.textContent).toBe("v from 25 to 40 m/s — case Engine stopped, 30 m/s wind");
    second.compute(0);
    await act(async () => second.deliver());
    expect(screen.getByTestId("sweep-chart")).toBeTruthy();
    expect(document.querySelector("[data-sweep] figcaption")!.textContent).toBe("v from 25 to 40 m/s — case Engine stopped, 30 m/s wind");
  });

  it("a refetch of the same version (a new object, the same file) and a change of units run nothing again", async () => {
    workers.length = 0;
    const { rerender } = render(<VersionSweeps document={stack()} units="SI" />);
    const [w] = live();
    w.compute(0);
    w.compute(1);
    await act(async () => w.deliver());
    expect(screen.getByTestId("sweep-limits")).toBeTruthy();
    const chart = screen.getByTestId("sweep-chart");
    const table = screen.getByTestId("sweep-limits");
    rerender(<VersionSweeps document={stack()} units="US" />);
    expect(w.terminated).toBe(false);
    expect(w.received).toHaveLength(2);
    expect(workers).toHaveLength(1);
    // the same results, still on the page (the chart converts them to the units shown)
    expect(screen.getByTestId("sweep-chart")).toBe(chart);
    expect(screen.getByTestId("sweep-limits")).toBe(table);
    expect(screen.queryByTestId("version-sweeps-progress")).toBeNull();
  });

  it("Stop ends the run and says what was left out; the same button then works out only the rest", async () => {
    workers.length = 0;
    const user = userEvent.setup();
    render(<VersionSweeps document={stack()} units="SI" />);
    const [w] = live();
    w.compute(0);
    await act(async () => w.deliver());
    const stop = screen.getByRole("button", { name: "Stop" });
    await user.click(stop);
    expect(w.terminated).toBe(true);
    expect(screen.getByRole("status").textContent).toBe("Stopped: 1 of the 2 charts and tables were left out.");
    expect(screen.getByTestId("sweep-limits-waiting").textContent).toBe("Not worked out: stopped.");
    // what was done stays; the focus stays on the button, now the way back
    expect(screen.getByTestId("sweep-chart")).toBeTruthy();
    const again = screen.getByRole("button", { name: "Work out the rest" });
    expect(again).toBe(stop);
    expect(document.activeElement).toBe(again);
    await user.click(again);
    const [next] = live();
    expect(next).not.toBe(w);
    expect(kinds(next)).toEqual(["kept-sweep-limits"]);
    next.compute(0);
    await act(async () => next.deliver());
    expect(screen.getByTestId("sweep-limits")).toBeTruthy();
    expect(screen.getByTestId("sweep-chart")).toBeTruthy();
  });

  it("a sweep that fails says which sweep, and a worker that dies says so for every job it held", async () => {
    workers.length = 0;
    const doc = stack();
    doc.sweeps = [...doc.sweeps!, { id: "flow", parameter: "flowFactor", from: 0, to: 2, points: 11 }];
    render(<VersionSweeps document={doc} units="SI" />);
    const [w] = live();
    expect(kinds(w)).toEqual(["kept-sweep", "kept-sweep", "kept-sweep-limits", "kept-sweep-limits"]);
    await act(async () => w.reply({ id: w.received[0].id, error: "sweeps: something went wrong" }));
    expect(screen.getByRole("alert").textContent).toBe("The sweep of v from 20 to 45 m/s on case Engine stopped, 30 m/s wind could not be run: sweeps: something went wrong");
    await act(async () => w.fail("out of memory"));
    const alerts = screen.getAllByRole("alert").map((a) => a.textContent);
    expect(alerts).toEqual([
      "The sweep of v from 20 to 45 m/s on case Engine stopped, 30 m/s wind could not be run: sweeps: something went wrong",
      "The sweep of flow factor from 0 to 2 as drawn could not be run: the study could not run: out of memory",
    ]);
    expect(screen.queryByTestId("version-sweeps-progress")).toBeNull();
  });
});
