// The calc sheet PDF: its text, extracted with pdfjs-dist, carries the title block, the hand-check
// sums, the reactions with units, ṁ and μ in the embedded font, and the cautions.
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { runLimit } from "@/canvas/studies/run";
import { formatNumber } from "@/solver/units";
import { tableCells } from "@/lib/calcsheet/table-layout";
import { parseSketch, solveCases } from "@/solver";
import { caseReactionTable, designLoadTable, envelopeTable, stabilityTable, type Table } from "@/solver/report";
import { loadFixture } from "../solver/helpers";
import { longLabelFile } from "./long-labels";

async function pdfText(buf: Buffer): Promise<{ text: string; pages: number }> {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data: new Uint8Array(buf), useSystemFonts: false, isEvalSupported: false }).promise;
  let text = "";
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    const content = await page.getTextContent();
    text += content.items.map((it) => ("str" in it ? it.str : "")).join(" ") + "\n";
  }
  return { text: text.replace(/\s+/g, " "), pages: doc.numPages };
}

interface PageItem {
  str: string;
  /** left edge and width (pt) */
  x: number;
  width: number;
}

async function pdfItems(buf: Buffer): Promise<{ pages: PageItem[][]; pageWidth: number }> {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data: new Uint8Array(buf), useSystemFonts: false, isEvalSupported: false }).promise;
  const pages: PageItem[][] = [];
  let pageWidth = 0;
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    pageWidth = page.view[2];
    const content = await page.getTextContent();
    pages.push(content.items.flatMap((it) => ("str" in it && it.str.trim() ? [{ str: it.str, x: it.transform[4], width: it.width }] : [])));
  }
  return { pages, pageWidth };
}

/** The pump set with long support ids, long case names, a combination and a sweep (demo data). */
function longLabelFileWithStudies() {
  const file = longLabelFile();
  file.combinations = [{ id: "c", name: "Duty point with the dead load factored", terms: [{ case: "duty", factor: 1.2 }] }];
  file.sweeps = [{ id: "s", parameter: "mdot", from: 0, to: 60, points: 31, quantities: [{ support: "holdDownStrapToFloorAnchor", component: "margin" }] }];
  return file;
}

/** A word printed as two pieces ("Supp ort", "beari ng"): what a squeezed column does. */
function brokenWords(text: string, tables: Table[]): string[] {
  const found = new Set<string>();
  for (const t of tables) {
    const all = [...t.columns.map((c) => c.label), ...tableCells(t).flat()];
    for (const w of all.flatMap((s) => s.split(/\s+/))) {
      for (let k = 2; k <= w.length - 2; k++) if (text.includes(` ${w.slice(0, k)} ${w.slice(k)} `)) found.add(`${w.slice(0, k)}/${w.slice(k)}`);
    }
  }
  return [...found];
}

