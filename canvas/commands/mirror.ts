// Mirroring the selection (or, with nothing selected, the whole sketch) left–right or up–down
// about the centre line of its bounding box. Positions and outlines are reflected, every
// direction is reflected (a left–right mirror turns an angle a into 180° − a, an up–down one into
// −a), a force given as components and a couple change sign where the reflection says so. An
// expression stays an expression that gives the mirrored value ("180 deg - (theta + 5 deg)"), so a
// parameter, an operating case and a sweep still turn the mirrored element; only an expression
// that cannot be worked out now (an error in it) is written as its last value, and the status line
// says so as a turn or a move does (`replacedWords`).
import type { Numeric, SketchFile } from "@/solver/schema";
import { compileExpression, isUnit } from "@/solver/expressions";
import { resolveParameters } from "@/solver/parameters";
import { findElement, GROUPS, withAttached, type AnyElement } from "../model/elements";
import { plainNumber, roundTo } from "../model/numeric";
import { normaliseAngle } from "../geometry/polygon";
import { defineCommand, edit, plural } from "./define";
import { FIELD_WORDS, type ValueOf } from "./move";

export type MirrorAxis = "leftRight" | "upDown";

export interface MirrorArgs {
  /** what to mirror (a body brings what sits on it); empty: the whole sketch */
  ids: string[];
  axis: MirrorAxis;
  /** values of expression fields, for the bounding box and for an expression in error */
  lookup?: ValueOf;
  /** the mirror line (x for left–right, y for up–down); default: the centre of the bounding box */
  about?: number;
}

/** The ids a mirror of `ids` changes: the whole sketch when nothing is given. */
export function mirroredIds(sketch: SketchFile, ids: readonly string[]): Set<string> {
  if (ids.length) return withAttached(sketch, ids);
  return new Set(GROUPS.flatMap((g) => (sketch[g] as AnyElement[]).map((e) => e.id)));
}

const coordOf = (v: Numeric, id: string, field: string, lookup?: ValueOf): number | undefined =>
  typeof v === "number" ? v : (lookup?.(id, field) ?? plainNumber(v));

/** Every point (as numbers) of the elements, for the bounding box. */
function pointsOf(el: AnyElement, lookup?: ValueOf): Array<[number | undefined, number | undefined]> {
  const r = el as unknown as Record<string, Numeric[] | Numeric[][] | undefined>;
  const out: Array<[number | undefined, number | undefined]> = [];
  const add = (p: Numeric[] | undefined, field: string) => p && out.push([coordOf(p[0], el.id, `${field}[0]`, lookup), coordOf(p[1], el.id, `${field}[1]`, lookup)]);
  if (Array.isArray(r.outline)) (r.outline as Numeric[][]).forEach((p, i) => add(p, `outline[${i}]`));
  for (const f of ["at", "from", "to"]) add(r[f] as Numeric[] | undefined, f);
  return out;
}

/**
 * The mirror line: the middle of the bounding box of what is mirrored, along x for a left–right
 * mirror and along y for an up–down one (undefined when nothing has a position that is known).
 */
