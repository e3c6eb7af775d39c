// Where a selected element's turn handle goes: pure (no Konva), so the canvas, its tests and the
// browser tests place it the same way.
import type { Vec2 } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import type { SceneItem } from "../scene";
import { ACCENT } from "./palette";
import { dir, textExtent, type Prim } from "./prims";
import type { Box } from "./labels";
import { itemPrims } from "./symbols";

export const ROTATE_HANDLE_PX = 66;

/** The farthest a turn handle moves out to clear the element's words (further, it would look detached). */
const HANDLE_REACH_PX = 120;
/** The nearest a turn handle comes in to stay in the drawing area (nearer, it sits on the symbol). */
const HANDLE_NEAR_PX = 30;

/**
 * Where an element's turn handle sits along its direction, and where its angle readout goes: the
 * handle ROTATE_HANDLE_PX out, or further (up to HANDLE_REACH_PX) until it is clear of the element's
 * own words (a port's "ṁ … · V …" sits where its arrow points); the readout at the first corner of
 * the handle where it covers none of them and stays inside `keepIn` (the drawing area below the
 * legend, when given: a handle near the top edge keeps its angle out from under the legend).
 * Offsets, and `keepIn`, are from the element's anchor, in pixels.
 */
export function handlePlace(item: SceneItem, along: Vec2, scale: number, units: UnitSystem, keepIn?: Box): { distance: number; readout: Vec2 } {
  return placeHandle(handleWords(item, scale, units), along, keepIn);
}

/** The boxes of an item's own words about its anchor (px): what its turn handle keeps off. They
 *  change with the item, the scale and the units, not with a pan: measure once, place per view. */
export function handleWords(item: SceneItem, scale: number, units: UnitSystem): Box[] {
  // an item's primitives are drawn about its anchor
  return itemPrims(item, { units, scale, color: ACCENT, showName: true })
    .filter((p): p is Extract<Prim, { t: "text" }> => p.t === "text")
    .map(textExtent);
}

/** `handlePlace` from words already measured (`handleWords`). */
export function placeHandle(boxes: readonly Box[], along: Vec2, keepIn?: Box): { distance: number; readout: Vec2 } {
  const clear = (x0: number, y0: number, x1: number, y1: number) => boxes.every((b) => !(b.x0 < x1 + 2 && x0 - 2 < b.x1 && b.y0 < y1 + 2 && y0 - 2 < b.y1));
  const clearAt = (t: number) => clear(along[0] * t - 8, along[1] * t - 8, along[0] * t + 8, along[1] * t + 8);
  let distance = ROTATE_HANDLE_PX;
  for (let t = ROTATE_HANDLE_PX; t <= HANDLE_REACH_PX; t += 6) {
    if (clearAt(t)) {
      distance = t;
      break;
    }
  }
  // a handle whose centre the legend or the canvas's edge would hide (an element near the top of a
  // short drawing) comes in along its line, clear of the words where it can be
  const shown = (t: number) => !keepIn || (along[0] * t >= keepIn.x0 && along[0] * t <= keepIn.x1 && along[1] * t >= keepIn.y0 && along[1] * t <= keepIn.y1);
  if (!shown(distance)) {
    const nearer: number[] = [];
    for (let t = Math.min(distance, ROTATE_HANDLE_PX) - 6; t >= HANDLE_NEAR_PX; t -= 6) if (shown(t)) nearer.push(t);
    distance = nearer.find(clearAt) ?? nearer[0] ?? distance;
  }
  const h = [along[0] * distance, along[1] * distance];
  // "90°" is about 30 × 12 px: upper right, lower right, upper left, lower left of the handle
  const corners: Vec2[] = [[9, -15], [9, 5], [-41, -15], [-41, 5]];
  const inside = ([dx, dy]: Vec2) => !keepIn || (h[0] + dx >= keepIn.x0 && h[1] + dy >= keepIn.y0 && h[0] + dx + 32 <= keepIn.x1 && h[1] + dy + 12 <= keepIn.y1);
  const free = ([dx, dy]: Vec2) => clear(h[0] + dx, h[1] + dy, h[0] + dx + 32, h[1] + dy + 12);
  const readout = corners.find((c) => free(c) && inside(c)) ?? corners.find(inside) ?? corners.find(free) ?? corners[0];
  return { distance, readout };
}

/**
 * What a turn handle covers on screen, in content pixels, for the labels to keep off: its ring,
 * its angle readout, and its dashed line from the element's anchor (`anchor`, content px) out
 * along `along` (a unit direction on screen), as small squares along it (a box round a slanted
 * line would shut out far more than the line). `place` is `handlePlace`'s answer.
 */
export function handleBoxes(anchor: Vec2, along: Vec2, place: { distance: number; readout: Vec2 }): Box[] {
  const t = place.distance;
  const h: Vec2 = [anchor[0] + along[0] * t, anchor[1] + along[1] * t];
  const boxes: Box[] = [
    { x0: h[0] - 9, y0: h[1] - 9, x1: h[0] + 9, y1: h[1] + 9 },
    { x0: h[0] + place.readout[0], y0: h[1] + place.readout[1], x1: h[0] + place.readout[0] + 32, y1: h[1] + place.readout[1] + 12 },
  ];
  // the line starts under the element's own symbol (its arrow, its face): squares from 12 px out
  for (let s = 12; s < t - 6; s += 5) {
    const p: Vec2 = [anchor[0] + along[0] * s, anchor[1] + along[1] * s];
    boxes.push({ x0: p[0] - 2.5, y0: p[1] - 2.5, x1: p[0] + 2.5, y1: p[1] + 2.5 });
  }
  return boxes;
}

/** Which way a rotate handle points from the anchor: the arrow's tail side for forces and inlets. */
export function handleSign(item: SceneItem): 1 | -1 {
  return item.kind === "outlet" || item.kind === "tie" ? 1 : -1;
}

/** The way an item's turn handle stands out from its anchor, a unit vector in screen pixels' axes
 *  (y down as drawn): along its direction (a negative force's reversed) times `handleSign`. */
export function handleAlong(item: SceneItem & { angle: number }): Vec2 {
  const d = dir(item.kind === "force" && "magnitude" in item && item.magnitude < 0 ? item.angle + 180 : item.angle);
  const sign = handleSign(item);
  return [d[0] * sign, d[1] * sign];
}
