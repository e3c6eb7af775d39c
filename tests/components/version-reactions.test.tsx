// A version's page states its reactions in one unit a table, and its factors of safety as drawn: a
// checker reads there what the calc sheet and the sign-off findings say.
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { VersionReactions } from "@/components/review/VersionReview";
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
    const cart = washingCart as unknown as SketchFile;
    render(<VersionReactions document={cart} units="SI" />);
    expect(screen.getByTestId("version-reactions")).toBeInTheDocument();
    const section = screen.getByRole("region", { name: "Factors of safety" });
    expect(within(section).getByRole("heading", { name: "Factors of safety as drawn" })).toBeInTheDocument();
    // the values on the drawing, not a case's: the file solved with its cases taken away
    const parsed = parseSketch(cart);
    if (!parsed.ok) throw new Error("the cart parses");
    const drawn = solveCases({ ...parsed.file, cases: undefined, combinations: undefined }).runs[0];
    const ot = drawn.ok ? drawn.stability[cart.bodies[0].id].overturning : null;
    if (!ot || "notApplicable" in ot) throw new Error("the cart as drawn has an overturning check");
    const s = cells(within(section).getByTestId("stability"));
    const row = s.rows.find((r) => r[s.col(/^Against/)] === "overturning")!;
    expect(num(row[s.col(/^Factor/)])).toBeCloseTo(ot.factor, 3);
    expect(s.col(/^Case/)).toBe(-1);
  });
});
