// The structure check speaks in words: a field of the wrong type, a bad parameter name, a list
// that is not a list, each gets a sentence and its field path, never zod's default message.
import { describe, expect, it } from "vitest";
import { parseSketch } from "@/solver";
import { formatPath } from "@/solver/schema";

const base = (parts: Record<string, unknown>) => ({ format: "counterpoise.sketch", version: 3, bodies: [], supports: [], loads: [], ports: [], massSources: [], ...parts });
const body = { id: "b", outline: [[0, 0], [1, 0], [1, 1]], mass: 1 };

const errorsOf = (doc: unknown) => {
  const p = parseSketch(doc);
  if (p.ok) throw new Error(`expected errors for ${JSON.stringify(doc)}`);
  return p.errors;
};

/** Ordinary mistakes: every top-level field of the wrong type, and a few inside. */
const MISTAKES: Array<[string, Record<string, unknown>]> = [
  ["title a number", base({ title: 5 })],
  ["title too long", base({ title: "x".repeat(301) })],
  ["description a list", base({ description: [] })],
  ["gravity true", base({ gravity: true })],
  ["parameters a list", base({ parameters: [] })],
  ["parameters text", base({ parameters: "theta = 20" })],
  ["a parameter name with a digit first", base({ parameters: { "2x": 1 } })],
  ["a parameter name with a space", base({ parameters: { "flow rate": 1 } })],
  ["bodies an object", base({ bodies: {} })],
  ["a body a number", base({ bodies: [5] })],
  ["an outline an object", base({ bodies: [{ ...body, outline: {} }] })],
  ["a label a number", base({ bodies: [{ ...body, label: 3 }] })],
  ["supports an object", base({ supports: {} })],
  ["a support a number", base({ supports: [5] })],
  ["a support null", base({ supports: [null] })],
  ["loads an object", base({ loads: {} })],
  ["a load text", base({ loads: ["x"] })],
  ["ports a number", base({ ports: 1 })],
  ["a port a number", base({ ports: [1] })],
  ["massSources an object", base({ massSources: {} })],
  ["a mass source a number", base({ massSources: [1] })],
  ["motion a list", base({ motion: [] })],
  ["motion.freeX text", base({ motion: { freeX: "yes" } })],
  ["cases an object", base({ cases: {} })],
  ["a case a number", base({ cases: [1] })],
  ["a case's overrides a list", base({ cases: [{ id: "c", name: "n", parameters: [] }] })],
  ["a case's factors text", base({ cases: [{ id: "c", name: "n", factors: "1.2" }] })],
  ["sweeps an object", base({ sweeps: {} })],
  ["a sweep's points not whole", base({ sweeps: [{ id: "s", parameter: "a", from: 0, to: 1, points: 2.5 }] })],
  ["a sweep's quantities an object", base({ sweeps: [{ id: "s", parameter: "a", from: 0, to: 1, points: 3, quantities: {} }] })],
  ["combinations an object", base({ combinations: {} })],
  ["a combination's terms an object", base({ combinations: [{ id: "k", name: "k", terms: {} }] })],
  ["stability a list", base({ stability: [] })],
  ["underlay a number", base({ underlay: 1 })],
  ["underlay fields of the wrong type", base({ underlay: { upload: "u", width: 1.5, height: 0, origin: "x", metresPerPixel: 1, opacity: 3, hidden: "y" } })],
];

describe("no zod default message reaches the user", () => {
  it.each(MISTAKES)("%s", (_name, doc) => {
    const errors = errorsOf(doc);
    expect(errors.length).toBeGreaterThan(0);
    for (const e of errors) {
      expect(e.message, JSON.stringify(e)).not.toMatch(/Invalid input|Invalid key|Invalid option|Too big|Too small|expected .*, received/);
      expect(e.path, JSON.stringify(e)).not.toBe("");
    }
  });
});

describe("the messages name the field and say what it must be", () => {
  it("bodies that are not a list", () => {
    expect(errorsOf(base({ bodies: {} }))).toEqual([{ path: "bodies", message: "must be a list of bodies [{ … }, …]" }]);
  });

  it("a parameter name that is not a name: the path quotes the key", () => {
    expect(errorsOf(base({ parameters: { "2x": 1 } }))).toEqual([
      { path: 'parameters["2x"]', message: "a parameter name starts with a letter or _ and holds only letters, digits and _" },
    ]);
  });

  it("a support that is not an object, and one with an unknown kind", () => {
    expect(errorsOf(base({ supports: [5] }))).toEqual([{ path: "supports[0]", message: 'must be a support { "id", "body", "kind", "at", … }' }]);
    expect(errorsOf(base({ bodies: [body], supports: [{ id: "s", body: "b", kind: "clamp", at: [0, 0] }] }))).toEqual([
      { path: "supports[0].kind", message: "kind must be one of pin, roller, contact, fixed, tie" },
    ]);
  });

  it("text, numbers and limits in words", () => {
    expect(errorsOf(base({ title: 5 }))).toEqual([{ path: "title", message: "must be text" }]);
    expect(errorsOf(base({ title: "x".repeat(301) }))).toEqual([{ path: "title", message: "is longer than 300 characters" }]);
    expect(errorsOf(base({ sweeps: [{ id: "s", parameter: "a", from: 0, to: 1, points: 2.5 }] }))).toEqual([{ path: "sweeps[0].points", message: "must be a whole number" }]);
    expect(errorsOf(base({ bodies: [{ id: "b", outline: [[0, 0], [1, 0], [1, 1]] }] }))).toEqual([{ path: "bodies[0].mass", message: "is required" }]);
  });

  it("the underlay's fields", () => {
    expect(errorsOf(base({ underlay: { upload: "u", width: 1.5, height: 0, origin: "x", metresPerPixel: 1, opacity: 3, hidden: "y" } }))).toEqual([
      { path: "underlay.width", message: "must be a whole number" },
      { path: "underlay.height", message: "must be more than 0" },
      { path: "underlay.origin", message: "must be a position [x, y]" },
      { path: "underlay.opacity", message: "must be at most 1" },
      { path: "underlay.hidden", message: "must be true or false" },
    ]);
  });
});

describe("formatPath", () => {
  it("writes the contract's paths, quoting a key that is not a plain name", () => {
    expect(formatPath(["ports", 1, "area"])).toBe("ports[1].area");
    expect(formatPath(["parameters", "theta"])).toBe("parameters.theta");
    expect(formatPath(["parameters", "2x"])).toBe('parameters["2x"]');
    expect(formatPath(["cases", 0, "factors", "live load"])).toBe('cases[0].factors["live load"]');
  });
});
