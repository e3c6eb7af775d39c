// The symbols of the design language, as primitives around each element's anchor (screen px).
// Supports sit on their ground side; given loads are solid arrows; ports are hollow arrows
// across a short stub of the control surface. States (lifts, slack, slips) change the shape.
import { formatQuantity, type UnitSystem } from "@/solver/units";
import type { Vec2 } from "@/solver/types";
import type { SceneBody, SceneItem, SceneElement } from "../scene";
import { isFinitePoint, nearestOnOutline, outwardNormal, angleOf, pointInPolygon } from "../geometry/polygon";
import { add, curvedArrow, dir, hatch, hollowArrow, line, mul, perp, solidArrow, sub, text, unit, zigzag, type Prim, type Pt } from "./prims";
import type { Box } from "./labels";
import { BODY_FILL, CAUTION, INK, INK_FAINT, PAPER_CARD } from "./palette";

export type DrawState = "bearing" | "lifted" | "taut" | "slack" | "active" | "slips";

export interface SymbolOptions {
  units: UnitSystem;
  /** pixels per metre (bodies and distributed loads scale; symbols do not) */
  scale: number;
  color?: string;
  /** world angle from the anchor toward the ground (pins and fixed supports) */
  groundSide?: number;
  state?: DrawState;
  /** show the element's label (or id) beside it */
  showName?: boolean;
  /** boxes in content pixels a body's name keeps clear of when it can (its ports' bars and arrows, its mass sources: `portKeepOut`) */
  keepOut?: readonly Box[];
  /**
   * The drawing's one force and moment unit (`drawingFamily`): a given point force or couple is
   * written in the unit the reactions beside it are ("0.8000 kN" beside "5.039 kN", never "800 N");
   * without it, each in its own.
   */
  family?: { force: string; moment: string };
}

export type { Box };

/**
 * Where the ports of body `bodyId` draw inside its outline, in content pixels: the bar across the
 * face and the pressure force's arrow along the axis into the body (up to 60 px); and its mass
 * sources' droplets. A body's name is placed clear of these when a corner allows.
 */
export function portKeepOut(items: readonly SceneItem[], bodyId: string, scale: number): Box[] {
  return JSON.parse(portKeepOutKey(items, bodyId, scale)) as Box[];
}

/** Each body's keep-out boxes as a string (equal while its ports stay put), worked out in one pass per scene and scale. */
const keepOutKeys = new WeakMap<readonly SceneItem[], { scale: number; byBody: Map<string, string> }>();

/** `portKeepOut` as a string: a selector's value that stays equal while the body's ports stay put (one pass over the scene's items, not one per body). */
export function portKeepOutKey(items: readonly SceneItem[], bodyId: string, scale: number): string {
  let hit = keepOutKeys.get(items);
  if (!hit || hit.scale !== scale) {
    const boxes = new Map<string, Box[]>();
    for (const it of items) {
      const box = portBox(it, scale);
      if (box) boxes.set(it.body, [...(boxes.get(it.body) ?? []), box]);
    }
    hit = { scale, byBody: new Map([...boxes].map(([id, b]) => [id, JSON.stringify(b)])) };
    keepOutKeys.set(items, hit);
  }
  return hit.byBody.get(bodyId) ?? "[]";
}

function portBox(it: SceneItem, scale: number): Box | null {
  // a mass source's droplet, inside the body: the name written through it reads as neither
  if (it.kind === "massSource") {
    if (!Number.isFinite(it.at[0]) || !Number.isFinite(it.at[1])) return null;
    const [x, y] = [it.at[0] * scale, -it.at[1] * scale];
    return { x0: x - 8, y0: y - 12, x1: x + 8, y1: y + 9 };
  }
  if ((it.kind !== "inlet" && it.kind !== "outlet") || !Number.isFinite(it.at[0]) || !Number.isFinite(it.at[1]) || !Number.isFinite(it.angle)) return null;
  const a = (it.angle * Math.PI) / 180;
  // screen direction of the flow (y down); the body's inside is ahead of an inlet, behind an outlet
  const d: Pt = [Math.cos(a), -Math.sin(a)];
  const inward: Pt = it.kind === "inlet" ? d : [-d[0], -d[1]];
  const p: Pt = [it.at[0] * scale, -it.at[1] * scale];
  const q2: Pt = [p[0] + inward[0] * 60, p[1] + inward[1] * 60];
  const pad = 14;
  return { x0: Math.min(p[0], q2[0]) - pad, y0: Math.min(p[1], q2[1]) - pad, x1: Math.max(p[0], q2[0]) + pad, y1: Math.max(p[1], q2[1]) + pad };
}

