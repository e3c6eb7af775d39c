import "server-only";
import { and, desc, eq, exists, inArray, isNull, lt, lte, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { auditEvent, membership, user } from "@/db/schema";
import { actorMay } from "./workspaces";

const actorUser = alias(user, "actor_user");
const targetUser = alias(user, "target_user");
const deletion = alias(auditEvent, "deletion");
/** A member's signing out on every device, or every other one: shown with the sign-ins, and kept when those are hidden. */
const SIGN_OUTS = ["auth.sign_out_all", "auth.sign_out_others"];

export type AuditRow = {
  id: number;
  at: Date;
  action: string;
  actorName: string | null;
  actorEmail: string | null;
  targetType: string | null;
  targetId: string | null;
  targetName: string | null;
  /** A sketch entry whose sketch has since been deleted (a `sketch.delete` names it): nothing to open. */
  targetDeleted: boolean;
  detail: Record<string, unknown>;
};

/**
 * Details no reader of a log needs and some may not see: a fork's origin sketch, perhaps in another
 * workspace; a sign-in's session hash (only the person's own account page uses it, to say "This device").
 */
export function withoutHiddenDetail<T extends { detail: Record<string, unknown> }>(row: T): T {
  if (!("fromSketchId" in row.detail) && !("sessionHash" in row.detail)) return row;
  const { fromSketchId: _hidden, sessionHash: _session, ...detail } = row.detail;
  return { ...row, detail };
}

/**
 * A workspace's audit log, newest first: its own events plus the sign-ins and sign-outs on every
 * device of its current members made since they joined (what they did before is not this workspace's business).
 * Empty unless the viewer may read it. `before` pages back by event id.
 */
export async function listAuditEvents(
  workspaceId: string,
  viewerId: string,
  opts: { before?: number; limit?: number; signIns?: "show" | "hide" } = {},
): Promise<{ events: AuditRow[]; nextBefore: number | null }> {
  const limit = Math.min(Math.max(opts.limit ?? 50, 1), 200);
  const memberAtTheTime = exists(
    db
      .select({ one: sql`1` })
      .from(membership)
      .where(and(eq(membership.workspaceId, workspaceId), eq(membership.userId, auditEvent.actorId), lte(membership.createdAt, auditEvent.at))),
  );
  const rows = await db
    .select({
      id: auditEvent.id,
      at: auditEvent.at,
      action: auditEvent.action,
      actorName: actorUser.name,
      actorEmail: sql<string | null>`coalesce(${actorUser.email}, ${auditEvent.actorEmail})`,
      targetType: auditEvent.targetType,
      targetId: auditEvent.targetId,
      targetName: targetUser.name,
      // one index probe per row (audit_target_idx) in the same query, never a request per row
      targetDeleted: sql<boolean>`(${auditEvent.targetType} = 'sketch' and exists (select 1 from ${auditEvent} as ${deletion}
        where ${deletion.targetType} = 'sketch' and ${deletion.targetId} = ${auditEvent.targetId} and ${deletion.action} = 'sketch.delete'))`,
      detail: auditEvent.detail,
    })
    .from(auditEvent)
    .leftJoin(actorUser, eq(actorUser.id, auditEvent.actorId))
    .leftJoin(targetUser, and(eq(auditEvent.targetType, "user"), eq(targetUser.id, auditEvent.targetId)))
    .where(
      and(
        or(
          eq(auditEvent.workspaceId, workspaceId),
          // a member's account events the owners should see: their sign-ins (unless hidden), and
          // their signing out on every device (a lost laptop, a session someone else may hold)
          and(isNull(auditEvent.workspaceId), inArray(auditEvent.action, opts.signIns === "hide" ? SIGN_OUTS : ["auth.sign_in", ...SIGN_OUTS]), memberAtTheTime),
        ),
        opts.before ? lt(auditEvent.id, opts.before) : undefined,
        actorMay(workspaceId, viewerId, "audit.read"),
      ),
    )
    .orderBy(desc(auditEvent.id))
    .limit(limit + 1);
  const more = rows.length > limit;
  const events = rows.slice(0, limit).map(withoutHiddenDetail);
  return { events, nextBefore: more ? events[events.length - 1].id : null };
}
