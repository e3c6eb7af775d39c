// A kept sweep's words on the calc sheet: the built-in flow factor by its name in words (never the
// file's key), and a case whose margin stays below zero over the whole range said to be past it
// all along, not "none in the range" (which reads as safe).
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { sweepCharts, sweepLimitTable, sweepMarkers, sweepQuantities } from "@/lib/calcsheet/sweeps";
import { tableCells } from "@/lib/calcsheet/table-layout";
import { noCrossingWords, sidesWords } from "@/components/studies/SweepPanel";
import { limitEverywhere } from "@/solver/studySweep";
import { parseSketch } from "@/solver/index";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { pdfText } from "../../support/pdf-text";

/** The pump-skid example with a 1.5 kN hose pull (group "piping") and a surge case: the pull
 *  doubled and the flow × 1.3, and a sweep of the flow factor from 0 to 3. */
function skid() {
  const d = JSON.parse(readFileSync("canvas/examples/pump-skid.json", "utf8"));
  d.version = 6;
  d.parameters.Q = "3600 lpm";
  d.loads = [{ id: "hose", label: "hose pull", body: "skid", kind: "force", at: [2.6, 0.8], angle: 0, magnitude: "1.5 kN", group: "piping" }];
  d.cases = [
    { id: "duty", name: "Duty" },
    { id: "surge", name: "Surge", flowFactor: 1.3, factors: { piping: 2 } },
  ];
  const sweep = { id: "s1", parameter: "flowFactor", from: 0, to: 3, points: 61, quantities: [{ support: "rear", component: "frictionMargin" }] };
  d.sweeps = [sweep];
  const parsed = parseSketch(d);
  if (!parsed.ok) throw new Error("fixture does not parse");
  return { file: parsed.file, sweep: parsed.file.sweeps![0] };
}

describe("a flow-factor sweep on the calc sheet", () => {
  it("names the flow factor in words in its title, axis and crossing", () => {
    const { file, sweep } = skid();
    const q = sweepQuantities(sweep, []);
    const [marker] = sweepMarkers(file, sweep, q);
    expect(marker.words).toMatch(/^rear bearer: slip \(μ·n − \|t\| reaches zero: the friction is used up\) at flow factor = \d/);
    const { charts } = sweepCharts(file, sweep, "SI", ["rear", "front"]);
    expect(charts[0].title).toMatch(/^flow factor from 0 to 3/);
    expect(charts[0].xLabel).toBe("flow factor");
    expect(JSON.stringify(charts) + marker.words).not.toContain("flowFactor");
  });

  it("says a case whose friction margin is below zero over the whole range slips throughout", () => {
    const { file, sweep } = skid();
    const cells = tableCells(sweepLimitTable(file, sweep).table);
    const slip = (run: string) => cells.find((r) => r[0] === "rear bearer: slip (μ·n − |t| = 0)" && r[1] === run)!;
    // with the pull doubled to 3 kN the rear bearer's friction is used up even with no flow
    // (the solver's own sweep: every point's μ·n − |t| below zero), so it has no crossing
    // closest with no flow (the margin falls as the flow grows), and nothing said of where it heads
    // below a flow factor of 0: there is no flow below none
    expect(slip("Surge").slice(2)).toEqual(["none in 0 … 3", "past it throughout: slipping over the whole range (the margin stays below zero); closest −0.1323 kN at flow factor = 0; moving away from 0 kN past 3"]);
    expect(slip("Duty")[2]).toMatch(/\d/);
  });
});

describe("the Sweep tab's words for a run that never reaches the target", () => {
  it("says which side of the target it stays on", () => {
    expect(noCrossingWords({ min: -3, max: -0.5 }, 0, "0 kN")).toBe("no crossing in this range: below 0 kN throughout");
    expect(noCrossingWords({ min: 0.5, max: 3 }, 0, "0 kN")).toBe("no crossing in this range: above 0 kN throughout");
    expect(noCrossingWords({ min: Number.NaN, max: Number.NaN }, 0, "0 kN")).toBe("no crossing in this range");
  });
});

describe("the calc sheet of the skid", () => {
  it("heads the sweep with the flow factor in words, names a combination's cases, and says the as-drawn case once", async () => {
    const { file } = skid();
    file.combinations = [{ id: "k", name: "Factored surge", terms: [{ case: "duty", factor: 0.9 }, { case: "surge", factor: 1.5 }] }];
    const buf = await buildCalcSheet({
      workspace: "W",
      sketchTitle: "Booster skid",
      version: 1,
      versionMessage: "cases",
      savedAt: new Date("2026-12-01T08:00:00Z"),
      generatedAt: new Date("2026-12-01T08:00:00Z"),
      signoff: [],
      file,
    });
    const { text } = await pdfText(buf);
    expect(text).toContain("Sweep of flow factor — as drawn");
    expect(text).not.toContain("flowFactor");
    // Duty changes nothing: it is the sketch as drawn, named so once
    expect(text).toContain("Duty, as drawn: no changes to the sketch");
    expect(text).not.toContain("as drawn: as drawn");
    // a combination's overlap names its cases as the sheet's tables do (by name, not id)
    expect(text).toContain('Warning: Load group "dead" (the weights) is in Duty (× 0.9) and Surge (× 1.5): it is counted 2.4 times.');
  }, 60000);
});

describe("a flow-factor sweep on a case with its own flow factor", () => {
  it("says on the sheet that the swept factor multiplies the case's own, and in a combination each case's", async () => {
    const { file } = skid();
    file.combinations = [{ id: "k", name: "Factored surge", terms: [{ case: "duty", factor: 0.9 }, { case: "surge", factor: 1.5 }] }];
    file.sweeps = [
      { ...file.sweeps![0], id: "on-surge", case: "surge", points: 11 },
      { ...file.sweeps![0], id: "on-k", combination: "k", points: 11 },
    ];
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Booster skid", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file });
    const { text } = await pdfText(buf);
    const flat = text.replace(/\s+/g, " ");
    expect(flat).toContain("The sweep's flow factor multiplies the case's own (flow × 1.3): each point runs the flow × 1.3·f; everything else is as in the case.");
    expect(flat).toContain("with the sweep's value of flow factor multiplying each of its cases' own (1 unless the case gives one).");
  }, 60000);
});

describe("In every case, a run past the target all along", () => {
  it("is said apart from the one that reaches it first", () => {
    const { file } = skid();
    // the same search the Sweep tab's "In every case" runs: the rear bearer's friction used up, flow factor 0 to 3
    const rows = limitEverywhere(file, "flowFactor", [0, 3], { support: "rear", component: "frictionMargin" });
    expect(rows.map((r) => [r.name, "found" in r.result && r.result.found])).toEqual([
      ["Duty", true],
      ["Surge", false],
    ]);
    expect(sidesWords(rows, 0, "0 kN")).toBe(" Surge stays below 0 kN over the whole range.");
    expect(sidesWords(rows.slice(0, 1), 0, "0 kN")).toBe("");
  });
});
