// Where a new or dropped element goes: which body it belongs to, and which way it points when
// it lands on an edge (a contact pushes into the body, an outlet flows out of it).
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { addElement, attachToBody } from "./commands/elements";
import type { Command } from "./commands/define";
import { nearestOnOutline, outwardNormal, angleOf, pointInPolygon, polygonCentroid, boxContains, type Box } from "./geometry/polygon";
import { findElement, nextId, type Attached, type ElementKind, GROUP_OF } from "./model/elements";
import { newAttached, newBody, DEFAULT_ANGLE } from "./model/factory";
import { anchorOf, pointsOf, type Scene, type SceneBody } from "./scene";

/** The body a point is on: inside it or within `tol` of its outline (the last drawn wins). */
export function bodyAt(bodies: readonly SceneBody[], p: Vec2, tol: number): SceneBody | undefined {
  for (let i = bodies.length - 1; i >= 0; i--) {
    const b = bodies[i];
    if (b.outline.length < 3) continue;
    if (pointInPolygon(p, b.outline) || nearestOnOutline(p, b.outline).distance <= tol) return b;
  }
  return undefined;
}

export function nearestBody(bodies: readonly SceneBody[], p: Vec2): SceneBody | undefined {
  let best: SceneBody | undefined;
  let d = Infinity;
  for (const b of bodies) {
    if (b.outline.length < 3) continue;
    const dist = pointInPolygon(p, b.outline) ? 0 : nearestOnOutline(p, b.outline).distance;
    if (dist < d) {
      d = dist;
      best = b;
    }
  }
  return best;
}

/** The direction a kind takes when placed on a body edge at p, or its default. */
export function angleOnEdge(kind: ElementKind, body: SceneBody | undefined, p: Vec2, tol: number): number | undefined {
  const fallback = DEFAULT_ANGLE[kind];
  if (!body || !["contact", "roller", "tie", "inlet", "outlet"].includes(kind)) return fallback;
  const hit = nearestOnOutline(p, body.outline);
  if (hit.edge < 0 || hit.distance > tol) return fallback;
  const out = angleOf(outwardNormal(body.outline, hit.edge));
  const r = (a: number) => Math.round(a * 1000) / 1000 || 0;
  if (kind === "tie" || kind === "outlet") return r(out);
  return r(out + 180 > 180 ? out - 180 : out + 180);
}

export type PlaceOutcome = { ok: true; command: Command<unknown> } | { ok: false; message: string };

/** What the editor says when a support, load or port is asked for before any body exists. */
export const NEEDS_BODY = "Draw a body first: supports, loads and ports belong to a body.";

/** The command that places an attached element at p (already snapped). */
export function placeCommand(
  sketch: SketchFile,
  scene: Scene,
  kind: Exclude<ElementKind, "body">,
  p: Vec2,
  tol: number,
  opts: { friction?: boolean } = {},
): PlaceOutcome {
  const body = bodyAt(scene.bodies, p, tol) ?? nearestBody(scene.bodies, p);
  if (!body) return { ok: false, message: NEEDS_BODY };
  return { ok: true, command: placeOnBody(sketch, body, kind, p, tol, opts) };
}

function placeOnBody(sketch: SketchFile, body: SceneBody, kind: Exclude<ElementKind, "body">, p: Vec2, tol: number, opts: { friction?: boolean }): Command<unknown> {
  const angle = angleOnEdge(kind, body, p, tol);
  const id = nextId(sketch, GROUP_OF[kind]);
  const element = newAttached(kind, id, { at: p, body: body.id, angle, friction: opts.friction });
  return addElement({ kind, element }) as Command<unknown>;
}

// ------------------------------------------------------------ placing without a pointer

/**
 * The side of a body each kind goes on when placed from the keyboard, as an outward direction:
 * supports under it, ties, forces and distributed loads on top, the inlet on the left and the
 * outlet on the right (the usual way such a sketch is read). Couples and mass sources: the centroid.
 */
const SIDE: Partial<Record<ElementKind, Vec2>> = {
  pin: [0, -1],
  roller: [0, -1],
  contact: [0, -1],
  fixed: [0, -1],
  tie: [0, 1],
  force: [0, 1],
  distributed: [0, 1],
  inlet: [-1, 0],
  outlet: [1, 0],
};

/** Along the chosen edge: the middle first, then the quarters, then the eighths. */
const ALONG = [0.5, 0.25, 0.75, 0.125, 0.375, 0.625, 0.875];

