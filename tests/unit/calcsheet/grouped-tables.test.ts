// Long case and support names on the calc sheet: a table grouped by its first column prints the
// name once across the width, so the rows under it are not made three lines tall by a narrow name
// column; and the M column of the studies' tables is there only when a fixed support can carry a
// moment.
import PDFDocument from "pdfkit";
import { describe, expect, it } from "vitest";
import { registerFonts } from "@/lib/calcsheet/fonts";
import { groupRows, pdfMeasure } from "@/lib/calcsheet/table";
import { layoutTable, type TableLayout } from "@/lib/calcsheet/table-layout";
import { hasMomentSupport, withoutAbsentMoment } from "@/canvas/studies/tables";
import { parseSketch, solveCases, type SketchFileInput } from "@/solver";
import { caseReactionTable, designLoadTable, envelopeTable } from "@/solver/report";
import { loadFixture } from "../solver/helpers";
import { longLabelFileWithStudies, VERY_LONG_CASE } from "./long-labels";

/** A4 less the sheet's margins of 44 pt a side. */
const PAGE = 595.28 - 2 * 44;
const CELL_PAD = 6;

function study(file: SketchFileInput) {
  const parsed = parseSketch(file);
  if (!parsed.ok) throw new Error("the sketch did not parse");
  return solveCases(parsed.file);
}

/** The most lines any cell of the named columns wraps to, as pdfkit wraps it (cells passing `only`). */
function tallestCell(layout: TableLayout, labels: string[], only: (text: string) => boolean = () => true): number {
  const doc = new PDFDocument({ size: "A4" });
  registerFonts(doc);
  doc.font("Inter").fontSize(layout.size);
  const line = doc.heightOfString("Xg", { width: 1000 });
  let most = 0;
  for (const part of layout.parts) {
    part.columns.forEach((c, i) => {
      if (!labels.includes(layout.headers[c].label)) return;
      for (const r of layout.cells) if (only(r[c])) most = Math.max(most, Math.round(doc.heightOfString(r[c], { width: part.widths[i] - CELL_PAD }) / line));
    });
  }
  return most;
}

describe("tables grouped by their first column", () => {
  it("prints each support once over its rows, so the envelope with long case names stays one readable table", () => {
    const s = study(longLabelFileWithStudies());
    const env = envelopeTable(s, "SI");
    const grouped = groupRows(env, "support");
    if (!grouped) throw new Error("expected the envelope to group");
    expect(grouped.table.columns.map((c) => c.key)).toEqual(["component", "unit", "max", "maxCase", "min", "minCase", "governs"]);
    expect(grouped.table.rows).toHaveLength(env.rows.length);
    expect([...new Set(grouped.groups)]).toEqual(["Support: leftRubberBearingPadUnderEngine", "Support: rightRubberBearingPadUnderPump", "Support: holdDownStrapToFloorAnchor"]);

    const doc = new PDFDocument({ size: "A4" });
    registerFonts(doc);
    const measure = pdfMeasure(doc);
    const caseColumns = ["Case of max", "Case of min", "Governing case"];
    expect(env.rows.some((r) => r.includes(VERY_LONG_CASE))).toBe(true);
    // with the support a column of its own (a third of the page for its long id), the case names
    // squeeze the table into two stacked parts: the governing case lands away from its row
    expect(layoutTable(env, { width: PAGE, measure }).parts.length).toBeGreaterThan(1);
    // grouped, it is one table at the base size, every word whole; the ordinary names (up to 36
    // characters) take two lines at most, and the 98-character one four
    const byGroup = layoutTable(grouped.table, { width: PAGE, measure });
    expect(byGroup.parts).toHaveLength(1);
    expect(byGroup.size).toBe(7.5);
    expect(byGroup.overflow).toEqual([]);
    expect(tallestCell(byGroup, caseColumns, (t) => t !== VERY_LONG_CASE)).toBeLessThanOrEqual(2);
    expect(tallestCell(byGroup, caseColumns)).toBeLessThanOrEqual(4);
  });

  it("fits the cases table with long support ids in one part once the case is a heading", () => {
    const s = study(longLabelFileWithStudies());
    const doc = new PDFDocument({ size: "A4" });
    registerFonts(doc);
    const measure = pdfMeasure(doc);
    const t = withoutAbsentMoment(caseReactionTable(s, "US"), s);
    expect(layoutTable(t, { width: PAGE, measure }).parts.length).toBeGreaterThan(1);
    const grouped = groupRows(t, "case")!;
    expect(layoutTable(grouped.table, { width: PAGE, measure }).parts).toHaveLength(1);
    expect(grouped.groups).toContain(`Case: ${VERY_LONG_CASE}`);
  });

  it("leaves a table alone when it has no such column", () => {
    const s = study(longLabelFileWithStudies());
    expect(groupRows(designLoadTable(s, "SI"), "body")).toBeNull();
  });
});

describe("the M column of the studies' tables", () => {
  it("is left out when no support is fixed, from the cases, envelope and design-load tables", () => {
    const s = study(loadFixture("fire-monitor-trailer.json"));
    expect(hasMomentSupport(s)).toBe(false);
    for (const t of [caseReactionTable(s, "SI"), designLoadTable(s, "SI")]) {
      const out = withoutAbsentMoment(t, s);
      expect(out.columns.map((c) => c.key)).not.toContain("m");
      expect(out.rows.every((r) => r.length === out.columns.length)).toBe(true);
      expect((out.marks ?? []).every((m) => !m || !("m" in m))).toBe(true);
    }
    const env = withoutAbsentMoment(envelopeTable(s, "SI"), s);
    expect(env.rows.map((r) => r[1])).not.toContain("M");
  });

  it("is kept for a fixed support whose moment is zero", () => {
    // the bend's anchor sits where the pipe axes meet, with no gravity: every force passes
    // through it, so its moment is zero (statics, common practice)
    const s = study(loadFixture("pipe-bend-anchor.json"));
    expect(hasMomentSupport(s)).toBe(true);
    const run = s.runs[0];
    if (!run.ok) throw new Error("the sketch did not solve");
    expect(Math.abs(run.result.reactions.anchor.m)).toBeLessThan(1e-6);
    const t = withoutAbsentMoment(caseReactionTable(s, "SI"), s);
    expect(t.columns.find((c) => c.key === "m")?.unit).toBe("kN·m");
    expect(t.rows[0][t.columns.findIndex((c) => c.key === "m")]).toBeCloseTo(0, 9);
    expect(withoutAbsentMoment(envelopeTable(s, "SI"), s).rows.map((r) => r[1])).toContain("M");
  });
});
