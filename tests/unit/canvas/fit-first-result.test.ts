// A view fitted before there was any result (a body drawn, no support yet) kept only a guess of
// room for the reactions' arrows. When the first result appears and the view is still as the fit
// left it, it is fitted once more, now measuring the arrows, if they would be cut (a short
// window); where all of it is in view already it stays, so the body does not move from under the
// pointer placing the next support. Never on a later result (the drawing must not jump while
// something is dragged), and never over a zoom or pan of the user's.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { createEditorStore } from "@/canvas/store";
import { addElement, moveElement, type Command } from "@/canvas/commands";
import { followFitRequests } from "@/canvas/fitRequests";
import { drawnInFrame, fitScene, isFitted } from "@/canvas/geometry/fit";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { primsBox } from "@/canvas/render/prims";
import { scenePrims } from "@/canvas/render/scenePrims";
import { linkStores } from "../../support/linked-stores";

const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;
const VIEWPORT = { width: 900, height: 600 };
/** A small drawing (a short window on a narrow screen): the first fit's guess of room is too little for the arrows. */
const SHORT = { width: 400, height: 240 };

/** A 6 m wide, 0.4 m tall equipment skid of 12 t (our own scenario), not yet supported. */
function skid(): SketchFile {
  const body = { ...newBody("b1", [[0, 0], [6, 0], [6, 0.4], [0, 0.4]], "Skid"), mass: "12000 kg" };
  return { ...emptySketch("Skid"), bodies: [body as never] };
}

const PIN = { id: "s1", body: "b1", kind: "pin", at: [0.3, 0] } as never;
const ROLLER = { id: "s2", body: "b1", kind: "contact", at: [5.7, 0], angle: 90 } as never;

function linked(busy: () => boolean = () => false, viewport = VIEWPORT) {
  const editor = createEditorStore({ sketch: skid() });
  editor.getState().setViewport(viewport);
  const { stores, stops } = linkStores(editor);
  const { analysis, scene } = stores;
  stops.push(followFitRequests(stores, busy));
  // the canvas's first fit: a body, no result
  const s = editor.getState();
  s.setView(fitScene(scene.getState(), viewport.width, viewport.height, { result: analysis.getState().shown, units: s.units }));
  return { editor, analysis, scene, stop: () => stops.forEach((f) => f()) };
}

/** All of what is drawn, the result included, is inside the drawing area at the view now. */
const allInView = (t: ReturnType<typeof linked>) => {
  const { view, viewport, units } = t.editor.getState();
  return drawnInFrame(t.scene.getState(), view, viewport, { result: t.analysis.getState().shown, units });
};

/** Everything drawn, the reactions' arrows and their words included, on screen (px). */
function drawnBox(t: ReturnType<typeof linked>) {
  const { view } = t.editor.getState();
  const { groups, results } = scenePrims(t.scene.getState(), view.scale, "SI", t.analysis.getState().shown);
  const p = primsBox([...groups.flatMap((g) => g.prims), ...results]);
  return { left: view.x + p.minX, right: view.x + p.maxX, top: view.y + p.minY, bottom: view.y + p.maxY, results: results.length };
}

const addSupports = (t: ReturnType<typeof linked>) => {
  t.editor.getState().apply(c(addElement({ kind: "pin", element: PIN })));
  t.editor.getState().apply(c(addElement({ kind: "contact", element: ROLLER })));
};

describe("the view when the first result appears", () => {
  it("is fitted once more, with room for the reactions, when it is still as the first fit left it and they would be cut", () => {
    const t = linked(undefined, SHORT);
    // (a body on nothing solves, with no reactions: it is not held)
    expect(Object.keys(t.analysis.getState().shown?.reactions ?? {})).toEqual([]);
    const first = t.editor.getState().view;
    expect(isFitted(first)).toBe(true);
    // the pin first: the first reactions (the skid not yet held, its pin's drawn all the same)
    t.editor.getState().apply(c(addElement({ kind: "pin", element: PIN })));
    const shown = t.analysis.getState().shown;
    expect(shown?.reactions.s1).toBeDefined();
    const { view } = t.editor.getState();
    expect(view).not.toBe(first);
    expect(isFitted(view)).toBe(true);
    expect(view).toEqual(fitScene(t.scene.getState(), SHORT.width, SHORT.height, { result: shown }));
    // at the first fit's view the pin's arrow and words would have been cut
    t.editor.getState().setView(first);
    expect(allInView(t)).toBe(false);
    t.editor.getState().setView(view);
    // then the contact: a later result, the view stays
    t.editor.getState().apply(c(addElement({ kind: "contact", element: ROLLER })));
    expect(t.analysis.getState().shown?.reactions.s2).toBeDefined();
    expect(t.editor.getState().view).toBe(view);
    t.stop();
  });

  it("stays where it is when all of it, the first reactions too, is already in view (900 × 600)", () => {
    const t = linked();
    const first = t.editor.getState().view;
    t.editor.getState().apply(c(addElement({ kind: "pin", element: PIN })));
    expect(t.analysis.getState().shown?.reactions.s1).toBeDefined();
    expect(t.editor.getState().view).toBe(first);
    expect(allInView(t)).toBe(true);
    // then the contact: every arrow and word of the result on the canvas
    t.editor.getState().apply(c(addElement({ kind: "contact", element: ROLLER })));
    expect(t.editor.getState().view).toBe(first);
    const box = drawnBox(t);
    expect(box.results).toBeGreaterThan(0);
    expect(box.left).toBeGreaterThanOrEqual(0);
    expect(box.right).toBeLessThanOrEqual(VIEWPORT.width);
    expect(box.top).toBeGreaterThanOrEqual(0);
    expect(box.bottom).toBeLessThanOrEqual(VIEWPORT.height);
    t.stop();
  });

  it("is not fitted again on a later result: moving a support leaves the view alone", () => {
    const t = linked();
    addSupports(t);
    const view = t.editor.getState().view;
    t.editor.getState().apply(c(moveElement({ ids: ["s2"], delta: [-1, 0] })));
    expect(t.analysis.getState().shown?.reactions.s2).toBeDefined();
    expect(t.editor.getState().view).toBe(view);
    t.stop();
  });

  it("is left as the user zoomed or panned it", () => {
    const t = linked();
    const mine = { scale: 40, x: 100, y: 400 };
    t.editor.getState().setView(mine);
    addSupports(t);
    expect(t.analysis.getState().shown?.reactions.s1).toBeDefined();
    expect(t.editor.getState().view).toBe(mine);
    t.stop();
  });

  it("waits for a drag to end: a first result during one is fitted for at the next result", () => {
    let dragging = true;
    const t = linked(() => dragging, SHORT);
    const first = t.editor.getState().view;
    addSupports(t);
    expect(t.analysis.getState().shown?.reactions.s1).toBeDefined();
    expect(t.editor.getState().view).toBe(first);
    dragging = false;
    t.editor.getState().apply(c(moveElement({ ids: ["s2"], delta: [-0.5, 0] })));
    const { view } = t.editor.getState();
    expect(view).not.toBe(first);
    expect(view).toEqual(fitScene(t.scene.getState(), SHORT.width, SHORT.height, { result: t.analysis.getState().shown }));
    // and only that once
    t.editor.getState().apply(c(moveElement({ ids: ["s2"], delta: [-0.5, 0] })));
    expect(t.editor.getState().view).toBe(view);
    t.stop();
  });
});
