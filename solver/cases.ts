// Operating cases and combinations. A case re-evaluates the sketch with its parameter overrides,
// scales load groups and the flow; a combination adds the load sets of its cases with factors
// and is solved once as its own factored load set: one-sided supports make the response
// non-linear, so results of cases are never added. Then the table of reactions per case, the
// governing case of each component, the envelope and each support's design load.
import { resolveFile } from "./parse";
import type { CaseFile, CombinationFile, SketchFile } from "./schema";
import { prepare, solveModels } from "./solve";
import { bodyStability, requirementsOf, type BodyStability, type Requirements } from "./stability";
import { DEFAULT_GROUPS, type EquationTerm, type FieldError, type Reaction, type SolveResult, type SolveWarning } from "./types";
import { generalizedLoad, type BodyModel } from "./model";
import { prettyUnit } from "./units";
import { compileExpression, isUnit, kindOfUnit, type FieldKind } from "./expressions";

export type CaseRun =
  | { id: string; name: string; kind: "case" | "combination"; ok: true; result: SolveResult; stability: Record<string, BodyStability> }
  | { id: string; name: string; kind: "case" | "combination"; ok: false; errors: FieldError[] };

export const COMPONENTS = ["fx", "fy", "m", "n", "t", "resultant", "margin"] as const;
export type Component = (typeof COMPONENTS)[number];

export interface EnvelopeEntry {
  max: { value: number; case: string };
  min: { value: number; case: string };
}

export interface SupportEnvelope {
  kind: Reaction["kind"];
  components: Partial<Record<Component, EnvelopeEntry>>;
  /** the largest resultant over the cases, with its direction (on the body) and case */
  design: { resultant: number; angle: number; fx: number; fy: number; m: number; case: string };
  /** governing case per component: the one with the largest magnitude (for the margin of a
   *  contact or tie: the smallest, where it comes closest to lifting or going slack) */
  governing: Partial<Record<Component, string>>;
  /** where several runs give a component's governing value alike (to a part in a billion of the
   *  support's largest value of it): all of them, in the order of the runs, the governing one
   *  first among equals. Absent for a component one run governs alone, or zero in every run. */
  ties?: Partial<Record<Component, string[]>>;
}

/** A body that tips or is unrestrained in a run: its reactions assume every support can pull,
 *  so they are no design values and stay out of the envelope. */
export interface ExcludedRun {
  case: string;
  body: string;
  status: "tips" | "unrestrained";
}

export interface StudyResult {
  runs: CaseRun[];
  /** what people call the bodies and supports (their labels, or their ids when they have none):
   *  the tables and plots name them so, as the drawing and the results panel do */
  names?: Record<string, string>;
  envelope: Record<string, SupportEnvelope>;
  /** runs (per body) left out of the envelope and the design loads */
  excluded: ExcludedRun[];
  requirements: Requirements;
}

const AS_DRAWN: CaseFile = { id: "as-drawn", name: "As drawn" };

/** Bodies' and supports' labels by id (the id where the label is blank). */
export function elementNames(file: SketchFile): Record<string, string> {
  const out: Record<string, string> = {};
  for (const e of [...file.bodies, ...file.supports]) out[e.id] = e.label?.trim() || e.id;
  return out;
}

/** A case's numeric sketch: the file with its parameter overrides, and its scaling. */
export function caseSketch(file: SketchFile, c: CaseFile) {
  const variant: SketchFile = c.parameters ? { ...file, parameters: { ...(file.parameters ?? {}), ...c.parameters } } : file;
  const r = resolveFile(variant);
  if (!r.ok) {
    return { ok: false as const, errors: r.errors.map((e) => (e.path.startsWith("parameters.") && c.parameters?.[e.path.slice(11)] !== undefined ? { ...e, path: `cases[${c.id}].${e.path}` } : e)) };
  }
  r.sketch.scaling = { factors: c.factors, flowFactor: c.flowFactor ?? 1 };
  return { ok: true as const, sketch: r.sketch, warnings: r.warnings };
}

/** How the message of a case's change typed without a unit begins (see `caseInputErrors`). */
export const NO_UNIT = "has no unit";

/** A plain number as typed: "30", "-2.5", "1e3" (no unit, no name, no operation). */
const PLAIN_NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?$/i;

/** A unit to tell someone to type: as the app shows it ("m³/h", "L/min") when that reads back as
 *  the same unit among the sketch's parameters, else as the parser wrote it ("m^4"). */
