// Every message of the solver's checks, as the editor shows it (banner, Cases tab, a run that could
// not be solved): in the properties form's words, not the file's field names, and units as
// engineers write them. The solver's own messages (the CLI's, the REST API's) keep the file's
// names: they are the contract of the sketch file.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { errorInWords, errorPlace, fieldKindAt, messageInWords, unitAsWritten, warningInWords } from "@/components/results/errorPlace";
import { parseSketch, solveFile } from "@/solver";
import type { SketchFile } from "@/solver/schema";

const pumpSkid = (): SketchFile => JSON.parse(readFileSync("canvas/examples/pump-skid.json", "utf8"));

/** The editor's words for every error of a sketch that does not parse. */
function shown(file: unknown): string[] {
  const r = parseSketch(file);
  expect(r.ok).toBe(false);
  return r.ok ? [] : r.errors.map((e) => errorInWords(file as SketchFile, e));
}

/** A file's own field names (or a path) a person reading the editor should not meet. */
const FILE_WORDS = /massFlow|volumeFlow|gravityAngle|freeX|\bfx\b|\bfy\b|`from`|\b(?:bodies|supports|loads|ports|massSources)\[\d|port "|\^\d| \/ /;

describe("a port that lacks a way to its flow, in the form's words", () => {
  it("names the form's fields (mass flow ṁ, density ρ, volume flow, velocity V), and the port once", () => {
    const s = pumpSkid();
    for (const k of ["density", "volumeFlow"] as const) delete (s.ports[0] as Record<string, unknown>)[k];
    // the file's words stay in the solver's message (the contract)
    const r = parseSketch(s);
    expect(!r.ok && r.errors[0].message).toBe('port "suction" needs a mass flow: give massFlow, or density and volumeFlow, or density, area and velocity');
    expect(shown(s)).toEqual(["Inlet suction: needs a mass flow: give mass flow ṁ, or density ρ and volume flow, or density ρ, area and velocity V"]);
  });

  it("a velocity it cannot find, and a pressure with no area", () => {
    const s = pumpSkid();
    s.ports[0] = { ...s.ports[0], massFlow: 30 } as SketchFile["ports"][number];
    for (const k of ["density", "volumeFlow", "area"] as const) delete (s.ports[0] as Record<string, unknown>)[k];
    expect(shown(s)).toEqual([
      "Inlet suction: needs a velocity: give velocity V, or density ρ and area, or volume flow and area",
      "Inlet suction — area: is required: the port has a gauge pressure, and its force is gauge pressure × area",
    ]);
  });

  it("a speed found by dividing by a tiny area, and a negative volume flow", () => {
    const s = pumpSkid();
    s.ports[0] = { ...s.ports[0], area: 1e-30, volumeFlow: "1e3 m^3/s" } as SketchFile["ports"][number];
    s.ports[1] = { ...s.ports[1], volumeFlow: -1 } as SketchFile["ports"][number];
    const words = shown(s);
    expect(words).toContain("Inlet suction — area: is too small for the flow through it: the speed it gives, ṁ / (ρ × area), is beyond 1e18 m/s");
    expect(words).toContain("Outlet discharge — volume flow: must be zero or more (the flow direction gives its direction)");
  });
});

describe("every check's message reads without the file's names", () => {
  it("forces given both ways or half given, a load line of no length, free x, gravity and a repeated id", () => {
    const s = pumpSkid();
    s.motion = { freeX: true };
    s.loads = [
      { id: "F1", body: "skid", kind: "force", at: [1, 1], magnitude: 10, angle: 0, fx: 1 },
      { id: "F2", body: "skid", kind: "force", at: [1, 1], magnitude: 10 },
      { id: "F3", body: "skid", kind: "force", at: [1, 1] },
      { id: "w", body: "skid", kind: "distributed", from: [0, 1], to: [0, 1], w1: 1, w2: 1 },
      { id: "skid", body: "skid", kind: "couple", value: 1 },
    ] as SketchFile["loads"];
    const words = shown(s);
    expect(words).toEqual(
      expect.arrayContaining([
        "Point force F1: give either a magnitude and a direction, or Fx and Fy, not both",
        "Point force F2 — direction: is required with the magnitude",
        "Point force F3: needs a magnitude and a direction, or Fx and Fy",
        "Distributed load w — to: must differ from the From point: the load line has no length",
        "Couple skid — id: id \"skid\" is already used by Body Pump skid",
        "Contact rear bearer: restrains x, but the body is set free to move in x (“Free to move in x”): untick that, remove the support, or turn it to act along y only",
      ]),
    );
    const gravity = parseSketch({ ...pumpSkid(), gravity: -1 });
    expect(!gravity.ok && errorInWords(null, gravity.errors[0])).toBe(
      "Gravity: must not be negative: to have gravity act another way, give its direction (Gravity direction, −90° by default); 0 turns weights off",
    );
    for (const w of words) expect(w).not.toMatch(FILE_WORDS);
  });

  it("a body named by an element that does not exist: the field is 'belongs to'", () => {
    const s = pumpSkid();
    s.supports[0] = { ...s.supports[0], body: "nope" };
    expect(shown(s)).toEqual(['Contact rear bearer — belongs to: names body "nope", which does not exist (bodies: skid)']);
  });

  it("a case's, a combination's and a sweep's errors name them, not their paths", () => {
    const s = { ...pumpSkid(), version: 2, cases: [{ id: "full", name: "Full flow", parameters: { q: "1 lpm" } }], combinations: [{ id: "k", name: "Factored", terms: [{ case: "nope", factor: 1 }] }] } as unknown as SketchFile;
    expect(shown(s)).toEqual(['Case Full flow — change of q: the sketch has no parameter "q" to override', 'Combination Factored — term 1: names case "nope", which does not exist']);
    expect(errorPlace(s, "cases[full].parameters.Q")).toBe("Case Full flow — change of Q");
  });
});

describe("a field whose key holds a digit", () => {
  it("a distributed load's w1 is its field \"w₁ at from\", a load per length", () => {
    const stack = JSON.parse(readFileSync("canvas/examples/exhaust-stack.json", "utf8")) as SketchFile;
    expect(errorPlace(stack, "loads[0].w1")).toBe("Distributed load wind on the stack — w₁ at from");
    expect(fieldKindAt("loads[0].w2")).toBe("lineLoad");
  });
});

describe("units as engineers write them", () => {
  it("a value in other units than the field's", () => {
    // what a unitless wind speed makes of q = ½ρv² × width (kg/m³ × 1 × m)
    expect(messageInWords(null, "loads[0].w1", "236.25 kg / m^2 is in other units, but this field needs a load per length (N/m)")).toBe(
      "236.25 kg/m² is in other units, but this field needs a load per length (N/m)",
    );
    expect(messageInWords(null, "loads[0].w1", "1.12308e+10 kg^3 / (m^4 s^4) is in other units, but this field needs a load per length (N/m)")).toBe(
      "1.12308 × 10¹⁰ kg³/(m⁴·s⁴) is in other units, but this field needs a load per length (N/m)",
    );
    expect(unitAsWritten("N m")).toBe("N·m");
    expect(unitAsWritten("m / s^(-2)")).toBe("m/s⁻²");
    expect(messageInWords(null, "bodies[0].mass", '"2 kg + 3 m": kg and m / s cannot be added: units do not match')).toBe('"2 kg + 3 m": kg and m/s cannot be added: units do not match');
  });
});

describe("a warning about a field, at its place", () => {
  it("unitless trigonometry in a force's Fy names the force and the field, not loads[0].fy", () => {
    const file = JSON.parse(readFileSync("tests/fixtures/sketches/trig-unitless.json", "utf8")) as SketchFile;
    const r = solveFile(file);
    if (!("warnings" in r)) throw new Error("the fixture does not solve");
    const trig = r.warnings.find((w) => w.code === "TRIG_UNITLESS")!;
    expect(trig.message).toBe("loads[0].fy: sin(30) reads 30 as radians: did you mean 30 deg?");
    expect(warningInWords(file, trig.message)).toBe(`${errorPlace(file, "loads[0].fy")}: sin(30) reads 30 as radians: did you mean 30 deg?`);
    expect(errorPlace(file, "loads[0].fy")).toMatch(/ — Fy$/);
    expect(warningInWords(file, "Mass flow in 3 kg/s, out 2 kg/s")).toBe("Mass flow in 3 kg/s, out 2 kg/s");
  });
});
