// The home page's free-body diagram is a worked example, so its numbers must balance where they
// are drawn: ΣFy and ΣM about a foot (rigid-body equilibrium, common practice; any statics text),
// to the three figures the labels carry.
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { HeroDiagram } from "@/components/site/HeroDiagram";

/** The number before "kN" or "N" in the wide layout's label that starts with `name`, in newtons. */
function labelled(svg: HTMLElement, name: string): number {
  const text = [...svg.querySelectorAll("text")].map((t) => t.textContent ?? "").find((t) => t.startsWith(name));
  const m = text?.match(/=\s*([\d.]+)\s*(kN|N)\b/);
  if (!m) throw new Error(`no label ${name}`);
  return Number(m[1]) * (m[2] === "kN" ? 1000 : 1);
}

describe("the home page's diagram", () => {
  it("draws the weight where the labelled reactions put it", () => {
    render(<HeroDiagram />);
    const svg = screen.getByTestId("hero-diagram-wide");
    const [r1, r2, w, jet] = ["R₁", "R₂", "W", "ṁV"].map((n) => labelled(svg, n));
    // vertical forces: R₁ + R₂ = W + ṁV (the upward jet pushes the body down)
    expect(r1 + r2).toBeCloseTo(w + jet, -1);
    const feet = [...svg.querySelectorAll("[data-testid=hero-reaction]")].map((g) => Number(g.getAttribute("data-x")));
    const cg = Number(svg.querySelector("[data-testid=hero-cg]")!.getAttribute("transform")!.match(/translate\(([\d.]+)/)![1]);
    const outlet = Number(svg.querySelector("[data-testid=hero-outlet]")!.getAttribute("d")!.match(/^M([\d.]+)/)![1]);
    expect(feet).toHaveLength(2);
    // moments about the left foot: R₂·(x₂ − x₁) = W·(x_cg − x₁) + ṁV·(x_outlet − x₁); the labels
    // carry three figures (±0.005 kN each), so the centre of gravity may be off by that much only
    const span = feet[1] - feet[0];
    const cgFromLabels = feet[0] + (r2 * span - jet * (outlet - feet[0])) / w;
    const slack = (5 * span) / w + 1; // a 5 N rounding of R₂, and a unit of drawing
    expect(Math.abs(cg - cgFromLabels)).toBeLessThanOrEqual(slack);
  });
});
