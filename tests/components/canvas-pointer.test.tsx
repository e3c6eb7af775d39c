// The canvas's pointer controller (jsdom, no Konva): a drag is one undo step and Escape rolls it
// back (from the keyboard too); a support dropped on another body attaches to it; handles turn
// and reshape; tools place; a finger is forgotten when it lifts; a finished drag is autosaved;
// a dragged body snaps to other bodies; tray items dropped on the canvas place what they show.
import { fireEvent, render } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { createInteractionStore } from "@/canvas/konva/interaction";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { toolHint } from "@/canvas/actions";
import { startAutosave } from "@/canvas/autosave";
import type { SketchPersistence } from "@/canvas/persistence";
import { HarnessKeys, pointerHarness } from "./pointer-harness";

function sketch(): SketchFile {
  return {
    ...emptySketch("Two crates"),
    bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]], "Left"), newBody("b2", [[4, 0], [6, 0], [6, 1], [4, 1]], "Right")],
    supports: [{ id: "s1", body: "b1", kind: "contact", at: [1, 0], angle: 90 }],
    ports: [{ id: "p1", body: "b1", kind: "outlet", at: [2, 0.5], angle: 0, massFlow: 1, velocity: 1 }],
  };
}

const h = pointerHarness(sketch);
const { ed, el, screenOf, down, pointer, fingerDown, finger } = h;

describe("dragging", () => {
  it("moves the element with the pointer, snapped, as one undo step", () => {
    h.hit = { type: "element", id: "s1" };
    down(1, 0);
    expect(ed().selection).toEqual(["s1"]);
    for (const x of [1.1, 1.25, 1.38, 1.52]) pointer("pointermove", x, 0);
    pointer("pointerup", 1.52, 0);
    // the grid at 100 px/m is 0.2 m; on the bottom edge the anchor stays on the edge
    expect(el("s1").at).toEqual([1.6, 0]);
    expect(ed().past).toHaveLength(1);
    ed().undo();
    expect(el("s1").at).toEqual([1, 0]);
  });

  it("rolls the drag back on Escape, recording nothing", () => {
    h.hit = { type: "element", id: "s1" };
    down(1, 0);
    pointer("pointermove", 1.7, 0.4);
    expect(el("s1").at).not.toEqual([1, 0]);
    expect(h.controller.cancel()).toBe(true);
    expect(el("s1").at).toEqual([1, 0]);
    expect(ed().past).toHaveLength(0);
    pointer("pointerup", 1.7, 0.4);
    expect(ed().past).toHaveLength(0);
  });

  it("attaches a support dropped on another body to that body, in the same step", () => {
    h.hit = { type: "element", id: "s1" };
    down(1, 0);
    pointer("pointermove", 5, 0);
    pointer("pointerup", 5, 0);
    expect(el("s1")).toMatchObject({ body: "b2", at: [5, 0] });
    expect(ed().past).toHaveLength(1);
    ed().undo();
    expect(el("s1")).toMatchObject({ body: "b1", at: [1, 0] });
  });

  it("moves a body with its elements; Alt turns snapping off", () => {
    h.hit = { type: "element", id: "b1" };
    down(1, 0.5);
    pointer("pointermove", 1.33, 0.5, { altKey: true });
    pointer("pointerup", 1.33, 0.5, { altKey: true });
    expect((ed().sketch.bodies[0].outline[0] as number[])[0]).toBeCloseTo(0.33, 9);
    expect((el("s1").at as number[])[0]).toBeCloseTo(1.33, 9);
    expect((el("p1").at as number[])[0]).toBeCloseTo(2.33, 9);
  });

  it("a click without movement only selects", () => {
    h.hit = { type: "element", id: "p1" };
    down(2, 0.5);
    pointer("pointerup", 2, 0.5);
    expect(ed().selection).toEqual(["p1"]);
    expect(ed().past).toHaveLength(0);
  });
});

