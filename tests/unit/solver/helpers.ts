import { readFileSync } from "node:fs";
import { join } from "node:path";
import { expect } from "vitest";
import { parseSketch, solve, type SketchFileInput, type SolveResult, type Sketch } from "@/solver";

export const FIXTURES = join(process.cwd(), "tests/fixtures/sketches");

export function loadFixture(name: string): SketchFileInput {
  return JSON.parse(readFileSync(join(FIXTURES, name), "utf8"));
}

/** Parse (failing the test with the errors if invalid) and return the numeric sketch. */
export function parsed(doc: unknown): Sketch {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error("sketch did not parse: " + JSON.stringify(p.errors));
  return p.sketch;
}

/** The errors of a sketch that must not parse (failing the test if it does). */
export function errorsOf(doc: unknown) {
  const p = parseSketch(doc);
  if (p.ok) throw new Error("expected errors");
  return p.errors;
}

export function solved(doc: unknown): SolveResult {
  return solve(parsed(doc));
}

/** |actual − expected| ≤ rel·|expected| */
export function expectRel(actual: number, expected: number, rel: number) {
  const tol = rel * Math.abs(expected);
  expect(Math.abs(actual - expected), `${actual} vs ${expected} (±${rel * 100} %)`).toBeLessThanOrEqual(tol);
}

/** A sketch file written at format version 1 (the published contract) unless another is given: it is
 *  migrated on parsing, so every test built with it also checks that version-1 files keep working. */
export const sketch = (parts: Partial<SketchFileInput>, version = 1): SketchFileInput => ({
  format: "counterpoise.sketch",
  version: version as unknown as SketchFileInput["version"],
  bodies: [],
  supports: [],
  loads: [],
  ports: [],
  massSources: [],
  ...parts,
});

export const box = (w: number, h: number, x = 0, y = 0): [number, number][] => [
  [x, y],
  [x + w, y],
  [x + w, y + h],
  [x, y + h],
];
