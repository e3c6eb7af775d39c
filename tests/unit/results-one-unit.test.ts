// One unit per quantity across a result: the reactions table (and its CSV), the hand check, the
// drawing's labels and the calc sheet write every force of one result in one unit, chosen from the
// largest of the result (all forces in kN once any is 1 kN, as a calculation by hand does: common
// practice), and every figure by one rule (4 significant figures, zeros kept), so a checker reading
// a reaction in the table, in the hand check and on the drawing meets the same digits.
import { describe, expect, it } from "vitest";
import { analyseCore } from "@/canvas/analysis/core";
import { EXAMPLES, exampleById } from "@/canvas/examples";
import { drawingFamily } from "@/canvas/render/results";
import { renderSketchSvg } from "@/canvas/render/svg";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { parseSketch } from "@/solver";
import { LBF_N } from "@/solver/constants";
import { cellNumberText, handCheckTable, reactionTable, resultScale, unitFamily } from "@/solver/report";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import { pdfText } from "../support/pdf-text";
import { twoReactions, sharedWeight } from "../fixtures/one-unit";

function solved(file: SketchFile) {
  const core = analyseCore(file);
  if (!core.ok || !core.result) throw new Error(JSON.stringify(core.errors));
  const p = parseSketch(file);
  if (!p.ok) throw new Error("does not parse");
  const scene = buildScene(p.file, fieldValuesById(p.file, p.fields, []));
  return { result: core.result, stability: core.stability, items: scene.items };
}

/** The reactions table's printed cell of a support and column, and its unit. */
function tableCell(file: SketchFile, units: UnitSystem, support: string, key: string) {
  const { result } = solved(file);
  const t = reactionTable(result, units);
  const ci = t.columns.findIndex((c) => c.key === key);
  const row = t.rows.find((r) => r[0] === support)!;
  return `${cellNumberText(t, row[ci] as number)} ${t.columns[ci].unit}`;
}

/** The hand check's printed Fy of a term, with its unit (the table the CSV and the calc sheet use). */
function handCell(file: SketchFile, units: UnitSystem, term: string) {
  const { result } = solved(file);
  const t = handCheckTable(result, "b1", [0, 0], units);
  const ci = t.columns.findIndex((c) => c.key === "fy");
  const row = t.rows.find((r) => String(r[1]).includes(term))!;
  return `${cellNumberText(t, row[ci] as number)} ${t.columns[ci].unit}`;
}

/** The drawing's labels (the SVG renderer's, the canvas's primitives), as the canvas picks their unit. */
function drawingTexts(file: SketchFile, units: UnitSystem): string[] {
  const { result, stability, items } = solved(file);
  const svg = renderSketchSvg(file, result, { units, family: drawingFamily(result, units, items, stability) });
  return [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]);
}

