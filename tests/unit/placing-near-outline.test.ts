// Where a click puts a support or a port: inside a body a support stays and a port goes onto the
// outline; just outside an outline either goes onto the nearest point of it; farther out it is
// refused with a hint (never attached to whichever body happens to be nearest). And a body placed
// in one go (a click, a tap, the keyboard) lands centred on the point, wholly in view, no larger
// than a phone's drawing takes.
// Geometry checked by hand on axis-aligned rectangles.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { emptySketch } from "@/canvas/model/elements";
import { newBody, rectangleAround } from "@/canvas/model/factory";
import { bodyPlaceInView, OUTLINE_REACH_PX, offOutlineMessage, outlineSpot, placeCommand } from "@/canvas/placement";
import { buildScene } from "@/canvas/scene";
import { LEGEND_ROOM } from "@/canvas/geometry/fit";
import { toScreen, type View } from "@/canvas/geometry/view";

/** Two crates, 2 m × 1 m, 2 m apart (demo data). */
function crates(): SketchFile {
  return { ...emptySketch("Two crates"), bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]], "Left"), newBody("b2", [[4, 0], [6, 0], [6, 1], [4, 1]], "Right")] };
}

// at 100 px/m: the pointer's tolerance is 9 px = 0.09 m, the reach 12 px = 0.12 m
const TOL = 0.09;
const REACH = OUTLINE_REACH_PX / 100;
type Placed = { element: { body: string; at: number[]; angle?: number } };
const placed = (out: ReturnType<typeof placeCommand>) => {
  if (!out.ok) throw new Error(out.message);
  return (out.command.args as Placed).element;
};

describe("a support or a port placed with the pointer", () => {
  const file = crates();
  const scene = buildScene(file);

  it("inside a body stays where it was clicked (a pin through a hole in a plate)", () => {
    const pin = placed(placeCommand(file, scene, "pin", [1.3, 0.4], TOL, { reach: REACH }));
    expect(pin).toMatchObject({ body: "b1", at: [1.3, 0.4] });
  });

  it("a port clicked inside a body goes onto the nearest point of its outline, flowing across it (fluid crosses the control surface only there)", () => {
    // 12 px under the top edge of the left crate, where a click meant for that edge lands
    const outlet = placed(placeCommand(file, scene, "outlet", [1.4, 0.88], TOL, { reach: REACH }));
    expect(outlet.body).toBe("b1");
    expect(outlet.at[0]).toBeCloseTo(1.4, 12);
    expect(outlet.at[1]).toBeCloseTo(1, 12);
    expect(outlet.angle).toBe(90);
    // deep inside, nearer the left face: onto it, an inlet flowing in (+x)
    const inlet = placed(placeCommand(file, scene, "inlet", [0.3, 0.45], TOL, { reach: REACH }));
    expect(inlet.at[0]).toBeCloseTo(0, 12);
    expect(inlet.at[1]).toBeCloseTo(0.45, 12);
    expect(inlet.angle).toBe(0);
    // the ghost before the click shows the same spot
    expect(outlineSpot(scene.bodies, [1.4, 0.88], REACH, TOL, [1.4, 0.88], true)?.at).toEqual([1.4, 1]);
  });

  it("a port goes onto the edge nearest the pointer, not the one nearest the grid point it snapped to", () => {
    // an L-shaped bend body: the pointer 5 cm under the top of its upright leg, the 0.2 m grid point
    // under it (0.8, 1.4) as near the leg's two sides as the top
    const bend: SketchFile = { ...emptySketch("Bend"), bodies: [newBody("b1", [[0, 0], [1, 0], [1, 1.6], [0.6, 1.6], [0.6, 0.4], [0, 0.4]])] };
    const outlet = placed(placeCommand(bend, buildScene(bend), "outlet", [0.8, 1.4], TOL, { reach: REACH, from: [0.8, 1.55] }));
    expect(outlet.at[0]).toBeCloseTo(0.8, 12);
    expect(outlet.at[1]).toBeCloseTo(1.6, 12);
    expect(outlet.angle).toBe(90);
  });

  it("10 px below a body's bottom edge goes onto the edge, pointing into the body", () => {
    const contact = placed(placeCommand(file, scene, "contact", [5.3, -0.1], TOL, { reach: REACH }));
    expect(contact.body).toBe("b2");
    expect(contact.at[0]).toBeCloseTo(5.3, 12);
    expect(contact.at[1]).toBeCloseTo(0, 12);
    expect(contact.angle).toBe(90);
  });

  it("just off a corner goes onto the corner; an outlet just right of a face goes onto it, flowing out", () => {
    const pin = placed(placeCommand(file, scene, "pin", [2.06, -0.05], TOL, { reach: REACH }));
    expect(pin).toMatchObject({ body: "b1", at: [2, 0] });
    const outlet = placed(placeCommand(file, scene, "outlet", [6.1, 0.5], TOL, { reach: REACH }));
    expect(outlet.body).toBe("b2");
    expect(outlet.at[0]).toBeCloseTo(6, 12);
    expect(outlet.at[1]).toBeCloseTo(0.5, 12);
    expect(outlet.angle).toBe(0);
  });

  it("in empty space, 0.8 m from the nearest body, is refused with the hint, in a tap's words on a touch screen", () => {
    expect(placeCommand(file, scene, "pin", [3.2, 0.5], TOL, { reach: REACH })).toEqual({ ok: false, message: "Click on or near a body's outline to place a support." });
    expect(placeCommand(file, scene, "tie", [3, 3], TOL, { reach: REACH, touch: true })).toEqual({ ok: false, message: "Tap on or near a body's outline to place a support." });
    expect(placeCommand(file, scene, "inlet", [3, 0.5], TOL, { reach: REACH })).toEqual({ ok: false, message: offOutlineMessage("inlet") });
    expect(offOutlineMessage("inlet")).toBe("Click on or near a body's outline to place a port: fluid crosses the control surface only there.");
  });

  it("measures the reach from the pointer's own point: a grid point 20 px out still lands on the edge, and one pulled in from 15 px out is refused", () => {
    // the pointer 11 px below the edge, its grid point 20 px below: onto the edge
    const near = placed(placeCommand(file, scene, "roller", [5.2, -0.2], TOL, { reach: REACH, from: [5.21, -0.11] }));
    expect(near.body).toBe("b2");
    expect(near.at[0]).toBeCloseTo(5.2, 12);
    expect(near.at[1]).toBeCloseTo(0, 12);
    // the pointer 15 px below the edge, its grid point on it: still too far
    expect(placeCommand(file, scene, "roller", [5.2, 0], TOL, { reach: REACH, from: [5.2, -0.15] }).ok).toBe(false);
  });

  it("a load clicked in empty space still goes on the nearest body (its line of action is what counts)", () => {
    const force = placed(placeCommand(file, scene, "force", [3.2, 0.5], TOL, { reach: REACH }));
    expect(force).toMatchObject({ body: "b2", at: [3.2, 0.5] });
  });

  it("outlineSpot picks the nearer of two outlines within reach, the last drawn when inside both", () => {
    const overlapping = buildScene({ ...emptySketch(), bodies: [newBody("a", [[0, 0], [2, 0], [2, 1], [0, 1]]), newBody("b", [[1, 0], [3, 0], [3, 1], [1, 1]])] });
    expect(outlineSpot(overlapping.bodies, [1.5, 0.5], 0.12, 0.09)?.body.id).toBe("b");
    const spot = outlineSpot(scene.bodies, [3.95, 0.5], 0.12, 0.09);
    expect(spot?.body.id).toBe("b2");
    expect(spot?.at).toEqual([4, 0.5]);
    expect(outlineSpot(scene.bodies, [3, 0.5], 0.12, 0.09)).toBeUndefined();
  });
});

