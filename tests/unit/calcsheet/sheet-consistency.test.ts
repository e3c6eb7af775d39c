// One calc sheet reads as one document: one unit family for its forces and moments, chosen once
// from its largest value; a case that is the sketch as drawn said once; the inputs in the words
// of the properties form and gravity in the sheet's units; and a footer whose lines each fit.
import PDFDocument from "pdfkit";
import { beforeAll, describe, expect, it } from "vitest";
import { fieldWords } from "@/components/editor/fieldDefs";
import { DEMO_SKETCHES, demoVersions } from "@/db/seed-sketches";
import { registerFonts } from "@/lib/calcsheet/fonts";
import { buildCalcSheet, FOOTER_CAUTION, FOOTER_SIZE, footerLines } from "@/lib/calcsheet/pdf";
import { asDrawnStudy, parseSketch, solve, solveCases } from "@/solver";
import { G0 } from "@/solver/constants";
import { asDrawnTwin, handCheckScale, handCheckTable, inputsTable, largestScale, stabilityTable, studyScale, unitFamily } from "@/solver/report";
import { loadFixture } from "../solver/helpers";
import { pdfItems, pdfText } from "../../support/pdf-text";

/** A demo sketch's version (invented demo scenarios): "a5" is the washing cart, "a2" the monitor trailer. */
const demo = (id: string, version: number) => demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith(id))!)[version - 1].doc;

const sheet = (id: string, version: number, units: "SI" | "US") =>
  buildCalcSheet({ workspace: "W", sketchTitle: DEMO_SKETCHES.find((s) => s.id.endsWith(id))!.title, version, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file: demo(id, version), units });

const count = (text: string, what: string) => text.split(what).length - 1;

const parsedOf = (doc: unknown) => {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p;
};

let cartV1: { text: string; buf: Buffer } = { text: "", buf: Buffer.alloc(0) };
let cartV1US = "";
let cartV3 = "";
let trailerUS = "";
beforeAll(async () => {
  const buf = await sheet("a5", 1, "SI");
  cartV1 = { text: (await pdfText(buf)).text, buf };
  cartV1US = (await pdfText(await sheet("a5", 1, "US"))).text;
  cartV3 = (await pdfText(await sheet("a5", 3, "SI"))).text;
  trailerUS = (await pdfText(await sheet("a2", 3, "US"))).text;
}, 120000);

