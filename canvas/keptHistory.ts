// The undo history kept across a reload of the page, in the tab's session storage: a reload never
// takes away the way back to a value typed before it (60 kg, then "abc", then a reload: Undo and
// Escape still reach 60 kg). Only a history that leads to the sketch the page opens is restored:
// one whose last state is another sketch (saved from elsewhere, opened from a version, an example
// opened over it) is dropped, so undo never steps into a sketch the user has not seen here.
import equal from "fast-deep-equal";
import type { SketchFile } from "@/solver/schema";
import type { EditorStore, HistoryEntry } from "./store";

export const HISTORY_PREFIX = "counterpoise:history:v1:";
/** the steps kept: the newest, so a long session does not fill the storage */
export const KEPT_STEPS = 40;
/** above this many characters the oldest steps go first (session storage holds about 5 MB) */
const MAX_CHARS = 1_500_000;

export interface HistoryStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

interface Kept {
  sketch: SketchFile;
  past: HistoryEntry[];
  future: HistoryEntry[];
}

/** The history as kept: no coalescing key (a new visit after the reload is a new undo step). */
const plain = (e: HistoryEntry): HistoryEntry => {
  const { coalesce: _coalesce, ...rest } = e;
  return rest;
};

function serialise(sketch: SketchFile, past: HistoryEntry[], future: HistoryEntry[]): string | null {
  let p = past.slice(-KEPT_STEPS).map(plain);
  let f = future.slice(-KEPT_STEPS).map(plain);
  for (;;) {
    const text = JSON.stringify({ sketch, past: p, future: f } satisfies Kept);
    if (text.length <= MAX_CHARS) return text;
    if (!p.length && !f.length) return null;
    if (p.length >= f.length) p = p.slice(1);
    else f = f.slice(0, -1);
  }
}

/** Put back the history kept under `key` when it leads to the sketch now open; true when it did. */
export function restoreHistory(store: EditorStore, key: string, storage: HistoryStorage | null): boolean {
  const text = storage?.getItem(HISTORY_PREFIX + key);
  if (!text) return false;
  let kept: Kept;
  try {
    kept = JSON.parse(text) as Kept;
  } catch {
    storage!.removeItem(HISTORY_PREFIX + key);
    return false;
  }
  const s = store.getState();
  if (!kept || !Array.isArray(kept.past) || !Array.isArray(kept.future) || !equal(kept.sketch, s.sketch)) return false;
  if (!kept.past.length && !kept.future.length) return false;
  store.setState({ past: kept.past, future: kept.future });
  return true;
}

/** Keep the store's history under `key` as it changes (a burst of typing is written once); returns `stop`. */
export function keepHistory(store: EditorStore, key: string, storage: HistoryStorage | null, delayMs = 300): () => void {
  if (!storage) return () => {};
  let timer: ReturnType<typeof setTimeout> | null = null;
  const write = () => {
    timer = null;
    const s = store.getState();
    // a write due from before a drag waits for its end, which writes again
    if (s.gesture) return;
    try {
      const text = serialise(s.sketch, s.past, s.future);
      if (text && (s.past.length || s.future.length)) storage.setItem(HISTORY_PREFIX + key, text);
      else storage.removeItem(HISTORY_PREFIX + key);
    } catch {
      // storage full or refused: the history stays in memory only, as before
    }
  };
  const unsubscribe = store.subscribe((s, p) => {
    // a drag's frames are not steps: its end (or cancel) writes, as autosave does
    if (s.gesture) return;
    if (s.past === p.past && s.future === p.future && s.sketch === p.sketch && !p.gesture) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(write, delayMs);
  });
  const flush = () => {
    if (!timer) return;
    clearTimeout(timer);
    write();
  };
  if (typeof window !== "undefined") window.addEventListener("pagehide", flush);
  return () => {
    flush();
    unsubscribe();
    if (typeof window !== "undefined") window.removeEventListener("pagehide", flush);
  };
}
