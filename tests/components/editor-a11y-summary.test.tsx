// The drawing in words for a screen reader: the canvas is described by what is drawn (each body
// with what is on it) and by the result's headline, and the words follow the sketch.
import { render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { emptySketch } from "@/canvas/model/elements";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { createInteractionStore } from "@/canvas/konva/interaction";
import SketchCanvas from "@/canvas/konva/SketchCanvas";
import { beam, renderEditor } from "./editor-helpers";

describe("the drawing's text alternative", () => {
  it("the drawing is described by the summary first, then by where the rest is listed", () => {
    render(
      <EditorProvider editor={createEditorStore({ sketch: beam() })}>
        <SketchCanvas interaction={createInteractionStore()} />
      </EditorProvider>,
    );
    expect(screen.getByTestId("sketch-canvas").getAttribute("aria-describedby")?.split(" ")).toEqual(["canvas-summary", "canvas-alt", "canvas-help"]);
  });

  it("lists every element under its body and says the result, as the description of the drawing", async () => {
    await renderEditor(beam("F1"));
    const summary = screen.getByTestId("canvas-summary");
    expect(summary).toHaveAttribute("id", "canvas-summary");
    expect(summary).toHaveTextContent(/^Body b1 \(Beam\), with Pin s1 \(left pin\), Contact s2 \(right pad\), Point force l1 \(F1\)\. Result: Holds/);
    // 10 kN at mid-span and the beam's own 100 kg (0.981 kN) at its centre: half each, 5.49 kN
    // (statics of a simply supported beam, common practice)
    expect(summary).toHaveTextContent(/the largest reaction is 5\.49 kN at the left pin$/);
  });

  it("follows a deletion, and says when nothing is drawn", async () => {
    const user = userEvent.setup();
    await renderEditor(beam("F1"));
    const row = within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: /^Point force l1/ });
    row.focus();
    await user.keyboard("{Enter}{Delete}");
    await waitFor(() => expect(screen.getByTestId("canvas-summary")).toHaveTextContent(/^Body b1 \(Beam\), with Pin s1 \(left pin\), Contact s2 \(right pad\)\. Result:/));
  });

  it("an empty sketch: nothing drawn yet", async () => {
    await renderEditor(emptySketch());
    expect(screen.getByTestId("canvas-summary")).toHaveTextContent("Nothing drawn yet.");
  });
});