describe("one unit family for the whole sheet", () => {
  it("the ballasted cart (weight 1.422 kN, reactions up to 1.062 kN, factor figures below 1 kN): kN and kN·m everywhere, its factors of safety too", () => {
    // before, the factors of safety were printed in N and N·m beside reactions and a hand check in kN
    expect(cartV3).toContain("Forces in kN and moments in kN·m in every table, chart and drawing of this sheet");
    expect(cartV3).not.toMatch(/\((N|N·m|N·m \/ N)\)/);
    expect(cartV3).toMatch(/Fx \(kN\)/);
    expect(cartV3).toMatch(/\(kN·m \/ kN\)/);
    // restoring moment about the rear wheels: W·(0.28 − 0.06) m = 145 kg × g0 × 0.22 m = 0.3128 kN·m
    // (statics, common practice); the jet turns it back with 0.2020 kN·m: factor 1.549
    expect(((145 * G0 * 0.22) / 1000).toFixed(4)).toBe("0.3128");
    expect(cartV3).toMatch(/overturning 0\.3128 0\.2020 kN·m 1\.549 1\.500 pass/);
  });

  it("the light cart (weight 833.6 N, everything below 1 kN): N and N·m everywhere", () => {
    expect(cartV1.text).toContain("Forces in N and moments in N·m in every table, chart and drawing of this sheet");
    expect(cartV1.text).not.toMatch(/\((kN|kN·m|kN·m \/ kN)\)/);
    // 85 kg × g0 × 0.22 m = 183.4 N·m restoring (statics, common practice)
    expect(cartV1.text).toMatch(/overturning 183\.4 139\.8 N·m 1\.311 1\.500 FAIL/);
  });

  it("the monitor trailer in US units (a restoring moment past 10 kip·ft): kip and kip·ft in the hand check, the cases and the factors of safety alike", () => {
    // before, the hand check and the factors of safety were in kip while the reactions were in lbf
    expect(trailerUS).toContain("Forces in kip and moments in kip·ft in every table, chart and drawing of this sheet");
    expect(trailerUS).not.toMatch(/\((lbf|lbf·ft|lbf·ft \/ lbf)\)/);
    expect(count(trailerUS, "(kip)")).toBeGreaterThanOrEqual(4);
    expect(trailerUS).toMatch(/\(kip·ft \/ kip\)/);
    // the drawing's reaction labels and the result's sentences too: no figure in lbf anywhere
    expect(trailerUS).not.toMatch(/\d lbf\b/);
    expect(trailerUS).toMatch(/\d kip\b/);
  });

  it("the tables take the sheet's scale when given one, and the scale is the largest of its parts", () => {
    const p = parsedOf(demo("a5", 3));
    const study = solveCases(p.file);
    const result = solve(p.sketch);
    const own = stabilityTable(study, "SI");
    // on its own the stability table is in N (its largest figure, 632.4 N of friction, is below 1 kN)
    expect(own.rows[0][5]).toBe("N·m");
    const hand = handCheckScale(result.equations.cart, [0.06, 0.12]);
    // the hand check's largest force is the weight: 145 kg × g0 = 1,422 N
    expect(hand.force).toBeCloseTo(145 * G0, 9);
    const scale = largestScale(studyScale(study), hand);
    expect(scale.force).toBeCloseTo(145 * G0, 9);
    expect(unitFamily("SI", scale)).toEqual({ force: "kN", moment: "kN·m" });
    const shared = stabilityTable(study, "SI", scale);
    expect(shared.rows[0][5]).toBe("kN·m");
    expect(shared.rows[0][3]).toBeCloseTo(own.rows[0][3] as number / 1000, 12);
    expect(handCheckTable(result, "cart", [0.06, 0.12], "SI", { scale }).columns[2].unit).toBe("kN");
  });
});

describe("a case that is the sketch as drawn", () => {
  it("is found by its results: the cart's v1 draws the lance aimed down, v2 and v3 raised; other cases are not", () => {
    const twin = (doc: unknown) => {
      const p = parsedOf(doc);
      return asDrawnTwin(solveCases(p.file), asDrawnStudy(p.file));
    };
    expect(twin(demo("a5", 1))).toBe("aimed-down");
    expect(twin(demo("a5", 2))).toBe("raised");
    expect(twin(demo("a5", 3))).toBe("raised");
    // the monitor trailer drawn at 15°, its cases at 30° and 60°: none is the drawing
    const trailer = loadFixture("fire-monitor-trailer.json");
    trailer.cases = [
      { id: "mid", name: "Mid throw", parameters: { theta: "30 deg" } },
      { id: "high", name: "High throw", parameters: { theta: "60 deg" } },
    ];
    expect(twin(trailer)).toBeNull();
  });

  it("says each failing factor of safety once, under the case it belongs to", () => {
    // v1: the lance aimed down as drawn (1.311) and raised to −50° (0.9078) fail; before, the drawn
    // state was printed again as its own "As drawn" group: three FAIL rows, and 1.311 twice on page 1
    const { text } = cartV1;
    expect(count(text, "FAIL")).toBe(2);
    expect(count(text, "1.311, below the required 1.5")).toBe(1);
    expect(text).toContain("• Lance aimed down at −75° (tank foot), as drawn — factor of safety against overturning about rear wheels (braked) 1.311, below the required 1.5");
    expect(text).toContain("• Lance raised to −50° — Washing cart tips; factor of safety against overturning about rear wheels (braked) 0.9078");
    expect(text).toContain("Case: Lance aimed down at −75° (tank foot), as drawn");
    expect(text).toContain("Lance aimed down at −75° (tank foot), as drawn: theta = −75 deg");
    expect(text).not.toContain("Case: As drawn");
    expect(text).not.toContain("Factors of safety as drawn:");
    // the v3 sheet draws the lance raised: that case is the one said to be as drawn
    // (its stability group; the reaction tables name the case as it is named)
    expect(count(cartV3, "Case: Lance raised to −50°, as drawn")).toBe(1);
    expect(cartV3).not.toContain("Case: As drawn");
  });
});

