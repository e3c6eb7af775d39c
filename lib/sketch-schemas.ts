// Request shapes of the sketch and version endpoints, shared by the route handlers (which
// enforce them) and the forms (which show the same messages first). Browser-safe.
import { z } from "zod";

/** Best first: a listing's status is the worst of its bodies. */
export const STATUS_ORDER = ["holds", "lifts", "tips", "unrestrained"] as const;
export type SketchStatus = (typeof STATUS_ORDER)[number];
/** What the listing filters by: a status, or "slips" (the body needs more friction as a whole than its contacts give, a warning beside any status; one contact alone over its μ is "over μ", not a slip). */
export const STATUS_FILTERS = ["holds", "slips", "lifts", "tips", "unrestrained"] as const satisfies ReadonlyArray<SketchStatus | "slips">;

export const sketchTitleSchema = z
  .string({ error: "Give the sketch a title." })
  .trim()
  .min(1, "Give the sketch a title.")
  .max(120, "Keep the title under 120 characters.");

export const sketchDescriptionSchema = z.string({ error: "The description is text." }).trim().max(2000, "Keep the description under 2000 characters.");

export const tagSchema = z
  .string({ error: "A tag is text." })
  .trim()
  .toLowerCase()
  // an empty tag breaks the character rule too; one message says it
  .min(1, { error: "A tag cannot be empty.", abort: true })
  .max(32, "Keep each tag under 32 characters.")
  .regex(/^[\p{L}\p{N}][\p{L}\p{N} ._/-]*$/u, "Tags are letters, digits, spaces and . _ / -, starting with a letter or digit.");

export const tagsSchema = z
  .array(tagSchema, { error: "Tags are a list of words." })
  .max(12, "At most 12 tags.")
  .transform((tags) => [...new Set(tags)]);

export const versionMessageSchema = z
  .string({ error: "The message is text." })
  .trim()
  .max(500, "Keep the message under 500 characters.");

/** No sketch gets near this many versions; the bound keeps a huge number from reaching PostgreSQL's integer column. */
export const MAX_VERSION_NUMBER = 1_000_000;

export const versionNumberSchema = z
  .number({ error: "A version number is a whole number." })
  .int("A version number is a whole number.")
  .min(1, "Versions start at 1.")
  .max(MAX_VERSION_NUMBER, `There are at most ${MAX_VERSION_NUMBER} versions.`);

export const sketchParams = z.object({ id: z.uuid() });
export const versionParams = z.object({ id: z.uuid(), number: z.coerce.number().int().min(1).max(MAX_VERSION_NUMBER) });

export const SKETCH_SORTS = ["updated", "title", "status", "created"] as const;
export type SketchSort = (typeof SKETCH_SORTS)[number];

export const listSketchesQuery = z.object({
  q: z.string().trim().max(100, "Search for at most 100 characters.").optional(),
  tag: tagSchema.optional(),
  status: z.enum(STATUS_FILTERS, { error: "Status is holds, slips, lifts, tips or unrestrained." }).optional(),
  sort: z.enum(SKETCH_SORTS, { error: "Sort by updated, title, status or created." }).optional(),
  dir: z.enum(["asc", "desc"], { error: "Direction is asc or desc." }).optional(),
  page: z.coerce.number({ error: "A page is a whole number from 1." }).int("A page is a whole number from 1.").min(1, "Pages start at 1.").max(100_000, "At most page 100000.").optional(),
  pageSize: z.coerce
    .number({ error: "pageSize is a whole number from 1 to 100." })
    .int("pageSize is a whole number from 1 to 100.")
    .min(1, "pageSize is a whole number from 1 to 100.")
    .max(100, "At most 100 a page.")
    .optional(),
});
export type ListSketchesQuery = z.infer<typeof listSketchesQuery>;

/** Rename, describe or tag a sketch: at least one of the three. */
export const updateSketchInput = z
  .strictObject({ title: sketchTitleSchema.optional(), description: sketchDescriptionSchema.optional(), tags: tagsSchema.optional() })
  .refine((v) => v.title !== undefined || v.description !== undefined || v.tags !== undefined, { error: "Send a title, a description or tags." });

/** Make a version the latest again: a new version on top of `baseVersion` (the latest the caller has seen). */
export const restoreInput = z.strictObject({
  baseVersion: versionNumberSchema,
  message: versionMessageSchema.optional(),
});

export const forkInput = z.strictObject({
  workspaceId: z.uuid({ error: "Choose the workspace to fork into." }),
  version: versionNumberSchema.optional(),
  title: sketchTitleSchema.optional(),
});
