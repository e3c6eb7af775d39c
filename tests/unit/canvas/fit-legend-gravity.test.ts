// The legend over the canvas's top right corner grows a row when the sketch turns gravity ("gravity
// at −87°, 3° off −y"). Before, the fit kept room for one row only and a tall body's corner was
// drawn under the second; now the scene says how many rows the legend has, and the fit and the
// labels' drawing area keep below them.
import { describe, expect, it } from "vitest";
import { drawingFrame, fitScene, LEGEND_ROOM, LEGEND_ROW } from "@/canvas/geometry/fit";
import { primsBox } from "@/canvas/render/prims";
import { scenePrims } from "@/canvas/render/scenePrims";
import { solvedScene } from "../../support/canvas-words";

/** A 2 m square test stand on a slope (our own scenario): a pad and a pin, gravity turned 3°. */
function stand(gravityAngle?: number | string) {
  return {
    format: "counterpoise.sketch",
    version: 1,
    title: "Test stand on a slope",
    ...(gravityAngle === undefined ? {} : { gravityAngle }),
    parameters: { slope: "3 deg" },
    bodies: [{ id: "b1", label: "Stand", mass: 200, outline: [[0, 0], [2, 0], [2, 2], [0, 2]] }],
    supports: [
      { id: "s1", body: "b1", kind: "contact", at: [0, 0], angle: 90, mu: 0.6, label: "rear pad" },
      { id: "s2", body: "b1", kind: "pin", at: [2, 0], label: "front pin" },
    ],
  };
}

describe("the legend's gravity row", () => {
  it("the scene counts it, whether gravity's direction is a number or an expression", () => {
    expect(solvedScene(stand()).scene.legendRows ?? 0).toBe(0);
    expect(solvedScene(stand(-90)).scene.legendRows ?? 0).toBe(0);
    expect(solvedScene(stand(-87)).scene.legendRows).toBe(1);
    expect(solvedScene(stand("-90 deg + slope")).scene.legendRows).toBe(1);
  });

  it("the fit keeps everything drawn below both rows, and the labels' area starts under them", () => {
    const [W, H] = [872, 474];
    const solved = solvedScene(stand(-87));
    const view = fitScene(solved.scene, W, H, { result: solved.result });
    const { groups, results } = scenePrims(solved.scene, view.scale, "SI", solved.result);
    const p = primsBox([...groups.flatMap((g) => g.prims), ...results]);
    expect(view.y + p.minY).toBeGreaterThanOrEqual(LEGEND_ROOM + LEGEND_ROW);
    expect(view.y + p.maxY).toBeLessThanOrEqual(H);
    expect(drawingFrame(view, { width: W, height: H }, 1)!.y0 + view.y).toBe(LEGEND_ROOM + LEGEND_ROW);
    expect(drawingFrame(view, { width: W, height: H })!.y0 + view.y).toBe(LEGEND_ROOM);
  });
});
