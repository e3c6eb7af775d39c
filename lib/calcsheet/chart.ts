// A line chart as an SVG string, for the calc sheet (the browser draws its plots with recharts).
// Marks where a series crosses zero (a contact lifting, a tie going slack, friction used up).
import { formatNumber } from "@/solver/units";
import { niceDomain, niceTicks } from "../ticks";

export interface ChartSeries {
  label: string;
  points: Array<[number, number | null]>;
  /** mark the zero crossings of this series */
  markZero?: boolean;
}

export interface ChartSpec {
  title: string;
  xLabel: string;
  yLabel: string;
  series: ChartSeries[];
  width?: number;
  height?: number;
  /** vertical lines with a label, e.g. the limit found */
  markers?: Array<{ x: number; label: string }>;
}

const COLORS = ["#1f5f7a", "#b4462b", "#1d2329", "#8a6212", "#4d7a3a", "#6b4c9a"];
const DASHES = ["", "6 3", "2 3", "8 3 2 3", "1 2", "10 4"];

/** About the width of a character at 8 px (a generous average, so a label is never cut off). */
const LABEL_CHAR = 4.6;

const esc = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");

/**
 * The x axis's ticks: round ones (`niceTicks`), and the sweep's own ends where no round tick falls
 * on or near them, so the reader sees where the run starts and stops (0 to 1.5 ends at "1.5", not
 * at an unlabelled edge past "1.4"); the Sweep tab's plot takes the same. An end closer than a third of a step to a round tick is left
 * out: the two labels would run into each other.
 */
export function sweepAxisTicks(lo: number, hi: number, count = 5): number[] {
  const ticks = niceTicks(lo, hi, count);
  if (ticks.length < 2) return ticks;
  const step = ticks[1] - ticks[0];
  const clear = (x: number) => ticks.every((t) => Math.abs(t - x) >= step / 3);
  return [...(clear(lo) ? [lo] : []), ...ticks, ...(clear(hi) ? [hi] : [])];
}

