// Nothing typed is lost, and the last good value is never lost: a bad entry is stored as typed
// and marked; a blank the sketch cannot hold sends the sketch back to the field's last good value;
// Escape goes back to it too; undo steps back through every entry. The results banner follows
// what the sketch holds, and an unknown name's error suggests the field's own units.
import { act, cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { deleteParameter } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import { EditorProvider } from "@/canvas/context";
import type { SketchFile } from "@/solver/schema";
import { ElementForm } from "@/components/editor/ElementForm";
import { ParametersTable } from "@/components/editor/ParametersTable";
import { SketchForm } from "@/components/editor/SketchForm";
import { beam, renderEditor, storedSketch } from "./editor-helpers";

/** The beam (demo data) with its body's mass given as typed. */
const beamOf = (mass: string): SketchFile => {
  const s = beam();
  return { ...s, bodies: [{ ...s.bodies[0], mass }] };
};

function mount(sketch: SketchFile) {
  const editor = createEditorStore({ sketch });
  render(
    <EditorProvider editor={editor}>
      <ElementForm id="b1" />
    </EditorProvider>,
  );
  const mass = within(screen.getByTestId("element-form")).getByLabelText("Mass");
  return { editor, mass };
}

type Store = ReturnType<typeof createEditorStore>;
const massOf = (editor: Store) => editor.getState().sketch.bodies[0].mass;

describe("a body's mass: 60 kg, then abc, then blank", () => {
  it("abc is stored as typed and marked with the mass's own units; the blank goes back to 60 kg; undo steps back through abc to 60 kg", async () => {
    const user = userEvent.setup();
    const { editor, mass } = mount(beamOf("60 kg"));
    await user.clear(mass);
    await user.type(mass, "abc");
    await user.tab();
    expect(mass).toHaveValue("abc");
    expect(massOf(editor)).toBe("abc");
    expect(mass).toHaveAttribute("aria-invalid", "true");
    expect(mass).toHaveAccessibleDescription('⚠ unknown name "abc": define it as a parameter or use a unit such as kg, tonne, lb');

    await user.clear(mass);
    await user.tab();
    expect(mass).toHaveValue("");
    expect(mass).toHaveAttribute("aria-invalid", "true");
    expect(mass).toHaveAccessibleDescription("⚠ Mass: required. The sketch keeps 60 kg until you give one.");
    // the sketch cannot hold a blank mass: it holds the last good value, not the bad entry
    expect(massOf(editor)).toBe("60 kg");

    // two steps: 60 kg → abc, abc → 60 kg (the blank); undo reaches each
    expect(editor.getState().past).toHaveLength(2);
    act(() => editor.getState().undo());
    expect(massOf(editor)).toBe("abc");
    expect(mass).toHaveValue("abc");
    act(() => editor.getState().undo());
    expect(massOf(editor)).toBe("60 kg");
    expect(mass).toHaveValue("60 kg");
    expect(mass).toHaveAccessibleDescription("= 60 kg");
  });

  it("Escape in a field holding abc goes back to 60 kg (one undo step), not to abc", async () => {
    const user = userEvent.setup();
    const { editor, mass } = mount(beamOf("60 kg"));
    await user.clear(mass);
    await user.type(mass, "abc");
    await user.tab();
    await user.click(mass);
    await user.keyboard("{Escape}");
    expect(mass).not.toHaveFocus();
    expect(mass).toHaveValue("60 kg");
    expect(mass).toHaveAttribute("aria-invalid", "false");
    expect(massOf(editor)).toBe("60 kg");
    act(() => editor.getState().undo());
    expect(massOf(editor)).toBe("abc");
    act(() => editor.getState().undo());
    expect(massOf(editor)).toBe("60 kg");
  });

  it("Escape after a refused blank goes back to 60 kg, not to the abc typed before", async () => {
    const user = userEvent.setup();
    const { editor, mass } = mount(beamOf("60 kg"));
    await user.clear(mass);
    await user.type(mass, "abc");
    await user.tab();
    await user.clear(mass);
    await user.keyboard("{Escape}");
    expect(mass).toHaveValue("60 kg");
    expect(mass).toHaveAttribute("aria-invalid", "false");
    expect(massOf(editor)).toBe("60 kg");
  });

  it("abc typed and taken back with Escape in one visit leaves 60 kg and no undo step", async () => {
    const user = userEvent.setup();
    const { editor, mass } = mount(beamOf("60 kg"));
    await user.clear(mass);
    await user.type(mass, "abc");
    expect(massOf(editor)).toBe("abc");
    await user.keyboard("{Escape}");
    expect(mass).toHaveValue("60 kg");
    expect(massOf(editor)).toBe("60 kg");
    expect(editor.getState().past).toHaveLength(0);
  });

  it("a good value typed and taken back with Escape goes back to the value the visit began with", async () => {
    const user = userEvent.setup();
    const { editor, mass } = mount(beamOf("60 kg"));
    await user.clear(mass);
    await user.type(mass, "75 kg");
    await user.keyboard("{Escape}");
    expect(mass).toHaveValue("60 kg");
    expect(massOf(editor)).toBe("60 kg");
    expect(editor.getState().past).toHaveLength(0);
  });

  it("with no good value anywhere in the history (a sketch opened with abc), the blank keeps abc and says so", async () => {
    const user = userEvent.setup();
    const { editor, mass } = mount(beamOf("abc"));
    await user.clear(mass);
    await user.tab();
    expect(mass).toHaveAccessibleDescription("⚠ Mass: required. The sketch keeps abc until you give one.");
    expect(massOf(editor)).toBe("abc");
    await user.click(mass);
    await user.keyboard("{Escape}");
    expect(mass).toHaveValue("abc");
    expect(editor.getState().past).toHaveLength(0);
  });

  it("a value that read a parameter since deleted is not good any more: Escape skips it for the one before", async () => {
    const user = userEvent.setup();
    const { editor, mass } = mount({ ...beamOf("60 kg"), parameters: { m0: "70 kg" } });
    await user.clear(mass);
    await user.type(mass, "m0");
    await user.tab();
    expect(mass).toHaveAccessibleDescription("= 70 kg");
    await user.clear(mass);
    await user.type(mass, "abc");
    await user.tab();
    act(() => void editor.getState().apply(deleteParameter({ name: "m0" }) as Command<unknown>));
    await user.click(mass);
    await user.keyboard("{Escape}");
    expect(massOf(editor)).toBe("60 kg");
  });
});

describe("the sketch's own fields", () => {
  it("gravity: Escape in a field holding abc goes back to 9.81 m/s^2, and the error suggests m/s^2, ft/s^2", async () => {
    const user = userEvent.setup();
    const editor = createEditorStore({ sketch: { ...beam(), gravity: "9.81 m/s^2" } });
    render(
      <EditorProvider editor={editor}>
        <SketchForm />
      </EditorProvider>,
    );
    const gravity = within(screen.getByTestId("sketch-form")).getByLabelText("Gravity");
    await user.clear(gravity);
    await user.type(gravity, "abc");
    await user.tab();
    expect(editor.getState().sketch.gravity).toBe("abc");
    expect(gravity).toHaveAccessibleDescription('⚠ unknown name "abc": define it as a parameter or use a unit such as m/s^2, ft/s^2');
    await user.click(gravity);
    await user.keyboard("{Escape}");
    expect(gravity).toHaveValue("9.81 m/s^2");
    expect(editor.getState().sketch.gravity).toBe("9.81 m/s^2");
  });
});

const outlineRow = (name: RegExp) => within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name });

