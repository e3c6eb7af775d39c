// Plane geometry of the editor: views, snapping, placing on a body, box selection, the scene.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { fitView, gridStep, toScreen, toWorld, zoomAt } from "@/canvas/geometry/view";
import { snapPoint, snapTo } from "@/canvas/geometry/snap";
import { isAxisRectangle, nearestOnOutline, outwardNormal, pointInPolygon, normaliseAngle } from "@/canvas/geometry/polygon";
import { angleOnEdge, bodyAt, elementsInBox, placeCommand } from "@/canvas/placement";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { toNumeric, numericText, roundTo } from "@/canvas/model/numeric";
import { parseSketch } from "@/solver/index";

const square: [number, number][] = [[0, 0], [2, 0], [2, 1], [0, 1]];

describe("view", () => {
  it("maps world to screen and back, y up on paper, y down on screen", () => {
    const v = { scale: 100, x: 50, y: 400 };
    expect(toScreen(v, [1, 2])).toEqual([150, 200]);
    expect(toWorld(v, [150, 200])).toEqual([1, 2]);
  });
  it("zooms about the pointer: the world point under it stays", () => {
    const v = { scale: 100, x: 50, y: 400 };
    const z = zoomAt(v, 2, [250, 300]);
    expect(z.scale).toBe(200);
    expect(toWorld(z, [250, 300])).toEqual(toWorld(v, [250, 300]));
  });
  it("fits a box inside the screen with margins and picks round grid steps", () => {
    const v = fitView({ minX: 0, minY: 0, maxX: 4, maxY: 2 }, 1000, 600, 100);
    expect(v.scale).toBe(200);
    expect(toScreen(v, [2, 1])).toEqual([500, 300]);
    expect(gridStep(120)).toBe(0.2);
    expect(gridStep(1000)).toBe(0.02);
    expect(snapTo(0.30000000000000004, 0.1)).toBe(0.3);
  });
});

describe("snapping", () => {
  const bodies = [{ id: "b1", outline: square }];
  it("prefers a corner, then an edge (on the grid along it), then the grid", () => {
    expect(snapPoint([1.97, 0.04], { bodies, grid: 0.1, tolerance: 0.08 })).toMatchObject({ kind: "corner", point: [2, 0], body: "b1" });
    expect(snapPoint([1.23, 0.03], { bodies, grid: 0.1, tolerance: 0.08 })).toMatchObject({ kind: "edge", point: [1.2, 0], edge: 0 });
    expect(snapPoint([3.26, 2.04], { bodies, grid: 0.1, tolerance: 0.08 })).toMatchObject({ kind: "grid", point: [3.3, 2] });
  });
  it("keeps where the dragged point began while the pointer is near it: before the grid, the grid along an edge, and a farther corner", () => {
    const o = { bodies, grid: 0.1, tolerance: 0.08 };
    // typed at (3.27, 2.04): a wobble of 0.05 leaves it there; 0.09 away the grid has it
    expect(snapPoint([3.3, 2.0], { ...o, keep: [3.27, 2.04] })).toEqual({ point: [3.27, 2.04], kind: "none" });
    expect(snapPoint([3.36, 2.0], { ...o, keep: [3.27, 2.04] })).toMatchObject({ kind: "grid", point: [3.4, 2] });
    // on the bottom edge at x = 1.23: still on the edge (the mark says so), not moved to 1.2
    expect(snapPoint([1.25, -0.03], { ...o, keep: [1.23, 0] })).toEqual({ point: [1.23, 0], kind: "edge", body: "b1", edge: 0 });
    // typed 0.05 off the corner (2, 0): nearer the typed place it stays; nearer the corner it goes there
    expect(snapPoint([1.95, 0.06], { ...o, keep: [1.95, 0.05] })).toEqual({ point: [1.95, 0.05], kind: "none" });
    expect(snapPoint([1.99, 0.01], { ...o, keep: [1.95, 0.05] })).toMatchObject({ kind: "corner", point: [2, 0] });
  });
  it("is off while the key is held, and ignores the body being dragged", () => {
    expect(snapPoint([1.97, 0.04], { bodies, grid: 0.1, tolerance: 0.08, enabled: false })).toEqual({ point: [1.97, 0.04], kind: "none" });
    expect(snapPoint([1.97, 0.04], { bodies, grid: 0.1, tolerance: 0.08, exclude: new Set(["b1"]) }).kind).toBe("grid");
  });
});

