// The body's own sliding among a kept sweep's limits: where the body as a whole starts to slide
// (the friction its contacts give together is used up), beside where one contact slips alone.
import { describe, expect, it } from "vitest";
import { sweepLimitRows, sweepLimitTable } from "@/lib/calcsheet/sweeps";
import { tableCells } from "@/lib/calcsheet/table-layout";
import { bodySlidingMargin, findBodySlidingWith, formatLimit } from "@/solver/limit";
import { sweeperOn } from "@/solver/studySweep";
import type { SketchFileInput } from "@/solver";
import { solveWithStability } from "@/solver/solve";
import { G0 } from "@/solver/constants";
import { parsed } from "../solver/helpers";
import { fileOf, jetPushedBlock } from "../../support/jet-pushed-block";

/**
 * A 500 kg block, 2 m wide, on two contacts at its bottom corners x = 0 and x = 2 m (μ = mu), its
 * centre of gravity over the middle. A water jet leaves its left side at h = 1 m, pointing −x, so it
 * pushes the block +x with P = ṁ·V = ρ·Q·(Q/A) = ρ·Q²/A (ρ = 1000 kg/m³, A = 0.01 m²); the flow Q
 * is fed back in by a mass source (no momentum of its own).
 */
const block = (mu: number, extra: Partial<SketchFileInput> = {}) => jetPushedBlock(mu, extra, "volume flow");

// Hand calculation (common practice: a rigid block, Coulomb friction; no source). W = 500 × 9.80665
// = 4903.3 N. Forces: n_r + n_f = W, t_r + t_f = −P. Moments about the rear pad (0, 0):
// 2·n_f − 1·W − 1·P = 0 (the push acts 1 m up), so n_f = W/2 + P/2 and n_r = W/2 − P/2 (P·h/b with
// h = 1 m, b = 2 m). The pads are alike and at one height, so they share the push: |t_r| = |t_f| = P/2.
//  - the block as a whole slides where |Σt| = μ·Σn: P = μ·W, ρQ²/A = μW, Q = √(μ·W·A/ρ);
//  - the rear pad alone slips first, where P/2 = μ·(W/2 − P/2): P = μ·W/(1 + μ), Q = √(μ·W·A/(ρ(1 + μ)));
//  - it tips about the front pad where P·h = W·b/2: P = W, Q = √(W·A/ρ) = 0.2214 m³/s.
const W = 500 * G0;
const qAt = (P: number) => Math.sqrt((P * 0.01) / 1000);
const sweep = { id: "s", parameter: "Q", from: 0, to: 0.2, points: 21, quantities: [{ support: "rear", component: "frictionMargin" as const }] };

