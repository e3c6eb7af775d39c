// A duplicate or a paste never gives two elements one name: the results headline and the
// reactions table call a body and a support by their labels ("Body 1: Holds … at pin s4"), so
// two bodies both called "Body 1" read as one. A copy whose label is taken gets the next free
// number ("Body 1" → "Body 2", "Front foot" → "Front foot 2"); one whose label is free keeps it.
import { describe, expect, it } from "vitest";
import { duplicateElements, freshLabel } from "@/canvas/commands/elements";
import { runCommand } from "@/canvas/commands/define";
import { copyFragment, planPaste } from "@/canvas/clipboard";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import type { SketchFile } from "@/solver/schema";

function skid(): SketchFile {
  return {
    ...emptySketch("Pump skid"),
    bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]])],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [0.25, 0], label: "Front foot" },
      { id: "s2", body: "b1", kind: "roller", at: [1.75, 0], angle: 90 },
    ],
  } as SketchFile;
}

describe("the label a copy gets", () => {
  it("takes the next free number, or adds one", () => {
    expect(freshLabel("Body 1", new Set(["Body 1", "Body 2"]))).toBe("Body 3");
    expect(freshLabel("Front foot", new Set(["Front foot"]))).toBe("Front foot 2");
    expect(freshLabel("Skid", new Set(["Body 1"]))).toBe("Skid");
  });

  it("a duplicated body and its labelled foot get names of their own; an unlabelled roller stays unlabelled", () => {
    const after = runCommand(skid(), duplicateElements({ ids: ["b1"], offset: [0.4, -0.4] }));
    expect(after.bodies.map((b) => b.label)).toEqual(["Body 1", "Body 2"]);
    expect(after.supports.map((s) => s.label)).toEqual(["Front foot", undefined, "Front foot 2", undefined]);
  });

  it("a paste into the same sketch renames; into a sketch without those names keeps them", () => {
    const fragment = copyFragment(skid(), ["b1"])!;
    const same = planPaste(skid(), fragment, { step: 0.2 });
    if (!same.ok) throw new Error(same.reason);
    expect(same.plan.copies.map((c) => c.el.label)).toEqual(["Body 2", "Front foot 2", undefined]);
    const other = planPaste(emptySketch("Next skid"), fragment, { step: 0.2 });
    if (!other.ok) throw new Error(other.reason);
    expect(other.plan.copies.map((c) => c.el.label)).toEqual(["Body 1", "Front foot", undefined]);
  });
});
