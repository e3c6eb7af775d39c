// Invalid sweep points are gathered into stretches of neighbours failing for the same reasons.
import { describe, expect, it } from "vitest";
import { invalidStretches } from "@/components/studies/sweepErrors";

const mass = [{ path: "bodies[0].mass", message: "must be zero or more (kg)" }];
const gravity = [{ path: "gravity", message: "must not be negative" }];

describe("invalidStretches", () => {
  it("joins neighbours with the same errors and splits at a solved point or other errors", () => {
    const statuses = ["error", "error", "holds", "error", "error", "error"];
    const errors = [
      { value: -3, errors: mass },
      { value: -2, errors: mass },
      { value: 0, errors: mass },
      { value: 1, errors: mass },
      { value: 2, errors: gravity },
    ];
    expect(invalidStretches({ statuses, errors })).toEqual([
      { from: -3, to: -2, count: 2, errors: mass },
      { from: 0, to: 1, count: 2, errors: mass },
      { from: 2, to: 2, count: 1, errors: gravity },
    ]);
  });

  it("gives nothing when every point solved", () => {
    expect(invalidStretches({ statuses: ["holds", "lifts"], errors: [] })).toEqual([]);
  });
});
