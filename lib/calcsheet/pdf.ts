import "server-only";
// The calc sheet: a PDF of one saved version, made on the server with pdfkit. The drawing is
// the shared SVG renderer's; tables come from solver/report.ts, so they match the screen.
import PDFDocument from "pdfkit";
import SVGtoPDF from "svg-to-pdfkit";
import { renderSketchSvg } from "@/canvas/render/svg";
import { withoutAbsentMoment } from "@/canvas/studies/tables";
import { parameterWords, typedValueWords } from "@/canvas/studies/display";
import {
  ASSUMPTIONS,
  CAUTIONS,
  CONVENTIONS,
  caseReactionTable,
  envelopeTable,
  handCheckTable,
  inputsTable,
  parametersTable,
  parseSketch,
  requirementsOf,
  solveWithStability,
  solveCases,
  stabilityTable,
  asDrawnStudy,
  withAsDrawnRun,
  formatQuantity,
  type UnitSystem,
} from "@/solver";
import type { Port } from "@/solver/types";
import { caseWarnings } from "@/solver/cases";
import { FLOW_FACTOR } from "@/solver/sweep";
import { FLOW_FACTOR_PRESSURES } from "@/solver/cautions";
import { combinationWarningWords } from "@/components/studies/casesText";
import { withSlipNote } from "@/components/studies/slipNote";
import type { CombinationFile } from "@/solver/schema";
import { statusSentences } from "@/components/results/statusSentence";
import { warningInWords } from "@/components/results/errorPlace";
import { defaultMomentPoint } from "@/components/results/handCheck";
import {
  asDrawnTwin,
  caseFindings,
  designLoadTable,
  excludedWords,
  slipWords,
  unitFamily,
  unsolvedWords,
  versionScale,
  withRunName,
  type Table,
} from "@/solver/report";
import { fieldWords } from "@/components/editor/fieldDefs";
import { KIND_LABEL, type ElementKind } from "@/canvas/model/elements";
import { lineChartSvg } from "./chart";
import { sweepCharts, sweepLimitTable } from "./sweeps";
import { registerFonts } from "./fonts";
import { drawTable, tableLeadHeight, type DrawTableOptions } from "./table";
import { checkRecord, type CheckRecordInput } from "./record";
import { elementLabels } from "@/lib/review/pin-words";
import { caseStateFindings } from "@/components/review/concerns";

/** The height an svg says it has (its own attribute), or `fallback`. */
const svgHeight = (svg: string, fallback: number) => Number(/^<svg[^>]*\sheight="([\d.]+)"/.exec(svg)?.[1] ?? fallback);

/** "0.9 × “Weight only” + 1.5 × “Wind only, 40 m/s”": the cases by the names the tables use. */
const combinationTerms = (k: CombinationFile, cases: ReadonlyArray<{ id: string; name: string }> = []) =>
  k.terms.map((t) => `${t.factor} × “${cases.find((c) => c.id === t.case)?.name ?? t.case}”`).join(" + ");

export interface SignoffEntry {
  role: "prepared" | "checked" | "approved";
  name: string;
  at: Date;
}

export interface CalcSheetInput {
  workspace: string;
  sketchTitle: string;
  version: number;
  /** the sketch's latest version: a sheet of an earlier one says it is superseded */
  latestVersion?: number;
  versionMessage?: string;
  savedAt: Date;
  generatedAt?: Date;
  /** prepared / checked / approved, when signed */
  signoff: SignoffEntry[];
  /** where the review stands ("approval withdrawn by …: reason"), printed under the signatures */
  review?: string;
  /** the newest earlier version that stands approved, when this one is not approved itself */
  approvedEarlier?: number;
  /** when this version is approved and later ones exist: the newest later one that stands approved
   *  (null when none is, so this one remains the approved design) */
  approvedLater?: number | null;
  /** the saved sketch file */
  file: unknown;
  /** the version's sign-off steps and comment threads, printed as its check record */
  record?: CheckRecordInput;
  units?: UnitSystem;
}

const INK = "#1d2329";
const SOFT = "#3d4650";
const FAINT = "#5f6974";
const RULE = "#cfc8b8";
const ACCENT = "#b4462b";
const CAUTION_BG = "#f6ebcf";

/** The room (pt) a section heading takes: the space above it, its line and its rule. */
const HEADING_ROOM = 32;
/** The room (pt) under a heading for the first lines of prose (three lines at 9.5 pt, and a little). */
const PROSE_KEEP = 40;

const fmtDate = (d: Date) => d.toISOString().slice(0, 16).replace("T", " ") + " UTC";

const PROSE_FEATURES = { kern: false } as unknown as PDFKit.Mixins.OpenTypeFeatures[];

