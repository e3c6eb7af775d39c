// The sweep's plotted values as CSV (the Sweep tab's CSV button): the swept value and each plotted
// quantity in the chart's unit, at full precision, with each point's state; units in the header.
import { readFileSync } from "node:fs";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { runSweep } from "@/canvas/studies/run";
import { csvOf, UTF8_BOM } from "@/components/studies/csv";
import { chartRows, sweepTable } from "@/components/studies/SweepChart";

const load = (n: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${n}.json`, "utf8"));

describe("a sweep's CSV", () => {
  const file = load("fire-monitor-trailer");
  const data = runSweep(file, { parameter: "theta", from: 0, to: 80, points: 81, quantities: [{ support: "jack", component: "margin" }, { support: "leg", component: "n" }] });
  const names = { jack: "front jack", leg: "rear stabiliser leg" };

  it("has the parameter, each quantity and the state, with units in the header", () => {
    const csv = csvOf(sweepTable(data, "SI", "theta", names));
    expect(csv.startsWith(UTF8_BOM)).toBe(true);
    const rows = Papa.parse<string[]>(csv.slice(1).trim()).data;
    expect(rows[0]).toEqual(["theta (deg)", "margin at front jack (kN)", "normal force at rear stabiliser leg (kN)", "State"]);
    expect(rows).toHaveLength(1 + 81);
  });

  it("every value is the plotted one at full precision: the jack's margin is its normal force in kN (1 kN = 1000 N)", () => {
    const rows = Papa.parse<string[]>(csvOf(sweepTable(data, "SI", "theta", names)).slice(1).trim()).data.slice(1);
    const plotted = chartRows(data, "SI");
    rows.forEach((r, i) => {
      expect(Number(r[0])).toBe(data.xs[i]);
      expect(Number(r[1])).toBe(plotted[i].q0);
      expect(Number(r[1])).toBeCloseTo(data.series[0][i] / 1000, 12);
      expect(r[3]).toBe(data.statuses[i]);
    });
    // below the crossing (18–19 deg) the jack is lifted, above it it bears
    expect(rows[0][3]).toBe("lifts");
    expect(rows[80][3]).toBe("holds");
  });

  it("in US units the forces are in the chart's US unit", () => {
    const header = Papa.parse<string[]>(csvOf(sweepTable(data, "US", "theta", names)).slice(1).trim()).data[0];
    expect(header[1]).toMatch(/^margin at front jack \((lbf|kip)\)$/);
  });
});
