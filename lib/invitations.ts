import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { db } from "@/db";
import { claimInvitation, createInvitation, findInvitation, type InvitationView } from "@/db/queries/invitations";
import { addMember, isMemberByEmail } from "@/db/queries/workspaces";
import { invitation, user } from "@/db/schema";
import { recordAudit } from "./audit";
import { appUrl, invitationTtlHours } from "./env";
import { AppError } from "./errors";
import { sendMail } from "./mail";
import { invitationMail } from "./mail-templates";
import type { Role } from "./roles";

/** Links carry a random token; the database keeps only its SHA-256. */
export function newInvitationToken(): string {
  return randomBytes(32).toString("base64url");
}

export function hashInvitationToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export function invitationUrl(token: string): string {
  return `${appUrl()}/invite/${encodeURIComponent(token)}`;
}

/** The invitation's own page, as a path in the app (where signing in comes back to). */
export function invitationPath(token: string): string {
  return `/invite/${encodeURIComponent(token)}`;
}

/** Sign in with the invited address filled in, then back to the invitation to join. */
export function invitationSignInPath(token: string, email: string): string {
  return `/sign-in?next=${encodeURIComponent(invitationPath(token))}&email=${encodeURIComponent(email)}`;
}

export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

/** An owner invites someone by e-mail. The mail goes out at once; `mailSent` says whether it did. */
export async function inviteMember(input: {
  workspaceId: string;
  actor: { id: string; name: string; email: string };
  email: string;
  role: Role;
}): Promise<{ id: string; email: string; role: Role; expiresAt: Date; url: string; mailSent: boolean }> {
  const email = normalizeEmail(input.email);
  if (await isMemberByEmail(input.workspaceId, email)) {
    throw new AppError("already_member", `${email} is already a member of this workspace.`);
  }
  const token = newInvitationToken();
  const expiresAt = new Date(Date.now() + invitationTtlHours() * 3600 * 1000);
  let replaces = false;
  const created = await db.transaction(async (tx) => {
    // an open link to this address that the new one replaces (createInvitation withdraws it): the mail says so
    const [open] = await tx
      .select({ id: invitation.id })
      .from(invitation)
      .where(
        and(
          eq(invitation.workspaceId, input.workspaceId),
          eq(invitation.email, email),
          isNull(invitation.acceptedAt),
          isNull(invitation.withdrawnAt),
          gt(invitation.expiresAt, new Date()),
        ),
      )
      .limit(1);
    replaces = Boolean(open);
    const made = await createInvitation(
      { workspaceId: input.workspaceId, actorId: input.actor.id, email, role: input.role, tokenHash: hashInvitationToken(token), expiresAt },
      tx,
    );
    if (!made) throw new AppError("forbidden");
    await recordAudit(
      {
        action: "invitation.create",
        actorId: input.actor.id,
        actorEmail: input.actor.email,
        workspaceId: input.workspaceId,
        targetType: "invitation",
        targetId: made.invitation.id,
        detail: { email, role: input.role },
      },
      tx,
    );
    return made;
  });
  const url = invitationUrl(token);
  let mailSent = true;
  try {
    await sendMail(
      invitationMail({ to: email, inviterName: input.actor.name, workspaceName: created.workspaceName, role: input.role, url, expiresAt, replaces }),
    );
  } catch (err) {
    mailSent = false;
    console.error(`[mail] invitation to ${email} was not sent:`, err instanceof Error ? err.message : err);
  }
  return { id: created.invitation.id, email, role: input.role, expiresAt, url, mailSent };
}

/** What a token leads to, or null for a link that never existed. */
export async function lookUpInvitation(token: string): Promise<InvitationView | null> {
  if (!token || token.length > 200) return null;
  return findInvitation(hashInvitationToken(token));
}

/**
 * What a refused link says, on its page and in the API's 410: which state, and whom to ask. The
 * inviter is named when known, so the reader knows who can send a fresh link.
 */
