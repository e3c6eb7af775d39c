"use client";
// "Sweep": one parameter (or the flow factor) over a range, the reactions and margins plotted
// against it with the points where a contact lifts, a tie goes slack or friction is used up;
// and the limit finder: where does a quantity reach a value, or a body reach its own limit (it tips,
// it slides as a whole)?
import { useEffect, useId, useMemo, useRef, useState } from "react";
import { limitPrecisionWords, limitTolerance, limitWithUnit, type LimitResult } from "@/solver/limit";
import { describeQuantity, type QuantityComponent, type QuantitySpec } from "@/solver/quantity";
import { elementNames } from "@/solver/cases";
import { FLOW_FACTOR } from "@/solver/sweep";
import { formatNumber, prettyUnit } from "@/solver/units";
import { displayKind, displayUnit, inOtherUnit, MAX_STRETCHES, parameterWords, parseTarget, sweepRangeWords, sweepStateLines, toDisplay, typedValueWords } from "@/canvas/studies/display";
import { reactionScale } from "@/solver/report";
import type { Command } from "@/canvas/commands/define";
import { setStudy } from "@/canvas/commands/studies";
import type { SketchFile, SweepFile } from "@/solver/schema";
import { useAnalysis, useEditor, useStores } from "@/canvas/context";
import { CancelledError, StudyRunner } from "@/canvas/studies/client";
import { bodyLimits, firstReached, isBodyLimit, reachedAt, type BodyLimitResult, type BodyLimitSpec, type LimitEverywhere, type LimitQuantity, type SweepData, type SweepSpec } from "@/canvas/studies/run";
import { BUTTON, INPUT, LABEL, PRIMARY_BUTTON } from "@/components/editor/ui";
import { errorInWords } from "@/components/results/errorPlace";
import { runErrorWords, studyErrorWords } from "./studyError";
import { defaultLimitQuantity, SweepChart, sweepTable } from "./SweepChart";
import { downloadCsv, useCsvName } from "./csv";
import { limitRowsTable, type SweepLimitRow } from "@/lib/calcsheet/sweeps";
import type { Table } from "@/solver/report";
import { invalidStretches } from "./sweepErrors";
import { compactNoLimitHint, noLimitHint, noLimitReading, rangeWords, widestOf } from "@/solver/limitHint";
import { defaultSweepParameter, defaultSweepRange, parseRangeValue, solvesAtIn, type ParameterValue } from "./sweepRange";
import { FLOW_FACTOR_PRESSURES } from "@/solver/cautions";

const NO_VALUES: Record<string, ParameterValue> = {};

/** Fields of the sketch a sweep is not solved from: its names, notes and kept sweeps. */
const NOT_SOLVED_FROM = new Set(["title", "description", "sweeps"]);
/** The sketch has changed in something a sweep is solved from (edits share what they leave alone, so identity tells). */
const solvedFromChanged = (a: SketchFile, b: SketchFile) =>
  a !== b && [...new Set([...Object.keys(a), ...Object.keys(b)])].some((k) => !NOT_SOLVED_FROM.has(k) && a[k as keyof SketchFile] !== b[k as keyof SketchFile]);
/** the most points a sweep takes */
const MAX_POINTS = 20000;

/** "a", "a and b", "a, b and c" */
const andList = (xs: readonly string[]) => (xs.length < 2 ? xs.join("") : `${xs.slice(0, -1).join(", ")} and ${xs[xs.length - 1]}`);

const COMPONENT_WORDS: Partial<Record<QuantityComponent, string>> = {
  margin: "margin",
  n: "normal force n",
  resultant: "resultant",
  fx: "Fx",
  fy: "Fy",
  m: "moment",
  frictionMargin: "friction margin",
  t: "tangential force t",
};
const COMPONENT_TITLES: Partial<Record<QuantityComponent, string>> = {
  margin: "The normal force while bearing (taut); below zero once the contact lifts (the tie goes slack)",
  frictionMargin: "μ·n − |t|: below zero where the contact needs more friction than it has",
};

/** An example of a value typed with its own unit, of the parameter's kind. */
export function unitExample(unit: string): string {
  const examples: Record<string, string> = { deg: "0.3 rad", rad: "15 deg", m: "250 mm", mm: "0.25 m", "m / s": "90 km/h", "m/s": "90 km/h", kg: "2 tonne", bar: "150 psi", Pa: "2 kPa", kPa: "0.5 bar", "m^3 / s": "50 m³/h", "m^3/s": "50 m³/h", lps: "50 m³/h" };
  return examples[unit.replace(/\s+/g, " ")] ?? examples[unit.replace(/\s+/g, "")] ?? `2 ${prettyUnit(unit)}`;
}

/**
 * The cases searched (on their own or within a searched combination) that set the swept parameter
 * themselves, "name: value" (as the case writes it): the searched value stands in for theirs. For the flow factor, the
 * cases whose flow factor is not 1: the searched one multiplies theirs (solver/sweep.ts).
 */
export function overridesIn(sketch: SketchFile, rows: readonly LimitEverywhere[], parameter: string): string[] {
  const ids = new Set<string>();
  for (const r of rows) {
    if (r.kind === "case") ids.add(r.id);
    if (r.kind === "combination") for (const t of sketch.combinations?.find((k) => k.id === r.id)?.terms ?? []) ids.add(t.case);
  }
  return (sketch.cases ?? []).flatMap((c) => {
    if (!ids.has(c.id)) return [];
    if (parameter === FLOW_FACTOR) return c.flowFactor !== undefined && c.flowFactor !== 1 ? [`${c.name}: flow × ${c.flowFactor}`] : [];
    const v = c.parameters?.[parameter];
    return v === undefined ? [] : [`${c.name}: ${typedValueWords(v)}`];
  });
}

/** Ticked on a new sweep: each contact's and tie's margin, the friction margin of a contact with
 *  friction, and the resultant of every other support; its components, a contact's own tangential
 *  force and resultant, and a moment are there to tick. */
export function tickedByDefault(q: QuantitySpec, supports: SketchFile["supports"], withFriction: ReadonlySet<string>): boolean {
  const kind = supports.find((s) => s.id === q.support)?.kind;
  if (q.component === "margin") return true;
  if (q.component === "frictionMargin") return withFriction.has(q.support);
  return q.component === "resultant" && kind !== "contact" && kind !== "tie";
}

/** A run of "In every case" that never reaches the target: which side of it the quantity stays on,
 *  so a margin already below zero over the whole range (lifted, or slipping, all along) is not read
 *  as one that never gets there. */
export function noCrossingWords(result: { min: number; max: number }, targetSI: number, target: string): string {
  if (result.max < targetSI) return `no crossing in this range: below ${target} throughout`;
  if (result.min > targetSI) return `no crossing in this range: above ${target} throughout`;
  return "no crossing in this range";
}

/** " Surge stays below 0 kN over the whole range." for the runs that never reach the target from
 *  below (a margin already past zero all along), said after which run reaches it first. */
export function sidesWords(rows: readonly LimitEverywhere[], targetSI: number, target: string): string {
  const below = rows.filter((r) => !("error" in r.result) && !r.result.found && r.result.max < targetSI).map((r) => r.name);
  if (!below.length) return "";
  return ` ${andList(below)} ${below.length > 1 ? "stay" : "stays"} below ${target} over the whole range.`;
}

/** A support's name at the head of a clause: "the front caster" for a label in lower case, as the status sentences name it. */
const theName = (name: string) => (/^[a-z]/.test(name) ? `the ${name}` : name);

/** A body's own limit as the picker and the answers name it: "Cart tips", "Cart slides as a whole". */
export function bodyLimitLabel(q: BodyLimitSpec, names: Readonly<Record<string, string>>): string {
  return `${names[q.body] ?? q.body} ${q.limit === "tips" ? "tips" : "slides as a whole"}`;
}

