// Editing values: one field of an element, the sketch's own fields, motion and parameters.
import { formatPath, type Numeric, type SketchFile } from "@/solver/schema";
import { parseSketch } from "@/solver/parse";
import { findElement, type AnyElement, type Group } from "../model/elements";
import { roundTo } from "../model/numeric";
import { PORT_PLACEHOLDER } from "../model/factory";
import { defineCommand, edit } from "./define";

export type FieldPath = string | ReadonlyArray<string | number>;
export type FieldValue = Numeric | boolean | null | undefined | Numeric[] | Numeric[][];

const pathOf = (p: FieldPath) => (typeof p === "string" ? [p] : [...p]);
const WORDS: Record<string, string> = {
  at: "position",
  cg: "centre of gravity",
  massFlow: "mass flow",
  volumeFlow: "volume flow",
  beta: "momentum-flux factor",
  mu: "friction",
  rotationalStiffness: "rotational stiffness",
  from: "start",
  to: "end",
  outline: "outline",
};
/** "the position (x)", "the mass flow", "corner 3 (y) of the outline" — for the undo history. */
const pathText = (p: FieldPath) => {
  const [head, i, j] = pathOf(p);
  const word = WORDS[String(head)] ?? String(head);
  if (head === "outline" && typeof i === "number") return `corner ${i + 1}${typeof j === "number" ? ` (${j ? "y" : "x"})` : ""}`;
  if (typeof i === "number") return `the ${word} (${i ? "y" : "x"})`;
  return `the ${word}`;
};

/** Keys a blank never deletes, by list (what the file format requires). */
const REQUIRED: Record<Group, ReadonlySet<string>> = {
  bodies: new Set(["id", "outline", "mass"]),
  supports: new Set(["id", "kind", "body", "at", "angle"]),
  loads: new Set(["id", "kind", "body", "at", "value", "from", "to", "w1", "w2"]),
  ports: new Set(["id", "kind", "body", "at", "angle"]),
  massSources: new Set(["id", "body", "massFlow"]),
};

/** What holds the last key of `path` inside the element `l` of the draft, or null where the path breaks off. */
function parentOf(d: SketchFile, l: { group: Group; index: number }, path: Array<string | number>): Record<string | number, unknown> | null {
  let target = (d[l.group] as unknown as AnyElement[])[l.index] as unknown as Record<string | number, unknown>;
  for (const k of path.slice(0, -1)) {
    if (target[k] === undefined || target[k] === null) return null;
    target = target[k] as Record<string | number, unknown>;
  }
  return target;
}

export const setField = defineCommand<{ id: string; field: FieldPath; value: FieldValue }>({
  name: "setField",
  label: ({ id, field }) => `Change ${pathText(field)} of ${id}`,
  undoable: true,
  run: (sketch, { id, field, value }) => {
    const l = findElement(sketch, id);
    if (!l) return sketch;
    const path = pathOf(field);
    if (path[0] === "id" || path[0] === "kind") return sketch;
    return edit(sketch, (d) => {
      const target = parentOf(d, l, path);
      if (!target) return;
      const last = path[path.length - 1];
      if (value === undefined || value === null || value === "") {
        if (path.length === 1 && REQUIRED[l.group].has(String(last))) return;
        if (path.length === 1) delete target[last];
        return;
      }
      target[last] = value;
      // a port described another way (ρ·Q, or ρ with A and V): the placed ṁ and V, still as placed,
      // would come first and hide what was typed (the contract takes massFlow before ρ·Q)
      if (l.group === "ports" && path.length === 1 && (last === "volumeFlow" || last === "density")) {
        for (const k of ["massFlow", "velocity"] as const) if (target[k] === PORT_PLACEHOLDER[k] && !(k === "velocity" && last === "density" && target.volumeFlow === undefined)) delete target[k];
      }
      // ρ and A with a typed ṁ fix V (V = ṁ/(ρA)), and with a typed V fix ṁ: the other placed value,
      // still as placed, would disagree with them and be the one solved
      if (l.group === "ports" && path.length === 1 && target.density !== undefined && target.area !== undefined) {
        const typed = (k: "massFlow" | "velocity") => target[k] !== undefined && target[k] !== PORT_PLACEHOLDER[k];
        if (target.velocity === PORT_PLACEHOLDER.velocity && typed("massFlow") && last !== "velocity") delete target.velocity;
        if (target.massFlow === PORT_PLACEHOLDER.massFlow && typed("velocity") && last !== "massFlow") delete target.massFlow;
      }
    });
  },
});

