// The studies' work, as plain functions that run in a worker (or directly in tests): all cases
// and combinations at once, a sweep in chunks with progress and a way to stop, and the limit finder.
import type { LimitResult } from "@/solver/limit";
import { parseSketch } from "@/solver/parse";
import type { QuantitySpec } from "@/solver/quantity";
import { linspace, supportBodyHeld, supportOff, sweptQuantity } from "@/solver/sweep";
import { findAnyLimitWith, limitEverywhere, SketchInputError, sweeperOn, type BodyLimitResult, type LimitEverywhere, type LimitQuantity } from "@/solver/studySweep";
export { bodyLimits, firstReached, isBodyLimit, reachedAt, SketchInputError, type BodyLimitResult, type BodyLimitSpec, type LimitEverywhere, type LimitQuantity } from "@/solver/studySweep";
import { solveCases, type StudyResult } from "@/solver/cases";
import type { FieldError } from "@/solver/types";
import { carriesNothing } from "@/solver/words";
import { marksZero, stretchesOf, watchBodies, type BodyStates } from "./display";
export { stretchesOf };

/** How far a job is: sweep points or runs (cases and combinations) done, of how many. */
export type OnProgress = (done: number, total: number) => void;

export type StudyJob =
  | { kind: "cases"; text: string }
  | { kind: "sweep"; text: string; spec: SweepSpec }
  | { kind: "limit"; text: string; spec: LimitSpec }
  | { kind: "limits"; text: string; spec: EverywhereSpec };

/** What the worker sends back for job `id`: progress, then its data or its error. */
export type StudyMessage = { id: number; done: number; total: number } | { id: number; data: unknown } | { id: number; error: string; fields?: FieldError[]; on?: string };

// `SketchInputError` (solver/studySweep.ts): the sketch a study was asked to run, or the case or
// combination it runs on, does not read: its errors by field path, so the page says them in the
// form's words ("Inlet p1: needs a mass flow: give mass flow ṁ, …").

export interface SweepSpec {
  parameter: string;
  from: number;
  to: number;
  points: number;
  /** apply this case's overrides and factors first */
  caseId?: string;
  /** or solve this combination's factored load set at each point */
  combinationId?: string;
  quantities: QuantitySpec[];
}

export interface SweepData {
  parameter: string;
  unit: string;
  /** what each series is */
  quantities: QuantitySpec[];
  xs: number[];
  /** one series per quantity, NaN where the point did not solve */
  series: number[][];
  /** per point: worst status of the bodies, or an error */
  statuses: string[];
  /** where a margin or friction margin crosses zero (a contact lifts, a tie goes slack, friction is
   *  used up): from a sign change between two points. Other quantities changing sign are not marked. */
  crossings: Array<{ quantity: number; between: [number, number] }>;
  errors: Array<{ value: number; errors: FieldError[] }>;
  /** where a plotted contact is off the ground (a plotted tie slack): stretches of neighbouring
   *  points, in sweep order (absent on data made before they were kept) */
  off?: Array<PointStretch & { support: string; kind: "contact" | "tie" }>;
  /** where a plotted contact lifted off (a tie gone slack) carries nothing, its body held
   *  (`carriesNothing`): its margin there is no force, only the side of zero (absent on older data) */
  idle?: Array<PointStretch & { support: string; kind: "contact" | "tie" }>;
  /** where a plotted friction margin is left out (NaN) while its contact bears, because its body
   *  tips or is unrestrained: its reactions are then only what would hold it */
  notHeld?: Array<PointStretch & { support: string; body: string; status: string }>;
  /** where a plotted friction margin is below zero (the contact needs more friction than μ·n): the
   *  crossing alone does not say on which side of it the contact slips */
  slips?: Array<PointStretch & { support: string }>;
  /** each body that may tip or slide as a whole, and where it does (`watchBodies`): whether the body
   *  itself holds where one of its contacts slips */
  bodies?: BodyStates;
}

