// `npm run solve -- FILE`: the contract's JSON on stdout, nothing else; invalid input exits 1.
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { solveFile } from "@/solver";
import { FIXTURES, loadFixture } from "./helpers";

const solveCli = (file: string) =>
  spawnSync("npm", ["run", "-s", "solve", "--", file], { encoding: "utf8", cwd: process.cwd(), env: { ...process.env, NODE_OPTIONS: "" } });

describe("npm run solve", () => {
  it("prints the result of a fixture as JSON, equal to solveFile", () => {
    const r = solveCli(join(FIXTURES, "thrust-stand-tips.json"));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toEqual(JSON.parse(JSON.stringify(solveFile(loadFixture("thrust-stand-tips.json")))));
    expect(out.bodies.stand.status).toBe("tips");
  }, 30000);

  it("invalid input exits 1 with { ok: false, errors } and nothing else on stdout", () => {
    const dir = mkdtempSync(join(tmpdir(), "cp-cli-"));
    const file = join(dir, "bad.json");
    const doc = loadFixture("pump-skid-discharge.json");
    (doc.ports![1] as Record<string, unknown>).area = "-1 m^2";
    writeFileSync(file, JSON.stringify(doc));
    const r = solveCli(file);
    expect(r.status).toBe(1);
    expect(JSON.parse(r.stdout)).toEqual({ ok: false, errors: [{ path: "ports[1].area", message: "must be more than zero" }] });
  }, 30000);

  it("a missing file is an error on stdout too", () => {
    const r = solveCli("/nonexistent/sketch.json");
    expect(r.status).toBe(1);
    expect(JSON.parse(r.stdout).errors[0].message).toBe("cannot read /nonexistent/sketch.json: no such file");
  }, 30000);

  it("--help prints the usage as the same JSON error shape", () => {
    const r = solveCli("--help");
    expect(r.status).toBe(1);
    expect(JSON.parse(r.stdout).errors[0].message).toMatch(/^usage: npm run -s solve -- FILE/);
  }, 30000);
});
