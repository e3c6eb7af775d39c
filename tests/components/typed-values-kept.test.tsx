// A value typed in the properties panel is kept exactly: the grid (and the turn handle's 5° steps)
// are for dragging, so pressing a handle or an element with the small wobble of a click leaves a
// typed corner, position, centre of gravity or direction as typed and records nothing; a real
// drag still snaps, and the turn keys turn a typed direction by exactly their step. The canvas
// (react-konva under vitest-canvas-mock) and the form side by side, as the editor shows them.
import { useCallback } from "react";
import { act, fireEvent, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import Konva from "konva";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import { createEditorStore, type EditorStore } from "@/canvas/store";
import { EditorProvider, useEditor, useStores } from "@/canvas/context";
import { createInteractionStore, type InteractionStore } from "@/canvas/konva/interaction";
import SketchCanvas from "@/canvas/konva/SketchCanvas";
import type { ActionContext } from "@/canvas/actions";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { pointInPolygon } from "@/canvas/geometry/polygon";
import { toScreen, toWorld } from "@/canvas/geometry/view";
import { useShortcuts } from "@/components/editor/useShortcuts";
import { ElementForm } from "@/components/editor/ElementForm";
import { measuredAs, mouseOn, stage } from "./canvas-support";

/** A skid frame on a roller and a pin, a second skid beside it (invented demo data). */
function skids(): SketchFile {
  return {
    ...emptySketch("Two skids"),
    bodies: [
      { ...newBody("b1", [[0, 0], [4, 0], [4, 1], [0, 1]], "Skid"), cg: [2, 0.5] },
      newBody("b2", [[5, 0], [6, 0], [6, 1], [5, 1]], "Second skid"),
    ],
    supports: [
      { id: "r1", body: "b1", kind: "roller", at: [1, 0], angle: 90 },
      { id: "p1", body: "b1", kind: "pin", at: [3, 0] },
    ],
  };
}

// 100 px per metre (the grid is 0.2 m, 20 px), the world origin at screen (100, 400)
const VIEW = { scale: 100, x: 100, y: 400 };

let editor: EditorStore;
let interaction: InteractionStore;
let container: HTMLElement;
const mocks: Array<{ mockRestore: () => void }> = [];

const ed = () => editor.getState();
const el = (id: string) => findElement(ed().sketch, id)!.el as unknown as Record<string, unknown>;
const screenOf = (p: Vec2) => toScreen(ed().view, p);
const hitNode = (type: string, id: string, index?: number) =>
  stage().findOne((n: Konva.Node) => {
    const h = n.getAttr("hit") as { type?: string; id?: string; index?: number } | undefined;
    return h?.type === type && h.id === id && (index === undefined || h.index === index);
  }) ?? null;

/**
 * jsdom draws no hit canvas: what is under a point, found the way the drawing places it — a
 * handle by its shape, a centre of gravity's mark within 10 px, a support within 12 px of its
 * point, else the body whose outline holds it.
 */
function underPoint(pos: { x: number; y: number }): Konva.Node | null {
  const handles = stage().find((n: Konva.Node) => ["rotate", "corner"].includes((n.getAttr("hit") as { type?: string } | undefined)?.type ?? ""));
  for (const n of handles) {
    const r = n.getClientRect();
    if (pos.x >= r.x - 1 && pos.x <= r.x + r.width + 1 && pos.y >= r.y - 1 && pos.y <= r.y + r.height + 1) return n;
  }
  const world = toWorld(ed().view, [pos.x, pos.y]);
  const near = (p: Vec2, px: number) => Math.hypot(p[0] - world[0], p[1] - world[1]) * ed().view.scale <= px;
  for (const b of ed().sketch.bodies) if (b.cg && near(b.cg as Vec2, 10)) return hitNode("cg", b.id);
  for (const s of ed().sketch.supports) if (near(s.at as Vec2, 12)) return hitNode("element", s.id);
  for (const b of ed().sketch.bodies) if (pointInPolygon(world, b.outline as Vec2[])) return hitNode("element", b.id);
  return null;
}

/** The properties of the one element selected, beside the canvas, with the editor's keys. */
function Panel({ interaction: i }: { interaction: InteractionStore }) {
  const stores = useStores();
  const getCtx = useCallback((): ActionContext => ({ stores, controller: null, ui: {} as ActionContext["ui"] }) as unknown as ActionContext, [stores]);
  useShortcuts(getCtx, i);
  const selected = useEditor((s) => (s.selection.length === 1 ? s.selection[0] : null));
  return selected ? <ElementForm key={selected} id={selected} /> : null;
}

beforeEach(async () => {
  mocks.push(
    measuredAs(800, 600),
    vi.spyOn(Konva.Stage.prototype, "getIntersection").mockImplementation(((pos: { x: number; y: number }) => underPoint(pos)) as never),
  );
  editor = createEditorStore({ sketch: skids() });
  interaction = createInteractionStore();
  const utils = render(
    <EditorProvider editor={editor}>
      <Panel interaction={interaction} />
      <SketchCanvas interaction={interaction} />
    </EditorProvider>,
  );
  container = utils.getByTestId("sketch-canvas");
  await waitFor(() => expect(container.querySelector("canvas")).not.toBeNull());
  act(() => ed().setView(VIEW));
});
afterEach(() => {
  mocks.splice(0).forEach((m) => m.mockRestore());
});

const { press, moveTo, release } = mouseOn(() => container);

/** A click that wobbles: pressed at `at`, moved by `by` px (5 px right and down: past the 3 px a
 *  drag needs, within the 9 px a snap reaches) and released there. */
function wobblyClick(at: Vec2, by: Vec2 = [4, 3]) {
  press(at);
  moveTo([at[0] + by[0] / 2, at[1] + by[1] / 2]);
  moveTo([at[0] + by[0], at[1] + by[1]]);
  release([at[0] + by[0], at[1] + by[1]]);
}

/** A wobbly click at `at` leaves `read()` exactly as it was and records no undo step. */
function keptThroughWobble(at: Vec2, read: () => unknown, by?: Vec2) {
  const before = structuredClone(read());
  const steps = ed().past.length;
  wobblyClick(at, by);
  expect(read()).toEqual(before);
  expect(ed().past).toHaveLength(steps);
}

function drag(from: Vec2, to: Vec2) {
  press(from);
  moveTo(to);
  release(to);
}

/** Types into the labelled field of the selected element's form, leaving it with Tab. */
async function type(label: string, text: string) {
  const user = userEvent.setup();
  const input = screen.getByLabelText(label);
  await user.clear(input);
  await user.type(input, text);
  await user.tab();
}
/** Types a point's x and y ("Position", "Corner 3"). */
async function typePoint(label: string, x: string, y: string) {
  await type(`${label} x`, x);
  await type(`${label} y`, y);
}

async function cornerHandle(id: string, index: number): Promise<Vec2> {
  let node: Konva.Node | null = null;
  await waitFor(() => {
    node = hitNode("corner", id, index);
    expect(node).not.toBeNull();
  });
  const r = node!.getClientRect();
  return [r.x + r.width / 2, r.y + r.height / 2];
}
async function turnHandle(id: string): Promise<Vec2> {
  let node: Konva.Node | null = null;
  await waitFor(() => {
    node = hitNode("rotate", id);
    expect(node).not.toBeNull();
  });
  const p = node!.getAbsolutePosition();
  return [p.x, p.y];
}

describe("a typed value off the grid", () => {
  it("a corner typed at (4.37, 1.13) m stays there when its handle is pressed with a wobble; a drag still snaps it to the grid", async () => {
    act(() => ed().select(["b1"]));
    await typePoint("Corner 3", "4.37", "1.13");
    expect(ed().sketch.bodies[0].outline).toEqual([[0, 0], [4, 0], [4.37, 1.13], [0, 1]]);
    const handle = await cornerHandle("b1", 2);
    keptThroughWobble(handle, () => ed().sketch.bodies[0].outline);
    expect((screen.getByLabelText("Corner 3 x") as HTMLInputElement).value).toBe("4.37");
    // a drag of 0.56 m right and 0.34 m up: to (4.93, 1.47), on the 0.2 m grid (5, 1.4), one step
    const steps = ed().past.length;
    drag(handle, screenOf([4.93, 1.47]));
    expect(ed().sketch.bodies[0].outline[2]).toEqual([5, 1.4]);
    expect(ed().past).toHaveLength(steps + 1);
  });

  it("a roller's position typed as x = 1.37 m on the bottom edge stays there when the roller is clicked with a wobble", async () => {
    act(() => ed().select(["r1"]));
    await type("Position x", "1.37");
    expect(el("r1").at).toEqual([1.37, 0]);
    keptThroughWobble(screenOf([1.37, 0]), () => el("r1"));
    // dragged 0.5 m along the edge it goes onto the grid along it: 1.87 → 1.8
    drag(screenOf([1.37, 0]), screenOf([1.87, 0.02]));
    expect(el("r1").at).toEqual([1.8, 0]);
  });

  it("a position typed 7 px from a body's corner stays typed under a wobble; dragged onto that corner it snaps there", async () => {
    // the pin typed at (3.95, 0.95): 7 px from the skid's top right corner (4, 1); the wobble
    // takes the pointer 8 px from that corner, still nearer the typed place
    act(() => ed().select(["p1"]));
    await typePoint("Position", "3.95", "0.95");
    expect(el("p1").at).toEqual([3.95, 0.95]);
    keptThroughWobble(screenOf([3.95, 0.95]), () => el("p1"));
    drag(screenOf([3.95, 0.95]), screenOf([4.0, 0.99]));
    expect(el("p1").at).toEqual([4, 1]);
  });

  it("a centre of gravity typed at (1.37, 0.43) m stays there when its mark is pressed with a wobble", async () => {
    act(() => ed().select(["b1"]));
    await typePoint("Centre of gravity", "1.37", "0.43");
    expect(ed().sketch.bodies[0].cg).toEqual([1.37, 0.43]);
    keptThroughWobble(screenOf([1.37, 0.43]), () => ed().sketch.bodies[0].cg);
  });

  it("a body whose corners were typed off the grid does not jump onto a neighbour's corner 6 px away when clicked with a wobble", async () => {
    act(() => ed().select(["b2"]));
    // the second skid's left side typed 0.06 m (6 px) right of the first skid's right side
    await type("Corner 1 x", "4.06");
    await type("Corner 4 x", "4.06");
    expect(ed().sketch.bodies[1].outline).toEqual([[4.06, 0], [6, 0], [6, 1], [4.06, 1]]);
    // 4 px up: its corners then pass 7 px from the first skid's corners, nearer than the 9 px a snap reaches
    keptThroughWobble(screenOf([5.5, 0.5]), () => ed().sketch.bodies[1].outline, [0, -4]);
  });

  it("a direction typed as 97° stays 97° when the turn handle is pressed with a wobble; a turn key turns it by exactly 15°, a drag in 5° steps", async () => {
    act(() => ed().select(["r1"]));
    await type("Direction", "97");
    expect(el("r1").angle).toBe(97);
    keptThroughWobble(await turnHandle("r1"), () => el("r1"));
    // ] turns 15° counter-clockwise: 97° → 112°, not rounded to 110°
    fireEvent.keyDown(window, { key: "]" });
    expect(el("r1").angle).toBe(112);
    fireEvent.keyDown(window, { key: "[" });
    expect(el("r1").angle).toBe(97);
    // a real turn: the handle swept 30° clockwise about the roller: 97° − 30° = 67°, to the step 65°
    const anchor = screenOf([1, 0]);
    const at = await turnHandle("r1");
    const r = Math.hypot(at[0] - anchor[0], at[1] - anchor[1]);
    const grip = Math.atan2(-(at[1] - anchor[1]), at[0] - anchor[0]) - (30 * Math.PI) / 180;
    drag(at, [anchor[0] + r * Math.cos(grip), anchor[1] - r * Math.sin(grip)]);
    expect(el("r1").angle).toBe(65);
  });
});