describe("dragging a body near another body", () => {
  // a third body off the grid (grid step 0.2 m at 100 px/m), so a corner snap cannot be mistaken for the grid's
  const addOffGrid = () =>
    ed().reset({ ...ed().sketch, bodies: [...ed().sketch.bodies, newBody("b3", [[3.03, 2.07], [4.03, 2.07], [4.03, 3.07], [3.03, 3.07]], "Off grid")] });
  const outline = (id: string) => ed().sketch.bodies.find((b) => b.id === id)!.outline;

  it("lands its nearest corner exactly on the other body's corner, showing the corner mark, as one undo step", () => {
    addOffGrid();
    h.hit = { type: "element", id: "b1" };
    down(1, 0.5);
    // b1's top-right corner (2, 1) is carried to (3.0, 2.1): 0.042 m from b3's corner (3.03, 2.07), within 9 px
    pointer("pointermove", 2, 1.6);
    expect(h.interaction.getState().snap).toMatchObject({ kind: "corner", body: "b3", point: [3.03, 2.07] });
    pointer("pointerup", 2, 1.6);
    expect(outline("b1")).toEqual([[1.03, 1.07], [3.03, 1.07], [3.03, 2.07], [1.03, 2.07]]);
    // the body's elements go with it
    expect(el("s1").at).toEqual([2.03, 1.07]);
    expect(h.interaction.getState().snap).toBeNull();
    expect(ed().past).toHaveLength(1);
    ed().undo();
    expect(outline("b1")).toEqual([[0, 0], [2, 0], [2, 1], [0, 1]]);
  });

  it("with Alt held moves by the pointer alone: no corner, no grid, no mark", () => {
    addOffGrid();
    h.hit = { type: "element", id: "b1" };
    down(1, 0.5);
    pointer("pointermove", 2, 1.6, { altKey: true });
    expect(h.interaction.getState().snap).toBeNull();
    pointer("pointerup", 2, 1.6, { altKey: true });
    const [x, y] = outline("b1")[2] as number[];
    expect(x).toBeCloseTo(3, 9);
    expect(y).toBeCloseTo(2.1, 9);
  });

  it("puts a corner on another body's edge, keeping to the grid along it", () => {
    addOffGrid();
    h.hit = { type: "element", id: "b1" };
    down(1, 0.5);
    // b1's bottom-right corner (2, 0) is carried to (3.0, 2.45): 0.03 m from b3's left edge x = 3.03,
    // and along that edge y keeps to the grid's 2.4
    pointer("pointermove", 2, 2.95);
    expect(h.interaction.getState().snap).toMatchObject({ kind: "edge", body: "b3", point: [3.03, 2.4] });
    pointer("pointerup", 2, 2.95);
    expect(outline("b1")).toEqual([[1.03, 2.4], [3.03, 2.4], [3.03, 3.4], [1.03, 3.4]]);
  });

  it("away from other bodies keeps the move on the grid, with no mark", () => {
    h.hit = { type: "element", id: "b1" };
    down(1, 0.5);
    pointer("pointermove", 1.33, 2.47);
    expect(h.interaction.getState().snap).toBeNull();
    pointer("pointerup", 1.33, 2.47);
    expect(outline("b1")[0]).toEqual([0.4, 2]);
  });
});

