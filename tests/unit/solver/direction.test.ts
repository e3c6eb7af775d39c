// The unit vector of an angle: exact at the quarter turns, cos/sin elsewhere, whichever path
// computes it (the whole quarter turns are told by integer arithmetic, the rest by a remainder).
import { describe, expect, it } from "vitest";
import { direction } from "@/solver/geometry";

/** The reference: the remainder of the angle over a full turn, snapped at the quarter turns. */
function reference(angleDeg: number): [number, number] {
  const r = ((angleDeg % 360) + 360) % 360;
  if (r === 0) return [1, 0];
  if (r === 90) return [0, 1];
  if (r === 180) return [-1, 0];
  if (r === 270) return [0, -1];
  const a = angleDeg * (Math.PI / 180);
  return [Math.cos(a), Math.sin(a)];
}

describe("direction", () => {
  it.each([
    [0, [1, 0]],
    [90, [0, 1]],
    [180, [-1, 0]],
    [270, [0, -1]],
    [-90, [0, -1]],
    [-180, [-1, 0]],
    [-270, [0, 1]],
    [360, [1, 0]],
    [-720, [1, 0]],
    [450, [0, 1]],
  ] as const)("%s° is exactly %j (no 6e-17 left over)", (deg, v) => {
    expect(direction(deg)).toEqual(v);
  });

  it("-0° is +x", () => {
    expect(direction(-0)).toEqual([1, 0]);
  });

  it("30° is (√3/2, 1/2) (common practice)", () => {
    const [x, y] = direction(30);
    expect(x).toBeCloseTo(Math.sqrt(3) / 2, 15);
    expect(y).toBeCloseTo(0.5, 15);
  });

  it("gives bit for bit the reference's answer: angles near, at and far past the quarter turns", () => {
    const angles = [
      1e-20, -1e-20, 89.99999999999999, 90.00000000000001, 359.99999999999994, -5e-324, 1e300, -1e300,
      90 * 2 ** 31, 90 * 2 ** 31 + 90, -90 * 2 ** 31, -90 * 2 ** 31 - 90, 90 * 2 ** 40, NaN, Infinity, -Infinity,
    ];
    // a seeded walk (a linear congruential generator) over wide whole and fractional angles
    let seed = 12345;
    const next = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
    for (let i = 0; i < 3000; i++) {
      angles.push((next() - 0.5) * 1e4, Math.round((next() - 0.5) * 1e7) * 90, Math.round((next() - 0.5) * 100) * 90 * (1 + (next() - 0.5) * 1e-15));
    }
    for (const a of angles) {
      const got = direction(a);
      const want = reference(a);
      expect(Object.is(got[0], want[0]) && Object.is(got[1], want[1]), `direction(${a})`).toBe(true);
    }
  });
});
