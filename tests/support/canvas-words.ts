// The words the canvas draws, in screen px, placed as the canvas places them (inside its drawing
// area: see `canvas/konva/labelLayout.ts`), for tests of labels near the canvas's edges.
import { drawingFrame } from "@/canvas/geometry/fit";
import { placeElementLabels, shiftTexts } from "@/canvas/render/labels";
import { textExtent } from "@/canvas/render/prims";
import { drawingFamily, supportStates } from "@/canvas/render/results";
import { elementGroups, resultLayer } from "@/canvas/render/scenePrims";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { parseSketch, solve } from "@/solver/index";

export type View = { x: number; y: number; scale: number };
export type Word = { text: string; x0: number; x1: number; y0: number; y1: number };

/** A sketch file's scene and its solve (a file that does not parse throws). */
export function solvedScene(file: unknown) {
  const parsed = parseSketch(file);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return { scene: buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, [])), result: solve(parsed.sketch) };
}

/** Every word drawn in `view` on a `width` × `height` canvas (only the element `only`'s, with it),
 *  and how many leader lines tie moved labels to their element. */
export function placedWords({ scene, result }: ReturnType<typeof solvedScene>, view: View, width: number, height: number, only?: string): { words: Word[]; leaders: number } {
  const frame = drawingFrame(view, { width, height });
  const states = supportStates(result, scene.items);
  const family = drawingFamily(result, "SI", scene.items);
  const groups = elementGroups(scene, view.scale, "SI", states, family);
  const results = resultLayer(groups, scene, view.scale, "SI", result, states, false, frame, family);
  const shifts = placeElementLabels(groups, results, undefined, frame);
  const chosen = only ? groups.filter((g) => g.id === only) : groups;
  const drawn = chosen.map((g) => (shifts.has(g.id) ? shiftTexts(g.prims, shifts.get(g.id)) : g.prims));
  const prims = [...drawn.flat(), ...(only ? [] : results)];
  const words = prims.flatMap((p) => {
    if (p.t !== "text") return [];
    const b = textExtent(p);
    return [{ text: p.text, x0: view.x + b.x0, x1: view.x + b.x1, y0: view.y + b.y0, y1: view.y + b.y1 }];
  });
  // a leader line is added after an element's own primitives
  const leaders = drawn.reduce((n, prims, i) => n + prims.length - chosen[i].prims.length, 0);
  return { words, leaders };
}
