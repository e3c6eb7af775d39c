// Moving elements. A drag computes every frame from the element as it was on pointer-down
// plus the total delta, so rounding never accumulates.
import type { Numeric, SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { findElement, withAttached, type AnyElement, type Attached, type ElementKind } from "../model/elements";
import { plainNumber, roundTo } from "../model/numeric";
import { defineCommand, edit, plural } from "./define";

/**
 * Values of expression fields, by element id and field ("s2", "at[0]"): a moved coordinate that
 * was an expression becomes a number (its value plus the move). Without a value it stays put.
 */
export type ValueOf = (id: string, field: string) => number | undefined;

const shift = (v: Numeric, d: number, id: string, field: string, valueOf?: ValueOf): Numeric => {
  if (d === 0) return v;
  const base = typeof v === "number" ? v : (valueOf?.(id, field) ?? plainNumber(v));
  return base === undefined || !Number.isFinite(base) ? v : roundTo(base + d);
};

function shiftPoint(p: readonly Numeric[], delta: Vec2, id: string, field: string, valueOf?: ValueOf): [Numeric, Numeric] {
  return [shift(p[0], delta[0], id, `${field}[0]`, valueOf), shift(p[1], delta[1], id, `${field}[1]`, valueOf)];
}

/** The element moved by delta (a new object; the input is not changed). */
export function shiftElement<T extends AnyElement>(el: T, kind: ElementKind, delta: Vec2, valueOf?: ValueOf): T {
  const out = { ...el } as Record<string, unknown>;
  const id = el.id;
  if (kind === "body") {
    const b = el as unknown as { outline: Numeric[][]; cg?: Numeric[] };
    out.outline = b.outline.map((p, i) => shiftPoint(p, delta, id, `outline[${i}]`, valueOf));
    if (b.cg) out.cg = shiftPoint(b.cg, delta, id, "cg", valueOf);
  } else if (kind === "distributed") {
    const l = el as unknown as { from: Numeric[]; to: Numeric[] };
    out.from = shiftPoint(l.from, delta, id, "from", valueOf);
    out.to = shiftPoint(l.to, delta, id, "to", valueOf);
  } else if ((el as { at?: Numeric[] }).at) {
    out.at = shiftPoint((el as unknown as { at: Numeric[] }).at, delta, id, "at", valueOf);
  }
  return out as T;
}

export interface MoveArgs {
  ids: string[];
  delta: Vec2;
  lookup?: ValueOf;
}

export const moveElement = defineCommand<MoveArgs>({
  name: "moveElement",
  label: ({ ids }) => (ids.length === 1 ? `Move ${ids[0]}` : `Move ${plural(ids.length, "element")}`),
  undoable: true,
  run: (sketch, { ids, delta, lookup }) => {
    if (delta[0] === 0 && delta[1] === 0) return sketch;
    // a body carries its supports, loads and ports with it
    const moving = withAttached(sketch, ids);
    if (!moving.size) return sketch;
    return edit(sketch, (d) => {
      for (const id of moving) {
        const l = findElement(sketch, id)!;
        (d[l.group] as AnyElement[])[l.index] = shiftElement(l.el, l.kind, delta, lookup);
      }
    });
  },
});

export const moveCentreOfGravity = defineCommand<{ id: string; to: Vec2 | null }>({
  name: "moveCentreOfGravity",
  label: ({ id, to }) => (to ? `Move the centre of gravity of ${id}` : `Use the centroid of ${id} as its centre of gravity`),
  undoable: true,
  run: (sketch, { id, to }) => {
    const l = findElement(sketch, id);
    if (!l || l.group !== "bodies") return sketch;
    return edit(sketch, (d) => {
      const b = d.bodies[l.index];
      if (to) b.cg = [roundTo(to[0]), roundTo(to[1])];
      else delete b.cg;
    });
  },
});

/** The body an attached element belongs to, or undefined. */
export function bodyOf(sketch: SketchFile, id: string): string | undefined {
  const l = findElement(sketch, id);
  return l && l.group !== "bodies" ? (l.el as Attached).body : undefined;
}

/** A field of an element that was an expression and that a turn or a move wrote as a number. */
export interface ReplacedExpression {
  id: string;
  /** the field's name in the file: "angle", "at", "outline", "from", "to", "cg", "fx", "fy" */
  field: string;
  was: string;
  /** the sketch's parameters the expression read */
  parameters: string[];
}

/** The expressions of the given elements (and what sits on them) that `after` holds as numbers instead. */
export function expressionsReplaced(before: SketchFile, after: SketchFile, ids: readonly string[]): ReplacedExpression[] {
  if (before === after) return [];
  const params = Object.keys(before.parameters ?? {});
  const out: ReplacedExpression[] = [];
  for (const id of withAttached(before, [...ids])) {
    const was = findElement(before, id);
    const now = findElement(after, id);
    if (!was || !now) continue;
    for (const [field, v] of Object.entries(was.el as Record<string, unknown>)) {
      if (field === "id" || field === "label" || field === "body" || field === "kind") continue;
      const exprs = new Set<string>();
      const walk = (a: unknown, b: unknown) => {
        if (Array.isArray(a)) a.forEach((x, i) => walk(x, Array.isArray(b) ? b[i] : undefined));
        else if (typeof a === "string" && typeof b === "number" && plainNumber(a) === undefined) exprs.add(a);
      };
      walk(v, (now.el as Record<string, unknown>)[field]);
      if (!exprs.size) continue;
      const text = [...exprs].join(", ");
      const read = params.filter((p) => new RegExp(`(?<![A-Za-z0-9_.])${p}(?![A-Za-z0-9_])`).test(text));
      out.push({ id, field, was: text, parameters: read });
    }
  }
  return out;
}

/** A field of an element in words: "Discharge's direction". */
export const FIELD_WORDS: Record<string, string> = { angle: "direction", at: "position", outline: "corners", from: "start", to: "end", cg: "centre of gravity", fx: "x component", fy: "y component" };

/**
 * What a turn or a move did to expressions, for the status line (two lines; empty when it replaced
 * none): "Lance tip's direction is now a number, not “theta”: 3 cases and the kept sweep that set
 * theta no longer change it. Undo brings “theta” back."
 */
export function replacedWords(before: SketchFile, after: SketchFile, ids: readonly string[]): string {
  const hit = expressionsReplaced(before, after, ids);
  if (!hit.length) return "";
  const params = [...new Set(hit.flatMap((h) => h.parameters))];
  const whose = (h: ReplacedExpression) => `${findElement(before, h.id)!.el.label || h.id}'s ${FIELD_WORDS[h.field] ?? h.field}`;
  const head =
    hit.length === 1
      ? `${whose(hit[0])} is now a number, not “${hit[0].was}”`
      : `${hit.map(whose).join(", ")} are now numbers, not the expressions they were`;
  const back = `Undo brings ${hit.length === 1 ? `“${hit[0].was}”` : "them"} back.`;
  const names = params.join(" and ");
  const cases = (before.cases ?? []).filter((c) => params.some((p) => c.parameters && p in c.parameters)).length;
  const sweeps = (before.sweeps ?? []).filter((w) => params.includes(w.parameter)).length;
  const studies = [cases ? (cases === 1 ? "the case" : `${cases} cases`) : "", sweeps ? (sweeps === 1 ? "the kept sweep" : `${sweeps} kept sweeps`) : ""].filter(Boolean).join(" and ");
  const one = cases + sweeps === 1;
  const reach = studies ? `: ${studies} that ${one ? "sets" : "set"} ${names} no longer ${one ? "changes" : "change"} ${hit.length === 1 ? "it" : "them"}` : "";
  return `${head[0].toUpperCase()}${head.slice(1)}${reach}. ${back}`;
}
