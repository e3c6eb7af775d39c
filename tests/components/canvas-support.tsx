// The Konva canvas under jsdom (vitest-canvas-mock), for the tests that read what it drew.
import { render, waitFor } from "@testing-library/react";
import Konva from "konva";
import { expect, vi } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { createInteractionStore } from "@/canvas/konva/interaction";
import SketchCanvas from "@/canvas/konva/SketchCanvas";
import type { SketchFile } from "@/solver/schema";
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