export async function buildCalcSheet(input: CalcSheetInput): Promise<Buffer> {
  const units = input.units ?? "SI";
  const parsed = parseSketch(input.file);
  if (!parsed.ok) throw new Error(`the saved sketch does not parse: ${parsed.errors.map((e) => `${e.path} ${e.message}`).join("; ")}`);
  // with the factors of safety, so a body that tips and slides says which comes first, as on screen
  const { result, stability } = solveWithStability(parsed.sketch, requirementsOf(parsed.file));
  result.warnings.unshift(...parsed.warnings);
  const study = solveCases(parsed.file);
  // the values on the drawing are a state of their own: with cases, solved apart for its factors of safety
  const asDrawn = parsed.file.cases?.length || parsed.file.combinations?.length ? asDrawnStudy(parsed.file) : study;
  // unless a case is that state over again: then its findings and factors of safety are said once,
  // under the case's name with "as drawn" beside it (the reaction tables keep the case's own name)
  const twin = asDrawnTwin(study, asDrawn);
  const twinName = (name: string) => `${name}, as drawn`;
  const named = twin ? withRunName(study, twin, twinName(study.runs.find((r) => r.id === twin)!.name)) : study;
  // each body's hand check, about the point the results panel's takes by default (the body's first
  // support, else its centre of gravity), so the sheet and the screen show the same terms
  const handChecks = Object.keys(result.bodies).map((id) => ({ id, about: defaultMomentPoint(result.equations[id], parsed.sketch.bodies.find((b) => b.id === id)?.cg) }));
  // one unit family for the whole sheet, from its largest force or moment (the result as drawn as the
  // results panel scales it, `resultScale`: its reactions, the terms of its hand checks and its
  // factors of safety; every case's reactions and factors of safety): N with N·m only when all of it
  // is below 1 kN (1 kN·m), else kN with kN·m; lbf with lbf·ft, or kip with kip·ft from 10 kip
  // (10 kip·ft). A sketch without cases reads on the sheet in the units of its screen
  // (`versionScale`, which the version's review page shares)
  const sheetScale = versionScale(result, study, asDrawn, stability);
  const family = unitFamily(units, sheetScale);

  const doc = new PDFDocument({ size: "A4", margins: { top: 44, bottom: 54, left: 44, right: 44 }, bufferPages: true, info: { Title: `${input.sketchTitle} v${input.version}`, Author: "Counterpoise", Subject: "Calculation sheet" } });
  registerFonts(doc);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on("end", () => resolve(Buffer.concat(chunks))));
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;

  /** `keep`: the room (pt) the heading's first block needs on its page, so the two stay together
   *  (by default: a paragraph's first three lines, what `para` keeps on its first page) */
  const heading = (text: string, keep = HEADING_ROOM + PROSE_KEEP) => {
    ensureSpace(doc, keep);
    doc.moveDown(0.6).font("Inter-SemiBold").fontSize(11.5).fillColor(INK).text(text, left, doc.y, { width });
    doc.moveTo(left, doc.y + 2).lineTo(left + width, doc.y + 2).lineWidth(0.6).strokeColor(RULE).stroke();
    doc.moveDown(0.5);
  };
  /** A heading over a table: kept on the page where the table's header and first row fit. */
  const tableHeading = (text: string, table: Table, options: DrawTableOptions = {}) => heading(text, HEADING_ROOM + tableLeadHeight(doc, table, width, options));
  // prose without kerning: a kerned "7," reads back (copied, or by a text reader) as "7 ,", and an
  // engineer copies figures out of the sheet
  // a paragraph of up to three lines is never split across pages, a longer one leaves at least two
  // lines on its first; `next`: the room (pt) what follows needs on the same page (a label's text)
  const paraLead = (text: string, size = 9) => proseLead(doc, text, size, width);
  const para = (text: string, size = 9, color = SOFT, next = 0) => paragraph(doc.fillColor(color), text, left, width, size, next);
  /** A label over lines (a list's caption): kept on the page of the first line under it. */
  const label = (text: string, first: string, size = 9, color = INK, firstSize = 8.5) => para(text, size, color, paraLead(first, firstSize));
  const boldLabel = (text: string, first: string) => {
    doc.font("Inter-SemiBold").fontSize(8.5);
    ensureSpace(doc, doc.currentLineHeight(true) + paraLead(first, 8.5));
    doc.font("Inter-SemiBold").fontSize(8.5).fillColor(INK).text(text, left, doc.y, { width });
  };

  // ---- title block
  titleBlock(doc, input, left, width);

  // ---- short cautions under the title block
  cautionBox(doc, left, width, [CAUTIONS[0], CAUTIONS[1] + " " + CAUTIONS[2]]);

  // ---- status
  const hasCases = !!(parsed.file.cases?.length || parsed.file.combinations?.length);
  heading(hasCases ? "Result as drawn" : "Result");
  // the sentences of the results panel: a body that slips is not reported as holding
  const said = new Set<string>();
  for (const s of statusSentences(parsed.sketch, result, units, family.force, stability, parsed.file)) {
    const b = result.bodies[s.body];
    // a body with a support released: its details say what the supports that carry load are
    const determinacy = b.determinacy.kind === "indeterminate" || b.activeDeterminacy ? "" : ` Statically ${b.determinacy.kind}.`;
    // short of a factor: the first detail says what the supports do ("It holds — …"), and the
    // determinacy follows it, not the failing check
    const after = s.short && s.details.length ? 0 : -1;
    para(`${s.headline}.${after < 0 ? determinacy : ""}`, 9.5, s.tone === "holds" && !s.short ? INK : ACCENT);
    s.details.forEach((d, i) => {
      para(i === after ? `${d}${determinacy}` : d, 8.5, SOFT);
      said.add(d.replace(/\.$/, ""));
    });
  }
  // the warnings the sentences above have not said already (they name the supports by id)
  // (a body's own "slides as a whole" is its status sentence's headline already)
  const more = result.warnings.filter((w) => w.code !== "INDETERMINATE" && !said.has(w.message.replace(/\.$/, "")) && !said.has(warningInWords(parsed.file, w.message).replace(/\.$/, "")) && !(w.code === "SLIP" && w.ids.every((id) => id in result.bodies)));
  if (more.length) {
    doc.moveDown(0.3);
    for (const w of more) para(`Warning: ${w.message}`, 8.5, w.code === "SLIP" || w.code === "LIFTOFF" || w.code === "SLACK" ? ACCENT : SOFT);
  }
  // the sheet's first page says when another case does not hold or a factor of safety falls short
  // (a case that is the sketch as drawn says its findings once, under its own name)
  const drawnLines = hasCases && !twin ? caseFindings(asDrawn, false) : [];
  if (drawnLines.length) {
    doc.moveDown(0.3);
    label("Factors of safety as drawn:", `• ${drawnLines[0]}`);
    for (const l of drawnLines) para(`• ${l}`, 8.5, ACCENT);
  }
  // and a case in which a contact lifts, a tie goes slack or a contact is over its own μ while the
  // body holds, as the sign-off dialogs list it (said of the sketch as drawn by its sentence above)
  const caseLines = [...caseFindings(named, hasCases), ...(hasCases ? caseStateFindings(named) : [])];
  if (caseLines.length) {
    doc.moveDown(0.3);
    label(hasCases ? "In the cases and combinations:" : "Factors of safety:", `• ${caseLines[0]}`);
    for (const l of caseLines) para(`• ${l}`, 8.5, ACCENT);
  }

  // ---- drawing
  // a tall sketch (a stack, a mast) takes a taller drawing, up to as tall as it is wide, in the room
  // left on the page; its heading goes to the next page with it when even the usual one does not fit
  const room = Math.floor(((doc.page.height - doc.page.margins.bottom - doc.y - 41) * 900) / width);
  const svg = haloBehindLabels(renderSketchSvg(parsed.file, result, { units, family, width: 900, height: 560, maxHeight: Math.min(900, Math.max(560, room)) }));
  const drawnHeight = width * (svgHeight(svg, 560) / 900);
  ensureSpace(doc, drawnHeight + 40);
  heading("Free-body diagram (control volume)");
  SVGtoPDF(doc, svg, left, doc.y, { width, height: drawnHeight, preserveAspectRatio: "xMidYMid meet", fontCallback: (family: string, bold: boolean) => (bold ? "Inter-SemiBold" : "Inter") });
  // the drawing carries its own legend (solid, double and dashed arrows) on its bottom line
  doc.y += drawnHeight + 6;

  // ---- inputs: the sketch's notes first (the design basis its author wrote), then the values
  const notes = parsed.file.description?.trim();
  const inputTables = [
    ...(Object.keys(parsed.parameterValues).length ? [parametersTable(parsed, units)] : []),
    // the fields and kinds in the words of the properties form, not the file format's names
    inputsTable(parsed, units, { field: fieldWords, kind: (k) => KIND_LABEL[k as ElementKind]?.toLowerCase() ?? k }),
  ];
  // the heading kept with the notes' label and first lines, or with the first table's header and row
  doc.font("Inter").fontSize(9);
  heading("Inputs", HEADING_ROOM + (notes ? doc.currentLineHeight(true) + paraLead(notes, 8.5) : tableLeadHeight(doc, inputTables[0], width)));
  if (notes) {
    // each of the notes' paragraphs (its lines as typed) on its own, so each keeps its lines together
    const paragraphs = notes.split("\n");
    label("Notes", paragraphs[0]);
    for (const p of paragraphs) {
      if (p.trim()) para(p, 8.5, SOFT);
      else doc.font("Inter").fontSize(8.5).moveDown(1);
    }
    doc.moveDown(0.4);
  }
  for (const t of inputTables) drawTable(doc, t, left, width);

  // ---- cases
  if (hasCases) {
    heading("Operating cases and combinations");
    for (const c of parsed.file.cases ?? []) {
      const over = Object.entries(c.parameters ?? {}).map(([k, v]) => `${k} = ${typedValueWords(v)}`);
      // a load group's factor scales its loads; the flow factor scales ṁ and V, so momentum flux by f²
      const fac = Object.entries(c.factors ?? {}).map(([k, v]) => `loads of group “${k}” × ${typedValueWords(v)}`);
      const f = c.flowFactor;
      const flow = f !== undefined && f !== 1 ? [`flow factor ${f} (every port's ṁ and V × ${f}, momentum flux × ${Number((f * f).toPrecision(4))})`] : [];
      const bits = [...over, ...fac, ...flow, ...(c.onlyInCombinations ? ["a load case, solved only in the combinations that name it"] : [])];
      // the case that is the sketch as drawn is named so ("Duty, as drawn"), so its changes are none, not "as drawn" twice
      para(`${c.id === twin ? twinName(c.name) : c.name}: ${bits.length ? bits.join(", ") : c.id === twin ? "no changes to the sketch" : "as drawn"}`, 8.5, INK);
      for (const w of caseWarnings(parsed.file, c)) para(`Warning: ${w}`, 8.5, ACCENT);
    }
    for (const k of parsed.file.combinations ?? []) {
      const own = k.stability ? Object.entries(k.stability).map(([what, v]) => `${v} against ${what}`) : [];
      para(`${k.name}: ${combinationTerms(k, parsed.file.cases)}, solved as one factored load set${own.length ? `; required factors of safety ${own.join(", ")}` : ""}`, 8.5, INK);
      for (const w of combinationWarningWords(parsed.file, k)) para(`Warning: ${w}`, 8.5, ACCENT);
    }
  }

  // ---- conventions: what a checker needs to redo the tables below by hand
  heading("Conventions");
  for (const c of [...CONVENTIONS, unitsConvention(family, units)]) para(`• ${c}`);

  // ---- hand check
  for (const { id: bodyId, about } of handChecks) {
    // the body as the drawing labels it (its id where it has no label)
    const name = parsed.file.bodies.find((b) => b.id === bodyId)?.label?.trim() || bodyId;
    const table = handCheckTable(result, bodyId, about, units, { scale: sheetScale, name });
    tableHeading(`Hand check — ${name}`, table);
    drawTable(doc, table, left, width);
  }

  // ---- reactions per case, envelope, stability
  if (hasCases) {
    // a contact over its own μ in a body that passes its sliding check: marked and said, as on screen
    const perCase = withSlipNote(withoutAbsentMoment(caseReactionTable(study, units, sheetScale), study), study);
    tableHeading("Reactions per case (forces on the body)", perCase, { groupBy: "case" });
    drawTable(doc, perCase, left, width, { groupBy: "case" });
    const words = [...excludedWords(study), ...slipWords(study)];
    const unsolved = unsolvedWords(study);
    // (no envelope while a run does not solve)
    const envelope = unsolved ? null : withoutAbsentMoment(envelopeTable(study, units, sheetScale), study);
    // straight over its table, the heading keeps to the table's page
    if (!words.length && envelope) tableHeading("Envelope and design loads", envelope, { groupBy: "support" });
    else heading("Envelope and design loads");
    for (const w of words) para(w, 8.5, ACCENT);
    if (!envelope) para(unsolved!, 8.5, ACCENT);
    else {
      drawTable(doc, envelope, left, width, { groupBy: "support" });
      drawTable(doc, withoutAbsentMoment(designLoadTable(study, units, sheetScale), study), left, width);
    }
  } else {
    // one run: an envelope of it, or a governing case among one, would only repeat its numbers
    heading("Reactions as drawn (forces on the body)");
    para("No operating cases are defined: these are the reactions of the sketch as drawn.", 8.5, SOFT);
    drawTable(doc, singleRunTable(withoutAbsentMoment(caseReactionTable(study, units, sheetScale), study)), left, width);
  }
  // with cases, the sketch as drawn first: its own state, then each case's (once, when a case is it)
  const stabilityRows = stabilityTable(twin ? named : withAsDrawnRun(study, asDrawn), units, sheetScale);
  tableHeading("Stability", stabilityRows, { groupBy: "case" });
  drawTable(doc, stabilityRows, left, width, { groupBy: "case" });

  // ---- sweeps: each on its saved case, one chart per unit (forces, moments, ratios)
  const chartHeight = width * (260 / 500);
  for (const sw of parsed.file.sweeps ?? []) {
    const caseName = sw.case ? (parsed.file.cases?.find((c) => c.id === sw.case)?.name ?? sw.case) : null;
    const combination = sw.combination ? parsed.file.combinations?.find((k) => k.id === sw.combination) : undefined;
    const on = sw.combination ? ` — combination ${combination?.name ?? sw.combination}` : caseName ? ` — case ${caseName}` : " — as drawn";
    const intro: string[] = [];
    // a case that sets the swept parameter itself: the sweep's values stand in for the case's
    const overridden = sw.case ? parsed.file.cases?.find((c) => c.id === sw.case)?.parameters?.[sw.parameter] : undefined;
    if (overridden !== undefined) intro.push(`The sweep's values of ${sw.parameter} stand in for the case's own (${sw.parameter} = ${typedValueWords(overridden)}); everything else is as in the case.`);
    // a case's own flow factor is scaled by the swept one, not replaced (solver/sweep.ts)
    const ownFlow = sw.case && sw.parameter === FLOW_FACTOR ? parsed.file.cases?.find((c) => c.id === sw.case)?.flowFactor : undefined;
    if (ownFlow !== undefined && ownFlow !== 1) intro.push(`The sweep's flow factor multiplies the case's own (flow × ${ownFlow}): each point runs the flow × ${ownFlow}·f; everything else is as in the case.`);
    if (combination)
      intro.push(
        `Each point is solved as the combination's factored load set (${combinationTerms(combination, parsed.file.cases)}), with the sweep's value of ${parameterWords(sw.parameter)} ${sw.parameter === FLOW_FACTOR ? "multiplying each of its cases' own (1 unless the case gives one)" : "in every one of its cases"}.`,
      );
    let swept: ReturnType<typeof sweepCharts> | null = null;
    let failed = "";
    try {
      swept = sweepCharts(parsed.file, sw, units, Object.keys(result.reactions), family);
    } catch (err) {
      failed = `This sweep could not be run: ${(err as Error).message}`;
    }
    // the heading kept with the sentences under it and the first chart (or the reason there is none)
    const introHeight = intro.reduce((h, t) => h + doc.font("Inter").fontSize(8.5).heightOfString(t, { width, features: PROSE_FEATURES }), 0);
    heading(`Sweep of ${parameterWords(sw.parameter)}${on}`, HEADING_ROOM + introHeight + (swept?.charts.length ? chartHeight + 4 : paraLead(failed || " ", 8.5)));
    for (const t of intro) para(t, 8.5, INK);
    if (!swept) {
      para(failed, 8.5, ACCENT);
      continue;
    }
    try {
      const { charts, markers, states } = swept;
      for (const spec of charts) {
        ensureSpace(doc, chartHeight + 4);
        SVGtoPDF(doc, haloBehindLabels(lineChartSvg(spec)), left, doc.y, { width, height: chartHeight, preserveAspectRatio: "xMidYMid meet", fontCallback: () => "Inter" });
        doc.y += chartHeight + 4;
      }
      for (const mk of markers) para(`Crossing: ${mk.words}.`, 8.5, INK);
      // where a plotted contact is off the ground (a tie slack), or a friction margin is left out
      // because its body is not held: the gaps in the lines, in the Sweep tab's words
      for (const line of states) para(line, 8.5, INK);
      // said of the plotted run only: another case may cross (the table below names each)
      const plotted = combination ? `combination ${combination.name}` : caseName ? `case ${caseName}` : "the sketch as drawn";
      if (!markers.length && charts.some((c) => c.series.some((se) => se.markZero))) para(`No crossing in this range for ${plotted}: none of the plotted margins reaches zero.`, 8.5, INK);
      // every limit (lift-off, slack, slip) searched in every run the sweep covers, reached or not:
      // the numbers of the editor's "In every case"
      const limits = sweepLimitTable(parsed.file, sw, undefined, units);
      if (limits.table.rows.length) {
        // the heading kept with the sentence under it and the table's first rows
        const said = doc.font("Inter").fontSize(8.5).heightOfString(limits.summary, { width, features: PROSE_FEATURES });
        heading(`Limits in every case — sweep of ${parameterWords(sw.parameter)}`, HEADING_ROOM + said + tableLeadHeight(doc, limits.table, width, { groupBy: "limit" }));
        para(limits.summary, 8.5, INK);
        drawTable(doc, limits.table, left, width, { groupBy: "limit" });
      } else para(limits.summary, 8.5, INK);
    } catch (err) {
      para(`This sweep could not be run: ${(err as Error).message}`, 8.5, ACCENT);
    }
  }

  // ---- the check record: sign-off steps with their notes, and every comment thread
  if (input.record) {
    const rec = checkRecord(input.record, elementLabels(parsed.file));
    heading("Check record");
    para(rec.summary, 9, INK);
    doc.moveDown(0.3);
    const noSteps = "Not yet submitted for checking.";
    boldLabel("Sign-off", rec.steps[0] ?? noSteps);
    if (rec.steps.length) for (const line of rec.steps) para(line, 8.5, SOFT);
    else para(noSteps, 8.5, SOFT);
    if (rec.threads.length) {
      doc.moveDown(0.4);
      const first = rec.threads[0];
      doc.font("Inter-SemiBold").fontSize(8.5);
      // the label kept with the first thread's heading and its first lines
      ensureSpace(doc, 2 * doc.currentLineHeight(true) + 4 + (first.lines[0] ? proseLead(doc, first.lines[0], 8.5, width - 12) : 0));
      doc.font("Inter-SemiBold").fontSize(8.5).fillColor(INK).text("Comments", left, doc.y, { width });
    }
    for (const t of rec.threads) {
      // a thread's heading kept with its first lines; a short thread whole
      doc.font("Inter-SemiBold").fontSize(8.5);
      const head = doc.heightOfString(t.heading, { width, features: PROSE_FEATURES });
      ensureSpace(doc, 3 + head + (t.lines[0] ? proseLead(doc, t.lines[0], 8.5, width - 12) : 0));
      doc.moveDown(0.25);
      doc.font("Inter-SemiBold").fontSize(8.5).fillColor(t.open ? ACCENT : INK).text(t.heading, left, doc.y, { width, features: PROSE_FEATURES });
      for (const line of t.lines) {
        paragraph(doc.fillColor(SOFT), line, left + 12, width - 12, 8.5);
      }
    }
    if (rec.earlier || rec.later) doc.moveDown(0.4);
    for (const line of [rec.earlier, rec.later]) if (line) para(line, 8.5, ACCENT);
  }

  // ---- method, assumptions, cautions
  // the equations on lines of their own, as a checker writes them out
  heading("Method", HEADING_ROOM + paraLead(METHOD[0]) + 2 * 14);
  para(METHOD[0]);
  doc.moveDown(0.25);
  for (const eq of EQUATIONS) {
    doc.font("Inter").fontSize(9.5);
    ensureSpace(doc, doc.heightOfString(eq, { width: width - 24, features: PROSE_FEATURES }) + 3);
    doc.fillColor(INK).text(eq, left + 24, doc.y, { width: width - 24, features: PROSE_FEATURES });
    doc.y += 3;
  }
  doc.moveDown(0.25);
  for (const m of METHOD.slice(1)) para(m);
  heading("Assumptions");
  const assumptions = [...ASSUMPTIONS, ...fluidAssumptions(parsed.sketch.ports, units, hasCases)];
  // the cautions close the sheet and never stand alone on its last page: the last two assumptions
  // go to the next page with them when the page cannot hold all of them
  const closing = HEADING_ROOM + cautionBoxHeight(doc, width, [...CAUTIONS]) + 6;
  const tail = Math.max(0, assumptions.length - 2);
  assumptions.forEach((a, i) => {
    if (i === tail) ensureSpace(doc, assumptions.slice(tail).reduce((h, t) => h + doc.font("Inter").fontSize(9).heightOfString(`• ${t}`, { width, features: PROSE_FEATURES }), 0) + closing);
    para(`• ${a}`);
  });
  heading("Cautions", closing);
  cautionBox(doc, left, width, [...CAUTIONS]);

  footer(doc, input);
  doc.end();
  return done;
}

