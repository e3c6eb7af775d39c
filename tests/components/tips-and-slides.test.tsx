// A body that tips and slides at once: the headline, the badge, the factors of safety under it and
// the hand check all name both, not only the tipping.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { solved, tallBlock } from "./tall-block";
import { stabilitySentence, statusSentences } from "@/components/results/statusSentence";
import { supportStates } from "@/canvas/render/results";
import { renderSketchSvg } from "@/canvas/render/svg";
import { mountResultsDock } from "./editor-helpers";

const g = 9.80665;


describe("a body that tips and slides", () => {
  it("names both in the headline, with the friction it needs as a whole and what it has", () => {
    // P = 400 N: over W/4 = 245.2 N (tips) and over μ·W = 294.2 N (slides). Taken as a whole the
    // pads must resist 400 N and give 0.3 × 980.7 = 294.2 N: needs μ = 400 / 980.7 = 0.408
    const { sketch, result } = solved(tallBlock("400 N"));
    expect(result.bodies.b1.status).toBe("tips");
    const [s] = statusSentences(sketch, result);
    expect(s.tone).toBe("tips");
    expect(s.alsoSlips).toBe(true);
    expect(s.headline).toMatch(/^Tips about the right pad and slides — the left pad would have to pull [\d.]+ N; sliding, it must resist 400 N and can give 294\.2 N \(needs μ = 0\.408 as a whole, has 0\.3\)$/);
    expect((0.3 * 100 * g).toPrecision(4)).toBe("294.2");
  });

  it("a body that tips but has the friction to stay put says only that it tips", () => {
    // P = 270 N: over 245.2 N (tips), under 294.2 N (does not slide)
    const { sketch, result } = solved(tallBlock("270 N"));
    const [s] = statusSentences(sketch, result);
    expect(s.headline).toMatch(/^Tips about the right pad — the left pad would have to pull [\d.]+ N$/);
    expect(s.alsoSlips).toBeUndefined();
  });

  it("pads of different μ are not taken as a whole: a pad over its own μ in the forces shown is said instead, and the badge stays Tips", () => {
    // the forces that would hold it share P = 400 N equally (200 N each, the stiffnesses' share);
    // moments about the left pad give the right pad n = (W·0.5 m + P·2 m) / 1 m = 490.3 + 800 =
    // 1290 N (the left pad pulling 309.7 N): it needs 200 / 1290 = 0.155, over its μ = 0.1
    const { sketch, result } = solved(tallBlock("400 N", [0.3, 0.1]));
    const [s] = statusSentences(sketch, result);
    expect(s.headline).toMatch(/^Tips about the right pad — the left pad would have to pull [\d.]+ N; the right pad would slip too, needing 0\.155 with μ = 0\.1$/);
    expect(s.alsoSlips).toBeUndefined();
  });

  it("the factors of safety under it say that a factor under 1 is the tipping or the sliding itself", () => {
    // overturning about the right pad: W·0.5 / (P·2) = 490.3 / 800 = 0.613; sliding as a whole 294.2 / 400 = 0.735
    const { sketch, stability } = solved(tallBlock("400 N"));
    expect(stabilitySentence(sketch, "b1", stability.b1)?.text).toBe(
      "Factors of safety as drawn: against overturning about the right pad 0.613, below the required 1.5 (under 1: it tips); against sliding (as a whole) 0.735, below the required 1.5 (under 1: it slides)",
    );
    // short of 1.5 but over 1: a margin short, not the thing itself
    const near = solved(tallBlock("200 N"));
    expect(stabilitySentence(near.sketch, "b1", near.stability.b1)?.text).not.toMatch(/under 1/);
  });

  it("on screen: the badge says both, and the hand check's factors say which of them are under 1", async () => {
    const user = userEvent.setup();
    mountResultsDock(tallBlock("400 N"));
    expect(await screen.findByTestId("status-badge")).toHaveTextContent("Tips, slides");
    expect(screen.getByTestId("status-sentence")).toHaveAttribute("data-tone", "tips");
    expect(screen.getByTestId("stability-as-drawn")).toHaveTextContent("(under 1: it tips)");
    expect(screen.getByTestId("stability-as-drawn")).toHaveTextContent("(under 1: it slides)");
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    expect(await screen.findByTestId("overturning-factor")).toHaveTextContent(/= 0\.6129, below the required 1\.5 \(under 1: it tips\)$/);
    expect(within(screen.getByTestId("hand-sliding")).getByTestId("sliding-factor")).toHaveTextContent(/= 0\.7355, below the required 1\.5 \(under 1: it slides\)$/);
  });

  it("the drawing marks the pad it still bears on as slipping, by shape and word, beside the lift-off", () => {
    const { sketch, result } = solved(tallBlock("400 N"));
    const states = supportStates(result, sketch.supports);
    expect(states.get("s1")).toBe("lifted");
    expect(states.get("s2")).toBe("slips");
    // tipping alone (270 N): the pivot bears, no slide mark
    const only = solved(tallBlock("270 N"));
    expect(supportStates(only.result, only.sketch.supports).get("s2")).toBe("bearing");
    // the exported drawing says it too
    const svg = renderSketchSvg(tallBlock("400 N"), result, { units: "SI" });
    expect(svg).toMatch(/>slips</);
    expect(svg).toMatch(/>lifts</);
  });
});
