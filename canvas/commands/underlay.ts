// The underlay's commands: put an uploaded drawing under the sketch, set its scale from two marks
// and a typed distance, move, turn, fade, hide, lock and remove it. Each is one undo step (the
// opacity slider coalesces while it slides); the underlay is part of the document, so it is
// saved with the version.
import { rescaleAbout } from "@/solver/underlay";
import type { UnderlayFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { roundTo } from "../model/numeric";
import { defineCommand, edit } from "./define";

/** Round to a step (1e-6 m, 0.01), a half away from zero, without floating noise. */
const round = (v: number, step = 1e-6) => roundTo(v, step);
const pt = (p: Vec2): Vec2 => [round(p[0]), round(p[1])];

/** Put an uploaded image under the sketch (replacing any underlay there was). */
export const placeUnderlay = defineCommand<{ underlay: UnderlayFile }>({
  name: "placeUnderlay",
  label: (_a, sketch) => (sketch.underlay ? "Replace the underlay" : "Put a drawing under the sketch"),
  undoable: true,
  run: (sketch, { underlay }) =>
    edit(sketch, (d) => {
      d.underlay = { ...underlay, origin: pt(underlay.origin) };
    }),
});

export const removeUnderlay = defineCommand<Record<string, never>>({
  name: "removeUnderlay",
  label: () => "Remove the underlay",
  undoable: true,
  run: (sketch) =>
    sketch.underlay
      ? edit(sketch, (d) => {
          delete d.underlay;
        })
      : sketch,
});

/** Move the image's top-left corner to a world point (m). */
export const moveUnderlay = defineCommand<{ to: Vec2 }>({
  name: "moveUnderlay",
  label: () => "Move the underlay",
  undoable: true,
  run: (sketch, { to }) => {
    const u = sketch.underlay;
    const next = pt(to);
    if (!u || (u.origin[0] === next[0] && u.origin[1] === next[1])) return sketch;
    return edit(sketch, (d) => {
      d.underlay!.origin = next;
    });
  },
});

/** The world point (m) at the image's centre. */
export function underlayCentre(u: UnderlayFile): Vec2 {
  const a = ((u.rotation ?? 0) * Math.PI) / 180;
  const x = (u.width / 2) * u.metresPerPixel;
  const y = (-u.height / 2) * u.metresPerPixel;
  return [u.origin[0] + x * Math.cos(a) - y * Math.sin(a), u.origin[1] + x * Math.sin(a) + y * Math.cos(a)];
}

/** Turn the image about its centre to an angle (degrees, counter-clockwise). */
export const rotateUnderlay = defineCommand<{ rotation: number }>({
  name: "rotateUnderlay",
  label: (a) => `Turn the underlay to ${round(a.rotation, 0.01)}°`,
  undoable: true,
  run: (sketch, { rotation }) => {
    const u = sketch.underlay;
    const angle = round((((rotation % 360) + 540) % 360) - 180, 1e-4);
    if (!u || !Number.isFinite(rotation) || u.rotation === angle) return sketch;
    const c = underlayCentre(u);
    const turned = underlayCentre({ ...u, rotation: angle });
    return edit(sketch, (d) => {
      d.underlay!.rotation = angle;
      d.underlay!.origin = pt([u.origin[0] + c[0] - turned[0], u.origin[1] + c[1] - turned[1]]);
    });
  },
});

export const setUnderlayOpacity = defineCommand<{ opacity: number }>({
  name: "setUnderlayOpacity",
  label: (a) => `Underlay at ${Math.round(a.opacity * 100)} % opacity`,
  undoable: true,
  run: (sketch, { opacity }) => {
    const o = Math.min(1, Math.max(0, round(opacity, 0.01)));
    if (!sketch.underlay || sketch.underlay.opacity === o) return sketch;
    return edit(sketch, (d) => {
      d.underlay!.opacity = o;
    });
  },
});

export const showUnderlay = defineCommand<{ shown: boolean }>({
  name: "showUnderlay",
  label: (a) => (a.shown ? "Show the underlay" : "Hide the underlay"),
  undoable: true,
  run: (sketch, { shown }) => {
    if (!sketch.underlay || !sketch.underlay.hidden === shown) return sketch;
    return edit(sketch, (d) => {
      if (shown) delete d.underlay!.hidden;
      else d.underlay!.hidden = true;
    });
  },
});

export const lockUnderlay = defineCommand<{ locked: boolean }>({
  name: "lockUnderlay",
  label: (a) => (a.locked ? "Lock the underlay" : "Unlock the underlay"),
  undoable: true,
  run: (sketch, { locked }) => {
    if (!sketch.underlay || Boolean(sketch.underlay.locked) === locked) return sketch;
    return edit(sketch, (d) => {
      if (locked) d.underlay!.locked = true;
      else delete d.underlay!.locked;
    });
  },
});

/**
 * Set the scale from two marks on the image (pixels) and the real distance between them, as
 * typed (kept for the record) and in metres. The first mark stays where it is in the world.
 */
export const calibrateUnderlay = defineCommand<{ a: Vec2; b: Vec2; distance: string | number; metresPerPixel: number }>({
  name: "calibrateUnderlay",
  label: (a) => `Set the underlay's scale (${typeof a.distance === "number" ? `${a.distance} m` : a.distance})`,
  undoable: true,
  run: (sketch, args) => {
    const u = sketch.underlay;
    if (!u || !(args.metresPerPixel > 0) || !Number.isFinite(args.metresPerPixel)) return sketch;
    const placed = rescaleAbout({ origin: u.origin, metresPerPixel: u.metresPerPixel, rotation: u.rotation ?? 0 }, args.a, args.metresPerPixel);
    return edit(sketch, (d) => {
      d.underlay!.metresPerPixel = args.metresPerPixel;
      d.underlay!.origin = pt(placed.origin);
      d.underlay!.calibration = { a: [round(args.a[0], 0.01), round(args.a[1], 0.01)], b: [round(args.b[0], 0.01), round(args.b[1], 0.01)], distance: args.distance };
    });
  },
});
