// Rounding of snapped and typed values: a half step goes away from zero, and a quotient that
// floating point leaves a hair below a half (0.3 / 0.2 = 1.4999999999999998) still counts as one.
import { describe, expect, it } from "vitest";
import { snapPoint, snapTo } from "@/canvas/geometry/snap";
import { decimalsOf, roundHalfAway, roundTo } from "@/canvas/model/numeric";
import { angleOnEdge } from "@/canvas/placement";
import type { Vec2 } from "@/solver/types";

describe("half steps on the grid", () => {
  it("0.3 m on a 0.2 m grid lands on 0.4 m, not on 0.2 m (0.3 / 0.2 computes as 1.4999999999999998)", () => {
    expect(0.3 / 0.2).toBeLessThan(1.5);
    expect(snapTo(0.3, 0.2)).toBe(0.4);
    expect(snapTo(0.7, 0.2)).toBe(0.8);
    expect(snapTo(0.15, 0.1)).toBe(0.2);
    expect(snapTo(1.15, 0.1)).toBe(1.2);
    expect(snapTo(0.075, 0.05)).toBe(0.1);
  });

  it("a half step goes away from zero on both sides, so a mirrored drawing snaps as its mirror image", () => {
    expect(snapTo(-0.3, 0.2)).toBe(-0.4);
    expect(snapTo(0.1, 0.2)).toBe(0.2);
    expect(snapTo(-0.1, 0.2)).toBe(-0.2);
    expect(snapTo(2.5, 1)).toBe(3);
    expect(snapTo(-2.5, 1)).toBe(-3);
    expect(snapTo(0.25, 0.5)).toBe(0.5);
  });

  it("a point truly short of the half still goes down, and zero is a plain zero", () => {
    expect(snapTo(0.2999, 0.2)).toBe(0.2);
    expect(snapTo(-0.2999, 0.2)).toBe(-0.2);
    expect(snapTo(0.3001, 0.2)).toBe(0.4);
    expect(Object.is(snapTo(-0.04, 0.2), 0)).toBe(true);
    expect(snapTo(0.30000000000000004, 0.1)).toBe(0.3);
    expect(snapTo(12.345, 0.005)).toBe(12.345);
  });

  it("the grid and the grid along an edge use the same rule", () => {
    const bodies = [{ id: "b1", outline: [[-1, 0], [1, 0], [1, 1], [-1, 1]] as Vec2[] }];
    expect(snapPoint([0.3, 2.7], { bodies, grid: 0.2, tolerance: 0.05 })).toEqual({ kind: "grid", point: [0.4, 2.8] });
    expect(snapPoint([-0.3, -2.7], { bodies, grid: 0.2, tolerance: 0.05 })).toEqual({ kind: "grid", point: [-0.4, -2.8] });
    // 0.02 m below the bottom edge at x = 0.3: on the edge, at x = 0.4
    expect(snapPoint([0.3, -0.02], { bodies, grid: 0.2, tolerance: 0.05 })).toMatchObject({ kind: "edge", point: [0.4, 0], edge: 0 });
  });
});

describe("rounding typed values and angles", () => {
  it("rounds to any step, a half away from zero, without floating noise", () => {
    expect(roundTo(1.0005, 1e-3)).toBe(1.001);
    expect(roundTo(-1.0005, 1e-3)).toBe(-1.001);
    expect(roundTo(12.35, 0.1)).toBe(12.4);
    expect(roundTo(0.125, 0.25)).toBe(0.25);
    expect(roundTo(0.374, 0.25)).toBe(0.25);
    expect(roundTo(1.23456789, 1e-3)).toBe(1.235);
    expect(roundTo(0.1 + 0.2)).toBe(0.3);
    // only round-off counts as a half: a value a real 1e-7 short of it (a small step, a large quotient) goes down
    expect(roundTo(800.0000004, 1e-6)).toBe(800);
    expect(roundTo(800.0000005, 1e-6)).toBe(800.000001);
    expect(roundTo(20, 1e-9)).toBe(20);
  });

  it("a turn handle's 5° steps: 7.5° goes to 10°, −7.5° to −10°; with Alt held, tenths of a degree", () => {
    expect(roundTo(7.5, 5)).toBe(10);
    expect(roundTo(-7.5, 5)).toBe(-10);
    expect(roundTo(7.4, 5)).toBe(5);
    expect(roundTo(33.35, 0.1)).toBe(33.4);
  });

  it("roundHalfAway and decimalsOf", () => {
    expect(roundHalfAway(1.4999999999999998)).toBe(2);
    expect(roundHalfAway(-1.4999999999999998)).toBe(-2);
    expect(roundHalfAway(1.4999)).toBe(1);
    expect(roundHalfAway(1000.4999999999999)).toBe(1001);
    expect(Object.is(roundHalfAway(-0.2), 0)).toBe(true);
    expect(decimalsOf(0.2)).toBe(1);
    expect(decimalsOf(0.25)).toBe(2);
    expect(decimalsOf(1e-6)).toBe(6);
    expect(decimalsOf(5)).toBe(0);
  });

  it("an element placed on a sloping edge takes the edge's normal to the thousandth of a degree", () => {
    const body = { id: "b", kind: "body", outline: [[0, 0], [2, 0], [2 + Math.sqrt(3), 1], [0, 1]] as Vec2[] };
    // the edge from (2, 0) to (2 + √3, 1) runs at 30°; outward (to its right) is at −60°; a contact pushes inward, at 120°
    const at: Vec2 = [2 + Math.sqrt(3) / 2, 0.5];
    expect(angleOnEdge("outlet", body as never, at, 0.01)).toBe(-60);
    expect(angleOnEdge("contact", body as never, at, 0.01)).toBe(120);
  });
});
