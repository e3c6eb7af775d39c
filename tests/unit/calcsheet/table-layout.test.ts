// The calc sheet's table layout: no column narrower than its longest word at the size chosen (so
// pdfkit never breaks a word mid-letters), nothing wider than the page, the font shrinking before
// a table is split, and a split table repeating its key columns.
import PDFDocument from "pdfkit";
import { describe, expect, it } from "vitest";
import { registerFonts } from "@/lib/calcsheet/fonts";
import { pdfMeasure } from "@/lib/calcsheet/table";
import { layoutTable, words, type Measure, type TableLayout } from "@/lib/calcsheet/table-layout";
import { parseSketch, solveCases } from "@/solver";
import { caseReactionTable, envelopeTable, stabilityTable, type Table } from "@/solver/report";
import { loadFixture } from "../solver/helpers";
import { longLabelFile } from "./long-labels";

/** A4 less the sheet's margins of 44 pt a side. */
const PAGE = 595.28 - 2 * 44;
const CELL_PAD = 6;

function interMeasure(): Measure {
  const doc = new PDFDocument({ size: "A4" });
  registerFonts(doc);
  return pdfMeasure(doc);
}

/** Every word of every heading and cell fits its column on one line, with pdfkit's own measure
 *  (a word is measured with the space after it, as pdfkit's line wrapper does). */
