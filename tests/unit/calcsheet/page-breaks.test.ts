// Where the calc sheet's pages end. A checker signs every page, so none may end on a heading or a
// list's label whose text is overleaf, and the closing cautions never stand alone on the last page
// (common practice for a bound calculation: keep a heading with what it heads, keep a closing
// block with the text before it). Read back with pdfjs-dist: a section heading is the only text
// set at 11.5 pt.
import { describe, expect, it } from "vitest";
import { buildCalcSheet, EQUATIONS, fluidAssumptions } from "@/lib/calcsheet/pdf";
import type { CheckRecordInput } from "@/lib/calcsheet/record";
import { EXAMPLES } from "@/canvas/examples";
import { pdfItems, type PdfItem } from "../../support/pdf-text";

/** Baselines below this (pt from the page's bottom) are the footer's. */
const FOOTER_TOP = 50;
const HEADING_SIZE = 11.5;
/** Labels over lines of their own: never the last words of a page. */
const LABELS = new Set(["Notes", "Sign-off", "Comments", "Factors of safety as drawn:", "In the cases and combinations:", "Factors of safety:"]);

const isHeading = (i: PdfItem) => Math.abs(i.size - HEADING_SIZE) < 0.05;

/** What is wrong with where the pages end: a page whose last text is a heading or a label, and a
 *  cautions heading with nothing of the sheet above it on its page. */
function pageBreakFaults(pages: PdfItem[][]): string[] {
  const faults: string[] = [];
  pages.forEach((items, p) => {
    const body = items.filter((i) => i.y > FOOTER_TOP && i.str.trim());
    if (!body.length) {
      faults.push(`page ${p + 1} is empty`);
      return;
    }
    const lowest = Math.min(...body.map((i) => i.y));
    // every piece on the page's last line (a line may be read back in several pieces)
    const last = body.filter((i) => i.y < lowest + 1);
    for (const i of last) if (isHeading(i) || LABELS.has(i.str.trim())) faults.push(`page ${p + 1} ends on "${i.str.trim()}"`);
    const cautions = body.find((i) => isHeading(i) && i.str.trim() === "Cautions");
    if (cautions && !body.some((i) => i.y > cautions.y + 1)) faults.push(`the cautions stand alone at the top of page ${p + 1}`);
    if (cautions && p !== pages.length - 1) faults.push(`the cautions are on page ${p + 1}, not the last`);
  });
  return faults;
}

const at = (s: string) => new Date(`${s}Z`);
const thread = (id: string, body: string, createdAt: Date) => ({ id, parentId: null, authorName: "Chen Checker", body, pin: null, resolvedAt: null, resolvedByName: null, editedAt: null, deletedAt: null, createdAt });
/** A version returned once and submitted again, with two open threads: every label of the check record. */
const record: CheckRecordInput = {
  steps: [
    { step: "submit", actorName: "Eddie Editor", at: at("2026-11-30T10:00"), note: "" },
    { step: "return", actorName: "Chen Checker", at: at("2026-11-30T12:00"), note: "The axle slips on wet ground: chock it or add ballast." },
    { step: "submit", actorName: "Eddie Editor", at: at("2026-11-30T14:00"), note: "Ballast added toward the front." },
  ],
  comments: [thread("t1", "Is the jet taken at the tip or at the swivel?", at("2026-11-30T11:00")), thread("t2", "Show the jack plate size on the drawing.", at("2026-11-30T11:10"))],
};

const sheet = async (file: unknown, withRecord = true) =>
  (await pdfItems(await buildCalcSheet({ workspace: "W", sketchTitle: "Sheet", version: 2, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file, ...(withRecord ? { record } : {}) }))).pages;