function typeableUnit(unit: string, parameterNames: ReadonlySet<string>): string {
  const shown = prettyUnit(unit);
  try {
    const [a, b] = [shown, unit].map((u) => compileExpression(`1 ${u}`, parameterNames).evaluate(new Map()));
    if (isUnit(a) && isUnit(b) && a.equals(b)) return shown;
  } catch {
    // not readable as shown
  }
  return unit.replace(/\s*\/\s*/g, "/");
}

/**
 * What a case's changes break in the sketch: the input errors of its variant that the sketch as
 * drawn does not have (a parameter given in the wrong unit, say). Empty when the case reads.
 * A change typed as a plain number ("v = 30", not 0) for a parameter the sketch writes with a unit
 * comes first, at the change, with the unit to write ("has no unit; the sketch gives v in m/s:
 * write 30 m/s"): it is what breaks the fields that read v ("236.25 kg / m^2 is in other units"),
 * and where it breaks nothing it would be read silently in SI units (30 rad for an angle in deg),
 * which the case table, unlike a field, does not show back.
 */
export function caseInputErrors(file: SketchFile, c: CaseFile): FieldError[] {
  const drawn = resolveFile(file);
  const unitless: FieldError[] = [];
  for (const [name, value] of Object.entries(c.parameters ?? {})) {
    const text = String(value).trim();
    const asDrawn = drawn.parameterValues[name];
    if (!PLAIN_NUMBER.test(text) || Number(text) === 0 || !asDrawn || !("unit" in asDrawn) || !asDrawn.unit) continue;
    const unit = typeableUnit(asDrawn.unit, new Set(Object.keys(file.parameters ?? {})));
    unitless.push({ path: `cases[${c.id}].parameters.${name}`, message: `${NO_UNIT}; the sketch gives ${name} in ${prettyUnit(unit)}: write ${text} ${unit}` });
  }
  const own = caseSketch(file, c);
  if (own.ok) return unitless;
  // a change in a unit of another kind ("v = 30 psi" for a speed) is said at the change too
  const variant = resolveFile({ ...file, parameters: { ...(file.parameters ?? {}), ...c.parameters } }).parameterValues;
  const otherKind: FieldError[] = [];
  for (const name of Object.keys(c.parameters ?? {})) {
    const was = drawn.parameterValues[name];
    const now = variant[name];
    if (!was || !now || !("unit" in was) || !("unit" in now)) continue;
    const [kindWas, kindNow] = [kindOfUnit(was.unit), kindOfUnit(now.unit)];
    if (!kindWas || !kindNow || kindWas === kindNow) continue;
    otherKind.push({ path: `cases[${c.id}].parameters.${name}`, message: `is ${KIND_NAMES[kindNow]}, but the sketch gives ${name} in ${prettyUnit(was.unit.replace(/\s*\/\s*/g, "/"))}, ${KIND_NAMES[kindWas]}` });
  }
  const known = new Set(drawn.ok ? [] : drawn.errors.map((e) => `${e.path} ${e.message}`));
  return [...unitless, ...otherKind, ...own.errors.filter((e) => !known.has(`${e.path} ${e.message}`))];
}

/** What a quantity of each kind is, in a sentence ("a pressure"). */
const KIND_NAMES: Record<FieldKind, string> = {
  length: "a length",
  angle: "an angle",
  mass: "a mass",
  force: "a force",
  moment: "a moment",
  lineLoad: "a load per length",
  massFlow: "a mass flow",
  velocity: "a speed",
  pressure: "a pressure",
  area: "an area",
  density: "a density",
  volumeFlow: "a volume flow",
  stiffness: "a stiffness",
  rotationalStiffness: "a rotational stiffness",
  acceleration: "an acceleration",
  ratio: "a plain number",
};

/** Add the load sets of several cases (each × its factor) on the geometry of the first. */
export function combineModels(parts: Array<{ models: BodyModel[]; factor: number; name: string }>): BodyModel[] {
  const base = parts[0].models;
  return base.map((m, bi) => {
    const forceTerms: EquationTerm[] = [];
    const momentumTerms: EquationTerm[] = [];
    const momentum = { fx: 0, fy: 0, m: 0 };
    let ax = 0;
    let ay = 0;
    for (const part of parts) {
      const pm = part.models[bi];
      const f = part.factor;
      const prefix = `${Number(f.toPrecision(6))} × [${part.name}] `;
      for (const t of pm.forceTerms) forceTerms.push({ ...t, label: prefix + t.label, fx: t.fx * f, fy: t.fy * f, m: t.m * f });
      for (const t of pm.momentumTerms) momentumTerms.push({ ...t, label: prefix + t.label, fx: t.fx * f, fy: t.fy * f, m: t.m * f });
      momentum.fx += f * pm.momentum.fx;
      momentum.fy += f * pm.momentum.fy;
      momentum.m += f * pm.momentum.m;
      ax += f * pm.ax;
      ay += f * pm.ay;
    }
    // Q from the combined terms about the first case's reference point
    const { Q, scale } = generalizedLoad(forceTerms, momentumTerms, m.origin, m.L);
    if (m.freeX) Q[0] = 0;
    return { ...m, Q, forceTerms, momentumTerms, momentum, scale, ax, ay };
  });
}

