// A swept range is said with its unit wherever it is worded: the status line after a delete, the
// Sweep tab's kept list, a comparison. The ends of a kept sweep are in the unit the sketch writes
// its parameter in (solver/studySweep.ts, `sweeperOn`), so that is the unit said beside them.
import { describe, expect, it } from "vitest";
import { sweepRangeWords, sweptUnitIn } from "@/canvas/studies/display";
import { limitMark } from "@/components/studies/SweepChart";
import { sweepCharts } from "@/lib/calcsheet/sweeps";
import { exampleById } from "@/canvas/examples";
import { emptySketch } from "@/canvas/model/elements";
import { FLOW_FACTOR } from "@/solver/sweep";
import type { SketchFile } from "@/solver/schema";

const withParameters = (parameters: Record<string, string>): SketchFile => ({ ...emptySketch(), parameters }) as SketchFile;

describe("the unit a kept sweep's ends are in", () => {
  const file = withParameters({ p: "4 bar", theta: "30 deg", v: "90 km/hr", q: "2 * p", n: "3", broken: "3 +" });

  it("is the unit the parameter is written in, or the one an expression gives", () => {
    expect(sweptUnitIn(file, "p")).toBe("bar");
    expect(sweptUnitIn(file, "theta")).toBe("deg");
    expect(sweptUnitIn(file, "v")).toBe("km / hr");
    // an expression of a parameter keeps that parameter's unit
    expect(sweptUnitIn(file, "q")).toBe("bar");
  });

  it("is none for a plain number, the flow factor, a parameter that does not read or is not there", () => {
    expect(sweptUnitIn(file, "n")).toBe("");
    expect(sweptUnitIn(file, FLOW_FACTOR)).toBe("");
    expect(sweptUnitIn(file, "broken")).toBe("");
    expect(sweptUnitIn(file, "missing")).toBe("");
  });
});

describe("a swept range in words", () => {
  it("says the unit after the range, as the Sweep tab's fields take it", () => {
    expect(sweepRangeWords("p", 0, 10, "bar")).toBe("p from 0 to 10 bar");
    expect(sweepRangeWords("theta", -58, 0, "deg")).toBe("theta from −58 to 0 deg");
    // mathjs's spelling is shown as written on paper
    // the hour is h (SI Brochure, table 8), as the Sweep tab's fields read it back
    expect(sweepRangeWords("v", 20, 140, "km / hr")).toBe("v from 20 to 140 km/h");
    expect(sweepRangeWords("rho", 800, 1000, "kg / m^3")).toBe("rho from 800 to 1,000 kg/m³");
  });

  it("names the flow factor in words and gives a plain number no unit", () => {
    expect(sweepRangeWords(FLOW_FACTOR, 0.5, 1.5, "")).toBe("flow factor from 0.5 to 1.5");
    expect(sweepRangeWords("n", 1, 4, "")).toBe("n from 1 to 4");
  });

  it("rounds the ends to six significant figures, not the float's noise", () => {
    expect(sweepRangeWords("theta", 0.1 + 0.2, 29.999999999999996, "deg")).toBe("theta from 0.3 to 30 deg");
  });
});

describe("the line a found limit draws across the plot", () => {
  it("carries the swept parameter's unit, 4 significant figures as the answer beside it", () => {
    expect(limitMark(1482.46, "gpm")).toBe("limit: 1,482 gpm");
    expect(limitMark(35.3812, "m / s")).toBe("limit: 35.38 m/s");
    // the flow factor is a plain number
    expect(limitMark(1.18634, "")).toBe("limit: 1.186");
  });
});

describe("a kept sweep's chart on the calc sheet", () => {
  it("is titled by its range with the unit, and a flow-factor sweep's title ends with its last figure", () => {
    const cart = exampleById("fire-monitor-trailer")!.sketch;
    const bySpeed = { id: "q", parameter: "Q", from: 1000, to: 2000, points: 3, quantities: [{ support: "axle", component: "frictionMargin" as const }] };
    expect(sweepCharts(cart, bySpeed, "SI", ["axle"]).charts.map((c) => c.title)).toEqual(["Q from 1,000 to 2,000 gpm"]);
    const byFlow = { ...bySpeed, id: "f", parameter: FLOW_FACTOR, from: 0, to: 2 };
    expect(sweepCharts(cart, byFlow, "SI", ["axle"]).charts.map((c) => c.title)).toEqual(["flow factor from 0 to 2"]);
  });
});
