// The words for fields you and a newer version both changed: each clash `mergeSketch` finds is
// named as the screens name it (the element's kind, label and id, the form's word for the field)
// with both values in the units on screen, never as a file path. The unit conversions are exact
// by definition (1 in = 25.4 mm, 1 lbf = 4.4482216152605 N: NIST SP 811, appendix B).
import { describe, expect, it } from "vitest";
import { mergeSketch } from "@/canvas/model/merge";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { clashList, clashWords, elementWords } from "@/lib/review/mergeWords";
import type { SketchFile } from "@/solver/schema";

const clone = <T,>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

/** A pump skid on two feet with a nozzle, a motor load, a storm case and a flow parameter (demo data). */
function skid(): SketchFile {
  return {
    ...emptySketch("Pump skid"),
    description: "Skid on the mezzanine",
    gravity: 9.81,
    parameters: { Q: "45 lpm", tip: "1.75 in" },
    bodies: [{ ...newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]], "Skid"), mass: 850 }],
    supports: [
      { id: "s1", body: "b1", kind: "contact", at: [0, 0], angle: 90, mu: 0.3, label: "rear foot" },
      { id: "s2", body: "b1", kind: "pin", at: [2, 0] },
    ],
    loads: [{ id: "l1", body: "b1", kind: "force", at: [1, 1], magnitude: 12000, angle: -90, label: "motor" }],
    ports: [{ id: "p1", body: "b1", kind: "outlet", at: [2, 0.5], angle: 0, massFlow: 10, velocity: 5, area: 0.002, label: "nozzle N1" }],
    cases: [{ id: "c1", name: "Storm", parameters: { Q: "60 lpm" }, factors: { live: 1.2 } }],
  } as SketchFile;
}

/** Base, mine and theirs, both sides changing the same fields differently. */
function clash(change: (doc: SketchFile, side: "mine" | "theirs") => void) {
  const mine = clone(skid());
  const theirs = clone(skid());
  change(mine, "mine");
  change(theirs, "theirs");
  const merged = mergeSketch(skid(), mine, theirs);
  return { ...merged, theirs };
}

