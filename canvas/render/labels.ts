// Label placement shared by the SVG renderer and the canvas, so a crowded drawing reads the same in
// both. Labels are placed one at a time in order of importance (the result's labels, reactions
// first; then the elements' values and states; then the elements' names). Each label tries its own
// place, then the 8 places around it, then the same twice and three times as far, and takes the
// cheapest: a place on a label already placed costs more than any other, a stroke of another
// symbol under the words a little, and distance from its own place a little. Ties go to the earlier
// place, so the layout is the same every time. A label moved clear of its own place gets a thin
// leader line from the nearest point of what it labels. A label that belongs to a point (a
// support's reaction and name, a port's values) also tries the places beside that point, and a
// place nearer another point of the same family (another support) than its own costs more than
// any stroke under it: "3.8 kN" read beside the wrong support is worse than a line through it.
// When every place tried lands on another label, rings further out are tried before giving in.
// Text widths are estimated (`textExtent`): this runs on the server too.
import { textExtent, type Prim, type Pt } from "./prims";

export type Box = { x0: number; y0: number; x1: number; y1: number };

/** A box as offsets from a point (both in content px): `handlePlace` measures from the element's anchor. */
export const shiftBox = (b: Box, from: readonly [number, number]): Box => ({ x0: b.x0 - from[0], y0: b.y0 - from[1], x1: b.x1 - from[0], y1: b.y1 - from[1] });
type TextPrim = Extract<Prim, { t: "text" }>;
type Segment = readonly [Pt, Pt];

const PAD = 1.5;
/** What one stroke under a label costs, in pixels of moving away from its own place: words with a line through them read worse than words a couple of lines further off. */
const STROKE_COST = 50;
/** Over any label already placed: more than any place that is not. */
const ON_LABEL_COST = 1e6;
/** A label moved at least this far clear of its own place gets a leader line. */
const LEADER_GAP = 4;
/** …or moved even a little, and now this far from the nearest point of what it labels. */
const LEADER_FAR = 16;
/** A place nearer another point of the label's family than its own: more than several strokes, less than a label. */
const ASTRAY_COST = 400;
/** The gaps (px) between a label and the point it belongs to, for the places tried beside that point. */
const ANCHOR_GAPS = [12, 24, 40];

/**
 * What a label belongs to: its element's point (content px) and the family of elements it could be
 * taken for (supports among supports, ports among ports). A label is kept nearer its own point than
 * any other point of its family.
 */
export interface LabelAnchor {
  at: Pt;
  family: string;
}

/** The family an element kind's labels are told apart within; none for bodies and distributed loads (no one point). */
export function anchorFamily(kind: string | undefined): string | null {
  switch (kind) {
    case "pin":
    case "roller":
    case "contact":
    case "fixed":
    case "tie":
      return "support";
    case "inlet":
    case "outlet":
      return "port";
    case "force":
    case "couple":
      return "load";
    case "massSource":
      return "source";
    default:
      return null;
  }
}

export function textBox(p: TextPrim): Box {
  const b = textExtent(p);
  return { x0: b.x0 - PAD, y0: b.y0 - PAD, x1: b.x1 + PAD, y1: b.y1 + PAD };
}

export const boxesOverlap = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
const overlapArea = (a: Box, b: Box) => Math.max(0, Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0)) * Math.max(0, Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0));
const union = (a: Box, b: Box): Box => ({ x0: Math.min(a.x0, b.x0), y0: Math.min(a.y0, b.y0), x1: Math.max(a.x1, b.x1), y1: Math.max(a.y1, b.y1) });
const moveBox = (b: Box, dx: number, dy: number): Box => ({ x0: b.x0 + dx, y0: b.y0 + dy, x1: b.x1 + dx, y1: b.y1 + dy });
const inBox = (p: Pt, b: Box) => p[0] >= b.x0 && p[0] <= b.x1 && p[1] >= b.y0 && p[1] <= b.y1;
const clampTo = (p: Pt, b: Box): Pt => [Math.min(Math.max(p[0], b.x0), b.x1), Math.min(Math.max(p[1], b.y0), b.y1)];

/**
 * The labels in `prims`, as lists of text indices: lines that `labelAt` wrote as one block (the
 * same x and alignment, each a line below the last, next to each other in the list) move together.
 * Pinned texts are part of a symbol, not labels.
 */
