// `npm run solve -- FILE`: the contract's JSON on stdout, nothing else; invalid input exits 1.
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { solveCli, written } from "./cli-support";
import { solveFile } from "@/solver";
import { FIXTURES, loadFixture } from "./helpers";

describe("npm run solve", () => {
  it("prints the result of a fixture as JSON, equal to solveFile", () => {
    const r = solveCli(join(FIXTURES, "thrust-stand-tips.json"));
    expect(r.status).toBe(0);
    // as typed, without -s: npm's "> counterpoise@… solve" banner stays off stdout (the .npmrc)
    expect(r.stdout.startsWith("{")).toBe(true);
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

  it("a number too large to solve exits 1 naming the field, not a result with nulls in it", () => {
    const doc = loadFixture("pump-skid-discharge.json");
    (doc.bodies![0] as Record<string, unknown>).mass = 1e308;
    const r = solveCli(written(doc));
    expect(r.status).toBe(1);
    expect(JSON.parse(r.stdout).errors.map((e: { path: string }) => e.path)).toEqual(["bodies[0].mass"]);
  }, 30000);

  it("a missing file is an error on stdout too", () => {
    const r = solveCli("/nonexistent/sketch.json");
    expect(r.status).toBe(1);
    expect(JSON.parse(r.stdout).errors[0].message).toBe("cannot read /nonexistent/sketch.json: no such file");
  }, 30000);

  it("--help prints the usage as the same JSON error shape", () => {
    const r = solveCli("--help");
    expect(r.status).toBe(1);
    expect(JSON.parse(r.stdout).errors[0].message).toMatch(/^usage: npm run solve -- FILE/);
  }, 30000);
});

describe("npm run solve -- --cases and --limit", () => {
  // the thrust stand: the rear pad lifts at T = W·d/h = 200·g0·0.8/1.5 N (common practice; the
  // same check as tests/unit/solver/sweep-limit.test.ts)
  const liftAt = (200 * 9.80665 * 0.8) / 1.5;

  it("--limit prints where the quantity reaches the target, in the parameter's unit", () => {
    const r = solveCli("--limit", "T=0..3", "--quantity", "rear.margin", join(FIXTURES, "thrust-stand-tips.json"));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toMatchObject({ ok: true, parameter: "T", from: 0, to: 3, quantity: { support: "rear", component: "margin" }, target: 0, result: { found: true, unit: "kN" } });
    expect(Math.abs(out.result.value * 1000 - liftAt) / liftAt).toBeLessThan(1e-8);
  }, 30000);

  it("--every-case searches each case and combination and names the first; --cases prints the study", () => {
    const doc = loadFixture("thrust-stand-tips.json");
    doc.cases = [
      { id: "full", name: "Full" },
      { id: "half", name: "Half weight", factors: { dead: 0.5 } },
    ];
    const file = written(doc);
    const r = solveCli("--limit", "T=0..3", "--quantity", "rear.margin", "--every-case", file);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.runs.map((x: { id: string; result: { value: number } }) => [x.id, Math.round(x.result.value * 1e6) / 1e3])).toEqual([
      ["full", Math.round(liftAt * 1e3) / 1e3],
      ["half", Math.round((liftAt / 2) * 1e3) / 1e3],
    ]);
    expect(out.first).toBe("half");
    const cases = solveCli("--cases", file);
    expect(cases.status).toBe(0);
    const study = JSON.parse(cases.stdout);
    expect(study.ok).toBe(true);
    expect(study.runs.map((x: { id: string }) => x.id)).toEqual(["full", "half"]);
    // as drawn (T = 2.2 kN, past both lift-offs) the stand tips in both: out of the envelope, and said so
    expect(study.excluded).toEqual([
      { case: "full", body: "stand", status: "tips" },
      { case: "half", body: "stand", status: "tips" },
    ]);
  }, 60000);

  // each run of the command line starts tsx (several seconds on a busy two-core machine): a few runs a test
  it("a target with a unit", () => {
    const fixture = join(FIXTURES, "thrust-stand-tips.json");
    const withUnit = JSON.parse(solveCli("--limit", "T=0..3", "--quantity", "rear.margin", "--target", "44.96178 lbf", fixture).stdout);
    const inNewtons = JSON.parse(solveCli("--limit", "T=0..3", "--quantity", "rear.margin", "--target", "200", fixture).stdout);
    // 44.96178 lbf = 200.000 N (1 lbf = 4.4482216152605 N, NIST SP 811)
    expect(Math.abs(withUnit.target - 200)).toBeLessThan(0.001);
    expect(inNewtons.result.found).toBe(true);
    expect(Math.abs(withUnit.result.value - inNewtons.result.value)).toBeLessThan(1e-4);
  }, 120000);

  it("mistakes named by their option", () => {
    const fixture = join(FIXTURES, "thrust-stand-tips.json");
    const bad = (...args: string[]) => JSON.parse(solveCli(...args, fixture).stdout).errors[0];
    expect(bad("--limit", "T=3..3", "--quantity", "rear.margin")).toEqual({ path: "--limit", message: "3..3 is not a range of two different numbers" });
    expect(bad("--limit", "T=0..3", "--quantity", "back.margin")).toEqual({ path: "--quantity", message: 'the sketch has no support "back"' });
    expect(bad("--limit", "T=0..3", "--quantity", "rear.margin", "--target", "3 kg")).toMatchObject({ path: "--target" });
    expect(bad("--limit", "T=0..3", "--quantity", "rear.margin", "--combination", "none")).toEqual({ path: "", message: 'combination: there is no combination "none"' });
    expect(bad("--frobnicate").message).toMatch(/^unknown option --frobnicate; usage:/);
  }, 180000);

  it("a parameter no case has, with --every-case, exits 1", () => {
    const fixture = join(FIXTURES, "thrust-stand-tips.json");
    // a parameter no case has is an error in every case at once, not a success with nothing found
    const every = solveCli("--limit", "Q=0..3", "--quantity", "rear.margin", "--every-case", fixture);
    expect(every.status).toBe(1);
    expect(JSON.parse(every.stdout).errors[0].message).toMatch(/^the sketch has no parameter "Q"/);
  }, 60000);
});