/** The method in words, around its two equations (`EQUATIONS`, printed on lines of their own). */
export const METHOD: readonly string[] = [
  "For each body, the linear momentum and moment-of-momentum equations of a control volume fixed to the body, in steady flow (W the body's weight, at its centre of gravity G; m·a its mass times the acceleration the sketch gives, none unless it gives one):",
  `Moments are taken about a point O, counter-clockwise positive, with r measured from O; each sum runs over the body's supports, loads and ports, and a couple counts whole. A port's momentum flux is β·ṁ·V, with β its momentum-flux factor (1, uniform flow, unless given). Gauge pressure at a port pushes inward (p·A along the flow at an inlet, against it at an outlet). ${FLOW_FACTOR_PRESSURES} Supports are stiff springs on the rigid body: a statically determinate body's reactions follow from equilibrium alone; an indeterminate one's from the support stiffnesses. Contacts push only and ties pull only; a contact or tie that would have to pull or push is released (lifts, goes slack), and a body that no engagement can hold tips (the reactions shown are then those equilibrium would require with every support bilateral). Friction is checked (|t|\u00a0≤\u00a0μ·n), not enforced.`,
];

/** Linear momentum and moment of momentum for a control volume in steady flow. */
export const EQUATIONS: readonly string[] = [
  "ΣF(reactions) + ΣF(loads) + W + ΣF(pressure) − m·a = Σ(ṁV)out − Σ(ṁV)in",
  "ΣM(reactions) + ΣM(loads) + r(G) × W + Σ r × F(pressure) − r(G) × m·a = Σ(r × ṁV)out − Σ(r × ṁV)in",
];

