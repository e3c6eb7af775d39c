// What the sign-off dialogs put before a checker or approver: the version's own findings, the
// same the calc sheet's first page says.
import { describe, expect, it } from "vitest";
import { versionConcerns, withOpenThreads } from "@/components/review/concerns";
import { studyOfDocument } from "@/lib/review/compare";
import type { SketchFile } from "@/solver/schema";
import { loadFixture } from "./solver/helpers";
import { pushedBlock } from "../support/pushed-block";

describe("a version's concerns for sign-off", () => {
  it("the trailer with a low throw case: the lift as drawn, and the overturning factor short of 1.5 (common practice, from memory)", () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
      { id: "high", name: "High throw at full flow", parameters: { theta: "60 deg" } },
    ];
    const concerns = versionConcerns(file);
    // as drawn the front jack lifts and overturning about the leg is 17.48/12.12 kN·m = 1.442 < 1.5:
    // the short factor leads, the lift-off follows in the same sentence
    expect(concerns[0]).toBe("As drawn: Short of the required factor of safety against overturning about the rear stabiliser leg: 1.44\u00a0<\u00a01.5; it lifts off at the front jack");
    expect(concerns).toContain("Low throw — factor of safety against overturning about rear stabiliser leg 1.442, below the required 1.5");
    expect(concerns.some((c) => c.startsWith("High throw"))).toBe(false);
    // the review page's case tables read the very study the findings came from: solved once
    const study = studyOfDocument(file as SketchFile);
    expect(study?.runs.map((r) => r.id)).toEqual(["low", "high"]);
    expect(studyOfDocument(file as SketchFile)).toBe(study);
  });

  it("a file that is not an object is said not to solve, not thrown on", () => {
    expect(versionConcerns("not a sketch")[0]).toMatch(/^The sketch does not solve: /);
  });

  it("a bend on its anchor that holds, with no cases: nothing to say", () => {
    expect(versionConcerns(loadFixture("pipe-bend-anchor.json"))).toEqual([]);
  });

  it("open comment threads on this version are named before a check or an approval", () => {
    expect(withOpenThreads(["As drawn: Lifts off at the front jack"], [{ number: 4, open: 2 }], 4)).toEqual([
      "As drawn: Lifts off at the front jack",
      "2 open comment threads on this version: answer or resolve them first, or say why not",
    ]);
    expect(withOpenThreads([], [{ number: 4, open: 1 }], 4)).toEqual(["1 open comment thread on this version: answer or resolve it first, or say why not"]);
    expect(withOpenThreads([], [], 4)).toEqual([]);
  });

  it("threads still open on earlier and later versions are named too, with the versions", () => {
    expect(withOpenThreads([], [{ number: 1, open: 2 }, { number: 3, open: 1 }], 4)).toEqual([
      "3 comment threads still open on earlier versions (v1, v3): resolve them there if this version settles them, or say why not",
    ]);
    expect(withOpenThreads([], [{ number: 2, open: 1 }, { number: 4, open: 1 }, { number: 5, open: 3 }], 4)).toEqual([
      "1 open comment thread on this version: answer or resolve it first, or say why not",
      "1 comment thread still open on an earlier version (v2): resolve it there if this version settles it, or say why not",
      "3 comment threads still open on a later version (v5): asked of the drawing as it went on; if they apply to this version too, resolve them or say why not",
    ]);
    expect(withOpenThreads(["x"], [], 2)).toEqual(["x"]);
  });
});

describe("the sketch as drawn, beside its cases", () => {
  // the pushed block (tests/support/pushed-block.ts): 1.226 against overturning as drawn (P = 4 kN),
  // 2.452 in its one case (P = 2 kN)
  const block = pushedBlock("4 kN", { cases: [{ id: "light", name: "Light push", parameters: { P: "2 kN" } }] });

  it("a factor of safety short as drawn is said even when every case passes", () => {
    const concerns = versionConcerns(block);
    expect(concerns).toEqual(["As drawn: factor of safety against overturning about far foot 1.226, below the required 1.5"]);
    // the values on the drawing are the only short one: the case itself passes (2.452)
    const study = studyOfDocument(block);
    const light = study!.runs[0];
    expect(light.ok && "factor" in light.stability.b.overturning && light.stability.b.overturning.factor).toBeCloseTo((1000 * 9.80665 * 0.5) / 2000, 6);
  });
});
