// Where an input error is, in the words of the screen: "Point force F1 — magnitude" rather than
// the file path "loads[0].magnitude", so a person can find the field without knowing the format.
import type { SketchFile } from "@/solver/schema";
import { kindOf, KIND_LABEL, type AnyElement, type Group } from "@/canvas/model/elements";
import { FORCE_COMPONENTS, FORCE_POLAR, FORM, fieldLabel, fieldWords as formFieldWords } from "@/components/editor/fieldDefs";
import { kindAndName } from "@/solver/words";
import { FIELD_KIND_BY_NAME } from "@/solver/resolve";
import { suggestUnitsFor } from "@/solver/expressionErrors";
import { prettyUnit } from "@/solver/units";

// a field's key may hold digits: a distributed load's w1 and w2
const ELEMENT_PATH = /^(bodies|supports|loads|ports|massSources)\[(\d+)\](?:\.([A-Za-z][A-Za-z0-9]*))?((?:\[\d+\])*)(?:\.(.+))?$/;

/** Lower-case the first letter of a field's label unless it is a symbol or an acronym ("Fx", "μ"). */
function asWord(label: string): string {
  // a component's symbol ("Fx", "Fy") keeps its capital
  return /^[A-Z][a-z ]/.test(label) && !/^[A-Z][xyz]$/.test(label.split(" ")[0]) ? label[0].toLowerCase() + label.slice(1) : label;
}

function fieldWords(kind: ReturnType<typeof kindOf>, key: string, indices: number[]): string {
  const defs = [...FORM[kind], ...(kind === "force" ? [...FORCE_POLAR, ...FORCE_COMPONENTS] : [])];
  const def = defs.find((d) => d.key === key);
  // the outline as a whole (it crosses itself) or one of its corners
  let words = def ? asWord(def.label) : key === "outline" ? (indices.length ? "outline corner" : "outline") : asWord(fieldLabel(kind, key));
  if (key === "outline" && indices.length) {
    words += ` ${indices[0] + 1}`;
    indices = indices.slice(1);
  }
  if (indices.length === 1 && (indices[0] === 0 || indices[0] === 1)) words += indices[0] === 0 ? " x" : " y";
  return words;
}

const STUDY_PATH = /^(cases|combinations|sweeps)\[([^\]]+)\](?:\.(.+))?$/;

/** A case's, a combination's or a sweep's place: "Case Storm — change of v". The study is named
 *  by its index (the parser's paths) or by its id (a case's own run); null when it is not found. */
function studyPlace(sketch: SketchFile | null, path: string): string | null {
  const m = STUDY_PATH.exec(path);
  if (!m || !sketch) return null;
  const [, group, ref, rest] = m;
  const list = (sketch[group as "cases" | "combinations" | "sweeps"] ?? []) as Array<{ id?: string; name?: string; parameter?: string }>;
  const i = /^\d+$/.test(ref) ? Number(ref) : list.findIndex((x) => x.id === ref);
  const item = list[i];
  if (!item) return null;
  const name = group === "cases" ? `Case ${item.name}` : group === "combinations" ? `Combination ${item.name}` : `Sweep ${i + 1} (of ${item.parameter})`;
  if (!rest) return name;
  const field =
    /^parameters\.(.+)$/.exec(rest)?.[1] !== undefined
      ? `change of ${rest.slice("parameters.".length)}`
      : /^factors\.(.+)$/.exec(rest)
        ? `factor of group ${rest.slice("factors.".length)}`
        : /^terms\[(\d+)\]/.exec(rest)
          ? `term ${Number(/^terms\[(\d+)\]/.exec(rest)![1]) + 1}`
          : ({ flowFactor: "flow ×", id: "id", name: "name", combination: "combination", case: "case", parameter: "parameter" } as Record<string, string>)[rest] ?? rest;
  return `${name} — ${field}`;
}

/** The place of an error at `path` in `sketch`, for people; the raw path when it is not an element's field. */
export function errorPlace(sketch: SketchFile | null, path: string): string {
  if (!path) return "";
  if (path.startsWith("parameters.")) return `Parameter ${path.slice("parameters.".length)}`;
  if (path === "gravity") return "Gravity";
  if (path === "gravityAngle") return "Gravity direction";
  const study = studyPlace(sketch, path);
  if (study) return study;
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

const SUPERSCRIPT: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };

/** A unit as the expression parser writes it, as engineers write it: "kg / m^2" → "kg/m²",
 *  "kg^3 / (m^4 s^4)" → "kg³/(m⁴·s⁴)", "N m" → "N·m", "m^3 / hr" → "m³/h" (`prettyUnit`, the one
 *  display of a unit). */
export function unitAsWritten(unit: string): string {
  return prettyUnit(unit);
}

/** A value and unit the parser printed ("236.25 kg / m^2"), as written: "236.25 kg/m²". */
function quantityAsWritten(q: string): string {
  const m = /^(−?-?[\d.]+(?:e[+-]?\d+)?)\s+(.+)$/.exec(q.trim());
  return m ? `${m[1].replace(/e\+?(-?\d+)$/, " × 10^$1").replace(/\^(-?\d+)$/, (_, n: string) => [...n].map((c) => SUPERSCRIPT[c]).join(""))} ${unitAsWritten(m[2])}` : q;
}