export function labelBlocks(prims: readonly Prim[]): number[][] {
  const blocks: number[][] = [];
  let cur: number[] | null = null;
  prims.forEach((p, i) => {
    if (p.t !== "text" || p.pinned) {
      cur = null;
      return;
    }
    const last = cur && (prims[cur[cur.length - 1]] as TextPrim);
    const dy = last ? p.at[1] - last.at[1] : 0;
    if (cur && last && last.at[0] === p.at[0] && last.align === p.align && dy > 0 && dy <= 2 * Math.max(p.size, last.size)) cur.push(i);
    else blocks.push((cur = [i]));
  });
  return blocks;
}

function blockBox(prims: readonly Prim[], idx: readonly number[]): Box {
  return idx.map((i) => textBox(prims[i] as TextPrim)).reduce(union);
}

/** The places a label tries, as offsets from its own: its own first, then rings around it (rings
 *  `from` to `to`), then, for a label of a point, the places beside that point. */
function offsets(b: Box, anchor?: Pt, from = 1, to = 3): Pt[] {
  const sy = b.y1 - b.y0;
  const sx = (b.x1 - b.x0) / 2 + 4;
  const out: Pt[] = from === 1 ? [[0, 0]] : [];
  for (let k = from; k <= to; k++) {
    const x = k * sx;
    const y = k * sy;
    out.push([0, y], [0, -y], [x, 0], [-x, 0], [x, y], [-x, y], [x, -y], [-x, -y]);
  }
  if (anchor && from === 1) {
    const hw = (b.x1 - b.x0) / 2;
    const hh = sy / 2;
    const cx = (b.x0 + b.x1) / 2;
    const cy = (b.y0 + b.y1) / 2;
    for (const g of ANCHOR_GAPS) {
      const d = g * Math.SQRT1_2;
      // right, left, above, below, then the corners
      const centres: Pt[] = [
        [anchor[0] + g + hw, anchor[1]],
        [anchor[0] - g - hw, anchor[1]],
        [anchor[0], anchor[1] - g - hh],
        [anchor[0], anchor[1] + g + hh],
        [anchor[0] + d + hw, anchor[1] - d - hh],
        [anchor[0] - d - hw, anchor[1] - d - hh],
        [anchor[0] + d + hw, anchor[1] + d + hh],
        [anchor[0] - d - hw, anchor[1] + d + hh],
      ];
      for (const c of centres) out.push([c[0] - cx, c[1] - cy]);
    }
  }
  return out;
}

/** The strokes of the shapes in `prims` (lines, outlines, circles as their square), to keep words off. */
export function strokesOf(prims: readonly Prim[]): Segment[] {
  const out: Segment[] = [];
  for (const p of prims) {
    if (p.t === "poly") {
      for (let i = 1; i < p.pts.length; i++) out.push([p.pts[i - 1], p.pts[i]]);
      if (p.closed && p.pts.length > 2) out.push([p.pts[p.pts.length - 1], p.pts[0]]);
    } else if (p.t === "circle") {
      const [x, y] = p.c;
      const r = p.r;
      out.push([[x - r, y - r], [x + r, y - r]], [[x + r, y - r], [x + r, y + r]], [[x + r, y + r], [x - r, y + r]], [[x - r, y + r], [x - r, y - r]]);
    }
  }
  return out.filter(([a, b]) => Number.isFinite(a[0] + a[1] + b[0] + b[1]));
}

/** Whether the segment a–b crosses the box (Liang–Barsky clipping). */
export function segmentHits(a: Pt, b: Pt, box: Box): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const edges: Array<[number, number]> = [
    [-dx, a[0] - box.x0],
    [dx, box.x1 - a[0]],
    [-dy, a[1] - box.y0],
    [dy, box.y1 - a[1]],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
    } else {
      const r = q / p;
      if (p < 0) t0 = Math.max(t0, r);
      else t1 = Math.min(t1, r);
      if (t0 > t1) return false;
    }
  }
  return true;
}

const CELL = 48;
/** A stroke across more squares than this is not filed by square. */
const WIDE_CELLS = 4096;

