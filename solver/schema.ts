// The sketch file (format "counterpoise.sketch"): the one zod schema that the editor's store,
// the API and the command line validate with. Numeric fields take a number (SI units) or a
// string expression with units ("12 kN", "theta + 5 deg"); expressions are evaluated later
// (solver/resolve.ts), so this schema checks structure only.
import { z } from "zod";

export const FORMAT = "counterpoise.sketch";
/** The newest format version this solver writes. Older files are migrated (solver/migrations).
 *  1: the published contract. 2: load groups, operating cases, combinations, saved sweeps,
 *  stability requirements. 3: the underlay. 4: a port's momentum-flux factor β. 5: the direction
 *  of gravity. 6: a saved sweep on a combination; a case solved only in combinations; required
 *  factors of safety per combination. */
export const CURRENT_VERSION = 6;

// zod's own messages ("Invalid input: expected array, received object") name a type, not the
// mistake. Every schema and check below that has no message of its own takes these words.
const TYPE_WORDS: Record<string, string> = {
  string: "text",
  number: "a number",
  int: "a whole number",
  boolean: "true or false",
  array: "a list [ … ]",
  tuple: "a list [ … ]",
  object: "an object { … }",
  record: "an object { … }",
};

function inWords(iss: z.core.$ZodRawIssue): string | undefined {
  switch (iss.code) {
    case "invalid_type":
      return iss.input === undefined ? "is required" : `must be ${TYPE_WORDS[iss.expected] ?? iss.expected}`;
    case "too_big":
      if (iss.origin === "string") return `is longer than ${iss.maximum} characters`;
      if (iss.origin === "array") return `has more than ${iss.maximum} entries`;
      return `must be ${iss.inclusive ? "at most" : "less than"} ${iss.maximum}`;
    case "too_small":
      if (iss.origin === "string") return Number(iss.minimum) <= 1 ? "must not be empty" : `needs at least ${iss.minimum} characters`;
      if (iss.origin === "array") return `needs at least ${iss.minimum} entries`;
      return `must be ${iss.inclusive ? "at least" : "more than"} ${iss.minimum}`;
    case "invalid_key":
      return iss.issues[0]?.message ?? "is not a name allowed here";
    case "invalid_value":
      return `must be one of ${iss.values.map((v) => JSON.stringify(v)).join(", ")}`;
    case "invalid_format":
      return "is not in the expected form";
    case "invalid_union":
      return "is not any of the forms allowed here";
    default:
      return undefined;
  }
}
const say = { error: inWords };
/** Words for a field that must be an object or a list of them, naming what it holds. */
const holding = (what: string) => ({
  error: (iss: z.core.$ZodRawIssue) => (iss.code === "invalid_type" && iss.input !== undefined ? `must be ${what}` : inWords(iss)),
});
/** Words for a list entry chosen by its `kind`: not an object at all, or an unknown kind. */
const kindWords = (what: string, kinds: string) => ({
  error: (iss: z.core.$ZodRawIssue) => {
    const notObject = iss.input === null || typeof iss.input !== "object" || Array.isArray(iss.input);
    return iss.code === "invalid_type" && iss.input !== undefined && notObject ? `must be ${what}` : `kind must be one of ${kinds}`;
  },
});
const text = (max: number) => z.string(say).max(max, say);
const finite = () => z.number(say).finite(say);

const numeric = z.union([z.number(), z.string().min(1, { error: "is empty: give a number or an expression" })], {
  error: (iss) =>
    iss.input === undefined ? "is required" : 'must be a number or an expression such as "12 kN" or "theta + 5 deg"',
});
export type Numeric = z.infer<typeof numeric>;

const point = z.tuple([numeric, numeric], { error: "must be a point [x, y]" });
const id = z.string({ error: "must be a text id" }).min(1, { error: "must not be empty" });
const label = text(200).optional();

/** Load group an element's forces belong to, for the factors of operating cases ("dead", "flow"…). */
const group = z
  .string(say)
  .regex(/^[A-Za-z][A-Za-z0-9 _-]{0,39}$/, { error: "must start with a letter and use letters, digits, spaces, _ or - (40 at most)" })
  .optional();

const elementBase = { id, label, body: id, group };

export const bodySchema = z.strictObject(
  {
    id,
    label,
    /** the group of the body's weight (default "dead") */
    group,
    outline: z.array(point, holding("a list of corners [[x, y], …]")).min(3, { error: "needs at least 3 corners" }),
    mass: numeric,
    cg: point.optional(),
  },
  holding('a body { "id", "outline", "mass", … }'),
);

const stiffness = { stiffness: numeric.optional() };

