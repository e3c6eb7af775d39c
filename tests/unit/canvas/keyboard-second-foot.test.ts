// A pair of feet placed half with the mouse and half from the keyboard: the foot clicked onto the
// base a little off the keyboard's own spot (an eighth of the base in from the left corner) still
// counts as the left foot, so Enter on the tray puts the second one at the right end of the base,
// not beside the first (a body on two feet side by side at one end reads as tipping).
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { placeWithoutPointer } from "@/canvas/placement";
import { buildScene } from "@/canvas/scene";
import { runCommand } from "@/canvas/commands/define";

/** A fan housing 1.2 m long and 0.9 m tall, one friction contact clicked on 0.1 m in from its left end. */
function housingWithLeftFoot(): SketchFile {
  return {
    ...emptySketch("Ducted fan"),
    bodies: [newBody("b1", [[0, 0], [1.2, 0], [1.2, 0.9], [0, 0.9]], "Fan housing")],
    supports: [{ id: "s1", body: "b1", kind: "contact", at: [0.1, 0], angle: 90, mu: 0.4 }],
  };
}

describe("the second foot from the keyboard", () => {
  it("goes near the right end when a foot clicked on near the left end is off the eighth", () => {
    const sketch = housingWithLeftFoot();
    // 9 screen px at 289 px/m, as the editor passes it
    const out = placeWithoutPointer(sketch, buildScene(sketch), "contact", { selection: ["s1"], viewCentre: [0.6, 0.45], tol: 9 / 289, friction: true });
    if (!out.ok) throw new Error(out.message);
    expect(out.place).toEqual({ edge: "bottom", along: 0.875 });
    const after = runCommand(sketch, out.command);
    // an eighth of 1.2 m in from the right corner: x = 1.2 − 0.15
    expect(after.supports[1]).toMatchObject({ body: "b1", kind: "contact", angle: 90 });
    expect(after.supports[1].at[0]).toBeCloseTo(1.05, 12);
    expect(after.supports[1].at[1]).toBe(0);
  });

  it("still goes to the left end when the clicked foot stands well inside the base", () => {
    const sketch = housingWithLeftFoot();
    sketch.supports[0].at = [0.6, 0];
    const out = placeWithoutPointer(sketch, buildScene(sketch), "contact", { selection: ["s1"], viewCentre: [0.6, 0.45], tol: 9 / 289, friction: true });
    if (!out.ok) throw new Error(out.message);
    expect(out.place).toEqual({ edge: "bottom", along: 0.125 });
  });
});
