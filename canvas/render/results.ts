// The solve drawn on the diagram: reactions as double-line arrows (dashed where a one-sided
// support would have to pull), the weight at the centre of gravity, momentum flux as dashed
// arrows, port pressure forces, and the pivot or free direction of a body that tips or is
// unrestrained. Primitives are in content pixels (world × scale, y down).
import { convert, type UnitSystem } from "@/solver/units";
import { tipSlide, type SlideSupport } from "./tipSlide";
import type { SolveResult, Vec2 } from "@/solver/types";
import { handCheckNumber, largestScale, resultScale, unitFamily } from "@/solver/report";
import type { BodyStability } from "@/solver/stability";
import type { Scene, SceneBody, SceneItem } from "../scene";
import { add, curvedArrow, dashedArrow, dir, doubleArrow, hollowArrow, mul, perp, solidArrow, sub, text, unit, type Prim, type Pt } from "./prims";
import { anchorWorld, cgMarkBox, groundSideOf, labelAt, type DrawState } from "./symbols";
import { nearestOnSegment } from "../geometry/polygon";
import { CAUTION, INK, INK_SOFT, REACTION } from "./palette";
import { placeResultLabels, type Box, type LabelAnchor } from "./labels";

export interface ResultOptions {
  units: UnitSystem;
  scale: number;
  /** the result is an earlier sketch's (input errors now): drawn faded */
  stale?: boolean;
  /**
   * what the elements draw: the result's labels keep off their strokes (their texts make way for
   * the result's labels, which are placed first)
   */
  under?: readonly Prim[];
  /** the supports' states, when the caller has them already (`supportStates(result, supports)`) */
  states?: Map<string, DrawState>;
  /** the drawing area, in content pixels: a label its edge would cut moves inside (the canvas) */
  frame?: Box;
  /** one force and moment unit for every figure (a calc sheet's family), else each its own */
  family?: { force: string; moment: string };
}

export interface ResultDrawing {
  prims: Prim[];
  /** states the support symbols show by shape */
  states: Map<string, DrawState>;
}

const SUPPORT_KINDS = new Set(["pin", "roller", "contact", "fixed", "tie"]);
const px = (p: Vec2, s: number): Pt => [p[0] * s, -p[1] * s];
// the drawing's figures are figures, as in the tables: "4.000 kN" beside "9.316 kN", never "4 kN";
// a force or moment by the rule of the reactions table and the hand check (4 significant figures,
// zeros kept), so a small one beside a large one reads the same digits in all three: "0.05000 kN"
const fq = (v: number, k: "force" | "moment", o: Pick<ResultOptions, "units" | "family">) => {
  const { value, unit } = convert(v, k, o.units, k === "force" ? o.family?.force : o.family?.moment);
  return `${handCheckNumber(value)} ${unit}`;
};

// an earlier result drawn over a sketch whose field is now in error (NaN): nothing is drawn from it
const finite = (p: Pt) => Number.isFinite(p[0]) && Number.isFinite(p[1]);
const portReadable = (p: Extract<SceneItem, { kind: "inlet" | "outlet" }>) => Number.isFinite(p.angle) && p.at.every(Number.isFinite);

/**
 * The drawing states of every support: lifted and slack from the result (and, on a body that tips,
 * from the margins), slips from its warnings. With the supports (the sketch the result is of, or
 * its scene), a body that tips and slides as a whole (`tipSlide`) gets the slide mark on the
 * contacts it still bears on, as its sentence says "tips … and slides".
 */