/**
 * The sheet's assumption on the fluid: the density each port's flow is worked out at, by port
 * (the sketch as drawn: a case may set its own through a parameter). None for a sketch without ports.
 */
export function fluidAssumptions(ports: ReadonlyArray<Pick<Port, "id" | "label" | "density">>, units: UnitSystem, hasCases = false): string[] {
  if (!ports.length) return [];
  const name = (p: Pick<Port, "id" | "label">) => p.label?.trim() || p.id;
  const list = (names: string[]) => (names.length < 2 ? names.join("") : `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`);
  const given = ports.filter((p) => p.density !== undefined && Number.isFinite(p.density));
  const byValue = new Map<string, string[]>();
  for (const p of given) {
    const v = formatQuantity(p.density!, "density", units);
    byValue.set(v, [...(byValue.get(v) ?? []), name(p)]);
  }
  const without = ports.filter((p) => !given.includes(p)).map(name);
  const drawn = hasCases ? " (as drawn; a case may set its own)" : "";
  const parts: string[] = [];
  if (given.length) parts.push(`Fluid density as each port gives it, constant across the port${drawn}: ${[...byValue].map(([v, names]) => `${v} at ${list(names)}`).join("; ")}.`);
  if (without.length) parts.push(`${without.length === 1 ? "Port" : "Ports"} ${list(without)} ${without.length === 1 ? "gives" : "give"} no density: ${without.length === 1 ? "its" : "their"} mass flow and velocity are taken as given.`);
  return [parts.join(" ")];
}

