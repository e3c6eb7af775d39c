import "server-only";
import { and, desc, eq, inArray, isNull, lt, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { auditEvent, membership, user } from "@/db/schema";
import { actorMay } from "./workspaces";

const actorUser = alias(user, "actor_user");
const targetUser = alias(user, "target_user");

export type AuditRow = {
  id: number;
  at: Date;
  action: string;
  actorName: string | null;
  actorEmail: string | null;
  targetType: string | null;
  targetId: string | null;
  targetName: string | null;
  detail: Record<string, unknown>;
};

/**
 * A workspace's audit log, newest first: its own events plus the sign-ins of its current
 * members. Empty unless the viewer may read it. `before` pages back by event id.
 */
export async function listAuditEvents(
  workspaceId: string,
  viewerId: string,
  opts: { before?: number; limit?: number } = {},
): Promise<{ events: AuditRow[]; nextBefore: number | null }> {
  const limit = Math.min(Math.max(opts.limit ?? 50, 1), 200);
  const members = db.select({ id: membership.userId }).from(membership).where(eq(membership.workspaceId, workspaceId));
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
      detail: auditEvent.detail,
    })
    .from(auditEvent)
    .leftJoin(actorUser, eq(actorUser.id, auditEvent.actorId))
    .leftJoin(targetUser, and(eq(auditEvent.targetType, "user"), eq(targetUser.id, auditEvent.targetId)))
    .where(
      and(
        or(
          eq(auditEvent.workspaceId, workspaceId),
          and(isNull(auditEvent.workspaceId), eq(auditEvent.action, "auth.sign_in"), inArray(auditEvent.actorId, members)),
        ),
        opts.before ? lt(auditEvent.id, opts.before) : undefined,
        actorMay(workspaceId, viewerId, "audit.read"),
      ),
    )
    .orderBy(desc(auditEvent.id))
    .limit(limit + 1);
  const more = rows.length > limit;
  const events = rows.slice(0, limit);
  return { events, nextBefore: more ? events[events.length - 1].id : null };
}
