// The editor's panels with Testing Library: tray, element list, properties (expressions with
// units, errors at the field), parameters, keyboard, undo, import errors.
import { act, fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { ACTIONS, actionById, shortcutLabel } from "@/canvas/actions";
import { exampleById } from "@/canvas/examples";
import { emptySketch } from "@/canvas/model/elements";
import { CURRENT_VERSION } from "@/solver/schema";
import { beam, renderEditor, storedSketch } from "./editor-helpers";


const outlineRow = (name: RegExp) => within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name });

describe("editor", () => {
  it("shows the tray, the element list and the sketch's properties", async () => {
    await renderEditor(beam());
    for (const name of [/^Pin/, /^Roller/, /^Contact \(C\)/, /^Contact with friction/, /^Fixed support/, /^Tie/, /^Point force/, /^Couple/, /^Distributed load/, /^Inlet/, /^Outlet/, /^Mass source/, /^Body \(rectangle\)/, /^Body \(polygon\)/])
      expect(screen.getByTitle(name)).toBeInTheDocument();
    expect(screen.getByRole("heading", { name: /Elements/ })).toHaveTextContent("(4)");
    expect(outlineRow(/Pin s1, left pin/)).toBeInTheDocument();
    expect(screen.getByTestId("sketch-form")).toBeInTheDocument();
    expect(screen.getByTestId("sketch-title")).toHaveTextContent("Beam on a pin and a contact");
  });

  it("disables supports in the tray until a body exists, and chooses a tool on click", async () => {
    const user = userEvent.setup();
    await renderEditor(emptySketch());
    expect(screen.getByTitle(/^Pin/)).toHaveAttribute("aria-disabled", "true");
    await user.click(screen.getByTitle(/^Body \(rectangle\)/));
    expect(screen.getByTitle(/^Body \(rectangle\)/)).toHaveAttribute("aria-pressed", "true");
    expect(screen.getByTestId("notice")).toHaveTextContent(/drag a rectangle/);
  });

  it("edits a field with an expression with units and shows its value; an unknown name shows the error there", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await user.click(outlineRow(/Point force l1/));
    const form = screen.getByTestId("element-form");
    const magnitude = within(form).getByLabelText("Magnitude");
    await user.clear(magnitude);
    await user.type(magnitude, "2.5 kip");
    expect(within(form).getByText("= 11.12 kN")).toBeInTheDocument();
    await user.clear(magnitude);
    await user.type(magnitude, "3 * span");
    expect(magnitude).toHaveAttribute("aria-invalid", "true");
    expect(within(form).getByText(/unknown name "span"/)).toBeInTheDocument();
    // the file keeps what was typed
    // (the autosave waits for a pause in the typing: allow for a busy machine)
    await waitFor(() => expect((storedSketch(mem)!.loads[0] as { magnitude: unknown }).magnitude).toBe("3 * span"), { timeout: 3000 });
  }, 15_000);

  it("refuses a blank required field at the field and changes nothing", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(outlineRow(/Contact s2/));
    const angle = screen.getByLabelText("Pushes toward");
    await user.clear(angle);
    await user.tab();
    // the field stays blank and says so; the sketch keeps its direction
    expect(screen.getByLabelText("Pushes toward")).toHaveValue("");
    expect(screen.getByText(/Pushes toward: required\. The sketch keeps 90° until you give one\./)).toBeInTheDocument();
    await user.click(outlineRow(/Point force l1/));
    await user.click(outlineRow(/Contact s2/));
    expect(screen.getByLabelText("Pushes toward")).toHaveValue("90");
  });

  it("adds a parameter that fields can use, and renaming it rewrites them", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await user.type(screen.getByLabelText("New parameter name"), "P");
    await user.type(screen.getByLabelText("New parameter expression"), "12 kN");
    await user.click(screen.getByRole("button", { name: "Add" }));
    expect(within(screen.getByTestId("parameters")).getByText("12 kN")).toBeInTheDocument();
    await user.click(outlineRow(/Point force l1/));
    const magnitude = screen.getByLabelText("Magnitude");
    await user.clear(magnitude);
    await user.type(magnitude, "P / 2");
    expect(screen.getByText("= 6 kN")).toBeInTheDocument();
    const name = screen.getByLabelText("Name of parameter P");
    await user.clear(name);
    await user.type(name, "load{Enter}");
    await waitFor(() => expect((storedSketch(mem)!.loads[0] as { magnitude: unknown }).magnitude).toBe("load / 2"));
    expect(storedSketch(mem)!.parameters).toEqual({ load: "12 kN" });
  });

  it("selects from the keyboard in the element list, deletes, and undoes", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    const first = outlineRow(/Body b1/);
    first.focus();
    await user.keyboard("{ArrowDown}{ArrowDown}");
    expect(outlineRow(/Contact s2/)).toHaveFocus();
    await user.keyboard("{Enter}");
    expect(outlineRow(/Contact s2/)).toHaveAttribute("aria-pressed", "true");
    await user.keyboard("{Delete}");
    expect(screen.queryByRole("button", { name: /Contact s2/ })).toBeNull();
    await waitFor(() => expect(storedSketch(mem)!.supports.map((s) => s.id)).toEqual(["s1"]));
    await user.click(screen.getByTestId("undo"));
    expect(outlineRow(/Contact s2/)).toBeInTheDocument();
    await user.click(screen.getByTestId("redo"));
    expect(screen.queryByRole("button", { name: /Contact s2/ })).toBeNull();
  });

  it("runs shortcuts from the registered actions: undo, duplicate, nudge, units", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await user.click(outlineRow(/Pin s1/));
    fireEvent.keyDown(document.body, { key: "d", ctrlKey: true });
    await waitFor(() => expect(storedSketch(mem)!.supports.map((s) => s.id)).toEqual(["s1", "s2", "s3"]));
    // the copy is selected, offset by two grid steps right and down (the grid follows the zoom,
    // and the canvas may fit the view when it mounts)
    const at = () => storedSketch(mem)!.supports[2].at as number[];
    const g = at()[0] / 2;
    expect(g).toBeGreaterThan(0);
    expect(at()[1]).toBeCloseTo(-2 * g, 9);
    fireEvent.keyDown(document.body, { key: "ArrowRight" });
    // one grid step to the right; the original stays where it was
    await waitFor(() => expect(at()[0]).toBeCloseTo(3 * g, 9));
    expect(at()[1]).toBeCloseTo(-2 * g, 9);
    expect(storedSketch(mem)!.supports[0].at).toEqual([0, 0]);
    // Shift: ten steps up
    fireEvent.keyDown(document.body, { key: "ArrowUp", shiftKey: true });
    await waitFor(() => expect(at()[1]).toBeCloseTo(8 * g, 9));
    expect(at()[0]).toBeCloseTo(3 * g, 9);
    fireEvent.keyDown(document.body, { key: "z", ctrlKey: true });
    await waitFor(() => expect(at()[1]).toBeCloseTo(-2 * g, 9));
    fireEvent.keyDown(document.body, { key: "z", ctrlKey: true });
    fireEvent.keyDown(document.body, { key: "z", ctrlKey: true });
    await waitFor(() => expect(storedSketch(mem)!.supports).toHaveLength(2));
    fireEvent.keyDown(document.body, { key: "u" });
    expect(within(screen.getByTestId("units")).getByRole("radio", { name: "US" })).toHaveAttribute("aria-checked", "true");
    // each step waits for the autosave's pause
  }, 15_000);

  it("duplicates and deletes a single selected element with the mouse", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await user.click(outlineRow(/Contact s2/));
    const panel = within(screen.getByTestId("selection-actions"));
    await user.click(panel.getByRole("button", { name: "Duplicate" }));
    await waitFor(() => expect(storedSketch(mem)!.supports.map((s) => s.id)).toEqual(["s1", "s2", "s3"]));
    // the copy is selected; Delete removes it and leaves the original
    expect(outlineRow(/Contact s3/)).toHaveAttribute("aria-pressed", "true");
    await user.click(within(screen.getByTestId("selection-actions")).getByRole("button", { name: "Delete" }));
    await waitFor(() => expect(storedSketch(mem)!.supports.map((s) => s.id)).toEqual(["s1", "s2"]));
    expect(screen.getByTestId("sketch-form")).toBeInTheDocument();
  }, 15_000);

  it("lists the File menu and the toolbar's shortcuts from the registered actions", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(screen.getByTestId("menu-file"));
    const items = screen.getAllByRole("menuitem").map((i) => i.textContent);
    const listed = ACTIONS.filter((a) => a.group === "file" && a.menu);
    expect(listed.map((a) => a.id)).toEqual(["file.new", "file.import", "file.exportJson", "file.exportSvg", "file.exportPng"]);
    expect(items).toHaveLength(listed.length);
    listed.forEach((a, i) => expect(items[i]).toContain(a.label));
    expect(items[2]).toContain(shortcutLabel("Mod+E"));
    await user.keyboard("{Escape}");
    expect(screen.getByRole("button", { name: "Zoom out" })).toHaveAttribute("title", `Zoom out (${actionById("view.zoomOut").shortcuts![0]})`);
    expect(screen.getByRole("button", { name: "Fit" })).toHaveAttribute("title", "Fit to view (F)");
  });

  it("opens an example from the menu, and undo returns to the sketch before", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(screen.getByTestId("menu-examples"));
    await user.click(screen.getByRole("menuitem", { name: /Pressure-pipe bend on an anchor/ }));
    expect(screen.getByTestId("sketch-title")).toHaveTextContent(exampleById("pipe-bend-anchor")!.sketch.title!);
    await user.click(screen.getByTestId("undo"));
    expect(screen.getByTestId("sketch-title")).toHaveTextContent("Beam on a pin and a contact");
  });

  it("refuses a bad file with its reasons and leaves the sketch alone", async () => {
    const { mem } = await renderEditor(beam());
    await waitFor(() => expect(storedSketch(mem)).toBeDefined());
    const before = mem.get("counterpoise:scratch-sketch:v1");
    const input = screen.getByTestId("import-input") as HTMLInputElement;
    const file = new File(['{"format": "counterpoise.sketch", "version": 1, "bodies": [{"id": "b1"}]}'], "broken.json", { type: "application/json" });
    await act(async () => {
      fireEvent.change(input, { target: { files: [file] } });
    });
    const dialog = await screen.findByRole("alertdialog");
    expect(dialog).toHaveTextContent("“broken.json” could not be opened");
    expect(dialog).toHaveTextContent("Nothing in your sketch has changed");
    expect(dialog).toHaveTextContent("bodies[0].outline");
    expect(screen.getByTestId("sketch-title")).toHaveTextContent("Beam on a pin and a contact");
    expect(mem.get("counterpoise:scratch-sketch:v1")).toBe(before);
  });

  it("opens a file of the first format version brought up to date, says so, and Undo gives the sketch back", async () => {
    const { mem } = await renderEditor(beam());
    await waitFor(() => expect(storedSketch(mem)).toBeDefined());
    // a version-1 file (before load cases): one body on a pin, nothing else
    const old = { format: "counterpoise.sketch", version: 1, title: "Crate on a pin", bodies: [{ id: "c", label: "Crate", mass: "40 kg", outline: [[0, 0], [1, 0], [1, 1], [0, 1]] }], supports: [{ id: "p", body: "c", kind: "pin", at: [0.5, 0] }], loads: [], ports: [], massSources: [] };
    const input = screen.getByTestId("import-input") as HTMLInputElement;
    const file = new File([JSON.stringify(old)], "crate-v1.json", { type: "application/json" });
    await act(async () => {
      fireEvent.change(input, { target: { files: [file] } });
    });
    expect(screen.queryByRole("alertdialog")).toBeNull();
    expect(screen.getByTestId("sketch-title")).toHaveTextContent("Crate on a pin");
    expect(screen.getByTestId("notice")).toHaveTextContent("Opened crate-v1.json (format version 1, brought up to date).");
    await waitFor(() => expect(storedSketch(mem)).toMatchObject({ version: CURRENT_VERSION, title: "Crate on a pin" }));
    await userEvent.setup().click(screen.getByTestId("undo"));
    expect(screen.getByTestId("sketch-title")).toHaveTextContent("Beam on a pin and a contact");
  });
});