/** The conventions' line on units: the sheet's one family for forces and moments, and the rule that chose it. */
export function unitsConvention(family: { force: string; moment: string }, units: UnitSystem): string {
  const rule =
    units === "US"
      ? "lbf and lbf·ft, or kip and kip·ft once a force reaches 10 kip or a moment 10 kip·ft"
      : "kN and kN·m, or N and N·m when every force is below 1 kN and every moment below 1 kN·m";
  return `Forces in ${family.force} and moments in ${family.moment} in every table, chart and drawing of this sheet: one unit family for the whole sheet, chosen from its largest force or moment (${rule}).`;
}

/** svg-to-pdfkit ignores paint-order, so a label's paper-coloured halo (its stroke) would be
 *  painted over its letters. Each haloed label becomes two: the halo alone, then the letters, so
 *  a label crossing an outline or a hatch stays readable as it is on screen. */
export function haloBehindLabels(svg: string): string {
  return svg.replace(
    /<text([^>]*?) stroke="(#[0-9a-fA-F]{3,8})" stroke-width="([\d.]+)" paint-order="stroke" stroke-linejoin="round">([^<]*)<\/text>/g,
    (_, attrs: string, halo: string, w: string, content: string) =>
      `<text${attrs.replace(/ fill="[^"]*"/, ` fill="${halo}"`)} stroke="${halo}" stroke-width="${w}" stroke-linejoin="round">${content}</text><text${attrs}>${content}</text>`,
  );
}

