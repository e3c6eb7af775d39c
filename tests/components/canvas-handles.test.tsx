// The canvas as the user drives it (react-konva under vitest-canvas-mock): the turn handle of
// every directed element and the corner handles of bodies, found where they are drawn and
// dragged with the pointer; Alt turning snapping off; pan with the middle button or Space held;
// zoom from the keyboard and the wheel, and fit to view.
import { useCallback } from "react";
import { act, fireEvent, render, waitFor } from "@testing-library/react";
import Konva from "konva";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { createEditorStore, type EditorStore } from "@/canvas/store";
import { EditorProvider, useStores } from "@/canvas/context";
import { createInteractionStore, type InteractionStore } from "@/canvas/konva/interaction";
import type { PointerController } from "@/canvas/konva/pointer";
import SketchCanvas from "@/canvas/konva/SketchCanvas";
import { ROTATE_HANDLE_PX } from "@/canvas/konva/overlays";
import type { ActionContext } from "@/canvas/actions";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { toScreen, toWorld } from "@/canvas/geometry/view";
import { useShortcuts } from "@/components/editor/useShortcuts";
import { ActionContextCtx } from "@/components/editor/useActions";
import { Tray } from "@/components/editor/Tray";
import { TRAY_MIME } from "@/canvas/konva/interaction";
import { noteWidth } from "@/canvas/render/pointerNote";
import { measuredAs, mouseOn, stage } from "./canvas-support";

/** A frame on a pad, with one of each directed element (invented demo data). */
function frame(): SketchFile {
  return {
    ...emptySketch("Frame with every directed element"),
    bodies: [newBody("b1", [[0, 0], [4, 0], [4, 1], [0, 1]], "Frame"), newBody("b2", [[6, 0], [7, 0], [6.5, 1.2]], "Wedge")],
    supports: [
      { id: "roller", body: "b1", kind: "roller", at: [1, 0], angle: 90 },
      { id: "pad", body: "b1", kind: "contact", at: [3, 0], angle: 90, mu: 0.3 },
      { id: "guy", body: "b1", kind: "tie", at: [2, 1], angle: 60 },
      { id: "pin", body: "b2", kind: "pin", at: [6, 0] },
    ],
    loads: [
      { id: "push", body: "b1", kind: "force", at: [1, 1], magnitude: "1 kN", angle: -90 },
      { id: "xy", body: "b1", kind: "force", at: [3, 1], fx: 0, fy: -2000 },
    ],
    ports: [
      { id: "in", body: "b1", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: 2, velocity: 3 },
      { id: "out", body: "b1", kind: "outlet", at: [4, 0.5], angle: 0, massFlow: 2, velocity: 3 },
    ],
  };
}

// 100 px per metre, the world origin at screen (100, 400)
const VIEW = { scale: 100, x: 100, y: 400 };
const SIZE = { width: 800, height: 600 };

let editor: EditorStore;
let interaction: InteractionStore;
let controller: PointerController | null = null;
let container: HTMLElement;
let tray: (id: string) => HTMLElement;
const mocks: Array<{ mockRestore: () => void }> = [];

/** jsdom draws no hit canvas: find handles by where their shapes are. */
function handleAt(stage: Konva.Stage, pos: { x: number; y: number }): Konva.Shape | null {
  const handles = stage.find((n: Konva.Node) => ["rotate", "corner"].includes((n.getAttr("hit") as { type?: string } | undefined)?.type ?? ""));
  for (const n of handles) {
    const r = n.getClientRect();
    if (pos.x >= r.x - 1 && pos.x <= r.x + r.width + 1 && pos.y >= r.y - 1 && pos.y <= r.y + r.height + 1) return n as Konva.Shape;
  }
  return null;
}

/** The keyboard and the tray, wired to the canvas's controller as the editor page does. */
function Keys() {
  const stores = useStores();
  const getCtx = useCallback((): ActionContext => ({ stores, controller, ui: {} as ActionContext["ui"] }), [stores]);
  useShortcuts(getCtx, interaction);
  return (
    <ActionContextCtx.Provider value={getCtx}>
      <Tray />
    </ActionContextCtx.Provider>
  );
}

