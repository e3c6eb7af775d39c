// Static determinacy of the supports as drawn, every one taken as bilateral: rank of the
// support directions (with motion.freeX, the free acceleration counts as one more unknown).
import { addOuter, clearlyFullRank, eigenSym3, norm3, zeroMat3, type Vec3 } from "./linalg";
import type { BodyModel } from "./model";
import type { Determinacy } from "./types";

export interface DeterminacyOutput {
  determinacy: Determinacy;
  /** with a mechanism: the motions nothing resists (scaled generalized directions) */
  freeMotions: Vec3[];
  /** reactions beyond those the resisted directions need: three contacts in a row under a beam
   *  leave it free to slide and still share its weight by their stiffnesses (unknowns − rank) */
  redundant: number;
}

export function determinacyOf(model: BodyModel): DeterminacyOutput {
  const gram = zeroMat3();
  let unknowns = 0;
  for (const s of model.springs) {
    const n = norm3(s.g);
    if (n > 0) addOuter(gram, s.g, 1 / (n * n));
    unknowns++;
  }
  if (model.freeX) {
    unknowns++;
    const m = model.body.mass;
    if (m > 0) {
      // the inertial force −m·ax at the centre of gravity, per unit ax
      const col = [-m, 0, (m * (model.cg[1] - model.origin[1])) / model.L];
      addOuter(gram, col, 1 / (norm3(col) ** 2));
    }
  }
  let rank = 3;
  const freeMotions: Vec3[] = [];
  if (!clearlyFullRank(gram)) {
    const { values, vectors } = eigenSym3(gram);
    const tol = Math.max(values[0], 1e-300) * 1e-10;
    rank = values.filter((v) => v > tol).length;
    values.forEach((v, i) => {
      if (!(v > tol)) freeMotions.push(vectors[i]);
    });
  }
  const redundant = Math.max(0, unknowns - rank);
  if (rank < 3) return { determinacy: { kind: "mechanism", degree: 3 - rank }, freeMotions, redundant };
  if (unknowns > 3) return { determinacy: { kind: "indeterminate", degree: unknowns - 3 }, freeMotions, redundant };
  return { determinacy: { kind: "determinate", degree: 0 }, freeMotions, redundant };
}
