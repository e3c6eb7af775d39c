// Round axis ticks: a step of 1, 2 or 5 × 10ⁿ nearest the range over the count, each tick a whole
// multiple of it (P. Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990).
import { describe, expect, it } from "vitest";
import { niceDomain, niceTicks } from "@/lib/ticks";

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

describe("niceDomain", () => {
  it("widens a range to the round ticks just outside it, so both ends are labelled", () => {
    // a margin curve from 0 to 7.4 kN: the axis runs to 8 (Heckbert's nice numbers, Graphics Gems 1990)
    expect(niceDomain(0, 7.4)).toEqual({ lo: 0, hi: 8, ticks: [0, 1, 2, 3, 4, 5, 6, 7, 8] });
    expect(niceDomain(0, 13.2)).toEqual({ lo: 0, hi: 14, ticks: [0, 2, 4, 6, 8, 10, 12, 14] });
    expect(niceDomain(-0.3, 5.8)).toEqual({ lo: -1, hi: 6, ticks: [-1, 0, 1, 2, 3, 4, 5, 6] });
    // a range already on ticks stays as it is
    expect(niceDomain(20, 45)).toEqual({ lo: 20, hi: 45, ticks: [20, 25, 30, 35, 40, 45] });
    expect(niceDomain(5, 5)).toEqual({ lo: 5, hi: 5, ticks: [5] });
  });
});
