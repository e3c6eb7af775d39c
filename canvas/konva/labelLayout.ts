// Keeps the interaction store's `labelShifts` (elements' labels moved off crowded labels and
// symbols) in step with the sketch, the zoom, the units and the result shown, whose labels are
// placed first. Placed for the whole sketch as the SVG renderer places it, so the drawing's nodes,
// the results layer and an export agree; held while a drag or a pan lasts. On the canvas the
// labels also keep inside the drawing area (below the legend): one its edge would cut (a port's
// values on a phone, past the squeezed margin of a fit) moves in beside what it labels. While one
// element is selected with the select tool, the labels also keep off its turn handle (the ring,
// the angle and the dashed line to it): a port's values, written where its arrow points, make way
// for the handle drawn there.
import type { EditorStores } from "../context";
import { drawingFrame } from "../geometry/fit";
import { DIRECTED } from "../model/elements";
import { anchorOf, type Scene } from "../scene";
import { handleAlong, handleBoxes, handlePlace } from "../render/handles";
import { placeElementLabels, shiftBox, type Box } from "../render/labels";
import { elementGroups, resultLayer } from "../render/scenePrims";
import { drawingFamily, supportStates } from "../render/results";
import type { UnitSystem } from "@/solver/units";
import { statesOf } from "./nodes";
import type { InteractionStore } from "./interaction";

const NONE: readonly Box[] = [];

/**
 * What the turn handle of the one selected element covers (content px), placed as the interaction
 * layer draws it; nothing when no handle is drawn (no single selection, another tool, a body, an
 * element without a direction, or an angle or position in error).
 */
export function turnHandleBoxes(scene: Scene, selection: readonly string[], tool: string, scale: number, units: UnitSystem, frame?: Box): readonly Box[] {
  if (tool !== "select" || selection.length !== 1) return NONE;
  const el = scene.byId.get(selection[0]);
  if (!el || el.kind === "body" || !DIRECTED.has(el.kind) || !("angle" in el)) return NONE;
  const a = anchorOf(el);
  if (![el.angle, a[0], a[1]].every(Number.isFinite)) return NONE;
  const along = handleAlong(el);
  const at: [number, number] = [a[0] * scale, -a[1] * scale];
  return handleBoxes(at, along, handlePlace(el, along, scale, units, frame && shiftBox(frame, at)));
}

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
    const key: unknown[] = [scene, view.scale, e.units, shown, stale, view.x, view.y, viewport.width, viewport.height, e.selection, e.tool.kind];
    if (key.every((k, i) => k === last[i])) return;
    last = key;
    const supports = stores.analysis.getState().shownSketch?.supports;
    // one force unit for the given loads and the reactions, as the drawing writes them
    const family = drawingFamily(shown, e.units, scene.items, stores.analysis.getState().shownStability);
    const groups = elementGroups(scene, view.scale, e.units, statesOf(shown, supports), family);
    const frame = drawingFrame(view, viewport, scene.legendRows);
    const results = shown ? resultLayer(groups, scene, view.scale, e.units, shown, supportStates(shown, supports), stale, frame, family) : [];
    const handle = turnHandleBoxes(scene, e.selection, e.tool.kind, view.scale, e.units, frame);
    const shifts = placeElementLabels(groups, results, it.labelShifts, frame, handle);
    if (shifts !== it.labelShifts) interaction.setState({ labelShifts: shifts });
  };
  const stops = [
    stores.scene.subscribe(update),
    stores.analysis.subscribe(update),
    stores.editor.subscribe((s, p) => {
      if (s.view !== p.view || s.units !== p.units || s.viewport !== p.viewport || s.selection !== p.selection || s.tool.kind !== p.tool.kind) update();
    }),
    interaction.subscribe((s, p) => {
      if ((!s.dragging && p.dragging) || (!s.panning && p.panning)) update();
    }),
  ];
  update();
  return () => stops.forEach((stop) => stop());
}
