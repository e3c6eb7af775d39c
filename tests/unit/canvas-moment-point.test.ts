// The hand check's point P on the drawing: its words go where they cover none of the result's
// labels and arrows (a P picked on the bottom edge under the weight's label used to sit under it).
import { describe, expect, it } from "vitest";
import { MOMENT_POINT_WORDS, momentPointPrims } from "@/canvas/render/momentPoint";
import { textExtent, type Prim } from "@/canvas/render/prims";

type Text = Extract<Prim, { t: "text" }>;
const wordsOf = (prims: Prim[]) => prims.find((p): p is Text => p.t === "text" && p.text === MOMENT_POINT_WORDS)!;
const overlap = (a: ReturnType<typeof textExtent>, b: ReturnType<typeof textExtent>) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

describe("the moment point's mark and words", () => {
  const P: [number, number] = [400, 300];

  it("with nothing near, the words sit up and to the right of the mark", () => {
    const prims = momentPointPrims(P, []);
    expect(prims.filter((p) => p.t === "circle")).toEqual([expect.objectContaining({ c: P, r: 7 })]);
    expect(wordsOf(prims)).toMatchObject({ at: [411, 286], align: "left" });
  });

  it("under the weight's label and beside its arrow, the words move to a place that covers neither", () => {
    // the weight: an arrow down to just above P, "W 1.177 kN" to its right, just above P
    const weight: Text = { t: "text", at: [408, 290], text: "W 1.177 kN", size: 11, color: "#000", baseline: "middle" };
    const arrow: Prim = { t: "poly", pts: [[400, 200], [400, 296]], stroke: "#000", width: 1.5 };
    // the body's bottom edge through P, left to right
    const edge: Prim = { t: "poly", pts: [[200, 300], [640, 300]], stroke: "#000", width: 1 };
    const words = wordsOf(momentPointPrims(P, [weight, arrow, edge]));
    expect(overlap(textExtent(words), textExtent(weight))).toBe(false);
    expect(words.at[1]).toBeGreaterThan(P[1]);
    // below the edge, to the right: clear of the arrow and the edge
    expect(words).toMatchObject({ at: [411, 314], align: "left" });
  });

  it("boxed in on every side, the words take the place that covers least", () => {
    const around: Prim[] = [-30, -14, 14, 30].flatMap((dy) => [
      { t: "text" as const, at: [300, 300 + dy] as [number, number], text: "x".repeat(40), size: 11, color: "#000", baseline: "middle" as const },
    ]);
    // labels left of P, above and below it: no place is clear of all, and the one chosen covers at most one
    const words = wordsOf(momentPointPrims(P, around));
    expect(words.text).toBe(MOMENT_POINT_WORDS);
    const covered = around.filter((a) => overlap(textExtent(words), textExtent(a as Text))).length;
    expect(covered).toBeLessThanOrEqual(1);
  });
});
