// A version's page plots the sweeps it keeps for the calc sheet, on their case or combination,
// with where each margin reaches zero — the limit finder's value, checked here against the hand
// calculation of the exhaust-stack example (tests/unit/studies/exhaust-stack-example.test.ts).
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { VersionSweeps } from "@/components/review/VersionSweeps";
import type { SketchFile } from "@/solver/schema";
import { formatLimit } from "@/solver/limit";
import { runLimit } from "@/canvas/studies/run";

const g = 9.80665; // standard gravity, m/s² (CGPM 1901)
// the example's numbers: 900 kg, restoring arm 1.4 m, wind q·Cd·D = ½·1.25·v²·0.7·0.6 N/m over 8 m at 4.7 m
const vLift = Math.sqrt((900 * g * 1.4) / (0.5 * 1.25 * 0.7 * 0.6 * 8 * 4.7));

describe("a version's kept sweeps", () => {
  it("plots each on its case or combination, with the crossing the limit finder gives", () => {
    const doc = structuredClone(exampleById("exhaust-stack")!.sketch) as unknown as SketchFile;
    doc.sweeps = [...doc.sweeps!, { id: "factored", parameter: "v", from: 20, to: 45, points: 26, combination: "uplift", quantities: [{ support: "upwind", component: "margin" }] }];
    render(<VersionSweeps document={doc} units="SI" />);
    const figures = within(screen.getByTestId("version-sweeps")).getAllByRole("figure").filter((f) => f.hasAttribute("data-sweep"));
    expect(figures.map((f) => f.querySelector("figcaption")!.textContent)).toEqual([
      "v from 20 to 45 m/s — case Engine stopped, 30 m/s wind",
      "v from 20 to 45 m/s — combination Uplift check: 0.9 × weight + 1.5 × wind",
    ]);
    // a found limit to 4 significant figures; the search's tolerance (1e-9 of the 25 m/s range, ±3e-8
    // m/s) is far finer than the 0.01 m/s the figures show, so it is not printed as noise
    expect(figures[0].textContent).toContain(`Crossing: upwind edge: lift-off (its normal force reaches zero) at v = ${formatLimit(vLift)} m/s (to 4 significant figures).`);
    expect(screen.getByTestId("version-sweeps").textContent).not.toMatch(/±\d(\.\d+)?e-\d+/);
    // factored: 1.5 × the wind against 0.9 × the weight, v = v_lift·√(0.9 / 1.5) (statics, common practice)
    expect(figures[1].textContent).toContain(`Crossing: upwind edge: lift-off (its normal force reaches zero) at v = ${formatLimit(vLift * Math.sqrt(0.6))} m/s (to 4 significant figures).`);
    expect(within(figures[0]).getByTestId("sweep-chart")).toBeTruthy();
    // and in every case and combination, as the calc sheet's table: each run's first lift-off of the
    // upwind edge, the factored uplift check's first of them, v_lift·√(0.6) (statics, common practice)
    const running = runLimit(doc, { parameter: "v", from: 20, to: 45, caseId: "running", quantity: { support: "upwind", component: "margin" }, target: 0 });
    if (!running.found) throw new Error("expected a crossing");
    const limits = within(figures[0]).getByTestId("sweep-limits");
    const rows = within(limits).getAllByRole("row").map((r) => r.textContent ?? "");
    const row = (limit: string, run: string) => rows.find((r) => r.startsWith(limit) && r.includes(run)) ?? "";
    expect(row("upwind edge: lift-off", "Engine running")).toContain(formatLimit(running.value));
    expect(row("upwind edge: lift-off", "Engine stopped, 30 m/s wind (plotted)")).toContain(formatLimit(vLift));
    expect(row("upwind edge: lift-off", "Uplift check")).toMatch(new RegExp(`${formatLimit(vLift * Math.sqrt(0.6)).replace(".", "\\.")}.*first of this limit`));
    // the downwind edge stays down in every run: said, not left out
    expect(row("downwind edge: lift-off", "Engine running")).toContain("none in 20 … 45 m/s");
    expect(within(figures[0]).getByTestId("sweep-limits-summary").textContent).toMatch(/^Governs over 20 … 45 m\/s: upwind edge: slip \(μ·n − \|t\| = 0\) in Uplift check: 0\.9 × weight \+ 1\.5 × wind at v = \d+\.\d+ m\/s\.$/);
  });

  it("says where a plotted contact is off the ground and its friction margin is left out, as the Sweep tab and the calc sheet do", () => {
    // the washing cart's kept sweep: the lance raised from −90° to 0°; the front caster lifts at
    // about −59° and the cart tips back onto its braked rear wheels (the example's notes)
    const doc = structuredClone(exampleById("washing-cart")!.sketch) as unknown as SketchFile;
    render(<VersionSweeps document={doc} units="SI" />);
    expect(screen.getAllByTestId("sweep-state").map((li) => li.textContent)).toEqual([
      "front caster is off the ground from theta = −59 to 0 deg.",
      "The friction margin at rear wheels (braked) is not plotted from theta = −59 to 0 deg, where Washing cart tips: a body that is not held has no friction margin (its reactions are only what would hold it).",
    ]);
  });

  it("says when a kept sweep cannot run, and shows nothing for a version without sweeps", () => {
    const doc = structuredClone(exampleById("exhaust-stack")!.sketch) as unknown as SketchFile;
    doc.sweeps = [{ id: "s", parameter: "v", from: 20, to: 45, points: 11, case: "gone" }];
    const { unmount } = render(<VersionSweeps document={doc} units="SI" />);
    expect(screen.getByRole("alert").textContent).toBe('This sweep could not be run: case: there is no case "gone" (cases: running, stopped, storm, weight, wind-30)');
    unmount();
    const none = { ...doc, sweeps: undefined };
    render(<VersionSweeps document={none} units="SI" />);
    expect(screen.queryByTestId("version-sweeps")).toBeNull();
  });
});
