// What a numeric field shows once it is left: the text typed, when it is the number stored (1e30
// stays 1e30, 2.50 stays 2.50), and a stored number written without a "+" in its exponent.
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import type { SketchFile } from "@/solver/schema";
import { ElementForm } from "@/components/editor/ElementForm";
import { storedText } from "@/components/editor/NumericField";
import { beam } from "./editor-helpers";

function mountLoad(sketch: SketchFile = beam("F1")) {
  const editor = createEditorStore({ sketch });
  render(
    <EditorProvider editor={editor}>
      <ElementForm id="l1" />
    </EditorProvider>,
  );
  return { editor, form: within(screen.getByTestId("element-form")) };
}

const magnitudeOf = (editor: ReturnType<typeof createEditorStore>) => (editor.getState().sketch.loads[0] as { magnitude?: unknown }).magnitude;

describe("a typed number is kept as typed", () => {
  it("1e30 stays 1e30 when the field is left with Tab or Enter, and when it is entered again; the sketch holds the number", async () => {
    const user = userEvent.setup();
    const { editor, form } = mountLoad();
    const magnitude = form.getByLabelText("Magnitude");
    await user.clear(magnitude);
    await user.type(magnitude, "1e30");
    await user.tab();
    expect(magnitude).not.toHaveFocus();
    expect(magnitude).toHaveValue("1e30");
    expect(magnitudeOf(editor)).toBe(1e30);
    await user.click(magnitude);
    expect(magnitude).toHaveValue("1e30");
    await user.keyboard("{Enter}");
    expect(magnitude).toHaveValue("1e30");
  });

  it("other ways to write a number are kept too: 1E3, 2.50, 1e-7", async () => {
    const user = userEvent.setup();
    const { editor, form } = mountLoad();
    const magnitude = form.getByLabelText("Magnitude");
    for (const [typed, stored] of [["1E3", 1000], ["2.50", 2.5], ["1e-7", 1e-7]] as const) {
      await user.clear(magnitude);
      await user.type(magnitude, typed);
      await user.tab();
      expect(magnitude).toHaveValue(typed);
      expect(magnitudeOf(editor)).toBe(stored);
    }
  });

  it("a number stored in the file is shown with no '+' in its exponent, and a small one keeps its figures", () => {
    const s = beam("F1");
    const { form } = mountLoad({ ...s, loads: [{ ...s.loads[0], magnitude: 1e30 }] } as SketchFile);
    expect(form.getByLabelText("Magnitude")).toHaveValue("1e30");
    expect(storedText(1e30)).toBe("1e30");
    expect(storedText(-2.5e21)).toBe("-2.5e21");
    expect(storedText(1e-6)).toBe("0.000001");
    expect(storedText(1e-7)).toBe("1e-7");
    expect(storedText(2e-10)).toBe("2e-10");
    expect(storedText(0.1 + 0.2)).toBe("0.3");
    expect(storedText(12.5)).toBe("12.5");
    expect(storedText("350 psi")).toBe("350 psi");
    expect(storedText(undefined)).toBe("");
  });
});