/** Switch a force between magnitude + angle and components fx, fy (values in N and degrees). */
export const setForceForm = defineCommand<{ id: string; form: "polar" | "components"; magnitude: number; angle: number }>({
  name: "setForceForm",
  label: ({ id, form }) => `Give ${id} as ${form === "polar" ? "magnitude and angle" : "components"}`,
  undoable: true,
  run: (sketch, { id, form, magnitude, angle }) => {
    const l = findElement(sketch, id);
    if (!l || l.kind !== "force") return sketch;
    const m = Number.isFinite(magnitude) ? magnitude : 0;
    const a = Number.isFinite(angle) ? angle : 0;
    return edit(sketch, (d) => {
      const f = d.loads[l.index] as Record<string, unknown>;
      delete f.magnitude;
      delete f.angle;
      delete f.fx;
      delete f.fy;
      if (form === "polar") {
        f.magnitude = roundTo(m, 1e-6);
        f.angle = roundTo(a, 1e-3);
      } else {
        const rad = (a * Math.PI) / 180;
        f.fx = roundTo(m * Math.cos(rad), 1e-6);
        f.fy = roundTo(m * Math.sin(rad), 1e-6);
      }
    });
  },
});

type SketchField = "title" | "description" | "gravity" | "gravityAngle";

export const setSketchField = defineCommand<{ field: SketchField; value: string | Numeric | undefined }>({
  name: "setSketchField",
  label: ({ field }) => `Change the sketch's ${field}`,
  undoable: true,
  run: (sketch, { field, value }) =>
    edit(sketch, (d) => {
      if (value === undefined || value === "") delete d[field];
      else (d as Record<string, unknown>)[field] = value;
    }),
});

export const setMotion = defineCommand<{ motion: SketchFile["motion"] | undefined }>({
  name: "setMotion",
  label: () => "Change the motion",
  undoable: true,
  run: (sketch, { motion }) =>
    edit(sketch, (d) => {
      const clean = motion ? Object.fromEntries(Object.entries(motion).filter(([, v]) => v !== undefined && v !== "" && v !== false)) : {};
      if (Object.keys(clean).length) d.motion = clean as SketchFile["motion"];
      else delete d.motion;
    }),
});

const NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;

export const setParameter = defineCommand<{ name: string; expression: Numeric }>({
  name: "setParameter",
  label: ({ name }) => `Set parameter ${name}`,
  undoable: true,
  run: (sketch, { name, expression }) => {
    if (!NAME.test(name)) return sketch;
    return edit(sketch, (d) => {
      d.parameters = { ...(d.parameters ?? {}), [name]: expression };
    });
  },
});

export const deleteParameter = defineCommand<{ name: string }>({
  name: "deleteParameter",
  label: ({ name }) => `Delete parameter ${name}`,
  undoable: true,
  run: (sketch, { name }) => {
    if (!sketch.parameters || !(name in sketch.parameters)) return sketch;
    return edit(sketch, (d) => {
      delete d.parameters![name];
    });
  },
});

/** Rename a parameter everywhere it is read: every expression in the sketch follows. */
export const renameParameter = defineCommand<{ from: string; to: string }>({
  name: "renameParameter",
  label: ({ from, to }) => `Rename parameter ${from} to ${to}`,
  undoable: true,
  run: (sketch, { from, to }) => {
    const params = sketch.parameters ?? {};
    if (!(from in params) || !NAME.test(to) || to in params || from === to) return sketch;
    const word = new RegExp(`(?<![A-Za-z0-9_.])${from}(?![A-Za-z0-9_])`, "g");
    const rewrite = (x: unknown): unknown => {
      if (typeof x === "string") return x.replace(word, to);
      if (Array.isArray(x)) return x.map(rewrite);
      if (x && typeof x === "object") return Object.fromEntries(Object.entries(x).map(([k, v]) => [k, k === "id" || k === "label" || k === "body" || k === "kind" ? v : rewrite(v)]));
      return x;
    };
    // keep the parameter's place in the table
    const renamed = (ps: Record<string, Numeric>): Record<string, Numeric> => Object.fromEntries(Object.entries(ps).map(([k, v]) => [k === from ? to : k, v] as const));
    const { parameters: _p, title: _t, description: _d, format: _f, ...rest } = sketch;
    const out = { ...sketch, ...(rewrite(rest) as object), parameters: renamed(Object.fromEntries(Object.entries(params).map(([k, v]) => [k, rewrite(v) as Numeric]))) as SketchFile["parameters"] } as SketchFile;
    // an operating case sets parameters by name (its values were rewritten with the rest): the one
    // it set for the old name is now for the new one, in the same place
    if (out.cases) out.cases = out.cases.map((c) => (c.parameters && from in c.parameters ? { ...c, parameters: renamed(c.parameters) } : c));
    return out;
  },
});

