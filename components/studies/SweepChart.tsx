"use client";
// The sweep's plot (recharts): each quantity against the swept parameter, in its display unit
// (forces on the left axis, a moment on the right), with the margins' zero crossings marked (✕)
// and the limit found, if any. Hover shows values.
import { CartesianGrid, Legend, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { limitWithUnit } from "@/solver/limit";
import { describeQuantity, type QuantityComponent } from "@/solver/quantity";
import { convert, formatNumber, prettyUnit, type UnitSystem } from "@/solver/units";
import { sweepAxisTicks } from "@/lib/calcsheet/chart";
import { displayKind, displayUnit, largestByKind, marksZero, pointStateWords, releasedWords, toDisplay, type DisplayKind } from "@/canvas/studies/display";
import type { SweepData } from "@/canvas/studies/run";
import type { Table } from "@/solver/report";

const COLORS = ["rgb(var(--reaction))", "rgb(var(--accent))", "rgb(var(--ink))", "rgb(var(--caution))", "rgb(var(--plot-5))", "rgb(var(--plot-6))"];
const DASHES = ["", "6 3", "2 3", "8 3 2 3", "1 2", "10 4"];

/** The largest force and moment plotted: N (N·m) for a sweep that stays below 1 kN (1 kN·m). */
const scaleOf = (data: SweepData) => largestByKind(data.quantities.map((q) => q.component), data.series);

/** The force and moment units of a page the chart sits on (a version's: `unitFamily`), or none:
 *  then the chart picks its own from its values. */
export type ChartFamily = { force: string; moment: string };

/** The display unit of a quantity: the page's `family`, else one for the plot's largest value. */
function unitIn(component: QuantityComponent, units: UnitSystem, largest: Record<DisplayKind, number>, family?: ChartFamily): string {
  const kind = displayKind(component);
  return family && kind !== "ratio" ? family[kind] : displayUnit(component, units, largest[kind]);
}

/** The chart's rows: each series in its own display unit (kN or kN·m, N or N·m, lbf or lbf·ft), or
 *  in the page's `family`. */
export function chartRows(data: SweepData, units: UnitSystem, family?: ChartFamily): Array<Record<string, number | null>> {
  const largest = scaleOf(data);
  return data.xs.map((x, i) => {
    const row: Record<string, number | null> = { x };
    data.series.forEach((ys, s) => {
      const v = ys[i];
      const c = data.quantities[s].component;
      const kind = displayKind(c);
      row[`q${s}`] = !Number.isFinite(v) ? null : family && kind !== "ratio" ? convert(v, kind, units, family[kind]).value : toDisplay(v, c, units, largest[kind]);
    });
    return row;
  });
}

/** The plotted values as a result table, for the CSV: the swept value, each quantity in the chart's
 *  unit at full precision (empty where the point did not solve) and each point's state. */
export function sweepTable(data: SweepData, units: UnitSystem, parameterLabel: string, names: Readonly<Record<string, string>> = {}, family?: ChartFamily): Table {
  const largest = scaleOf(data);
  const rows = chartRows(data, units, family);
  return {
    id: "sweep",
    title: `Sweep of ${parameterLabel}`,
    columns: [
      { key: "x", label: parameterLabel, unit: data.unit ? prettyUnit(data.unit) : undefined, align: "right" },
      ...data.quantities.map((q, s) => ({ key: `q${s}`, label: describeQuantity(q, names), unit: unitIn(q.component, units, largest, family) || undefined, align: "right" as const })),
      { key: "state", label: "State", align: "left" },
    ],
    rows: rows.map((r, i) => [data.xs[i], ...data.quantities.map((_, s) => r[`q${s}`]), data.statuses[i] ?? null]),
  };
}

/**
 * The quantity the limit finder offers first for this plot (its index in `data.quantities`): the
 * one whose zero crossing the plot marks first along the sweep (where a contact lifts, a tie goes
 * slack or friction is used up: what the user sees happen); else the first plotted margin, which
 * the plot would mark at zero; else the first quantity plotted.
 */
export function defaultLimitQuantity(data: SweepData): number {
  let best: { at: number; quantity: number } | null = null;
  for (const c of data.crossings) {
    const at = data.xs.indexOf(c.between[1]);
    if (!best || at < best.at || (at === best.at && c.quantity < best.quantity)) best = { at, quantity: c.quantity };
  }
  if (best) return best.quantity;
  const margin = data.quantities.findIndex((q) => marksZero(q.component));
  return margin >= 0 ? margin : 0;
}

/** The words on a found limit's line across the plot, with the swept parameter's unit: "limit: 1,482 gpm". */
export const limitMark = (x: number, unit: string): string => `limit: ${limitWithUnit(x, unit)}`;

/** `names`: the supports' labels by id, to name the lines as the drawing names the supports;
 *  `family`: the page's force and moment units (a version's page), else the chart's own. */
export function SweepChart({
  data,
  units,
  parameterLabel,
  limit,
  run,
  names,
  family,
}: {
  data: SweepData;
  units: UnitSystem;
  parameterLabel: string;
  limit: { x: number; label: string } | null;
  run: number;
  names?: Readonly<Record<string, string>>;
  family?: ChartFamily;
}) {
  const rows = chartRows(data, units, family);
  // forces on the left axis; a moment (or a ratio) on its own axis on the right, in its own unit
  const kinds = [...new Set(data.quantities.map((q) => displayKind(q.component)))];
  const axisOf = (s: number) => (displayKind(data.quantities[s].component) === kinds[0] ? "left" : "right");
  const largest = scaleOf(data);
  const unitOf = (s: number) => unitIn(data.quantities[s].component, units, largest, family);
  const leftUnit = unitIn(data.quantities.find((q) => displayKind(q.component) === kinds[0])?.component ?? "fx", units, largest, family);
  const rightUnits = [...new Set(data.quantities.map((q, s) => (axisOf(s) === "right" ? unitOf(s) : null)).filter((u): u is string => u !== null))];
  const crossingsX = data.crossings.map((c) => {
    const ys = data.series[c.quantity];
    const i = data.xs.indexOf(c.between[1]);
    const a = ys[i - 1];
    const b = ys[i];
    return { ...c, x: c.between[0] + ((c.between[1] - c.between[0]) * a) / (a - b) };
  });
  // round ticks across the swept range (recharts divides a data-bound domain evenly otherwise), and
  // its ends where no round tick labels them, as the calc sheet's chart has them
  const xTicks = data.xs.length ? sweepAxisTicks(Math.min(...data.xs), Math.max(...data.xs), 6) : undefined;
  return (
    <figure className="h-56 w-full" data-testid="sweep-chart" data-run={run} aria-label={`Reactions and margins against ${parameterLabel}`}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={rows} margin={{ top: 6, right: 16, bottom: 4, left: 4 }}>
          <CartesianGrid stroke="rgb(var(--rule-soft))" strokeDasharray="0" />
          <XAxis dataKey="x" type="number" domain={["dataMin", "dataMax"]} ticks={xTicks} tick={{ fontSize: 11, fill: "rgb(var(--ink-soft))" }} tickFormatter={(v: number) => formatNumber(v, 6)}
            label={{ value: `${parameterLabel}${data.unit ? ` (${prettyUnit(data.unit)})` : ""}`, position: "insideBottom", offset: 0, fontSize: 11, fill: "rgb(var(--ink))" }} height={38} />
          <YAxis yAxisId="left" tick={{ fontSize: 11, fill: "rgb(var(--ink-soft))" }} tickFormatter={(v: number) => formatNumber(v, 3)} width={52}
            label={{ value: leftUnit, angle: -90, position: "insideLeft", fontSize: 11, fill: "rgb(var(--ink))" }} />
          {rightUnits.length > 0 && (
            <YAxis yAxisId="right" orientation="right" tick={{ fontSize: 11, fill: "rgb(var(--ink-soft))" }} tickFormatter={(v: number) => formatNumber(v, 3)} width={52}
              label={{ value: rightUnits.join(", "), angle: 90, position: "insideRight", fontSize: 11, fill: "rgb(var(--ink))" }} />
          )}
          <Tooltip
            formatter={(v, name, item) => {
              const s = Number(String(item?.dataKey ?? "q0").slice(1));
              // a released support's margin below zero is no force: said in words, as the table's "—"
              const released = releasedWords(data, s, Number((item?.payload as { x?: number } | undefined)?.x));
              if (released) return [released, String(name)];
              return [typeof v === "number" ? `${formatNumber(v, 4)}${unitOf(s) ? ` ${unitOf(s)}` : ""}` : "—", String(name)];
            }}
            labelFormatter={(x) => {
              const at = `${parameterLabel} = ${formatNumber(Number(x), 5)}${data.unit ? ` ${prettyUnit(data.unit)}` : ""}`;
              // what the bodies and the plotted supports do there: a contact slipping alone, or the body as a whole
              const state = pointStateWords(data, Number(x), names ?? {});
              return state ? (
                <>
                  {at}
                  <br />
                  <span className="font-normal" data-testid="sweep-point-state">{state}</span>
                </>
              ) : at;
            }}
            // compact: on a short chart the values must not hide the curves they read
            contentStyle={{ fontSize: 11, lineHeight: 1.3, padding: "3px 7px", borderColor: "rgb(var(--rule))", backgroundColor: "rgb(var(--paper-card) / 0.92)" }}
            itemStyle={{ padding: 0 }}
            labelStyle={{ marginBottom: 1, fontWeight: 600 }}
          />
          {/* below the axis title, clear of it */}
          <Legend wrapperStyle={{ fontSize: 11, paddingTop: 6 }} />
          <ReferenceLine yAxisId="left" y={0} stroke="rgb(var(--ink-faint))" />
          {data.quantities.map((q, s) => (
            <Line key={s} yAxisId={axisOf(s)} type="linear" dataKey={`q${s}`} name={`${describeQuantity(q, names)}${axisOf(s) === "right" && unitOf(s) ? ` (${unitOf(s)}, right)` : ""}`} stroke={COLORS[s % COLORS.length]} strokeDasharray={DASHES[s % DASHES.length]} strokeWidth={1.6} dot={false} isAnimationActive={false} connectNulls={false} />
          ))}
          {crossingsX.map((c, i) => (
            <ReferenceDot key={i} yAxisId={axisOf(c.quantity)} x={c.x} y={0} r={5} fill="rgb(var(--paper-card))" stroke={COLORS[c.quantity % COLORS.length]} strokeWidth={2} label={{ value: "✕", position: "top", fontSize: 12, fill: COLORS[c.quantity % COLORS.length] }} />
          ))}
          {limit && <ReferenceLine yAxisId="left" x={limit.x} stroke="rgb(var(--accent))" strokeDasharray="4 3" label={{ value: limitMark(limit.x, data.unit), position: "insideTopRight", fontSize: 11, fill: "rgb(var(--accent))" }} />}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