/**
 * Strokes filed by the squares of a grid they pass, each with its owner (an index: the element, or
 * the result's shape): a label asks only about the squares under it, and skips its own owners.
 */
class Strokes {
  private cells = new Map<number, number[]>();
  private segs: Segment[] = [];
  private owners: number[] = [];
  private seen: number[] = [];
  private stamp = 0;
  /** strokes across more squares than `WIDE_CELLS`, asked about by every label */
  private wide: number[] = [];

  add(segs: readonly Segment[], owner: number) {
    for (const s of segs) {
      const k = this.segs.length;
      this.segs.push(s);
      this.owners.push(owner);
      this.seen.push(0);
      const [a, b] = s;
      // a stroke across many squares (an outline kilometres long, typed in at a close zoom) is
      // asked about by every label instead: filed square by square it would fill millions
      const span = (Math.floor(Math.max(a[0], b[0]) / CELL) - Math.floor(Math.min(a[0], b[0]) / CELL) + 1) * (Math.floor(Math.max(a[1], b[1]) / CELL) - Math.floor(Math.min(a[1], b[1]) / CELL) + 1);
      if (span > WIDE_CELLS) {
        this.wide.push(k);
        continue;
      }
      for (let x = Math.floor(Math.min(a[0], b[0]) / CELL); x <= Math.floor(Math.max(a[0], b[0]) / CELL); x++)
        for (let y = Math.floor(Math.min(a[1], b[1]) / CELL); y <= Math.floor(Math.max(a[1], b[1]) / CELL); y++) {
          const key = x * 1_000_003 + y;
          const cell = this.cells.get(key);
          if (cell) cell.push(k);
          else this.cells.set(key, [k]);
        }
    }
    return this;
  }

  /** How many strokes cross the box, leaving out those of owners from `lo` up to `hi` (none by default). */
  count(b: Box, lo = 0, hi = 0): number {
    const stamp = ++this.stamp;
    let n = 0;
    for (const k of this.wide) {
      const o = this.owners[k];
      if (o >= lo && o < hi) continue;
      if (segmentHits(this.segs[k][0], this.segs[k][1], b)) n++;
    }
    for (let x = Math.floor(b.x0 / CELL); x <= Math.floor(b.x1 / CELL); x++)
      for (let y = Math.floor(b.y0 / CELL); y <= Math.floor(b.y1 / CELL); y++) {
        for (const k of this.cells.get(x * 1_000_003 + y) ?? []) {
          if (this.seen[k] === stamp) continue;
          this.seen[k] = stamp;
          const o = this.owners[k];
          if (o >= lo && o < hi) continue;
          if (segmentHits(this.segs[k][0], this.segs[k][1], b)) n++;
        }
      }
    return n;
  }
}

/**
 * What a label keeps to: the strokes index and its own owners' range (`lo` to `hi`); for a label of
 * a point, that point and the other points of its family it must not sit nearer to.
 */
type Own = { strokes: Strokes; lo: number; hi: number; anchor?: Pt; rivals?: readonly Pt[] };

/** How much nearer the box's centre is to another point of the family than to its own (0: nearest its own). */
export function astray(b: Box, anchor: Pt, rivals: readonly Pt[]): number {
  const cx = (b.x0 + b.x1) / 2;
  const cy = (b.y0 + b.y1) / 2;
  const mine = Math.hypot(cx - anchor[0], cy - anchor[1]);
  let worst = 0;
  for (const r of rivals) worst = Math.max(worst, mine - Math.hypot(cx - r[0], cy - r[1]));
  return worst;
}

/** The other points of a family, leaving out any on `own` itself (two supports drawn at one point cannot be told apart by place). */
function rivalsOf(own: LabelAnchor | undefined, all: readonly LabelAnchor[]): Pt[] | undefined {
  if (!own) return undefined;
  const out: Pt[] = [];
  for (const a of all) if (a.family === own.family && Math.hypot(a.at[0] - own.at[0], a.at[1] - own.at[1]) > 1 && !out.some((p) => p[0] === a.at[0] && p[1] === a.at[1])) out.push(a.at);
  return out;
}

/** The part of a box outside the frame, in px² (0 inside it). */
const outside = (b: Box, frame: Box) => (b.x1 - b.x0) * (b.y1 - b.y0) - overlapArea(b, frame);