describe("dropping a tray item on the canvas", () => {
  const drop = (what: Parameters<typeof h.controller.drop>[0], x: number, y: number, altKey = false) => h.controller.drop(what, { ...screenOf(x, y), altKey });

  it("a rectangle body: 2 m × 1 m centred on the snapped drop point, selected, one undo step", () => {
    drop({ kind: "body" }, 1.03, 3.08);
    // the centre snaps to the 0.2 m grid: (1.0, 3.0)
    expect(ed().sketch.bodies[2]).toMatchObject({ id: "b3", outline: [[0, 2.5], [2, 2.5], [2, 3.5], [0, 3.5]] });
    expect(ed().selection).toEqual(["b3"]);
    expect(ed().tool.kind).toBe("select");
    expect(ed().notice).toBe("Body added, 2 m × 1 m. Drag its corners to reshape it.");
    expect(ed().past).toHaveLength(1);
    ed().undo();
    expect(ed().sketch.bodies).toHaveLength(2);
  });

  it("a rectangle body when zoomed far out is ten times the size, so it is not a speck", () => {
    ed().setView({ scale: 10, x: 100, y: 500 });
    h.controller.drop({ kind: "body" }, { clientX: 100 + 30 * 10, clientY: 500 - 36 * 10, altKey: false });
    expect(ed().sketch.bodies[2].outline).toEqual([[20, 31], [40, 31], [40, 41], [20, 41]]);
  });

  it("a polygon body starts the polygon tool with its first corner at the drop point; clicks add the rest", () => {
    drop({ kind: "body", polygon: true }, 0.02, 3.01);
    expect(ed().tool).toEqual({ kind: "body", shape: "polygon", points: [[0, 3]] });
    expect(ed().sketch.bodies).toHaveLength(2);
    // the status line's hint, read from the tool, says so
    expect(toolHint(ed().tool)).toMatch(/^Polygon body: 1 corner placed\. Click each next corner/);
    for (const [x, y] of [[2, 3], [1, 4.4]]) down(x, y);
    h.controller.finishPolygon();
    expect(ed().sketch.bodies[2]).toMatchObject({ id: "b3", outline: [[0, 3], [2, 3], [1, 4.4]] });
    expect(ed().past).toHaveLength(1);
  });

  it("a contact with friction lands on the body's edge, pointing into it, selected", () => {
    drop({ kind: "contact", friction: true }, 5.02, 1.03);
    expect(ed().sketch.supports[1]).toMatchObject({ id: "s2", body: "b2", kind: "contact", at: [5, 1], angle: -90, mu: 0.3 });
    expect(ed().selection).toEqual(["s2"]);
  });

  it("a support with no body in the sketch says why and adds nothing", () => {
    ed().reset(emptySketch());
    drop({ kind: "pin" }, 1, 1);
    expect(ed().sketch.supports).toHaveLength(0);
    expect(ed().notice).toMatch(/^Draw a body first/);
  });
});

describe("handles", () => {
  it("turns a port with its handle in 5° steps", () => {
    h.hit = { type: "rotate", id: "p1" };
    down(2.66, 0.5);
    pointer("pointermove", 2.5, 1.03);
    pointer("pointerup", 2.5, 1.03);
    // direction from the port (2, 0.5) to the pointer: atan2(0.53, 0.5) = 46.7° → 45°
    expect(el("p1").angle).toBe(45);
    expect(ed().past).toHaveLength(1);
  });

  it("reshapes a rectangle by its corner, keeping it a rectangle", () => {
    h.hit = { type: "corner", id: "b1", index: 2 };
    down(2, 1);
    pointer("pointermove", 2.8, 1.6);
    pointer("pointerup", 2.8, 1.6);
    expect(ed().sketch.bodies[0].outline).toEqual([[0, 0], [2.8, 0], [2.8, 1.6], [0, 1.6]]);
  });
});

