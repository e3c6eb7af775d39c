// A port's "Resolved" line under its fields: numbers only while every flow field holds a value the
// solver takes, otherwise a short line naming what is invalid or missing, and no numbers at all.
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { setField, type Command } from "@/canvas/commands";
import type { SketchFile } from "@/solver/schema";
import { ElementForm } from "@/components/editor/ElementForm";
import { beam } from "./editor-helpers";

/** The beam with an inlet p1 on its left end (demo data). */
function withInlet(port: Record<string, unknown>): SketchFile {
  return { ...beam(), ports: [{ id: "p1", body: "b1", kind: "inlet", at: [0, 0.25], angle: 0, ...port }] } as SketchFile;
}

function mountPort(port: Record<string, unknown>) {
  const editor = createEditorStore({ sketch: withInlet(port) });
  render(
    <EditorProvider editor={editor}>
      <ElementForm id="p1" />
    </EditorProvider>,
  );
  const form = within(screen.getByTestId("element-form"));
  return { editor, form, line: () => form.getByTestId("port-resolved") };
}

const portOf = (editor: ReturnType<typeof createEditorStore>) => editor.getState().sketch.ports[0] as unknown as Record<string, unknown>;

describe("the port's resolved line", () => {
  it("gives ṁ, V and ṁV while the fields are good: 10 kg/s × 5 m/s = 50 N", () => {
    const { line } = mountPort({ massFlow: 10, velocity: 5, area: 0.01 });
    expect(line().textContent).toBe("Resolved: ṁ = 10 kg/s, V = 5 m/s, momentum flux ṁV = 50 N");
  });

  it("an area of −1, refused at its field, leaves no numbers: the line waits for a valid area", async () => {
    const user = userEvent.setup();
    const { form, line } = mountPort({ massFlow: 10, velocity: 5, area: 0.01 });
    const area = form.getByLabelText("Area");
    await user.clear(area);
    await user.type(area, "-1");
    expect(area).toHaveAttribute("aria-invalid", "true");
    expect(area).toHaveAccessibleDescription("⚠ must be more than zero");
    expect(line().textContent).toBe("Resolved values wait for a valid area.");
    expect(line().textContent).not.toMatch(/\d/);
    // a good area brings the numbers back
    await user.clear(area);
    await user.type(area, "0.02");
    expect(line().textContent).toBe("Resolved: ṁ = 10 kg/s, V = 5 m/s, momentum flux ṁV = 50 N");
  });

  it("names every flow field in error, an expression's error too", () => {
    const { editor, line } = mountPort({ massFlow: 10, velocity: 5, area: 0.01 });
    const set = (field: string, value: number | string) => act(() => void editor.getState().apply(setField({ id: "p1", field, value }) as Command<unknown>));
    set("velocity", "2 * nope");
    expect(line().textContent).toBe("Resolved values wait for a valid velocity V.");
    set("velocity", 5);
    set("area", -1);
    set("density", -5);
    expect(line().textContent).toBe("Resolved values wait for a valid area and density ρ.");
  });

  it("a port with no way to its mass flow says what to give, and marks the blank mass flow field", () => {
    // a density typed on a placed port takes its placed 10 kg/s away: ρ and V alone give no ṁ
    const { form, line } = mountPort({ density: 998, velocity: 5 });
    expect(line().textContent).toBe("Resolved values wait for a mass flow: give ṁ, or ρ with the volume flow, or ρ with the area and V.");
    const massFlow = form.getByLabelText("Mass flow ṁ");
    expect(massFlow).toHaveValue("");
    expect(massFlow).toHaveAttribute("aria-invalid", "true");
    expect(massFlow).toHaveAccessibleDescription("⚠ Mass flow ṁ is needed (or ρ with the volume flow, or ρ with the area and V).");
  });

  it("a gauge pressure without its area: the area is marked and the line waits for it", () => {
    const { form, line } = mountPort({ massFlow: 10, velocity: 5, pressure: "2 bar" });
    expect(line().textContent).toBe("Resolved values wait for the area the gauge pressure acts on.");
    expect(form.getByLabelText("Area")).toHaveAttribute("aria-invalid", "true");
    expect(form.getByLabelText("Area")).toHaveAccessibleDescription("⚠ Area is needed: the gauge pressure acts on it.");
  });

  it("a mass flow the field would not leave blank waits too, while the sketch keeps its 10 kg/s", async () => {
    const user = userEvent.setup();
    const { editor, form, line } = mountPort({ massFlow: 10, velocity: 5 });
    await user.clear(form.getByLabelText("Mass flow ṁ"));
    expect(line().textContent).toBe("Resolved values wait for a valid mass flow ṁ.");
    expect(portOf(editor).massFlow).toBe(10);
  });

  it("ρ times the volume flow resolves a blank mass flow: 1000 kg/m³ × 0.01 m³/s = 10 kg/s over 0.002 m² is 5 m/s", () => {
    const { form, line } = mountPort({ density: 1000, volumeFlow: 0.01, area: 0.002 });
    expect(line().textContent).toBe("Resolved: ṁ = 10 kg/s, V = 5 m/s, momentum flux ṁV = 50 N");
    expect(form.getByLabelText("Mass flow ṁ")).toHaveAttribute("aria-invalid", "false");
    expect(form.getByLabelText("Mass flow ṁ")).toHaveAccessibleDescription("not given");
  });
});
