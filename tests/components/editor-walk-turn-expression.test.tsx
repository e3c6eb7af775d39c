// Turning a port by its handle when its direction is an expression ("theta"): the drag writes a
// number, as documented, and the status line now says that the port no longer follows theta and
// that the operating case which sets theta no longer turns it (before, nothing was said and the
// case silently stopped turning the port). One undo step brings the expression back.
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { createEditorStore } from "@/canvas/store";
import { createAnalysisStore, linkAnalysis } from "@/canvas/analysis/store";
import { createSceneStore, linkScene, type EditorStores } from "@/canvas/context";
import { createInteractionStore } from "@/canvas/konva/interaction";
import { createPointerController, type HitInfo } from "@/canvas/konva/pointer";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";

function sketch(): SketchFile {
  return {
    ...emptySketch("Skid with a nozzle"),
    parameters: { theta: "0 deg" },
    bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]], "Skid")],
    supports: [{ id: "s1", body: "b1", kind: "pin", at: [1, 0] }],
    ports: [{ id: "p1", body: "b1", kind: "outlet", at: [2, 0.5], angle: "theta", massFlow: 1, velocity: 1, label: "discharge" }],
    cases: [{ id: "up", name: "Nozzle turned up", parameters: { theta: "90 deg" } }],
  };
}

const VIEW = { scale: 100, x: 100, y: 500 };
const screenOf = (x: number, y: number) => ({ clientX: VIEW.x + x * VIEW.scale, clientY: VIEW.y - y * VIEW.scale });

let stores: EditorStores;
let stops: Array<() => void> = [];
let hit: HitInfo | null = null;
let controller: ReturnType<typeof createPointerController>;

beforeEach(() => {
  const editor = createEditorStore({ sketch: sketch(), view: VIEW });
  const analysis = createAnalysisStore();
  const scene = createSceneStore(editor, analysis);
  stops = [linkAnalysis(editor, analysis), linkScene(editor, analysis, scene)];
  stores = { editor, analysis, scene };
  controller = createPointerController({ stores, interaction: createInteractionStore(), container: () => null, hitTest: () => hit });
});
afterEach(() => {
  controller.dispose();
  stops.forEach((s) => s());
});

const ed = () => stores.editor.getState();

describe("turning a port whose direction is an expression", () => {
  it("says the port no longer follows theta nor the case that sets it; Undo brings “theta” back", () => {
    hit = { type: "rotate", id: "p1" };
    controller.down({ ...screenOf(2.66, 0.5), button: 0, shiftKey: false, altKey: false, ctrlKey: false, metaKey: false, timeStamp: performance.now(), preventDefault() {} } as unknown as PointerEvent);
    window.dispatchEvent(new MouseEvent("pointermove", { ...screenOf(2.5, 1.03), bubbles: true }));
    window.dispatchEvent(new MouseEvent("pointerup", { ...screenOf(2.5, 1.03), bubbles: true }));
    // direction from the port (2, 0.5) to the pointer: atan2(0.53, 0.5) = 46.7°, to the 5° step: 45°
    expect(findElement(ed().sketch, "p1")!.el).toMatchObject({ angle: 45 });
    expect(ed().past).toHaveLength(1);
    expect(ed().notice).toBe(
      "Discharge's direction is now a number, not “theta”: the case that sets theta no longer changes it. Undo brings “theta” back.",
    );
    ed().undo();
    expect(findElement(ed().sketch, "p1")!.el).toMatchObject({ angle: "theta" });
  });
});
