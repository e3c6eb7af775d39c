// A body free to move one way can still have more supports than the other directions need: three
// frictionless feet in a row under a beam leave it free to slide sideways and share its weight by
// their stiffnesses. Both facts are reported.
import { describe, expect, it } from "vitest";
import { G0 } from "@/solver/constants";
import { box, expectRel, solved, sketch } from "./helpers";

// a 4 m beam of 1 t, its centre of gravity over the middle foot (invented demo data)
const feet = (xs: number[], mu?: number) =>
  sketch({
    bodies: [{ id: "beam", label: "Beam", outline: box(4, 0.4), mass: 1000, cg: [2, 0.2] }],
    supports: xs.map((x, i) => ({ id: `f${i}`, body: "beam", kind: "contact", at: [x, 0], angle: 90, ...(mu ? { mu } : {}) })),
  });

describe("redundant supports on a body free to move one way", () => {
  it("three frictionless feet: free to slide in x, and indeterminate (degree 1) in the directions they resist", () => {
    const r = solved(feet([0, 2, 4]));
    expect(r.bodies.beam.status).toBe("holds");
    expect(r.bodies.beam.determinacy).toEqual({ kind: "mechanism", degree: 1 });
    expect(r.warnings.map((w) => w.code).sort()).toEqual(["INDETERMINATE", "MECHANISM"]);
    const w = r.warnings.find((x) => x.code === "INDETERMINATE")!;
    expect(w.message).toBe("Beam is statically indeterminate (degree 1) in the directions its supports resist: the reactions depend on the support stiffnesses");
    expect(w.ids).toEqual(["f0", "f1", "f2"]);
    // Σn = W (statics); equal stiffnesses under a symmetric load share it equally (common practice)
    const n = ["f0", "f1", "f2"].map((id) => r.reactions[id].fy);
    expectRel(n.reduce((a, b) => a + b, 0), 1000 * G0, 1e-9);
    for (const x of n) expectRel(x, (1000 * G0) / 3, 1e-6);
  });

  it("two frictionless feet: free to slide, nothing redundant; two feet with friction: indeterminate, nothing free", () => {
    const two = solved(feet([0, 4]));
    expect(two.bodies.beam.determinacy).toEqual({ kind: "mechanism", degree: 1 });
    expect(two.warnings.map((w) => w.code)).toEqual(["MECHANISM"]);
    const rough = solved(feet([0, 4], 0.5));
    expect(rough.bodies.beam.determinacy).toEqual({ kind: "indeterminate", degree: 1 });
    expect(rough.warnings.map((w) => w.code)).toEqual(["INDETERMINATE"]);
  });
});
