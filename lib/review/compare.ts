// What changed between two sketch files: elements added, removed and changed field by field
// (old → new, with units), parameters, the design studies (cases, combinations, required factors
// of safety, sweeps, underlay), and the result: every support's reaction before and
// after with the change (absolute and %), and each body's status ("holds → lifts").
// Pure and browser-safe: the API, the comparison page and "compare with my kept changes" share it.
import { asDrawnStudy, parseSketch, solve, solveCases, type ParseResult, type SolveResult, type StudyResult } from "@/solver";
import type { CaseFile, CombinationFile, SketchFile, SweepFile, UnderlayFile } from "@/solver/schema";
import { DEFAULT_REQUIREMENTS } from "@/solver/stability";
import { stateWord } from "@/solver/report";
import { describeQuantity } from "@/solver/quantity";
import { parameterWords, sweepRangeWords, sweptUnitIn, typedValueWords } from "@/canvas/studies/display";
import type { FieldError } from "@/solver/types";
import { FOOT_M, LBF_N } from "@/solver/constants";
import { formatNumber, formatQuantity, type Quantity, type UnitSystem } from "@/solver/units";

export const COLLECTIONS = ["bodies", "supports", "loads", "ports", "massSources"] as const;
export type Collection = (typeof COLLECTIONS)[number];

export type ElementRef = { id: string; collection: Collection; kind: string; label: string };
export type FieldChange = { field: string; before: string | null; after: string | null };
/** `kindBefore`: the element's kind before, when it changed (a contact bolted down as a pin), so its
 *  old fields are named as that kind's form names them. */
export type ElementChange = ElementRef & { fields: FieldChange[]; kindBefore?: string };
/** `state` as the file format has it; `word` as the tables say it ("lifts", "slips") */
export type ReactionSnapshot = { fx: number; fy: number; m: number; resultant: number; n: number | null; state: string; word: string };
export type ReactionChange = {
  id: string;
  label: string;
  body: string;
  before: ReactionSnapshot | null;
  after: ReactionSnapshot | null;
  /** of the resultant (N), and relative to before (%; null when before was zero or missing) */
  change: { abs: number; pct: number | null } | null;
  /** "bearing → lifts" (or "→ slips"), when the state changed */
  stateChange: string | null;
};
/** A change to the design studies: a case, combination, sweep, required factor or the underlay. */
export type StudyChange = FieldChange & { change: "added" | "removed" | "changed" };
export type BodyChange = { id: string; label: string; before: string | null; after: string | null; words: string | null };

export type Comparison = {
  sketch: FieldChange[];
  parameters: { added: FieldChange[]; removed: FieldChange[]; changed: FieldChange[] };
  elements: { added: ElementRef[]; removed: ElementRef[]; changed: ElementChange[] };
  /** operating cases, combinations, required factors of safety, saved sweeps and the underlay */
  studies: StudyChange[];
  bodies: BodyChange[];
  reactions: ReactionChange[];
  errors: { before: FieldError[]; after: FieldError[] };
  /** element ids to mark on each drawing */
  marks: { before: Record<string, "removed" | "changed">; after: Record<string, "added" | "changed"> };
};

/** The unit of each numeric field, by its name. */
export const FIELD_QUANTITY: Record<string, Quantity | "rotationalStiffness"> = {
  mass: "mass",
  cg: "length",
  at: "length",
  from: "length",
  to: "length",
  outline: "length",
  angle: "angle",
  mu: "ratio",
  stiffness: "stiffness",
  rotationalStiffness: "rotationalStiffness",
  magnitude: "force",
  fx: "force",
  fy: "force",
  value: "moment",
  w1: "lineLoad",
  w2: "lineLoad",
  massFlow: "massFlow",
  velocity: "velocity",
  pressure: "pressure",
  area: "area",
  density: "density",
  volumeFlow: "volumeFlow",
  beta: "ratio",
  gravity: "acceleration",
  gravityAngle: "angle",
  ax: "acceleration",
  ay: "acceleration",
};

type Side = { file: SketchFile; parsed: ParseResult; result: SolveResult | null };

type Solved = { parsed: ParseResult; result: SolveResult | null };
// Saved documents are never changed in place: each is parsed and solved once, however many
// tables and drawings of a page show it.
const solvedCache = new WeakMap<SketchFile, Solved>();

