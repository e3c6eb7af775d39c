// A long paragraph at a page's end keeps at least two of its lines on each side of every break, over
// as many pages as it runs: no single line left at the foot of a page (an orphan) nor alone at the
// top of the next (a widow), common practice in typesetting. Read back with pdfjs-dist.
import PDFDocument from "pdfkit";
import { describe, expect, it } from "vitest";
import { buildCalcSheet, paragraph, proseBreaks } from "@/lib/calcsheet/pdf";
import { registerFonts } from "@/lib/calcsheet/fonts";
import { pdfItems, type PdfItem } from "../../support/pdf-text";
import { loadFixture } from "../solver/helpers";

const MARGINS = { top: 44, bottom: 54, left: 44, right: 44 };
const WIDTH = 595.28 - 88;
/** Numbered words, so each line read back says which words it holds: "w01 w02 …". */
const words = (n: number, tag: string) => Array.from({ length: n }, (_, i) => `${tag}${String(i + 1).padStart(2, "0")}`).join(" ");

/** The lines of the paragraph tagged `tag` on each page, counted by baseline. */
function linesPerPage(pages: PdfItem[][], tag: string): number[] {
  return pages.map((items) => new Set(items.filter((i) => i.str.includes(tag)).map((i) => Math.round(i.y))).size).filter((n) => n > 0);
}

async function pages(draw: (doc: PDFKit.PDFDocument) => void): Promise<PdfItem[][]> {
  const doc = new PDFDocument({ size: "A4", margins: MARGINS });
  registerFonts(doc);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on("end", () => resolve(Buffer.concat(chunks))));
  draw(doc);
  doc.end();
  return (await pdfItems(await done)).pages;
}

describe("a paragraph at a page break", () => {
  it("keeps two lines at least on each side, wherever the page ends, and every line in order", async () => {
    const text = words(160, "q"); // about 6 lines at 9 pt across the page
    const doc = new PDFDocument({ size: "A4", margins: MARGINS });
    registerFonts(doc);
    const line = doc.font("Inter").fontSize(9).currentLineHeight(true);
    const total = Math.round(doc.heightOfString(text, { width: WIDTH }) / line);
    expect(total).toBeGreaterThanOrEqual(5);
    const foot = doc.page.height - MARGINS.bottom;
    const seen: string[] = [];
    // start with room for 0 to total + 1 lines before the foot (a little over each count)
    for (let room = 0; room <= total + 1; room++) {
      const got = await pages((d) => {
        d.y = foot - room * line - 0.3 * line;
        paragraph(d, text, MARGINS.left, WIDTH, 9);
        d.font("Inter").fontSize(9).text("after", MARGINS.left, d.y);
      });
      const counts = linesPerPage(got, "q");
      seen.push(`${room}: ${counts.join("+")}`);
      expect(counts.reduce((a, b) => a + b, 0), `room ${room}`).toBe(total);
      for (const n of counts) expect(n, `room ${room}: ${counts.join("+")}`).toBeGreaterThanOrEqual(2);
      // the words read back in order across the break
      const read = got.flatMap((items) => items.filter((i) => i.str.includes("q")).map((i) => i.str)).join(" ").split(/\s+/).filter(Boolean);
      expect(read, `room ${room}`).toEqual(text.split(" "));
      // the next page starts at its top margin, with the paragraph's lines
      if (counts.length > 1) expect(Math.max(...got[1].filter((i) => i.str.includes("q")).map((i) => i.y))).toBeGreaterThan(doc.page.height - MARGINS.top - line);
    }
    // where the page held all but one line, one more went over: total − 2 + 2, not total − 1 + 1
    expect(seen[total - 1]).toBe(`${total - 1}: ${total - 2}+2`);
    // room for one line only: the whole paragraph starts on the next page, none left at the foot
    expect(seen[1]).toBe(`1: ${total}`);
    // room for it all: one page
    expect(seen[total]).toBe(`${total}: ${total}`);
  });

  it("a four-line paragraph with room for three: two lines on each side, and the page's foot put back", async () => {
    const got = await pages((d) => {
      const line = d.font("Inter").fontSize(9).currentLineHeight(true);
      // 4 lines: with room for 3, 2 stay and 2 go over
      let n = 60;
      while (Math.round(d.heightOfString(words(n + 1, "r"), { width: WIDTH }) / line) <= 4) n++;
      const text = words(n, "r");
      expect(Math.round(d.heightOfString(text, { width: WIDTH }) / line)).toBe(4);
      d.y = d.page.height - MARGINS.bottom - 3.3 * line;
      const first = d.page;
      paragraph(d, text, MARGINS.left, WIDTH, 9);
      expect(first.margins.bottom).toBe(MARGINS.bottom);
      expect(d.page.margins.bottom).toBe(MARGINS.bottom);
    });
    expect(linesPerPage(got, "r")).toEqual([2, 2]);
  });
});

