// A body with a contact lifted off that falls short of a required factor of safety: the failing
// check leads (the governing, most dangerous fact), the lift-off follows in the same headline (a
// finding of its own), the supports that still hold it under it; the badge says both. The panel,
// the drawing's summary and the announcement say the same. Figures by hand (rigid-block statics
// on equal springs, common practice): tests/support/three-foot-block.ts.
import { screen, waitFor } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { parseSketch, solveWithStability } from "@/solver";
import { G0 } from "@/solver/constants";
import { statusSentences } from "@/components/results/statusSentence";
import { threeFootBlock } from "../support/three-foot-block";
import { mountResultsDock, renderEditor } from "./editor-helpers";

function said(P: string, required = { overturning: 1.5, sliding: 1.5 }) {
  const p = parseSketch(threeFootBlock(P));
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const { result, stability } = solveWithStability(p.sketch, required);
  return { result, stability, sentences: statusSentences(p.sketch, result, "SI", "kN", stability) };
}

const W = 1000 * G0;
const HEAD_4KN = "Short of the required factor of safety against overturning about the far foot: 1.23\u00a0<\u00a01.5; it lifts off at the near foot";

describe("a body with a contact lifted off, short of a required factor of safety", () => {
  it("P = 4 kN: the near foot lifts (W/3 − P·h < 0), overturning W·0.5/(P·1) = 1.226 < 1.5 leads, the lift-off follows", () => {
    const { result, stability, sentences } = said("4 kN");
    // hand statics: near lifts, the middle foot carries W − 2P = 1806.65 N, the far foot 2P = 8000 N
    expect(result.reactions.near.state).toBe("lifted");
    expect(result.reactions.mid.n).toBeCloseTo(W - 8000, 3);
    expect(result.reactions.far.n).toBeCloseTo(8000, 3);
    const ot = stability.b.overturning;
    if ("notApplicable" in ot) throw new Error("no overturning check");
    expect(ot.factor).toBeCloseTo((W * 0.5) / 4000, 6);
    const [s] = sentences;
    expect(s.tone).toBe("lifts");
    expect(s.short).toBe("overturning");
    expect(s.headline).toBe(HEAD_4KN);
    // what still holds it, once, under the headline (the lift-off is not said twice)
    expect(s.details[0]).toBe("The far foot and the middle foot still hold the body.");
    expect(s.details.join(" ")).not.toMatch(/Lifts off/);
  });

  it("P = 3.5 kN with 1.2 required against overturning: 1.40 passes, the lift-off leads as before", () => {
    // the near foot lifts once P > W/3 = 3.269 kN; 4903.3/3500 = 1.401 ≥ 1.2
    const [s] = said("3.5 kN", { overturning: 1.2, sliding: 1.5 }).sentences;
    expect(s.tone).toBe("lifts");
    expect(s.short).toBeUndefined();
    expect(s.headline).toBe("Lifts off at the near foot — the far foot and the middle foot still hold the body");
  });

  it("P = 2 kN: every foot bears (near W/3 − P = 1268.9 N), both factors pass: Holds", () => {
    const { result, sentences } = said("2 kN");
    expect(result.reactions.near.n).toBeCloseTo(W / 3 - 2000, 3);
    expect(sentences[0].headline).toMatch(/^Holds — all supports within their limits/);
  });

  it("in the results panel: the badge says FoS short, lifts, and the headline both", async () => {
    mountResultsDock(threeFootBlock("4 kN"));
    const line = await screen.findByTestId("stability-as-drawn");
    expect(line).toHaveAttribute("data-pass", "false");
    expect(screen.getByTestId("status-badge")).toHaveTextContent(/^FoS short, lifts$/);
    const sentence = screen.getByTestId("status-sentence");
    expect(sentence).toHaveAttribute("data-tone", "lifts");
    expect(sentence).toHaveAttribute("data-short", "true");
    expect(sentence).toHaveTextContent(/Short of the required factor of safety against overturning about the far foot: 1\.23\s<\s1\.5; it lifts off at the near foot$/);
    expect(screen.getByText("The far foot and the middle foot still hold the body.")).toBeInTheDocument();
  });

  it("the drawing's summary and the announcement say it as the panel does", async () => {
    await renderEditor(threeFootBlock("4 kN"));
    const words = /Short of the required factor of safety against overturning about the far foot: 1\.23\s<\s1\.5; it lifts off at the near foot/;
    await waitFor(() => expect(screen.getByTestId("canvas-summary")).toHaveTextContent(words));
    await waitFor(() => expect(screen.getByTestId("result-announcer")).toHaveTextContent(words), { timeout: 5000 });
  });
});
