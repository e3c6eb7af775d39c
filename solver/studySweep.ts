// A sweep or limit search on what a study names: the sketch as drawn, one operating case (its
// overrides and factors), or a combination. A combination is solved at each point as its own
// factored load set, as the case table solves it (solver/cases.ts): each of its cases takes the
// swept value, its load set is built, and the sets are added with their factors before the one
// solve — never the results of the cases.
import { caseInputErrors, caseSketch, combineModels } from "./cases";
import { planOf, resolveFile } from "./parse";
import type { SketchFile } from "./schema";
import { prepare, solveModels } from "./solve";
import { bodySlidingMargin, findBodySlidingWith, findLimitWith, findTippingWith, formatLimit, limitTolerance, type LimitOptions, type LimitResult } from "./limit";
import type { QuantitySpec } from "./quantity";
import { createSetter, createSweeper, FLOW_FACTOR, type ParameterSetter, type Sweeper } from "./sweep";
import type { FieldError, Sketch, SolveResult, SolveWarning, Support } from "./types";

/** What a sweep runs on: a case, or a combination, or (neither) the sketch as drawn. */
export interface SweepOn {
  case?: string;
  combination?: string;
}

const listed = (what: string, ids: string[]) => (ids.length ? ` (${what}: ${ids.join(", ")})` : "");

/**
 * A sketch (or a case's or combination's variant of it) that does not read: its errors by field
 * path, so a page can say them in the form's words ("Case Storm — change of v: has no unit; …").
 * The message keeps the file's paths, for the CLI and wherever nothing translates it. `on`: what
 * was being run when it is not the sketch as drawn ("case Storm", "combination Gusts").
 */
export class SketchInputError extends Error {
  constructor(
    readonly fields: FieldError[],
    readonly on?: string,
  ) {
    super(fields.map((e) => `${e.path}: ${e.message}`).join("; "));
  }
}

function failed(errors: FieldError[], on?: string): SketchInputError {
  return new SketchInputError(errors, on);
}

/** A case's variant that does not read: what its changes break, the change itself first (a value
 *  typed without its unit, in a unit of another kind), as the Cases tab says it. */
function caseFailed(file: SketchFile, c: CaseFile, errors: FieldError[]): SketchInputError {
  const said = caseInputErrors(file, c);
  return failed(said.length ? said : errors, `case ${c.name}`);
}

type CaseFile = NonNullable<SketchFile["cases"]>[number];

/** A case without its own value of the swept parameter: every point sets it, so the case's value
 *  stands for nothing (and one typed without its unit must not stop the sweep). */
function withoutSwept(c: CaseFile, parameter?: string): CaseFile {
  if (!parameter || !c.parameters || !(parameter in c.parameters)) return c;
  const { [parameter]: _swept, ...rest } = c.parameters;
  return { ...c, parameters: rest };
}

/** The numeric sketch of one case (its parameter overrides, its factors and flow factor);
 *  `swept`: a parameter the sweep sets at each point, whose value in the case is left out. */
export function sketchOfCase(file: SketchFile, caseId: string, swept?: string): Sketch {
  const found = file.cases?.find((x) => x.id === caseId);
  if (!found) throw new Error(`case: there is no case "${caseId}"${listed("cases", (file.cases ?? []).map((x) => x.id))}`);
  const c = withoutSwept(found, swept);
  const cs = caseSketch(file, c);
  if (!cs.ok) throw caseFailed(file, c, cs.errors);
  return cs.sketch;
}

/** The unit the sketch as drawn writes `parameter` in (undefined when it does not read). */
function drawnUnit(file: SketchFile, parameter: string, asDrawn?: Sketch): string | undefined {
  let sketch = asDrawn;
  if (!sketch) {
    const r = resolveFile(file);
    if (!r.ok) return undefined;
    sketch = r.sketch;
  }
  const plan = planOf(sketch);
  if (parameter === FLOW_FACTOR && !plan?.scope.has(FLOW_FACTOR)) return "";
  return plan?.parameterUnits[parameter];
}

/**
 * A sweeper over `parameter` for what `on` names in the parsed file (`asDrawn`: its sketch as
 * drawn, when the caller has it). The swept values are in the unit the sketch as drawn writes the
 * parameter in, whatever unit a case writes its own value in ("140 km/h" for a "30 m/s"), so one
 * range means the same in every case and combination.
 */