/** What a body's own limit is, said after where it is reached. */
const BODY_LIMIT_WHY: Record<BodyLimitSpec["limit"], string> = {
  tips: "from there no set of its contacts and ties holds it",
  slides: "its friction contacts together are used up there (Σμ·n − |Σt| = 0, a factor of 1 against sliding)",
};

/**
 * A run of "In every case" in which a body's own limit is not reached, in words: a body that slides
 * all along, one that tips first (sliding is searched only while the body is held), or one that
 * holds throughout.
 */
export function bodyNoCrossingWords(result: BodyLimitResult & { found: false }, q: BodyLimitSpec, pName: string, unit: string): string {
  if (!Number.isFinite(result.min)) return "no crossing in this range: not held anywhere in it, or nothing bears";
  if (q.limit === "tips") return `no crossing in this range: it does not tip${result.slidesFrom !== undefined ? `; it slides as a whole from ${pName} = ${limitWithUnit(result.slidesFrom, unit)}` : ""}`;
  const tips = result.tipsFrom !== undefined ? `, it tips first, from ${pName} = ${limitWithUnit(result.tipsFrom, unit)}` : "";
  if (result.max < 0) return `no crossing in this range: it slides as a whole throughout (Σμ·n − |Σt| stays below zero)${tips ? `, while it is held; then${tips.slice(1).replace(" first", "")}` : ""}`;
  if (tips) return `no crossing in this range: searched while the body is held${tips}`;
  return "no crossing in this range: it does not slide as a whole";
}

/**
 * Where a body found tipping has already slid as a whole, in words, after its tipping value: the
 * solve checks friction but does not enforce it, so a body found sliding is still solved as if held
 * along its base, and its tipping value stands only while it is held against sliding (kept from
 * sliding by a stop or an anchor). Empty when it does not slide first, going from the range's start.
 */
export function slidFirstWords(result: BodyLimitResult, q: BodyLimitSpec, pName: string, from: number, to: number): string {
  if (q.limit !== "tips" || !result.found || result.slidesFrom === undefined) return "";
  const tips = reachedAt(result, from, to)!;
  const first = from <= to ? result.slidesFrom <= tips : result.slidesFrom >= tips;
  if (!first) return "";
  return `while it is held against sliding: it already slides as a whole from ${pName} = ${limitWithUnit(result.slidesFrom, result.unit)}`;
}

/**
 * The answer of a search of a body's own limit in one run: where it tips or slides as a whole, and
 * why that is the limit; else why it is not reached in the range. `over`: "for flow factor from 0
 * to 4"; `precision`: how far the value is given.
 */
export function bodyLimitWords(result: BodyLimitResult, q: BodyLimitSpec, label: string, pName: string, over: string, precision: string, from: number, to = Number.POSITIVE_INFINITY): string {
  if (result.found) {
    const again = result.crossings.length > 1 ? ` and again at ${result.crossings.slice(1).map((x) => limitWithUnit(x, result.unit)).join(", ")}` : "";
    const start = result.value === from ? ", already at the range's start" : "";
    const slid = slidFirstWords(result, q, pName, from, to);
    const held = slid ? ` — ${slid}; the solve checks friction but does not enforce it, so it tips there only if it is kept from sliding` : "";
    return `${label} at ${pName} = ${limitWithUnit(result.value, result.unit)}${again}${start} (${precision}): ${BODY_LIMIT_WHY[q.limit]}${held}.`;
  }
  const name = label.slice(0, label.length - (q.limit === "tips" ? " tips" : " slides as a whole").length);
  if (!Number.isFinite(result.min)) return `No crossing in this range: ${name} is not held anywhere ${over}${q.limit === "slides" ? ", or no contact with friction bears" : ""}.`;
  if (q.limit === "tips")
    return `No crossing in this range: ${name} does not tip ${over} (a set of its contacts and ties holds it throughout)${result.slidesFrom !== undefined ? `; it slides as a whole from ${pName} = ${limitWithUnit(result.slidesFrom, result.unit)}` : ""}.`;
  const tips = result.tipsFrom !== undefined ? `from ${pName} = ${limitWithUnit(result.tipsFrom, result.unit)}` : "";
  if (result.max < 0)
    return `No crossing in this range: ${name} slides as a whole throughout, ${over} (Σμ·n − |Σt| stays below zero)${tips ? `, while it is held; it tips ${tips} (sliding is searched only while the body is held)` : ""}.`;
  if (tips) return `No crossing in this range: ${name} does not slide as a whole while it is held, ${over}; it tips first, ${tips} (sliding is searched only while the body is held).`;
  return `No crossing in this range: ${name} does not slide as a whole ${over}.`;
}

/** " Storm slides as a whole throughout the range." for the runs of a body's sliding past it all along. */
export function bodySidesWords(rows: readonly LimitEverywhere[], q: BodyLimitSpec, names: Readonly<Record<string, string>>): string {
  if (q.limit !== "slides") return "";
  const all = rows.filter((r) => !("error" in r.result) && !r.result.found && r.result.max < 0).map((r) => r.name);
  if (!all.length) return "";
  return ` ${names[q.body] ?? q.body} slides as a whole throughout the range in ${andList(all)}.`;
}

/** "In every case" as answered: the same limit searched in every case and combination. */
export interface Everywhere {
  rows: LimitEverywhere[];
  label: string;
  target: string;
  /** the target in SI, to say which side of it a run that never reaches it stays on */
  targetSI: number;
  /** the runs where it comes first: more than one when they tie */
  first: string[];
  firstValue: number | null;
  unit: string;
  from: number;
  to: number;
  precision: string;
  /** the searched runs' cases that set the parameter themselves: "name: value" */
  overrides: string[];
  pName: string;
  /** a body's own limit searched (no target) */
  body?: BodyLimitSpec;
  /** the parameter searched (its name in the sketch) */
  parameter: string;
  /** what was searched: a support's quantity or a body's own limit */
  quantity: LimitQuantity;
  /** the search's tolerance, in the parameter's unit */
  tolerance: number;
  /** for each run of a support's quantity that does not reach the target (by `runKey`): how it is read
   *  (`noLimitReading`) and where it came closest and which way it goes at the ends (`compactNoLimitHint`) */
  hints?: Record<string, EverywhereHint>;
  /** a range covering every run's wider range worth a search (`widestOf`), in the parameter's unit */
  wider?: { from: number; to: number };
}

/** A run of "In every case" without a crossing, as read for its row. */
export interface EverywhereHint {
  released?: "lifted off" | "slack";
  /** the body's name when it is held nowhere in the range */
  loose?: string;
  /** "closest … at …; past … heading for …" */
  words: string;
}

/** A run's key among the rows of "In every case": its kind and id. */
export const runKey = (r: LimitEverywhere) => `${r.kind}:${r.id}`;

/**
 * The words of a run of a support's quantity that does not reach the target: which side of it the
 * quantity stays on (lifted off, or slack, throughout for a released support; not held, for a body
 * held nowhere), then where it came closest and which way it goes at each end, as the single
 * search says them in full. On screen and in the CSV.
 */
export function unreachedWords(e: Everywhere, run: LimitEverywhere, result: { min: number; max: number }): string {
  const h = e.hints?.[runKey(run)];
  const head = h?.loose !== undefined
    ? `no crossing in this range: ${h.loose} is not held anywhere in it (what its supports would need, not a load they carry)`
    : h?.released
      ? `no crossing in this range: ${h.released} (it carries nothing) throughout`
      : noCrossingWords(result, e.targetSI, e.target);
  return h?.words ? `${head}; ${h.words}` : head;
}

/**
 * "In every case" as a result table, for its CSV: built by the same builder as a version page's
 * table of a kept sweep's limits (`limitRowsTable`), a row per case or combination, with where the
 * limit is reached (full precision), and the words on screen for a run that does not reach it.
 */
