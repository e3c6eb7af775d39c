// A case's typed values on the calc sheet and in a version comparison: a minus reads as the true
// minus (−75 deg) the tables, the plots and the Sweep tab write, never a hyphen; the case keeps
// the text as typed.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { compareSketches } from "@/lib/review/compare";
import { parseSketch } from "@/solver/index";
import type { SketchFile } from "@/solver/schema";
import { pdfText } from "../../support/pdf-text";

/** The washing-cart example with a hose pull (group "hose") and two cases on the lance angle,
 *  one of them with the pull reversed (factor −1), and a sweep of the angle on the first case. */
function cart(low: string): SketchFile {
  const d = JSON.parse(readFileSync("canvas/examples/washing-cart.json", "utf8"));
  d.version = 6;
  d.parameters.theta0 = "-60 deg";
  d.loads = [{ id: "pull", label: "hose pull", body: "cart", kind: "force", at: [0.3, 0.5], angle: 0, magnitude: "20 N", group: "hose" }];
  d.cases = [
    { id: "low", name: "Jet low", parameters: { theta: low } },
    { id: "back", name: "Jet back", parameters: { theta: "theta0 - 5 deg" }, factors: { hose: -1 } },
  ];
  d.sweeps = [{ id: "s1", parameter: "theta", from: -90, to: -30, points: 7, case: "low" }];
  const parsed = parseSketch(d);
  if (!parsed.ok) throw new Error(`fixture does not parse: ${JSON.stringify(parsed)}`);
  return parsed.file;
}

describe("a case's values with a minus", () => {
  it("reads with the true minus on the calc sheet: its list, its group factor and a sweep standing in for it", async () => {
    const file = cart("-75 deg");
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Cart", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file, units: "SI" });
    const text = (await pdfText(buf)).text.replace(/\s+/g, " ");
    // (the case is the sketch as drawn, so named so)
    expect(text).toContain("Jet low, as drawn: theta = −75 deg");
    expect(text).toContain("Jet back: theta = theta0 − 5 deg, loads of group “hose” × −1");
    expect(text).toContain("stand in for the case's own (theta = −75 deg)");
    expect(text).not.toMatch(/theta = -|× -1/);
    // the file keeps what was typed
    expect(file.cases![0].parameters!.theta).toBe("-75 deg");
  });

  it("reads with the true minus in a comparison of two versions", () => {
    const change = compareSketches(cart("-75 deg"), cart("-80 deg")).studies.find((s) => s.field === "case “Jet low”");
    expect(change).toEqual({ field: "case “Jet low”", before: "Jet low: theta = −75 deg", after: "Jet low: theta = −80 deg", change: "changed" });
  });
});
