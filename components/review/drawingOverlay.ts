// Marks drawn over the shared SVG renderer's output in the browser: outlines around changed,
// added and removed elements (by shape and a word, not colour alone), comment pins, and the
// world point under a click. The renderer draws every element in a `<g data-id>` inside one
// translated group, in pixels of (x·scale, −y·scale); the scale is read back from a body's
// outline, whose corners the sketch gives in metres.
import type { Sketch } from "@/solver/types";

const NS = "http://www.w3.org/2000/svg";
export const OVERLAY_CLASS = "review-overlay";

export type MarkKind = "changed" | "added" | "removed";
/** `name`: what the pin's button is called (see `pinName`) */
export type PinMarker = { threadId: string; n: number; name: string; at: { elementId: string } | { point: [number, number] }; resolved: boolean; selected: boolean };
/** Where a pin's head is drawn, in the svg's own pixels (its viewBox), for the button laid over it. */
export type PinSpot = { threadId: string; n: number; name: string; x: number; y: number };

/** A pin's button's name: "Comment 3 by Chen Checker: the anchor bolts look short…", and "(resolved)". */
export function pinName(n: number, first: { authorName: string | null; body: string; deleted: boolean } | undefined, resolved: boolean, plain: (text: string) => string): string {
  const who = first?.authorName ?? "a deleted account";
  let words = !first ? "" : first.deleted ? "a deleted comment" : plain(first.body);
  const cut = words.split(" ");
  if (cut.length > 8) words = `${cut.slice(0, 8).join(" ")}…`;
  else if (words.length > 60) words = `${words.slice(0, 60)}…`;
  return `Comment ${n} by ${who}${words ? `: ${words}` : ""}${resolved ? " (resolved)" : ""}`;
}

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

type Box = { x: number; y: number; width: number; height: number };
export type WordSpot = { x: number; y: number; anchor: "start" | "end"; box: Box };

/** A mark's word's box, estimated (11 px semi-bold: about 0.62 em a character), so that it is the same in every browser. */
export function wordSize(text: string, size = 11): { width: number; height: number } {
  return { width: Math.ceil([...text].length * size * 0.62), height: size + 3 };
}

const overlap = (a: Box, b: Box) => Math.max(0, Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x)) * Math.max(0, Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y));

/**
 * Where a mark's word goes beside its outline (drawing pixels): above its left corner, else above
 * its right corner, below its left, below its right: the first place that covers none of `avoid`
 * (the labels drawn near it, its own included, and the words placed before), else the one that
 * covers least of them. `x`, `y` are the text's anchor point and baseline.
 */
export function placeMarkWord(outline: Box, word: { width: number; height: number }, avoid: readonly Box[]): WordSpot {
  const gap = 4;
  const above = outline.y - gap;
  const below = outline.y + outline.height + gap + word.height - 3;
  const spots: WordSpot[] = [
    [outline.x + 2, above, "start"],
    [outline.x + outline.width - 2, above, "end"],
    [outline.x + 2, below, "start"],
    [outline.x + outline.width - 2, below, "end"],
  ].map(([x, y, anchor]) => {
    const left = anchor === "start" ? (x as number) : (x as number) - word.width;
    return { x: x as number, y: y as number, anchor: anchor as WordSpot["anchor"], box: { x: left, y: (y as number) - word.height + 3, width: word.width, height: word.height } };
  });
  let best = spots[0];
  let least = Infinity;
  for (const s of spots) {
    const covered = avoid.reduce((sum, b) => sum + overlap(s.box, b), 0);
    if (covered === 0) return s;
    if (covered < least) [best, least] = [s, covered];
  }
  return best;
}

/** The drawn boxes of the drawing's words (labels and results), outside the review marks. */
function textBoxes(group: SVGGElement): Box[] {
  const out: Box[] = [];
  for (const t of group.querySelectorAll<SVGTextElement>("text")) {
    if (t.closest(`.${OVERLAY_CLASS}`)) continue;
    try {
      const b = t.getBBox();
      if (b.width || b.height) out.push({ x: b.x, y: b.y, width: b.width, height: b.height });
    } catch {
      // not laid out (no layout engine): nothing to avoid
    }
  }
  return out;
}

/** Outline each marked element: dashed for changed, solid with “+” for added, dotted with “×” for removed, and the word, placed clear of the labels near it. */
export function drawMarks(svg: SVGSVGElement, marks: Record<string, MarkKind>): void {
  const group = contentGroup(svg);
  if (!group) return;
  const g = overlay(group, "marks");
  const avoid = textBoxes(group);
  for (const [id, kind] of Object.entries(marks)) {
    const b = boxOf(group, id);
    if (!b) continue;
    const s = MARK_STYLE[kind];
    const outline = { x: b.x - 7, y: b.y - 7, width: b.width + 14, height: b.height + 14 };
    g.appendChild(el("rect", { ...outline, rx: 4, fill: "none", stroke: s.stroke, "stroke-width": 1.6, "stroke-dasharray": s.dash, "data-mark": kind, "data-mark-id": id }));
    const tag = kind === "added" ? "+ added" : kind === "removed" ? "× removed" : "△ changed";
    const spot = placeMarkWord(outline, wordSize(tag), avoid);
    avoid.push(spot.box);
    const label = el("text", { x: spot.x, y: spot.y, "text-anchor": spot.anchor, "font-size": 11, "font-weight": 600, fill: s.stroke, stroke: "#fbfaf6", "stroke-width": 3, "paint-order": "stroke", "data-mark-word": id });
    label.textContent = tag;
    g.appendChild(label);
  }
}

