// Result tables as plain data: the results panel, the CSV export and the calc sheet all read
// the same rows, so a number cannot differ between them. Cells are numbers in the column's unit
// (or text); formatting is left to whoever shows them.
import type { CaseRun, Component, StudyResult, SupportEnvelope } from "./cases";
import { handCheckSums, termMomentAbout } from "./equations";
import { FOOT_M, G0, LBF_N } from "./constants";
import { FIELD_UNIT_LABELS, kindOfUnit } from "./expressions";
import { FIELD_KIND_BY_NAME } from "./resolve";
import type { ParseResult } from "./parse";
import { pivotWords, type BodyStability } from "./stability";
import type { SolveResult, Status, Vec2 } from "./types";
import { formatFigures, formatTiny } from "./quantity";
import { convert, formatNumber, formatQuantity, prettyUnit, unitsFor, type Quantity, type UnitSystem } from "./units";
import { carriesNothing, gravityActs, overMu } from "./words";

export type Cell = string | number | null;

export interface Table {
  id: string;
  title: string;
  columns: Array<{ key: string; label: string; unit?: string; align?: "left" | "right" }>;
  rows: Cell[][];
  /** notes printed under the table */
  notes?: string[];
  /** per row, by column key: a mark shown beside the cell (a shape, and words for screen readers) */
  marks?: Array<Record<string, CellMark> | undefined>;
  /** every number of the table to this many significant figures, trailing zeros kept (`formatFigures`);
   *  absent: the tables' usual `formatNumber(x, 4, { keepZeros: true })` */
  figures?: number;
}

/** A number cell as the table prints it. */
export function cellNumberText(t: Pick<Table, "figures">, x: number): string {
  return t.figures ? formatFigures(x, t.figures) : formatNumber(x, 4, { keepZeros: true });
}

export interface CellMark {
  /** a shape before the number ("▲"), or "" for none */
  symbol: string;
  /** the mark in words (for screen readers, and as the cell's title) */
  text: string;
  /** the cell as printed in place of its number ("1.4e-16 (rounding)"); the cell itself, and so
   *  the CSV, keeps the number */
  shown?: string;
}

/** What a study's tables call a body or support: its label (the id when it has none). */
export const nameIn = (study: Pick<StudyResult, "names">, id: string): string => study.names?.[id] ?? id;

/** Below this (N, or N·m) a whole SI table is written in N (N·m) rather than kN (kN·m): a fan cart's 52 N, not 0.052 kN. */
const SMALL_SI = 999.95;
/** From this (lbf, or lbf·ft) a whole US table is written in kip (kip·ft), as the canvas's labels are from 10 kip: an anchor's 12.5 kip, not 12,500 lbf. */
const LARGE_US = 9999.5;

/**
 * The display unit of a table's force or moment columns: kN / kN·m in SI, lbf / lbf·ft in US. Given
 * `largest` (the largest magnitude in the table, SI), an SI table whose every value is below 1 kN
 * (1 kN·m) is written in N (N·m), and a US table with a value of 10 kip (10 kip·ft) or more in kip
 * (kip·ft). One unit per table, so its numbers compare at a glance.
 */
export function columnUnit(q: Quantity, system: UnitSystem, largest?: number): string {
  const preferred: Partial<Record<Quantity, Record<UnitSystem, string>>> = {
    force: { SI: "kN", US: "lbf" },
    moment: { SI: "kN·m", US: "lbf·ft" },
  };
  if (largest !== undefined && largest > 0 && (q === "force" || q === "moment")) {
    if (system === "SI" && largest < SMALL_SI) return q === "force" ? "N" : "N·m";
    const usual = q === "force" ? LBF_N : LBF_N * FOOT_M;
    if (system === "US" && largest / usual >= LARGE_US) return q === "force" ? "kip" : "kip·ft";
  }
  return preferred[q]?.[system] ?? unitsFor(q, system)[0];
}

/** The largest finite magnitude of some values (0 when there are none). */
function largestOf(values: Iterable<number | null | undefined>): number {
  let m = 0;
  for (const v of values) if (v !== null && v !== undefined && Number.isFinite(v)) m = Math.max(m, Math.abs(v));
  return m;
}

/** The largest force and moment (SI) a table or panel shows, which choose its units. */
export type Scale = { force: number; moment: number };
function scaleOf(forces: Iterable<number | null | undefined>, moments: Iterable<number | null | undefined>): Scale {
  // moments all zero (no fixed support): the forces alone choose the family (N with N·m)
  return { force: largestOf(forces), moment: largestOf(moments) };
}

/** The scale of a result's reactions table; the limit finder's target is typed in its units. */
export function reactionScale(result: SolveResult): Scale {
  const all = Object.values(result.reactions);
  return scaleOf(all.flatMap((r) => [Math.hypot(r.fx, r.fy), r.n, r.t, r.margin]), all.map((r) => r.m));
}

/** The scale of a body's hand check about a point: its terms and their sums. */
export function handCheckScale(eq: SolveResult["equations"][string], about: Vec2): Scale {
  const sums = handCheckSums(eq, about);
  const terms = [...eq.forces, ...eq.momentum];
  return scaleOf(
    [...terms.flatMap((t) => [t.fx, t.fy]), sums.forces.fx, sums.forces.fy, sums.momentum.fx, sums.momentum.fy],
    [...terms.map((t) => termMomentAbout(t, about)), sums.forces.m, sums.momentum.m],
  );
}

/** The figures behind a body's factors of safety: restoring and overturning moments, friction available and the force driving sliding. */
function stabilityFigures(stability: Readonly<Record<string, BodyStability>> | null | undefined, forces: Array<number | undefined>, moments: Array<number | undefined>): void {
  for (const st of Object.values(stability ?? {})) {
    if (!("notApplicable" in st.overturning)) moments.push(st.overturning.restoring, st.overturning.overturning);
    if (!("notApplicable" in st.sliding)) forces.push(st.sliding.available, st.sliding.driving);
  }
}

/**
 * The one scale of a result: every view of it writes its forces and moments in the family this
 * chooses (`unitFamily`) — the reactions table and its CSV, the hand check and its CSV, the factors
 * of safety under it, the status sentences and the drawing's labels — so a checker reading a figure
 * across them never meets 56.79 N in one and 0.05679 kN in the next. As a calculation by hand does,
 * the largest value of the whole result chooses (every force in kN once any is 1 kN or more), not
 * each view's own: the reactions, every term of every body's equations (weights, given loads, p·A,
 * ṁV, each by its magnitude, as the drawing labels it, and the couples they bring), and with
 * `stability` the figures of its factors of safety. Moments about a point a checker picks are left
 * out: their arms, not the result, make them large. Small values keep their figures: the views
 * print 4 significant figures (0.05679 kN), never a rounded 0.06. A calc sheet takes the larger of
 * this and its cases' scales (`studyScale`), one family for the whole sheet.
 */
export function resultScale(result: SolveResult, stability?: Readonly<Record<string, BodyStability>> | null): Scale {
  const forces: Array<number | undefined> = [];
  const moments: Array<number | undefined> = [];
  for (const eq of Object.values(result.equations ?? {}))
    for (const t of [...eq.forces, ...eq.momentum]) {
      forces.push(Math.hypot(t.fx, t.fy));
      moments.push(t.m);
    }
  stabilityFigures(stability, forces, moments);
  return largestScale(reactionScale(result), scaleOf(forces, moments));
}

