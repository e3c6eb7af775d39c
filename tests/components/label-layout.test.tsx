// The canvas keeps crowded element labels off other labels: the layout follows the sketch, the
// zoom and the support states, and holds still while a drag lasts.
import { describe, expect, it } from "vitest";
import type { Command } from "@/canvas/commands/define";
import type { EditorStores } from "@/canvas/context";
import { connectAnalysis } from "@/canvas/analysis/store";
import { createSceneStore, linkScene } from "@/canvas/context";
import { setParameter } from "@/canvas/commands/fields";
import { exampleById } from "@/canvas/examples";
import { createInteractionStore } from "@/canvas/konva/interaction";
import { followLabelLayout } from "@/canvas/konva/labelLayout";
import { createEditorStore } from "@/canvas/store";

function setUp(theta: string) {
  const cart = exampleById("washing-cart")!.sketch;
  const editor = createEditorStore({ sketch: { ...cart, parameters: { ...cart.parameters, theta } } });
  const { store: analysis } = connectAnalysis(editor);
  const scene = createSceneStore(editor, analysis);
  linkScene(editor, analysis, scene);
  editor.getState().setView({ scale: 320, x: 400, y: 500 });
  const interaction = createInteractionStore();
  const stop = followLabelLayout({ editor, analysis, scene } as EditorStores, interaction);
  return { editor, interaction, stop };
}

describe("element label layout on the canvas", () => {
  it("moves the rear wheels' name off the front contact's 'lifts' when the cart tips, and back when it holds", () => {
    const { editor, interaction, stop } = setUp("-35 deg");
    const moves = interaction.getState().labelShifts.get("rear");
    // straight up or down by whole lines (10 px text + 3), to the nearest place free of labels and
    // strokes: here two lines
    expect(moves).toHaveLength(1);
    expect(moves![0][1]).toBe(0);
    expect(Math.abs(moves![0][2])).toBe(26);
    const tipping = interaction.getState().labelShifts;

    // while a drag lasts the names stay where they are, whatever changes
    interaction.setState({ dragging: true });
    editor.getState().apply(setParameter({ name: "theta", expression: "-75 deg" }) as Command<unknown>);
    expect(interaction.getState().labelShifts).toBe(tipping);

    // released: placed again; holding, the front contact bears and says nothing, so no name moves
    interaction.setState({ dragging: false });
    expect(interaction.getState().labelShifts.has("rear")).toBe(false);
    stop();
  });
});
