// A version's kept sweeps plot their forces in the one unit the rest of its page (and its calc
// sheet) writes them in, `unitFamily(units, versionScaleOf(doc))`, not in a unit picked from the
// sweep's own values: a checker reading 0.3 on the chart reads it against the reactions' kN.
import { cloneElement, isValidElement, type ReactElement, type ReactNode } from "react";
import { render, screen, waitFor, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { VersionSweeps } from "@/components/review/VersionSweeps";
import { versionScaleOf } from "@/components/review/versionScale";
import { largestByKind } from "@/canvas/studies/display";
import { runSweep } from "@/canvas/studies/run";
import { columnUnit, unitFamily } from "@/solver/report";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import { twoReactions } from "../fixtures/one-unit";

// jsdom lays nothing out, so a ResponsiveContainer measures 0 × 0 and draws no chart: give the
// chart a size of its own, as a browser would
vi.mock("recharts", async (importOriginal) => {
  const actual = await importOriginal<typeof import("recharts")>();
  return {
    ...actual,
    ResponsiveContainer: ({ children }: { children: ReactNode }) => (isValidElement(children) ? cloneElement(children as ReactElement<{ width: number; height: number }>, { width: 640, height: 224 }) : null),
  };
});

/** The beam of `twoReactions` with the small load over the pad a parameter P, and a kept sweep of P
 *  from 0 to 500 N plotting the pad's normal force (it carries the load over it: statics, common
 *  practice), so every plotted value is below 1 kN while the pin carries `big`. */
function beamSweepingP(big: string): SketchFile {
  return {
    ...twoReactions,
    parameters: { P: "200 N" },
    loads: twoReactions.loads.map((l) => ({ ...l, magnitude: l.id === "big" ? big : "P" })),
    sweeps: [{ id: "pad-load", parameter: "P", from: 0, to: 500, points: 6, quantities: [{ support: "pad", component: "n" }] }],
  } as SketchFile;
}

describe("a version's kept sweep plots in the page's unit", { timeout: 30000 }, () => {
  it.each([
    // the pin carries 5 kN: the page reads in kN, the sweep alone (pad ≤ 500 N) would read in N
    ["SI, reactions in kN", "5 kN", "SI" as const, "kN", "N"],
    // the pin carries 50 kN = 11.2 kip (1 lbf = 4.448 222 N, NIST SP 811): the page reads in kip,
    // the sweep alone (pad ≤ 500 N = 112 lbf) would read in lbf
    ["US, reactions in kip", "50 kN", "US" as const, "kip", "lbf"],
  ])("%s: the chart's force axis and its values are in the page's unit", async (_what, big, units: UnitSystem, force, alone) => {
    const doc = beamSweepingP(big);
    expect(unitFamily(units, versionScaleOf(doc)!).force).toBe(force);
    // what the chart picked from the sweep's own values before
    const data = runSweep(doc, { parameter: "P", from: 0, to: 500, points: 6, quantities: [{ support: "pad", component: "n" }] });
    expect(columnUnit("force", units, largestByKind(["n"], data.series).force)).toBe(alone);
    render(<VersionSweeps document={doc} units={units} />);
    await waitFor(() => expect(screen.queryByTestId("version-sweeps-progress")).toBeNull(), { timeout: 20000 });
    const chart = within(screen.getByTestId("version-sweeps")).getByTestId("sweep-chart");
    // the force axis's title (the parameter's is "P (N)"), and its top tick: 500 N on the pad =
    // 0.5 kN, or 112.4 lbf = 0.1124 kip
    const words = [...chart.querySelectorAll("text")].map((t) => t.textContent ?? "");
    expect(words).toContain(force);
    expect(words).not.toContain(alone);
    const ticks = [...chart.querySelectorAll(".recharts-yAxis-tick-labels text")].map((t) => Number(t.textContent)).filter((v) => Number.isFinite(v));
    expect(ticks.length).toBeGreaterThan(1);
    const top = force === "kN" ? 0.5 : 500 / 4448.2216152605;
    expect(Math.max(...ticks)).toBeGreaterThanOrEqual(top * 0.999);
    expect(Math.max(...ticks)).toBeLessThan(top * 2);
  });
});