/** The larger force and the larger moment of several scales: one unit family for all of them. */
export function largestScale(...scales: Scale[]): Scale {
  return { force: Math.max(0, ...scales.map((s) => s.force)), moment: Math.max(0, ...scales.map((s) => s.moment)) };
}

/**
 * The scale of every table of a study: the reactions of each case (components, resultants, n, t,
 * margins) and the figures behind its factors of safety (restoring and overturning moments,
 * friction available and the driving force). The calc sheet takes one family for all its tables
 * from this and the hand checks (`largestScale`), so a force reads in one unit across the sheet.
 */
export function studyScale(study: StudyResult): Scale {
  const forces: Array<number | undefined> = [];
  const moments: Array<number | undefined> = [];
  for (const run of study.runs as CaseRun[]) {
    if (!run.ok) continue;
    for (const r of Object.values(run.result.reactions)) {
      forces.push(r.fx, r.fy, Math.hypot(r.fx, r.fy), r.n, r.t, r.margin);
      moments.push(r.m);
    }
    stabilityFigures(run.stability, forces, moments);
  }
  return scaleOf(forces, moments);
}

/**
 * The one scale of a saved version, its calc sheet and its review page alike: the largest of its
 * cases' scales (`studyScale` of `study`, every case and combination), the sketch as drawn solved
 * apart (`asDrawn`, with its factors of safety) and the result as drawn as the results panel scales
 * it (`resultScale`: its reactions, the terms of its hand checks, its factors of safety). Every
 * table, the drawing and the figures in words of the version then write a force in one unit: N with
 * N·m only when all of it is below 1 kN (1 kN·m), else kN with kN·m; lbf with lbf·ft, or kip with
 * kip·ft from 10 kip (10 kip·ft). A sketch without cases reads in the units of its editor's screen.
 */
export function versionScale(
  result: SolveResult,
  study: StudyResult | null,
  asDrawn: StudyResult | null,
  stability?: Readonly<Record<string, BodyStability>> | null,
): Scale {
  return largestScale(...[study, asDrawn].flatMap((s) => (s ? [studyScale(s)] : [])), resultScale(result, stability));
}

/** A table's force and moment units. */
type Units = { system: UnitSystem; force: string; moment: string };
/**
 * One family per table: kN with kN·m, or N with N·m only when all of it stays below a kilonewton
 * (lbf with lbf·ft, or kip with kip·ft once a force reaches 10 kip or a moment 10 kip·ft, each
 * in its own unit), so no row mixes the two.
 */
export function unitFamily(system: UnitSystem, scale: Scale): { force: string; moment: string } {
  if (system === "US") {
    const kip = scale.force / LBF_N >= LARGE_US || scale.moment / (LBF_N * FOOT_M) >= LARGE_US;
    return kip ? { force: "kip", moment: "kip·ft" } : { force: "lbf", moment: "lbf·ft" };
  }
  const largest = Math.max(scale.force, scale.moment);
  return { force: columnUnit("force", system, largest), moment: columnUnit("moment", system, largest) };
}
const unitsOf = (system: UnitSystem, scale: Scale): Units => ({ system, ...unitFamily(system, scale) });
const tableUnits = (system: UnitSystem, forces: Iterable<number | null | undefined>, moments: Iterable<number | null | undefined>): Units => unitsOf(system, scaleOf(forces, moments));

/** The unit of a quantity in a table: its force or moment unit, or the usual one (length, angle…). */
const unitOf = (q: Quantity, u: Units) => (q === "force" ? u.force : q === "moment" ? u.moment : columnUnit(q, u.system));

/** A value in its column's unit, or null when there is none. */
function inUnit(v: number | undefined, q: Quantity, u: Units): number | null {
  return v === undefined || !Number.isFinite(v) ? null : convert(v, q, u.system, unitOf(q, u)).value;
}

/** The states of the file format in a table's words, as the status sentences say them. */
const STATE_WORDS: Record<string, string> = { bearing: "bearing", lifted: "lifts", taut: "taut", slack: "slack", active: "holds" };

/** A support's state in a table ("slips" for a bearing contact over its μ): the panel, the CSV and
 *  the calc sheet say the same. On a body that tips (or nothing holds), the numbers are what a
 *  lifted contact or a slack tie would have to carry: it "would pull" or "would push", as the
 *  drawing's dashed arrow says, not "lifts" beside a force it cannot give. */
export function stateWord(r: SolveResult["reactions"][string], bodyStatus?: string): string {
  // a body that tips: its rows are what would hold it with every support able to pull; a contact
  // bearing there whose margin (the last engagement that held the body, carried on) is below zero
  // leaves its base as the body turns, and friction under forces it never gets says nothing
  if (bodyStatus === "tips" && r.state === "bearing") return r.margin !== undefined && r.margin < 0 ? "lifts as it tips" : "bearing";
  if (r.state === "bearing" && r.friction && overMu(r.friction.needed, r.friction.mu)) return "slips";
  if ((bodyStatus === "tips" || bodyStatus === "unrestrained") && (r.state === "lifted" || r.state === "slack")) return r.state === "lifted" ? "would pull" : "would push";
  return STATE_WORDS[r.state] ?? r.state;
}

/** Reactions of one run, one row per support (force on the body, or load on the support). */
export function reactionTable(
  result: SolveResult,
  system: UnitSystem,
  opts: { onSupport?: boolean; id?: string; title?: string; scale?: Scale; names?: Readonly<Record<string, string>> } = {},
): Table {
  // `scale`: the screen holds a table's units while a drag runs, so 990 N → 1.01 kN does not flicker;
  // else the whole result's (`resultScale`), as its hand check and drawing are written
  const scale = opts.scale ?? resultScale(result);
  const u = unitsOf(system, scale);
  const f = u.force;
  const m = u.moment;
  const sign = opts.onSupport ? -1 : 1;
  // a force or moment as the hand check has it: floating-point noise (a contact's 1e-13 N along
  // its face) is 0, as the hand check's term for the same reaction is
  const at = (v: number | undefined, q: Quantity) => inUnit(v === undefined ? undefined : handCheckClean(v, scale), q, u);
  return {
    id: opts.id ?? "reactions",
    title: opts.title ?? (opts.onSupport ? "Loads on the supports" : "Reactions (forces on the body)"),
    columns: [
      { key: "support", label: "Support", align: "left" },
      { key: "kind", label: "Kind", align: "left" },
      { key: "fx", label: "Fx", unit: f },
      { key: "fy", label: "Fy", unit: f },
      { key: "resultant", label: "Resultant", unit: f },
      { key: "angle", label: "Direction", unit: "°" },
      { key: "m", label: "M", unit: m },
      { key: "n", label: "Normal n", unit: f },
      { key: "t", label: "Tangential t", unit: f },
      { key: "state", label: "State", align: "left" },
      { key: "margin", label: "Margin", unit: f },
    ],
    rows: Object.entries(result.reactions).map(([id, r]) => {
      const fx = sign * r.fx;
      const fy = sign * r.fy;
      const res = Math.hypot(fx, fy);
      return [
        opts.names?.[id] ?? id,
        r.kind,
        at(fx, "force"),
        at(fy, "force"),
        at(res, "force"),
        res > 0 ? (Math.atan2(fy, fx) * 180) / Math.PI : null,
        at(sign * r.m, "moment"),
        at(r.n === undefined ? undefined : sign * r.n, "force"),
        at(r.t === undefined ? undefined : sign * r.t, "force"),
        stateWord(r, result.bodies[r.body]?.status),
        // a released one-sided support carries nothing: no margin to show (see `carriesNothing`)
        carriesNothing(r, result.bodies[r.body]?.status) ? null : at(r.margin, "force"),
      ];
    }),
    notes: reactionNotes(result, opts),
    // the hand check's rule (4 significant figures, zeros kept): a reaction reads the same digits
    // in this table, in the hand check's term for it and on the drawing ("0.05000 kN" in all three,
    // not "0.05" here beside "0.05000 kN" there)
    figures: HAND_CHECK_FIGURES,
  };
}