beforeEach(async () => {
  mocks.push(
    measuredAs(SIZE.width, SIZE.height),
    vi.spyOn(Konva.Stage.prototype, "getIntersection").mockImplementation(function (this: Konva.Stage, pos: { x: number; y: number }) {
      return handleAt(this, pos);
    } as never),
  );
  editor = createEditorStore({ sketch: frame() });
  interaction = createInteractionStore();
  const utils = render(
    <EditorProvider editor={editor}>
      <Keys />
      <SketchCanvas interaction={interaction} onController={(c) => (controller = c)} />
    </EditorProvider>,
  );
  container = utils.getByTestId("sketch-canvas");
  tray = (id: string) => utils.getByTestId(`tray-${id}`);
  await waitFor(() => expect(container.querySelector("canvas")).not.toBeNull());
  act(() => editor.getState().setView(VIEW));
});
afterEach(() => {
  mocks.splice(0).forEach((m) => m.mockRestore());
});

const ed = () => editor.getState();
const el = (id: string) => findElement(ed().sketch, id)!.el as unknown as Record<string, unknown>;
const screenOf = (p: Vec2) => toScreen(ed().view, p);

const { press, moveTo, release } = mouseOn(() => container);

/** The turn handle of the selected element, where it is drawn on screen. */
async function turnHandle(id: string): Promise<Vec2> {
  act(() => ed().select([id]));
  let node: Konva.Node | undefined;
  await waitFor(() => {
    node = stage().findOne((n: Konva.Node) => (n.getAttr("hit") as { type?: string; id?: string } | undefined)?.type === "rotate");
    expect((node?.getAttr("hit") as { id: string }).id).toBe(id);
  });
  const p = node!.getAbsolutePosition();
  return [p.x, p.y];
}

/** The screen point that turns an element whose handle sits `sign` × its direction to `angleDeg`. */
function pointerFor(anchor: Vec2, angleDeg: number, sign: 1 | -1): Vec2 {
  const a = (angleDeg * Math.PI) / 180;
  return [anchor[0] + sign * ROTATE_HANDLE_PX * Math.cos(a), anchor[1] - sign * ROTATE_HANDLE_PX * Math.sin(a)];
}

describe("the turn handle", () => {
  // the handle is on the arrow's tail for pushes and inflow, on its head for an outlet's flow and a tie's pull
  const CASES: Array<{ id: string; sign: 1 | -1; angle: number; anchor: Vec2 }> = [
    { id: "roller", sign: -1, angle: 90, anchor: [1, 0] },
    { id: "pad", sign: -1, angle: 90, anchor: [3, 0] },
    { id: "guy", sign: 1, angle: 60, anchor: [2, 1] },
    { id: "push", sign: -1, angle: -90, anchor: [1, 1] },
    { id: "in", sign: -1, angle: 0, anchor: [0, 0.5] },
    { id: "out", sign: 1, angle: 0, anchor: [4, 0.5] },
  ];

  it("is drawn along the element's direction, on the side the user grips: 66 px out, or a little further past the element's words", async () => {
    for (const c of CASES) {
      const h = await turnHandle(c.id);
      const anchor = screenOf(c.anchor);
      const unit = pointerFor([0, 0], c.angle, c.sign).map((x) => x / ROTATE_HANDLE_PX);
      const t = Math.hypot(h[0] - anchor[0], h[1] - anchor[1]);
      // on the ray from the anchor, on the gripped side
      expect((h[0] - anchor[0]) * unit[0] + (h[1] - anchor[1]) * unit[1], c.id).toBeCloseTo(t, 6);
      // the force's words sit at its tail, where its handle is: the handle moves out past them
      if (c.id === "push") expect(t, c.id).toBeGreaterThan(ROTATE_HANDLE_PX);
      else if (c.id !== "in") expect(t, c.id).toBeCloseTo(ROTATE_HANDLE_PX, 6);
      expect(t, c.id).toBeLessThanOrEqual(120 + 1e-6);
    }
    // a pin has no direction to turn; a body has corners instead
    act(() => ed().select(["pin"]));
    await waitFor(() => expect(stage().find((n: Konva.Node) => (n.getAttr("hit") as { type?: string } | undefined)?.type === "rotate")).toHaveLength(0));
  });

  it("turns roller, contact, tie, force, inlet and outlet in 5° steps, one undo step each", async () => {
    for (const [i, c] of CASES.entries()) {
      const h = await turnHandle(c.id);
      press(h);
      const anchor = screenOf(c.anchor);
      // toward 47°: the nearest 5° step is 45°
      moveTo(pointerFor(anchor, 20, c.sign));
      moveTo(pointerFor(anchor, 47, c.sign));
      expect(el(c.id).angle, c.id).toBe(45);
      release(pointerFor(anchor, 47, c.sign));
      expect(ed().past, c.id).toHaveLength(i + 1);
      expect(ed().past.at(-1)!.label).toBe(`Turn ${c.id}`);
    }
    ed().undo();
    expect(el("out").angle).toBe(0);
    expect(el("in").angle).toBe(45);
  });

  it("turns a force given as components, keeping its 2 kN", async () => {
    const h = await turnHandle("xy");
    press(h);
    const anchor = screenOf([3, 1]);
    moveTo(pointerFor(anchor, 30, -1));
    release(pointerFor(anchor, 30, -1));
    // 2000 N at 30°: (2000 cos 30°, 2000 sin 30°) = (1732.051, 1000)
    expect(el("xy").fx).toBeCloseTo(1732.051, 3);
    expect(el("xy").fy).toBeCloseTo(1000, 3);
    expect(el("xy").magnitude).toBeUndefined();
  });

  it("with Alt held follows the pointer to a tenth of a degree", async () => {
    const h = await turnHandle("pad");
    press(h);
    const anchor = screenOf([3, 0]);
    moveTo(pointerFor(anchor, 72.34, -1), { altKey: true });
    release(pointerFor(anchor, 72.34, -1), { altKey: true });
    expect(el("pad").angle).toBe(72.3);
  });

  it("Escape during a turn gives the direction back and records nothing", async () => {
    const h = await turnHandle("guy");
    press(h);
    moveTo(pointerFor(screenOf([2, 1]), 120, 1));
    expect(el("guy").angle).toBe(120);
    fireEvent.keyDown(window, { key: "Escape" });
    expect(el("guy").angle).toBe(60);
    release(pointerFor(screenOf([2, 1]), 120, 1));
    expect(ed().past).toHaveLength(0);
  });
});

