import "server-only";
import { and, asc, count, eq, exists, inArray, isNull, ne, or } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { comment, membership, sketch, sketchVersion, user, type CommentPin } from "@/db/schema";
import type { DbOrTx } from "./tx";
import { actorMay } from "./workspaces";

const resolver = alias(user, "resolver");

export type CommentRow = {
  id: string;
  parentId: string | null;
  authorId: string | null;
  authorName: string | null;
  body: string;
  pin: CommentPin | null;
  mentions: string[];
  resolvedAt: Date | null;
  resolvedByName: string | null;
  editedAt: Date | null;
  deletedAt: Date | null;
  createdAt: Date;
};

/** Every comment of a version, oldest first (empty unless the viewer may read the sketch). */
export async function listVersionComments(versionId: string, viewerId: string): Promise<CommentRow[]> {
  return db
    .select({
      id: comment.id,
      parentId: comment.parentId,
      authorId: comment.authorId,
      authorName: user.name,
      body: comment.body,
      pin: comment.pin,
      mentions: comment.mentions,
      resolvedAt: comment.resolvedAt,
      resolvedByName: resolver.name,
      editedAt: comment.editedAt,
      deletedAt: comment.deletedAt,
      createdAt: comment.createdAt,
    })
    .from(comment)
    .innerJoin(sketchVersion, eq(sketchVersion.id, comment.versionId))
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .leftJoin(user, eq(user.id, comment.authorId))
    .leftJoin(resolver, eq(resolver.id, comment.resolvedBy))
    .where(and(eq(comment.versionId, versionId), actorMay(sketch.workspaceId, viewerId, "sketch.read")))
    .orderBy(asc(comment.createdAt), asc(comment.id));
}

const reply = alias(comment, "reply");

/**
 * Open threads on the sketch's versions, per version, oldest first: threads whose first comment
 * stands (or has replies), not resolved, on a version that is not approved (an approved version's
 * threads are locked and its approval stands). What a check or an approval must answer for
 * (`noteForOpenThreads`, `lib/review/rules.ts`).
 */
export async function openThreadsOnSketch(sketchId: string, tx: DbOrTx = db): Promise<Array<{ number: number; open: number }>> {
  return tx
    .select({ number: sketchVersion.number, open: count() })
    .from(comment)
    .innerJoin(sketchVersion, eq(sketchVersion.id, comment.versionId))
    .where(
      and(
        eq(sketchVersion.sketchId, sketchId),
        ne(sketchVersion.reviewState, "approved"),
        isNull(comment.parentId),
        isNull(comment.resolvedAt),
        or(isNull(comment.deletedAt), exists(tx.select({ one: reply.id }).from(reply).where(eq(reply.parentId, comment.id)))),
      ),
    )
    .groupBy(sketchVersion.number)
    .orderBy(asc(sketchVersion.number));
}

/**
 * A comment with its version, sketch and the caller's role (null role: not a member). `lock`
 * holds the comment's version row, so a sign-off step cannot slip between check and write.
 */
export async function getCommentAccess(commentId: string, userId: string, tx: DbOrTx = db, lock = false) {
  const q = tx
    .select({
      id: comment.id,
      parentId: comment.parentId,
      authorId: comment.authorId,
      body: comment.body,
      mentions: comment.mentions,
      resolvedAt: comment.resolvedAt,
      deletedAt: comment.deletedAt,
      versionId: sketchVersion.id,
      number: sketchVersion.number,
      reviewState: sketchVersion.reviewState,
      sketchId: sketch.id,
      sketchTitle: sketch.title,
      workspaceId: sketch.workspaceId,
      role: membership.role,
    })
    .from(comment)
    .innerJoin(sketchVersion, eq(sketchVersion.id, comment.versionId))
    .innerJoin(sketch, eq(sketch.id, sketchVersion.sketchId))
    .leftJoin(membership, and(eq(membership.workspaceId, sketch.workspaceId), eq(membership.userId, userId)))
    .where(eq(comment.id, commentId));
  const [row] = lock ? await q.for("update", { of: sketchVersion }) : await q;
  return row ?? null;
}
export type CommentAccess = NonNullable<Awaited<ReturnType<typeof getCommentAccess>>>;

export async function insertComment(
  tx: DbOrTx,
  input: { versionId: string; parentId: string | null; authorId: string; body: string; pin: CommentPin | null; mentions: string[] },
) {
  const [row] = await tx.insert(comment).values(input).returning({ id: comment.id, createdAt: comment.createdAt });
  return row;
}

/** Change your own comment's text (the author is checked in the UPDATE). */
export async function updateCommentBody(tx: DbOrTx, input: { commentId: string; authorId: string; body: string; mentions: string[] }) {
  const [row] = await tx
    .update(comment)
    .set({ body: input.body, mentions: input.mentions, editedAt: new Date() })
    .where(and(eq(comment.id, input.commentId), eq(comment.authorId, input.authorId), isNull(comment.deletedAt)))
    .returning({ id: comment.id });
  return row ?? null;
}

/** Delete your own comment: its text goes, the row stays so the thread keeps its shape. */
export async function softDeleteComment(tx: DbOrTx, input: { commentId: string; authorId: string }) {
  const [row] = await tx
    .update(comment)
    .set({ body: "", mentions: [], deletedAt: new Date() })
    .where(and(eq(comment.id, input.commentId), eq(comment.authorId, input.authorId), isNull(comment.deletedAt)))
    .returning({ id: comment.id });
  return row ?? null;
}

/** Resolve or reopen a thread (its first comment). */
export async function setThreadResolved(tx: DbOrTx, input: { commentId: string; actorId: string; resolved: boolean }) {
  const [row] = await tx
    .update(comment)
    .set(input.resolved ? { resolvedAt: new Date(), resolvedBy: input.actorId } : { resolvedAt: null, resolvedBy: null })
    .where(and(eq(comment.id, input.commentId), isNull(comment.parentId)))
    .returning({ id: comment.id });
  return row ?? null;
}

export type MemberContact = { id: string; name: string; email: string; emailNotifications: boolean; role: string };

/** The members of a workspace with what mail needs (for mentions and sign-off notices). */
export async function workspaceContacts(workspaceId: string, tx: DbOrTx = db, ids?: string[]): Promise<MemberContact[]> {
  return tx
    .select({ id: user.id, name: user.name, email: user.email, emailNotifications: user.emailNotifications, role: membership.role })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(and(eq(membership.workspaceId, workspaceId), ids ? inArray(user.id, ids.length ? ids : [""]) : undefined));
}
