// The editor's Underlay section and its read-only mode, with Testing Library: the scratch sketch
// says underlays need a saved sketch; a saved one uploads, places the image, sets the scale from
// two marks and a typed distance, fades, hides and locks it (each an undo step); a role that may
// not edit sees a note, no tray, and disabled fields.
import { act, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { Editor } from "@/components/editor/Editor";
import { UnderlayPanel } from "@/components/editor/UnderlayPanel";
import { PersistenceCtx } from "@/components/editor/usePersistence";
import { EditorProvider } from "@/canvas/context";
import { createEditorStore } from "@/canvas/store";
import type { SketchPersistence } from "@/canvas/persistence";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import type { SketchFile } from "@/solver/schema";
import { renderEditor } from "./editor-helpers";

const UPLOAD = "0b7d1f52-9a51-4c8e-8f4e-2a7b8c1d0e11";

function savedPersistence(sketch: SketchFile, opts: { readOnly?: boolean } = {}) {
  const uploadUnderlay = vi.fn(async (file: File) => ({ id: UPLOAD, width: 1000, height: 600, name: file.name }));
  const saved: SketchFile[] = [];
  const persistence: SketchPersistence = {
    kind: "saved",
    autosave: false,
    describe: () => "Skid · Test bay",
    load: async () => ({ ok: true, sketch, version: 1, readOnly: opts.readOnly }),
    save: async (s) => {
      saved.push(s);
      return { ok: true, version: 2, savedAt: new Date().toISOString() };
    },
    uploadUnderlay,
  };
  return { persistence, uploadUnderlay, saved };
}

function skid(): SketchFile {
  return { ...emptySketch("Skid"), bodies: [newBody("b1", [[0, 0], [3, 0], [3, 1.2], [0, 1.2]], "Skid")], supports: [{ id: "s1", body: "b1", kind: "pin", at: [0, 0] }] };
}

async function open(persistence: SketchPersistence) {
  const utils = render(<Editor persistence={persistence} />);
  await screen.findByTestId("underlay-panel");
  // let the editor's effects run (see renderEditor)
  await act(async () => {});
  return utils;
}

describe("the Underlay section", () => {
  it("on the scratch sketch, explains that underlays need a saved sketch", async () => {
    await renderEditor(skid());
    expect(screen.getByTestId("underlay-needs-saved")).toHaveTextContent("Underlays need a saved sketch");
    expect(screen.queryByTestId("underlay-upload")).toBeNull();
  });

  it("uploads a drawing, sets its scale from two marks and a typed distance, fades, hides and locks it; undo walks back", async () => {
    const user = userEvent.setup();
    const { persistence, uploadUnderlay } = savedPersistence(skid());
    const store = createEditorStore({ sketch: skid() });
    store.getState().setViewport({ width: 1000, height: 700 });
    render(
      <EditorProvider editor={store}>
        <PersistenceCtx.Provider value={persistence}>
          <UnderlayPanel />
        </PersistenceCtx.Provider>
      </EditorProvider>,
    );
    const file = new File([new Uint8Array([137, 80, 78, 71])], "GA skid.png", { type: "image/png" });
    fireEvent.change(screen.getByTestId("underlay-input"), { target: { files: [file] } });
    await screen.findByTestId("underlay-controls");
    expect(uploadUnderlay).toHaveBeenCalledWith(file);
    const placed = store.getState().sketch.underlay!;
    expect(placed).toMatchObject({ upload: UPLOAD, width: 1000, height: 600, rotation: 0, opacity: 0.6 });
    // fitted into four fifths of the 1000 × 700 canvas at the view's 120 px/m: 800 px wide
    expect(placed.metresPerPixel * 1000 * store.getState().view.scale).toBeCloseTo(800, 6);
    expect(store.getState().notice).toMatch(/^“GA skid.png” is under the sketch\. Set its scale/);
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("not set from the drawing yet");

    // the marks come from clicks on the canvas (pointer.ts, and the e2e story); here the tool is given them
    await user.click(screen.getByTestId("underlay-calibrate"));
    expect(store.getState().tool).toEqual({ kind: "calibrate", points: [] });
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("Click the first mark on the drawing");
    // from the keyboard: the marks typed in image pixels (the button it came from is gone: the
    // focus is on the first of them); one off the image is refused, naming it
    expect(document.activeElement).toBe(screen.getByTestId("underlay-mark-0"));
    for (const [i, v] of ["300", "520", "1700", "520"].entries()) await user.type(screen.getByTestId(`underlay-mark-${i}`), v);
    await user.click(screen.getByTestId("underlay-use-marks"));
    expect(screen.getByRole("alert")).toHaveTextContent("The second mark x must be a pixel of the image: 0 to 1000.");
    expect(document.activeElement).toBe(screen.getByTestId("underlay-mark-2"));
    await user.clear(screen.getByTestId("underlay-mark-2"));
    await user.type(screen.getByTestId("underlay-mark-2"), "700{Enter}");
    expect(store.getState().tool).toEqual({ kind: "calibrate", points: [[300, 520], [700, 520]] });
    const distance = screen.getByTestId("underlay-distance");
    await user.type(distance, "2 kg");
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("2 kg is a mass (kg), but this field needs a length (m)");
    expect(screen.getByTestId("underlay-set-scale")).toBeDisabled();
    await user.clear(distance);
    await user.type(distance, "78.74 in");
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("= 2 m, so 5 mm a pixel");
    await user.click(screen.getByTestId("underlay-set-scale"));
    const cal = store.getState().sketch.underlay!;
    // 78.74 in = 1.999996 m over 400 px
    expect(cal.metresPerPixel).toBeCloseTo((78.74 * 0.0254) / 400, 12);
    expect(cal.calibration).toEqual({ a: [300, 520], b: [700, 520], distance: "78.74 in" });
    expect(store.getState().tool).toEqual({ kind: "select" });
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("from 78.74 in between two marks");

    fireEvent.change(screen.getByTestId("underlay-opacity"), { target: { value: "0.35" } });
    await user.click(screen.getByTestId("underlay-shown"));
    await user.click(screen.getByTestId("underlay-locked"));
    expect(store.getState().sketch.underlay).toMatchObject({ opacity: 0.35, hidden: true, locked: true });
    expect(screen.getByTestId("underlay-x")).toBeDisabled();
    await user.click(screen.getByTestId("underlay-locked"));
    const x = screen.getByTestId("underlay-x");
    await user.clear(x);
    // a value it cannot read is said beside the field, and the field is described by it
    await user.type(x, "2 kg{Enter}");
    expect(x).toHaveAttribute("aria-invalid", "true");
    expect(document.getElementById(x.getAttribute("aria-describedby")!)?.textContent).toMatch(/is a mass/);
    await user.clear(x);
    await user.type(x, "1500 mm{Enter}");
    expect(x).not.toHaveAttribute("aria-describedby");
    expect(store.getState().sketch.underlay!.origin[0]).toBeCloseTo(1.5, 9);
    expect(store.getState().past.map((e) => e.label)).toEqual([
      "Put a drawing under the sketch",
      "Set the underlay's scale (78.74 in)",
      "Underlay at 35 % opacity",
      "Hide the underlay",
      "Lock the underlay",
      "Unlock the underlay",
      "Move the underlay",
    ]);
    for (let i = 0; i < 7; i++) act(() => store.getState().undo());
    expect(store.getState().sketch.underlay).toBeUndefined();
    expect(screen.getByTestId("underlay-upload")).toBeInTheDocument();
  });

  it("an upload the server refuses shows its reason and changes nothing", async () => {
    const { persistence } = savedPersistence(skid());
    persistence.uploadUnderlay = async () => {
      throw new Error("This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says).");
    };
    await open(persistence);
    fireEvent.change(screen.getByTestId("underlay-input"), { target: { files: [new File(["text"], "drawing.png", { type: "image/png" })] } });
    expect(await screen.findByTestId("underlay-problem")).toHaveTextContent("whatever its name says");
    expect(screen.queryByTestId("underlay-controls")).toBeNull();
  });
});

describe("a read-only editor (a viewer or a checker on a saved sketch)", () => {
  it("shows the note, hides the tray, and disables every field and underlay control", async () => {
    const sketch = { ...skid(), underlay: { upload: UPLOAD, width: 1000, height: 600, origin: [0, 2] as [number, number], metresPerPixel: 0.005, rotation: 0, opacity: 0.6 } };
    const { persistence } = savedPersistence(sketch, { readOnly: true });
    await open(persistence);
    expect(screen.getByTestId("read-only-note")).toHaveTextContent("Read only — your role may not edit");
    expect(screen.queryByRole("heading", { name: "Add" })).toBeNull();
    expect(screen.queryByTitle(/^Pin/)).toBeNull();
    expect(screen.getByTestId("sketch-form").closest("fieldset")).toBeDisabled();
    expect(screen.getByTestId("sketch-form").querySelector("input")).toBeDisabled();
    for (const id of ["underlay-calibrate", "underlay-shown", "underlay-locked", "underlay-opacity", "underlay-remove", "underlay-x"]) expect(screen.getByTestId(id)).toBeDisabled();
    expect(screen.queryByTestId("underlay-upload")).toBeNull();
    await waitFor(() => expect(screen.getByTestId("sketch-title")).toHaveTextContent("Skid"));
    // a selected element can still be copied (into a sketch the reader may edit), nothing else
    await userEvent.setup().click(within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: /Pin s1/ }));
    const actions = within(screen.getByTestId("selection-actions"));
    expect(actions.getAllByRole("button").map((b) => b.textContent)).toEqual(["Copy"]);
    expect(actions.getByRole("button", { name: "Copy" })).toBeEnabled();
    // nothing that would replace the sketch is offered: no examples, no import or new sketch; exports stay
    const user = userEvent.setup();
    expect(screen.queryByTestId("menu-examples")).toBeNull();
    await user.click(screen.getByTestId("menu-file"));
    expect(screen.getAllByRole("menuitem").map((m) => m.textContent?.replace(/Ctrl.*$/, ""))).toEqual(["Export JSON", "Export drawing as SVG", "Export drawing as PNG"]);
    await user.keyboard("{Escape}");
    expect(screen.getByText(/^Read only: click an element to see its values/)).toBeInTheDocument();
    // the keys still refuse, and say why (Ctrl+O would import)
    await user.keyboard("{Control>}o{/Control}");
    expect(screen.getByTestId("sketch-title")).toHaveTextContent("Skid");
  });
});

