"use client";
// The sweep's plot (recharts): each quantity against the swept parameter, in the display unit,
// with zero crossings marked (✕ and a dashed line) and the limit found, if any. Hover shows values.
import { CartesianGrid, Legend, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { columnUnit } from "@/solver/report";
import { describeQuantity } from "@/solver/quantity";
import { convert, formatNumber, type UnitSystem } from "@/solver/units";
import type { SweepData } from "@/canvas/studies/run";

const COLORS = ["#1f5f7a", "#b4462b", "#1d2329", "#8a6212", "#4d7a3a", "#6b4c9a"];
const DASHES = ["", "6 3", "2 3", "8 3 2 3", "1 2", "10 4"];

export function SweepChart({ data, units, parameterLabel, limit, run }: { data: SweepData; units: UnitSystem; parameterLabel: string; limit: { x: number; label: string } | null; run: number }) {
  const unit = columnUnit("force", units);
  const k = convert(1, "force", units, unit).value;
  const rows = data.xs.map((x, i) => {
    const row: Record<string, number | null> = { x };
    data.series.forEach((ys, s) => {
      const v = ys[i];
      row[`q${s}`] = Number.isFinite(v) ? (data.quantities[s].component === "frictionRatio" ? v : v * k) : null;
    });
    return row;
  });
  const crossingsX = data.crossings.map((c) => {
    const ys = data.series[c.quantity];
    const i = data.xs.indexOf(c.between[1]);
    const a = ys[i - 1];
    const b = ys[i];
    return { ...c, x: c.between[0] + ((c.between[1] - c.between[0]) * a) / (a - b) };
  });
  return (
    <figure className="h-56 w-full" data-testid="sweep-chart" data-run={run} aria-label={`Reactions and margins against ${parameterLabel}`}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={rows} margin={{ top: 6, right: 16, bottom: 4, left: 4 }}>
          <CartesianGrid stroke="#e2dccf" strokeDasharray="0" />
          <XAxis dataKey="x" type="number" domain={["dataMin", "dataMax"]} tick={{ fontSize: 11, fill: "#3d4650" }} tickFormatter={(v: number) => formatNumber(v, 3)}
            label={{ value: `${parameterLabel}${data.unit ? ` (${data.unit})` : ""}`, position: "insideBottom", offset: -2, fontSize: 11, fill: "#1d2329" }} height={34} />
          <YAxis tick={{ fontSize: 11, fill: "#3d4650" }} tickFormatter={(v: number) => formatNumber(v, 3)} width={52}
            label={{ value: unit, angle: -90, position: "insideLeft", fontSize: 11, fill: "#1d2329" }} />
          <Tooltip
            formatter={(v, name) => [typeof v === "number" ? `${formatNumber(v, 4)} ${unit}` : "—", String(name)]}
            labelFormatter={(x) => `${parameterLabel} = ${formatNumber(Number(x), 5)}${data.unit ? ` ${data.unit}` : ""}`}
            contentStyle={{ fontSize: 12, borderColor: "#cfc8b8" }}
          />
          <Legend wrapperStyle={{ fontSize: 11 }} />
          <ReferenceLine y={0} stroke="#6b7580" />
          {data.quantities.map((q, s) => (
            <Line key={s} type="linear" dataKey={`q${s}`} name={describeQuantity(q)} stroke={COLORS[s % COLORS.length]} strokeDasharray={DASHES[s % DASHES.length]} strokeWidth={1.6} dot={false} isAnimationActive={false} connectNulls={false} />
          ))}
          {crossingsX.map((c, i) => (
            <ReferenceDot key={i} x={c.x} y={0} r={5} fill="#fbfaf6" stroke={COLORS[c.quantity % COLORS.length]} strokeWidth={2} label={{ value: "✕", position: "top", fontSize: 12, fill: COLORS[c.quantity % COLORS.length] }} />
          ))}
          {limit && <ReferenceLine x={limit.x} stroke="#b4462b" strokeDasharray="4 3" label={{ value: `limit: ${formatNumber(limit.x, 4)}`, position: "insideTopRight", fontSize: 11, fill: "#b4462b" }} />}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
