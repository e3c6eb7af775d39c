// The drawing to trace over in view: with nothing drawn yet, "Fit" (F) shows the whole underlay —
// it used to fit an empty scene and leave the drawing wherever it was (after its scale is set it
// grows or shrinks about the first mark, to a speck or off the screen). Once something is drawn,
// Fit shows the model, as before. The view is checked by hand: the image's corners on screen.
import { describe, expect, it } from "vitest";
import type { ActionContext } from "@/canvas/actions";
import { ACTIONS } from "@/canvas/actions";
import { createAnalysisStore } from "@/canvas/analysis/store";
import { createSceneStore } from "@/canvas/context";
import { LEGEND_ROOM } from "@/canvas/geometry/fit";
import { fitUnderlayView } from "@/canvas/geometry/underlay";
import { toScreen } from "@/canvas/geometry/view";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { createEditorStore } from "@/canvas/store";
import type { SketchFile, UnderlayFile } from "@/solver/schema";
import { imageToWorld } from "@/solver/underlay";
import type { Vec2 } from "@/solver/types";

/** A one-page GA drawing rendered at 150 dpi (A4 landscape), its scale set to 1.6 mm a pixel. */
const GA: UnderlayFile = { upload: "0b7d1f52-9a51-4c8e-8f4e-2a7b8c1d0e11", width: 1754, height: 1241, origin: [-0.39, 1.44], metresPerPixel: 0.0016, rotation: 0, opacity: 0.6 };
const VIEWPORT = { width: 840, height: 460 };

function cornersOnScreen(u: UnderlayFile, view: { scale: number; x: number; y: number }): Vec2[] {
  const placement = { origin: u.origin, metresPerPixel: u.metresPerPixel, rotation: u.rotation ?? 0 };
  return ([[0, 0], [u.width, 0], [u.width, u.height], [0, u.height]] as Vec2[]).map((p) => toScreen(view, imageToWorld(placement, p)));
}

function runFit(sketch: SketchFile) {
  const editor = createEditorStore({ sketch });
  editor.getState().setViewport(VIEWPORT);
  const analysis = createAnalysisStore();
  const ctx = { stores: { editor, analysis, scene: createSceneStore(editor, analysis) }, controller: null, ui: {} as ActionContext["ui"] } as ActionContext;
  ACTIONS.find((a) => a.id === "view.fit")!.run(ctx);
  return editor.getState().view;
}

describe("fitting the underlay into view", () => {
  it("puts the whole image on the canvas, below the legend, filling its width or its height", () => {
    const view = fitUnderlayView(GA, VIEWPORT.width, VIEWPORT.height);
    const c = cornersOnScreen(GA, view);
    for (const [x, y] of c) {
      expect(x).toBeGreaterThanOrEqual(0);
      expect(x).toBeLessThanOrEqual(VIEWPORT.width);
      expect(y).toBeGreaterThanOrEqual(LEGEND_ROOM);
      expect(y).toBeLessThanOrEqual(VIEWPORT.height);
    }
    // 1754 × 1241 px is wider (1.41) than the room left (≈ 816 × 396 px, 2.06): the height fills it
    const shownHeight = Math.max(...c.map((p) => p[1])) - Math.min(...c.map((p) => p[1]));
    expect(shownHeight).toBeGreaterThan(0.9 * (VIEWPORT.height - LEGEND_ROOM));
  });

  it("takes a turned image's corners", () => {
    const turned = { ...GA, rotation: 90 };
    for (const [x, y] of cornersOnScreen(turned, fitUnderlayView(turned, VIEWPORT.width, VIEWPORT.height))) {
      expect(x).toBeGreaterThanOrEqual(0);
      expect(x).toBeLessThanOrEqual(VIEWPORT.width);
      expect(y).toBeGreaterThanOrEqual(LEGEND_ROOM);
      expect(y).toBeLessThanOrEqual(VIEWPORT.height);
    }
  });

  it("is what Fit does while nothing is drawn; a hidden drawing, or a drawn body, is fitted as before", () => {
    const empty: SketchFile = { ...emptySketch("Ducted fan"), underlay: GA };
    expect(runFit(empty)).toEqual(fitUnderlayView(GA, VIEWPORT.width, VIEWPORT.height));
    expect(runFit({ ...empty, underlay: { ...GA, hidden: true } })).not.toEqual(fitUnderlayView(GA, VIEWPORT.width, VIEWPORT.height));
    const traced: SketchFile = { ...empty, bodies: [newBody("b1", [[0, 0], [1.2, 0], [1.2, 0.9], [0, 0.9]], "Fan housing")] };
    const view = runFit(traced);
    // the housing (with room for its labels), not the 2.8 m × 2.0 m page, fills the view
    expect(view.scale).toBeGreaterThan(1.3 * fitUnderlayView(GA, VIEWPORT.width, VIEWPORT.height).scale);
  });
});
