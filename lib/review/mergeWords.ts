// The words for a field that you and a newer version both changed (a merge clash, `mergeSketch`'s
// paths such as "ports[p1].area" or "cases[c1].parameters.Q"): where it is, as the screens name it
// ("Outlet nozzle N1 (p1): area"), and both values with their units ("yours 1,963 mm²; v3 has
// 2,827 mm²"). One formatter for every place a clash reaches the user: the kept changes brought
// back, the conflict's "Stay and bring vN in", and the comparison of kept changes.
import { KIND_LABEL, kindOf, type AnyElement, type Group } from "@/canvas/model/elements";
import { parameterWords } from "@/canvas/studies/display";
import { blankWords, fieldWords } from "@/components/editor/fieldDefs";
import { formatNumber, type UnitSystem } from "@/solver/units";
import { kindAndName } from "@/solver/words";
import type { SketchFile } from "@/solver/schema";
import { FIELD_QUANTITY, pointText, quantityText } from "./compare";

const ELEMENT_GROUPS = new Set<string>(["bodies", "supports", "loads", "ports", "massSources"]);
const STUDY_GROUPS = new Set<string>(["cases", "combinations", "sweeps"]);

type Step = { key: string; id?: string };

/** "ports[p1].area" → [{ key: "ports", id: "p1" }, { key: "area" }]; ids hold anything but "]". */
function steps(path: string): Step[] {
  const out: Step[] = [];
  const re = /([^.[\]]+)(?:\[([^\]]*)\])?\.?/gy;
  let m: RegExpExecArray | null;
  while ((m = re.exec(path)) && m[0]) out.push(m[2] === undefined ? { key: m[1] } : { key: m[1], id: m[2] });
  return out;
}

const MISSING = Symbol("missing");

/** The value a clash path names in `doc` (MISSING where it is absent). */
function valueAt(doc: SketchFile, path: string): unknown {
  let at: unknown = doc;
  for (const s of steps(path)) {
    if (typeof at !== "object" || at === null) return MISSING;
    at = (at as Record<string, unknown>)[s.key];
    if (s.id !== undefined) at = Array.isArray(at) ? at.find((x) => (x as { id?: unknown })?.id === s.id) : undefined;
    if (at === undefined) return MISSING;
  }
  return at;
}

const find = <T extends { id: string }>(docs: SketchFile[], group: string, id: string): T | undefined => {
  for (const d of docs) {
    const hit = ((d as Record<string, unknown>)[group] as T[] | undefined)?.find((x) => x.id === id);
    if (hit) return hit;
  }
  return undefined;
};

/** "Outlet nozzle N1 (p1)", "Contact s2": the element's kind, its label and its id. */
export function elementWords(group: Group, el: AnyElement): string {
  const kind = KIND_LABEL[kindOf(group, el)];
  const label = el.label?.trim();
  return label && label !== el.id ? `${kindAndName(kind, label)} (${el.id})` : `${kind} ${el.id}`;
}

const SKETCH_FIELDS: Record<string, string> = { title: "Title", description: "Notes", gravity: "Gravity", gravityAngle: "Gravity direction", motion: "Motion of the body" };
const MOTION_FIELDS: Record<string, string> = { ax: "acceleration ax", ay: "acceleration ay", freeX: "free to move in x" };
const CASE_FIELDS: Record<string, string> = { name: "name", flowFactor: "flow factor", onlyInCombinations: "only in combinations", parameters: "changes of parameters", factors: "group factors" };
const COMBINATION_FIELDS: Record<string, string> = { name: "name", terms: "cases and factors", stability: "required factors of safety" };
const SWEEP_FIELDS: Record<string, string> = { parameter: "swept parameter", from: "from", to: "to", points: "points", case: "case", combination: "combination", quantities: "plotted quantities" };
const UNDERLAY_FIELDS: Record<string, string> = { upload: "file", metresPerPixel: "scale", origin: "corner", rotation: "turn", opacity: "opacity", hidden: "hidden", locked: "locked", calibration: "scale marks", width: "width", height: "height" };

/** What the clash path is about: its place in words, and the kind of element and field key (for units and blanks). */
type Place = { place: string; kind?: string; field?: string };

/** Fields that hold words, not values: shown in quotes. */
const TEXT_FIELDS = new Set(["title", "description", "label", "name"]);

