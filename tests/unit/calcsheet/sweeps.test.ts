// The calc sheet's sweep charts: solved on the sweep's saved case, and a moment drawn in its own
// unit on its own chart.
import { describe, expect, it } from "vitest";
import { runLimit } from "@/canvas/studies/run";
import { sweepCharts } from "@/lib/calcsheet/sweeps";
import { parseSketch, type SketchFileInput } from "@/solver";
import { box, expectRel, loadFixture, sketch } from "../solver/helpers";

const fileOf = (doc: unknown) => {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
};

describe("calc sheet sweeps", () => {
  const trailer = (): SketchFileInput => {
    const doc = loadFixture("fire-monitor-trailer.json");
    doc.cases = [{ id: "more", name: "More flow", parameters: { Q: "2500 gpm" } }];
    return doc;
  };
  const jack = { support: "jack", component: "margin" as const };

  it("a sweep saved on a case is solved with the case's overrides, not the sketch as drawn", () => {
    const doc = trailer();
    const withCase = fileOf({ ...doc, sweeps: [{ id: "sw", parameter: "theta", from: 0, to: 80, points: 41, case: "more", quantities: [jack] }] });
    const { markers } = sweepCharts(withCase, withCase.sweeps![0], "SI", []);
    // independently, the limit finder on the case and on the sketch as drawn
    const onCase = runLimit(doc, { parameter: "theta", from: 0, to: 80, caseId: "more", quantity: jack, target: 0 });
    const asDrawn = runLimit(doc, { parameter: "theta", from: 0, to: 80, quantity: jack, target: 0 });
    if (!onCase.found || !asDrawn.found) throw new Error("expected both to cross");
    expect(Math.abs(onCase.value - asDrawn.value)).toBeGreaterThan(5);
    expect(markers).toHaveLength(1);
    expectRel(markers[0].x, onCase.value, 1e-9);
  });

  it("a sweep naming a case that does not exist says so", () => {
    const doc = fileOf({ ...trailer(), sweeps: [{ id: "sw", parameter: "theta", from: 0, to: 80, points: 5, case: "gone", quantities: [jack] }] });
    expect(() => sweepCharts(doc, doc.sweeps![0], "SI", [])).toThrow('case: there is no case "gone" (cases: more)');
  });

  it("a fixed support's moment gets its own chart in lbf·ft (1 lbf·ft = 1.3558179483 N·m, NIST SP 811)", () => {
    // a post on a fixed base at x = 1 m, 1 kN down at x = a on top: M_base = 1000·(a − 1) N·m (statics)
    const doc = fileOf(
      sketch({
        parameters: { a: "0.5 m" },
        bodies: [{ id: "p", outline: box(2, 1), mass: 0 }],
        supports: [{ id: "base", body: "p", kind: "fixed", at: [1, 0] }],
        loads: [{ id: "w", body: "p", kind: "force", at: ["a", 1], fx: 0, fy: -1000 }],
        sweeps: [{ id: "sw", parameter: "a", from: 0, to: 2, points: 3, quantities: [{ support: "base", component: "m" }, { support: "base", component: "fy" }] }],
      }),
    );
    const { charts, markers } = sweepCharts(doc, doc.sweeps![0], "US", ["base"]);
    expect(charts.map((c) => [c.title, c.yLabel])).toEqual([
      ["a from 0 to 2 m — moments", "lbf·ft"],
      ["a from 0 to 2 m — forces", "lbf"],
    ]);
    expectRel(charts[0].series[0].points[0][1]!, -1000 / 1.3558179483, 1e-9);
    expectRel(charts[1].series[0].points[0][1]!, 1000 / 4.4482216152605, 1e-9);
    // a moment changing sign is not marked as a crossing
    expect(charts[0].series[0].markZero).toBe(false);
    expect(markers).toEqual([]);
  });
});
