// The Sweep tab's limit finder on a body's own limits: where it tips, where it slides as a whole,
// in one run and in every case and combination, the same numbers as the calc sheet's limits table.
import { describe, expect, it } from "vitest";
import { sweepLimitRows } from "@/lib/calcsheet/sweeps";
import { bodyLimits, firstReached, reachedAt, runLimit, runLimitEverywhere } from "@/canvas/studies/run";
import type { SketchFileInput } from "@/solver";
import { G0 } from "@/solver/constants";
import { FLOW_FACTOR } from "@/solver/sweep";
import { fileOf, jetPushedBlock } from "../../support/jet-pushed-block";

/**
 * A block of 500 kg (weight W = 500·g0), base b = 2 m, on two contacts at its bottom corners (μ each),
 * its centre of gravity over the middle. A jet leaves its left side at h = 1 m pointing −x with
 * ṁ0 = 10 kg/s at V0 = 50 m/s, so it pushes the block +x with f²·ṁ0·V0 = f²·500 N at flow factor f
 * (ṁ and V both × f); a mass source feeds the flow back in, with no momentum of its own.
 */
const block = (mu: number, extra: Partial<SketchFileInput> = {}) => jetPushedBlock(mu, extra);

// Hand calculation (common practice: a rigid block, Coulomb friction; no source). P = f²·ṁ0·V0.
//  - tips about the front pad where the push's moment about it equals the weight's:
//    f²·ṁ0·V0·h = W·b/2  →  f = √(W·b/2 / (ṁ0·V0·h)) = √(500·g0 / 500) = √g0 = 3.1316;
//  - slides as a whole where the push equals the friction of both pads together (Σn = W):
//    f²·ṁ0·V0 = μ·W  →  f = √(μ·W / (ṁ0·V0)) = √(μ·g0); μ = 0.3: 1.7152 (before it tips: μ < b/(2h) = 1).
const W = 500 * G0;
const tipsAt = Math.sqrt((W * 1) / (500 * 1));
const slidesAt = (mu: number) => Math.sqrt((mu * W) / 500);
const limit = (doc: SketchFileInput, body: "tips" | "slides", from = 0, to = 4) =>
  runLimit(doc, { parameter: FLOW_FACTOR, from, to, quantity: { body: "blk", limit: body }, target: 0 });

describe("the limit finder on a body's own limits", () => {
  it("offers each body held by contacts or ties: tipping, and sliding as a whole where a contact has a μ and nothing bilateral holds it", () => {
    expect(bodyLimits(fileOf(block(0.3)))).toEqual([
      { body: "blk", limit: "tips" },
      { body: "blk", limit: "slides" },
    ]);
    const pinned = block(0.3);
    pinned.supports![1] = { id: "front", label: "front pin", body: "blk", kind: "pin", at: [2, 0] };
    // a pin resists sliding, as the stability check says; the block can still tip about it
    expect(bodyLimits(fileOf(pinned))).toEqual([{ body: "blk", limit: "tips" }]);
    const frictionless = block(0.3);
    for (const s of frictionless.supports!) delete (s as { mu?: number }).mu;
    expect(bodyLimits(fileOf(frictionless))).toEqual([{ body: "blk", limit: "tips" }]);
  });

  it("finds where the block tips: f²·ṁ0·V0·h = W·b/2 (μ large: no sliding first)", () => {
    const r = limit(block(1.2), "tips");
    if (!r.found) throw new Error(r.reason);
    expect(r.value).toBeCloseTo(tipsAt, 7); // hand calculation above: 3.1316
    expect(r.unit).toBe("");
  });

  it("finds where the block slides as a whole: f²·ṁ0·V0 = μ·W", () => {
    const r = limit(block(0.3), "slides", 0, 3);
    if (!r.found) throw new Error(r.reason);
    expect(r.value).toBeCloseTo(slidesAt(0.3), 7); // hand calculation above: 1.7152
    // nor does it tip below f = 3.1316: no tipping to report
    expect(r.tipsFrom).toBeUndefined();
    // over a range past that, where it tips is said beside (friction is checked, not enforced: the
    // tipping search does not stop where the block would slide)
    expect(limit(block(0.3), "slides").tipsFrom).toBeCloseTo(tipsAt, 7);
  });

  it("a block that tips before it could slide: no crossing, and where it tips is the reason", () => {
    // μ = 1.2 > b/(2h) = 1: it tips at f = 3.1316 before the push reaches μ·W (hand calculation above)
    const r = limit(block(1.2), "slides");
    expect(r.found).toBe(false);
    expect(r.tipsFrom).toBeCloseTo(tipsAt, 7);
  });

  it("searched downwards, the first limit met from the range's start", () => {
    // from f = 4 down to 0 the block is tipping at the start: reached at once, where the range starts
    const r = limit(block(1.2), "tips", 4, 0);
    if (!r.found) throw new Error(r.reason);
    expect(reachedAt(r, 4, 0)).toBe(4);
  });

  it("in every case: the same values as the calc sheet's limits table, the first marked alike", () => {
    // throttled to a flow factor of 0.8 the push is 0.64·f²·ṁ0·V0: it slides at f = 1.7152 / 0.8 = 2.144
    const doc = block(0.3, { cases: [{ id: "full", name: "Full flow" }, { id: "thr", name: "Throttled", flowFactor: 0.8 }] });
    const file = fileOf(doc);
    const { rows } = sweepLimitRows(file, { id: "s", parameter: FLOW_FACTOR, from: 0, to: 4, points: 41, case: "full" });
    for (const kind of ["tips", "slides"] as const) {
      const editor = runLimitEverywhere(doc, { parameter: FLOW_FACTOR, from: 0, to: 4, quantity: { body: "blk", limit: kind }, target: 0 });
      const sheet = rows.filter((r) => r.body === "blk" && r.past === (kind === "tips" ? "tipping" : "sliding as a whole"));
      expect(editor.map((r) => r.name)).toEqual(sheet.map((r) => r.run.name));
      expect(editor.map((r) => reachedAt(r.result, 0, 4))).toEqual(sheet.map((r) => r.value));
      const first = firstReached(editor, 0, 4);
      expect(editor.map((r) => !!first?.tied.includes(r))).toEqual(sheet.map((r) => r.first));
    }
    const slides = runLimitEverywhere(doc, { parameter: FLOW_FACTOR, from: 0, to: 4, quantity: { body: "blk", limit: "slides" }, target: 0 });
    expect(reachedAt(slides[0].result, 0, 4)).toBeCloseTo(slidesAt(0.3), 7); // hand calculation above
    expect(reachedAt(slides[1].result, 0, 4)).toBeCloseTo(slidesAt(0.3) / 0.8, 7); // hand calculation above
    // tipping: f = 3.1316 at full flow; throttled it would need f = 3.1316 / 0.8 = 3.9145, in the range too
    const tips = runLimitEverywhere(doc, { parameter: FLOW_FACTOR, from: 0, to: 4, quantity: { body: "blk", limit: "tips" }, target: 0 });
    expect(reachedAt(tips[0].result, 0, 4)).toBeCloseTo(tipsAt, 7);
    expect(reachedAt(tips[1].result, 0, 4)).toBeCloseTo(tipsAt / 0.8, 7);
  });
});
