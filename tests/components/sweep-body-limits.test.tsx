// The Sweep tab's limit finder on a body's own limits: "Block tips", "Block slides as a whole",
// without a target, answered in words and on the plot, and in every case with the calc sheet's numbers.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock, setUpSweep } from "./editor-helpers";
import { sweepLimitRows } from "@/lib/calcsheet/sweeps";
import { parseSketch, type SketchFileInput } from "@/solver";
import { G0 } from "@/solver/constants";
import { formatLimit, limitWithUnit } from "@/solver/limit";
import { FLOW_FACTOR } from "@/solver/sweep";
import { bodyLimitWords, bodyNoCrossingWords } from "@/components/studies/SweepPanel";
import { runLimit } from "@/canvas/studies/run";
import { jetPushedBlock } from "../support/jet-pushed-block";

/**
 * A 500 kg block, base b = 2 m, on two contacts at its bottom corners (μ each), pushed +x by a jet
 * leaving its left side at h = 1 m with ṁ0·V0 = 10 kg/s × 50 m/s = 500 N at flow factor 1 (f²·500 N
 * at f; a mass source feeds the flow back in).
 * Hand calculation (common practice: rigid block, Coulomb friction): it tips about the front pad where
 * f²·ṁ0·V0·h = W·b/2, f = √(W/500 N) = √g0 = 3.132; it slides as a whole where f²·ṁ0·V0 = μ·W,
 * f = √(μ·g0) (μ = 0.3: 1.715).
 */
const block = (mu: number, extra: Partial<SketchFileInput> = {}) => jetPushedBlock(mu, extra);
const W = 500 * G0;
const tipsAt = Math.sqrt(W / 500);
const slidesAt = (mu: number) => Math.sqrt((mu * W) / 500);
const quantity = () => screen.getByRole("combobox", { name: "Quantity for the limit" }) as HTMLSelectElement;

/** The block with friction `mu` mounted, its flow factor swept over `range` (From, To, Points) and run. */
async function sweptBlock(mu: number, range: [string, string, string]) {
  const user = userEvent.setup();
  mountResultsDock(block(mu));
  await setUpSweep(user, FLOW_FACTOR, range);
  await user.click(screen.getByRole("button", { name: "Run the sweep" }));
  await screen.findByTestId("crossings");
  return user;
}

