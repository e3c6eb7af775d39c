// The format's migration chain: the mechanism with a stand-in chain, then each real step.
import { describe, expect, it } from "vitest";
import { MIGRATIONS, migrateSketch, type Migration } from "@/solver/migrations";
import { CURRENT_VERSION } from "@/solver/schema";
import { loadCases } from "@/solver/migrations/002-load-cases";
import { underlay } from "@/solver/migrations/003-underlay";
import { momentumFactor } from "@/solver/migrations/004-momentum-factor";
import { gravityDirection } from "@/solver/migrations/005-gravity-direction";
import { combinationStudies } from "@/solver/migrations/006-combination-studies";
import { loadFixture } from "./helpers";

describe("migrateSketch", () => {
  it("a current file passes through unchanged (a copy)", () => {
    const doc = { ...loadFixture("pump-skid-discharge.json"), version: CURRENT_VERSION };
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

describe("each step of the chain", () => {
  it("1 → 2 (load cases): a version-1 file gets version 2 and is otherwise unchanged", () => {
    const doc = loadFixture("pump-skid-discharge.json");
    const out = loadCases.up(structuredClone(doc) as Record<string, unknown>);
    expect({ ...out, version: 1 }).toEqual(doc);
    const r = migrateSketch(doc, [loadCases], 2);
    expect(r.ok && r.doc.version).toBe(2);
  });

  it("2 → 3 (underlay): a version-2 file with cases gets version 3 and keeps its cases", () => {
    const doc = { ...loadFixture("pump-skid-discharge.json"), version: 2, cases: [{ id: "a", name: "A", flowFactor: 1.2 }] };
    const r = migrateSketch(doc, [loadCases, underlay], 3);
    expect(r).toEqual({ ok: true, doc: { ...doc, version: 3 }, applied: [2] });
  });

  it("3 → 4 (momentum-flux factor): a version-3 file with an underlay gets version 4, unchanged otherwise, and its ports keep β = 1", async () => {
    const doc = { ...loadFixture("pump-skid-discharge.json"), version: 3, underlay: { upload: "00000000-0000-4000-8000-000000000001", width: 10, height: 10, origin: [0, 0], metresPerPixel: 0.01 } };
    const r = migrateSketch(doc, [loadCases, underlay, momentumFactor], 4);
    expect(r).toEqual({ ok: true, doc: { ...doc, version: 4 }, applied: [3] });
    const { parseSketch } = await import("@/solver");
    const p = parseSketch(doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    expect(p.sketch.ports.length).toBeGreaterThan(0);
    expect(p.sketch.ports.every((port) => port.beta === undefined)).toBe(true);
  });

  it("4 → 5 (gravity direction): a version-4 file with a port's β gets version 5, unchanged otherwise, and gravity stays −y", async () => {
    const base = loadFixture("pump-skid-discharge.json") as unknown as { ports: Record<string, unknown>[] };
    const doc = { ...base, version: 4, ports: base.ports.map((p, i) => (i === 0 ? { ...p, beta: 1.02 } : p)) };
    const r = migrateSketch(doc, [loadCases, underlay, momentumFactor, gravityDirection], 5);
    expect(r).toEqual({ ok: true, doc: { ...doc, version: 5 }, applied: [4] });
    const { parseSketch } = await import("@/solver");
    const p = parseSketch(doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    expect(p.sketch.gravityAngle).toBeUndefined();
    expect(p.sketch.ports[0].beta).toBe(1.02);
  });

  it("5 → 6 (a sweep on a combination): a version-5 file with cases and a saved sweep gets version 6, unchanged otherwise", async () => {
    const base = loadFixture("fire-monitor-trailer.json");
    const doc = {
      ...base,
      version: 5,
      gravityAngle: -90,
      cases: [{ id: "low", name: "Low throw", parameters: { theta: "10 deg" } }],
      sweeps: [{ id: "s", parameter: "theta", from: 0, to: 60, points: 31, case: "low" }],
    };
    const r = migrateSketch(doc, [loadCases, underlay, momentumFactor, gravityDirection, combinationStudies], 6);
    expect(r).toEqual({ ok: true, doc: { ...doc, version: 6 }, applied: [5] });
    const { parseSketch } = await import("@/solver");
    const p = parseSketch(doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    expect(p.file.sweeps).toEqual([{ id: "s", parameter: "theta", from: 0, to: 60, points: 31, case: "low" }]);
    // the new field reads (what it names is checked when the sweep runs)
    const q = parseSketch({ ...doc, version: 6, sweeps: [{ id: "s", parameter: "theta", from: 0, to: 60, points: 31, combination: "nope" }] });
    expect(q.ok).toBe(true);
  });

  it("every version-1 fixture still solves exactly as before: migrated, parsed, solved", async () => {
    const { readdirSync } = await import("node:fs");
    const { FIXTURES } = await import("./helpers");
    const { parseSketch, solve } = await import("@/solver");
    for (const f of readdirSync(FIXTURES).filter((n) => n.endsWith(".json"))) {
      const doc = loadFixture(f);
      expect(doc.version).toBe(1);
      const p = parseSketch(doc);
      expect(p.ok, f).toBe(true);
      if (!p.ok) continue;
      expect(p.migratedFrom).toEqual([1, 2, 3, 4, 5]);
      expect(p.file.version).toBe(CURRENT_VERSION);
      // the same file marked as current (no migration) gives the identical result
      const q = parseSketch({ ...doc, version: CURRENT_VERSION });
      if (!q.ok) throw new Error();
      expect(JSON.stringify(solve(p.sketch))).toBe(JSON.stringify(solve(q.sketch)));
    }
  });
});
