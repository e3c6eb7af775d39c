// The Konva canvas under jsdom (vitest-canvas-mock), for the tests that read what it drew.
import { act, render, waitFor } from "@testing-library/react";
import Konva from "konva";
import { expect, vi } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { createInteractionStore } from "@/canvas/konva/interaction";
import SketchCanvas from "@/canvas/konva/SketchCanvas";
import type { SketchFile } from "@/solver/schema";
import type { Vec2 } from "@/solver/types";
import "./editor-helpers";

export const stage = () => Konva.stages[Konva.stages.length - 1];

/** jsdom lays nothing out: every element measures `width` × `height` at the page's origin (the spy; mockRestore it after). */
export function measuredAs(width: number, height: number) {
  return vi.spyOn(HTMLElement.prototype, "getBoundingClientRect").mockReturnValue({ x: 0, y: 0, left: 0, top: 0, right: width, bottom: height, width, height, toJSON: () => ({}) } as DOMRect);
}

/** Every text the canvas's layers filled, from the canvas mock's record of calls. */
export function drawnTexts(): string[] {
  const out: string[] = [];
  for (const layer of stage().getLayers()) {
    const ctx = layer.getCanvas().getContext()._context as unknown as { __getEvents?: () => Array<{ type: string; props: { text?: string } }> };
    for (const e of ctx.__getEvents?.() ?? []) if (e.type === "fillText" && e.props.text) out.push(e.props.text);
  }
  return out;
}

/** A sketch on an 800 × 600 canvas, drawn once; its editor store. */
export async function onCanvas(sketch: SketchFile) {
  const editor = createEditorStore({ sketch });
  const { container } = render(
    <EditorProvider editor={editor}>
      <div style={{ width: 800, height: 600 }}>
        <SketchCanvas interaction={createInteractionStore()} />
      </div>
    </EditorProvider>,
  );
  await waitFor(() => expect(container.querySelector("canvas")).not.toBeNull());
  return editor;
}

/**
 * A mouse on the canvas at screen points, as the browser sends a drag: the press on the canvas's
 * container (`canvas()`, read at each press), the moves and the release on the window.
 */
export function mouseOn(canvas: () => HTMLElement) {
  const send = (target: EventTarget, type: string, at: Vec2, extra: MouseEventInit) =>
    act(() => {
      target.dispatchEvent(new MouseEvent(type, { clientX: at[0], clientY: at[1], bubbles: true, ...extra }));
    });
  return {
    press: (at: Vec2, extra: MouseEventInit = {}) => send(canvas(), "pointerdown", at, { button: 0, ...extra }),
    moveTo: (at: Vec2, extra: MouseEventInit = {}) => send(window, "pointermove", at, extra),
    release: (at: Vec2, extra: MouseEventInit = {}) => send(window, "pointerup", at, extra),
  };
}