describe("one unit per quantity across a result", () => {
  // a 2 m beam on a pin at (0, 0) and a pad at (2, 0), 5 kN down over the pin and 50 N down over the
  // pad: the pin carries 5 kN and the pad 50 N, each the load over it (statics, common practice)
  // US: 5 kN = 1,124 lbf and 50 N = 11.24 lbf (1 lbf = 4.448222 N, NIST SP 811)
  it("US conversions of the two reactions, to the figures shown", () => {
    expect((5000 / LBF_N).toFixed(2)).toBe("1124.04");
    expect((50 / LBF_N).toFixed(4)).toBe("11.2404");
  });

  it.each([
    ["SI, a 50 N and a 5 kN reaction: 5.000 kN and 0.05000 kN in the table, the hand check and on the drawing", "SI", "5.000 kN", "0.05000 kN"],
    ["US, the same: 5 kN = 1,124 lbf and 50 N = 11.24 lbf in all three (1 lbf = 4.448222 N, NIST SP 811)", "US", "1,124 lbf", "11.24 lbf"],
  ] as const)("%s", (_what, units, pin, pad) => {
    expect(tableCell(twoReactions, units, "pin", "fy")).toBe(pin);
    expect(tableCell(twoReactions, units, "pad", "fy")).toBe(pad);
    expect(handCell(twoReactions, units, "“pin”")).toBe(pin);
    expect(handCell(twoReactions, units, "“pad”")).toBe(pad);
    const labels = drawingTexts(twoReactions, units);
    expect(labels).toContain(pin);
    expect(labels).toContain(pad);
    if (units === "SI") expect(labels.some((t) => /\d N\b/.test(t))).toBe(false);
  });

  // 1.2 kN down at mid-span of the same beam: 600 N on each support (statics, common practice). The
  // reactions alone are below 1 kN, the load they carry is not: the whole result reads in kN
  it("reactions below 1 kN carrying a 1.2 kN load: the table is in kN as the hand check and the drawing are", () => {
    expect(tableCell(sharedWeight, "SI", "pin", "fy")).toBe("0.6000 kN");
    expect(handCell(sharedWeight, "SI", "“pad”")).toBe("0.6000 kN");
    expect(handCell(sharedWeight, "SI", "“load”")).toBe("−1.200 kN");
    const labels = drawingTexts(sharedWeight, "SI");
    expect(labels).toContain("0.6000 kN");
    // the given load is an input, written as typed figures go (zeros dropped), in the result's unit
    expect(labels).toContain("1.2 kN");
    expect(labels.some((t) => /\d N\b/.test(t))).toBe(false);
  });

  it("every example, in both systems: the table, the hand check and the drawing take the result's family", () => {
    for (const { id } of EXAMPLES) {
      for (const units of ["SI", "US"] as const) {
        const file = exampleById(id)!.sketch as SketchFile;
        const { result, stability, items } = solved(file);
        const family = unitFamily(units, resultScale(result, stability));
        expect(drawingFamily(result, units, items, stability), `${id} ${units}`).toEqual(family);
        // the panel passes the result's scale (with its factors of safety) to both tables
        const scale = resultScale(result, stability);
        expect(reactionTable(result, units, { scale }).columns.find((c) => c.key === "fy")!.unit, `${id} ${units}`).toBe(family.force);
        const body = Object.keys(result.bodies)[0];
        expect(handCheckTable(result, body, [40, 25], units, { scale }).columns.find((c) => c.key === "fy")!.unit, `${id} ${units}`).toBe(family.force);
      }
    }
  });

  it("the calc sheet prints the same figures: 5.000 and 0.05000 in kN, 1,124 and 11.24 in lbf", async () => {
    for (const [units, big, small, unit] of [["SI", "5.000", "0.05000", "kN"], ["US", "1,124", "11.24", "lbf"]] as const) {
      const buf = await buildCalcSheet({
        workspace: "Units",
        sketchTitle: "Beam on a pin and a pad",
        version: 1,
        versionMessage: "first",
        savedAt: new Date("2026-12-01T10:00:00Z"),
        generatedAt: new Date("2026-12-01T10:00:00Z"),
        signoff: [],
        file: twoReactions,
        units,
      });
      const { text } = await pdfText(buf);
      // the reactions table's rows and the hand check's terms
      expect(text, units).toMatch(new RegExp(`pin\\s+0\\s+${big}\\s+${big}\\s+—\\s+—\\s+holds`));
      expect(text, units).toMatch(new RegExp(`pad\\s+0\\s+${small}\\s+${small}\\s+${small}\\s+0\\s+bearing`));
      // the drawing's labels
      expect(text, units).toContain(`${big} ${unit} ${big} ${unit}`);
      expect(text, units).toContain(`${small} ${unit} ${small} ${unit}`);
      expect(text, units).toMatch(new RegExp(`reaction at “pad”\\s+0\\s+${small}`));
      expect(text, units).toContain(`Fy (${unit})`);
      expect(text, units).not.toMatch(units === "SI" ? /\(N\)/ : /\(kip\)/);
    }
  }, 60_000);
});
