// Fit to view on a phone-sized canvas (390 px wide) with wide labels at both ends of the body:
// after Fit, and with the labels placed as the canvas places them (inside its drawing area, see
// `canvas/konva/labelLayout.ts`), no word is cut at the left or the right edge.
import { describe, expect, it } from "vitest";
import { fitScene, LEGEND_ROOM } from "@/canvas/geometry/fit";
import { placedWords, solvedScene } from "../support/canvas-words";

/** A fan 1.2 m × 0.8 m on a fixed frame, air in at the left edge and out at the right, both ports named with `left` and `right`. */
function fan(left: string, right: string) {
  return {
    format: "counterpoise.sketch",
    version: 1,
    title: "Fan with long port names",
    bodies: [{ id: "fan", label: "Fan", mass: 45, outline: [[0, 0], [1.2, 0], [1.2, 0.8], [0, 0.8]] }],
    supports: [{ id: "frame", label: "frame", body: "fan", kind: "fixed", at: [0.6, 0] }],
    ports: [
      { id: "intake", label: left, body: "fan", kind: "inlet", at: [0, 0.4], angle: 0, massFlow: 20, density: 1.2, velocity: 40 },
      { id: "exhaust", label: right, body: "fan", kind: "outlet", at: [1.2, 0.4], angle: 0, massFlow: 20, velocity: 45 },
    ],
  };
}

/** Every word the canvas draws after Fit, in screen px, placed as the canvas places it. */
function wordsAfterFit(file: unknown, width: number, height: number) {
  const solved = solvedScene(file);
  const view = fitScene(solved.scene, width, height, { result: solved.result });
  return placedWords(solved, view, width, height).words;
}

describe("Fit on a 390 px canvas with wide labels at the left and the right edge", () => {
  for (const [left, right] of [
    ["intake bell-mouth duct", "exhaust cone to cowl"],
    ["intake bell-mouth on the flexible duct", "exhaust cone up to the roof cowl"],
  ]) {
    it(`keeps "${left}" and "${right}" and their values whole inside the canvas`, () => {
      const [W, H] = [390, 380];
      const words = wordsAfterFit(fan(left, right), W, H);
      // the names and the ports' values are all drawn
      for (const t of [left, right, "ṁ 20 kg/s · V 40 m/s", "ṁ 20 kg/s · V 45 m/s"]) expect(words.map((w) => w.text)).toContain(t);
      for (const w of words) {
        expect(w.x0, w.text).toBeGreaterThanOrEqual(0);
        expect(w.x1, w.text).toBeLessThanOrEqual(W);
        expect(w.y0, w.text).toBeGreaterThanOrEqual(LEGEND_ROOM);
        expect(w.y1, w.text).toBeLessThanOrEqual(H);
      }
    });
  }
});
