// Keeps the interaction store's `labelShifts` (elements' labels moved off crowded labels and
// symbols) in step with the sketch, the zoom, the units and the result shown, whose labels are
// placed first. Placed for the whole sketch as the SVG renderer places it, so the drawing's nodes,
// the results layer and an export agree; held while a drag lasts.
import type { EditorStores } from "../context";
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
    if (it.dragging) return;
    const scene = stores.scene.getState();
    const e = stores.editor.getState();
    const { shown, stale } = stores.analysis.getState();
    const key: unknown[] = [scene, e.view.scale, e.units, shown, stale];
    if (key.every((k, i) => k === last[i])) return;
    last = key;
    const groups = elementGroups(scene, e.view.scale, e.units, statesOf(shown));
    const results = shown ? resultLayer(groups, scene, e.view.scale, e.units, shown, supportStates(shown), stale) : [];
    const shifts = placeElementLabels(groups, results, it.labelShifts);
    if (shifts !== it.labelShifts) interaction.setState({ labelShifts: shifts });
  };
  const stops = [
    stores.scene.subscribe(update),
    stores.analysis.subscribe(update),
    stores.editor.subscribe((s, p) => {
      if (s.view.scale !== p.view.scale || s.units !== p.units) update();
    }),
    interaction.subscribe((s, p) => {
      if (!s.dragging && p.dragging) update();
    }),
  ];
  update();
  return () => stops.forEach((stop) => stop());
}
