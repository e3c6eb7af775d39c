// Another tab or window of this browser writing to local storage: heard as the `storage` event,
// which the writing tab itself never gets. Browser-safe; the scratch sketch's `watch`
// (canvas/persistence.ts) and a saved sketch's "saved in another tab" (savedElsewhere.ts) use it.

export type EventsLike = Pick<Window, "addEventListener" | "removeEventListener">;

export const browserEvents = (): EventsLike | null => (typeof window !== "undefined" ? window : null);

/**
 * Calls `onWrite` with the new text when another tab writes `key` (null: it removed the key, or
 * cleared the whole of local storage); returns the unsubscribe.
 */
export function watchKey(key: string, onWrite: (newValue: string | null) => void, events: EventsLike | null = browserEvents()): () => void {
  if (!events) return () => {};
  const heard = (e: Event) => {
    const { key: changed, newValue } = e as StorageEvent;
    if (changed === key) onWrite(newValue);
    else if (changed === null) onWrite(null);
  };
  events.addEventListener("storage", heard);
  return () => events.removeEventListener("storage", heard);
}
