// Turning directed elements and reshaping bodies.
import type { Numeric } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { findElement, type AnyElement, type BodyEl } from "../model/elements";
import { roundTo } from "../model/numeric";
import { isAxisRectangle, normaliseAngle } from "../geometry/polygon";
import { defineCommand, edit } from "./define";

export interface RotateArgs {
  id: string;
  /** the new direction, degrees counter-clockwise from +x */
  angle: number;
  /** for a force given as fx, fy: its magnitude (N), to keep it while turning */
  magnitude?: number;
}

export const rotateElement = defineCommand<RotateArgs>({
  name: "rotateElement",
  label: ({ id }) => `Turn ${id}`,
  undoable: true,
  run: (sketch, { id, angle, magnitude }) => {
    const l = findElement(sketch, id);
    if (!l) return sketch;
    const a = roundTo(normaliseAngle(angle), 1e-3);
    const el = l.el as Record<string, unknown>;
    if (l.kind === "force" && el.magnitude === undefined && el.angle === undefined) {
      // given as components: turn them, keeping the magnitude
      const m = magnitude ?? Math.hypot(Number(el.fx ?? 0), Number(el.fy ?? 0));
      if (!Number.isFinite(m)) return sketch;
      const rad = (a * Math.PI) / 180;
      return edit(sketch, (d) => {
        const f = (d.loads[l.index] as Record<string, unknown>);
        f.fx = roundTo(m * Math.cos(rad), 1e-6);
        f.fy = roundTo(m * Math.sin(rad), 1e-6);
      });
    }
    if (!["roller", "contact", "tie", "force", "inlet", "outlet", "distributed"].includes(l.kind)) return sketch;
    if (el.angle === a) return sketch;
    return edit(sketch, (d) => {
      ((d[l.group] as AnyElement[])[l.index] as Record<string, unknown>).angle = a;
    });
  },
});

export interface ReshapeArgs {
  id: string;
  /** index of the corner being dragged */
  corner: number;
  to: Vec2;
  /** keep an axis-aligned rectangle a rectangle (the opposite corner stays) */
  keepRectangle?: boolean;
}

export const reshapeBody = defineCommand<ReshapeArgs>({
  name: "reshapeBody",
  label: ({ id }) => `Reshape ${id}`,
  undoable: true,
  run: (sketch, { id, corner, to, keepRectangle = true }) => {
    const l = findElement(sketch, id);
    if (!l || l.group !== "bodies") return sketch;
    const outline = (l.el as BodyEl).outline as Numeric[][];
    if (corner < 0 || corner >= outline.length) return sketch;
    const x = roundTo(to[0]);
    const y = roundTo(to[1]);
    const numeric = outline.every((p) => typeof p[0] === "number" && typeof p[1] === "number");
    return edit(sketch, (d) => {
      const o = d.bodies[l.index].outline;
      if (keepRectangle && numeric && isAxisRectangle(outline as Vec2[])) {
        const old = outline[corner] as Vec2;
        // corners sharing an x or a y with the dragged one follow it
        outline.forEach((p, i) => {
          const q = p as Vec2;
          o[i] = [q[0] === old[0] ? x : q[0], q[1] === old[1] ? y : q[1]];
        });
      } else {
        o[corner] = [x, y];
      }
    });
  },
});

export const setOutline = defineCommand<{ id: string; outline: Array<[Numeric, Numeric]> }>({
  name: "setOutline",
  label: ({ id }) => `Change the corners of ${id}`,
  undoable: true,
  run: (sketch, { id, outline }) => {
    const l = findElement(sketch, id);
    if (!l || l.group !== "bodies" || outline.length < 3) return sketch;
    return edit(sketch, (d) => {
      d.bodies[l.index].outline = outline;
    });
  },
});

/** A corner added halfway along the edge after `corner`. */
export const insertCorner = defineCommand<{ id: string; after: number }>({
  name: "insertCorner",
  label: ({ id }) => `Add a corner to ${id}`,
  undoable: true,
  run: (sketch, { id, after }) => {
    const l = findElement(sketch, id);
    if (!l || l.group !== "bodies") return sketch;
    const o = (l.el as BodyEl).outline as Numeric[][];
    const a = o[after];
    const b = o[(after + 1) % o.length];
    if (!a || typeof a[0] !== "number" || typeof a[1] !== "number" || typeof b[0] !== "number" || typeof b[1] !== "number") return sketch;
    const mid: [Numeric, Numeric] = [roundTo((a[0] + b[0]) / 2), roundTo((a[1] + b[1]) / 2)];
    return edit(sketch, (d) => {
      d.bodies[l.index].outline.splice(after + 1, 0, mid);
    });
  },
});

export const removeCorner = defineCommand<{ id: string; corner: number }>({
  name: "removeCorner",
  label: ({ id }) => `Remove a corner of ${id}`,
  undoable: true,
  run: (sketch, { id, corner }) => {
    const l = findElement(sketch, id);
    if (!l || l.group !== "bodies" || (l.el as BodyEl).outline.length <= 3) return sketch;
    return edit(sketch, (d) => {
      d.bodies[l.index].outline.splice(corner, 1);
    });
  },
});
