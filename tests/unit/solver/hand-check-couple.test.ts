// The hand-check table (CSV and calc sheet): a fixed support's row says the couple its M carries
// beside r × F, so x·Fy − y·Fx redone from the row plus that couple is the M printed.
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { parseSketch, solve } from "@/solver";
import { handCheckTable } from "@/solver/report";

describe("hand-check table: a fixed support's couple", () => {
  it("the pipe-bend example about the origin: M = 0.09 m × Fy + m", () => {
    const p = parseSketch(exampleById("pipe-bend-anchor")!.sketch);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const r = solve(p.sketch);
    const t = handCheckTable(r, "bend", [0, 0], "SI");
    const anchor = t.rows.find((x) => String(x[1]).startsWith("reaction at “anchor”"))!;
    // control-volume momentum equation (any fluid mechanics text): Fy = ṁV + W + p_out·A =
    // 114.4 + 902.2 + 17 579 = 18 596 N at (0.09, 0); r × F = 0.09 × 18 596 = 1 674 N·m; with the
    // anchor's couple −1 771 N·m the row's M is −97.44 N·m
    expect(anchor[1]).toBe("reaction at “anchor”, with its couple −1.771 kN·m");
    expect(anchor[3] as number).toBeCloseTo(18.596, 3);
    expect(anchor[4]).toBe("(0.09000, 0)");
    expect(anchor[5] as number).toBeCloseTo(0.09 * (anchor[3] as number) - 1.771, 3);
    expect(anchor[5] as number).toBeCloseTo(-0.09744, 4);
    // a force without a couple keeps its label
    expect(t.rows.some((x) => x[1] === "weight of “DN150 bend”")).toBe(true);
  });
});
