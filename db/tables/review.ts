import { sql } from "drizzle-orm";
import { bigint, index, jsonb, pgTable, text, timestamp, uuid, type AnyPgColumn } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { reviewState, signOffStep } from "./review-enums";
import { sketchVersion } from "./sketches";

/** Where a comment is pinned: an element of the sketch (by id) or a point of the drawing (metres). */
export type CommentPin = { kind: "element"; elementId: string } | { kind: "point"; at: [number, number] };

/**
 * The sign-off record of a version: each step taken, by whom, when, with its note (the reason of
 * a return or a withdrawal). Rows are only ever inserted; the actor's name is copied so the
 * record reads the same after an account is renamed or deleted.
 */
export const signOff = pgTable(
  "sign_off",
  {
    id: bigint("id", { mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
    versionId: uuid("version_id")
      .notNull()
      .references(() => sketchVersion.id, { onDelete: "cascade" }),
    step: signOffStep("step").notNull(),
    fromState: reviewState("from_state").notNull(),
    toState: reviewState("to_state").notNull(),
    actorId: text("actor_id").references(() => user.id, { onDelete: "set null" }),
    actorName: text("actor_name").notNull(),
    note: text("note").notNull().default(""),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("sign_off_version_idx").on(t.versionId, t.id)],
);

/**
 * A comment on a version: the first of a thread (parent null), pinned to an element, a point or
 * nothing (the whole version), or a reply in a thread. Deleting keeps a thread's shape: the
 * text goes, the row stays with deleted_at.
 */
export const comment = pgTable(
  "comment",
  {
    id: uuid("id").primaryKey().default(sql`gen_random_uuid()`),
    versionId: uuid("version_id")
      .notNull()
      .references(() => sketchVersion.id, { onDelete: "cascade" }),
    parentId: uuid("parent_id").references((): AnyPgColumn => comment.id, { onDelete: "cascade" }),
    authorId: text("author_id").references(() => user.id, { onDelete: "set null" }),
    body: text("body").notNull(),
    pin: jsonb("pin").$type<CommentPin>(),
    /** the members mentioned with @name (user ids) */
    mentions: text("mentions").array().notNull().default(sql`'{}'::text[]`),
    resolvedAt: timestamp("resolved_at", { withTimezone: true }),
    resolvedBy: text("resolved_by").references(() => user.id, { onDelete: "set null" }),
    editedAt: timestamp("edited_at", { withTimezone: true }),
    deletedAt: timestamp("deleted_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("comment_version_idx").on(t.versionId, t.createdAt), index("comment_parent_idx").on(t.parentId)],
);