const q = (v: number, kind: Parameters<typeof formatQuantity>[1], units: UnitSystem, unit?: string) => (Number.isFinite(v) ? formatQuantity(v, kind, units, { unit }) : "?");

/** Where a label goes beyond point p along screen direction d. */
export function labelAt(p: Pt, d: Pt, lines: string[], color: string, size = 11, extra: Partial<Extract<Prim, { t: "text" }>> = {}): Prim[] {
  const align = d[0] > 0.35 ? "left" : d[0] < -0.35 ? "right" : "center";
  const lh = size + 3;
  const total = lh * lines.length;
  let y0: number;
  if (d[1] > 0.35) y0 = p[1] + size / 2 + 1;
  else if (d[1] < -0.35) y0 = p[1] - total + size / 2 + 2;
  else y0 = p[1] - total / 2 + lh / 2;
  return lines.map((s, i) => text([p[0], y0 + i * lh], s, color, size, { align, baseline: "middle", ...extra }));
}

/** World angle toward the ground for a pin or a fixed support: away from the body edge it sits on. */
export function groundSideOf(item: SceneItem, body: SceneBody | undefined): number {
  if (item.kind === "contact" || item.kind === "roller") return item.angle + 180;
  if (item.kind === "tie") return item.angle;
  if (!body || body.outline.length < 3 || !("at" in item)) return -90;
  const hit = nearestOnOutline(item.at as Vec2, body.outline);
  const size = Math.max(...body.outline.map((p) => Math.hypot(p[0] - body.cg[0], p[1] - body.cg[1])), 1e-9);
  if (hit.edge < 0 || hit.distance > 0.15 * size) return -90;
  return angleOf(outwardNormal(body.outline, hit.edge));
}

function ground(a: Pt, b: Pt, away: Pt, color: string, rough: boolean): Prim[] {
  return [rough ? zigzag(a, b, color) : line(a, b, { stroke: color, width: 1.4 }), ...hatch(a, b, away, INK_FAINT)];
}

