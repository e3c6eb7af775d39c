// The calc sheet PDF: its text, extracted with pdfjs-dist, carries the title block, the hand-check
// sums, the reactions with units, ṁ and μ in the embedded font, and the cautions.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { buildCalcSheet, haloBehindLabels } from "@/lib/calcsheet/pdf";
import { runLimit } from "@/canvas/studies/run";
import { formatLimit } from "@/solver/limit";
import { tableCells } from "@/lib/calcsheet/table-layout";
import { parseSketch, solveCases } from "@/solver";
import { caseReactionTable, designLoadTable, envelopeTable, stabilityTable, type Table } from "@/solver/report";
import { loadFixture } from "../solver/helpers";
import { longLabelFileWithStudies } from "./long-labels";
import { pdfItems, pdfText } from "../../support/pdf-text";
import { pushedBlock } from "../../support/pushed-block";

/** A word printed as two pieces ("Supp ort", "beari ng"): what a squeezed column does. */
function brokenWords(text: string, tables: Table[]): string[] {
  const found = new Set<string>();
  for (const t of tables) {
    const all = [...t.columns.map((c) => c.label), ...tableCells(t).flat()];
    for (const w of all.flatMap((s) => s.split(/\s+/))) {
      for (let k = 2; k <= w.length - 2; k++) if (text.includes(` ${w.slice(0, k)} ${w.slice(k)} `)) found.add(`${w.slice(0, k)}/${w.slice(k)}`);
    }
  }
  return [...found];
}