function placeOf(path: string, docs: SketchFile[]): Place {
  const [head, ...rest] = steps(path);
  if (!head) return { place: "the sketch" };
  if (head.key === "parameters" && rest[0]) return { place: `Parameter ${rest[0].key}` };
  if (head.key in SKETCH_FIELDS && head.id === undefined) {
    if (head.key === "motion" && rest[0]) return { place: `${SKETCH_FIELDS.motion}: ${MOTION_FIELDS[rest[0].key] ?? rest[0].key}`, field: rest[0].key };
    return { place: SKETCH_FIELDS[head.key], field: head.key };
  }
  if (head.key === "stability") return rest[0] ? { place: `Required factor against ${rest[0].key}` } : { place: "Required factors of safety" };
  if (head.key === "underlay") return { place: rest[0] ? `Underlay: ${UNDERLAY_FIELDS[rest[0].key] ?? rest[0].key}` : "Underlay" };
  if (ELEMENT_GROUPS.has(head.key) && head.id !== undefined) {
    const el = find<AnyElement>(docs, head.key, head.id);
    if (!el) return { place: `${head.key} ${head.id}` };
    const name = elementWords(head.key as Group, el);
    const kind = kindOf(head.key as Group, el);
    if (!rest[0]) return { place: name, kind };
    return { place: `${name}: ${fieldWords(kind, rest[0].key)}`, kind, field: rest[0].key };
  }
  if (STUDY_GROUPS.has(head.key) && head.id !== undefined) {
    const item = find<{ id: string; name?: string; parameter?: string }>(docs, head.key, head.id);
    const name =
      head.key === "sweeps" ? `Sweep of ${item?.parameter ? parameterWords(item.parameter) : head.id}` : `${head.key === "cases" ? "Case" : "Combination"} “${item?.name ?? head.id}”`;
    const field = rest[0]?.key;
    if (!field) return { place: name };
    if (head.key === "cases" && (field === "parameters" || field === "factors") && rest[1])
      return { place: `${name}: ${field === "parameters" ? `change of ${rest[1].key}` : `factor of group ${rest[1].key}`}` };
    if (head.key === "combinations" && field === "stability" && rest[1]) return { place: `${name}: required factor against ${rest[1].key}` };
    const words = (head.key === "cases" ? CASE_FIELDS : head.key === "combinations" ? COMBINATION_FIELDS : SWEEP_FIELDS)[field] ?? field;
    return { place: `${name}: ${words}`, field };
  }
  return { place: path };
}

/** A value as its field shows it: a number in SI with its unit in `units`, an expression as written. */
function valueWords(v: unknown, where: Place & { whole: boolean }, units: UnitSystem): string {
  if (v === MISSING) {
    if (where.whole) return "removed";
    return (where.kind && where.field ? blankWords(where.kind, where.field) : null) ?? "blank";
  }
  if (where.whole) return "changed";
  // a study's own fields (a sweep's from and to) are no element's quantities
  const q = where.field && (where.kind || where.field in SKETCH_FIELDS || where.field in MOTION_FIELDS) ? FIELD_QUANTITY[where.field] : undefined;
  if (where.field === "outline" && Array.isArray(v)) return `${v.length} corners`;
  if (Array.isArray(v) && v.length === 2 && v.every((x) => typeof x === "number") && q) return pointText(v as number[], units);
  if (Array.isArray(v) && v.length === 2 && q) return `(${v.map((x) => String(x)).join(", ")})`;
  if (typeof v === "number") return q ? quantityText(v, q, units) : formatNumber(v, 6);
  if (typeof v === "boolean") return v ? "yes" : "no";
  // words in quotes; a value or an expression as written
  if (typeof v === "string") return v.trim() === "" ? "blank" : where.field && TEXT_FIELDS.has(where.field) ? `“${v}”` : v;
  if (Array.isArray(v)) return `${v.length} item${v.length === 1 ? "" : "s"}`;
  return "changed";
}

export interface ClashWords {
  /** "Outlet nozzle N1 (p1): area" */
  place: string;
  /** your value (kept), and the newer version's, in words with units */
  yours: string;
  theirs: string;
}

/**
 * One clash in words. `mine`: the merged document (your value stands there); `theirs`: the newer
 * version as saved. Elements and studies are named from whichever of the two still has them.
 */
export function clashWords(path: string, mine: SketchFile, theirs: SketchFile, units: UnitSystem = "SI"): ClashWords {
  const where = placeOf(path, [mine, theirs]);
  const last = steps(path).at(-1);
  // a whole element, case or sweep: one side removed it, the other changed it
  const whole = !!last && last.id !== undefined;
  const w = { ...where, whole };
  return { place: where.place, yours: valueWords(valueAt(mine, path), w, units), theirs: valueWords(valueAt(theirs, path), w, units) };
}

/** Each clash as one item: "Outlet nozzle N1 (p1): area (yours 1,963 mm²; v3 has 2,827 mm²)". */
export function clashItems(paths: readonly string[], mine: SketchFile, theirs: SketchFile, newer: string, units: UnitSystem = "SI"): string[] {
  return paths.map((p) => {
    const c = clashWords(p, mine, theirs, units);
    return `${c.place} (yours ${c.yours}; ${newer} has ${c.theirs})`;
  });
}

/**
 * The clashes as a sentence's list: "Outlet nozzle N1 (p1): area (yours 1,963 mm²; v3 has
 * 2,827 mm²); Parameter tip (yours 1.6 in; v3 has 1.8 in)". `newer`: how the newer version is
 * called ("v3"). `limit`: how many are named before "and N more" (all when omitted).
 */
export function clashList(paths: readonly string[], mine: SketchFile, theirs: SketchFile, newer: string, units: UnitSystem = "SI", limit?: number): string {
  const shown = limit === undefined ? paths : paths.slice(0, limit);
  const more = paths.length - shown.length;
  return clashItems(shown, mine, theirs, newer, units).join("; ") + (more > 0 ? ` and ${more} more` : "");
}