function supportPrims(item: Extract<SceneItem, { kind: "pin" | "roller" | "contact" | "fixed" | "tie" }>, o: SymbolOptions): Prim[] {
  const c = o.color ?? INK;
  const O: Pt = [0, 0];
  const side = item.kind === "pin" || item.kind === "fixed" ? (o.groundSide ?? -90) : groundSideOf(item, undefined);
  const g = dir(side);
  const n = perp(g);
  const out: Prim[] = [];
  switch (item.kind) {
    case "pin": {
      const base = mul(g, 16);
      out.push({ t: "poly", closed: true, pts: [O, add(base, mul(n, 10)), sub(base, mul(n, 10))], stroke: c, width: 1.4, fill: PAPER_CARD });
      out.push({ t: "circle", c: O, r: 3.6, stroke: c, width: 1.4, fill: PAPER_CARD });
      out.push(...ground(add(base, mul(n, -15)), add(base, mul(n, 15)), g, c, false));
      break;
    }
    case "roller": {
      const base = mul(g, 11);
      out.push({ t: "poly", closed: true, pts: [O, add(base, mul(n, 9)), sub(base, mul(n, 9))], stroke: c, width: 1.4, fill: PAPER_CARD });
      out.push({ t: "circle", c: O, r: 3, stroke: c, width: 1.3, fill: PAPER_CARD });
      for (const k of [-5, 5]) out.push({ t: "circle", c: add(mul(g, 14.2), mul(n, k)), r: 3.1, stroke: c, width: 1.2, fill: PAPER_CARD });
      const gl = mul(g, 17.5);
      out.push(...ground(add(gl, mul(n, -14)), add(gl, mul(n, 14)), g, c, false));
      break;
    }
    case "contact": {
      const lifted = o.state === "lifted";
      const foot = mul(g, 7);
      out.push({ t: "poly", closed: true, pts: [add(O, mul(n, -6)), add(O, mul(n, 6)), add(foot, mul(n, 9)), add(foot, mul(n, -9))], stroke: c, width: 1.4, fill: BODY_FILL });
      const gap = lifted ? 7 : 0;
      const gl = mul(g, 7 + gap);
      out.push(...ground(add(gl, mul(n, -15)), add(gl, mul(n, 15)), g, c, item.mu !== undefined));
      if (lifted) {
        // the gap, with ticks across it, and the word
        out.push(line(add(foot, mul(n, 12)), add(gl, mul(n, 12)), { stroke: CAUTION, width: 1, dash: [2, 2] }));
        out.push(...labelAt(add(mul(g, 12), mul(n, -18)), mul(n, -1), ["lifts"], CAUTION, 11, { weight: 600 }));
      }
      if (o.state === "slips") {
        // along the surface both ways: the mark says the contact slides, not which way (the friction
        // force drawn with the reaction gives that, opposite to the slide)
        const t = mul(n, 1);
        out.push(...solidArrow(add(mul(g, 22), mul(t, 1)), add(mul(g, 22), mul(t, 10)), CAUTION, 1.3, 6));
        out.push(...solidArrow(add(mul(g, 22), mul(t, -1)), add(mul(g, 22), mul(t, -10)), CAUTION, 1.3, 6));
        out.push(...labelAt(add(mul(g, 22), mul(t, 13)), t, ["slips"], CAUTION, 11, { weight: 600 }));
      }
      break;
    }
    case "fixed": {
      out.push(line(mul(n, -15), mul(n, 15), { stroke: c, width: 3.6 }));
      out.push(...hatch(add(mul(g, 1.8), mul(n, -15)), add(mul(g, 1.8), mul(n, 15)), g, INK_FAINT, 5, 8));
      break;
    }
    case "tie": {
      const d = dir(item.angle);
      const m = perp(d);
      const end = mul(d, 34);
      if (o.state === "slack") {
        // a sagging dashed line and the word
        const pts: Pt[] = [];
        for (let i = 0; i <= 12; i++) {
          const t = i / 12;
          pts.push(add(mul(end, t), mul([0, 1], 7 * Math.sin(Math.PI * t))));
        }
        out.push({ t: "poly", pts, stroke: CAUTION, width: 1.3, dash: [4, 3] });
        out.push(...labelAt(add(mul(end, 0.5), mul(m, -12)), mul(m, -1), ["slack"], CAUTION, 11, { weight: 600 }));
      } else out.push(line(O, end, { stroke: c, width: 1.3 }));
      out.push({ t: "circle", c: O, r: 2.4, stroke: c, width: 1.2, fill: PAPER_CARD });
      out.push({ t: "circle", c: end, r: 3, stroke: c, width: 1.3, fill: PAPER_CARD });
      const base = add(end, mul(d, 3));
      out.push(...ground(add(base, mul(m, -9)), add(base, mul(m, 9)), d, c, false));
      break;
    }
  }
  return out;
}

function portPrims(item: Extract<SceneItem, { kind: "inlet" | "outlet" }>, o: SymbolOptions): Prim[] {
  const c = o.color ?? INK;
  const d = dir(item.angle);
  const n = perp(d);
  const outlet = item.kind === "outlet";
  const from = outlet ? mul(d, -10) : mul(d, -48);
  const to = outlet ? mul(d, 48) : mul(d, 10);
  const out: Prim[] = [line(mul(n, -11), mul(n, 11), { stroke: c, width: 3 }), ...hollowArrow(from, to, c, 1.5)];
  const lines = portFlowLines(item, o.units);
  const tipOut = outlet ? mul(d, 56) : mul(d, -56);
  const away = outlet ? d : mul(d, -1);
  if (o.showName !== false) out.push(...labelAt(tipOut, away, [item.label || item.id, ...lines], c, 11).map((p, i) => (i === 0 && p.t === "text" ? { ...p, italic: true, color: INK_FAINT, size: 10 } : p)));
  else out.push(...labelAt(tipOut, away, lines, c, 11));
  return out;
}