describe("polygons", () => {
  it("hit-tests, finds the nearest edge and its outward normal either way round", () => {
    expect(pointInPolygon([1, 0.5], square)).toBe(true);
    expect(pointInPolygon([3, 0.5], square)).toBe(false);
    expect(nearestOnOutline([1, -0.2], square)).toMatchObject({ edge: 0, point: [1, 0] });
    expect(outwardNormal(square, 0)).toEqual([0, -1]);
    expect(outwardNormal([...square].reverse(), 2)).toEqual([0, -1]);
    expect(isAxisRectangle(square)).toBe(true);
    expect(isAxisRectangle([[0, 0], [2, 0], [2, 1], [0.5, 1]])).toBe(false);
    expect(normaliseAngle(-180)).toBe(180);
    expect(normaliseAngle(270)).toBe(-90);
  });
});

describe("placing", () => {
  const file: SketchFile = { ...emptySketch(), bodies: [newBody("b1", square), newBody("b2", [[5, 0], [6, 0], [6, 1], [5, 1]])] };
  const scene = buildScene(file);
  it("attaches a load to the body under the point, else the nearest; a support only on or near an outline", () => {
    expect(bodyAt(scene.bodies, [1, 0.5], 0.05)?.id).toBe("b1");
    expect(bodyAt(scene.bodies, [6.03, 0.5], 0.05)?.id).toBe("b2");
    const force = placeCommand(file, scene, "force", [4.2, 0], 0.05);
    expect(force.ok && (force.command.args as { element: { body: string } }).element.body).toBe("b2");
    // 0.8 m from the nearest outline: a pin there would belong to no body
    expect(placeCommand(file, scene, "pin", [4.2, 0], 0.05)).toEqual({ ok: false, message: "Click on or near a body's outline to place a support." });
  });
  it("points a contact into the body and an outlet out of it when placed on an edge", () => {
    const b = scene.bodies[0];
    expect(angleOnEdge("contact", b, [1, 0], 0.05)).toBe(90);
    expect(angleOnEdge("outlet", b, [2, 0.5], 0.05)).toBe(0);
    expect(angleOnEdge("inlet", b, [0, 0.5], 0.05)).toBe(0);
    expect(angleOnEdge("tie", b, [1, 1], 0.05)).toBe(90);
    expect(angleOnEdge("contact", b, [1, 0.5], 0.05)).toBe(90);
  });
  it("refuses to place a support with no body drawn", () => {
    const out = placeCommand(emptySketch(), buildScene(emptySketch()), "pin", [0, 0], 0.05);
    expect(out).toEqual({ ok: false, message: expect.stringMatching(/Draw a body first/) });
  });
  it("selects bodies wholly inside a box and elements by their anchor", () => {
    expect(elementsInBox(scene, { minX: -1, minY: -1, maxX: 3, maxY: 2 })).toEqual(["b1"]);
  });
});

describe("scene", () => {
  it("reads expressions through the last parse's values, by element id", () => {
    const file: SketchFile = {
      ...emptySketch(),
      parameters: { w: "3 m" },
      bodies: [{ id: "b1", outline: [[0, 0], ["w", 0], ["w", 1], [0, 1]], mass: "2 tonne" }],
      supports: [{ id: "s1", body: "b1", kind: "roller", at: ["w/2", 0], angle: "90 deg" }],
    };
    const p = parseSketch(file);
    const fv = fieldValuesById(file, p.fields);
    expect(fv.values.get("s1.at[0]")).toBe(1.5);
    const scene = buildScene(file, fv);
    expect(scene.byId.get("s1")).toMatchObject({ kind: "roller", at: [1.5, 0], angle: 90 });
    expect(scene.bodies[0]).toMatchObject({ mass: 2000, cg: [1.5, 0.5], cgGiven: false });
    // unchanged elements keep their scene objects
    const again = buildScene({ ...file, supports: [...file.supports] }, fv);
    expect(again.byId.get("s1")).toBe(scene.byId.get("s1"));
  });
  it("turns typed text into stored values", () => {
    expect(toNumeric(" 12.5 ")).toBe(12.5);
    expect(toNumeric("−3")).toBe(-3);
    expect(toNumeric("350 psi")).toBe("350 psi");
    expect(toNumeric("  ")).toBeUndefined();
    expect(numericText(0.1 + 0.2)).toBe("0.3");
    expect(roundTo(1.23456789, 1e-3)).toBe(1.235);
  });
});

