// A saved sweep as the calc sheet's charts: solved on the sweep's own case (its overrides and
// factors), one chart per unit (forces, moments, ratios) so a moment is never drawn on a force
// axis, and the crossings of its margins found by the limit finder.
import { sketchForCase } from "@/canvas/studies/run";
import { displayKind, displayUnit, marksZero, toDisplay } from "@/canvas/studies/display";
import { findLimit } from "@/solver/limit";
import { describeQuantity, readQuantity, type QuantitySpec } from "@/solver/quantity";
import type { SketchFile, SweepFile } from "@/solver/schema";
import { linspace, solveSweep } from "@/solver/sweep";
import { formatNumber, type UnitSystem } from "@/solver/units";
import type { ChartSpec } from "./chart";

/** At most this many points are solved for a printed chart. */
const MAX_POINTS = 400;

const KIND_WORDS = { force: "forces", moment: "moments", ratio: "ratios" } as const;

export function sweepCharts(file: SketchFile, sw: SweepFile, units: UnitSystem, supports: string[]): { charts: ChartSpec[]; markers: Array<{ x: number; label: string }> } {
  const sketch = sketchForCase(file, sw.case);
  const res = solveSweep(sketch, sw.parameter, linspace(sw.from, sw.to, Math.min(sw.points, MAX_POINTS)));
  const quantities: QuantitySpec[] = sw.quantities?.length ? sw.quantities : supports.map((s) => ({ support: s, component: "resultant" as const }));
  const markers = quantities.filter((q) => marksZero(q.component)).flatMap((q) => {
    const lim = findLimit(sketch, sw.parameter, [sw.from, sw.to], q);
    return lim.found ? [{ x: lim.value, label: `${q.support} at ${formatNumber(lim.value, 4)} ${lim.unit}` }] : [];
  });
  const kinds = [...new Set(quantities.map((q) => displayKind(q.component)))];
  const charts = kinds.map((kind): ChartSpec => {
    const mine = quantities.filter((q) => displayKind(q.component) === kind);
    return {
      title: `${sw.parameter} from ${sw.from} to ${sw.to} ${res.unit}${kinds.length > 1 ? ` — ${KIND_WORDS[kind]}` : ""}`,
      xLabel: `${sw.parameter}${res.unit ? ` (${res.unit})` : ""}`,
      yLabel: displayUnit(mine[0].component, units) || "ratio",
      series: mine.map((q) => ({
        label: describeQuantity(q),
        markZero: marksZero(q.component),
        points: res.points.map((p) => [p.value, p.ok ? toDisplay(readQuantity(p.result, q), q.component, units) : null] as [number, number | null]),
      })),
      markers,
    };
  });
  return { charts, markers };
}