export function invitationRefusal(view: Pick<InvitationView, "status" | "workspaceName" | "inviterName" | "workspaceDeleted">): { title: string; body: string } | null {
  if (view.workspaceDeleted && view.status !== "used") {
    return { title: "This workspace was deleted", body: `"${view.workspaceName}" was deleted after this invitation was sent, so there is nothing to join.${view.inviterName ? ` ${view.inviterName} invited you, if you want to ask why.` : ""}` };
  }
  const ask = view.inviterName ? `${view.inviterName}, who invited you, or another owner of "${view.workspaceName}"` : `an owner of "${view.workspaceName}"`;
  if (view.status === "expired") {
    return { title: "This invitation has expired", body: `Invitation links work for a limited time. Ask ${ask} to send the invitation again; the new mail has a fresh link.` };
  }
  if (view.status === "used") {
    return { title: "This invitation has already been used", body: `Each invitation link works once. If you joined with it, sign in to find the workspace; otherwise ask ${ask} for a new invitation.` };
  }
  if (view.status === "withdrawn") {
    return { title: "This invitation was withdrawn", body: `An owner of the workspace withdrew it, or sent a newer one that replaces it. Use the newest invitation mail, or ask ${ask}.` };
  }
  return null;
}

const REFUSAL_CODE = { expired: "invitation_expired", used: "invitation_used", withdrawn: "invitation_withdrawn" } as const;

/**
 * The error an invitation in this state answers with (null while it can still be used): 404 for a
 * link nobody sent, 410 for one expired, used or withdrawn, with the workspace and inviter beside
 * the code (`error.workspaceName`, `error.inviterName`) so a script can say whom to ask.
 */
export function invitationStateError(view: InvitationView | null): AppError | null {
  if (!view) return new AppError("not_found", "This invitation link is not valid. Check that the whole link was copied.");
  const refusal = invitationRefusal(view);
  if (!refusal || view.status === "pending") return null;
  return new AppError(REFUSAL_CODE[view.status], `${refusal.title}. ${refusal.body}`, {
    extra: { invitationStatus: view.status, workspaceName: view.workspaceName, inviterName: view.inviterName, ...(view.workspaceDeleted ? { workspaceDeleted: true } : {}) },
  });
}

/** An invitation link as `GET /api/invitations/:token` answers it while it can still be used. */
export async function readInvitation(token: string) {
  const view = await lookUpInvitation(token);
  const refused = invitationStateError(view);
  if (refused) throw refused;
  const v = view!;
  return { invitation: { workspaceName: v.workspaceName, email: v.email, role: v.role, inviterName: v.inviterName, expiresAt: v.expiresAt, status: v.status } };
}

/**
 * The signed-in user accepts: the link must be open and addressed to their e-mail. The claim
 * and the membership are one transaction, so a link works exactly once.
 */
export async function acceptInvitation(token: string, who: { id: string; email: string }): Promise<{ workspaceId: string; role: Role }> {
  const view = await lookUpInvitation(token);
  const stateError = invitationStateError(view);
  if (stateError) throw stateError;
  if (normalizeEmail(who.email) !== view!.email) {
    throw new AppError("email_mismatch", `This invitation was sent to ${view!.email}. Sign in with that address to accept it.`);
  }
  return db.transaction(async (tx) => {
    const claimed = await claimInvitation({ tokenHash: hashInvitationToken(token), userId: who.id }, tx);
    if (!claimed) throw invitationStateError(await lookUpInvitation(token)) ?? new AppError("invitation_used");
    const joined = await addMember({ workspaceId: claimed.workspaceId, userId: who.id, role: claimed.role }, tx);
    await recordAudit(
      {
        action: "invitation.accept",
        actorId: who.id,
        actorEmail: who.email,
        workspaceId: claimed.workspaceId,
        targetType: "invitation",
        targetId: claimed.id,
        detail: { role: joined.role, alreadyMember: !joined.added },
      },
      tx,
    );
    return { workspaceId: claimed.workspaceId, role: joined.role };
  });
}

/** True when an account already uses this e-mail (the invitation page then offers sign-in instead). */
export async function accountExists(email: string): Promise<boolean> {
  const [row] = await db.select({ id: user.id }).from(user).where(eq(sql`lower(${user.email})`, normalizeEmail(email)));
  return Boolean(row);
}
