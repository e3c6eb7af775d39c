// Rendering the editor under jsdom: in-memory persistence, a ResizeObserver stand-in, and the
// store of the mounted editor for assertions.
import { act, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect } from "vitest";
import { Editor } from "@/components/editor/Editor";
import { scratchPersistence } from "@/canvas/persistence";
import type { SketchFile } from "@/solver/schema";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { importSketchText } from "@/canvas/files";
import type { ActionContext } from "@/canvas/actions";
import { ResultsDock } from "@/components/results/ResultsDock";
import { ActionContextCtx } from "@/components/editor/useActions";
import { withResizeObserver } from "./dialog-support";

/** A 4 m beam on a left pin and a right contact with a 10 kN load at mid-span (demo data). */
export function beam(loadLabel?: string): SketchFile {
  return {
    ...emptySketch("Beam on a pin and a contact"),
    bodies: [newBody("b1", [[0, 0], [4, 0], [4, 0.5], [0, 0.5]], "Beam")],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [0, 0], label: "left pin" },
      { id: "s2", body: "b1", kind: "contact", at: [4, 0], angle: 90, label: "right pad" },
    ],
    loads: [{ id: "l1", body: "b1", kind: "force", at: [2, 0.5], magnitude: "10 kN", angle: -90, ...(loadLabel ? { label: loadLabel } : {}) }],
  };
}

/** The beam with an inlet p1 on its left end (demo data). */
export function beamWithInlet(): SketchFile {
  return { ...beam("F1"), ports: [{ id: "p1", body: "b1", kind: "inlet", at: [0, 0.25], angle: 0, massFlow: 10, velocity: 5, area: 0.01 }] } as SketchFile;
}

/** A JSON response, as a stubbed `fetch` answers. */
export const jsonResponse = (body: unknown, status = 200) => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

export function memoryStorage(initial?: SketchFile) {
  const mem = new Map<string, string>();
  if (initial) mem.set("counterpoise:scratch-sketch:v1", JSON.stringify({ savedAt: "", sketch: initial }));
  return { mem, storage: { getItem: (k: string) => mem.get(k) ?? null, setItem: (k: string, v: string) => void mem.set(k, v), removeItem: (k: string) => void mem.delete(k) } };
}

withResizeObserver();

export async function renderEditor(sketch?: SketchFile, example?: string) {
  const { storage, mem } = memoryStorage(sketch);
  const persistence = scratchPersistence(storage);
  const utils = render(<Editor persistence={persistence} example={example} />);
  await screen.findByRole("heading", { name: "Add" });
  // the heading is on screen once React has committed, but the editor's effects (its key and
  // clipboard listeners) may still wait for the scheduler on a busy machine: let them run
  await act(async () => {});
  return { ...utils, mem };
}

/** The sketch as the page would export it: read from the scratch storage after autosave. */
export function storedSketch(mem: Map<string, string>): SketchFile | undefined {
  const raw = mem.get("counterpoise:scratch-sketch:v1");
  return raw ? (JSON.parse(raw).sketch as SketchFile) : undefined;
}

/** The results dock alone, around an editor store holding `doc` (a sketch file as JSON). */
export function mountResultsDock(doc: unknown) {
  const file = importSketchText(JSON.stringify(doc));
  if (!file.ok) throw new Error("fixture does not import");
  const editor = createEditorStore({ sketch: file.sketch });
  const ctx = { stores: null as never, controller: null, ui: {} as ActionContext["ui"] };
  render(
    <EditorProvider editor={editor}>
      <ActionContextCtx.Provider value={() => ctx}>
        <ResultsDock />
      </ActionContextCtx.Provider>
    </EditorProvider>,
  );
  return editor;
}

/** The Sweep tab opened, a parameter picked and its range typed (From, To, Points). */
export async function setUpSweep(user: { click: (e: Element) => Promise<void>; selectOptions: (e: Element, v: string) => Promise<void>; clear: (e: Element) => Promise<void>; type: (e: Element, t: string) => Promise<void> }, parameter: string, range: [string, string, string]) {
  await user.click(screen.getByRole("tab", { name: "Sweep" }));
  await user.selectOptions(screen.getByRole("combobox", { name: "Parameter to sweep" }), parameter);
  for (const [name, v] of [["From", range[0]], ["To", range[1]], ["Points", range[2]]]) {
    await user.clear(screen.getByRole("textbox", { name }));
    await user.type(screen.getByRole("textbox", { name }), v);
  }
}

/** A change to save in a saved sketch's editor (beamWithInlet): the inlet's area typed anew, until the bar marks it unsaved. */
export async function changeInletArea(value = "0.02") {
  const user = userEvent.setup();
  await user.click(within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: /Inlet p1/ }));
  const area = await screen.findByTestId("field-area");
  await user.clear(area);
  await user.type(area, `${value}{Enter}`);
  await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent("unsaved"));
}