export function supportStates(result: SolveResult, supports?: readonly SlideSupport[]): Map<string, DrawState> {
  const states = new Map<string, DrawState>();
  const tips = (r: { body: string }) => result.bodies[r.body]?.status === "tips";
  // a body that tips: a contact still bearing in the forces that would hold it, but below zero in
  // its margin, leaves its base as the body turns (drawn lifted); friction says nothing there
  for (const [id, r] of Object.entries(result.reactions)) states.set(id, tips(r) && r.state === "bearing" && r.margin !== undefined && r.margin < 0 ? "lifted" : r.state);
  for (const w of result.warnings) if (w.code === "SLIP") for (const id of w.ids) if (states.get(id) === "bearing" && !tips(result.reactions[id])) states.set(id, "slips");
  if (supports) {
    const sliding = new Set(Object.values(result.reactions).map((r) => r.body).filter((b) => tips({ body: b })));
    for (const b of sliding) if (!tipSlide(supports, result, b)) sliding.delete(b);
    for (const [id, r] of Object.entries(result.reactions)) if (sliding.has(r.body) && states.get(id) === "bearing") states.set(id, "slips");
  }
  return states;
}

/** How far a ray from `from` along `u` runs before it leaves the outline (Infinity when it never
 *  meets it: a port off its body). Points a hair along the ray are skipped: the ray starts on the face. */
function depthInside(from: Pt, u: Pt, outline: Pt[]): number {
  let best = Infinity;
  for (let i = 0; i < outline.length; i++) {
    const a = outline[i];
    const b = outline[(i + 1) % outline.length];
    const e: Pt = [b[0] - a[0], b[1] - a[1]];
    const den = u[0] * e[1] - u[1] * e[0];
    if (Math.abs(den) < 1e-12) continue;
    const w: Pt = [a[0] - from[0], a[1] - from[1]];
    const t = (w[0] * e[1] - w[1] * e[0]) / den;
    const k = (w[0] * u[1] - w[1] * u[0]) / den;
    if (t > 1 && k >= 0 && k <= 1) best = Math.min(best, t);
  }
  return best;
}

/** The least distance between segments ab and cd (0 where they cross). */
function segmentGap(a: Pt, b: Pt, c: Pt, d: Pt): number {
  const cross = (o: Pt, p: Pt, q: Pt) => (p[0] - o[0]) * (q[1] - o[1]) - (p[1] - o[1]) * (q[0] - o[0]);
  if (cross(a, b, c) * cross(a, b, d) < 0 && cross(c, d, a) * cross(c, d, b) < 0) return 0;
  return Math.min(nearestOnSegment(a, c, d).distance, nearestOnSegment(b, c, d).distance, nearestOnSegment(c, a, b).distance, nearestOnSegment(d, a, b).distance);
}

