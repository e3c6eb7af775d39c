// The underlay's frame on the canvas while its file is not drawn: a word while it loads (the marks
// of the scale should not be clicked on an empty canvas), and one when it cannot be fetched.
import { describe, expect, it } from "vitest";
import { UNDERLAY_FAILED, UNDERLAY_LOADING, underlayFrameNote } from "@/canvas/konva/underlayStatus";

describe("underlayFrameNote", () => {
  it("says the drawing is loading until its image arrives", () => {
    expect(underlayFrameNote(null, false)).toBe("Loading the drawing…");
    expect(UNDERLAY_LOADING).toBe("Loading the drawing…");
  });
  it("says nothing once it is drawn, or while it is hidden", () => {
    expect(underlayFrameNote({ img: {}, failed: false }, false)).toBeNull();
    expect(underlayFrameNote(null, true)).toBeNull();
    expect(underlayFrameNote({ img: null, failed: true }, true)).toBeNull();
  });
  it("names every reason a file may not arrive, the connection first, and what to do", () => {
    const note = underlayFrameNote({ img: null, failed: true }, false);
    expect(note).toBe(UNDERLAY_FAILED);
    expect(note).toMatch(/could not be fetched \(check the connection and reload\)/);
    expect(note).toMatch(/deleted/);
    expect(note).toMatch(/workspace you cannot read/);
  });
});