/** A line for each run whose body does not hold, or whose factor of safety is below the required
 *  value (the as-drawn run's status is already said above, so only its factors when it is alone). */

/** The cases table of a sketch with no cases: no case column, no governing marks or words. */
function singleRunTable(t: Table): Table {
  const drop = new Set(["case", "governs"]);
  const keep = t.columns.map((c) => !drop.has(c.key));
  return { ...t, title: "Reactions as drawn (forces on the body)", columns: t.columns.filter((_, i) => keep[i]), rows: t.rows.map((r) => r.filter((_, i) => keep[i])), marks: undefined, notes: undefined };
}

/** The room (pt) a paragraph needs on the page it starts on: all of it up to three lines, else
 *  its first two (the rest flows on; no line is left alone at the foot of a page). */
function proseLead(doc: PDFKit.PDFDocument, text: string, size: number, width: number): number {
  doc.font("Inter").fontSize(size);
  const line = doc.currentLineHeight(true);
  const h = doc.heightOfString(text, { width, features: PROSE_FEATURES });
  return h <= 3 * line + 0.5 ? h : 2 * line;
}

/** A paragraph of prose at `size` pt: up to three lines whole on one page, a longer one with two
 *  lines at least on each side of a page break; `next`: the room (pt) what follows needs with it. */
export function paragraph(doc: PDFKit.PDFDocument, text: string, x: number, width: number, size: number, next = 0) {
  ensureSpace(doc, proseLead(doc, text, size, width) + next);
  flowProse(doc.font("Inter").fontSize(size), text, x, width);
}

/**
 * How many of a paragraph's `lines` go on each page it runs over: as many as each page holds
 * (`fit` on the first, `full` on each after it), but where only one line would be left for the next
 * page (a widow), that page ends a line early, so two go over (common practice in typesetting). A
 * page that holds fewer than three keeps what it holds (`proseLead` gives the first page two at least).
 */