export function solveCases(file: SketchFile, onProgress: (done: number, total: number) => void = () => {}): StudyResult {
  const requirements: Requirements = requirementsOf(file);
  const cases = file.cases?.length ? file.cases : [AS_DRAWN];
  // a load case marked for combinations only is solved as part of them, not on its own
  let total = cases.filter((c) => !c.onlyInCombinations).length + (file.combinations?.length ?? 0);
  const runs: CaseRun[] = [];
  // each run, solved or not, counts towards the progress a long study shows
  const record = (run: CaseRun) => {
    runs.push(run);
    total = Math.max(total, runs.length);
    onProgress(runs.length, total);
  };
  const prepared = new Map<string, { models: BodyModel[]; warnings: SolveWarning[] }>();

  const finish = (id: string, name: string, kind: "case" | "combination", models: BodyModel[], warnings: SolveWarning[], own?: Partial<Requirements>) => {
    const result = solveModels(models, warnings);
    const required = own ? { ...requirements, ...own } : requirements;
    const stability = Object.fromEntries(models.map((m) => [m.body.id, bodyStability(m, result, required)]));
    record({ id, name, kind, ok: true, result, stability });
  };

  for (const c of cases) {
    const cs = caseSketch(file, c);
    if (!cs.ok) {
      record({ id: c.id, name: c.name, kind: "case", ok: false, errors: cs.errors });
      continue;
    }
    const p = prepare(cs.sketch);
    p.warnings.unshift(...cs.warnings);
    prepared.set(c.id, p);
    if (!c.onlyInCombinations) finish(c.id, c.name, "case", p.models, [...p.warnings]);
  }

  for (const k of file.combinations ?? []) {
    const missing = k.terms.filter((t) => !prepared.has(t.case));
    if (missing.length) {
      record({ id: k.id, name: k.name, kind: "combination", ok: false, errors: [{ path: `combinations[${k.id}]`, message: `${missing.length === 1 ? "its case" : "its cases"} ${missing.map((t) => cases.find((c) => c.id === t.case)?.name ?? t.case).join(", ")} could not be evaluated` }] });
      continue;
    }
    const parts = k.terms.map((t) => ({ models: prepared.get(t.case)!.models, factor: t.factor, name: cases.find((c) => c.id === t.case)!.name }));
    const warnings = k.terms.flatMap((t) => prepared.get(t.case)!.warnings).filter((w, i, all) => all.findIndex((x) => x.message === w.message) === i);
    finish(k.id, k.name, "combination", combineModels(parts), warnings, k.stability);
  }

  return { runs, names: elementNames(file), envelope: envelopeOf(runs), excluded: excludedRuns(runs), requirements };
}

/**
 * The sketch as drawn, as a study of its own (one run, "As drawn"): with operating cases, the
 * study above covers the cases only, but the values on the drawing (a design wind, a full flow
 * typed in as the working point) are a state of their own whose factors of safety must not go
 * unsaid. Without cases it is the same study as `solveCases`.
 */
export function asDrawnStudy(file: SketchFile): StudyResult {
  return file.cases?.length || file.combinations?.length ? solveCases({ ...file, cases: undefined, combinations: undefined }) : solveCases(file);
}

/** The study with the sketch as drawn first, when it has cases (for the factors-of-safety table). */
export function withAsDrawnRun(study: StudyResult, asDrawn: StudyResult): StudyResult {
  return study === asDrawn || study.runs.some((r) => r.id === AS_DRAWN.id) ? study : { ...study, runs: [...asDrawn.runs, ...study.runs] };
}

