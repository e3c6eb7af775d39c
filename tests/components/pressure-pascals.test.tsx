// A plain number typed as a gauge pressure with SI units on screen is pascals (the file format's
// rule, SI base units): "10" meant as bar is 10 Pa, 100 000 times too small. The field says so
// beside the value; a pressure typed with its unit, or a large plain number, gets the plain echo.
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { analyseCore, expressionFields } from "@/canvas/analysis/core";
import type { Runner } from "@/canvas/analysis/store";
import { ElementForm } from "@/components/editor/ElementForm";
import { beamWithInlet } from "./editor-helpers";

const workerLike: Runner = (sketch, done) => {
  const core = analyseCore(sketch);
  done({ ...core, fields: expressionFields(sketch, core.fields) });
};

function pressureField() {
  render(
    <EditorProvider editor={createEditorStore({ sketch: beamWithInlet() })} runner={workerLike}>
      <ElementForm id="p1" />
    </EditorProvider>,
  );
  return within(screen.getByTestId("element-form")).getByLabelText("Gauge pressure");
}

describe("a plain number typed as a gauge pressure in SI", () => {
  it("says it is pascals, and what to type for bar", async () => {
    const user = userEvent.setup();
    const field = pressureField();
    await user.clear(field);
    await user.type(field, "10");
    expect(field).toHaveAccessibleDescription("= 10 Pa (a plain number is pascals: 10 bar is “10 bar”)");
    await user.tab();
    expect(field).toHaveAccessibleDescription("= 10 Pa (a plain number is pascals: 10 bar is “10 bar”)");
  });

  it("a pressure with its unit, or a plain number of pascals as large as a real one, is only echoed", async () => {
    const user = userEvent.setup();
    const field = pressureField();
    await user.clear(field);
    await user.type(field, "10 bar");
    // 1 bar = 100 kPa (NIST SP 811)
    expect(field).toHaveAccessibleDescription("= 1 MPa");
    await user.clear(field);
    await user.type(field, "250000");
    expect(field).toHaveAccessibleDescription("= 250 kPa");
  });
});