/** A saved document parsed and solved (once per document object); the result is null when it does not parse or solve. */
export function solveDocument(file: SketchFile): Solved {
  const hit = solvedCache.get(file);
  if (hit) return hit;
  const parsed = parseSketch(file);
  let result: SolveResult | null = null;
  if (parsed.ok) {
    try {
      result = solve(parsed.sketch);
    } catch {
      result = null;
    }
  }
  const solved = { parsed, result };
  solvedCache.set(file, solved);
  return solved;
}

const studyCache = new WeakMap<SketchFile, StudyResult | null>();

/** A saved document's operating cases and combinations, solved once per document object (the
 *  review page's tables and the sign-off findings share it); null when it does not parse. */
export function studyOfDocument(file: SketchFile): StudyResult | null {
  if (studyCache.has(file)) return studyCache.get(file) ?? null;
  const { parsed } = solveDocument(file);
  const study = parsed.ok ? solveCases(parsed.file) : null;
  studyCache.set(file, study);
  return study;
}

const asDrawnCache = new WeakMap<SketchFile, StudyResult | null>();
/** The document as drawn as a study of its own (`asDrawnStudy`: its study itself without cases), once per document; null when it does not parse. */
export function asDrawnOfDocument(file: SketchFile): StudyResult | null {
  if (asDrawnCache.has(file)) return asDrawnCache.get(file) ?? null;
  const { parsed } = solveDocument(file);
  const study = !parsed.ok ? null : parsed.file.cases?.length || parsed.file.combinations?.length ? asDrawnStudy(parsed.file) : studyOfDocument(file);
  asDrawnCache.set(file, study);
  return study;
}