describe("the sweep's limits include the body sliding as a whole", () => {
  it("finds where the block slides as a whole (ρ·Q²/A = μ·W), after its rear pad slips alone", () => {
    const mu = 0.3;
    const { rows } = sweepLimitRows(fileOf(block(mu)), sweep);
    const slides = rows.find((r) => r.limit === "Block: slides as a whole (Σμ·n − |Σt| = 0)")!;
    expect(slides.run.name).toBe("As drawn");
    expect(slides.body).toBe("blk");
    expect(slides.value!).toBeCloseTo(qAt(mu * W), 9); // hand calculation above: 0.1213 m³/s
    expect(formatLimit(slides.value!)).toBe("0.1213");
    const rearSlip = rows.find((r) => r.limit === "rear pad: slip (μ·n − |t| = 0)")!;
    expect(rearSlip.value!).toBeCloseTo(qAt((mu * W) / (1 + mu)), 9); // hand calculation above: 0.1064 m³/s
    // the rear pad's slip comes first of all and governs; the body's own sliding is a limit of its own
    expect(rearSlip.governs).toBe(true);
    expect(slides.governs).toBe(false);
    expect(slides.first).toBe(true);
    // nothing tips below Q = 0.2214 m³/s (hand calculation above)
    expect(rows.find((r) => r.limit === "Block: tips (not held)")!.value).toBeUndefined();
  });

  it("is where the solve starts to warn the body's own SLIP and its factor against sliding reaches 1", () => {
    const mu = 0.3;
    const doc = block(mu);
    const found = findBodySlidingWith(sweeperOn(fileOf(doc), {}, "Q"), [0, 0.2], "blk");
    if (!found.found) throw new Error("not found");
    const at = (q: number) => solveWithStability(parsed({ ...doc, parameters: { Q: `${q} m^3/s` } }), { overturning: 1.5, sliding: 1.5 });
    const bodySlip = (q: number) => at(q).result.warnings.some((w) => w.code === "SLIP" && w.ids.length === 1 && w.ids[0] === "blk");
    expect(bodySlip(found.value * (1 - 1e-6))).toBe(false);
    expect(bodySlip(found.value * (1 + 1e-6))).toBe(true);
    const sliding = at(found.value).stability.blk.sliding;
    if (!("factor" in sliding)) throw new Error(sliding.notApplicable);
    expect(sliding.factor).toBeCloseTo(1, 6);
    // the margin itself, at half the sliding flow: P = μW/4, so μ·W − P = 0.75·μ·W (hand calculation above)
    expect(bodySlidingMargin(at(found.value / 2).result, "blk")).toBeCloseTo(0.75 * mu * W, 6);
  });

  it("says the body's own first limit beside the contact's slip that governs", () => {
    const { table, summary } = sweepLimitTable(fileOf(block(0.3)), sweep);
    const row = tableCells(table).find((r) => r[0] === "Block: slides as a whole (Σμ·n − |Σt| = 0)")!;
    expect(row).toEqual(["Block: slides as a whole (Σμ·n − |Σt| = 0)", "As drawn (plotted)", "◇\u00a00.1213", "first of this limit"]);
    expect(summary).toBe(
      "Governs over 0 … 0.2 m³/s: rear pad: slip (μ·n − |t| = 0) in the sketch as drawn at Q = 0.1064 m³/s. Block itself (the body, not one support) first gives way at Q = 0.1213 m³/s: slides as a whole (Σμ·n − |Σt| = 0) in the sketch as drawn.",
    );
  });

  it("searches it in every case, as the other limits", () => {
    // throttled to a flow factor of 0.8 the push is 0.64·ρQ²/A: it slides at Q = 0.1213 / 0.8 = 0.1516 m³/s
    const doc = block(0.3, { cases: [{ id: "full", name: "Full flow" }, { id: "thr", name: "Throttled", flowFactor: 0.8 }] });
    const { rows } = sweepLimitRows(fileOf(doc), { ...sweep, case: "full" });
    const slides = rows.filter((r) => r.limit.startsWith("Block: slides"));
    expect(slides.map((r) => r.run.name)).toEqual(["Full flow", "Throttled"]);
    expect(slides[0].value!).toBeCloseTo(qAt(0.3 * W), 9); // hand calculation above
    expect(slides[1].value!).toBeCloseTo(qAt(0.3 * W) / 0.8, 9); // hand calculation above
  });

  it("searches it in a combination's factored load set", () => {
    // 0.9 × weight + 1.5 × jet, one load set: it slides where 1.5·ρQ²/A = μ·0.9·W, Q = 0.1213 × √(0.9 / 1.5) = 0.09395 m³/s
    const doc = block(0.3, {
      cases: [
        { id: "w", name: "Weight", factors: { flow: 0 }, onlyInCombinations: true },
        { id: "j", name: "Jet", factors: { dead: 0 }, onlyInCombinations: true },
      ],
      combinations: [{ id: "k", name: "Factored", terms: [{ case: "w", factor: 0.9 }, { case: "j", factor: 1.5 }] }],
    });
    const { rows } = sweepLimitRows(fileOf(doc), { ...sweep, combination: "k" });
    const slides = rows.filter((r) => r.limit.startsWith("Block: slides"));
    expect(slides.map((r) => [r.run.kind, r.run.name])).toEqual([["combination", "Factored"]]);
    expect(slides[0].value!).toBeCloseTo(qAt(0.3 * W) * Math.sqrt(0.9 / 1.5), 9); // hand calculation above
  });

  it("is read only while the body is held: one that tips first says so", () => {
    // μ = 1.2: it would slide at P = 1.2·W, but tips at P = W, Q = 0.2214 m³/s (hand calculation above)
    const { table, summary } = sweepLimitTable(fileOf(block(1.2)), { ...sweep, to: 0.3 });
    const row = tableCells(table).find((r) => r[0] === "Block: slides as a whole (Σμ·n − |Σt| = 0)")!;
    expect(row).toEqual(["Block: slides as a whole (Σμ·n − |Σt| = 0)", "As drawn (plotted)", "none in 0 … 0.3 m³/s", "searched while the body is held: it tips from 0.2214 m³/s"]);
    // the rear pad slips alone at P = 1.2·W/2.2, Q = 0.1635 m³/s (hand calculation above, μ = 1.2)
    expect(summary).toBe(
      "Governs over 0 … 0.3 m³/s: rear pad: slip (μ·n − |t| = 0) in the sketch as drawn at Q = 0.1635 m³/s. Block itself (the body, not one support) first gives way at Q = 0.2214 m³/s: tips (not held) in the sketch as drawn.",
    );
  });

  it("is not searched for a body a pin holds: the pin resists sliding", () => {
    const doc = block(0.3);
    doc.supports![1] = { id: "front", label: "front pin", body: "blk", kind: "pin", at: [2, 0] };
    const { rows } = sweepLimitRows(fileOf(doc), sweep);
    expect(rows.some((r) => r.limit.includes("slides as a whole"))).toBe(false);
  });
});