describe("setting the scale on a narrow window (the properties panel lies over the drawing)", () => {
  /** A window `width` px wide, as far as CSS media queries of the form (max-width: N px) go. */
  function windowWidth(width: number) {
    window.matchMedia = ((query: string) => {
      const max = /\(max-width:\s*(\d+)px\)/.exec(query);
      return { matches: max ? width <= Number(max[1]) : false, media: query, onchange: null, addListener() {}, removeListener() {}, addEventListener() {}, removeEventListener() {}, dispatchEvent: () => false } as MediaQueryList;
    }) as typeof window.matchMedia;
  }
  const panelShown = () => !document.getElementById("properties-panel")!.className.split(/\s+/).includes("max-[1179px]:hidden");

  it("at 390 px the panel steps aside while the marks are picked on the drawing, and comes back for the distance", async () => {
    windowWidth(390);
    try {
      const user = userEvent.setup();
      const sketch = { ...skid(), underlay: { upload: UPLOAD, width: 1000, height: 600, origin: [0, 2] as [number, number], metresPerPixel: 0.005, rotation: 0, opacity: 0.6 } };
      const { persistence } = savedPersistence(sketch);
      await open(persistence);
      await user.click(screen.getByTestId("toggle-properties"));
      expect(panelShown()).toBe(true);
      await user.click(screen.getByTestId("underlay-calibrate"));
      // the drawing is free for the two taps
      expect(panelShown()).toBe(false);
      expect(screen.getByTestId("toggle-properties")).toHaveAttribute("aria-expanded", "false");
      // the two marks land (here typed: jsdom has no drawing to tap, and applies no CSS)
      for (const [i, v] of ["300", "520", "700", "520"].entries()) await user.type(screen.getByTestId(`underlay-mark-${i}`), v);
      expect(panelShown()).toBe(false);
      await user.click(screen.getByTestId("underlay-use-marks"));
      // back for the distance, with the focus in its field
      expect(panelShown()).toBe(true);
      await waitFor(() => expect(document.activeElement).toBe(screen.getByTestId("underlay-distance")));
      await user.type(screen.getByTestId("underlay-distance"), "2 m{Enter}");
      expect(screen.getByTestId("underlay-mpp")).toHaveAttribute("data-mpp", "0.005");
      expect(panelShown()).toBe(true);
    } finally {
      delete (window as { matchMedia?: unknown }).matchMedia;
    }
  });

  it("on a wide window the panel stays where it is", async () => {
    windowWidth(1440);
    try {
      const user = userEvent.setup();
      const sketch = { ...skid(), underlay: { upload: UPLOAD, width: 1000, height: 600, origin: [0, 2] as [number, number], metresPerPixel: 0.005, rotation: 0, opacity: 0.6 } };
      await open(savedPersistence(sketch).persistence);
      await user.click(screen.getByTestId("underlay-calibrate"));
      expect(screen.getByTestId("underlay-scale")).toHaveTextContent("Click the first mark on the drawing");
      expect(screen.getByTestId("toggle-properties")).toHaveAttribute("aria-expanded", "false");
      expect(document.activeElement).toBe(screen.getByTestId("underlay-mark-0"));
    } finally {
      delete (window as { matchMedia?: unknown }).matchMedia;
    }
  });
});