/**
 * Where a kind goes on a body when there is no pointer to say: on the edge that faces the kind's
 * side (the longest such edge), at its middle, or along it where nothing is placed yet; for a
 * couple or a mass source, the centroid.
 */
export function spotOnBody(body: SceneBody, kind: Exclude<ElementKind, "body">, taken: readonly Vec2[], tol: number): Vec2 {
  const poly = body.outline;
  const side = SIDE[kind];
  if (!side || poly.length < 3) return polygonCentroid(poly);
  let edge = 0;
  let best = -Infinity;
  let bestLen = 0;
  for (let i = 0; i < poly.length; i++) {
    const n = outwardNormal(poly, i);
    const facing = n[0] * side[0] + n[1] * side[1];
    const b = poly[(i + 1) % poly.length];
    const len = Math.hypot(b[0] - poly[i][0], b[1] - poly[i][1]);
    if (facing > best + 1e-9 || (Math.abs(facing - best) <= 1e-9 && len > bestLen)) {
      edge = i;
      best = facing;
      bestLen = len;
    }
  }
  const a = poly[edge];
  const b = poly[(edge + 1) % poly.length];
  const at = (t: number): Vec2 => [a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])];
  const free = ALONG.map(at).find((p) => taken.every((q) => Math.hypot(p[0] - q[0], p[1] - q[1]) > tol));
  return free ?? at(0.5);
}

/**
 * The body a keyboard placement goes on: the selected body, or the body of the selected element,
 * or else the body nearest the middle of the view (the only one, when there is one).
 */
export function targetBody(sketch: SketchFile, scene: Scene, selection: readonly string[], viewCentre: Vec2): SceneBody | undefined {
  for (const id of selection) {
    const l = findElement(sketch, id);
    const bodyId = !l ? undefined : l.group === "bodies" ? id : (l.el as Attached).body;
    const b = scene.bodies.find((x) => x.id === bodyId);
    if (b && b.outline.length >= 3) return b;
  }
  return nearestBody(scene.bodies, viewCentre);
}

/** The command that places a kind on a body without a pointer (see `targetBody` and `spotOnBody`). */
export function placeWithoutPointer(
  sketch: SketchFile,
  scene: Scene,
  kind: Exclude<ElementKind, "body">,
  where: { selection: readonly string[]; viewCentre: Vec2; tol: number; friction?: boolean },
): PlaceOutcome & { body?: string; at?: Vec2 } {
  const body = targetBody(sketch, scene, where.selection, where.viewCentre);
  if (!body) return { ok: false, message: NEEDS_BODY };
  const taken = scene.items.filter((it) => it.body === body.id).map(anchorOf);
  const at = spotOnBody(body, kind, taken, where.tol);
  return { ok: true, command: placeOnBody(sketch, body, kind, at, where.tol, { friction: where.friction }), body: body.id, at };
}

export function bodyCommand(sketch: SketchFile, outline: Vec2[]): Command<unknown> {
  const id = nextId(sketch, "bodies");
  return addElement({ kind: "body", element: newBody(id, outline) }) as Command<unknown>;
}

/** Elements inside a box (bodies wholly inside; others by their anchor). */
export function elementsInBox(scene: Scene, box: Box): string[] {
  const out: string[] = [];
  for (const b of scene.bodies) if (b.outline.length && b.outline.every((p) => boxContains(box, p))) out.push(b.id);
  for (const it of scene.items) if (pointsOf(it).every((p) => boxContains(box, p)) || boxContains(box, anchorOf(it))) out.push(it.id);
  return out;
}

/** After a drag: supports, loads and ports dropped on another body attach to it (moving bodies carry theirs). */
export function dropAttachments(sketch: SketchFile, scene: Scene, ids: readonly string[], tol: number): Command<unknown>[] {
  const cmds: Command<unknown>[] = [];
  const movingBodies = new Set(ids.filter((id) => findElement(sketch, id)?.group === "bodies"));
  for (const id of ids) {
    const l = findElement(sketch, id);
    const item = scene.byId.get(id);
    if (!l || l.group === "bodies" || !item || movingBodies.has((l.el as Attached).body)) continue;
    const target = bodyAt(scene.bodies.filter((b) => !movingBodies.has(b.id)), anchorOf(item), tol);
    if (target && target.id !== (l.el as Attached).body) cmds.push(attachToBody({ ids: [id], body: target.id }) as Command<unknown>);
  }
  return cmds;
}