export function resultPrims(scene: Scene, result: SolveResult, o: ResultOptions): ResultDrawing {
  const s = o.scale;
  const prims: Prim[] = [];
  const states = o.states ?? supportStates(result, scene.items);
  // the point each reaction's label belongs to (by the index of its first text), and every
  // support's point: a label is kept nearer its own support than any other
  const labelAnchors = new Map<number, LabelAnchor>();
  const supports: LabelAnchor[] = [];
  const bodyOf = (id: string) => scene.byId.get(id) as SceneBody | undefined;

  // what the weight's arrow keeps clear of: the reactions' arrows and every element's anchor
  const drawnArrows: Array<[Pt, Pt]> = [];
  const anchors: Pt[] = scene.items.map((item) => px(anchorWorld(item), s)).filter(finite);

  let maxR = 0;
  for (const r of Object.values(result.reactions)) maxR = Math.max(maxR, Math.hypot(r.fx, r.fy));

  // ---- reactions
  for (const item of scene.items) {
    if (!SUPPORT_KINDS.has(item.kind)) continue;
    const r = result.reactions[item.id];
    const body = result.bodies[item.body];
    if (!r || !body) continue;
    const at = px((item as Extract<SceneItem, { at: Vec2 }>).at, s);
    if (!finite(at)) continue;
    const own: LabelAnchor = { at, family: "support" };
    supports.push(own);
    const impossible = (r.state === "lifted" || r.state === "slack") && (body.status === "tips" || body.status === "unrestrained");
    // the pull (or push) a contact or tie would need is drawn as its normal force alone: the
    // friction a lifted contact would also need is not what "would have to pull" measures
    const angle = (item as { angle?: number }).angle;
    const [fx, fy] = impossible && r.n !== undefined && angle !== undefined && Number.isFinite(angle) ? [r.n * Math.cos((angle * Math.PI) / 180), r.n * Math.sin((angle * Math.PI) / 180)] : [r.fx, r.fy];
    const R = Math.hypot(fx, fy);
    // the moment's label goes to a corner of its arrow away from the force's arrow, on the ground's
    // side when it can (inside the body it would sit on the outline, the weight and other labels)
    const g = dir(groundSideOf(item, bodyOf(item.body)));
    const corners: Pt[] = [[1, 1], [-1, 1], [1, -1], [-1, -1]];
    const outward = corners.filter((c) => c[0] * g[0] + c[1] * g[1] > 0.1);
    let corner: Pt = outward.length === 2 ? outward[0] : [1, 1];
    if (R > 1e-9 * Math.max(maxR, 1)) {
      const u = unit([fx, -fy]);
      const L = 26 + 50 * (R / (maxR || R));
      const off = item.kind === "tie" ? 10 : 25;
      const color = impossible ? CAUTION : REACTION;
      const dash = impossible ? [5, 3] : undefined;
      // push: the arrow arrives at the support from the ground side; pull: it leaves toward the ground
      const push = -u[0] * g[0] - u[1] * g[1] >= -1e-9;
      let from: Pt;
      let to: Pt;
      if (item.kind === "tie") {
        const side = mul(perp(u), 11);
        from = add(add(at, side), mul(u, 4));
        to = add(from, mul(u, L));
      } else if (push) {
        to = sub(at, mul(u, off));
        from = sub(to, mul(u, L));
      } else {
        from = add(at, mul(u, off));
        to = add(from, mul(u, L));
      }
      prims.push(...doubleArrow(from, to, color, 1.5, 11, dash));
      drawnArrows.push([from, to]);
      const mid = unit(sub(mul(add(from, to), 0.5), at));
      // the first corner unless the force's arrow leaves that way: then the one furthest from it
      // (of the two on the ground's side, when the ground has a side)
      const choice = outward.length === 2 ? outward : corners;
      if (corner[0] * mid[0] + corner[1] * mid[1] > 0.5) corner = choice.reduce((a, b) => (b[0] * mid[0] + b[1] * mid[1] < a[0] * mid[0] + a[1] * mid[1] - 1e-9 ? b : a));
      const words = impossible ? `would have to ${item.kind === "tie" ? "push" : "pull"} ${fq(Math.abs(r.n ?? R), "force", o)}` : fq(R, "force", o);
      const tail = push || item.kind === "tie" ? from : to;
      const away = push ? mul(u, -1) : u;
      labelAnchors.set(prims.length, own);
      prims.push(...labelAt(add(tail, mul(away, 4)), away, [words], color, 11.5, { weight: 600 }));
    }
    if (Math.abs(r.m) > 1e-9 * Math.max(maxR, 1)) {
      prims.push(...curvedArrow(at, 24, r.m > 0, REACTION, 1.5, true));
      labelAnchors.set(prims.length, own);
      prims.push(...labelAt(add(at, [20 * corner[0], 24 * corner[1]]), corner, [fq(Math.abs(r.m), "moment", o) + (r.m > 0 ? " ↺" : " ↻")], REACTION, 11.5, { weight: 600 }));
    }
  }

  // ---- known forces from the equations: weight, momentum flux, pressure
  for (const [bodyId, eq] of Object.entries(result.equations)) {
    const b = bodyOf(bodyId);
    if (!b) continue;
    for (const t of eq.forces) {
      if (t.kind === "weight" && Number.isFinite(b.cg[0])) {
        const cg = px(b.cg, s);
        const W = Math.hypot(t.fx, t.fy);
        // along gravity (down the page unless the sketch turns it), in screen axes (y down)
        const d: Pt = [t.fx / W, -t.fy / W];
        const side: Pt = [d[1], -d[0]];
        // hung from the centre of gravity; or, when a support sits under it (a body on one post),
        // arriving at it from the other side: the same line of action, clear of the reaction's arrow
        const clearance = (a: Pt, b: Pt) => Math.min(...anchors.map((p) => nearestOnSegment(p, a, b).distance), ...drawnArrows.map(([f, t]) => segmentGap(a, b, f, t)));
        const hung = clearance(add(cg, mul(d, 8)), add(cg, mul(d, 52)));
        const arrives = hung < 6 && clearance(add(cg, mul(d, -52)), add(cg, mul(d, -8))) > hung;
        const [from, to, at] = arrives ? [add(cg, mul(d, -52)), add(cg, mul(d, -8)), add(cg, mul(d, -40))] : [add(cg, mul(d, 8)), add(cg, mul(d, 52)), add(cg, mul(d, 38))];
        prims.push(...solidArrow(from, to, INK, 1.9, 11));
        prims.push(text(add(at, mul(side, 7)), `W ${fq(W, "force", o)}`, INK, 11.5, { weight: 600, align: side[0] >= 0 ? "left" : "right", baseline: "middle" }));
      }
      if (t.kind === "pressure") {
        const port = scene.byId.get(t.id) as Extract<SceneItem, { kind: "inlet" | "outlet" }> | undefined;
        if (!port || !portReadable(port)) continue;
        // p·A pushes inward across the port face: drawn inside the control surface on the port's own
        // axis (its line of action), starting at the face — never a fixed distance to one side,
        // which at a small scale would land it on another element and mislead the moment arm
        // (a suction's negative gauge pressure pulls outward: drawn inside too, its head at the face)
        const P = px(port.at, s);
        const u = unit([t.fx, -t.fy]);
        const d = dir(port.angle);
        const inward = port.kind === "inlet" ? d : mul(d, -1);
        const push = u[0] * inward[0] + u[1] * inward[1] >= 0;
        // clear of an inlet's own arrowhead, which reaches inside the face; no longer than the body
        // is deep there (a thin stack), so it never pokes out of the far side
        const near = port.kind === "inlet" ? 17 : 6;
        const room = depthInside(P, inward, (bodyOf(port.body)?.outline ?? []).map((q) => px(q, s)));
        const long = Math.max(12, Math.min(34, room - near - 4));
        const start = add(P, mul(inward, push ? near : near + long));
        const end = add(P, mul(inward, push ? near + long : near));
        prims.push(...solidArrow(start, end, INK_SOFT, 1.4, 8));
        prims.push(...labelAt(add(end, mul(u, 4)), u, [`pA ${fq(Math.hypot(t.fx, t.fy), "force", o)}`], INK_SOFT, 10.5));
      }
    }
    for (const t of eq.momentum) {
      const port = scene.byId.get(t.id) as Extract<SceneItem, { kind: "inlet" | "outlet" }> | undefined;
      if (!port || !portReadable(port)) continue;
      const P = px(port.at, s);
      const d = dir(port.angle);
      const n = perp(d);
      const base = add(P, mul(n, 17));
      const outlet = port.kind === "outlet";
      const from = outlet ? add(base, mul(d, 6)) : add(base, mul(d, -50));
      const to = outlet ? add(base, mul(d, 50)) : add(base, mul(d, -6));
      prims.push(...dashedArrow(from, to, INK_SOFT));
      const mid: Pt = [(from[0] + to[0]) / 2 + n[0] * 10, (from[1] + to[1]) / 2 + n[1] * 10];
      prims.push(...labelAt(mid, n, [`${port.beta === 1 ? "" : "β"}ṁV ${fq(Math.hypot(t.fx, t.fy), "force", o)}`], INK_SOFT, 10.5));
    }
  }

  // ---- how a body that tips or is unrestrained would move
  for (const b of scene.bodies) {
    const br = result.bodies[b.id];
    if (!br?.freeMotion || (br.status !== "tips" && br.status !== "unrestrained")) continue;
    const fm = br.freeMotion;
    if (fm.kind === "rotation") {
      const c = px(fm.about, s);
      if (!finite(c)) continue;
      prims.push({ t: "circle", c, r: 7, stroke: CAUTION, width: 1.8, fill: "#f6ebcf" });
      prims.push({ t: "circle", c, r: 2.2, fill: CAUTION });
      prims.push(...curvedArrow(c, 20, true, CAUTION, 1.4).map((p) => ({ ...p, dash: p.t === "poly" && !("closed" in p && p.closed) ? [4, 3] : undefined }) as Prim));
      prims.push(...labelAt(add(c, [0, 30]), [0, 1], [br.status === "tips" ? "pivot: tips about here" : "free to turn about here"], CAUTION, 11.5, { weight: 600 }));
    } else {
      const c = px(b.cg, s);
      if (!finite(c)) continue;
      const d = dir(fm.angle);
      const from = add(c, mul(d, 14));
      const to = add(c, mul(d, 84));
      prims.push(...hollowArrow(from, to, CAUTION, 2.2, 16));
      prims.push(...labelAt(add(to, mul(d, 6)), d, ["free to move: nothing resists"], CAUTION, 11.5, { weight: 600 }));
    }
  }

  // no label on a centre of gravity's mark
  const marks = scene.bodies.map((b) => px(b.cg, s)).filter(finite).map(cgMarkBox);
  const out = placeResultLabels(prims, o.under, o.frame, { anchors: labelAnchors, rivals: supports, keepOut: marks });
  if (o.stale) for (const p of out) (p as { opacity?: number }).opacity = 0.38;
  return { prims: out, states };
}

