// A heading over a table is never left alone at the foot of a page with its table on the next:
// a longer description moves everything down a line and a half at a time, through most of a page, and each
// such heading keeps at least the table's header and first row under it on its own page.
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { pdfItems } from "../../support/pdf-text";
import { pushedTallBlock } from "./pushed-tall-block";

const HEADINGS = ["Hand check — Block", "Reactions per case (forces on the body)", "Envelope and design loads", "Stability"];
/** Baselines below this (pt from the page's bottom) are the footer's. */
const FOOTER_TOP = 50;

describe("a heading over a table on the calc sheet", () => {
  it("stays on the page of the table's header and first row, wherever the page ends", { timeout: 120_000 }, async () => {
    const line = "The pad is broom-finished concrete, laid level. ";
    const alone: string[] = [];
    for (let k = 0; k < 34; k++) {
      const file = { ...pushedTallBlock(), description: line.repeat(k * 3) };
      const { pages } = await pdfItems(await buildCalcSheet({ workspace: "W", sketchTitle: "Block", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file, units: "SI" }));
      for (const heading of HEADINGS) {
        const page = pages.find((items) => items.some((i) => i.str === heading));
        if (!page) throw new Error(`${heading} is not on the sheet`);
        const at = page.find((i) => i.str === heading)!;
        // something of the table under it, above the footer
        if (!page.some((i) => i.y < at.y - 1 && i.y > FOOTER_TOP && i.str.trim())) alone.push(`${heading} (description of ${k * 3} sentences)`);
      }
    }
    expect(alone).toEqual([]);
  });
});
