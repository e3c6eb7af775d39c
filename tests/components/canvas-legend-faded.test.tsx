// The "Results faded" note and the room the fit keeps for the legend. The note comes as a typed
// value holds an error and goes as it is put right; before, it was a row of the legend over the top
// right corner, which then grew taller than the band the fit keeps, over the drawing. Now a wide
// canvas has it at the top left, beside the key, in that band; a narrow one has it in the legend,
// and the fit keeps room for that row always, so the drawing does not jump at each keystroke.
import { act, render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { EditorProvider } from "@/canvas/context";
import { CanvasLegend } from "@/canvas/konva/CanvasLegend";
import { createEditorStore } from "@/canvas/store";
import { setField } from "@/canvas/commands/fields";
import { drawingFrame, fitScene, FADED_BESIDE, LEGEND_ROOM, LEGEND_ROW, legendRoom } from "@/canvas/geometry/fit";
import { primsBox } from "@/canvas/render/prims";
import { scenePrims } from "@/canvas/render/scenePrims";
import { EXAMPLES } from "@/canvas/examples";
import { emptySketch } from "@/canvas/model/elements";
import type { Command } from "@/canvas/commands/define";
import { solvedScene } from "../support/canvas-words";

/** A beam on a pin and a roller (our own scenario). */
function beam(): SketchFile {
  return {
    ...emptySketch("Beam"),
    bodies: [{ id: "b1", label: "Beam", outline: [[0, 0], [4, 0], [4, 0.5], [0, 0.5]], mass: 100 }],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [0, 0] },
      { id: "s2", body: "b1", kind: "roller", at: [4, 0], angle: 90 },
    ],
    loads: [],
    ports: [],
  };
}

function legend(width: number) {
  const editor = createEditorStore({ sketch: beam() });
  editor.getState().setViewport({ width, height: 480 });
  render(
    <EditorProvider editor={editor}>
      <CanvasLegend />
    </EditorProvider>,
  );
  // a mass typed with an error: the results drawn are the last good ones, faded
  act(() => void editor.getState().apply(setField({ id: "b1", field: ["mass"], value: "100 kgg" }) as Command<unknown>));
  return editor;
}

describe("the Results faded note", () => {
  it("on a wide canvas sits apart from the legend's key (top left), so the legend keeps its height", async () => {
    legend(FADED_BESIDE + 80);
    const note = await screen.findByTestId("results-faded");
    expect(note).toHaveTextContent("Results faded: last good result, the input has errors");
    expect(screen.getByTestId("canvas-legend")).not.toContainElement(note);
    expect(note.parentElement!.className).toContain("left-2");
  });

  it("on a narrow canvas is a row of the legend", async () => {
    legend(FADED_BESIDE - 1);
    const note = await screen.findByTestId("results-faded");
    expect(screen.getByTestId("canvas-legend")).toContainElement(note);
  });
});

describe("the room the fit keeps for the legend", () => {
  it("is the key's band on a wide canvas, and a row more on a narrow one, with or without the note", () => {
    expect(legendRoom(FADED_BESIDE)).toBe(LEGEND_ROOM);
    expect(legendRoom(FADED_BESIDE - 1)).toBe(LEGEND_ROOM + LEGEND_ROW);
    expect(legendRoom(374, 1)).toBe(LEGEND_ROOM + 2 * LEGEND_ROW);
    expect(drawingFrame({ scale: 100, x: 0, y: 0 }, { width: 374, height: 600 })!.y0).toBe(LEGEND_ROOM + LEGEND_ROW);
    expect(drawingFrame({ scale: 100, x: 0, y: 0 }, { width: 900, height: 600 })!.y0).toBe(LEGEND_ROOM);
  });

  it("on a phone's canvas (374 × 520) every example is drawn below the legend with its faded row", () => {
    for (const ex of EXAMPLES) {
      const solved = solvedScene(ex.sketch);
      const view = fitScene(solved.scene, 374, 520, { result: solved.result });
      const { groups, results } = scenePrims(solved.scene, view.scale, "SI", solved.result);
      const p = primsBox([...groups.flatMap((g) => g.prims), ...results]);
      expect(view.y + p.minY, ex.id).toBeGreaterThanOrEqual(LEGEND_ROOM + LEGEND_ROW * (1 + (solved.scene.legendRows ?? 0)));
    }
  });
});
