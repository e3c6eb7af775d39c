// Round axis ticks: a step of 1, 2 or 5 × 10ⁿ nearest the range over the count, each tick a whole
// multiple of it (P. Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990).
import { describe, expect, it } from "vitest";
import { niceTicks } from "@/lib/ticks";

describe("niceTicks", () => {
  it("gives round multiples of a round step across the range", () => {
    expect(niceTicks(-90, 0, 6)).toEqual([-80, -60, -40, -20, 0]);
    expect(niceTicks(20, 45, 5)).toEqual([20, 25, 30, 35, 40, 45]);
    expect(niceTicks(0, 1, 5)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceTicks(0.1, 0.7, 6)).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7]);
    expect(niceTicks(3, 97, 5)).toEqual([20, 40, 60, 80]);
    expect(niceTicks(1200, 2400, 5)).toEqual([1200, 1400, 1600, 1800, 2000, 2200, 2400]);
  });

  it("a range of one value is that value; no range, no ticks", () => {
    expect(niceTicks(5, 5)).toEqual([5]);
    expect(niceTicks(Number.NaN, 1)).toEqual([]);
  });
});
