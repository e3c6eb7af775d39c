// Keeping the sketch as it changes (the scratch sketch autosaves): a change schedules one save a
// moment later, and a burst of changes (typing) becomes one save. A drag is saved once, when it
// ends; a drag cancelled with Escape leaves nothing new to save.
import type { SketchFile } from "@/solver/schema";
import type { SketchPersistence, SaveOutcome } from "./persistence";
import type { EditorStore } from "./store";

export interface AutosaveOptions {
  /** quiet time after the last change before saving */
  delayMs?: number;
  onSaved?: (out: SaveOutcome) => void;
}

/** Start saving the store's sketch through `persistence`; returns `flush` (save now if a save is due) and `stop`. */
export function startAutosave(store: EditorStore, persistence: SketchPersistence, { delayMs = 350, onSaved }: AutosaveOptions = {}) {
  /** the sketch last handed to the persistence (at the start: the one loaded) */
  let kept: SketchFile | null = store.getState().sketch;
  let timer: ReturnType<typeof setTimeout> | null = null;
  /** held while the user chooses between this tab's sketch and another tab's: nothing is written */
  let held = false;

  const save = () => {
    timer = null;
    if (held) return;
    const s = store.getState();
    // mid-drag the sketch on screen is not yet an edit: keep what the drag started from
    const sketch = s.gesture ? s.gesture.origin : s.sketch;
    if (sketch === kept) return;
    kept = sketch;
    void persistence.save(sketch).then((out) => {
      // not kept after all: the next change (even back to this sketch) saves again
      if (!out.ok && kept === sketch) kept = null;
      onSaved?.(out);
    });
  };

  const unsubscribe = store.subscribe((s, p) => {
    // the frames of a drag are not saved one by one: its end (or cancel) decides
    if (s.gesture) return;
    if (s.sketch === p.sketch && !p.gesture) return;
    if (timer) clearTimeout(timer);
    timer = null;
    // back to what is kept (an Escape-cancelled drag, an undo to the saved state): nothing to do
    if (s.sketch === kept) return;
    timer = setTimeout(save, delayMs);
  });

  return {
    /** Save now if a save is due (the page is being hidden or left). */
    flush: () => {
      if (!timer) return;
      clearTimeout(timer);
      save();
    },
    /** Write nothing until `release` (another tab keeps a different sketch under the same key). */
    hold: () => {
      held = true;
      if (timer) clearTimeout(timer);
      timer = null;
    },
    /**
     * Write again. "mine": keep this tab's sketch now, over what the other tab kept; "as-is": what
     * is kept stays until the next change here (the user took the other tab's sketch, or let the
     * kept one go).
     */
    release: (how: "mine" | "as-is") => {
      held = false;
      if (how === "as-is") {
        kept = store.getState().gesture?.origin ?? store.getState().sketch;
        return;
      }
      kept = null;
      save();
    },
    stop: () => {
      unsubscribe();
      if (timer) clearTimeout(timer);
      timer = null;
    },
  };
}
