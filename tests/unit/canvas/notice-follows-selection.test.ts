// The status line's words about what was just added ("Arrow keys move it") go once another element
// is selected, which the arrows would move instead; words said with the change itself stay.
import { describe, expect, it } from "vitest";
import { actionById, noticesFollowTool, type ActionContext } from "@/canvas/actions";
import { createEditorStore } from "@/canvas/store";
import { createStore } from "zustand/vanilla";
import { buildScene } from "@/canvas/scene";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";

function editor() {
  const sketch = { ...emptySketch(), bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]])] };
  const store = createEditorStore({ sketch });
  const stop = noticesFollowTool(store);
  const scene = createStore(() => buildScene(store.getState().sketch));
  store.subscribe((s, p) => s.sketch !== p.sketch && scene.setState(buildScene(s.sketch), true));
  const ctx = { stores: { editor: store, scene }, controller: null, ui: {} } as unknown as ActionContext;
  return { store, stop, ctx };
}

describe("a notice and the selection", () => {
  it("the placed contact's notice goes when the body is selected instead; an undo's words stay", () => {
    const { store, stop, ctx } = editor();
    actionById("add.contact").placeNow!(ctx);
    expect(store.getState().selection).toEqual(["s1"]);
    expect(store.getState().notice).toMatch(/^Contact added to Body 1 near the left end of its bottom edge \(x = 0\.25 m, y = 0 m\)\. Arrow keys move it/);
    // selecting the same element again says nothing new and keeps it
    store.getState().select(["s1"]);
    expect(store.getState().notice).toMatch(/^Contact added/);
    store.getState().select(["b1"]);
    expect(store.getState().notice).toBeNull();
    // undo selects what it brings back and says so in the same step: that stays
    store.getState().undo();
    expect(store.getState().notice).toMatch(/^Undid: /);
    stop();
  });
});