/** The underlay panel of a saved sketch, on its own. */
function mountPanel(sketch: ReturnType<typeof skid>, units: "SI" | "US" = "SI") {
  const store = createEditorStore({ sketch });
  store.getState().setUnits(units);
  render(
    <EditorProvider editor={store}>
      <PersistenceCtx.Provider value={savedPersistence(sketch).persistence}>
        <UnderlayPanel />
      </PersistenceCtx.Provider>
    </EditorProvider>,
  );
  return store;
}

/** The underlay panel on a US customary screen, its two marks 400 px apart set, waiting for the distance. */
async function markedOnUsScreen() {
  const user = userEvent.setup();
  const store = mountPanel({ ...skid(), underlay: { upload: UPLOAD, width: 1000, height: 600, origin: [0, 2] as [number, number], metresPerPixel: 0.01, rotation: 0, opacity: 0.6 } }, "US");
  await user.click(screen.getByTestId("underlay-calibrate"));
  for (const [i, v] of ["300", "520", "700", "520"].entries()) await user.type(screen.getByTestId(`underlay-mark-${i}`), v);
  await user.click(screen.getByTestId("underlay-use-marks"));
  return { user, store };
}

describe("the underlay's fields read values, not the sketch's parameters", () => {
  it("an unknown name is not told to become a parameter, and the units offered are the field's own", async () => {
    const user = userEvent.setup();
    const sketch = { ...skid(), parameters: { theta: "30 deg" }, underlay: { upload: UPLOAD, width: 1000, height: 600, origin: [0, 2] as [number, number], metresPerPixel: 0.005, rotation: 0, opacity: 0.6 } };
    const store = mountPanel(sketch);
    const turn = screen.getByTestId("underlay-rotation");
    await user.clear(turn);
    await user.type(turn, "theta{Enter}");
    expect(turn).toHaveAttribute("aria-invalid", "true");
    expect(document.getElementById(turn.getAttribute("aria-describedby")!)).toHaveTextContent(
      'unknown name "theta": use a unit such as deg, rad (the underlay takes values with their units, not the sketch\'s parameters)',
    );
    expect(store.getState().sketch.underlay!.rotation).toBe(0);

    await user.click(screen.getByTestId("underlay-calibrate"));
    for (const [i, v] of ["300", "520", "700", "520"].entries()) await user.type(screen.getByTestId(`underlay-mark-${i}`), v);
    await user.click(screen.getByTestId("underlay-use-marks"));
    await user.type(screen.getByTestId("underlay-distance"), "2 yds");
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent('unknown name "yds": use a unit such as m, mm, ft, in (the underlay takes values with their units');
    expect(screen.getByTestId("underlay-set-scale")).toBeDisabled();
  });

  it("a distance typed without its unit is refused, not read as metres", async () => {
    const { user, store } = await markedOnUsScreen();
    const distance = screen.getByTestId("underlay-distance");
    // a drawing dimensioned in inches: "96" would have been 96 m, 39 times too large
    await user.type(distance, "96");
    expect(distance).toHaveAttribute("aria-invalid", "true");
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("96 what? Give the unit with the distance, as the drawing is dimensioned: 96 m, 96 mm, 96 ft or 96 in.");
    expect(screen.getByTestId("underlay-set-scale")).toBeDisabled();
    await user.type(distance, " in{Enter}");
    // 96 in = 8 ft over 400 px: 0.24 in a pixel
    expect(store.getState().sketch.underlay!.metresPerPixel).toBeCloseTo((96 * 0.0254) / 400, 12);
    expect(store.getState().sketch.underlay!.calibration).toEqual({ a: [300, 520], b: [700, 520], distance: "96 in" });
    // set again: the distance kept comes back as typed, with its unit
    await user.click(screen.getByTestId("underlay-calibrate"));
    for (const [i, v] of ["300", "520", "700", "520"].entries()) await user.type(screen.getByTestId(`underlay-mark-${i}`), v);
    await user.click(screen.getByTestId("underlay-use-marks"));
    expect(screen.getByTestId("underlay-distance")).toHaveValue("96 in");
  });

  it("the distance read is said in feet on a US customary screen", async () => {
    const { user } = await markedOnUsScreen();
    await user.type(screen.getByTestId("underlay-distance"), "2.4384 m");
    expect(screen.getByTestId("underlay-scale")).toHaveTextContent("= 8 ft, so 0.24 in a pixel");
  });
});
