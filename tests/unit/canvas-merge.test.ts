// Kept work brought back on top of a newer version: a three-way merge, as version control tools
// merge text (common practice), here by element id and field.
import { describe, expect, it } from "vitest";
import { mergeSketch } from "@/canvas/model/merge";
import type { SketchFile } from "@/solver/schema";
import { beam } from "../components/editor-helpers";

const clone = <T,>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

describe("bringing kept work back on top of the newest version", () => {
  const base = (): SketchFile => ({ ...beam(), parameters: { tip: "1.75 in", theta: "32 deg" } });

  it("keeps a colleague's change you did not touch, and applies yours", () => {
    const mine = clone(base());
    mine.parameters!.theta = "40 deg";
    const theirs = clone(base());
    theirs.parameters!.tip = "1.8 in";
    const { sketch, conflicts } = mergeSketch(base(), mine, theirs);
    expect(sketch.parameters).toEqual({ tip: "1.8 in", theta: "40 deg" });
    expect(conflicts).toEqual([]);
  });

  it("merges element lists by id: their new support stays, your deleted load goes, your new port comes, a field each", () => {
    const mine = clone(base());
    mine.loads = [];
    mine.ports = [{ id: "p1", body: "b1", kind: "outlet", at: [4, 0.25], angle: 0, massFlow: "2 kg/s", velocity: "20 m/s" }];
    mine.supports[0] = { ...mine.supports[0], label: "left pin (cast)" };
    const theirs = clone(base());
    theirs.supports.push({ id: "s3", body: "b1", kind: "tie", at: [2, 0.5], angle: 90 });
    theirs.supports[1] = { ...theirs.supports[1], mu: 0.4 } as SketchFile["supports"][number];
    const { sketch, conflicts } = mergeSketch(base(), mine, theirs);
    expect(sketch.loads).toEqual([]);
    expect(sketch.ports.map((p) => p.id)).toEqual(["p1"]);
    expect(sketch.supports.map((s) => s.id)).toEqual(["s1", "s2", "s3"]);
    expect(sketch.supports[0].label).toBe("left pin (cast)");
    expect((sketch.supports[1] as { mu?: number }).mu).toBe(0.4);
    expect(conflicts).toEqual([]);
  });

  it("where both changed the same field, yours is kept and the field is named", () => {
    const mine = clone(base());
    mine.parameters!.tip = "1.6 in";
    mine.loads[0] = { ...mine.loads[0], magnitude: "12 kN" } as SketchFile["loads"][number];
    const theirs = clone(base());
    theirs.parameters!.tip = "1.8 in";
    theirs.loads[0] = { ...theirs.loads[0], magnitude: "11 kN" } as SketchFile["loads"][number];
    const { sketch, conflicts } = mergeSketch(base(), mine, theirs);
    expect(sketch.parameters!.tip).toBe("1.6 in");
    expect((sketch.loads[0] as { magnitude: string }).magnitude).toBe("12 kN");
    expect(conflicts).toEqual(["parameters.tip", "loads[l1].magnitude"]);
  });

  it("a field you deleted while they changed it is a conflict; key order does not count as a change", () => {
    const mine = clone(base());
    delete mine.parameters!.theta;
    const theirs = clone(base());
    theirs.parameters = { theta: "35 deg", tip: "1.75 in" }; // reordered too, as the database stores keys
    const { sketch, conflicts } = mergeSketch(base(), mine, theirs);
    expect(sketch.parameters).toEqual({ tip: "1.75 in" });
    expect(conflicts).toEqual(["parameters.theta"]);
  });
});