/**
 * A port's values as its label gives them: "ṁ 10 kg/s · V 5 m/s", then "p 50 psig" (gauge). A mass flow
 * nothing gives (no ṁ, nor ρ with Q, nor ρ with A and V: `massFlowGiven` false) is left out, not
 * drawn as "ṁ 0"; a speed is shown when given, or always beside a given flow. A closed end under
 * pressure (ṁ 0 and V 0 given, p given) keeps its zero flow, which is the point of it.
 */
export function portFlowLines(item: Pick<Extract<SceneItem, { kind: "inlet" | "outlet" }>, "massFlow" | "velocity" | "pressure" | "massFlowGiven">, units: UnitSystem): string[] {
  // scenes made without the flag: a zero ṁ beside a speed, or with neither speed nor pressure, is one not given
  const noFlow = item.massFlowGiven === undefined ? item.massFlow === 0 && (item.velocity !== 0 || !item.pressure) : !item.massFlowGiven;
  const parts = noFlow ? [] : [`ṁ ${q(item.massFlow, "massFlow", units)}`];
  if (!(noFlow && item.velocity === 0)) parts.push(`V ${q(item.velocity, "velocity", units)}`);
  const lines = parts.length ? [parts.join(" · ")] : [];
  if (item.pressure) lines.push(`p ${gaugeWords(q(item.pressure, "pressure", units))}`);
  return lines;
}

/** A port's pressure is a gauge pressure (the file format's rule, the inputs table's "Gauge
 *  pressure"): the drawing says so as the trade writes it, "350 kPa(g)", "50 psig". */
export function gaugeWords(pressure: string): string {
  if (pressure === "?") return pressure;
  return pressure.endsWith(" psi") ? `${pressure}g` : `${pressure}(g)`;
}

function loadPrims(item: Extract<SceneItem, { kind: "force" | "couple" | "distributed" }>, o: SymbolOptions): Prim[] {
  const c = o.color ?? INK;
  if (item.kind === "force") {
    const ang = item.magnitude < 0 ? item.angle + 180 : item.angle;
    const d = dir(ang);
    const tail = mul(d, -54);
    return [...solidArrow(tail, [0, 0], c, 1.9, 11), ...labelAt(add(tail, mul(d, -4)), mul(d, -1), [q(Math.abs(item.magnitude), "force", o.units, o.family?.force)], c, 11, { weight: 600 })];
  }
  if (item.kind === "couple") {
    return [...curvedArrow([0, 0], 15, item.value >= 0, c), { t: "circle", c: [0, 0], r: 2, fill: c }, ...labelAt([14, -20], [1, -1], [`${q(Math.abs(item.value), "moment", o.units, o.family?.moment)} ${item.value >= 0 ? "↺" : "↻"}`], c, 11, { weight: 600 })];
  }
  // distributed, local to `from`
  const T: Pt = [(item.to[0] - item.from[0]) * o.scale, -(item.to[1] - item.from[1]) * o.scale];
  const L = Math.hypot(T[0], T[1]);
  const d = dir(item.angle);
  const wmax = Math.max(Math.abs(item.w1), Math.abs(item.w2)) || 1;
  const count = Math.max(3, Math.min(14, Math.floor(L / 16) + 1));
  const tails: Pt[] = [];
  const out: Prim[] = [];
  for (let i = 0; i < count; i++) {
    const t = i / (count - 1);
    const p = mul(T, t);
    const w = item.w1 + (item.w2 - item.w1) * t;
    const h = 6 + 26 * (Math.abs(w) / wmax);
    const tail = sub(p, mul(d, w >= 0 ? h : -h));
    tails.push(tail);
    if (Math.abs(w) > 1e-12) out.push(...solidArrow(tail, w >= 0 ? p : add(p, mul(d, 0)), c, 1.1, 6));
  }
  out.push({ t: "poly", pts: tails, stroke: c, width: 1.2 });
  out.push(line([0, 0], T, { stroke: c, width: 0.8, dash: [2, 3] }));
  const away = mul(d, -1);
  out.push(...labelAt(add(tails[0], mul(away, 5)), away, [`w₁ ${q(item.w1, "lineLoad", o.units)}`], c, 10.5));
  out.push(...labelAt(add(tails[tails.length - 1], mul(away, 5)), away, [`w₂ ${q(item.w2, "lineLoad", o.units)}`], c, 10.5));
  return out;
}