export function proseBreaks(lines: number, fit: number, full: number): number[] {
  const out: number[] = [];
  let left = lines;
  let room = fit;
  while (left > 0) {
    let take = Math.min(left, Math.max(room, 0));
    if (left - take === 1 && take >= 3) take--;
    // a page with no room at all (the paragraph starts at its foot): pdfkit moves on at once
    if (take > 0 || out.length === 0) out.push(take);
    left -= take;
    room = full;
    if (full < 1) break;
  }
  return out;
}

/**
 * Prose in the current font from `doc.y`, flowing onto the next pages as it must, but never leaving
 * one line alone at the top of a page (a widow) at any of its breaks: where only the last line
 * would go over, the page ends a line early, so two go over (`proseBreaks`). (The page it starts
 * on keeps two lines at least: `proseLead`, checked before.)
 */
export function flowProse(doc: PDFKit.PDFDocument, text: string, x: number, width: number) {
  const options = { width, features: PROSE_FEATURES };
  const line = doc.currentLineHeight(true);
  const lines = Math.round(doc.heightOfString(text, options) / line);
  const page = doc.page;
  // the lines a page holds from a height (pdfkit breaks once the next line would pass its foot)
  const holds = (p: PDFKit.PDFPage, y: number) => Math.floor((p.height - p.margins.bottom - y) / line + 1e-6);
  const fit = holds(page, doc.y);
  const full = holds(page, page.margins.top);
  const plan = proseBreaks(lines, fit, full);
  // the pages (by their place in the plan) that end a line early
  const early = new Set(plan.flatMap((take, k) => (k < plan.length - 1 && take < (k === 0 ? fit : full) ? [k] : [])));
  if (!early.size) {
    doc.text(text, x, doc.y, options);
    return;
  }
  // pdfkit reads a page's foot when the text starts on it and at each page it adds: raise it half a
  // line below the last line it keeps, for this paragraph, then put it back (the footer is drawn
  // on each page later)
  const raised: Array<[PDFKit.PDFPage, PDFKit.PDFPage["margins"]]> = [];
  const raise = (p: PDFKit.PDFPage, y: number, take: number) => {
    raised.push([p, p.margins]);
    p.margins = { ...p.margins, bottom: p.height - (y + take * line + line / 2) };
  };
  let k = 0;
  if (early.has(0)) raise(page, doc.y, plan[0]);
  const added = () => {
    k++;
    if (early.has(k)) raise(doc.page, doc.page.margins.top, plan[k]);
  };
  doc.on("pageAdded", added);
  try {
    doc.text(text, x, doc.y, options);
  } finally {
    doc.off("pageAdded", added);
    for (const [p, margins] of raised) p.margins = margins;
  }
}

