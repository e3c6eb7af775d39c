// Fit to view on a short, wide canvas: a laptop window of 1280 × 600 or a landscape tablet of
// 1024 × 560, where the results take the lower part of the window. Before, the drawing was left
// 224 px and 184 px tall; the reaction arrows ran off its bottom edge and the momentum arrows went
// under the legend. Now the results' own height leaves the drawing 340 px first (`ownHeight`), and
// on a landscape canvas the fit draws the body smaller rather than let the edges cut what is drawn
// around it at a fixed size on screen.
import { describe, expect, it } from "vitest";
import { EXAMPLES } from "@/canvas/examples";
import { fitScene, LEGEND_ROOM } from "@/canvas/geometry/fit";
import { toScreen } from "@/canvas/geometry/view";
import { primsBox } from "@/canvas/render/prims";
import { scenePrims } from "@/canvas/render/scenePrims";
import { DRAWING_KEEPS, ownHeight } from "@/components/results/ResultsDock";
import { placedWords, solvedScene } from "../../support/canvas-words";

/** The editor's toolbar (48 px) and the hint line under the drawing (36 px) on a wide window. */
const CHROME = 84;
/** The tray (232 px) and, on a 1280 px window, the properties panel (336 px) beside the drawing. */
const CANVASES = [
  { window: "1280 × 600", width: 1280 - 232 - 336, height: 600 - CHROME - ownHeight(600) },
  { window: "1024 × 560", width: 1024 - 232, height: 560 - CHROME - ownHeight(560) },
];

describe("the results' own height on a short window", () => {
  it("leaves the drawing 340 px first, the results at least 160 px; a taller window is as before", () => {
    expect(ownHeight(600)).toBe(600 - CHROME - DRAWING_KEEPS); // 176
    expect(ownHeight(560)).toBe(160);
    expect(ownHeight(500)).toBe(160);
    expect(ownHeight(768)).toBe(292);
    expect(ownHeight(900)).toBe(342);
    expect(ownHeight(1400)).toBe(420);
    expect(CANVASES.map((c) => c.height)).toEqual([340, 316]);
  });
});

describe("fit to view on a short, wide canvas", () => {
  for (const c of CANVASES) {
    it(`every example's symbols, arrows and words are whole on the ${c.width} × ${c.height} canvas of a ${c.window} window`, () => {
      const { width: W, height: H } = c;
      for (const ex of EXAMPLES) {
        const solved = solvedScene(ex.sketch);
        const view = fitScene(solved.scene, W, H, { result: solved.result });
        const where = `${ex.id} on ${W}×${H}`;
        // everything drawn, the reaction arrows' tails and the momentum arrows included
        const { groups, results } = scenePrims(solved.scene, view.scale, "SI", solved.result);
        const p = primsBox([...groups.flatMap((g) => g.prims), ...results]);
        expect(view.x + p.minX, where).toBeGreaterThanOrEqual(0);
        expect(view.x + p.maxX, where).toBeLessThanOrEqual(W);
        // at most a few pixels into the band kept for the legend (its box is 30 px tall)
        expect(view.y + p.minY, where).toBeGreaterThanOrEqual(LEGEND_ROOM - 8);
        expect(view.y + p.maxY, where).toBeLessThanOrEqual(H);
        // every word as the canvas places it is inside the drawing area
        for (const w of placedWords(solved, view, W, H).words) {
          expect(w.x0, `${where}: ${w.text}`).toBeGreaterThanOrEqual(0);
          expect(w.x1, `${where}: ${w.text}`).toBeLessThanOrEqual(W);
          expect(w.y0, `${where}: ${w.text}`).toBeGreaterThanOrEqual(LEGEND_ROOM - 8);
          expect(w.y1, `${where}: ${w.text}`).toBeLessThanOrEqual(H);
        }
        // and the body is still drawn at a size to work on: 48 px tall or more
        const ys = solved.scene.bodies.flatMap((b) => b.outline.map((q) => toScreen(view, q)[1]));
        expect(Math.max(...ys) - Math.min(...ys), where).toBeGreaterThanOrEqual(48 - 0.5);
      }
    });
  }
});
