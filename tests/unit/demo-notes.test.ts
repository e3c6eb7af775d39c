// The demo sketches' notes travel with their drawings from version to version: each later version
// states its own inputs, so a calc sheet printed from it never describes an earlier version's case.
// (Invented demo scenarios; the checks compare the notes with the inputs the version holds.)
import { describe, expect, it } from "vitest";
import { DEMO_SKETCHES, demoVersions } from "@/db/seed-sketches";
import { summarizeSolve } from "@/lib/sketch-document";
import { parseSketch, solve } from "@/solver";

const notesOf = (id: string) => demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith(id))!).map((v) => String(v.doc.description ?? ""));

describe("the demo sketches' notes", () => {
  it("name what each later version changed", () => {
    const expected: Record<string, string[][]> = {
      a2: [["1250 gpm", "950 kg"], ["2000 gpm", "950 kg", "lifts off", "slides"], ["2000 gpm", "1250 kg", "bears again", "wheels still slip"]],
      a3: [["1.5 m"], ["0.6 m", "bears"], ["0.6 m", "3°"]],
      a4: [["10 bar"], ["15 bar", "5 kPa"]],
      a5: [["85 kg"], ["−50°", "85 kg", "tips back"], ["−50°", "145 kg", "bears again", "1.55"]],
      a6: [["30 m/s"], ["40 m/s", "lifts"], ["40 m/s", "1200 kg", "bears again"]],
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