export function lineChartSvg(spec: ChartSpec): string {
  const W = spec.width ?? 500;
  const H = spec.height ?? 260;
  // the legend sits between the title and the plot, where no line can run through it
  const m = { l: 62, r: 14, t: 30 + 11 * spec.series.length, b: 42 };
  const xs = spec.series.flatMap((s) => s.points.map((p) => p[0]));
  const ys = spec.series.flatMap((s) => s.points.map((p) => p[1]).filter((v): v is number => v !== null && Number.isFinite(v)));
  const x0 = Math.min(...xs);
  const x1 = Math.max(...xs);
  let y0 = Math.min(0, ...ys);
  let y1 = Math.max(0, ...ys);
  if (y1 === y0) {
    y1 += 1;
    y0 -= 1;
  }
  // out to the round ticks beyond the data, so the plot's top and bottom are labelled
  const yAxis = niceDomain(y0, y1);
  y0 = yAxis.lo;
  y1 = yAxis.hi;
  const X = (v: number) => m.l + ((v - x0) / (x1 - x0 || 1)) * (W - m.l - m.r);
  const Y = (v: number) => H - m.b - ((v - y0) / (y1 - y0)) * (H - m.t - m.b);
  const parts: string[] = [];
  parts.push(`<rect x="0" y="0" width="${W}" height="${H}" fill="#ffffff"/>`);
  parts.push(`<text x="${m.l}" y="16" font-size="11" font-weight="600" fill="#1d2329">${esc(spec.title)}</text>`);
  for (const t of yAxis.ticks) {
    parts.push(`<line x1="${m.l}" x2="${W - m.r}" y1="${Y(t)}" y2="${Y(t)}" stroke="${t === 0 ? "#5f6974" : "#e2dccf"}" stroke-width="${t === 0 ? 1 : 0.6}"/>`);
    parts.push(`<text x="${m.l - 5}" y="${Y(t) + 3}" font-size="8" text-anchor="end" fill="#3d4650">${esc(formatNumber(t, 3))}</text>`);
  }
  for (const t of sweepAxisTicks(x0, x1)) {
    parts.push(`<line x1="${X(t)}" x2="${X(t)}" y1="${H - m.b}" y2="${H - m.b + 4}" stroke="#5f6974" stroke-width="0.6"/>`);
    // to 6 figures: a round tick prints as it is, and a sweep's end as the sweep says it (its title)
    parts.push(`<text x="${X(t)}" y="${H - m.b + 13}" font-size="8" text-anchor="middle" fill="#3d4650">${esc(formatNumber(t, 6))}</text>`);
  }
  parts.push(`<rect x="${m.l}" y="${m.t}" width="${W - m.l - m.r}" height="${H - m.t - m.b}" fill="none" stroke="#cfc8b8" stroke-width="0.8"/>`);
  parts.push(`<text x="${(m.l + W - m.r) / 2}" y="${H - 8}" font-size="9" text-anchor="middle" fill="#1d2329">${esc(spec.xLabel)}</text>`);
  parts.push(`<text transform="translate(12 ${(m.t + H - m.b) / 2}) rotate(-90)" font-size="9" text-anchor="middle" fill="#1d2329">${esc(spec.yLabel)}</text>`);
  spec.series.forEach((s, i) => {
    const color = COLORS[i % COLORS.length];
    let d = "";
    let pen = false;
    for (const [x, y] of s.points) {
      if (y === null || !Number.isFinite(y)) {
        pen = false;
        continue;
      }
      d += `${pen ? "L" : "M"}${X(x).toFixed(2)} ${Y(y).toFixed(2)} `;
      pen = true;
    }
    parts.push(`<path d="${d.trim()}" fill="none" stroke="${color}" stroke-width="1.4"${DASHES[i % DASHES.length] ? ` stroke-dasharray="${DASHES[i % DASHES.length]}"` : ""}/>`);
    if (s.markZero) {
      for (let k = 1; k < s.points.length; k++) {
        const [xa, ya] = s.points[k - 1];
        const [xb, yb] = s.points[k];
        if (ya === null || yb === null || Math.sign(ya) === Math.sign(yb) || ya === 0) continue;
        const xz = xa + ((xb - xa) * ya) / (ya - yb);
        parts.push(`<path d="M${X(xz) - 4} ${Y(0) - 4}L${X(xz) + 4} ${Y(0) + 4}M${X(xz) - 4} ${Y(0) + 4}L${X(xz) + 4} ${Y(0) - 4}" stroke="${color}" stroke-width="1.4"/>`);
      }
    }
    // legend
    const ly = 30 + i * 11;
    parts.push(`<line x1="${m.l}" x2="${m.l + 18}" y1="${ly - 3}" y2="${ly - 3}" stroke="${color}" stroke-width="1.4"${DASHES[i % DASHES.length] ? ` stroke-dasharray="${DASHES[i % DASHES.length]}"` : ""}/>`);
    parts.push(`<text x="${m.l + 22}" y="${ly}" font-size="8" fill="#1d2329">${esc(s.label)}</text>`);
  });
  (spec.markers ?? []).forEach((mk, k) => {
    parts.push(`<line x1="${X(mk.x)}" x2="${X(mk.x)}" y1="${m.t}" y2="${H - m.b}" stroke="#b4462b" stroke-width="1" stroke-dasharray="3 2"/>`);
    // one label a line, so markers close together do not print over each other; a label that
    // would run past the plot's right edge goes on the left of its line
    const right = X(mk.x) + 3 + mk.label.length * LABEL_CHAR <= W - m.r;
    // on a paper-coloured halo: a label that crosses another marker's line stays readable
    parts.push(`<text x="${X(mk.x) + (right ? 3 : -3)}" y="${m.t + 9 + k * 10}" font-size="8" text-anchor="${right ? "start" : "end"}" fill="#b4462b" stroke="#fbfaf6" stroke-width="3" paint-order="stroke" stroke-linejoin="round">${esc(mk.label)}</text>`);
  });
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}" font-family="Inter">${parts.join("")}</svg>`;
}
