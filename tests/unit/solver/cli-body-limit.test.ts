// `npm run solve -- --limit … --quantity BODY.tips | BODY.slides`: a body's own limits on the command line.
import { describe, expect, it } from "vitest";
import { solveCli, written } from "./cli-support";
import type { SketchFileInput } from "@/solver";
import { G0 } from "@/solver/constants";

/**
 * A 500 kg block, base b = 2 m, on two contacts at its bottom corners (μ each), pushed +x by a jet
 * leaving its left side at h = 1 m with ṁ0·V0 = 10 kg/s × 50 m/s = 500 N at flow factor 1 (f²·500 N
 * at f); a mass source feeds the flow back in.
 * Hand calculation (common practice: rigid block, Coulomb friction): it tips where
 * f²·ṁ0·V0·h = W·b/2, f = √g0 = 3.1316; it slides as a whole where f²·ṁ0·V0 = μ·W, f = √(μ·g0).
 */
const block = (mu: number, extra: Partial<SketchFileInput> = {}): SketchFileInput => ({
  format: "counterpoise.sketch",
  version: 6,
  bodies: [{ id: "blk", label: "Block", mass: 500, cg: [1, 0.5], outline: [[0, 0], [2, 0], [2, 2], [0, 2]] }],
  supports: [
    { id: "rear", body: "blk", kind: "contact", at: [0, 0], angle: 90, mu },
    { id: "front", body: "blk", kind: "contact", at: [2, 0], angle: 90, mu },
  ],
  loads: [],
  ports: [{ id: "jet", body: "blk", kind: "outlet", at: [0, 1], angle: 180, massFlow: "10 kg/s", velocity: "50 m/s" }],
  massSources: [{ id: "feed", body: "blk", massFlow: "10 kg/s", at: [1, 1] }],
  ...extra,
});
const W = 500 * G0;

describe("npm run solve -- --limit … --quantity BODY.tips | BODY.slides", () => {
  it("BODY.tips: where the block tips, f²·ṁ0·V0·h = W·b/2 (hand calculation above)", () => {
    const r = solveCli("--limit", "flowFactor=0..4", "--quantity", "blk.tips", written(block(1.2)));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    // a body's own limit has no target: none is printed
    expect(out).toMatchObject({ ok: true, parameter: "flowFactor", from: 0, to: 4, quantity: { body: "blk", limit: "tips" }, result: { found: true, unit: "" } });
    expect(out).not.toHaveProperty("target");
    expect(out.result.value).toBeCloseTo(Math.sqrt(W / 500), 7); // 3.1316
    // μ = 1.2: sliding would need f = √(1.2·g0) = 3.43, past the tipping: nothing slides first
    expect(out.result).not.toHaveProperty("slidesFrom");
  }, 30000);

  it("BODY.tips past where the block already slides: slidesFrom says where, f²·ṁ0·V0 = μ·W (hand calculation above)", () => {
    // μ = 0.3: it slides as a whole from f = √(0.3·g0) = 1.7152 and is found tipping at f = 3.1316,
    // a value it reaches only if it is kept from sliding (friction is checked, not enforced)
    const r = solveCli("--limit", "flowFactor=0..4", "--quantity", "blk.tips", written(block(0.3)));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.result.value).toBeCloseTo(Math.sqrt(W / 500), 7); // 3.1316
    expect(out.result.slidesFrom).toBeCloseTo(Math.sqrt((0.3 * W) / 500), 7); // 1.7152
  }, 30000);

  it("BODY.slides in every case: f²·ṁ0·V0 = μ·W, the first case named, and where a case tips", () => {
    // throttled to 0.8 the push is 0.64·f²·500 N: it slides at f = √(0.3·g0) / 0.8 (hand calculation above)
    const doc = block(0.3, { cases: [{ id: "full", name: "Full flow" }, { id: "thr", name: "Throttled", flowFactor: 0.8 }] });
    const r = solveCli("--limit", "flowFactor=0..3.5", "--quantity", "blk.slides", "--every-case", written(doc));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.runs.map((x: { id: string }) => x.id)).toEqual(["full", "thr"]);
    expect(out.runs[0].result.value).toBeCloseTo(Math.sqrt((0.3 * W) / 500), 7); // 1.7152
    expect(out.runs[1].result.value).toBeCloseTo(Math.sqrt((0.3 * W) / 500) / 0.8, 7); // 2.1440
    expect(out.first).toBe("full");
    // full flow tips at f = 3.1316 within the range (the solve checks friction, it does not enforce
    // it); throttled it would need 3.1316 / 0.8 = 3.9145, past the range
    expect(out.runs[0].result.tipsFrom).toBeCloseTo(Math.sqrt(W / 500), 7);
    expect(out.runs[1].result).not.toHaveProperty("tipsFrom");
  }, 30000);

  it("mistakes named by their option", () => {
    const file = written(block(0.3));
    const bad = (...args: string[]) => JSON.parse(solveCli(...args, file).stdout).errors[0];
    expect(bad("--limit", "flowFactor=0..4", "--quantity", "blk.tips", "--target", "2")).toEqual({
      path: "--target",
      message: "blk.tips is a body's own limit, reached where it starts to tip: it takes no --target",
    });
    expect(bad("--limit", "flowFactor=0..4", "--quantity", "cart.slides")).toEqual({ path: "--quantity", message: 'the sketch has no body "cart" (bodies: blk)' });
    expect(bad("--limit", "flowFactor=0..4", "--quantity", "blk.lifts")).toEqual({
      path: "--quantity",
      message: "lifts is not one of fx, fy, m, n, t, resultant, margin, frictionRatio, frictionMargin, tips, slides",
    });
  }, 120000);

  it("a body a pin holds cannot slide as a whole: refused, saying why", () => {
    const doc = block(0.3);
    doc.supports![1] = { id: "front", body: "blk", kind: "pin", at: [2, 0] };
    const r = solveCli("--limit", "flowFactor=0..4", "--quantity", "blk.slides", written(doc));
    expect(r.status).toBe(1);
    expect(JSON.parse(r.stdout).errors[0]).toEqual({
      path: "--quantity",
      message: 'the body "blk" cannot slide as a whole: it needs a contact with a friction coefficient μ, and no pin, roller or fixed support (they resist sliding)',
    });
  }, 30000);
});