export function mirrorLine(sketch: SketchFile, ids: readonly string[], axis: MirrorAxis, lookup?: ValueOf): number | undefined {
  const k = axis === "leftRight" ? 0 : 1;
  let lo = Infinity;
  let hi = -Infinity;
  for (const id of mirroredIds(sketch, ids)) {
    const l = findElement(sketch, id);
    if (!l) continue;
    for (const p of pointsOf(l.el, lookup)) {
      const v = p[k];
      if (v === undefined || !Number.isFinite(v)) continue;
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  }
  return lo <= hi ? roundTo((lo + hi) / 2) : undefined;
}

// ------------------------------------------------------------------ expressions

const SIMPLE = /^(?:[A-Za-z_][A-Za-z0-9_]*|\d+(?:\.\d*)?(?:[eE][-+]?\d+)?)$/;

/** Is the whole text one pair of brackets, "(…)"? */
function wrapped(t: string): boolean {
  if (!t.startsWith("(") || !t.endsWith(")")) return false;
  let depth = 0;
  for (let i = 0; i < t.length; i++) {
    if (t[i] === "(") depth++;
    else if (t[i] === ")" && --depth === 0 && i < t.length - 1) return false;
  }
  return depth === 0;
}

const operand = (t: string) => (SIMPLE.test(t) || wrapped(t) ? t : `(${t})`);

/**
 * "head − text" written so that mirroring twice gives the text back: `k − (k − x)` is x. With k = 0
 * it is the negation, "-x".
 */
export function reflectedText(text: string, k: number, unit: string): string {
  const t = text.trim();
  const head = k === 0 ? "-" : `${roundTo(k)}${unit ? ` ${unit}` : ""} - `;
  if (t.startsWith(head)) {
    const rest = t.slice(head.length).trim();
    if (SIMPLE.test(rest)) return rest;
    if (wrapped(rest)) return rest.slice(1, -1).trim();
  }
  return `${head}${operand(t)}`;
}

/**
 * Does the expression give a quantity with a unit (true), a plain number (false), or nothing
 * readable (null)? `parameters`: the values to read it with (default: the sketch's own).
 */
function carriesUnit(text: string, sketch: SketchFile, parameters = sketch.parameters): boolean | null {
  try {
    const params = resolveParameters(parameters);
    const v = compileExpression(text, new Set(Object.keys(parameters ?? {}))).evaluate(params.scope);
    if (isUnit(v)) return true;
    return typeof v === "number" ? false : null;
  } catch {
    return null;
  }
}

/** k − v for a number or an expression (an expression in error becomes k − its last value, or stays). */
function reflect(v: Numeric, k: number, unit: string, sketch: SketchFile, value: () => number | undefined): Numeric {
  if (typeof v === "number") return roundTo(k - v);
  const plain = plainNumber(v);
  if (plain !== undefined) return roundTo(k - plain);
  if (k === 0) return reflectedText(v, 0, "");
  const u = carriesUnit(v, sketch);
  if (u !== null) return reflectedText(v, k, u ? unit : "");
  const now = value();
  return now === undefined || !Number.isFinite(now) ? v : roundTo(k - now);
}

// ------------------------------------------------------------------ the command

export const mirrorElements = defineCommand<MirrorArgs>({
  name: "mirrorElements",
  label: ({ ids, axis }) => {
    const how = axis === "leftRight" ? "left–right" : "up–down";
    if (!ids.length) return `Mirror the whole sketch ${how}`;
    return ids.length === 1 ? `Mirror ${ids[0]} ${how}` : `Mirror ${plural(ids.length, "element")} ${how}`;
  },
  undoable: true,
  run: (sketch, { ids, axis, lookup, about }) => {
    const moving = mirroredIds(sketch, ids);
    if (!moving.size) return sketch;
    const c = about ?? mirrorLine(sketch, ids, axis, lookup);
    if (c === undefined) return sketch;
    const k = axis === "leftRight" ? 0 : 1;
    const lr = axis === "leftRight";
    let changed = false;
    const next = edit(sketch, (d) => {
      for (const id of moving) {
        const l = findElement(sketch, id)!;
        const src = l.el as unknown as Record<string, unknown>;
        const out = { ...src };
        const val = (field: string) => () => lookup?.(id, field);
        const point = (p: Numeric[], field: string): [Numeric, Numeric] => {
          const q: [Numeric, Numeric] = [p[0], p[1]];
          q[k] = reflect(p[k], 2 * c, "m", sketch, val(`${field}[${k}]`));
          return q;
        };
        // a direction: 180° − a left–right, −a up–down
        const angle = (a: Numeric): Numeric => {
          if (typeof a === "number" || plainNumber(a) !== undefined) {
            const n = typeof a === "number" ? a : plainNumber(a)!;
            return roundTo(normaliseAngle(lr ? 180 - n : -n), 1e-6);
          }
          return reflect(a, lr ? 180 : 0, "deg", sketch, val("angle"));
        };
        const negate = (v: Numeric, field: string): Numeric => reflect(v, 0, "", sketch, val(field));

        if (l.kind === "body") {
          const outline = src.outline as Numeric[][];
          // the mirror image runs the other way round: the corners are listed backwards (the
          // first stays first) so the outline keeps its sense of rotation
          const flipped = outline.map((p, i) => point(p, `outline[${i}]`));
          out.outline = [flipped[0], ...flipped.slice(1).reverse()];
          if (src.cg) out.cg = point(src.cg as Numeric[], "cg");
        } else {
          for (const f of ["at", "from", "to"]) if (Array.isArray(src[f])) out[f] = point(src[f] as Numeric[], f);
          if (l.kind === "force") {
            // a force given by magnitude and direction turns; one given by components changes sign
            if (src.magnitude !== undefined || src.angle !== undefined) {
              const a = angle((src.angle as Numeric | undefined) ?? 0);
              if (src.angle !== undefined || a !== 0) out.angle = a;
            }
            const comp = lr ? "fx" : "fy";
            if (src[comp] !== undefined) out[comp] = negate(src[comp] as Numeric, comp);
          } else if (l.kind === "couple") {
            // a couple's sense flips in any mirror
            out.value = negate(src.value as Numeric, "value");
          } else if (l.kind === "distributed") {
            // default −90 (down the page): left–right keeps it, up–down makes it +90
            const a = angle((src.angle as Numeric | undefined) ?? -90);
            if (src.angle !== undefined || a !== -90) out.angle = a;
          } else if (src.angle !== undefined) {
            out.angle = angle(src.angle as Numeric);
          }
        }
        // a lone pin or fixed support is its own mirror image: nothing to change, no undo step
        if (JSON.stringify(out) === JSON.stringify(src)) continue;
        changed = true;
        (d[l.group] as AnyElement[])[l.index] = out as unknown as AnyElement;
      }
    });
    return changed ? next : sketch;
  },
});

/**
 * Where the hand check's point P goes with a mirror. The whole sketch mirrored: P is mirrored with
 * it (moments are then taken about the same place on the mirrored drawing). Only a selection
 * mirrored: P follows only when it sits on a point of what is mirrored (picked on a support, a
 * corner or a centre of gravity of it, as the pick snaps there); a P on what stays, or in open
 * space, stays. null (the default, the first support) stays null: it follows the support itself.
 */
export function mirroredMomentPoint(
  sketch: SketchFile,
  ids: readonly string[],
  axis: MirrorAxis,
  about: number,
  p: readonly [number, number] | null,
  lookup?: ValueOf,
): [number, number] | null {
  if (!p) return null;
  const k = axis === "leftRight" ? 0 : 1;
  const flipped: [number, number] = [p[0], p[1]];
  flipped[k] = roundTo(2 * about - p[k]);
  if (!ids.length) return flipped;
  const near = (a: number | undefined, b: number) => a !== undefined && Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(b));
  for (const id of mirroredIds(sketch, ids)) {
    const l = findElement(sketch, id);
    if (!l) continue;
    const pts = pointsOf(l.el, lookup);
    const cg = (l.el as unknown as { cg?: Numeric[] }).cg;
    if (cg) pts.push([coordOf(cg[0], id, "cg[0]", lookup), coordOf(cg[1], id, "cg[1]", lookup)]);
    if (pts.some(([x, y]) => near(x, p[0]) && near(y, p[1]))) return flipped;
  }
  return [p[0], p[1]];
}

