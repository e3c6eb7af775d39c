// The properties form of each element kind: which fields, in what words, and in what quantity
// their value is displayed. Field names are the file format's.
import type { ElementKind } from "@/canvas/model/elements";
import type { Quantity, UnitSystem } from "@/solver/units";

export type Display = Quantity | "rotationalStiffness";

/** A placeholder's example: the same text in both unit systems (an angle, a plain number), or
 *  one per system, so the field suggests the units on screen ("31 m/s" in SI, "100 ft/s" in US). */
export type Example = string | Readonly<Record<UnitSystem, string>>;

/** The example to show with these units on screen. */
export const exampleIn = (example: Example, units: UnitSystem): string => (typeof example === "string" ? example : example[units]);

export interface NumberFieldDef {
  key: string;
  label: string;
  /** what the value is, for showing it with a unit */
  display: Display;
  optional?: boolean;
  /** placeholder text: an example of what to type, in the units on screen */
  example?: Example;
  hint?: string;
  advanced?: boolean;
}

export interface PointFieldDef {
  key: string;
  label: string;
  point: true;
  optional?: boolean;
  hint?: string;
}

export type FieldDef = NumberFieldDef | PointFieldDef;

const at: PointFieldDef = { key: "at", label: "Position", point: true };
const stiffness: NumberFieldDef = { key: "stiffness", label: "Stiffness", display: "stiffness", optional: true, example: { SI: "200 kN/m", US: "1100 lbf/in" }, hint: "Only matters when the supports are statically indeterminate.", advanced: true };
const angle = (label: string, hint: string): NumberFieldDef => ({ key: "angle", label, display: "angle", example: "90 deg", hint });

export const FORM: Record<ElementKind, FieldDef[]> = {
  body: [
    { key: "mass", label: "Mass", display: "mass", example: { SI: "850 kg", US: "1900 lb" }, hint: "Everything inside the control volume, the fluid in it included." },
    { key: "cg", label: "Centre of gravity", point: true, optional: true, hint: "Blank: the outline's centroid." },
  ],
  pin: [at, stiffness],
  roller: [at, angle("Direction", "The line along which it holds (either way), degrees from +x."), stiffness],
  contact: [
    at,
    angle("Pushes toward", "The direction the ground pushes on the body: 90 for level ground under it."),
    { key: "mu", label: "Friction μ", display: "ratio", optional: true, example: "0.3", hint: "Blank: no friction." },
    stiffness,
  ],
  fixed: [at, stiffness, { key: "rotationalStiffness", label: "Rotational stiffness", display: "rotationalStiffness", optional: true, example: { SI: "50 kN m", US: "37 kip ft" }, advanced: true }],
  tie: [at, angle("Toward anchor", "The direction from the body to the anchor; a tie only pulls."), stiffness],
  force: [at],
  couple: [{ key: "value", label: "Moment", display: "moment", example: { SI: "1.2 kN m", US: "900 lbf ft" }, hint: "Counter-clockwise positive." }, { key: "at", label: "Drawn at", point: true, optional: true }],
  distributed: [
    { key: "from", label: "From", point: true },
    { key: "to", label: "To", point: true },
    { key: "w1", label: "w₁ at from", display: "lineLoad", example: { SI: "2 kN/m", US: "140 lbf/ft" } },
    { key: "w2", label: "w₂ at to", display: "lineLoad", example: { SI: "2 kN/m", US: "140 lbf/ft" } },
    { key: "angle", label: "Direction", display: "angle", optional: true, example: "-90 deg", hint: "Blank: straight down (−90°)." },
  ],
  inlet: portFields("into the body"),
  outlet: portFields("out of the body"),
  massSource: [
    { key: "massFlow", label: "Mass flow ṁ", display: "massFlow", example: { SI: "2 kg/s", US: "4.4 lb/s" } },
    { key: "at", label: "Drawn at", point: true, optional: true },
  ],
};

function portFields(way: string): FieldDef[] {
  return [
    at,
    { key: "angle", label: "Flow direction", display: "angle", example: "0 deg", hint: `Direction of the fluid velocity ${way}, degrees from +x.` },
    { key: "massFlow", label: "Mass flow ṁ", display: "massFlow", optional: true, example: { SI: "14 kg/s", US: "30 lb/s" } },
    { key: "velocity", label: "Velocity V", display: "velocity", optional: true, example: { SI: "31 m/s", US: "100 ft/s" } },
    { key: "pressure", label: "Gauge pressure", display: "pressure", optional: true, example: { SI: "350 kPa", US: "50 psi" }, hint: "Needs the area; pushes inward at inlets and outlets alike." },
    { key: "area", label: "Area", display: "area", optional: true, example: { SI: "pi/4 * (50 mm)^2", US: "pi/4 * (2 in)^2" } },
    { key: "density", label: "Density ρ", display: "density", optional: true, example: { SI: "998 kg/m^3", US: "62.3 lb/ft^3" } },
    { key: "volumeFlow", label: "Volume flow", display: "volumeFlow", optional: true, example: { SI: "600 lpm", US: "160 gpm" } },
    {
      key: "beta",
      label: "Momentum-flux factor β",
      display: "ratio",
      optional: true,
      example: "1.02",
      hint: "Blank: 1, flow uniform across the port (a free jet). About 1.02 for turbulent pipe flow, 4/3 for laminar.",
    },
  ];
}

