// The underlay's scale and placement: pure geometry shared by the editor and the tests.
// Image pixels have y down; the world has y up.
import type { Vec2 } from "./types";

export interface UnderlayPlacement {
  origin: Vec2;
  metresPerPixel: number;
  /** degrees, counter-clockwise */
  rotation: number;
}

/** Metres per pixel from two marks on the image and the real distance between them (m). */
export function calibrate(a: Vec2, b: Vec2, distanceM: number): number {
  const px = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (!(px > 0)) throw new Error("the two marks are on the same pixel: pick two points apart");
  if (!(distanceM > 0)) throw new Error("the real distance must be more than zero");
  return distanceM / px;
}

/** A pixel of the image in world coordinates (m). */
export function imageToWorld(u: UnderlayPlacement, p: Vec2): Vec2 {
  const a = (u.rotation * Math.PI) / 180;
  const x = p[0] * u.metresPerPixel;
  const y = -p[1] * u.metresPerPixel;
  return [u.origin[0] + x * Math.cos(a) - y * Math.sin(a), u.origin[1] + x * Math.sin(a) + y * Math.cos(a)];
}

/** A world point (m) as a pixel of the image. */
export function worldToImage(u: UnderlayPlacement, w: Vec2): Vec2 {
  const a = (u.rotation * Math.PI) / 180;
  const dx = w[0] - u.origin[0];
  const dy = w[1] - u.origin[1];
  const x = dx * Math.cos(a) + dy * Math.sin(a);
  const y = -dx * Math.sin(a) + dy * Math.cos(a);
  return [x / u.metresPerPixel, -y / u.metresPerPixel];
}

/** Keep a world point fixed while the scale changes (calibrating about the first mark). */
export function rescaleAbout(u: UnderlayPlacement, pixel: Vec2, metresPerPixel: number): UnderlayPlacement {
  const fixed = imageToWorld(u, pixel);
  const moved = imageToWorld({ ...u, metresPerPixel }, pixel);
  return { ...u, metresPerPixel, origin: [u.origin[0] + fixed[0] - moved[0], u.origin[1] + fixed[1] - moved[1]] };
}
