import "server-only";
import { and, desc, eq, gt, isNull, sql } from "drizzle-orm";
import { db } from "@/db";
import { invitation, user, workspace } from "@/db/schema";
import type { Role } from "@/lib/roles";
import type { DbOrTx } from "./tx";
import { actorMay } from "./workspaces";

export type InvitationStatus = "pending" | "expired" | "used" | "withdrawn";

function statusOf(row: { acceptedAt: Date | null; withdrawnAt: Date | null; expiresAt: Date }, now = new Date()): InvitationStatus {
  if (row.acceptedAt) return "used";
  if (row.withdrawnAt) return "withdrawn";
  if (row.expiresAt.getTime() <= now.getTime()) return "expired";
  return "pending";
}

/**
 * A new invitation from an owner. Earlier open invitations to the same address in the same
 * workspace are withdrawn, so only the newest link works. Returns null when the actor may not invite.
 */
export async function createInvitation(
  input: { workspaceId: string; actorId: string; email: string; role: Role; tokenHash: string; expiresAt: Date },
  tx: DbOrTx,
) {
  const [allowed] = await tx
    .select({ id: workspace.id, name: workspace.name })
    .from(workspace)
    .where(and(eq(workspace.id, input.workspaceId), actorMay(workspace.id, input.actorId, "invitations.create")))
    .for("share");
  if (!allowed) return null;
  await tx
    .update(invitation)
    .set({ withdrawnAt: new Date() })
    .where(
      and(
        eq(invitation.workspaceId, input.workspaceId),
        eq(invitation.email, input.email),
        isNull(invitation.acceptedAt),
        isNull(invitation.withdrawnAt),
      ),
    );
  const [row] = await tx
    .insert(invitation)
    .values({
      workspaceId: input.workspaceId,
      email: input.email,
      role: input.role,
      tokenHash: input.tokenHash,
      invitedBy: input.actorId,
      expiresAt: input.expiresAt,
    })
    .returning();
  return { invitation: row, workspaceName: allowed.name };
}

export type InvitationRow = {
  id: string;
  email: string;
  role: Role;
  invitedBy: string | null;
  createdAt: Date;
  expiresAt: Date;
  status: InvitationStatus;
};

/** Open invitations (pending or expired, not used or withdrawn), newest first; empty unless the viewer may list them. */
export async function listInvitations(workspaceId: string, viewerId: string): Promise<InvitationRow[]> {
  const rows = await db
    .select({
      id: invitation.id,
      email: invitation.email,
      role: invitation.role,
      invitedBy: user.name,
      createdAt: invitation.createdAt,
      expiresAt: invitation.expiresAt,
      acceptedAt: invitation.acceptedAt,
      withdrawnAt: invitation.withdrawnAt,
    })
    .from(invitation)
    .leftJoin(user, eq(user.id, invitation.invitedBy))
    .where(
      and(
        eq(invitation.workspaceId, workspaceId),
        isNull(invitation.acceptedAt),
        isNull(invitation.withdrawnAt),
        actorMay(workspaceId, viewerId, "invitations.list"),
      ),
    )
    .orderBy(desc(invitation.createdAt))
    .limit(200);
  const now = new Date();
  return rows.map(({ acceptedAt: _a, withdrawnAt: _w, ...r }) => ({ ...r, status: statusOf({ ...r, acceptedAt: null, withdrawnAt: null }, now) }));
}

/** Withdraw an open invitation; null when there is none or the actor may not. */
export async function withdrawInvitation(input: { workspaceId: string; invitationId: string; actorId: string }, tx: DbOrTx = db) {
  const [row] = await tx
    .update(invitation)
    .set({ withdrawnAt: new Date() })
    .where(
      and(
        eq(invitation.id, input.invitationId),
        eq(invitation.workspaceId, input.workspaceId),
        isNull(invitation.acceptedAt),
        isNull(invitation.withdrawnAt),
        actorMay(input.workspaceId, input.actorId, "invitations.withdraw"),
      ),
    )
    .returning({ id: invitation.id, email: invitation.email, role: invitation.role });
  return row ?? null;
}

export type InvitationView = {
  id: string;
  workspaceId: string;
  workspaceName: string;
  email: string;
  role: Role;
  inviterName: string | null;
  expiresAt: Date;
  status: InvitationStatus;
  /** the workspace was deleted since (its open invitations were withdrawn then) */
  workspaceDeleted?: boolean;
};

/** What an invitation link leads to (for its page), by the hash of the link's token. */
export async function findInvitation(tokenHash: string): Promise<InvitationView | null> {
  const [row] = await db
    .select({
      id: invitation.id,
      workspaceId: invitation.workspaceId,
      workspaceName: workspace.name,
      email: invitation.email,
      role: invitation.role,
      inviterName: user.name,
      expiresAt: invitation.expiresAt,
      acceptedAt: invitation.acceptedAt,
      withdrawnAt: invitation.withdrawnAt,
      deletedAt: workspace.deletedAt,
    })
    .from(invitation)
    .innerJoin(workspace, eq(workspace.id, invitation.workspaceId))
    .leftJoin(user, eq(user.id, invitation.invitedBy))
    .where(eq(invitation.tokenHash, tokenHash));
  if (!row) return null;
  const { acceptedAt: _accepted, withdrawnAt: _withdrawn, deletedAt, ...rest } = row;
  return { ...rest, status: statusOf(row), ...(deletedAt ? { workspaceDeleted: true } : {}) };
}

/**
 * Use the invitation once: marks it accepted only while it is open and unexpired, in one
 * UPDATE, so two concurrent clicks cannot both succeed. Null when it was not open.
 */
export async function claimInvitation(input: { tokenHash: string; userId: string }, tx: DbOrTx) {
  const [row] = await tx
    .update(invitation)
    .set({ acceptedAt: new Date(), acceptedBy: input.userId })
    .where(
      and(
        eq(invitation.tokenHash, input.tokenHash),
        isNull(invitation.acceptedAt),
        isNull(invitation.withdrawnAt),
        gt(invitation.expiresAt, sql`now()`),
      ),
    )
    .returning({ id: invitation.id, workspaceId: invitation.workspaceId, email: invitation.email, role: invitation.role });
  return row ?? null;
}