export function sweeperOn(file: SketchFile, on: SweepOn, parameter: string, asDrawn?: Sketch): Sweeper {
  if (on.case && on.combination) throw new Error("a sweep runs on a case or on a combination, not both");
  if (on.case) return createSweeper(sketchOfCase(file, on.case, parameter), parameter, drawnUnit(file, parameter, asDrawn));
  if (!on.combination) {
    if (asDrawn) return createSweeper(asDrawn, parameter);
    const r = resolveFile(file);
    if (!r.ok) throw failed(r.errors);
    return createSweeper(r.sketch, parameter);
  }

  const k = file.combinations?.find((x) => x.id === on.combination);
  if (!k) throw new Error(`combination: there is no combination "${on.combination}"${listed("combinations", (file.combinations ?? []).map((x) => x.id))}`);
  const cases = k.terms.map((t) => file.cases?.find((c) => c.id === t.case));
  const missing = k.terms.filter((_, i) => !cases[i]).map((t) => t.case);
  if (missing.length) throw new Error(`combination ${k.id}: names case ${missing.join(", ")}, which does not exist`);
  const parts = cases.map((found) => {
    const c = withoutSwept(found!, parameter);
    const cs = caseSketch(file, c);
    if (!cs.ok) throw caseFailed(file, c, cs.errors);
    return { name: c.name, setter: createSetter(cs.sketch, parameter), warnings: cs.warnings };
  });
  const setters: ParameterSetter[] = parts.map((p) => p.setter);
  const unit = drawnUnit(file, parameter, asDrawn) ?? parts[0].setter.unit;
  return {
    parameter,
    unit,
    at(value: number) {
      const errors: FieldError[] = [];
      const seen = new Set<string>();
      for (const s of setters) {
        for (const e of s.set(value, unit)) {
          const key = `${e.path} ${e.message}`;
          if (!seen.has(key)) errors.push(e);
          seen.add(key);
        }
      }
      if (errors.length) return { value, ok: false, errors };
      const prepared = parts.map((p) => prepare(p.setter.sketch));
      const warnings: SolveWarning[] = [];
      prepared.forEach((p, i) => {
        for (const w of [...parts[i].warnings, ...p.warnings]) if (!warnings.some((x) => x.message === w.message)) warnings.push(w);
      });
      const models = combineModels(prepared.map((p, i) => ({ models: p.models, factor: k.terms[i].factor, name: parts[i].name })));
      return { value, ok: true, result: solveModels(models, warnings) };
    },
    restore: () => setters.forEach((s) => s.restore()),
  };
}

/**
 * A body's own limit, searched as the calc sheet's limits table searches it (lib/calcsheet/sweeps.ts):
 * where it tips (no set of its one-sided reactions holds it: `findTippingWith`) or where it slides as
 * a whole (Σ μ·n − |Σ t| of its bearing friction contacts reaches zero: `findBodySlidingWith`). The
 * limit itself, so it has no target.
 */
export interface BodyLimitSpec {
  body: string;
  limit: "tips" | "slides";
}

/** What the limit finder searches: a support's quantity reaching a target, or a body's own limit. */
export type LimitQuantity = QuantitySpec | BodyLimitSpec;

export const isBodyLimit = (q: LimitQuantity): q is BodyLimitSpec => "body" in q && "limit" in q;

/**
 * A body's limit searched: where it is reached, or why not. For sliding, `tipsFrom` is where the
 * body starts to tip in the same range, going from its start (absent: it does not): sliding is read
 * only while the body is held, so a body that tips first never slides in the search.
 *
 * For tipping, `slidesFrom` is where the body starts to slide as a whole in the same range, going
 * from its start (its start itself when it slides there already; absent: it does not). The solve
 * checks friction but does not enforce it: a body found sliding as a whole is still solved as if
 * its contacts held it along its base, so it can be reported tipping at a larger value. That
 * tipping value holds only for a body kept from sliding (a stop, a heavier anchor); the answers
 * say so wherever `slidesFrom` comes before it.
 */
export type BodyLimitResult = LimitResult & { tipsFrom?: number; slidesFrom?: number };