describe("the calc sheet's page breaks", () => {
  it("finds the faults it looks for (a heading last on a page, cautions alone)", () => {
    const item = (str: string, y: number, size = 9): PdfItem => ({ str, x: 44, y, width: 50, size });
    const footer = item("For design checking; review by a qualified engineer required; local codes govern.", 30, 7);
    expect(pageBreakFaults([[item("Stability", 700, 11.5), item("text", 690), item("Method", 80, 11.5), footer], [item("Cautions", 780, 11.5), item("ENGINEERING CAUTIONS", 760, 7.5), footer]])).toEqual([
      'page 1 ends on "Method"',
      "the cautions stand alone at the top of page 2",
    ]);
    expect(pageBreakFaults([[item("Assumptions", 700, 11.5), item("• Rigid body", 680), item("Sign-off", 90, 8.5), footer]])).toEqual(['page 1 ends on "Sign-off"']);
    expect(pageBreakFaults([[item("• Rigid body", 780), item("Cautions", 700, 11.5), item("ENGINEERING CAUTIONS", 680, 7.5), footer]])).toEqual([]);
  });

  it("no page of any example's sheet ends on a heading, and the cautions share their page", { timeout: 120_000 }, async () => {
    const faults: string[] = [];
    for (const ex of EXAMPLES) {
      for (const f of pageBreakFaults(await sheet(ex.sketch))) faults.push(`${ex.id}: ${f}`);
      // the same sketch without its cases and sweeps: a shorter sheet ends elsewhere
      const plain = { ...ex.sketch, cases: undefined, combinations: undefined, sweeps: undefined };
      for (const f of pageBreakFaults(await sheet(plain, false))) faults.push(`${ex.id} without studies: ${f}`);
    }
    expect(faults).toEqual([]);
  });

  it("repeats a table's header and its group's name on every page the table runs onto", { timeout: 120_000 }, async () => {
    // the limits tables of the kept sweeps run over two or three pages in these examples
    for (const id of ["roof-fan", "washing-cart"]) {
      const pages = await sheet(EXAMPLES.find((e) => e.id === id)!.sketch, false);
      const withRows = pages.map((items, p) => ({ items, p })).filter(({ items }) => items.some((i) => i.str.startsWith("none in ")));
      expect(withRows.length, id).toBeGreaterThan(1);
      for (const { items, p } of withRows) {
        const firstRow = Math.max(...items.filter((i) => i.str.startsWith("none in ")).map((i) => i.y));
        // the header's first column and the name of the limit the rows are of, above the page's first row
        expect(items.some((i) => i.str.trim() === "Case or combination" && i.y > firstRow), `${id}, page ${p + 1}: header`).toBe(true);
        expect(items.some((i) => i.str.startsWith("Limit: ") && i.y > firstRow), `${id}, page ${p + 1}: group`).toBe(true);
      }
    }
  });

  it("…wherever the pages end: longer notes move everything down three lines at a time through a page", { timeout: 240_000 }, async () => {
    const trailer = EXAMPLES.find((e) => e.id === "fire-monitor-trailer")!.sketch;
    // one line of the notes each (a page holds about 70 of them)
    const line = "Jack on a steel plate.\n";
    const faults: string[] = [];
    let cautionsWithAssumption = 0;
    const steps = 25;
    for (let k = 0; k < steps; k++) {
      const pages = await sheet({ ...trailer, description: line.repeat(3 * k) });
      for (const f of pageBreakFaults(pages)) faults.push(`notes of ${3 * k} lines: ${f}`);
      const last = pages[pages.length - 1].map((i) => i.str).join(" ");
      // the last page holds the cautions with at least the last assumption (the fluid's density)
      if (/Fluid density as each port gives it.*Cautions ENGINEERING CAUTIONS/.test(last)) cautionsWithAssumption++;
    }
    expect(faults).toEqual([]);
    expect(cautionsWithAssumption).toBe(steps);
  });
});

describe("the method and the fluid on the calc sheet", () => {
  it("prints the two equations on lines of their own and the fluid's density by port", { timeout: 60_000 }, async () => {
    const pages = await sheet(EXAMPLES.find((e) => e.id === "fire-monitor-trailer")!.sketch, false);
    const lines = pages.flat().map((i) => i.str.trim());
    for (const eq of EQUATIONS) expect(lines).toContain(eq);
    // the trailer's monitor tip is worked at ρ = 998 kg/m³ (fresh water near 20 °C, from memory)
    expect(lines.join(" ")).toContain("Fluid density as each port gives it, constant across the port: 998 kg/m³ at monitor tip.");
  });

  it("words the density by port, in either unit system, and the ports that give none", () => {
    const ports = [
      { id: "in", label: "suction", density: 1000 },
      { id: "out", label: "discharge", density: 1000 },
      { id: "vent", label: " ", density: 1.2 },
      { id: "jet", label: "jet" },
    ];
    expect(fluidAssumptions(ports, "SI")).toEqual([
      "Fluid density as each port gives it, constant across the port: 1,000 kg/m³ at suction and discharge; 1.2 kg/m³ at vent. Port jet gives no density: its mass flow and velocity are taken as given.",
    ]);
    // 1 lb/ft³ = 16.018 46 kg/m³ (NIST SP 811, appendix B.8): 1000 kg/m³ = 62.43 lb/ft³
    expect(fluidAssumptions(ports.slice(0, 1), "US", true)).toEqual(["Fluid density as each port gives it, constant across the port (as drawn; a case may set its own): 62.43 lb/ft³ at suction."]);
    expect(fluidAssumptions([], "SI")).toEqual([]);
    expect(fluidAssumptions([{ id: "a" }, { id: "b", label: "b" }], "SI")).toEqual(["Ports a and b give no density: their mass flow and velocity are taken as given."]);
  });
});
