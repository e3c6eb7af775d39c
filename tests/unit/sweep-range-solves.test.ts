// A new sweep's range starts where the sketch solves: a density, a diameter or an area cannot be
// zero, a flow can (no flow). Our own rule (components/studies/sweepRange.ts).
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { defaultSweepRange, solvesAtIn } from "@/components/studies/sweepRange";
import { parseSketch } from "@/solver/parse";
import type { SketchFile } from "@/solver/schema";
import { runSweep } from "@/canvas/studies/run";

const bend = JSON.parse(readFileSync("tests/fixtures/sketches/pipe-bend-anchor.json", "utf8")) as SketchFile;
const parsed = parseSketch(bend);
if (!parsed.ok) throw new Error("the fixture must parse");
const values = parsed.parameterValues;
const range = (name: string) => defaultSweepRange(name, values[name], solvesAtIn(bend, name));
const firstPoint = (name: string, r: { from: number; to: number }) =>
  runSweep(bend, { parameter: name, from: r.from, to: r.to, points: 5, quantities: [{ support: bend.supports[0].id, component: "resultant" }] });

describe("a new sweep's range on a sketch that cannot solve at zero", () => {
  it("starts a density at a tenth of its value, tidied, where the sketch solves", () => {
    expect(values.rho).toEqual({ value: 998.2, unit: "kg / m^3", si: 998.2 });
    // a density of 0 is an input error: the first point of 0 … 2× would not solve
    expect(solvesAtIn(bend, "rho")(0)).toBe(false);
    const r = range("rho");
    expect(r).toEqual({ from: 100, to: 1996 });
    const data = firstPoint("rho", r);
    expect(data.xs[0]).toBe(100);
    expect(data.errors).toEqual([]);
    expect(Number.isFinite(data.series[0][0])).toBe(true);
  });

  it("starts a diameter above zero too", () => {
    const r = range("D1");
    expect(r.from).toBeGreaterThan(0);
    expect(r).toEqual({ from: 30, to: 600 });
    expect(firstPoint("D1", r).errors).toEqual([]);
  });

  it("keeps a flow's range from 0 (no flow solves: a meaningful start)", () => {
    expect(solvesAtIn(bend, "Q")(0)).toBe(true);
    const r = range("Q");
    expect(r).toEqual({ from: 0, to: 0.24 });
    const data = firstPoint("Q", r);
    expect(data.xs[0]).toBe(0);
    expect(data.errors).toEqual([]);
  });

  it("falls back to the value itself when a tenth does not solve either, and asks at most twice", () => {
    const asked: number[] = [];
    const r = defaultSweepRange("m", { value: 40, unit: "kg" }, (v) => (asked.push(v), v >= 40));
    expect(r).toEqual({ from: 40, to: 80 });
    expect(asked).toEqual([0, 4]);
    // a negative value's end at zero moves the same way
    expect(defaultSweepRange("p", { value: -40, unit: "kPa" }, (v) => v !== 0)).toEqual({ from: -80, to: -4 });
  });

  it("says yes for a sketch that does not read (its errors are said elsewhere)", () => {
    const broken = { ...bend, parameters: { ...bend.parameters, p1: "600 kPa +" } } as SketchFile;
    expect(parseSketch(broken).ok).toBe(false);
    expect(solvesAtIn(broken, "rho")(0)).toBe(true);
  });
});
