import "server-only";
import { and, desc, eq, inArray, isNull, sql } from "drizzle-orm";
import { db } from "@/db";
import { auditEvent, comment, invitation, membership, sketch, sketchVersion, upload, user, workspace } from "@/db/schema";
import type { DbOrTx } from "./tx";
import { actorMay } from "./workspaces";

/** What deleting a workspace takes with it, counted for the confirmation and the audit record. */
export type WorkspaceContents = {
  sketches: number;
  versions: number;
  /** versions whose sign-off reached "approved" (evidence that goes unless exported first) */
  approved: number;
  comments: number;
  uploads: number;
  members: number;
};

export async function workspaceContents(workspaceId: string, tx: DbOrTx = db): Promise<WorkspaceContents> {
  const n = (v: unknown) => Number(v ?? 0);
  const [s] = await tx
    .select({ sketches: sql`count(distinct ${sketch.id})`, versions: sql`count(${sketchVersion.id})`, approved: sql`count(${sketchVersion.id}) filter (where ${sketchVersion.reviewState} = 'approved')` })
    .from(sketch)
    .leftJoin(sketchVersion, eq(sketchVersion.sketchId, sketch.id))
    .where(eq(sketch.workspaceId, workspaceId));
  const [c] = await tx
    .select({ n: sql`count(*)` })
    .from(comment)
    .innerJoin(sketchVersion, eq(sketchVersion.id, comment.versionId))
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .where(and(eq(sketch.workspaceId, workspaceId), isNull(comment.deletedAt)));
  const [u] = await tx.select({ n: sql`count(*)` }).from(upload).where(eq(upload.workspaceId, workspaceId));
  const [m] = await tx.select({ n: sql`count(*)` }).from(membership).where(eq(membership.workspaceId, workspaceId));
  return { sketches: n(s?.sketches), versions: n(s?.versions), approved: n(s?.approved), comments: n(c?.n), uploads: n(u?.n), members: n(m?.n) };
}

/**
 * Lock a workspace that is not deleted, for the actor allowed `workspace.delete` (checked in the
 * same statement); null when it is gone or the actor may not.
 */
export async function lockWorkspaceForDeletion(workspaceId: string, actorId: string, tx: DbOrTx) {
  const [row] = await tx
    .select({ id: workspace.id, name: workspace.name, personalOf: workspace.personalOf })
    .from(workspace)
    .where(and(eq(workspace.id, workspaceId), isNull(workspace.deletedAt), actorMay(workspace.id, actorId, "workspace.delete")))
    .for("update");
  return row ?? null;
}

/** Every member with the address to tell them (read before the memberships go). */
export async function membersToTell(workspaceId: string, tx: DbOrTx) {
  return tx
    .select({ id: user.id, name: user.name, email: user.email, role: membership.role })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(eq(membership.workspaceId, workspaceId));
}

export async function sketchesOf(workspaceId: string, tx: DbOrTx) {
  return tx.select({ id: sketch.id, title: sketch.title, latestVersion: sketch.latestVersion }).from(sketch).where(eq(sketch.workspaceId, workspaceId)).for("update");
}

/** The object keys of every file uploaded to the workspace (read before the rows go). */
export async function uploadKeysOf(workspaceId: string, tx: DbOrTx): Promise<string[]> {
  const rows = await tx.select({ key: upload.storageKey, thumb: upload.thumbnailKey }).from(upload).where(eq(upload.workspaceId, workspaceId));
  return rows.flatMap((r) => [r.key, r.thumb].filter((k): k is string => Boolean(k)));
}

/**
 * Empty the workspace and leave its row as a tombstone: sketches (their versions, sign-offs,
 * comments and files cascade), remaining upload rows, memberships; open invitations are withdrawn
 * so their links say so. The row keeps its name and gains `deleted_at`/`deleted_by`; it is no
 * longer anyone's personal workspace.
 */
export async function emptyAndMarkDeleted(workspaceId: string, actorId: string, sketchIds: string[], tx: DbOrTx) {
  if (sketchIds.length) await tx.delete(sketch).where(inArray(sketch.id, sketchIds));
  await tx.delete(upload).where(eq(upload.workspaceId, workspaceId));
  await tx.delete(membership).where(eq(membership.workspaceId, workspaceId));
  await tx
    .update(invitation)
    .set({ withdrawnAt: new Date() })
    .where(and(eq(invitation.workspaceId, workspaceId), isNull(invitation.acceptedAt), isNull(invitation.withdrawnAt)));
  await tx.update(workspace).set({ deletedAt: new Date(), deletedBy: actorId, personalOf: null }).where(eq(workspace.id, workspaceId));
}

export type WorkspaceDeletion = { workspaceId: string; name: string; deletedBy: string | null; deletedAt: Date };

/**
 * Who deleted a workspace and when, for someone who was a member of it then (the ids kept in its
 * `workspace.delete` audit record); null for anyone else and for a workspace not deleted.
 */
export async function getWorkspaceDeletion(workspaceId: string, viewerId: string): Promise<WorkspaceDeletion | null> {
  const [row] = await db
    .select({ name: sql<string | null>`${auditEvent.detail} ->> 'name'`, at: auditEvent.at, actorName: user.name, email: auditEvent.actorEmail })
    .from(auditEvent)
    .leftJoin(user, eq(user.id, auditEvent.actorId))
    .where(and(eq(auditEvent.workspaceId, workspaceId), eq(auditEvent.action, "workspace.delete"), sql`${auditEvent.detail} -> 'memberIds' ? ${viewerId}`))
    .orderBy(desc(auditEvent.id))
    .limit(1);
  if (!row) return null;
  return { workspaceId, name: row.name ?? "The workspace", deletedBy: row.actorName ?? row.email ?? null, deletedAt: row.at };
}

/** `EXISTS (the viewer was a member of the audit row's workspace when it was deleted)`. */
export function wasMemberOfDeleted(workspaceIdColumn: typeof auditEvent.workspaceId, viewerId: string) {
  const w = sql`audit_event w`;
  return sql`exists (select 1 from ${w} where w.workspace_id = ${workspaceIdColumn} and w.action = 'workspace.delete' and w.detail -> 'memberIds' ? ${viewerId})`;
}
