// The sketch as numbers for drawing: every field of the file (number or expression) read as an
// SI value. Expressions take their value from the last analysis (`FieldValues`); plain numbers
// are read directly, so a drag redraws without waiting for a parse. Scene elements are cached per
// element object, so an unchanged element keeps the same scene object (and is not redrawn).
import { gravityNote } from "@/solver/words";
import type { FieldValue } from "@/solver/resolve";
import type { SketchFile } from "@/solver/schema";
import { portFlow } from "@/solver/ports";
import type { Port, Vec2 } from "@/solver/types";
import { GROUPS, type AnyElement, type BodyEl, type ElementKind, type Group, kindOf } from "./model/elements";
import { plainNumber } from "./model/numeric";
import { isFinitePoint, polygonArea, polygonCentroid } from "./geometry/polygon";

/** SI values of expression fields by `${elementId}.${field}` (e.g. `s2.at[0]`), and their errors. */
export interface FieldValues {
  values: ReadonlyMap<string, number>;
  errors: ReadonlyMap<string, string>;
}

export const NO_VALUES: FieldValues = { values: new Map(), errors: new Map() };

const PATH = /^(bodies|supports|loads|ports|massSources)\[(\d+)\](?:\.(.+))?$/;

/** Re-key a parse's `fields` (by path) and errors by element id, for the sketch that was parsed. */
export function fieldValuesById(
  file: SketchFile,
  fields: Record<string, FieldValue>,
  errors: ReadonlyArray<{ path: string; message: string }> = [],
): FieldValues {
  const values = new Map<string, number>();
  const errs = new Map<string, string>();
  const key = (path: string): string => {
    const m = PATH.exec(path);
    if (!m) return path;
    const el = (file[m[1] as Group] as AnyElement[])[Number(m[2])];
    if (!el) return path;
    return m[3] ? `${el.id}.${m[3]}` : el.id;
  };
  for (const [path, v] of Object.entries(fields)) {
    if ("value" in v) values.set(key(path), v.value);
    else errs.set(key(path), v.error);
  }
  for (const e of errors) if (!errs.has(key(e.path))) errs.set(key(e.path), e.message);
  return { values, errors: errs };
}

export interface SceneBody {
  kind: "body";
  id: string;
  label?: string;
  outline: Vec2[];
  cg: Vec2;
  cgGiven: boolean;
  mass: number;
}
interface Base {
  id: string;
  body: string;
  label?: string;
}
export interface SceneSupport extends Base {
  kind: "pin" | "roller" | "contact" | "fixed" | "tie";
  at: Vec2;
  angle: number;
  mu?: number;
}
export interface SceneForce extends Base {
  kind: "force";
  at: Vec2;
  angle: number;
  magnitude: number;
}
export interface SceneCouple extends Base {
  kind: "couple";
  at: Vec2;
  value: number;
}
export interface SceneDistributed extends Base {
  kind: "distributed";
  from: Vec2;
  to: Vec2;
  w1: number;
  w2: number;
  angle: number;
}
export interface ScenePort extends Base {
  kind: "inlet" | "outlet";
  at: Vec2;
  angle: number;
  massFlow: number;
  velocity: number;
  /** momentum-flux factor β (1: uniform flow) */
  beta: number;
  pressure: number;
  area?: number;
  /** false when nothing gives the mass flow (no ṁ, nor ρ with Q, nor ρ with A and V): `massFlow` is then 0 by default, not a value */
  massFlowGiven?: boolean;
}
export interface SceneSource extends Base {
  kind: "massSource";
  at: Vec2;
  massFlow: number;
}
export type SceneItem = SceneSupport | SceneForce | SceneCouple | SceneDistributed | ScenePort | SceneSource;
export type SceneElement = SceneBody | SceneItem;

export interface Scene {
  bodies: SceneBody[];
  items: SceneItem[];
  byId: Map<string, SceneElement>;
  /** ids in drawing order; the same array objects while the ids do not change (narrow redraws) */
  bodyIds?: readonly string[];
  /** rows the canvas's legend has beyond its key of arrows (1 when it says gravity is turned): the
   *  fit and the labels keep below it */
  legendRows?: number;
  itemIds?: readonly string[];
}

let lastBodyIds: readonly string[] = [];
let lastItemIds: readonly string[] = [];
const sameIds = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((x, i) => x === b[i]);

