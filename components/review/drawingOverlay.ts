// Marks drawn over the shared SVG renderer's output in the browser: outlines around changed,
// added and removed elements (by shape and a word, not colour alone), comment pins, and the
// world point under a click. The renderer draws every element in a `<g data-id>` inside one
// translated group, in pixels of (x·scale, −y·scale); the scale is read back from a body's
// outline, whose corners the sketch gives in metres.
import type { Sketch } from "@/solver/types";

const NS = "http://www.w3.org/2000/svg";
export const OVERLAY_CLASS = "review-overlay";

export type MarkKind = "changed" | "added" | "removed";
export type PinMarker = { threadId: string; n: number; at: { elementId: string } | { point: [number, number] }; resolved: boolean; selected: boolean };

/** The group the renderer translates, which holds every element. */
export function contentGroup(svg: SVGSVGElement): SVGGElement | null {
  return svg.querySelector<SVGGElement>(":scope > g[transform]");
}

/** Pixels per metre, from the first body whose outline is drawn (null when no body is drawn). */
export function drawingScale(svg: SVGSVGElement, sketch: Sketch | null): number | null {
  if (!sketch) return null;
  for (const b of sketch.bodies) {
    const path = svg.querySelector<SVGPathElement>(`g[data-kind="body"][data-id="${CSS.escape(b.id)}"] path`);
    const d = path?.getAttribute("d");
    if (!d) continue;
    const px = [...d.matchAll(/[ML]\s*(-?[\d.]+)\s+(-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
    let best: { scale: number; span: number } | null = null;
    for (let i = 1; i < Math.min(px.length, b.outline.length); i++) {
      const span = Math.hypot(b.outline[i][0] - b.outline[0][0], b.outline[i][1] - b.outline[0][1]);
      if (span > (best?.span ?? 0)) best = { span, scale: Math.hypot(px[i][0] - px[0][0], px[i][1] - px[0][1]) / span };
    }
    if (best && Number.isFinite(best.scale) && best.scale > 0) return best.scale;
  }
  return null;
}

function el<K extends keyof SVGElementTagNameMap>(name: K, attrs: Record<string, string | number>): SVGElementTagNameMap[K] {
  const e = document.createElementNS(NS, name);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, String(v));
  return e;
}

function overlay(group: SVGGElement, which: "marks" | "pins"): SVGGElement {
  group.querySelector(`:scope > g.${OVERLAY_CLASS}-${which}`)?.remove();
  const g = el("g", { class: `${OVERLAY_CLASS} ${OVERLAY_CLASS}-${which}` });
  group.appendChild(g);
  return g;
}

function boxOf(group: SVGGElement, id: string): DOMRect | null {
  const target = group.querySelector<SVGGElement>(`g[data-id="${CSS.escape(id)}"]`);
  if (!target) return null;
  try {
    const b = target.getBBox();
    return b.width || b.height ? b : null;
  } catch {
    return null;
  }
}

const MARK_STYLE: Record<MarkKind, { dash: string; word: string; stroke: string }> = {
  changed: { dash: "6 3", word: "changed", stroke: "#8a6212" },
  added: { dash: "", word: "added", stroke: "#1f5f7a" },
  removed: { dash: "2 3", word: "removed", stroke: "#8c3520" },
};

/** Outline each marked element: dashed for changed, solid with “+” for added, dotted with “×” for removed, and the word. */
export function drawMarks(svg: SVGSVGElement, marks: Record<string, MarkKind>): void {
  const group = contentGroup(svg);
  if (!group) return;
  const g = overlay(group, "marks");
  for (const [id, kind] of Object.entries(marks)) {
    const b = boxOf(group, id);
    if (!b) continue;
    const s = MARK_STYLE[kind];
    const x = b.x - 7;
    const y = b.y - 7;
    g.appendChild(el("rect", { x, y, width: b.width + 14, height: b.height + 14, rx: 4, fill: "none", stroke: s.stroke, "stroke-width": 1.6, "stroke-dasharray": s.dash, "data-mark": kind, "data-mark-id": id }));
    const tag = kind === "added" ? "+ added" : kind === "removed" ? "× removed" : "△ changed";
    const label = el("text", { x: x + 2, y: y - 4, "font-size": 11, "font-weight": 600, fill: s.stroke, stroke: "#fbfaf6", "stroke-width": 3, "paint-order": "stroke" });
    label.textContent = tag;
    g.appendChild(label);
  }
}

/** Numbered pins: at an element's top-right corner, or at a point of the drawing. */
/**
 * `anchors`: where each element is (world, m): a support's, load's or port's point, a body's top
 * right corner. A pin stands on it; without one (or the scale) it stands on the element's drawn box.
 */
export function drawPins(svg: SVGSVGElement, pins: PinMarker[], scale: number | null, anchors: ReadonlyMap<string, [number, number]> = new Map()): void {
  const group = contentGroup(svg);
  if (!group) return;
  const g = overlay(group, "pins");
  for (const p of pins) {
    let at: [number, number] | null = null;
    if ("elementId" in p.at) {
      const a = anchors.get(p.at.elementId);
      if (a && scale) at = [a[0] * scale, -a[1] * scale];
      else {
        const b = boxOf(group, p.at.elementId);
        if (b) at = [b.x + b.width, b.y];
      }
    } else if (scale) at = [p.at.point[0] * scale, -p.at.point[1] * scale];
    if (!at) continue;
    const pin = el("g", { "data-thread": p.threadId, transform: `translate(${at[0].toFixed(1)} ${at[1].toFixed(1)})`, style: "cursor:pointer", role: "button", "aria-label": `Comment ${p.n}` });
    pin.appendChild(el("path", { d: "M0 0 L-5 -10 A11 11 0 1 1 5 -10 Z", fill: p.resolved ? "#e2dccf" : p.selected ? "#b4462b" : "#1d2329", stroke: "#fbfaf6", "stroke-width": 1.5 }));
    const n = el("text", { x: 0, y: -18, "text-anchor": "middle", "dominant-baseline": "central", "font-size": 11, "font-weight": 700, fill: p.resolved ? "#3d4650" : "#fbfaf6" });
    n.textContent = p.resolved ? `✓${p.n}` : String(p.n);
    pin.appendChild(n);
    g.appendChild(pin);
  }
}

/** The world point (m) under a pointer event, or null when the scale is unknown. */
export function worldPoint(svg: SVGSVGElement, clientX: number, clientY: number, scale: number | null): [number, number] | null {
  const group = contentGroup(svg);
  const ctm = group?.getScreenCTM();
  if (!group || !ctm || !scale) return null;
  const p = new DOMPoint(clientX, clientY).matrixTransform(ctm.inverse());
  return [Math.round((p.x / scale) * 1000) / 1000, Math.round((-p.y / scale) * 1000) / 1000];
}
