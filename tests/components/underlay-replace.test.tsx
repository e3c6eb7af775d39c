// "Replace…" with the next revision of the same drawing: a file of the same pixel size keeps the
// scale, place, turn, opacity, lock and marks of the one it replaces, so the body traced over
// rev A still lines up with rev B (before, the scale was dropped and the new sheet was fitted
// into view at an arbitrary size, off the traced model). A file of another size is fitted anew
// and the notice says why its scale was not kept.
import { fireEvent, render, screen, waitFor } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { UnderlayPanel } from "@/components/editor/UnderlayPanel";
import { PersistenceCtx } from "@/components/editor/usePersistence";
import { EditorProvider } from "@/canvas/context";
import { createEditorStore } from "@/canvas/store";
import type { SketchPersistence } from "@/canvas/persistence";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import type { SketchFile, UnderlayFile } from "@/solver/schema";

const REV_A = "0b7d1f52-9a51-4c8e-8f4e-2a7b8c1d0e11";
const REV_B = "5f0c2a9e-3d4b-4e1a-9c8d-7b6a5f4e3d21";

/** Rev A of the fan's GA, calibrated on its 1200 mm dimension line, locked, turned a hair. */
const CALIBRATED: UnderlayFile = {
  upload: REV_A,
  width: 1754,
  height: 1241,
  origin: [-0.387483, 1.438127],
  metresPerPixel: 0.0016,
  rotation: 0.5,
  opacity: 0.45,
  locked: true,
  hidden: true,
  calibration: { a: [416.7, 979.2], b: [1166.7, 979.2], distance: "1200 mm" },
};

function traced(): SketchFile {
  return { ...emptySketch("Ducted fan"), bodies: [newBody("b1", [[0.276775, 0.109612], [1.476775, 0.109612], [1.476775, 1.009612], [0.276775, 1.009612]], "Fan housing")], underlay: CALIBRATED };
}

function setup(size: { width: number; height: number }) {
  const uploadUnderlay = vi.fn(async (file: File) => ({ id: REV_B, ...size, name: file.name }));
  const persistence: SketchPersistence = {
    kind: "saved",
    autosave: false,
    describe: () => "Ducted fan · Roof",
    load: async () => ({ ok: true, sketch: traced(), version: 1 }),
    save: async () => ({ ok: true, version: 2, savedAt: new Date().toISOString() }),
    uploadUnderlay,
  };
  const store = createEditorStore({ sketch: traced() });
  store.getState().setViewport({ width: 840, height: 460 });
  render(
    <EditorProvider editor={store}>
      <PersistenceCtx.Provider value={persistence}>
        <UnderlayPanel />
      </PersistenceCtx.Provider>
    </EditorProvider>,
  );
  const file = new File([new Uint8Array([37, 80, 68, 70])], "DF-900 GA rev B.pdf", { type: "application/pdf" });
  fireEvent.change(screen.getByTestId("underlay-input"), { target: { files: [file] } });
  return store;
}

describe("replacing the underlay", () => {
  it("with a sheet of the same size keeps its scale and place, and shows it", async () => {
    const store = setup({ width: 1754, height: 1241 });
    await waitFor(() => expect(store.getState().sketch.underlay?.upload).toBe(REV_B));
    const { hidden, ...rest } = CALIBRATED;
    expect(hidden).toBe(true);
    expect(store.getState().sketch.underlay).toEqual({ ...rest, upload: REV_B });
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("from 1200 mm between two marks");
    expect(store.getState().notice).toBe("“DF-900 GA rev B.pdf” replaces the drawing at the same scale and place (the same size, 1754 × 1241 px): check that it lines up with what is traced.");
    expect(store.getState().past.at(-1)?.label).toBe("Replace the underlay");
  });

  it("with a sheet of another size fits it anew and says its scale was not kept", async () => {
    const store = setup({ width: 2480, height: 1754 });
    await waitFor(() => expect(store.getState().sketch.underlay?.upload).toBe(REV_B));
    const u = store.getState().sketch.underlay!;
    expect(u).toMatchObject({ width: 2480, height: 1754, rotation: 0, opacity: 0.6 });
    expect(u.calibration).toBeUndefined();
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("not set from the drawing yet");
    expect(store.getState().notice).toMatch(/^“DF-900 GA rev B\.pdf” is under the sketch\. It is not the size of the drawing it replaces \(1754 × 1241 px\), so its scale is not kept: set it from two marks/);
  });
});
