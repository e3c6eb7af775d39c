import "server-only";
// The underlay's file and the sketch's versions: a saved document may only draw an underlay
// uploaded to its own workspace, and a fork into another workspace takes a copy of the file, so
// its readers can see what they trace over (and nothing of the origin's workspace leaks).
import { randomUUID } from "node:crypto";
import { insertUpload, rehomeSharedUnderlays, sketchUploadKeys, underlayInWorkspace } from "@/db/queries/uploads";
import type { DbOrTx } from "@/db/queries/tx";
import type { SketchFile } from "@/solver/schema";
import { AppError } from "../errors";
import { getObject, newStorageKey, putObject } from "../storage";
import { deleteObjectsQuietly } from "./objects";

/**
 * 400 when the document draws an underlay that is not an underlay upload of this workspace.
 * Inside a transaction the upload's row stays locked until it ends (see sweep.ts).
 */
export async function assertUnderlayIn(workspaceId: string, file: SketchFile, tx?: DbOrTx): Promise<void> {
  const id = file.underlay?.upload;
  if (!id) return;
  const known = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(id) ? await underlayInWorkspace(id, workspaceId, tx, tx !== undefined) : null;
  if (!known) {
    throw new AppError("validation_failed", "The sketch's underlay is not a file uploaded to this workspace: upload it again from the editor's Underlay section.", {
      fields: [{ path: "document.underlay.upload", message: "No underlay with this id in this workspace." }],
    });
  }
}

export type UnderlayCopy = {
  /** the document to store in the target workspace */
  document: SketchFile;
  /** write the copy's row (inside the fork's transaction, once the new sketch exists) */
  insert: (tx: DbOrTx, sketchId: string, actorId: string) => Promise<void>;
  /** remove the copied objects (the fork failed) */
  discard: () => Promise<void>;
};

/**
 * Copy a document's underlay file into another workspace for a fork. Without an underlay, in
 * the same workspace, or when the file is gone, the document is kept as it is.
 */
export async function copyUnderlayForFork(document: SketchFile, fromWorkspaceId: string, toWorkspaceId: string): Promise<UnderlayCopy> {
  const same: UnderlayCopy = { document, insert: async () => undefined, discard: async () => undefined };
  const id = document.underlay?.upload;
  if (!id || fromWorkspaceId === toWorkspaceId) return same;
  const src = await underlayInWorkspace(id, fromWorkspaceId);
  if (!src) return same;
  const ext = src.storageKey.split(".").pop() ?? "png";
  const storageKey = newStorageKey(toWorkspaceId, ext);
  const thumbnailKey = newStorageKey(toWorkspaceId, "png");
  try {
    await putObject(storageKey, await getObject(src.storageKey), src.storedType);
    await putObject(thumbnailKey, await getObject(src.thumbnailKey), "image/png");
  } catch (err) {
    await deleteObjectsQuietly([storageKey, thumbnailKey]);
    console.error("[uploads] could not copy an underlay for a fork", err);
    throw new AppError("unavailable", "The file store is not answering, so the underlay could not be copied; nothing was forked. Try again shortly.");
  }
  const newId = randomUUID();
  return {
    document: { ...document, underlay: { ...document.underlay!, upload: newId } },
    insert: async (tx, sketchId, actorId) => {
      const { id: _id, createdAt: _at, workspaceId: _ws, sketchId: _sk, commentId: _c, uploadedBy: _by, storageKey: _k, thumbnailKey: _t, ...meta } = src;
      await insertUpload(tx, { ...meta, id: newId, workspaceId: toWorkspaceId, sketchId, uploadedBy: actorId, storageKey, thumbnailKey });
    },
    discard: () => deleteObjectsQuietly([storageKey, thumbnailKey]),
  };
}

/**
 * The object keys of a sketch's files, read before the sketch is deleted (rows go with it). An
 * underlay that another sketch's version draws (a fork in the same workspace) is handed to that
 * sketch first, so its file stays.
 */
export async function keysOfSketch(sketchId: string, tx: DbOrTx): Promise<string[]> {
  await rehomeSharedUnderlays(sketchId, tx);
  return sketchUploadKeys(sketchId, tx);
}