function sourcePrims(item: Extract<SceneItem, { kind: "massSource" }>, o: SymbolOptions): Prim[] {
  const c = o.color ?? INK;
  const drop: Pt[] = [[0, -9]];
  for (let i = 0; i <= 16; i++) {
    const a = (-30 + (240 * i) / 16) * (Math.PI / 180);
    drop.push([5 * Math.cos(a), 1.5 + 5 * Math.sin(a)]);
  }
  return [{ t: "poly", closed: true, pts: drop, stroke: c, width: 1.3, fill: "#dfe9ee" }, ...labelAt([9, 0], [1, 0], [`ṁ ${q(item.massFlow, "massFlow", o.units)}`], c, 10.5)];
}

/** Fields the symbol is drawn from (its direction, size, reach), in the words the panel uses. */
const SHAPE_FIELDS = ["angle", "magnitude", "value", "w1", "w2"] as const;
/** A field as the properties form writes it, where that differs from its key in the file. */
const FIELD_WORDS: Record<string, string> = { w1: "w₁", w2: "w₂" };

/**
 * The fields of an element whose value could not be worked out (an expression in error reads as
 * NaN): its symbol cannot be drawn from them, so it is marked instead.
 */
export function unreadableFields(item: SceneItem): string[] {
  const out: string[] = [];
  const rec = item as unknown as Record<string, unknown>;
  for (const f of SHAPE_FIELDS) if (typeof rec[f] === "number" && !Number.isFinite(rec[f])) out.push(f);
  if (item.kind === "distributed" && !item.to.every(Number.isFinite)) out.push("to");
  return out;
}

/**
 * In place of a symbol that cannot be drawn: a dashed ring with a question mark at the anchor and,
 * beside it, the element's name and which field to check (a shape and words, not colour alone).
 */
function unreadablePrims(item: SceneItem, fields: string[], o: SymbolOptions): Prim[] {
  const c = o.color && o.color !== INK ? o.color : CAUTION;
  const out: Prim[] = [
    { t: "circle", c: [0, 0], r: 9, stroke: c, width: 1.4, dash: [3, 2.5], fill: PAPER_CARD },
    text([0, 0.5], "?", c, 11, { weight: 700, align: "center", baseline: "middle", halo: false, pinned: true }),
  ];
  const lines = [`${fields.map((f) => FIELD_WORDS[f] ?? f).join(", ")}: cannot be worked out`];
  if (o.showName !== false) lines.unshift(item.label || item.id);
  out.push(...labelAt([14, 0], [1, 0], lines, c, 10.5, { weight: 600 }).map((p, i) => (i === 0 && lines.length > 1 && p.t === "text" ? { ...p, italic: true, weight: 400 as const, color: INK_FAINT } : p)));
  return out;
}

/**
 * An element whose own position cannot be worked out has nowhere to be drawn: it is marked where a
 * reader will look for it (its body's centre of gravity), named, with the field to check.
 */
export function unplacedPrims(item: SceneItem, o: SymbolOptions): Prim[] {
  return unreadablePrims(item, [item.kind === "distributed" ? "from" : "position"], o);
}

/** Where an element without a usable position is marked: its body's centre of gravity, else the mean of the body's corners, else the origin. */
export function standInPoint(body: SceneBody | undefined): Vec2 {
  if (!body) return [0, 0];
  if (isFinitePoint(body.cg)) return body.cg;
  const pts = body.outline.filter(isFinitePoint);
  return pts.length ? [pts.reduce((t, p) => t + p[0], 0) / pts.length, pts.reduce((t, p) => t + p[1], 0) / pts.length] : [0, 0];
}

/** The symbol of an attached element, around its anchor (`from` for a distributed load). */
export function itemPrims(item: SceneItem, o: SymbolOptions): Prim[] {
  const unreadable = unreadableFields(item);
  if (unreadable.length) return unreadablePrims(item, unreadable, o);
  let prims: Prim[];
  switch (item.kind) {
    case "pin":
    case "roller":
    case "contact":
    case "fixed":
    case "tie":
      prims = supportPrims(item, o);
      break;
    case "inlet":
    case "outlet":
      prims = portPrims(item, o);
      break;
    case "massSource":
      prims = sourcePrims(item, o);
      break;
    default:
      prims = loadPrims(item, o);
  }
  if (o.showName !== false && item.kind !== "inlet" && item.kind !== "outlet") {
    const name = item.label || item.id;
    if (item.kind === "distributed") {
      // beside the middle of the line through the arrows' tails, on the side away from the body
      const { at, away } = distributedNamePlace(item, o);
      prims.push(...labelAt(at, away, [name], INK_FAINT, 10, { italic: true }));
    } else prims.push(text(nameOffset(item, o), name, INK_FAINT, 10, { align: "left", baseline: "middle", italic: true }));
  }
  return prims;
}