export const supportSchema = z.discriminatedUnion(
  "kind",
  [
    z.strictObject({ ...elementBase, kind: z.literal("pin"), at: point, ...stiffness }),
    z.strictObject({ ...elementBase, kind: z.literal("roller"), at: point, angle: numeric, ...stiffness }),
    z.strictObject({ ...elementBase, kind: z.literal("contact"), at: point, angle: numeric, mu: numeric.optional(), ...stiffness }),
    z.strictObject({ ...elementBase, kind: z.literal("fixed"), at: point, ...stiffness, rotationalStiffness: numeric.optional() }),
    z.strictObject({ ...elementBase, kind: z.literal("tie"), at: point, angle: numeric, ...stiffness }),
  ],
  kindWords('a support { "id", "body", "kind", "at", … }', "pin, roller, contact, fixed, tie"),
);

export const loadSchema = z.discriminatedUnion(
  "kind",
  [
    z.strictObject({
      ...elementBase,
      kind: z.literal("force"),
      at: point,
      magnitude: numeric.optional(),
      angle: numeric.optional(),
      fx: numeric.optional(),
      fy: numeric.optional(),
    }),
    z.strictObject({ ...elementBase, kind: z.literal("couple"), value: numeric, at: point.optional() }),
    z.strictObject({
      ...elementBase,
      kind: z.literal("distributed"),
      from: point,
      to: point,
      w1: numeric,
      w2: numeric,
      angle: numeric.optional(),
    }),
  ],
  kindWords('a load { "id", "body", "kind", "at", … }', "force, couple, distributed"),
);

export const portSchema = z.strictObject(
  {
    ...elementBase,
    kind: z.enum(["inlet", "outlet"], { error: "kind must be inlet or outlet" }),
    at: point,
    angle: numeric,
    massFlow: numeric.optional(),
    velocity: numeric.optional(),
    pressure: numeric.optional(),
    area: numeric.optional(),
    density: numeric.optional(),
    volumeFlow: numeric.optional(),
    beta: numeric.optional(),
  },
  holding('a port { "id", "body", "kind", "at", "angle", … }'),
);

export const massSourceSchema = z.strictObject(
  { ...elementBase, massFlow: numeric, at: point.optional() },
  holding('a mass source { "id", "body", "massFlow" }'),
);

export const motionSchema = z.strictObject(
  {
    ax: numeric.optional(),
    ay: numeric.optional(),
    freeX: z.boolean({ error: "must be true or false" }).optional(),
  },
  holding('an object { "ax", "ay" } or { "freeX": true }'),
);

const parameterName = z
  .string()
  .regex(/^[A-Za-z_][A-Za-z0-9_]*$/, { error: "a parameter name starts with a letter or _ and holds only letters, digits and _" });

/** An operating case: parameter overrides, group factors and the flow factor. */
export const caseSchema = z.strictObject(
  {
    id,
    name: z.string(say).min(1, { error: "must not be empty" }).max(120, say),
    parameters: z.record(z.string(), numeric, holding('an object of parameter overrides { "name": value }')).optional(),
    factors: z.record(z.string(), finite(), holding('an object of group factors { "group": factor }')).optional(),
    flowFactor: z.number({ error: "must be a number" }).nonnegative({ error: "must be zero or more" }).optional(),
    /** a load case: solved only as part of the combinations that name it (version 6) */
    onlyInCombinations: z.boolean({ error: "must be true or false" }).optional(),
  },
  holding('a case { "id", "name", … }'),
);

export const stabilitySchema = z.strictObject(
  {
    overturning: z.number(say).positive({ error: "must be more than zero" }).optional(),
    sliding: z.number(say).positive({ error: "must be more than zero" }).optional(),
  },
  holding('an object { "overturning", "sliding" } of required factors of safety'),
);

/** A combination: cases added as one factored load set (solved once, never by adding results). */
export const combinationSchema = z.strictObject(
  {
    id,
    name: z.string(say).min(1, { error: "must not be empty" }).max(120, say),
    terms: z
      .array(z.strictObject({ case: id, factor: finite() }, holding('a term { "case", "factor" }')), holding('a list of terms [{ "case", "factor" }, …]'))
      .min(1, { error: "needs at least one case" }),
    /** required factors of safety for this combination, over the sketch's (a factored set is
     *  usually checked against 1.0: its factors carry the margin) (version 6) */
    stability: stabilitySchema.optional(),
  },
  holding('a combination { "id", "name", "terms" }'),
);

/** A saved sweep: a parameter over a range, and the quantities to plot. */
export const sweepSchema = z.strictObject(
  {
    id,
    parameter: z.string(say).min(1, { error: "must name a parameter (or flowFactor)" }),
    from: finite(),
    to: finite(),
    points: z.number(say).int(say).min(2, { error: "needs at least 2 points" }).max(20000, { error: "is more than 20,000 points" }),
    /** the case whose overrides apply (default: the sketch as drawn) */
    case: id.optional(),
    /** or the combination whose factored load set is solved at each point (version 6) */
    combination: id.optional(),
    quantities: z
      .array(
        z.strictObject(
          {
            support: id,
            component: z.enum(["fx", "fy", "m", "n", "t", "resultant", "margin", "frictionRatio", "frictionMargin"], {
              error: "must be one of fx, fy, m, n, t, resultant, margin, frictionRatio, frictionMargin",
            }),
          },
          holding('a quantity { "support", "component" }'),
        ),
        holding('a list of quantities [{ "support", "component" }, …]'),
      )
      .max(24, say)
      .optional(),
  },
  holding('a sweep { "id", "parameter", "from", "to", "points" }'),
);

