// The live canvas (react-konva under vitest-canvas-mock) writes each support's state in words
// beside its symbol, as the exported drawing does: never colour alone. A tipping body's support
// that would have to pull says so with the force, a slack tie says "slack", a lifted contact
// "lifts", a slipping contact "slips", and an unrestrained body the direction nothing resists.
import { readFileSync } from "node:fs";
import { waitFor } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { importSketchText } from "@/canvas/files";
import { solveFile, type SolveResult } from "@/solver/index";
import { drawnTexts, onCanvas } from "./canvas-support";

/** A solver fixture, brought up to the current format as the editor's import does, and its result. */
function fixture(name: string) {
  const text = readFileSync(`tests/fixtures/sketches/${name}.json`, "utf8");
  const out = importSketchText(text);
  if (!out.ok) throw new Error(`${name}: ${JSON.stringify(out.errors)}`);
  return { sketch: out.sketch, result: solveFile(JSON.parse(text)) as SolveResult };
}

describe("support states on the live canvas, in words", () => {
  it("tips: the support that would have to pull, with the force it would need", async () => {
    const { sketch, result } = fixture("thrust-stand-tips");
    expect(Object.values(result.bodies).map((b) => b.status)).toContain("tips");
    await onCanvas(sketch);
    await waitFor(() => expect(drawnTexts().some((t) => /^would have to pull [\d.,]+ k?N$/.test(t))).toBe(true));
  });

  it("a slack tie says slack; a lifted contact says lifts", async () => {
    await onCanvas(fixture("exhaust-stack-guyed").sketch);
    await waitFor(() => expect(drawnTexts()).toContain("slack"));
    await onCanvas(fixture("pump-set-hold-down").sketch);
    await waitFor(() => expect(drawnTexts()).toContain("lifts"));
  });

  it("a slipping contact says slips", async () => {
    const { sketch, result } = fixture("pump-skid-slip");
    expect(result.warnings.some((w) => w.code === "SLIP")).toBe(true);
    await onCanvas(sketch);
    await waitFor(() => expect(drawnTexts()).toContain("slips"));
  });

  it("an unrestrained body: the direction nothing resists", async () => {
    await onCanvas(fixture("skid-on-rollers-unrestrained").sketch);
    await waitFor(() => expect(drawnTexts()).toContain("free to move: nothing resists"));
  });
});