/** Where a distributed load's name goes, local to `from`: off the middle of its tails' line. */
function distributedNamePlace(item: Extract<SceneItem, { kind: "distributed" }>, o: SymbolOptions): { at: Pt; away: Pt } {
  const T: Pt = [(item.to[0] - item.from[0]) * o.scale, -(item.to[1] - item.from[1]) * o.scale];
  const d = dir(item.angle);
  const wmax = Math.max(Math.abs(item.w1), Math.abs(item.w2)) || 1;
  const w = (item.w1 + item.w2) / 2;
  // as loadPrims draws the arrows' tails
  const mid = mul(T, 0.5);
  const tail = sub(mid, mul(d, w >= 0 ? 6 + 26 * (Math.abs(w) / wmax) : -(6 + 26 * (Math.abs(w) / wmax))));
  const away = unit(sub(tail, mid));
  return { at: add(tail, mul(away, 6)), away };
}

function nameOffset(item: SceneItem, o: SymbolOptions): Pt {
  // beside the symbol, across from where it points
  let a = -90;
  if (item.kind === "pin" || item.kind === "fixed") a = o.groundSide ?? -90;
  else if ("angle" in item && item.kind !== "force") a = item.angle + (item.kind === "contact" || item.kind === "roller" ? 180 : 0);
  const d = dir(a);
  const n = perp(d);
  return add(mul(d, 10), mul(n, item.kind === "inlet" || item.kind === "outlet" ? 16 : 20));
}

/** A body: the filled outline in content pixels (world × scale, y down), its name and mass. */
export function bodyPrims(b: SceneBody, o: SymbolOptions & { gravityOn?: boolean }): Prim[] {
  const c = o.color ?? INK;
  const pts: Pt[] = b.outline.map((p) => [p[0] * o.scale, -p[1] * o.scale]);
  const out: Prim[] = [{ t: "poly", closed: true, pts, fill: BODY_FILL, stroke: c, width: o.color && o.color !== INK ? 2 : 1.4 }];
  if (o.showName !== false && pts.length) {
    // a mass the solver refuses (below zero, or no number) is not drawn as if it counted
    const words = `${b.label || b.id} · ${Number.isFinite(b.mass) && b.mass >= 0 ? q(b.mass, "mass", o.units) : "mass not valid"}`;
    // clear of the centre-of-gravity mark and of the weight's arrow and label below and beside it
    const cg: Pt | null = Number.isFinite(b.cg[0]) && Number.isFinite(b.cg[1]) ? [b.cg[0] * o.scale, -b.cg[1] * o.scale] : null;
    const around: Box[] = cg ? [{ x0: cg[0] - 12, y0: cg[1] - 12, x1: cg[0] + 80, y1: cg[1] + 60 }] : [];
    // at the least clear of the mark itself and of the weight's arrow hung under it: words with the
    // mark drawn over them ("9⊕ kg") read as neither
    const mark: Box[] = cg ? [cgMarkBox(cg), { x0: cg[0] - 4, y0: cg[1], x1: cg[0] + 4, y1: cg[1] + 52 }] : [];
    const ports = o.keepOut ?? [];
    const name = b.label || b.id;
    const mass = words.slice(name.length + 3);
    const oneWide = words.length * 6.4 + 8;
    const twoWide = Math.max(name.length, mass.length) * 6.4 + 8;
    // clear of everything on one line, then on two; then clear of the mark and the ports (sliding
    // along past the mark where no corner is clear of it); nowhere inside clear of those: beside
    // the body, as for a body too narrow for its name
    const tries: Array<{ place: ReturnType<typeof bodyLabelPoint>; two: boolean }> = [];
    for (const [avoid, slide] of [[[...around, ...ports], false], [[...mark, ...ports], true]] as const)
      for (const two of [false, true]) tries.push({ place: bodyLabelPoint(pts, two ? twoWide : oneWide, avoid, two ? 13 : 0, slide), two });
    const found = tries.find((t) => t.place.clear && !t.place.outside);
    const at = found?.place ?? bodyLabelPoint(pts, Infinity);
    if (found?.two) {
      out.push(text(found.place.at, name, INK, 11, { weight: 600, align: "left", baseline: "middle", halo: false }));
      out.push(text([found.place.at[0], found.place.at[1] + 13], mass, INK, 11, { weight: 600, align: "left", baseline: "middle", halo: false }));
    } else out.push(text(at.at, words, INK, 11, { weight: 600, align: "left", baseline: "middle", halo: at.outside === true }));
  }
  return out;
}

