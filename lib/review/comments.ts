import "server-only";
import { db } from "@/db";
import { getCommentAccess, insertComment, listVersionComments, openThreadsOnSketch, setThreadResolved, softDeleteComment, updateCommentBody, workspaceContacts, type CommentAccess, type CommentRow } from "@/db/queries/comments";
import { getVersionAccess } from "@/db/queries/review";
import { openThreadsBesides } from "./rules";
import { lockRole } from "@/db/queries/sketches";
import { getVersion } from "@/db/queries/versions";
import { attachmentsOf, commentAttachmentKeys, deleteCommentAttachments } from "@/db/queries/uploads";
import type { CommentPin } from "@/db/schema";
import type { DbOrTx } from "@/db/queries/tx";
import { recordAudit } from "../audit";
import { AppError } from "../errors";
import { sendMailInBackground } from "../mail";
import { can } from "../roles";
import { mentionedIds } from "./comment-text";
import { threadsOf } from "./threads";
import { mentionMail } from "./mail";
import { versionUrl } from "./signoff";
import { deleteObjectsQuietly } from "../uploads/objects";
import { uploadView, type UploadView } from "../uploads/service";

type Actor = { id: string; email: string; name: string };

const NO_VERSION = "No such version, or you are not a member of its workspace.";
const NO_COMMENT = "No such comment, or you are not a member of its workspace.";
const LOCKED = "This version is approved: it takes no new comments or changes to them. Comment on a newer version, or ask an owner to withdraw the approval.";

export type CommentView = Omit<CommentRow, "mentions" | "parentId" | "pin" | "resolvedAt" | "resolvedByName"> & { mentions: Array<{ id: string; name: string }>; deleted: boolean; attachments: UploadView[] };
export type Thread = { id: string; pin: CommentPin | null; resolvedAt: Date | null; resolvedByName: string | null; comments: CommentView[] };

/** A version's comments as threads (first comment, then replies), with the members who can be mentioned. */
export async function readComments(sketchId: string, number: number, viewerId: string) {
  const access = await getVersionAccess(sketchId, number, viewerId);
  if (!access || !access.role) throw new AppError("not_found", NO_VERSION);
  const [rows, contacts, openOnSketch] = await Promise.all([listVersionComments(access.versionId, viewerId), workspaceContacts(access.workspaceId), openThreadsOnSketch(sketchId)]);
  const names = new Map(contacts.map((c) => [c.id, c.name]));
  const files = new Map<string, UploadView[]>();
  for (const u of await attachmentsOf(rows.filter((r) => !r.deletedAt).map((r) => r.id), viewerId)) files.set(u.commentId!, [...(files.get(u.commentId!) ?? []), uploadView(u)]);
  const view = (r: CommentRow): CommentView => ({
    id: r.id,
    authorId: r.authorId,
    authorName: r.authorName,
    body: r.deletedAt ? "" : r.body,
    editedAt: r.editedAt,
    deletedAt: r.deletedAt,
    deleted: r.deletedAt !== null,
    createdAt: r.createdAt,
    mentions: r.mentions.filter((id) => names.has(id)).map((id) => ({ id, name: names.get(id)! })),
    attachments: r.deletedAt ? [] : (files.get(r.id) ?? []),
  });
  const threads: Thread[] = threadsOf(rows).map(({ first: r, all }) => ({ id: r.id, pin: r.pin, resolvedAt: r.resolvedAt, resolvedByName: r.resolvedByName, comments: all.map(view) }));
  return {
    threads,
    /** open threads on the other versions that are not approved: earlier ones (a question asked of
     *  v1 is still open on v2) and later ones (asked of the drawing as it went on; the sign-off counts
     *  them too, `noteForOpenThreads`) */
    ...openThreadsBesides(openOnSketch, number),
    members: contacts.map((c) => ({ id: c.id, name: c.name })),
    locked: access.reviewState === "approved",
    canComment: can(access.role, "comment.create") && access.reviewState !== "approved",
  };
}

