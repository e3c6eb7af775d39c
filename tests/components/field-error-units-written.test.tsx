// The error under a field writes units as engineers do ("kg/m²", not the expression parser's
// "kg / m^2"), as the results banner does; and a distributed load whose w₁ cannot be worked out is
// marked on the drawing by the form's name of the field. Common practice in calc sheets.
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { itemPrims } from "@/canvas/render/symbols";
import type { SceneItem } from "@/canvas/scene";
import type { SketchFile } from "@/solver/schema";
import { beam, renderEditor } from "./editor-helpers";

describe("units in a field's error", () => {
  it("a force typed as 236.25 kg/m^2 says “236.25 kg/m²” under the field", async () => {
    const user = userEvent.setup();
    const file: SketchFile = { ...beam("F1"), loads: [{ id: "l1", label: "F1", body: "b1", kind: "force", at: [2, 0.5], magnitude: "236.25 kg/m^2", angle: -90 }] } as SketchFile;
    await renderEditor(file);
    await user.click(await within(screen.getByRole("list", { name: "Elements of the sketch" })).findByRole("button", { name: /^Point force l1, F1/ }));
    const form = screen.getByTestId("element-form");
    await waitFor(() => expect(form.textContent).toMatch(/Magnitude⚠ 236\.25 kg\/m² is in other units, but this field needs a force \(N\)/));
    expect(screen.queryByText(/kg \/ m\^2/)).toBeNull();
  }, 15_000);

  it("the drawing marks a distributed load whose w₁ cannot be worked out as “w₁”, not the file's w1", () => {
    const item = { id: "w", body: "b1", kind: "distributed", from: [0, 0.5], to: [4, 0.5], w1: Number.NaN, w2: 2000, angle: -90, label: "snow" } as unknown as SceneItem;
    const texts = itemPrims(item, { units: "SI", scale: 100 }).flatMap((p) => (p.t === "text" ? [p.text] : []));
    expect(texts).toContain("w₁: cannot be worked out");
  });
});