/**
 * One force and moment unit for every figure a result draws, the unit its tables and hand check are
 * written in (`resultScale`, `unitFamily`: N with N·m only when all of it stays below 1 kN, else kN
 * with kN·m; lbf, or kip from 10 kip): the largest of the reactions, of the forces drawn beside them
 * (weights, pA, ṁV, given loads) and, with `stability` (the results panel's), of the figures of the
 * factors of safety. Several results (two versions drawn side by side) share one family. With the
 * scene's `items`, its given point forces and couples count too, so their labels
 * (`SymbolOptions.family`) share the unit with no result at all (an input error before the first
 * solve) or on a body that did not solve.
 */
export function drawingFamily(
  result: SolveResult | ReadonlyArray<SolveResult | null> | null,
  units: UnitSystem = "SI",
  items: readonly SceneItem[] = [],
  stability?: Readonly<Record<string, BodyStability>> | null,
): { force: string; moment: string } {
  // the live canvas asks for one result's family from several places per redraw (its nodes, the
  // result layer, the label layout): worked out once per result, units and items
  const last = lastFamily;
  if (last && last.result === result && last.units === units && last.items === items && last.stability === (stability ?? null)) return last.family;
  const family = familyOf(result, units, items, stability ?? null);
  lastFamily = { result, units, items, stability: stability ?? null, family };
  return family;
}
let lastFamily: { result: unknown; units: UnitSystem; items: readonly SceneItem[]; stability: unknown; family: { force: string; moment: string } } | null = null;

function familyOf(result: SolveResult | ReadonlyArray<SolveResult | null> | null, units: UnitSystem, items: readonly SceneItem[], stability: Readonly<Record<string, BodyStability>> | null): { force: string; moment: string } {
  const results = (Array.isArray(result) ? result : [result]).filter((r): r is SolveResult => !!r);
  let force = 0;
  let moment = 0;
  for (const it of items) {
    if (it.kind === "force" && Number.isFinite(it.magnitude)) force = Math.max(force, Math.abs(it.magnitude));
    if (it.kind === "couple" && Number.isFinite(it.value)) moment = Math.max(moment, Math.abs(it.value));
  }
  // one result with its factors of safety (the panel's); side by side, each result's own scale
  return unitFamily(units, largestScale({ force, moment }, ...results.map((r) => resultScale(r, results.length === 1 ? stability : null))));
}
