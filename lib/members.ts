import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { changeMemberRole, removeMember, renameWorkspace, type MemberChange } from "@/db/queries/workspaces";
import { auditEvent, workspace } from "@/db/schema";
import { recordAudit } from "./audit";
import { AppError } from "./errors";
import type { Role } from "./roles";

type Actor = { id: string; email: string };

function refuse(result: Extract<MemberChange, { ok: false }>): never {
  if (result.reason === "last_owner") throw new AppError("last_owner");
  if (result.reason === "not_found") throw new AppError("not_found", "That person is not a member of this workspace.");
  throw new AppError("forbidden");
}

/**
 * The name of a workspace this person left themselves (their own "left the workspace" in its audit
 * log), for the notice on the workspaces list after leaving. Anything else, a malformed id or a
 * workspace they never left, is null: the address cannot make the page name a workspace.
 */
export async function leftWorkspaceName(userId: string, workspaceId: string | undefined): Promise<string | null> {
  if (!z.uuid().safeParse(workspaceId).success) return null;
  const [row] = await db
    .select({ name: workspace.name })
    .from(auditEvent)
    .innerJoin(workspace, eq(workspace.id, auditEvent.workspaceId))
    .where(and(eq(auditEvent.workspaceId, workspaceId!), eq(auditEvent.actorId, userId), eq(auditEvent.action, "member.leave")))
    .orderBy(desc(auditEvent.id))
    .limit(1);
  return row?.name ?? null;
}

/** An owner changes a member's role (the last owner cannot be demoted). */
export async function changeRole(workspaceId: string, actor: Actor, userId: string, role: Role) {
  return db.transaction(async (tx) => {
    const result = await changeMemberRole({ workspaceId, actorId: actor.id, userId, role }, tx);
    if (!result.ok) refuse(result);
    if (result.previousRole !== role) {
      await recordAudit(
        {
          action: "member.role_change",
          actorId: actor.id,
          actorEmail: actor.email,
          workspaceId,
          targetType: "user",
          targetId: userId,
          detail: { email: result.member.email, from: result.previousRole, to: role },
        },
        tx,
      );
    }
    return { userId, role };
  });
}

/** An owner removes a member, or a member leaves (the last owner can do neither). */
export async function removeFromWorkspace(workspaceId: string, actor: Actor, userId: string) {
  return db.transaction(async (tx) => {
    const result = await removeMember({ workspaceId, actorId: actor.id, userId }, tx);
    if (!result.ok) refuse(result);
    const leaving = actor.id === userId;
    await recordAudit(
      {
        action: leaving ? "member.leave" : "member.remove",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId,
        targetType: "user",
        targetId: userId,
        detail: { email: result.member.email, name: result.member.name, role: result.previousRole },
      },
      tx,
    );
    return { userId, removed: true };
  });
}

export async function rename(workspaceId: string, actor: Actor, name: string) {
  return db.transaction(async (tx) => {
    const row = await renameWorkspace({ workspaceId, actorId: actor.id, name }, tx);
    if (!row) throw new AppError("forbidden");
    await recordAudit({ action: "workspace.rename", actorId: actor.id, actorEmail: actor.email, workspaceId, targetType: "workspace", targetId: workspaceId, detail: { name } }, tx);
    return row;
  });
}