/** The editor on a 60 kg beam, its mass field retyped "abc" and left. */
async function abcOver60() {
  const user = userEvent.setup();
  const { mem, unmount } = await renderEditor(beamOf("60 kg"));
  await user.click(outlineRow(/Body b1/));
  const mass = within(screen.getByTestId("element-form")).getByLabelText("Mass");
  await user.clear(mass);
  await user.type(mass, "abc");
  await user.tab();
  return { user, mem, unmount, mass };
}

describe("the editor around it", () => {
  it("the banner quotes abc's error while the sketch holds it, and not once the blank has put 60 kg back; a reload shows 60 kg", async () => {
    const { user, mem, unmount, mass } = await abcOver60();
    expect(screen.getByTestId("stale").textContent).toContain('Body Beam — mass: unknown name "abc": define it as a parameter or use a unit such as kg, tonne, lb');
    await waitFor(() => expect(storedSketch(mem)!.bodies[0].mass).toBe("abc"), { timeout: 3000 });

    await user.clear(mass);
    await user.tab();
    expect(mass).toHaveAccessibleDescription("⚠ Mass: required. The sketch keeps 60 kg until you give one.");
    expect(screen.queryByTestId("stale")).toBeNull();
    expect(screen.getByTestId("status").textContent).not.toContain("abc");
    await waitFor(() => expect(storedSketch(mem)!.bodies[0].mass).toBe("60 kg"), { timeout: 3000 });

    // a reload opens what was stored last
    const kept = storedSketch(mem)!;
    unmount();
    await renderEditor(kept);
    await user.click(outlineRow(/Body b1/));
    expect(within(screen.getByTestId("element-form")).getByLabelText("Mass")).toHaveValue("60 kg");
  }, 20_000);

  it("a reload keeps the way back: 60 kg, then abc, then a reload — Undo still reaches 60 kg", async () => {
    const { user, mem, unmount } = await abcOver60();
    await waitFor(() => expect(storedSketch(mem)!.bodies[0].mass).toBe("abc"), { timeout: 3000 });
    // the page goes (its history is written as it leaves) and opens again on what was stored
    const kept = storedSketch(mem)!;
    unmount();
    await renderEditor(kept);
    await user.click(outlineRow(/Body b1/));
    expect(within(screen.getByTestId("element-form")).getByLabelText("Mass")).toHaveValue("abc");
    await user.click(screen.getByTestId("undo"));
    expect(within(screen.getByTestId("element-form")).getByLabelText("Mass")).toHaveValue("60 kg");
    // a sketch other than the one the history leads to gets none of it
    cleanup();
    await renderEditor(beamOf("75 kg"));
    expect(screen.getByTestId("undo")).toBeDisabled();
  }, 20_000);
});

