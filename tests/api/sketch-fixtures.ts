// Sketch files for API tests, read from the committed fixtures.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { SketchFileInput } from "@/solver/schema";

export function fixture(name: string): SketchFileInput & Record<string, unknown> {
  return JSON.parse(readFileSync(join(process.cwd(), "tests/fixtures/sketches", `${name}.json`), "utf8"));
}

/** A copy of a fixture with one change made by `edit`. */
export function edited(name: string, edit: (doc: Record<string, unknown> & { [k: string]: unknown }) => void) {
  const doc = fixture(name);
  edit(doc);
  return doc;
}