const pixel = z.tuple([finite(), finite()], { error: "must be a pixel position [x, y]" });

/** A drawing or photo under the sketch (an uploaded file), placed and scaled in the world. */
export const underlaySchema = z.strictObject(
  {
    /** the upload's id */
    upload: z.string(say).min(1, say),
    /** image size in pixels */
    width: z.number(say).int(say).positive(say),
    height: z.number(say).int(say).positive(say),
    /** world position (m) of the image's top-left corner */
    origin: z.tuple([finite().min(-1e6, { error: "must be within 1,000 km of (0, 0)" }).max(1e6, { error: "must be within 1,000 km of (0, 0)" }), finite().min(-1e6, { error: "must be within 1,000 km of (0, 0)" }).max(1e6, { error: "must be within 1,000 km of (0, 0)" })], { error: "must be a position [x, y]" }),
    // a drawing, a photo or a site plan: 0.001 mm to 100 m a pixel (the editor's scale refuses others)
    metresPerPixel: z.number(say).positive({ error: "must be more than zero" }).min(1e-6, { error: "must be at least 0.000001 (0.001 mm a pixel)" }).max(100, { error: "must be at most 100 (m a pixel)" }),
    /** degrees, counter-clockwise */
    rotation: finite().default(0),
    opacity: z.number(say).min(0, say).max(1, say).default(0.6),
    hidden: z.boolean(say).optional(),
    locked: z.boolean(say).optional(),
    /** the two marks and the distance the user typed to set the scale */
    calibration: z.strictObject({ a: pixel, b: pixel, distance: numeric }, holding('an object { "a", "b", "distance" }')).optional(),
  },
  holding('an underlay { "upload", "width", "height", "origin", "metresPerPixel" }'),
);

export const sketchSchema = z.strictObject(
  {
    format: z.literal(FORMAT, { error: `must be "${FORMAT}"` }),
    version: z.literal(CURRENT_VERSION, { error: `must be ${CURRENT_VERSION}` }),
    title: text(300).optional(),
    description: text(5000).optional(),
    gravity: numeric.optional(),
    /** the direction gravity acts in, degrees from +x (default −90: down the page) */
    gravityAngle: numeric.optional(),
    parameters: z.record(parameterName, numeric, holding('an object of parameters { "name": "expression", … }')).optional(),
    bodies: z.array(bodySchema, holding("a list of bodies [{ … }, …]")).default([]),
    supports: z.array(supportSchema, holding("a list of supports [{ … }, …]")).default([]),
    loads: z.array(loadSchema, holding("a list of loads [{ … }, …]")).default([]),
    ports: z.array(portSchema, holding("a list of ports [{ … }, …]")).default([]),
    massSources: z.array(massSourceSchema, holding("a list of mass sources [{ … }, …]")).default([]),
    motion: motionSchema.optional(),
    cases: z.array(caseSchema, holding("a list of operating cases [{ … }, …]")).optional(),
    sweeps: z.array(sweepSchema, holding("a list of sweeps [{ … }, …]")).optional(),
    combinations: z.array(combinationSchema, holding("a list of combinations [{ … }, …]")).optional(),
    /** required factors of safety (default 1.5 each) */
    stability: stabilitySchema.optional(),
    underlay: underlaySchema.optional(),
  },
  holding("an object { … } (a sketch file)"),
);

/** A sketch file as written (numbers or expressions). */
export type SketchFile = z.infer<typeof sketchSchema>;
export type SketchFileInput = z.input<typeof sketchSchema>;
export type BodyFile = z.infer<typeof bodySchema>;
export type SupportFile = z.infer<typeof supportSchema>;
export type LoadFile = z.infer<typeof loadSchema>;
export type PortFile = z.infer<typeof portSchema>;
export type MassSourceFile = z.infer<typeof massSourceSchema>;
export type SupportKind = SupportFile["kind"];
export type CaseFile = z.infer<typeof caseSchema>;
export type CombinationFile = z.infer<typeof combinationSchema>;
export type SweepFile = z.infer<typeof sweepSchema>;
export type UnderlayFile = z.infer<typeof underlaySchema>;
export type LoadKind = LoadFile["kind"];

/** Format a zod path as the contract writes it: `ports[1].area`, and `parameters["2x"]` for a
 *  key that is not a plain name. */
export function formatPath(path: ReadonlyArray<PropertyKey>): string {
  let out = "";
  for (const p of path) {
    if (typeof p === "number") out += `[${p}]`;
    else if (typeof p === "string" && !/^[A-Za-z_$][A-Za-z0-9_$]*$/.test(p)) out += `[${JSON.stringify(p)}]`;
    else out += out ? `.${String(p)}` : String(p);
  }
  return out;
}
