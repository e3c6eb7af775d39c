// The demo sketches' notes travel with their drawings from version to version: each later version
// states its own inputs, so a calc sheet printed from it never describes an earlier version's case.
// (Invented demo scenarios; the checks compare the notes with the inputs the version holds.)
import { describe, expect, it } from "vitest";
import { DEMO_SKETCHES, demoVersions } from "@/db/seed-sketches";
import { summarizeSolve } from "@/lib/sketch-document";
import { parseSketch, solve, solveCases } from "@/solver";
import { caseSketch } from "@/solver/cases";
import { sweepMarkers } from "@/lib/calcsheet/sweeps";

const notesOf = (id: string) => demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith(id))!).map((v) => String(v.doc.description ?? ""));

describe("the demo sketches' notes", () => {
  it("name what each later version changed", () => {
    const expected: Record<string, string[][]> = {
      a2: [["1250 gpm", "950 kg"], ["2000 gpm", "950 kg", "lifts off", "slides"], ["2000 gpm", "1250 kg", "bears again", "wheels still slip"]],
      a3: [["1.5 m"], ["0.6 m", "bears"], ["0.6 m", "3°"]],
      a4: [["10 bar"], ["15 bar", "5 kPa"]],
      a5: [["85 kg"], ["−50°", "85 kg", "tips back"], ["−50°", "145 kg", "bears again", "1.55"]],
      a6: [["30 m/s"], ["40 m/s", "lifts"], ["40 m/s", "1200 kg", "bears again"]],
      a7: [["30 m/s", "neoprene pads", "not yet bolted"], ["45 m/s", "tips", "not bolted"], ["45 m/s", "bolted", "slotted holes"]],
    };
    for (const [id, versions] of Object.entries(expected)) {
      const notes = notesOf(id);
      expect(notes, id).toHaveLength(versions.length);
      versions.forEach((words, i) => {
        for (const w of words) expect(notes[i], `${id} v${i + 1}`).toContain(w);
      });
    }
  });

  it("drop what an earlier version said that no longer holds", () => {
    const stale: Record<string, Array<[number, string]>> = {
      a2: [[3, "950 kg"], [3, "lifts off"], [2, "1250 gpm"], [2, "foot slips"], [3, "foot still slips"]],
      a3: [[2, "1.5 m pushes"], [3, "tips"]],
      a4: [[2, "10 bar"]],
      a5: [[3, "85 kg"], [2, "steeply down"]],
      a6: [[2, "30 m/s"], [3, "30 m/s"], [3, "1.39"]],
      a7: [[2, "30 m/s"], [3, "30 m/s"], [3, "neoprene"], [3, "tips"]],
    };
    for (const [id, words] of Object.entries(stale)) {
      const notes = notesOf(id);
      for (const [v, w] of words) expect(notes[v - 1], `${id} v${v}`).not.toContain(w);
    }
  });
});

describe("the demo sketches' stories agree with the solver", () => {
  // what each version's message and notes claim, solved: the status of the body as drawn, the
  // contacts that slip, and the factor of safety furthest below its required value (none: all met)
  const claims: Record<string, Array<{ status: string; slips: string[]; low: null | [string, number] }>> = {
    a2: [
      { status: "holds", slips: [], low: null },
      { status: "lifts", slips: ["axle"], low: ["sliding", 0.934] },
      { status: "holds", slips: ["axle"], low: ["sliding", 1.07] },
    ],
    a3: [
      { status: "tips", slips: [], low: ["overturning", 0.475] },
      { status: "holds", slips: [], low: ["overturning", 1.19] },
      { status: "holds", slips: [], low: ["overturning", 1.13] },
    ],
    a5: [
      { status: "holds", slips: [], low: ["overturning", 0.908] },
      { status: "tips", slips: [], low: ["overturning", 0.908] },
      { status: "holds", slips: [], low: null },
    ],
    a6: [
      // furthest below its required value: the 38 m/s storm's 0.867 of 1.5, not the uplift check's 0.835 of 1.0
      { status: "holds", slips: [], low: ["overturning", 0.867] },
      { status: "tips", slips: [], low: ["overturning", 0.469] },
      { status: "holds", slips: [], low: null },
    ],
    a7: [
      { status: "holds", slips: [], low: null },
      // furthest below its required value: the stopped fan's overturning, 0.900 of 1.5
      { status: "tips", slips: [], low: ["overturning", 0.9] },
      { status: "holds", slips: [], low: null },
    ],
  };
  it("the status, the slipping contacts and the lowest factor of every version", () => {
    for (const [id, versions] of Object.entries(claims)) {
      const got = demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith(id))!).map(({ doc }) => {
        const parsed = parseSketch(doc);
        if (!parsed.ok) throw new Error(`${id}: ${JSON.stringify(parsed.errors)}`);
        const summary = summarizeSolve(parsed);
        const result = solve(parsed.sketch);
        const slips = result.warnings.filter((w) => w.code === "SLIP" && w.ids.length === 1 && parsed.sketch.supports.some((s) => s.id === w.ids[0])).map((w) => w.ids[0]);
        return { status: summary.status, slips, low: summary.lowestFactor ? [summary.lowestFactor.check, Number(summary.lowestFactor.factor.toPrecision(3))] : null };
      });
      expect(got, id).toEqual(versions.map((v) => ({ ...v, low: v.low ? [v.low[0], Number(v.low[1].toPrecision(3))] : null })));
    }
  });
});

