"use client";
// A drawing shown smaller than it was drawn (a phone, a half-width column) offers "Enlarge": a
// dialog that shows the same drawing at its own size, scrolled by finger or wheel, so its labels
// read at the size they were made for. The copy is the drawing as shown (marks and pins included)
// and takes no clicks.
import { useLayoutEffect, useRef, useState, type ReactNode } from "react";
import { Button } from "@/components/shell/controls";
import { Dialog } from "@/components/versions/Dialog";

/** Shown below this share of its own width, a drawing's words are too small to read comfortably. */
const READABLE = 0.8;

/** The drawing as shown, without what is marked `data-enlarge-skip` (the comment pins' buttons) and without posing as the page's drawing. */
function copyOf(el: HTMLElement | null): string {
  if (!el) return "";
  const copy = el.cloneNode(true) as HTMLElement;
  for (const skip of copy.querySelectorAll("[data-enlarge-skip]")) skip.remove();
  return copy.innerHTML.replace(/ data-testid="[^"]*"/g, "").replace(/ role="img"/g, "");
}

export function Enlargeable({ naturalWidth, label, children }: { naturalWidth: number; label: string; children: ReactNode }) {
  const box = useRef<HTMLDivElement>(null);
  const [shown, setShown] = useState<number | null>(null);
  const [copy, setCopy] = useState<string | null>(null);
  useLayoutEffect(() => {
    const el = box.current;
    if (!el || typeof ResizeObserver === "undefined") return;
    const ro = new ResizeObserver(([entry]) => setShown(Math.round(entry.contentRect.width)));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  // opened on the middle of the drawing, where its body is, rather than its top left corner
  const pane = useRef<HTMLDivElement>(null);
  useLayoutEffect(() => {
    const el = pane.current;
    if (copy === null || !el) return;
    // after the dialog has opened and laid its pane out
    const frame = requestAnimationFrame(() => {
      el.scrollLeft = Math.max(0, (el.scrollWidth - el.clientWidth) / 2);
      el.scrollTop = Math.max(0, (el.scrollHeight - el.clientHeight) / 2);
    });
    return () => cancelAnimationFrame(frame);
  }, [copy]);
  const small = shown !== null && shown > 0 && shown < naturalWidth * READABLE;
  return (
    <div className="relative">
      <div ref={box}>{children}</div>
      {small ? (
        <button
          type="button"
          className="absolute right-2 top-2 rounded border border-rule bg-paper-card/95 px-2 py-1 text-xs font-medium text-ink shadow-sm hover:bg-paper focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-accent"
          aria-label={`Enlarge: ${label}`}
          onClick={() => setCopy(copyOf(box.current))}
        >
          Enlarge
        </button>
      ) : null}
      <Dialog open={copy !== null} title={label} onClose={() => setCopy(null)} full testId="enlarged-drawing">
        <p className="text-xs text-ink-soft">At its own size: scroll or drag to move around it.</p>
        <div ref={pane} className="paper-sheet mt-2 min-h-0 flex-1 overflow-auto rounded-md border border-rule bg-paper" role="img" aria-label={label}>
          <div className="pointer-events-none" style={{ width: naturalWidth }} dangerouslySetInnerHTML={{ __html: copy ?? "" }} />
        </div>
        <div className="mt-3 flex justify-end">
          <Button tone="secondary" onClick={() => setCopy(null)}>
            Close
          </Button>
        </div>
      </Dialog>
    </div>
  );
}
