// The calc sheet says a unitless trigonometric argument in the properties form's words, once: the
// force and its field ("Point force F — Fy"), not the file's path ("loads[0].fy").
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { pdfText } from "../../support/pdf-text";

describe("the calc sheet's warning of sin(30) read as radians", () => {
  it("names the force and the field, once, and never the file's path", async () => {
    const file = JSON.parse(readFileSync("tests/fixtures/sketches/trig-unitless.json", "utf8"));
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Trig", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file, units: "SI" });
    const text = (await pdfText(buf)).text.replace(/\s+/g, " ");
    expect(text).toContain("Point force F — Fy: sin(30) reads 30 as radians: did you mean 30 deg?");
    expect(text).not.toContain("loads[0].fy");
    // said once (the sketch's own notes, which tell the story, aside)
    expect(text.split("reads 30 as radians: did you mean").length - 1).toBe(1);
  }, 60000);
});
