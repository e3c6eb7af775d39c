import "server-only";
import { db } from "@/db";
import { changeMemberRole, removeMember, renameWorkspace, type MemberChange } from "@/db/queries/workspaces";
import { recordAudit } from "./audit";
import { AppError } from "./errors";
import type { Role } from "./roles";

type Actor = { id: string; email: string };

function refuse(result: Extract<MemberChange, { ok: false }>): never {
  if (result.reason === "last_owner") throw new AppError("last_owner");
  if (result.reason === "not_found") throw new AppError("not_found", "That person is not a member of this workspace.");
  throw new AppError("forbidden");
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
