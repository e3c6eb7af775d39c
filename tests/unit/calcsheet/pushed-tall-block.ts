// A ballasted block pushed high, with an uplift check in which one pad is over its own μ while the
// block as a whole has friction to spare: for the calc sheet tests.

/**
 * A 2 m wide, 3 m tall ballasted block (1000 kg, centre of gravity at (1, 0.5) m) on two contacts
 * at x = 0.1 m and 1.9 m (μ = 0.5), pushed sideways by P = 2 kN at 2.5 m. The uplift check
 * 0.9 × weight + 1.5 × push, rigid-block statics (common practice):
 *   0.9·W = 0.9 × 1000 kg × 9.80665 m/s² = 8826 N; 1.5·P = 3000 N
 *   about the downwind contact: restoring 8826 × 0.9 = 7943 N·m, overturning 3000 × 2.5 = 7500 N·m
 *   upwind n = (7943 − 7500) / 1.8 = 246 N; each contact takes t = 1500 N (equal stiffness)
 *   upwind: μ·n = 123 N < 1500 N, so it alone needs more friction than μ gives ("slips");
 *   the body: μ·Σn / Σt = 0.5 × 8826 / 3000 = 1.47 ≥ 1.0 required, so it passes sliding.
 */
export function pushedTallBlock() {
  return {
    format: "counterpoise.sketch",
    version: 6,
    title: "Ballasted block pushed high",
    parameters: { P: "2 kN" },
    bodies: [{ id: "block", label: "Block", outline: [[0, 0], [2, 0], [2, 3], [0, 3]], mass: "1000 kg", cg: [1, 0.5] }],
    supports: [
      { id: "up", label: "upwind pad", body: "block", kind: "contact", at: [0.1, 0], angle: 90, mu: 0.5 },
      { id: "down", label: "downwind pad", body: "block", kind: "contact", at: [1.9, 0], angle: 90, mu: 0.5 },
    ],
    loads: [{ id: "push", label: "push", body: "block", group: "wind", kind: "force", at: [0, 2.5], magnitude: "P", angle: 0 }],
    ports: [],
    massSources: [],
    cases: [
      { id: "weight", name: "Weight only", factors: { wind: 0 }, onlyInCombinations: true },
      { id: "push", name: "Push only", factors: { dead: 0 }, onlyInCombinations: true },
    ],
    combinations: [{ id: "uplift", name: "Uplift check", terms: [{ case: "weight", factor: 0.9 }, { case: "push", factor: 1.5 }], stability: { overturning: 1, sliding: 1 } }],
  };
}