describe("placeholders follow the units on screen", () => {
  it("a port's velocity and pressure say ft/s and psi in US units, m/s and kPa in SI", () => {
    const editor = createEditorStore({
      sketch: { ...beam(), ports: [{ id: "p1", body: "b1", kind: "outlet", at: [4, 0.25], angle: 0, massFlow: 10 }] } as SketchFile,
      units: "US",
    });
    render(
      <EditorProvider editor={editor}>
        <ElementForm id="p1" />
      </EditorProvider>,
    );
    const form = within(screen.getByTestId("element-form"));
    expect(form.getByLabelText("Velocity V")).toHaveAttribute("placeholder", "e.g. 100 ft/s");
    expect(form.getByLabelText("Gauge pressure")).toHaveAttribute("placeholder", "e.g. 50 psi");
    expect(form.getByLabelText("Density ρ")).toHaveAttribute("placeholder", "e.g. 62.3 lb/ft^3");
    act(() => editor.getState().setUnits("SI"));
    expect(form.getByLabelText("Velocity V")).toHaveAttribute("placeholder", "e.g. 31 m/s");
    expect(form.getByLabelText("Gauge pressure")).toHaveAttribute("placeholder", "e.g. 350 kPa");
    expect(form.getByLabelText("Density ρ")).toHaveAttribute("placeholder", "e.g. 998 kg/m^3");
  });

  it("a new parameter's expression suggests psi in US units and kPa in SI", () => {
    const editor = createEditorStore({ sketch: beam(), units: "US" });
    render(
      <EditorProvider editor={editor}>
        <ParametersTable />
      </EditorProvider>,
    );
    expect(screen.getByLabelText("New parameter expression")).toHaveAttribute("placeholder", "e.g. 50 psi");
    act(() => editor.getState().setUnits("SI"));
    expect(screen.getByLabelText("New parameter expression")).toHaveAttribute("placeholder", "e.g. 350 kPa");
  });
});