type Reader = (raw: unknown, field: string) => number;

function reader(id: string, fv: FieldValues): Reader {
  return (raw, field) => {
    if (typeof raw === "number") return raw;
    const v = fv.values.get(`${id}.${field}`);
    if (v !== undefined) return v;
    return plainNumber(raw as string) ?? Number.NaN;
  };
}

function hasExpression(x: unknown): boolean {
  if (typeof x === "string") return true;
  if (Array.isArray(x)) return x.some(hasExpression);
  return false;
}

function dependsOnValues(el: AnyElement): boolean {
  for (const [k, v] of Object.entries(el)) if (k !== "id" && k !== "label" && k !== "body" && k !== "kind" && hasExpression(v)) return true;
  return false;
}

const point = (r: Reader, raw: unknown, field: string): Vec2 => {
  const a = raw as unknown[];
  return [r(a[0], `${field}[0]`), r(a[1], `${field}[1]`)];
};

export function sceneBody(b: BodyEl, fv: FieldValues): SceneBody {
  const r = reader(b.id, fv);
  const outline = b.outline.map((p, i) => point(r, p, `outline[${i}]`));
  const cgGiven = b.cg !== undefined;
  let cg: Vec2 = cgGiven ? point(r, b.cg, "cg") : [Number.NaN, Number.NaN];
  if (!cgGiven && outline.every(isFinitePoint) && Math.abs(polygonArea(outline)) > 1e-12) cg = polygonCentroid(outline);
  return { kind: "body", id: b.id, label: b.label, outline, cg, cgGiven, mass: r(b.mass, "mass") };
}

export function sceneItem(kind: ElementKind, el: AnyElement, fv: FieldValues, body: SceneBody | undefined): SceneItem {
  const r = reader(el.id, fv);
  const e = el as Record<string, unknown> & { id: string; body: string; label?: string };
  const base = { id: e.id, body: e.body, label: e.label };
  const fallback: Vec2 = body?.cg ?? [0, 0];
  switch (kind) {
    case "pin":
    case "fixed":
      return { ...base, kind, at: point(r, e.at, "at"), angle: 90 };
    case "roller":
    case "contact":
    case "tie":
      return { ...base, kind, at: point(r, e.at, "at"), angle: r(e.angle, "angle"), ...(e.mu !== undefined ? { mu: r(e.mu, "mu") } : {}) };
    case "force": {
      const polar = e.magnitude !== undefined || e.angle !== undefined;
      if (polar) return { ...base, kind, at: point(r, e.at, "at"), angle: r(e.angle ?? 0, "angle"), magnitude: r(e.magnitude ?? 0, "magnitude") };
      const fx = r(e.fx ?? 0, "fx");
      const fy = r(e.fy ?? 0, "fy");
      return { ...base, kind, at: point(r, e.at, "at"), angle: (Math.atan2(fy, fx) * 180) / Math.PI, magnitude: Math.hypot(fx, fy) };
    }
    case "couple":
      return { ...base, kind, at: e.at ? point(r, e.at, "at") : fallback, value: r(e.value, "value") };
    case "distributed":
      return {
        ...base,
        kind,
        from: point(r, e.from, "from"),
        to: point(r, e.to, "to"),
        w1: r(e.w1, "w1"),
        w2: r(e.w2, "w2"),
        angle: e.angle === undefined ? -90 : r(e.angle, "angle"),
      };
    case "inlet":
    case "outlet": {
      const opt = (k: string) => (e[k] === undefined ? undefined : r(e[k], k));
      const numeric: Port = {
        id: e.id,
        body: e.body,
        kind,
        at: point(r, e.at, "at"),
        angle: r(e.angle, "angle"),
        massFlow: opt("massFlow"),
        velocity: opt("velocity"),
        pressure: opt("pressure"),
        area: opt("area"),
        density: opt("density"),
        volumeFlow: opt("volumeFlow"),
        beta: opt("beta"),
      };
      const flow = portFlow(numeric, null);
      return { ...base, kind, at: numeric.at, angle: numeric.angle, massFlow: flow.massFlow, velocity: flow.velocity, beta: numeric.beta ?? 1, pressure: numeric.pressure ?? 0, area: numeric.area, massFlowGiven: flow.massFlowGiven };
    }
    case "massSource":
      return { ...base, kind, at: e.at ? point(r, e.at, "at") : fallback, massFlow: r(e.massFlow, "massFlow") };
    default:
      throw new Error(`not an attached element: ${kind}`);
  }
}

