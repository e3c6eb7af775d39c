import "server-only";
// Underlays uploaded in the editor but never saved in a version: replaced, removed, or left when
// the tab closed. The editor never deletes them itself: an undo brings a removed underlay back,
// and a draft kept in the browser may still draw it. So they are swept once they are old enough
// that no editing session plausibly still holds them, and only while no saved version draws
// them (checked again, under a lock, just before each row goes).
import { db } from "@/db";
import { deleteUnusedUnderlays, lockUnusedUnderlays } from "@/db/queries/uploads";
import { deleteObjectsQuietly } from "./objects";

export const SWEEP_DEFAULTS = {
  /** an unsaved underlay is kept this long after its upload */
  keepHours: 7 * 24,
  /** rows deleted per sweep, so one sweep stays short */
  limit: 100,
};

/**
 * Delete unused underlays older than `keepHours` (in one workspace, or everywhere), rows first
 * and then their objects. Returns the ids that went.
 */
export async function sweepUnusedUnderlays(opts: { workspaceId?: string; keepHours?: number; limit?: number; now?: Date } = {}): Promise<string[]> {
  const keepHours = opts.keepHours ?? SWEEP_DEFAULTS.keepHours;
  const before = new Date((opts.now ?? new Date()).getTime() - keepHours * 3600_000);
  const gone = await db.transaction(async (tx) => {
    const ids = await lockUnusedUnderlays(tx, { before, workspaceId: opts.workspaceId, limit: opts.limit ?? SWEEP_DEFAULTS.limit });
    return deleteUnusedUnderlays(tx, ids);
  });
  if (gone.length) {
    await deleteObjectsQuietly(gone.flatMap((g) => [g.storageKey, g.thumbnailKey]));
    console.info(`[uploads] swept ${gone.length} underlay(s) no saved version draws`);
  }
  return gone.map((g) => g.id);
}