/**
 * The expressions a mirror can neither rewrite nor replace by a value (they hold an error now):
 * they stay as they were, so the status line names them ("Discharge's direction").
 */
export function mirrorLeavesAlone(sketch: SketchFile, ids: readonly string[], axis: MirrorAxis, about: number, lookup?: ValueOf): string[] {
  const k = axis === "leftRight" ? 0 : 1;
  const out: string[] = [];
  const stuck = (v: unknown, id: string, field: string) =>
    typeof v === "string" && plainNumber(v) === undefined && carriesUnit(v, sketch) === null && lookup?.(id, field) === undefined;
  for (const id of mirroredIds(sketch, ids)) {
    const l = findElement(sketch, id);
    if (!l) continue;
    const r = l.el as unknown as Record<string, unknown>;
    const hit = new Set<string>();
    if (about !== 0) {
      (Array.isArray(r.outline) ? (r.outline as Numeric[][]) : []).forEach((p, i) => stuck(p[k], id, `outline[${i}][${k}]`) && hit.add("outline"));
      for (const f of ["at", "from", "to", "cg"]) if (Array.isArray(r[f]) && stuck((r[f] as Numeric[])[k], id, `${f}[${k}]`)) hit.add(f);
    }
    if (axis === "leftRight" && l.kind !== "couple" && stuck(r.angle, id, "angle")) hit.add("angle");
    for (const f of hit) out.push(`${l.el.label || id}'s ${FIELD_WORDS[f] ?? f}`);
  }
  return out;
}

/** A field a mirror cannot rewrite for the sketch and a case at once (see `mirrorMixedKinds`). */
export interface MixedKind {
  /** "nozzle's direction" */
  field: string;
  /** the case's name */
  caseName: string;
  /** the value has a unit in the sketch (and none in the case), or the other way round */
  unitInSketch: boolean;
  /** the parameters the case gives with the other kind of value than the sketch ("tilt") */
  parameters: string[];
}

