// A sweep or limit search on a case (or a combination of cases) whose own changes do not read: the
// failure carries the field errors, as a sketch that does not parse does, so the Sweep tab says them
// in the form's words ("Case … — change of v: has no unit; …"), not as "cases[storm].parameters.v: …".
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { limitEverywhere, SketchInputError, sweeperOn } from "@/solver/studySweep";
import { SketchInputError as RunSketchInputError } from "@/canvas/studies/run";
import { parseSketch } from "@/solver";
import type { SketchFile } from "@/solver/schema";
import { runErrorWords, studyErrorWords } from "@/components/studies/studyError";

/** The exhaust stack (demo data) with its storm case's wind speed typed bare: 38, not 38 m/s. */
function bareStorm(): SketchFile {
  const file = JSON.parse(readFileSync("canvas/examples/exhaust-stack.json", "utf8")) as SketchFile;
  const storm = file.cases!.find((c) => c.id === "storm")!;
  storm.parameters = { ...storm.parameters, v: "38" };
  // the wind-only load case of the uplift combination too
  const wind = file.cases!.find((c) => c.id === "wind-30")!;
  wind.parameters = { v: "30" };
  // as the studies run it: parsed (the sketch as drawn reads), its defaults filled in
  const p = parseSketch(file);
  if (!p.ok) throw new Error("the sketch as drawn reads");
  return p.file;
}

const STORM = "Case Engine stopped, 38 m/s storm — change of v: has no unit; the sketch gives v in m/s: write 38 m/s";

describe("a sweep on a case that does not read", () => {
  it("throws the field errors, the change without its unit first", () => {
    const file = bareStorm();
    let thrown: unknown;
    try {
      sweeperOn(file, { case: "storm" }, "ballast");
    } catch (err) {
      thrown = err;
    }
    expect(thrown).toBeInstanceOf(SketchInputError);
    // one class: the studies' worker and client pass it on with its fields
    expect(thrown).toBeInstanceOf(RunSketchInputError);
    const e = thrown as SketchInputError;
    expect(e.fields[0]).toEqual({ path: "cases[storm].parameters.v", message: "has no unit; the sketch gives v in m/s: write 38 m/s" });
    expect(e.on).toBe("case Engine stopped, 38 m/s storm");
    // the message (the CLI's) keeps the file's paths
    expect(e.message).toMatch(/^cases\[storm\]\.parameters\.v: has no unit/);
    // the Sweep tab's words: the case and the change named as the form names them
    const words = studyErrorWords(file, e);
    expect(words).toMatch(new RegExp(`^The sketch has \\d+ input errors, the first: ${STORM.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}\\.$`));
    expect(words).not.toMatch(/cases\[|parameters\./);
  });

  it("a combination whose case does not read says it too", () => {
    const file = bareStorm();
    expect(() => sweeperOn(file, { combination: "uplift" }, "ballast")).toThrow(SketchInputError);
    try {
      sweeperOn(file, { combination: "uplift" }, "ballast");
    } catch (err) {
      expect(studyErrorWords(file, err)).toMatch(/the first: Case Wind only, 30 m\/s — change of v: has no unit; the sketch gives v in m\/s: write 30 m\/s\.$/);
    }
  });

  it("a sweep of the parameter the case writes without its unit runs: each point sets it, the case's value stands for nothing", () => {
    const file = bareStorm();
    const sweeper = sweeperOn(file, { case: "storm" }, "v");
    expect(sweeper.unit).toBe("m / s");
    const point = sweeper.at(38);
    expect(point.ok).toBe(true);
    // the same point as the storm case written with its unit
    const asSaved = parseSketch(JSON.parse(readFileSync("canvas/examples/exhaust-stack.json", "utf8")));
    if (!asSaved.ok) throw new Error("the example reads");
    const written = sweeperOn(asSaved.file, { case: "storm" }, "v").at(38);
    if (!point.ok || !written.ok) throw new Error("both points solve");
    expect(point.result.reactions.upwind.fy).toBe(written.result.reactions.upwind.fy);
    // and on the combination whose wind case writes v bare
    expect(sweeperOn(file, { combination: "uplift" }, "v").at(30).ok).toBe(true);
  });

  it("\"in every case\": the row of a case that does not read keeps its field errors, said in the form's words", () => {
    const file = bareStorm();
    const rows = limitEverywhere(file, "ballast", [0, 2000], { support: "upwind", component: "margin" }, 0);
    const storm = rows.find((r) => r.id === "storm")!;
    if (!("error" in storm.result)) throw new Error("the storm case should not read");
    expect(storm.result.fields?.[0].path).toBe("cases[storm].parameters.v");
    expect(runErrorWords(file, storm.result)).toMatch(new RegExp(`^\\d+ input errors, the first: ${STORM.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}$`));
    // a run that reads is searched as before
    expect("found" in rows.find((r) => r.id === "running")!.result).toBe(true);
  });

  it("a failure that is not an input error is said as it is", () => {
    expect(runErrorWords(null, { error: "the quantity is not plotted" })).toBe("the quantity is not plotted");
    expect(studyErrorWords(null, new Error("case: there is no case \"x\""))).toBe("case: there is no case \"x\"");
  });
});
