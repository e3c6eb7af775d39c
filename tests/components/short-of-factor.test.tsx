// A body held by its supports but short of a required factor of safety: the headline leads with the
// governing failing check, never "Holds"; the badge says "FoS short"; what the old headline said of
// the supports follows as the first detail. Figures by hand (rigid-block statics, common practice).
import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { parseSketch, solveWithStability, type SketchFileInput } from "@/solver";
import { G0 } from "@/solver/constants";
import { shortfall, statusSentences } from "@/components/results/statusSentence";
import { pushedBlock } from "../support/pushed-block";
import { jetPushedBlock } from "../support/jet-pushed-block";
import { mountResultsDock } from "./editor-helpers";

function said(doc: unknown, required = { overturning: 1.5, sliding: 1.5 }) {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const { result, stability } = solveWithStability(p.sketch, required);
  return { sketch: p.sketch, result, stability, sentences: statusSentences(p.sketch, result, "SI", "kN", stability) };
}

// The pushed block (tests/support/pushed-block.ts): W = 1000·g0 = 9806.65 N on feet 1 m apart,
// pushed at h = 1 m. Overturning about the far foot: W·b/2 / (P·h) = 4903.3/4000 = 1.226 at 4 kN;
// sliding (far foot only, μ 0.9): 0.9·(W/2 + P·h/b)/P = 0.9·8903.3/4000 = 2.003.
describe("a held body short of a required factor of safety", () => {
  it("leads with the failing check: overturning 1.23 < 1.5 at P = 4 kN (the figures and the sign kept together)", () => {
    const { sentences, stability } = said(pushedBlock("4 kN"));
    const ot = stability.b.overturning;
    if ("notApplicable" in ot) throw new Error("no overturning check");
    expect(ot.factor).toBeCloseTo((1000 * G0 * 0.5) / 4000, 6);
    const [s] = sentences;
    expect(s.tone).toBe("holds");
    expect(s.short).toBe("overturning");
    expect(s.headline).toBe("Short of the required factor of safety against overturning about the far foot: 1.23\u00a0<\u00a01.5");
    // the supports' own state follows; far foot: n = W/2 + P·h/b = 8.903 kN, t = 4 kN, |R| = 9.761 kN
    expect(s.details[0]).toBe("It holds — all supports within their limits; the largest reaction is 9.761 kN at the far foot.");
  });

  it("keeps Holds when every check passes (P = 2 kN: 2.45 and 3.11)", () => {
    const [s] = said(pushedBlock("2 kN")).sentences;
    expect(s.short).toBeUndefined();
    expect(s.headline).toMatch(/^Holds — all supports within their limits/);
  });

  it("the check furthest below its required value governs; the other follows", () => {
    // required 1.5 against overturning and 2.5 against sliding: 1.226/1.5 = 0.817, 2.003/2.5 = 0.801
    const [s] = said(pushedBlock("4 kN"), { overturning: 1.5, sliding: 2.5 }).sentences;
    expect(s.short).toBe("sliding");
    expect(s.headline).toBe("Short of the required factor of safety against sliding: 2\u00a0<\u00a02.5; also against overturning about the far foot: 1.23\u00a0<\u00a01.5");
  });

  it("one contact over its μ with friction to spare as a whole: the sliding factor 1.34 leads, the contact follows", () => {
    // tests/support/jet-pushed-block.ts with μ 0.2 at the rear pad, 0.5 at the front, Q = 0.12 m³/s:
    // P = ρQ²/A = 1440 N; nr = (W − P)/2 = 1731.7 N, nf = (W + P)/2 = 3171.7 N, W = 500·g0;
    // factor (0.2·nr + 0.5·nf)/P = 1932.2/1440 = 1.342 < 1.5; the rear pad needs 720/1731.7 = 0.416
    const doc = jetPushedBlock(0.5, { parameters: { Q: "0.12 m^3/s" } }, "volume flow") as SketchFileInput & { supports: Array<{ mu?: number }> };
    doc.supports[0].mu = 0.2;
    const [s] = said(doc).sentences;
    expect(s.tone).toBe("strained");
    expect(s.headline).toBe("Short of the required factor of safety against sliding: 1.34\u00a0<\u00a01.5");
    expect(s.details[0]).toMatch(/^It holds as a whole, with friction to spare \(needs μ = 0\.294, has 0\.394\) — but the rear pad alone needs 0\.416, more than its μ = 0\.2\.$/);
  });

  it("a factor that is not driven, or a body with no factors, gives no shortfall", () => {
    const { sketch } = said(pushedBlock("4 kN"));
    expect(shortfall(sketch, undefined)).toBeNull();
    expect(shortfall(sketch, { overturning: { notApplicable: "no contacts to tip about" }, sliding: { factor: Infinity, available: 1, driving: 0, required: 1.5, pass: true } })).toBeNull();
  });

  it("in the results panel: the badge says FoS short and the headline the failing check", async () => {
    mountResultsDock(pushedBlock("4 kN"));
    const line = await screen.findByTestId("stability-as-drawn");
    expect(line).toHaveAttribute("data-pass", "false");
    expect(screen.getByTestId("status-badge")).toHaveTextContent("FoS short");
    expect(screen.getByTestId("status-sentence")).toHaveTextContent(/^FoS shortShort of the required factor of safety against overturning about the far foot: 1\.23\s<\s1\.5$/);
    expect(screen.getByTestId("status-sentence")).toHaveAttribute("data-short", "true");
  });
});
