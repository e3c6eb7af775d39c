// New elements as the tray places them: sensible values a user then edits. Every value is a
// plain number or a short expression with units, so the properties panel shows what they mean.
import type { Numeric } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import type { AnyElement, BodyEl, ElementKind } from "./elements";
import { roundTo } from "./numeric";

export interface PlaceOptions {
  at: Vec2;
  /** the body it attaches to (ignored for a body) */
  body: string;
  /** direction in degrees; a kind's default when absent */
  angle?: number;
  /** true for a contact that carries friction */
  friction?: boolean;
}

const r = (x: number) => roundTo(x, 1e-6);
const pt = (p: Vec2): [Numeric, Numeric] => [r(p[0]), r(p[1])];

export const DEFAULT_ANGLE: Partial<Record<ElementKind, number>> = {
  roller: 90,
  contact: 90,
  tie: -90,
  force: -90,
  distributed: -90,
  inlet: 0,
  outlet: 0,
};

/** A body from its corners (a rectangle's four, or a polygon's). */
/** The flow a new port is placed with, so the drawing solves at once: it stands aside as soon as
 *  the user describes the flow another way (a volume flow or a density; see setField). */
export const PORT_PLACEHOLDER = { massFlow: "10 kg/s", velocity: "5 m/s" } as const;

export function newBody(id: string, outline: Vec2[], label?: string): BodyEl {
  return { id, label: label ?? `Body ${id.replace(/^b/, "")}`, outline: outline.map(pt), mass: "100 kg" };
}

/** The four corners of the rectangle spanned by two points, counter-clockwise from bottom-left. */
export function rectangleOutline(a: Vec2, b: Vec2): Vec2[] {
  const x0 = Math.min(a[0], b[0]);
  const x1 = Math.max(a[0], b[0]);
  const y0 = Math.min(a[1], b[1]);
  const y1 = Math.max(a[1], b[1]);
  return [
    [x0, y0],
    [x1, y0],
    [x1, y1],
    [x0, y1],
  ];
}

/**
 * The size (m) of a body placed in one go (dropped from the tray, or added from the keyboard):
 * 2 m × 1 m, times the power of ten that makes it about 240 px wide at this zoom, so it is
 * neither a speck nor wider than the view, and its size stays a round number.
 */
export function defaultBodySize(scalePxPerM: number): Vec2 {
  const k = Math.round(Math.log10(240 / (2 * scalePxPerM)));
  const w = roundTo(2 * 10 ** k, 1e-9);
  return [w, roundTo(w / 2, 1e-9)];
}

/** A rectangle of this size centred on a point. */
export function rectangleAround(centre: Vec2, size: Vec2): Vec2[] {
  const [w, h] = size;
  return rectangleOutline([centre[0] - w / 2, centre[1] - h / 2], [centre[0] + w / 2, centre[1] + h / 2]);
}

/** A trapezoid of this overall size centred on a point: a polygon body whose corners are then edited one by one. */
export function polygonAround(centre: Vec2, size: Vec2): Vec2[] {
  const [w, h] = size;
  const [x, y] = centre;
  return [
    [x - w / 2, y - h / 2],
    [x + w / 2, y - h / 2],
    [x + w / 4, y + h / 2],
    [x - w / 4, y + h / 2],
  ];
}

/** An element of any attached kind, with the id left for the caller. */
export function newAttached(kind: Exclude<ElementKind, "body">, id: string, o: PlaceOptions): AnyElement {
  const angle = r(o.angle ?? DEFAULT_ANGLE[kind] ?? 0);
  const at = pt(o.at);
  const base = { id, body: o.body };
  switch (kind) {
    case "pin":
      return { ...base, kind: "pin", at };
    case "fixed":
      return { ...base, kind: "fixed", at };
    case "roller":
      return { ...base, kind: "roller", at, angle };
    case "contact":
      return o.friction ? { ...base, kind: "contact", at, angle, mu: 0.3 } : { ...base, kind: "contact", at, angle };
    case "tie":
      return { ...base, kind: "tie", at, angle };
    case "force":
      return { ...base, kind: "force", at, magnitude: "1 kN", angle };
    case "couple":
      return { ...base, kind: "couple", at, value: "500 N m" };
    case "distributed": {
      const from: Vec2 = [o.at[0] - 0.5, o.at[1]];
      const to: Vec2 = [o.at[0] + 0.5, o.at[1]];
      return { ...base, kind: "distributed", from: pt(from), to: pt(to), w1: "2 kN/m", w2: "2 kN/m", angle };
    }
    case "inlet":
    case "outlet":
      return { ...base, kind, at, angle, ...PORT_PLACEHOLDER };
    case "massSource":
      return { ...base, at, massFlow: "1 kg/s" };
  }
}
