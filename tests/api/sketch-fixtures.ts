// Sketch files for API tests, read from the committed fixtures.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { parseSketch } from "@/solver";
import type { SketchFileInput } from "@/solver/schema";

type ParsedSketch = Extract<ReturnType<typeof parseSketch>, { ok: true }>;

export function fixture(name: string): SketchFileInput & Record<string, unknown> {
  return JSON.parse(readFileSync(join(process.cwd(), "tests/fixtures/sketches", `${name}.json`), "utf8"));
}

/** A copy of a fixture with one change made by `edit`. */
export function edited(name: string, edit: (doc: Record<string, unknown> & { [k: string]: unknown }) => void) {
  const doc = fixture(name);
  edit(doc);
  return doc;
}

/** A fixture as the routes store it (`parseSketch`'s result): for `createSketch` and the solve. */
export function parsedFixture(name: string): ParsedSketch {
  const parsed = parseSketch(fixture(name));
  if (!parsed.ok) throw new Error(`fixture ${name} does not parse`);
  return parsed;
}
