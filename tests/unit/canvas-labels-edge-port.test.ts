// A port placed near the left edge of a phone's view, before Fit is pressed again: an inlet writes
// its name and values left of its arrow's tail, past the edge of the drawing area. Placed as the
// canvas places them (`canvas/konva/labelLayout.ts`: inside its drawing area), they move inside the
// frame beside what they label, as the result's labels do, rather than stay off the canvas.
import { describe, expect, it } from "vitest";
import { LEGEND_ROOM } from "@/canvas/geometry/fit";
import { placedWords, solvedScene } from "../support/canvas-words";

/** A pump casing 1.2 m × 0.8 m on a fixed foot, water in at its left edge and out at its right. */
const casing = {
  format: "counterpoise.sketch",
  version: 1,
  title: "Casing near the edge",
  bodies: [{ id: "casing", label: "Casing", mass: 45, outline: [[0, 0], [1.2, 0], [1.2, 0.8], [0, 0.8]] }],
  supports: [{ id: "foot", label: "foot", body: "casing", kind: "fixed", at: [0.6, 0] }],
  ports: [
    { id: "suction", label: "suction", body: "casing", kind: "inlet", at: [0, 0.4], angle: 0, massFlow: 29.94, density: 1000, velocity: 5.968 },
    { id: "discharge", label: "discharge", body: "casing", kind: "outlet", at: [1.2, 0.4], angle: 0, massFlow: 29.94, velocity: 5.968 },
  ],
};

/** The words and leader lines the canvas draws of the suction port, in screen px, with the view's origin `x` px from the left. */
function suctionLabels(x: number, width = 390, height = 380) {
  return placedWords(solvedScene(casing), { x, y: 220, scale: 120 }, width, height, "suction");
}

describe("a port near the left edge of the canvas", () => {
  for (const x of [12, 40, 90]) {
    it(`its name and values stay whole inside the drawing area with the port ${x} px from the edge`, () => {
      const { words, leaders } = suctionLabels(x);
      expect(words.map((w) => w.text)).toEqual(expect.arrayContaining(["suction", "ṁ 29.94 kg/s · V 5.968 m/s"]));
      for (const w of words) {
        expect(w.x0, w.text).toBeGreaterThanOrEqual(0);
        expect(w.x1, w.text).toBeLessThanOrEqual(390);
        expect(w.y0, w.text).toBeGreaterThanOrEqual(LEGEND_ROOM);
        expect(w.y1, w.text).toBeLessThanOrEqual(380);
      }
      // moved clear of their own place, they are tied to the port by a leader
      // read with the port: beside it (within 40 px of its point), or tied to it by a leader line
      const values = words.find((w) => w.text.startsWith("ṁ"))!;
      const [px, py] = [x, 220 - 0.4 * 120];
      const gap = Math.hypot(Math.max(values.x0 - px, 0, px - values.x1), Math.max(values.y0 - py, 0, py - values.y1));
      expect(gap <= 40 || leaders > 0, `${gap} px from the port, ${leaders} leaders`).toBe(true);
    });
  }

  it("a port off the canvas keeps its labels with it (nothing is pulled in for an element not shown)", () => {
    const { words } = suctionLabels(-60);
    const values = words.find((w) => w.text.startsWith("ṁ"))!;
    expect(values.x1).toBeLessThan(0);
  });
});