/**
 * The bodies whose own limits can be searched, as the calc sheet's limits table lists them: each
 * body on a contact or a tie may tip; one on contacts and ties alone, one of them a contact with a μ,
 * may slide as a whole (a pin, a roller or a fixed support resists sliding, as the stability check
 * says).
 */
export function bodyLimits(file: Pick<SketchFile, "bodies" | "supports">): BodyLimitSpec[] {
  const out: BodyLimitSpec[] = [];
  for (const b of file.bodies) {
    const own = file.supports.filter((s) => s.body === b.id);
    if (own.some((s) => s.kind === "contact" || s.kind === "tie")) out.push({ body: b.id, limit: "tips" });
  }
  for (const b of file.bodies) {
    const own = file.supports.filter((s) => s.body === b.id);
    if (own.some((s) => s.kind === "contact" && s.mu !== undefined) && own.every((s) => s.kind === "contact" || s.kind === "tie")) out.push({ body: b.id, limit: "slides" });
  }
  return out;
}

/**
 * Where a body starts to slide as a whole going from the range's start: the start itself when its
 * sliding margin is below zero there, else its first crossing (into sliding); undefined when it
 * holds against sliding throughout (or never bears on friction).
 */
export function slidesFromWith(sweeper: Sweeper, range: readonly [number, number], body: string, options: LimitOptions = {}): number | undefined {
  let atStart: number;
  try {
    const p = sweeper.at(range[0]);
    atStart = p.ok ? bodySlidingMargin(p.result, body) : Number.NaN;
  } finally {
    sweeper.restore();
  }
  if (atStart < 0) return range[0];
  return reachedAt(findBodySlidingWith(sweeper, range, body, options), range[0], range[1]);
}

/** A body's own state at one solve, beside holding (`bodyStateIn`). */
export type BodyState = "slides" | "tips" | "unrestrained";

/**
 * What a body itself does in a solve, as its own limits name it (`bodyLimits`): it tips (no set of
 * its one-sided reactions holds it; `about`: the support it turns about, when the turn is about
 * one), it is unrestrained, or it slides as a whole (its sliding margin `bodySlidingMargin` is
 * below zero: the solve's `SLIP` on the body, ids `[body]`); null while it holds (with a contact
 * lifted or slipping alone, perhaps: one contact over its own μ while the others have friction to
 * spare gives its share to them, and the body stays put). `supports`: where each support is, to
 * name the pivot (`freeMotion.about` is a support's own point).
 */
export function bodyStateIn(result: SolveResult, body: string, supports: ReadonlyArray<Pick<Support, "id" | "at">> = []): { state: BodyState; about?: string } | null {
  const b = result.bodies[body];
  if (!b) return null;
  if (b.status === "tips") {
    const fm = b.freeMotion;
    const at = fm?.kind === "rotation" ? supports.find((s) => result.reactions[s.id]?.body === body && Math.hypot(s.at[0] - fm.about[0], s.at[1] - fm.about[1]) < 1e-6) : undefined;
    return at ? { state: "tips", about: at.id } : { state: "tips" };
  }
  if (b.status === "unrestrained") return { state: "unrestrained" };
  return bodySlidingMargin(result, body) < 0 ? { state: "slides" } : null;
}

/** A body's own limit with a sweeper made for it (`findTippingWith`, `findBodySlidingWith`); for
 *  sliding, also where the body tips in the range (`tipsFrom`), the reason it may never slide; for
 *  tipping, where it already slides as a whole (`slidesFrom`), the reason the tipping value may
 *  never be reached by a body free to slide. */
export function findBodyLimitWith(sweeper: Sweeper, range: readonly [number, number], q: BodyLimitSpec, options: LimitOptions = {}): BodyLimitResult {
  if (q.limit === "tips") {
    const tipping = findTippingWith(sweeper, range, q.body, options);
    const slidesFrom = slidesFromWith(sweeper, range, q.body, options);
    return slidesFrom === undefined ? tipping : { ...tipping, slidesFrom };
  }
  const sliding = findBodySlidingWith(sweeper, range, q.body, options);
  const tipsFrom = reachedAt(findTippingWith(sweeper, range, q.body, options), range[0], range[1]);
  return tipsFrom === undefined ? sliding : { ...sliding, tipsFrom };
}

