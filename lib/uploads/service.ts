import "server-only";
// The upload acts: an underlay for a sketch, an attachment on a comment, deleting one. Each
// checks the caller's role before reading the body, cleans the file (process.ts), stores its
// objects, and only then writes the row and its audit entry in one transaction that checks the
// role again under a lock. Anything that fails after the objects were stored deletes them, so a
// failed upload leaves neither an object nor a row behind.
import { createHash, randomUUID } from "node:crypto";
import { db } from "@/db";
import { getCommentAccess } from "@/db/queries/comments";
import { lockRole } from "@/db/queries/sketches";
import { countAttachments, deleteUploadRow, getUploadAccess, insertUpload, uploadUsedByVersions, type UploadInfo } from "@/db/queries/uploads";
import type { DbOrTx } from "@/db/queries/tx";
import { recordAudit } from "../audit";
import { AppError } from "../errors";
import { can, type Permission } from "../roles";
import { requireSketchRole } from "../sketches";
import { newStorageKey, putObject } from "../storage";
import { deleteObjectsQuietly } from "./objects";
import { withoutDocumentMetadata } from "./pdf";
import { processUpload } from "./process";
import { sweepUnusedUnderlays } from "./sweep";
import type { UploadBody } from "./request";

type Actor = { id: string; email: string };

/** Attachments one comment may carry. */
export const MAX_ATTACHMENTS = 8;

const NO_COMMENT = "No such comment, or you are not a member of its workspace.";
const TOO_MANY = `A comment carries at most ${MAX_ATTACHMENTS} files.`;
const LOCKED = "This version is approved: its comments take no new attachments.";

/** An upload as the API answers it: its metadata and where to fetch it (never a storage key). */
export type UploadView = Omit<UploadInfo, "sketchId" | "commentId" | "originalName"> & { name: string; url: string; thumbnailUrl: string };

export function uploadView(u: UploadInfo): UploadView {
  const { sketchId: _s, commentId: _c, originalName, ...rest } = u;
  return { ...rest, name: originalName, url: `/api/uploads/${u.id}`, thumbnailUrl: `/api/uploads/${u.id}/thumbnail` };
}

type Stored = { storageKey: string; thumbnailKey: string; values: Omit<Parameters<typeof insertUpload>[1], "workspaceId" | "purpose"> };

/**
 * Clean the file and put its objects. An attachment sent as a PDF keeps the PDF itself (a vendor
 * sheet has more than one page), rewritten without its document metadata where poppler can
 * (pdf.ts says what goes and what stays); everything else keeps the cleaned image.
 */
async function storeObjects(workspaceId: string, body: UploadBody, keepPdf: boolean): Promise<Stored> {
  const p = await processUpload(body.bytes);
  const pdf = keepPdf && p.sourceMime === "application/pdf";
  const file = pdf ? { bytes: (await withoutDocumentMetadata(body.bytes)) ?? body.bytes, mime: "application/pdf", ext: "pdf" } : { bytes: p.bytes, mime: p.mime, ext: p.ext };
  const storageKey = newStorageKey(workspaceId, file.ext);
  const thumbnailKey = newStorageKey(workspaceId, "png");
  try {
    await putObject(storageKey, file.bytes, file.mime);
    await putObject(thumbnailKey, p.thumbnail, "image/png");
  } catch (err) {
    await deleteObjectsQuietly([storageKey, thumbnailKey]);
    console.error("[uploads] storage refused an object", err);
    throw new AppError("unavailable", "The file store is not answering; nothing was kept. Try again shortly.");
  }
  return {
    storageKey,
    thumbnailKey,
    values: {
      sourceType: p.sourceMime,
      storedType: file.mime,
      size: file.bytes.length,
      width: p.width,
      height: p.height,
      checksum: pdf ? createHash("sha256").update(file.bytes).digest("hex") : p.checksum,
      storageKey,
      thumbnailKey,
    },
  };
}

/** Run the row's transaction; on any failure the stored objects go too. */
async function commitOrClean<T>(stored: Stored, write: (tx: DbOrTx) => Promise<T>): Promise<T> {
  try {
    return await db.transaction(write);
  } catch (err) {
    await deleteObjectsQuietly([stored.storageKey, stored.thumbnailKey]);
    throw err;
  }
}

async function lockedRole(tx: DbOrTx, workspaceId: string, actorId: string, permission: Permission, notFound: string) {
  const role = await lockRole(tx, workspaceId, actorId);
  if (!role) throw new AppError("not_found", notFound);
  if (!can(role, permission)) throw new AppError("forbidden");
  return role;
}