describe("the inputs in the words of the properties form", () => {
  it("name the fields and kinds as the form does, not by the file format's names", () => {
    const { text } = cartV1;
    for (const internal of ["volumeFlow", "massFlow", "massSource", "mu 0.6"]) expect(text).not.toContain(internal);
    expect(text).toContain("volume flow: Q = 0.00066667 m³/s");
    expect(text).toContain("mass flow ṁ: rho * Q = 0.66533 kg/s");
    expect(text).toMatch(/hose mass source high-pressure hose/);
    expect(text).toContain("friction μ: 0.6");
    expect(text).toContain("flow direction: theta = −75°");
    expect(text).toContain("centre of gravity: (0.28, 0.42) m");
    // the table itself keeps the file's names when it is given no words (a developer's view)
    const p = parsedOf(demo("a5", 1));
    expect(String(inputsTable(p, "SI").rows.find((r) => r[0] === "lance")![4])).toContain("volumeFlow Q =");
    expect(String(inputsTable(p, "SI", { field: fieldWords, kind: (k) => k }).rows.find((r) => r[0] === "lance")![4])).toContain("volume flow: Q =");
  });

  it("give gravity in ft/s² on a US sheet: 9.80665 m/s² = 32.174 ft/s² (÷ 0.3048 m/ft, NIST SP 811)", () => {
    expect(cartV1US).toContain("gravity 32.174 ft/s² (acts in −y)");
    expect(cartV1US).not.toContain("9.80665 m/s²");
    expect(cartV1.text).toContain("gravity 9.80665 m/s² (acts in −y)");
    expect(Number((G0 / 0.3048).toFixed(3))).toBe(32.174);
  });
});

describe("the page footer", () => {
  const measureAt = () => {
    const doc = new PDFDocument({ size: "A4" });
    registerFonts(doc);
    doc.font("Inter").fontSize(FOOTER_SIZE);
    return (t: string) => doc.widthOfString(t);
  };
  // A4 is 595.28 pt wide; the sheet's margins are 44 pt each side
  const width = 595.28 - 88;

  it("fits each line in its width by the font's own metrics, a long title cut with an ellipsis", () => {
    const measure = measureAt();
    const titles = ["Pressure-washing cart with a fixed lance", "Standby generator exhaust stack, temporary skid", "A".repeat(40) + " " + "very long title ".repeat(20)];
    for (const title of titles) {
      const lines = footerLines(measure, title, 12, "page 12 of 12", width);
      expect(measure(lines.sketch), lines.sketch).toBeLessThanOrEqual(lines.sketchWidth);
      expect(lines.sketchWidth + measure(lines.page)).toBeLessThanOrEqual(width);
      expect(measure(lines.caution)).toBeLessThanOrEqual(width);
      expect(lines.sketch.endsWith(" · v12")).toBe(true);
    }
    expect(footerLines(measure, titles[0], 3, "page 1 of 5", width).sketch).toBe("Pressure-washing cart with a fixed lance · v3");
    expect(footerLines(measure, titles[2], 3, "page 1 of 5", width).sketch).toMatch(/^A{40} very long title .*…  ?· v3$/);
    expect(FOOTER_CAUTION).toBe("For design checking; review by a qualified engineer required; local codes govern.");
  });

  it("on the printed pages: no word alone on a line, every footer line inside the margins", async () => {
    const { pages, pageWidth } = await pdfItems(cartV1.buf);
    for (const [i, items] of pages.entries()) {
      // the footer sits below the 54 pt bottom margin
      const foot = items.filter((it) => it.y < 54);
      expect(foot.map((it) => it.str).sort(), `page ${i + 1}`).toEqual([FOOTER_CAUTION, "Pressure-washing cart with a fixed lance · v1", `page ${i + 1} of ${pages.length}`].sort());
      for (const it of foot) {
        expect(it.x).toBeGreaterThanOrEqual(44 - 0.5);
        expect(it.x + it.width, it.str).toBeLessThanOrEqual(pageWidth - 44 + 0.5);
      }
    }
  });
});