/** One numeric field, found again in any sketch of the history (an element's by its id). */
export interface FieldAccess {
  /** the field's value in a sketch, or null when its element is not in that sketch */
  read: (sketch: SketchFile) => { value: Numeric | undefined } | null;
  /** the sketch with the field set to a value (deleted when undefined) */
  write: (sketch: SketchFile, value: Numeric | undefined) => SketchFile;
  /** the field's path as the solver names it in a sketch ("bodies[0].mass"), or null */
  path: (sketch: SketchFile) => string | null;
}

const numericAt = (x: unknown): { value: Numeric | undefined } | null =>
  x === undefined || typeof x === "number" || typeof x === "string" ? { value: x as Numeric | undefined } : null;

/** An element's field: `path` inside the element ("mass", ["at", 0], ["outline", 2, 1]). */
export function elementField(id: string, field: FieldPath): FieldAccess {
  const path = pathOf(field);
  return {
    read: (sketch) => {
      const l = findElement(sketch, id);
      if (!l) return null;
      let t: unknown = l.el;
      for (const k of path) t = t === undefined || t === null ? undefined : (t as Record<string | number, unknown>)[k];
      return numericAt(t);
    },
    write: (sketch, value) => {
      const l = findElement(sketch, id);
      if (!l) return sketch;
      return edit(sketch, (d) => {
        const t = parentOf(d, l, path);
        if (!t) return;
        const last = path[path.length - 1];
        if (value === undefined) delete t[last];
        else t[last] = value;
      });
    },
    path: (sketch) => {
      const l = findElement(sketch, id);
      return l ? formatPath([l.group, l.index, ...path]) : null;
    },
  };
}

/** A field of the sketch itself (gravity, its direction) or of its motion ("motion.ax"). */
export function sketchField(field: "gravity" | "gravityAngle" | "motion.ax" | "motion.ay"): FieldAccess {
  const motion = field.startsWith("motion.") ? (field.slice(7) as "ax" | "ay") : null;
  return {
    read: (sketch) => numericAt(motion ? sketch.motion?.[motion] : sketch[field as "gravity" | "gravityAngle"]),
    write: (sketch, value) =>
      motion
        ? setMotion.run(sketch, { motion: { ...(sketch.motion ?? {}), [motion]: value } })
        : setSketchField.run(sketch, { field: field as "gravity" | "gravityAngle", value }),
    path: () => field,
  };
}

/** At most this many different values of a field are tried, newest first. */
const LAST_GOOD_TRIES = 50;

/**
 * The field's last good value: the newest value it held that evaluates with no error at the field
 * when put in the sketch as it is now (so the parameters it reads still exist), walking back
 * through the undo history. `visit` (the coalesce key of the edit under way) leaves out what that
 * edit stored: Escape and a refused blank go back to before it. Null when no value was good.
 */
export function lastGoodValue(
  history: { sketch: SketchFile; past: ReadonlyArray<{ before: SketchFile; coalesce?: string }> },
  field: FieldAccess,
  visit?: string,
): { value: Numeric | undefined } | null {
  const { sketch, past } = history;
  const path = field.path(sketch);
  if (!path) return null;
  let i = past.length - 1;
  const earlier: SketchFile[] = [];
  if (visit !== undefined && i >= 0 && past[i].coalesce === visit) earlier.push(past[i--].before);
  else earlier.push(sketch);
  for (; i >= 0; i--) earlier.push(past[i].before);
  const tried = new Set<string>();
  for (const s of earlier) {
    const got = field.read(s);
    if (!got) continue;
    const key = got.value === undefined ? "" : `${typeof got.value}:${got.value}`;
    if (tried.has(key)) continue;
    if (tried.size >= LAST_GOOD_TRIES) break;
    tried.add(key);
    const withIt = field.write(sketch, got.value);
    if (field.read(withIt)?.value !== got.value) continue;
    const parsed = parseSketch(withIt);
    if (parsed.ok || !parsed.errors.some((e) => e.path === path)) return got;
  }
  return null;
}

export const replaceSketch = defineCommand<{ sketch: SketchFile; label: string }>({
  name: "replaceSketch",
  label: ({ label }) => label,
  undoable: true,
  replacesSketch: true,
  run: (_sketch, { sketch }) => sketch,
  select: () => [],
});