describe("a body placed in one go", () => {
  // a phone's drawing: 390 × 420 px at the scratch sketch's 120 px/m
  const phone = { width: 390, height: 420 };
  const view: View = { scale: 120, x: 117, y: 294 };
  const screenBox = (centre: number[], size: number[]) => {
    const [a, b] = [toScreen(view, [centre[0] - size[0] / 2, centre[1] + size[1] / 2]), toScreen(view, [centre[0] + size[0] / 2, centre[1] - size[1] / 2])];
    return { x0: a[0], y0: a[1], x1: b[0], y1: b[1] };
  };

  it("is centred on a tap in the middle of a phone's drawing, 2 m × 1 m (240 px of 374)", () => {
    const tap: [number, number] = [0.6, 0];
    expect(bodyPlaceInView(tap, view, phone, 0.2)).toEqual({ centre: [0.6, 0], size: [2, 1] });
  });

  it("tapped near the right edge, is moved in by whole grid steps until it lies wholly in view", () => {
    // the tap at 2.2 m is 381 px, 9 px from the right edge: centred there the body would reach 119 px past 382
    const { centre, size } = bodyPlaceInView([2.2, 0.4], view, phone, 0.2);
    expect(size).toEqual([2, 1]);
    // 119 px is 0.99 m: 1 m in grid steps, so its right side is at 117 + 2.2 × 120 = 381 px
    expect(centre).toEqual([1.2, 0.4]);
    const box = screenBox(centre, size);
    expect(box.x1).toBeCloseTo(381, 9);
    expect(box.x0).toBeGreaterThanOrEqual(8);
  });

  it("tapped under the legend, is moved down below it", () => {
    const { centre, size } = bodyPlaceInView([0.6, 2.2], view, phone, 0.2);
    const box = screenBox(centre, size);
    expect(box.y0).toBeGreaterThanOrEqual(LEGEND_ROOM + 8);
    // 2.2 m is 30 px from the top, the body's top 30 px above it: down 82 px (0.68 m), 0.8 m on the grid
    expect(centre).toEqual([0.6, 1.4]);
  });

  it("takes a round size smaller when the default would fill more than two thirds of the drawing", () => {
    // at 200 px/m the default is still 2 m, 400 px: on the phone (374 px across) 1 m instead, on a laptop 2 m
    const close: View = { scale: 200, x: 195, y: 250 };
    expect(bodyPlaceInView([0, 0], close, phone, 0.1).size).toEqual([1, 0.5]);
    expect(bodyPlaceInView([0, 0], close, { width: 1200, height: 700 }, 0.1).size).toEqual([2, 1]);
    const rect = rectangleAround([0, 0], bodyPlaceInView([0, 0], close, phone, 0.1).size);
    expect(rect[1][0] - rect[0][0]).toBe(1);
  });

  it("leaves the point and size alone while the drawing is not measured", () => {
    expect(bodyPlaceInView([9, 9], view, { width: 0, height: 0 }, 0.2)).toEqual({ centre: [9, 9], size: [2, 1] });
  });
});
