// Where a comment pin's head goes: its tip stays on the point it marks, and the head leans clear
// of the drawing's labels and values (a reaction's number is never hidden by a pin that could
// stand beside it), and of the pins placed before it.
import { describe, expect, it } from "vitest";
import { placePinHead } from "@/components/review/drawingOverlay";

const tip = [200, 100] as const;

describe("a comment pin's head", () => {
  it("with nothing near, stands upright 18 px above its tip, 22 px across", () => {
    expect(placePinHead(tip, [])).toEqual({ angle: 0, x: 200, y: 82, box: { x: 189, y: 71, width: 22, height: 22 } });
  });

  it("a value label at the point's upper right tips it 40° to the left, clear of the label", () => {
    // "12.4 kN" written 4 px right of the point and 16 to 30 px above it
    const value = { x: 204, y: 70, width: 44, height: 14 };
    const head = placePinHead(tip, [value]);
    // sin 40° = 0.6428, cos 40° = 0.7660 (from memory): the head at (200 − 18·0.6428, 100 − 18·0.7660)
    expect(head).toMatchObject({ angle: -40, x: 188.4, y: 86.2 });
    expect(head.box.x + head.box.width).toBeLessThanOrEqual(value.x);
  });

  it("a label wide across the top hangs it to the lower right; a second pin on one point leans away from the first", () => {
    const above = { x: 170, y: 60, width: 60, height: 30 };
    const head = placePinHead(tip, [above]);
    expect(head.angle).toBe(125);
    expect(head.box.y).toBeGreaterThanOrEqual(above.y + above.height);
    const first = placePinHead(tip, []);
    const second = placePinHead(tip, [first.box]);
    expect(second.angle).toBe(125);
    expect(second.box.y).toBeGreaterThanOrEqual(first.box.y + first.box.height);
  });

  it("hemmed in all round, takes the lean that covers least (upright when every one is covered alike)", () => {
    // covers down to 12 px below the tip: hanging straight down (head 7 to 29 px below) covers least
    expect(placePinHead(tip, [{ x: 150, y: 50, width: 100, height: 62 }])).toMatchObject({ angle: 180, x: 200, y: 118 });
    expect(placePinHead(tip, [{ x: 150, y: 50, width: 100, height: 100 }]).angle).toBe(0);
  });
});
