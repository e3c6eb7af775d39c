// The calc sheet's table of a kept sweep's limits: every limit (lift-off, slack, slip, tipping)
// searched in every run the sweep covers, reached or not, with the one that governs marked by a
// shape and in words; the same numbers as the editor's "In every case".
import { describe, expect, it } from "vitest";
import { sweepLimitRows, sweepLimitTable } from "@/lib/calcsheet/sweeps";
import { tableCells } from "@/lib/calcsheet/table-layout";
import { runLimitEverywhere } from "@/canvas/studies/run";
import { reachedAt } from "@/solver/studySweep";
import { formatLimit } from "@/solver/limit";
import { parseSketch, type SketchFileInput } from "@/solver";
import { G0 } from "@/solver/constants";
import { loadFixture } from "../solver/helpers";

/** The thrust stand: 200 kg, cg 0.8 m behind the front pin, pushed by a jet at 1.5 m. */
const standWith = (cases: SketchFileInput["cases"]) => {
  const doc = loadFixture("thrust-stand-tips.json");
  doc.cases = cases;
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return { doc, file: p.file };
};
// Hand calculation (common practice): moments about the front pin when the rear pad's n reaches zero,
// T·h = W·d with h = 1.5 m, d = 1.6 − 0.8 = 0.8 m, W = 200 kg × 9.80665 m/s² = 1961.33 N:
// T0 = 1961.33 × 0.8 / 1.5 = 1046.04 N = 1.046 kN. Past it the pad would have to pull: the stand
// tips about the pin, at the same thrust. Throttled to a flow factor of 0.8 the thrust is 0.8² = 0.64
// of T (momentum flux × f²): the pad lifts at T0 / 0.64 = 1634.4 N = 1.634 kN.
const T0 = (200 * G0 * 0.8) / 1.5;
const cases = [
  { id: "a", name: "Full flow" },
  { id: "b", name: "Throttled", flowFactor: 0.8 },
];
// T is written in kN ("2.2 kN"): the sweep's range and its values are in kN
const sweep = { id: "s", parameter: "T", from: 0, to: 3, points: 31, case: "a", quantities: [{ support: "rear", component: "margin" as const }] };

