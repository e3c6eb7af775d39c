import "server-only";
// Underlays uploaded in the editor but never saved in a version: replaced, removed, or left when
// the tab closed. The editor never deletes them itself: an undo brings a removed underlay back,
// and a draft kept in the browser may still draw it. So they are swept once they are old enough
// that no editing session plausibly still holds them, and only while no saved version draws
// them (checked again, under a lock, just before each row goes). The server sweeps on its own, at
// start and then hourly (startUnderlaySweeper, from instrumentation.ts), and after each new upload.
import { db } from "@/db";
import { deleteUnusedUnderlays, lockUnusedUnderlays } from "@/db/queries/uploads";
import { uploadSweepMinutes } from "../env";
import { storageAnswers } from "../storage";
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
  // rows go before their objects: with the store down the objects would stay behind for good,
  // so the rows wait for a sweep that finds it answering
  if (!(await storageAnswers())) {
    console.error("[uploads] the file store is not answering: unsaved underlays are swept later");
    return [];
  }
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

/**
 * One background round over every workspace: batches until one comes back short (or `maxBatches`
 * ran). Never throws: a database or store that is down is logged and tried again next round.
 */
export async function sweepRound(opts: { sweep?: () => Promise<string[]>; maxBatches?: number } = {}): Promise<number> {
  const sweep = opts.sweep ?? (() => sweepUnusedUnderlays());
  let total = 0;
  try {
    for (let i = 0; i < (opts.maxBatches ?? 50); i++) {
      const gone = await sweep();
      total += gone.length;
      if (gone.length < SWEEP_DEFAULTS.limit) break;
    }
  } catch (err) {
    console.error("[uploads] the sweep of unused underlays failed; the next round tries again", err);
  }
  return total;
}

type Sweeper = { stop: () => void; idle: () => Promise<void> };

const globalForSweeper = globalThis as unknown as { counterpoiseUnderlaySweeper?: Sweeper };

/**
 * Sweep now and then every `intervalMinutes` (UPLOAD_SWEEP_MINUTES), so unsaved underlays go even
 * in a workspace where nobody uploads again. Called from instrumentation.ts at server start; one
 * sweeper a process (a second call returns the first). The timer is unref'd, so it never holds
 * the process open, and a round still running when the next is due is not doubled. Several
 * servers may sweep at once: the rows are locked with SKIP LOCKED, so each row goes once.
 */
export function startUnderlaySweeper(opts: { intervalMinutes?: number; sweep?: () => Promise<string[]> } = {}): Sweeper | null {
  if (globalForSweeper.counterpoiseUnderlaySweeper) return globalForSweeper.counterpoiseUnderlaySweeper;
  let minutes: number;
  try {
    minutes = opts.intervalMinutes ?? uploadSweepMinutes();
  } catch (err) {
    console.error(`[uploads] ${(err as Error).message}; sweeping every 60 minutes`);
    minutes = 60;
  }
  if (minutes <= 0) return null;
  let running: Promise<unknown> | null = null;
  const tick = () => {
    running ??= sweepRound({ sweep: opts.sweep }).finally(() => {
      running = null;
    });
  };
  tick();
  const timer = setInterval(tick, minutes * 60_000);
  timer.unref();
  const sweeper: Sweeper = {
    stop: () => {
      clearInterval(timer);
      if (globalForSweeper.counterpoiseUnderlaySweeper === sweeper) delete globalForSweeper.counterpoiseUnderlaySweeper;
    },
    idle: async () => {
      await running;
    },
  };
  globalForSweeper.counterpoiseUnderlaySweeper = sweeper;
  return sweeper;
}