/** Same numbers, same scene object: a new analysis with unchanged values must not redraw anything. */
function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a === "number" && typeof b === "number") return Number.isNaN(a) && Number.isNaN(b);
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((x, i) => sameValue(x, b[i]));
  if (a && b && typeof a === "object" && typeof b === "object") {
    const ka = Object.keys(a);
    const kb = Object.keys(b);
    return ka.length === kb.length && ka.every((k) => sameValue((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
  }
  return false;
}

interface CacheEntry {
  fv: FieldValues;
  body?: SceneBody;
  scene: SceneElement;
}
const cache = new WeakMap<AnyElement, CacheEntry>();

/** What the canvas's legend is drawn from: the result on screen and the numeric sketch it is of
 *  (the analysis store's `shown` and `shownSketch`). */
export interface ShownResult {
  shown: unknown;
  shownSketch: { gravityAngle?: number } | null;
}

/**
 * The numeric scene of a sketch; unchanged elements keep their scene objects. Given the result on
 * screen (`onScreen`), the legend's rows are those the legend draws: gravity's direction as the
 * shown result's sketch has it (the last good one while a typed direction holds an error; none
 * with no result), so the fit keeps room for the row the legend shows. Without it, the sketch's
 * own direction.
 */
export function buildScene(file: SketchFile, fv: FieldValues = NO_VALUES, onScreen?: ShownResult): Scene {
  const byId = new Map<string, SceneElement>();
  const bodies: SceneBody[] = [];
  const items: SceneItem[] = [];
  for (const b of file.bodies) {
    const hit = cache.get(b);
    let s: SceneBody;
    if (hit && (hit.fv === fv || !dependsOnValues(b))) s = hit.scene as SceneBody;
    else {
      s = sceneBody(b, fv);
      if (hit && sameValue(s, hit.scene)) s = hit.scene as SceneBody;
      cache.set(b, { fv, scene: s });
    }
    bodies.push(s);
    if (!byId.has(b.id)) byId.set(b.id, s);
  }
  for (const group of GROUPS) {
    if (group === "bodies") continue;
    for (const el of file[group] as AnyElement[]) {
      const kind = kindOf(group, el);
      const body = byId.get((el as { body: string }).body) as SceneBody | undefined;
      const hit = cache.get(el);
      let s: SceneItem;
      if (hit && hit.body === body && (hit.fv === fv || !dependsOnValues(el))) s = hit.scene as SceneItem;
      else {
        s = sceneItem(kind, el, fv, body);
        if (hit && sameValue(s, hit.scene)) s = hit.scene as SceneItem;
        cache.set(el, { fv, body, scene: s });
      }
      items.push(s);
      if (!byId.has(el.id)) byId.set(el.id, s);
    }
  }
  const bodyIds = bodies.map((b) => b.id);
  const itemIds = items.map((i) => i.id);
  if (!sameIds(bodyIds, lastBodyIds)) lastBodyIds = bodyIds;
  if (!sameIds(itemIds, lastItemIds)) lastItemIds = itemIds;
  const g = onScreen ? (onScreen.shown ? onScreen.shownSketch?.gravityAngle : undefined) : typeof file.gravityAngle === "number" ? file.gravityAngle : fv.values.get("gravityAngle");
  const legendRows = gravityNote(g) ? 1 : 0;
  return { bodies, items, byId, bodyIds: lastBodyIds, itemIds: lastItemIds, ...(legendRows ? { legendRows } : {}) };
}

/** The point an element is held by: where a drag snaps and the outline's "at". */
export function anchorOf(s: SceneElement): Vec2 {
  switch (s.kind) {
    case "body":
      return s.cg;
    case "distributed":
      return [(s.from[0] + s.to[0]) / 2, (s.from[1] + s.to[1]) / 2];
    default:
      return s.at;
  }
}

/** Every point of an element (for fit-to-view and box selection). */
export function pointsOf(s: SceneElement): Vec2[] {
  if (s.kind === "body") return s.outline;
  if (s.kind === "distributed") return [s.from, s.to];
  return [s.at];
}
