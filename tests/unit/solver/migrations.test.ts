// The format's migration chain. Version 1 is the first published format, so the real chain is
// empty today; the mechanism is checked with a stand-in chain, and every later step gets its own
// test beside it.
import { describe, expect, it } from "vitest";
import { MIGRATIONS, migrateSketch, type Migration } from "@/solver/migrations";
import { CURRENT_VERSION } from "@/solver/schema";
import { loadFixture } from "./helpers";

describe("migrateSketch", () => {
  it("a current file passes through unchanged (a copy)", () => {
    const doc = loadFixture("pump-skid-discharge.json");
    const r = migrateSketch(doc);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.doc).toEqual(doc);
      expect(r.doc).not.toBe(doc);
      expect(r.applied).toEqual([]);
    }
  });

  it("every step of the real chain is numbered from 1 without gaps up to the current version", () => {
    expect(MIGRATIONS.map((m) => m.from)).toEqual(Array.from({ length: CURRENT_VERSION - 1 }, (_, i) => i + 1));
  });

  it("runs the steps in order and sets each version", () => {
    const chain: Migration[] = [
      { from: 1, description: "rename a", up: (d) => ({ ...d, b: d.a, a: undefined }) },
      { from: 2, description: "double b", up: (d) => ({ ...d, b: (d.b as number) * 2 }) },
    ];
    const r = migrateSketch({ format: "counterpoise.sketch", version: 1, a: 21 }, chain, 3);
    expect(r).toEqual({ ok: true, doc: { format: "counterpoise.sketch", version: 3, a: undefined, b: 42 }, applied: [1, 2] });
  });

  it("refuses a missing step, a newer file and a bad version", () => {
    expect(migrateSketch({ format: "counterpoise.sketch", version: 1 }, [], 2)).toEqual({ ok: false, errors: [{ path: "version", message: "no migration from version 1 to 2" }] });
    expect(migrateSketch({ format: "counterpoise.sketch", version: 3 }, [], 2).ok).toBe(false);
    expect(migrateSketch({ format: "counterpoise.sketch", version: 1.5 })).toEqual({ ok: false, errors: [{ path: "version", message: "must be a whole number, 1 or more" }] });
    expect(migrateSketch([1, 2])).toEqual({ ok: false, errors: [{ path: "", message: "a sketch file must be a JSON object" }] });
  });
});
