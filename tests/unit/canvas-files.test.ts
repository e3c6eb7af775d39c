// Sketch files in and out: a bad file is refused with reasons (and nothing changes), an older
// version is brought up to date, the export is the contract's JSON, and the scratch store keeps it.
import { describe, expect, it } from "vitest";
import { CURRENT_VERSION } from "@/solver/schema";
import { solveFile } from "@/solver/index";
import { exportSketchText, fileStem, importSketchText } from "@/canvas/files";
import { scratchPersistence, unavailablePersistence } from "@/canvas/persistence";
import { exampleById } from "@/canvas/examples";

const good = () => structuredClone(exampleById("pump-skid")!.sketch);

describe("import", () => {
  it("reads a good file, expressions and all", () => {
    const out = importSketchText(JSON.stringify(good()));
    expect(out.ok).toBe(true);
    if (out.ok) expect(out.sketch.ports[0].area).toBe("pi / 4 * (100 mm)^2");
  });
  it("refuses text that is not JSON, or not a sketch, saying why", () => {
    expect(importSketchText("{ nope")).toMatchObject({ ok: false, errors: [{ path: "", message: expect.stringMatching(/not a JSON file/) }] });
    expect(importSketchText(JSON.stringify({ hello: 1 }))).toMatchObject({ ok: false, errors: [{ path: "format", message: expect.stringMatching(/Counterpoise sketch/) }] });
    expect(importSketchText(JSON.stringify({ ...good(), version: CURRENT_VERSION + 1 }))).toMatchObject({ ok: false, errors: [{ path: "version" }] });
  });
  it("names the field of a structural error, and a reference to a body that is not there", () => {
    const bad = good() as unknown as { supports: Array<Record<string, unknown>> };
    bad.supports[0].kind = "magnet";
    const out = importSketchText(JSON.stringify(bad));
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.errors[0].path).toMatch(/^supports\[0\]/);
    const orphan = good();
    orphan.supports[0].body = "ghost";
    const o = importSketchText(JSON.stringify(orphan));
    expect(o).toMatchObject({ ok: false, errors: [{ path: "supports[0].body", message: expect.stringMatching(/ghost/) }] });
  });
  it("brings a file of the first format version up to date, saying which version it was, and it solves as written", () => {
    // a version-1 file: no cases, no underlay, no β, no gravity direction (solver/migrations)
    const v1 = { format: "counterpoise.sketch", version: 1, title: "Crate on a pin and a pad", bodies: [{ id: "c", mass: "100 kg", outline: [[0, 0], [2, 0], [2, 1], [0, 1]] }], supports: [{ id: "pin", body: "c", kind: "pin", at: [0, 0] }, { id: "pad", body: "c", kind: "contact", at: [2, 0], angle: 90 }], loads: [], ports: [], massSources: [] };
    const out = importSketchText(JSON.stringify(v1));
    expect(out).toMatchObject({ ok: true, migratedFrom: [1, 2, 3, 4, 5].slice(0, CURRENT_VERSION - 1), sketch: { version: CURRENT_VERSION, title: "Crate on a pin and a pad" } });
    if (!out.ok) return;
    // the weight 100 kg × 9.80665 m/s² (standard gravity, ISO 80000-3) shared by two supports 2 m
    // apart with the centre of gravity halfway: 490.3 N each (hand calculation, moments about the pin)
    const r = solveFile(out.sketch);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.reactions.pad.fy).toBeCloseTo(490.3325, 3);
      expect(r.reactions.pin.fy).toBeCloseTo(490.3325, 3);
    }
  });
  it("keeps a file whose expressions have errors: those show at their fields", () => {
    const f = good();
    f.ports[0].pressure = "-0.4 bar + zebra";
    expect(importSketchText(JSON.stringify(f)).ok).toBe(true);
  });
});

describe("export", () => {
  it("writes exactly the sketch, which solves the same as the original", () => {
    const text = exportSketchText(good());
    expect(JSON.parse(text)).toEqual(good());
    expect(solveFile(JSON.parse(text))).toEqual(solveFile(good()));
    expect(fileStem("Pump skid, discharge test")).toBe("pump-skid-discharge-test");
    expect(fileStem("")).toBe("sketch");
  });
});

describe("persistence", () => {
  it("keeps the scratch sketch in storage and reads it back", async () => {
    const mem = new Map<string, string>();
    const storage = { getItem: (k: string) => mem.get(k) ?? null, setItem: (k: string, v: string) => void mem.set(k, v), removeItem: (k: string) => void mem.delete(k) };
    const p = scratchPersistence(storage);
    expect(await p.load()).toEqual({ ok: true, sketch: null });
    const saved = await p.save(good());
    expect(saved.ok).toBe(true);
    const back = await p.load();
    expect(back.ok && back.sketch).toEqual(good());
    mem.set("counterpoise:scratch-sketch:v1", "{broken");
    expect(await p.load()).toMatchObject({ ok: false, reason: "invalid" });
  });
  it("a saved sketch that cannot be reached says so", async () => {
    expect(await unavailablePersistence("abc").load()).toMatchObject({ ok: false, reason: "not-found", message: expect.stringMatching(/abc/) });
    expect(await unavailablePersistence("abc", "signed-out").load()).toMatchObject({ reason: "signed-out", message: "Sign in to open this sketch." });
  });
});
