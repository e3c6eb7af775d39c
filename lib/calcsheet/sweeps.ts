// A saved sweep as the calc sheet's charts: solved on the sweep's own case (its overrides and
// factors) or combination (its factored load set), one chart per unit (forces, moments, ratios) so
// a moment is never drawn on a force axis, and the crossings of its margins found by the limit
// finder (which a version's page lists under its own plot too). Each quantity is read as the
// Sweep tab reads it (`sweptQuantity`): a contact's friction margin is a gap where it is off the
// ground or its body is not held, and the sheet says where, in the tab's words.
import { displayKind, displayUnit, largestByKind, marksZero, parameterWords, sweepStateLines, toDisplay } from "@/canvas/studies/display";
import { runSweep } from "@/canvas/studies/run";
import { findLimitWith, limitPrecisionWords, limitTolerance, limitWithUnit } from "@/solver/limit";
import { describeQuantity, type QuantitySpec } from "@/solver/quantity";
import type { SketchFile, SweepFile } from "@/solver/schema";
import { elementNames } from "@/solver/cases";
import { firstReached, limitEverywhere, reachedAt, sweeperOn } from "@/solver/studySweep";
import { convert, formatNumber, prettyUnit, type UnitSystem } from "@/solver/units";
import type { ChartSpec } from "./chart";

/** At most this many points are solved for a printed chart (or one on a version's page). */
export const MAX_POINTS = 400;

const KIND_WORDS = { force: "forces", moment: "moments", ratio: "ratios" } as const;

/** What a margin reaching zero means, in the trade's words; a noun, since the sweep may cross
 *  either way (a contact lifts off, or comes back into bearing). */
function crossingEvent(q: QuantitySpec, kind: string | undefined): { noun: string; why: string; past: string } {
  if (q.component === "frictionMargin") return { noun: "slip", why: "μ·n − |t| reaches zero: the friction is used up", past: "slipping" };
  if (kind === "tie") return { noun: "slack", why: "its tension reaches zero", past: "slack" };
  return { noun: "lift-off", why: "its normal force reaches zero", past: "lifted" };
}

export interface SweepMarker {
  x: number;
  /** short, on the chart: "front jack: lift-off at 44.44 deg" (the support by its label) */
  label: string;
  /** the sentence under the chart, with how far the value is given: "… at theta = 44.44 deg (to 4
   *  significant figures)"; the search's tolerance only where it shows in the figures (`limitPrecisionWords`) */
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
    // the tolerance said only where it shows in the figure given, never as the search's noise ("±8e-8 deg")
    const precision = limitPrecisionWords(lim.tolerance ?? limitTolerance([sw.from, sw.to]), lim.unit, [lim.value]);
    return [{ x: lim.value, label: `${name}: ${event.noun} at ${at}`, words: `${name}: ${event.noun} (${event.why}) at ${parameterWords(sw.parameter)} = ${at} (${precision})` }];
  });
}

/**
 * The same crossings searched in every case and combination of the study (when it has more than
 * one run): one line a plotted margin, each run's value and the run where it comes first (every
 * run that gets there at the same value, named as a tie).
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
    // "(first)" where it comes first; every run that gets there at the same value is named, a tie
    // (as the Sweep tab's "In every case" says it); when every run does, that is said once
    const at = all.map((r) => ("error" in r.result || !r.result.found ? null : (reachedAt(r.result, sw.from, sw.to) ?? null)));
    const tie = first.tied.length > 1;
    const everyOne = tie && first.tied.length === all.length;
    const each = all.map((r, i) => {
      const f = r.result;
      // the run's name, a dash, then what it comes to: names hold commas and colons of their own
      if ("error" in f) return `${r.name} — not solved`;
      // a margin below zero over the whole range has no crossing, but is past it all along: never
      // said as "none", which reads as safe
      if (!f.found && f.max < 0) return `${r.name} — none in the range: ${event.past} throughout (its margin stays below zero)`;
      if (!f.found || at[i] === null) return `${r.name} — none in the range`;
      const mark = everyOne || !first.tied.includes(r) ? "" : tie ? " (first, a tie)" : " (first)";
      return `${r.name} — ${limitWithUnit(at[i], f.unit)}${mark}`;
    });
    if (everyOne) each.push("the same in every one (a tie)");
    // every run is searched over the sweep's range, so to one tolerance
    const found = first.row.result;
    const unit = "unit" in found ? found.unit : "";
    const tolerance = ("found" in found && found.found && found.tolerance) || limitTolerance([sw.from, sw.to]);
    // the tolerance said only where it shows in the figures given
    const reached = at.filter((x): x is number => x !== null);
    return [`${names[q.support] ?? q.support} ${event.noun} in each case and combination: ${each.join("; ")}; each ${limitPrecisionWords(tolerance, unit, reached)}`];
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
): { charts: ChartSpec[]; markers: SweepMarker[]; states: string[] } {
  const quantities = sweepQuantities(sw, supports);
  // solved as the Sweep tab solves it: each quantity as `sweptQuantity` reads it (NaN, a gap, where
  // a friction margin has no meaning), and where each plotted support is off its seat
  const data = runSweep(file, { parameter: sw.parameter, from: sw.from, to: sw.to, points: Math.min(sw.points, MAX_POINTS), caseId: sw.case, combinationId: sw.combination, quantities });
  const markers = sweepMarkers(file, sw, quantities);
  const names = elementNames(file);
  const states = sweepStateLines(data, names).map((l) => l.words);
  const kinds = [...new Set(quantities.map((q) => displayKind(q.component)))];
  const charts = kinds.map((kind): ChartSpec => {
    const mine = quantities.filter((q) => displayKind(q.component) === kind);
    const series = mine.map((q) => data.series[quantities.indexOf(q)]);
    // one unit per chart: N (N·m) when everything plotted stays below 1 kN (1 kN·m)
    const largest = largestByKind(
      mine.map((q) => q.component),
      series,
    )[kind];
    // the sheet's unit for a force or a moment; a ratio has none
    const unit = family && kind !== "ratio" ? family[kind] : displayUnit(mine[0].component, units, largest);
    const shown = (si: number, q: QuantitySpec) => (family && kind !== "ratio" ? convert(si, kind, units, unit).value : toDisplay(si, q.component, units, largest));
    return {
      title: `${parameterWords(sw.parameter)} from ${formatNumber(sw.from, 6)} to ${formatNumber(sw.to, 6)} ${prettyUnit(data.unit)}${kinds.length > 1 ? ` — ${KIND_WORDS[kind]}` : ""}`,
      xLabel: `${parameterWords(sw.parameter)}${data.unit ? ` (${prettyUnit(data.unit)})` : ""}`,
      yLabel: unit || "ratio",
      series: mine.map((q, k) => ({
        label: describeQuantity(q, names),
        markZero: marksZero(q.component),
        // a point that did not solve, or a quantity without meaning there: a gap in the line
        points: data.xs.map((x, i) => [x, Number.isFinite(series[k][i]) ? shown(series[k][i], q) : null] as [number, number | null]),
      })),
      markers,
    };
  });
  return { charts, markers, states };
}
