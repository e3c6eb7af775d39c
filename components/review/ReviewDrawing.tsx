"use client";
// A version's drawing with its solved reactions, from the shared SVG renderer, with review
// marks on top: comment pins, outlines around what a comparison found changed, and (while
// pinning a new comment) a click picks an element or a point.
import { useLayoutEffect, useMemo, useRef, useState } from "react";
import type { View } from "@/canvas/geometry/view";
import { Enlargeable } from "./Enlargeable";
import { renderSketchSvg } from "@/canvas/render/svg";
import { solveDocument } from "@/lib/review/compare";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import { drawingScale, drawMarks, drawPins, worldPoint, type MarkKind, type PinMarker, type PinSpot } from "./drawingOverlay";

export type PickedPin = { kind: "element"; elementId: string; label: string } | { kind: "point"; at: [number, number] };

/** Where a pin on an element stands (world, m): its point, or a body's top right corner. */
function elementAnchors(sketch: NonNullable<ReturnType<typeof useSolved>["sketch"]>): Map<string, [number, number]> {
  const out = new Map<string, [number, number]>();
  for (const b of sketch.bodies) {
    if (!b.outline.length) continue;
    out.set(b.id, [Math.max(...b.outline.map((p) => p[0])), Math.max(...b.outline.map((p) => p[1]))]);
  }
  for (const e of [...sketch.supports, ...sketch.loads, ...sketch.ports, ...sketch.massSources] as Array<{ id: string; at?: [number, number] }>) {
    if (e.at && Number.isFinite(e.at[0]) && Number.isFinite(e.at[1])) out.set(e.id, [e.at[0], e.at[1]]);
  }
  return out;
}

export function useSolved(document: SketchFile) {
  return useMemo(() => {
    const { parsed, result } = solveDocument(document);
    return { parsed, result, sketch: parsed.ok ? parsed.sketch : null };
  }, [document]);
}

