// Where a note that follows the pointer goes ("not on a body: …", "corner", "click: take moments
// about this point"): below and to the right of the pointer, or to its left when it would run
// past the canvas's right edge, above it near the bottom edge, and never past the left or top
// edge. Pure, so the rule is tested without a canvas.
import type { Vec2 } from "@/solver/types";

/** The gap between the pointer and the note (px): right of it, below it. */
export const NOTE_GAP: Vec2 = [10, 8];
/** The least the note keeps from the canvas's edges (px). */
const EDGE = 4;
/** A note's width is estimated as for the drawing's other words (0.56 em a character). */
const EM_PER_CHAR = 0.56;

/** The estimated width (px) of a note's text at this font size. */
export function noteWidth(text: string, fontSize: number): number {
  return text.length * fontSize * EM_PER_CHAR;
}

/**
 * The note's top-left corner relative to the pointer (px), for a pointer at `at` (screen px in the
 * canvas) and a note `size` big in a canvas `viewport` big. `gap` is the usual offset (right and
 * below); a note that does not fit there flips to the other side of the pointer, and is then held
 * inside the edges (a note wider than the canvas starts at its left edge).
 */
export function pointerNotePlace(at: Vec2, size: { width: number; height: number }, viewport: { width: number; height: number }, gap: Vec2 = NOTE_GAP): Vec2 {
  const place = (p: number, extent: number, g: number, room: number) => {
    let d = g;
    if (p + g + extent > room - EDGE) d = -g - extent;
    // held inside: the far edge first, then the near one (which wins when the note is wider than the room)
    d = Math.min(d, room - EDGE - extent - p);
    return Math.max(d, EDGE - p);
  };
  if (!(viewport.width > 1 && viewport.height > 1)) return [gap[0], gap[1]];
  return [place(at[0], size.width, gap[0], viewport.width), place(at[1], size.height, gap[1], viewport.height)];
}