/** The kind of element whose field a path names ("ports[0].area" → inlet), or null. */
function kindAtPath(sketch: SketchFile | null, path: string): ReturnType<typeof kindOf> | null {
  const m = ELEMENT_PATH.exec(path);
  const el = m && sketch ? ((sketch[m[1] as Group] as AnyElement[] | undefined)?.[Number(m[2])] as AnyElement | undefined) : undefined;
  return m && el ? kindOf(m[1] as Group, el) : null;
}

/**
 * A solver message in the properties form's words. The solver (and so the CLI and the REST API)
 * names the file's fields ("give massFlow, or density and volumeFlow"), the contract of the sketch
 * file; the editor names what its form labels them ("give mass flow ṁ, or density ρ and volume
 * flow"), the element another element is ("already used by Body Skid", not "bodies[0]"), and units
 * as engineers write them ("kg/m²", not "kg / m^2"). A message it does not know is left as it is.
 */
export function messageInWords(sketch: SketchFile | null, path: string, message: string): string {
  const kind = kindAtPath(sketch, path);
  const form = (key: string) => (kind ? formFieldWords(kind, key) : key);
  let out = message
    // another element named by its path ("id "p1" is already used by bodies[0]")
    .replace(/\b(?:bodies|supports|loads|ports|massSources|cases|combinations)\[\d+\](?![.[])/g, (ref) => {
      const place = errorPlace(sketch, ref);
      return place === ref ? ref : place;
    })
    // the file's own words for a field, said once in the sentence (the place names the field)
    .replace(/ \(gravityAngle, /, " (Gravity direction, ")
    .replace(/, motion\.freeX in the file\)/, ")")
    // a port's message names the port, which the place already does
    .replace(/^port "[^"]*" needs /, "needs ")
    .replace(/: port "[^"]*" has a gauge pressure, and its force is pressure × area$/, ": the port has a gauge pressure, and its force is gauge pressure × area")
    .replace(/\(the direction is given by angle\)$/, "(the flow direction gives its direction)")
    .replace(/the speed it gives, massFlow \/ \(density × area\), is/, "the speed it gives, ṁ / (ρ × area), is")
    .replace(/the speed it gives, volumeFlow \/ area, is/, "the speed it gives, volume flow / area, is")
    // a force given both ways, or half of one
    .replace(/^give either magnitude and angle, or fx and fy, not both$/, "give either a magnitude and a direction, or Fx and Fy, not both")
    .replace(/^needs magnitude and angle, or fx and fy$/, "needs a magnitude and a direction, or Fx and Fy")
    .replace(/^is required with angle$/, "is required with the direction")
    .replace(/^is required with magnitude$/, "is required with the magnitude")
    .replace(/^must differ from `from`: /, "must differ from the From point: ")
    // a value in other units than the field's ("236.25 kg / m^2 is in other units, but …")
    .replace(/^(.+?) is (in other units|an? [^,]+), but this field needs /, (_, q: string, what: string) => `${quantityAsWritten(q)} is ${what}, but this field needs `)
    .replace(/: (.+?) and (.+?) cannot be (added|subtracted): units do not match$/, (_, a: string, b: string, verb: string) => `: ${unitAsWritten(a)} and ${unitAsWritten(b)} cannot be ${verb}: units do not match`);
  // the ways a port is given its mass flow or velocity, in the form's words
  out = out.replace(/^(needs a (?:mass flow|velocity): give )(.+)$/, (_, head: string, ways: string) => head + ways.replace(/\b(massFlow|volumeFlow|density|velocity|area)\b/g, (k) => form(k)));
  return out;
}

/** "Point force F1 — magnitude: unknown name "span"": the place, and the message in the form's
 *  words with the units it suggests fitted to the field ("kg, tonne, lb" for a mass, not any unit). */
export function errorInWords(sketch: SketchFile | null, e: { path: string; message: string }): string {
  const place = errorPlace(sketch, e.path);
  const message = messageInWords(sketch, e.path, suggestUnitsFor(e.message, fieldKindAt(e.path)));
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

/**
 * A solver warning whose message starts with the file's path of the field it is about
 * ("loads[0].fy: sin(30) reads 30 as radians: did you mean 30 deg?", unitless trigonometry), in
 * the editor's words: "Point force F — Fy: sin(30) reads 30 as radians: …". Other warnings as they are.
 */
export function warningInWords(sketch: SketchFile | null, message: string): string {
  const m = /^((?:parameters\.|gravity|motion\.|(?:bodies|supports|loads|ports|massSources)\[\d+\])[^\s:]*): (.+)$/s.exec(message);
  if (!m) return message;
  const place = errorPlace(sketch, m[1]);
  return place === m[1] ? message : `${place}: ${messageInWords(sketch, m[1], m[2])}`;
}
