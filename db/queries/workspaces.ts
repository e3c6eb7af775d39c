import "server-only";
import { and, asc, count, eq, exists, inArray, sql, type SQL } from "drizzle-orm";
import { alias, type AnyPgColumn } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { membership, user, workspace } from "@/db/schema";
import type { DbOrTx } from "./tx";
import { PERMISSIONS, type Permission, type Role } from "@/lib/roles";

const actor = alias(membership, "actor");

/**
 * `EXISTS (the actor holds one of the roles allowed `permission` in the workspace)`: put it in
 * the WHERE clause of every read and write so the role check and the act are one statement.
 */
export function actorMay(workspaceId: string | AnyPgColumn, actorId: string, permission: Permission): SQL {
  return exists(
    db
      .select({ one: sql`1` })
      .from(actor)
      .where(and(eq(actor.workspaceId, workspaceId), eq(actor.userId, actorId), inArray(actor.role, [...PERMISSIONS[permission]]))),
  );
}

/** The caller's role in a workspace, or null when they are not a member. */
export async function getRole(workspaceId: string, userId: string, tx: DbOrTx = db): Promise<Role | null> {
  const [row] = await tx
    .select({ role: membership.role })
    .from(membership)
    .where(and(eq(membership.workspaceId, workspaceId), eq(membership.userId, userId)));
  return row?.role ?? null;
}

export type WorkspaceSummary = { id: string; name: string; personal: boolean; role: Role; memberCount: number };

/** Every workspace the user belongs to, personal first, then by name. */
export async function listWorkspacesForUser(userId: string): Promise<WorkspaceSummary[]> {
  const counts = db
    .select({ workspaceId: membership.workspaceId, n: count().as("n") })
    .from(membership)
    .groupBy(membership.workspaceId)
    .as("counts");
  const rows = await db
    .select({ id: workspace.id, name: workspace.name, personalOf: workspace.personalOf, role: membership.role, memberCount: counts.n })
    .from(membership)
    .innerJoin(workspace, eq(workspace.id, membership.workspaceId))
    .innerJoin(counts, eq(counts.workspaceId, workspace.id))
    .where(eq(membership.userId, userId))
    .orderBy(sql`${workspace.personalOf} is null`, asc(workspace.name));
  return rows.map((r) => ({ id: r.id, name: r.name, personal: r.personalOf === userId, role: r.role, memberCount: Number(r.memberCount) }));
}

/** The workspace as its member sees it (null for anyone else: not found, never forbidden). */
export async function getWorkspaceForMember(workspaceId: string, userId: string) {
  const [row] = await db
    .select({ id: workspace.id, name: workspace.name, personalOf: workspace.personalOf, createdAt: workspace.createdAt, role: membership.role })
    .from(workspace)
    .innerJoin(membership, and(eq(membership.workspaceId, workspace.id), eq(membership.userId, userId)))
    .where(eq(workspace.id, workspaceId));
  return row ? { ...row, personal: row.personalOf === userId } : null;
}

export async function createWorkspace(
  input: { name: string; ownerId: string; personalOf?: string | null },
  tx: DbOrTx = db,
): Promise<{ id: string; name: string }> {
  const [ws] = await tx
    .insert(workspace)
    .values({ name: input.name, personalOf: input.personalOf ?? null })
    .returning({ id: workspace.id, name: workspace.name });
  await tx.insert(membership).values({ workspaceId: ws.id, userId: input.ownerId, role: "owner" });
  return ws;
}

/** The personal workspace every account gets at sign-up (once). */
export async function ensurePersonalWorkspace(u: { id: string; name: string }, tx: DbOrTx = db): Promise<string> {
  const [existing] = await tx.select({ id: workspace.id }).from(workspace).where(eq(workspace.personalOf, u.id));
  if (existing) return existing.id;
  const first = u.name.trim().split(/\s+/)[0];
  const ws = await createWorkspace({ name: first ? `${first}'s workspace` : "Personal workspace", ownerId: u.id, personalOf: u.id }, tx);
  return ws.id;
}

export async function renameWorkspace(input: { workspaceId: string; actorId: string; name: string }, tx: DbOrTx = db) {
  const [row] = await tx
    .update(workspace)
    .set({ name: input.name })
    .where(and(eq(workspace.id, input.workspaceId), actorMay(workspace.id, input.actorId, "workspace.rename")))
    .returning({ id: workspace.id, name: workspace.name });
  return row ?? null;
}

export type MemberRow = { userId: string; name: string; email: string; role: Role; joinedAt: Date };

