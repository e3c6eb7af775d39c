// Where one contact slips, does the body as a whole hold? A sweep keeps each body's own state
// point by point (it slides as a whole, it tips about a support) and its words say it beside each
// contact's slip; a tipping answer past the point where the body already slides says so.
import { describe, expect, it } from "vitest";
import { pointStateWords, sweepStateLines } from "@/canvas/studies/display";
import { runLimit, runSweep, type SweepSpec } from "@/canvas/studies/run";
import { sweepLimitTable } from "@/lib/calcsheet/sweeps";
import type { SketchFile } from "@/solver/schema";
import { elementNames } from "@/solver/cases";
import { G0 } from "@/solver/constants";
import { formatLimit } from "@/solver/limit";
import { bodyLimitWords } from "@/components/studies/SweepPanel";
import { fileOf, jetPushedBlock } from "../../support/jet-pushed-block";

/**
 * The 500 kg block (W = 500·g0), base b = 2 m, on the rear pad (x = 0, μr = 0.2) and the front pad
 * (x = 2 m, μf = 0.5), pushed +x by a water jet leaving its left side at h = 1 m: P = ρ·Q²/A with
 * ρ = 1000 kg/m³, A = 0.01 m², so P = 1e5·Q² (N, Q in m³/s).
 *
 * Hand calculation (rigid block, Coulomb friction: common practice; no source):
 *  - normals, from moments about the base: nr = W/2 − P·h/b = (W − P)/2, nf = (W + P)/2;
 *  - the two pads' tangential springs are alike and at the same height: each takes t = P/2;
 *  - the rear pad slips where P/2 = μr·nr → P = μr·W/(1 + μr) = W/6 → Q = 0.09040 m³/s;
 *  - the block slides as a whole where P = μr·nr + μf·nf = 0.35·W + 0.15·P → P = 0.35·W/0.85
 *    → Q = 0.1421 m³/s;
 *  - the rear pad unloads, and the block tips about the front pad, where nr = 0: P = W → Q = 0.2214 m³/s.
 * So from Q = 0.0904 to 0.1421 the rear pad slips alone and the block holds (the front pad takes up
 * the friction the rear one lacks); from 0.1421 the block itself slides; from 0.2214 it tips.
 */
const W = 500 * G0;
const rearSlipsAt = Math.sqrt(W / 6 / 1e5);
const slidesAt = Math.sqrt((0.35 * W) / 0.85 / 1e5);
const tipsAt = Math.sqrt(W / 1e5);

function twoPadBlock(): SketchFile {
  const doc = jetPushedBlock(0.5, {}, "volume flow");
  (doc.supports![0] as { mu?: number }).mu = 0.2;
  return fileOf(doc);
}

const SPEC: SweepSpec = {
  parameter: "Q",
  from: 0,
  to: 0.3,
  points: 31,
  quantities: [
    { support: "rear", component: "margin" },
    { support: "rear", component: "frictionMargin" },
    { support: "front", component: "frictionMargin" },
  ],
};

