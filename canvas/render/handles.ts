// Where a selected element's turn handle goes: pure (no Konva), so the canvas, its tests and the
// browser tests place it the same way.
import type { Vec2 } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import type { SceneItem } from "../scene";
import { ACCENT } from "./palette";
import { textExtent, type Prim } from "./prims";
import { itemPrims } from "./symbols";

export const ROTATE_HANDLE_PX = 66;

/** The farthest a turn handle moves out to clear the element's words (further, it would look detached). */
const HANDLE_REACH_PX = 120;

/**
 * Where an element's turn handle sits along its direction, and where its angle readout goes: the
 * handle ROTATE_HANDLE_PX out, or further (up to HANDLE_REACH_PX) until it is clear of the element's
 * own words (a port's "ṁ … · V …" sits where its arrow points); the readout at the first corner of
 * the handle where it covers none of them. Offsets are from the element's anchor, in pixels.
 */
export function handlePlace(item: SceneItem, along: Vec2, scale: number, units: UnitSystem): { distance: number; readout: Vec2 } {
  // an item's primitives are drawn about its anchor
  const boxes = itemPrims(item, { units, scale, color: ACCENT, showName: true })
    .filter((p): p is Extract<Prim, { t: "text" }> => p.t === "text")
    .map(textExtent);
  const clear = (x0: number, y0: number, x1: number, y1: number) => boxes.every((b) => !(b.x0 < x1 + 2 && x0 - 2 < b.x1 && b.y0 < y1 + 2 && y0 - 2 < b.y1));
  let distance = ROTATE_HANDLE_PX;
  for (let t = ROTATE_HANDLE_PX; t <= HANDLE_REACH_PX; t += 6) {
    if (clear(along[0] * t - 8, along[1] * t - 8, along[0] * t + 8, along[1] * t + 8)) {
      distance = t;
      break;
    }
  }
  const h = [along[0] * distance, along[1] * distance];
  // "90°" is about 30 × 12 px: upper right, lower right, upper left, lower left of the handle
  const corners: Vec2[] = [[9, -15], [9, 5], [-41, -15], [-41, 5]];
  const readout = corners.find(([dx, dy]) => clear(h[0] + dx, h[1] + dy, h[0] + dx + 32, h[1] + dy + 12)) ?? corners[0];
  return { distance, readout };
}
