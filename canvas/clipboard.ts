// Copy and paste of elements, within a sketch and between sketches (another tab, another
// workspace). What goes on the clipboard is plain JSON text: the chosen elements (a body brings its
// supports, loads and ports), the parameters their expressions read, and the format version, so a
// later Counterpoise migrates it like a file. A whole sketch file's text pastes too.
import { compileExpression } from "@/solver/expressions";
import { CURRENT_VERSION, FORMAT, type Numeric, type SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { resolveSketch } from "@/solver/resolve";
import { relabelCopies } from "./commands/elements";
import { shiftElement, type ValueOf } from "./commands/move";
import { checkSketchJson } from "./files";
import { fieldValuesById } from "./scene";
import { findElement, GROUPS, kindOf, nextId, type AnyElement, type Attached, type Group, withAttached } from "./model/elements";

/** The clipboard's format marker (a sketch file's is FORMAT). */
export const ELEMENTS_FORMAT = "counterpoise.elements";

export interface Fragment {
  format: typeof ELEMENTS_FORMAT;
  version: number;
  parameters: Record<string, Numeric>;
  bodies: SketchFile["bodies"];
  supports: SketchFile["supports"];
  loads: SketchFile["loads"];
  ports: SketchFile["ports"];
  massSources: SketchFile["massSources"];
}

/** Every expression text in a value (a field, a point, an outline). */
function textsIn(v: unknown, out: string[]) {
  if (typeof v === "string") out.push(v);
  else if (Array.isArray(v)) for (const x of v) textsIn(x, out);
}

const NUMERIC_KEYS = new Set(["id", "body", "kind", "label", "group"]);

/** The parameters the elements' expressions read, and the ones those read, by name. */
export function parametersUsed(params: Record<string, Numeric>, elements: readonly AnyElement[]): Record<string, Numeric> {
  const names = new Set(Object.keys(params));
  const depsOf = (text: string): string[] => {
    try {
      return compileExpression(text, names).deps;
    } catch {
      return []; // an expression in error reads nothing we can name
    }
  };
  const todo: string[] = [];
  for (const el of elements) {
    const texts: string[] = [];
    for (const [k, v] of Object.entries(el)) if (!NUMERIC_KEYS.has(k)) textsIn(v, texts);
    for (const t of texts) todo.push(...depsOf(t));
  }
  const out: Record<string, Numeric> = {};
  while (todo.length) {
    const name = todo.pop()!;
    if (name in out || !(name in params)) continue;
    out[name] = params[name];
    if (typeof params[name] === "string") todo.push(...depsOf(params[name] as string));
  }
  // in the order the sketch lists them
  return Object.fromEntries(Object.keys(params).filter((n) => n in out).map((n) => [n, out[n]]));
}

/** The chosen elements as a fragment: a body brings its elements along. Null when nothing is chosen. */
export function copyFragment(sketch: SketchFile, ids: readonly string[]): Fragment | null {
  const chosen = withAttached(sketch, ids);
  if (!chosen.size) return null;
  const pick = <G extends Group>(g: G) => (sketch[g] as AnyElement[]).filter((e) => chosen.has(e.id)).map((e) => structuredClone(e)) as unknown as SketchFile[G];
  const fragment: Fragment = {
    format: ELEMENTS_FORMAT,
    version: CURRENT_VERSION,
    parameters: {},
    bodies: pick("bodies"),
    supports: pick("supports"),
    loads: pick("loads"),
    ports: pick("ports"),
    massSources: pick("massSources"),
  };
  fragment.parameters = parametersUsed(sketch.parameters ?? {}, GROUPS.flatMap((g) => fragment[g] as AnyElement[]));
  return fragment;
}

export const fragmentText = (f: Fragment): string => JSON.stringify(f, null, 1);

export type ReadFragment = { ok: true; fragment: Fragment } | { ok: false; reason: string };

/**
 * Clipboard text as elements: a fragment from the editor, or a whole sketch file. Anything else is
 * not ours (null: the paste is left to the page); ours but broken says why.
 */
export function readFragment(text: string): ReadFragment | null {
  const trimmed = text.trim();
  if (!trimmed.startsWith("{")) return null;
  let json: Record<string, unknown>;
  try {
    json = JSON.parse(trimmed);
  } catch {
    return null;
  }
  if (!json || typeof json !== "object" || (json.format !== ELEMENTS_FORMAT && json.format !== FORMAT)) return null;
  // checked as a sketch file (migrated from an older version first): the same schema, the same words
  const checked = checkSketchJson({ ...json, format: FORMAT });
  if (!checked.ok) {
    const e = checked.errors[0];
    return { ok: false, reason: `The copied elements cannot be read: ${e.path ? e.path + " " : ""}${e.message}` };
  }
  const s = checked.sketch;
  return {
    ok: true,
    fragment: { format: ELEMENTS_FORMAT, version: CURRENT_VERSION, parameters: s.parameters ?? {}, bodies: s.bodies, supports: s.supports, loads: s.loads, ports: s.ports, massSources: s.massSources },
  };
}

/** The values of the fragment's expression fields, evaluated with the parameters copied with it. */
function fragmentValues(fragment: Fragment): ValueOf {
  const file: SketchFile = { format: FORMAT, version: CURRENT_VERSION, parameters: fragment.parameters, bodies: fragment.bodies, supports: fragment.supports, loads: fragment.loads, ports: fragment.ports, massSources: fragment.massSources };
  const { values } = fieldValuesById(file, resolveSketch(file).fields);
  return (id, field) => values.get(`${id}.${field}`);
}

export interface PastePlan {
  copies: Array<{ group: Group; el: AnyElement }>;
  /** parameters the target lacks, added with the elements */
  parameters: Record<string, Numeric>;
  /** names the target already has with another expression: the target's own are kept */
  conflicts: Array<{ name: string; kept: Numeric; copied: Numeric }>;
}

export type PasteOutcome = { ok: true; plan: PastePlan } | { ok: false; reason: string };

/** A point to tell whether a paste lands on the elements it was copied from. */
function spot(group: Group, el: AnyElement): string {
  const rec = el as unknown as Record<string, unknown>;
  return JSON.stringify(group === "bodies" ? rec.outline : (rec.at ?? rec.from ?? null));
}

/**
 * Where and how a fragment goes into a sketch: ids kept where free (else the next free ones),
 * elements whose body was not copied attached to `attachTo` (or the sketch's body of the same id,
 * or its only body), and moved by `step` until they no longer sit exactly on what is there.
 */
export function planPaste(target: SketchFile, fragment: Fragment, opts: { attachTo?: string; step: number }): PasteOutcome {
  const all = GROUPS.flatMap((g) => (fragment[g] as AnyElement[]).map((el) => ({ group: g, el })));
  if (!all.length) return { ok: false, reason: "The clipboard holds no elements." };
  const copiedBodies = new Set(fragment.bodies.map((b) => b.id));
  const orphans = all.filter((x) => x.group !== "bodies" && !copiedBodies.has((x.el as Attached).body));
  let host: string | undefined;
  if (orphans.length) {
    const isBody = (id: string | undefined) => !!id && findElement(target, id)?.group === "bodies";
    const sameId = (orphans[0].el as Attached).body;
    host = isBody(opts.attachTo) ? opts.attachTo : isBody(sameId) ? sameId : target.bodies.length === 1 ? target.bodies[0].id : undefined;
    if (!host) {
      return {
        ok: false,
        reason: target.bodies.length
          ? "Select the body the copied supports, loads and ports should go on, then paste again."
          : "Draw a body first: the copied supports, loads and ports need one to go on (or copy their body with them).",
      };
    }
  }

  // move the copies on until they no longer lie exactly on elements already there
  const taken = new Set(GROUPS.flatMap((g) => (target[g] as AnyElement[]).map((e) => `${g}:${spot(g, e)}`)));
  // a coordinate written as an expression cannot move by itself: moved copies take its value (as
  // copied, with the copied parameters) plus the offset; copies that need no move keep it as written
  const valueOf = fragmentValues(fragment);
  const first = all[0];
  let offset: Vec2 = [0, 0];
  for (let k = 1; k < 50 && taken.has(`${first.group}:${spot(first.group, shiftElement(first.el, kindOf(first.group, first.el), offset, valueOf))}`); k++) {
    offset = [2 * k * opts.step, -2 * k * opts.step];
  }

  const used = new Set<string>();
  const newId = new Map<string, string>();
  for (const { group, el } of all) {
    const id = !findElement(target, el.id) && !used.has(el.id) ? el.id : nextId(target, group, used);
    used.add(id);
    newId.set(el.id, id);
  }
  const copies = all.map(({ group, el }) => {
    const moved = structuredClone(shiftElement(el, kindOf(group, el), offset, valueOf)) as AnyElement;
    moved.id = newId.get(el.id)!;
    if (group !== "bodies") {
      const a = moved as Attached;
      a.body = copiedBodies.has(a.body) ? newId.get(a.body)! : host!;
    }
    return { group, el: moved };
  });
  relabelCopies(target, copies);

  const own = target.parameters ?? {};
  const parameters: Record<string, Numeric> = {};
  const conflicts: PastePlan["conflicts"] = [];
  for (const [name, expr] of Object.entries(parametersUsed(fragment.parameters, all.map((x) => x.el)))) {
    if (!(name in own)) parameters[name] = expr;
    else if (String(own[name]) !== String(expr)) conflicts.push({ name, kept: own[name], copied: expr });
  }
  return { ok: true, plan: { copies, parameters, conflicts } };
}

/** What the status line says after a paste. */
export function pasteNotice(plan: PastePlan): string {
  const n = plan.copies.length;
  const added = Object.keys(plan.parameters);
  const parts = [`Pasted ${n} element${n === 1 ? "" : "s"}`];
  if (added.length) parts.push(`with the parameter${added.length === 1 ? "" : "s"} ${added.join(", ")}`);
  let text = parts.join(" ") + ".";
  if (plan.conflicts.length) {
    text += ` Kept this sketch's own ${plan.conflicts.map((c) => `${c.name} = ${c.kept} (the copy had ${c.copied})`).join(", ")}.`;
  }
  return text;
}
