// During a sweep, results share what does not change from one point to the next. A term or a
// warning equal in every field to the one the last solve made at the same place is replaced by
// that one. Results are never changed after a solve, so sharing is safe; a sweep keeps a thousand
// results, and most of their terms (every load the swept parameter does not touch) and warnings
// are then one object each, not a thousand: less memory held, far less for the collector to copy.
// Only sketches a sweeper has marked do this; a single solve pays one set lookup.
import type { EquationTerm, SolveWarning, Vec2 } from "./types";

const memos = new WeakMap<object, unknown[][]>();
const shared = new WeakSet<object>();

/** Mark (or unmark) a sketch whose solves should share unchanged terms and warnings. */
export function shareAcrossSolves(sketch: object, on: boolean): void {
  if (on) shared.add(sketch);
  else shared.delete(sketch);
}

export const isShared = (sketch: object) => shared.has(sketch);

/**
 * Replace each `items[i]` by the equal item the last call for `owner` and `slot` had at `i`; the
 * owner is an object a sweep keeps (a body, the sketch), so a new sketch starts afresh.
 */
export function reuseEqual<T>(owner: object, slot: number, items: T[], same: (a: T, b: T) => boolean): void {
  let lists = memos.get(owner);
  if (!lists) {
    lists = [];
    memos.set(owner, lists);
  }
  const prev = lists[slot] as T[] | undefined;
  if (prev) {
    const n = Math.min(prev.length, items.length);
    for (let i = 0; i < n; i++) if (prev[i] !== items[i] && same(prev[i], items[i])) items[i] = prev[i];
  }
  lists[slot] = items;
}

const sameAt = (a: Vec2 | undefined, b: Vec2 | undefined) => a === b || (a !== undefined && b !== undefined && a[0] === b[0] && a[1] === b[1]);

export const sameTerm = (a: EquationTerm, b: EquationTerm) =>
  a.fx === b.fx && a.fy === b.fy && a.m === b.m && a.id === b.id && a.kind === b.kind && a.label === b.label && a.body === b.body && sameAt(a.at, b.at);

export const sameWarning = (a: SolveWarning, b: SolveWarning) =>
  a.code === b.code && a.message === b.message && a.ids.length === b.ids.length && a.ids.every((id, k) => id === b.ids[k]);
