import "server-only";
import { db } from "@/db";
import {
  emptyAndMarkDeleted,
  lockWorkspaceForDeletion,
  membersToTell,
  sketchesOf,
  uploadKeysOf,
  workspaceContents,
  type WorkspaceContents,
} from "@/db/queries/workspace-deletion";
import type { DbOrTx } from "@/db/queries/tx";
import { getRole } from "@/db/queries/workspaces";
import { nameConfirms } from "@/components/workspaces/format";
import { recordAudit } from "./audit";
import { appUrl } from "./env";
import { AppError } from "./errors";
import { sendMail } from "./mail";
import { workspaceDeletedMail } from "./mail-templates";
import { refusedWords } from "./roles";
import { deleteObjectsQuietly } from "./uploads/objects";

type Actor = { id: string; email: string; name: string };

/**
 * Delete a workspace (owners): the caller types its name to confirm. In one transaction, under a lock
 * on the workspace row: each sketch is deleted as a sketch deletion is (a `sketch.delete` audit
 * record per sketch, so a link to it says it was deleted and with what), then its remaining files'
 * rows, memberships, and open invitations (withdrawn); the row stays as a tombstone and the
 * `workspace.delete` record keeps the counts and who were members (their ids let their open pages
 * say what happened). After the commit the files leave the store and the other members get a mail;
 * neither can undo the deletion when it fails (logged).
 */
export async function deleteWorkspace(workspaceId: string, actor: Actor, confirmName: string) {
  const done = await db.transaction((tx) => deleteWorkspaceIn(tx, workspaceId, actor, confirmName));
  await afterWorkspaceDeleted(done, actor);
  return done.workspace;
}

export type WorkspaceDeleted = {
  workspace: { id: string; name: string; deleted: true; contents: WorkspaceContents };
  /** the store's object keys of its files, to remove once the transaction has committed */
  keys: string[];
  /** the members other than the caller, to mail once it has committed */
  told: { name: string; email: string; id: string }[];
};

/**
 * The database part of a workspace deletion, inside the caller's transaction (so deleting an
 * account can take its workspaces with it all or nothing). With `onlyMember`, it is refused (409)
 * when anyone but the caller is a member by the time the row is locked.
 */
export async function deleteWorkspaceIn(tx: DbOrTx, workspaceId: string, actor: Actor, confirmName: string, opts: { onlyMember?: boolean } = {}): Promise<WorkspaceDeleted> {
  const ws = await lockWorkspaceForDeletion(workspaceId, actor.id, tx);
  if (!ws) {
    // gone since the page was read, or the caller is no longer an owner
    const role = await getRole(workspaceId, actor.id, tx);
    if (!role) throw new AppError("not_found", "No such workspace, or you are not a member of it.");
    throw new AppError("forbidden", refusedWords(role, "workspace.delete"));
  }
  if (!nameConfirms(confirmName, ws.name)) {
    throw new AppError("validation_failed", `Type the workspace's name, ${ws.name}, exactly as it is written, to delete it.`, {
      fields: [{ path: "confirmName", message: `Type “${ws.name}” to confirm.` }],
    });
  }
  const contents = await workspaceContents(workspaceId, tx);
  const members = await membersToTell(workspaceId, tx);
  const told = members.filter((m) => m.id !== actor.id);
  if (opts.onlyMember && told.length) {
    throw new AppError("conflict", `Someone joined “${ws.name}” meanwhile: nothing was deleted. Look at its members, then try again.`);
  }
  const sketches = await sketchesOf(workspaceId, tx);
  const keys = await uploadKeysOf(workspaceId, tx);
  for (const s of sketches) {
    await recordAudit(
      {
        action: "sketch.delete",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId,
        targetType: "sketch",
        targetId: s.id,
        detail: { sketchId: s.id, title: s.title, versions: s.latestVersion, withWorkspace: true },
      },
      tx,
    );
  }
  await emptyAndMarkDeleted(
    workspaceId,
    actor.id,
    sketches.map((s) => s.id),
    tx,
  );
  await recordAudit(
    {
      action: "workspace.delete",
      actorId: actor.id,
      actorEmail: actor.email,
      workspaceId,
      targetType: "workspace",
      targetId: workspaceId,
      detail: {
        name: ws.name,
        ...contents,
        memberIds: members.map((m) => m.id),
        formerMembers: members.map((m) => ({ email: m.email, name: m.name, role: m.role })),
      },
    },
    tx,
  );
  return { workspace: { id: workspaceId, name: ws.name, deleted: true as const, contents }, keys, told };
}

/** After the commit: the files leave the store and the other members are mailed (failures logged, the deletion stands). */
export async function afterWorkspaceDeleted(done: WorkspaceDeleted, actor: Actor) {
  await deleteObjectsQuietly(done.keys);
  await tellMembers(done.told, done.workspace.name, actor.name, done.workspace.contents);
}

async function tellMembers(members: { name: string; email: string }[], workspaceName: string, deletedBy: string, contents: WorkspaceContents) {
  const url = `${appUrl()}/workspaces`;
  await Promise.all(
    members.map((m) =>
      sendMail(workspaceDeletedMail({ to: m.email, name: m.name, workspaceName, deletedBy, sketches: contents.sketches, versions: contents.versions, url })).catch((err: unknown) => {
        console.error(`[mail] could not tell ${m.email} that "${workspaceName}" was deleted:`, err instanceof Error ? err.message : err);
      }),
    ),
  );
}
