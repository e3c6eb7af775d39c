// Keeps the interaction store's `labelShifts` (element names moved off crowded texts) in step
// with the sketch, the zoom, the units and the drawn support states. Placed for the whole sketch,
// so the drawing's nodes and the results layer agree; held while a drag lasts.
import type { EditorStores } from "../context";
import { placeElementNames } from "../render/declutter";
import { elementGroups } from "../render/scenePrims";
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
    const states = statesOf(stores.analysis.getState().shown);
    const key: unknown[] = [scene, e.view.scale, e.units, states];
    if (key.every((k, i) => k === last[i])) return;
    last = key;
    const shifts = placeElementNames(elementGroups(scene, e.view.scale, e.units, states), it.labelShifts);
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
