// Where a sketch is kept. The editor talks only to this seam: the scratch sketch of
// /sketches/new lives in the browser's local storage; saved, versioned sketches (the versions
// work) implement the same interface over the API — load the latest version, save a new one
// based on a known version, and report a conflict instead of overwriting.
import type { SketchFile } from "@/solver/schema";
import { importSketchText } from "./files";
import { browserEvents, watchKey, type EventsLike } from "@/lib/other-tabs";

export type LoadOutcome =
  | { ok: true; sketch: SketchFile; /** the saved version this is (saved sketches) */ version?: number; readOnly?: boolean; migratedFrom?: number[] }
  | { ok: true; sketch: null }
  | { ok: false; reason: "not-found" | "signed-out" | "forbidden" | "unavailable" | "invalid"; message: string };

export type SaveOutcome =
  | { ok: true; version?: number; savedAt: string }
  | { ok: false; reason: "conflict"; message: string; latestVersion: number }
  | { ok: false; reason: "signed-out" | "forbidden" | "invalid" | "error"; message: string };

export interface SaveOptions {
  /** the version the edits started from (saved sketches) */
  baseVersion?: number;
  /** the version's message */
  message?: string;
}

/** What another tab or window of this browser did to the kept sketch: the sketch it keeps now (null: it let it go). */
export type OutsideChange = { sketch: SketchFile | null };

/** An uploaded drawing to trace over, as the editor needs it. */
export type UnderlayUpload = { id: string; width: number; height: number; name: string };

export interface SketchPersistence {
  readonly kind: "scratch" | "saved";
  /** true: every change is kept as it happens (debounced); false: the user saves */
  readonly autosave: boolean;
  /** where the undo history is kept across a reload of the page (`canvas/keptHistory.ts`); none: not kept */
  readonly historyKey?: string;
  /** a short phrase for the header, e.g. "Scratch sketch · kept in this browser"; `title`: the
   *  drawing's title shown above it (a saved sketch of the same name is not named twice) */
  describe(title?: string): string;
  load(): Promise<LoadOutcome>;
  save(sketch: SketchFile, opts?: SaveOptions): Promise<SaveOutcome>;
  /**
   * Upload a drawing, photo or PDF to trace over (saved sketches; it throws an Error whose
   * message is for people). Absent: underlays need a saved sketch, and the editor says so.
   */
  uploadUnderlay?(file: File): Promise<UnderlayUpload>;
  /**
   * Tell the page when another tab or window changes what is kept (the same sketch open twice),
   * so the two never overwrite each other unseen; returns the unsubscribe. Absent: nothing else
   * writes where this page keeps its sketch.
   */
  watch?(onChange: (change: OutsideChange) => void): () => void;
}

export const SCRATCH_KEY = "counterpoise:scratch-sketch:v1";

interface StorageLike {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

/** The sketch a scratch record holds, or null (none, or one this version cannot read). */
function scratchSketch(text: string | null): SketchFile | null {
  if (!text) return null;
  try {
    const out = importSketchText(JSON.stringify((JSON.parse(text) as { sketch?: unknown }).sketch));
    return out.ok ? out.sketch : null;
  } catch {
    return null;
  }
}

/**
 * The scratch sketch: works before sign-in, kept in local storage until saved to an account.
 * Every tab of the browser keeps it under the one key: `watch` hears another tab's writes (the
 * storage event, which the writing tab itself never gets).
 */
export function scratchPersistence(
  storage: StorageLike | null = typeof window !== "undefined" ? window.localStorage : null,
  key = SCRATCH_KEY,
  events: EventsLike | null = browserEvents(),
): SketchPersistence {
  return {
    kind: "scratch",
    autosave: true,
    historyKey: `scratch:${key}`,
    describe: () => "Scratch sketch · kept in this browser",
    async load() {
      const text = storage?.getItem(key);
      if (!text) return { ok: true, sketch: null };
      let stored: unknown;
      try {
        stored = JSON.parse(text);
      } catch {
        return { ok: false, reason: "invalid", message: "The scratch sketch in this browser is damaged; starting a new one." };
      }
      const doc = (stored as { sketch?: unknown }).sketch;
      const out = importSketchText(JSON.stringify(doc));
      if (!out.ok) return { ok: false, reason: "invalid", message: `The scratch sketch in this browser could not be read (${out.errors[0]?.message}); starting a new one.` };
      return { ok: true, sketch: out.sketch, migratedFrom: out.migratedFrom };
    },
    async save(sketch) {
      const savedAt = new Date().toISOString();
      try {
        storage?.setItem(key, JSON.stringify({ savedAt, sketch }));
      } catch (err) {
        return { ok: false, reason: "error", message: `This browser would not keep the sketch (${(err as Error).message}).` };
      }
      return { ok: true, savedAt };
    },
    watch(onChange) {
      return watchKey(key, (text) => onChange({ sketch: scratchSketch(text) }), events);
    },
  };
}

/**
 * A saved sketch before the versions API exists (or when it cannot be reached): it says so,
 * and the page offers sign-in and a scratch sketch instead.
 */
export function unavailablePersistence(id: string, reason: "not-found" | "signed-out" | "unavailable" = "not-found"): SketchPersistence {
  const message =
    reason === "signed-out"
      ? "Sign in to open this sketch."
      : `There is no sketch "${id}" that you can open. Saved sketches belong to a workspace: sign in with an account that is a member of it.`;
  return {
    kind: "saved",
    autosave: false,
    describe: () => `Saved sketch ${id}`,
    async load() {
      return { ok: false, reason, message };
    },
    async save() {
      return { ok: false, reason: "error", message: "Saving to a workspace is not available here yet." };
    },
  };
}
