// A body that tips and slides: which starts first, by the factors of safety (the smaller one,
// when the loads that drive it grow in proportion and its weight stays), in the headline, the
// badge, the line under it and the hand check's factors.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { solved, tallBlock } from "./tall-block";
import { statusSentences, tipSlideOrder } from "@/components/results/statusSentence";
import { mountResultsDock } from "./editor-helpers";

const g = 9.80665;
const W = 100 * g;

// The tall block of ./tall-block (rigid-block statics, common practice). Factors of safety at P:
// overturning (W·0.5)/(P·2), sliding μ·W/P; with P growing from zero the smaller is reached first.
describe("a body that tips and slides says which starts first", () => {
  it("tips first when the overturning factor is the smaller (μ = 0.3, P = 400 N)", () => {
    // overturning W·0.5 / (P·2) = 490.3 / 800 = 0.613; sliding μ·W / P = 294.2 / 400 = 0.7355
    expect(((W * 0.5) / 800).toPrecision(3)).toBe("0.613");
    expect(((0.3 * W) / 400).toPrecision(4)).toBe("0.7355");
    const { sketch, result, stability } = solved(tallBlock("400 N", 0.3));
    const [s] = statusSentences(sketch, result, "SI", undefined, stability);
    expect(s.first).toBe("tips");
    expect(s.headline).toMatch(/^Tips about the right pad before it slides — the left pad would have to pull 309\.7 N; sliding, it must resist 400 N and can give 294\.2 N \(needs μ = 0\.408 as a whole, has 0\.3\)$/);
    expect(s.details[0]).toBe(
      "It tips before it slides: overturning factor 0.613 < sliding factor 0.735 (the smaller factor is reached first if the loads that drive it grow in proportion while its weight stays as it is).",
    );
  });

  it("slides first when the sliding factor is the smaller (μ = 0.2, P = 400 N): the slide leads the headline", () => {
    // sliding 0.2 × 980.7 / 400 = 196.1 / 400 = 0.490; overturning 0.613 as above. The left pad's
    // pull, moments about the right pad: n·1 m = W·0.5 m − P·2 m = 490.3 − 800 → n = −309.7 N
    expect(((0.2 * W) / 400).toPrecision(3)).toBe("0.490");
    const { sketch, result, stability } = solved(tallBlock("400 N", 0.2));
    expect(result.bodies.b1.status).toBe("tips");
    const [s] = statusSentences(sketch, result, "SI", undefined, stability);
    expect(s.first).toBe("slides");
    expect(s.headline).toMatch(/^Slides before it tips about the right pad — sliding, it must resist 400 N and can give 196\.1 N \(needs μ = 0\.408 as a whole, has 0\.2\); the left pad would have to pull 309\.7 N$/);
    expect(s.details[0]).toBe(
      "It slides before it tips: sliding factor 0.49 < overturning factor 0.613 (the smaller factor is reached first if the loads that drive it grow in proportion while its weight stays as it is).",
    );
  });

  it("without the factors of safety (a caller that has none) the headline names both and puts neither first", () => {
    const { sketch, result } = solved(tallBlock("400 N", 0.2));
    const [s] = statusSentences(sketch, result);
    expect(s.headline).toMatch(/^Tips about the right pad and slides — /);
    expect(s.first).toBeUndefined();
  });

  it("factors equal to three figures are written with the digits that tell them apart, equal ones give no order", () => {
    const o = { factor: 0.61294, about: "s2" } as never;
    expect(tipSlideOrder(o, { factor: 0.61312, wholeBody: true } as never)?.text).toMatch(/^It tips before it slides: overturning factor 0\.6129 < sliding factor 0\.6131 /);
    expect(tipSlideOrder(o, { factor: 0.61294, wholeBody: true } as never)).toBeNull();
    // a body whose sliding is not taken as a whole, or a factor of 1 or more: no order said
    expect(tipSlideOrder(o, { factor: 0.5, wholeBody: false } as never)).toBeNull();
    expect(tipSlideOrder({ factor: 1.2 } as never, { factor: 0.5, wholeBody: true } as never)).toBeNull();
  });

  it("on screen: the badge puts the first first, the line under the headline and the hand check's factors say which and why", async () => {
    const user = userEvent.setup();
    mountResultsDock(tallBlock("400 N", 0.2));
    expect(await screen.findByTestId("status-badge")).toHaveTextContent(/^Slides, tips$/);
    expect(screen.getByTestId("status-sentence")).toHaveTextContent(/Slides before it tips about the right pad —/);
    expect(screen.getByTestId("which-first")).toHaveTextContent(/^It slides before it tips: sliding factor 0\.49 < overturning factor 0\.613 \(/);
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    const check = await screen.findByTestId("hand-stability");
    // taken as a whole each contact's μ·n counts with its sign, so the column adds up to μ·Σn = μ·W
    // = 0.2 × 980.7 N = 196.1 N: the left pad (n = −309.7 N, pulling) −61.93 N, the right pad
    // (n = W + 309.7 = 1290 N) 258.1 N; −61.93 + 258.1 = 196.1
    const lines = within(check).getAllByTestId("friction-line");
    expect(lines[0]).toHaveTextContent("the left pad0.2 × −0.3097 kN = −0.06193 kN0.2000 kN");
    expect(lines[1]).toHaveTextContent("the right pad0.2 × 1.290 kN = 0.2581 kN0.2000 kN");
    expect(within(check).getByTestId("available-sum")).toHaveTextContent(/^0\.1961 kN$/);
    expect(within(check).getByTestId("hand-which-first")).toHaveTextContent(/^It slides before it tips: sliding factor 0\.49 < overturning factor 0\.613 \(the smaller factor is reached first if the loads that drive it grow in proportion while its weight stays as it is\)\.$/);
  });

  it("on screen, tipping first: the badge stays “Tips, slides”", async () => {
    mountResultsDock(tallBlock("400 N", 0.3));
    expect(await screen.findByTestId("status-badge")).toHaveTextContent(/^Tips, slides$/);
    expect(screen.getByTestId("which-first")).toHaveTextContent(/^It tips before it slides: overturning factor 0\.613 < sliding factor 0\.735/);
  });
});
