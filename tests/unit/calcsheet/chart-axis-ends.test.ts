// The calc sheet's sweep charts label where the sweep's range ends: a flow factor swept from 0 to
// 1.5 (0 to 150 % of the flow) ends at a "1.5" on its x axis, not at an unlabelled edge past "1.4".
import { describe, expect, it } from "vitest";
import { lineChartSvg, sweepAxisTicks } from "@/lib/calcsheet/chart";

/** The x axis's labels of a chart: the texts on the line under the plot. */
function xLabels(svg: string, height = 260, bottom = 42): string[] {
  const y = height - bottom + 13;
  return [...svg.matchAll(new RegExp(`<text x="[\\d.]+" y="${y}"[^>]*>([^<]*)</text>`, "g"))].map((m) => m[1]);
}

describe("the x axis of a sweep chart", () => {
  it("ends a 0 to 1.5 sweep at 1.5", () => {
    expect(sweepAxisTicks(0, 1.5)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1, 1.2, 1.4, 1.5]);
    const points: Array<[number, number]> = [0, 0.5, 1, 1.5].map((x) => [x, 5 - x]);
    const svg = lineChartSvg({ title: "flow factor from 0 to 1.5", xLabel: "flow factor", yLabel: "kN", series: [{ label: "margin", points, markZero: true }] });
    expect(xLabels(svg)).toEqual(["0", "0.2", "0.4", "0.6", "0.8", "1", "1.2", "1.4", "1.5"]);
  });

  it("gives a sweep's odd start and end as the sweep says them, and no end beside a round tick", () => {
    // 22.5 to 43.7 m/s: round ticks every 5, the ends between them
    expect(sweepAxisTicks(22.5, 43.7)).toEqual([22.5, 25, 30, 35, 40, 43.7]);
    // 20 to 45: both ends are round ticks already
    expect(sweepAxisTicks(20, 45)).toEqual([20, 25, 30, 35, 40, 45]);
    // 0 to 1.45: 1.45 is a quarter of a step past 1.4, too close for two labels
    expect(sweepAxisTicks(0, 1.45)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1, 1.2, 1.4]);
  });
});
