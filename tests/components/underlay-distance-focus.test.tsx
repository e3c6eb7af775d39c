// Setting the underlay's scale with the mouse: the second mark is a click on the drawing, which
// takes the focus as the pointer goes down. The distance is what is typed next, so its field must
// have the focus once the click is over — typed into the drawing, "1200 mm" would run the
// drawing's shortcuts and the distance would be lost. With nothing traced yet, setting the scale
// then shows the whole drawing at its new size (it grows or shrinks about the first mark).
import { act, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { UnderlayPanel } from "@/components/editor/UnderlayPanel";
import { PersistenceCtx } from "@/components/editor/usePersistence";
import { EditorProvider } from "@/canvas/context";
import { createEditorStore } from "@/canvas/store";
import { fitUnderlayView } from "@/canvas/geometry/underlay";
import type { SketchPersistence } from "@/canvas/persistence";
import { emptySketch } from "@/canvas/model/elements";
import type { SketchFile } from "@/solver/schema";

const UPLOAD = "0b7d1f52-9a51-4c8e-8f4e-2a7b8c1d0e11";

function withDrawing(): SketchFile {
  return { ...emptySketch("Ducted fan"), underlay: { upload: UPLOAD, width: 1754, height: 1241, origin: [-1, 1.5], metresPerPixel: 0.0025, rotation: 0, opacity: 0.6 } };
}

const persistence: SketchPersistence = {
  kind: "saved",
  autosave: false,
  describe: () => "Ducted fan · Test bay",
  load: async () => ({ ok: true, sketch: withDrawing(), version: 1 }),
  save: async () => ({ ok: true, version: 2, savedAt: new Date().toISOString() }),
  uploadUnderlay: async () => ({ id: UPLOAD, width: 1754, height: 1241, name: "GA.pdf" }),
};

describe("the distance between the two marks", () => {
  it("takes the focus back from the drawing once the second mark is clicked", async () => {
    const store = createEditorStore({ sketch: withDrawing() });
    render(
      <EditorProvider editor={store}>
        <PersistenceCtx.Provider value={persistence}>
          <div tabIndex={0} data-testid="drawing" role="application" aria-label="Drawing" />
          <UnderlayPanel />
        </PersistenceCtx.Provider>
      </EditorProvider>,
    );
    const drawing = screen.getByTestId("drawing");
    act(() => store.getState().setTool({ kind: "calibrate", points: [[416.7, 979.2]] }));
    // the second click: the mark is set on pointer down (the field mounts), then the drawing takes the focus
    act(() => store.getState().setTool({ kind: "calibrate", points: [[416.7, 979.2], [1166.7, 979.2]] }));
    drawing.focus();
    expect(document.activeElement).toBe(drawing);
    await waitFor(() => expect(document.activeElement).toBe(screen.getByTestId("underlay-distance")));
    expect(screen.getByLabelText(/Real distance between the marks \(750 px apart\)/)).toBe(document.activeElement);
  });

  it("with nothing traced yet, setting the scale shows the whole drawing at its new size", async () => {
    const user = userEvent.setup();
    const store = createEditorStore({ sketch: withDrawing() });
    store.getState().setViewport({ width: 840, height: 460 });
    const before = store.getState().view;
    render(
      <EditorProvider editor={store}>
        <PersistenceCtx.Provider value={persistence}>
          <UnderlayPanel />
        </PersistenceCtx.Provider>
      </EditorProvider>,
    );
    act(() => store.getState().setTool({ kind: "calibrate", points: [[416.7, 979.2], [1166.7, 979.2]] }));
    await user.type(screen.getByTestId("underlay-distance"), "1200 mm{Enter}");
    const u = store.getState().sketch.underlay!;
    // 1.2 m over 750 px
    expect(u.metresPerPixel).toBeCloseTo(0.0016, 12);
    expect(store.getState().view).toEqual(fitUnderlayView(u, 840, 460));
    expect(store.getState().view).not.toEqual(before);
  });
});
