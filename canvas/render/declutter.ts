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