describe("the washing cart's cases say what they set", () => {
  // (Invented demo scenario.) A case's name is read as its definition on the calc sheet: the angle
  // and the pressure it names must be the ones it solves at, in every version, whatever the
  // drawing's own angle (v2 and v3 draw the lance at −50°). A case left to follow the drawing
  // would change under its name from version to version.
  const versions = demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith("a5"))!);
  const fileOf = (doc: unknown) => {
    const p = parseSketch(doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    return p.file;
  };
  const degrees = (text: string) => [...text.matchAll(/([−-]?\d+(?:\.\d+)?)°/g)].map((m) => Number(m[1].replace("−", "-")));

  it("the lance angle in each case's name is the angle the case solves at, and the named pressure is the pump's", () => {
    versions.forEach(({ doc }, v) => {
      const file = fileOf(doc);
      for (const c of file.cases ?? []) {
        const at = `v${v + 1} ${c.name}`;
        // never "as drawn": what the drawing holds changes between versions, the case does not
        expect(c.name, at).not.toMatch(/as drawn/i);
        const own = caseSketch(file, c);
        if (!own.ok) throw new Error(at);
        const lance = own.sketch.ports.find((p) => p.id === "lance")!;
        if (/lance/i.test(c.name)) expect(degrees(c.name), at).toEqual([Math.round(lance.angle)]);
        // the case sets the angle it names itself (not left to the drawing)
        if (/lance/i.test(c.name)) expect(c.parameters?.theta, at).toBe(`${Math.round(lance.angle)} deg`);
        const bar = /(\d+) bar/.exec(c.name);
        if (bar) expect(c.parameters?.p_pump, at).toBe(`${bar[1]} bar`);
      }
    });
  });

  it("the notes' figures are the solver's: the caster lifts at about −59° at 85 kg, 1.31 aimed down, 1.55 with 145 kg and 1.39 with 130 kg", () => {
    // overturning about the rear wheels (common practice): restoring W·(0.28 − 0.06) m over the
    // jet's turning moment; the solver's factor as drawn, to the figures the notes give
    const factorAsDrawn = (doc: unknown) => {
      const run = solveCases({ ...fileOf(doc), cases: undefined }).runs[0];
      const ot = run.ok ? run.stability.cart.overturning : null;
      if (!ot || "notApplicable" in ot) throw new Error("the cart has an overturning check");
      return ot.factor;
    };
    const [v1, , v3] = versions.map((v) => v.doc);
    expect(String(v1.description)).toContain("only 1.31");
    expect(factorAsDrawn(v1).toFixed(2)).toBe("1.31");
    expect(String(v3.description)).toContain("factor of 1.55");
    expect(factorAsDrawn(v3).toFixed(2)).toBe("1.55");
    expect(String(v3.description)).toContain("45 kg gave only 1.39");
    expect(factorAsDrawn({ ...v3, bodies: [{ ...v3.bodies[0], mass: "130 kg" }] }).toFixed(2)).toBe("1.39");
    // the front caster's margin reaches zero as the lance is raised: the sweep's crossing
    expect(String(v1.description)).toContain("the caster lifts at about −59°");
    const file = fileOf(v1);
    const [marker] = sweepMarkers({ ...file, cases: undefined }, file.sweeps![0], [{ support: "front", component: "margin" }]);
    expect(Math.round(marker.x)).toBe(-59);
  });
});