describe("calc sheet PDF", () => {
  it("has the title block, inputs, hand check, reactions with units, cases, sweeps and cautions", async () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
      { id: "high", name: "High throw", parameters: { theta: "60 deg" } },
    ];
    file.sweeps = [{ id: "sw", parameter: "theta", from: 0, to: 80, points: 41, quantities: [{ support: "jack", component: "margin" }] }];
    const buf = await buildCalcSheet({
      workspace: "Demo: Riverside Pump Station",
      sketchTitle: "Monitor trailer",
      version: 3,
      versionMessage: "raised the riser to 2.8 m",
      savedAt: new Date("2026-11-30T10:00:00Z"),
      generatedAt: new Date("2026-12-01T08:00:00Z"),
      signoff: [
        { role: "prepared", name: "Eddie Editor", at: new Date("2026-11-30T10:00:00Z") },
        { role: "checked", name: "Chen Checker", at: new Date("2026-11-30T15:30:00Z") },
      ],
      file,
    });
    expect(buf.subarray(0, 5).toString()).toBe("%PDF-");
    const { text, pages } = await pdfText(buf);
    expect(pages).toBeGreaterThan(1);
    expect(text).toContain("COUNTERPOISE · CALCULATION SHEET");
    expect(text).toContain("Monitor trailer");
    expect(text).toContain("Workspace: Demo: Riverside Pump Station");
    expect(text).toContain("Version 3 — raised the riser to 2.8 m");
    expect(text).toMatch(/Prepared by Eddie Editor, 2026-11-30 10:00 UTC/);
    expect(text).toMatch(/Checked by Chen Checker, 2026-11-30 15:30 UTC/);
    expect(text).toMatch(/Approved by —/);
    // the font carries Σ, ṁ and μ
    expect(text).toMatch(/ΣFx = 4\.847 kN and Σ\(ṁV\)x = 4\.847 kN/);
    expect(text).toContain("total Σ(ṁV)out − Σ(ṁV)in");
    expect(text).toContain("μ·n");
    // reactions with units
    expect(text).toMatch(/Fx \(kN\)/);
    expect(text).toMatch(/Design load \(kN\)/);
    expect(text).toContain("Low throw");
    expect(text).toContain("High throw");
    expect(text).toMatch(/Sweep of theta/);
    expect(text).toMatch(/Crossing: jack at \d+(\.\d+)? deg/);
    // cautions
    expect(text).toContain("must be reviewed by a qualified engineer");
    expect(text).toContain("Local codes, standards and licensed engineering practice govern");
    expect(text).toContain("water hammer");
  }, 60000);

  it("names the governing cases, leaves a tipping case out of the envelope, warns of a load counted twice, sweeps on the saved case", async () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "normal", name: "Normal", parameters: { Q: "2000 gpm" } },
      { id: "flood", name: "Flood flow", parameters: { Q: "4000 gpm" } },
      { id: "more", name: "More flow", parameters: { Q: "2500 gpm" } },
    ];
    // two whole cases in one combination: the weight is counted 1.2 + 1.5 = 2.7 times
    file.combinations = [{ id: "k", name: "Both", terms: [{ case: "normal", factor: 1.2 }, { case: "more", factor: 1.5 }] }];
    file.sweeps = [{ id: "sw", parameter: "theta", from: 0, to: 80, points: 41, case: "more", quantities: [{ support: "jack", component: "margin" }] }];
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Trailer", version: 1, savedAt: new Date(), signoff: [], file });
    const { text } = await pdfText(buf);
    // the flood case tips (the trailer is not held): named, and left out
    expect(text).toContain("Flood flow — trailer tips: not in the envelope or the design loads; the body is not held in this case");
    expect(text).toContain('Warning: Load group "dead" (the weights) is in normal (× 1.2) and more (× 1.5): it is counted 2.7 times.');
    // the envelope names the case of each max and min; the cases table marks the governing cells by shape
    expect(text).toContain("Case of max");
    expect(text).toContain("Governing case");
    expect(text).toMatch(/▲ [−\d]/);
    // the stability figures behind each factor
    expect(text).toContain("Restoring M / friction available");
    // the saved sweep runs on its case: the jack lifts where the limit finder says for "More flow"
    const lim = runLimit(file, { parameter: "theta", from: 0, to: 80, caseId: "more", quantity: { support: "jack", component: "margin" }, target: 0 });
    if (!lim.found) throw new Error("expected a crossing");
    expect(text).toContain("Sweep of theta — case More flow");
    expect(text).toContain(`Crossing: jack at ${formatNumber(lim.value, 4)} deg`);
  }, 60000);

  it("US customary units on request", async () => {
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Bend", version: 1, savedAt: new Date(), signoff: [], file: loadFixture("pipe-bend-anchor.json"), units: "US" });
    const { text } = await pdfText(buf);
    expect(text).toMatch(/Fx \(lbf\)/);
  }, 60000);

  it("prints every table word whole, inside the margins, with the cautions on every page", async () => {
    const file = longLabelFileWithStudies();
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Pump set", version: 2, savedAt: new Date(), signoff: [], file, units: "US" });
    const { text } = await pdfText(buf);
    const { pages, pageWidth } = await pdfItems(buf);
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error("the sketch did not parse");
    const study = solveCases(parsed.file);
    const tables = [caseReactionTable(study, "US"), envelopeTable(study, "US"), designLoadTable(study, "US"), stabilityTable(study, "US")];
    // the old layout printed "Supp ort", "beari ng" and "leftRubberBearingPa dUnderEngine"
    expect(brokenWords(text, tables)).toEqual([]);
    for (const w of ["Support", "bearing", "Tangential t", "leftRubberBearingPadUnderEngine", "rightRubberBearingPadUnderPump", "holdDownStrapToFloorAnchor"]) expect(text).toContain(` ${w} `);
    // the wide cases table comes in stacked parts that say so
    expect(text).toMatch(/Part 1 of \d: the table is too wide for the page; each part repeats Case and Support\./);
    expect(text).toMatch(/Part 2 of \d: the same rows, more columns\./);
    // units on the heading's second line still read as "Fx (lbf)"
    expect(text).toMatch(/Fx \(lbf\)/);
    expect(pages.length).toBeGreaterThan(2);
    pages.forEach((items, i) => {
      const words = items.map((it) => it.str).join(" ").replace(/\s+/g, " ");
      // the short caution in the footer of every page
      expect(words, `page ${i + 1}`).toContain("for design checking; review by a qualified engineer required; local codes govern");
      // nothing past the 44 pt margins (1 pt for rounding)
      for (const it of items) {
        expect(it.x, `"${it.str}" on page ${i + 1}`).toBeGreaterThanOrEqual(44 - 1);
        expect(it.x + it.width, `"${it.str}" on page ${i + 1}`).toBeLessThanOrEqual(pageWidth - 44 + 1);
      }
    });
  }, 60000);

  it("prints the trailer's case, envelope and stability tables with no word broken", async () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
      { id: "high", name: "High throw at full flow", parameters: { theta: "60 deg" } },
    ];
    file.combinations = [{ id: "k1", name: "Factored low throw", terms: [{ case: "low", factor: 1.4 }] }];
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Trailer", version: 1, savedAt: new Date(), signoff: [], file });
    const { text } = await pdfText(buf);
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error("the sketch did not parse");
    const study = solveCases(parsed.file);
    expect(brokenWords(text, [caseReactionTable(study, "SI"), envelopeTable(study, "SI"), designLoadTable(study, "SI"), stabilityTable(study, "SI")])).toEqual([]);
    expect(text).toMatch(/ Support Fx \(kN\)| Case Support /);
    expect(text).toContain(" bearing ");
    expect(text).toContain("Restoring M / friction available");
  }, 60000);
});
