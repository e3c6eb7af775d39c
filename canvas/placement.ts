// Where a new or dropped element goes: which body it belongs to, and which way it points when
// it lands on an edge (a contact pushes into the body, an outlet flows out of it).
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { addElement, attachToBody } from "./commands/elements";
import type { Command } from "./commands/define";
import { nearestOnOutline, nearestOnSegment, outwardNormal, angleOf, pointInPolygon, polygonCentroid, boxContains, type Box } from "./geometry/polygon";
import { findElement, nextId, type Attached, type ElementKind, GROUP_OF } from "./model/elements";
import { defaultBodySize, newAttached, newBody, DEFAULT_ANGLE } from "./model/factory";
import { roundTo } from "./model/numeric";
import { LEGEND_ROOM } from "./geometry/fit";
import { toScreen, type View } from "./geometry/view";
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
  const r = (a: number) => roundTo(a, 1e-3);
  if (kind === "tie" || kind === "outlet") return r(out);
  return r(out + 180 > 180 ? out - 180 : out + 180);
}

export type PlaceOutcome = { ok: true; command: Command<unknown> } | { ok: false; message: string };

/** What the editor says when a support, load or port is asked for before any body exists. */
export const NEEDS_BODY = "Draw a body first: supports, loads and ports belong to a body.";

/**
 * How far outside a body's outline (screen px) a click still places a support or a port: it goes
 * onto the nearest point of the outline. Farther out it is not placed at all.
 */
export const OUTLINE_REACH_PX = 12;

/** Kinds that act on the body where it meets the world: a support on its outline (or through it,
 *  a pin in a hole), a port where fluid crosses the control surface. */
const AT_OUTLINE: ReadonlySet<ElementKind> = new Set(["pin", "roller", "contact", "fixed", "tie", "inlet", "outlet"]);

/** Whether a kind is placed only on or inside a body (never out in empty space). */
export const placedAtOutline = (kind: ElementKind): boolean => AT_OUTLINE.has(kind);

/** What a click (or a tap) too far from every body's outline says for a support or a port. */
export function offOutlineMessage(kind: ElementKind, touch = false): string {
  const act = touch ? "Tap" : "Click";
  return GROUP_OF[kind] === "ports"
    ? `${act} on or near a body's outline to place a port: fluid crosses the control surface only there.`
    : `${act} on or near a body's outline to place a support.`;
}

/**
 * Where a support or a port clicked at `p` goes, and on which body: inside a body (the last drawn
 * wins) a support stays at `p` (a pin through a hole) and a port (`onOutline`) goes onto the
 * nearest point of the outline, since fluid crosses the control surface only there; outside every
 * body, onto the nearest point of the nearest outline within `reach`; farther than that, nowhere.
 * `from` is the pointer's own point before snapping (the reach is measured from it, so a snap to
 * the grid neither lets a far click in nor keeps a near one out); a snapped point that has left
 * the body is taken back onto its outline.
 */
export function outlineSpot(bodies: readonly SceneBody[], p: Vec2, reach: number, tol: number, from: Vec2 = p, onOutline = false): { body: SceneBody; at: Vec2 } | undefined {
  const onOrIn = (b: SceneBody, q: Vec2) => pointInPolygon(q, b.outline) || nearestOnOutline(q, b.outline).distance <= tol;
  const onto = (b: SceneBody): Vec2 => {
    if (onOutline && nearestOnOutline(p, b.outline).distance > 1e-12) {
      // a port: onto the edge nearest the pointer itself (a grid point may lie nearer another),
      // at the snapped point's place along it
      const edge = nearestOnOutline(from, b.outline).edge;
      const hit = nearestOnSegment(p, b.outline[edge], b.outline[(edge + 1) % b.outline.length]).point;
      return [hit[0], hit[1]];
    }
    if (onOrIn(b, p)) return p;
    const hit = nearestOnOutline(p, b.outline).point;
    return [hit[0], hit[1]];
  };
  for (let i = bodies.length - 1; i >= 0; i--) {
    const b = bodies[i];
    if (b.outline.length >= 3 && pointInPolygon(from, b.outline)) return { body: b, at: onto(b) };
  }
  let best: { body: SceneBody; d: number } | undefined;
  for (const b of bodies) {
    if (b.outline.length < 3) continue;
    const d = nearestOnOutline(from, b.outline).distance;
    if (d <= reach && (!best || d < best.d)) best = { body: b, d };
  }
  if (!best) return undefined;
  const b = best.body;
  // outside the body: on its outline, not a hair off it
  const at = nearestOnOutline(p, b.outline).distance <= 1e-12 ? p : nearestOnOutline(p, b.outline).point;
  return { body: b, at: [at[0], at[1]] };
}

