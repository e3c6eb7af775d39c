// A selected element's turn handle and its angle readout stand clear of the element's own words
// (a port's "ṁ … · V …" is written where its arrow points, which is where the handle goes).
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { handlePlace, ROTATE_HANDLE_PX } from "@/canvas/konva/overlays";
import { buildScene, fieldValuesById, type SceneItem } from "@/canvas/scene";
import { itemPrims } from "@/canvas/render/symbols";
import { dir, textExtent, type Prim } from "@/canvas/render/prims";
import { ACCENT } from "@/canvas/render/palette";
import { parseSketch } from "@/solver";

const SCALE = 154;

function itemOf(exampleId: string, id: string): SceneItem {
  const parsed = parseSketch(exampleById(exampleId)!.sketch);
  if (!parsed.ok) throw new Error("example does not parse");
  const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
  return scene.items.find((i) => i.id === id)!;
}

describe("the turn handle's place", () => {
  it("moves out past an outlet's words, and nothing it draws lands on them", () => {
    const item = itemOf("pump-skid", "discharge") as SceneItem & { angle: number };
    // the item's words are drawn about its anchor, and so is the handle
    const along = dir(item.angle);
    const { distance: t, readout } = handlePlace(item, along, SCALE, "SI");
    expect(t).toBeGreaterThan(ROTATE_HANDLE_PX);
    expect(t).toBeLessThanOrEqual(120);
    const h = [along[0] * t, along[1] * t];
    const words = itemPrims(item, { units: "SI", scale: SCALE, color: ACCENT, showName: true })
      .filter((p): p is Extract<Prim, { t: "text" }> => p.t === "text")
      .map(textExtent);
    expect(words.length).toBeGreaterThan(0);
    const r = [h[0] + readout[0], h[1] + readout[1]];
    for (const w of words) {
      // the ring (radius 6.5) and the readout (about 32 × 12 px) each miss every word
      expect(w.x1 < h[0] - 8 || w.x0 > h[0] + 8 || w.y1 < h[1] - 8 || w.y0 > h[1] + 8).toBe(true);
      expect(w.x1 < r[0] || w.x0 > r[0] + 32 || w.y1 < r[1] || w.y0 > r[1] + 12).toBe(true);
    }
  });

  it("stays at its usual distance where nothing is written in its way (a contact's handle points into the ground)", () => {
    const item = itemOf("pump-skid", "rear") as SceneItem & { angle: number };
    const along = dir(item.angle);
    expect(handlePlace(item, [-along[0], -along[1]], SCALE, "SI")).toEqual({ distance: ROTATE_HANDLE_PX, readout: [9, -15] });
  });

  it("keeps its angle inside the drawing area: a handle just under the legend writes it below, not under the legend", () => {
    const item = itemOf("pump-skid", "rear") as SceneItem & { angle: number };
    const along = dir(item.angle);
    const free = handlePlace(item, [-along[0], -along[1]], SCALE, "SI");
    const h = [-along[0] * free.distance, -along[1] * free.distance];
    // the drawing area's top edge 5 px above the handle's centre: the upper corners (15 px up) reach past it
    const keepIn = { x0: -1000, y0: h[1] - 5, x1: 1000, y1: 1000 };
    const { readout } = handlePlace(item, [-along[0], -along[1]], SCALE, "SI", keepIn);
    expect(readout).toEqual([9, 5]);
    expect(h[1] + readout[1]).toBeGreaterThanOrEqual(keepIn.y0);
    // and at the right edge too: the lower left corner
    const corner = handlePlace(item, [-along[0], -along[1]], SCALE, "SI", { ...keepIn, x1: h[0] + 20 });
    expect(corner.readout).toEqual([-41, 5]);
  });

  it("comes in along its line when the legend would hide it (an element near the top of a short drawing), and no nearer than 30 px", () => {
    // the contact's handle turned to point straight up (screen y down): 66 px above its anchor
    const item = itemOf("pump-skid", "rear") as SceneItem & { angle: number };
    const up: [number, number] = [0, -1];
    expect(handlePlace(item, up, SCALE, "SI").distance).toBe(ROTATE_HANDLE_PX);
    // the drawing area begins 40 px above the anchor: the handle comes in to 36 px, inside it
    const keepIn = { x0: -1000, y0: -40, x1: 1000, y1: 1000 };
    const placed = handlePlace(item, up, SCALE, "SI", keepIn);
    expect(placed.distance).toBe(36);
    expect(-placed.distance).toBeGreaterThanOrEqual(keepIn.y0);
    // its angle is written inside the area too
    expect(-placed.distance + placed.readout[1]).toBeGreaterThanOrEqual(keepIn.y0);
    // with the area's edge 20 px above the anchor there is no room outside the symbol: it stays out where it was
    expect(handlePlace(item, up, SCALE, "SI", { ...keepIn, y0: -20 }).distance).toBe(ROTATE_HANDLE_PX);
  });
});
