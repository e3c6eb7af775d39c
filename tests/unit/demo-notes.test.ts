// The demo sketches' notes travel with their drawings from version to version: each later version
// states its own inputs, so a calc sheet printed from it never describes an earlier version's case.
// (Invented demo scenarios; the checks compare the notes with the inputs the version holds.)
import { describe, expect, it } from "vitest";
import { DEMO_SKETCHES, demoVersions } from "@/db/seed-sketches";

const notesOf = (id: string) => demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith(id))!).map((v) => String(v.doc.description ?? ""));

describe("the demo sketches' notes", () => {
  it("name what each later version changed", () => {
    const expected: Record<string, string[][]> = {
      a2: [["1250 gpm", "950 kg"], ["2000 gpm", "950 kg", "lifts off"], ["2000 gpm", "1250 kg", "bears again"]],
      a3: [["1.5 m"], ["0.6 m", "bears"], ["0.6 m", "3°"]],
      a4: [["10 bar"], ["15 bar", "14.6 bar"]],
      a5: [["85 kg"], ["−50°", "85 kg", "tips back"], ["−50°", "130 kg", "bears again"]],
      a6: [["30 m/s"], ["40 m/s", "lifts"], ["40 m/s", "900 kg", "bears again"]],
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
      a2: [[3, "950 kg"], [3, "lifts off"], [2, "1250 gpm"]],
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
