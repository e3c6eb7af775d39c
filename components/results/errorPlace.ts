// Where an input error is, in the words of the screen: "Point force F1 — magnitude" rather than
// the file path "loads[0].magnitude", so a person can find the field without knowing the format.
import type { SketchFile } from "@/solver/schema";
import { kindOf, KIND_LABEL, type AnyElement, type Group } from "@/canvas/model/elements";
import { FORCE_COMPONENTS, FORCE_POLAR, FORM } from "@/components/editor/fieldDefs";
import { kindAndName } from "@/solver/words";
import { FIELD_KIND_BY_NAME } from "@/solver/resolve";
import { suggestUnitsFor } from "@/solver/expressionErrors";

const ELEMENT_PATH = /^(bodies|supports|loads|ports|massSources)\[(\d+)\](?:\.([A-Za-z]+))?((?:\[\d+\])*)(?:\.(.+))?$/;

/** Lower-case the first letter of a field's label unless it is a symbol or an acronym ("Fx", "μ"). */
function asWord(label: string): string {
  return /^[A-Z][a-z ]/.test(label) ? label[0].toLowerCase() + label.slice(1) : label;
}

function fieldWords(kind: ReturnType<typeof kindOf>, key: string, indices: number[]): string {
  const defs = [...FORM[kind], ...(kind === "force" ? [...FORCE_POLAR, ...FORCE_COMPONENTS] : [])];
  const def = defs.find((d) => d.key === key);
  // the outline as a whole (it crosses itself) or one of its corners
  let words = def ? asWord(def.label) : key === "outline" ? (indices.length ? "outline corner" : "outline") : key;
  if (key === "outline" && indices.length) {
    words += ` ${indices[0] + 1}`;
    indices = indices.slice(1);
  }
  if (indices.length === 1 && (indices[0] === 0 || indices[0] === 1)) words += indices[0] === 0 ? " x" : " y";
  return words;
}

/** The place of an error at `path` in `sketch`, for people; the raw path when it is not an element's field. */
export function errorPlace(sketch: SketchFile | null, path: string): string {
  if (!path) return "";
  if (path.startsWith("parameters.")) return `Parameter ${path.slice("parameters.".length)}`;
  if (path === "gravity") return "Gravity";
  const m = ELEMENT_PATH.exec(path);
  const el = m && sketch ? ((sketch[m[1] as Group] as AnyElement[] | undefined)?.[Number(m[2])] as AnyElement | undefined) : undefined;
  if (!m || !el) return path;
  const kind = kindOf(m[1] as Group, el);
  // a body labelled "Body 1" is "Body 1", not "Body Body 1"
  const name = kindAndName(KIND_LABEL[kind], el.label || el.id);
  if (!m[3]) return name;
  const indices = [...(m[4] ?? "").matchAll(/\[(\d+)\]/g)].map((x) => Number(x[1]));
  return `${name} — ${fieldWords(kind, m[3], indices)}`;
}

const POINT_KEYS = new Set(["at", "from", "to", "cg", "outline"]);

/** What the field at a path holds ("bodies[0].mass" → mass, "supports[1].at[0]" → length), or
 *  null when the path is not a numeric field's (a parameter holds whatever it is given). */
export function fieldKindAt(path: string): string | null {
  if (path === "gravity" || path === "gravityAngle") return FIELD_KIND_BY_NAME[path];
  const motion = /^motion\.(\w+)$/.exec(path);
  if (motion) return FIELD_KIND_BY_NAME[motion[1]] ?? null;
  const m = ELEMENT_PATH.exec(path);
  if (!m || !m[3] || m[5]) return null;
  if (POINT_KEYS.has(m[3])) return "length";
  return FIELD_KIND_BY_NAME[m[3]] ?? null;
}

/** "Point force F1 — magnitude: unknown name "span"": the place, and the message with the units
 *  it suggests fitted to the field ("kg, tonne, lb" for a mass, not any unit at all). */
export function errorInWords(sketch: SketchFile | null, e: { path: string; message: string }): string {
  const place = errorPlace(sketch, e.path);
  const message = suggestUnitsFor(e.message, fieldKindAt(e.path));
  return place ? `${place}: ${message}` : message;
}

/**
 * The field issues of a sketch the server refused (a 400 whose paths are the request's:
 * "document.ports[0].area"), in the editor's words: "Inlet p1 — area: must be more than zero".
 * `sketch`: the document that was sent. Issues of other fields keep their path ("message: …").
 */
export function refusedInWords(sketch: SketchFile | null, fields: ReadonlyArray<{ path: string; message: string }>, documentField = "document"): string[] {
  return fields.map((f) => {
    const inDocument = f.path === documentField || f.path.startsWith(`${documentField}.`);
    const path = inDocument ? f.path.slice(documentField.length + 1) : f.path;
    return errorInWords(inDocument ? sketch : null, { path, message: f.message });
  });
}

/**
 * The input errors of the sketch as the editor has them (the live analysis's), said before the
 * sketch is sent anywhere: "an input error: Inlet p1 — area: must be more than zero", or
 * "3 input errors, the first: …"; null when there are none. A solve that failed is not an input
 * error (the sketch itself may be fine), so it is left out.
 */
export function inputErrorsInWords(sketch: SketchFile | null, errors: ReadonlyArray<{ path: string; message: string }>): { count: number; words: string } | null {
  const input = errors.filter((e) => e.path || !/^the solve failed/.test(e.message));
  if (!input.length) return null;
  const first = errorInWords(sketch, input[0]);
  return { count: input.length, words: input.length === 1 ? `an input error: ${first}` : `${input.length} input errors, the first: ${first}` };
}
