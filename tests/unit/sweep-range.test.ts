// The range and parameter a new sweep starts with (our own rule: around the current value).
import { describe, expect, it } from "vitest";
import { defaultSweepParameter, defaultSweepRange, parseRangeValue } from "@/components/studies/sweepRange";

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

describe("the ends of a range as typed", () => {
  it("a plain number is in the parameter's own unit; a value with a unit is converted to it", () => {
    expect(parseRangeValue("45", "m / s")).toBe(45);
    // 90 km/h = 25 m/s exactly; 1 US gallon = 3.785411784 L (NIST SP 811): 2000 L/min = 528.34 gpm
    expect(parseRangeValue("90 km/hr", "m / s")).toBeCloseTo(25, 12);
    expect(parseRangeValue("2000 lpm", "gpm")).toBeCloseTo(2000 / 3.785411784, 9);
    // π rad = 180°
    expect(parseRangeValue("(pi/6) rad", "deg")).toBeCloseTo(30, 12);
  });

  it("refuses the wrong kind, a unit on a plain-number parameter, and an empty box, in words", () => {
    expect(() => parseRangeValue("3 kg", "m / s")).toThrow("3 kg cannot be written in m/s");
    expect(() => parseRangeValue("1.2 m", "")).toThrow("1.2 m has a unit, but this parameter is a plain number");
    expect(() => parseRangeValue(" ", "deg")).toThrow("needs a value");
    expect(() => parseRangeValue("2 *", "deg")).toThrow();
  });
});