describe("a paragraph over more than two pages", () => {
  it("plans two lines at least over every break, a page ending a line early wherever one would go over alone", () => {
    // 10 lines held here, 50 on a full page
    expect(proseBreaks(61, 10, 50)).toEqual([10, 49, 2]);
    expect(proseBreaks(111, 10, 50)).toEqual([10, 50, 49, 2]);
    // the first break guarded, as before
    expect(proseBreaks(11, 10, 50)).toEqual([9, 2]);
    expect(proseBreaks(60, 9, 50)).toEqual([9, 49, 2]);
    // nothing to guard: each page full, the rest (two lines or more) on the last
    expect(proseBreaks(62, 10, 50)).toEqual([10, 50, 2]);
    expect(proseBreaks(60, 10, 50)).toEqual([10, 50]);
    // every line placed, none alone on a page, wherever it starts and however long
    for (let lines = 4; lines <= 160; lines++)
      for (let fit = 2; fit <= 12; fit++) {
        const plan = proseBreaks(lines, fit, 50);
        expect(plan.reduce((a, b) => a + b, 0)).toBe(lines);
        for (const n of plan) expect(n, `${lines} lines from ${fit}: ${plan.join("+")}`).toBeGreaterThanOrEqual(2);
      }
  });

  it("on paper: no line alone at the top of the third or the fourth page, and every line in order", async () => {
    const doc = new PDFDocument({ size: "A4", margins: MARGINS });
    registerFonts(doc);
    const line = doc.font("Inter").fontSize(9).currentLineHeight(true);
    const full = Math.floor((doc.page.height - MARGINS.top - MARGINS.bottom) / line + 1e-6);
    const lineCount = (n: number) => Math.round(doc.heightOfString(words(n, "p"), { width: WIDTH }) / line);
    /** The fewest words that make `target` lines (a binary search: the count only grows with them). */
    const wordsFor = (target: number) => {
      let [lo, hi] = [1, 40 * target];
      while (lo < hi) {
        const mid = Math.floor((lo + hi) / 2);
        if (lineCount(mid) >= target) hi = mid;
        else lo = mid + 1;
      }
      return lo;
    };
    const room = 6;
    for (const [lines, expected] of [
      // 6 + full + 1: the second page ends a line early
      [room + full + 1, [room, full - 1, 2]],
      // 6 + 2 full + 1: the third does
      [room + 2 * full + 1, [room, full, full - 1, 2]],
      // 6 + full: each page as full as it holds
      [room + full, [room, full]],
    ] as const) {
      const n = wordsFor(lines);
      const text = words(n, "p");
      expect(lineCount(n)).toBe(lines);
      const got = await pages((d) => {
        d.y = d.page.height - MARGINS.bottom - room * line - 0.3 * line;
        const all = [d.page];
        d.on("pageAdded", () => all.push(d.page));
        paragraph(d, text, MARGINS.left, WIDTH, 9);
        // every page's foot put back for the footer
        expect(all.map((p) => p.margins.bottom)).toEqual(expected.map(() => MARGINS.bottom));
        d.font("Inter").fontSize(9).text("after", MARGINS.left, d.y);
      });
      expect(linesPerPage(got, "p"), `${lines} lines`).toEqual(expected);
      const read = got.flatMap((items) => items.filter((i) => i.str.includes("p")).map((i) => i.str)).join(" ").split(/\s+/).filter((w) => /^p\d+$/.test(w));
      expect(read).toEqual(text.split(" "));
    }
  });
});

describe("on the calc sheet", () => {
  it("a long paragraph of the notes placed near a page end: one line more over, or the whole of it over", { timeout: 60_000 }, async () => {
    const file = loadFixture("pipe-bend-anchor.json");
    const long = words(180, "z");
    const measure = new PDFDocument({ size: "A4", margins: MARGINS });
    registerFonts(measure);
    const line = measure.font("Inter").fontSize(8.5).currentLineHeight(true);
    const total = Math.round(measure.heightOfString(long, { width: WIDTH }) / line);
    expect(total).toBeGreaterThanOrEqual(5);
    const build = async (filler: number) =>
      (await pdfItems(await buildCalcSheet({ workspace: "W", sketchTitle: "Bend", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file: { ...file, description: `${"Anchor block on rock.\n".repeat(filler)}${long}` } }))).pages;
    // with no notes before it: how many lines its page has below its first line (each one-line
    // note before it moves it down one line)
    const first = await build(0);
    const items = first.find((p) => p.some((i) => i.str.includes("z01")))!;
    const top = Math.max(...items.filter((i) => i.str.includes("z01")).map((i) => i.y));
    const lowest = Math.min(...items.filter((i) => i.y > 50).map((i) => i.y));
    const below = Math.round((top - lowest) / line);
    expect(below).toBeGreaterThan(total);
    // k notes before it leave room for below + 1 − k of its lines on that page
    // room for all but its last line: two lines go over, not one
    expect(linesPerPage(await build(below + 2 - total), "z")).toEqual([total - 2, 2]);
    // room for its first line only: it starts on the next page, whole
    expect(linesPerPage(await build(below), "z")).toEqual([total]);
    // room for two: two stay
    expect(linesPerPage(await build(below - 1), "z")).toEqual([2, total - 2]);
  });
});
