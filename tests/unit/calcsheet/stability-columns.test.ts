// The Stability table of the calc sheet: a check that does not apply says "n/a" in its Verdict
// column and why in the note column beside it (the verdict stays one short word, the reason has
// the wide column), and a short name (a body's "Pump set") is not broken over two lines.
import PDFDocument from "pdfkit";
import { describe, expect, it } from "vitest";
import { registerFonts } from "@/lib/calcsheet/fonts";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { pdfMeasure } from "@/lib/calcsheet/table";
import { layoutTable } from "@/lib/calcsheet/table-layout";
import { parseSketch, solveCases } from "@/solver";
import { NOT_APPLICABLE, stabilityTable } from "@/solver/report";
import { loadFixture } from "../solver/helpers";
import { pdfText } from "../../support/pdf-text";

/** A4 less the sheet's margins of 44 pt a side. */
const PAGE = 595.28 - 2 * 44;

function stabilityOf(name: string) {
  const parsed = parseSketch(loadFixture(name));
  if (!parsed.ok) throw new Error(parsed.errors[0].message);
  return stabilityTable(solveCases(parsed.file), "SI");
}

describe("calc sheet stability table", () => {
  it("puts a check that does not apply as n/a, with its reason in the note column", () => {
    const t = stabilityOf("pump-set-hold-down.json");
    const col = (key: string) => t.columns.findIndex((c) => c.key === key);
    const tipping = t.rows.find((r) => r[col("check")] === "overturning")!;
    expect(tipping[col("verdict")]).toBe(NOT_APPLICABLE);
    // a tie over the top holds the set down (statics: a tension member resists overturning, common practice)
    expect(tipping[col("note")]).toBe("tipping is prevented by the tie “hold-down strap”");
    // a check that applies keeps its word and no note
    const sliding = t.rows.find((r) => r[col("check")] === "sliding")!;
    expect(sliding[col("verdict")]).toBe("pass");
    expect(sliding[col("note")]).toBe("");
  });

  it("gives the reason the wide column and keeps the verdict and a two-word body name on one line", () => {
    const t = stabilityOf("pump-set-hold-down.json");
    const doc = new PDFDocument({ size: "A4" });
    registerFonts(doc);
    const measure = pdfMeasure(doc);
    const layout = layoutTable(t, { width: PAGE, measure });
    expect(layout.parts).toHaveLength(1);
    const [part] = layout.parts;
    const widthOf = (key: string) => part.widths[part.columns.indexOf(t.columns.findIndex((c) => c.key === key))];
    // 6 pt of cell padding: "Pump set" and "overturning" fit whole on a line
    expect(widthOf("body") - 6).toBeGreaterThanOrEqual(measure("Pump set", false, layout.size));
    expect(widthOf("check") - 6).toBeGreaterThanOrEqual(measure("overturning", false, layout.size));
    expect(widthOf("note")).toBeGreaterThan(2 * widthOf("verdict"));
  });

  it("prints n/a and the reason on one row of the sheet", async () => {
    const buf = await buildCalcSheet({
      workspace: "Demo",
      sketchTitle: "Pump set on its strap",
      version: 1,
      savedAt: new Date("2026-11-30T10:00:00Z"),
      generatedAt: new Date("2026-12-01T08:00:00Z"),
      signoff: [],
      file: loadFixture("pump-set-hold-down.json"),
    });
    const { text } = await pdfText(buf);
    expect(text).toMatch(/Pump set overturning — — — — n\/a tipping is prevented by the tie/);
  });
});