function side(file: SketchFile): Side {
  const { parsed, result } = solveDocument(file);
  return { file: parsed.ok ? parsed.file : file, parsed, result };
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
/** "1,250 gpm" and "1250gpm" say the same. */
const sameText = (a: string, b: string) => a.replace(/[\s,]/g, "") === b.replace(/[\s,]/g, "");

const LBF_FT_PER_NM = 1 / (LBF_N * FOOT_M);

/** A value in SI as `units` write it, with its unit ("1,963 mm²"). */
export function quantityText(si: number, q: Quantity | "rotationalStiffness", units: UnitSystem): string {
  if (q === "rotationalStiffness") return units === "SI" ? `${formatNumber(si)} N·m/rad` : `${formatNumber(si * LBF_FT_PER_NM)} lbf·ft/rad`;
  return formatQuantity(si, q, units);
}

/** A point (m) in the chosen units. */
export function pointText(xs: number[], units: UnitSystem): string {
  return units === "SI" ? `(${xs.map((x) => formatNumber(x)).join(", ")}) m` : `(${xs.map((x) => formatNumber(x / FOOT_M)).join(", ")}) ft`;
}

/** A value as written, with its evaluated value and unit beside an expression. */
function show(raw: unknown, path: string, field: string, fields: ParseResult["fields"], units: UnitSystem): string | null {
  if (raw === undefined) return null;
  const q = FIELD_QUANTITY[field];
  const resolved = (p: string) => {
    const v = fields[p];
    return v && "value" in v ? v.value : undefined;
  };
  if (q && Array.isArray(raw) && raw.length === 2 && !Array.isArray(raw[0])) {
    const xs = [0, 1].map((i) => resolved(`${path}[${i}]`));
    const written = raw.every((x) => typeof x === "number");
    const values = xs.every((x) => x !== undefined) ? pointText(xs as number[], units) : null;
    return written ? (values ?? `(${raw.join(", ")}) m`) : `(${raw.map((x) => String(x)).join(", ")})${values ? ` = ${values}` : ""}`;
  }
  if (q && (typeof raw === "number" || typeof raw === "string")) {
    const si = resolved(path);
    if (si === undefined) return String(raw);
    const text = quantityText(si, q, units);
    return typeof raw === "number" || sameText(raw, text) ? text : `${raw} (= ${text})`;
  }
  if (typeof raw === "string") return raw;
  if (typeof raw === "number" || typeof raw === "boolean") return String(raw);
  return JSON.stringify(raw);
}

/** "ax 0.5 m/s², free to move in x": the prescribed motion in words. */
function motionText(m: SketchFile["motion"], fields: ParseResult["fields"], units: UnitSystem): string | null {
  if (!m) return null;
  const bits = (["ax", "ay"] as const).filter((k) => m[k] !== undefined).map((k) => `${k} ${show(m[k], `motion.${k}`, k, fields, units)}`);
  if (m.freeX) bits.push("free to move in x");
  return bits.length ? bits.join(", ") : "none";
}

function outlineChange(before: unknown[], after: unknown[], units: UnitSystem): FieldChange {
  if (before.length !== after.length) return { field: "outline", before: `${before.length} corners`, after: `${after.length} corners` };
  const moved = before.map((p, i) => (same(p, after[i]) ? null : i)).filter((i): i is number => i !== null);
  const k = units === "SI" ? 1 : 1 / FOOT_M;
  const pt = (p: unknown) => `(${(p as unknown[]).map((x) => (typeof x === "number" ? formatNumber(x * k) : String(x))).join(", ")})`;
  const unit = units === "SI" ? " m" : " ft";
  return {
    field: "outline",
    before: moved.map((i) => `corner ${i + 1} ${pt(before[i])}`).join("; ") + unit,
    after: moved.map((i) => `corner ${i + 1} ${pt(after[i])}`).join("; ") + unit,
  };
}

type AnyElement = Record<string, unknown> & { id: string; kind?: string; label?: string; body?: string };

function elementsOf(file: SketchFile): Map<string, { el: AnyElement; collection: Collection; index: number }> {
  const out = new Map<string, { el: AnyElement; collection: Collection; index: number }>();
  for (const c of COLLECTIONS) {
    ((file[c] ?? []) as AnyElement[]).forEach((el, index) => out.set(el.id, { el, collection: c, index }));
  }
  return out;
}

const KIND_OF: Record<Collection, string> = { bodies: "body", supports: "support", loads: "load", ports: "port", massSources: "mass source" };
const refOf = (e: { el: AnyElement; collection: Collection }): ElementRef => ({
  id: e.el.id,
  collection: e.collection,
  kind: e.el.kind ?? KIND_OF[e.collection],
  label: e.el.label || e.el.id,
});

function elementFields(a: { el: AnyElement; collection: Collection; index: number }, b: { el: AnyElement; collection: Collection; index: number }, fa: ParseResult["fields"], fb: ParseResult["fields"], units: UnitSystem) {
  const keys = [...new Set([...Object.keys(a.el), ...Object.keys(b.el)])].filter((k) => k !== "id");
  const changes: FieldChange[] = [];
  for (const k of keys) {
    if (same(a.el[k], b.el[k])) continue;
    if (k === "outline" && Array.isArray(a.el[k]) && Array.isArray(b.el[k])) {
      changes.push(outlineChange(a.el[k] as unknown[], b.el[k] as unknown[], units));
      continue;
    }
    changes.push({ field: k, before: show(a.el[k], `${a.collection}[${a.index}].${k}`, k, fa, units), after: show(b.el[k], `${b.collection}[${b.index}].${k}`, k, fb, units) });
  }
  return changes;
}

function parameterText(name: string, raw: unknown, values: ParseResult["parameterValues"]): string {
  const v = values[name];
  const written = String(raw);
  if (!v || "error" in v) return written;
  const evaluated = `${formatNumber(v.value)}${v.unit ? ` ${v.unit}` : ""}`;
  return sameText(written, evaluated) ? written : `${written} (= ${evaluated})`;
}

function snapshot(r: SolveResult["reactions"][string] | undefined): ReactionSnapshot | null {
  if (!r) return null;
  return { fx: r.fx, fy: r.fy, m: r.m, resultant: Math.hypot(r.fx, r.fy), n: r.n ?? null, state: r.state, word: stateWord(r) };
}

const num = (x: number) => formatNumber(x, 6);

function caseText(c: CaseFile): string {
  const bits = [
    ...Object.entries(c.parameters ?? {}).map(([k, v]) => `${k} = ${typedValueWords(v)}`),
    ...Object.entries(c.factors ?? {}).map(([k, v]) => `${k} × ${num(v)}`),
    ...(c.flowFactor !== undefined && c.flowFactor !== 1 ? [`flow × ${num(c.flowFactor)}`] : []),
    ...(c.onlyInCombinations ? ["only in combinations"] : []),
  ];
  return `${c.name}: ${bits.length ? bits.join(", ") : "as drawn"}`;
}

/** A case or combination of `list` by its name, as the Cases tab names it (its id when it has none there). */
const nameIn = (list: Array<{ id: string; name: string }> | undefined, id: string) => list?.find((x) => x.id === id)?.name ?? id;

const combinationText = (k: CombinationFile, file: SketchFile) =>
  `${k.name}: ${k.terms.map((t) => `${num(t.factor)} × ${nameIn(file.cases, t.case)}`).join(" + ")}${k.stability ? `; required ${Object.entries(k.stability).map(([what, v]) => `${num(v)} against ${what}`).join(", ")}` : ""}`;

/** A sweep in words; its plotted quantities named as its chart's legend names them, by the supports' labels in `file`. */
function sweepText(s: SweepFile, file: SketchFile): string {
  const names = Object.fromEntries(file.supports.map((x) => [x.id, x.label || x.id]));
  const plots = s.quantities?.length ? `; plots ${s.quantities.map((q) => describeQuantity(q, names)).join(", ")}` : "";
  return `${sweepRangeWords(s.parameter, s.from, s.to, sweptUnitIn(file, s.parameter))}, ${s.points} points${s.case ? `, case “${nameIn(file.cases, s.case)}”` : ""}${s.combination ? `, combination “${nameIn(file.combinations, s.combination)}”` : ""}${plots}`;
}

function underlayText(u: UnderlayFile): string {
  return `upload ${u.upload}, ${num(u.metresPerPixel)} m/px, corner (${num(u.origin[0])}, ${num(u.origin[1])}) m, turned ${num(u.rotation ?? 0)}°, opacity ${num(u.opacity ?? 0.6)}${u.calibration ? `, scale from two marks ${u.calibration.distance} apart` : ""}${u.hidden ? ", hidden" : ""}${u.locked ? ", locked" : ""}`;
}

/**
 * Items of a list matched by id: added, removed, or changed (old → new). Each row is named as the
 * Cases and Sweep tabs name the item (`name`: its name after the change, or before when removed),
 * not by the id the file keeps.
 */
function listChanges<T extends { id: string }>(
  what: string,
  a: T[] | undefined,
  b: T[] | undefined,
  text: (x: T, side: "before" | "after") => string,
  name: (x: T) => string,
): StudyChange[] {
  const out: StudyChange[] = [];
  const before = new Map((a ?? []).map((x) => [x.id, x]));
  const after = new Map((b ?? []).map((x) => [x.id, x]));
  const field = (x: T) => `${what} ${name(x)}`;
  for (const [id, x] of before) {
    const y = after.get(id);
    if (!y) out.push({ field: field(x), before: text(x, "before"), after: null, change: "removed" });
    else if (!same(x, y)) out.push({ field: field(y), before: text(x, "before"), after: text(y, "after"), change: "changed" });
  }
  for (const [id, y] of after) if (!before.has(id)) out.push({ field: field(y), before: null, after: text(y, "after"), change: "added" });
  return out;
}

const quoted = (x: { name: string }) => `“${x.name}”`;

/** What changed in the design studies: cases, combinations, the required factors of safety,
 *  saved sweeps and the underlay. A checker must see a changed required factor. */
export function studyChanges(a: SketchFile, b: SketchFile): StudyChange[] {
  const out: StudyChange[] = [
    ...listChanges("case", a.cases, b.cases, caseText, quoted),
    ...listChanges("combination", a.combinations, b.combinations, (k, at) => combinationText(k, at === "before" ? a : b), quoted),
  ];
  for (const k of ["overturning", "sliding"] as const) {
    const x = a.stability?.[k];
    const y = b.stability?.[k];
    if (x === y) continue;
    const shown = (v: number | undefined) => (v === undefined ? `${num(DEFAULT_REQUIREMENTS[k])} (default)` : num(v));
    if (shown(x) === shown(y)) continue;
    out.push({ field: `required factor against ${k}`, before: shown(x), after: shown(y), change: "changed" });
  }
  out.push(...listChanges("sweep", a.sweeps, b.sweeps, (s, at) => sweepText(s, at === "before" ? a : b), (s) => `of ${parameterWords(s.parameter)}`));
  if (!same(a.underlay, b.underlay)) {
    out.push({
      field: "underlay",
      before: a.underlay ? underlayText(a.underlay) : null,
      after: b.underlay ? underlayText(b.underlay) : null,
      change: !a.underlay ? "added" : !b.underlay ? "removed" : "changed",
    });
  }
  return out;
}

/** Compare sketch `a` (before) with sketch `b` (after); evaluated values are written in `units`. */
export function compareSketches(fileA: SketchFile, fileB: SketchFile, units: UnitSystem = "SI"): Comparison {
  const A = side(fileA);
  const B = side(fileB);
  const fa = A.parsed.fields;
  const fb = B.parsed.fields;

  const sketch: FieldChange[] = [];
  for (const k of ["title", "description", "gravity", "gravityAngle", "motion"] as const) {
    if (same(A.file[k], B.file[k])) continue;
    if (k === "motion") sketch.push({ field: "motion", before: motionText(A.file.motion, fa, units), after: motionText(B.file.motion, fb, units) });
    else sketch.push({ field: k, before: show(A.file[k], k, k, fa, units), after: show(B.file[k], k, k, fb, units) });
  }

  const pa = A.file.parameters ?? {};
  const pb = B.file.parameters ?? {};
  const parameters: Comparison["parameters"] = { added: [], removed: [], changed: [] };
  for (const name of [...new Set([...Object.keys(pa), ...Object.keys(pb)])]) {
    const before = name in pa ? parameterText(name, pa[name], A.parsed.parameterValues) : null;
    const after = name in pb ? parameterText(name, pb[name], B.parsed.parameterValues) : null;
    if (before === null) parameters.added.push({ field: name, before, after });
    else if (after === null) parameters.removed.push({ field: name, before, after });
    else if (!same(pa[name], pb[name])) parameters.changed.push({ field: name, before, after });
  }

  const ea = elementsOf(A.file);
  const eb = elementsOf(B.file);
  const elements: Comparison["elements"] = { added: [], removed: [], changed: [] };
  const marks: Comparison["marks"] = { before: {}, after: {} };
  for (const [id, a] of ea) {
    const b = eb.get(id);
    if (!b) {
      elements.removed.push(refOf(a));
      marks.before[id] = "removed";
      continue;
    }
    const fields = elementFields(a, b, fa, fb, units);
    if (fields.length) {
      const was = refOf(a).kind;
      elements.changed.push({ ...refOf(b), ...(was !== refOf(b).kind ? { kindBefore: was } : {}), fields });
      marks.before[id] = "changed";
      marks.after[id] = "changed";
    }
  }
  for (const [id, b] of eb) {
    if (ea.has(id)) continue;
    elements.added.push(refOf(b));
    marks.after[id] = "added";
  }

  const studies = studyChanges(A.file, B.file);

  const label = (id: string) => (eb.get(id) ?? ea.get(id))?.el.label || id;
  const bodyIds = [...new Set([...ea.values(), ...eb.values()].filter((e) => e.collection === "bodies").map((e) => e.el.id))];
  // a body's status with its slip, as the listings mark it ("holds, but slips"): sliding is a change too
  const bodyWord = (side: Side, id: string): string | null => {
    const status = side.result?.bodies[id]?.status;
    if (!status) return null;
    const own = new Set([id, ...side.file.supports.filter((s) => s.body === id).map((s) => s.id)]);
    const slips = side.result!.warnings.some((w) => w.code === "SLIP" && w.ids.some((x) => own.has(x)));
    return slips ? `${status}, but slips` : status;
  };
  const bodies: BodyChange[] = bodyIds.map((id) => {
    const before = bodyWord(A, id);
    const after = bodyWord(B, id);
    return { id, label: label(id), before, after, words: before !== after ? `${before ?? "—"} → ${after ?? "—"}` : null };
  });

  const supportIds = [...new Set([...ea.values(), ...eb.values()].filter((e) => e.collection === "supports").map((e) => e.el.id))];
  const reactions: ReactionChange[] = supportIds.map((id) => {
    const before = snapshot(A.result?.reactions[id]);
    const after = snapshot(B.result?.reactions[id]);
    const change = before && after ? { abs: after.resultant - before.resultant, pct: before.resultant > 1e-9 ? ((after.resultant - before.resultant) / before.resultant) * 100 : null } : null;
    const stateChange = before && after && before.word !== after.word ? `${before.word} → ${after.word}` : null;
    return { id, label: label(id), body: String((eb.get(id) ?? ea.get(id))?.el.body ?? ""), before, after, change, stateChange };
  });

  return {
    sketch,
    parameters,
    elements,
    studies,
    bodies,
    reactions,
    errors: { before: A.parsed.ok ? [] : A.parsed.errors, after: B.parsed.ok ? [] : B.parsed.errors },
    marks,
  };
}

/** How many things changed in the inputs (not counting the result). */
export function changeCount(c: Comparison): number {
  return (
    c.sketch.length +
    c.parameters.added.length +
    c.parameters.removed.length +
    c.parameters.changed.length +
    c.elements.added.length +
    c.elements.removed.length +
    // each field of a changed element is a change, as the table lists it (a body's mass and its
    // centre of gravity are two)
    c.elements.changed.reduce((n, e) => n + Math.max(1, e.fields.length), 0) +
    (c.studies?.length ?? 0)
  );
}