function ensureSpace(doc: PDFKit.PDFDocument, needed: number) {
  if (doc.y + needed > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

function titleBlock(doc: PDFKit.PDFDocument, input: CalcSheetInput, left: number, width: number) {
  const top = doc.y;
  const h = 104;
  doc.rect(left, top, width, h).lineWidth(1).strokeColor(INK).stroke();
  const split = left + width * 0.52;
  doc.moveTo(split, top).lineTo(split, top + h).lineWidth(0.6).stroke();
  doc.font("Inter-SemiBold").fontSize(8).fillColor(ACCENT).text("COUNTERPOISE · CALCULATION SHEET", left + 10, top + 9, { width: split - left - 20 });
  // each text in its place in the box, cut with an ellipsis where it is too long; what is cut is
  // printed whole under the box, so no word of the title or the revision note is lost
  const inner = split - left - 20;
  const cut: Array<[string, string]> = [];
  const boxed = (text: string, font: string, size: number, y: number, lines: number, color: string, name: string, whole = text) => {
    doc.font(font).fontSize(size);
    const room = lines * doc.currentLineHeight(true) + 1;
    if (doc.heightOfString(text, { width: inner }) > room) cut.push([name, whole]);
    doc.fillColor(color).text(text, left + 10, y, { width: inner, height: room, ellipsis: true });
  };
  boxed(input.sketchTitle, "Inter-SemiBold", 13, top + 24, 2, INK, "Title");
  boxed(`Workspace: ${input.workspace}`, "Inter", 8.5, top + 62, 1, SOFT, "Workspace", input.workspace);
  boxed(`Version ${input.version}${input.versionMessage ? ` — ${input.versionMessage}` : ""}`, "Inter", 8.5, top + 74, 2, SOFT, `Version ${input.version}`, input.versionMessage ?? "");
  const rows: Array<[string, string]> = [
    ["Saved", fmtDate(input.savedAt)],
    ["Printed", fmtDate(input.generatedAt ?? new Date())],
  ];
  for (const role of ["prepared", "checked", "approved"] as const) {
    const s = input.signoff.find((x) => x.role === role);
    rows.push([`${role[0].toUpperCase()}${role.slice(1)} by`, s ? `${s.name}, ${fmtDate(s.at)}` : "—"]);
  }
  rows.forEach(([k, v], i) => {
    const y = top + 9 + i * 18.5;
    doc.font("Inter").fontSize(7.5).fillColor(FAINT).text(k, split + 10, y, { width: 62 });
    // a long name is cut in the box and printed whole under it, with its date
    doc.font("Inter-SemiBold").fontSize(7.8);
    const w = left + width - split - 78;
    if (doc.widthOfString(v) > w) cut.push([k, v]);
    doc.fillColor(INK).text(v, split + 72, y - 0.5, { width: w, height: doc.currentLineHeight(true) + 1, ellipsis: true });
  });
  doc.y = top + h + 8;
  for (const [name, whole] of cut) {
    doc.font("Inter-SemiBold").fontSize(8.5).fillColor(INK).text(`${name}: `, left, doc.y, { continued: true });
    doc.font("Inter").fillColor(SOFT).text(whole, { width, features: PROSE_FEATURES });
    doc.y += 4;
  }
  // where the review stands, under the box across its width: a withdrawn approval is not left to be
  // read as current, and its reason is printed whole
  if (input.review) {
    doc.font("Inter-SemiBold").fontSize(8.5).fillColor(INK).text("Review: ", left, doc.y, { continued: true });
    doc.font("Inter").fillColor(SOFT).text(input.review, { width, features: PROSE_FEATURES });
    doc.y += 4;
  }
  // a revision of an approved design is not mistaken for the approved one
  if (input.approvedEarlier) {
    const v = input.approvedEarlier;
    doc.font("Inter-SemiBold").fontSize(8.5).fillColor(INK).text("Revision: ", left, doc.y, { continued: true });
    doc.font("Inter").fillColor(SOFT).text(`v${v} is the approved version of this sketch. This sheet is of v${input.version}, which is not approved: v${v}'s approval does not carry over to it.`, { width, features: PROSE_FEATURES });
    doc.y += 4;
  }
  // a sheet of an earlier version is not mistaken for the current design, nor an approved one whose
  // later versions are unapproved drafts for one whose approval lapsed
  if (input.latestVersion && input.latestVersion > input.version) {
    doc.font("Inter-SemiBold").fontSize(8.5).fillColor(input.approvedLater === null ? INK : ACCENT).text(laterVersionsWords(input.version, input.latestVersion, input.approvedLater), left, doc.y, { width, features: PROSE_FEATURES });
    doc.y += 4;
  }
}

/** What the sheet of an earlier version says of the later ones. */
export function laterVersionsWords(version: number, latest: number, approvedLater?: number | null): string {
  if (approvedLater === null) return `Later versions: v${latest} is the latest version of this sketch. No later version is approved, so this one, v${version}, remains the approved design.`;
  if (approvedLater === undefined) return `Superseded: v${latest} is the latest version of this sketch.`;
  return approvedLater === latest
    ? `Superseded: v${latest}, the latest version of this sketch, is approved.`
    : `Superseded: v${approvedLater}, a later version, is approved; v${latest} is the latest version of this sketch.`;
}

function cautionBoxHeight(doc: PDFKit.PDFDocument, width: number, lines: string[]): number {
  doc.font("Inter").fontSize(8.5);
  return doc.heightOfString(lines.join(" "), { width: width - 20 }) + 22;
}

function cautionBox(doc: PDFKit.PDFDocument, left: number, width: number, lines: string[]) {
  const text = lines.join(" ");
  const h = cautionBoxHeight(doc, width, lines);
  ensureSpace(doc, h + 4);
  const top = doc.y;
  doc.rect(left, top, width, h).fillColor(CAUTION_BG).fill();
  doc.font("Inter-SemiBold").fontSize(7.5).fillColor("#8a6212").text("ENGINEERING CAUTIONS", left + 10, top + 6, { width: width - 20 });
  doc.font("Inter").fontSize(8.5).fillColor(INK).text(text, left + 10, top + 17, { width: width - 20 });
  doc.y = top + h + 6;
}

/** The footer's type size (pt) and the gap (pt) between its sketch line and the page number. */
export const FOOTER_SIZE = 7;
const FOOTER_GAP = 12;
/** The footer's caution, on a line of its own: short enough for the page at any title. */
export const FOOTER_CAUTION = "For design checking; review by a qualified engineer required; local codes govern.";

/**
 * The footer of a page in two lines, each measured to fit (`measure`: the width of a text in the
 * footer's font, pt): the sketch and version beside the page number, the title cut with an
 * ellipsis when it would not fit, and the caution across the width. A line that ran past its
 * width would wrap and leave a word alone on a line of its own.
 */
export function footerLines(measure: (text: string) => number, title: string, version: number, page: string, width: number): { sketch: string; page: string; caution: string; sketchWidth: number } {
  const sketchWidth = width - measure(page) - FOOTER_GAP;
  const tail = ` · v${version}`;
  let shown = title;
  if (measure(shown + tail) > sketchWidth) {
    const chars = [...title];
    let n = chars.length;
    while (n > 0 && measure(`${chars.slice(0, n).join("").trimEnd()}…${tail}`) > sketchWidth) n--;
    shown = `${chars.slice(0, n).join("").trimEnd()}…`;
  }
  return { sketch: shown + tail, page, caution: FOOTER_CAUTION, sketchWidth };
}

function footer(doc: PDFKit.PDFDocument, input: CalcSheetInput) {
  const range = doc.bufferedPageRange();
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const y = doc.page.height - 40;
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc.font("Inter").fontSize(FOOTER_SIZE).fillColor(FAINT);
    const lines = footerLines((t) => doc.widthOfString(t), input.sketchTitle, input.version, `page ${i + 1} of ${range.count}`, width);
    // each line fits its width (measured above), so none wraps
    doc.text(lines.sketch, left, y, { width: lines.sketchWidth, lineBreak: false });
    doc.text(lines.page, left + width - doc.widthOfString(lines.page), y, { lineBreak: false });
    doc.text(lines.caution, left, y + FOOTER_SIZE * 1.3, { width, lineBreak: false });
    doc.page.margins.bottom = bottom;
  }
}
