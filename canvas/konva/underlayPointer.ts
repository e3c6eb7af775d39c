// A click while setting the underlay's scale: the first and second marks, as image pixels (no
// snapping: the marks are features of the image, not of the grid). A third click starts again.
import { worldToImage } from "@/solver/underlay";
import type { Vec2 } from "@/solver/types";
import { roundTo } from "../model/numeric";
import type { EditorState } from "../store";

export function calibrationClick(s: EditorState, world: Vec2): void {
  const u = s.sketch.underlay;
  if (!u || s.tool.kind !== "calibrate") {
    s.setTool({ kind: "select" });
    return;
  }
  const px = worldToImage({ origin: u.origin, metresPerPixel: u.metresPerPixel, rotation: u.rotation ?? 0 }, world);
  const mark: Vec2 = [roundTo(px[0], 0.01), roundTo(px[1], 0.01)];
  const points = s.tool.points.length >= 2 ? [mark] : [...s.tool.points, mark];
  s.setTool({ kind: "calibrate", points });
  s.notify(
    points.length === 1
      ? "Now click the second mark."
      : "Type the real distance between the two marks in the Underlay section (e.g. 2.4 m or 96 in), then Set the scale.",
  );
}