/** Upload a drawing, photo or PDF to trace over in a sketch (editors and owners of its workspace). */
export async function createUnderlay(sketchId: string, actor: Actor, read: () => Promise<UploadBody>): Promise<UploadView> {
  const access = await requireSketchRole(sketchId, actor.id, "upload.underlay");
  const body = await read();
  const stored = await storeObjects(access.workspaceId, body, false);
  const row = await commitOrClean(stored, async (tx) => {
    await lockedRole(tx, access.workspaceId, actor.id, "upload.underlay", "No such sketch, or you are not a member of its workspace.");
    const made = await insertUpload(tx, { ...stored.values, id: randomUUID(), workspaceId: access.workspaceId, uploadedBy: actor.id, originalName: body.name, purpose: "underlay", sketchId });
    await recordAudit(
      {
        action: "upload.create",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: access.workspaceId,
        targetType: "sketch",
        targetId: sketchId,
        detail: { sketchId, title: access.title, uploadId: made.id, name: body.name, purpose: "underlay", size: made.size },
      },
      tx,
    );
    return made;
  });
  // each new underlay clears the workspace's old ones that were never saved (sweep.ts says why then)
  await sweepUnusedUnderlays({ workspaceId: access.workspaceId }).catch((err) => console.error("[uploads] the sweep of unused underlays failed", err));
  return uploadView(row);
}

async function attachable(commentId: string, actor: Actor, tx: DbOrTx = db, lock = false) {
  const c = await getCommentAccess(commentId, actor.id, tx, lock);
  if (!c || !c.role) throw new AppError("not_found", NO_COMMENT);
  if (c.deletedAt) throw new AppError("gone", "This comment was deleted.");
  if (!can(c.role, "upload.attach")) throw new AppError("forbidden", "Your role reads comments but does not write them.");
  if (c.authorId !== actor.id) throw new AppError("forbidden", "Only its author attaches files to a comment.");
  if (c.reviewState === "approved") throw new AppError("review_state", LOCKED);
  return c;
}

/** Attach an image or a PDF to your own comment (not on an approved version). */
export async function attachToComment(commentId: string, actor: Actor, read: () => Promise<UploadBody>): Promise<UploadView> {
  const first = await attachable(commentId, actor);
  // refused before anything is read or stored; the transaction counts again for a race
  if ((await countAttachments(db, commentId)) >= MAX_ATTACHMENTS) throw new AppError("conflict", TOO_MANY);
  const body = await read();
  const stored = await storeObjects(first.workspaceId, body, true);
  const row = await commitOrClean(stored, async (tx) => {
    // the version row stays locked until commit: no approval slips in between
    const c = await attachable(commentId, actor, tx, true);
    await lockedRole(tx, c.workspaceId, actor.id, "upload.attach", NO_COMMENT);
    if ((await countAttachments(tx, commentId)) >= MAX_ATTACHMENTS) throw new AppError("conflict", TOO_MANY);
    const made = await insertUpload(tx, { ...stored.values, id: randomUUID(), workspaceId: c.workspaceId, uploadedBy: actor.id, originalName: body.name, purpose: "attachment", commentId });
    await recordAudit(
      {
        action: "upload.create",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: c.workspaceId,
        targetType: "sketch",
        targetId: c.sketchId,
        detail: { sketchId: c.sketchId, title: c.sketchTitle, number: c.number, commentId, uploadId: made.id, name: body.name, purpose: "attachment", size: made.size },
      },
      tx,
    );
    return made;
  });
  return uploadView(row);
}

/**
 * Delete an upload: an attachment by its comment's author (not on an approved version); an
 * underlay by an editor or owner while no saved version draws it (saved versions never change).
 */
export async function removeUpload(uploadId: string, actor: Actor) {
  const out = await db.transaction(async (tx) => {
    const a = await getUploadAccess(uploadId, tx, true);
    const role = a ? await lockRole(tx, a.upload.workspaceId, actor.id) : null;
    if (!a || !role) throw new AppError("not_found", "No such file, or you are not a member of its workspace.");
    const u = a.upload;
    if (u.purpose === "attachment") {
      if (a.commentAuthorId !== actor.id || !can(role, "upload.attach")) throw new AppError("forbidden", "Only the comment's author removes its attachments.");
      if (a.reviewState === "approved") throw new AppError("review_state", LOCKED);
    } else {
      if (!can(role, "upload.underlay")) throw new AppError("forbidden");
      if (await uploadUsedByVersions(uploadId, tx)) throw new AppError("conflict", "A saved version draws this file under its sketch, and saved versions never change: it stays.");
    }
    const gone = await deleteUploadRow(tx, uploadId);
    const sketchId = u.sketchId ?? a.versionSketchId;
    await recordAudit(
      {
        action: "upload.delete",
        actorId: actor.id,
        actorEmail: actor.email,
        workspaceId: u.workspaceId,
        targetType: sketchId ? "sketch" : "upload",
        targetId: sketchId ?? uploadId,
        detail: { sketchId, uploadId, name: u.originalName, purpose: u.purpose, number: a.versionNumber ?? undefined },
      },
      tx,
    );
    return gone;
  });
  if (out) await deleteObjectsQuietly([out.storageKey, out.thumbnailKey]);
  return { id: uploadId, deleted: true };
}
