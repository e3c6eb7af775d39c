// Work that could not be saved (a conflict, an ended session) is kept in this browser until
// the user restores or discards it: nothing typed is lost.
import type { SketchFile } from "@/solver/schema";

export type Draft = {
  sketchId: string;
  /** the version the edits started from */
  baseVersion: number;
  /** the newest version when the draft was kept */
  latestVersion: number;
  message: string;
  keptAt: string;
  sketch: SketchFile;
};

const key = (sketchId: string) => `counterpoise:draft:${sketchId}`;

function storage(): Storage | null {
  return typeof window === "undefined" ? null : window.localStorage;
}

export function keepDraft(draft: Omit<Draft, "keptAt">): boolean {
  try {
    storage()?.setItem(key(draft.sketchId), JSON.stringify({ ...draft, keptAt: new Date().toISOString() }));
    return true;
  } catch {
    return false;
  }
}

export function readDraft(sketchId: string): Draft | null {
  try {
    const text = storage()?.getItem(key(sketchId));
    if (!text) return null;
    const d = JSON.parse(text) as Draft;
    return d && d.sketchId === sketchId && d.sketch && typeof d.baseVersion === "number" ? d : null;
  } catch {
    return null;
  }
}

export function discardDraft(sketchId: string): void {
  storage()?.removeItem(key(sketchId));
}
