// Small dense linear algebra for the 3 × 3 systems of a rigid body in the plane.
// Matrices are row-major arrays of 9 (plain arrays: cheaper to make than typed ones); vectors [a, b, c].

export type Vec3 = [number, number, number];
export type Mat3 = number[];

export function zeroMat3(): Mat3 {
  return [0, 0, 0, 0, 0, 0, 0, 0, 0];
}

/** M += k · g gᵀ */
export function addOuter(m: Mat3, g: ArrayLike<number>, k: number): void {
  const a = g[0];
  const b = g[1];
  const c = g[2];
  m[0] += k * a * a;
  m[1] += k * a * b;
  m[2] += k * a * c;
  m[4] += k * b * b;
  m[5] += k * b * c;
  m[8] += k * c * c;
  m[3] = m[1];
  m[6] = m[2];
  m[7] = m[5];
}

export interface Eigen3 {
  /** eigenvalues, descending */
  values: Vec3;
  /** eigenvectors as rows, unit length, matching `values` */
  vectors: [Vec3, Vec3, Vec3];
}

/** Eigen-decomposition of a symmetric 3 × 3 matrix by cyclic Jacobi rotations. */
export function eigenSym3(input: Mat3): Eigen3 {
  // Work on the matrix scaled to unit size: no overflow or denormals in the rotations.
  let size = 0;
  for (let i = 0; i < 9; i++) size = Math.max(size, Math.abs(input[i]));
  if (!(size > 1e-290) || !Number.isFinite(size)) {
    return { values: [0, 0, 0], vectors: [[1, 0, 0], [0, 1, 0], [0, 0, 1]] };
  }
  const a = input.map((x) => x / size);
  // v holds eigenvectors as columns
  const v = [1, 0, 0, 0, 1, 0, 0, 0, 1];
  for (let sweep = 0; sweep < 50; sweep++) {
    const off = a[1] * a[1] + a[2] * a[2] + a[5] * a[5];
    const diag = a[0] * a[0] + a[4] * a[4] + a[8] * a[8];
    if (off <= 1e-30 * diag || off === 0) break;
    for (let p = 0; p < 2; p++) {
      for (let q = p + 1; q < 3; q++) {
        const apq = a[p * 3 + q];
        if (apq === 0) continue;
        const app = a[p * 3 + p];
        const aqq = a[q * 3 + q];
        const theta = (aqq - app) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < 3; k++) {
          const akp = a[k * 3 + p];
          const akq = a[k * 3 + q];
          a[k * 3 + p] = c * akp - s * akq;
          a[k * 3 + q] = s * akp + c * akq;
        }
        for (let k = 0; k < 3; k++) {
          const apk = a[p * 3 + k];
          const aqk = a[q * 3 + k];
          a[p * 3 + k] = c * apk - s * aqk;
          a[q * 3 + k] = s * apk + c * aqk;
        }
        for (let k = 0; k < 3; k++) {
          const vkp = v[k * 3 + p];
          const vkq = v[k * 3 + q];
          v[k * 3 + p] = c * vkp - s * vkq;
          v[k * 3 + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  const order = [0, 1, 2].sort((i, j) => a[j * 4] - a[i * 4]);
  const values = order.map((i) => a[i * 4] * size) as Vec3;
  const vectors = order.map((i) => [v[i], v[3 + i], v[6 + i]]) as [Vec3, Vec3, Vec3];
  return { values, vectors };
}

export interface PseudoSolve {
  /** least-norm solution of H x = b on the range of H */
  x: Vec3;
  /** the part of b in the null space of H (what H cannot balance) */
  nullPart: Vec3;
  /** number of eigenvalues above the tolerance */
  rank: number;
}

/**
 * det(H) / (trace/3)³ above this means λmin/λmax > 3.7e-9, so H is safely of full rank (by the
 * eigenvalue test too) and can be inverted directly: the common, fast case.
 */
const WELL_CONDITIONED = 1e-7;

function det3(h: Mat3): number {
  return h[0] * (h[4] * h[8] - h[5] * h[7]) - h[1] * (h[3] * h[8] - h[5] * h[6]) + h[2] * (h[3] * h[7] - h[4] * h[6]);
}

/** Is a positive semi-definite H clearly of full rank? */
export function clearlyFullRank(h: Mat3): boolean {
  const tr = (h[0] + h[4] + h[8]) / 3;
  return tr > 0 && det3(h) > WELL_CONDITIONED * tr * tr * tr;
}

/** Solve H x = b for symmetric positive semi-definite H, splitting off H's null space. */
export function solvePsd(h: Mat3, b: Vec3, relTol = 1e-10): PseudoSolve {
  if (clearlyFullRank(h)) {
    const d = det3(h);
    const c00 = h[4] * h[8] - h[5] * h[7];
    const c01 = h[2] * h[7] - h[1] * h[8];
    const c02 = h[1] * h[5] - h[2] * h[4];
    const c11 = h[0] * h[8] - h[2] * h[6];
    const c12 = h[2] * h[3] - h[0] * h[5];
    const c22 = h[0] * h[4] - h[1] * h[3];
    return {
      x: [(c00 * b[0] + c01 * b[1] + c02 * b[2]) / d, (c01 * b[0] + c11 * b[1] + c12 * b[2]) / d, (c02 * b[0] + c12 * b[1] + c22 * b[2]) / d],
      nullPart: [0, 0, 0],
      rank: 3,
    };
  }
  const { values, vectors } = eigenSym3(h);
  const tol = Math.max(values[0], 0) * relTol;
  const x: Vec3 = [0, 0, 0];
  const nullPart: Vec3 = [0, 0, 0];
  let rank = 0;
  for (let i = 0; i < 3; i++) {
    const vec = vectors[i];
    const proj = vec[0] * b[0] + vec[1] * b[1] + vec[2] * b[2];
    if (values[i] > tol && values[i] > 0) {
      rank++;
      const f = proj / values[i];
      x[0] += f * vec[0];
      x[1] += f * vec[1];
      x[2] += f * vec[2];
    } else {
      nullPart[0] += proj * vec[0];
      nullPart[1] += proj * vec[1];
      nullPart[2] += proj * vec[2];
    }
  }
  return { x, nullPart, rank };
}

export const dot3 = (a: ArrayLike<number>, b: ArrayLike<number>) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const norm3 = (a: ArrayLike<number>) => Math.sqrt(dot3(a, a));