/**
 * The command that places an attached element at p (already snapped). A support goes on or
 * inside a body, a port on its outline (`outlineSpot`, within `reach` of an outline, measured
 * from the pointer's own point `from`), or is refused with a hint; a load or a mass source goes
 * on the body under the point, else on the nearest.
 */
export function placeCommand(
  sketch: SketchFile,
  scene: Scene,
  kind: Exclude<ElementKind, "body">,
  p: Vec2,
  tol: number,
  opts: { friction?: boolean; reach?: number; from?: Vec2; touch?: boolean } = {},
): PlaceOutcome {
  if (!scene.bodies.some((b) => b.outline.length >= 3)) return { ok: false, message: NEEDS_BODY };
  if (placedAtOutline(kind)) {
    const spot = outlineSpot(scene.bodies, p, opts.reach ?? tol, tol, opts.from ?? p, GROUP_OF[kind] === "ports");
    if (!spot) return { ok: false, message: offOutlineMessage(kind, opts.touch) };
    return { ok: true, command: placeOnBody(sketch, spot.body, kind, spot.at, tol, opts) };
  }
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
 * The supports a body usually stands on in twos or more (wheels, feet, a pin and a roller): near
 * each end of its base first, an eighth of the edge in from each corner (the left end first), so
 * the first two give it a wide base, as drawn by hand; then the middle and the quarters. A fixed
 * support or a tie, usually one, takes the middle.
 */
const ALONG_PAIRED = [0.125, 0.875, 0.5, 0.25, 0.75, 0.375, 0.625];
const PAIRED: ReadonlySet<ElementKind> = new Set(["pin", "roller", "contact"]);

/** Where on its edge a keyboard placement went, for the words that say so. */
export type SpotPlace = { edge: "bottom" | "top" | "left" | "right" | "centroid"; along: number };

/**
 * Where a kind goes on a body when there is no pointer to say: on the edge that faces the kind's
 * side (the longest such edge), for a pin, roller or contact near its left end, then near its
 * right end, for the rest at its middle, and along it where nothing is placed yet; for a couple or
 * a mass source, the centroid.
 */
export function spotOnBody(body: SceneBody, kind: Exclude<ElementKind, "body">, taken: readonly Vec2[], tol: number): Vec2 {
  return spotAndPlace(body, kind, taken, tol).at;
}

function spotAndPlace(body: SceneBody, kind: Exclude<ElementKind, "body">, taken: readonly Vec2[], tol: number): { at: Vec2; place: SpotPlace } {
  const poly = body.outline;
  const side = SIDE[kind];
  if (!side || poly.length < 3) return { at: polygonCentroid(poly), place: { edge: "centroid", along: 0.5 } };
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
  let a = poly[edge];
  let b = poly[(edge + 1) % poly.length];
  // run the edge left to right (bottom to top on a side), whichever way the outline was drawn
  if (side[1] !== 0 ? b[0] < a[0] : b[1] < a[1]) [a, b] = [b, a];
  const at = (t: number): Vec2 => [a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])];
  const order = PAIRED.has(kind) ? ALONG_PAIRED : ALONG;
  // a spot is taken by anything nearer it than halfway to the next spot (an eighth of the edge
  // apart): a foot placed with the mouse a little off the eighth still counts as the left foot, so
  // the next one goes to the right end, not beside it
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const near = Math.max(tol, len / 16);
  // for a pair, an end is taken by anything on the edge in that end's half: a first foot typed or
  // dragged to where the axle is (1.2 m along a 5 m base) is still the left foot, and the second
  // goes to the right end rather than outside the first
  const onEdge = taken
    .map((q) => {
      const d: Vec2 = [q[0] - a[0], q[1] - a[1]];
      const u = len > 0 ? (d[0] * (b[0] - a[0]) + d[1] * (b[1] - a[1])) / (len * len) : 0;
      const off = len > 0 ? Math.abs(d[0] * (b[1] - a[1]) - d[1] * (b[0] - a[0])) / len : Infinity;
      return { u, off };
    })
    .filter((e) => e.off <= near && e.u >= -1e-9 && e.u <= 1 + 1e-9);
  const endTaken = (u: number) => PAIRED.has(kind) && (u === 0.125 || u === 0.875) && onEdge.some((e) => (u < 0.5 ? e.u < 0.5 : e.u > 0.5));
  const t = order.find((u) => !endTaken(u) && taken.every((q) => Math.hypot(at(u)[0] - q[0], at(u)[1] - q[1]) >= near)) ?? order[0];
  const words = { "0,-1": "bottom", "0,1": "top", "-1,0": "left", "1,0": "right" } as const;
  return { at: at(t), place: { edge: words[`${side[0]},${side[1]}` as keyof typeof words], along: t } };
}