describe("an example link over a kept scratch sketch", () => {
  it("opens the example as one undo step, so the sketch kept here comes back with Undo", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam(), "pump-skid");
    expect(screen.getByTestId("sketch-title")).toHaveTextContent(exampleById("pump-skid")!.sketch.title!);
    expect(screen.getByTestId("notice")).toHaveTextContent(/Undo .* returns to the sketch you had here/);
    await user.click(screen.getByTestId("undo"));
    expect(screen.getByTestId("sketch-title")).toHaveTextContent("Beam on a pin and a contact");
    // and the autosave keeps it again
    await waitFor(() => expect(storedSketch(mem)?.title).toBe("Beam on a pin and a contact"), { timeout: 3000 });
    expect(storedSketch(mem)?.supports.map((s) => s.id)).toEqual(["s1", "s2"]);
  });

  it("an empty scratch sketch is simply replaced (nothing to undo to)", async () => {
    const { mem } = await renderEditor(undefined, "pump-skid");
    expect(screen.getByTestId("sketch-title")).toHaveTextContent(exampleById("pump-skid")!.sketch.title!);
    expect(screen.getByTestId("undo")).toBeDisabled();
    // and kept at once: the link's ?example= is dropped, so a reload opens what is kept, not an empty sketch
    await waitFor(() => expect(storedSketch(mem)?.title).toBe(exampleById("pump-skid")!.sketch.title));
  });

  it("over a kept sketch, the example is what is kept (the kept sketch stays one Undo away)", async () => {
    const { mem } = await renderEditor(beam(), "pump-skid");
    await waitFor(() => expect(storedSketch(mem)?.title).toBe(exampleById("pump-skid")!.sketch.title));
  });
});

