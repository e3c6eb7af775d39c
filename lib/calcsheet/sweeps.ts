// A saved sweep as the calc sheet's charts: solved on the sweep's own case (its overrides and
// factors) or combination (its factored load set), one chart per unit (forces, moments, ratios) so
// a moment is never drawn on a force axis, and the crossings of its margins found by the limit
// finder (which a version's page lists under its own plot too).
import { displayKind, displayUnit, largestByKind, marksZero, toDisplay } from "@/canvas/studies/display";
import { findLimitWith, limitPrecisionWords, limitTolerance, limitWithUnit } from "@/solver/limit";
import { describeQuantity, readQuantity, type QuantitySpec } from "@/solver/quantity";
import type { SketchFile, SweepFile } from "@/solver/schema";
import { elementNames } from "@/solver/cases";
import { linspace, sweepWith } from "@/solver/sweep";
import { firstReached, limitEverywhere, reachedAt, sweeperOn } from "@/solver/studySweep";
import { convert, formatNumber, prettyUnit, type UnitSystem } from "@/solver/units";
import type { ChartSpec } from "./chart";

/** At most this many points are solved for a printed chart (or one on a version's page). */
export const MAX_POINTS = 400;

const KIND_WORDS = { force: "forces", moment: "moments", ratio: "ratios" } as const;

/** What a margin reaching zero means, in the trade's words; a noun, since the sweep may cross
 *  either way (a contact lifts off, or comes back into bearing). */
function crossingEvent(q: QuantitySpec, kind: string | undefined): { noun: string; why: string } {
  if (q.component === "frictionMargin") return { noun: "slip", why: "μ·n − |t| reaches zero: the friction is used up" };
  if (kind === "tie") return { noun: "slack", why: "its tension reaches zero" };
  return { noun: "lift-off", why: "its normal force reaches zero" };
}

export interface SweepMarker {
  x: number;
  /** short, on the chart: "front jack: lift-off at 44.44 deg" (the support by its label) */
  label: string;
  /** the sentence under the chart, with how far the value is given: "… at theta = 44.44 deg (to 4 significant figures, found to within ±8e-8 deg)" */
  words: string;
}

/** What a kept sweep plots: its own quantities, or each support's resultant. */
export const sweepQuantities = (sw: SweepFile, supports: string[]): QuantitySpec[] =>
  sw.quantities?.length ? sw.quantities : supports.map((s) => ({ support: s, component: "resultant" as const }));

/** Where each plotted margin of a kept sweep reaches zero, found by the limit finder, in words. */
export function sweepMarkers(file: SketchFile, sw: SweepFile, quantities: QuantitySpec[]): SweepMarker[] {
  const names = elementNames(file);
  return quantities.filter((q) => marksZero(q.component)).flatMap((q) => {
    const lim = findLimitWith(sweeperOn(file, { case: sw.case, combination: sw.combination }, sw.parameter), [sw.from, sw.to], q);
    if (!lim.found) return [];
    // a found limit is written by one rule wherever it is shown (solver/limit.ts)
    const at = limitWithUnit(lim.value, lim.unit);
    const event = crossingEvent(q, file.supports.find((s) => s.id === q.support)?.kind);
    const name = names[q.support] ?? q.support;
    const precision = limitPrecisionWords(lim.tolerance ?? limitTolerance([sw.from, sw.to]), lim.unit);
    return [{ x: lim.value, label: `${name}: ${event.noun} at ${at}`, words: `${name}: ${event.noun} (${event.why}) at ${sw.parameter} = ${at} (${precision})` }];
  });
}

/**
 * The same crossings searched in every case and combination of the study (when it has more than
 * one run): one line a plotted margin, each run's value and the run where it comes first.
 */
