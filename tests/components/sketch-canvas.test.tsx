// The Konva canvas under jsdom (vitest-canvas-mock): a node per element in the drawing layer,
// handles for the selection, and the results drawn on their own layer.
import { act, render, waitFor } from "@testing-library/react";
import Konva from "konva";
import { describe, expect, it, vi } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { createInteractionStore } from "@/canvas/konva/interaction";
import SketchCanvas from "@/canvas/konva/SketchCanvas";
import { exampleById } from "@/canvas/examples";
import { replaceSketch, type Command } from "@/canvas/commands";
import { toScreen } from "@/canvas/geometry/view";
import { newBody } from "@/canvas/model/factory";
import { emptySketch } from "@/canvas/model/elements";
import type { Vec2 } from "@/solver/types";
import { measuredAs, stage } from "./canvas-support";

function mount(id: string) {
  const editor = createEditorStore({ sketch: exampleById(id)!.sketch });
  const utils = render(
    <EditorProvider editor={editor}>
      <div style={{ width: 800, height: 600 }}>
        <SketchCanvas interaction={createInteractionStore()} />
      </div>
    </EditorProvider>,
  );
  return { editor, ...utils };
}

const hits = () => stage().find((n: Konva.Node) => !!n.getAttr("hit")).map((n) => n.getAttr("hit") as { type: string; id: string });

describe("SketchCanvas", () => {
  it("draws every element as its own node on the drawing layer, above the grid", async () => {
    const { container } = mount("fire-monitor-trailer");
    await waitFor(() => expect(container.querySelector("canvas")).not.toBeNull());
    expect(stage().getLayers()).toHaveLength(4);
    const ids = hits().filter((h) => h.type === "element").map((h) => h.id);
    expect(ids.sort()).toEqual(["axle", "foot", "jack", "nozzle", "supply", "trailer"]);
    expect(hits().filter((h) => h.type === "cg").map((h) => h.id)).toEqual(["trailer"]);
    expect(container.querySelector("[role=application]")).toHaveAccessibleName("Drawing of the free-body diagram");
  });

  it("shows the turn handle of a selected directed element and the corners of a selected body", async () => {
    const { editor, container } = mount("washing-cart");
    await waitFor(() => expect(container.querySelector("canvas")).not.toBeNull());
    editor.getState().select(["lance"]);
    await waitFor(() => expect(hits().some((h) => h.type === "rotate" && h.id === "lance")).toBe(true));
    editor.getState().select(["cart"]);
    await waitFor(() => expect(hits().filter((h) => h.type === "corner")).toHaveLength(8));
  });

  it("redraws the interaction layer as soon as a change is committed, without waiting for a frame", async () => {
    const { editor, container } = mount("washing-cart");
    await waitFor(() => expect(container.querySelector("canvas")).not.toBeNull());
    const [, , , interactionLayer] = stage().getLayers();
    const draws: number[] = [];
    interactionLayer.on("draw", () => draws.push(draws.length));
    // no animation frame runs here: a redraw that waited for one would never come
    const raf = vi.spyOn(window, "requestAnimationFrame").mockImplementation(() => 0);
    try {
      act(() => editor.getState().select(["lance"]));
      await Promise.resolve();
      expect(draws.length).toBe(1);
      expect(hits().some((h) => h.type === "rotate" && h.id === "lance")).toBe(true);
    } finally {
      raf.mockRestore();
    }
    // Konva's own DOM listeners are bypassed: pointer input lands on the editor's container
    expect(stage().content.style.pointerEvents).toBe("none");
  });
});

describe("undo of opening an example over one's own sketch", () => {
  it("fits the view to the sketch that comes back, and redo fits the example again", async () => {
    // jsdom lays nothing out: give the canvas's container a size
    const rect = measuredAs(800, 600);
    try {
      const own = { ...emptySketch("A crate far out"), bodies: [newBody("b1", [[50, 40], [51, 40], [51, 40.6], [50, 40.6]], "Crate")] };
      const editor = createEditorStore({ sketch: own });
      const { container } = render(
        <EditorProvider editor={editor}>
          <SketchCanvas interaction={createInteractionStore()} />
        </EditorProvider>,
      );
      await waitFor(() => expect(container.querySelector("canvas")).not.toBeNull());
      const onCanvas = () =>
        editor.getState().sketch.bodies.every((b) =>
          (b.outline as Vec2[]).every((p) => {
            const [x, y] = toScreen(editor.getState().view, p);
            return x >= 0 && x <= 800 && y >= 0 && y <= 600;
          }),
        );
      expect(onCanvas()).toBe(true);
      act(() => {
        editor.getState().apply(replaceSketch({ sketch: exampleById("washing-cart")!.sketch, label: "Open the example" }) as Command<unknown>);
      });
      expect(onCanvas()).toBe(true);
      act(() => editor.getState().undo());
      expect(editor.getState().sketch.title).toBe("A crate far out");
      expect(onCanvas()).toBe(true);
      act(() => editor.getState().redo());
      expect(onCanvas()).toBe(true);
    } finally {
      rect.mockRestore();
    }
  });
});

describe("drawing a layer right after a commit", () => {
  it("coalesces the changes of one task into one draw, and skips a layer destroyed before it", async () => {
    const { drawAfterCommit } = await import("@/canvas/konva/immediate");
    const div = document.createElement("div");
    document.body.appendChild(div);
    const st = new Konva.Stage({ container: div, width: 100, height: 80 });
    const layer = new Konva.Layer();
    st.add(layer);
    drawAfterCommit(layer);
    drawAfterCommit(layer); // a second call changes nothing
    const draw = vi.spyOn(layer, "draw");
    layer.batchDraw();
    layer.batchDraw();
    layer.add(new Konva.Rect({ width: 10, height: 10, fill: "black" }));
    expect(draw).not.toHaveBeenCalled();
    await Promise.resolve();
    expect(draw).toHaveBeenCalledTimes(1);
    layer.batchDraw();
    layer.remove();
    await Promise.resolve();
    expect(draw).toHaveBeenCalledTimes(1);
    st.destroy();
  });
});

describe("support states for the drawing", () => {
  it("a new result with the same states gives back the same map (no node re-renders), a changed state a new one", async () => {
    const { statesOf } = await import("@/canvas/konva/nodes");
    const { solveFile } = await import("@/solver/index");
    const cart = structuredClone(exampleById("washing-cart")!.sketch);
    const r1 = solveFile(cart);
    const r2 = solveFile({ ...cart, parameters: { ...cart.parameters, theta: "-74 deg" } });
    const tipped = solveFile({ ...cart, parameters: { ...cart.parameters, theta: "-35 deg" } });
    if (!r1.ok || !r2.ok || !tipped.ok) throw new Error("does not solve");
    const a = statesOf(r1);
    expect(statesOf(r2)).toBe(a);
    const b = statesOf(tipped);
    expect(b).not.toBe(a);
    expect(b.get("front")).toBe("lifted");
    expect(a.get("front")).toBe("bearing");
  });
});
