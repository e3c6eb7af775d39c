// The same saved sketch open in two tabs of one browser: a tab that saves a version says so in
// local storage (`counterpoise:saved:<sketchId>` = { version, at }), and every other tab with
// the sketch open hears it as a storage event (which the writing tab itself never gets), the way
// the scratch sketch's `watch` does (`canvas/persistence.ts`), through `watchKey` (lib/other-tabs.ts).
import { browserEvents, watchKey, type EventsLike } from "@/lib/other-tabs";

export type SavedElsewhere = { version: number; at: string };

type StorageLike = Pick<Storage, "setItem">;

const key = (sketchId: string) => `counterpoise:saved:${sketchId}`;

const browserStorage = (): StorageLike | null => (typeof window !== "undefined" ? window.localStorage : null);

/** Tells the other tabs that this one saved `version` of the sketch. */
export function announceSaved(sketchId: string, saved: SavedElsewhere, storage: StorageLike | null = browserStorage()): void {
  try {
    storage?.setItem(key(sketchId), JSON.stringify(saved));
  } catch {
    // a full or refused storage: the other tab still meets the conflict dialog when it saves
  }
}

function parse(text: string | null): SavedElsewhere | null {
  if (!text) return null;
  try {
    const v = JSON.parse(text) as Partial<SavedElsewhere>;
    return typeof v.version === "number" && Number.isInteger(v.version) && v.version > 0 ? { version: v.version, at: typeof v.at === "string" ? v.at : "" } : null;
  } catch {
    return null;
  }
}

/** Hears another tab's save of the sketch; returns the unsubscribe. */
export function watchSaved(sketchId: string, onSaved: (saved: SavedElsewhere) => void, events: EventsLike | null = browserEvents()): () => void {
  return watchKey(
    key(sketchId),
    (text) => {
      const saved = parse(text);
      if (saved) onSaved(saved);
    },
    events,
  );
}
