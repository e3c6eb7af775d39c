"use client";
// The same sketch open in two tabs of one browser: each keeps its sketch under the same key, so
// the later write would replace the earlier one unseen. When another tab keeps a different sketch,
// this tab stops writing and asks which to keep; either choice leaves the other recoverable (Undo
// brings this tab's back; the other tab is asked the same when this one writes).
import { useEffect, useState, type RefObject } from "react";
import equal from "fast-deep-equal";
import type { Command } from "@/canvas/commands/define";
import { replaceSketch } from "@/canvas/commands/fields";
import type { SketchPersistence } from "@/canvas/persistence";
import type { EditorStore } from "@/canvas/store";
import type { SketchFile } from "@/solver/schema";
import { BUTTON, PRIMARY_BUTTON } from "./ui";

/** What the banner needs of the autosave: stop writing, and write again. */
export interface AutosaveHold {
  hold(): void;
  release(how: "mine" | "as-is"): void;
}

/** Another tab's sketch waiting for a choice (null: that tab let the kept sketch go), or none. */
export type Clash = { theirs: SketchFile | null } | null;

export function useOtherTab(store: EditorStore, persistence: SketchPersistence, autosave: RefObject<AutosaveHold | null>, ready: boolean) {
  const [clash, setClash] = useState<Clash>(null);
  useEffect(() => {
    if (!ready || !persistence.watch || store.getState().readOnly) return;
    return persistence.watch(({ sketch }) => {
      const s = store.getState();
      const mine = s.gesture?.origin ?? s.sketch;
      // the other tab keeps what this one shows (both opened it, or one took the other's): nothing to choose
      if (sketch && equal(sketch, mine)) {
        setClash((was) => {
          if (was) autosave.current?.release("as-is");
          return null;
        });
        return;
      }
      autosave.current?.hold();
      setClash({ theirs: sketch });
    });
  }, [store, persistence, autosave, ready]);
  // leaving while the choice is open would lose this tab's sketch: the browser asks first
  useEffect(() => {
    if (!clash) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [clash]);

  const keepMine = () => {
    setClash(null);
    autosave.current?.release("mine");
    store.getState().notify("Kept this tab’s sketch in this browser. The other tab, if it shows another, now asks which to keep.");
  };
  const takeTheirs = () => {
    if (!clash?.theirs) return;
    if (!store.getState().apply(replaceSketch({ sketch: clash.theirs, label: "Open the other tab's sketch" }) as Command<unknown>)) return;
    setClash(null);
    autosave.current?.release("as-is");
    store.getState().notify("Opened the other tab's sketch. Undo (Ctrl+Z) brings this tab's back.");
  };
  const letGo = () => {
    setClash(null);
    autosave.current?.release("as-is");
  };
  return { clash, keepMine, takeTheirs, letGo };
}

/** The question, above the drawing, until it is answered. */
export function OtherTabNotice({ clash, keepMine, takeTheirs, letGo }: ReturnType<typeof useOtherTab>) {
  if (!clash) return null;
  return (
    <section aria-labelledby="other-tab-h" className="border-b border-caution/50 bg-caution-soft px-3 py-2 text-[12.5px] text-ink" data-testid="other-tab">
      <p id="other-tab-h" role="alert" className="font-semibold">
        {clash.theirs ? "This sketch was changed in another tab or window." : "The sketch kept in this browser was cleared in another tab or window."}
      </p>
      <p className="mt-0.5 text-ink-soft">
        {clash.theirs
          ? "This tab has stopped keeping its changes, so neither tab's work replaces the other's unseen. Open the other tab's sketch here (Undo brings this one back), or keep this tab's (it replaces the other's in this browser)."
          : "It may have been saved to a workspace there. This tab has stopped keeping its changes: keep this tab's sketch in this browser again, or leave it cleared (this tab keeps its sketch on screen, and keeps it again from its next change)."}
      </p>
      <div className="mt-1.5 flex flex-wrap gap-2">
        {clash.theirs ? (
          <button type="button" className={PRIMARY_BUTTON} onClick={takeTheirs} data-testid="other-tab-theirs">
            Open the other tab’s sketch
          </button>
        ) : null}
        <button type="button" className={clash.theirs ? BUTTON : PRIMARY_BUTTON} onClick={keepMine} data-testid="other-tab-mine">
          Keep this tab’s sketch
        </button>
        {clash.theirs ? null : (
          <button type="button" className={BUTTON} onClick={letGo} data-testid="other-tab-let-go">
            Leave it cleared
          </button>
        )}
      </div>
    </section>
  );
}