describe("calc sheet PDF", () => {
  it("has the title block, inputs, hand check, reactions with units, cases, sweeps and cautions", async () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
      { id: "high", name: "High throw", parameters: { theta: "60 deg" } },
    ];
    file.sweeps = [{ id: "sw", parameter: "theta", from: 0, to: 80, points: 41, quantities: [{ support: "jack", component: "margin" }] }];
    const buf = await buildCalcSheet({
      workspace: "Demo: Riverside Pump Station",
      sketchTitle: "Monitor trailer",
      version: 3,
      versionMessage: "raised the riser to 2.8 m",
      savedAt: new Date("2026-11-30T10:00:00Z"),
      generatedAt: new Date("2026-12-01T08:00:00Z"),
      signoff: [
        { role: "prepared", name: "Eddie Editor", at: new Date("2026-11-30T10:00:00Z") },
        { role: "checked", name: "Chen Checker", at: new Date("2026-11-30T15:30:00Z") },
      ],
      file,
    });
    expect(buf.subarray(0, 5).toString()).toBe("%PDF-");
    const { text, pages } = await pdfText(buf);
    expect(pages).toBeGreaterThan(1);
    expect(text).toContain("COUNTERPOISE · CALCULATION SHEET");
    expect(text).toContain("Monitor trailer");
    // the hand check takes moments about the point the results panel takes by default: the first
    // support (the rear leg at (0, 0.3) m), so a checker sees the same terms on screen and paper;
    // the point's coordinates follow the check's one rule for numbers (4 significant figures, zeros kept)
    expect(text).toContain("ΣM about (0, 0.3000) m");
    expect(text).toContain("Workspace: Demo: Riverside Pump Station");
    expect(text).toContain("Version 3 — raised the riser to 2.8 m");
    expect(text).toMatch(/Prepared by Eddie Editor, 2026-11-30 10:00 UTC/);
    expect(text).toMatch(/Checked by Chen Checker, 2026-11-30 15:30 UTC/);
    expect(text).toMatch(/Approved by —/);
    // the font carries Σ, ṁ and μ
    expect(text).toMatch(/ΣFx = 4\.847 kN and Σ\(ṁV\)x = 4\.847 kN/);
    expect(text).toContain("total Σ(ṁV)out − Σ(ṁV)in");
    expect(text).toContain("μ·n");
    // reactions with units
    expect(text).toMatch(/Fx \(kN\)/);
    expect(text).toMatch(/Design load \(kN\)/);
    expect(text).toContain("Low throw");
    expect(text).toContain("High throw");
    expect(text).toMatch(/Sweep of theta/);
    // a found limit to 4 significant figures; the search's tolerance (1e-9 of the 80° range, ±8e-8
    // deg) is far finer than the 0.01 deg the figures show: not printed as noise
    expect(text).toMatch(/Crossing: front jack: lift-off \(its normal force reaches zero\) at theta = \d+\.\d+ deg \(to 4 significant figures\)\./);
    expect(text).not.toMatch(/±\d(\.\d+)?e-\d+/);
    // the conventions a checker redoes the tables by (common practice: a reaction table states
    // its signs and whose force it gives)
    expect(text).toContain("Moments are positive counter-clockwise");
    expect(text).toContain("Reaction tables give the force of each support on the body");
    expect(text).toMatch(/n is the component along its normal \(positive: pressing on the body\)/);
    expect(text).toContain("shares its load by support stiffness");
    expect(text).toContain("the fluid in it included");
    expect(text).toContain("gauge pressures stay as given unless the case sets them");
    expect(text).toContain("Reactions per case (forces on the body)");
    // cautions
    expect(text).toContain("must be reviewed by a qualified engineer");
    expect(text).toContain("Local codes, standards and licensed engineering practice govern");
    expect(text).toContain("water hammer");
  }, 60000);

  it("names the governing cases, leaves a tipping case out of the envelope, warns of a load counted twice, sweeps on the saved case", async () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "normal", name: "Normal", parameters: { Q: "1960 gpm" } },
      { id: "flood", name: "Flood flow", parameters: { Q: "4000 gpm" } },
      { id: "more", name: "More flow", parameters: { Q: "2500 gpm" } },
    ];
    // two whole cases in one combination: the weight is counted 1.2 + 1.5 = 2.7 times
    file.combinations = [{ id: "k", name: "Both", terms: [{ case: "normal", factor: 1.2 }, { case: "more", factor: 1.5 }] }];
    file.sweeps = [{ id: "sw", parameter: "theta", from: 0, to: 80, points: 41, case: "more", quantities: [{ support: "jack", component: "margin" }] }];
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Trailer", version: 1, savedAt: new Date(), signoff: [], file });
    const { text } = await pdfText(buf);
    // the flood case tips (the trailer is not held): named (by its label), and left out
    expect(text).toContain("Flood flow — Trailer tips: not in the envelope or the design loads; the body is not held in this case");
    // and the first page says so under the result as drawn, which alone would read "Holds"
    expect(text).toMatch(/Result as drawn Short of the required factor of safety against overturning about the rear stabiliser leg: 1\.44\s<\s1\.5; it lifts off at the front jack\. The rear stabiliser leg and the wheel still hold the body\. .* In the cases and combinations: (• [^•]* )?• Flood flow — Trailer tips/);
    // a factor just under its required value is not rounded up to it (the stability table: 1.497)
    const parsedFile = parseSketch(file);
    if (!parsedFile.ok) throw new Error("the sketch did not parse");
    const normal = solveCases(parsedFile.file).runs.find((r) => r.id === "normal");
    const ot = normal?.ok ? normal.stability.trailer.overturning : null;
    expect(ot && "factor" in ot ? ot.factor : 0).toBeGreaterThan(1.4965);
    expect(ot && "factor" in ot ? ot.factor : 2).toBeLessThan(1.5);
    // (prose is set without kerning, so "1.497," reads back as written)
    expect(text).toContain("• Normal — factor of safety against overturning about rear stabiliser leg 1.497, below the required 1.5");
    // the cases by their names, as the cases table and the Cases tab name them (not their ids)
    expect(text).toContain('Warning: Load group "dead" (the weights) is in Normal (× 1.2) and More flow (× 1.5): it is counted 2.7 times.');
    // the envelope names the case of each max and min; the cases table marks the governing cells by shape
    expect(text).toContain("Case of max");
    expect(text).toContain("Governing case");
    expect(text).toMatch(/▲ [−\d]/);
    // the stability figures behind each factor
    expect(text).toContain("Restoring M / friction available");
    // the saved sweep runs on its case: the jack lifts where the limit finder says for "More flow"
    const lim = runLimit(file, { parameter: "theta", from: 0, to: 80, caseId: "more", quantity: { support: "jack", component: "margin" }, target: 0 });
    if (!lim.found) throw new Error("expected a crossing");
    expect(text).toContain("Sweep of theta — case More flow");
    // "More flow" leaves theta alone: nothing to say about it
    expect(text).not.toContain("stand in for the case's own");
    expect(text).toContain(`Crossing: front jack: lift-off (its normal force reaches zero) at theta = ${formatLimit(lim.value)} deg`);
  }, 60000);

  it("with cases, says the factors of safety of the sketch as drawn too: a short one on the first page, and its own rows first in the stability table", async () => {
    // the pushed block (tests/support/pushed-block.ts): overturning factor 1.226 as drawn, 2.452 in
    // the one case (P = 2 kN)
    const file = pushedBlock("4 kN", { cases: [{ id: "light", name: "Light push", parameters: { P: "2 kN" } }] });
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Block", version: 1, savedAt: new Date(), signoff: [], file });
    const { text } = await pdfText(buf);
    // the headline leads with the short factor, not "Holds"; that the supports hold follows it
    expect(text).toMatch(/Result as drawn Short of the required factor of safety against overturning about the far foot: 1\.23\s<\s1\.5\. It holds — all supports within their limits.*? Statically determinate\. Factors of safety as drawn: • factor of safety against overturning about far foot 1\.226, below the required 1\.5/);
    // the stability table: the sketch as drawn (FAIL), then the case (pass)
    const table = text.slice(text.indexOf("Stability"));
    expect(table.indexOf("As drawn")).toBeGreaterThan(0);
    expect(table.indexOf("As drawn")).toBeLessThan(table.indexOf("Light push"));
    expect(table).toContain("Case: As drawn block overturning 4.903 4.000 kN·m 1.226 1.500 FAIL far foot");
    expect(table).toContain("Case: Light push block overturning 4.903 2.000 kN·m 2.452 1.500 pass far foot");
  });

  it("a sweep saved on a combination is solved as its factored load set, and says so", async () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "dead", name: "Dead", factors: { flow: 0 } },
      { id: "jet", name: "Jet", factors: { dead: 0 } },
    ];
    file.combinations = [{ id: "k", name: "Light trailer", terms: [{ case: "dead", factor: 0.9 }, { case: "jet", factor: 1.4 }] }];
    file.sweeps = [{ id: "sw", parameter: "theta", from: 0, to: 80, points: 41, combination: "k", quantities: [{ support: "jack", component: "margin" }] }];
    const { text } = await pdfText(await buildCalcSheet({ workspace: "W", sketchTitle: "Trailer", version: 1, savedAt: new Date(), signoff: [], file }));
    expect(text).toContain("Sweep of theta — combination Light trailer");
    expect(text).toContain("Each point is solved as the combination's factored load set (0.9 × “Dead” + 1.4 × “Jet”), with the sweep's value of theta in every one of its cases.");
    const lim = runLimit(file, { parameter: "theta", from: 0, to: 80, combinationId: "k", quantity: { support: "jack", component: "margin" }, target: 0 });
    const drawn = runLimit(file, { parameter: "theta", from: 0, to: 80, quantity: { support: "jack", component: "margin" }, target: 0 });
    if (!lim.found || !drawn.found) throw new Error("expected crossings");
    expect(formatLimit(lim.value)).not.toBe(formatLimit(drawn.value));
    expect(text).toContain(`Crossing: front jack: lift-off (its normal force reaches zero) at theta = ${formatLimit(lim.value)} deg`);
  }, 60000);

  it("says when a sweep's case sets the swept parameter itself: the sweep's values stand in for it", async () => {
    // the exhaust-stack example sweeps the wind speed v on a case that sets v = 30 m/s
    const { exampleById } = await import("@/canvas/examples");
    const file = exampleById("exhaust-stack")!.sketch;
    const { text } = await pdfText(await buildCalcSheet({ workspace: "W", sketchTitle: "Stack", version: 1, savedAt: new Date(), signoff: [], file }));
    expect(text).toContain("Sweep of v — case Engine stopped, 30 m/s wind");
    expect(text).toContain("The sweep's values of v stand in for the case's own (v = 30 m/s); everything else is as in the case.");
    expect(text).toMatch(/Crossing: upwind edge: lift-off \(its normal force reaches zero\) at v = 35\.38 m\/s/);
    // and in every case and combination, the factored uplift check first (v_lift·√(0.9 / 1.5) = 27.41 m/s:
    // tests/unit/studies/exhaust-stack-example.test.ts)
    // as a table of every limit in every run, reached or not: the rows as printed
    const limits = text.slice(text.indexOf("Limits in every case — sweep of v"));
    expect(limits).toMatch(
      /Limit: upwind edge: lift-off \(n = 0\) Engine running, 30 m\/s wind 36\.8\d? Engine stopped, 30 m\/s wind \(plotted\) 35\.38 Engine stopped, 38 m\/s storm 35\.38 Uplift check: 0\.9 × weight \+ 1\.5 × wind ◇\s?27\.41 first of this limit/,
    );
    // not reached: where it came closest, and no wind speed below zero quoted (solver/limitHint.ts)
    expect(limits).toMatch(
      /Limit: downwind edge: lift-off \(n = 0\) Engine running, 30 m\/s wind none in 20 … 45 m\/s closest \d[\d.]* kN at v = 20\.00 m\/s; below 20 m\/s heading for 0 kN \(a line reaches it only below 0 m\/s\) Engine stopped, 30 m\/s wind \(plotted\) none in 20 … 45 m\/s/,
    );
    expect(limits).not.toMatch(/v = −\d/);
    // the friction at the upwind edge is used up first, in the factored uplift check: it governs
    expect(limits).toContain("Governs over 20 … 45 m/s: upwind edge: slip (μ·n − |t| = 0) in Uplift check: 0.9 × weight + 1.5 × wind at v = 21.70 m/s.");
    expect(limits).toMatch(/Uplift check: 0\.9 × weight \+ 1\.5 × wind ◆\s?21\.70 governs: reached first of all/);
    expect(limits).toMatch(/Limit: Stack on skid: tips \(not held\)/);
  }, 60000);

  it("prints a support-moment column only when a fixed support can carry a moment, zeros included", async () => {
    /** the text from one heading up to the next */
    const section = (text: string, from: string, to: string) => text.slice(text.indexOf(from), text.indexOf(to, text.indexOf(from)));
    // the trailer stands on contacts only: no support can carry a moment, so no M column of zeros
    const trailer = loadFixture("fire-monitor-trailer.json");
    trailer.cases = [
      { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
      { id: "high", name: "High throw", parameters: { theta: "60 deg" } },
    ];
    const t = (await pdfText(await buildCalcSheet({ workspace: "W", sketchTitle: "Trailer", version: 1, savedAt: new Date(), signoff: [], file: trailer }))).text;
    const perCase = section(t, "Reactions per case (forces on the body) Support", "Envelope and design loads");
    expect(perCase).toContain("Resultant (kN) Normal n (kN)");
    expect(perCase).not.toContain("(kN·m)");
    const envelope = section(t, "Envelope and design loads", "Stability");
    expect(envelope).toContain(" Fy kN ");
    expect(envelope).not.toMatch(/ M kN·m /);
    expect(envelope).toContain("Design load (kN) at angle (°) Fx (kN) Fy (kN) from case");

    // the bend's anchor is a fixed support at the meeting point of the pipe axes, with no gravity:
    // every force passes through it, so its moment is zero (statics, common practice), and the
    // column stays, printing that zero
    const bend = loadFixture("pipe-bend-anchor.json");
    bend.cases = [{ id: "surge", name: "Surge pressure 900 kPa", parameters: { p1: "900 kPa" } }];
    const parsed = parseSketch(bend);
    if (!parsed.ok) throw new Error("the sketch did not parse");
    const run = solveCases(parsed.file).runs[0];
    if (!run.ok) throw new Error("the case did not solve");
    expect(Math.abs(run.result.reactions.anchor.m)).toBeLessThan(1e-6);
    const b = (await pdfText(await buildCalcSheet({ workspace: "W", sketchTitle: "Bend", version: 1, savedAt: new Date(), signoff: [], file: bend }))).text;
    expect(section(b, "Reactions per case (forces on the body) Support", "Envelope and design loads")).toMatch(/Resultant \(kN\) M \(kN·m\) Normal n/);
    const bendEnvelope = section(b, "Envelope and design loads", "Stability");
    expect(bendEnvelope).toMatch(/ M kN·m 0 Surge pressure 900 kPa 0 Surge pressure 900 kPa none \(zero in every case\) /);
    expect(bendEnvelope).toContain("Fy (kN) M (kN·m) from case");
  }, 60000);

  it("says a body that slips as drawn slips, in the words of the results panel, not that it holds", async () => {
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Skid", version: 1, savedAt: new Date(), signoff: [], file: loadFixture("pump-skid-slip.json") });
    const { text } = await pdfText(buf);
    const result = text.slice(text.indexOf("Result "), text.indexOf("Free-body diagram"));
    expect(result).toMatch(/^Result (Slips at|Slips as a whole) /);
    expect(result).not.toMatch(/Holds|INDETERMINATE:|SLIP:/);
  }, 60000);

  it("draws a label's paper halo as a copy behind its letters (the PDF library ignores paint-order)", () => {
    const svg = '<text x="1" y="2" font-size="10" fill="#1d2329" stroke="#fbfaf6" stroke-width="3" paint-order="stroke" stroke-linejoin="round">ṁ 2 kg/s</text>';
    expect(haloBehindLabels(svg)).toBe(
      '<text x="1" y="2" font-size="10" fill="#fbfaf6" stroke="#fbfaf6" stroke-width="3" stroke-linejoin="round">ṁ 2 kg/s</text><text x="1" y="2" font-size="10" fill="#1d2329">ṁ 2 kg/s</text>',
    );
  });

  it("says under the signatures where the review stands: a withdrawn approval is not read as current", async () => {
    const buf = await buildCalcSheet({
      workspace: "W",
      sketchTitle: "Bend",
      version: 4,
      savedAt: new Date("2026-11-30T10:00:00Z"),
      signoff: [
        { role: "prepared", name: "Eddie Editor", at: new Date("2026-11-30T10:00:00Z") },
        { role: "checked", name: "Chen Checker", at: new Date("2026-11-30T15:30:00Z") },
      ],
      review: "approval withdrawn by Olivia Owner, 2026-12-01: Anchor bolts changed to M20",
      file: loadFixture("pipe-bend-anchor.json"),
    });
    const { text } = await pdfText(buf);
    expect(text).toContain("Approved by — Review: approval withdrawn by Olivia Owner, 2026-12-01: Anchor bolts changed to M20");
  }, 60000);

  it("US customary units on request", async () => {
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Bend", version: 1, savedAt: new Date(), signoff: [], file: loadFixture("pipe-bend-anchor.json"), units: "US" });
    const { text } = await pdfText(buf);
    expect(text).toMatch(/Fx \(lbf\)/);
  }, 60000);

  it("prints every table word whole, inside the margins, with the cautions on every page", async () => {
    const file = longLabelFileWithStudies();
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Pump set", version: 2, savedAt: new Date(), signoff: [], file, units: "US" });
    const { text } = await pdfText(buf);
    const { pages, pageWidth } = await pdfItems(buf);
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error("the sketch did not parse");
    const study = solveCases(parsed.file);
    const tables = [caseReactionTable(study, "US"), envelopeTable(study, "US"), designLoadTable(study, "US"), stabilityTable(study, "US")];
    // the old layout printed "Supp ort", "beari ng" and "leftRubberBearingPa dUnderEngine"
    expect(brokenWords(text, tables)).toEqual([]);
    for (const w of ["Support", "bearing", "Tangential t", "leftRubberBearingPadUnderEngine", "rightRubberBearingPadUnderPump", "holdDownStrapToFloorAnchor"]) expect(text).toContain(` ${w} `);
    // grouped by case, the cases table fits the page whole (it used to come in two stacked parts):
    // each case is named once, across the width, over its rows
    expect(text).not.toContain("Part 1 of");
    for (const c of [...file.cases!, ...file.combinations!]) {
      expect(text.split(`Case: ${c.name} leftRubberBearingPadUnderEngine `), c.name).toHaveLength(2);
      // (the duty point is the sketch as drawn: its factors of safety are said once, under its name)
      expect(text, c.name).toMatch(new RegExp(`Case: ${c.name}(, as drawn)?( \\(continued\\))? Pump set `));
    }
    // the strap is a tie: its margin reaching zero is named for what it means
    expect(text).toMatch(/Crossing: holdDownStrapToFloorAnchor: slack \(its tension reaches zero\) at mdot = \d+\.?\d* kg\/s \(to 4 significant figures\)\./);
    // the envelope names each support once over its components
    expect(text).toContain("Support: leftRubberBearingPadUnderEngine Fx lbf ");
    // units on the heading's second line still read as "Fx (lbf)"
    expect(text).toMatch(/Fx \(lbf\)/);
    expect(pages.length).toBeGreaterThan(2);
    pages.forEach((items, i) => {
      const words = items.map((it) => it.str).join(" ").replace(/\s+/g, " ");
      // the short caution in the footer of every page
      expect(words, `page ${i + 1}`).toContain("For design checking; review by a qualified engineer required; local codes govern.");
      // nothing past the 44 pt margins (1 pt for rounding)
      for (const it of items) {
        expect(it.x, `"${it.str}" on page ${i + 1}`).toBeGreaterThanOrEqual(44 - 1);
        expect(it.x + it.width, `"${it.str}" on page ${i + 1}`).toBeLessThanOrEqual(pageWidth - 44 + 1);
      }
    });
  }, 60000);

  it("prints the trailer's case, envelope and stability tables with no word broken", async () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
      { id: "high", name: "High throw at full flow", parameters: { theta: "60 deg" } },
    ];
    file.cases.push({ id: "dead", name: "Dead", factors: { flow: 0, loads: 0 } }, { id: "flow", name: "Flow", factors: { dead: 0, loads: 0 } });
    file.combinations = [
      { id: "k1", name: "Factored low throw", terms: [{ case: "low", factor: 1.4 }] },
      { id: "k2", name: "Combination 1", terms: [{ case: "dead", factor: 1.2 }, { case: "flow", factor: 1.5 }] },
    ];
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Trailer", version: 1, savedAt: new Date(), signoff: [], file });
    const { text } = await pdfText(buf);
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error("the sketch did not parse");
    const study = solveCases(parsed.file);
    const tables = [caseReactionTable(study, "SI"), envelopeTable(study, "SI"), designLoadTable(study, "SI"), stabilityTable(study, "SI")];
    expect(brokenWords(text, tables)).toEqual([]);
    expect(text).toMatch(/ Support Fx \(kN\)| Case Support /);
    expect(text).toContain(" bearing ");
    expect(text).toContain("Restoring M / friction available");
  }, 60000);

  it("prints every number of the case tables whole, on one line", async () => {
    // tabular figures are wider than proportional ones; columns once measured without them printed
    // "−6.168" as "−6.16" with its "8" over the next row. The demo trailer, heavier, with six cases
    // and a factored combination (invented data)
    const file = JSON.parse(readFileSync("canvas/examples/fire-monitor-trailer.json", "utf8"));
    file.bodies[0].mass = "1250 kg";
    file.bodies[0].cg = [2.1, 0.85];
    file.parameters = { Q: "1800 gpm", rho: "1000 kg/m^3", tip: "1.8 in", theta: "32 deg" };
    file.cases = [
      { id: "normal-operation", name: "Normal operation" },
      { id: "case-2", name: "Rated flow", parameters: { Q: "2000 gpm" } },
      { id: "case-3", name: "Surge", flowFactor: 1.3 },
      { id: "case-4", name: "Steep throw", parameters: { Q: "2000 gpm", theta: "60 deg" } },
      { id: "case-5", name: "Dead", factors: { flow: 0, loads: 0 } },
      { id: "case-6", name: "Flow", factors: { dead: 0, loads: 0 }, parameters: { Q: "2000 gpm" } },
    ];
    file.combinations = [{ id: "combination-1", name: "Combination 1", terms: [{ case: "case-5", factor: 1.2 }, { case: "case-6", factor: 1.5 }] }];
    const { text } = await pdfText(await buildCalcSheet({ workspace: "W", sketchTitle: "Trailer", version: 1, savedAt: new Date(), signoff: [], file }));
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error("the sketch did not parse");
    const study = solveCases(parsed.file);
    const tables = [caseReactionTable(study, "SI"), envelopeTable(study, "SI"), designLoadTable(study, "SI"), stabilityTable(study, "SI")];
    const numbers = tables.flatMap((t) => tableCells(t).flat().map((c) => c.replace(/\s+/g, " "))).filter((c) => /^[▲▼]? ?−?\d[\d,.]*$/.test(c));
    expect(numbers.length).toBeGreaterThan(50);
    for (const n of numbers) expect(text, n).toContain(` ${n} `);
    // a load group's factor and the flow factor read differently: the one scales loads, the other ṁ and V (flux × f²)
    expect(text).toContain("Surge: flow factor 1.3 (every port's ṁ and V × 1.3, momentum flux × 1.69)");
    expect(text).toContain("Dead: loads of group “flow” × 0, loads of group “loads” × 0");
    // cases by their names, not their ids (a renamed case keeps an id the reader never typed)
    expect(text).toContain("Combination 1: 1.2 × “Dead” + 1.5 × “Flow”, solved as one factored load set");
    expect(text).not.toContain("case-5");
  }, 60000);
});

