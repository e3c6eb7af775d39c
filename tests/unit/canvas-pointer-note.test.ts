// Where the note beside the pointer goes: inside the canvas whatever the pointer's place.
import { describe, expect, it } from "vitest";
import { noteWidth, pointerNotePlace } from "@/canvas/render/pointerNote";

const VIEWPORT = { width: 800, height: 600 };
const NOTE = { width: 260, height: 13 };

describe("the note beside the pointer", () => {
  it("goes 10 px right of and 8 px below the pointer where it fits", () => {
    expect(pointerNotePlace([300, 200], NOTE, VIEWPORT)).toEqual([10, 8]);
    // the last that fits: 526 + 10 + 260 = 796, 4 px inside the edge
    expect(pointerNotePlace([526, 200], NOTE, VIEWPORT)).toEqual([10, 8]);
  });
  it("flips left of the pointer at the right edge, and above it at the bottom edge", () => {
    expect(pointerNotePlace([527, 200], NOTE, VIEWPORT)).toEqual([-270, 8]);
    expect(pointerNotePlace([790, 590], NOTE, VIEWPORT)).toEqual([-270, -21]);
  });
  it("a note wider than the canvas starts at its left edge; a pointer off the canvas keeps it inside", () => {
    expect(pointerNotePlace([200, 100], { width: 400, height: 13 }, { width: 300, height: 600 })).toEqual([-196, 8]);
    expect(pointerNotePlace([-50, -30], NOTE, VIEWPORT)).toEqual([54, 34]);
  });
  it("leaves the usual place while the canvas is not measured, and estimates a note's width as 0.56 em a character", () => {
    expect(pointerNotePlace([790, 590], NOTE, { width: 0, height: 0 })).toEqual([10, 8]);
    expect(noteWidth("not on a body: move onto or near its outline", 10.5)).toBeCloseTo(258.72, 9);
  });
});
