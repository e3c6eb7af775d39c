// Results share what does not change between solves of one sketch. A term or a warning equal in
// every field to the one the last solve of the same sketch made in its place is replaced by that
// one. Results are never changed after a solve, so sharing is safe; a sweep keeps a thousand
// results, and most of their terms (every load the swept parameter does not touch) and warnings
// are then one object each, not a thousand: less memory held, far less for the collector to copy.
import type { EquationTerm, SolveWarning, Vec2 } from "./types";

const memos = new WeakMap<object, Map<string, unknown>>();

/** Replace each `items[i]` by the equal item the last call for `owner` and `list` kept at its key. */
export function reuseEqual<T>(owner: object, list: string, items: T[], keyOf: (t: T, i: number) => string, same: (a: T, b: T) => boolean): void {
  let memo = memos.get(owner);
  if (!memo) {
    memo = new Map();
    memos.set(owner, memo);
  }
  for (let i = 0; i < items.length; i++) {
    const t = items[i];
    const key = `${list}:${keyOf(t, i)}`;
    const prev = memo.get(key) as T | undefined;
    if (prev !== undefined && same(prev, t)) items[i] = prev;
    else memo.set(key, t);
  }
}

const sameAt = (a: Vec2 | undefined, b: Vec2 | undefined) => a === b || (a !== undefined && b !== undefined && a[0] === b[0] && a[1] === b[1]);

export const termKey = (t: EquationTerm, i: number) => `${i}:${t.body}:${t.id}:${t.kind}`;
export const sameTerm = (a: EquationTerm, b: EquationTerm) =>
  a.id === b.id && a.body === b.body && a.kind === b.kind && a.label === b.label && a.fx === b.fx && a.fy === b.fy && a.m === b.m && sameAt(a.at, b.at);

export const warningKey = (w: SolveWarning, i: number) => `${i}:${w.code}`;
export const sameWarning = (a: SolveWarning, b: SolveWarning) =>
  a.code === b.code && a.message === b.message && a.ids.length === b.ids.length && a.ids.every((id, k) => id === b.ids[k]);