/** The limit finder on any quantity: a support's reaching `target`, or a body's own limit (no target). */
export function findAnyLimitWith(sweeper: Sweeper, range: readonly [number, number], q: LimitQuantity, target = 0, options: LimitOptions = {}): BodyLimitResult {
  return isBodyLimit(q) ? findBodyLimitWith(sweeper, range, q, options) : findLimitWith(sweeper, range, q, target, options);
}

export interface LimitEverywhere {
  /** the case's or combination's id ("" for the sketch as drawn, when it has neither) */
  id: string;
  name: string;
  kind: "case" | "combination" | "as drawn";
  /** `fields`: the input errors by field path when the run's sketch does not read */
  result: BodyLimitResult | { error: string; fields?: FieldError[] };
}

/**
 * The same limit searched in each case (but those solved only in combinations) and each
 * combination: under which of them, and at what value, does the quantity reach the target (or the
 * body reach its own limit: it tips, or slides as a whole)?
 * A sketch with neither is searched as drawn; one whose cases are all for combinations only,
 * with no combination, is refused (the case study solves nothing either).
 */
export function limitEverywhere(
  file: SketchFile,
  parameter: string,
  range: readonly [number, number],
  quantity: LimitQuantity,
  target = 0,
  asDrawn?: Sketch,
  onProgress: (done: number, total: number) => void = () => {},
): LimitEverywhere[] {
  const runs: Array<Omit<LimitEverywhere, "result"> & { on: SweepOn }> = [
    ...(file.cases ?? []).filter((c) => !c.onlyInCombinations).map((c) => ({ id: c.id, name: c.name, kind: "case" as const, on: { case: c.id } })),
    ...(file.combinations ?? []).map((k) => ({ id: k.id, name: k.name, kind: "combination" as const, on: { combination: k.id } })),
  ];
  if (!runs.length) {
    // cases all kept for combinations that are not there: the study solves nothing, and
    // searching the drawing instead would answer a question nobody asked
    if (file.cases?.length)
      throw new Error("Every case is solved only in combinations and the sketch has no combination: there is nothing to search. Clear \"only in combinations\" on a case, or add a combination.");
    runs.push({ id: "", name: "As drawn", kind: "as drawn", on: {} });
  }
  return runs.map(({ on, ...run }, i) => {
    let result: LimitEverywhere["result"];
    try {
      result = findAnyLimitWith(sweeperOn(file, on, parameter, asDrawn), range, quantity, target);
    } catch (err) {
      result = { error: (err as Error).message, ...(err instanceof SketchInputError ? { fields: err.fields } : {}) };
    }
    onProgress(i + 1, runs.length);
    return { ...run, result };
  });
}

/** Where a search first reaches the target going from `from` towards `to` (a range searched
 *  downwards meets its highest crossing first); undefined when it never does. */
export function reachedAt(result: LimitEverywhere["result"], from: number, to: number): number | undefined {
  if (!("found" in result) || !result.found) return undefined;
  return from <= to ? result.crossings[0] : result.crossings[result.crossings.length - 1];
}

/**
 * The run in which the quantity gets to the target first, going from the range's start `from`;
 * `tied` lists every run that gets there at the same value (the first among them too, in the
 * order of the rows): within the searches' tolerance, or alike when written to the figures a
 * limit is given to. Cases that leave the swept parameter's effects alone tie exactly.
 */
export function firstReached(rows: readonly LimitEverywhere[], from: number, to: number): { row: LimitEverywhere; value: number; tied: LimitEverywhere[] } | null {
  let best: { row: LimitEverywhere; value: number } | null = null;
  for (const row of rows) {
    const x = reachedAt(row.result, from, to);
    if (x === undefined) continue;
    if (!best || (from <= to ? x < best.value : x > best.value)) best = { row, value: x };
  }
  if (!best) return null;
  const first = best;
  const toleranceOf = (r: LimitEverywhere["result"]) => ("found" in r && r.found && r.tolerance) || limitTolerance([from, to]);
  const tied = rows.filter((row) => {
    const x = reachedAt(row.result, from, to);
    if (x === undefined) return false;
    return Math.abs(x - first.value) <= 2 * Math.max(toleranceOf(row.result), toleranceOf(first.row.result)) || formatLimit(x) === formatLimit(first.value);
  });
  return { ...first, tied };
}
