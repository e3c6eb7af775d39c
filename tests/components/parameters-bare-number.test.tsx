// A parameter typed as a bare number (v = 30) where the fields that read it need a speed: the
// parameters table says, at the parameter, that it has no unit and what to write — in the Cases
// tab's words — but only when those fields fail on it: a plain number is a legal SI value.
import { readFileSync } from "node:fs";
import { act, render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { setParameter } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import { importSketchText } from "@/canvas/files";
import { parseSketch } from "@/solver";
import type { SketchFile } from "@/solver/schema";
import { bareParameterNote, ParametersTable } from "@/components/editor/ParametersTable";

/** The exhaust stack (demo data): v = 30 m/s feeds the wind load w = ½ρv² × 0.6 m × 0.7. */
function stack(v: string | number): SketchFile {
  const r = importSketchText(readFileSync("canvas/examples/exhaust-stack.json", "utf8"));
  if (!r.ok) throw new Error("the example does not import");
  return { ...r.sketch, parameters: { ...r.sketch.parameters, v } };
}

const errorsOf = (file: SketchFile) => {
  const r = parseSketch(file);
  return r.ok ? [] : r.errors;
};

function mount(sketch: SketchFile) {
  const editor = createEditorStore({ sketch });
  render(
    <EditorProvider editor={editor}>
      <ParametersTable />
    </EditorProvider>,
  );
  return editor;
}

describe("a bare parameter that the fields reading it fail on", () => {
  it("names the kind they need and what to write", () => {
    const file = stack("30");
    // ½ × 1.25 kg/m³ × 30² × 0.6 m × 0.7 is kg/m², not a load per length (q = ½ρv², common practice)
    expect(errorsOf(file).map((e) => e.path)).toEqual(["loads[0].w1", "loads[0].w2"]);
    expect(bareParameterNote(file, "v", errorsOf(file))).toBe("has no unit; the fields that read v need a speed: write 30 m/s");
  });

  it("says nothing of a bare number nothing fails on (a plain number is SI), nor of a parameter with a unit", () => {
    const fine = stack("30 m/s");
    expect(bareParameterNote(fine, "v", errorsOf(fine))).toBeNull();
    // a bare ballast mass: 0 kg → 0 reads the same
    const bareZero = { ...stack("30 m/s"), parameters: { ...stack("30 m/s").parameters, ballast: 0 } };
    expect(bareParameterNote(bareZero, "ballast", errorsOf(bareZero))).toBeNull();
    // errors that are not v's doing: a unit on v clears none of them
    const other = stack("30");
    other.ports[0] = { ...other.ports[0], area: "-1 m^2" } as SketchFile["ports"][number];
    const errors = errorsOf(other);
    expect(bareParameterNote(other, "mdot", errors)).toBeNull();
    expect(bareParameterNote(other, "v", errors)).toBe("has no unit; the fields that read v need a speed: write 30 m/s");
  });

  it("the table says it under the parameter's expression, and stops once the unit is typed", () => {
    const editor = mount(stack(30));
    const note = screen.getByTestId("parameter-no-unit");
    expect(note.textContent).toBe("⚠ v = 30 has no unit; the fields that read v need a speed: write 30 m/s");
    const input = screen.getByLabelText("Expression of parameter v");
    expect(input).toHaveAttribute("aria-invalid", "true");
    expect(input).toHaveAttribute("aria-describedby", note.id);
    // a parameter the failing fields do not read stays quiet
    expect(screen.getAllByTestId("parameter-no-unit")).toHaveLength(1);
    act(() => void editor.getState().apply(setParameter({ name: "v", expression: "30 m/s" }) as Command<unknown>));
    expect(screen.queryByTestId("parameter-no-unit")).toBeNull();
  });
});
