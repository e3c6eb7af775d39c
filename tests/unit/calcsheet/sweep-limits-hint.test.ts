// The calc sheet's (and a version page's) table of a kept sweep's limits, for a run in which a
// support's margin never reaches zero: where it came closest and which way it goes past each end,
// in the compact words of the editor's "In every case" (`runNoLimitWords`, solver/limitHint.ts),
// and the same words from `npm run solve -- --limit … --every-case`. Checked against statics
// worked by hand (common practice).
import { describe, expect, it } from "vitest";
import { sweepLimitTable } from "@/lib/calcsheet/sweeps";
import { tableCells } from "@/lib/calcsheet/table-layout";
import { parseSketch } from "@/solver";
import { G0 } from "@/solver/constants";
import { loadFixture } from "../solver/helpers";
import { tieBeam } from "../studies/tie-beam";
import { solveCli, written } from "../solver/cli-support";

// The thrust stand: 200 kg, cg 0.8 m behind the front pin, the rear pad 1.6 m behind it, pushed by
// a jet T at 1.5 m. Moments about the pin: 1.6·n = W·0.8 − 1.5·T·f², with f the flow factor (the
// thrust goes as f², momentum flux). At T = 1 kN: n = (1569.06 − 1500)/1.6 = 43.17 N at full flow,
// (1569.06 − 960)/1.6 = 380.7 N throttled to f = 0.8; n is linear in T, so the line through the
// last samples reaches zero exactly where the pad lifts, W·0.8/(1.5·f²) = 1.046 kN and 1.634 kN.
const W = 200 * G0;
const standDoc = () => {
  const doc = loadFixture("thrust-stand-tips.json");
  doc.cases = [
    { id: "a", name: "Full flow" },
    { id: "b", name: "Throttled", flowFactor: 0.8 },
  ];
  return doc;
};
const stand = () => {
  const p = parseSketch(standDoc());
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
};
// T is written in kN in the fixture: the range is in kN
const short = { id: "s", parameter: "T", from: 0, to: 1, points: 31, case: "a" };
const noteOf = (cells: string[][], limit: string, run: string) => cells.find((r) => r[0] === limit && r[1] === run)![3];

describe("a lift-off not reached in the sweep's range", () => {
  it("says the closest margin and where, and that it heads for zero past the end, in the sheet's units", () => {
    expect(((W * 0.8 - 1500) / 1.6).toFixed(2)).toBe("43.17"); // hand calculation above
    expect(((W * 0.8 - 960) / 1.6).toFixed(1)).toBe("380.7");
    expect(((W * 0.8) / 1.5 / 1000).toFixed(3)).toBe("1.046");
    const si = tableCells(sweepLimitTable(stand(), short).table);
    expect(si.find((r) => r[1] === "Full flow (plotted)")![2]).toBe("none in 0 … 1 kN");
    expect(noteOf(si, "rear pad: lift-off (n = 0)", "Full flow (plotted)")).toBe("closest 43.17 N at T = 1.000 kN; past 1 kN heading for 0 N (a line reaches it near T = 1.046 kN)");
    expect(noteOf(si, "rear pad: lift-off (n = 0)", "Throttled")).toBe("closest 380.7 N at T = 1.000 kN; past 1 kN heading for 0 N (a line reaches it near T = 1.634 kN)");
    // a body's own limit (tipping) is a sign, not a force: no figure said
    expect(noteOf(si, "Stand: tips (not held)", "Throttled")).toBe("");
    // 43.165 N = 9.704 lbf (1 lbf = 4.4482216152605 N, NIST SP 811)
    const us = tableCells(sweepLimitTable(stand(), short, undefined, "US").table);
    expect(noteOf(us, "rear pad: lift-off (n = 0)", "Full flow (plotted)")).toBe("closest 9.704 lbf at T = 1.000 kN; past 1 kN heading for 0 lbf (a line reaches it near T = 1.046 kN)");
  });

  it("a range already past the lift-off says only that it is lifted throughout (the stand is not held there)", () => {
    const cells = tableCells(sweepLimitTable(stand(), { ...short, from: 2, to: 3 }).table);
    expect(noteOf(cells, "rear pad: lift-off (n = 0)", "Throttled")).toBe("past it throughout: lifted over the whole range (the margin stays below zero)");
  });
});

describe("a tie slack all through the range, on a body held by a pin and a pad", () => {
  // the tie beam (../studies/tie-beam.ts): with the bolt slack, 2·n = W − 1.5·P about the pin, so
  // at P = 1000 N the pad bears (1961.33 − 1500)/2 = 230.7 N and lifts at P = W/1.5 = 1307.6 N
  const p = parseSketch(tieBeam());
  if (!p.ok) throw new Error(JSON.stringify(p.errors));

  it("says the bolt is slack throughout and heads back toward taking load, without a figure; the pad's closest margin", () => {
    const cells = tableCells(sweepLimitTable(p.file, { id: "s", parameter: "P", from: 0, to: 1000, points: 21 }).table);
    expect(noteOf(cells, "bolt: slack (tension = 0)", "As drawn (plotted)")).toBe(
      "past it throughout: slack over the whole range (the margin stays below zero); past 1,000 N heading back toward taking load",
    );
    expect(((W - 1500) / 2).toFixed(1)).toBe("230.7");
    expect((W / 1.5).toFixed(0)).toBe("1308");
    expect(noteOf(cells, "pad: lift-off (n = 0)", "As drawn (plotted)")).toBe("closest 230.7 N at P = 1,000 N; past 1,000 N heading for 0 N (a line reaches it near P = 1,308 N)");
  });
});

describe("npm run solve -- --limit … --every-case", () => {
  // each run of the command line starts tsx (several seconds on a busy machine): one run
  it("gives each run without a crossing the same words, in N, and the wider range worth a search", () => {
    const r = solveCli("--limit", "T=0..1", "--quantity", "rear.margin", "--every-case", written(standDoc()));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.runs.map((x: { id: string; hint: string; wider: unknown }) => [x.id, x.hint, x.wider])).toEqual([
      // half as far again past 1 kN as the line says, rounded out to 0.01 kN: 1 + 1.5·0.046 = 1.07;
      // 1 + 1.5·0.634 = 1.952 → 1.96 (three figures of the width, outward)
      ["a", "closest 43.17 N at T = 1.000 kN; past 1 kN heading for 0 N (a line reaches it near T = 1.046 kN)", { from: 0, to: 1.07 }],
      ["b", "closest 380.7 N at T = 1.000 kN; past 1 kN heading for 0 N (a line reaches it near T = 1.634 kN)", { from: 0, to: 1.96 }],
    ]);
    expect(out.first).toBeNull();
  }, 60000);
});
