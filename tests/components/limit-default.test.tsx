// The limit finder searches by default what the plot shows happening: the quantity whose zero
// crossing the plot marks (where a contact lifts), not merely the first line of the plot. Its
// answer and its line on the plot give the value to 4 significant figures with the search's tolerance.
import { readFileSync } from "node:fs";
import { screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock } from "./editor-helpers";
import { defaultLimitQuantity } from "@/components/studies/SweepChart";
import type { SweepData } from "@/canvas/studies/run";
import { G0 } from "@/solver/constants";
import { formatLimit } from "@/solver/limit";

const load = (n: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${n}.json`, "utf8"));

/** The thrust-stand demo as its latest version has it: the jet lowered to 0.6 m, the test pad falling 3° toward the front pin (gravity turned by the slope). */
function thrustStandOnSlope() {
  const d = load("thrust-stand-tips");
  d.ports[0].at = [0, 0.6];
  d.parameters.slope = "3 deg";
  d.gravityAngle = "-90 deg + slope";
  return d;
}

const data = (quantities: SweepData["quantities"], crossings: SweepData["crossings"]): SweepData => ({
  parameter: "p",
  unit: "",
  quantities,
  xs: [0, 1, 2, 3],
  series: quantities.map(() => [1, 1, 1, 1]),
  statuses: [],
  crossings,
  errors: [],
});

describe("the quantity the limit finder offers first", () => {
  const front = { support: "front", component: "resultant" as const };
  const rear = { support: "rear", component: "margin" as const };
  const grip = { support: "grip", component: "frictionMargin" as const };

  it("is the one whose crossing the plot marks first along the sweep", () => {
    expect(defaultLimitQuantity(data([front, rear], [{ quantity: 1, between: [1, 2] }]))).toBe(1);
    expect(defaultLimitQuantity(data([front, rear, grip], [{ quantity: 1, between: [2, 3] }, { quantity: 2, between: [0, 1] }]))).toBe(2);
  });

  it("else the first plotted margin, else the first line", () => {
    expect(defaultLimitQuantity(data([front, grip, rear], []))).toBe(1);
    expect(defaultLimitQuantity(data([front], []))).toBe(0);
  });
});

/**
 * Tests have no worker: a study job runs on the test's own thread (canvas/studies/client.ts,
 * `runHere`), blocking it while the sweep and the limit search solve. Alone they take well under a
 * second, but on a loaded machine several; a `findBy` with its default 1 s could time out while the
 * job it waits for is still running (the job blocks the poll too). So the sweeps here take 41 points
 * (enough to see the crossing: the answer comes from the limit finder, not the points), the answers
 * are awaited for up to 15 s and each test may take 60 s: a real failure (no answer, a wrong one)
 * still fails, only later.
 */
const SLOW = { timeout: 15_000 };
const TEST_TIMEOUT_MS = 60_000;

async function runSweep(user: ReturnType<typeof userEvent.setup>) {
  const points = screen.getByRole("textbox", { name: "Points" });
  await user.clear(points);
  await user.type(points, "41");
  // a run again keeps the last plot until the new one is in: wait for the chart of this run
  const before = screen.queryByTestId("sweep-chart")?.getAttribute("data-run") ?? null;
  await user.click(screen.getByRole("button", { name: "Run the sweep" }));
  await waitFor(() => expect(screen.getByTestId("sweep-chart").getAttribute("data-run")).not.toBe(before), SLOW);
  return screen.getByTestId("crossings");
}

describe("the limit finder on the thrust stand", () => {
  it("searches the rear pad's margin the plot marks, and finds where it lifts: 0.8·cos s − 0.7·sin s = 0.6·T / W", async () => {
    const user = userEvent.setup();
    mountResultsDock(thrustStandOnSlope());
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    // the plot: the front pin's resultant first, then the rear pad's margin; each reaction's
    // components can be ticked too
    expect(screen.getAllByRole("checkbox").map((c) => [c.closest("label")?.textContent, (c as HTMLInputElement).checked])).toEqual([
      ["front pin: resultant", true],
      ["front pin: Fx", false],
      ["front pin: Fy", false],
      ["rear pad: margin", true],
      ["rear pad: resultant", false],
    ]);
    expect((await runSweep(user)).textContent).toContain("margin at rear pad crosses zero between slope");
    const quantity = screen.getByRole("combobox", { name: "Quantity for the limit" }) as HTMLSelectElement;
    expect([...quantity.options].map((o) => o.textContent)).toEqual(["resultant at front pin", "margin at rear pad", "Stand tips"]);
    expect(quantity.selectedOptions[0].textContent).toBe("margin at rear pad");
    await user.click(screen.getByRole("button", { name: "Find" }));
    // moments about the front pin (statics, common practice): the weight W = 200 kg·g0 at (−0.8, 0.7) m
    // from the pin, along (sin s, −cos s), against the 2.2 kN jet at 0.6 m: the pad unloads where
    // W·(0.8·cos s − 0.7·sin s) = 0.6 m·T, i.e. s = acos(0.6·T / (W·√1.13)) − atan(0.7 / 0.8)
    const W = 200 * G0;
    const s = ((Math.acos((0.6 * 2200) / (W * Math.sqrt(1.13))) - Math.atan(0.7 / 0.8)) * 180) / Math.PI;
    expect(formatLimit(s)).toBe("9.534");
    // the sweep's default range is the slope ±90°, −87° to 93°: searched to 1e-9 of it, 1.8e-7°,
    // far finer than the 0.001° the answer is written to, so the words leave it out
    expect((await screen.findByTestId("limit-answer", {}, SLOW)).textContent).toBe(`The margin at rear pad reaches 0 kN at slope = ${formatLimit(s)} deg (to 4 significant figures).`);
  }, TEST_TIMEOUT_MS);

  it("keeps the quantity picked while it is still plotted", async () => {
    const user = userEvent.setup();
    mountResultsDock(thrustStandOnSlope());
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    await runSweep(user);
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "resultant at front pin");
    await runSweep(user);
    expect((screen.getByRole("combobox", { name: "Quantity for the limit" }) as HTMLSelectElement).selectedOptions[0].textContent).toBe("resultant at front pin");
  }, TEST_TIMEOUT_MS);
});
