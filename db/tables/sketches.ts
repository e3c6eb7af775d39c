import { sql } from "drizzle-orm";
import { check, doublePrecision, index, integer, json, jsonb, pgTable, text, timestamp, uniqueIndex, uuid, type AnyPgColumn } from "drizzle-orm/pg-core";
import type { SketchFile } from "@/solver/schema";
import { user } from "./auth";
import { reviewState } from "./review-enums";
import { workspace } from "./workspaces";

/** What a version's solve said, kept for listings (the document is solved again wherever detail is shown). */
export type SolveSummary = {
  /** the worst status over the bodies (holds < lifts < tips < unrestrained); null without bodies or when the solve failed */
  status: "holds" | "lifts" | "tips" | "unrestrained" | null;
  /** the largest reaction resultant over all bodies (N) */
  largestReaction: number | null;
  bodies: Record<string, { status: string; largestReaction: number }>;
  /** warning codes of the solve (SLIP, LIFTOFF, …) */
  warnings: string[];
  /** the factor of safety furthest below its required value over the sketch as drawn and its
   *  cases and combinations (bodies that are held), when one is below; null when none is */
  lowestFactor?: LowFactor | null;
  error?: string;
};

export type LowFactor = { check: "overturning" | "sliding"; body: string; factor: number; required: number; run: string };

/**
 * A sketch: one free-body diagram in a workspace, saved as numbered versions. `latestVersion`
 * is the number of the newest version (versions are 1…latestVersion with no gaps); a save
 * locks this row, so concurrent saves on one base version cannot both win.
 */
export const sketch = pgTable(
  "sketch",
  {
    id: uuid("id").primaryKey().default(sql`gen_random_uuid()`),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspace.id, { onDelete: "cascade" }),
    title: text("title").notNull(),
    description: text("description").notNull().default(""),
    tags: text("tags").array().notNull().default(sql`'{}'::text[]`),
    /** the version this sketch was forked from (null for an original, or once the origin is deleted) */
    forkedFromVersionId: uuid("forked_from_version_id").references((): AnyPgColumn => sketchVersion.id, { onDelete: "set null" }),
    /** the origin's title as it was when forked (the forker could read it and copied it) */
    forkedFromTitle: text("forked_from_title"),
    latestVersion: integer("latest_version").notNull().default(0),
    createdBy: text("created_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedBy: text("updated_by").references(() => user.id, { onDelete: "set null" }),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("sketch_workspace_updated_idx").on(t.workspaceId, t.updatedAt.desc()),
    index("sketch_workspace_title_idx").on(t.workspaceId, t.title),
    index("sketch_tags_idx").using("gin", t.tags),
    index("sketch_forked_from_idx").on(t.forkedFromVersionId),
  ],
);

/**
 * One saved state of a sketch. Immutable once written (a trigger refuses changes to what was
 * saved); numbered 1, 2, 3… per sketch. The document is the sketch file as validated and
 * migrated by the solver's parseSketch, at the format version the solver calls current.
 */
export const sketchVersion = pgTable(
  "sketch_version",
  {
    id: uuid("id").primaryKey().default(sql`gen_random_uuid()`),
    sketchId: uuid("sketch_id")
      .notNull()
      .references(() => sketch.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    message: text("message").notNull().default(""),
    /** json, not jsonb: the text is kept as saved, so object keys (the user's order of the
     *  parameters and of a case's overrides) come back in the order they were saved in. json has
     *  no equality operator: compare documents as ::text (or ::jsonb when order must not count). */
    document: json("document").$type<SketchFile>().notNull(),
    formatVersion: integer("format_version").notNull(),
    status: text("status").$type<SolveSummary["status"]>(),
    largestReaction: doublePrecision("largest_reaction"),
    summary: jsonb("summary").$type<SolveSummary>().notNull(),
    authorId: text("author_id").references(() => user.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    /** the sign-off state (not part of what was saved: it moves while the version stays) */
    reviewState: reviewState("review_state").notNull().default("draft"),
    /** who checked it in the current round (approval may not be theirs) */
    checkedBy: text("checked_by").references(() => user.id, { onDelete: "set null" }),
  },
  (t) => [
    uniqueIndex("sketch_version_number_idx").on(t.sketchId, t.number),
    index("sketch_version_author_idx").on(t.authorId),
    index("sketch_version_review_idx").on(t.sketchId, t.reviewState),
    check("sketch_version_number_positive", sql`${t.number} >= 1`),
  ],
);
