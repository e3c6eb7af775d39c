// A version's page plots the sweeps it keeps for the calc sheet, on their case or combination,
// with where each margin reaches zero — the limit finder's value, checked here against the hand
// calculation of the exhaust-stack example (tests/unit/studies/exhaust-stack-example.test.ts).
// It is worked out off the page's thread (here a turn of the event loop later, as a worker answers):
// a designed waiting state first, then the charts, then the tables of limits.
import { render, screen, waitFor, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { VersionSweeps } from "@/components/review/VersionSweeps";
import type { SketchFile } from "@/solver/schema";
import { formatLimit } from "@/solver/limit";
import { runLimit } from "@/canvas/studies/run";
import { sweepLimitTable } from "@/lib/calcsheet/sweeps";
import { ReportTable } from "@/components/studies/ReportTable";

/** Every kept sweep's chart and table are on the page. */
async function settled() {
  await waitFor(() => expect(screen.queryByTestId("version-sweeps-progress")).toBeNull(), { timeout: 20000 });
}

const g = 9.80665; // standard gravity, m/s² (CGPM 1901)
// the example's numbers: 900 kg, restoring arm 1.4 m, wind q·Cd·D = ½·1.25·v²·0.7·0.6 N/m over 8 m at 4.7 m
const vLift = Math.sqrt((900 * g * 1.4) / (0.5 * 1.25 * 0.7 * 0.6 * 8 * 4.7));

// each test works out real sweeps and every limit in every case: more than vitest's 5 s on a busy machine
describe("a version's kept sweeps", { timeout: 30000 }, () => {
  it("plots each on its case or combination, with the crossing the limit finder gives", async () => {
    const doc = structuredClone(exampleById("exhaust-stack")!.sketch) as unknown as SketchFile;
    doc.sweeps = [...doc.sweeps!, { id: "factored", parameter: "v", from: 20, to: 45, points: 26, combination: "uplift", quantities: [{ support: "upwind", component: "margin" }] }];
    render(<VersionSweeps document={doc} units="SI" />);
    await settled();
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
    expect(within(figures[0]).getByTestId("sweep-limits-summary").textContent).toMatch(/^Governs over 20 … 45 m\/s: upwind edge: slip \(μ·n − \|t\| = 0\) in Uplift check: 0\.9 × weight \+ 1\.5 × wind at v = \d+\.\d+ m\/s\.( |$)/);
  });

  it("shows where each chart will come, with what is being worked out, then the same table as the calc sheet's", async () => {
    const doc = structuredClone(exampleById("exhaust-stack")!.sketch) as unknown as SketchFile;
    render(<VersionSweeps document={doc} units="SI" />);
    // the first render works nothing out: the chart's place, busy, and what is being done
    const section = screen.getByTestId("version-sweeps");
    expect(section).toHaveAttribute("aria-busy", "true");
    expect(within(section).getByTestId("sweep-plot-waiting").textContent).toBe("Plotting…");
    expect(within(section).getByRole("progressbar", { name: "Sweep progress" })).toBeTruthy();
    expect(within(section).getByRole("status").textContent).toBe("Plotting the sweep of v from 20 to 45 m/s on case Engine stopped, 30 m/s wind — step 1 of 2. The page stays usable meanwhile.");
    expect(within(section).getByRole("button", { name: "Stop" })).toBeTruthy();
    expect(screen.queryByTestId("sweep-chart")).toBeNull();
    expect(screen.queryByTestId("sweep-limits")).toBeNull();
    await settled();
    expect(section).toHaveAttribute("aria-busy", "false");
    // the table and summary are the calc sheet's own (lib/calcsheet/sweeps.ts), cell for cell
    const direct = sweepLimitTable(doc, doc.sweeps![0]);
    const shown = within(section).getByTestId("sweep-limits");
    const { container } = render(<ReportTable table={direct.table} fileName="direct" testId="direct-limits" />);
    const rows = (t: HTMLElement) => within(t).getAllByRole("row").map((r) => r.textContent);
    expect(rows(shown)).toEqual(rows(within(container).getByTestId("direct-limits")));
    expect(rows(shown).length).toBe(direct.table.rows.length + 1);
    expect(within(section).getByTestId("sweep-limits-summary").textContent).toBe(direct.summary);
  });

  it("says where a plotted contact is off the ground, where the cart tips, and that its friction margin is left out, as the Sweep tab and the calc sheet do", async () => {
    // the washing cart's kept sweep: the lance raised from −90° to 0°; the front caster lifts at
    // about −59° and the cart tips back onto its braked rear wheels (the example's notes)
    const doc = structuredClone(exampleById("washing-cart")!.sketch) as unknown as SketchFile;
    render(<VersionSweeps document={doc} units="SI" />);
    await settled();
    expect(screen.getAllByTestId("sweep-state").map((li) => li.textContent)).toEqual([
      "front caster is off the ground from theta = −59 to 0 deg.",
      // the body's own state over the same stretch, as the calc sheet's limits table words it
      "Washing cart tips about rear wheels (braked) from theta = −59 to 0 deg: no set of its contacts and ties holds it.",
      "The friction margin at rear wheels (braked) is not plotted from theta = −59 to 0 deg, where Washing cart tips: a body that is not held has no friction margin (its reactions are only what would hold it).",
    ]);
  });

  it("says when a kept sweep cannot run, naming the sweep, and shows nothing for a version without sweeps", async () => {
    const doc = structuredClone(exampleById("exhaust-stack")!.sketch) as unknown as SketchFile;
    doc.sweeps = [{ id: "s", parameter: "v", from: 20, to: 45, points: 11, case: "gone" }];
    const { unmount } = render(<VersionSweeps document={doc} units="SI" />);
    expect((await screen.findByRole("alert")).textContent).toBe('The sweep of v from 20 to 45 m/s on case gone could not be run: case: there is no case "gone" (cases: running, stopped, storm, weight, wind-30)');
    unmount();
    // a case whose own change does not read: said in the form's words, as the Sweep tab says it, not by field path
    const bad = structuredClone(exampleById("exhaust-stack")!.sketch) as unknown as SketchFile;
    bad.cases!.find((c) => c.id === "stopped")!.parameters = { v: "30 m/s", p_duct: "2 kg" };
    const second = render(<VersionSweeps document={bad} units="SI" />);
    expect((await screen.findByRole("alert")).textContent).toBe(
      "The sweep of v from 20 to 45 m/s on case Engine stopped, 30 m/s wind could not be run: the sketch has 2 input errors, the first: Case Engine stopped, 30 m/s wind — change of p_duct: is a mass, but the sketch gives p_duct in kPa, a pressure.",
    );
    second.unmount();
    const none = { ...doc, sweeps: undefined };
    render(<VersionSweeps document={none} units="SI" />);
    expect(screen.queryByTestId("version-sweeps")).toBeNull();
  });
});
