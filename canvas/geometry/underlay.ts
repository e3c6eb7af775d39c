// The underlay's geometry for the editor: where a new image goes, the scale a typed distance
// gives, and the image's place on screen. Pure functions over the solver's underlay geometry.
import { evaluateToNumber } from "@/solver/expressions";
import { calibrate, imageToWorld } from "@/solver/underlay";
import type { UnderlayFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { LEGEND_ROOM } from "./fit";
import { fitView, toScreen, toWorld, type View } from "./view";

/** A new image, fitted into about four fifths of the visible canvas, centred. */
export function fitNewUnderlay(size: { width: number; height: number }, view: View, viewport: { width: number; height: number }): Pick<UnderlayFile, "origin" | "metresPerPixel"> {
  const screenPerPixel = Math.min((viewport.width * 0.8) / size.width, (viewport.height * 0.8) / size.height);
  const metresPerPixel = screenPerPixel / view.scale;
  const topLeft: Vec2 = [(viewport.width - size.width * screenPerPixel) / 2, (viewport.height - size.height * screenPerPixel) / 2];
  return { origin: toWorld(view, topLeft), metresPerPixel };
}

/**
 * The underlay an upload puts under the sketch. A new drawing is fitted into view, its scale still
 * to be set; one replacing a drawing of the same pixel size (the next revision of the same sheet)
 * keeps its scale, place, turn, opacity, lock and marks, so what was traced over the old one still
 * lines up (shown, even when the old one was hidden).
 */
export function underlayFromUpload(
  before: UnderlayFile | undefined,
  up: { id: string; width: number; height: number },
  fitted: Pick<UnderlayFile, "origin" | "metresPerPixel">,
): { underlay: UnderlayFile; kept: boolean } {
  if (before && before.width === up.width && before.height === up.height) {
    // shown, whatever the old one was: the new drawing is what was just asked for
    const { hidden: _hidden, ...look } = before;
    return { underlay: { ...look, upload: up.id }, kept: true };
  }
  return { underlay: { upload: up.id, width: up.width, height: up.height, ...fitted, rotation: 0, opacity: 0.6 }, kept: false };
}

/** The scales an underlay may take (m a pixel); the file format refuses others. */
export const MIN_METRES_PER_PIXEL = 1e-6;
export const MAX_METRES_PER_PIXEL = 100;

export type ScaleReading = { ok: true; distanceM: number; metresPerPixel: number; pixels: number } | { ok: false; message: string };

/** The scale from two marks (image pixels) and the distance typed between them ("2.4 m", "96 in"). */
export function readScale(a: Vec2, b: Vec2, text: string): ScaleReading {
  const pixels = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (!text.trim()) return { ok: false, message: "Type the real distance between the two marks, with its unit (e.g. 2.4 m or 96 in)." };
  let distanceM: number;
  try {
    distanceM = evaluateToNumber(text, "length");
  } catch (err) {
    return { ok: false, message: (err as Error).message };
  }
  try {
    const metresPerPixel = calibrate(a, b, distanceM);
    // a drawing, a photo or a site plan: from a thousandth of a millimetre to 100 m a pixel (a
    // typo in the exponent or the unit lands far outside, and would put the drawing off the page)
    if (metresPerPixel < MIN_METRES_PER_PIXEL || metresPerPixel > MAX_METRES_PER_PIXEL)
      return { ok: false, message: `That makes ${metresPerPixel.toExponential(2)} m a pixel; a drawing to trace is between 0.001 mm and 100 m a pixel. Check the number and its unit.` };
    return { ok: true, distanceM, metresPerPixel, pixels };
  } catch (err) {
    const m = (err as Error).message;
    return { ok: false, message: m.charAt(0).toUpperCase() + m.slice(1) + "." };
  }
}

/** The image's top-left corner on screen, its size there (px) and its turn (Konva's degrees, clockwise). */
export function underlayOnScreen(u: UnderlayFile, view: View) {
  const [x, y] = toScreen(view, u.origin);
  const k = u.metresPerPixel * view.scale;
  return { x, y, width: u.width * k, height: u.height * k, rotation: -(u.rotation ?? 0) };
}

/**
 * The view that shows the whole underlay (turned or not), clear of the legend: "Fit" on a sketch
 * with nothing drawn yet, and the view after its scale is set then (the drawing grows or shrinks
 * about the first mark, and could otherwise sit off the screen or as a speck in it).
 */
export function fitUnderlayView(u: UnderlayFile, width: number, height: number): View {
  const placement = { origin: u.origin, metresPerPixel: u.metresPerPixel, rotation: u.rotation ?? 0 };
  const corners = ([[0, 0], [u.width, 0], [u.width, u.height], [0, u.height]] as Vec2[]).map((p) => imageToWorld(placement, p));
  const xs = corners.map((p) => p[0]);
  const ys = corners.map((p) => p[1]);
  const box = { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
  return fitView(box, width, height, { top: LEGEND_ROOM + 8, right: 12, bottom: 12, left: 12 });
}