describe("reshape handles", () => {
  async function cornerHandles(id: string): Promise<Vec2[]> {
    act(() => ed().select([id]));
    let nodes: Konva.Node[] = [];
    await waitFor(() => {
      nodes = stage().find((n: Konva.Node) => (n.getAttr("hit") as { type?: string } | undefined)?.type === "corner");
      expect(nodes.length).toBeGreaterThan(0);
    });
    return nodes.map((n) => {
      const r = n.getClientRect();
      return [r.x + r.width / 2, r.y + r.height / 2];
    });
  }
  const outline = (id: string) => ed().sketch.bodies.find((b) => b.id === id)!.outline;

  it("sit on the body's corners", async () => {
    const handles = await cornerHandles("b1");
    const corners = (outline("b1") as Vec2[]).map(screenOf);
    expect(handles).toHaveLength(4);
    handles.forEach((h, i) => {
      expect(h[0]).toBeCloseTo(corners[i][0], 0);
      expect(h[1]).toBeCloseTo(corners[i][1], 0);
    });
  });

  it("drag a rectangle's corner keeping it a rectangle, on the grid; Shift frees that corner alone", async () => {
    const [, , topRight] = await cornerHandles("b1");
    press(topRight);
    // the grid at 100 px/m is 0.2 m: (4.93, 1.47) snaps to (5.0, 1.4)
    moveTo(screenOf([4.93, 1.47]));
    release(screenOf([4.93, 1.47]));
    expect(outline("b1")).toEqual([[0, 0], [5, 0], [5, 1.4], [0, 1.4]]);
    expect(ed().past).toHaveLength(1);
    const again = (await cornerHandles("b1"))[2];
    press(again, { shiftKey: true });
    moveTo(screenOf([5.4, 1.8]), { shiftKey: true });
    release(screenOf([5.4, 1.8]), { shiftKey: true });
    expect(outline("b1")).toEqual([[0, 0], [5, 0], [5.4, 1.8], [0, 1.4]]);
  });

  it("drag one corner of a polygon; Alt turns the grid off; Escape gives the shape back", async () => {
    const [, , apex] = await cornerHandles("b2");
    press(apex);
    moveTo(screenOf([6.63, 1.91]), { altKey: true });
    release(screenOf([6.63, 1.91]), { altKey: true });
    const moved = outline("b2") as Vec2[];
    expect(moved[0]).toEqual([6, 0]);
    expect(moved[1]).toEqual([7, 0]);
    expect(moved[2][0]).toBeCloseTo(6.63, 9);
    expect(moved[2][1]).toBeCloseTo(1.91, 9);
    const again = (await cornerHandles("b2"))[2];
    press(again);
    moveTo(screenOf([8, 3]));
    expect((outline("b2") as Vec2[])[2]).toEqual([8, 3]);
    fireEvent.keyDown(window, { key: "Escape" });
    expect((outline("b2") as Vec2[])[2][0]).toBeCloseTo(6.63, 9);
    release(screenOf([8, 3]));
    expect(ed().past).toHaveLength(1);
  });
});

