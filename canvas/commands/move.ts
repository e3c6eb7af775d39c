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
