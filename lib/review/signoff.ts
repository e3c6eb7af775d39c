import "server-only";
import { db } from "@/db";
import { openThreadsOnSketch, workspaceContacts, type MemberContact } from "@/db/queries/comments";
import { applySignOff, getVersionAccess, listSignOffs, titleBlockOf, type VersionAccess } from "@/db/queries/review";
import { lockRole } from "@/db/queries/sketches";
import { recordAudit } from "../audit";
import { appUrl } from "../env";
import { AppError } from "../errors";
import { sendMailInBackground } from "../mail";
import { can } from "../roles";
import { signOffMail } from "./mail";
import { allowedSteps, decideSignOff, newerThan, noteForOpenThreads, SIGN_OFF_RULES, SIGN_OFF_STEPS, STATE_WORDS, type SignOffStep } from "./rules";

type Actor = { id: string; email: string; name: string };

const NO_VERSION = "No such version, or you are not a member of its workspace.";

export function versionUrl(workspaceId: string, sketchId: string, number: number): string {
  return `${appUrl()}/workspaces/${workspaceId}/sketches/${sketchId}/versions/${number}`;
}

/** The version's sign-off as its reader sees it: state, record, title block, and the steps open to them. */
export async function readSignOff(sketchId: string, number: number, viewerId: string) {
  const access = await getVersionAccess(sketchId, number, viewerId);
  if (!access || !access.role || !can(access.role, "sketch.read")) throw new AppError("not_found", NO_VERSION);
  const [entries, openThreads] = await Promise.all([listSignOffs(access.versionId), openThreadsOnSketch(sketchId)]);
  const contacts = await workspaceContacts(access.workspaceId, db, access.authorId ? [access.authorId] : []);
  const authorName = contacts[0]?.name ?? "a deleted account";
  const isAuthor = access.authorId === viewerId;
  const isChecker = access.checkedBy === viewerId;
  const newer = newerThan(access);
  const allowed = allowedSteps({ role: access.role, isAuthor, isChecker, state: access.reviewState, newer });
  return {
    state: access.reviewState,
    sentence: STATE_WORDS[access.reviewState].sentence,
    entries,
    titleBlock: titleBlockOf({ name: authorName, date: access.createdAt }, entries),
    you: { role: access.role, isAuthor, isChecker },
    allowed,
    /** the sketch's latest version, when it is newer than this one */
    newer,
    /** open comment threads per version of the sketch (versions not approved; this one too): a check or an approval over them needs a note */
    openThreads,
    /** why an owner may not approve this checked version, and what would let someone approve it (null otherwise) */
    approval: access.reviewState === "checked" && access.role === "owner" && !allowed.includes("approve") ? await approvalRefusal(access, viewerId, isAuthor, isChecker) : null,
  };
}
export type SignOffRead = Awaited<ReturnType<typeof readSignOff>>;

/** What an owner who may not approve a checked version is told: the rule's reason, and whether anyone else could approve it. */
export type ApprovalRefusal = {
  reason: string;
  /** set when no other owner of the workspace may approve it: what to do about that */
  remedy: string | null;
  /** the workspace's Members page, where an owner makes a colleague an owner */
  membersPath: string;
};

async function approvalRefusal(access: VersionAccess, viewerId: string, isAuthor: boolean, isChecker: boolean): Promise<ApprovalRefusal | null> {
  const decision = decideSignOff({ step: "approve", role: "owner", isAuthor, isChecker, state: access.reviewState });
  if (decision.ok) return null;
  const owners = (await workspaceContacts(access.workspaceId)).filter((c) => c.role === "owner" && c.id !== viewerId);
  const approvers = owners.filter((c) => c.id !== access.authorId && c.id !== access.checkedBy);
  const remedy =
    owners.length === 0
      ? "This workspace has no other owner: make a colleague an owner on the Members page to approve it."
      : approvers.length === 0
        ? `This workspace's only other owner ${owners.some((c) => c.id === access.checkedBy) ? "checked" : "prepared"} this version: make another colleague an owner on the Members page to approve it.`
        : null;
  return { reason: decision.reason, remedy, membersPath: `/workspaces/${access.workspaceId}/members` };
}

/**
 * The caller's standing on a version before any complaint about a sign-off request's body: 404 when
 * the version does not exist or the caller is not a member, 403 when the rules offer the caller no
 * step on it from any state (a viewer who did not prepare it). Who may take the step a readable
 * body names is decided with that step (`takeSignOffStep`), with the rule's own reason.
 */
