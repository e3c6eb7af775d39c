"use client";
// A quiet key in the corner of the drawing: what each kind of arrow means, a note when the
// results drawn are an earlier sketch's, and gravity's direction when the sketch turns it.
import { useAnalysis, useEditor } from "../context";
import { FADED_BESIDE } from "../geometry/fit";
import { INK, INK_SOFT, REACTION } from "../render/palette";
import { gravityNote } from "@/solver/words";

const BOX = "pointer-events-none absolute top-2 rounded border border-rule/70 bg-paper-card/90 px-2 py-1.5 text-[11px] text-ink-soft";

export function CanvasLegend() {
  const shown = useAnalysis((s) => !!s.shown);
  const stale = useAnalysis((s) => s.stale);
  const gravityAngle = useAnalysis((s) => s.shownSketch?.gravityAngle);
  // a wide canvas has the note beside the key, in the band the fit keeps; a narrow one, in the
  // legend, whose room for it the fit keeps always (`legendRoom`): the drawing never jumps for it
  const beside = useEditor((s) => s.viewport.width >= FADED_BESIDE);
  if (!shown) return null;
  const turned = gravityNote(gravityAngle);
  const faded = <p className="font-semibold text-caution" data-testid="results-faded">Results faded: last good result, the input has errors</p>;
  return (
    <>
      {stale && beside && <div className={`${BOX} left-2`}>{faded}</div>}
      <div className={`${BOX} right-2 flex flex-col gap-1`} data-testid="canvas-legend">
        {stale && !beside && faded}
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
    </>
  );
}
