// Work kept after a save conflict, brought back on top of the newest version: a three-way merge of
// sketch documents. What you changed since the version you started from is applied to the newest
// one; what a colleague changed and you did not stays theirs. Lists of elements (bodies, supports,
// loads, ports, cases…) merge by id; objects (parameters, fields of an element) key by key. Where
// both changed the same field differently, yours is kept and the field is named, so nobody's work
// goes without a word.
import equal from "fast-deep-equal";
import type { SketchFile } from "@/solver/schema";

export interface MergeResult {
  sketch: SketchFile;
  /** paths both sides changed differently ("parameters.tip", "supports[foot].mu"): yours kept */
  conflicts: string[];
}

type Json = unknown;
const isObject = (v: Json): v is Record<string, Json> => typeof v === "object" && v !== null && !Array.isArray(v);
const hasIds = (v: Json): v is Array<Record<string, Json> & { id: string }> => Array.isArray(v) && v.every((x) => isObject(x) && typeof x.id === "string");
/** a key that is absent and a key set to undefined are the same */
const MISSING = Symbol("missing");

function mergeValue(base: Json, mine: Json, theirs: Json, path: string, conflicts: string[]): Json {
  if (equal(mine, base)) return theirs;
  if (equal(theirs, base) || equal(mine, theirs)) return mine;
  if (isObject(base) && isObject(mine) && isObject(theirs)) return mergeObject(base, mine, theirs, path, conflicts);
  if (hasIds(base) && hasIds(mine) && hasIds(theirs)) return mergeById(base, mine, theirs, path, conflicts);
  conflicts.push(path);
  return mine;
}

function mergeObject(base: Record<string, Json>, mine: Record<string, Json>, theirs: Record<string, Json>, path: string, conflicts: string[]) {
  const out: Record<string, Json> = {};
  const keys = [...new Set([...Object.keys(theirs), ...Object.keys(mine), ...Object.keys(base)])];
  for (const k of keys) {
    const pick = (o: Record<string, Json>) => (k in o && o[k] !== undefined ? o[k] : MISSING);
    const v = mergeValue(pick(base), pick(mine), pick(theirs), path ? `${path}.${k}` : k, conflicts);
    if (v !== MISSING) out[k] = v;
  }
  return out;
}

function mergeById(base: Array<{ id: string }>, mine: Array<{ id: string }>, theirs: Array<{ id: string }>, path: string, conflicts: string[]) {
  const byId = (list: Array<{ id: string }>) => new Map(list.map((x) => [x.id, x as Json]));
  const [b, m, t] = [byId(base), byId(mine), byId(theirs)];
  // theirs' order, then what only you added, in your order
  const ids = [...new Set([...theirs.map((x) => x.id), ...mine.map((x) => x.id)])];
  const out: Json[] = [];
  for (const id of ids) {
    const v = mergeValue(b.get(id) ?? MISSING, m.get(id) ?? MISSING, t.get(id) ?? MISSING, `${path}[${id}]`, conflicts);
    if (v !== MISSING) out.push(v);
  }
  return out;
}

/** Your changes from `base` to `mine`, applied to `theirs` (the newest version). */
export function mergeSketch(base: SketchFile, mine: SketchFile, theirs: SketchFile): MergeResult {
  const conflicts: string[] = [];
  const sketch = mergeValue(base, mine, theirs, "", conflicts) as SketchFile;
  return { sketch, conflicts };
}
