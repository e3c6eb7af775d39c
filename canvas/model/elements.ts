// The elements of a sketch as the editor sees them: one id space across the five lists of the
// file, a kind per element (the tray's words), and lookups that do not care which list holds it.
import { CURRENT_VERSION, type SketchFile } from "@/solver/schema";

export type Group = "bodies" | "supports" | "loads" | "ports" | "massSources";
export const GROUPS: readonly Group[] = ["bodies", "supports", "loads", "ports", "massSources"];

export type ElementKind =
  | "body"
  | "pin"
  | "roller"
  | "contact"
  | "fixed"
  | "tie"
  | "force"
  | "couple"
  | "distributed"
  | "inlet"
  | "outlet"
  | "massSource";

export type BodyEl = SketchFile["bodies"][number];
export type SupportEl = SketchFile["supports"][number];
export type LoadEl = SketchFile["loads"][number];
export type PortEl = SketchFile["ports"][number];
export type MassSourceEl = SketchFile["massSources"][number];
export type AnyElement = BodyEl | SupportEl | LoadEl | PortEl | MassSourceEl;
/** Elements that belong to a body. */
export type Attached = SupportEl | LoadEl | PortEl | MassSourceEl;

export const GROUP_OF: Record<ElementKind, Group> = {
  body: "bodies",
  pin: "supports",
  roller: "supports",
  contact: "supports",
  fixed: "supports",
  tie: "supports",
  force: "loads",
  couple: "loads",
  distributed: "loads",
  inlet: "ports",
  outlet: "ports",
  massSource: "massSources",
};

/** Words for each kind, as the tray, the outline and the status sentences use them. */
export const KIND_LABEL: Record<ElementKind, string> = {
  body: "Body",
  pin: "Pin",
  roller: "Roller",
  contact: "Contact",
  fixed: "Fixed support",
  tie: "Tie",
  force: "Point force",
  couple: "Couple",
  distributed: "Distributed load",
  inlet: "Inlet",
  outlet: "Outlet",
  massSource: "Mass source",
};

/** Kinds with a direction the rotate handle turns. */
export const DIRECTED: ReadonlySet<ElementKind> = new Set(["roller", "contact", "tie", "force", "inlet", "outlet", "distributed"]);

export interface Located {
  group: Group;
  index: number;
  kind: ElementKind;
  el: AnyElement;
}

export function kindOf(group: Group, el: AnyElement): ElementKind {
  if (group === "bodies") return "body";
  if (group === "massSources") return "massSource";
  return (el as SupportEl | LoadEl | PortEl).kind;
}

const indexCache = new WeakMap<SketchFile, Map<string, Located>>();

/** Every element by id (cached per sketch object, which commands never mutate). */
export function elementIndex(sketch: SketchFile): Map<string, Located> {
  let map = indexCache.get(sketch);
  if (map) return map;
  map = new Map();
  for (const group of GROUPS) {
    const list = sketch[group] as AnyElement[];
    list.forEach((el, index) => {
      if (!map!.has(el.id)) map!.set(el.id, { group, index, kind: kindOf(group, el), el });
    });
  }
  indexCache.set(sketch, map);
  return map;
}

/** Where each id was last found: a new sketch from a drag keeps its elements in place, so most lookups need no index. */
const lastPos = new Map<string, { group: Group; index: number }>();

/** Elements found without the full index, per sketch (the same object for the same question: React selectors rely on it). */
const partial = new WeakMap<SketchFile, Map<string, Located>>();

export function findElement(sketch: SketchFile, id: string): Located | undefined {
  const cached = indexCache.get(sketch);
  if (cached) return cached.get(id);
  let found = partial.get(sketch);
  const hit = found?.get(id);
  if (hit) return hit;
  const pos = lastPos.get(id);
  if (pos) {
    const el = (sketch[pos.group] as AnyElement[] | undefined)?.[pos.index];
    if (el && el.id === id && firstWithId(sketch, pos.group, pos.index, id)) {
      const l: Located = { group: pos.group, index: pos.index, kind: kindOf(pos.group, el), el };
      if (!found) partial.set(sketch, (found = new Map()));
      found.set(id, l);
      return l;
    }
  }
  const l = elementIndex(sketch).get(id);
  if (l) {
    if (lastPos.size > 10_000) lastPos.clear();
    lastPos.set(id, { group: l.group, index: l.index });
  }
  return l;
}

/** True when no earlier element holds the same id (ids should be unique; the first one wins). */
function firstWithId(sketch: SketchFile, group: Group, index: number, id: string): boolean {
  for (const g of GROUPS) {
    const list = sketch[g] as AnyElement[];
    const end = g === group ? index : list.length;
    for (let i = 0; i < end; i++) if (list[i].id === id) return false;
    if (g === group) return true;
  }
  return true;
}

/** Every element in file order (bodies first). */
export function allElements(sketch: SketchFile): Located[] {
  return [...elementIndex(sketch).values()];
}

/** Elements attached to a body. */
export function childrenOf(sketch: SketchFile, bodyId: string): Located[] {
  return allElements(sketch).filter((l) => l.group !== "bodies" && (l.el as Attached).body === bodyId);
}

/** The ids that exist, and the supports, loads and ports of the bodies among them (a body brings its elements). */
export function withAttached(sketch: SketchFile, ids: readonly string[]): Set<string> {
  const out = new Set<string>();
  for (const id of ids) {
    const l = findElement(sketch, id);
    if (!l) continue;
    out.add(id);
    if (l.group === "bodies") for (const c of childrenOf(sketch, id)) out.add(c.el.id);
  }
  return out;
}

const PREFIX: Record<Group, string> = { bodies: "b", supports: "s", loads: "l", ports: "p", massSources: "ms" };

/** The next free id for a group: b1, b2… (never reusing an id in the sketch or in `taken`). */
export function nextId(sketch: SketchFile, group: Group, taken: ReadonlySet<string> = new Set()): string {
  const used = elementIndex(sketch);
  const prefix = PREFIX[group];
  for (let i = 1; ; i++) {
    const id = `${prefix}${i}`;
    if (!used.has(id) && !taken.has(id)) return id;
  }
}

/** "Pin s1 (rear foot)" */
export function describeElement(l: Pick<Located, "kind" | "el">): string {
  const base = `${KIND_LABEL[l.kind]} ${l.el.id}`;
  return l.el.label ? `${base} (${l.el.label})` : base;
}

/** The short name a sentence uses: the label, or "contact s2". */
export function nameOf(l: Pick<Located, "kind" | "el">): string {
  return l.el.label || `${KIND_LABEL[l.kind].toLowerCase()} ${l.el.id}`;
}

export function emptySketch(title = "Untitled sketch"): SketchFile {
  return {
    format: "counterpoise.sketch",
    version: CURRENT_VERSION,
    title,
    parameters: {},
    bodies: [],
    supports: [],
    loads: [],
    ports: [],
    massSources: [],
  };
}
