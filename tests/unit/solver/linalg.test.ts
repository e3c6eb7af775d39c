// The 3 × 3 eigen-solver and pseudo-inverse, cross-checked against ml-matrix (a general-purpose
// linear algebra package from the registry) on seeded random systems.
import fc from "fast-check";
import { EigenvalueDecomposition, Matrix, pseudoInverse } from "ml-matrix";
import { describe, expect, it } from "vitest";
import { addOuter, eigenSym3, solvePsd, zeroMat3, type Vec3 } from "@/solver/linalg";

// Components on a 0.01 grid in [−10, 10], like the directions and lever arms of real supports.
const component = fc.integer({ min: -1000, max: 1000 }).map((x) => x / 100);
const vec = fc.tuple(component, component, component);

function psd(rows: Vec3[], weights: number[]) {
  const m = zeroMat3();
  rows.forEach((g, i) => addOuter(m, g, weights[i]));
  return m;
}

describe("linear algebra against ml-matrix", () => {
  it("eigenvalues of random symmetric positive semi-definite matrices", () => {
    fc.assert(
      fc.property(fc.array(vec, { minLength: 1, maxLength: 6 }), fc.array(fc.double({ min: 0.1, max: 100, noNaN: true }), { minLength: 6, maxLength: 6 }), (rows, w) => {
        const m = psd(rows, w);
        const ours = eigenSym3(m).values;
        const ref = new EigenvalueDecomposition(new Matrix([[m[0], m[1], m[2]], [m[3], m[4], m[5]], [m[6], m[7], m[8]]]), { assumeSymmetric: true })
          .realEigenvalues.slice()
          .sort((a, b) => b - a);
        const scale = Math.max(1, Math.abs(ref[0]));
        ours.forEach((v, i) => expect(Math.abs(v - ref[i])).toBeLessThanOrEqual(1e-9 * scale));
      }),
      { seed: 20261201, numRuns: 300 },
    );
  }, 120_000);

  it("the least-norm solution equals the Moore–Penrose pseudo-inverse times b", () => {
    fc.assert(
      fc.property(fc.array(vec, { minLength: 1, maxLength: 5 }), vec, (rows, b) => {
        const m = psd(rows, rows.map(() => 1));
        const full = new Matrix([[m[0], m[1], m[2]], [m[3], m[4], m[5]], [m[6], m[7], m[8]]]);
        const ours = solvePsd(m, b);
        const ref = pseudoInverse(full, 1e-10).mmul(Matrix.columnVector(b)).to1DArray();
        const scale = Math.max(1, ...ref.map(Math.abs));
        ours.x.forEach((v, i) => expect(Math.abs(v - ref[i])).toBeLessThanOrEqual(1e-6 * scale));
        // and what is left over lies in the null space: H · nullPart = 0
        const hn = full.mmul(Matrix.columnVector(ours.nullPart)).to1DArray();
        hn.forEach((v) => expect(Math.abs(v)).toBeLessThanOrEqual(1e-7 * Math.max(1, full.norm())));
      }),
      { seed: 7, numRuns: 300 },
    );
  }, 120_000);

  it("rank of a rank-deficient matrix", () => {
    const m = psd([[1, 0, 0], [2, 0, 0]], [1, 1]);
    expect(solvePsd(m, [1, 1, 0]).rank).toBe(1);
    expect(solvePsd(m, [1, 1, 0]).nullPart).toEqual([0, 1, 0]);
  });
});