describe("several elements at once", () => {
  it("Shift+click adds to the selection and takes away again; a drag moves them all, one undo step", () => {
    h.hit = { type: "element", id: "s1" };
    down(1, 0);
    pointer("pointerup", 1, 0);
    h.hit = { type: "element", id: "b2" };
    down(5, 0.5, { shiftKey: true });
    pointer("pointerup", 5, 0.5);
    expect(ed().selection).toEqual(["s1", "b2"]);
    h.hit = { type: "element", id: "p1" };
    down(2, 0.5, { shiftKey: true });
    pointer("pointerup", 2, 0.5);
    expect(ed().selection).toEqual(["s1", "b2", "p1"]);
    down(2, 0.5, { shiftKey: true });
    pointer("pointerup", 2, 0.5);
    expect(ed().selection).toEqual(["s1", "b2"]);
    // dragging one of them carries the others by the same step
    h.hit = { type: "element", id: "s1" };
    down(1, 0);
    pointer("pointermove", 1.6, 0);
    pointer("pointerup", 1.6, 0);
    expect(el("s1").at).toEqual([1.6, 0]);
    expect(ed().sketch.bodies[1].outline[0]).toEqual([4.6, 0]);
    expect(ed().sketch.bodies[0].outline[0]).toEqual([0, 0]);
    expect(ed().past).toHaveLength(1);
  });
});

describe("a held Alt turns snapping off", () => {
  it("for a dragged support: it follows the pointer, off the grid", () => {
    h.hit = { type: "element", id: "s1" };
    down(1, 0);
    pointer("pointermove", 1.33, 0.07, { altKey: true });
    expect(h.interaction.getState().snap).toBeNull();
    pointer("pointerup", 1.33, 0.07, { altKey: true });
    const [x, y] = el("s1").at as number[];
    expect(x).toBeCloseTo(1.33, 9);
    expect(y).toBeCloseTo(0.07, 9);
  });

  it("for a click that places: the pin goes where clicked, not onto the grid", () => {
    ed().setTool({ kind: "place", element: "pin" });
    down(5.33, 0.47, { altKey: true });
    const [x, y] = ed().sketch.supports[1].at as number[];
    expect(x).toBeCloseTo(5.33, 9);
    expect(y).toBeCloseTo(0.47, 9);
    // without Alt the same click lands on the grid (0.2 m at 100 px/m)
    ed().undo();
    ed().setTool({ kind: "place", element: "pin" });
    down(5.33, 0.47);
    expect(ed().sketch.supports[1].at).toEqual([5.4, 0.4]);
  });

  it("for a tray item dropped on the canvas: the body is centred on the drop point itself", () => {
    h.controller.drop({ kind: "body" }, { ...screenOf(1.03, 3.08), altKey: true });
    const [x0, y0] = ed().sketch.bodies[2].outline[0] as number[];
    expect(x0).toBeCloseTo(0.03, 9);
    expect(y0).toBeCloseTo(2.58, 9);
  });

  it("and the snap switch turns it off for good", () => {
    ed().setSnap(false);
    h.hit = { type: "element", id: "s1" };
    down(1, 0);
    pointer("pointermove", 1.33, 0.07);
    pointer("pointerup", 1.33, 0.07);
    expect((el("s1").at as number[])[0]).toBeCloseTo(1.33, 9);
  });
});

describe("zoom and pan", () => {
  it("pinches with two fingers: zooms about their midpoint and follows it", () => {
    const touch = (id: number, x: number, y: number) => fingerDown(id, { clientX: x, clientY: y });
    const move = (id: number, x: number, y: number) => finger("pointermove", id, { clientX: x, clientY: y });
    touch(1, 300, 300);
    touch(2, 400, 300);
    move(2, 500, 300);
    // the fingers are twice as far apart: twice the scale, about (350, 300), then the midpoint moved to (400, 300)
    expect(ed().view.scale).toBeCloseTo(200, 9);
    expect(ed().view.x).toBeCloseTo(350 - (350 - 100) * 2 + 50, 9);
    finger("pointerup", 2, { clientX: 500, clientY: 300 });
    finger("pointerup", 1, { clientX: 300, clientY: 300 });
    expect(ed().past).toHaveLength(0);
  });

  it("zooms with the wheel about the pointer", () => {
    h.controller.wheel({ clientX: 300, clientY: 300, deltaY: -100, deltaMode: 0, ctrlKey: false, preventDefault() {} } as unknown as WheelEvent);
    expect(ed().view.scale).toBeCloseTo(100 * Math.exp(0.16), 9);
  });
});