/** What a place costs; `moved`: away from the label's own place, where its own symbol's strokes
 *  count too (at its own place it may touch them; moved, it must not cover them). Words cut off
 *  by the edge of the drawing area (`frame`) read no better than words over other words. */
function cost(b: Box, placed: readonly Box[], own: Own, moved: boolean, frame?: Box): number {
  let c = 0;
  if (frame) {
    const off = outside(b, frame);
    if (off > 0.5) c += ON_LABEL_COST + off;
  }
  for (const q of placed) {
    const a = overlapArea(b, q);
    if (a > 0) c += ON_LABEL_COST + a;
  }
  if (own.anchor && own.rivals?.length) {
    const off = astray(b, own.anchor, own.rivals);
    if (off > 0.5) c += ASTRAY_COST + off;
  }
  return c + STROKE_COST * (moved ? own.strokes.count(b) : own.strokes.count(b, own.lo, own.hi));
}

/**
 * The cheapest offset for a label whose own place is `box`; the earliest wins a tie. A label that
 * reaches past the edge of the drawing area (`frame`) but is partly inside it also tries the
 * places just inside the edge, as does one wholly past it whose own point (`own.anchor`) is inside
 * (an inlet placed near the left edge of a phone's view writes its values past that edge, left of
 * its arrow's tail); one inside it does not move out past the edge (under the legend) to make way;
 * one wholly off the area with what it labels stays with it.
 */
function bestOffset(box: Box, placed: readonly Box[], own: Own, frame?: Box): Pt {
  let best: Pt = [0, 0];
  let bestCost = Infinity;
  const within = frame && (boxesOverlap(box, frame) || (own.anchor && inBox(own.anchor, frame))) ? frame : undefined;
  const edge = within && outside(box, within) > 0.5 ? within : undefined;
  const tries = offsets(box, own.anchor);
  if (edge) {
    const dx = box.x0 < edge.x0 ? edge.x0 - box.x0 : box.x1 > edge.x1 ? Math.max(edge.x1 - box.x1, edge.x0 - box.x0) : 0;
    const dy = box.y0 < edge.y0 ? edge.y0 - box.y0 : box.y1 > edge.y1 ? Math.max(edge.y1 - box.y1, edge.y0 - box.y0) : 0;
    const sy = box.y1 - box.y0;
    for (let k = 0; k <= 3; k++) tries.push([dx, dy + k * sy], [dx, dy - k * sy]);
  }
  const look = (list: readonly Pt[]) => {
    for (const o of list) {
      const c = cost(moveBox(box, o[0], o[1]), placed, own, o[0] !== 0 || o[1] !== 0, within) + Math.hypot(o[0], o[1]);
      if (c < bestCost) {
        best = o;
        bestCost = c;
        if (c === 0) break;
      }
    }
  };
  look(tries);
  // every place tried is on another label (or cut by the edge): further out, rather than on it
  if (bestCost >= ON_LABEL_COST) look(offsets(box, undefined, 4, 8));
  return best;
}

/** The points of the shapes in `prims` (line ends and corners, circles' centres). */
function shapePoints(prims: readonly Prim[]): Pt[] {
  const out: Pt[] = [];
  for (const p of prims) {
    if (p.t === "poly") out.push(...p.pts);
    else if (p.t === "circle") out.push(p.c);
  }
  return out.filter((q) => Number.isFinite(q[0]) && Number.isFinite(q[1]));
}

/**
 * A thin line to a label moved clear of its own place (`from`), from the nearest point of what it
 * labels (`own`; its own place only when that has no shapes).
 */
function leader(from: Box, to: Box, own: readonly Pt[], color: string): Prim | null {
  const centre: Pt = [(to.x0 + to.x1) / 2, (to.y0 + to.y1) / 2];
  const back = clampTo(centre, from);
  const gap = (q: Pt) => {
    const c = clampTo(q, to);
    return Math.hypot(c[0] - q[0], c[1] - q[1]);
  };
  // from what it labels when that has shapes (a point of its old place would be empty paper)
  let a = own.length ? own[0] : back;
  for (const q of own) if (gap(q) < gap(a)) a = q;
  // next to its old place, a label is still read with its symbol, unless it has moved off it (a
  // moment's label taken round past the arrow of the force beside it)
  if (gap(back) < LEADER_GAP && (!own.length || gap(a) < LEADER_FAR)) return null;
  const b = clampTo(a, to);
  if (Math.hypot(b[0] - a[0], b[1] - a[1]) < LEADER_GAP) return null;
  return { t: "poly", pts: [a, b], stroke: color, width: 0.75, opacity: 0.8 };
}