/** A corner inside the outline where the body's name fits (top corners first), off every box of
 *  `avoid` when one can be (the centre of gravity and the weight, the ports), else the first that
 *  fits; beside the body when it fits nowhere inside. `slide`: each corner's line may also start
 *  just past an avoided box, or end just before it (the name along the top edge, past the mark). */
function bodyLabelPoint(pts: Pt[], width: number, avoid: readonly Box[] = [], extra = 0, slide = false): { at: Pt; clear: boolean; outside?: boolean } {
  const poly = pts.map((p) => [p[0], -p[1]] as Vec2);
  const inside = (p: Pt) => pointInPolygon([p[0], -p[1]], poly);
  const order = [...pts].sort((a, b) => a[0] + a[1] - (b[0] + b[1]) || a[1] - b[1]);
  // `extra`: the height of a second line under the first
  const starts = order.map((v): Pt => [v[0] + 7, v[1] + 13]);
  const places = slide ? starts.flatMap((at): Pt[] => [at, ...avoid.flatMap((box): Pt[] => [[box.x1 + 3, at[1]], [box.x0 - 3 - width, at[1]]])]) : starts;
  const fits = places.filter((at) => inside(at) && inside([at[0] + width, at[1]]) && inside([at[0], at[1] - 6]) && inside([at[0] + width, at[1] + 6 + extra]) && inside([at[0], at[1] + 6 + extra]));
  const clear = (at: Pt) => avoid.every((box) => at[0] + width < box.x0 || at[0] > box.x1 || at[1] + 7 + extra < box.y0 || at[1] - 7 > box.y1);
  const best = fits.find(clear);
  if (best) return { at: best, clear: true };
  if (fits.length) return { at: fits[0], clear: avoid.length === 0 };
  // too narrow for its name anywhere inside (a stack, a strut): beside its top right corner, outside
  const right = Math.max(...pts.map((p) => p[0]));
  const top = Math.min(...pts.filter((p) => p[0] >= right - 1).map((p) => p[1]));
  return { at: [right + 6, top + 8], clear: true, outside: true };
}

/** The box (content px) the centre of gravity's mark at `c` covers, with a hair around it: no label goes on it. */
export function cgMarkBox(c: Pt): Box {
  const r = CG_RADIUS + 2;
  return { x0: c[0] - r, y0: c[1] - r, x1: c[0] + r, y1: c[1] + r };
}

const CG_RADIUS = 6.5;

/** The centre of gravity: a small quartered circle, around (0, 0). */
export function cgPrims(color = INK): Prim[] {
  const r = CG_RADIUS;
  const wedge = (a0: number): Prim => {
    const pts: Pt[] = [[0, 0]];
    for (let i = 0; i <= 8; i++) {
      const a = ((a0 + (90 * i) / 8) * Math.PI) / 180;
      pts.push([r * Math.cos(a), r * Math.sin(a)]);
    }
    return { t: "poly", closed: true, pts, fill: color };
  };
  return [{ t: "circle", c: [0, 0], r, fill: PAPER_CARD, stroke: color, width: 1.3 }, wedge(-90), wedge(90)];
}

/** Local anchor of an element in world metres. */
export function anchorWorld(s: SceneElement): Vec2 {
  if (s.kind === "body") return [0, 0];
  if (s.kind === "distributed") return s.from;
  return s.at;
}

export { unit };