/** Members of a workspace, owners first; empty unless the viewer is a member. */
export async function listMembers(workspaceId: string, viewerId: string): Promise<MemberRow[]> {
  return db
    .select({ userId: user.id, name: user.name, email: user.email, role: membership.role, joinedAt: membership.createdAt })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(and(eq(membership.workspaceId, workspaceId), actorMay(workspaceId, viewerId, "members.list")))
    .orderBy(sql`array_position(array['owner','editor','checker','viewer']::workspace_role[], ${membership.role})`, asc(user.name));
}

export async function findMember(workspaceId: string, userId: string, tx: DbOrTx = db) {
  const [row] = await tx
    .select({ userId: user.id, name: user.name, email: user.email, role: membership.role })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(and(eq(membership.workspaceId, workspaceId), eq(membership.userId, userId)));
  return row ?? null;
}

/** Lock the workspace's owner rows for this transaction and count them (no race can leave zero owners). */
async function lockOwners(tx: DbOrTx, workspaceId: string): Promise<number> {
  const owners = await tx
    .select({ userId: membership.userId })
    .from(membership)
    .where(and(eq(membership.workspaceId, workspaceId), eq(membership.role, "owner")))
    .for("update");
  return owners.length;
}

export type MemberChange =
  | { ok: true; member: { userId: string; name: string; email: string }; previousRole: Role; role: Role | null }
  | { ok: false; reason: "not_found" | "last_owner" | "forbidden" };

/** Change a member's role; refuses to demote the last owner. The actor's role is checked in the UPDATE. */
export async function changeMemberRole(
  input: { workspaceId: string; actorId: string; userId: string; role: Role },
  tx: DbOrTx,
): Promise<MemberChange> {
  const owners = await lockOwners(tx, input.workspaceId);
  const target = await findMember(input.workspaceId, input.userId, tx);
  if (!target) return { ok: false, reason: "not_found" };
  if (target.role === "owner" && input.role !== "owner" && owners <= 1) return { ok: false, reason: "last_owner" };
  const updated = await tx
    .update(membership)
    .set({ role: input.role })
    .where(
      and(
        eq(membership.workspaceId, input.workspaceId),
        eq(membership.userId, input.userId),
        actorMay(input.workspaceId, input.actorId, "members.changeRole"),
      ),
    )
    .returning({ role: membership.role });
  if (!updated.length) return { ok: false, reason: "forbidden" };
  return { ok: true, member: target, previousRole: target.role, role: input.role };
}

/** Remove a member (an owner removing someone, or anyone leaving); never the last owner. */
export async function removeMember(input: { workspaceId: string; actorId: string; userId: string }, tx: DbOrTx): Promise<MemberChange> {
  const owners = await lockOwners(tx, input.workspaceId);
  const target = await findMember(input.workspaceId, input.userId, tx);
  if (!target) return { ok: false, reason: "not_found" };
  if (target.role === "owner" && owners <= 1) return { ok: false, reason: "last_owner" };
  const leaving = input.actorId === input.userId;
  const deleted = await tx
    .delete(membership)
    .where(
      and(
        eq(membership.workspaceId, input.workspaceId),
        eq(membership.userId, input.userId),
        leaving ? undefined : actorMay(input.workspaceId, input.actorId, "members.remove"),
      ),
    )
    .returning({ userId: membership.userId });
  if (!deleted.length) return { ok: false, reason: "forbidden" };
  return { ok: true, member: target, previousRole: target.role, role: null };
}

/** Add a member (accepting an invitation); an existing member keeps the role they have. */
export async function addMember(input: { workspaceId: string; userId: string; role: Role }, tx: DbOrTx): Promise<{ added: boolean; role: Role }> {
  const inserted = await tx
    .insert(membership)
    .values({ workspaceId: input.workspaceId, userId: input.userId, role: input.role })
    .onConflictDoNothing()
    .returning({ role: membership.role });
  if (inserted.length) return { added: true, role: input.role };
  const role = await getRole(input.workspaceId, input.userId, tx);
  return { added: false, role: role ?? input.role };
}

/** True when an account with this e-mail already belongs to the workspace. */
export async function isMemberByEmail(workspaceId: string, email: string, tx: DbOrTx = db): Promise<boolean> {
  const [row] = await tx
    .select({ userId: membership.userId })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(and(eq(membership.workspaceId, workspaceId), eq(sql`lower(${user.email})`, email.toLowerCase())));
  return Boolean(row);
}