describe("fit to view", () => {
  it("keeps every symbol, label and reaction arrow of each example on the canvas and clear of the legend", async () => {
    const { EXAMPLES } = await import("@/canvas/examples");
    const { fitScene, LEGEND_ROOM } = await import("@/canvas/geometry/fit");
    const { scenePrims } = await import("@/canvas/render/scenePrims");
    const { primsBox } = await import("@/canvas/render/prims");
    const { solve } = await import("@/solver/index");
    for (const ex of EXAMPLES) {
      const parsed = parseSketch(ex.sketch);
      if (!parsed.ok) throw new Error(ex.id);
      const result = solve(parsed.sketch);
      const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
      for (const [W, H] of [[870, 510], [1200, 700], [600, 420]]) {
        const v = fitScene(scene, W, H, { result });
        const { groups, results } = scenePrims(scene, v.scale, "SI", result);
        const p = primsBox([...groups.flatMap((g) => g.prims), ...results]);
        const where = `${ex.id} at ${W}×${H}`;
        expect(v.x + p.minX, where).toBeGreaterThanOrEqual(0);
        expect(v.x + p.maxX, where).toBeLessThanOrEqual(W);
        expect(v.y + p.minY, where).toBeGreaterThanOrEqual(LEGEND_ROOM);
        expect(v.y + p.maxY, where).toBeLessThanOrEqual(H);
      }
    }
  });

  it("on a phone-sized canvas the body is drawn whole and gets at least 30% of the width", async () => {
    const { exampleById } = await import("@/canvas/examples");
    const { fitScene } = await import("@/canvas/geometry/fit");
    const { solve } = await import("@/solver/index");
    const parsed = parseSketch(exampleById("pump-skid")!.sketch);
    if (!parsed.ok) throw new Error("pump-skid");
    const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
    const [W, H] = [390, 446];
    const v = fitScene(scene, W, H, { result: solve(parsed.sketch) });
    const xs = scene.bodies.flatMap((b) => b.outline.map((p) => toScreen(v, p)[0]));
    const left = Math.min(...xs);
    const right = Math.max(...xs);
    // before, the labels' room left it 40 px: 15 px/m, pushed against one side
    expect(right - left).toBeGreaterThanOrEqual(0.3 * W - 1);
    expect(left).toBeGreaterThanOrEqual(0);
    expect(right).toBeLessThanOrEqual(W);
  });

  it("on a phone-sized canvas the labels of one side may reach past the edge, never both: every example's reactions are drawn whole", async () => {
    const { EXAMPLES } = await import("@/canvas/examples");
    const { fitScene } = await import("@/canvas/geometry/fit");
    const { scenePrims } = await import("@/canvas/render/scenePrims");
    const { primsBox } = await import("@/canvas/render/prims");
    const { solve } = await import("@/solver/index");
    const [W, H] = [390, 446];
    for (const ex of EXAMPLES) {
      const parsed = parseSketch(ex.sketch);
      if (!parsed.ok) throw new Error(ex.id);
      const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
      const result = solve(parsed.sketch);
      const v = fitScene(scene, W, H, { result });
      const { groups, results } = scenePrims(scene, v.scale, "SI", result);
      const r = primsBox(results);
      expect(v.x + r.minX, ex.id).toBeGreaterThanOrEqual(0);
      expect(v.x + r.maxX, ex.id).toBeLessThanOrEqual(W);
      const all = primsBox([...results, ...groups.flatMap((g) => g.prims)]);
      expect(v.x + all.minX >= 0 || v.x + all.maxX <= W, `${ex.id}: cut on both sides`).toBe(true);
    }
  });
});
