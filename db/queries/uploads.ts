import "server-only";
import { and, asc, eq, inArray, isNull, lt, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { comment, sketchVersion, upload, type Upload } from "@/db/schema";
import type { DbOrTx } from "./tx";
import { actorMay } from "./workspaces";

export type NewUpload = typeof upload.$inferInsert;

/** What a page or an API answer shows of an upload (no storage keys). */
export type UploadInfo = Pick<Upload, "id" | "purpose" | "originalName" | "sourceType" | "storedType" | "size" | "width" | "height" | "checksum" | "createdAt" | "commentId" | "sketchId">;

const INFO = {
  id: upload.id,
  purpose: upload.purpose,
  originalName: upload.originalName,
  sourceType: upload.sourceType,
  storedType: upload.storedType,
  size: upload.size,
  width: upload.width,
  height: upload.height,
  checksum: upload.checksum,
  createdAt: upload.createdAt,
  commentId: upload.commentId,
  sketchId: upload.sketchId,
};

export async function insertUpload(tx: DbOrTx, values: NewUpload): Promise<UploadInfo> {
  const [row] = await tx.insert(upload).values(values).returning(INFO);
  return row;
}

/**
 * An upload for someone who may read its workspace (the role check is in the WHERE clause), or
 * null: it does not exist, or the caller is not a reader there. A deleted comment's files are gone.
 */
export async function getUploadForReader(uploadId: string, userId: string, tx: DbOrTx = db): Promise<Upload | null> {
  const [row] = await tx
    .select()
    .from(upload)
    .leftJoin(comment, eq(comment.id, upload.commentId))
    .where(and(eq(upload.id, uploadId), actorMay(upload.workspaceId, userId, "upload.read"), or(isNull(upload.commentId), isNull(comment.deletedAt))));
  return row?.upload ?? null;
}

/**
 * An upload with what deciding on its deletion needs: the comment's author and its version's
 * sign-off state (attachments). `lock` holds the upload row for the rest of the transaction.
 */
export async function getUploadAccess(uploadId: string, tx: DbOrTx, lock = false) {
  const q = tx
    .select({ upload, commentAuthorId: comment.authorId, reviewState: sketchVersion.reviewState, versionNumber: sketchVersion.number, versionSketchId: sketchVersion.sketchId })
    .from(upload)
    .leftJoin(comment, eq(comment.id, upload.commentId))
    .leftJoin(sketchVersion, eq(sketchVersion.id, comment.versionId))
    .where(eq(upload.id, uploadId));
  const [row] = lock ? await q.for("update", { of: upload }) : await q;
  return row ?? null;
}

/** Whether any saved version of a sketch draws this upload under it. */
export async function uploadUsedByVersions(uploadId: string, tx: DbOrTx = db): Promise<boolean> {
  const [row] = await tx
    .select({ one: sql<number>`1` })
    .from(sketchVersion)
    .where(sql`${sketchVersion.document} -> 'underlay' ->> 'upload' = ${uploadId}`)
    .limit(1);
  return Boolean(row);
}

/**
 * Before a sketch is deleted: its underlays that a version of another sketch draws (a fork in the
 * same workspace shares the file) move to the oldest such sketch, so they outlive this one.
 * Returns their ids; their objects must not be deleted with the sketch.
 */
export async function rehomeSharedUnderlays(sketchId: string, tx: DbOrTx): Promise<string[]> {
  const heir = sql`(select ${sketchVersion.sketchId} from ${sketchVersion}
    where ${sketchVersion.document} -> 'underlay' ->> 'upload' = ${upload.id}::text and ${sketchVersion.sketchId} <> ${sketchId}
    order by ${sketchVersion.createdAt} limit 1)`;
  const rows = await tx
    .update(upload)
    .set({ sketchId: heir })
    .where(and(eq(upload.sketchId, sketchId), eq(upload.purpose, "underlay"), sql`${heir} is not null`))
    .returning({ id: upload.id });
  return rows.map((r) => r.id);
}

/** No saved version, of any sketch, draws this upload (a condition on the upload row). */
const drawnByNoVersion = sql`not exists (select 1 from ${sketchVersion} where ${sketchVersion.document} -> 'underlay' ->> 'upload' = ${upload.id}::text)`;

/**
 * Underlays uploaded before `before` that no saved version draws, oldest first, locked for the
 * rest of the transaction (rows another transaction holds are skipped, not waited for).
 */
export async function lockUnusedUnderlays(tx: DbOrTx, opts: { before: Date; workspaceId?: string; limit: number }): Promise<string[]> {
  const rows = await tx
    .select({ id: upload.id })
    .from(upload)
    .where(and(eq(upload.purpose, "underlay"), lt(upload.createdAt, opts.before), opts.workspaceId ? eq(upload.workspaceId, opts.workspaceId) : undefined, drawnByNoVersion))
    .orderBy(asc(upload.createdAt))
    .limit(opts.limit)
    .for("update", { skipLocked: true });
  return rows.map((r) => r.id);
}

/**
 * Delete locked underlay rows that still no saved version draws. A statement of its own, so it
 * sees versions committed while the rows were being locked.
 */
export async function deleteUnusedUnderlays(tx: DbOrTx, ids: string[]) {
  if (!ids.length) return [];
  return tx
    .delete(upload)
    .where(and(inArray(upload.id, ids), eq(upload.purpose, "underlay"), drawnByNoVersion))
    .returning({ id: upload.id, workspaceId: upload.workspaceId, storageKey: upload.storageKey, thumbnailKey: upload.thumbnailKey });
}

export async function deleteUploadRow(tx: DbOrTx, uploadId: string) {
  const [row] = await tx.delete(upload).where(eq(upload.id, uploadId)).returning({ storageKey: upload.storageKey, thumbnailKey: upload.thumbnailKey });
  return row ?? null;
}

/** The attachments of some comments, oldest first, for a reader of their workspace. */
export async function attachmentsOf(commentIds: string[], viewerId: string): Promise<UploadInfo[]> {
  if (!commentIds.length) return [];
  return db
    .select(INFO)
    .from(upload)
    .where(and(inArray(upload.commentId, commentIds), actorMay(upload.workspaceId, viewerId, "upload.read")))
    .orderBy(asc(upload.createdAt), asc(upload.id));
}

export async function countAttachments(tx: DbOrTx, commentId: string): Promise<number> {
  return tx.$count(upload, eq(upload.commentId, commentId));
}

/** The storage keys of a comment's attachments (to delete the objects once the rows are gone). */
export async function commentAttachmentKeys(commentId: string, tx: DbOrTx): Promise<string[]> {
  const rows = await tx.select({ a: upload.storageKey, b: upload.thumbnailKey }).from(upload).where(eq(upload.commentId, commentId));
  return rows.flatMap((r) => [r.a, r.b]);
}

export async function deleteCommentAttachments(tx: DbOrTx, commentId: string): Promise<void> {
  await tx.delete(upload).where(eq(upload.commentId, commentId));
}

/** Every object key a sketch's uploads hold: its underlays and the attachments on its versions' comments. */
export async function sketchUploadKeys(sketchId: string, tx: DbOrTx = db): Promise<string[]> {
  const rows = await tx
    .select({ a: upload.storageKey, b: upload.thumbnailKey })
    .from(upload)
    .leftJoin(comment, eq(comment.id, upload.commentId))
    .leftJoin(sketchVersion, eq(sketchVersion.id, comment.versionId))
    .where(or(eq(upload.sketchId, sketchId), eq(sketchVersion.sketchId, sketchId)));
  return rows.flatMap((r) => [r.a, r.b]);
}

/**
 * An underlay upload in a workspace (a saved document may only draw files of its own workspace).
 * `lock` holds the row until the transaction ends, so the sweep of unused underlays cannot
 * delete it while a version that draws it is being written.
 */
export async function underlayInWorkspace(uploadId: string, workspaceId: string, tx: DbOrTx = db, lock = false) {
  const q = tx
    .select()
    .from(upload)
    .where(and(eq(upload.id, uploadId), eq(upload.workspaceId, workspaceId), eq(upload.purpose, "underlay")));
  const [row] = lock ? await q.for("share") : await q;
  return row ?? null;
}
