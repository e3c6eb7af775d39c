// The status line's words for the tool in use: read from the tool, so they go when it goes (a
// single placement hands back to selecting); a touch screen's words speak of taps and the Done
// button, never of Shift or Esc; and a notice said under a tool (a refusal) goes with the tool.
import { describe, expect, it } from "vitest";
import { actionById, noticesFollowTool, toolHint, type ActionContext } from "@/canvas/actions";
import { createEditorStore, type Tool } from "@/canvas/store";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";

const KEYS = /Shift|Esc|Enter|Backspace|click/;

describe("toolHint", () => {
  it("says what each tool does, and nothing while selecting", () => {
    expect(toolHint({ kind: "select" })).toBeNull();
    expect(toolHint({ kind: "select" }, true)).toBeNull();
    expect(toolHint({ kind: "place", element: "pin" })).toBe("Pin: click on or near a body's outline to place it (Shift+click to place several). Esc to stop.");
    expect(toolHint({ kind: "place", element: "contact", friction: true })).toMatch(/^Contact with friction: click on or near a body's outline/);
    expect(toolHint({ kind: "place", element: "force" })).toBe("Point force: click on a body to place it (Shift+click to place several). Esc to stop.");
    expect(toolHint({ kind: "body", shape: "rectangle", points: [] })).toMatch(/^Body: drag a rectangle on the drawing, or click for one of the default size centred there\./);
    expect(toolHint({ kind: "body", shape: "polygon", points: [[0, 0]] })).toMatch(/^Polygon body: 1 corner placed\. Click each next corner/);
    expect(toolHint({ kind: "pick-point" })).toMatch(/the hand check takes moments about that point/);
    // a mark clicked at a small zoom is a few image pixels out: the hint says how to make the scale exact
    expect(toolHint({ kind: "calibrate", points: [] })).toBe(
      "Setting the scale: click the first of two marks a known distance apart on the drawing (the farther apart they are, and the closer you zoom in on each, the more exact the scale). Esc to stop.",
    );
    expect(toolHint({ kind: "calibrate", points: [[10, 10]] })).toBe("Setting the scale: now click the second mark. Esc to stop.");
  });

  it("on a touch screen, speaks of taps and Done, never of keys", () => {
    const tools: Tool[] = [
      { kind: "place", element: "pin" },
      { kind: "place", element: "inlet" },
      { kind: "place", element: "couple" },
      { kind: "body", shape: "rectangle", points: [] },
      { kind: "body", shape: "polygon", points: [] },
      { kind: "body", shape: "polygon", points: [[0, 0], [1, 0], [1, 1]] },
      { kind: "pick-point" },
      { kind: "calibrate", points: [] },
    ];
    for (const t of tools) expect(toolHint(t, true), JSON.stringify(t)).not.toMatch(KEYS);
    expect(toolHint({ kind: "place", element: "pin" }, true)).toBe("Pin: tap on or near a body's outline to place it. Done stops.");
    expect(toolHint({ kind: "body", shape: "polygon", points: [[0, 0], [1, 0], [1, 1]] }, true)).toBe("Polygon body: 3 corners placed. Tap each next corner, then tap the first corner or Done to close it.");
  });
});

describe("the notice and the tool", () => {
  function editor() {
    const store = createEditorStore({ sketch: { ...emptySketch(), bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]])] } });
    const stop = noticesFollowTool(store);
    const ctx = { stores: { editor: store }, controller: null, ui: {} } as unknown as ActionContext;
    return { store, stop, ctx };
  }

  it("choosing a tool clears what was said before; the words said under it go when it is put down", () => {
    const { store, stop, ctx } = editor();
    store.getState().notify("Opened the example.");
    actionById("add.pin").run(ctx);
    expect(store.getState().tool).toEqual({ kind: "place", element: "pin", friction: false });
    expect(store.getState().notice).toBeNull();
    // a click too far out is refused; the tool stays on and says why
    store.getState().notify("Click on or near a body's outline to place a support.");
    // a placement (or Esc, or Done) hands back to selecting: the refusal goes with the tool
    store.getState().setTool({ kind: "select" });
    expect(store.getState().notice).toBeNull();
    stop();
  });

  it("what is said after the tool is put down (what was added) stays", () => {
    const { store, stop } = editor();
    store.getState().setTool({ kind: "place", element: "pin" });
    store.getState().setTool({ kind: "select" });
    store.getState().notify("Body added, 2 m × 1 m. Drag its corners to reshape it.");
    expect(store.getState().notice).toBe("Body added, 2 m × 1 m. Drag its corners to reshape it.");
    // a polygon's next corner is the same tool: a notice under it stays
    store.getState().setTool({ kind: "body", shape: "polygon", points: [] });
    store.getState().notify("A note.");
    store.getState().setTool({ kind: "body", shape: "polygon", points: [[0, 0]] });
    expect(store.getState().notice).toBe("A note.");
    stop();
  });
});
