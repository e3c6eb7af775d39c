// A comparison's sentence about each body: its status and, as the listings mark it, its slip — a
// skid that starts to slide between two versions is a change even though it still "holds".
import { describe, expect, it } from "vitest";
import { compareSketches } from "@/lib/review/compare";
import type { SketchFile } from "@/solver/schema";
import { loadFixture } from "./solver/helpers";

const skid = (mu: number): SketchFile => {
  const f = loadFixture("pump-skid-discharge.json") as SketchFile;
  return { ...f, supports: f.supports.map((s) => (s.kind === "contact" ? { ...s, mu } : s)) };
};

describe("a body's change between two versions", () => {
  it("names a slip that begins: the skid's feet on a wet deck (μ 0.4 → 0.02)", () => {
    // the discharge's horizontal momentum flux is carried by friction at the feet; with μ = 0.02 the
    // feet cannot give it (Coulomb friction, |t| ≤ μ·n: common practice)
    const c = compareSketches(skid(0.4), skid(0.02));
    expect(c.bodies).toEqual([{ id: "skid", label: "Skid", before: "holds", after: "holds, but slips", words: "holds → holds, but slips" }]);
    expect(c.reactions.map((r) => r.stateChange)).toEqual(["bearing → slips", "bearing → slips"]);
  });

  it("says nothing of a body whose status and slip are the same in both", () => {
    expect(compareSketches(skid(0.4), skid(0.5)).bodies[0].words).toBeNull();
  });
});