describe("the limit finder on a body's own limits", () => {
  it("offers the block's tipping and sliding, with no target, and answers with the value in words", async () => {
    const user = await sweptBlock(1.2, ["0", "4", "41"]);
    expect([...quantity().querySelectorAll("optgroup")].map((g) => [g.label, [...g.querySelectorAll("option")].map((o) => o.textContent)])).toEqual([
      ["Plotted (reaches a target)", ["margin at rear pad", "friction margin (μ·n − |t|) at rear pad", "margin at front pad", "friction margin (μ·n − |t|) at front pad"]],
      ["The body itself (its own limit)", ["Block tips", "Block slides as a whole"]],
    ]);
    await user.selectOptions(quantity(), "Block tips");
    // the limit itself: no target to type, and it says so
    expect(screen.queryByRole("textbox", { name: "Target value" })).toBeNull();
    expect(screen.getByTestId("limit-no-target").textContent).toBe("No target: this is the body's own limit, where no set of its contacts and ties holds it any more.");
    expect(quantity()).toHaveAccessibleDescription("No target: this is the body's own limit, where no set of its contacts and ties holds it any more.");
    await user.click(screen.getByRole("button", { name: "Find" }));
    expect(formatLimit(tipsAt)).toBe("3.132"); // hand calculation above
    expect((await screen.findByTestId("limit-answer")).textContent).toBe(
      "Block tips at flow factor = 3.132 (to 4 significant figures): from there no set of its contacts and ties holds it.",
    );
    // sliding: μ = 1.2 > b/(2h) = 1, so it tips before the push reaches μ·W: no crossing, and why
    await user.selectOptions(quantity(), "Block slides as a whole");
    await user.click(screen.getByRole("button", { name: "Find" }));
    expect((await screen.findByTestId("limit-answer")).textContent).toBe(
      "No crossing in this range: Block does not slide as a whole while it is held, for flow factor from 0 to 4; it tips first, from flow factor = 3.132 (sliding is searched only while the body is held).",
    );
    // a support's quantity takes its target again
    await user.selectOptions(quantity(), "margin at rear pad");
    expect(screen.getByRole("textbox", { name: "Target value" })).toBeTruthy();
  });

  it("finds where the block slides as a whole: f²·ṁ0·V0 = μ·W", async () => {
    const user = await sweptBlock(0.3, ["0", "3", "31"]);
    await user.selectOptions(quantity(), "Block slides as a whole");
    await user.click(screen.getByRole("button", { name: "Find" }));
    expect(formatLimit(slidesAt(0.3))).toBe("1.715"); // hand calculation above
    expect((await screen.findByTestId("limit-answer")).textContent).toBe(
      "Block slides as a whole at flow factor = 1.715 (to 4 significant figures): its friction contacts together are used up there (Σμ·n − |Σt| = 0, a factor of 1 against sliding).",
    );
  });

  it("In every case: each case with the calc sheet's value, the first marked, and why a case reaches none", async () => {
    const user = userEvent.setup();
    // throttled to 0.8 the push is 0.64·f²·500 N: it slides at f = 1.715 / 0.8 = 2.144 (hand calculation above)
    const doc = block(0.3, { cases: [{ id: "full", name: "Full flow" }, { id: "thr", name: "Throttled", flowFactor: 0.8 }] });
    mountResultsDock(doc);
    await setUpSweep(user, FLOW_FACTOR, ["0", "3.5", "36"]);
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await screen.findByTestId("crossings");
    await user.selectOptions(quantity(), "Block slides as a whole");
    await user.click(screen.getByRole("button", { name: "In every case" }));
    const box = await screen.findByTestId("limit-everywhere");
    expect(within(box).getByRole("status").textContent).toBe("Block slides as a whole first in Full flow.");
    // the calc sheet's limits table for the same sketch and range: the same numbers
    const p = parseSketch(doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const sheet = sweepLimitRows(p.file, { id: "s", parameter: FLOW_FACTOR, from: 0, to: 3.5, points: 36, case: "full" }).rows.filter((r) => r.past === "sliding as a whole");
    expect(sheet.map((r) => r.value!)).toHaveLength(2);
    expect(sheet[0].value!).toBeCloseTo(slidesAt(0.3), 7); // hand calculation above
    expect(sheet[1].value!).toBeCloseTo(slidesAt(0.3) / 0.8, 7); // hand calculation above
    const rows = [...box.querySelectorAll("tbody tr")].map((tr) => tr.textContent);
    expect(rows).toEqual([`Case Full flowflow factor = ${limitWithUnit(sheet[0].value!, "")} — first`, `Case Throttledflow factor = ${limitWithUnit(sheet[1].value!, "")}`]);

    // tipping: full flow tips at f = 3.132; throttled it would need 3.132 / 0.8 = 3.915, past the range
    await user.selectOptions(quantity(), "Block tips");
    await user.click(screen.getByRole("button", { name: "In every case" }));
    const again = await screen.findByTestId("limit-everywhere");
    expect(within(again).getByRole("status").textContent).toBe("Block tips first in Full flow.");
    // friction is checked, not enforced: each case says where the block already slides as a whole,
    // f = √(μ·g0) = 1.715 at full flow and 1.715 / 0.8 = 2.144 throttled (hand calculation above)
    expect([...again.querySelectorAll("tbody tr")].map((tr) => tr.textContent)).toEqual([
      `Case Full flowflow factor = ${formatLimit(tipsAt)} — first, while it is held against sliding: it already slides as a whole from flow factor = ${formatLimit(slidesAt(0.3))}`,
      `Case Throttledno crossing in this range: it does not tip; it slides as a whole from flow factor = ${formatLimit(slidesAt(0.3) / 0.8)}`,
    ]);
  });

  it("a block sliding from the range's start says so, and where it tips after", () => {
    // μ = 0.3: from f = 2 (past 1.715) the push is more than μ·W all along, and it tips at f = 3.132
    // (the solve checks friction, it does not enforce it: hand calculation above)
    const slides = { body: "blk", limit: "slides" as const };
    const r = runLimit(block(0.3), { parameter: FLOW_FACTOR, from: 2, to: 4, quantity: slides, target: 0 });
    if (r.found) throw new Error("no crossing expected");
    expect(r.max).toBeLessThan(0);
    expect(bodyLimitWords(r, slides, "Block slides as a whole", "the flow factor", "for the flow factor from 2 to 4", "", 2)).toBe(
      "No crossing in this range: Block slides as a whole throughout, for the flow factor from 2 to 4 (Σμ·n − |Σt| stays below zero), while it is held; it tips from the flow factor = 3.132 (sliding is searched only while the body is held).",
    );
    expect(bodyNoCrossingWords(r, slides, "flow factor", "")).toBe(
      "no crossing in this range: it slides as a whole throughout (Σμ·n − |Σt| stays below zero), while it is held; then it tips, from flow factor = 3.132",
    );
  });
});