// A lifted contact or a slack tie (on a held body: the envelope leaves the others out) carries
// nothing and has no margin left: 0, not the solver's −stiffness × gap, whose size follows the
// support stiffnesses and would rank the cases it is released in by them.
const componentOf = (r: Reaction, c: Component): number | undefined =>
  c === "resultant" ? Math.hypot(r.fx, r.fy) : c === "margin" && (r.state === "lifted" || r.state === "slack") ? 0 : r[c];

const notHeld = (status: string): status is ExcludedRun["status"] => status === "tips" || status === "unrestrained";

/** The runs whose body is not held (tips, or is unrestrained), per body. */
export function excludedRuns(runs: CaseRun[]): ExcludedRun[] {
  const out: ExcludedRun[] = [];
  for (const run of runs) {
    if (!run.ok) continue;
    for (const [body, b] of Object.entries(run.result.bodies)) if (notHeld(b.status)) out.push({ case: run.id, body, status: b.status });
  }
  return out;
}

/** Max and min of each component over the runs, and each support's design load. A run in which
 *  the support's body tips or is unrestrained is left out: its reactions are those every support
 *  would need if it could pull, which no support gives. */
export function envelopeOf(runs: CaseRun[]): Record<string, SupportEnvelope> {
  const out: Record<string, SupportEnvelope> = {};
  for (const run of runs) {
    if (!run.ok) continue;
    for (const [id, r] of Object.entries(run.result.reactions)) {
      if (notHeld(run.result.bodies[r.body]?.status ?? "holds")) continue;
      const env = (out[id] ??= { kind: r.kind, components: {}, design: { resultant: -1, angle: 0, fx: 0, fy: 0, m: 0, case: run.id }, governing: {} });
      for (const c of COMPONENTS) {
        const v = componentOf(r, c);
        if (v === undefined) continue;
        const e = (env.components[c] ??= { max: { value: v, case: run.id }, min: { value: v, case: run.id } });
        if (v > e.max.value) e.max = { value: v, case: run.id };
        if (v < e.min.value) e.min = { value: v, case: run.id };
        env.governing[c] = c === "margin" ? e.min.case : Math.abs(e.max.value) >= Math.abs(e.min.value) ? e.max.case : e.min.case;
      }
      const res = Math.hypot(r.fx, r.fy);
      if (res > env.design.resultant) {
        env.design = { resultant: res, angle: (Math.atan2(r.fy, r.fx) * 180) / Math.PI, fx: r.fx, fy: r.fy, m: r.m, case: run.id };
      }
    }
  }
  for (const [id, env] of Object.entries(out)) {
    const ties = tiesOf(runs, id, env);
    if (Object.keys(ties).length) env.ties = ties;
  }
  return out;
}

/** Below this (N, N·m) a component is zero in every run, and no run governs it. */
const NOTHING = 1e-9;

/** The components of a support whose governing value more than one run gives (see `SupportEnvelope.ties`). */
function tiesOf(runs: CaseRun[], id: string, env: SupportEnvelope): Partial<Record<Component, string[]>> {
  const out: Partial<Record<Component, string[]>> = {};
  for (const c of COMPONENTS) {
    const e = env.components[c];
    const gov = env.governing[c];
    if (!e || !gov) continue;
    const size = Math.max(Math.abs(e.max.value), Math.abs(e.min.value));
    if (size < NOTHING) continue;
    // a margin governs by its least value; any other component by its largest magnitude
    const target = c === "margin" ? e.min.value : Math.abs(e.max.value) >= Math.abs(e.min.value) ? e.max.value : e.min.value;
    const same = (v: number) => (c === "margin" ? Math.abs(v - target) : Math.abs(Math.abs(v) - Math.abs(target))) <= 1e-9 * size;
    const tied = runs.filter((run) => {
      if (!run.ok) return false;
      const r = run.result.reactions[id];
      if (!r || notHeld(run.result.bodies[r.body]?.status ?? "holds")) return false;
      const v = componentOf(r, c);
      return v !== undefined && same(v);
    });
    if (tied.length > 1) out[c] = tied.map((run) => run.id);
  }
  return out;
}

/** A load group with a non-zero factor in more than one term of a combination: counted more than once. */
export interface GroupOverlap {
  group: string;
  /** the terms that carry it: case id, the combination's factor × the case's group factor */
  terms: Array<{ case: string; factor: number }>;
  /** how many times the group's loads are counted in all */
  total: number;
}

/** The load groups that hold loads in the file: weights ("dead" unless a body names a group), loads
 *  ("loads") and ports ("flow"). Mass sources carry no force of their own. */
