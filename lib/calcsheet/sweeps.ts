// A saved sweep as the calc sheet's charts: solved on the sweep's own case (its overrides and
// factors) or combination (its factored load set), one chart per unit (forces, moments, ratios) so
// a moment is never drawn on a force axis, and the crossings of its margins found by the limit
// finder (which a version's page lists under its own plot too). Each quantity is read as the
// Sweep tab reads it (`sweptQuantity`): a contact's friction margin is a gap where it is off the
// ground or its body is not held, and the sheet says where, in the tab's words.
import { displayKind, displayUnit, largestByKind, marksZero, parameterWords, sweepRangeWords, sweepStateLines, toDisplay } from "@/canvas/studies/display";
import { runSweep } from "@/canvas/studies/run";
import { findBodySlidingWith, findLimitWith, limitPrecisionWords, limitTolerance, limitWithUnit } from "@/solver/limit";
import { runNoLimitWords } from "@/solver/limitHint";
import { describeQuantity, type QuantitySpec } from "@/solver/quantity";
import type { SketchFile, SweepFile } from "@/solver/schema";
import { elementNames } from "@/solver/cases";
import { bodyLimits, findBodyLimitWith, firstReached, limitEverywhere, reachedAt, sweeperOn, type BodyLimitResult, type LimitEverywhere } from "@/solver/studySweep";
import type { Cell, Table } from "@/solver/report";
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
      title: `${sweepRangeWords(sw.parameter, sw.from, sw.to, data.unit)}${kinds.length > 1 ? ` — ${KIND_WORDS[kind]}` : ""}`,
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

/** "A", "A and B", "A, B and C" */
const andWords = (xs: string[]): string => (xs.length < 2 ? (xs[0] ?? "") : `${xs.slice(0, -1).join(", ")} and ${xs[xs.length - 1]}`);

/** One limit of a kept sweep searched in one run: where it is first reached, or why it is not. */
export interface SweepLimitRow {
  /** the run searched: a case, a combination, or the sketch as drawn */
  run: LimitEverywhere;
  /** the support whose margin it is, and what reaching zero means there */
  quantity: QuantitySpec;
  limit: string;
  /** what being past the limit is called ("lifted", "slack", "slipping") */
  past: string;
  /** where it is first reached going from the sweep's start, in the parameter's unit */
  value?: number;
  /** more crossings after the first, in the range */
  more: number;
  /** the margin stays below zero over the whole range: past the limit all along */
  pastThroughout: boolean;
  /** first of its limit among the runs (a tie: each) */
  first: boolean;
  /** first of every limit in every run: it governs the sweep's range (a tie: each) */
  governs: boolean;
  /** the body whose own limit it is (it tips, or slides as a whole); absent for a support's */
  body?: string;
  /** the note for a run that does not reach the limit, or is not solved, in the caller's words (the
   *  editor's "In every case" says which side of its target the quantity stays on); else the table's own */
  unreached?: string;
  /** a support's margin not reaching zero: where it came closest and which way it goes past each end
   *  ("closest 0.3807 kN at T = 1 kN; past 1 kN heading for 0 kN (…)"), as "In every case" says it */
  hint?: string;
}

/** A value of a quantity (SI) with its unit, as a run's hint in the limits table says it: in the
 *  sheet's units, N (N·m) below 1 kN (1 kN·m) as a table does. */
function hintShown(q: QuantitySpec, units: UnitSystem, largest: number) {
  const unit = displayUnit(q.component, units, largest);
  return (si: number) => `${formatNumber(toDisplay(si, q.component, units, largest), 4)}${unit ? ` ${unit}` : ""}`;
}

