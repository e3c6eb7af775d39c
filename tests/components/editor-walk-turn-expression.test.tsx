// Turning a port by its handle when its direction is an expression ("theta"): the drag writes a
// number, as documented, and the status line now says that the port no longer follows theta and
// that the operating case which sets theta no longer turns it (before, nothing was said and the
// case silently stopped turning the port). One undo step brings the expression back.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { pointerHarness } from "./pointer-harness";

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

const h = pointerHarness(sketch);
const { ed, down, pointer } = h;

describe("turning a port whose direction is an expression", () => {
  it("says the port no longer follows theta nor the case that sets it; Undo brings “theta” back", () => {
    h.hit = { type: "rotate", id: "p1" };
    down(2.66, 0.5);
    pointer("pointermove", 2.5, 1.03);
    pointer("pointerup", 2.5, 1.03);
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