describe("naming a merge clash in words", () => {
  it("names an element by its kind, label and id", () => {
    const s = skid();
    expect(elementWords("ports", s.ports[0])).toBe("Outlet nozzle N1 (p1)");
    expect(elementWords("supports", s.supports[0])).toBe("Contact rear foot (s1)");
    // no label: the kind and the id
    expect(elementWords("supports", s.supports[1])).toBe("Pin s2");
    // a label that starts with the kind is not given it twice
    expect(elementWords("bodies", { ...s.bodies[0], label: "Body frame" })).toBe("Body frame (b1)");
  });

  it("a port's area: the element's name, the form's word, both values as areas", () => {
    const r = clash((d, side) => void ((d.ports[0] as { area: unknown }).area = side === "mine" ? 0.0025 : 0.003));
    expect(r.conflicts).toEqual(["ports[p1].area"]);
    expect(clashWords(r.conflicts[0], r.sketch, r.theirs)).toEqual({ place: "Outlet nozzle N1 (p1): area", yours: "2,500 mm²", theirs: "3,000 mm²" });
    // in US units: 0.0025 m² / (0.0254 m)² = 3.875 in², 0.003 m² = 4.65 in²
    expect(clashWords(r.conflicts[0], r.sketch, r.theirs, "US")).toEqual({ place: "Outlet nozzle N1 (p1): area", yours: "3.875 in²", theirs: "4.65 in²" });
  });

  it("a support's friction, cleared on one side: the blank says what it means", () => {
    const r = clash((d, side) => {
      const foot = d.supports[0] as { mu?: number };
      if (side === "mine") delete foot.mu;
      else foot.mu = 0.45;
    });
    expect(r.conflicts).toEqual(["supports[s1].mu"]);
    expect(clashList(r.conflicts, r.sketch, r.theirs, "v3")).toBe("Contact rear foot (s1): friction μ (yours blank (no friction); v3 has 0.45)");
  });

  it("a load's magnitude as a number and as an expression, and its position as a point", () => {
    const r = clash((d, side) => {
      const load = d.loads[0] as { magnitude: unknown; at: unknown };
      load.magnitude = side === "mine" ? "2 * 6.5 kN" : 14000;
      load.at = side === "mine" ? [1.2, 1] : [0.8, 1];
    });
    expect(r.conflicts).toEqual(["loads[l1].at", "loads[l1].magnitude"]);
    // 14,000 N = 3,147 lbf (14,000 / 4.4482216)
    expect(clashList(r.conflicts, r.sketch, r.theirs, "v5", "US")).toBe(
      "Point force motor (l1): position (yours (3.937, 3.281) ft; v5 has (2.625, 3.281) ft); Point force motor (l1): magnitude (yours 2 * 6.5 kN; v5 has 3,147 lbf)",
    );
  });

  it("a body's mass and outline, and a support one side removed while the other changed it", () => {
    const r = clash((d, side) => {
      d.bodies[0] = { ...d.bodies[0], mass: side === "mine" ? 900 : 1000 } as SketchFile["bodies"][number];
      if (side === "mine") d.bodies[0].outline = [[0, 0], [2, 0], [2, 1.2], [0, 1]];
      else d.bodies[0].outline = [[0, 0], [2, 0], [2, 1], [1, 1.5], [0, 1]];
      if (side === "mine") d.supports = d.supports.filter((s) => s.id !== "s2");
      else (d.supports[1] as { at: unknown }).at = [1.9, 0];
    });
    expect(r.conflicts).toEqual(["bodies[b1].outline", "bodies[b1].mass", "supports[s2]"]);
    expect(r.conflicts.map((p) => clashWords(p, r.sketch, r.theirs))).toEqual([
      { place: "Body Skid (b1): outline", yours: "4 corners", theirs: "5 corners" },
      { place: "Body Skid (b1): mass", yours: "900 kg", theirs: "1 t" },
      // named from v3, where it still is
      { place: "Pin s2", yours: "removed", theirs: "changed" },
    ]);
  });

  it("a case's parameter change and factor, and the case's name from the merged file", () => {
    const r = clash((d, side) => {
      d.cases![0].parameters!.Q = side === "mine" ? "70 lpm" : "65 lpm";
      d.cases![0].factors!.live = side === "mine" ? 1.5 : 1.4;
    });
    expect(r.conflicts).toEqual(["cases[c1].parameters.Q", "cases[c1].factors.live"]);
    expect(clashList(r.conflicts, r.sketch, r.theirs, "v2")).toBe(
      "Case “Storm”: change of Q (yours 70 lpm; v2 has 65 lpm); Case “Storm”: factor of group live (yours 1.5; v2 has 1.4)",
    );
  });

  it("a renamed support and case: named by your name, both names in quotes", () => {
    const r = clash((d, side) => {
      d.supports[0].label = side === "mine" ? "rear foot, shimmed" : "rear pad";
      d.cases![0].name = side === "mine" ? "Storm, 50-year" : "Gale";
    });
    expect(r.conflicts).toEqual(["supports[s1].label", "cases[c1].name"]);
    expect(clashList(r.conflicts, r.sketch, r.theirs, "v6")).toBe(
      "Contact rear foot, shimmed (s1): label (yours “rear foot, shimmed”; v6 has “rear pad”); Case “Storm, 50-year”: name (yours “Storm, 50-year”; v6 has “Gale”)",
    );
  });

  it("parameters as written, and one removed on your side", () => {
    const r = clash((d, side) => {
      if (side === "mine") delete d.parameters!.tip;
      else d.parameters!.tip = "1.8 in";
      d.parameters!.Q = side === "mine" ? "50 lpm" : "48 lpm";
    });
    expect(r.conflicts).toEqual(["parameters.Q", "parameters.tip"]);
    expect(clashList(r.conflicts, r.sketch, r.theirs, "v4")).toBe("Parameter Q (yours 50 lpm; v4 has 48 lpm); Parameter tip (yours blank; v4 has 1.8 in)");
  });

  it("the document's own fields: title, notes, gravity in the units on screen", () => {
    const r = clash((d, side) => {
      d.title = side === "mine" ? "Pump skid, east" : "Pump skid, west";
      d.description = side === "mine" ? "On the roof" : "On the slab";
      d.gravity = side === "mine" ? 9.80665 : 9.78;
    });
    expect(r.conflicts).toEqual(["title", "description", "gravity"]);
    expect(r.conflicts.map((p) => clashWords(p, r.sketch, r.theirs, "US"))).toEqual([
      { place: "Title", yours: "“Pump skid, east”", theirs: "“Pump skid, west”" },
      { place: "Notes", yours: "“On the roof”", theirs: "“On the slab”" },
      // 9.80665 m/s² = 32.17 ft/s² (standard gravity / 0.3048); 9.78 m/s² = 32.09 ft/s²
      { place: "Gravity", yours: "32.17 ft/s²", theirs: "32.09 ft/s²" },
    ]);
  });

  it("names only the first few, then says how many more", () => {
    const r = clash((d, side) => {
      d.title = side;
      d.description = side;
      d.gravity = side === "mine" ? 9.8 : 9.7;
      d.parameters!.Q = side;
      d.parameters!.tip = side;
      (d.ports[0] as { area: unknown }).area = side === "mine" ? 0.004 : 0.005;
    });
    expect(r.conflicts).toHaveLength(6);
    const words = clashList(r.conflicts, r.sketch, r.theirs, "v7", "SI", 4);
    expect(words.endsWith(" and 2 more")).toBe(true);
    expect(words.split("); ")).toHaveLength(4);
    expect(words).not.toMatch(/\[|\]/);
  });
});
