// The version page's kept-sweep jobs, as the studies' worker runs them: the same chart, crossings and
// table of limits as the calc sheet's own functions give, as plain data that survives the
// structured clone out of the worker, with progress that only goes up and ends at its total.
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { runStudyJob } from "@/canvas/studies/keptSweep";
import { runSweep } from "@/canvas/studies/run";
import { MAX_POINTS, sweepLimitTable, sweepMarkers, sweepQuantities } from "@/lib/calcsheet/sweeps";
import type { SketchFile } from "@/solver/schema";

const cart = () => structuredClone(exampleById("washing-cart")!.sketch) as unknown as SketchFile;

describe("kept-sweep jobs", () => {
  it("plot: the sweep and its crossings as the calc sheet makes them, cloneable, with rising progress", () => {
    const doc = cart();
    const sw = doc.sweeps![0];
    const heard: Array<[number, number]> = [];
    const got = runStudyJob({ kind: "kept-sweep", text: JSON.stringify(doc), sweep: sw.id }, (done, total) => heard.push([done, total]));
    const quantities = sweepQuantities(sw, doc.supports.map((s) => s.id));
    const data = runSweep(doc, { parameter: sw.parameter, from: sw.from, to: sw.to, points: Math.min(sw.points, MAX_POINTS), quantities });
    expect(got.data).toEqual(data);
    expect(got.markers).toEqual(sweepMarkers(doc, sw, quantities));
    expect(got.markers.length).toBeGreaterThan(0);
    expect(structuredClone(got)).toEqual(got);
    // 91 points, then the two plotted margins (the front caster's, the rear wheels' friction)
    const total = 91 + 2;
    expect(heard.every(([, t]) => t === total)).toBe(true);
    expect(heard.map(([d]) => d)).toEqual([20, 40, 60, 80, 91, 92, 93]);
  });

  it("limits: the calc sheet's table and summary, cloneable", () => {
    const doc = cart();
    const got = runStudyJob({ kind: "kept-sweep-limits", text: JSON.stringify(doc), sweep: "lance-angle" }, () => {});
    const direct = sweepLimitTable(doc, doc.sweeps![0]);
    expect(got).toEqual(direct);
    expect(structuredClone(got)).toEqual(direct);
    expect(got.table.rows.length).toBeGreaterThan(0);
  });

  it("a sweep the version does not keep is said by its id", () => {
    expect(() => runStudyJob({ kind: "kept-sweep", text: JSON.stringify(cart()), sweep: "gone" }, () => {})).toThrow('sweeps: there is no kept sweep "gone"');
  });
});
