// Bad input: every error names the field and says what is wrong; nothing is solved.
import { describe, expect, it } from "vitest";
import { parseSketch, solveFile, solveSweep, type SketchFileInput } from "@/solver";
import { box, expectRel, loadFixture, parsed, sketch } from "./helpers";

/** A unit square of 1 kg on a pin at (0, 0) and a vertical roller at (1, 0) (g = 9.81 unless `parts` say), each spring of `stiffness` when given. */
const onPinAndRoller = (parts: Partial<SketchFileInput> = {}, stiffness?: number) =>
  sketch({
    gravity: 9.81,
    bodies: [{ id: "b", outline: box(1, 1), mass: 1 }],
    supports: [
      { id: "pin", body: "b", kind: "pin", at: [0, 0], ...(stiffness === undefined ? {} : { stiffness }) },
      { id: "r", body: "b", kind: "roller", at: [1, 0], angle: 90, ...(stiffness === undefined ? {} : { stiffness }) },
    ],
    ...parts,
  });

const errorsOf = (doc: unknown) => {
  const p = parseSketch(doc);
  if (p.ok) throw new Error("expected errors");
  return p.errors;
};

describe("invalid sketch files", () => {
  it("not JSON", () => {
    expect(errorsOf("{ bodies: ")[0].message).toMatch(/^not valid JSON/);
  });
  it("not a Counterpoise file", () => {
    expect(errorsOf({ hello: 1 })).toEqual([{ path: "format", message: 'must be "counterpoise.sketch" (this does not look like a Counterpoise sketch file)' }]);
  });
  it("a newer version than this solver reads", () => {
    expect(errorsOf({ format: "counterpoise.sketch", version: 99 })[0]).toEqual({
      path: "version",
      message: "is 99, newer than this version of Counterpoise reads (6); update Counterpoise to open it",
    });
  });

  type Doc = { ports: Record<string, unknown>[]; supports: Record<string, unknown>[]; bodies: Record<string, unknown>[] };
  const doc = (): Doc => loadFixture("pump-skid-discharge.json") as unknown as Doc;

  it.each([
    ["a port area of the wrong type", (d: Doc): void => void (d.ports[1].area = true), "ports[1].area", /must be a number or an expression/],
    ["a misspelt field", (d: Doc): void => void (d.ports[0].massflow = 3), "ports[0].massflow", /is not a field here/],
    ["an unknown support kind", (d: Doc): void => void (d.supports[0].kind = "clamp"), "supports[0].kind", /pin, roller, contact, fixed, tie/],
    ["a body with two corners", (d: Doc): void => void (d.bodies[0].outline = [[0, 0], [1, 0]]), "bodies[0].outline", /at least 3 corners/],
    ["a negative mass", (d: Doc): void => void (d.bodies[0].mass = -5), "bodies[0].mass", /zero or more/],
    ["a negative friction coefficient", (d: Doc): void => void (d.supports[1].mu = -0.1), "supports[1].mu", /zero or more/],
    ["a zero area", (d: Doc): void => void (d.ports[0].area = 0), "ports[0].area", /more than zero/],
    ["a length where a pressure belongs", (d: Doc): void => void (d.ports[0].pressure = "3 m"), "ports[0].pressure", /is a length \(m\), but this field needs a pressure/],
    ["a reference to a missing body", (d: Doc): void => void (d.supports[0].body = "nope"), "supports[0].body", /names body "nope", which does not exist/],
    ["a duplicate id", (d: Doc): void => void (d.supports[1].id = "rear"), "supports[1].id", /already used by supports\[0\]/],
    ["an empty expression", (d: Doc): void => void (d.ports[1].velocity = ""), "ports[1].velocity", /is empty/],
    ["a broken expression", (d: Doc): void => void (d.ports[1].velocity = "24 m/"), "ports[1].velocity", /cannot read "24 m\/"/],
  ] as const)("%s", (_name, mutate, path, message) => {
    const d = doc();
    mutate(d);
    const errors = errorsOf(d);
    const e = errors.find((x) => x.path === path);
    expect(e, JSON.stringify(errors)).toBeDefined();
    expect(e!.message).toMatch(message);
  });

  it("a port without enough information names the port and what is missing", () => {
    const errors = errorsOf(
      sketch({
        bodies: [{ id: "b", outline: box(1, 1), mass: 0 }],
        ports: [{ id: "jet", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, velocity: 10 }],
      }),
    );
    expect(errors).toEqual([{ path: "ports[0]", message: 'port "jet" needs a mass flow: give massFlow, or density and volumeFlow, or density, area and velocity' }]);
  });

  it("a gauge pressure without an area", () => {
    const errors = errorsOf(
      sketch({
        bodies: [{ id: "b", outline: box(1, 1), mass: 0 }],
        ports: [{ id: "jet", body: "b", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: 0, pressure: "2 bar" }],
      }),
    );
    expect(errors).toEqual([{ path: "ports[0].area", message: 'is required: port "jet" has a gauge pressure, and its force is pressure × area' }]);
  });

  it("a gauge pressure below a full vacuum (one standard atmosphere, 101.325 kPa: ISO 2533)", () => {
    const port = (pressure: string) =>
      sketch({
        bodies: [{ id: "b", outline: box(1, 1), mass: 0 }],
        ports: [{ id: "suction", body: "b", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: 0, pressure, area: 0.01 }],
      });
    expect(errorsOf(port("-500 kPa"))).toEqual([
      { path: "ports[0].pressure", message: "is below a full vacuum: a gauge pressure cannot be less than −101.325 kPa (one standard atmosphere below the air around it); check the sign, or whether the value is absolute" },
    ]);
    // a pump's suction a little under the atmosphere is an ordinary input (−14.7 psi is −101.35 kPa: just past it)
    expect(parseSketch(port("-60 kPa")).ok).toBe(true);
    expect(parseSketch(port("-101.3 kPa")).ok).toBe(true);
    expect(parseSketch(port("-14.7 psi")).ok).toBe(false);
  });

  it("a support that restrains x on a body free in x", () => {
    const d = loadFixture("thrust-cart-free.json");
    d.supports!.push({ id: "brake", body: "cart", kind: "pin", at: [1, 0] });
    expect(errorsOf(d)).toEqual([
      { path: "supports[2]", message: "restrains x, but the body is set free to move in x (“Free to move in x”, motion.freeX in the file): untick that, remove the support, or turn it to act along y only" },
    ]);
  });

  it("a force needs magnitude and angle, or fx and fy", () => {
    const errors = errorsOf(
      sketch({ bodies: [{ id: "b", outline: box(1, 1), mass: 0 }], loads: [{ id: "F", body: "b", kind: "force", at: [0, 0], magnitude: 5 }] }),
    );
    expect(errors).toEqual([{ path: "loads[0].angle", message: "is required with magnitude" }]);
  });

  it("an outline that crosses itself names the two edges and the point", () => {
    const body = (outline: [number, number][]) => sketch({ bodies: [{ id: "b", outline, mass: 1 }] });
    // hand calculation: the edge (0, 0)–(2, 2) is y = x, the edge (2, 0)–(0, 1) is y = 1 − x/2; they meet at x = 2/3
    expect(errorsOf(body([[0, 0], [2, 2], [2, 0], [0, 1]]))).toEqual([
      { path: "bodies[0].outline", message: "crosses itself: its edge from corner 1 to 2 crosses its edge from corner 3 to 4 at (0.6667, 0.6667); list the corners in order around the body" },
    ]);
    // equal lobes: the signed areas cancel, but the corners are not on one line; the crossing is the reason
    expect(errorsOf(body([[0, 0], [1, 1], [1, 0], [0, 1]]))[0].message).toMatch(/^crosses itself: .* at \(0\.5, 0\.5\)/);
    // the closing edge counts too: (2, 1)–(0, 0) is y = x/2, which meets x = 1 at y = 0.5
    expect(errorsOf(body([[0, 0], [1, 0], [1, 2], [2, 1]]))[0].message).toMatch(/^crosses itself: its edge from corner 2 to 3 crosses its edge from corner 4 to 1 at \(1, 0\.5\)/);
    // a concave outline, a repeated corner and a corner touching another edge cross nothing
    expect(parseSketch(body([[0, 0], [2, 0], [2, 1], [1, 1], [1, 2], [0, 2]])).ok).toBe(true);
    expect(parseSketch(body([[0, 0], [1, 0], [1, 0], [1, 1], [0, 1]])).ok).toBe(true);
    expect(parseSketch(body([[0, 0], [2, 0], [2, 2], [1, 0], [0, 2]])).ok).toBe(true);
    // corners on one line keep their own reason
    expect(errorsOf(body([[0, 0], [1, 0], [2, 0]]))).toEqual([{ path: "bodies[0].outline", message: "encloses no area: its corners lie on one line" }]);
  });

  it("a swept value that makes the outline cross itself is an error at that point", () => {
    const p = parsed(
      sketch({
        parameters: { x: "1 m" },
        bodies: [{ id: "b", outline: [[0, 0], [2, 0], ["x", 1], [0, 1]], mass: 1 }],
        supports: [{ id: "pin", body: "b", kind: "pin", at: [0, 0] }],
      }),
    );
    const r = solveSweep(p, "x", [1, -1]);
    expect(r.points[0].ok).toBe(true);
    // hand calculation: at x = −1 the edge (2, 0)–(−1, 1) meets the closing edge x = 0 at y = 2/3
    expect(r.points[1]).toMatchObject({ ok: false, errors: [{ path: "bodies[0].outline", message: expect.stringMatching(/^crosses itself: .* at \(0, 0\.6667\)/) }] });
  });

  it("a swept value too large to solve is an error at that point, naming the field", () => {
    const p = parsed(
      sketch({
        parameters: { P: "1 kN" },
        bodies: [{ id: "b", outline: box(1, 1), mass: 0 }],
        supports: [{ id: "pin", body: "b", kind: "pin", at: [0, 0] }],
        loads: [{ id: "F", body: "b", kind: "force", at: [0, 0], fx: 0, fy: "-P" }],
      }),
    );
    const r = solveSweep(p, "P", [1, 1e300]);
    expect(r.points[0].ok).toBe(true);
    expect(r.points[1]).toMatchObject({ ok: false, errors: [{ path: "loads[0].fy", message: expect.stringMatching(/^is too large to solve/) }] });
  });

  it("a support spring too soft to solve with is refused with the field named; a soft one that is not, solves", () => {
    const on = (stiffness: number) => onPinAndRoller({ gravity: 10 }, stiffness);
    // every spring at 1e-300 N/m used to read as "unrestrained" with no reactions (the stiffness matrix underflows)
    expect(errorsOf(on(1e-300))).toEqual([
      { path: "supports[0].stiffness", message: "is too small to solve with: at least 0.000001 N/m (a support that carries nothing is better removed)" },
      { path: "supports[1].stiffness", message: "is too small to solve with: at least 0.000001 N/m (a support that carries nothing is better removed)" },
    ]);
    // a determinate pin and roller share 10 N by statics whatever their stiffness (hand calculation: 5 N each)
    const r = solveFile(on(1e-3));
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.bodies.b.status).toBe("holds");
    expect(r.reactions.r.fy).toBeCloseTo(5, 9);
    expect(r.reactions.pin.fy).toBeCloseTo(5, 9);
  });

  it("numbers too large to solve are refused with the field named (the solve would overflow)", () => {
    const pinned = (parts: Partial<SketchFileInput>) => onPinAndRoller(parts);
    const tooLarge = "is too large to solve: the solver takes numbers up to ±1e18 in SI units (check the unit and the exponent)";
    expect(errorsOf(pinned({ bodies: [{ id: "b", outline: box(1, 1), mass: 1e308 }] }))).toEqual([{ path: "bodies[0].mass", message: tooLarge }]);
    expect(errorsOf(pinned({ loads: [{ id: "F", body: "b", kind: "force", at: [0.5, 1], fx: 0, fy: "-1e300 N" }] }))).toEqual([{ path: "loads[0].fy", message: tooLarge }]);
    expect(errorsOf(pinned({ loads: [{ id: "C", body: "b", kind: "couple", value: "1e300 kN*m" }] }))).toEqual([{ path: "loads[0].value", message: tooLarge }]);
    expect(errorsOf(pinned({ supports: [{ id: "pin", body: "b", kind: "pin", at: [1e300, 0] }] }))).toEqual([{ path: "supports[0].at[0]", message: tooLarge }]);
    expect(errorsOf(pinned({ cases: [{ id: "c", name: "c", factors: { dead: 1e300 } }] }))).toEqual([{ path: "cases[0].factors.dead", message: tooLarge }]);
    // every value in range, but a speed found by dividing by a tiny area is not
    expect(errorsOf(pinned({ ports: [{ id: "o", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, massFlow: 1e10, density: 1e-300, area: 1e-300 }] }))).toEqual([
      { path: "ports[0].area", message: "is too small for the flow through it: the speed it gives, massFlow / (density × area), is beyond 1e18 m/s" },
    ]);
  });

  it("a zero area is refused once, as zero, not also as too small for the flow", () => {
    const out = (area: number | string) => ({ ports: [{ id: "o", body: "b", kind: "outlet" as const, at: [1, 0.5] as [number, number], angle: 0, massFlow: 10, density: 1000, area }] });
    expect(errorsOf(onPinAndRoller(out(0)))).toEqual([{ path: "ports[0].area", message: "must be more than zero" }]);
    expect(errorsOf(onPinAndRoller(out("0 m^2")))).toEqual([{ path: "ports[0].area", message: "must be more than zero" }]);
    expect(errorsOf(onPinAndRoller({ ports: [{ id: "o", body: "b", kind: "outlet", at: [1, 0.5], angle: 0, volumeFlow: 0.01, density: 0, area: 0.01 }] }))).toEqual([
      { path: "ports[0].density", message: "must be more than zero" },
    ]);
  });

  it("large but sane values still solve, with finite reactions", () => {
    // 1e12 N down at the middle of a 1 m span (a pin and a roller), on a body of 1e9 kg (g = 10)
    const r = solveFile(
      onPinAndRoller({
        gravity: 10,
        bodies: [{ id: "b", outline: box(1, 1), mass: 1e9 }],
        loads: [{ id: "F", body: "b", kind: "force", at: [0.5, 1], fx: 0, fy: "-1e12 N" }],
      }),
    );
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.bodies.b.status).toBe("holds");
    // hand calculation: symmetric about x = 0.5, so each support takes half of 1e12 + 1e10 N
    expectRel(r.reactions.r.n!, 5.05e11, 1e-12);
    expectRel(r.reactions.pin.fy, 5.05e11, 1e-12);
  });

  it("solveFile returns { ok: false, errors } and nothing partial", () => {
    const d = loadFixture("pump-skid-discharge.json");
    (d.ports![0] as Record<string, unknown>).area = "3 kg";
    const r = solveFile(d);
    expect(r).toEqual({ ok: false, errors: [{ path: "ports[0].area", message: "3 kg is a mass (kg), but this field needs an area (m²)" }] });
  });
});
