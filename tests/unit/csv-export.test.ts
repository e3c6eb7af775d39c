// The CSV downloads of the result tables: a UTF-8 byte order mark so a spreadsheet reads −, °, ·,
// μ and ▲ as written, and number columns that hold numbers only, every one at full precision.
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { csvOf, UTF8_BOM } from "@/components/studies/csv";
import { DEMO_SKETCHES, demoVersions } from "@/db/seed-sketches";
import { tableCells } from "@/lib/calcsheet/table-layout";
import { parseSketch, solve, solveCases } from "@/solver";
import { G0 } from "@/solver/constants";
import { caseReactionTable, designLoadTable, envelopeTable, handCheckTable, reactionTable, stabilityTable, type Table } from "@/solver/report";

/** The washing cart's first version (invented demo): four cases, one of them with the pump off. */
function cart() {
  const doc = demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith("a5"))!)[0].doc;
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p;
}

/** The CSV's rows back, without the byte order mark. */
const rowsOf = (csv: string) => Papa.parse<string[]>(csv.slice(UTF8_BOM.length), { skipEmptyLines: true }).data;

/** Number columns: the report aligns them right (text columns left). */
const numberColumns = (t: Table) => t.columns.flatMap((c, i) => ((c.align ?? "right") === "right" ? [i] : []));

describe("a table's CSV", () => {
  const p = cart();
  const study = solveCases(p.file);
  const result = solve(p.sketch);
  const tables = [
    reactionTable(result, "SI"),
    caseReactionTable(study, "SI"),
    envelopeTable(study, "SI"),
    designLoadTable(study, "SI"),
    stabilityTable(study, "SI"),
    handCheckTable(result, "cart", [0.06, 0.12], "SI"),
  ];

  it("starts with the UTF-8 byte order mark (EF BB BF), then the header with its units", () => {
    const csv = csvOf(caseReactionTable(study, "SI"));
    expect([...Buffer.from(csv, "utf8").subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(csv.startsWith(`${UTF8_BOM}Case,Support,Fx (N),Fy (N),Resultant (N),M (N·m),`)).toBe(true);
    // the symbols the BOM is there for come through as written
    expect(csv).toContain("▲");
    expect(csv).toContain("−75°");
  });

  it("holds in every number column a number at full precision, or nothing: no ∞, no words", () => {
    for (const t of tables) {
      const back = rowsOf(csvOf(t)).slice(1);
      expect(back, t.id).toHaveLength(t.rows.length);
      expect(csvOf(t), t.id).not.toContain("∞");
      for (const ci of numberColumns(t)) {
        back.forEach((row, ri) => {
          const cell = t.rows[ri][ci];
          const at = `${t.id} row ${ri} ${t.columns[ci].key}: ${row[ci]}`;
          if (typeof cell === "number") {
            // the double itself, not 4 or 6 figures of it
            expect(Number(row[ci]), at).toBe(cell === 0 ? 0 : cell);
            expect(row[ci], at).toBe(String(cell === 0 ? 0 : cell));
          } else expect([null, undefined], at).toContain(cell);
          if (cell === null) expect(row[ci], at).toBe("");
        });
      }
    }
  });

  it("gives the factor of safety unrounded, as the moments beside it, and says a factor without bound in words in its own column", () => {
    const t = stabilityTable(study, "SI");
    const col = (key: string) => t.columns.findIndex((c) => c.key === key);
    const back = rowsOf(csvOf(t));
    const row = (caseName: string, check: string) => back.find((r) => r[col("case")] === caseName && r[col("check")] === check)!;
    // aimed down at −75°, as drawn in v1: restoring W·(0.28 − 0.06) m about the rear wheels
    // (overturning about the heel, statics: common practice), 85 kg × g0 × 0.22 m = 183.38 N·m
    const down = row("Lance aimed down at −75° (tank foot)", "overturning");
    expect(Number(down[col("resisting")])).toBeCloseTo(85 * G0 * 0.22, 9);
    const run = study.runs.find((r) => r.id === "aimed-down")!;
    const ot = run.ok ? run.stability.cart.overturning : null;
    if (!ot || "notApplicable" in ot) throw new Error("the cart has an overturning check");
    expect(down[col("factor")]).toBe(String(ot.factor));
    expect(down[col("factor")].replace(/^0\.|\./, "").length).toBeGreaterThan(6);
    expect(Number(down[col("factor")])).toBeCloseTo(Number(down[col("resisting")]) / Number(down[col("acting")]), 12);
    // the pump off: nothing drives the cart to slide, μ·n over 0 has no bound; the number column is
    // empty and the note says why, the verdict stays a verdict
    const parked = row("Pump off (parked)", "sliding");
    expect(parked[col("acting")]).toBe("0");
    expect(parked[col("factor")]).toBe("");
    expect(parked[col("verdict")]).toBe("pass");
    expect(parked[col("note")]).toBe("no force drives it to slide: the factor has no bound");
    expect(back[0][col("note")]).toBe("Tips about, or note");
  });

  it("keeps a hand check's rounding noise a number, while the sheet prints it as rounding", () => {
    const t = handCheckTable(result, "cart", [0.06, 0.12], "SI");
    const last = t.rows.length - 1;
    const noisy = (["fx", "fy", "m"] as const).filter((k) => t.marks?.[last]?.[k]?.shown);
    expect(noisy.length).toBeGreaterThan(0);
    const back = rowsOf(csvOf(t));
    for (const k of noisy) {
      const ci = t.columns.findIndex((c) => c.key === k);
      expect(Number.isFinite(Number(back[last + 1][ci])), back[last + 1][ci]).toBe(true);
      expect(Math.abs(Number(back[last + 1][ci]))).toBeLessThan(1e-9);
      expect(tableCells(t)[last][ci]).toMatch(/^−?\d(\.\d)?e-\d+ \(rounding\)$/);
    }
  });
});