describe("the table of a sweep's limits in every case", () => {
  it("gives each run's first crossing of each limit, the governing one marked ◆ and said", () => {
    const { file } = standWith(cases);
    const { table, summary } = sweepLimitTable(file, sweep);
    const cells = tableCells(table);
    const row = (limit: string, run: string) => cells.find((r) => r[0] === limit && r[1] === run)!;
    expect(table.columns.map((c) => c.label)).toEqual(["Limit", "Case or combination", "T where first reached", "Note"]);
    expect(table.columns[2].unit).toBe("kN");
    // the plotted run is named so; full flow lifts first and governs (with its tipping, a tie)
    expect(row("rear pad: lift-off (n = 0)", "Full flow (plotted)")).toEqual(["rear pad: lift-off (n = 0)", "Full flow (plotted)", "◆\u00a01.046", "governs (equal first)"]);
    expect(row("rear pad: lift-off (n = 0)", "Throttled")).toEqual(["rear pad: lift-off (n = 0)", "Throttled", "1.634", ""]);
    expect(row("Stand: tips (not held)", "Full flow (plotted)")).toEqual(["Stand: tips (not held)", "Full flow (plotted)", "◆\u00a01.046", "governs (equal first)"]);
    expect(row("Stand: tips (not held)", "Throttled")[2]).toBe("1.634");
    const { rows } = sweepLimitRows(file, sweep);
    const lift = rows.filter((r) => r.limit.startsWith("rear pad"));
    expect(lift[0].value! * 1000).toBeCloseTo(T0, 2); // hand calculation above
    expect(lift[1].value! * 1000).toBeCloseTo(T0 / 0.64, 2); // hand calculation above
    expect(summary).toBe("Governs over 0 … 3 kN: equal first at T = 1.046 kN: rear pad: lift-off (n = 0) in Full flow; Stand: tips (not held) in Full flow.");
    expect(table.notes?.[0]).toContain("◆\u00a0governs: the limit reached first of all");
  });

  it("marks every run of a tie for first, and none of the later ones", () => {
    // two benches at full flow lift at T0; throttled to f = 0.8 the thrust is 0.64·T: later, at T0 / 0.64
    const { file } = standWith([{ id: "a", name: "Bench A" }, { id: "b", name: "Bench B" }, { id: "c", name: "Throttled", flowFactor: 0.8 }]);
    const { rows } = sweepLimitRows(file, sweep);
    const lift = rows.filter((r) => r.limit === "rear pad: lift-off (n = 0)");
    expect(lift.map((r) => [r.run.name, formatLimit(r.value!), r.first])).toEqual([
      ["Bench A", "1.046", true],
      ["Bench B", "1.046", true],
      ["Throttled", "1.634", false],
    ]);
    expect(lift[0].value! * 1000).toBeCloseTo(T0, 2); // hand calculation above
    expect(lift[2].value! * 1000).toBeCloseTo(T0 / 0.64, 2); // hand calculation above
  });

  it("has the numbers of the editor's In every case, to the last digit", () => {
    const { doc, file } = standWith([...cases, { id: "c", name: "Light stand", factors: { dead: 0.9 } }]);
    const { rows } = sweepLimitRows(file, sweep);
    const editor = runLimitEverywhere(doc, { parameter: "T", from: 0, to: 3, quantity: { support: "rear", component: "margin" }, target: 0 });
    const sheet = rows.filter((r) => r.limit.startsWith("rear pad"));
    expect(sheet.map((r) => r.run.name)).toEqual(editor.map((r) => r.name));
    expect(sheet.map((r) => r.value)).toEqual(editor.map((r) => reachedAt(r.result, 0, 3)));
    // and the light stand (0.9 W) governs: it lifts at 0.9·T0 = 0.9414 kN (hand calculation above)
    const light = sheet.find((r) => r.run.name === "Light stand")!;
    expect(light.governs).toBe(true);
    expect(formatLimit(light.value!)).toBe("0.9414");
  });

  it("says none in the range for a limit no run reaches, and that nothing governs", () => {
    // below T0 / 0.64 and T0 everywhere: 0.5 kN lifts nothing
    const { file } = standWith(cases);
    const { table, summary } = sweepLimitTable(file, { ...sweep, to: 0.5 });
    expect(tableCells(table).map((r) => r[2])).toEqual(Array(4).fill("none in 0 … 0.5 kN"));
    expect(table.marks?.every((m) => m === undefined)).toBe(true);
    expect(summary).toBe("No limit is reached in 0 … 0.5 kN in any run searched: every contact stays in bearing, every tie taut and every friction margin above zero.");
  });

  it("searches the sketch as drawn when it has no cases", () => {
    const { file } = standWith(undefined);
    const { rows } = sweepLimitRows(file, { ...sweep, case: undefined });
    expect(rows.map((r) => [r.limit, r.run.name, formatLimit(r.value!)])).toEqual([
      ["rear pad: lift-off (n = 0)", "As drawn", "1.046"],
      ["Stand: tips (not held)", "As drawn", "1.046"],
    ]);
  });

  it("says a body already tipping where a downward sweep starts", () => {
    // from 3 kN down: above T0 = 1.046 kN the stand tips (hand calculation above), so at the start already
    const { file } = standWith(undefined);
    const { table } = sweepLimitTable(file, { ...sweep, case: undefined, from: 3, to: 0 });
    const tips = tableCells(table).find((r) => r[0] === "Stand: tips (not held)")!;
    expect(tips).toEqual(["Stand: tips (not held)", "As drawn (plotted)", "◆\u00a03.000", "governs: reached first of all; already at the range's start"]);
  });
});