/** The place in words: "near the left end of its bottom edge", "at the middle of its right side". */
export function spotWords(place: SpotPlace): string {
  if (place.edge === "centroid") return "at its centroid";
  const sideways = place.edge === "left" || place.edge === "right";
  const what = sideways ? `its ${place.edge} side` : `its ${place.edge} edge`;
  const [lo, hi] = sideways ? ["lower", "upper"] : ["left", "right"];
  const [before, after] = sideways ? ["below", "above"] : ["left of", "right of"];
  const t = place.along;
  if (Math.abs(t - 0.5) < 1e-9) return `at the middle of ${what}`;
  if (t < 0.2) return `near the ${lo} end of ${what}`;
  if (t > 0.8) return `near the ${hi} end of ${what}`;
  return `${t < 0.5 ? before : after} the middle of ${what}`;
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
): PlaceOutcome & { body?: string; at?: Vec2; place?: SpotPlace } {
  const body = targetBody(sketch, scene, where.selection, where.viewCentre);
  if (!body) return { ok: false, message: NEEDS_BODY };
  const taken = scene.items.filter((it) => it.body === body.id).map(anchorOf);
  const { at, place } = spotAndPlace(body, kind, taken, where.tol);
  return { ok: true, command: placeOnBody(sketch, body, kind, at, where.tol, { friction: where.friction }), body: body.id, at, place };
}

/** A body placed in one go takes at most this share of the visible drawing's width or height. */
const BODY_SHARE = 2 / 3;
/** …and keeps this far (px) inside the drawing's edges. */
const BODY_MARGIN = 8;

/** The next smaller of 1, 2, 5 × a power of ten (2 → 1, 1 → 0.5, 0.5 → 0.2). */
function smallerRound(x: number): number {
  const k = Math.floor(Math.log10(x) + 1e-9);
  const m = Math.round(x / 10 ** k);
  return Number((m >= 5 ? 2 * 10 ** k : m >= 2 ? 10 ** k : 0.5 * 10 ** k).toPrecision(12));
}

/**
 * Where a rectangle body placed in one go goes (a click with the body tool, a tray item dropped on
 * the drawing, the tray's keyboard route), asked for at `centre`: of the default size for the zoom
 * (`defaultBodySize`), or a round size smaller when that would take more than two thirds of the
 * drawing's width or height (a phone); centred on the point, and moved in (by whole grid steps,
 * so a centre on the grid stays on it) until it lies wholly in view, below the legend. A viewport
 * not measured yet leaves the point and size alone.
 */
export function bodyPlaceInView(centre: Vec2, view: View, viewport: { width: number; height: number }, grid = 0): { centre: Vec2; size: Vec2 } {
  let size = defaultBodySize(view.scale);
  const x0 = BODY_MARGIN;
  const x1 = viewport.width - BODY_MARGIN;
  const y0 = LEGEND_ROOM + BODY_MARGIN;
  const y1 = viewport.height - BODY_MARGIN;
  if (x1 - x0 < 40 || y1 - y0 < 40) return { centre, size };
  for (let i = 0; i < 12 && (size[0] * view.scale > BODY_SHARE * (x1 - x0) || size[1] * view.scale > BODY_SHARE * (y1 - y0)); i++) {
    const w = smallerRound(size[0]);
    size = [w, Number((w / 2).toPrecision(12))];
  }
  // how far (px) the body's screen box reaches past an edge of the drawing, in from that edge
  const inward = (lo: number, hi: number, min: number, max: number) => (lo < min ? min - lo : hi > max ? max - hi : 0);
  const [sx, sy] = toScreen(view, centre);
  const hw = (size[0] * view.scale) / 2;
  const hh = (size[1] * view.scale) / 2;
  const steps = (px: number) => {
    const d = px / view.scale;
    return grid > 0 ? Math.sign(d) * Math.ceil(Math.abs(d) / grid - 1e-9) * grid : d;
  };
  const dx = steps(inward(sx - hw, sx + hw, x0, x1));
  // screen y runs down the page, world y up it
  const dy = -steps(inward(sy - hh, sy + hh, y0, y1));
  const tidy = (v: number) => (grid > 0 ? Number(v.toFixed(Math.max(0, Math.ceil(-Math.log10(grid)) + 2))) : v);
  return { centre: dx || dy ? [tidy(centre[0] + dx), tidy(centre[1] + dy)] : centre, size };
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