/** Mail each member mentioned (notifications on), with a link that opens the comment's thread. */
async function mailMentions(ids: string[], actor: Actor, where: { workspaceId: string; sketchId: string; sketchTitle: string; number: number; threadId: string }, text: string) {
  const targets = (await workspaceContacts(where.workspaceId, db, ids)).filter((c) => c.id !== actor.id && c.emailNotifications);
  const url = `${versionUrl(where.workspaceId, where.sketchId, where.number)}#thread-${where.threadId}`;
  for (const c of targets) sendMailInBackground(mentionMail({ to: c.email, name: c.name, actorName: actor.name, sketchTitle: where.sketchTitle, number: where.number, text, url }));
}

async function validPin(sketchId: string, number: number, actorId: string, pin: CommentPin | null, tx: DbOrTx): Promise<void> {
  if (!pin || pin.kind === "point") return;
  const version = await getVersion(sketchId, number, actorId, tx);
  const doc = version?.document;
  const ids = doc ? [...doc.bodies, ...doc.supports, ...doc.loads, ...doc.ports, ...doc.massSources].map((e) => e.id) : [];
  if (!ids.includes(pin.elementId)) throw new AppError("validation_failed", "The comment is pinned to an element this version does not have.", { fields: [{ path: "pin.elementId", message: "No element with this id in this version." }] });
}

/** A new thread (with an optional pin) or a reply, by a member who may comment, on a version that is not approved. */
export async function addComment(sketchId: string, number: number, actor: Actor, input: { body: string; pin?: CommentPin | null; parentId?: string | null }) {
  const made = await db.transaction(async (tx) => {
    const access = await getVersionAccess(sketchId, number, actor.id, tx, true);
    const role = access ? await lockRole(tx, access.workspaceId, actor.id) : null;
    if (!access || !role) throw new AppError("not_found", NO_VERSION);
    if (!can(role, "comment.create")) throw new AppError("forbidden", "Your role reads comments but does not write them.");
    if (access.reviewState === "approved") throw new AppError("review_state", LOCKED);
    const parentId = input.parentId ?? null;
    if (parentId) {
      const parent = await getCommentAccess(parentId, actor.id, tx);
      if (!parent || parent.versionId !== access.versionId) throw new AppError("not_found", "The thread you answer is not on this version.");
      if (parent.parentId !== null) throw new AppError("validation_failed", "Answer the thread's first comment.", { fields: [{ path: "parentId", message: "Not the first comment of a thread." }] });
      if (input.pin) throw new AppError("validation_failed", "A reply takes the pin of its thread.", { fields: [{ path: "pin", message: "Only the first comment of a thread is pinned." }] });
    }
    await validPin(sketchId, number, actor.id, input.pin ?? null, tx);
    const contacts = await workspaceContacts(access.workspaceId, tx);
    const mentions = mentionedIds(input.body, contacts);
    const row = await insertComment(tx, { versionId: access.versionId, parentId, authorId: actor.id, body: input.body, pin: input.pin ?? null, mentions });
    await recordAudit(
      {
        action: "comment.create",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: access.workspaceId,
        targetType: "sketch",
        targetId: sketchId,
        detail: { sketchId, title: access.sketchTitle, number, commentId: row.id, reply: parentId !== null, note: input.body.slice(0, 140) },
      },
      tx,
    );
    return { access, row, mentions, threadId: parentId ?? row.id };
  });
  await mailMentions(made.mentions, actor, { workspaceId: made.access.workspaceId, sketchId, sketchTitle: made.access.sketchTitle, number, threadId: made.threadId }, input.body);
  return { id: made.row.id, createdAt: made.row.createdAt, mentions: made.mentions };
}

/**
 * Edit, delete, resolve or reopen: the comment must exist for a member whose role (read now,
 * under a lock) may still comment, and its version must not be approved. A member demoted to
 * viewer keeps what they wrote but no longer changes it.
 */
