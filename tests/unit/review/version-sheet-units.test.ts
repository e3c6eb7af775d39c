// A version's page writes its forces and moments in the unit its calc sheet writes them: both
// choose the family with `versionScale` (the cases, the sketch as drawn with its factors of
// safety, the result as drawn), so a checker reading a reaction on the page and on the sheet meets
// the same unit and the same digits. (Rendered to HTML in Node, where the sheet is built: pdfkit's
// fonts do not load under jsdom.)
import { readFileSync } from "node:fs";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it, vi } from "vitest";
import { versionConcerns } from "@/components/review/concerns";
import { VersionCases, VersionReactions, versionScaleOf } from "@/components/review/VersionReview";
import stack from "@/canvas/examples/exhaust-stack.json";
import trailer from "@/canvas/examples/fire-monitor-trailer.json";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { unitFamily } from "@/solver/report";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import { twoReactions } from "../../fixtures/one-unit";
import { pdfText } from "../../support/pdf-text";

// each check builds a calc sheet (pdfkit, fonts, a drawing) and solves every case: a second or two
// on an idle machine, more under a loaded test run
vi.setConfig({ testTimeout: 30_000 });

/** The demo trailer's third version: 2000 gpm, 300 kg of ballast toward the front (db/seed-sketches.ts). */
const trailerV3 = (() => {
  const d = structuredClone(trailer) as unknown as SketchFile;
  d.parameters = { ...d.parameters, Q: "2000 gpm" };
  d.bodies[0] = { ...d.bodies[0], mass: "1250 kg", cg: [2.1, 0.85] };
  return d;
})();

/** The beam with 500 N over its pin and 50 N over its pad (each support carries the load over it:
 *  statics), and a storm case at three times it: 1.5 kN. Drawn, every figure is below 1 kN; the
 *  case puts the version, page and sheet alike, in kN. */
const beamWithCases = {
  ...twoReactions,
  loads: twoReactions.loads.map((l) => ({ ...l, magnitude: l.id === "big" ? "500 N" : "50 N" })),
  cases: [
    { id: "duty", name: "Duty" },
    { id: "storm", name: "Storm", factors: { loads: 3 } },
  ],
} as SketchFile;

/** A rendered table's header cells and body rows, as text (the markup of one table, from `renderToStaticMarkup`). */
function readTable(html: string, testId: string) {
  const at = html.indexOf(`data-testid="${testId}"`);
  if (at < 0) return null;
  const markup = html.slice(at, html.indexOf("</table>", at));
  const text = (cell: string) => cell.replace(/<[^>]+>/g, "").replace(/&amp;/g, "&").replace(/&#x27;/g, "'");
  const cellsOf = (row: string) => [...row.matchAll(/<t[hd]\b[^>]*>([\s\S]*?)<\/t[hd]>/g)].map((m) => text(m[1]));
  const head = cellsOf(markup.slice(markup.indexOf("<thead"), markup.indexOf("</thead>")));
  const body = markup.slice(markup.indexOf("<tbody"));
  const rows = body.split(/<tr\b/).slice(1).map(cellsOf);
  return { head, rows, col: (name: RegExp) => head.findIndex((h) => name.test(h)) };
}

function tables(file: SketchFile, units: UnitSystem) {
  const html = renderToStaticMarkup(createElement(VersionReactions, { document: file, units }));
  return { reactions: readTable(html, "version-reactions"), stability: readTable(html, "stability") };
}

async function sheet(file: SketchFile, units: UnitSystem) {
  const pdf = await buildCalcSheet({ workspace: "Demo", sketchTitle: "Check", version: 3, savedAt: new Date("2026-01-01T00:00:00Z"), signoff: [], file, units });
  return (await pdfText(pdf)).text;
}

describe("the version page writes forces in its calc sheet's unit", () => {
  it.each([
    ["the demo trailer's v3 in US units", trailerV3, "US" as const, "kip", "kip·ft"],
    ["a beam of a 500 N and a 50 N reaction with a 3× case, in SI", beamWithCases, "SI" as const, "kN", "kN·m"],
    ["the same beam in US units", beamWithCases, "US" as const, "lbf", "lbf·ft"],
  ])("%s: the reactions and factors of safety read in the sheet's units, with its figures", async (_what, file, units, force, moment) => {
    const text = await sheet(file, units);
    expect(unitFamily(units, versionScaleOf(file)!)).toEqual({ force, moment });
    const { reactions, stability } = tables(file, units);
    expect(reactions!.head[reactions!.col(/^Fy/)]).toContain(`(${force})`);
    // the sheet heads its reaction columns with the same unit
    expect(text).toContain(`Fy (${force})`);
    // every resultant of the page is a figure of the sheet
    const figures = reactions!.rows.map((row) => row[reactions!.col(/^Resultant/)].trim());
    expect(figures.length).toBeGreaterThan(1);
    for (const f of figures) expect(text).toContain(f);
    // the factors of safety as drawn: their forces and moments in the sheet's family too
    const shown = (stability?.head ?? []).flatMap((h) => /\(([^)]*)\)$/.exec(h)?.[1].split(" / ") ?? []).filter((u) => /^(kip|lbf|k?N)/.test(u));
    if (file === trailerV3) expect(shown).toEqual([moment, force, moment, force]);
    for (const u of shown) expect([force, moment]).toContain(u);
  });
});

describe("the version page's operating-case tables use the sheet's unit too", () => {
  it.each([
    ["the demo exhaust stack in US units", stack as unknown as SketchFile, "US" as const],
    ["the beam with a 3× case, in SI", beamWithCases, "SI" as const],
  ])("%s: the reactions per case, the envelope and the design loads head their forces in the sheet's unit", async (_what, file, units) => {
    const { force } = unitFamily(units, versionScaleOf(file)!);
    const html = renderToStaticMarkup(createElement(VersionCases, { document: file, units }));
    const text = await sheet(file, units);
    for (const id of ["case-reactions", "envelope", "design-loads"]) {
      const t = readTable(html, id);
      expect(t, id).not.toBeNull();
      const forceHeads = t!.head.filter((h) => /\((kip|lbf|k?N|MN)\)$/.test(h));
      expect(forceHeads.length, id).toBeGreaterThan(0);
      for (const h of forceHeads) expect(h, id).toMatch(new RegExp(`\\(${force}\\)$`));
    }
    expect(text).toContain(`(${force})`);
  });
});

describe("the sign-off's findings write forces in the page's unit", () => {
  it("a stand that tips, in US units: the pull its pad would need reads as on the calc sheet's first page", async () => {
    const stand = JSON.parse(readFileSync("tests/fixtures/sketches/thrust-stand-tips.json", "utf8")) as SketchFile;
    const force = unitFamily("US", versionScaleOf(stand)!).force;
    const [line] = versionConcerns(stand, "US", force);
    expect(line).toContain(` ${force}`);
    expect(line).toMatch(/^As drawn: /);
    const text = await sheet(stand, "US");
    expect(text).toContain(line.replace(/^As drawn: /, ""));
  });
});
