// Unitless trigonometry (TRIG_UNITLESS) said in the results panel in the properties form's words:
// the force and its field ("Point force F — Fy"), not the file's path ("loads[0].fy").
import { readFileSync } from "node:fs";
import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { parseSketch, solve } from "@/solver/index";
import type { SketchFile } from "@/solver/schema";
import { statusSentences } from "@/components/results/statusSentence";
import { mountResultsDock } from "./editor-helpers";

const trigFile = (): SketchFile => JSON.parse(readFileSync("tests/fixtures/sketches/trig-unitless.json", "utf8"));

function solvedFile(file: SketchFile) {
  const p = parseSketch(file);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const result = solve(p.sketch);
  result.warnings.unshift(...p.warnings);
  return { sketch: p.sketch, result, file: p.file };
}

const RADIANS = "sin(30) reads 30 as radians: did you mean 30 deg?";

describe("unitless trigonometry in the status sentence", () => {
  it("with the sketch file, names the force and the field as the form does", () => {
    const { sketch, result, file } = solvedFile(trigFile());
    const details = statusSentences(sketch, result, "SI", undefined, undefined, file)[0].details;
    expect(details).toContain(`Point force F — Fy: ${RADIANS}`);
    expect(details.join(" ")).not.toMatch(/loads\[0\]/);
  });

  it("without a file (a caller that has none) keeps the file's path", () => {
    const { sketch, result } = solvedFile(trigFile());
    expect(statusSentences(sketch, result)[0].details).toContain(`loads[0].fy: ${RADIANS}`);
  });

  it("a parameter's warning names the parameter", () => {
    const file = trigFile();
    file.parameters = { fy: "-5 kN * sin(30)" };
    file.loads[0] = { ...file.loads[0], fy: "fy" } as SketchFile["loads"][number];
    const { sketch, result } = solvedFile(file);
    expect(statusSentences(sketch, result, "SI", undefined, undefined, file)[0].details).toContain(`Parameter fy: ${RADIANS}`);
  });

  it("a file whose element at the path is another one (a result kept from before an edit) keeps the path rather than name the wrong element", () => {
    const { sketch, result } = solvedFile(trigFile());
    const moved = trigFile();
    moved.loads = [{ id: "G", body: "bracket", kind: "force", at: [0.2, 0.5], fx: 1, fy: 0 }, ...moved.loads] as SketchFile["loads"];
    expect(statusSentences(sketch, result, "SI", undefined, undefined, moved)[0].details).toContain(`loads[0].fy: ${RADIANS}`);
  });

  it("the results panel says it in the form's words", () => {
    mountResultsDock(trigFile());
    const status = screen.getByTestId("status");
    expect(status).toHaveTextContent(`Point force F — Fy: ${RADIANS}`);
    expect(status.textContent).not.toMatch(/loads\[0\]/);
  });
});