describe("a sweep says whether the body as a whole holds where one contact slips", () => {
  const file = twoPadBlock();
  const names = elementNames(file);
  const data = runSweep(file, SPEC);

  it("keeps where the block itself slides as a whole and where it tips about the front pad", () => {
    expect(formatLimit(rearSlipsAt)).toBe("0.09040"); // hand calculation above
    expect(formatLimit(slidesAt)).toBe("0.1421"); // hand calculation above
    expect(formatLimit(tipsAt)).toBe("0.2214"); // hand calculation above
    // the points every 0.01 m³/s: sliding from 0.15 (past 0.1421) to 0.22, tipping from 0.23 (past 0.2214)
    expect(data.bodies).toEqual({
      watched: [{ body: "blk", supports: ["rear", "front"] }],
      stretches: [
        { body: "blk", state: "slides", from: expect.closeTo(0.15, 12), to: expect.closeTo(0.22, 12), points: 8, whole: false },
        { body: "blk", state: "tips", about: "front", from: expect.closeTo(0.23, 12), to: 0.3, points: 8, whole: false },
      ],
    });
  });

  it("says it in the state lines, in the limits table's words", () => {
    const lines = sweepStateLines(data, names).map((l) => l.words);
    expect(lines).toContain(
      "rear pad slips from Q = 0.1 to 0.22 m³/s: it needs more friction than μ·n gives there (its friction margin is below zero). Block slides as a whole over part of it (from Q = 0.15 to 0.22 m³/s) and holds over the rest.",
    );
    expect(lines).toContain(
      "Block slides as a whole from Q = 0.15 to 0.22 m³/s: its friction contacts together cannot give the friction it needs (Σμ·n − |Σt| below zero), so the body itself moves along its base.",
    );
    // it slides as a whole before it tips: the solve does not enforce friction, so the tipping line
    // holds only for a block kept from sliding, and says so (as the limit finder's answer does)
    expect(lines).toContain(
      "Block tips about front pad from Q = 0.23 to 0.3 m³/s: no set of its contacts and ties holds it (while it is held against sliding: it already slides as a whole from Q = 0.15 to 0.22 m³/s).",
    );
  });

  it("says the block holds where the rear pad slips alone", () => {
    // up to Q = 0.14 (below 0.1421) only the rear pad is past its μ: the block holds
    const short = runSweep(file, { ...SPEC, to: 0.14, points: 15 });
    expect(sweepStateLines(short, names).map((l) => l.words)).toEqual([
      "rear pad slips from Q = 0.1 to 0.14 m³/s: it needs more friction than μ·n gives there (its friction margin is below zero). Block as a whole holds there: its friction contacts together give the friction it needs (Σμ·n ≥ |Σt|), the others taking up what this one cannot.",
    ]);
  });

  it("shows each body's state in the plot's hover", () => {
    expect(pointStateWords(data, 0.05, names)).toBe("Block holds");
    expect(pointStateWords(data, 0.12, names)).toBe("Block holds; rear pad slips");
    expect(pointStateWords(data, 0.18, names)).toBe("Block slides as a whole; rear pad slips");
    expect(pointStateWords(data, 0.25, names)).toBe("Block tips about front pad; rear pad off the ground");
  });
});

describe("a tipping answer where the body has already slid", () => {
  const file = twoPadBlock();

  it("carries where the body slides as a whole, and the Sweep tab says it tips only while held against sliding", () => {
    const r = runLimit(file, { parameter: "Q", from: 0, to: 0.3, quantity: { body: "blk", limit: "tips" }, target: 0 });
    if (!r.found) throw new Error(r.reason);
    expect(r.value).toBeCloseTo(tipsAt, 7); // hand calculation above: 0.2214
    expect(r.slidesFrom).toBeCloseTo(slidesAt, 7); // hand calculation above: 0.1421
    expect(bodyLimitWords(r, { body: "blk", limit: "tips" }, "Block tips", "Q", "for Q from 0 to 0.3 m³/s", "to 4 significant figures", 0, 0.3)).toBe(
      "Block tips at Q = 0.2214 m³/s (to 4 significant figures): from there no set of its contacts and ties holds it — while it is held against sliding: it already slides as a whole from Q = 0.1421 m³/s; the solve checks friction but does not enforce it, so it tips there only if it is kept from sliding.",
    );
  });

  it("says nothing of sliding where the body tips before it could slide", () => {
    // μ = 1.2 on both: sliding would need P = 1.2·W, past the tipping at P = W (hand calculation above)
    const grippy = fileOf(jetPushedBlock(1.2, {}, "volume flow"));
    const r = runLimit(grippy, { parameter: "Q", from: 0, to: 0.3, quantity: { body: "blk", limit: "tips" }, target: 0 });
    if (!r.found) throw new Error(r.reason);
    expect(r.slidesFrom).toBeUndefined();
    expect(bodyLimitWords(r, { body: "blk", limit: "tips" }, "Block tips", "Q", "", "to 4 significant figures", 0, 0.3)).toBe(
      "Block tips at Q = 0.2214 m³/s (to 4 significant figures): from there no set of its contacts and ties holds it.",
    );
  });

  it("the calc sheet's limits table says it beside the tipping row", () => {
    const { table } = sweepLimitTable(file, { id: "s", parameter: "Q", from: 0, to: 0.3, points: 31 });
    const row = table.rows.find((r) => r[0] === "Block: tips (not held)")!;
    expect(formatLimit(row[2] as number)).toBe("0.2214"); // hand calculation above
    expect(row[3]).toBe("first of this limit; while it is held against sliding: it already slides as a whole from 0.1421 m³/s");
  });
});
