// Every labelled term of ΣFx, ΣFy and ΣM reads as a sentence whatever the user typed as a label:
// free text is quoted ("pressure at “from pump”"), an id stands bare ("pressure at p1"), and the
// stability check words the flux terms from the terms' data, never by reading their labels back.
import { describe, expect, it } from "vitest";
import { parseSketch, solveCases, type SketchFileInput } from "@/solver";
import { elementName } from "@/solver/model";
import { asTheBodyFeelsIt } from "@/solver/stability";
import { exampleById } from "@/canvas/examples";
import { loadFixture, sketch, solved } from "./helpers";

const labels = (doc: unknown, body: string) => {
  const eq = solved(doc).equations[body];
  return { forces: eq.forces.map((t) => t.label), momentum: eq.momentum.map((t) => t.label) };
};

describe("an element's name in a term's label", () => {
  it("quotes a label, keeps an id bare, and falls back to the id for an empty label", () => {
    expect(elementName({ id: "in", label: "from pump" })).toBe("“from pump”");
    expect(elementName({ id: "p1" })).toBe("p1");
    expect(elementName({ id: "p1", label: "" })).toBe("p1");
    expect(elementName({ id: "p1", label: "   " })).toBe("p1");
  });

  it("keeps quotes and unicode the user typed, joins a pasted line break, and does not double quotes around the whole label", () => {
    expect(elementName({ id: "t", label: '12" tee' })).toBe("“12\" tee”");
    expect(elementName({ id: "d", label: "Düse ø50 — Strahl" })).toBe("“Düse ø50 — Strahl”");
    expect(elementName({ id: "n", label: "  nozzle\n tip " })).toBe("“nozzle tip”");
    expect(elementName({ id: "n", label: '"nozzle"' })).toBe("“nozzle”");
    expect(elementName({ id: "n", label: "“nozzle”" })).toBe("“nozzle”");
    expect(elementName({ id: "n", label: "'nozzle'" })).toBe("“nozzle”");
    // quotes inside the label are the user's, not a wrapping
    expect(elementName({ id: "n", label: '"A" and "B"' })).toBe("“\"A\" and \"B\"”");
    expect(elementName({ id: "n", label: '""' })).toBe("“\"\"”");
  });
});

describe("the terms of the equations", () => {
  it("the pipe-bend example: its inlet labelled with a phrase reads as one", () => {
    const { forces, momentum } = labels(exampleById("pipe-bend-anchor")!.sketch, "bend");
    expect(forces.filter((l) => !l.startsWith("reaction"))).toEqual(["weight of “DN150 bend”", "pressure at “from pump”", "pressure at “up the riser”"]);
    expect(momentum).toEqual(["momentum in at “from pump”, as −ṁV", "momentum out at “up the riser”"]);
  });

  it("every kind of term, labelled and not", () => {
    const doc = sketch({
      bodies: [{ id: "b1", label: "skid on the deck", outline: [[0, 0], [4, 0], [4, 1], [0, 1]], mass: 100, cg: [2, 0.5] }],
      supports: [
        { id: "s1", body: "b1", kind: "pin", at: [0, 0] },
        { id: "s2", body: "b1", kind: "roller", at: [4, 0], angle: 90 },
      ],
      loads: [
        { id: "f1", body: "b1", kind: "force", at: [2, 1], magnitude: 1000, angle: -90, label: "from the crane hook" },
        { id: "f2", body: "b1", kind: "force", at: [1, 1], magnitude: 500, angle: -90 },
        { id: "c1", body: "b1", kind: "couple", value: 200, label: "motor torque" },
        { id: "w1", body: "b1", kind: "distributed", from: [0, 1], to: [4, 1], w1: 100, w2: 100, label: "snow on the roof" },
        { id: "w2", body: "b1", kind: "distributed", from: [0, 1], to: [4, 1], w1: 100, w2: -100 },
      ],
      ports: [
        { id: "p1", body: "b1", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: 10, velocity: 2, area: 0.01, pressure: 1000 },
        { id: "p2", body: "b1", kind: "outlet", at: [4, 0.5], angle: 0, massFlow: 10, velocity: 2, label: "to the tank", beta: 1.05 },
      ],
      motion: { ax: 0.5 },
    }, 4);
    const { forces, momentum } = labels(doc, "b1");
    expect(forces.filter((l) => !l.startsWith("reaction"))).toEqual([
      "weight of “skid on the deck”",
      "force “from the crane hook”",
      "force f2",
      "couple “motor torque”",
      "distributed load “snow on the roof” (resultant)",
      "distributed load w2 (part at ⅓)",
      "distributed load w2 (part at ⅔)",
      "pressure at p1",
      "inertia of “skid on the deck” (−m·a)",
    ]);
    expect(momentum).toEqual(["momentum in at p1, as −ṁV", "momentum out at “to the tank” (β = 1.05)"]);
    // the same facts as data, so nothing has to read them back out of the words
    const eq = solved(doc).equations.b1;
    expect(eq.momentum.map((t) => [t.name, t.flow, t.beta])).toEqual([
      ["p1", "in", undefined],
      ["“to the tank”", "out", 1.05],
    ]);
    expect(eq.forces.find((t) => t.id === "f1")?.name).toBe("“from the crane hook”");
  });
});