/** Neighbouring points of a sweep that share something: the first and last swept value, how many. */
export interface PointStretch {
  from: number;
  to: number;
  points: number;
  /** the stretch is every point of the sweep */
  whole: boolean;
}

const STATUS_RANK: Record<string, number> = { holds: 0, lifts: 1, tips: 2, unrestrained: 3 };

/** Every case and combination; `onProgress` hears the runs done of the total after each one. */
export function runCases(file: unknown, onProgress: OnProgress = () => {}): StudyResult {
  const p = parseSketch(file);
  if (!p.ok) throw new SketchInputError(p.errors);
  return solveCases(p.file, onProgress);
}

/**
 * A sweep in chunks. `onChunk` gets the fraction done after each chunk and may return false to
 * stop (the data so far is returned, marked with the last value reached).
 */
export function runSweep(file: unknown, spec: SweepSpec, onChunk: (done: number) => boolean = () => true, chunk = 100): SweepData {
  const p = parseSketch(file);
  if (!p.ok) throw new SketchInputError(p.errors);
  const xs = linspace(spec.from, spec.to, spec.points);
  const sweeper = sweeperOn(p.file, { case: spec.caseId, combination: spec.combinationId }, spec.parameter, p.sketch);
  const data: SweepData = { parameter: spec.parameter, unit: sweeper.unit, quantities: spec.quantities, xs: [], series: spec.quantities.map(() => []), statuses: [], crossings: [], errors: [] };
  // the plotted supports, and those whose friction is plotted, once each
  const supports = [...new Set(spec.quantities.map((q) => q.support))];
  const withFriction = [...new Set(spec.quantities.filter((q) => q.component === "frictionMargin" || q.component === "frictionRatio").map((q) => q.support))];
  /** per point: "contact" / "tie" where the support is off its seat, else null */
  const off = new Map<string, Array<string | null>>(supports.map((id) => [id, []]));
  /** per point: "contact" / "tie" where the support carries nothing, its body held, else null */
  const idle = new Map<string, Array<string | null>>(supports.map((id) => [id, []]));
  /** per point: "<body> <status>" where the support's body is not held and the support is on its seat */
  const loose = new Map<string, Array<string | null>>(withFriction.map((id) => [id, []]));
  /** per point: what each body itself does (slides as a whole, tips, is unrestrained) */
  const bodies = watchBodies(p.file, p.sketch.supports);
  try {
    for (let i = 0; i < xs.length; i++) {
      const pt = sweeper.at(xs[i]);
      data.xs.push(xs[i]);
      if (pt.ok) {
        spec.quantities.forEach((q, k) => data.series[k].push(sweptQuantity(pt.result, q)));
        for (const id of supports) {
          const r = pt.result.reactions[id];
          off.get(id)!.push(supportOff(pt.result, id) ? r.kind : null);
          idle.get(id)!.push(r && carriesNothing(r, pt.result.bodies[r.body]?.status) ? r.kind : null);
        }
        for (const id of withFriction) {
          const r = pt.result.reactions[id];
          loose.get(id)!.push(r && !supportOff(pt.result, id) && !supportBodyHeld(pt.result, id) ? `${r.body} ${pt.result.bodies[r.body]?.status}` : null);
        }
        const worst = Object.values(pt.result.bodies).reduce((w, b) => (STATUS_RANK[b.status] > STATUS_RANK[w] ? b.status : w), "holds");
        data.statuses.push(worst);
        bodies.add(pt.result);
      } else {
        spec.quantities.forEach((_, k) => data.series[k].push(Number.NaN));
        for (const list of [...off.values(), ...idle.values(), ...loose.values()]) list.push(null);
        data.statuses.push("error");
        bodies.add(null);
        data.errors.push({ value: xs[i], errors: pt.errors });
      }
      if ((i + 1) % chunk === 0 && i + 1 < xs.length && !onChunk((i + 1) / xs.length)) break;
    }
  } finally {
    sweeper.restore();
  }
  data.off = supports.flatMap((support) => stretchesOf(data.xs, off.get(support)!).map(({ key, ...s }) => ({ ...s, support, kind: key as "contact" | "tie" })));
  data.idle = supports.flatMap((support) => stretchesOf(data.xs, idle.get(support)!).map(({ key, ...s }) => ({ ...s, support, kind: key as "contact" | "tie" })));
  data.notHeld = withFriction.flatMap((support) =>
    stretchesOf(data.xs, loose.get(support)!).map(({ key, ...s }) => {
      const cut = key.lastIndexOf(" ");
      return { ...s, support, body: key.slice(0, cut), status: key.slice(cut + 1) };
    }),
  );
  const slipping = withFriction.filter((id) => spec.quantities.some((q) => q.support === id && q.component === "frictionMargin"));
  data.slips = slipping.flatMap((support) => {
    const k = spec.quantities.findIndex((q) => q.support === support && q.component === "frictionMargin");
    return stretchesOf(data.xs, data.series[k].map((y) => (y < 0 ? "slip" : null))).map(({ key: _key, ...s }) => ({ ...s, support }));
  });
  data.bodies = bodies.states(data.xs);
  data.series.forEach((ys, k) => {
    if (!marksZero(spec.quantities[k].component)) return;
    for (let i = 1; i < ys.length; i++) {
      const a = ys[i - 1];
      const b = ys[i];
      if (Number.isFinite(a) && Number.isFinite(b) && ((a > 0 && b <= 0) || (a < 0 && b >= 0) || (a === 0 && b !== 0 && i === 1))) {
        data.crossings.push({ quantity: k, between: [data.xs[i - 1], data.xs[i]] });
      }
    }
  });
  onChunk(1);
  return data;
}

