// A port with a mass flow but zero velocity cannot be: ṁ = ρ·A·V needs an infinite area. With
// nothing else given to compare (no area or density) it used to be solved without a word; it is
// now a PORT_INCONSISTENT warning naming the port, and the solve still runs as given.
import { describe, expect, it } from "vitest";
import { solve } from "@/solver";
import { portDirectionNotes, portFlow } from "@/solver/ports";
import type { Port, SolveWarning } from "@/solver/types";
import { kindAndName } from "@/solver/words";
import { parsed, sketch, solved } from "./helpers";

/** A 2 m × 1 m block on a fixed support with one inlet on its left face (demo data). */
const block = (port: Record<string, unknown>) =>
  sketch({
    bodies: [{ id: "b1", outline: [[0, 0], [2, 0], [2, 1], [0, 1]], mass: 0, cg: [1, 0.5] }],
    supports: [{ id: "s1", body: "b1", kind: "fixed", at: [1, 0] }],
    ports: [{ id: "p1", body: "b1", kind: "inlet", at: [0, 0.5], angle: 0, ...port }],
  } as never);

const warningsOf = (port: Port) => {
  const w: SolveWarning[] = [];
  portFlow(port, w);
  return w;
};

describe("a mass flow at zero velocity", () => {
  it("warns, naming the port by its label, and says what to check", () => {
    const p = parsed(block({ label: "feed", massFlow: 39, velocity: 0 })).ports[0];
    expect(warningsOf(p)).toEqual([
      { code: "PORT_INCONSISTENT", message: "Inlet feed: a mass flow of 39 kg/s at zero velocity would need an infinite area (ṁ = ρ·A·V); check V or the area", ids: ["p1"] },
    ]);
  });

  it("is in the solve's warnings, and the solve still runs (no momentum flux, no weight)", () => {
    const r = solved(block({ massFlow: 39, velocity: 0 }));
    expect(r.ok).toBe(true);
    expect(r.warnings.filter((w) => w.code === "PORT_INCONSISTENT")).toEqual([expect.objectContaining({ ids: ["p1"], message: expect.stringMatching(/^Inlet p1: a mass flow of 39 kg\/s at zero velocity/) })]);
    // ṁ·V = 0: the support carries nothing sideways
    expect(r.reactions.s1.fx).toBeCloseTo(0, 9);
  });

  it("a port with no flow, or a flow at speed, says nothing", () => {
    expect(warningsOf(parsed(block({ massFlow: 0, velocity: 0 })).ports[0])).toEqual([]);
    expect(warningsOf(parsed(block({ massFlow: 39, velocity: 5 })).ports[0])).toEqual([]);
  });

  it("values that also disagree keep the one warning they had", () => {
    // ρ·A·V = 0 against ṁ = 39: disagree by 100 %
    const w = warningsOf(parsed(block({ massFlow: 39, velocity: 0, density: 1000, area: 0.01 })).ports[0]);
    expect(w).toHaveLength(1);
    expect(w[0].message).toMatch(/^Port p1: the values given disagree/);
  });

  it("with a flow factor the warning is the same (it is about the values given)", () => {
    const r = solve({ ...parsed(block({ massFlow: 39, velocity: 0 })), scaling: { flowFactor: 2 } });
    expect(r.warnings.map((w) => w.code)).toContain("PORT_INCONSISTENT");
  });
});

describe("the kind in front of a name", () => {
  it("is not said twice when the label starts with it, in any case, as a whole word", () => {
    expect(kindAndName("Body", "Body 1")).toBe("Body 1");
    expect(kindAndName("Body", "body 1")).toBe("body 1");
    expect(kindAndName("Inlet", "INLET-A")).toBe("INLET-A");
    expect(kindAndName("Fixed support", "Fixed support left")).toBe("Fixed support left");
    expect(kindAndName("Body", "Bodywork")).toBe("Body Bodywork");
    expect(kindAndName("Inlet", "p1")).toBe("Inlet p1");
  });

  it("a port's direction note says \"Inlet 1\", not \"Inlet Inlet 1\"", () => {
    // the inlet on the left face pointing out of the body (angle 180)
    const s = parsed(block({ label: "Inlet 1", massFlow: 39, velocity: 5, angle: 180 }));
    expect(portDirectionNotes(s)[0].message).toMatch(/^Inlet 1 points out of the body/);
  });
});

describe("a port whose flow runs along its face", () => {
  // The momentum flux through a port is ṁ·V with the port's area square to V (common practice: a
  // control surface is crossed, not grazed); on the left face (x = 0) a flow at ±90° crosses nothing.
  it("is said to run along the outline, with the way to turn it for its kind", () => {
    const inlet = parsed(block({ label: "feed", massFlow: 39, velocity: 5, angle: 90 }));
    expect(portDirectionNotes(inlet).map((n) => n.message)).toEqual([
      "Inlet feed flows along the outline, not across it: fluid that crosses the control surface must go through it, and the port's area is taken square to its flow. Turn it to point into the body.",
    ]);
    const outlet = parsed(block({ kind: "outlet", label: "spill", massFlow: 39, velocity: 5, angle: -90 }));
    expect(portDirectionNotes(outlet).map((n) => n.message)).toEqual([
      "Outlet spill flows along the outline, not across it: fluid that crosses the control surface must go through it, and the port's area is taken square to its flow. Turn it to point out of the body.",
    ]);
  });

  it("a port at an angle across its face (a nozzle aimed 60° off square) is not judged", () => {
    expect(portDirectionNotes(parsed(block({ massFlow: 39, velocity: 5, angle: 60 })))).toEqual([]);
  });
});