export async function requireSignOffParty(sketchId: string, number: number, userId: string): Promise<void> {
  const access = await getVersionAccess(sketchId, number, userId);
  if (!access || !access.role) throw new AppError("not_found", NO_VERSION);
  const who = { role: access.role, isAuthor: access.authorId === userId, isChecker: access.checkedBy === userId };
  const some = SIGN_OFF_STEPS.some((step) => SIGN_OFF_RULES[step].from.some((state) => decideSignOff({ ...who, step, state }).ok));
  if (!some) throw new AppError("forbidden", "Your role reads the sign-off of this version but takes no step in it.");
}

/** Who hears about a step: the people it concerns, minus the one who took it and anyone who turned mail off. */
function recipients(step: SignOffStep, contacts: MemberContact[], people: { authorId: string | null; checkerId: string | null; approverIds: string[]; actorId: string }) {
  const byId = (ids: Array<string | null>) => contacts.filter((c) => ids.includes(c.id));
  let list: MemberContact[];
  if (step === "submit") {
    const checkers = contacts.filter((c) => c.role === "checker");
    list = checkers.length ? checkers : contacts.filter((c) => c.role === "owner");
  } else if (step === "check") list = [...byId([people.authorId]), ...contacts.filter((c) => c.role === "owner")];
  else if (step === "return") list = byId([people.authorId]);
  else if (step === "approve") list = byId([people.authorId, people.checkerId]);
  else list = byId([people.authorId, people.checkerId, ...people.approverIds]);
  const seen = new Set<string>();
  return list.filter((c) => c.id !== people.actorId && c.emailNotifications && !seen.has(c.id) && seen.add(c.id));
}

/**
 * Take a sign-off step on a version. The version row is locked and the member's role held
 * (FOR SHARE) while the rules table decides; a refusal is 403 (who) or 409 (the state) with
 * the rule's reason. Recorded in the sign-off record and the audit log; mail goes to the
 * people involved once it is committed.
 */
export async function takeSignOffStep(sketchId: string, number: number, actor: Actor, input: { step: SignOffStep; note?: string }) {
  const note = input.note?.trim() ?? "";
  const outcome = await db.transaction(async (tx) => {
    const access = await getVersionAccess(sketchId, number, actor.id, tx, true);
    const role = access ? await lockRole(tx, access.workspaceId, actor.id) : null;
    if (!access || !role) throw new AppError("not_found", NO_VERSION);
    const decision = decideSignOff({ step: input.step, role, isAuthor: access.authorId === actor.id, isChecker: access.checkedBy === actor.id, state: access.reviewState, newer: newerThan(access) });
    if (!decision.ok) throw new AppError(decision.code, decision.reason, { extra: { state: access.reviewState } });
    const rule = SIGN_OFF_RULES[input.step];
    if (rule.noteRequired && !note) {
      const what = input.step === "return" ? "Say what needs to change" : "Give the reason for withdrawing the approval";
      throw new AppError("validation_failed", `${what}.`, { fields: [{ path: "note", message: `${what}.` }] });
    }
    // a check or an approval over open questions says why it stands (the threads are counted in
    // the transaction, after the version's lock: a thread resolved a moment ago counts as resolved)
    const openThreads = rule.noteWhenThreadsOpen && !note ? await openThreadsOnSketch(sketchId, tx) : [];
    const unanswered = noteForOpenThreads(input.step, openThreads, number);
    if (unanswered) throw new AppError("validation_failed", unanswered, { fields: [{ path: "note", message: unanswered }], extra: { openThreads } });
    const entry = await applySignOff(tx, { versionId: access.versionId, workspaceId: access.workspaceId, step: input.step, from: access.reviewState, to: decision.to, actor, note });
    if (!entry) throw new AppError("conflict", "The version changed while you were deciding; reload it.");
    await recordAudit(
      {
        action: `signoff.${input.step}`,
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: access.workspaceId,
        targetType: "sketch",
        targetId: sketchId,
        detail: { sketchId, title: access.sketchTitle, number, versionId: access.versionId, ...(note ? { note } : {}) },
      },
      tx,
    );
    const history = await listSignOffs(access.versionId, tx);
    return { access, entry, to: decision.to, approverIds: history.filter((e) => e.step === "approve" && e.actorId).map((e) => e.actorId!) };
  });

  const { access } = outcome;
  const contacts = await workspaceContacts(access.workspaceId);
  const url = versionUrl(access.workspaceId, sketchId, number);
  const checkerId = input.step === "check" ? actor.id : access.checkedBy;
  for (const c of recipients(input.step, contacts, { authorId: access.authorId, checkerId, approverIds: outcome.approverIds, actorId: actor.id })) {
    sendMailInBackground(signOffMail({ to: c.email, name: c.name, actorName: actor.name, step: input.step, sketchTitle: access.sketchTitle, number, note, url }));
  }
  return { state: outcome.to, entry: outcome.entry };
}