describe("tools", () => {
  it("places a contact on an edge pointing into the body, then goes back to selecting", () => {
    ed().setTool({ kind: "place", element: "contact" });
    down(5.02, 1.03);
    const added = ed().sketch.supports[1];
    expect(added).toMatchObject({ id: "s2", body: "b2", kind: "contact", at: [5, 1], angle: -90 });
    expect(ed().tool.kind).toBe("select");
    expect(ed().selection).toEqual(["s2"]);
  });

  it("draws a polygon body corner by corner, closing on the first corner", () => {
    ed().setTool({ kind: "body", shape: "polygon", points: [] });
    for (const [x, y] of [[0, 3], [2, 3], [1, 4.4], [0.01, 3.02]]) down(x, y);
    expect(ed().sketch.bodies).toHaveLength(3);
    expect(ed().sketch.bodies[2]).toMatchObject({ id: "b3", outline: [[0, 3], [2, 3], [1, 4.4]] });
  });

  it("draws a rectangle body by dragging", () => {
    ed().setTool({ kind: "body", shape: "rectangle", points: [] });
    down(0, 2);
    pointer("pointermove", 3, 3.4);
    pointer("pointerup", 3, 3.4);
    expect(ed().sketch.bodies[2].outline).toEqual([[0, 2], [3, 2], [3, 3.4], [0, 3.4]]);
  });

  it("selects what a rubber band encloses", () => {
    down(-0.5, -0.5);
    pointer("pointermove", 2.5, 1.5);
    pointer("pointerup", 2.5, 1.5);
    expect([...ed().selection].sort()).toEqual(["b1", "p1", "s1"]);
  });

  it("picks the point the hand check takes moments about", () => {
    ed().setTool({ kind: "pick-point" });
    down(1.97, 0.02);
    expect(ed().momentPoint).toEqual([2, 0]);
  });

  it("leaves no snap mark (\"corner\") or hover ring behind once the moment point is picked", () => {
    ed().setTool({ kind: "pick-point" });
    const at = { ...screenOf(1.97, 0.02), altKey: false } as unknown as PointerEvent;
    h.controller.hover(at);
    expect(h.interaction.getState().snap).toMatchObject({ kind: "corner", point: [2, 0] });
    down(1.97, 0.02);
    expect(ed().tool.kind).toBe("select");
    expect(h.interaction.getState().snap).toBeNull();
    expect(h.interaction.getState().hover).toBeNull();
  });
});

describe("a tool's marks go with the tool", () => {
  const hoverAt = (x: number, y: number) => h.controller.hover({ ...screenOf(x, y), altKey: false } as unknown as PointerEvent);

  it("a contact clicked onto an edge leaves no \"on edge\" mark behind once the tool is back to selecting", () => {
    ed().setTool({ kind: "place", element: "contact" });
    hoverAt(5.5, 1.03);
    expect(h.interaction.getState().snap).toMatchObject({ kind: "edge" });
    down(5.5, 1.03);
    expect(ed().tool.kind).toBe("select");
    expect(h.interaction.getState().snap).toBeNull();
    expect(h.interaction.getState().hover).toBeNull();
  });

  it("with Shift held the tool stays on for the next one, and so does its mark; Escape takes both away", () => {
    ed().setTool({ kind: "place", element: "contact" });
    hoverAt(5.5, 1.03);
    down(5.5, 1.03, { shiftKey: true });
    expect(ed().tool.kind).toBe("place");
    expect(h.interaction.getState().hover).not.toBeNull();
    h.controller.cancel();
    expect(h.interaction.getState().snap).toBeNull();
    expect(h.interaction.getState().hover).toBeNull();
  });

  it("a polygon closed on its first corner, begun on the left body's corner, leaves no \"corner\" mark there", () => {
    ed().setTool({ kind: "body", shape: "polygon", points: [] });
    for (const [x, y] of [[2, 1], [3.4, 1], [2.6, 2]]) down(x, y);
    hoverAt(2.01, 1.02);
    expect(h.interaction.getState().snap).toMatchObject({ kind: "corner" });
    down(2.01, 1.02);
    expect(ed().tool.kind).toBe("select");
    expect(h.interaction.getState().snap).toBeNull();
  });
});

