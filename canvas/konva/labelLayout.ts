// Keeps the interaction store's `labelShifts` (elements' labels moved off crowded labels and
// symbols) in step with the sketch, the zoom, the units and the result shown, whose labels are
// placed first. Placed for the whole sketch as the SVG renderer places it, so the drawing's nodes,
// the results layer and an export agree; held while a drag or a pan lasts. On the canvas the
// labels also keep inside the drawing area (below the legend): one its edge would cut (a port's
// values on a phone, past the squeezed margin of a fit) moves in beside what it labels.
import type { EditorStores } from "../context";
import { drawingFrame } from "../geometry/fit";
import { placeElementLabels } from "../render/labels";
import { elementGroups, resultLayer } from "../render/scenePrims";
import { supportStates } from "../render/results";
import { statesOf } from "./nodes";
import type { InteractionStore } from "./interaction";

/** Start following; returns the function that stops. */
export function followLabelLayout(stores: EditorStores, interaction: InteractionStore): () => void {
  let last: unknown[] = [];
  const update = () => {
    const it = interaction.getState();
    if (it.dragging || it.panning) return;
    const scene = stores.scene.getState();
    const e = stores.editor.getState();
    const { shown, stale } = stores.analysis.getState();
    const { view, viewport } = e;
    const key: unknown[] = [scene, view.scale, e.units, shown, stale, view.x, view.y, viewport.width, viewport.height];
    if (key.every((k, i) => k === last[i])) return;
    last = key;
    const groups = elementGroups(scene, view.scale, e.units, statesOf(shown));
    const frame = drawingFrame(view, viewport);
    const results = shown ? resultLayer(groups, scene, view.scale, e.units, shown, supportStates(shown), stale, frame) : [];
    const shifts = placeElementLabels(groups, results, it.labelShifts, frame);
    if (shifts !== it.labelShifts) interaction.setState({ labelShifts: shifts });
  };
  const stops = [
    stores.scene.subscribe(update),
    stores.analysis.subscribe(update),
    stores.editor.subscribe((s, p) => {
      if (s.view !== p.view || s.units !== p.units || s.viewport !== p.viewport) update();
    }),
    interaction.subscribe((s, p) => {
      if ((!s.dragging && p.dragging) || (!s.panning && p.panning)) update();
    }),
  ];
  update();
  return () => stops.forEach((stop) => stop());
}
