import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { account, membership, session, user, verification, workspace } from "@/db/schema";
import type { Role } from "@/lib/roles";
import type { DbOrTx } from "./tx";

export type HeldWorkspace = { id: string; name: string; role: Role; members: number; owners: number };

/** Every workspace the person is in, with how many members and owners it has. */
export async function workspacesHeldBy(userId: string, tx: DbOrTx = db): Promise<HeldWorkspace[]> {
  const rows = await tx
    .select({
      id: workspace.id,
      name: workspace.name,
      role: membership.role,
      members: sql<number>`(select count(*) from membership m where m.workspace_id = ${workspace.id})`,
      owners: sql<number>`(select count(*) from membership m where m.workspace_id = ${workspace.id} and m.role = 'owner')`,
    })
    .from(membership)
    .innerJoin(workspace, eq(workspace.id, membership.workspaceId))
    .where(eq(membership.userId, userId))
    .orderBy(workspace.name);
  return rows.map((r) => ({ ...r, members: Number(r.members), owners: Number(r.owners) }));
}

/** Lock the owner rows of every workspace the person owns, so no one else's role changes under the check. */
export async function lockOwnersAround(userId: string, tx: DbOrTx): Promise<void> {
  await tx
    .select({ userId: membership.userId })
    .from(membership)
    .where(and(eq(membership.role, "owner"), sql`${membership.workspaceId} in (select workspace_id from membership where user_id = ${userId} and role = 'owner')`))
    .for("update");
}

/** The placeholder address of a deleted account: `.invalid` never delivers (RFC 2606), and the real address is free again. */
export const tombstoneEmail = (userId: string) => `deleted-${userId.toLowerCase()}@deleted.invalid`;
export const tombstoneName = (name: string) => `former member: ${name}`.slice(0, 120);

/**
 * Leave the person's row as a tombstone: the name kept as "former member: <name>" (so their
 * versions, comments and sign-offs still say who), a placeholder address, no notifications; their
 * password, sessions, reset links and memberships go.
 */
export async function tombstoneUser(userId: string, tx: DbOrTx) {
  const [row] = await tx.select({ name: user.name, email: user.email, deletedAt: user.deletedAt }).from(user).where(eq(user.id, userId)).for("update");
  if (!row || row.deletedAt) return null;
  await tx.delete(membership).where(eq(membership.userId, userId));
  await tx.delete(session).where(eq(session.userId, userId));
  await tx.delete(account).where(eq(account.userId, userId));
  await tx.delete(verification).where(eq(verification.value, userId));
  await tx
    .update(user)
    .set({ name: tombstoneName(row.name), email: tombstoneEmail(userId), emailVerified: false, image: null, emailNotifications: false, deletedAt: new Date(), updatedAt: new Date() })
    .where(and(eq(user.id, userId)));
  return row;
}
