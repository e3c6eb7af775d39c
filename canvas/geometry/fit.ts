// Fit the whole sketch into the canvas.
import type { Scene } from "../scene";
import { pointsOf } from "../scene";
import { boxOf } from "./polygon";
import { fitView, type View } from "./view";

export function fitScene(scene: Scene, width: number, height: number): View {
  const box = boxOf([...scene.bodies.flatMap((b) => [...b.outline, b.cg]), ...scene.items.flatMap(pointsOf)]);
  // symbols and labels do not scale: keep a generous margin for them
  // reactions hang below the supports and jets leave above: more room at the bottom and top
  const k = Math.min(1, Math.min(width, height) / 600);
  return fitView(box, width, height, { top: 100 * k, right: 160 * k, bottom: 165 * k, left: 160 * k });
}
