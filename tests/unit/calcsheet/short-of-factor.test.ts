// The calc sheet's result leads, as the results panel does, with the governing failing factor of
// safety of a body its supports hold: never "Holds" while a factor is short of the required one.
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { pushedBlock } from "../../support/pushed-block";
import { threeFootBlock } from "../../support/three-foot-block";
import { pdfText } from "../../support/pdf-text";

const sheet = async (P: string, block = pushedBlock) => {
  const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Pushed block", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file: block(P), units: "SI" });
  return (await pdfText(buf)).text.replace(/\s+/g, " ");
};

describe("the calc sheet's result of a held body", () => {
  it("P = 4 kN: overturning W·b/2 / (P·h) = 4903.3/4000 = 1.226 < 1.5 leads; that it holds follows", async () => {
    const text = await sheet("4 kN");
    const lead = text.indexOf("Short of the required factor of safety against overturning about the far foot: 1.23 < 1.5.");
    expect(lead).toBeGreaterThan(-1);
    const holds = text.indexOf("It holds — all supports within their limits; the largest reaction is 9.761 kN at the far foot.");
    expect(holds).toBeGreaterThan(lead);
    expect(text).not.toMatch(/ Holds — all supports/);
    // two feet, the far one with friction: three reactions, three equations; said after what the
    // supports do, not between the failing check and it
    expect(text).toContain("1.5. It holds — all supports within their limits; the largest reaction is 9.761 kN at the far foot. Statically determinate.");
    expect(text).not.toContain("1.5. Statically determinate.");
  }, 60000);

  it("a contact lifted off (three feet, P = 4 kN): the failing check leads, the lift-off in the same sentence, what holds it after", async () => {
    const text = await sheet("4 kN", threeFootBlock);
    // W·0.5/(P·1) = 1.226; the near foot lifts once P·h > W/3 (tests/support/three-foot-block.ts)
    expect(text).toContain("Short of the required factor of safety against overturning about the far foot: 1.23 < 1.5; it lifts off at the near foot. The far foot and the middle foot still hold the body.");
    expect(text).not.toMatch(/Lifts off at the near foot/);
  }, 60000);

  it("P = 2 kN: both factors pass (2.45 and 3.11), the result says Holds", async () => {
    const text = await sheet("2 kN");
    expect(text).toMatch(/Holds — all supports within their limits; the largest reaction is [\d.]+ kN at the far foot/);
    expect(text).not.toMatch(/Short of the required factor/);
  }, 60000);

  it("the method says the flow factor leaves port gauge pressures as entered", async () => {
    const text = await sheet("4 kN");
    expect(text).toContain("Gauge pressure at a port pushes inward (p·A along the flow at an inlet, against it at an outlet). The flow factor scales mass flows (and velocities), not port gauge pressures: those are as entered; write them as expressions of a parameter if they change with flow.");
  }, 60000);
});
