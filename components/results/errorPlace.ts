// Where an input error is, in the words of the screen: "Point force F1 — magnitude" rather than
// the file path "loads[0].magnitude", so a person can find the field without knowing the format.
import type { SketchFile } from "@/solver/schema";
import { kindOf, KIND_LABEL, type AnyElement, type Group } from "@/canvas/model/elements";
import { FORCE_COMPONENTS, FORCE_POLAR, FORM } from "@/components/editor/fieldDefs";

const ELEMENT_PATH = /^(bodies|supports|loads|ports|massSources)\[(\d+)\](?:\.([A-Za-z]+))?((?:\[\d+\])*)(?:\.(.+))?$/;

/** Lower-case the first letter of a field's label unless it is a symbol or an acronym ("Fx", "μ"). */
function asWord(label: string): string {
  return /^[A-Z][a-z ]/.test(label) ? label[0].toLowerCase() + label.slice(1) : label;
}

function fieldWords(kind: ReturnType<typeof kindOf>, key: string, indices: number[]): string {
  const defs = [...FORM[kind], ...(kind === "force" ? [...FORCE_POLAR, ...FORCE_COMPONENTS] : [])];
  const def = defs.find((d) => d.key === key);
  let words = def ? asWord(def.label) : key === "outline" ? "outline corner" : key;
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
  const name = `${KIND_LABEL[kind]} ${el.label || el.id}`;
  if (!m[3]) return name;
  const indices = [...(m[4] ?? "").matchAll(/\[(\d+)\]/g)].map((x) => Number(x[1]));
  return `${name} — ${fieldWords(kind, m[3], indices)}`;
}

/** "Point force F1 — magnitude: unknown name "span"" */
export function errorInWords(sketch: SketchFile | null, e: { path: string; message: string }): string {
  const place = errorPlace(sketch, e.path);
  return place ? `${place}: ${e.message}` : e.message;
}
