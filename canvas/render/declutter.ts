// Keep the result's labels readable: a label that would sit on another text (an element's own
// label block, or an earlier result label) moves up or down a line or two to the first free
// place. Element labels stay where they are; the result's are placed in the order drawn
// (reactions first). Boxes use the same text-width estimate as primsBox.
import { textExtent, type Prim } from "./prims";

type Box = { x0: number; y0: number; x1: number; y1: number };
type TextPrim = Extract<Prim, { t: "text" }>;

const PAD = 1.5;

export function textBox(p: TextPrim): Box {
  const b = textExtent(p);
  return { x0: b.x0 - PAD, y0: b.y0 - PAD, x1: b.x1 + PAD, y1: b.y1 + PAD };
}

const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
const free = (b: Box, placed: Box[]) => !placed.some((q) => overlaps(b, q));

/** `labels` with each text moved off the `obstacles`' texts and off the labels placed before it. */
export function declutter(labels: Prim[], obstacles: readonly Prim[]): Prim[] {
  const placed: Box[] = [];
  for (const p of obstacles) if (p.t === "text") placed.push(textBox(p));
  return labels.map((p) => {
    if (p.t !== "text") return p;
    const b = textBox(p);
    if (free(b, placed)) {
      placed.push(b);
      return p;
    }
    const step = p.size + 3;
    for (const dy of [step, -step, 2 * step, -2 * step, 3 * step, -3 * step]) {
      const moved = { ...b, y0: b.y0 + dy, y1: b.y1 + dy };
      if (free(moved, placed)) {
        placed.push(moved);
        return { ...p, at: [p.at[0], p.at[1] + dy] };
      }
    }
    placed.push(b);
    return p;
  });
}

/** Per element id: the vertical moves of its name texts, as [index of the text prim, dy in px]. */
export type LabelShifts = ReadonlyMap<string, ReadonlyArray<readonly [number, number]>>;
export const NO_SHIFTS: LabelShifts = new Map();

/**
 * Keep the elements' names readable where elements crowd: every value and state word (and each
 * body's name) stays where its symbol puts it; then each element's name (the italic text beside
 * a support or a load), in drawing order, moves a line or two down or up when it would sit on a
 * text placed before it. `prev` keeps the identity of unchanged entries (and of the whole map
 * when nothing changed), so a canvas node is drawn again only when its own names move.
 */
export function placeElementNames(groups: ReadonlyArray<{ id: string; prims: readonly Prim[] }>, prev: LabelShifts = NO_SHIFTS): LabelShifts {
  const placed: Box[] = [];
  for (const g of groups) for (const p of g.prims) if (p.t === "text" && !p.italic) placed.push(textBox(p));
  const out = new Map<string, ReadonlyArray<readonly [number, number]>>();
  for (const g of groups) {
    const moves: Array<[number, number]> = [];
    g.prims.forEach((p, i) => {
      if (p.t !== "text" || !p.italic) return;
      const b = textBox(p);
      const step = p.size + 3;
      for (const dy of [0, step, -step, 2 * step, -2 * step]) {
        const moved = { ...b, y0: b.y0 + dy, y1: b.y1 + dy };
        if (free(moved, placed)) {
          placed.push(moved);
          if (dy) moves.push([i, dy]);
          return;
        }
      }
      placed.push(b);
    });
    if (!moves.length) continue;
    const before = prev.get(g.id);
    out.set(g.id, before && before.length === moves.length && before.every(([i, d], k) => i === moves[k][0] && d === moves[k][1]) ? before : moves);
  }
  if (out.size === prev.size && [...out].every(([id, m]) => prev.get(id) === m)) return prev;
  return out;
}

/** `prims` with the given texts moved (a new array only when something moves). */
export function shiftTexts(prims: Prim[], moves: ReadonlyArray<readonly [number, number]> | undefined): Prim[] {
  if (!moves?.length) return prims;
  const out = prims.slice();
  for (const [i, dy] of moves) {
    const p = out[i];
    if (p?.t === "text") out[i] = { ...p, at: [p.at[0], p.at[1] + dy] };
  }
  return out;
}