/**
 * Every limit a kept sweep can meet, searched in every run it covers: each one-sided support's
 * margin (a contact lifting off, a tie going slack, where the body may start to tip) and each
 * contact with a μ (friction used up), in the sweep's own run and in every case and combination
 * the editor's "In every case" searches — the same `limitEverywhere`, so the same numbers. A limit
 * never reached is a row too: a checker reads that it was searched and found nowhere in the range.
 *
 * Then each body's own limits, in the same runs: where it tips (no set of its one-sided reactions
 * holds it) and, on contacts and ties with a friction contact, where it slides as a whole (Σ μ·n −
 * |Σ t| of its bearing friction contacts reaches zero: the stability check's factor against
 * sliding reaching 1, the solve's `SLIP` on the body; `bodySlidingMargin` in solver/limit.ts). One
 * contact over its own μ slips alone while the others take its share, so a contact's slip may come
 * first and still leave the body held: the table marks the first limit of all, and the summary says
 * each body's own first limit beside it.
 */
export function sweepLimitRows(file: SketchFile, sw: SweepFile, onProgress?: (done: number, total: number) => void, units: UnitSystem = "SI"): { rows: SweepLimitRow[]; unit: string; tolerance: number } {
  const names = elementNames(file);
  const pName = parameterWords(sw.parameter);
  const limits: Array<{ q: QuantitySpec; limit: string; past: string }> = [];
  for (const s of file.supports) {
    if (s.kind !== "contact" && s.kind !== "tie") continue;
    const event = crossingEvent({ support: s.id, component: "margin" }, s.kind);
    limits.push({ q: { support: s.id, component: "margin" }, limit: `${names[s.id] ?? s.id}: ${event.noun} (${s.kind === "tie" ? "tension" : "n"} = 0)`, past: event.past });
  }
  for (const s of file.supports) {
    if (s.kind !== "contact" || s.mu === undefined) continue;
    limits.push({ q: { support: s.id, component: "frictionMargin" }, limit: `${names[s.id] ?? s.id}: slip (μ·n − |t| = 0)`, past: "slipping" });
  }
  // a body's own limits (`bodyLimits`, as the Sweep tab offers them): on contacts or ties it may tip,
  // where no set of its one-sided reactions holds it; on contacts and ties alone, one of them with a
  // μ, it may slide as a whole (a pin, a roller or a fixed support resists sliding)
  const ownLimits = bodyLimits(file);
  const tipping = ownLimits.filter((l) => l.limit === "tips").map(({ body }) => ({ body, limit: `${names[body] ?? body}: tips (not held)` }));
  const sliding = ownLimits.filter((l) => l.limit === "slides").map(({ body }) => ({ body, limit: `${names[body] ?? body}: slides as a whole (Σμ·n − |Σt| = 0)` }));
  const range: [number, number] = [sw.from, sw.to];
  // the sweep's own run, when "In every case" does not search it (the sketch as drawn beside its
  // cases, or a case solved only in combinations)
  const ownId = sw.combination ?? sw.case ?? "";
  const everywhereIds = new Set([...(file.cases ?? []).filter((c) => !c.onlyInCombinations).map((c) => c.id), ...(file.combinations ?? []).map((k) => k.id)]);
  const hasRuns = everywhereIds.size > 0;
  const ownMissing = hasRuns ? !everywhereIds.has(ownId) : ownId !== "";
  const own = (): Omit<LimitEverywhere, "result"> =>
    sw.combination
      ? { id: sw.combination, name: file.combinations?.find((k) => k.id === sw.combination)?.name ?? sw.combination, kind: "combination" }
      : sw.case
        ? { id: sw.case, name: file.cases?.find((c) => c.id === sw.case)?.name ?? sw.case, kind: "case" }
        : { id: "", name: "As drawn", kind: "as drawn" };
  let unit = "";
  let tolerance = limitTolerance(range);
  const rows: SweepLimitRow[] = [];
  const all: LimitEverywhere[] = [];
  /** One limit's rows, a row per run searched, the first of them marked. */
  let searchedLimits = 0;
  const addRows = (runs: LimitEverywhere[], quantity: QuantitySpec, limit: string, past: string, body?: string) => {
    const first = firstReached(runs, sw.from, sw.to);
    for (const run of runs) {
      const r = run.result;
      if ("unit" in r) unit = r.unit;
      if ("found" in r && r.found && r.tolerance) tolerance = r.tolerance;
      const value = reachedAt(r, sw.from, sw.to);
      const crossings = "found" in r && r.found ? r.crossings.length : 0;
      // tipping's "margin" is a sign only (held or not): never "past it throughout" in words of a margin
      const pastThroughout = past !== "tipping" && "found" in r && !r.found && r.max < 0;
      // a support's margin that never reaches zero: where it came closest, and which way it goes at the ends
      let hint: string | undefined;
      if (!body && "found" in r && !r.found) {
        const largest = Math.max(Math.abs(r.min), Math.abs(r.max));
        const shown = hintShown(quantity, units, Number.isFinite(largest) ? largest : 0);
        hint = runNoLimitWords(r, quantity, file.supports, names, { from: sw.from, to: sw.to }, { parameter: sw.parameter, pName, targetSI: 0, target: shown(0), shown })?.words;
      }
      rows.push({ run, quantity, limit, past, value, more: Math.max(0, crossings - 1), pastThroughout, first: !!first?.tied.includes(run), governs: false, ...(body ? { body } : {}), ...(hint ? { hint } : {}) });
      all.push(run);
    }
    onProgress?.(++searchedLimits, limits.length + tipping.length + sliding.length);
  };
  for (const { q, limit, past } of limits) {
    const runs: LimitEverywhere[] = [];
    if (ownMissing) {
      let result: LimitEverywhere["result"];
      try {
        result = findLimitWith(sweeperOn(file, { case: sw.case, combination: sw.combination }, sw.parameter), range, q);
      } catch (err) {
        result = { error: (err as Error).message };
      }
      runs.push({ ...own(), result });
    }
    // a sketch whose cases are all for combinations, with none: only the sweep's own run
    if (hasRuns || !ownMissing) runs.push(...limitEverywhere(file, sw.parameter, range, q));
    addRows(runs, q, limit, past);
  }
  // tipping, in the same runs as the margins (the order "In every case" searches them)
  const searched: Array<Omit<LimitEverywhere, "result"> & { on: { case?: string; combination?: string } }> = [
    ...(ownMissing ? [{ ...own(), on: { case: sw.case, combination: sw.combination } }] : []),
    ...(hasRuns
      ? [
          ...(file.cases ?? []).filter((c) => !c.onlyInCombinations).map((c) => ({ id: c.id, name: c.name, kind: "case" as const, on: { case: c.id } })),
          ...(file.combinations ?? []).map((k) => ({ id: k.id, name: k.name, kind: "combination" as const, on: { combination: k.id } })),
        ]
      : ownMissing
        ? []
        : [{ id: "", name: "As drawn", kind: "as drawn" as const, on: {} }]),
  ];
  /** One of a body's own limits searched in every run. */
  const bodyRuns = (find: (sweeper: ReturnType<typeof sweeperOn>) => LimitEverywhere["result"]) =>
    searched.map(({ on, ...run }): LimitEverywhere => {
      try {
        return { ...run, result: find(sweeperOn(file, on, sw.parameter)) };
      } catch (err) {
        return { ...run, result: { error: (err as Error).message } };
      }
    });
  // tipping with where the body already slides as a whole (`slidesFrom`): friction is checked, not
  // enforced, so a tipping value past that holds only for a body kept from sliding
  for (const { body, limit } of tipping) addRows(bodyRuns((s) => findBodyLimitWith(s, range, { body, limit: "tips" })), { support: body, component: "margin" }, limit, "tipping", body);
  for (const { body, limit } of sliding) addRows(bodyRuns((s) => findBodySlidingWith(s, range, body)), { support: body, component: "frictionMargin" }, limit, "sliding as a whole", body);
  // the first of every limit: what governs over the sweep's range (every row at that value, a tie)
  const governing = firstReached(all, sw.from, sw.to);
  for (const row of rows) row.governs = !!governing?.tied.includes(row.run);
  return { rows, unit, tolerance };
}

