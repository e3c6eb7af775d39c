// A version's page states its reactions in one unit a table, and its factors of safety as drawn: a
// checker reads there what the calc sheet and the sign-off findings say. A case that is the sketch
// as drawn over again gives them once, under "<case name>, as drawn", as the calc sheet does.
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { VersionCases, VersionReactions } from "@/components/review/VersionReview";
import trailer from "@/canvas/examples/fire-monitor-trailer.json";
import washingCart from "@/canvas/examples/washing-cart.json";
import type { SketchFile } from "@/solver/schema";
import { parseSketch, solveCases } from "@/solver";

const doc = trailer as unknown as SketchFile;
const num = (s: string | null | undefined) => Number((s ?? "").replace("−", "-").replace(/[^\d.eE-]/g, ""));

function cells(table: HTMLElement) {
  const head = within(table).getAllByRole("columnheader").map((h) => h.textContent ?? "");
  const rows = within(table)
    .getAllByRole("row")
    .slice(1)
    .map((r) => [...r.querySelectorAll("th,td")].map((c) => c.textContent ?? ""));
  return { head, rows, col: (name: RegExp) => head.findIndex((h) => name.test(h)) };
}

describe("the reactions and factors of safety on a version's page", () => {
  it("writes each force column in one unit, named once in its heading", () => {
    render(<VersionReactions document={doc} units="SI" />);
    const { head, rows } = cells(screen.getByTestId("version-reactions"));
    expect(head.find((h) => h.startsWith("Fx"))).toMatch(/\((k?N)\)/);
    // no cell repeats a unit: 797.3 N and 11.50 kN never sit in one table
    for (const r of rows) for (const c of r.slice(1)) expect(c).not.toMatch(/\d\s*k?N\b/);
    expect(rows.map((r) => r[0])).toEqual(["rear stabiliser foot", "axle (both wheels)", "front jack (on a skid plate)"]);
  });

  it.each([
    ["1250 gpm", "passes"],
    ["2000 gpm", "fails"],
  ])("shows the sliding check of a sketch without cases, with its verdict: at %s it %s", (flow, verdict) => {
    const gpm = Number(flow.split(" ")[0]);
    render(<VersionReactions document={{ ...doc, parameters: { ...doc.parameters, Q: flow } }} units="SI" />);
    const r = cells(screen.getByTestId("version-reactions"));
    const inN = r.head[r.col(/^Fx/)].includes("(kN)") ? 1000 : 1;
    const n = r.rows.map((row) => num(row[r.col(/^Normal/)]) * inN);
    const t = r.rows.map((row) => num(row[r.col(/^Tangential/)]) * inN);
    // horizontally only the jet acts: Σt balances ṁ·V·cos θ (momentum, textbook); US gpm of
    // water (998 kg/m³) through a 1.75 in tip at 32°: Q = 1250 × 3.785411784 L / 60 s (NIST gallon)
    const Q = (gpm * 3.785411784e-3) / 60;
    const A = (Math.PI / 4) * (1.75 * 0.0254) ** 2;
    const thrust = 998 * Q * (Q / A) * Math.cos((32 * Math.PI) / 180);
    expect(Math.abs(t.reduce((a, b) => a + b, 0))).toBeCloseTo(thrust, -1);
    // sliding factor: friction available over the force to resist, Σ μ·n / |Σ t| (common practice),
    // μ = 0.55 at the foot and the axle; the jack's skid plate gives none
    const factor = (0.55 * (n[0] + n[1])) / Math.abs(t.reduce((a, b) => a + b, 0));
    const section = screen.getByRole("region", { name: "Factors of safety" });
    const s = cells(within(section).getByTestId("stability"));
    const sliding = s.rows.find((row) => row[s.col(/^Against/)].startsWith("sliding"))!;
    expect(num(sliding[s.col(/^Factor/)])).toBeCloseTo(factor, 2);
    expect(sliding[s.col(/^Verdict/)]).toMatch(factor >= 1.5 ? /^pass$/ : /^FAIL\s*\(below 1\.5\)$/);
    expect(factor >= 1.5).toBe(verdict === "passes");
    expect(s.rows.some((row) => row[s.col(/^Against/)] === "overturning")).toBe(true);
  });

  it("with operating cases, still shows the factors of the sketch as drawn (the cases' tables carry theirs)", () => {
    // the trailer drawn at 15°, its cases at 30° and 60°: no case is the drawing
    const trailerWithCases = {
      ...doc,
      cases: [
        { id: "mid", name: "Mid throw", parameters: { theta: "30 deg" } },
        { id: "high", name: "High throw", parameters: { theta: "60 deg" } },
      ],
    } as SketchFile;
    render(<VersionReactions document={trailerWithCases} units="SI" />);
    expect(screen.getByTestId("version-reactions")).toBeInTheDocument();
    const section = screen.getByRole("region", { name: "Factors of safety" });
    expect(within(section).getByRole("heading", { name: "Factors of safety as drawn" })).toBeInTheDocument();
    // the values on the drawing, not a case's: the file solved with its cases taken away
    const parsed = parseSketch(trailerWithCases);
    if (!parsed.ok) throw new Error("the trailer parses");
    const drawn = solveCases({ ...parsed.file, cases: undefined, combinations: undefined }).runs[0];
    const ot = drawn.ok ? drawn.stability[doc.bodies[0].id].overturning : null;
    if (!ot || "notApplicable" in ot) throw new Error("the trailer as drawn has an overturning check");
    const s = cells(within(section).getByTestId("stability"));
    const row = s.rows.find((r) => r[s.col(/^Against/)] === "overturning")!;
    expect(num(row[s.col(/^Factor/)])).toBeCloseTo(ot.factor, 3);
    expect(s.col(/^Case/)).toBe(-1);
    expect(screen.queryByTestId("version-stability-twin")).toBeNull();
  });

  it("says the factors as drawn once when a case is the sketch as drawn: under that case, “…, as drawn”", () => {
    // the washing cart draws its lance aimed down at −75°, which its first case restates
    const cart = washingCart as unknown as SketchFile;
    const twin = "Lance aimed down at −75° (tank foot)";
    render(
      <>
        <VersionReactions document={cart} units="SI" />
        <VersionCases document={cart} units="SI" />
      </>,
    );
    // no separate group for the drawing: the page points to the case instead
    expect(screen.queryByRole("heading", { name: "Factors of safety as drawn" })).toBeNull();
    expect(screen.queryByTestId("version-stability")).toBeNull();
    expect(screen.getByTestId("version-stability-twin").textContent).toBe(
      `Factors of safety as drawn: the case ${twin} is the sketch as drawn, so they are given once, under “${twin}, as drawn” in the operating cases below.`,
    );
    // the cases' factors of safety: that case's group says it is the drawing; no "As drawn" group
    const stability = within(screen.getByRole("region", { name: "Operating cases" })).getByTestId("stability");
    const groups = [...stability.querySelectorAll("[data-group-label]")].map((g) => g.getAttribute("data-group-label"));
    expect(groups).toContain(`${twin}, as drawn — Washing cart`);
    expect(groups.filter((g) => g?.startsWith(twin))).toHaveLength(1);
    expect(groups.some((g) => g?.startsWith("As drawn"))).toBe(false);
    // its overturning factor is the drawing's: the file solved with its cases taken away (1.311,
    // below the required 1.5, as the calc sheet says it)
    const parsed = parseSketch(cart);
    if (!parsed.ok) throw new Error("the cart parses");
    const drawn = solveCases({ ...parsed.file, cases: undefined, combinations: undefined }).runs[0];
    const ot = drawn.ok ? drawn.stability[cart.bodies[0].id].overturning : null;
    if (!ot || "notApplicable" in ot) throw new Error("the cart as drawn has an overturning check");
    expect(ot.factor.toPrecision(4)).toBe("1.311");
    // the reaction tables keep the case's own name
    expect(within(screen.getByTestId("case-reactions")).getAllByRole("rowheader").map((h) => h.textContent)).toContain(twin);
  });
});
