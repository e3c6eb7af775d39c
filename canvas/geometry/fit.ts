// Fit the whole sketch into the canvas: the bodies and elements, and also what is drawn around
// them at a fixed size on screen (symbols, labels, reaction arrows, the legend's corner), so that
// nothing lands off the canvas or under the legend.
import type { SolveResult } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import { primsBox } from "../render/prims";
import { scenePrims } from "../render/svg";
import type { Scene } from "../scene";
import { pointsOf } from "../scene";
import { boxOf } from "./polygon";
import { fitView, type View } from "./view";

/** Room kept at the top for the legend of line styles, which sits over the canvas's top edge. */
export const LEGEND_ROOM = 44;
const GAP = 14;

export function fitScene(scene: Scene, width: number, height: number, drawn: { result?: SolveResult | null; units?: UnitSystem } = {}): View {
  const box = boxOf([...scene.bodies.flatMap((b) => [...b.outline, b.cg]), ...scene.items.flatMap(pointsOf)].filter((p) => Number.isFinite(p[0]) && Number.isFinite(p[1])));
  // a first guess: symbols and labels do not scale, so keep a generous margin for them
  const k = Math.min(1, Math.min(width, height) / 600);
  const guess = { top: 100 * k, right: 160 * k, bottom: 165 * k, left: 160 * k };
  let view = fitView(box, width, height, guess);
  if (!Number.isFinite(box.minX)) return view;
  // then measure what is drawn at that scale, beyond the geometry, and fit again (twice: the
  // margins hardly change with the scale, as arrows and labels keep their size on screen)
  for (let i = 0; i < 2; i++) {
    const s = view.scale;
    const { groups, results } = scenePrims(scene, s, drawn.units ?? "SI", drawn.result ?? null);
    const p = primsBox([...groups.flatMap((g) => g.prims), ...results]);
    if (!Number.isFinite(p.minX)) break;
    const m = {
      left: Math.max(0, box.minX * s - p.minX) + GAP,
      right: Math.max(0, p.maxX - box.maxX * s) + GAP,
      top: Math.max(0, -box.maxY * s - p.minY) + GAP + LEGEND_ROOM,
      bottom: Math.max(0, p.maxY + box.minY * s) + GAP,
    };
    // without a result yet, the reactions' arrows are not measured: keep the first guess's room for them
    if (!drawn.result) for (const side of ["left", "right", "top", "bottom"] as const) m[side] = Math.max(m[side], guess[side]);
    view = fitView(box, width, height, m);
  }
  return view;
}
