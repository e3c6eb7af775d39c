// The underlay's geometry for the editor: where a new image goes, the scale a typed distance
// gives, and the image's place on screen. Pure functions over the solver's underlay geometry.
import { evaluateToNumber } from "@/solver/expressions";
import { calibrate } from "@/solver/underlay";
import type { UnderlayFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { toScreen, toWorld, type View } from "./view";

/** A new image, fitted into about four fifths of the visible canvas, centred. */
export function fitNewUnderlay(size: { width: number; height: number }, view: View, viewport: { width: number; height: number }): Pick<UnderlayFile, "origin" | "metresPerPixel"> {
  const screenPerPixel = Math.min((viewport.width * 0.8) / size.width, (viewport.height * 0.8) / size.height);
  const metresPerPixel = screenPerPixel / view.scale;
  const topLeft: Vec2 = [(viewport.width - size.width * screenPerPixel) / 2, (viewport.height - size.height * screenPerPixel) / 2];
  return { origin: toWorld(view, topLeft), metresPerPixel };
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
