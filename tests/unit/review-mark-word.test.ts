// Where a comparison's mark word ("△ changed", "+ added", "× removed") goes beside its outline:
// clear of the labels drawn near it, so that it never writes over a port's or a support's name.
import { describe, expect, it } from "vitest";
import { placeMarkWord, wordSize } from "@/components/review/drawingOverlay";

// an element's outline, in drawing pixels
const outline = { x: 100, y: 50, width: 120, height: 60 };
const word = wordSize("△ changed");

describe("a mark word's place", () => {
  it("is 9 characters of 11 px semi-bold, about 62 px by 14 px", () => {
    expect(word).toEqual({ width: 62, height: 14 });
  });

  it("with nothing near, stands above the outline's left corner, 4 px clear of it", () => {
    const s = placeMarkWord(outline, word, []);
    expect([s.x, s.y, s.anchor]).toEqual([102, 46, "start"]);
    expect(s.box).toEqual({ x: 102, y: 35, width: 62, height: 14 });
    // the word's box ends above the outline
    expect(s.box.y + s.box.height).toBeLessThanOrEqual(outline.y);
  });

  it("a neighbour's label above the left corner sends it above the right corner, its end at the corner", () => {
    const portLabel = { x: 90, y: 30, width: 60, height: 14 };
    const s = placeMarkWord(outline, word, [portLabel]);
    expect([s.x, s.y, s.anchor]).toEqual([218, 46, "end"]);
    expect(s.box).toEqual({ x: 156, y: 35, width: 62, height: 14 });
    expect(s.box.x).toBeGreaterThanOrEqual(portLabel.x + portLabel.width);
  });

  it("labels above both corners send it below the outline, at its left corner", () => {
    const s = placeMarkWord(outline, word, [{ x: 90, y: 30, width: 70, height: 14 }, { x: 170, y: 36, width: 60, height: 12 }]);
    expect([s.x, s.y, s.anchor]).toEqual([102, 125, "start"]);
    expect(s.box).toEqual({ x: 102, y: 114, width: 62, height: 14 });
    expect(s.box.y).toBeGreaterThanOrEqual(outline.y + outline.height);
  });

  it("with every place covered, takes the one that covers least (below right, 84 px² against 522, 612 and 924)", () => {
    const labels = [
      { x: 90, y: 30, width: 70, height: 14 },
      { x: 170, y: 36, width: 60, height: 12 },
      { x: 100, y: 112, width: 60, height: 20 },
      { x: 150, y: 112, width: 8, height: 20 },
    ];
    const s = placeMarkWord(outline, word, labels);
    expect([s.x, s.y, s.anchor]).toEqual([218, 125, "end"]);
  });

  it("a word placed before is avoided as a label is (two marked elements side by side)", () => {
    const first = placeMarkWord(outline, word, []);
    const beside = { x: 130, y: 50, width: 120, height: 60 };
    const second = placeMarkWord(beside, word, [first.box]);
    expect(second.anchor).toBe("end");
    expect(second.box.x).toBeGreaterThanOrEqual(first.box.x + first.box.width);
  });
});
