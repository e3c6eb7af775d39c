// A selected port's turn handle and its words: the handle is drawn where the port's arrow points,
// which is where the port's values are written, so while the port is selected its labels (and
// every other label) make way for the ring, the angle beside it and the dashed line out to it.
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { parseSketch, solveFile, type SolveResult } from "@/solver/index";
import type { SketchFile } from "@/solver/schema";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { turnHandleBoxes } from "@/canvas/konva/labelLayout";
import { elementGroups, resultLayer } from "@/canvas/render/scenePrims";
import { supportStates } from "@/canvas/render/results";
import { boxesOverlap, labelBlocks, placeElementLabels, shiftTexts, textBox, type Box } from "@/canvas/render/labels";
import type { Prim } from "@/canvas/render/prims";

type Text = Extract<Prim, { t: "text" }>;

function bend() {
  const file = exampleById("pipe-bend-anchor")!.sketch as SketchFile;
  const parsed = parseSketch(file);
  if (!parsed.ok) throw new Error("the sketch parses");
  const result = solveFile(file) as SolveResult;
  return { scene: buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, [])), result };
}

/** The words of every element, placed with `keepOut` (or without), as boxes with their owner. */
function placedWords(scale: number, keepOut?: readonly Box[]) {
  const { scene, result } = bend();
  const states = supportStates(result);
  const groups = elementGroups(scene, scale, "SI", states);
  const results = resultLayer(groups, scene, scale, "SI", result, states);
  const shifts = placeElementLabels(groups, results, undefined, undefined, keepOut);
  return groups.flatMap((g) => {
    const prims = shiftTexts(g.prims, shifts.get(g.id));
    return labelBlocks(prims).flatMap((idx) => idx.map((i) => ({ owner: g.id, words: (prims[i] as Text).text, box: textBox(prims[i] as Text) })));
  });
}

const covered = (words: ReturnType<typeof placedWords>, boxes: readonly Box[]) => words.filter((w) => boxes.some((b) => boxesOverlap(w.box, b)));

describe("a selected port's turn handle", () => {
  // the pipe bend as the canvas draws it on a laptop (350 px/m) and on a smaller one (306 px/m)
  for (const scale of [350, 306]) {
    it(`at ${scale} px/m: the inlet's values make way for its handle, which would sit on them otherwise`, () => {
      const { scene } = bend();
      const handle = turnHandleBoxes(scene, ["in"], "select", scale, "SI");
      expect(handle.length).toBeGreaterThan(2);
      // without the handle to keep off, the ring lands on the inlet's own words
      expect(covered(placedWords(scale), handle).map((w) => w.owner)).toContain("in");
      // with it, no label of any element is under the ring, the angle or the line
      expect(covered(placedWords(scale, handle), handle)).toEqual([]);
    });

    it(`at ${scale} px/m: the outlet's words move off the dashed line out to its handle`, () => {
      const { scene } = bend();
      const handle = turnHandleBoxes(scene, ["out"], "select", scale, "SI");
      expect(covered(placedWords(scale), handle).map((w) => w.owner)).toContain("out");
      expect(covered(placedWords(scale, handle), handle)).toEqual([]);
    });
  }

  it("covers nothing when no handle is drawn: another tool, two elements selected, a body, a support without a direction", () => {
    const { scene } = bend();
    expect(turnHandleBoxes(scene, ["in"], "place", 350, "SI")).toEqual([]);
    expect(turnHandleBoxes(scene, ["in", "out"], "select", 350, "SI")).toEqual([]);
    expect(turnHandleBoxes(scene, ["bend"], "select", 350, "SI")).toEqual([]);
    expect(turnHandleBoxes(scene, ["anchor"], "select", 350, "SI")).toEqual([]);
    expect(turnHandleBoxes(scene, [], "select", 350, "SI")).toEqual([]);
  });
});