export function ReviewDrawing({
  document,
  marks,
  pins,
  picking = false,
  onPick,
  onSelectThread,
  caption,
  label,
  width = 880,
  height = 520,
  units = "SI",
  frame,
  layer = false,
  onlyLabelsOf,
  family,
  className = "",
}: {
  document: SketchFile;
  marks?: Record<string, MarkKind>;
  pins?: PinMarker[];
  picking?: boolean;
  onPick?: (pin: PickedPin) => void;
  onSelectThread?: (threadId: string) => void;
  caption?: string;
  label: string;
  /** the drawing's size in SVG pixels; it is shown at the width of its column */
  width?: number;
  height?: number;
  units?: UnitSystem;
  /** a shared scale and origin (from `sharedFrame`), so that two drawings line up */
  frame?: View;
  /** drawn as a see-through layer over another drawing: no paper, no legend, no border */
  layer?: boolean;
  /** write only these elements' labels, and no result labels (see renderSketchSvg) */
  onlyLabelsOf?: string[];
  /** every force and moment in these units (two drawings compared share one); by default the drawing's own */
  family?: { force: string; moment: string };
  className?: string;
}) {
  const box = useRef<HTMLDivElement>(null);
  const { result, sketch } = useSolved(document);
  // Drawn at the width of its column (not scaled down from `width`), so its words keep their size
  // on screen: a half-width column or a phone would otherwise shrink them past reading. A shared
  // frame (two drawings laid over each other) keeps its own size.
  const [column, setColumn] = useState<number | null>(null);
  useLayoutEffect(() => {
    const el = box.current;
    if (frame || !el || typeof ResizeObserver === "undefined") return;
    const ro = new ResizeObserver(([entry]) => {
      const w = Math.round(entry.contentRect.width);
      if (w > 0) setColumn((old) => (old !== null && Math.abs(old - w) < 8 ? old : w));
    });
    ro.observe(el);
    return () => ro.disconnect();
  }, [frame]);
  // (not below 640 px: a phone's column shows a drawing made for 640, scaled, whole, rather than
  // one whose labels crowd the body off its edges)
  const drawnWidth = !frame && column ? Math.max(640, column) : width;
  const drawnHeight = !frame && column ? Math.max(300, Math.round((drawnWidth * height) / width)) : height;
  // The renderer escapes every text it draws (titles, labels, values), so its output is markup we made.
  const svg = useMemo(
    // a tall sketch (a stack, a mast) may take a taller drawing, up to 1.2 times its width, rather than shrink
    () => renderSketchSvg(document, result, { width: drawnWidth, height: drawnHeight, maxHeight: frame ? undefined : Math.round(drawnWidth * 1.2), caption, units, frame, legend: !layer, background: layer ? "none" : "paper", onlyLabelsOf, family }),
    [document, result, drawnWidth, drawnHeight, caption, units, frame, layer, onlyLabelsOf, family],
  );

  // each pin is also a button laid over the drawing (outside its role="img", whose insides a
  // screen reader does not enter): at the pin's head, in shares of the drawing's own size
  const [spots, setSpots] = useState<Array<PinSpot & { left: number; top: number }>>([]);
  useLayoutEffect(() => {
    const el = box.current?.querySelector("svg");
    if (!el) return;
    if (marks) drawMarks(el, marks);
    const placed = pins ? drawPins(el, pins, drawingScale(el, sketch), sketch ? elementAnchors(sketch) : undefined) : [];
    const [w, h] = [Number(el.getAttribute("width")), Number(el.getAttribute("height"))];
    setSpots(w > 0 && h > 0 ? placed.map((p) => ({ ...p, left: (100 * p.x) / w, top: (100 * p.y) / h })) : []);
  }, [svg, marks, pins, sketch]);

  const drawing = (
    <div
      ref={box}
      role="img"
      aria-label={label}
      data-testid="review-drawing"
      data-picking={picking || undefined}
      className={`overflow-hidden [&>svg]:block [&>svg]:h-auto [&>svg]:w-full ${layer ? "" : "paper-sheet rounded-md border border-rule bg-paper"} ${picking ? "cursor-crosshair ring-2 ring-accent/40" : ""} ${className}`}
      onClick={(e) => {
        const target = e.target as Element;
        const thread = target.closest("[data-thread]");
        if (thread && onSelectThread) {
          onSelectThread(thread.getAttribute("data-thread")!);
          return;
        }
        if (!picking || !onPick) return;
        const element = target.closest("g[data-id]");
        if (element) {
          const id = element.getAttribute("data-id")!;
          const all = sketch ? [...sketch.bodies, ...sketch.supports, ...sketch.loads, ...sketch.ports, ...sketch.massSources] : [];
          onPick({ kind: "element", elementId: id, label: all.find((x) => x.id === id)?.label || id });
          return;
        }
        const svgEl = box.current?.querySelector("svg");
        const at = svgEl ? worldPoint(svgEl, e.clientX, e.clientY, drawingScale(svgEl, sketch)) : null;
        if (at) onPick({ kind: "point", at });
      }}
      dangerouslySetInnerHTML={{ __html: svg }}
    />
  );
  // (always this shape: a drawing re-made when its first pin arrives would lose the marks drawn on it)
  const withPins = (
    <div className="relative">
      {drawing}
      {/* for the keyboard and assistive technology; a mouse clicks the drawn pin under it (which
          does the same), and a click while pinning lands on the drawing. Not copied into the
          enlarged drawing, which takes no clicks. */}
      {spots.length ? (
        <div className="pointer-events-none absolute inset-0" data-enlarge-skip data-testid="comment-pins">
          {spots.map((p) => (
            <button
              key={p.threadId}
              type="button"
              aria-label={p.name}
              data-pin={p.n}
              onClick={() => onSelectThread?.(p.threadId)}
              className="absolute h-7 w-7 -translate-x-1/2 -translate-y-1/2 rounded-full focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-accent focus-visible:ring-offset-2 focus-visible:ring-offset-paper"
              style={{ left: `${p.left}%`, top: `${p.top}%` }}
            />
          ))}
        </div>
      ) : null}
    </div>
  );
  // a layer (no pins) is enlarged with the drawing it lies over (the caller wraps and places the pair)
  if (layer) return drawing;
  return (
    <Enlargeable naturalWidth={drawnWidth} label={label}>
      {withPins}
    </Enlargeable>
  );
}