describe("pan and zoom", () => {
  it("the middle button drags the drawing along, recording nothing", () => {
    press([300, 300], { button: 1 });
    moveTo([340, 270], { button: 1 });
    release([340, 270], { button: 1 });
    expect(ed().view).toEqual({ scale: 100, x: 140, y: 370 });
    expect(ed().past).toHaveLength(0);
  });

  it("Space held turns a left-button drag into a pan; Escape mid-pan puts the view back", () => {
    fireEvent.keyDown(window, { key: " " });
    expect(interaction.getState().spaceHeld).toBe(true);
    press([300, 300]);
    moveTo([250, 320]);
    expect(ed().view).toEqual({ scale: 100, x: 50, y: 420 });
    fireEvent.keyDown(window, { key: "Escape" });
    expect(ed().view).toEqual(VIEW);
    release([250, 320]);
    fireEvent.keyUp(window, { key: " " });
    expect(interaction.getState().spaceHeld).toBe(false);
    // without Space the same drag on empty paper is a rubber band, not a pan
    press([300, 300]);
    moveTo([250, 320]);
    release([250, 320]);
    expect(ed().view).toEqual(VIEW);
  });

  it("+ and − zoom about the canvas's middle; F fits every body into view", () => {
    const middle: Vec2 = [SIZE.width / 2, SIZE.height / 2];
    const world = toWorld(ed().view, middle);
    fireEvent.keyDown(window, { key: "+" });
    expect(ed().view.scale).toBeCloseTo(125, 9);
    const after = toScreen(ed().view, world);
    expect(after[0]).toBeCloseTo(middle[0], 9);
    expect(after[1]).toBeCloseTo(middle[1], 9);
    fireEvent.keyDown(window, { key: "-" });
    expect(ed().view.scale).toBeCloseTo(100, 9);
    // far away and tiny: F brings every corner back on the canvas
    act(() => ed().setView({ scale: 3, x: -5000, y: 9000 }));
    fireEvent.keyDown(window, { key: "f" });
    for (const b of ed().sketch.bodies)
      for (const p of b.outline as Vec2[]) {
        const [x, y] = screenOf(p);
        expect(x).toBeGreaterThan(0);
        expect(x).toBeLessThan(SIZE.width);
        expect(y).toBeGreaterThan(0);
        expect(y).toBeLessThan(SIZE.height);
      }
    expect(ed().view.scale).toBeGreaterThan(50);
  });

  it("the wheel zooms about the pointer; a trackpad pinch (wheel with Ctrl) zooms faster", () => {
    const at: Vec2 = [500, 250];
    const world = toWorld(ed().view, at);
    act(() => {
      container.dispatchEvent(new WheelEvent("wheel", { clientX: at[0], clientY: at[1], deltaY: -100, bubbles: true, cancelable: true }));
    });
    expect(ed().view.scale).toBeCloseTo(100 * Math.exp(0.16), 9);
    const still = toScreen(ed().view, world);
    expect(still[0]).toBeCloseTo(at[0], 9);
    expect(still[1]).toBeCloseTo(at[1], 9);
    act(() => {
      container.dispatchEvent(new WheelEvent("wheel", { clientX: at[0], clientY: at[1], deltaY: 10, ctrlKey: true, bubbles: true, cancelable: true }));
    });
    expect(ed().view.scale).toBeCloseTo(100 * Math.exp(0.16) * Math.exp(-0.1), 9);
  });
});

describe("undo and redo from the keyboard", () => {
  it("Ctrl+Z undoes a turn; Shift+Ctrl+Z and Ctrl+Y redo it", async () => {
    const h = await turnHandle("out");
    press(h);
    moveTo(pointerFor(screenOf([4, 0.5]), 90, 1));
    release(pointerFor(screenOf([4, 0.5]), 90, 1));
    expect(el("out").angle).toBe(90);
    fireEvent.keyDown(window, { key: "z", ctrlKey: true });
    expect(el("out").angle).toBe(0);
    fireEvent.keyDown(window, { key: "Z", ctrlKey: true, shiftKey: true });
    expect(el("out").angle).toBe(90);
    fireEvent.keyDown(window, { key: "z", metaKey: true });
    expect(el("out").angle).toBe(0);
    fireEvent.keyDown(window, { key: "y", ctrlKey: true });
    expect(el("out").angle).toBe(90);
  });
});

