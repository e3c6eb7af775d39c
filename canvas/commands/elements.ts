// Adding, deleting, duplicating and re-attaching elements.
import type { Numeric, SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { childrenOf, elementIndex, findElement, GROUP_OF, nextId, withAttached, type AnyElement, type Attached, type ElementKind, type Group } from "../model/elements";
import { defineCommand, edit, plural } from "./define";
import { shiftElement, type ValueOf } from "./move";

/** Ids in `after` that were not in `before`, in file order. */
export function newIds(before: SketchFile, after: SketchFile): string[] {
  const old = elementIndex(before);
  return [...elementIndex(after).keys()].filter((id) => !old.has(id));
}

export const addElement = defineCommand<{ kind: ElementKind; element: AnyElement }>({
  name: "addElement",
  label: ({ kind }) => `Add ${kind === "massSource" ? "mass source" : kind}`,
  undoable: true,
  run: (sketch, { kind, element }) => {
    const group = GROUP_OF[kind];
    const id = element.id && !findElement(sketch, element.id) ? element.id : nextId(sketch, group);
    return edit(sketch, (d) => {
      (d[group] as AnyElement[]).push({ ...element, id });
    });
  },
  select: (before, after) => newIds(before, after),
});

/**
 * What deleting elements does to the kept sweeps: a sweep that plots a deleted support stops
 * plotting it, and one left plotting nothing goes (as removing a case takes the sweeps run on it).
 * A sweep with no list of its own plots every support there is, and is left as it is.
 */
export function deletionEffects(sketch: SketchFile, ids: readonly string[]): { sweepsChanged: string[]; sweepsRemoved: string[] } {
  const gone = withAttached(sketch, [...ids]);
  const hit = (sketch.sweeps ?? []).filter((w) => w.quantities?.some((q) => gone.has(q.support)));
  const removed = hit.filter((w) => w.quantities!.every((q) => gone.has(q.support))).map((w) => w.id);
  return { sweepsChanged: hit.map((w) => w.id).filter((id) => !removed.includes(id)), sweepsRemoved: removed };
}

export const deleteElements = defineCommand<{ ids: string[] }>({
  name: "deleteElements",
  label: ({ ids }, sketch) => `Delete ${plural(withAttached(sketch, ids).size, "element")}`,
  undoable: true,
  run: (sketch, { ids }) => {
    const gone = withAttached(sketch, ids);
    if (!gone.size) return sketch;
    const { sweepsChanged, sweepsRemoved } = deletionEffects(sketch, ids);
    return edit(sketch, (d) => {
      for (const g of Object.keys(GROUP_NAMES) as Group[]) {
        const list = d[g] as AnyElement[];
        if (list.some((e) => gone.has(e.id))) d[g] = list.filter((e) => !gone.has(e.id)) as never;
      }
      if (!sweepsChanged.length && !sweepsRemoved.length) return;
      const sweeps = (sketch.sweeps ?? [])
        .filter((w) => !sweepsRemoved.includes(w.id))
        .map((w) => (sweepsChanged.includes(w.id) ? { ...w, quantities: w.quantities!.filter((q) => !gone.has(q.support)) } : w));
      if (sweeps.length) d.sweeps = sweeps;
      else delete d.sweeps;
    });
  },
  select: (_b, after, _a, selection) => selection.filter((id) => findElement(after, id)),
});

const GROUP_NAMES: Record<Group, true> = { bodies: true, supports: true, loads: true, ports: true, massSources: true };

/** A copy's label: its own when no element has it yet, else the next free number ("Body 1" → "Body 2", "Front foot" → "Front foot 2"). */
export function freshLabel(label: string, taken: ReadonlySet<string>): string {
  if (!taken.has(label)) return label;
  const m = /^(.*?)\s*(\d+)$/.exec(label);
  const stem = m ? m[1] : label;
  for (let n = m ? Number(m[2]) + 1 : 2; ; n++) if (!taken.has(`${stem} ${n}`)) return `${stem} ${n}`;
}

/** The labels every element of the sketch has. */
export function labelsIn(sketch: SketchFile): Set<string> {
  return new Set([...elementIndex(sketch).values()].map((l) => l.el.label).filter((x): x is string => !!x));
}

/** Copies given labels no element of the sketch (or an earlier copy) has already; changes them in place. */
export function relabelCopies(sketch: SketchFile, copies: ReadonlyArray<{ el: AnyElement }>): void {
  const taken = labelsIn(sketch);
  for (const c of copies) {
    if (!c.el.label) continue;
    c.el.label = freshLabel(c.el.label, taken);
    taken.add(c.el.label);
  }
}

/** The copies a duplicate makes: bodies bring their elements along. Deterministic, so `select` can replay it. */
export function planDuplicate(sketch: SketchFile, ids: readonly string[], offset: Vec2, lookup?: ValueOf) {
  const chosen = ids.filter((id) => findElement(sketch, id));
  const taken = new Set<string>();
  const copies: Array<{ group: Group; el: AnyElement }> = [];
  const copyOf = new Map<string, string>();
  const fresh = (group: Group) => {
    const id = nextId(sketch, group, taken);
    taken.add(id);
    return id;
  };
  const copy = (id: string, body?: string) => {
    const l = findElement(sketch, id)!;
    const nid = fresh(l.group);
    copyOf.set(id, nid);
    // shifted under the original's id, so an expression coordinate is read from the original's value
    const el = structuredClone(shiftElement(l.el, l.kind, offset, lookup)) as AnyElement;
    el.id = nid;
    if (l.group !== "bodies") (el as Attached).body = body ?? copyOf.get((el as Attached).body) ?? (el as Attached).body;
    copies.push({ group: l.group, el });
    return nid;
  };
  for (const id of chosen) {
    if (findElement(sketch, id)!.group !== "bodies" || copyOf.has(id)) continue;
    const nid = copy(id);
    for (const c of childrenOf(sketch, id)) if (!copyOf.has(c.el.id)) copy(c.el.id, nid);
  }
  for (const id of chosen) if (!copyOf.has(id)) copy(id);
  relabelCopies(sketch, copies);
  return { copies, copyOf, chosen };
}

/** `lookup` gives the values of expression coordinates: a copy of an element placed by an
 *  expression lands at its value plus the offset (as a number), not on the original. */
export const duplicateElements = defineCommand<{ ids: string[]; offset: Vec2; lookup?: ValueOf }>({
  name: "duplicateElements",
  label: ({ ids }) => `Duplicate ${plural(ids.length, "element")}`,
  undoable: true,
  run: (sketch, { ids, offset, lookup }) => {
    const { copies } = planDuplicate(sketch, ids, offset, lookup);
    if (!copies.length) return sketch;
    return edit(sketch, (d) => {
      for (const c of copies) (d[c.group] as AnyElement[]).push(c.el);
    });
  },
  select: (before, _after, { ids, offset }) => {
    const { copyOf, chosen } = planDuplicate(before, ids, offset);
    return chosen.map((id) => copyOf.get(id)!).filter(Boolean);
  },
});

export const attachToBody = defineCommand<{ ids: string[]; body: string }>({
  name: "attachToBody",
  label: ({ ids, body }) => `Attach ${plural(ids.length, "element")} to ${body}`,
  undoable: true,
  run: (sketch, { ids, body }) => {
    const target = findElement(sketch, body);
    if (!target || target.group !== "bodies") return sketch;
    const todo = ids.map((id) => findElement(sketch, id)).filter((l) => l && l.group !== "bodies" && (l.el as Attached).body !== body);
    if (!todo.length) return sketch;
    return edit(sketch, (d) => {
      for (const l of todo) ((d[l!.group] as AnyElement[])[l!.index] as Attached).body = body;
    });
  },
});

/** Copied elements (and the parameters they read that the sketch lacks) put in, as planned by `planPaste`. */
export const pasteElements = defineCommand<{ copies: Array<{ group: Group; el: AnyElement }>; parameters: Record<string, Numeric> }>({
  name: "pasteElements",
  label: ({ copies }) => `Paste ${plural(copies.length, "element")}`,
  undoable: true,
  run: (sketch, { copies, parameters }) => {
    if (!copies.length || copies.some((c) => findElement(sketch, c.el.id))) return sketch;
    return edit(sketch, (d) => {
      const own = (d.parameters ??= {});
      for (const [name, expr] of Object.entries(parameters)) if (!(name in own)) own[name] = expr;
      for (const c of copies) (d[c.group] as AnyElement[]).push(structuredClone(c.el));
    });
  },
  select: (_before, after, { copies }) => copies.map((c) => c.el.id).filter((id) => findElement(after, id)),
});