export function sweepEverywhere(file: SketchFile, sw: SweepFile, quantities: QuantitySpec[]): string[] {
  const runs = (file.cases ?? []).filter((c) => !c.onlyInCombinations).length + (file.combinations ?? []).length;
  if (runs < 2) return [];
  const names = elementNames(file);
  return quantities.filter((q) => marksZero(q.component)).flatMap((q) => {
    const all = limitEverywhere(file, sw.parameter, [sw.from, sw.to], q);
    const event = crossingEvent(q, file.supports.find((s) => s.id === q.support)?.kind);
    const first = firstReached(all, sw.from, sw.to);
    // a margin that reaches zero in no run says nothing here
    if (!first) return [];
    // "(first)" only where it comes first: not when every run reaches it at the same value
    const at = all.map((r) => ("error" in r.result || !r.result.found ? null : (reachedAt(r.result, sw.from, sw.to) ?? null)));
    const firstAt = at[all.indexOf(first.row)] ?? null;
    const tie = firstAt !== null && at.every((v) => v !== null && Math.abs(v - firstAt) <= 1e-9 * Math.max(1, Math.abs(firstAt)));
    const each = all.map((r, i) => {
      const f = r.result;
      // the run's name, a dash, then what it comes to: names hold commas and colons of their own
      if ("error" in f) return `${r.name} — not solved`;
      if (!f.found || at[i] === null) return `${r.name} — none in the range`;
      return `${r.name} — ${limitWithUnit(at[i], f.unit)}${r === first.row && !tie ? " (first)" : ""}`;
    });
    // every run is searched over the sweep's range, so to one tolerance
    const found = first.row.result;
    const unit = "unit" in found ? found.unit : "";
    const tolerance = ("found" in found && found.found && found.tolerance) || limitTolerance([sw.from, sw.to]);
    return [`${names[q.support] ?? q.support} ${event.noun} in each case and combination: ${each.join("; ")}; each ${limitPrecisionWords(tolerance, unit)}`];
  });
}

/**
 * The charts of a kept sweep. `family`: the force and moment units of the sheet the charts are
 * printed on, so a chart reads in the units of its tables; absent, each chart takes N (N·m) when
 * everything plotted stays below 1 kN (1 kN·m), as a table does.
 */
export function sweepCharts(
  file: SketchFile,
  sw: SweepFile,
  units: UnitSystem,
  supports: string[],
  family?: { force: string; moment: string },
): { charts: ChartSpec[]; markers: SweepMarker[] } {
  const res = sweepWith(sweeperOn(file, { case: sw.case, combination: sw.combination }, sw.parameter), linspace(sw.from, sw.to, Math.min(sw.points, MAX_POINTS)));
  const quantities = sweepQuantities(sw, supports);
  const markers = sweepMarkers(file, sw, quantities);
  const names = elementNames(file);
  const kinds = [...new Set(quantities.map((q) => displayKind(q.component)))];
  const charts = kinds.map((kind): ChartSpec => {
    const mine = quantities.filter((q) => displayKind(q.component) === kind);
    // one unit per chart: N (N·m) when everything plotted stays below 1 kN (1 kN·m)
    const largest = largestByKind(
      mine.map((q) => q.component),
      mine.map((q) => res.points.map((p) => (p.ok ? readQuantity(p.result, q) : null))),
    )[kind];
    // the sheet's unit for a force or a moment; a ratio has none
    const unit = family && kind !== "ratio" ? family[kind] : displayUnit(mine[0].component, units, largest);
    const shown = (si: number, q: QuantitySpec) => (family && kind !== "ratio" ? convert(si, kind, units, unit).value : toDisplay(si, q.component, units, largest));
    return {
      title: `${sw.parameter} from ${formatNumber(sw.from, 6)} to ${formatNumber(sw.to, 6)} ${prettyUnit(res.unit)}${kinds.length > 1 ? ` — ${KIND_WORDS[kind]}` : ""}`,
      xLabel: `${sw.parameter}${res.unit ? ` (${prettyUnit(res.unit)})` : ""}`,
      yLabel: unit || "ratio",
      series: mine.map((q) => ({
        label: describeQuantity(q, names),
        markZero: marksZero(q.component),
        points: res.points.map((p) => [p.value, p.ok ? shown(readQuantity(p.result, q), q) : null] as [number, number | null]),
      })),
      markers,
    };
  });
  return { charts, markers };
}
