"use client";
// A quiet key in the corner of the drawing: what each kind of arrow means, a note when the
// results drawn are an earlier sketch's, and gravity's direction when the sketch turns it.
import { useAnalysis } from "../context";
import { INK, INK_SOFT, REACTION } from "../render/palette";
import { gravityNote } from "@/solver/words";

export function CanvasLegend() {
  const shown = useAnalysis((s) => !!s.shown);
  const stale = useAnalysis((s) => s.stale);
  const gravityAngle = useAnalysis((s) => s.shownSketch?.gravityAngle);
  if (!shown) return null;
  const turned = gravityNote(gravityAngle);
  return (
    <div className="pointer-events-none absolute right-2 top-2 flex flex-col gap-1 rounded border border-rule/70 bg-paper-card/90 px-2 py-1.5 text-[11px] text-ink-soft">
      {stale && <p className="font-semibold text-caution">Results faded: last good result, the input has errors</p>}
      {turned && (
        <p className="flex items-center gap-1 font-semibold text-ink" data-testid="gravity-turned">
          <svg width="14" height="14" viewBox="-7 -7 14 14" aria-hidden="true">
            {/* gravity's direction in screen axes (y down) */}
            <g transform={`rotate(${-(gravityAngle as number)})`}>
              <path d="M-6 0H3" stroke={INK} strokeWidth="1.6" />
              <path d="M2 -3L6.5 0L2 3Z" fill={INK} />
            </g>
          </svg>
          {turned}
        </p>
      )}
      {/* the arrows' key repeats what the drawing's words say: kept from screen readers */}
      <div className="flex items-center gap-3" aria-hidden="true">
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