export interface LimitSpec {
  parameter: string;
  from: number;
  to: number;
  caseId?: string;
  combinationId?: string;
  /** a support's quantity, or a body's own limit (it tips, or slides as a whole: `target` is not read) */
  quantity: LimitQuantity;
  target: number;
}

/** The limit finder on one run; a body's sliding also says where the body tips (`tipsFrom`). */
export function runLimit(file: unknown, spec: LimitSpec): BodyLimitResult {
  const p = parseSketch(file);
  if (!p.ok) throw new SketchInputError(p.errors);
  return findAnyLimitWith(sweeperOn(p.file, { case: spec.caseId, combination: spec.combinationId }, spec.parameter, p.sketch), [spec.from, spec.to], spec.quantity, spec.target);
}

/** The limit search in every run of the study: each case solved on its own and each combination. */
export type EverywhereSpec = Omit<LimitSpec, "caseId" | "combinationId">;

/** `limitEverywhere` (solver/studySweep.ts) on a sketch file as JSON or text. */
export function runLimitEverywhere(file: unknown, spec: EverywhereSpec, onProgress: OnProgress = () => {}): LimitEverywhere[] {
  const p = parseSketch(file);
  if (!p.ok) throw new SketchInputError(p.errors);
  return limitEverywhere(p.file, spec.parameter, [spec.from, spec.to], spec.quantity, spec.target, p.sketch, onProgress);
}

/** One job, as the worker runs it (or the page, where no worker can run). */
export function runJob(job: StudyJob, onProgress: OnProgress): StudyResult | SweepData | LimitResult | LimitEverywhere[] {
  const file = JSON.parse(job.text);
  if (job.kind === "cases") return runCases(file, onProgress);
  if (job.kind === "limits") return runLimitEverywhere(file, job.spec, onProgress);
  // runSweep reports the fraction done; the page hears points done of the total
  if (job.kind === "sweep") return runSweep(file, job.spec, (fraction) => (onProgress(Math.round(fraction * job.spec.points), job.spec.points), true));
  return runLimit(file, job.spec);
}
