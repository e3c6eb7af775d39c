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

  it("goes to the other end when the first foot was typed to where its axle is, in either half of the base", () => {
    // a trailer 5 m long (our own scenario): the rear wheels typed to x = 1.2 m, a hose inlet on its left side
    const trailer: SketchFile = {
      ...emptySketch("Monitor trailer"),
      bodies: [newBody("b1", [[0, 0], [5, 0], [5, 1.4], [0, 1.4]], "Trailer")],
      supports: [{ id: "s1", body: "b1", kind: "contact", at: [1.2, 0], angle: 90, mu: 0.3 }],
      ports: [{ id: "p1", body: "b1", kind: "inlet", at: [0, 0.9], angle: 0, massFlow: 90, velocity: 7 }],
    };
    const where = { selection: ["s1"], viewCentre: [2.5, 0.7] as [number, number], tol: 9 / 120, friction: true };
    const out = placeWithoutPointer(trailer, buildScene(trailer), "contact", where);
    if (!out.ok) throw new Error(out.message);
    // before, the left end's spot (0.625 m) was more than a sixteenth of the base from 1.2 m and so
    // free: the second wheels went outside the first, a base of 0.6 m instead of 3.75 m
    expect(out.place).toEqual({ edge: "bottom", along: 0.875 });
    expect(out.at![0]).toBeCloseTo(4.375, 12);
    // the front wheels typed first, at 3.8 m: the second goes to the left end
    const front = { ...trailer, supports: [{ ...trailer.supports[0], at: [3.8, 0] }] } as SketchFile;
    const back = placeWithoutPointer(front, buildScene(front), "roller", where);
    if (!back.ok) throw new Error(back.message);
    expect(back.place).toEqual({ edge: "bottom", along: 0.125 });
    // with both ends taken, a third goes to the middle
    const both = { ...front, supports: [...front.supports, { id: "s2", body: "b1", kind: "contact", at: [0.4, 0], angle: 90 }] } as SketchFile;
    const third = placeWithoutPointer(both, buildScene(both), "contact", where);
    if (!third.ok) throw new Error(third.message);
    expect(third.place).toEqual({ edge: "bottom", along: 0.5 });
  });
});
