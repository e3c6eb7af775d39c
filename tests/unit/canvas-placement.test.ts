// Placing without a pointer (the tray's keyboard route): which body, which spot on it, which way
// it points; the size of a body placed in one go; and a moving body's corners snapping to others.
// Geometry checked by hand on axis-aligned rectangles (midpoints, quarter points).
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { emptySketch } from "@/canvas/model/elements";
import { defaultBodySize, newBody, polygonAround, rectangleAround } from "@/canvas/model/factory";
import { placeWithoutPointer, spotOnBody, targetBody } from "@/canvas/placement";
import { buildScene } from "@/canvas/scene";
import { runCommand } from "@/canvas/commands/define";
import { snapCorners } from "@/canvas/geometry/snap";

function twoBodies(): SketchFile {
  return {
    ...emptySketch("Two crates"),
    bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]], "Left"), newBody("b2", [[4, 0], [6, 0], [6, 1], [4, 1]], "Right")],
    supports: [{ id: "s1", body: "b2", kind: "pin", at: [5, 0] }],
  };
}

describe("defaultBodySize", () => {
  it("is 2 m × 1 m at ordinary zoom and a power of ten larger or smaller far out or close in", () => {
    expect(defaultBodySize(120)).toEqual([2, 1]);
    expect(defaultBodySize(40)).toEqual([2, 1]);
    expect(defaultBodySize(10)).toEqual([20, 10]);
    expect(defaultBodySize(1000)).toEqual([0.2, 0.1]);
  });

  it("a rectangle and a polygon around a centre keep that centre and size", () => {
    expect(rectangleAround([1, 3], [2, 1])).toEqual([[0, 2.5], [2, 2.5], [2, 3.5], [0, 3.5]]);
    const poly = polygonAround([0, 0], [2, 1]);
    expect(poly).toHaveLength(4);
    expect(Math.min(...poly.map((p) => p[0]))).toBe(-1);
    expect(Math.max(...poly.map((p) => p[1]))).toBe(0.5);
  });
});

describe("spotOnBody", () => {
  const body = buildScene(twoBodies()).bodies[0];
  const tol = 0.05;

  it("puts supports at the middle of the bottom edge, ties and forces on top, ports at the sides, couples at the centroid", () => {
    expect(spotOnBody(body, "pin", [], tol)).toEqual([1, 0]);
    expect(spotOnBody(body, "contact", [], tol)).toEqual([1, 0]);
    expect(spotOnBody(body, "tie", [], tol)).toEqual([1, 1]);
    expect(spotOnBody(body, "force", [], tol)).toEqual([1, 1]);
    expect(spotOnBody(body, "inlet", [], tol)).toEqual([0, 0.5]);
    expect(spotOnBody(body, "outlet", [], tol)).toEqual([2, 0.5]);
    const c = spotOnBody(body, "couple", [], tol);
    expect(c[0]).toBeCloseTo(1, 12);
    expect(c[1]).toBeCloseTo(0.5, 12);
  });

  it("moves along the edge past spots already taken: the quarter points next", () => {
    const taken: Vec2[] = [[1, 0]];
    expect(spotOnBody(body, "pin", taken, tol)).toEqual([0.5, 0]);
    expect(spotOnBody(body, "pin", [...taken, [0.5, 0]], tol)).toEqual([1.5, 0]);
  });

  it("on a triangle with a sloping side takes the edge that faces down", () => {
    const tri = buildScene({ ...emptySketch(), bodies: [newBody("t", [[0, 0], [4, 0], [0, 3]])] }).bodies[0];
    expect(spotOnBody(tri, "fixed", [], tol)).toEqual([2, 0]);
    // the top: the sloping edge faces up and right (its normal (3, 4)/5), the left edge faces left
    expect(spotOnBody(tri, "force", [], tol)).toEqual([2, 1.5]);
  });
});

describe("targetBody", () => {
  const sketch = twoBodies();
  const scene = buildScene(sketch);
  it("is the selected body, or the body of the selected element, or else the body nearest the middle of the view", () => {
    expect(targetBody(sketch, scene, ["b2"], [0, 0])?.id).toBe("b2");
    expect(targetBody(sketch, scene, ["s1"], [0, 0])?.id).toBe("b2");
    expect(targetBody(sketch, scene, [], [1, 5])?.id).toBe("b1");
    expect(targetBody(sketch, scene, [], [5.5, -3])?.id).toBe("b2");
    expect(targetBody(emptySketch(), buildScene(emptySketch()), [], [0, 0])).toBeUndefined();
  });
});

describe("placeWithoutPointer", () => {
  it("places a roller under the selected body, pointing up into it", () => {
    const sketch = twoBodies();
    const out = placeWithoutPointer(sketch, buildScene(sketch), "roller", { selection: ["b1"], viewCentre: [5, 0], tol: 0.05 });
    if (!out.ok) throw new Error(out.message);
    expect(out.body).toBe("b1");
    const after = runCommand(sketch, out.command);
    expect(after.supports[1]).toEqual({ id: "s2", body: "b1", kind: "roller", at: [1, 0], angle: 90 });
  });

  it("an outlet goes on the right-hand side, flowing out (0°); the pin already there pushes a new pin along", () => {
    const sketch = twoBodies();
    const outlet = placeWithoutPointer(sketch, buildScene(sketch), "outlet", { selection: [], viewCentre: [5, 0], tol: 0.05 });
    if (!outlet.ok) throw new Error(outlet.message);
    expect(runCommand(sketch, outlet.command).ports[0]).toMatchObject({ body: "b2", at: [6, 0.5], angle: 0 });
    const pin = placeWithoutPointer(sketch, buildScene(sketch), "pin", { selection: ["s1"], viewCentre: [0, 0], tol: 0.05 });
    if (!pin.ok) throw new Error(pin.message);
    expect(runCommand(sketch, pin.command).supports[1]).toMatchObject({ body: "b2", at: [4.5, 0] });
  });

  it("without a body says to draw one first", () => {
    const out = placeWithoutPointer(emptySketch(), buildScene(emptySketch()), "pin", { selection: [], viewCentre: [0, 0], tol: 0.05 });
    expect(out).toEqual({ ok: false, message: expect.stringMatching(/^Draw a body first/) });
  });
});

describe("snapCorners", () => {
  const bodies = [{ id: "b2", outline: [[4, 0], [6, 0], [6, 1], [4, 1]] as Vec2[] }];
  const o = { bodies, grid: 0.2, tolerance: 0.09 };

  it("takes the moving corner nearest a corner, and a corner over any edge", () => {
    // (3.95, 1.05) is 0.071 m from the corner (4, 1); (4.02, 0.5) is only 0.02 m from the edge x = 4
    const r = snapCorners([[3.95, 1.05], [4.02, 0.5]], o);
    expect(r).toMatchObject({ kind: "corner", point: [4, 1], from: [3.95, 1.05], body: "b2" });
  });

  it("is null when nothing is near, when turned off, and for the bodies left out", () => {
    expect(snapCorners([[3, 3]], o)).toBeNull();
    expect(snapCorners([[3.95, 1.05]], { ...o, enabled: false })).toBeNull();
    expect(snapCorners([[3.95, 1.05]], { ...o, exclude: new Set(["b2"]) })).toBeNull();
  });
});
