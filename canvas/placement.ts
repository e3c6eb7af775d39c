// Where a new or dropped element goes: which body it belongs to, and which way it points when
// it lands on an edge (a contact pushes into the body, an outlet flows out of it).
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { addElement, attachToBody } from "./commands/elements";
import type { Command } from "./commands/define";
import { nearestOnOutline, outwardNormal, angleOf, pointInPolygon, boxContains, type Box } from "./geometry/polygon";
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
  if (!body) return { ok: false, message: "Draw a body first: supports, loads and ports belong to a body." };
  const angle = angleOnEdge(kind, body, p, tol);
  const id = nextId(sketch, GROUP_OF[kind]);
  const element = newAttached(kind, id, { at: p, body: body.id, angle, friction: opts.friction });
  return { ok: true, command: addElement({ kind, element }) as Command<unknown> };
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