export const FORCE_POLAR: NumberFieldDef[] = [
  { key: "magnitude", label: "Magnitude", display: "force", example: { SI: "12 kN", US: "2700 lbf" } },
  { key: "angle", label: "Direction", display: "angle", example: "-90 deg", hint: "Degrees counter-clockwise from +x; −90 is straight down." },
];
export const FORCE_COMPONENTS: NumberFieldDef[] = [
  { key: "fx", label: "Fx", display: "force", example: { SI: "0 N", US: "0 lbf" } },
  { key: "fy", label: "Fy", display: "force", example: { SI: "-2 kN", US: "-450 lbf" } },
];

/** Fields of the sketch itself and of every element that the properties form writes outside FORM. */
const OTHER_FIELDS: Record<string, string> = {
  title: "Title",
  description: "Notes",
  gravity: "Gravity",
  gravityAngle: "Gravity direction",
  motion: "Motion of the body",
  label: "Label",
  body: "Belongs to",
  group: "Load group",
  outline: "Outline",
  kind: "Kind",
};

/** The words the properties form uses for a field of an element of this kind ("Gravity direction"
 *  for `gravityAngle`, "Flow direction" for a port's `angle`), for tables that list changed fields. */
export function fieldLabel(kind: string, key: string): string {
  const defs: FieldDef[] = kind in FORM ? FORM[kind as ElementKind] : [];
  const own = [...defs, ...(kind === "force" ? [...FORCE_POLAR, ...FORCE_COMPONENTS] : [])].find((d) => d.key === key);
  if (own) return own.label;
  if (key === "group" && kind === "body") return "Load group of its weight";
  return OTHER_FIELDS[key] ?? key;
}

/** What a blank optional field means, for tables that show a value being given or cleared. */
const BLANK_MEANS: Record<string, string> = {
  "sketch.gravity": "standard, 9.807 m/s²",
  "sketch.gravityAngle": "−90°, down the page",
  "inlet.beta": "1",
  "outlet.beta": "1",
  "contact.mu": "no friction",
  "distributed.angle": "−90°, straight down",
  "body.cg": "the outline's centroid",
  "body.group": "dead",
  "inlet.group": "flow",
  "outlet.group": "flow",
};

/** "blank (−90°, down the page)": the words for a field left blank, or null when blank means nothing. */
export function blankWords(kind: string, key: string): string | null {
  const v = BLANK_MEANS[`${kind}.${key}`] ?? (key === "group" && ["force", "couple", "distributed"].includes(kind) ? "loads" : undefined);
  return v ? `blank (${v})` : null;
}

/** A port's fields its mass flow, velocity and forces are resolved from, in the form's order. */
export const PORT_FLOW_KEYS = ["massFlow", "velocity", "pressure", "area", "density", "volumeFlow", "beta"] as const;

/** A field's words inside a sentence: "area", "mass flow ṁ", "density ρ". */
export function fieldWords(kind: string, key: string): string {
  const label = fieldLabel(kind, key);
  return label.charAt(0).toLowerCase() + label.slice(1);
}

/** What a port needs and has not been given, as the solver checks it (`solver/validate.ts`). */
export type PortLack = "massFlow" | "velocity" | "area";

const given = (v: unknown) => v !== undefined && v !== null && v !== "";

/**
 * What a port (as the file holds it) lacks before it can be solved: a way to its mass flow (ṁ,
 * ρ·Q or ρ·A·V), then a way to its velocity (V, ṁ/(ρ·A) or Q/A; a zero mass flow needs none),
 * then the area its gauge pressure acts on. Null when it has all three.
 */
export function portLacks(port: Readonly<Record<string, unknown>>): PortLack | null {
  const has = (k: string) => given(port[k]);
  const massFlow = has("massFlow") || (has("density") && has("volumeFlow")) || (has("density") && has("area") && has("velocity"));
  if (!massFlow) return "massFlow";
  const velocity = has("velocity") || (has("density") && has("area")) || (has("volumeFlow") && has("area")) || port.massFlow === 0;
  if (!velocity) return "velocity";
  const pressure = port.pressure;
  if (has("pressure") && pressure !== 0 && String(pressure).trim() !== "0" && !has("area")) return "area";
  return null;
}

/** The other ways to what a port lacks, besides its own field (ṁ, V), for the words that say so. */
export const PORT_OTHER_WAYS: Record<Exclude<PortLack, "area">, string> = {
  massFlow: "ρ with the volume flow, or ρ with the area and V",
  velocity: "the area with ρ or with the volume flow",
};

/**
 * Why a port's field may not be left blank, or null when it may: a blank that leaves the port
 * without a mass flow, a velocity or the area its pressure needs (which it had) is refused, so
 * the value in the sketch is not lost to a port that cannot be solved.
 */
export function portBlankRefusal(kind: string, port: Readonly<Record<string, unknown>>, key: string): string | null {
  if (portLacks(port) !== null) return null;
  const without = { ...port };
  delete without[key];
  const lack = portLacks(without);
  if (!lack) return null;
  const label = fieldLabel(kind, key);
  if (lack === "area") return `${label} is needed: the gauge pressure acts on it.`;
  return `${label} is needed: nothing else gives the port its ${lack === "massFlow" ? "mass flow" : "velocity"}.`;
}
