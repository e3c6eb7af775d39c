// The calc sheet's result as drawn says which comes first when a body tips and slides, as the
// results panel does: the smaller factor of safety is reached first when the driving loads grow in
// proportion with the weight kept (rigid-block statics, common practice).
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { versionConcerns } from "@/components/review/concerns";
import { tallBlock } from "../../components/tall-block";
import { pdfText } from "../../support/pdf-text";

describe("a body that tips and slides, on the calc sheet and in the sign-off concerns", () => {
  it("μ = 0.2, P = 400 N on the 100 kg tall block: sliding 0.2·W/P = 0.49 < overturning (W·0.5)/(P·2) = 0.613", async () => {
    const file = tallBlock("400 N", 0.2);
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Tall block", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file, units: "SI" });
    const { text } = await pdfText(buf);
    expect(text.replace(/\s+/g, " ")).toMatch(/Slides before it tips about the right pad/);
    expect(versionConcerns(file)[0]).toMatch(/^As drawn: Slides before it tips about the right pad/);
  }, 60000);
});