describe("dragging from the tray onto the canvas", () => {
  /** jsdom has no DataTransfer: a minimal one that carries the tray's payload */
  function transfer() {
    const data = new Map<string, string>();
    return { setData: (k: string, v: string) => void data.set(k, v), getData: (k: string) => data.get(k) ?? "", get types() { return [...data.keys()]; }, effectAllowed: "", dropEffect: "" };
  }
  function dropOn(dt: ReturnType<typeof transfer>, at: Vec2, altKey = false) {
    const e = new MouseEvent("drop", { clientX: at[0], clientY: at[1], altKey, bubbles: true, cancelable: true });
    Object.defineProperty(e, "dataTransfer", { value: dt });
    act(() => {
      container.dispatchEvent(e);
    });
  }

  it("a pin dropped on the wedge is placed there, on the grid, attached to it and selected, as one undo step", () => {
    const dt = transfer();
    fireEvent.dragStart(tray("pin"), { dataTransfer: dt });
    expect(JSON.parse(dt.getData(TRAY_MIME))).toMatchObject({ kind: "pin" });
    dropOn(dt, screenOf([6.47, 0.33]));
    const added = ed().sketch.supports.at(-1)!;
    expect(added).toMatchObject({ kind: "pin", body: "b2", at: [6.4, 0.4] });
    expect(ed().selection).toEqual([added.id]);
    expect(ed().past).toHaveLength(1);
  });

  it("a rectangle body dropped with Alt held is centred on the drop point itself", () => {
    const dt = transfer();
    fireEvent.dragStart(tray("body"), { dataTransfer: dt });
    dropOn(dt, screenOf([5.03, 2.07]), true);
    const outline = ed().sketch.bodies.at(-1)!.outline as Vec2[];
    // 2 m × 1 m about (5.03, 2.07)
    expect(outline[0][0]).toBeCloseTo(4.03, 9);
    expect(outline[0][1]).toBeCloseTo(1.57, 9);
  });
});

describe("the preview of what a click places", () => {
  const hoverAt = (at: Vec2) =>
    act(() => {
      container.dispatchEvent(new MouseEvent("pointermove", { clientX: at[0], clientY: at[1], bubbles: true }));
    });
  const warning = () => stage().find((n: Konva.Node) => n.getClassName() === "Text" && (n as Konva.Text).text().startsWith("not on a body"));

  it("a pin's preview catches on the frame's edge 10 px below it (and goes there), and says where to go when far from every outline", async () => {
    act(() => ed().setTool({ kind: "place", element: "pin" }));
    // 10 px under the frame's bottom edge at 100 px/m: within the 12 px reach, the preview snaps onto the edge
    hoverAt(screenOf([2.5, -0.1]));
    await waitFor(() => expect(interaction.getState().hover).toEqual([2.6, 0]));
    expect(warning()).toHaveLength(0);
    // 1.5 m above the frame: no body there, nothing would be placed
    hoverAt(screenOf([2, 2.5]));
    await waitFor(() => expect(warning()).toHaveLength(1));
    // a load would go on the nearest body: no warning for it
    act(() => ed().setTool({ kind: "place", element: "force" }));
    hoverAt(screenOf([2, 2.6]));
    await waitFor(() => expect(warning()).toHaveLength(0));
  });

  it("the note beside the pointer stays inside the canvas: right of and below the pointer, flipped left at the right edge and above it at the bottom", async () => {
    act(() => ed().setTool({ kind: "place", element: "pin" }));
    // the note's box on screen: its top-left as drawn, its width as the drawing's words are estimated
    const box = () => {
      const t = warning()[0] as Konva.Text;
      const p = t.getAbsolutePosition();
      return { x0: p.x, y0: p.y, x1: p.x + noteWidth(t.text(), t.fontSize()), y1: p.y + t.fontSize() * 1.25 };
    };
    // (the pointer's spots are on the 0.2 m grid at 100 px/m, so the preview stays where it points)
    // in the open, 1.4 m above the frame: 10 px right of and 8 px below the pointer
    hoverAt([300, 160]);
    await waitFor(() => expect(warning()).toHaveLength(1));
    expect(box()).toMatchObject({ x0: 310, y0: 168 });
    // 20 px from the canvas's right edge (800 px wide), far above the wedge: the 44-character note
    // (about 259 px) would end past the edge; it goes left of the pointer, ending 10 px before it
    hoverAt([780, 100]);
    await waitFor(() => expect(box().x0).toBeLessThan(780));
    expect(box().x1).toBeCloseTo(770, 6);
    expect(box().y0).toBe(108);
    // 20 px above the canvas's bottom edge (600 px), right of the wedge: above the pointer, and left of it
    hoverAt([780, 580]);
    await waitFor(() => expect(box().y1).toBeCloseTo(572, 6));
    expect(box().x1).toBeCloseTo(770, 6);
    expect(box().y0).toBeGreaterThanOrEqual(4);
  });
});
