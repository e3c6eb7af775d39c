import { sql } from "drizzle-orm";
import { index, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";

/** owner: members, settings, everything · editor: create, edit, save, fork · checker: read, comment, check · viewer: read. */
export const workspaceRole = pgEnum("workspace_role", ["owner", "editor", "checker", "viewer"]);

export const workspace = pgTable("workspace", {
  id: uuid("id").primaryKey().default(sql`gen_random_uuid()`),
  name: text("name").notNull(),
  personalOf: text("personal_of").references(() => user.id, { onDelete: "cascade" }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  /**
   * Set when an owner deleted the workspace. The row stays as a tombstone (name, when, by whom) so
   * its audit log, the record of what was done in it, outlives it; its sketches, files, members and
   * open invitations are gone (`lib/workspace-deletion.ts`).
   */
  deletedAt: timestamp("deleted_at", { withTimezone: true }),
  deletedBy: text("deleted_by").references(() => user.id, { onDelete: "set null" }),
});

export const membership = pgTable(
  "membership",
  {
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspace.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    role: workspaceRole("role").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("membership_pk").on(t.workspaceId, t.userId), index("membership_user_idx").on(t.userId)],
);

/**
 * An invitation by e-mail. Only the SHA-256 of the link's token is stored; a link works once
 * (accepted_at), until expires_at, and not after an owner withdraws it (withdrawn_at).
 */
export const invitation = pgTable(
  "invitation",
  {
    id: uuid("id").primaryKey().default(sql`gen_random_uuid()`),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspace.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: workspaceRole("role").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    invitedBy: text("invited_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    acceptedBy: text("accepted_by").references(() => user.id, { onDelete: "set null" }),
    withdrawnAt: timestamp("withdrawn_at", { withTimezone: true }),
  },
  (t) => [index("invitation_workspace_idx").on(t.workspaceId, t.createdAt), index("invitation_email_idx").on(t.email)],
);