export function loadGroupsOf(file: SketchFile): string[] {
  const groups = new Set<string>();
  const gravityOff = file.gravity === 0;
  for (const b of file.bodies) if (!gravityOff && b.mass !== 0) groups.add(b.group ?? DEFAULT_GROUPS.weight);
  for (const l of file.loads) groups.add(l.group ?? DEFAULT_GROUPS.load);
  for (const p of file.ports) groups.add(p.group ?? DEFAULT_GROUPS.flow);
  return [...groups];
}

/**
 * The groups a combination counts more than once. Each case carries its whole load set (a group
 * it does not scale counts × 1), so "1.2 normal + 1.5 test" of two full cases counts the weight
 * 2.7 times. A combination is right when each group is in only one of its terms.
 */
export function combinationOverlaps(file: SketchFile, combination: CombinationFile): GroupOverlap[] {
  const out: GroupOverlap[] = [];
  const carried = new Map<string, Set<string> | null>();
  const carries = (c: CaseFile, group: string) => {
    if (!carried.has(c.id)) carried.set(c.id, groupsCarried(file, c));
    // a case that does not evaluate is taken at its factors
    return carried.get(c.id)?.has(group) ?? true;
  };
  for (const group of loadGroupsOf(file)) {
    const byFactors = combination.terms
      .map((t) => ({ case: t.case, factor: t.factor * (file.cases?.find((x) => x.id === t.case)?.factors?.[group] ?? 1) }))
      .filter((t) => t.factor !== 0);
    // only a group the factors count twice is looked at closer (which takes building the cases' loads):
    // a group whose loads come to nothing in a case (its ports' flow and pressure set to 0, say) is not in it
    if (byFactors.length < 2) continue;
    const terms = byFactors.filter((t) => {
      const c = file.cases?.find((x) => x.id === t.case);
      return !c || carries(c, group);
    });
    if (terms.length > 1) out.push({ group, terms, total: terms.reduce((a, t) => a + t.factor, 0) });
  }
  return out;
}

/** The load groups whose loads do not all come to zero in the case's load set (null: the case does not evaluate). */
function groupsCarried(file: SketchFile, c: CaseFile): Set<string> | null {
  const cs = caseSketch(file, c);
  if (!cs.ok) return null;
  const groupOf = new Map<string, string>();
  for (const b of file.bodies) groupOf.set(b.id, b.group ?? DEFAULT_GROUPS.weight);
  for (const l of file.loads) groupOf.set(l.id, l.group ?? DEFAULT_GROUPS.load);
  for (const p of file.ports) groupOf.set(p.id, p.group ?? DEFAULT_GROUPS.flow);
  const out = new Set<string>();
  for (const m of prepare(cs.sketch).models) {
    for (const t of [...m.forceTerms, ...m.momentumTerms]) {
      const g = t.kind === "reaction" ? undefined : groupOf.get(t.id);
      if (g !== undefined && (t.fx !== 0 || t.fy !== 0 || t.m !== 0)) out.add(g);
    }
  }
  return out;
}

/** Words for a case's factors of groups that no load is in: they change nothing (a typo, or the
 *  group's loads were removed), so the case is not what its factors say. */
export function caseWarnings(file: SketchFile, c: CaseFile, groups: readonly string[] = loadGroupsOf(file)): string[] {
  const out = Object.keys(c.factors ?? {})
    .filter((g) => !groups.includes(g))
    .map((g) => `Case ${c.name} scales load group "${g}", which no load is in, so that factor changes nothing (the sketch's groups: ${groups.join(", ") || "none"}).`);
  if (c.onlyInCombinations && !(file.combinations ?? []).some((k) => k.terms.some((t) => t.case === c.id)))
    out.push(`Case ${c.name} is solved only in combinations, and no combination names it: it is solved nowhere.`);
  return out;
}

/** Words for a combination's overlaps, one sentence a group (empty when there are none). */
export function combinationWarnings(file: SketchFile, combination: CombinationFile, caseName: (id: string) => string = (id) => id): string[] {
  const words = (g: string) => (g === DEFAULT_GROUPS.weight ? `"${g}" (the weights)` : `"${g}"`);
  const n = (x: number) => Number(x.toPrecision(6));
  return combinationOverlaps(file, combination).map(
    (o) =>
      `Load group ${words(o.group)} is in ${o.terms.map((t) => `${caseName(t.case)} (× ${n(t.factor)})`).join(" and ")}: it is counted ${n(o.total)} times. Give each case of a combination its own load groups (set the others to 0 in the case) so each load is counted once.`,
  );
}