describe("placing on an outline, and in view", () => {
  const tap = (x: number, y: number) => fingerDown(7, screenOf(x, y));

  it("a pin clicked in empty space, 0.9 m from the nearest body, is not placed: the hint says where, and the tool stays on", () => {
    ed().setTool({ kind: "place", element: "pin" });
    down(3.1, 0.5);
    expect(ed().sketch.supports.map((x) => x.id)).toEqual(["s1"]);
    expect(ed().notice).toBe("Click on or near a body's outline to place a support.");
    expect(ed().tool).toEqual({ kind: "place", element: "pin" });
    expect(ed().past).toHaveLength(0);
  });

  it("a tap 10 px under a body's edge puts the contact on the edge (past the 9 px snap, within the 12 px reach)", () => {
    ed().setTool({ kind: "place", element: "contact" });
    tap(5.13, -0.1);
    expect(ed().sketch.supports[1]).toMatchObject({ id: "s2", body: "b2", kind: "contact", at: [5.2, 0], angle: 90 });
    expect(ed().tool.kind).toBe("select");
  });

  it("a tap too far out says so in a tap's words; an outlet dropped from the tray far from any body is refused too", () => {
    ed().setTool({ kind: "place", element: "tie" });
    tap(3, 2);
    expect(ed().notice).toBe("Tap on or near a body's outline to place a support.");
    h.controller.drop({ kind: "outlet" }, { ...screenOf(3, 0.5), altKey: false });
    expect(ed().sketch.ports).toHaveLength(1);
    expect(ed().notice).toMatch(/^Click on or near a body's outline to place a port/);
  });

  it("a tap with the body tool on a phone's drawing near its right edge: a body centred on the tap, moved in to lie wholly in view", () => {
    // 390 px wide, the world origin at (100, 500) as above: the right edge is x = 2.9 m
    ed().setViewport({ width: 390, height: 600 });
    ed().setTool({ kind: "body", shape: "rectangle", points: [] });
    tap(2.6, 1);
    finger("pointerup", 7, screenOf(2.6, 1));
    // centred on (2.6, 1) at 360 px it would reach 460 px, 78 px past 382: 0.8 m in (whole 0.2 m
    // steps), so its right side is at 380 px (a body with its corner at the tap reached 560 px)
    expect(ed().sketch.bodies[2].outline).toEqual([[0.8, 0.5], [2.8, 0.5], [2.8, 1.5], [0.8, 1.5]]);
    expect(ed().notice).toBe("Body added, 2 m × 1 m. Drag its corners to reshape it.");
    expect(ed().tool.kind).toBe("select");
  });
});

describe("touch", () => {
  const touch = (id: number, x: number, y: number) => fingerDown(id, screenOf(x, y));
  const lift = (type: "pointermove" | "pointerup" | "pointercancel", id: number, x: number, y: number) => finger(type, id, screenOf(x, y));

  it("a tap that places an element is forgotten when the finger lifts: the next finger drags, not pinches", () => {
    ed().setTool({ kind: "place", element: "contact" });
    touch(1, 5.02, 1.03);
    lift("pointerup", 1, 5.02, 1.03);
    expect(ed().sketch.supports.map((s) => s.id)).toEqual(["s1", "s2"]);
    h.hit = { type: "element", id: "s1" };
    touch(2, 1, 0);
    expect(h.controller.mode).toBe("move");
    lift("pointermove", 2, 1.6, 0);
    lift("pointerup", 2, 1.6, 0);
    expect(ed().view.scale).toBe(100);
    expect(el("s1").at).toEqual([1.6, 0]);
    expect(h.controller.mode).toBe("idle");
  });

  it("a tap with the moment-point tool and a polygon corner do not leave a finger behind", () => {
    ed().setTool({ kind: "pick-point" });
    touch(1, 2, 0);
    lift("pointerup", 1, 2, 0);
    ed().setTool({ kind: "body", shape: "polygon", points: [] });
    touch(2, 0, 3);
    lift("pointercancel", 2, 0, 3);
    expect(ed().tool).toMatchObject({ kind: "body", points: [[0, 3]] });
    // then one finger on empty paper: a rubber band, not a pinch
    ed().setTool({ kind: "select" });
    touch(3, -0.5, -0.5);
    expect(h.controller.mode).toBe("band");
    lift("pointerup", 3, -0.5, -0.5);
    expect(h.controller.mode).toBe("idle");
    expect(ed().view.scale).toBe(100);
  });

  it("Escape forgets the fingers counted so far", () => {
    ed().setTool({ kind: "place", element: "contact" });
    touch(1, 5.02, 1.03);
    expect(h.controller.cancel()).toBe(false);
    h.hit = { type: "element", id: "s1" };
    touch(2, 1, 0);
    expect(h.controller.mode).toBe("move");
  });
});

describe("Escape", () => {
  it("pressed on the keyboard rolls back a drag in progress, recording nothing", () => {
    render(<HarnessKeys harness={h} interaction={createInteractionStore()} />);
    h.hit = { type: "element", id: "s1" };
    down(1, 0);
    pointer("pointermove", 1.52, 0);
    expect(el("s1").at).toEqual([1.6, 0]);
    fireEvent.keyDown(window, { key: "Escape" });
    expect(el("s1").at).toEqual([1, 0]);
    expect(ed().gesture).toBeNull();
    expect(h.controller.mode).toBe("idle");
    pointer("pointerup", 1.7, 0);
    expect(ed().past).toHaveLength(0);
    // the element stays selected: Escape spent itself on the drag
    expect(ed().selection).toEqual(["s1"]);
  });

  it("during a rubber band gives back the selection from before it", () => {
    render(<HarnessKeys harness={h} interaction={createInteractionStore()} />);
    ed().select(["p1", "b2"]);
    down(-0.5, -0.5);
    expect(ed().selection).toEqual([]);
    pointer("pointermove", 2.5, 1.5);
    fireEvent.keyDown(window, { key: "Escape" });
    expect(ed().selection).toEqual(["p1", "b2"]);
    pointer("pointerup", 2.5, 1.5);
    expect(ed().selection).toEqual(["p1", "b2"]);
  });
});

describe("autosave of a drag", () => {
  it("saves the moved position once the drag ends, and nothing for a cancelled one", async () => {
    vi.useFakeTimers();
    const saved: SketchFile[] = [];
    const persistence: SketchPersistence = { kind: "scratch", autosave: true, describe: () => "", load: async () => ({ ok: true, sketch: null }), save: async (s) => (saved.push(s), { ok: true, savedAt: "" }) };
    const autosave = startAutosave(h.stores.editor, persistence);
    try {
      h.hit = { type: "element", id: "s1" };
      down(1, 0);
      pointer("pointermove", 1.7, 0.4);
      h.controller.cancel();
      pointer("pointerup", 1.7, 0.4);
      await vi.advanceTimersByTimeAsync(1000);
      expect(saved).toHaveLength(0);
      down(1, 0);
      for (const x of [1.2, 1.38, 1.52]) pointer("pointermove", x, 0);
      pointer("pointerup", 1.52, 0);
      await vi.advanceTimersByTimeAsync(1000);
      expect(saved).toHaveLength(1);
      expect((findElement(saved[0], "s1")!.el as { at: unknown }).at).toEqual([1.6, 0]);
    } finally {
      autosave.stop();
      vi.useRealTimers();
    }
  });
});
