// A value the sketch cannot do without, left blank: the field stays blank and marked (red outline
// through aria-invalid, words naming the field), and the sketch keeps the value it had before the
// edit. A port's mass flow is such a value when nothing else gives the port its flow.
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import type { SketchFile } from "@/solver/schema";
import { ElementForm } from "@/components/editor/ElementForm";
import { beam } from "./editor-helpers";

function mount(id: string, sketch: SketchFile) {
  const editor = createEditorStore({ sketch });
  render(
    <EditorProvider editor={editor}>
      <ElementForm id={id} />
    </EditorProvider>,
  );
  return { editor, form: within(screen.getByTestId("element-form")) };
}

type Store = ReturnType<typeof createEditorStore>;
const magnitudeOf = (editor: Store) => (editor.getState().sketch.loads[0] as { magnitude?: unknown }).magnitude;
const portOf = (editor: Store) => editor.getState().sketch.ports[0] as unknown as Record<string, unknown>;
const withPort = (port: Record<string, unknown>) => ({ ...beam(), ports: [{ id: "p1", body: "b1", kind: "outlet", at: [4, 0.25], angle: 0, ...port }] }) as SketchFile;

describe("a required field left blank", () => {
  it("stays blank and marked with the field's name, and the sketch keeps 10 kN", async () => {
    const user = userEvent.setup();
    const { editor, form } = mount("l1", beam("F1"));
    const magnitude = form.getByLabelText("Magnitude");
    await user.clear(magnitude);
    await user.tab();
    expect(magnitude).not.toHaveFocus();
    expect(magnitude).toHaveValue("");
    expect(magnitude).toHaveAttribute("aria-invalid", "true");
    expect(magnitude).toHaveAccessibleDescription("⚠ Magnitude: required. The sketch keeps 10 kN until you give one.");
    expect(magnitudeOf(editor)).toBe("10 kN");
    // entered again, it stays marked until a value is typed; the value is then stored
    await user.click(magnitude);
    expect(magnitude).toHaveAttribute("aria-invalid", "true");
    await user.type(magnitude, "12 kN");
    await user.tab();
    expect(magnitude).toHaveValue("12 kN");
    expect(magnitude).toHaveAttribute("aria-invalid", "false");
    expect(magnitude).toHaveAccessibleDescription("= 12 kN");
    expect(magnitudeOf(editor)).toBe("12 kN");
  });

  it("deleting one character at a time keeps the value from before the edit, not what was typed on the way", async () => {
    const user = userEvent.setup();
    const { editor, form } = mount("l1", beam("F1"));
    const magnitude = form.getByLabelText("Magnitude");
    await user.click(magnitude);
    await user.keyboard("{End}{Backspace}{Backspace}{Backspace}{Backspace}{Backspace}");
    expect(magnitude).toHaveValue("");
    expect(magnitudeOf(editor)).toBe("10 kN");
    // the edit changed nothing, so it leaves no undo step
    await user.tab();
    expect(magnitudeOf(editor)).toBe("10 kN");
    expect(editor.getState().past).toHaveLength(0);
    expect(magnitude).toHaveAccessibleDescription("⚠ Magnitude: required. The sketch keeps 10 kN until you give one.");
  });

  it("Escape puts the kept value back in the field", async () => {
    const user = userEvent.setup();
    const { editor, form } = mount("l1", beam("F1"));
    const magnitude = form.getByLabelText("Magnitude");
    await user.clear(magnitude);
    await user.keyboard("{Escape}");
    expect(magnitude).not.toHaveFocus();
    expect(magnitude).toHaveValue("10 kN");
    expect(magnitude).toHaveAttribute("aria-invalid", "false");
    expect(magnitude).toHaveAccessibleDescription("= 10 kN");
    expect(magnitudeOf(editor)).toBe("10 kN");
  });

  it("a body's mass: a plain number kept is said in its unit", async () => {
    const user = userEvent.setup();
    const s = beam();
    const { editor, form } = mount("b1", { ...s, bodies: [{ ...s.bodies[0], mass: 850 }] });
    const mass = form.getByLabelText("Mass");
    await user.clear(mass);
    await user.tab();
    expect(mass).toHaveValue("");
    expect(mass).toHaveAttribute("aria-invalid", "true");
    expect(mass).toHaveAccessibleDescription("⚠ Mass: required. The sketch keeps 850 kg until you give one.");
    expect(editor.getState().sketch.bodies[0].mass).toBe(850);
  });
});

describe("a port's mass flow left blank", () => {
  it("is refused when nothing else gives the port its flow: marked, and 10 kg/s is kept", async () => {
    const user = userEvent.setup();
    const { editor, form } = mount("p1", withPort({ massFlow: 10, velocity: 5 }));
    const massFlow = form.getByLabelText("Mass flow ṁ");
    await user.clear(massFlow);
    await user.tab();
    expect(massFlow).toHaveValue("");
    expect(massFlow).toHaveAttribute("aria-invalid", "true");
    expect(massFlow).toHaveAccessibleDescription("⚠ Mass flow ṁ is needed: nothing else gives the port its mass flow. The sketch keeps 10 kg/s until you give one.");
    expect(portOf(editor).massFlow).toBe(10);
  });

  it("is taken when the density and the volume flow give it: 1000 kg/m³ × 0.01 m³/s = 10 kg/s", async () => {
    const user = userEvent.setup();
    const { editor, form } = mount("p1", withPort({ massFlow: 10, velocity: 5, density: 1000, volumeFlow: 0.01 }));
    const massFlow = form.getByLabelText("Mass flow ṁ");
    await user.clear(massFlow);
    await user.tab();
    expect(massFlow).toHaveValue("");
    expect(massFlow).toHaveAttribute("aria-invalid", "false");
    expect(portOf(editor).massFlow).toBeUndefined();
    expect(form.getByTestId("port-resolved").textContent).toBe("Resolved: ṁ = 10 kg/s, V = 5 m/s, momentum flux ṁV = 50 N");
  });

  it("a velocity the port needs is refused the same way", async () => {
    const user = userEvent.setup();
    const { editor, form } = mount("p1", withPort({ massFlow: 10, velocity: 5 }));
    const velocity = form.getByLabelText("Velocity V");
    await user.clear(velocity);
    await user.tab();
    expect(velocity).toHaveAttribute("aria-invalid", "true");
    expect(velocity).toHaveAccessibleDescription("⚠ Velocity V is needed: nothing else gives the port its velocity. The sketch keeps 5 m/s until you give one.");
    expect(portOf(editor).velocity).toBe(5);
  });
});