/** The thrust stand (a jet pushes it over its front pin) with its jet's port changed, solved as drawn and in a case. */
function stand(port: Record<string, unknown>, factors?: Record<string, number>) {
  const doc = loadFixture("thrust-stand-tips.json") as SketchFileInput & { version: number };
  doc.version = 6; // cases came in at version 2
  doc.ports = [{ ...doc.ports![0], ...port }] as never;
  if (factors) (doc as { cases?: unknown }).cases = [{ id: "k", name: "Factored", factors }];
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const runs = solveCases(p.file).runs;
  const run = runs[runs.length - 1];
  if (!run.ok) throw new Error(JSON.stringify(run.errors));
  const o = run.stability.stand.overturning;
  if ("notApplicable" in o) throw new Error(o.notApplicable);
  return { terms: o.terms.map((t) => t.label), equations: run.result.equations.stand };
}

describe("the stability check's turning lines", () => {
  it("the jet as the body feels it, named as the equations name it", () => {
    const { terms } = stand({});
    expect(terms).toEqual(["weight of “Stand”", "outflow at “test jet”, on the body −ṁV"]);
  });

  it("a label that looks like the solver's own words (β, a factor, “as −ṁV”) changes nothing but the name", () => {
    const { terms } = stand({ label: "jet (β = 1.05 measured), as −ṁV × 2" });
    expect(terms[1]).toBe("outflow at “jet (β = 1.05 measured), as −ṁV × 2”, on the body −ṁV");
    // and with no label the port's id stands bare
    expect(stand({ label: undefined }).terms[1]).toBe("outflow at jet, on the body −ṁV");
  });

  it("β and a case's factor come from the term's data", () => {
    const { terms, equations } = stand({ beta: 1.02 }, { flow: 1.35 });
    expect(terms[1]).toBe("outflow at “test jet”, on the body −βṁV × 1.35");
    expect(equations.momentum[0]).toMatchObject({ label: "momentum out at “test jet” (β = 1.02) × 1.35", flow: "out", beta: 1.02, factor: 1.35 });
  });

  it("an inflow pushes the body on: +ṁV", () => {
    expect(asTheBodyFeelsIt({ id: "p1", flow: "in" })).toBe("inflow at p1, on the body +ṁV");
    expect(asTheBodyFeelsIt({ id: "p1", name: "“suction”", flow: "in", beta: 1.1, factor: 0.5 })).toBe("inflow at “suction”, on the body +βṁV × 0.5");
  });
});
