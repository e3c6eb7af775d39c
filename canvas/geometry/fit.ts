// Fit sketches into a drawing area: the bodies and elements, and also what is drawn around them
// at a fixed size on screen (symbols, labels, reaction arrows), so that nothing lands off the
// area — or, on the canvas, under the legend. Several scenes fitted together share one frame
// (scale and origin), which lets two versions be laid over each other.
import type { SolveResult } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import type { Box } from "../render/labels";
import { primsBox } from "../render/prims";
import { scenePrims } from "../render/scenePrims";
import type { Scene } from "../scene";
import { pointsOf } from "../scene";
import { boxOf } from "./polygon";
import { fitView, type View } from "./view";

/** Room kept at the top of the canvas for the legend of line styles, which sits over its top edge. */
export const LEGEND_ROOM = 44;
/** What each further row of the legend adds (gravity's direction when the sketch turns it). */
export const LEGEND_ROW = 22;
/**
 * The narrowest canvas on which the "Results faded" note sits in the band the legend's key keeps,
 * at the top left, beside the key. On a narrower one it is a row of the legend, and the room for
 * that row is kept always: the note comes and goes as a typed value holds an error and is put
 * right, and the drawing must not jump at each keystroke.
 */
export const FADED_BESIDE = 720;

/** The room kept at the top of a canvas `width` wide for the legend with its `legendRows` further rows. */
export function legendRoom(width: number, legendRows = 0): number {
  return LEGEND_ROOM + LEGEND_ROW * (legendRows + (width < FADED_BESIDE ? 1 : 0));
}
const GAP = 14;

type Drawn = { scene: Scene; result?: SolveResult | null };

function geometryBox(scene: Scene) {
  return boxOf([...scene.bodies.flatMap((b) => [...b.outline, b.cg]), ...scene.items.flatMap(pointsOf)].filter((p) => Number.isFinite(p[0]) && Number.isFinite(p[1])));
}

const SIDES = ["left", "right", "top", "bottom"] as const;

/** One frame for every scene: the union of their geometry, with room for what each draws around it. */
export function fitScenes(drawn: Drawn[], width: number, height: number, opts: { units?: UnitSystem; top?: number } = {}): View {
  const boxes = drawn.map((d) => geometryBox(d.scene)).filter((b) => Number.isFinite(b.minX));
  const box = boxes.length
    ? { minX: Math.min(...boxes.map((b) => b.minX)), minY: Math.min(...boxes.map((b) => b.minY)), maxX: Math.max(...boxes.map((b) => b.maxX)), maxY: Math.max(...boxes.map((b) => b.maxY)) }
    : geometryBox({ bodies: [], items: [], byId: new Map() });
  // a first guess: symbols and labels do not scale, so keep a generous margin for them
  const k = Math.min(1, Math.min(width, height) / 600);
  const guess = { top: 100 * k, right: 160 * k, bottom: 165 * k, left: 160 * k };
  let view = fitView(box, width, height, guess);
  if (!Number.isFinite(box.minX)) return view;
  // then measure what is drawn at that scale beyond the geometry, and fit again; the margins hardly
  // change with the scale (arrows and labels keep their size on screen), but a crowded label may
  // take another place at the new one: measure again, keeping the larger margins, until what is
  // drawn fits in them (a few rounds at most)
  let used: { left: number; right: number; top: number; bottom: number } | null = null;
  for (let i = 0; i < 5; i++) {
    const s = view.scale;
    const m = { left: 0, right: 0, top: 0, bottom: 0 };
    for (const d of drawn) {
      const { groups, results } = scenePrims(d.scene, s, opts.units ?? "SI", d.result ?? null);
      const p = primsBox([...groups.flatMap((g) => g.prims), ...results]);
      if (!Number.isFinite(p.minX)) continue;
      m.left = Math.max(m.left, box.minX * s - p.minX);
      m.right = Math.max(m.right, p.maxX - box.maxX * s);
      m.top = Math.max(m.top, -box.maxY * s - p.minY);
      m.bottom = Math.max(m.bottom, p.maxY + box.minY * s);
    }
    const margins = { left: m.left + GAP, right: m.right + GAP, top: m.top + GAP + (opts.top ?? 0), bottom: m.bottom + GAP };
    // without a result yet, the reactions' arrows are not measured: keep the first guess's room for them
    if (drawn.some((d) => !d.result)) for (const side of SIDES) margins[side] = Math.max(margins[side], guess[side]);
    if (used) {
      if (i >= 2 && SIDES.every((k) => margins[k] <= used![k] + 0.5)) break;
      for (const k of SIDES) margins[k] = Math.max(margins[k], used[k]);
    }
    used = margins;
    view = fitView(box, width, height, margins);
  }
  return view;
}

/**
 * The canvas's drawing area in content pixels (the drawing's own coordinates at the view's scale),
 * below the legend and a hair inside the edges: the labels keep inside it.
 */
export function drawingFrame(view: View, viewport: { width: number; height: number }, legendRows = 0): Box | undefined {
  const top = legendRoom(viewport.width, legendRows);
  if (viewport.width <= 1 || viewport.height <= top) return undefined;
  return { x0: 2 - view.x, y0: top - view.y, x1: viewport.width - 2 - view.x, y1: viewport.height - 2 - view.y };
}

/**
 * Everything the canvas draws for the scene and its result (symbols, words, the reactions' arrows)
 * lies inside the drawing area at this view, below the legend: a refit would only move the
 * drawing under the user's pointer.
 */
export function drawnInFrame(scene: Scene, view: View, viewport: { width: number; height: number }, drawn: { result?: SolveResult | null; units?: UnitSystem } = {}): boolean {
  const frame = drawingFrame(view, viewport, scene.legendRows);
  if (!frame) return false;
  const { groups, results } = scenePrims(scene, view.scale, drawn.units ?? "SI", drawn.result ?? null);
  const p = primsBox([...groups.flatMap((g) => g.prims), ...results]);
  if (!Number.isFinite(p.minX)) return true;
  return p.minX >= frame.x0 && p.maxX <= frame.x1 && p.minY >= frame.y0 && p.maxY <= frame.y1;
}

const fitted = new WeakSet<View>();

/** The canvas's fit to view: one scene, clear of the legend. The view it gives is known as a fit
 *  (`isFitted`) until a zoom or a pan replaces it. */
export function fitScene(scene: Scene, width: number, height: number, drawn: { result?: SolveResult | null; units?: UnitSystem } = {}): View {
  const view = fitScenes([{ scene, result: drawn.result }], width, height, { units: drawn.units, top: legendRoom(width, scene.legendRows) });
  fitted.add(view);
  return view;
}

/** The view is the one a fit to view made (no zoom or pan since): a resized canvas is fitted again. */
export const isFitted = (view: View): boolean => fitted.has(view);