export function everywhereTable(e: Everywhere, sketch: SketchFile): Table {
  const rows: SweepLimitRow[] = e.rows.map((run) => {
    const r = run.result;
    const value = reachedAt(r, e.from, e.to);
    const first = e.first.includes(run.id);
    return {
      run,
      quantity: e.body ? { support: e.body.body, component: e.body.limit === "tips" ? "margin" : "frictionMargin" } : (e.quantity as QuantitySpec),
      limit: e.body ? e.label : `${e.label} reaches ${e.target}`,
      past: e.body ? (e.body.limit === "tips" ? "tipping" : "sliding as a whole") : "",
      value,
      more: "found" in r && r.found ? Math.max(0, r.crossings.length - 1) : 0,
      pastThroughout: false,
      first,
      governs: first,
      ...(e.body ? { body: e.body.body } : {}),
      ...("error" in r ? { unreached: runErrorWords(sketch, r) } : !r.found ? { unreached: e.body ? bodyNoCrossingWords(r, e.body, e.pName, e.unit) : unreachedWords(e, run, r) } : {}),
    };
  });
  const title = e.body ? `Where ${e.label}, in each case and combination` : `Where the ${e.label} reaches ${e.target}, in each case and combination`;
  return limitRowsTable(rows, { id: "limit-everywhere", title, parameter: e.parameter, from: e.from, to: e.to, unit: e.unit, tolerance: e.tolerance });
}

