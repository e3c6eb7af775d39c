"use client";
// A quiet key in the corner of the drawing: what each kind of arrow means, and a note when the
// results drawn are an earlier sketch's.
import { useAnalysis } from "../context";
import { INK, INK_SOFT, REACTION } from "../render/palette";

export function CanvasLegend() {
  const shown = useAnalysis((s) => !!s.shown);
  const stale = useAnalysis((s) => s.stale);
  if (!shown) return null;
  return (
    <div className="pointer-events-none absolute right-2 top-2 flex flex-col gap-1 rounded border border-rule/70 bg-paper-card/90 px-2 py-1.5 text-[11px] text-ink-soft" aria-hidden="true">
      {stale && <p className="font-semibold text-caution">Results faded: last good result, the input has errors</p>}
      <div className="flex items-center gap-3">
        <span className="flex items-center gap-1">
          <svg width="26" height="10">
            <path d="M1 5H19" stroke={INK} strokeWidth="1.8" />
            <path d="M18 1.5L25 5L18 8.5Z" fill={INK} />
          </svg>
          given load
        </span>
        <span className="flex items-center gap-1">
          <svg width="26" height="10">
            <path d="M1 2.6H19M1 7.4H19" stroke={REACTION} strokeWidth="1.5" />
            <path d="M18 0.5L25 5L18 9.5" fill="none" stroke={REACTION} strokeWidth="1.6" />
          </svg>
          reaction found
        </span>
        <span className="flex items-center gap-1">
          <svg width="26" height="10">
            <path d="M1 5H21" stroke={INK_SOFT} strokeWidth="1.4" strokeDasharray="4 3" />
            <path d="M19 1.5L25 5L19 8.5" fill="none" stroke={INK_SOFT} strokeWidth="1.4" />
          </svg>
          momentum flux ṁV
        </span>
      </div>
    </div>
  );
}
