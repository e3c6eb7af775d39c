// On the live canvas a given point force is written in the drawing's one force unit, the one its
// reactions are written in: "0.5 kN" beside the bearers' kN, never "500 N" beside "5.039 kN". One
// unit per quantity across a drawing is common practice on calc sheets.
import { waitFor } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { drawnTexts, onCanvas } from "./canvas-support";

describe("a given force on the live canvas", () => {
  it("is written in kN beside the skid's reactions in kN", async () => {
    const sketch = structuredClone(exampleById("pump-skid")!.sketch);
    sketch.loads = [...sketch.loads, { id: "f", label: "hand load", body: "skid", kind: "force", at: [1, 1], magnitude: "500 N", angle: -90 }];
    await onCanvas(sketch);
    // the reactions are drawn (in kN), and the given force with them
    await waitFor(() => expect(drawnTexts().some((t) => / kN$/.test(t) && t !== "0.5 kN")).toBe(true));
    await waitFor(() => expect(drawnTexts()).toContain("0.5 kN"));
    expect(drawnTexts()).not.toContain("500 N");
  });
});
