import { bigint, index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { workspace } from "./workspaces";

/**
 * Who did what, where, to what, and when. Rows are only ever inserted. The actor's e-mail is
 * copied so a row still reads well after the account is deleted.
 */
export const auditEvent = pgTable(
  "audit_event",
  {
    id: bigint("id", { mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    actorId: text("actor_id").references(() => user.id, { onDelete: "set null" }),
    actorEmail: text("actor_email"),
    workspaceId: uuid("workspace_id").references(() => workspace.id, { onDelete: "cascade" }),
    action: text("action").notNull(),
    targetType: text("target_type"),
    targetId: text("target_id"),
    detail: jsonb("detail").$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [
    index("audit_workspace_idx").on(t.workspaceId, t.id),
    index("audit_actor_idx").on(t.actorId, t.id),
    // a sketch's activity feed reads its events by target
    index("audit_target_idx").on(t.targetType, t.targetId, t.id),
  ],
);