/**
 * The expressions whose mirror cannot be written for the sketch and every operating case at once:
 * "k − x" needs k with a unit when x has one ("180 deg - theta") and a plain k when x is a plain
 * number ("180 - a"), so an expression that is a plain number in the sketch but has a unit in a case
 * (or the other way round) would break in one of them. The mirror is refused and these are named.
 * A negation ("-x", an up–down angle or a mirror about 0) fits both and is never named.
 */
export function mirrorMixedKinds(sketch: SketchFile, ids: readonly string[], axis: MirrorAxis, about: number): MixedKind[] {
  const cases = sketch.cases ?? [];
  if (!cases.length) return [];
  const k = axis === "leftRight" ? 0 : 1;
  const out: MixedKind[] = [];
  const mixed = (v: unknown): Omit<MixedKind, "field"> | null => {
    if (typeof v !== "string" || plainNumber(v) !== undefined) return null;
    const base = carriesUnit(v, sketch);
    if (base === null) return null;
    for (const c of cases) {
      if (!c.parameters || !Object.keys(c.parameters).length) continue;
      const merged = { ...(sketch.parameters ?? {}), ...c.parameters };
      const there = carriesUnit(v, sketch, merged);
      if (there === null || there === base) continue;
      const parameters = Object.keys(c.parameters).filter((name) => {
        const [a, b] = [carriesUnit(name, sketch), carriesUnit(name, sketch, merged)];
        return a !== null && b !== null && a !== b;
      });
      return { caseName: c.name, unitInSketch: base, parameters };
    }
    return null;
  };
  for (const id of mirroredIds(sketch, ids)) {
    const l = findElement(sketch, id);
    if (!l) continue;
    const r = l.el as unknown as Record<string, unknown>;
    const hit = new Map<string, Omit<MixedKind, "field">>();
    const check = (v: unknown, field: string) => {
      if (hit.has(field)) return;
      const why = mixed(v);
      if (why) hit.set(field, why);
    };
    if (about !== 0) {
      (Array.isArray(r.outline) ? (r.outline as Numeric[][]) : []).forEach((p) => check(p[k], "outline"));
      for (const f of ["at", "from", "to", "cg"]) if (Array.isArray(r[f])) check((r[f] as Numeric[])[k], f);
    }
    if (axis === "leftRight" && l.kind !== "couple") check(r.angle, "angle");
    for (const [f, why] of hit) out.push({ field: `${l.el.label || id}'s ${FIELD_WORDS[f] ?? f}`, ...why });
  }
  return out;
}

/** The status line's words for a mirror refused by `mirrorMixedKinds`. */
export function mixedKindsWords(mixed: readonly MixedKind[]): string {
  const first = mixed[0];
  const fields = mixed.map((m) => m.field).join(", ");
  const params = [...new Set(mixed.flatMap((m) => m.parameters))];
  const names = params.length ? params.join(" and ") : "the parameters they read";
  const [here, there] = first.unitInSketch ? ["with a unit", "as a plain number"] : ["as a plain number", "with a unit"];
  return (
    `Nothing was mirrored: ${fields} ${mixed.length === 1 ? "reads" : "read"} ${names} ${here} in the sketch but ${there} in case “${first.caseName}”, ` +
    `and no one mirror (“180 deg - x” or “180 - x”) is right in both. Give ${names} a unit in the sketch and in every case, or in none, then mirror again.`
  );
}

/** What a mirror leaves as it was, for the status line: the sketch's own directions and the underlay. */
export function mirrorKeeps(sketch: SketchFile, ids: readonly string[], axis: MirrorAxis): string {
  const kept: string[] = [];
  const g = sketch.gravityAngle;
  const gravityOn = sketch.gravity === undefined || plainNumber(sketch.gravity) !== 0;
  if (axis === "upDown" && gravityOn && sketch.bodies.length) kept.push("gravity still acts down the page");
  else if (axis === "leftRight" && gravityOn && g !== undefined && plainNumber(g) !== -90 && plainNumber(g) !== 90) kept.push("gravity keeps its direction");
  const m = sketch.motion;
  const along = axis === "leftRight" ? m?.ax : m?.ay;
  if (along !== undefined && plainNumber(along) !== 0) kept.push(`the body's acceleration ${axis === "leftRight" ? "ax" : "ay"} keeps its sign`);
  if (!ids.length && sketch.underlay) kept.push("the underlay is not mirrored");
  if (!kept.length) return "";
  const text = kept.join("; ");
  return ` ${text[0].toUpperCase()}${text.slice(1)}.`;
}
