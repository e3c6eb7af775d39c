// Units of the swept quantities (a moment is a moment, not a force) and which lines get their
// zero crossings marked (margins only).
import { describe, expect, it } from "vitest";
import { displayUnit, fromDisplay, parseTarget, toDisplay } from "@/canvas/studies/display";
import { runSweep } from "@/canvas/studies/run";
import { chartRows } from "@/components/studies/SweepChart";
import { box, expectRel, sketch } from "../solver/helpers";

// 1 lbf·ft = 1.3558179483 N·m and 1 lbf = 4.4482216152605 N, exact by the definitions of the
// foot and the pound-force (NIST SP 811).
const LBF_FT = 1.3558179483;
const LBF = 4.4482216152605;

describe("display units per quantity", () => {
  it("a fixed support's moment in kN·m or lbf·ft, forces in kN or lbf, a ratio as it is", () => {
    expect(displayUnit("m", "SI")).toBe("kN·m");
    expect(displayUnit("m", "US")).toBe("lbf·ft");
    expect(displayUnit("resultant", "US")).toBe("lbf");
    expect(displayUnit("margin", "SI")).toBe("kN");
    expect(displayUnit("frictionRatio", "US")).toBe("");
    expectRel(toDisplay(LBF_FT, "m", "US"), 1, 1e-10);
    expectRel(toDisplay(2500, "m", "SI"), 2.5, 1e-12);
    expectRel(toDisplay(LBF, "fx", "US"), 1, 1e-12);
    expect(toDisplay(0.35, "frictionRatio", "US")).toBe(0.35);
    // a moment converted as a force would be off by the foot: 1 N·m is 0.7376 lbf·ft, not 0.2248
    expectRel(toDisplay(1000, "m", "US"), 1000 / LBF_FT, 1e-10);
    expectRel(fromDisplay(1, "m", "US"), LBF_FT, 1e-10);
    expectRel(fromDisplay(2, "n", "SI"), 2000, 1e-12);
  });
});

// A cantilever post on a fixed base at x = 1 m, a downward 1 kN load at x = a on its top: the base
// moment is M = (a − 1 m)·1 kN (counter-clockwise positive, on the body: M_base + (a − 1)(−1000) = 0,
// so M_base = 1000·(a − 1)), changing sign at a = 1 m (statics, common practice).
const post = sketch({
  parameters: { a: "0.5 m" },
  bodies: [{ id: "p", outline: box(2, 1), mass: 0 }],
  supports: [{ id: "base", body: "p", kind: "fixed", at: [1, 0] }],
  loads: [{ id: "w", body: "p", kind: "force", at: ["a", 1], fx: 0, fy: -1000 }],
});

describe("sweep of a moment", () => {
  const data = runSweep(post, { parameter: "a", from: 0, to: 2, points: 5, quantities: [{ support: "base", component: "m" }, { support: "base", component: "fy" }] });

  it("the moment changes sign, and no crossing is marked: nothing lifted", () => {
    expect(data.series[0].map((v) => Math.round(v))).toEqual([-1000, -500, 0, 500, 1000]);
    expect(data.crossings).toEqual([]);
  });

  it("a plot that stays below a kilonewton is in N and N·m, as the tables are; one at 1 kN in kN", () => {
    const light = sketch({ ...post, loads: [{ id: "w", body: "p", kind: "force", at: ["a", 1], fx: 0, fy: -100 }] });
    const small = runSweep(light, { parameter: "a", from: 0, to: 2, points: 5, quantities: [{ support: "base", component: "m" }, { support: "base", component: "fy" }] });
    // M = 100·(a − 1) N·m: −100 at a = 0; Fy = 100 N throughout
    const rows = chartRows(small, "SI");
    expectRel(rows[0].q0!, -100, 1e-9);
    expectRel(rows[0].q1!, 100, 1e-9);
    expect(displayUnit("m", "SI", 100)).toBe("N·m");
    expect(displayUnit("fy", "SI", 100)).toBe("N");
    // the 1 kN post reaches 1 kN·m: kN and kN·m
    expectRel(chartRows(data, "SI")[0].q0!, -1, 1e-9);
    expect(displayUnit("m", "SI", 1000)).toBe("kN·m");
    // US units stay lbf whatever the size
    expect(displayUnit("fy", "US", 100)).toBe("lbf");
  });

  it("the chart shows the moment in lbf·ft and the force in lbf", () => {
    const rows = chartRows(data, "US");
    expectRel(rows[0].q0!, -1000 / LBF_FT, 1e-9);
    expectRel(rows[0].q1!, 1000 / LBF, 1e-9);
    expect(rows[0].x).toBe(0);
  });

  it("a margin crossing zero is still marked, a reaction changing sign in the same sweep is not", () => {
    // a beam on a left contact at x = 0 and a pin at x = 2, a 1 kN load at x = a on top: by moments
    // about the pin, the contact's n = 1000·(2 − a)/2, reaching zero at a = 2 (it lifts beyond);
    // the pin's Fy = 1000·a/2 changes sign at a = 0, which is no event (statics, common practice)
    const beam = sketch({
      parameters: { a: "1 m" },
      bodies: [{ id: "b", outline: box(4, 1, -1, 0), mass: 0 }],
      supports: [
        { id: "left", body: "b", kind: "contact", at: [0, 0], angle: 90 },
        { id: "pin", body: "b", kind: "pin", at: [2, 0] },
      ],
      loads: [{ id: "w", body: "b", kind: "force", at: ["a", 1], fx: 0, fy: -1000 }],
    });
    const d = runSweep(beam, { parameter: "a", from: -1, to: 3, points: 9, quantities: [{ support: "left", component: "margin" }, { support: "pin", component: "fy" }] });
    expect(Math.sign(d.series[1][0])).toBe(-1);
    expect(Math.sign(d.series[1][8])).toBe(1);
    expect(d.crossings).toHaveLength(1);
    expect(d.crossings[0].quantity).toBe(0);
    expect(d.crossings[0].between[0]).toBeLessThanOrEqual(2);
    expect(d.crossings[0].between[1]).toBeGreaterThanOrEqual(2);
  });
});

describe("the limit finder's target, said back", () => {
  it("writes a negative plain number with the true minus, as the tables do, and keeps its digits", () => {
    expect(parseTarget("-4", "fx", "SI", 5000)).toEqual({ si: -4000, shown: "−4 kN" });
    expect(parseTarget("0.5", "margin", "SI", 5000)).toEqual({ si: 500, shown: "0.5 kN" });
  });
});