describe("the closing cautions", () => {
  it("their heading stays on the page of their box, in every example's sheet", { timeout: 60_000 }, async () => {
    const { EXAMPLES } = await import("@/canvas/examples");
    for (const ex of EXAMPLES) {
      const { pages } = await pdfItems(await buildCalcSheet({ workspace: "W", sketchTitle: ex.title, version: 1, savedAt: new Date(), signoff: [], file: ex.sketch }));
      const at = pages.findIndex((items) => items.some((i) => i.str === "Cautions"));
      expect(at, ex.id).toBeGreaterThanOrEqual(0);
      const items = pages[at].map((i) => i.str);
      // the box's own caption and its first caution follow the heading on the same page
      expect(items.slice(items.indexOf("Cautions")).join(" "), ex.id).toMatch(/ENGINEERING CAUTIONS/);
    }
  });

  it("…wherever the page ends: a longer description moves them down, three lines at a time", { timeout: 60_000 }, async () => {
    const file = loadFixture("thrust-stand-tips.json");
    const line = "The test pad drains toward the front pin. ";
    // about two of these sentences to a line of the sheet
    for (let k = 0; k < 19; k++) {
      const { pages } = await pdfItems(await buildCalcSheet({ workspace: "W", sketchTitle: "Stand", version: 1, savedAt: new Date(), signoff: [], file: { ...file, description: line.repeat(k * 6) } }));
      const at = pages.findIndex((items) => items.some((i) => i.str === "Cautions"));
      const items = pages[at].map((i) => i.str);
      expect(items.slice(items.indexOf("Cautions")).join(" "), `description of ${k * 6} sentences`).toMatch(/ENGINEERING CAUTIONS/);
      // the sketch's notes are printed with the inputs: the design basis its author wrote
      if (k === 1) expect(pages.flat().map((i) => i.str).join(" ")).toMatch(/Notes .*The test pad drains toward the front pin\./);
    }
  });
});