function expectWordsWhole(t: Table, layout: TableLayout, measure: Measure) {
  for (const part of layout.parts) {
    part.columns.forEach((c, i) => {
      const room = part.widths[i] - CELL_PAD;
      const h = layout.headers[c];
      for (const w of [...words(h.label), ...(h.unit ? [h.unit] : [])]) {
        expect(measure(`${w} `, true, layout.size), `heading word "${w}" of ${t.id}`).toBeLessThanOrEqual(room);
      }
      for (const r of layout.cells) {
        // numbers are never wrapped at all
        const pieces = h.align === "right" ? [r[c]] : words(r[c]);
        for (const w of pieces) expect(measure(`${w} `, false, layout.size), `"${w}" in ${t.columns[c].label} of ${t.id}`).toBeLessThanOrEqual(room);
      }
    });
    expect(part.widths.reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(PAGE + 1e-6);
  }
  // every column is printed
  expect(new Set(layout.parts.flatMap((p) => p.columns))).toEqual(new Set(t.columns.map((_, i) => i)));
}

function study(file: unknown) {
  const parsed = parseSketch(file);
  if (!parsed.ok) throw new Error("the sketch did not parse: " + JSON.stringify(parsed.errors));
  return solveCases(parsed.file);
}

/** The trailer fixture with several cases and a combination (demo data). */
function trailerStudy() {
  const file = loadFixture("fire-monitor-trailer.json");
  file.cases = [
    { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
    { id: "high", name: "High throw at full flow", parameters: { theta: "60 deg" } },
    { id: "reduced", name: "Reduced flow", parameters: { Q: "1200 gpm" } },
  ];
  file.combinations = [{ id: "k1", name: "Factored low throw", terms: [{ case: "low", factor: 1.4 }] }];
  return study(file);
}

/** The pump set with long support ids and long case names (demo data). */
function longLabelStudy() {
  const file = longLabelFile();
  return study(file);
}

describe("calc sheet table layout, measured in Inter as pdfkit draws it", () => {
  const measure = interMeasure();

  it("fits the cases table of a study on the page at the base size, every heading and word whole", () => {
    const t = caseReactionTable(trailerStudy(), "SI");
    const layout = layoutTable(t, { width: PAGE, measure });
    expect(layout.parts).toHaveLength(1);
    expect(layout.size).toBe(7.5);
    expectWordsWhole(t, layout, measure);
    // the column the old layout squeezed to "Supp/ort", and the state words ("beari/ng")
    const support = layout.parts[0].columns.indexOf(1);
    expect(layout.parts[0].widths[support] - CELL_PAD).toBeGreaterThanOrEqual(measure("Support ", true, 7.5));
    const state = layout.parts[0].columns.indexOf(8);
    expect(layout.parts[0].widths[state] - CELL_PAD).toBeGreaterThanOrEqual(measure("bearing ", false, 7.5));
    // numbers right, words left, units on their own heading line
    expect(layout.headers.map((h) => h.align)).toEqual(["left", "left", "right", "right", "right", "right", "right", "right", "left", "left"]);
    expect(layout.headers[2]).toMatchObject({ label: "Fx", unit: "(kN)" });
    // a symbol stays with its word
    expect(layout.headers[6].label).toBe("Normal\u00a0n");
  });

  it("splits the cases table with long support ids into stacked parts that repeat the case and the support", () => {
    const t = caseReactionTable(longLabelStudy(), "US");
    const layout = layoutTable(t, { width: PAGE, measure });
    expect(layout.parts.length).toBeGreaterThan(1);
    for (const p of layout.parts) expect(p.columns.slice(0, 2)).toEqual([0, 1]);
    expect(layout.overflow).toEqual([]);
    expectWordsWhole(t, layout, measure);
    // the long id is printed whole
    expect(layout.cells.some((r) => r[1] === "leftRubberBearingPadUnderEngine")).toBe(true);
  });

  it("keeps the envelope and stability tables whole and readable", () => {
    for (const t of [envelopeTable(longLabelStudy(), "US"), stabilityTable(trailerStudy(), "SI"), envelopeTable(trailerStudy(), "SI")]) {
      const layout = layoutTable(t, { width: PAGE, measure });
      expect(layout.parts, t.id).toHaveLength(1);
      expectWordsWhole(t, layout, measure);
    }
  });
});

describe("calc sheet table layout, with a measure worked by hand", () => {
  // every character 0.5 em wide: "word " of n letters is (n + 1) × size / 2 points
  const measure: Measure = (text, _bold, size) => (text.length * size) / 2;
  const table = (columns: number, label = "Value"): Table => ({
    id: "t",
    title: "t",
    columns: [{ key: "name", label: "Name", align: "left" }, ...Array.from({ length: columns }, (_, i) => ({ key: `c${i}`, label: `${label}${i}`, unit: "kN" }))],
    rows: [["first", ...Array.from({ length: columns }, () => 123.456)]],
  });

  it("keeps the base size when the table fits", () => {
    // min of a number column: "123.5 " = 6 chars × 3.75 = 22.5, + padding 6.5 = 29; heading "Value0 " = 7 × 3.75 = 26.25 bold
    const layout = layoutTable(table(3), { width: 300, measure, size: 7.5 });
    expect(layout.size).toBe(7.5);
    expect(layout.parts).toHaveLength(1);
    expect(layout.minWidths[1]).toBeCloseTo(7 * 3.75 + 6.5, 6);
    const sum = layout.parts[0].widths.reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo(300, 6);
  });

  it("shrinks the font a step before it splits the table", () => {
    // 8 number columns at 7.5 pt need 8 × (7 × 3.75 + 6.5) = 262 pt plus the name column
    // ("first " and "Name " → 6 × 3.75 + 6.5 = 29): 291 pt. At 7 pt: 8 × (7 × 3.5 + 6.5) + (6 × 3.5 + 6.5) = 275.5 pt.
    const layout = layoutTable(table(8), { width: 280, measure, size: 7.5, minSize: 6.5, step: 0.5 });
    expect(layout.size).toBe(7);
    expect(layout.parts).toHaveLength(1);
  });

  it("splits a table wider than the page at the smallest size, repeating its key column", () => {
    // 20 number columns at 6.5 pt need 20 × (7 × 3.25 + 6.5) = 585 pt: more than 300
    const t = table(20);
    const layout = layoutTable(t, { width: 300, measure, size: 7.5, minSize: 6.5 });
    expect(layout.size).toBe(7.5);
    expect(layout.parts.length).toBe(3);
    for (const p of layout.parts) {
      expect(p.columns[0]).toBe(0);
      expect(p.widths.reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(300 + 1e-9);
    }
    expect(layout.parts.flatMap((p) => p.columns.slice(1))).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
  });

  it("gives every column at least its longest word", () => {
    const t: Table = {
      id: "w",
      title: "w",
      columns: [
        { key: "a", label: "Case", align: "left" },
        { key: "b", label: "Governs", align: "left" },
      ],
      rows: [["short", "one extraordinarily long word here"]],
    };
    const layout = layoutTable(t, { width: 120, measure, size: 8 });
    // "extraordinarily " is 16 chars × 4 = 64, + 6.5 padding
    expect(layout.parts[0].widths[1]).toBeGreaterThanOrEqual(16 * 4 + 6.5 - 1e-9);
  });

  it("names the table when the width is not usable", () => {
    expect(() => layoutTable(table(1), { width: 0, measure })).toThrow(/table t: the width must be more than zero/);
  });
});
