// Placing without a pointer (the tray's keyboard route): which body, which spot on it, which way
// it points; the size of a body placed in one go; and a moving body's corners snapping to others.
// Geometry checked by hand on axis-aligned rectangles (midpoints, quarter points).
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { emptySketch } from "@/canvas/model/elements";
import { defaultBodySize, newBody, polygonAround, rectangleAround } from "@/canvas/model/factory";
import { placeWithoutPointer, spotOnBody, spotWords, targetBody } from "@/canvas/placement";
import { placedWords } from "@/canvas/actions";
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

  it("puts a pin, roller or contact near the left end of the bottom edge, a fixed support and a tie at the middle, forces on top, ports at the sides, couples at the centroid", () => {
    // an eighth of the 2 m edge in from its left corner
    expect(spotOnBody(body, "pin", [], tol)).toEqual([0.25, 0]);
    expect(spotOnBody(body, "contact", [], tol)).toEqual([0.25, 0]);
    expect(spotOnBody(body, "roller", [], tol)).toEqual([0.25, 0]);
    expect(spotOnBody(body, "fixed", [], tol)).toEqual([1, 0]);
    expect(spotOnBody(body, "tie", [], tol)).toEqual([1, 1]);
    expect(spotOnBody(body, "force", [], tol)).toEqual([1, 1]);
    expect(spotOnBody(body, "inlet", [], tol)).toEqual([0, 0.5]);
    expect(spotOnBody(body, "outlet", [], tol)).toEqual([2, 0.5]);
    const c = spotOnBody(body, "couple", [], tol);
    expect(c[0]).toBeCloseTo(1, 12);
    expect(c[1]).toBeCloseTo(0.5, 12);
  });

  it("moves along the edge past spots already taken: a fixed support's quarter points next", () => {
    const taken: Vec2[] = [[1, 0]];
    expect(spotOnBody(body, "fixed", taken, tol)).toEqual([0.5, 0]);
    expect(spotOnBody(body, "fixed", [...taken, [0.5, 0]], tol)).toEqual([1.5, 0]);
  });

  it("a second contact goes near the right end, so the pair stands on 1.5 m of a 2 m base; a third at the middle", () => {
    const first = spotOnBody(body, "contact", [], tol);
    const second = spotOnBody(body, "contact", [first], tol);
    expect(second).toEqual([1.75, 0]);
    expect(second[0] - first[0]).toBe(1.5);
    expect(spotOnBody(body, "contact", [first, second], tol)).toEqual([1, 0]);
    // a pin then a roller: the two ends as well (a simply supported body)
    expect(spotOnBody(body, "roller", [spotOnBody(body, "pin", [], tol)], tol)).toEqual([1.75, 0]);
  });

  it("takes the left end first whichever way the outline was drawn (clockwise here)", () => {
    const cw = buildScene({ ...emptySketch(), bodies: [newBody("c", [[0, 0], [0, 1], [4, 1], [4, 0]])] }).bodies[0];
    expect(spotOnBody(cw, "contact", [], tol)).toEqual([0.5, 0]);
    expect(spotOnBody(cw, "contact", [[0.5, 0]], tol)).toEqual([3.5, 0]);
  });

  it("on a triangle with a sloping side takes the edge that faces down", () => {
    const tri = buildScene({ ...emptySketch(), bodies: [newBody("t", [[0, 0], [4, 0], [0, 3]])] }).bodies[0];
    expect(spotOnBody(tri, "fixed", [], tol)).toEqual([2, 0]);
    // the top: the sloping edge faces up and right (its normal (3, 4)/5), the left edge faces left
    expect(spotOnBody(tri, "force", [], tol)).toEqual([2, 1.5]);
  });
});

describe("the words for where a keyboard placement went", () => {
  it("name the edge and the end, and how far an arrow key moves it at the zoom", () => {
    expect(spotWords({ edge: "bottom", along: 0.125 })).toBe("near the left end of its bottom edge");
    expect(spotWords({ edge: "bottom", along: 0.875 })).toBe("near the right end of its bottom edge");
    expect(spotWords({ edge: "top", along: 0.5 })).toBe("at the middle of its top edge");
    expect(spotWords({ edge: "right", along: 0.25 })).toBe("below the middle of its right side");
    expect(spotWords({ edge: "centroid", along: 0.5 })).toBe("at its centroid");
    // 120 px a metre: the grid (the nudge's step) is the first round step at least 18 px long, 0.2 m
    expect(placedWords({ at: [0.25, -0.5], place: { edge: "bottom", along: 0.125 } }, 120)).toBe(
      "near the left end of its bottom edge (x = 0.25 m, y = -0.5 m). Arrow keys move it 0.2 m a press, Shift+arrow 2 m.",
    );
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
  it("places a roller under the selected body, near its left end, pointing up into it, and says where", () => {
    const sketch = twoBodies();
    const out = placeWithoutPointer(sketch, buildScene(sketch), "roller", { selection: ["b1"], viewCentre: [5, 0], tol: 0.05 });
    if (!out.ok) throw new Error(out.message);
    expect(out.body).toBe("b1");
    expect(out.place).toEqual({ edge: "bottom", along: 0.125 });
    const after = runCommand(sketch, out.command);
    expect(after.supports[1]).toEqual({ id: "s2", body: "b1", kind: "roller", at: [0.25, 0], angle: 90 });
  });

  it("two contacts with friction one after the other stand near the two ends of the base", () => {
    let sketch = twoBodies();
    for (let i = 0; i < 2; i++) {
      const out = placeWithoutPointer(sketch, buildScene(sketch), "contact", { selection: ["b1"], viewCentre: [0, 0], tol: 0.05, friction: true });
      if (!out.ok) throw new Error(out.message);
      sketch = runCommand(sketch, out.command);
    }
    const mine = sketch.supports.filter((x) => x.body === "b1");
    expect(mine.map((x) => x.at)).toEqual([[0.25, 0], [1.75, 0]]);
    expect(mine.every((x) => x.kind === "contact" && x.angle === 90)).toBe(true);
  });

  it("an outlet goes on the right-hand side, flowing out (0°); the pin already there pushes a new pin along", () => {
    const sketch = twoBodies();
    const outlet = placeWithoutPointer(sketch, buildScene(sketch), "outlet", { selection: [], viewCentre: [5, 0], tol: 0.05 });
    if (!outlet.ok) throw new Error(outlet.message);
    expect(runCommand(sketch, outlet.command).ports[0]).toMatchObject({ body: "b2", at: [6, 0.5], angle: 0 });
    // the pin s1 stands at the middle (5, 0): a new pin still takes the left end first
    const pin = placeWithoutPointer(sketch, buildScene(sketch), "pin", { selection: ["s1"], viewCentre: [0, 0], tol: 0.05 });
    if (!pin.ok) throw new Error(pin.message);
    expect(runCommand(sketch, pin.command).supports[1]).toMatchObject({ body: "b2", at: [4.25, 0] });
    const fixed = placeWithoutPointer(sketch, buildScene(sketch), "fixed", { selection: ["s1"], viewCentre: [0, 0], tol: 0.05 });
    if (!fixed.ok) throw new Error(fixed.message);
    expect(runCommand(sketch, fixed.command).supports[1]).toMatchObject({ body: "b2", at: [4.5, 0] });
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
