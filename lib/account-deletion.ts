import "server-only";
import { db } from "@/db";
import { lockOwnersAround, tombstoneUser, workspacesHeldBy, type HeldWorkspace } from "@/db/queries/account-deletion";
import { recordAudit } from "./audit";
import { getAuth } from "./auth";
import { appUrl } from "./env";
import { AppError } from "./errors";
import { sendMail } from "./mail";
import { accountDeletedMail } from "./mail-templates";
import { createRateLimiter } from "./rate-limit";
import { afterWorkspaceDeleted, deleteWorkspaceIn, type WorkspaceDeleted } from "./workspace-deletion";

type Actor = { id: string; email: string; name: string };

/**
 * What deleting an account does to each workspace the person is in:
 * - `blocking`: they are its only owner and others are in it: refused until they make someone else
 *   an owner or delete the workspace (its members would be left with no one to manage it);
 * - `deleted`: they are its only member: it is deleted with the account (as an owner deletes a workspace);
 * - `left`: they leave it; what they did there stays under their tombstone name.
 */
export type AccountDeletionPlan = { blocking: HeldWorkspace[]; deleted: HeldWorkspace[]; left: HeldWorkspace[] };

export function planOf(held: HeldWorkspace[]): AccountDeletionPlan {
  const blocking = held.filter((w) => w.role === "owner" && w.owners <= 1 && w.members > 1);
  const deleted = held.filter((w) => w.members <= 1);
  const left = held.filter((w) => !blocking.includes(w) && !deleted.includes(w));
  return { blocking, deleted, left };
}

export async function accountDeletionPlan(userId: string): Promise<AccountDeletionPlan> {
  return planOf(await workspacesHeldBy(userId));
}

const quoted = (names: string[]) => (names.length < 2 ? `“${names[0]}”` : `${names.slice(0, -1).map((n) => `“${n}”`).join(", ")} and “${names[names.length - 1]}”`);

/** The refusal while the person is the last owner of a workspace that has other members, naming each. */
export function lastOwnerRefusal(blocking: HeldWorkspace[]): AppError {
  const one = blocking.length === 1;
  return new AppError(
    "last_owner",
    `You are the only owner of ${quoted(blocking.map((w) => w.name))}, which ${one ? "has" : "have"} other members: make one of them an owner, or delete ${one ? "the workspace" : "those workspaces"}, before deleting your account.`,
    { extra: { workspaces: blocking.map((w) => ({ id: w.id, name: w.name, members: w.members })) } },
  );
}

const attempts = createRateLimiter("account-delete");

function isInvalidPassword(err: unknown): boolean {
  const e = err as { statusCode?: unknown; body?: { code?: unknown } } | null;
  return typeof e === "object" && e !== null && e.statusCode === 400 && e.body?.code === "INVALID_PASSWORD";
}

/** The password of the signed-in account, checked by better-auth (400 naming the `password` field when wrong). */
async function checkPassword(password: string, headers: Headers) {
  try {
    await getAuth().api.verifyPassword({ body: { password }, headers });
  } catch (err) {
    // read by its fields: the class better-auth throws is not always the one imported here (bundled twice under next)
    if (isInvalidPassword(err)) {
      throw new AppError("validation_failed", "That is not your password: nothing was deleted.", { fields: [{ path: "password", message: "That is not your password." }] });
    }
    throw err;
  }
}

/**
 * Delete the signed-in person's account, their password typed again. Refused while they are the last
 * owner of a shared workspace. All or nothing, in one transaction once the password is checked: the
 * owners around them are locked, the plan is read again (someone may have joined or stepped down
 * since the first look) and any refusal comes before anything is deleted; then the workspaces where
 * they are alone go (as an owner deletes a workspace: tombstone and audit records), they leave every
 * other workspace (a `member.leave` record each) and their row becomes a tombstone: the name
 * "former member: <name>" stays on their versions, comments and sign-offs, the address is freed,
 * the password, sessions and reset links go. better-auth's own deleteUser removes the row (and with
 * it every name on the record), so it is not used. After the commit the deleted workspaces' files
 * leave the store, and a mail to the old address says it happened.
 */
export async function deleteAccount(actor: Actor, password: string, headers: Headers) {
  const first = await accountDeletionPlan(actor.id);
  if (first.blocking.length) throw lastOwnerRefusal(first.blocking);
  await attempts.hit(actor.id, 10, 15 * 60);
  await checkPassword(password, headers);

  const removed: WorkspaceDeleted[] = [];
  const out = await db.transaction(async (tx) => {
    await lockOwnersAround(actor.id, tx);
    const now = planOf(await workspacesHeldBy(actor.id, tx));
    // someone joined a workspace of theirs, or an owner stepped down, since the first look: nothing is deleted yet
    if (now.blocking.length) throw lastOwnerRefusal(now.blocking);
    for (const w of now.deleted) removed.push(await deleteWorkspaceIn(tx, w.id, actor, w.name, { onlyMember: true }));
    const workspacesDeleted = removed.map((d) => d.workspace.name);
    const leaving = now.left;
    for (const w of leaving) {
      await recordAudit(
        { action: "member.leave", actorId: actor.id, actorEmail: actor.email, workspaceId: w.id, targetType: "user", targetId: actor.id, detail: { email: actor.email, name: actor.name, role: w.role, accountDeleted: true } },
        tx,
      );
    }
    const row = await tombstoneUser(actor.id, tx);
    if (!row) throw new AppError("not_found", "This account was deleted already.");
    await recordAudit(
      {
        action: "auth.account_delete",
        actorId: actor.id,
        actorEmail: actor.email,
        targetType: "user",
        targetId: actor.id,
        detail: { name: actor.name, workspacesDeleted, left: leaving.map((w) => ({ id: w.id, name: w.name, role: w.role })) },
      },
      tx,
    );
    return { deleted: true as const, workspacesDeleted, left: leaving.map((w) => w.name) };
  });
  for (const d of removed) await afterWorkspaceDeleted(d, actor);
  await sendMail(accountDeletedMail({ to: actor.email, name: actor.name, workspacesDeleted: out.workspacesDeleted, url: appUrl() })).catch((err: unknown) => {
    console.error(`[mail] could not tell ${actor.email} that their account was deleted:`, err instanceof Error ? err.message : err);
  });
  return out;
}