/**
 * Each body's own first limit (it tips, or slides as a whole), said after what governs when that is
 * a support's: a contact slipping alone, or lifting off, leaves the body held, and an anchor's
 * designer asks where the body itself starts to move. Nothing for a body whose own limit governs.
 */
function bodyWords(rows: SweepLimitRow[], sw: SweepFile, p: string, unit: string, runWords: (r: SweepLimitRow) => string): string {
  const bodies = [...new Set(rows.flatMap((r) => (r.body ? [r.body] : [])))];
  return bodies
    .map((body) => {
      const own = rows.filter((r) => r.body === body);
      if (own.some((r) => r.governs)) return "";
      const name = own[0].limit.slice(0, own[0].limit.lastIndexOf(": "));
      const what = (r: SweepLimitRow) => r.limit.slice(name.length + 2);
      const first = firstReached(own.map((r) => r.run), sw.from, sw.to);
      if (!first) {
        const slides = own.some((r) => r.past === "sliding as a whole");
        return ` ${name} itself ${slides ? "neither tips nor slides as a whole" : "does not tip"} in any run searched.`;
      }
      const tied = own.filter((r) => first.tied.includes(r.run));
      const limits = [...new Set(tied.map(what))].map((l) => `${l} in ${andWords(tied.filter((r) => what(r) === l).map(runWords))}`);
      return ` ${name} itself (the body, not one support) first ${limits.length > 1 || tied.length > 1 ? "gives way in more than one way at once" : "gives way"} at ${p} = ${limitWithUnit(first.value, unit)}: ${limits.join("; ")}.`;
    })
    .join("");
}