/** How far a pin's head stands from its tip (px), and its radius. */
const PIN_STALK = 18;
const PIN_HEAD = 11;
/** The pin's leans, degrees clockwise from upright, in the order tried. */
const PIN_LEANS = [0, 40, -40, 80, -80, 125, -125, 180];

export type PinHead = { angle: number; x: number; y: number; box: Box };

/**
 * Where a pin's head goes (drawing pixels), its tip staying on `tip`: upright, else leaning right
 * or left, further and further, down to hanging: the first lean whose head covers none of `avoid`
 * (the drawing's labels and values, and the heads placed before), else the one that covers least.
 * A pin never hides a number of the drawing it could stand clear of.
 */
export function placePinHead(tip: readonly [number, number], avoid: readonly Box[]): PinHead {
  let best: PinHead | null = null;
  let least = Infinity;
  for (const angle of PIN_LEANS) {
    const r = (angle * Math.PI) / 180;
    const x = Math.round((tip[0] + PIN_STALK * Math.sin(r)) * 10) / 10;
    const y = Math.round((tip[1] - PIN_STALK * Math.cos(r)) * 10) / 10;
    const head: PinHead = { angle, x, y, box: { x: x - PIN_HEAD, y: y - PIN_HEAD, width: 2 * PIN_HEAD, height: 2 * PIN_HEAD } };
    const covered = avoid.reduce((sum, b) => sum + overlap(head.box, b), 0);
    if (covered === 0) return head;
    if (covered < least) [best, least] = [head, covered];
  }
  return best!;
}

/**
 * Numbered pins: at an element's top-right corner, or at a point of the drawing.
 * `anchors`: where each element is (world, m): a support's, load's or port's point, a body's top
 * right corner. A pin stands on it; without one (or the scale) it stands on the element's drawn box.
 * Its head leans clear of the drawing's words and of the pins before it (`placePinHead`).
 */
export function drawPins(svg: SVGSVGElement, pins: PinMarker[], scale: number | null, anchors: ReadonlyMap<string, [number, number]> = new Map()): PinSpot[] {
  const group = contentGroup(svg);
  if (!group) return [];
  const g = overlay(group, "pins");
  // the group's own shift, so that a spot is in the svg's pixels
  const shift = /translate\(\s*(-?[\d.]+)[\s,]+(-?[\d.]+)\s*\)/.exec(group.getAttribute("transform") ?? "");
  const [dx, dy] = shift ? [Number(shift[1]), Number(shift[2])] : [0, 0];
  const spots: PinSpot[] = [];
  const avoid = textBoxes(group);
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
    // drawn only: the button laid over it (ReviewDrawing) is what a keyboard and a screen reader reach
    const head = placePinHead(at, avoid);
    avoid.push(head.box);
    const hx = Math.round((head.x - at[0]) * 10) / 10;
    const hy = Math.round((head.y - at[1]) * 10) / 10;
    const pin = el("g", { "data-thread": p.threadId, "data-lean": head.angle, transform: `translate(${at[0].toFixed(1)} ${at[1].toFixed(1)})`, style: "cursor:pointer", "aria-hidden": "true" });
    // the pin's shape turns with its lean; its number stays upright in the head
    pin.appendChild(
      el("path", { d: "M0 0 L-5 -10 A11 11 0 1 1 5 -10 Z", ...(head.angle ? { transform: `rotate(${head.angle})` } : {}), fill: p.resolved ? "#e2dccf" : p.selected ? "#b4462b" : "#1d2329", stroke: "#fbfaf6", "stroke-width": 1.5 }),
    );
    const n = el("text", { x: hx, y: hy, "text-anchor": "middle", "dominant-baseline": "central", "font-size": 11, "font-weight": 700, fill: p.resolved ? "#3d4650" : "#fbfaf6" });
    n.textContent = p.resolved ? `✓${p.n}` : String(p.n);
    pin.appendChild(n);
    g.appendChild(pin);
    spots.push({ threadId: p.threadId, n: p.n, name: p.name, x: Math.round((dx + head.x) * 10) / 10, y: Math.round((dy + head.y) * 10) / 10 });
  }
  return spots;
}

/** The world point (m) under a pointer event, or null when the scale is unknown. */
export function worldPoint(svg: SVGSVGElement, clientX: number, clientY: number, scale: number | null): [number, number] | null {
  const group = contentGroup(svg);
  const ctm = group?.getScreenCTM();
  if (!group || !ctm || !scale) return null;
  const p = new DOMPoint(clientX, clientY).matrixTransform(ctm.inverse());
  return [Math.round((p.x / scale) * 1000) / 1000, Math.round((-p.y / scale) * 1000) / 1000];
}
