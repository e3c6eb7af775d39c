// Request shapes of the review endpoints (comments, sign-off, comparison, activity). Browser-safe.
import { z } from "zod";
import { MAX_COMMENT_LENGTH } from "./comment-text";
import { SIGN_OFF_STEPS } from "./rules";
import { MAX_VERSION_NUMBER } from "../sketch-schemas";

const MAX_COORDINATE_M = 1e6;
const OUT_OF_RANGE = "The point is outside the allowed range: each coordinate is from −1,000,000 m to 1,000,000 m.";
// The type's message is for a value that is not a number; the range has its own (a schema-wide
// `error` would answer "not a number" for 1e9 too).
const coordinate = z
  .number({ error: "A coordinate is a number (m)." })
  .min(-MAX_COORDINATE_M, OUT_OF_RANGE)
  .max(MAX_COORDINATE_M, OUT_OF_RANGE);

export const commentPinSchema = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("element"), elementId: z.string().min(1).max(100) }),
  z.strictObject({ kind: z.literal("point"), at: z.tuple([coordinate, coordinate]) }),
]);

export const commentBodySchema = z
  .string({ error: "A comment is text." })
  .trim()
  .min(1, "Write something first.")
  .max(MAX_COMMENT_LENGTH, `Keep a comment under ${MAX_COMMENT_LENGTH} characters.`);

export const createCommentInput = z.strictObject({
  body: commentBodySchema,
  pin: commentPinSchema.nullish(),
  parentId: z.uuid({ error: "Not a comment id." }).nullish(),
});

export const updateCommentInput = z
  .strictObject({ body: commentBodySchema.optional(), resolved: z.boolean({ error: "resolved is true or false." }).optional() })
  .refine((v) => (v.body === undefined) !== (v.resolved === undefined), { error: "Send either the new text (body) or resolved." });

export const signOffInput = z.strictObject({
  step: z.enum(SIGN_OFF_STEPS, { error: "The step is submit, check, return, approve or withdraw." }),
  note: z.string({ error: "The note is text." }).trim().max(2000, "Keep the note under 2000 characters.").optional(),
});

export const commentParams = z.object({ commentId: z.uuid() });

const queryVersionNumber = z.coerce
  .number({ error: "A version number is a whole number." })
  .int("A version number is a whole number.")
  .min(1, "Versions start at 1.")
  .max(MAX_VERSION_NUMBER, `There are at most ${MAX_VERSION_NUMBER} versions.`);

export const compareQuery = z.object({
  from: queryVersionNumber,
  to: queryVersionNumber,
  units: z.enum(["SI", "US"], { error: "units must be SI or US" }).default("SI"),
});

export const activityQuery = z.object({
  before: z.coerce.number({ error: "before is the id of the last entry you have, a whole number." }).int("before is the id of the last entry you have, a whole number.").positive("before is the id of the last entry you have, a whole number.").optional(),
  limit: z.coerce.number({ error: "limit is a whole number from 1 to 100." }).int("limit is a whole number from 1 to 100.").min(1, "limit is a whole number from 1 to 100.").max(100, "limit is a whole number from 1 to 100.").optional(),
});