/**
 * A table of limits searched in runs (`SweepLimitRow`s), a row for each run, with where the limit is
 * first reached, or "none in 0 … 80 deg" and why. The calc sheet's and a version page's table of a
 * kept sweep's limits (`sweepLimitTable`), and the editor's "In every case" (one limit): one
 * builder, so the CSV of each says the same in the same columns. `plotted`: the run whose plot the
 * table sits under, marked "(plotted)".
 */
export function limitRowsTable(
  rows: SweepLimitRow[],
  o: { id: string; title: string; parameter: string; from: number; to: number; unit: string; tolerance: number; plotted?: { id: string; combination: boolean } },
): Table {
  const { unit, tolerance } = o;
  const u = unit ? ` ${prettyUnit(unit)}` : "";
  const span = `${formatNumber(o.from, 6)} … ${formatNumber(o.to, 6)}${u}`;
  const p = parameterWords(o.parameter);
  const governing = rows.filter((r) => r.governs);
  const marks: Table["marks"] = [];
  const cells = rows.map((r): Cell[] => {
    const res = r.run.result;
    let value: Cell;
    let note: string;
    // a tipping row: where the body already slides as a whole in the same run (`findBodyLimitWith`)
    const slidesFrom = r.past === "tipping" && "found" in res ? (res as BodyLimitResult).slidesFrom : undefined;
    if ("error" in res) {
      value = "not solved";
      note = r.unreached ?? res.error;
    } else if (r.value === undefined) {
      value = `none in ${span}`;
      // sliding is read only while the body is held: where it tips in this run, say so
      const tips = r.past === "sliding as a whole" ? rows.find((t) => t.body === r.body && t.past === "tipping" && t.run.kind === r.run.kind && t.run.id === r.run.id && t.value !== undefined) : undefined;
      note = r.unreached ?? [
        r.pastThroughout
          ? `past it throughout: ${r.past} over the whole range (the margin stays below zero)`
          : tips
            ? `searched while the body is held: it tips from ${limitWithUnit(tips.value!, unit)}`
            : slidesFrom !== undefined
              ? `it slides as a whole from ${limitWithUnit(slidesFrom, unit)}`
              : "",
        r.hint ?? "",
      ]
        .filter(Boolean)
        .join("; ");
    } else {
      value = r.value;
      const slidFirst = slidesFrom !== undefined && (o.from <= o.to ? slidesFrom <= r.value : slidesFrom >= r.value);
      const bits = [
        r.governs ? (governing.length > 1 ? "governs (equal first)" : "governs: reached first of all") : r.first ? "first of this limit" : "",
        r.value === o.from ? "already at the range's start" : "",
        r.more ? `reached ${r.more} more time${r.more > 1 ? "s" : ""} in the range` : "",
        // friction is checked, not enforced: the body is solved as if held along its base
        slidFirst ? `while it is held against sliding: it already slides as a whole from ${limitWithUnit(slidesFrom, unit)}` : "",
      ];
      note = bits.filter(Boolean).join("; ");
    }
    marks.push(r.governs ? { value: { symbol: "◆", text: "governs: the first limit reached over the sweep's range" } } : r.first && r.value !== undefined ? { value: { symbol: "◇", text: "the first run to reach this limit" } } : undefined);
    // the run plotted above, so the chart and its row are read together
    const plotted = o.plotted && r.run.id === o.plotted.id && (r.run.kind === "combination") === o.plotted.combination ? " (plotted)" : "";
    return [r.limit, `${r.run.kind === "as drawn" ? "As drawn" : r.run.name}${plotted}`, value, note];
  });
  const reached = rows.map((r) => r.value).filter((x): x is number => x !== undefined);
  return {
    id: o.id,
    title: o.title,
    columns: [
      { key: "limit", label: "Limit", align: "left" },
      { key: "run", label: "Case or combination", align: "left" },
      { key: "value", label: `${p} where first reached`, unit: unit ? prettyUnit(unit) : undefined, align: "right" },
      { key: "note", label: "Note", align: "left" },
    ],
    rows: cells,
    marks,
    figures: 4,
    notes: [
      `Each limit searched by the limit finder over ${span} in every run listed (${limitPrecisionWords(tolerance, unit, reached)}); from ${formatNumber(o.from, 6)}${u}, the first crossing is given. ◆\u00a0governs: the limit reached first of all; ◇\u00a0the first run to reach each other limit.`,
    ],
  };
}