async function writable(commentId: string, actor: Actor, tx: DbOrTx): Promise<CommentAccess> {
  const c = await getCommentAccess(commentId, actor.id, tx, true);
  const role = c ? await lockRole(tx, c.workspaceId, actor.id) : null;
  if (!c || !role) throw new AppError("not_found", NO_COMMENT);
  if (!can(role, "comment.create")) throw new AppError("forbidden", "Your role reads comments but does not write them, your own included.");
  if (c.deletedAt) throw new AppError("gone", "This comment was deleted.");
  if (c.reviewState === "approved") throw new AppError("review_state", LOCKED);
  return { ...c, role };
}

/** An edit or a deletion in the sketch's activity and the audit log (a deletion keeps no text). */
function recordChange(tx: DbOrTx, action: "comment.edit" | "comment.delete", c: CommentAccess, actor: Actor, body?: string) {
  return recordAudit(
    {
      action,
      actorId: actor.id,
      actorEmail: actor.email,
      workspaceId: c.workspaceId,
      targetType: "sketch",
      targetId: c.sketchId,
      detail: { sketchId: c.sketchId, title: c.sketchTitle, number: c.number, commentId: c.id, reply: c.parentId !== null, ...(body !== undefined ? { note: body.slice(0, 140) } : {}) },
    },
    tx,
  );
}

export async function editComment(commentId: string, actor: Actor, body: string) {
  const out = await db.transaction(async (tx) => {
    const c = await writable(commentId, actor, tx);
    if (c.authorId !== actor.id) throw new AppError("forbidden", "Only its author may edit a comment.");
    const mentions = mentionedIds(body, await workspaceContacts(c.workspaceId, tx));
    await updateCommentBody(tx, { commentId, authorId: actor.id, body, mentions });
    await recordChange(tx, "comment.edit", c, actor, body);
    return { c, added: mentions.filter((id) => !c.mentions.includes(id)) };
  });
  await mailMentions(out.added, actor, { workspaceId: out.c.workspaceId, sketchId: out.c.sketchId, sketchTitle: out.c.sketchTitle, number: out.c.number, threadId: out.c.parentId ?? out.c.id }, body);
  return { id: commentId, edited: true };
}

/** Delete your own comment; its attached files go with its text. */
export async function deleteComment(commentId: string, actor: Actor) {
  const out = await db.transaction(async (tx) => {
    const c = await writable(commentId, actor, tx);
    if (c.authorId !== actor.id) throw new AppError("forbidden", "Only its author may delete a comment.");
    await softDeleteComment(tx, { commentId, authorId: actor.id });
    await recordChange(tx, "comment.delete", c, actor);
    const keys = await commentAttachmentKeys(commentId, tx);
    await deleteCommentAttachments(tx, commentId);
    return { keys };
  });
  await deleteObjectsQuietly(out.keys);
  return { id: commentId, deleted: true };
}

/** Resolve or reopen a thread: its author, or anyone whose role may resolve threads. */
export async function resolveThread(commentId: string, actor: Actor, resolved: boolean) {
  return db.transaction(async (tx) => {
    const c = await writable(commentId, actor, tx);
    if (c.parentId !== null) throw new AppError("validation_failed", "Resolve the thread from its first comment.", { fields: [{ path: "resolved", message: "Not the first comment of a thread." }] });
    if (c.authorId !== actor.id && !can(c.role, "comment.resolve")) throw new AppError("forbidden", "Your role reads comments but does not resolve them.");
    await setThreadResolved(tx, { commentId, actorId: actor.id, resolved });
    await recordAudit(
      {
        action: resolved ? "comment.resolve" : "comment.reopen",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: c.workspaceId,
        targetType: "sketch",
        targetId: c.sketchId,
        detail: { sketchId: c.sketchId, title: c.sketchTitle, number: c.number, commentId },
      },
      tx,
    );
    return { id: commentId, resolved };
  });
}
