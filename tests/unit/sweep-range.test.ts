// The range and parameter a new sweep starts with (our own rule: around the current value).
import { describe, expect, it } from "vitest";
import { defaultSweepParameter, defaultSweepRange } from "@/components/studies/sweepRange";

describe("a new sweep's starting range", () => {
  it("turns an angle ±90° about its value, in its own unit", () => {
    expect(defaultSweepRange("theta", { value: -75, unit: "deg" })).toEqual({ from: -165, to: 15 });
    expect(defaultSweepRange("a", { value: 0.5, unit: "rad" })).toEqual({ from: -1.071, to: 2.071 });
  });

  it("takes any other quantity from zero to twice its value (a negative one from twice it to zero)", () => {
    expect(defaultSweepRange("Q", { value: 1250, unit: "gpm" })).toEqual({ from: 0, to: 2500 });
    expect(defaultSweepRange("p", { value: -40, unit: "kPa" })).toEqual({ from: -80, to: 0 });
    expect(defaultSweepRange("d", { value: 0, unit: "m" })).toEqual({ from: 0, to: 1 });
  });

  it("runs the flow factor from 0 to 2, and a parameter with an error from 0 to 1", () => {
    expect(defaultSweepRange("flowFactor", undefined)).toEqual({ from: 0, to: 2 });
    expect(defaultSweepRange("x", { error: "unknown name y" })).toEqual({ from: 0, to: 1 });
  });

  it("offers an angle first, else the first parameter, else the flow factor", () => {
    const values = { rho: { value: 998, unit: "kg/m^3" }, Q: { value: 40, unit: "lpm" }, theta: { value: -75, unit: "deg" } };
    expect(defaultSweepParameter(["rho", "Q", "theta"], values)).toBe("theta");
    expect(defaultSweepParameter(["rho", "Q"], values)).toBe("rho");
    expect(defaultSweepParameter([], {})).toBe("flowFactor");
  });
});