/** Under the reactions: the sign of loads on the supports, and a body that is not held, whose rows
 *  are what equilibrium would need, not what its supports carry (the banner says why it moves). */
function reactionNotes(result: SolveResult, opts: { onSupport?: boolean; names?: Readonly<Record<string, string>> }): string[] | undefined {
  const notes: string[] = [];
  if (opts.onSupport) notes.push("Loads on the supports are the reactions with the sign reversed (what an anchor must carry).");
  const idle = Object.values(result.reactions).filter((r) => carriesNothing(r, result.bodies[r.body]?.status));
  if (idle.length) {
    const what = idle.every((r) => r.kind === "tie") ? "A slack tie" : idle.every((r) => r.kind === "contact") ? "A lifted contact" : "A lifted contact or a slack tie";
    notes.push(
      `${what} carries nothing, so it has no margin to show (—). At what value of a parameter it takes load again, the limit finder on its margin answers (Sweep tab).`,
    );
  }
  const loose = Object.entries(result.bodies).filter(([, b]) => b.status === "tips" || b.status === "unrestrained");
  if (loose.length) {
    const names = loose.map(([id]) => opts.names?.[id] ?? id).join(", ");
    notes.push(
      `Not held: ${names}. ${loose.length === 1 ? "Its supports' rows are" : "Their supports' rows are"} the forces equilibrium would need, not loads the supports carry; the margins mean nothing until the body is held.`,
    );
  }
  return notes.length ? notes : undefined;
}

/**
 * The case whose run is the sketch as drawn over again (same reactions, states and factors of
 * safety: its overrides restate the drawing's values), or null. A sheet that printed both would
 * say every finding of that state twice, under two names; it says it once, under the case's name
 * with "as drawn" beside it.
 */
export function asDrawnTwin(study: StudyResult, asDrawn: StudyResult): string | null {
  if (study === asDrawn || asDrawn.runs.length !== 1) return null;
  const drawn = asDrawn.runs[0];
  if (!drawn.ok) return null;
  const key = (run: CaseRun & { ok: true }) => JSON.stringify([run.result.reactions, run.result.bodies, run.stability]);
  const k = key(drawn);
  return study.runs.find((r) => r.ok && r.kind === "case" && key(r) === k)?.id ?? null;
}

/** The study with one run renamed (the case that is the sketch as drawn: "Lance raised to −50°, as drawn"). */
export function withRunName(study: StudyResult, id: string, name: string): StudyResult {
  return { ...study, runs: study.runs.map((r) => (r.id === id ? { ...r, name } : r)) };
}

/** Words for a run left out of the envelope: "Case X — trailer tips: not in the envelope; …". */
export function excludedWords(study: StudyResult): string[] {
  const name = (id: string) => study.runs.find((r) => r.id === id)?.name ?? id;
  return (study.excluded ?? []).map(
    (e) =>
      `${name(e.case)} — ${nameIn(study, e.body)} ${e.status === "tips" ? "tips" : "is unrestrained"}: not in the envelope or the design loads; the body is not held in this case (its reactions would need every support to pull).`,
  );
}

/**
 * A line for each case whose body slides as a whole but is held otherwise (it stays in the
 * envelope): its contacts' friction is what they would need to hold it, more than μ·n gives in
 * all, so the body would slide in that case and those loads are not reached as computed. (One
 * contact over its own μ while the body has friction to spare is said with the results.)
 */
export function slipWords(study: StudyResult): string[] {
  const out: string[] = [];
  for (const run of study.runs) {
    if (!run.ok) continue;
    const bodies = new Set<string>();
    for (const w of run.result.warnings) {
      if (w.code !== "SLIP") continue;
      for (const id of w.ids) if (run.result.bodies[id] && !(study.excluded ?? []).some((e) => e.case === run.id && e.body === id)) bodies.add(id);
    }
    for (const body of bodies)
      out.push(
        `${run.name} — ${nameIn(study, body)} slides: in the envelope and the design loads with the friction its contacts would need to hold it, more than μ·n gives in all. It would slide in this case, so those friction forces are not reached as computed: hold it by other means or give it more friction.`,
      );
  }
  return out;
}

/** Why no envelope is given: a case or combination that did not solve could be the governing one,
 *  so an envelope of the others would understate the design loads. Null when every run solved. */
