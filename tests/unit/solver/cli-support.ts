// Running `npm run solve` from a test, on a sketch written to a file of its own.
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

export const solveCli = (...args: string[]) =>
  spawnSync("npm", ["run", "solve", "--", ...args], { encoding: "utf8", cwd: process.cwd(), env: { ...process.env, NODE_OPTIONS: "" } });

/** A sketch written to a file of its own, for the command line. */
export function written(doc: unknown): string {
  const file = join(mkdtempSync(join(tmpdir(), "cp-cli-")), "sketch.json");
  writeFileSync(file, JSON.stringify(doc));
  return file;
}