function moveTexts(prims: Prim[], idx: readonly number[], dx: number, dy: number) {
  for (const i of idx) {
    const p = prims[i] as TextPrim;
    prims[i] = { ...p, at: [p.at[0] + dx, p.at[1] + dy] };
  }
}

/**
 * The result's drawing with its labels placed, in the order drawn (reactions first), off each
 * other and off the strokes of its own other arrows and of `under` (what the elements draw, with
 * any texts that stay where they are). Each label keeps off every stroke but those drawn just
 * before it: its own arrow; and inside the drawing area when given one (`frame`). `anchors`: the
 * point a label belongs to, by the index of its first text (a reaction's values: its support),
 * kept nearer it than any of `rivals` (every support, with a label or not; the anchors by default).
 * `keepOut`: boxes no label may cover (the bodies' centres of gravity).
 */
export function placeResultLabels(
  prims: readonly Prim[],
  under: readonly Prim[] = [],
  frame?: Box,
  points: { anchors?: ReadonlyMap<number, LabelAnchor>; rivals?: readonly LabelAnchor[]; keepOut?: readonly Box[] } = {},
): Prim[] {
  const anchors = points.anchors ?? new Map<number, LabelAnchor>();
  const all = points.rivals ?? [...anchors.values()];
  const out = prims.slice();
  const leaders: Prim[] = [];
  // marks no label may cover (the bodies' centres of gravity), as if labels were there
  const placed: Box[] = [...(points.keepOut ?? [])];
  for (const p of under) if (p.t === "text") placed.push(textBox(p));
  for (const p of prims) if (p.t === "text" && p.pinned) placed.push(textBox(p));
  const strokes = new Strokes().add(strokesOf(under), -1);
  prims.forEach((p, i) => p.t !== "text" && strokes.add(strokesOf([p]), i));
  let ownFrom = 0;
  for (const idx of labelBlocks(prims)) {
    // its own arrow: the shapes drawn since the label before it
    const ownFrom0 = ownFrom;
    ownFrom = idx[idx.length - 1] + 1;
    const box = blockBox(prims, idx);
    const anchor = anchors.get(idx[0]);
    const [dx, dy] = bestOffset(box, placed, { strokes, lo: ownFrom0, hi: idx[0], anchor: anchor?.at, rivals: rivalsOf(anchor, all) }, frame);
    const to = moveBox(box, dx, dy);
    placed.push(to);
    if (dx || dy) {
      moveTexts(out, idx, dx, dy);
      const l = leader(box, to, shapePoints(prims.slice(ownFrom0, idx[0])), (prims[idx[0]] as TextPrim).color);
      if (l) leaders.push(l);
    }
  }
  return leaders.length ? [...out, ...leaders] : out;
}

/** A text's move: [index of the text prim, dx, dy] in px. */
export type TextMove = readonly [number, number, number];
/** Per element id: how its texts move. */
export type LabelShifts = ReadonlyMap<string, readonly TextMove[]>;
export const NO_SHIFTS: LabelShifts = new Map();

/**
 * Where the elements' labels go, as moves of their texts per element: after the result's labels
 * (`taken`, placed already) and the bodies' names inside them (which stay), the names beside
 * bodies too narrow to hold them, every element's values and states in drawing order, then every
 * element's name. Each keeps off the labels placed before it and off the strokes of the other
 * elements and of the result's arrows, and, given the drawing area (`frame`, in the same content
 * pixels), inside it: a label cut by its edge moves in, with a leader. An element with an
 * `anchor` (its point, content px) keeps its labels nearer it than the point of any other element
 * of its family (a support's name beside that support, not the next one). `keepOut`: boxes no
 * label may cover (the turn handle of the element selected on the canvas), as are a group's own
 * `marks` (a body's centre of gravity, whose quartered circle would hide the words). `prev` keeps the
 * identity of unchanged entries (and of the whole map when nothing changed), so a canvas node is
 * drawn again only when its own labels move.
 */