export function unsolvedWords(study: StudyResult): string | null {
  const names = study.runs.filter((r) => !r.ok).map((r) => r.name);
  if (!names.length) return null;
  const list = names.length === 1 ? names[0] : `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
  return `No envelope or design loads while ${list} ${names.length === 1 ? "does" : "do"} not solve: without ${names.length === 1 ? "it" : "them"}, they could miss the governing case. Put the input right and run again.`;
}

const COMPONENT_LABEL: Record<Component, string> = { fx: "Fx", fy: "Fy", resultant: "Resultant", m: "M", n: "Normal n", t: "Tangential t", margin: "Margin" };
/** Below this (N, N·m) a component is zero in every case, and no case governs it. */
const NOTHING = 1e-9;

/** The runs that govern component `c` of a support: its governing run, or every run of a tie. */
const governingRuns = (env: SupportEnvelope, c: Component): string[] => env.ties?.[c] ?? (env.governing[c] ? [env.governing[c]!] : []);

/** Does `run` govern component `c` of a support (alone or in a tie, where its value is `value`),
 *  and by its maximum (▲) or its minimum (▼)? */
function governs(env: SupportEnvelope, c: Component, run: string, value?: number): "max" | "min" | null {
  const e = env.components[c];
  if (!e || !governingRuns(env, c).includes(run) || Math.max(Math.abs(e.max.value), Math.abs(e.min.value)) < NOTHING) return null;
  if (c === "margin") return "min";
  // a tie by magnitude may be +F in one run and −F in another: each by the end its own value is at
  if (value !== undefined && run !== env.governing[c]) return Math.abs(value - e.max.value) <= Math.abs(value - e.min.value) ? "max" : "min";
  return Math.abs(e.max.value) >= Math.abs(e.min.value) ? "max" : "min";
}

/** The names of the runs that give a governing value: one name, or every run of a tie ("A and B (equal)"). */
export function tiedNames(study: StudyResult, ids: readonly string[]): string {
  const names = ids.map((id) => study.runs.find((r) => r.id === id)?.name ?? id);
  return names.length < 2 ? names.join("") : `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]} (equal)`;
}

/** Every support in every case: the table of the studies. The governing case of each component is
 *  marked in its cell (▲ by its maximum, ▼ by its minimum) and named in the "Governs" column.
 *  `scale`: the units of a larger whole (the calc sheet's), else the table's own values choose them. */
export function caseReactionTable(study: StudyResult, system: UnitSystem, scale?: Scale): Table {
  const all = study.runs.flatMap((run) => (run.ok ? Object.values(run.result.reactions) : []));
  const own = scale ?? scaleOf(all.flatMap((r) => [Math.hypot(r.fx, r.fy), r.n, r.t]), all.map((r) => r.m));
  const u = unitsOf(system, own);
  // as the hand check has it: floating-point noise is 0, every figure to 4 significant figures
  const at = (v: number | undefined, q: Quantity) => inUnit(v === undefined ? undefined : handCheckClean(v, own), q, u);
  const f = u.force;
  const m = u.moment;
  const rows: Cell[][] = [];
  const marks: Table["marks"] = [];
  const excluded = new Set((study.excluded ?? []).map((e) => `${e.case}/${e.body}`));
  for (const run of study.runs) {
    if (!run.ok) {
      rows.push([run.name, "—", null, null, null, null, null, null, `not solved: ${run.errors.map((e) => `${e.path} ${e.message}`).join("; ")}`, ""]);
      marks.push(undefined);
      continue;
    }
    for (const [id, r] of Object.entries(run.result.reactions)) {
      const env = study.envelope[id];
      const status = run.result.bodies[r.body]?.status;
      const rowMarks: Record<string, CellMark> = {};
      const words: string[] = [];
      if (excluded.has(`${run.id}/${r.body}`)) {
        words.push(`not in the envelope: ${nameIn(study, r.body)} ${status === "tips" ? "tips" : "is unrestrained"}`);
      } else if (env) {
        // every run of a tie is marked and named: each governs as much
        // a support that carries nothing in every case (a tie slack throughout) has no design load
        if (hasDesignLoad(env) && (env.ties?.resultant ?? [env.design.case]).includes(run.id)) words.push("design load");
        const gov: string[] = [];
        // the resultant's governing case is the design load, said above
        for (const c of ["fx", "fy", "m", "n", "t"] as const) {
          const by = governs(env, c, run.id, r[c]);
          if (!by) continue;
          const symbol = by === "max" ? "▲" : "▼";
          rowMarks[c] = { symbol, text: `governing case of ${COMPONENT_LABEL[c]}: the largest magnitude over the cases (its ${by === "max" ? "maximum" : "minimum"})` };
          gov.push(`${COMPONENT_LABEL[c]} ${symbol}`);
        }
        if (gov.length) words.push(`governs ${gov.join(", ")}`);
        // below zero it has already lifted or gone slack: not "closest to" it
        // lifted or slack, it carries nothing: no margin left (the envelope counts it 0)
        if (governs(env, "margin", run.id))
          words.push(`least margin (${r.state === "lifted" || r.state === "slack" ? (r.kind === "tie" ? "slack: carries nothing" : "lifted off: carries nothing") : `closest to ${r.kind === "tie" ? "going slack" : "lifting"}`})`);
      }
      rows.push([
        run.name,
        nameIn(study, id),
        at(r.fx, "force"),
        at(r.fy, "force"),
        at(Math.hypot(r.fx, r.fy), "force"),
        at(r.m, "moment"),
        at(r.n, "force"),
        at(r.t, "force"),
        stateWord(r, run.result.bodies[r.body]?.status),
        words.join("; "),
      ]);
      marks.push(Object.keys(rowMarks).length ? rowMarks : undefined);
    }
  }
  const notes = ["▲ / ▼: the governing case of that component (its largest magnitude over the cases), by its maximum (▲) or its minimum (▼); cases that give it alike (equal) are each marked. “design load”: the case of the support's largest resultant."];
  return {
    id: "cases",
    title: "Reactions per case (forces on the body)",
    columns: [
      { key: "case", label: "Case", align: "left" },
      { key: "support", label: "Support", align: "left" },
      { key: "fx", label: "Fx", unit: f },
      { key: "fy", label: "Fy", unit: f },
      { key: "resultant", label: "Resultant", unit: f },
      { key: "m", label: "M", unit: m },
      { key: "n", label: "Normal n", unit: f },
      { key: "t", label: "Tangential t", unit: f },
      { key: "state", label: "State", align: "left" },
      { key: "governs", label: "Governs", align: "left" },
    ],
    rows,
    marks,
    notes,
    // the reactions table's and the hand check's rule: a case's reaction reads as the same result's does
    figures: HAND_CHECK_FIGURES,
  };
}

/** The components of a support's envelope, in the order shown. */
function envelopeComponents(env: SupportEnvelope): Component[] {
  const out: Component[] = ["fx", "fy"];
  if (env.kind === "fixed" || Math.max(Math.abs(env.components.m?.max.value ?? 0), Math.abs(env.components.m?.min.value ?? 0)) >= NOTHING) out.push("m");
  for (const c of ["n", "t", "margin"] as const) if (env.components[c]) out.push(c);
  return out;
}

/** Max and min of each reaction component over the cases, each with the case that gives it, and
 *  the governing case (the largest magnitude; for a margin the smallest value). */
export function envelopeTable(study: StudyResult, system: UnitSystem, scale?: Scale): Table {
  const name = (id: string) => study.runs.find((r) => r.id === id)?.name ?? id;
  const rows: Cell[][] = [];
  const extremes = (c: Component) => Object.values(study.envelope).flatMap((env) => (env.components[c] ? [env.components[c]!.max.value, env.components[c]!.min.value] : []));
  const u = scale ? unitsOf(system, scale) : tableUnits(system, (["fx", "fy", "n", "t", "margin"] as const).flatMap(extremes), extremes("m"));
  for (const [id, env] of Object.entries(study.envelope)) {
    for (const c of envelopeComponents(env)) {
      const e = env.components[c]!;
      const q: Quantity = c === "m" ? "moment" : "force";
      // every case of a tie is named: "A and B (equal)" (never "a tie": a tie is a support here)
      const gov = governingRuns(env, c);
      // a component that is zero in every case (a frictionless contact's t) has no governing case
      const zero = Math.max(Math.abs(e.max.value), Math.abs(e.min.value)) < NOTHING;
      // a margin whose least value is a release (lifted or slack: 0, it carries nothing) is said so;
      // the cases it is released in are each marked in the cases table, so a long list is not repeated here
      const released = c === "margin" && e.min.value === 0 ? (env.kind === "tie" ? "slack" : "lifted off") : null;
      const governing = zero ? "none (zero in every case)" : released ? `${name(gov[0])}${gov.length > 1 ? ` and ${gov.length - 1} more` : ""} (${released})` : tiedNames(study, gov);
      rows.push([nameIn(study, id), COMPONENT_LABEL[c], unitOf(q, u), inUnit(e.max.value, q, u), name(e.max.case), inUnit(e.min.value, q, u), name(e.min.case), governing]);
    }
  }
  return withRowUnitsInHeader({
    id: "envelope",
    title: "Envelope of the reactions (forces on the body)",
    columns: [
      { key: "support", label: "Support", align: "left" },
      { key: "component", label: "Component", align: "left" },
      { key: "unit", label: "Unit", align: "left" },
      { key: "max", label: "Max" },
      { key: "maxCase", label: "Case of max", align: "left" },
      { key: "min", label: "Min" },
      { key: "minCase", label: "Case of min", align: "left" },
      { key: "governs", label: "Governing case", align: "left" },
    ],
    rows,
    notes: [
      "Governing case: the one with the largest magnitude; for the margin of a contact or tie, the smallest (the case where it comes closest to lifting or going slack). A contact lifted off or a tie gone slack carries nothing: its margin is 0 there, and the cases it does so in are each marked in the cases table. Cases that give a value alike are all named (equal).",
      "A case in which the body tips or is unrestrained is not in the envelope or the design loads (see the note above the tables).",
    ],
  });
}

/**
 * A table whose rows give their own unit (the envelope's "Unit" column: forces and moments in
 * one table) with the units of its rows in the headings of its number columns too ("kN", or
 * "kN / kN·m" when it has moment rows), so a heading always says what its numbers are in.
 */
export function withRowUnitsInHeader(t: Table): Table {
  const ui = t.columns.findIndex((c) => c.key === "unit");
  if (ui < 0) return t;
  const units = [...new Set(t.rows.map((r) => r[ui]).filter((u): u is string => typeof u === "string" && u !== ""))];
  const unit = units.length ? units.join(" / ") : undefined;
  return { ...t, columns: t.columns.map((c) => ((c.align ?? "right") === "right" && c.key !== "unit" ? { ...c, unit } : c)) };
}

/** Whether a support carries load in any case where its body is held: one that carries nothing in
 *  all of them (a tie slack in every case, a contact lifted in every case) has no design load, and
 *  no case is "the design load" of it. */
export function hasDesignLoad(env: SupportEnvelope): boolean {
  return env.design.resultant >= NOTHING;
}

/** The words of a support's design load case: the case (or cases alike), or that it carries nothing. */
export function designCaseWords(study: StudyResult, id: string): string {
  const env = study.envelope[id];
  return hasDesignLoad(env) ? tiedNames(study, env.ties?.resultant ?? [env.design.case]) : NO_DESIGN_LOAD;
}

/** A support with no design load: said in place of its case. */
export const NO_DESIGN_LOAD = "none: carries nothing in any case";

/** Each support's design load: its largest resultant over the cases, with its direction. */
export function designLoadTable(study: StudyResult, system: UnitSystem, scale?: Scale): Table {
  const designs = Object.values(study.envelope).map((env) => env.design);
  const u = scale ? unitsOf(system, scale) : tableUnits(system, designs.map((d) => d.resultant), designs.map((d) => d.m));
  const f = u.force;
  const m = u.moment;
  return {
    id: "design-loads",
    title: "Design loads (forces on the body)",
    columns: [
      { key: "support", label: "Support", align: "left" },
      { key: "design", label: "Design load", unit: f },
      { key: "angle", label: "at angle", unit: "°" },
      { key: "fx", label: "Fx", unit: f },
      { key: "fy", label: "Fy", unit: f },
      { key: "m", label: "M", unit: m },
      { key: "case", label: "from case", align: "left" },
    ],
    rows: Object.entries(study.envelope).map(([id, env]) => [
      nameIn(study, id),
      inUnit(env.design.resultant, "force", u),
      // a zero resultant has no direction
      hasDesignLoad(env) ? env.design.angle : null,
      inUnit(env.design.fx, "force", u),
      inUnit(env.design.fy, "force", u),
      inUnit(env.design.m, "moment", u),
      // every case of a tie for the largest resultant: "A and B (equal)"
      designCaseWords(study, id),
    ]),
    notes: [
      "The design load of a support is its largest resultant over all cases and combinations in which its body is held, with its direction (force on the body). Cases that give it alike are all named (equal); the direction and components are those of the first named.",
    ],
  };
}

/** The verdict of a stability check that does not apply (its note says why). */
export const NOT_APPLICABLE = "n/a";

/** The stability table's "tips about" note: the support, or an instant centre with the point it is at, "(0.4000, 1.520) m". */
function pivotNote(study: Pick<StudyResult, "names">, ot: { about: string; with?: string; pivot: Vec2 }, system: UnitSystem): string {
  const words = pivotWords(ot, (id) => nameIn(study, id));
  if (ot.with === undefined) return words;
  const L = columnUnit("length", system);
  const coord = (x: number) => handCheckNumber(convert(x, "length", system, L).value);
  return `${words} at (${coord(ot.pivot[0])}, ${coord(ot.pivot[1])}) ${L}`;
}

/** Factors of safety with the figures behind them: restoring and overturning moment, or the
 *  friction available and the force that drives sliding. Every number column holds numbers only
 *  (unrounded; a factor without bound is left empty and said in words in the note column), so a
 *  spreadsheet reads them as numbers. `scale`: the units of a larger whole (the calc sheet's). */
export function stabilityTable(study: StudyResult, system: UnitSystem = "SI", scale?: Scale): Table {
  const rows: Cell[][] = [];
  const checks = (study.runs as CaseRun[]).flatMap((run) => (run.ok ? Object.values(run.stability) : []));
  const figures = (s: { restoring?: number; overturning?: number; available?: number; driving?: number } | { notApplicable: string }) =>
    "notApplicable" in s ? [] : [s.restoring, s.overturning, s.available, s.driving];
  const u = scale ? unitsOf(system, scale) : tableUnits(system, checks.flatMap((c) => figures(c.sliding)), checks.flatMap((c) => figures(c.overturning)));
  const verdict = (s: { factor: number; required: number; pass: boolean }) => [Number.isFinite(s.factor) ? s.factor : null, s.required, s.pass ? "pass" : "FAIL"];
  for (const run of study.runs as CaseRun[]) {
    if (!run.ok) continue;
    for (const [body, st] of Object.entries(run.stability)) {
      const ot = st.overturning;
      // a check that does not apply: the verdict column stays a verdict ("n/a") and the note says why
      if ("notApplicable" in ot) rows.push([run.name, nameIn(study, body), "overturning", null, null, "", null, null, NOT_APPLICABLE, ot.notApplicable]);
      else rows.push([run.name, nameIn(study, body), "overturning", inUnit(ot.restoring, "moment", u), inUnit(ot.overturning, "moment", u), u.moment, ...verdict(ot), pivotNote(study, ot, system)]);
      const sl = st.sliding;
      if ("notApplicable" in sl) rows.push([run.name, nameIn(study, body), "sliding", null, null, "", null, null, NOT_APPLICABLE, sl.notApplicable]);
      else
        rows.push([
          run.name,
          nameIn(study, body),
          sl.wholeBody ? "sliding (as a whole: it tips)" : "sliding",
          inUnit(sl.available, "force", u),
          inUnit(sl.driving, "force", u),
          u.force,
          ...verdict(sl),
          Number.isFinite(sl.factor) ? "" : "no force drives it to slide: the factor has no bound",
        ]);
    }
  }
  return {
    id: "stability",
    title: "Factors of safety",
    columns: [
      { key: "case", label: "Case", align: "left" },
      { key: "body", label: "Body", align: "left" },
      { key: "check", label: "Against", align: "left" },
      { key: "resisting", label: "Restoring M / friction available", unit: `${u.moment} / ${u.force}` },
      { key: "acting", label: "Overturning M / driving force", unit: `${u.moment} / ${u.force}` },
      { key: "unit", label: "Unit", align: "left" },
      { key: "factor", label: "Factor" },
      { key: "required", label: "Required" },
      { key: "verdict", label: "Verdict", align: "left" },
      { key: "note", label: "Tips about, or note", align: "left" },
    ],
    rows,
    notes: [
      "Overturning: factor = restoring over overturning moment of the applied loads about the support the body would tip about (a contact, or a pin or roller once the contacts lift off, or the instant centre of two contacts whose lines of action meet, as a wheel climbing a chock turns), each load resolved across and along the base it stands on (a weight on a slope restores by W·cos θ and overturns by W·sin θ), each component of a load counted apart.",
      "Sliding: factor = friction the bearing contacts can give (Σ μ·n) over the tangential force they must resist (|Σ t|). A body that tips is taken as a whole: μ·Σn over |Σt| of all its contacts (μ·W over the sliding force on level ground), when they share one base and one μ.",
    ],
  };
}

/** Significant figures of every number of the hand check (terms, sums, points, differences), on screen and on the calc sheet. */
export const HAND_CHECK_FIGURES = 4;

/** A number of the hand check: 4 significant figures with trailing zeros kept ("12.50", "3.100", "0.09818"). */
export const handCheckNumber = (x: number): string => formatFigures(x, HAND_CHECK_FIGURES);

/** Below this share of the check's largest value a term or a sum is floating-point noise, written 0. */
const HAND_NOISE = 1e-10;
/** Below this share the difference of the two sides is floating-point rounding, not a figure of the check. */
const HAND_ROUNDING = 1e-9;

/** A term or a sum of the hand check (SI) with its floating-point noise taken off: a weight's 6e-14 N along x is 0. */
export function handCheckClean(v: number, scale: Scale): number {
  return Math.abs(v) < HAND_NOISE * Math.max(scale.force, scale.moment, 1e-30) ? 0 : v;
}

/** The two sides of one equation of the hand check, as it prints them (SI). */
export interface HandCheckSides {
  /** Σ forces on the control volume, of the unrounded terms */
  forces: number;
  /** Σ(ṁV)out − Σ(ṁV)in, of the unrounded terms */
  momentum: number;
  /** forces − momentum as computed */
  difference: number;
  /** the difference is floating-point rounding (below a billionth of the check's largest value), not a figure */
  rounding: boolean;
}

/**
 * The two sides of ΣFx, ΣFy or ΣM as printed. Each sum is taken of the unrounded terms; when the
 * two differ by floating-point rounding only, both are printed from one value (their mean), so two
 * sums that are equal to a billionth never show as 0.09817 beside 0.09818.
 */
export function handCheckSides(forces: number, momentum: number, difference: number, scale: Scale): HandCheckSides {
  const size = Math.max(scale.force, scale.moment, Math.abs(forces), Math.abs(momentum), 1e-30);
  const rounding = difference !== 0 && Math.abs(difference) <= HAND_ROUNDING * size;
  if (difference === 0 || rounding) {
    const both = handCheckClean((forces + momentum) / 2, scale);
    return { forces: both, momentum: both, difference, rounding };
  }
  return { forces: handCheckClean(forces, scale), momentum: handCheckClean(momentum, scale), difference, rounding };
}

/** The difference of the two sides in a shown unit: "0", "1.2e-12 (rounding)", or the figure itself ("12.50"). */
export function handCheckDifferenceText(shown: number, rounding: boolean, unit = ""): string {
  const u = unit ? ` ${unit}` : "";
  if (shown === 0) return `0${u}`;
  return rounding ? `${formatTiny(shown)}${u} (rounding)` : `${handCheckNumber(shown)}${u}`;
}

/** The hand check: every term with its components, point of action and moment about `about`.
 *  `opts.scale`: the units of a larger whole (the calc sheet's, the panel's held ones), else the whole result's (`resultScale`). */
/**
 * What two sides of a hand check that agree are worth for a body that is not held (it tips, or is
 * free to move): they balance only with a support giving a force it cannot (a contact pulling), so
 * the panel and the calc sheet never say "agree" without saying so; "" for a body that is held.
 */
export function notHeldAgreement(status: Status | undefined): string {
  if (status !== "tips" && status !== "unrestrained") return "";
  return ` only with the reactions equilibrium would need: the body is not held (it ${status === "tips" ? "tips" : "is free to move"}), a support here would have to give a force it cannot`;
}

export function handCheckTable(result: SolveResult, bodyId: string, about: Vec2, system: UnitSystem, opts: { scale?: Scale; name?: string } = {}): Table {
  const eq = result.equations[bodyId];
  const notHeld = notHeldAgreement(result.bodies[bodyId]?.status);
  const sums = handCheckSums(eq, about);
  // its own scale says what is floating-point noise; the units may be the sheet's
  const scale = handCheckScale(eq, about);
  const u = unitsOf(system, opts.scale ?? resultScale(result));
  const f = u.force;
  const m = u.moment;
  const L = columnUnit("length", system);
  // a term's floating-point noise (a weight's 6e-14 N along x) is no figure of the check: 0
  const val = (v: number, q: Quantity) => inUnit(handCheckClean(v, scale), q, u);
  // every number of the check by one rule: 4 significant figures, trailing zeros kept, the points too
  const coord = (x: number) => handCheckNumber(convert(x, "length", system, L).value);
  const point = `(${coord(about[0])}, ${coord(about[1])}) ${L}`;
  // a force that brings a couple of its own (a fixed support's m): its M is r × F plus that couple,
  // said in the label, so a checker redoing x·Fy − y·Fx from the row knows what is added
  const label = (t: (typeof eq.forces)[number], sign: number) =>
    t.kind !== "couple" && t.at && t.m ? `${t.label}, with its couple ${handCheckNumber(inUnit(handCheckClean(sign * t.m, scale), "moment", u) ?? 0)} ${m}` : t.label;
  const row = (side: string, t: (typeof eq.forces)[number], sign: number): Cell[] => [
    side,
    label(t, sign),
    val(sign * t.fx, "force"),
    val(sign * t.fy, "force"),
    t.at ? `(${coord(t.at[0])}, ${coord(t.at[1])})` : "—",
    val(sign * termMomentAbout(t, about), "moment"),
  ];
  const keys = ["fx", "fy", "m"] as const;
  const qOf = (k: (typeof keys)[number]): Quantity => (k === "m" ? "moment" : "force");
  const sides = Object.fromEntries(keys.map((k) => [k, handCheckSides(sums.forces[k], sums.momentum[k], sums.imbalance[k], scale)])) as Record<(typeof keys)[number], HandCheckSides>;
  const shown = (v: number, q: Quantity) => inUnit(v, q, u) ?? 0;
  // the difference as computed: 0 or a number, its rounding noise printed in words (never a bare 0
  // beside two different sums) while the cell, and so the CSV, keeps the number
  const diffCell = (k: (typeof keys)[number]): Cell => shown(sides[k].difference, qOf(k));
  const diffMarks: Record<string, CellMark> = {};
  for (const k of keys) {
    const d = shown(sides[k].difference, qOf(k));
    if (d !== 0 && sides[k].rounding) diffMarks[k] = { symbol: "", text: "floating-point rounding of the sums, not a figure of the check", shown: handCheckDifferenceText(d, true) };
  }
  const agree = keys.filter((k) => handCheckNumber(shown(sides[k].forces, qOf(k))) === handCheckNumber(shown(sides[k].momentum, qOf(k))));
  const differ = keys.filter((k) => !agree.includes(k));
  const name = { fx: "ΣFx", fy: "ΣFy", m: "ΣM" } as const;
  const list = (ks: readonly string[]) => (ks.length < 2 ? ks.join("") : `${ks.slice(0, -1).join(", ")} and ${ks[ks.length - 1]}`);
  const rounded = keys.filter((k) => sides[k].rounding);
  return {
    id: `hand-check-${bodyId}`,
    title: `Hand check of ${opts.name ?? bodyId}: ΣF = Σ(ṁV)out − Σ(ṁV)in, ΣM about ${point}`,
    columns: [
      { key: "side", label: "Side", align: "left" },
      { key: "term", label: "Term", align: "left" },
      { key: "fx", label: "Fx", unit: f },
      { key: "fy", label: "Fy", unit: f },
      { key: "at", label: "Acts at", unit: L, align: "left" },
      { key: "m", label: `M about ${point}`, unit: m },
    ],
    rows: [
      ...eq.forces.map((t) => row("forces on the control volume", t, 1)),
      ...eq.momentum.map((t) => row("momentum flux", t, 1)),
      ["total", "Σ forces (Σ moments)", shown(sides.fx.forces, "force"), shown(sides.fy.forces, "force"), "", shown(sides.m.forces, "moment")],
      ["total", "Σ(ṁV)out − Σ(ṁV)in", shown(sides.fx.momentum, "force"), shown(sides.fy.momentum, "force"), "", shown(sides.m.momentum, "moment")],
      ["total", "imbalance (0 when the body holds)", diffCell("fx"), diffCell("fy"), "", diffCell("m")],
    ],
    marks: Object.keys(diffMarks).length ? [...eq.forces.map(() => undefined), ...eq.momentum.map(() => undefined), undefined, undefined, diffMarks] : undefined,
    figures: HAND_CHECK_FIGURES,
    notes: [
      `ΣFx = ${fmt(sides.fx.forces, "force")} and Σ(ṁV)x = ${fmt(sides.fx.momentum, "force")}; ΣFy = ${fmt(sides.fy.forces, "force")} and Σ(ṁV)y = ${fmt(sides.fy.momentum, "force")}; ΣM about ${point} = ${fmt(sides.m.forces, "moment")} and Σ r × ṁV = ${fmt(sides.m.momentum, "moment")}.`,
      `Every number to ${HAND_CHECK_FIGURES} significant figures. Each Σ adds the unrounded terms, so it may differ in its last figure from the printed terms added up.`,
      ...(agree.length
        ? [
            `The two sides agree to ${HAND_CHECK_FIGURES} significant figures in ${list(agree.map((k) => name[k]))}${notHeld}${rounded.length ? `; a difference marked “rounding” is floating-point noise of the sums (below a billionth of the largest value), not a figure of the check` : ""}.`,
          ]
        : []),
      ...differ.map((k) => `${name[k]}: the two sides differ by ${fmt(sides[k].difference, qOf(k))}; the body is not in equilibrium on its supports as drawn.`),
    ],
  };
  function fmt(v: number, q: Quantity) {
    return `${handCheckNumber(shown(v, q))} ${unitOf(q, u)}`;
  }
}

/** Parameters as typed and as evaluated (a US sheet adds the value in US customary units). */
export function parametersTable(parsed: Extract<ParseResult, { ok: true }>, system: UnitSystem = "SI"): Table {
  const inUs = (si: number, unit: string) => {
    const kind = system === "US" ? kindOfUnit(unit) : null;
    return kind && kind in US_QUANTITY && Number.isFinite(si) && si !== 0 ? ` (${formatQuantity(si, kind as Quantity, "US")})` : "";
  };
  return {
    id: "parameters",
    title: "Parameters",
    columns: [
      { key: "name", label: "Name", align: "left" },
      { key: "typed", label: "Expression", align: "left" },
      { key: "value", label: "Value", align: "left" },
    ],
    rows: Object.entries(parsed.parameterValues).map(([name, v]) => {
      if (!("value" in v)) return [name, String(parsed.file.parameters?.[name]), v.error];
      const own = `${formatNumber(v.value, 6)}${v.unit ? " " + prettyUnit(v.unit) : ""}`;
      // a value already written in the US unit is not repeated beside itself ("2,000 gpm (2,000 gpm)")
      const us = inUs(v.si, v.unit);
      return [name, String(parsed.file.parameters?.[name]), us && us.slice(2, -1).replace(/,/g, "") === own.replace(/,/g, "") ? own : `${own}${us}`];
    }),
  };
}

/** The words a table of inputs calls a field and a kind by: the properties form's ("volume flow",
 *  "friction μ", "mass source"), which live with the form; absent, the file format's names. */
export interface InputWords {
  /** a field of an element of a kind (`kind`: "body", "contact", "outlet", "massSource"…), in a sentence's words */
  field: (kind: string, key: string) => string;
  /** an element kind in words */
  kind: (kind: string) => string;
}

/** Every element with its fields: as typed, and (for expressions) the value in SI units.
 *  `words`: the fields and kinds in the words of the properties form (the calc sheet's). */
export function inputsTable(parsed: Extract<ParseResult, { ok: true }>, system: UnitSystem = "SI", words?: InputWords): Table {
  const rows: Cell[][] = [];
  const groups = ["bodies", "supports", "loads", "ports", "massSources"] as const;
  // a US sheet gives each dimensional value in US customary units too, so it reads beside the hand check
  const inUs = (si: number, kind: string | undefined) =>
    system === "US" && kind && kind in US_QUANTITY && Number.isFinite(si) && si !== 0 ? ` (${formatQuantity(si, kind as Quantity, "US")})` : "";
  // a number with its unit ("90°", "−0.4", "1,500 N"); an expression's value in the SI unit of its
  // kind, with a prefix where the trade uses one ("600 kPa", not "600000 Pa")
  const withUnit = (x: string, unit: string) => (!unit ? x : unit === "°" ? `${x}°` : `${x} ${unit}`);
  const show = (raw: unknown, path: string, name: string): string => {
    const v = parsed.fields[path];
    const kind = FIELD_KIND_BY_NAME[name];
    const unit = kind ? FIELD_UNIT_LABELS[kind] : "";
    if (typeof raw === "number") return `${withUnit(formatNumber(raw, 6), unit)}${inUs(raw, kind)}`;
    if (typeof raw === "string" && v && "value" in v) {
      const value = kind && kind in PREFIXED ? formatQuantity(v.value, kind as Quantity, "SI", { sig: 5 }) : withUnit(formatNumber(v.value, 5), unit);
      // "92 kg" typed is its own value: once, not "92 kg = 92 kg"
      return `${sameValueText(raw, value) ? raw : `${raw} = ${value}`}${inUs(v.value, kind)}`;
    }
    return String(raw);
  };
  const coord = (raw: unknown, path: string): number => {
    const v = parsed.fields[path];
    return typeof raw === "number" ? raw : v && "value" in v ? v.value : Number.NaN;
  };
  const point = (raw: unknown, path: string): string => {
    const pt = raw as unknown[];
    const us = system === "US" ? ` = (${[0, 1].map((i) => formatNumber(convert(coord(pt[i], `${path}[${i}]`), "length", "US", "ft").value, 4)).join(", ")}) ft` : "";
    return `(${show(pt[0], `${path}[0]`, "")}, ${show(pt[1], `${path}[1]`, "")}) m${us}`;
  };
  for (const g of groups) {
    (parsed.file[g] as Array<Record<string, unknown>>).forEach((el, i) => {
      const parts: string[] = [];
      // "bodies" → "body", "massSources" → "massSource": the element kinds of the file format
      const kind = (el.kind as string | undefined) ?? g.replace(/ies$/, "y").replace(/s$/, "");
      // "mass flow ṁ: 2 kg/s" in the form's words (the colon keeps a symbol apart from a value), "massFlow 2 kg/s" in the file's
      const name = (k: string) => (words ? `${words.field(kind, k)}:` : k);
      for (const [k, raw] of Object.entries(el)) {
        if (["id", "label", "body", "kind"].includes(k)) continue;
        const path = `${g}[${i}].${k}`;
        if (k === "outline") parts.push(`${name(k)} ${(raw as unknown[]).map((p, j) => point(p, `${path}[${j}]`).replace(/ m( = .*)?$/, "")).join(" ")} m`);
        else if (Array.isArray(raw)) parts.push(`${name(k)} ${point(raw, path)}`);
        else parts.push(`${name(k)} ${show(raw, path, k)}`);
      }
      rows.push([el.id as string, words ? words.kind(kind) : kind, (el.label as string | undefined) ?? "", (el.body as string | undefined) ?? "", parts.join("; ")]);
    });
  }
  const gv = parsed.fields.gravity;
  const ga = parsed.fields.gravityAngle;
  const angle = ga && "value" in ga ? ga.value : -90;
  const acts = gravityActs(angle);
  const typed = typeof parsed.file.gravityAngle === "string" && acts !== "acts in −y" ? ` (${parsed.file.gravityAngle})` : "";
  // gravity in the sheet's units: 9.80665 m/s² is 32.174 ft/s² (9.80665 / 0.3048, NIST SP 811)
  const g = gv && "value" in gv ? gv.value : G0;
  const gravity = system === "US" ? formatQuantity(g, "acceleration", "US", { sig: 6 }) : `${formatNumber(g, 6)} m/s²`;
  rows.unshift([words ? words.field("sketch", "gravity").toLowerCase() : "gravity", "", "", "", `${gravity} (${acts}${typed})`]);
  const named = words ? "fields in the words of the properties form" : "fields by their names in the sketch file";
  return {
    id: "inputs",
    title: system === "US" ? `Elements (${named}, as typed; expressions with their values in SI units, US customary in brackets, angles in degrees)` : `Elements (${named}, as typed; expressions with their values in SI units, angles in degrees)`,
    columns: [
      { key: "id", label: "Id", align: "left" },
      { key: "kind", label: "Kind", align: "left" },
      { key: "label", label: "Label", align: "left" },
      { key: "body", label: "Body", align: "left" },
      { key: "fields", label: "Fields", align: "left" },
    ],
    rows,
  };
}

/** Whether a typed text and a shown value are one number in one unit: "92 kg" and "92 kg", "1500.0 kg"
 *  and "1,500 kg", "-2" and "−2", "90 deg" and "90°", "998 kg/m^3" and "998 kg/m³". An expression
 *  ("2 * r", "900 kg + ballast") never is. */
function sameValueText(typed: string, shown: string): boolean {
  const split = (s: string) => {
    const t = prettyUnit(s.trim()).replace(/−/g, "-").replace(/(\d),(?=\d{3})/g, "$1").replace(/\s+/g, "");
    const m = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)(.*)$/i.exec(t);
    return m ? { n: Number(m[1]), unit: m[2] === "deg" ? "°" : m[2] } : null;
  };
  const a = split(typed);
  const b = split(shown);
  return !!a && !!b && a.n === b.n && a.unit === b.unit;
}

/** The field kinds that have US customary units to show beside the SI value. */
/** Kinds whose SI values read with a prefix (kN, kPa, kN/m…). */
const PREFIXED: Readonly<Record<string, true>> = { force: true, moment: true, pressure: true, lineLoad: true, stiffness: true };

const US_QUANTITY: Readonly<Record<string, true>> = { length: true, mass: true, force: true, moment: true, lineLoad: true, massFlow: true, velocity: true, pressure: true, area: true, density: true, volumeFlow: true, stiffness: true, acceleration: true };

/**
 * CSV of a table: a header with units, every number unformatted at full precision (the shortest
 * text that reads back as the same double; a spreadsheet rounds it as it is told to), an empty
 * cell where there is none. The table's number columns hold numbers only, so none of them has a
 * word or a symbol in it (a factor without bound is empty, with the words in a text column).
 */
export function tableToCsv(t: Table, unparse: (rows: unknown[][]) => string): string {
  const header = t.columns.map((c) => (c.unit ? `${c.label} (${c.unit})` : c.label || c.key));
  const rows = t.rows.map((r) => r.map((c) => (typeof c === "number" ? (Number.isFinite(c) ? (Object.is(c, -0) ? 0 : c) : "") : (c ?? ""))));
  return unparse([header, ...rows]);
}

/**
 * What a reader must not miss in the cases: a case in which a body is not held, a factor of
 * safety below its required value (never rounded up to it). The calc sheet's first page and the
 * sign-off dialogs say these. `hasCases`: named cases (else the one run is the sketch as drawn).
 */
export function caseFindings(study: StudyResult, hasCases: boolean): string[] {
  const out: string[] = [];
  for (const run of study.runs) {
    if (!run.ok) {
      out.push(`${run.name}: not solved (${run.errors.map((e) => `${e.path} ${e.message}`).join("; ")})`);
      continue;
    }
    for (const [body, b] of Object.entries(run.result.bodies)) {
      const bits: string[] = [];
      if (hasCases && (b.status === "tips" || b.status === "unrestrained")) bits.push(`${nameIn(study, body)} ${b.status === "tips" ? "tips" : "is unrestrained"}`);
      const st = run.stability[body];
      for (const [against, check] of [["overturning", st?.overturning], ["sliding", st?.sliding]] as const) {
        if (!check || "notApplicable" in check || check.pass) continue;
        const about = "about" in check ? ` about ${pivotWords(check, (id) => nameIn(study, id))}` : "";
        bits.push(`factor of safety against ${against}${about} ${factorWords(check.factor, check.required)}, below the required ${formatNumber(check.required, 4)}`);
      }
      if (bits.length) out.push(`${hasCases ? `${run.name} — ` : ""}${bits.join("; ")}`);
    }
  }
  return out;
}

/** A factor below its required value, never rounded up to it (1.4996 is not "1.5"). */
function factorWords(factor: number, required: number): string {
  for (const digits of [4, 6, 9]) {
    const shown = Number(factor.toPrecision(digits));
    if (shown < required) return formatNumber(shown, digits);
  }
  return String(factor);
}