export function SweepPanel() {
  const { editor } = useStores();
  const csvName = useCsvName();
  const noTargetId = useId();
  const sketch = useEditor((s) => s.sketch);
  const units = useEditor((s) => s.units);
  const parameters = Object.keys(sketch.parameters ?? {});
  const choices = useMemo(() => {
    const out: Array<{ spec: QuantitySpec; label: string; title: string }> = [];
    const add = (s: SketchFile["supports"][number], component: QuantityComponent) =>
      out.push({ spec: { support: s.id, component }, label: `${s.label?.trim() || s.id}: ${COMPONENT_WORDS[component]}`, title: `${s.label ? `${s.label} — ` : ""}${COMPONENT_TITLES[component] ?? COMPONENT_WORDS[component]}` });
    // each reaction can be plotted (issue: "plot each reaction"); the margins and the resultants
    // of pins, rollers and fixed supports are ticked by default (see `picked`), the rest on request
    for (const s of sketch.supports) {
      if (s.kind === "contact" || s.kind === "tie") {
        add(s, "margin");
        if (s.kind === "contact" && s.mu !== undefined) add(s, "frictionMargin");
        if (s.kind === "contact") {
          // without friction a contact's tangential force is zero at every point: nothing to plot
          if (s.mu !== undefined && Number(s.mu) !== 0) add(s, "t");
          add(s, "resultant");
        }
      } else {
        add(s, "resultant");
        add(s, "fx");
        add(s, "fy");
        if (s.kind === "fixed") add(s, "m");
      }
    }
    return out;
  }, [sketch.supports]);

  // the supports as the drawing names them (their labels), for the lines and the sentences
  const names = useMemo(() => elementNames(sketch), [sketch]);
  const saved = sketch.sweeps?.[0];
  const values = useAnalysis((s) => s.core?.parameterValues) ?? NO_VALUES;
  // the limit's target is typed in the unit of the reactions table (N for a bench rig, kN for a skid)
  const shown = useAnalysis((s) => s.shown);
  const scale = useMemo(() => (shown ? reactionScale(shown) : undefined), [shown]);
  const scaleFor = (c: QuantityComponent) => {
    const kind = displayKind(c);
    return kind === "ratio" ? undefined : scale?.[kind];
  };
  const [parameter, setParameter] = useState(() => saved?.parameter ?? defaultSweepParameter(parameters, values));
  // a new sweep's range starts where the sketch solves (a density is not swept from 0): one or two solves
  const [firstRange] = useState(() => saved ?? defaultSweepRange(parameter, values[parameter], solvesAtIn(sketch, parameter)));
  const [from, setFrom] = useState(() => String(firstRange.from));
  const [to, setTo] = useState(() => String(firstRange.to));
  /** the unit a parameter is written in now ("" for the flow factor or a plain number) */
  const unitNow = (name: string) => {
    const v = name === FLOW_FACTOR ? undefined : values[name];
    return v && !("error" in v) ? v.unit : "";
  };
  const pickParameter = (name: string) => {
    setParameter(name);
    setFormUnit(unitNow(name));
    const range = saved?.parameter === name ? saved : defaultSweepRange(name, values[name], solvesAtIn(sketch, name));
    setFrom(String(range.from));
    setTo(String(range.to));
  };
  const [points, setPoints] = useState(String(saved?.points ?? 201));
  // the unit the chosen parameter is written in (what a plain number in From and To means), from
  // the parameter as chosen now, not from the last plot
  const chosenValue = parameter === FLOW_FACTOR ? undefined : values[parameter];
  const parameterUnit = chosenValue && !("error" in chosenValue) ? chosenValue.unit : "";
  // the unit the plain numbers in From and To were given in: when the parameter is written in
  // another unit of the same kind ("30 m/s" edited to "108 km/hr"), they are rewritten as the same
  // values in it, as the kept sweeps are (a unit of another kind on the way there is passed over)
  const [formUnit, setFormUnit] = useState(parameterUnit);
  if (parameterUnit && parameterUnit !== formUnit) {
    const moved = (text: string): string | null => {
      const n = text.trim() === "" ? NaN : Number(text);
      // a value typed with its own unit ("72 km/hr") means the same in any
      if (!Number.isFinite(n)) return text;
      const x = inOtherUnit(n, formUnit, parameterUnit);
      return x === null ? null : String(x);
    };
    const f = formUnit ? moved(from) : from;
    const t = formUnit ? moved(to) : to;
    if (f !== null && t !== null) {
      setFrom(f);
      setTo(t);
      setFormUnit(parameterUnit);
    }
  }
  // what the sweep runs on: "" (as drawn), "case:<id>" or "combination:<id>"
  const [on, setOn] = useState<string>(saved?.combination ? `combination:${saved.combination}` : saved?.case ? `case:${saved.case}` : "");
  const caseId = on.startsWith("case:") ? on.slice(5) : undefined;
  const combinationId = on.startsWith("combination:") ? on.slice(12) : undefined;
  // by default the margins, the friction margins of contacts with friction (a body slides long
  // before it tips as often as not: "when does it start to move?" needs both) and the resultants
  const [picked, setPicked] = useState<string[]>(() => {
    const withFriction = new Set(sketch.supports.filter((s) => s.kind === "contact" && s.mu !== undefined && Number(s.mu) !== 0).map((s) => s.id));
    return (saved?.quantities ?? choices.map((c) => c.spec).filter((q) => tickedByDefault(q, sketch.supports, withFriction))).map((q) => `${q.support}:${q.component}`);
  });
  const [data, setData] = useState<SweepData | null>(null);
  /** what the plot shows was run on, and with which settings: the limit finder searches the same */
  const [ran, setRan] = useState<{ spec: SweepSpec; on: string; sketch: SketchFile; text: string; id: number } | null>(null);
  // the plot no longer shows the sketch once anything it is solved from has changed
  const stalePlot = ran !== null && solvedFromChanged(ran.sketch, sketch);
  // which plot a limit search answers: a result that comes back after another plot replaced it is dropped
  const ranId = useRef(0);
  const [runs, setRuns] = useState(0);
  const [progress, setProgress] = useState<number | null>(null);
  const [cancel, setCancel] = useState<(() => void) | null>(null);
  const [error, setError] = useState<string | null>(null);
  /** the quantity the limit finder searches, as "support:component" (null: the plot's default, see defaultLimitQuantity) */
  const [limitKey, setLimitKey] = useState<string | null>(null);
  const [target, setTarget] = useState("0");
  const [limit, setLimit] = useState<{ result: LimitResult; label: string; /** in the unit on screen ("" for a body's own limit) */ target: string; /** the answer, in words with units */ words: string; /** no crossing, but heading for one past an end: the range worth a search */ wider?: { from: number; to: number }; unit?: string } | null>(null);
  /** the same limit in every case and combination */
  const [everywhere, setEverywhere] = useState<Everywhere | null>(null);
  /** a target that does not read: said beside the limit finder, not up by the sweep's Run */
  const [limitError, setLimitError] = useState<string | null>(null);
  const [searching, setSearching] = useState<(() => void) | null>(null);
  const [limitStopped, setLimitStopped] = useState(false);
  const runner = useRef<StudyRunner | null>(null);
  useEffect(() => {
    runner.current = new StudyRunner();
    return () => runner.current?.dispose();
  }, []);

  const onLabel = (caseId?: string, combinationId?: string) =>
    combinationId
      ? `combination ${sketch.combinations?.find((c) => c.id === combinationId)?.name ?? combinationId}`
      : caseId
        ? `case ${sketch.cases?.find((c) => c.id === caseId)?.name ?? caseId}`
        : "as drawn";
  const quantities = choices.filter((c) => picked.includes(`${c.spec.support}:${c.spec.component}`)).map((c) => c.spec);
  /** The range as typed now, in the unit the parameter is written in (or an error in words, naming the field). */
  const typedRange = (): { from: number; to: number } | string => {
    // the ends in the unit the parameter is written in, or with their own unit ("90 km/hr")
    const ends: number[] = [];
    for (const [name, text] of [["From", from], ["To", to]]) {
      try {
        ends.push(parseRangeValue(text, parameterUnit));
      } catch (err) {
        return `${name}: ${(err as Error).message}.`;
      }
    }
    const [f, t] = ends;
    if (f === t) return "Give a range: two different values.";
    return { from: f, to: t };
  };
  const spec = (): SweepSpec | string => {
    const range = typedRange();
    if (typeof range === "string") return range;
    // a whole number as typed: 2.6 is refused, not quietly run as 3
    const n = Number(points.trim());
    if (!points.trim() || !Number.isInteger(n) || n < 2 || n > MAX_POINTS) return `Points: a whole number from 2 to ${MAX_POINTS.toLocaleString("en-US")}.`;
    if (!quantities.length) return "Pick at least one quantity to plot.";
    return { parameter, from: range.from, to: range.to, points: n, caseId, combinationId, quantities };
  };

  const run = () => {
    const s = spec();
    if (typeof s === "string") return setError(s);
    setError(null);
    setProgress(0);
    const text = JSON.stringify(sketch);
    const asRun = sketch;
    const job = runner.current!.run({ kind: "sweep", text, spec: s }, (done, total) => setProgress(done / total));
    setCancel(() => job.cancel);
    job.promise
      .then((d) => {
        setData(d);
        ranId.current += 1;
        setRan({ spec: s, on: onLabel(s.caseId, s.combinationId), sketch: asRun, text, id: ranId.current });
        setRuns((n) => n + 1);
        setLimit(null);
        setEverywhere(null);
        setLimitStopped(false);
      })
      .catch((err) => setError(err instanceof CancelledError ? "Stopped: nothing plotted." : studyErrorWords(asRun, err)))
      .finally(() => {
        setProgress(null);
        setCancel(null);
      });
  };

  /** The plotted run's settings, the quantity and the target read for a limit search (null: said why). */
  const limitInputs = (wider?: { from: number; to: number }) => {
    // on what the plot shows (the form may have changed since): its case or combination and its
    // parameter, over the range as typed now while the form still sweeps that parameter
    // (`wider`: the range a search without a crossing offered, put in the form as it runs)
    const s = ran?.spec;
    if (!s || !limitQuantity) return null;
    const q = limitQuantity;
    let range = { from: s.from, to: s.to };
    if (wider) range = wider;
    else if (parameter === s.parameter) {
      const typed = typedRange();
      if (typeof typed === "string") {
        setLimit(null);
        setEverywhere(null);
        setLimitError(`${typed} The limit finder searches the range as typed.`);
        return null;
      }
      range = typed;
    }
    // a plain number is in the quantity's own unit, as the reactions table shows it (kN or N, kN·m or
    // N·m); a value with a unit ("450 lbf") is taken as written, and quoted in the unit on screen
    let tgt: { si: number; shown: string } = { si: 0, shown: "" };
    // a body's own limit (it tips, it slides as a whole) is the limit itself: no target is read
    if (!isBodyLimit(q))
      try {
        tgt = parseTarget(target, q.component, units, scaleFor(q.component));
      } catch (err) {
        setLimit(null);
        setEverywhere(null);
        setLimitError(`Target: ${(err as Error).message}.`);
        return null;
      }
    setError(null);
    setLimitError(null);
    setLimit(null);
    setEverywhere(null);
    setLimitStopped(false);
    return { s: { ...s, ...range }, q, tgt, text: ran.text, id: ran.id };
  };

  /** a value of a component (SI) in the unit on screen, with the unit */
  const shownIn = (component: QuantityComponent) => {
    const shownUnit = displayUnit(component, units, scaleFor(component));
    return (si: number) => `${formatNumber(toDisplay(si, component, units, scaleFor(component)), 4)}${shownUnit ? ` ${shownUnit}` : ""}`;
  };

  const findEverywhere = (wider?: { from: number; to: number }) => {
    const inputs = limitInputs(wider);
    if (!inputs) return;
    const { s, q, tgt, text, id } = inputs;
    const job = runner.current!.run({ kind: "limits", text, spec: { parameter: s.parameter, from: s.from, to: s.to, quantity: q, target: tgt.si } });
    setSearching(() => job.cancel);
    job.promise
      .then((rows) => {
        if (ranId.current !== id) return;
        const first = firstReached(rows, s.from, s.to);
        const unit = rows.find((r) => "unit" in r.result)?.result;
        const unitText = unit && "unit" in unit ? unit.unit : "";
        // every run is searched over the same range, to the same tolerance
        const found = rows.find((r) => "found" in r.result && r.result.found)?.result;
        const tolerance = (found && "found" in found && found.found && found.tolerance) || limitTolerance([s.from, s.to]);
        const reached = rows.map((r) => reachedAt(r.result, s.from, s.to)).filter((x): x is number => x !== undefined);
        // each run of a support's quantity without a crossing read as the single search reads it
        const pName = parameterWords(s.parameter);
        const hints: Record<string, EverywhereHint> = {};
        const offered: { from: number; to: number }[] = [];
        if (!isBodyLimit(q))
          for (const r of rows) {
            if (!("found" in r.result) || r.result.found || !Number.isFinite(r.result.min)) continue;
            const reading = noLimitReading(r.result, q, ran!.sketch.supports ?? [], names, tgt.si, shownIn(q.component));
            const hint = compactNoLimitHint(r.result, s, { parameter: s.parameter, pName, target: tgt.shown, shown: reading.shown, released: reading.released });
            hints[runKey(r)] = { ...(reading.released ? { released: reading.released } : {}), ...(reading.loose !== undefined ? { loose: reading.loose } : {}), words: hint.words };
            if (hint.wider) offered.push(hint.wider);
          }
        const widest = widestOf(offered, s);
        setEverywhere({
          rows,
          label: isBodyLimit(q) ? bodyLimitLabel(q, names) : describeQuantity(q, names),
          target: tgt.shown,
          targetSI: tgt.si,
          first: first ? first.tied.map((r) => r.id) : [],
          firstValue: first?.value ?? null,
          unit: unitText,
          from: s.from,
          to: s.to,
          precision: limitPrecisionWords(tolerance, unitText, reached),
          overrides: overridesIn(ran!.sketch, rows, s.parameter),
          pName,
          ...(isBodyLimit(q) ? { body: q } : {}),
          parameter: s.parameter,
          quantity: q,
          tolerance,
          hints,
          ...(widest ? { wider: widest } : {}),
        });
      })
      .catch((err) => (err instanceof CancelledError ? setLimitStopped(true) : setError(studyErrorWords(ran?.sketch ?? sketch, err))))
      .finally(() => setSearching(null));
  };

  const findLimit = (wider?: { from: number; to: number }) => {
    const inputs = limitInputs(wider);
    if (!inputs) return;
    const { s, q, tgt, text, id } = inputs;
    const job = runner.current!.run({ kind: "limit", text, spec: { parameter: s.parameter, from: s.from, to: s.to, caseId: s.caseId, combinationId: s.combinationId, quantity: q, target: tgt.si } });
    setSearching(() => job.cancel);
    job.promise
      .then((result: BodyLimitResult) => {
        if (ranId.current !== id) return;
        const label = isBodyLimit(q) ? bodyLimitLabel(q, names) : describeQuantity(q, names);
        // a body's sliding margin is a force, as a friction margin is
        const component = isBodyLimit(q) ? "frictionMargin" : q.component;
        const inShown = shownIn(component);
        const pUnit = result.unit ? ` ${prettyUnit(result.unit)}` : "";
        // the flow factor is named as everywhere else ("at flow factor = 1.186", as "In every case" says it)
        const pName = parameterWords(s.parameter);
        // one rule for a found limit wherever it is shown: 4 significant figures, with the search's
        // tolerance where it shows in them
        const again = result.found && result.crossings.length > 1 ? ` and again at ${result.crossings.slice(1).map((x) => limitWithUnit(x, result.unit)).join(", ")}` : "";
        // a range typed since the plot is the one searched: said, since the plot shows another
        const plotted = ran!.spec;
        const otherRange = s.from !== plotted.from || s.to !== plotted.to ? ` Searched from ${formatNumber(s.from, 5)} to ${formatNumber(s.to, 5)}${pUnit} as typed now; the plot shows ${formatNumber(plotted.from, 5)} to ${formatNumber(plotted.to, 5)}${pUnit}.` : "";
        const precision = result.found ? limitPrecisionWords(result.tolerance ?? limitTolerance([s.from, s.to]), result.unit, result.crossings) : "";
        const over = `for ${pName} from ${formatNumber(s.from, 5)} to ${formatNumber(s.to, 5)}${pUnit}`;
        // no crossing: where it came closest, and whether a wider range may find one
        // a contact's or tie's margin below zero all through: it is lifted off (slack) there and carries
        // nothing; the margin's size then follows the support stiffnesses, so no figure of it is said.
        // Not held anywhere in the range (it tips all through): its margins are those of the last set
        // of supports that held it, carried on, not loads its supports carry
        const reading = !isBodyLimit(q) && !result.found ? noLimitReading(result, q, ran!.sketch.supports ?? [], names, tgt.si, inShown) : undefined;
        const released = reading?.released;
        const loose = reading?.loose;
        // below zero a margin of a held body is no force: "lifted off" (or "slack") in place of its figure
        const marginShown = reading?.shown ?? inShown;
        const hint = !isBodyLimit(q) && !result.found && Number.isFinite(result.min) ? noLimitHint(result, s, { parameter: s.parameter, pName, target: tgt.shown, shown: marginShown, released }) : null;
        const words = isBodyLimit(q)
          ? bodyLimitWords(result, q, label, pName, over, precision, s.from, s.to) + otherRange
          : result.found
          ? `The ${label} reaches ${tgt.shown} at ${pName} = ${limitWithUnit(result.value, result.unit)}${again} (${limitPrecisionWords(result.tolerance ?? limitTolerance([s.from, s.to]), result.unit, result.crossings)}).${otherRange}`
          : loose !== undefined
            ? `No crossing in this range: ${loose} is not held anywhere in it (it tips, or nothing holds it, all through ${pName} from ${formatNumber(s.from, 5)} to ${formatNumber(s.to, 5)}${pUnit}); the ${label} there is what its supports would need, not a load they carry.${hint?.words ? ` ${hint.words}` : ""}${otherRange}`
          : released
            ? `No crossing in this range: ${theName(names[q.support] ?? q.support)} is ${released} (it carries nothing) all through ${pName} from ${formatNumber(s.from, 5)} to ${formatNumber(s.to, 5)}${pUnit}.${hint?.words ? ` ${hint.words}` : ""}${otherRange}`
          : Number.isFinite(result.min)
            ? `No crossing in this range: the ${label} stays ${result.min >= tgt.si ? "above" : "below"} ${tgt.shown} (it runs from ${marginShown(result.min)} to ${marginShown(result.max)}) for ${pName} from ${formatNumber(s.from, 5)} to ${formatNumber(s.to, 5)}${pUnit}.${hint?.words ? ` ${hint.words}` : ""}${otherRange}`
            : `No crossing in this range: the ${label} is undefined for ${pName} from ${formatNumber(s.from, 5)} to ${formatNumber(s.to, 5)}${pUnit}.`;
        setLimit({ result, label, target: tgt.shown, words, ...(hint?.wider ? { wider: hint.wider, unit: result.unit } : {}) });
      })
      // Stop ends every study of this panel at once (they share one worker)
      .catch((err) => (err instanceof CancelledError ? setLimitStopped(true) : setError(studyErrorWords(ran?.sketch ?? sketch, err))))
      .finally(() => setSearching(null));
  };

  /** A wider range offered searched: put in From and To (Run plots it) while the form sweeps the plotted parameter, the one searched. */
  const searchWider = (w: { from: number; to: number }, search: (w: { from: number; to: number }) => void) => {
    if (parameter === ran?.spec.parameter) {
      setFrom(String(w.from));
      setTo(String(w.to));
    }
    search(w);
  };

  const kept = sketch.sweeps ?? [];
  const putKept = (value: SweepFile[]) => editor.getState().apply(setStudy({ key: "sweeps", value }) as Command<unknown>);
  const [keptNote, setKeptNote] = useState<string | null>(null);
  const keep = () => {
    const s = spec();
    if (typeof s === "string") return setError(s);
    const settings = { parameter: s.parameter, from: s.from, to: s.to, points: s.points, ...(s.caseId ? { case: s.caseId } : {}), ...(s.combinationId ? { combination: s.combinationId } : {}), quantities: s.quantities };
    const key = (k: Omit<SweepFile, "id">) => JSON.stringify([k.parameter, k.from, k.to, k.points, k.case ?? null, k.combination ?? null, (k.quantities ?? []).map((q) => `${q.support}:${q.component}`)]);
    const same = kept.find((k) => key(k) === key(settings));
    if (same) return setKeptNote("This sweep is on the calc sheet already.");
    let n = kept.length + 1;
    while (kept.some((k) => k.id === `sweep-${n}`)) n++;
    putKept([...kept, { id: `sweep-${n}`, ...settings }]);
    setKeptNote(null);
  };
  /** a kept sweep's settings back in the form */
  const open = (k: SweepFile) => {
    setParameter(k.parameter);
    // a kept sweep's ends are in the unit its parameter is written in
    setFormUnit(unitNow(k.parameter));
    setFrom(String(k.from));
    setTo(String(k.to));
    setPoints(String(k.points));
    setOn(k.combination ? `combination:${k.combination}` : k.case ? `case:${k.case}` : "");
    if (k.quantities?.length) setPicked(k.quantities.map((q) => `${q.support}:${q.component}`));
    setKeptNote(null);
  };
  /** what a kept sweep names that the sketch no longer has */
  const keptProblem = (k: SweepFile): string | null => {
    if (k.case && !sketch.cases?.some((c) => c.id === k.case)) return `its case "${k.case}" is gone`;
    if (k.combination && !sketch.combinations?.some((c) => c.id === k.combination)) return `its combination "${k.combination}" is gone`;
    if (k.parameter !== FLOW_FACTOR && !(k.parameter in (sketch.parameters ?? {}))) return `the sketch has no parameter "${k.parameter}" any more`;
    // deleting a support in the editor takes it off the sweeps; a file from elsewhere may still name one
    const gone = k.quantities?.find((q) => !sketch.supports.some((s) => s.id === q.support));
    if (gone) return `its support "${gone.support}" is gone`;
    return null;
  };

  const caseOverride = caseId ? sketch.cases?.find((c) => c.id === caseId)?.parameters?.[parameter] : undefined;
  // a case's own flow factor is not replaced but scaled by the swept one
  const caseFlow = caseId && parameter === FLOW_FACTOR ? sketch.cases?.find((c) => c.id === caseId)?.flowFactor : undefined;
  const combination = combinationId ? sketch.combinations?.find((k) => k.id === combinationId) : undefined;
  // the cases of the combination that set the swept parameter themselves
  const combinationOverrides = combination
    ? combination.terms.flatMap((t) => {
        const c = sketch.cases?.find((x) => x.id === t.case);
        if (parameter === FLOW_FACTOR) return c && c.flowFactor !== undefined && c.flowFactor !== 1 ? [`${c.name} (flow × ${c.flowFactor})`] : [];
        const v = c?.parameters?.[parameter];
        return c && v !== undefined ? [`${c.name} (${parameter} = ${typedValueWords(v)})`] : [];
      })
    : [];
  const plotted = ran?.spec.quantities ?? [];
  // each body's own limits (it tips; it slides as a whole), as the calc sheet's limits table
  // searches them, in the sketch the plot was run on: offered whatever is plotted
  const bodyChoices = useMemo(() => (ran ? bodyLimits(ran.sketch) : []), [ran]);
  const keyOf = (q: LimitQuantity) => (isBodyLimit(q) ? `body:${q.body}:${q.limit}` : `${q.support}:${q.component}`);
  const limitChoices: LimitQuantity[] = [...plotted, ...bodyChoices];
  // the quantity picked while it is still offered; else the one the plot marks where it reaches zero
  // (what the user sees happen), so the finder searches by default what the plot shows
  const shownByDefault = data ? data.quantities[defaultLimitQuantity(data)] : undefined;
  const limitQuantity: LimitQuantity | undefined = limitChoices.find((q) => keyOf(q) === limitKey) ?? plotted.find((q) => shownByDefault && keyOf(q) === keyOf(shownByDefault)) ?? limitChoices[0];
  const bodyLimit = limitQuantity && isBodyLimit(limitQuantity) ? limitQuantity : undefined;
  const targetUnit = limitQuantity && !isBodyLimit(limitQuantity) ? displayUnit(limitQuantity.component, units, scaleFor(limitQuantity.component)) : "";
  const pLabel = parameterWords(parameter);
  // the plot's parameter, which the form may have left since
  const dLabel = data ? parameterWords(data.parameter) : pLabel;
  const invalid = data ? invalidStretches(data) : [];
  // where a plotted support is off its seat or its body not held: in the words a version's page and the calc sheet use
  const stateLines = data ? sweepStateLines(data, names) : [];
  // the limit finder searches the plotted parameter over the range as typed now: said when that is not the plotted range
  const rangeNote = (() => {
    if (!ran || !data) return null;
    const s = ran.spec;
    const sName = parameterWords(s.parameter);
    const sUnit = data.unit ? ` ${prettyUnit(data.unit)}` : "";
    if (parameter !== s.parameter) return `Find searches the plotted ${sName}, from ${formatNumber(s.from, 5)} to ${formatNumber(s.to, 5)}${sUnit}: run the sweep to search ${pLabel}.`;
    const typed = typedRange();
    if (typeof typed === "string") return `Find searches the range as typed: ${typed}`;
    if (typed.from === s.from && typed.to === s.to) return null;
    return `Find searches ${sName} from ${formatNumber(typed.from, 5)} to ${formatNumber(typed.to, 5)}${sUnit}, as typed now; the plot shows ${formatNumber(s.from, 5)} to ${formatNumber(s.to, 5)}${sUnit} (run the sweep to plot the new range).`;
  })();

  return (
    <div className="@container" data-testid="sweep-panel">
    <div className="grid min-h-0 gap-4 @4xl:grid-cols-[19rem_1fr]">
      <form className="grid grid-cols-2 gap-x-3 gap-y-2 @xl:grid-cols-4 @4xl:grid-cols-1" onSubmit={(e) => { e.preventDefault(); run(); }} aria-label="Sweep settings">
        <label className="col-span-2 block @4xl:col-span-1">
          <span className={LABEL}>Parameter</span>
          <select className={INPUT} value={parameter} onChange={(e) => pickParameter(e.target.value)} aria-label="Parameter to sweep">
            {parameters.map((p) => (
              <option key={p} value={p}>{p} = {String(sketch.parameters?.[p])}</option>
            ))}
            <option value={FLOW_FACTOR}>flow factor (every port’s ṁ and V × f)</option>
          </select>
        </label>
        <div className="col-span-2 grid grid-cols-3 gap-1.5 @4xl:col-span-1">
          <label><span className={LABEL}>From</span><input className={INPUT} value={from} onChange={(e) => setFrom(e.target.value)} aria-label="From" aria-invalid={error?.startsWith("From:") || undefined} /></label>
          <label><span className={LABEL}>To</span><input className={INPUT} value={to} onChange={(e) => setTo(e.target.value)} aria-label="To" aria-invalid={error?.startsWith("To:") || undefined} /></label>
          <label><span className={LABEL}>Points</span><input className={INPUT} value={points} onChange={(e) => setPoints(e.target.value)} aria-label="Points" inputMode="numeric" aria-invalid={error?.startsWith("Points:") || undefined} /></label>
        </div>
        <p className="col-span-2 text-[11px] text-ink-faint @xl:col-span-4 @4xl:col-span-1" data-testid="sweep-unit-hint">
          {parameter === FLOW_FACTOR
            ? `The flow factor is a plain number (1: the flow as drawn). ${FLOW_FACTOR_PRESSURES}`
            : parameterUnit
              ? `Numbers in ${prettyUnit(parameterUnit)}, the unit ${parameter} is written in, or give a unit of the same kind (“${unitExample(parameterUnit)}”).`
              : `${parameter} is a plain number.`}
        </p>
        {(sketch.cases?.length ?? 0) > 0 && (
          <label className="col-span-2 block @4xl:col-span-1">
            <span className={LABEL}>{sketch.combinations?.length ? "Case or combination" : "Case"}</span>
            <select className={INPUT} value={on} onChange={(e) => setOn(e.target.value)} aria-label={sketch.combinations?.length ? "Case or combination to sweep" : "Case to sweep"}>
              <option value="">As drawn</option>
              <optgroup label="Cases">
                {sketch.cases!.map((c) => <option key={c.id} value={`case:${c.id}`}>{c.name}{c.onlyInCombinations ? " (a load case)" : ""}</option>)}
              </optgroup>
              {(sketch.combinations?.length ?? 0) > 0 && (
                <optgroup label="Combinations (factored load sets)">
                  {sketch.combinations!.map((k) => <option key={k.id} value={`combination:${k.id}`}>{k.name}</option>)}
                </optgroup>
              )}
            </select>
            {combination && (
              <span className="mt-0.5 block text-[11px] text-ink-faint" data-testid="combination-sweep-note">
                Each point is solved as one factored load set ({combination.terms.map((t) => `${t.factor} × ${sketch.cases?.find((c) => c.id === t.case)?.name ?? t.case}`).join(" + ")}), with the sweep&apos;s {pLabel} in every case
                {combinationOverrides.length ? (parameter === FLOW_FACTOR ? `, times each case's own flow factor: ${combinationOverrides.join(", ")}` : `, standing in for ${combinationOverrides.join(", ")}`) : ""}.
              </span>
            )}
            {caseOverride !== undefined && (
              <span className="mt-0.5 block text-[11px] text-ink-faint" data-testid="case-sets-parameter">
                This case sets {parameter} = {typedValueWords(caseOverride)}; the sweep&apos;s values stand in for it.
              </span>
            )}
            {caseFlow !== undefined && caseFlow !== 1 && (
              <span className="mt-0.5 block text-[11px] text-ink-faint" data-testid="case-sets-parameter">
                {caseFlow === 0
                  ? "This case runs without flow (flow × 0); the sweep's flow factor multiplies it, so every point is without flow too."
                  : `This case runs the flow × ${caseFlow}; the sweep's flow factor multiplies it (each point runs the flow × ${caseFlow}·f).`}
              </span>
            )}
          </label>
        )}
        <fieldset className="col-span-2 flex flex-wrap gap-x-3 gap-y-0.5 rounded border border-rule-soft p-1.5 @xl:col-span-4 @4xl:col-span-1">
          <legend className={LABEL}>Plot</legend>
          {choices.map((c) => {
            const key = `${c.spec.support}:${c.spec.component}`;
            return (
              <label key={key} title={c.title} className="flex items-center gap-1.5 text-[12px] text-ink-soft">
                <input type="checkbox" checked={picked.includes(key)} onChange={(e) => setPicked(e.target.checked ? [...picked, key] : picked.filter((k) => k !== key))} />
                {c.label}
              </label>
            );
          })}
          {!choices.length && <p className="text-[12px] text-ink-faint">Add supports to plot their reactions.</p>}
        </fieldset>
        <div className="col-span-2 flex flex-wrap items-center gap-1.5 @xl:col-span-4 @4xl:col-span-1">
          <button type="submit" className={PRIMARY_BUTTON} disabled={progress !== null}>Run the sweep</button>
          <button type="button" className={BUTTON} onClick={keep} title="Save this sweep in the sketch: the calc sheet plots it">Keep on the calc sheet</button>
          {progress !== null && (
            <>
              <progress className="h-2 w-20" max={1} value={progress} aria-label="Sweep progress" />
              <button type="button" className={BUTTON} onClick={() => cancel?.()}>Stop</button>
            </>
          )}
        </div>
        {error && <p className="col-span-2 text-[12px] text-caution @xl:col-span-4 @4xl:col-span-1" role="alert">{error}</p>}
        {keptNote && <p className="col-span-2 text-[12px] text-ink-soft @xl:col-span-4 @4xl:col-span-1" role="status">{keptNote}</p>}
        {kept.length > 0 && (
          <section className="col-span-2 @xl:col-span-4 @4xl:col-span-1" aria-label="Sweeps on the calc sheet">
            <span className={LABEL}>On the calc sheet</span>
            <ul className="space-y-0.5 text-[12px]" data-testid="kept-sweeps">
              {kept.map((k) => (
                <li key={k.id} className="flex items-start gap-1.5">
                  <span className="min-w-0 flex-1 text-ink-soft">
                    {sweepRangeWords(k.parameter, k.from, k.to, unitNow(k.parameter))}, {k.points} points — {onLabel(k.case, k.combination)}
                    {keptProblem(k) && <span className="block text-caution" data-testid="kept-sweep-problem">{keptProblem(k)}: the calc sheet cannot plot it. Open it, pick another, and keep it again.</span>}
                  </span>
                  <button type="button" className="text-[11.5px] text-ink underline decoration-ink/30 underline-offset-2 hover:decoration-ink" onClick={() => open(k)} aria-label={`Open the kept sweep ${k.id}`}>
                    Open
                  </button>
                  <button type="button" className="px-0.5 text-ink-faint hover:text-accent" onClick={() => putKept(kept.filter((x) => x.id !== k.id))} aria-label={`Remove the kept sweep ${k.id}`}>
                    ×
                  </button>
                </li>
              ))}
            </ul>
          </section>
        )}
      </form>

      <div className="min-w-0" aria-live="polite">
        {!data ? (
          <p className="text-[12.5px] text-ink-faint">Run a sweep to plot each reaction and margin against {pLabel}. Where a margin crosses zero a contact lifts, a tie goes slack or friction is used up: those points are marked.</p>
        ) : (
          <>
            {stalePlot && (
              <p className="mb-1 text-[12px] font-medium text-caution" data-testid="sweep-stale">
                The sketch has changed since this plot was run: run the sweep again to see it as it is now.
              </p>
            )}
            <p className="mb-1 text-[11.5px] text-ink-faint" data-testid="sweep-ran-on">
              {sweepRangeWords(data.parameter, ran?.spec.from ?? 0, ran?.spec.to ?? 0, data.unit)}, {data.xs.length} points — {ran?.on}
            </p>
            <SweepChart data={data} run={runs} units={units} names={names} parameterLabel={dLabel} limit={limit?.result.found ? { x: limit.result.value, label: `${limit.label} = ${limit.target}` } : null} />
            <div className="flex justify-end">
              <button type="button" className={`${BUTTON} h-6 px-2 text-[11.5px]`} onClick={() => downloadCsv(sweepTable(data, units, dLabel, names), csvName(`sweep-${data.parameter}`))} aria-label="Download the sweep's values as CSV">
                CSV
              </button>
            </div>
            <ul className="mt-1 space-y-0.5 text-[12px]" data-testid="crossings">
              {data.crossings.length === 0 && <li className="text-ink-faint">No margin crosses zero in this range.</li>}
              {data.crossings.map((c, i) => (
                <li key={i} className="text-ink-soft">
                  <span className="font-semibold text-ink">✕</span> {describeQuantity(data.quantities[c.quantity], names)} crosses zero between {dLabel} = {formatNumber(c.between[0], 4)} and {formatNumber(c.between[1], 4)}{data.unit ? ` ${prettyUnit(data.unit)}` : ""}
                </li>
              ))}
              {stateLines.map((l, i) => (
                <li key={`${l.kind}-${i}`} className="text-ink-soft" data-testid={l.kind === "off" ? "off-stretch" : l.kind === "notHeld" ? "not-held-stretch" : l.kind === "body" ? "body-stretch" : undefined}>
                  {l.words}
                </li>
              ))}
              {invalid.slice(0, MAX_STRETCHES).map((r, i) => (
                <li key={`invalid-${i}`} className="text-caution" data-testid="invalid-points">
                  Not solved at {dLabel} = {formatNumber(r.from, 4)}{r.count > 1 ? ` to ${formatNumber(r.to, 4)}` : ""}{data.unit ? ` ${prettyUnit(data.unit)}` : ""} ({r.count} {r.count === 1 ? "point" : "points"}), where the sketch is invalid:{" "}
                  {r.errors.map((e) => errorInWords(ran?.sketch ?? sketch, e)).join("; ")}.
                </li>
              ))}
              {invalid.length > MAX_STRETCHES && <li className="text-caution">… and {invalid.length - MAX_STRETCHES} more stretches of invalid points.</li>}
            </ul>
            <div className="mt-2 flex flex-wrap items-center gap-1.5 border-t border-rule-soft pt-2" role="group" aria-label="Limit finder">
              <span className={`${LABEL} whitespace-nowrap`}>At what {dLabel}{bodyLimit ? "" : " does"}</span>
              <select className={`${INPUT} !w-auto min-w-0`} value={limitQuantity ? keyOf(limitQuantity) : ""} onChange={(e) => setLimitKey(e.target.value)} aria-label="Quantity for the limit" aria-describedby={bodyLimit ? noTargetId : undefined}>
                {plotted.length > 0 && (
                  <optgroup label="Plotted (reaches a target)">
                    {plotted.map((q) => <option key={keyOf(q)} value={keyOf(q)}>{describeQuantity(q, names)}</option>)}
                  </optgroup>
                )}
                {bodyChoices.length > 0 && (
                  <optgroup label="The body itself (its own limit)">
                    {bodyChoices.map((q) => <option key={keyOf(q)} value={keyOf(q)}>{bodyLimitLabel(q, names)}</option>)}
                  </optgroup>
                )}
              </select>
              {bodyLimit ? (
                <span className={LABEL}>?</span>
              ) : (
                <>
                  <span className={LABEL}>reach</span>
                  <input className={`${INPUT} !w-20`} value={target} onChange={(e) => setTarget(e.target.value)} aria-label="Target value" />
                  <span className={`${LABEL} whitespace-nowrap`}>{targetUnit}?</span>
                </>
              )}
              <button type="button" className={BUTTON} onClick={() => findLimit()} disabled={!!searching || progress !== null}>Find</button>
              {(sketch.cases?.length ?? 0) + (sketch.combinations?.length ?? 0) > 0 && (
                <button type="button" className={BUTTON} onClick={() => findEverywhere()} disabled={!!searching || progress !== null} title="The same search in each case (but those only in combinations) and each combination: under which does it happen first?">
                  In every case
                </button>
              )}
              {searching && (
                <>
                  <span className="text-[12px] text-ink-faint" role="status">Searching…</span>
                  <button type="button" className={BUTTON} onClick={() => searching()} title="Stops the sweep too, if one is running: they share one worker">Stop</button>
                </>
              )}
            </div>
            {bodyLimit && (
              <p id={noTargetId} className="mt-1 text-[11.5px] text-ink-faint" data-testid="limit-no-target">
                No target: this is the body&apos;s own limit, {bodyLimit.limit === "tips" ? "where no set of its contacts and ties holds it any more" : "where its friction contacts together are used up (Σμ·n − |Σt| = 0, a factor of 1 against sliding)"}.
              </p>
            )}
            {rangeNote && (
              <p className="mt-1 text-[11.5px] text-ink-faint" data-testid="limit-range-note">
                {rangeNote}
              </p>
            )}
            {limitError && (
              <p className="mt-1 text-[12.5px] text-caution" data-testid="limit-error" role="alert">
                {limitError}
              </p>
            )}
            {limitStopped && (
              <p className="mt-1 text-[12.5px] text-caution" data-testid="limit-stopped">
                Stopped: the limit search did not finish. Press Find to search again.
              </p>
            )}
            {limit && !limitStopped && (
              <p className="mt-1 text-[12.5px]" data-testid="limit-answer" role="status">
                {limit.words}
              </p>
            )}
            {limit?.wider && !limitStopped && (
              <button
                type="button"
                className={`${BUTTON} mt-1`}
                data-testid="limit-wider"
                disabled={!!searching || progress !== null}
                title="Puts this range in From and To and searches it (run the sweep again to plot it)"
                onClick={() => searchWider(limit.wider!, findLimit)}
              >
                Search {rangeWords(limit.wider, limit.unit ?? "")}
              </button>
            )}
            {everywhere && !limitStopped && (
              <div className="mt-1 text-[12.5px]" data-testid="limit-everywhere">
                <p role="status">
                  {everywhere.body
                    ? everywhere.first.length > 1
                      ? `${everywhere.label} first in ${andList(everywhere.rows.filter((r) => everywhere.first.includes(r.id)).map((r) => r.name))}: equal first, each at ${everywhere.pName} = ${limitWithUnit(everywhere.firstValue!, everywhere.unit)}.`
                      : everywhere.first.length === 1
                        ? `${everywhere.label} first in ${everywhere.rows.find((r) => r.id === everywhere.first[0])!.name}.`
                        : `${everywhere.label} in none of them in this range.`
                    : everywhere.first.length > 1
                    ? `The ${everywhere.label} reaches ${everywhere.target} first in ${andList(everywhere.rows.filter((r) => everywhere.first.includes(r.id)).map((r) => r.name))}: equal first, each at ${everywhere.pName} = ${limitWithUnit(everywhere.firstValue!, everywhere.unit)}.`
                    : everywhere.first.length === 1
                      ? `The ${everywhere.label} reaches ${everywhere.target} first in ${everywhere.rows.find((r) => r.id === everywhere.first[0])!.name}.`
                      : `The ${everywhere.label} reaches ${everywhere.target} in none of them in this range.`}
                  {/* a run already past the target over the whole range reaches it nowhere, so is not "first": said apart */}
                  {everywhere.body ? bodySidesWords(everywhere.rows, everywhere.body, names) : sidesWords(everywhere.rows, everywhere.targetSI, everywhere.target)}
                </p>
                <table className="mt-0.5 text-[12px]">
                  <caption className="sr-only">
                    {everywhere.body ? `Where ${everywhere.label}` : `Where the ${everywhere.label} reaches ${everywhere.target}`}, in each case and combination
                  </caption>
                  <thead className="sr-only">
                    <tr>
                      <th scope="col">Case or combination</th>
                      <th scope="col">Reached at</th>
                    </tr>
                  </thead>
                  <tbody>
                    {everywhere.rows.map((r) => (
                      <tr key={`${r.kind}:${r.id}`} className={everywhere.first.includes(r.id) ? "font-semibold" : ""}>
                        <th scope="row" className={`pr-3 text-left text-ink-soft ${everywhere.first.includes(r.id) ? "font-semibold" : "font-normal"}`}>{r.kind === "combination" ? "Combination" : r.kind === "case" ? "Case" : ""} {r.name}</th>
                        <td className="tabular-nums">
                          {"error" in r.result
                            ? `not solved: ${runErrorWords(ran?.sketch ?? sketch, r.result)}`
                            : r.result.found
                              ? `${everywhere.pName} = ${limitWithUnit(reachedAt(r.result, everywhere.from, everywhere.to)!, everywhere.unit)}${everywhere.first.includes(r.id) ? (everywhere.first.length > 1 ? " — equal first" : " — first") : ""}${everywhere.body && slidFirstWords(r.result, everywhere.body, everywhere.pName, everywhere.from, everywhere.to) ? `, ${slidFirstWords(r.result, everywhere.body, everywhere.pName, everywhere.from, everywhere.to)}` : ""}`
                              : everywhere.body
                                ? bodyNoCrossingWords(r.result, everywhere.body, everywhere.pName, everywhere.unit)
                                : unreachedWords(everywhere, r, r.result)}
                        </td>
                      </tr>
                    ))}
                  </tbody>
                </table>
                <button
                  type="button"
                  className={`${BUTTON} mt-0.5 h-6 px-2 text-[11.5px]`}
                  onClick={() => downloadCsv(everywhereTable(everywhere, ran?.sketch ?? sketch), csvName(`limit-in-every-case-${everywhere.parameter}`))}
                  aria-label="Download the limit in every case as CSV"
                >
                  CSV
                </button>
                {everywhere.wider && (
                  <button
                    type="button"
                    className={`${BUTTON} mt-0.5 ml-1.5`}
                    data-testid="limit-everywhere-wider"
                    disabled={!!searching || progress !== null}
                    title="Puts this range in From and To and searches every case and combination over it (run the sweep again to plot it)"
                    onClick={() => searchWider(everywhere.wider!, findEverywhere)}
                  >
                    Search every case {rangeWords(everywhere.wider, everywhere.unit)}
                  </button>
                )}
                <p className="mt-0.5 text-[11.5px] text-ink-faint" data-testid="limit-everywhere-overrides">
                  {everywhere.overrides.length
                    ? `Each is searched over ${everywhere.pName} from ${formatNumber(everywhere.from, 5)} to ${formatNumber(everywhere.to, 5)}${everywhere.unit ? ` ${prettyUnit(everywhere.unit)}` : ""}: ${everywhere.pName === "flow factor" ? "the searched flow factor multiplies a case's own" : `the searched value stands in for the ${everywhere.pName} a case sets itself`} (${everywhere.overrides.join("; ")}).`
                    : `Each is searched over ${everywhere.pName} from ${formatNumber(everywhere.from, 5)} to ${formatNumber(everywhere.to, 5)}${everywhere.unit ? ` ${prettyUnit(everywhere.unit)}` : ""}; no case sets ${everywhere.pName} itself.`}
                </p>
                {everywhere.first.length > 0 && (
                  <p className="mt-0.5 text-[11.5px] text-ink-faint" data-testid="limit-everywhere-precision">
                    Values {everywhere.precision}.
                  </p>
                )}
              </div>
            )}
          </>
        )}
      </div>
    </div>
    </div>
  );
}