export function placeElementLabels(
  groups: ReadonlyArray<{ id: string; kind?: string; prims: readonly Prim[]; anchor?: Pt; marks?: readonly Box[] }>,
  taken: readonly Prim[] = [],
  prev: LabelShifts = NO_SHIFTS,
  frame?: Box,
  keepOut: readonly Box[] = [],
): LabelShifts {
  const placed: Box[] = [...keepOut];
  for (const g of groups) if (g.marks) placed.push(...g.marks);
  const anchorOf = (g: { kind?: string; anchor?: Pt }): LabelAnchor | undefined => {
    const family = anchorFamily(g.kind);
    return family && g.anchor && Number.isFinite(g.anchor[0]) && Number.isFinite(g.anchor[1]) ? { at: g.anchor, family } : undefined;
  };
  const anchors = groups.map(anchorOf);
  const all = anchors.filter((a): a is LabelAnchor => a !== undefined);
  const rivals = anchors.map((a) => rivalsOf(a, all));
  for (const p of taken) if (p.t === "text") placed.push(textBox(p));
  // a body's name inside it stays in the corner chosen for it (moved, it would cross the outline);
  // one beside a body too narrow to hold it (drawn with a halo) makes way like the other labels, first
  const outsideName = (g: { kind?: string }, p: Prim) => g.kind === "body" && p.t === "text" && p.halo === true;
  for (const g of groups) for (const p of g.prims) if (p.t === "text" && ((g.kind === "body" && !outsideName(g, p)) || p.pinned)) placed.push(textBox(p));
  const strokes = new Strokes().add(strokesOf(taken), -1);
  groups.forEach((g, k) => strokes.add(strokesOf(g.prims), k));
  type Job = { g: number; idx: number[] };
  const bodies: Job[] = [];
  const values: Job[] = [];
  const names: Job[] = [];
  groups.forEach((g, k) => {
    for (const idx of labelBlocks(g.prims)) {
      if (g.kind === "body") {
        if (idx.every((i) => outsideName(g, g.prims[i]))) bodies.push({ g: k, idx });
      } else (idx.every((i) => (g.prims[i] as TextPrim).italic) ? names : values).push({ g: k, idx });
    }
  });
  const moves = groups.map((): Array<[number, number, number]> => []);
  for (const { g, idx } of [...bodies, ...values, ...names]) {
    const box = blockBox(groups[g].prims, idx);
    const [dx, dy] = bestOffset(box, placed, { strokes, lo: g, hi: g + 1, anchor: anchors[g]?.at, rivals: rivals[g] }, frame);
    placed.push(moveBox(box, dx, dy));
    if (dx || dy) for (const i of idx) moves[g].push([i, dx, dy]);
  }
  const out = new Map<string, readonly TextMove[]>();
  groups.forEach((g, k) => {
    const m = moves[k].sort((a, b) => a[0] - b[0]);
    if (!m.length) return;
    const before = prev.get(g.id);
    const same = before && before.length === m.length && before.every((x, j) => x[0] === m[j][0] && x[1] === m[j][1] && x[2] === m[j][2]);
    out.set(g.id, same ? before : m);
  });
  if (out.size === prev.size && [...out].every(([id, m]) => prev.get(id) === m)) return prev;
  return out;
}

/** `prims` with the given texts moved and a leader from each block moved clear of its own place. */
export function shiftTexts(prims: Prim[], moves: readonly TextMove[] | undefined): Prim[] {
  if (!moves?.length) return prims;
  const out = prims.slice();
  const by = new Map(moves.map((m) => [m[0], m]));
  const own = shapePoints(prims);
  for (const idx of labelBlocks(prims)) {
    const m = by.get(idx[0]);
    if (!m || !idx.every((i) => by.has(i))) continue;
    const box = blockBox(prims, idx);
    moveTexts(out, idx, m[1], m[2]);
    const l = leader(box, moveBox(box, m[1], m[2]), own, (prims[idx[0]] as TextPrim).color);
    if (l) out.push(l);
  }
  return out;
}
