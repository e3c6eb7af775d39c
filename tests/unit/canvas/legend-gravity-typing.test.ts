// While a typed gravity direction holds an error, the canvas's legend keeps saying the last good
// one (it is drawn from the shown result's sketch). The scene's legend rows follow the legend, so
// the fit and the labels keep below the row the legend still shows, and lose it only when the
// legend does.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { createEditorStore } from "@/canvas/store";
import { setSketchField, type Command } from "@/canvas/commands";
import { buildScene } from "@/canvas/scene";
import { fitScene, LEGEND_ROOM, LEGEND_ROW } from "@/canvas/geometry/fit";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { gravityNote } from "@/solver/words";
import { linkStores } from "../../support/linked-stores";

const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;

/** A 2 m crate on a pin, on a deck sloped by `slope` (our own scenario): gravity turned 4° off −y. */
function crate(): SketchFile {
  return {
    ...emptySketch("Crate on a sloped deck"),
    parameters: { slope: "4 deg" },
    gravityAngle: "-90 deg + slope",
    bodies: [{ ...newBody("b1", [[0, 0], [2, 0], [2, 2], [0, 2]], "Crate"), mass: "500 kg" } as never],
    supports: [{ id: "s1", body: "b1", kind: "fixed", at: [0, 0] } as never],
  } as SketchFile;
}

function linked() {
  const editor = createEditorStore({ sketch: crate() });
  editor.getState().setViewport({ width: 900, height: 600 });
  const {
    stores: { analysis, scene },
    stops,
  } = linkStores(editor);
  const type = (value: string) => editor.getState().apply(c(setSketchField({ field: "gravityAngle", value })));
  /** what the legend says of gravity (CanvasLegend: the shown result's sketch) */
  const legendSays = () => (analysis.getState().shown ? gravityNote(analysis.getState().shownSketch?.gravityAngle) : null);
  return { editor, analysis, scene, type, legendSays, stop: () => stops.forEach((f) => f()) };
}

describe("the legend's gravity row while a typed direction holds an error", () => {
  it("stays in the scene as long as the legend shows it, and goes when the legend's goes", () => {
    const t = linked();
    expect(t.legendSays()).toMatch(/4° off −y/);
    expect(t.scene.getState().legendRows).toBe(1);

    // a slip of the keyboard: the name is unknown, the last good result (gravity at −86°) stays on screen
    t.type("-90 deg + slop");
    expect(t.analysis.getState().stale).toBe(true);
    expect(t.analysis.getState().fieldValues.errors.has("gravityAngle")).toBe(true);
    expect(t.legendSays()).toMatch(/4° off −y/);
    expect(t.scene.getState().legendRows).toBe(1);
    // and the fit keeps the drawing below both rows of the legend
    const view = fitScene(t.scene.getState(), 900, 600, { result: t.analysis.getState().shown });
    const top = Math.min(...t.scene.getState().bodies[0].outline.map(([, y]) => view.y - y * view.scale));
    expect(top).toBeGreaterThanOrEqual(LEGEND_ROOM + LEGEND_ROW);

    // put right to straight down: the legend's row goes, and the scene's with it
    t.type("-90 deg");
    expect(t.analysis.getState().stale).toBe(false);
    expect(t.legendSays()).toBeNull();
    expect(t.scene.getState().legendRows ?? 0).toBe(0);
    t.stop();
  });

  it("a scene built without the result on screen reads the sketch's own direction (a saved sketch's picture)", () => {
    const t = linked();
    t.type("-90 deg + slop");
    const { sketch } = t.editor.getState();
    const { fieldValues } = t.analysis.getState();
    expect(buildScene(sketch, fieldValues).legendRows ?? 0).toBe(0);
    expect(buildScene(sketch, fieldValues, t.analysis.getState()).legendRows).toBe(1);
    // no result on screen, no legend: no row
    expect(buildScene(sketch, fieldValues, { shown: null, shownSketch: null }).legendRows ?? 0).toBe(0);
    t.stop();
  });
});
