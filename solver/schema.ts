// The sketch file (format "counterpoise.sketch"): the one zod schema that the editor's store,
// the API and the command line validate with. Numeric fields take a number (SI units) or a
// string expression with units ("12 kN", "theta + 5 deg"); expressions are evaluated later
// (solver/resolve.ts), so this schema checks structure only.
import { z } from "zod";

export const FORMAT = "counterpoise.sketch";
/** The newest format version this solver writes. Older files are migrated (solver/migrations).
 *  1: the published contract. 2: load groups, operating cases, combinations, saved sweeps,
 *  stability requirements. 3: the underlay. */
export const CURRENT_VERSION = 3;

const numeric = z.union([z.number(), z.string().min(1, { error: "is empty: give a number or an expression" })], {
  error: (iss) =>
    iss.input === undefined ? "is required" : 'must be a number or an expression such as "12 kN" or "theta + 5 deg"',
});
export type Numeric = z.infer<typeof numeric>;

const point = z.tuple([numeric, numeric], { error: "must be a point [x, y]" });
const id = z.string({ error: "must be a text id" }).min(1, { error: "must not be empty" });
const label = z.string().max(200, { error: "is longer than 200 characters" }).optional();

/** Load group an element's forces belong to, for the factors of operating cases ("dead", "flow"…). */
const group = z
  .string()
  .regex(/^[A-Za-z][A-Za-z0-9 _-]{0,39}$/, { error: "must start with a letter and use letters, digits, spaces, _ or - (40 at most)" })
  .optional();

const elementBase = { id, label, body: id, group };

export const bodySchema = z.strictObject({
  id,
  label,
  /** the group of the body's weight (default "dead") */
  group,
  outline: z.array(point).min(3, { error: "needs at least 3 corners" }),
  mass: numeric,
  cg: point.optional(),
});

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
  { error: "kind must be one of pin, roller, contact, fixed, tie" },
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
  { error: "kind must be one of force, couple, distributed" },
);

export const portSchema = z.strictObject({
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
});

export const massSourceSchema = z.strictObject({ ...elementBase, massFlow: numeric, at: point.optional() });

export const motionSchema = z.strictObject({
  ax: numeric.optional(),
  ay: numeric.optional(),
  freeX: z.boolean({ error: "must be true or false" }).optional(),
});

const parameterName = z
  .string()
  .regex(/^[A-Za-z_][A-Za-z0-9_]*$/, { error: "must start with a letter or _ and hold only letters, digits and _" });

/** An operating case: parameter overrides, group factors and the flow factor. */
export const caseSchema = z.strictObject({
  id,
  name: z.string().min(1, { error: "must not be empty" }).max(120),
  parameters: z.record(z.string(), numeric).optional(),
  factors: z.record(z.string(), z.number({ error: "must be a number" }).finite()).optional(),
  flowFactor: z.number({ error: "must be a number" }).nonnegative({ error: "must be zero or more" }).optional(),
});

/** A combination: cases added as one factored load set (solved once, never by adding results). */
export const combinationSchema = z.strictObject({
  id,
  name: z.string().min(1, { error: "must not be empty" }).max(120),
  terms: z
    .array(z.strictObject({ case: id, factor: z.number({ error: "must be a number" }).finite() }))
    .min(1, { error: "needs at least one case" }),
});

/** A saved sweep: a parameter over a range, and the quantities to plot. */
export const sweepSchema = z.strictObject({
  id,
  parameter: z.string().min(1, { error: "must name a parameter (or flowFactor)" }),
  from: z.number({ error: "must be a number" }).finite(),
  to: z.number({ error: "must be a number" }).finite(),
  points: z.number().int().min(2, { error: "needs at least 2 points" }).max(20000, { error: "is more than 20,000 points" }),
  /** the case whose overrides apply (default: the sketch as drawn) */
  case: id.optional(),
  quantities: z
    .array(
      z.strictObject({
        support: id,
        component: z.enum(["fx", "fy", "m", "n", "t", "resultant", "margin", "frictionRatio", "frictionMargin"], {
          error: "must be one of fx, fy, m, n, t, resultant, margin, frictionRatio, frictionMargin",
        }),
      }),
    )
    .max(24)
    .optional(),
});

const pixel = z.tuple([z.number().finite(), z.number().finite()], { error: "must be a pixel position [x, y]" });

/** A drawing or photo under the sketch (an uploaded file), placed and scaled in the world. */
export const underlaySchema = z.strictObject({
  /** the upload's id */
  upload: z.string().min(1),
  /** image size in pixels */
  width: z.number().int().positive(),
  height: z.number().int().positive(),
  /** world position (m) of the image's top-left corner */
  origin: z.tuple([z.number().finite(), z.number().finite()]),
  metresPerPixel: z.number().positive({ error: "must be more than zero" }),
  /** degrees, counter-clockwise */
  rotation: z.number().finite().default(0),
  opacity: z.number().min(0).max(1).default(0.6),
  hidden: z.boolean().optional(),
  locked: z.boolean().optional(),
  /** the two marks and the distance the user typed to set the scale */
  calibration: z.strictObject({ a: pixel, b: pixel, distance: numeric }).optional(),
});

export const stabilitySchema = z.strictObject({
  overturning: z.number().positive({ error: "must be more than zero" }).optional(),
  sliding: z.number().positive({ error: "must be more than zero" }).optional(),
});

export const sketchSchema = z.strictObject({
  format: z.literal(FORMAT, { error: `must be "${FORMAT}"` }),
  version: z.literal(CURRENT_VERSION, { error: `must be ${CURRENT_VERSION}` }),
  title: z.string().max(300).optional(),
  description: z.string().max(5000).optional(),
  gravity: numeric.optional(),
  parameters: z.record(parameterName, numeric).optional(),
  bodies: z.array(bodySchema).default([]),
  supports: z.array(supportSchema).default([]),
  loads: z.array(loadSchema).default([]),
  ports: z.array(portSchema).default([]),
  massSources: z.array(massSourceSchema).default([]),
  motion: motionSchema.optional(),
  cases: z.array(caseSchema).optional(),
  sweeps: z.array(sweepSchema).optional(),
  combinations: z.array(combinationSchema).optional(),
  /** required factors of safety (default 1.5 each) */
  stability: stabilitySchema.optional(),
  underlay: underlaySchema.optional(),
});

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

/** Format a zod path as the contract writes it: `ports[1].area`. */
export function formatPath(path: ReadonlyArray<PropertyKey>): string {
  let out = "";
  for (const p of path) {
    if (typeof p === "number") out += `[${p}]`;
    else out += out ? `.${String(p)}` : String(p);
  }
  return out;
}
