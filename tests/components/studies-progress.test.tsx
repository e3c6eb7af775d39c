// Long studies on the page: the cases run shows its progress, and Stop settles every job of the
// panel's worker (a limit search started while a sweep runs stops with it instead of hanging).
// The panels' worker is a stand-in the test answers step by step.
import { readFileSync } from "node:fs";
import { act, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { mountResultsDock, setUpSweep } from "./editor-helpers";
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

const load = (n: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${n}.json`, "utf8"));
/** the live worker that was sent a job of this kind */
const busy = (kind: string) => workers.filter((w) => !w.terminated).find((w) => w.received.some((m) => m.job.kind === kind))!;

describe("Cases tab progress", () => {
  it("shows cases done of the total while the run goes on, then the results", async () => {
    workers.length = 0;
    const user = userEvent.setup();
    mount3Cases();
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Run all cases" }));
    const bar = screen.getByRole("progressbar", { name: "Cases progress" });
    expect(bar).toHaveAttribute("max", "4");
    expect(bar).toHaveAttribute("value", "0");
    expect(screen.getByRole("status").textContent).toBe("0 of 4 cases and combinations");
    const w = busy("cases");
    w.compute();
    // three cases and a combination: a progress message after each run, then the result
    expect(w.queued.map((m) => ("done" in m ? `${m.done}/${m.total}` : "result"))).toEqual(["1/4", "2/4", "3/4", "4/4", "result"]);
    act(() => w.deliver(3));
    expect(screen.getByRole("progressbar", { name: "Cases progress" })).toHaveAttribute("value", "3");
    expect(screen.getByRole("status").textContent).toBe("3 of 4 cases and combinations");
    await act(async () => w.deliver());
    expect(await screen.findByTestId("case-reactions")).toBeInTheDocument();
    expect(screen.queryByRole("progressbar", { name: "Cases progress" })).toBeNull();
  });

  it("Stop ends the run and says so; the next run works", async () => {
    workers.length = 0;
    const user = userEvent.setup();
    mount3Cases();
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Run all cases" }));
    const first = busy("cases");
    await user.click(screen.getByRole("button", { name: "Stop" }));
    expect(first.terminated).toBe(true);
    expect((await screen.findByRole("alert")).textContent).toBe("Stopped.");
    expect(screen.queryByRole("progressbar", { name: "Cases progress" })).toBeNull();
    await user.click(screen.getByRole("button", { name: "Run all cases" }));
    const second = busy("cases");
    expect(second).not.toBe(first);
    second.compute();
    await act(async () => second.deliver());
    expect(await screen.findByTestId("case-reactions")).toBeInTheDocument();
  });
});

describe("Sweep tab: the limit finder beside a running sweep, and Stop while it searches", () => {
  it("the limit search settles as stopped, and Find works again", async () => {
    workers.length = 0;
    const user = userEvent.setup();
    mountResultsDock(load("fire-monitor-trailer"));
    await setUpSweep(user, "theta", ["0", "80", "81"]);
    // a first sweep, answered, so the limit finder shows
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    let w = busy("sweep");
    w.compute();
    await act(async () => w.deliver());
    await screen.findByTestId("crossings");

    // while a second sweep runs, the limit finder waits for its plot (it searches what the plot shows)
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    const finder = screen.getByRole("group", { name: "Limit finder" });
    expect(within(finder).getByRole("button", { name: "Find" })).toBeDisabled();
    w = busy("sweep");
    w.compute();
    await act(async () => w.deliver());
    await waitFor(() => expect(within(finder).getByRole("button", { name: "Find" })).toBeEnabled());

    // a limit search running, stopped from beside it
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "margin at front jack");
    await user.click(screen.getByRole("button", { name: "Find" }));
    expect(within(finder).getByRole("status").textContent).toBe("Searching…");
    expect(within(finder).getByRole("button", { name: "Find" })).toBeDisabled();
    w = busy("limit");
    expect(w.received.map((m) => m.job.kind)).toEqual(["sweep", "sweep", "limit"]);

    await user.click(within(finder).getByRole("button", { name: "Stop" }));
    expect(w.terminated).toBe(true);
    expect((await screen.findByTestId("limit-stopped")).textContent).toBe("Stopped: the limit search did not finish. Press Find to search again.");
    expect(within(finder).queryByText("Searching…")).toBeNull();

    await user.click(within(finder).getByRole("button", { name: "Find" }));
    const fresh = busy("limit");
    expect(fresh).not.toBe(w);
    fresh.compute();
    await act(async () => fresh.deliver());
    // the jack lifts between theta = 18 and 19 deg (the sweep's marked crossing)
    // to 4 significant figures, with the search's tolerance (1e-9 of the 80° range)
    expect((await screen.findByTestId("limit-answer")).textContent).toMatch(/^The margin at front jack reaches 0 kN at theta = 18\.\d\d deg \(to 4 significant figures\)\.$/);
    expect(screen.queryByTestId("limit-stopped")).toBeNull();
  });
});

function mount3Cases() {
  return mountResultsDock({
    ...load("fire-monitor-trailer"),
    version: 3,
    cases: [
      { id: "low", name: "Low", parameters: { theta: "10 deg" } },
      { id: "high", name: "High", parameters: { theta: "40 deg" } },
      { id: "half", name: "Half flow", flowFactor: 0.5 },
    ],
    combinations: [{ id: "both", name: "Both", terms: [{ case: "low", factor: 1 }, { case: "half", factor: 1 }] }],
  });
}