/**
 * The calc sheet's table of a kept sweep's limits (`sweepLimitRows`): grouped by limit, a row for
 * each run, with where the limit is first reached, or "none in 0 … 80 deg". The one that governs is
 * marked ◆ and said in words, the first of each other limit ◇, so the mark is never colour alone.
 * When what governs is a support's limit, the summary says each body's own first limit after it.
 */
export function sweepLimitTable(file: SketchFile, sw: SweepFile, onProgress?: (done: number, total: number) => void, units: UnitSystem = "SI"): { table: Table; summary: string } {
  const { rows, unit, tolerance } = sweepLimitRows(file, sw, onProgress, units);
  const u = unit ? ` ${prettyUnit(unit)}` : "";
  const span = `${formatNumber(sw.from, 6)} … ${formatNumber(sw.to, 6)}${u}`;
  const p = parameterWords(sw.parameter);
  const governing = rows.filter((r) => r.governs);
  const table = limitRowsTable(rows, { id: `sweep-limits-${sw.id}`, title: `Limits searched — ${p}`, parameter: sw.parameter, from: sw.from, to: sw.to, unit, tolerance, plotted: { id: sw.combination ?? sw.case ?? "", combination: !!sw.combination } });
  // a tie said once, at its value: each limit with the runs that reach it there
  const runWords = (r: SweepLimitRow) => (r.run.kind === "as drawn" ? "the sketch as drawn" : r.run.name);
  const tiedLimits = [...new Set(governing.map((r) => r.limit))].map((l) => `${l} in ${andWords(governing.filter((r) => r.limit === l).map(runWords))}`);
  const summary = governing.length
    ? `Governs over ${span}: ${governing.length > 1 ? `equal first at ${p} = ${limitWithUnit(governing[0].value!, unit)}: ${tiedLimits.join("; ")}` : `${tiedLimits[0]} at ${p} = ${limitWithUnit(governing[0].value!, unit)}`}.${bodyWords(rows, sw, p, unit, runWords)}`
    : rows.length
      ? `No limit is reached in ${span} in any run searched: ${rows.some((r) => r.pastThroughout) ? "each is either past throughout or not reached (see the notes)" : "every contact stays in bearing, every tie taut and every friction margin above zero"}.`
      : "The sketch has no contact or tie: no limit to search.";
  return { table, summary };
}
