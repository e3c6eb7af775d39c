// The hand check is written in the drawing's force unit wherever the checker picks the moment
// point: the arms to a far point make its moments large, but the forces it sums are the drawing's.
// One unit per quantity across a result's views is common practice on calc sheets.
import { describe, expect, it } from "vitest";
import { EXAMPLES, exampleById } from "@/canvas/examples";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { drawingFamily } from "@/canvas/render/results";
import { parseSketch, solve } from "@/solver";
import { handCheckScale, handCheckTable, resultScale, unitFamily } from "@/solver/report";
import type { Vec2 } from "@/solver/types";

function example(id: string) {
  const p = parseSketch(exampleById(id)!.sketch);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const scene = buildScene(p.file, fieldValuesById(p.file, p.fields, []));
  return { scene, result: solve(p.sketch), body: p.sketch.bodies[0].id };
}

describe("the hand check's units", () => {
  it("US, the fire-monitor trailer about a point 30 m off: lbf as the drawing, though ΣM passes 10 kip·ft", () => {
    const { scene, result, body } = example("fire-monitor-trailer");
    const far: Vec2 = [30, 0];
    const eq = result.equations[body];
    // the moments about the far point alone would pick kip (≥ 10 kip·ft = 13 558 N·m) ...
    expect(handCheckScale(eq, far).moment).toBeGreaterThan(13_558);
    expect(unitFamily("US", handCheckScale(eq, far)).force).toBe("kip");
    // ... but the forces choose: the drawing's lbf, in the table's headings too
    expect(drawingFamily(result, "US", scene.items).force).toBe("lbf");
    expect(unitFamily("US", resultScale(result)).force).toBe("lbf");
    const t = handCheckTable(result, body, far, "US");
    const units = t.columns.map((c) => c.unit).filter(Boolean);
    expect(units).toContain("lbf");
    expect(units).not.toContain("kip");
  });

  it("SI, every example: the hand check about its first point and about a far one takes the drawing's force unit", () => {
    expect(EXAMPLES.length).toBeGreaterThanOrEqual(5);
    for (const { id } of EXAMPLES) {
      const { scene, result, body } = example(id);
      const drawing = drawingFamily(result, "SI", scene.items).force;
      for (const about of [[0, 0], [40, 25]] as Vec2[]) {
        const units = handCheckTable(result, body, about, "SI").columns.map((c) => c.unit).filter(Boolean);
        expect(units, `${id} about (${about})`).toContain(drawing);
      }
    }
  });
});
