// A body with a motion nothing resists, which the loads do not drive (the contract's MECHANISM
// warning), says so whatever its headline: a lift-off or a tip does not hide it.
import { describe, expect, it } from "vitest";
import { parseSketch, solve } from "@/solver/index";
import { statusSentences } from "@/components/results/statusSentence";

const doc = (uplift: number) => ({
  format: "counterpoise.sketch",
  version: 1,
  title: "Hold-down",
  parameters: {},
  bodies: [{ id: "b", label: "Beam", outline: [[-1, 0], [2, 0], [2, 0.2], [-1, 0.2]], mass: 0 }],
  supports: [
    { id: "A", body: "b", kind: "contact", at: [0, 0], angle: 90, label: "left pad" },
    { id: "B", body: "b", kind: "contact", at: [2, 0], angle: 90, label: "right pad" },
    { id: "T", body: "b", kind: "tie", at: [0.5, 0], angle: -90, label: "hold-down" },
  ],
  loads: [
    { id: "W", body: "b", kind: "force", at: [1, 0.2], fx: 0, fy: -1000 },
    { id: "P", body: "b", kind: "force", at: [-1, 0.2], fx: 0, fy: uplift },
  ],
  ports: [],
  massSources: [],
});

function sentence(uplift: number) {
  const p = parseSketch(doc(uplift));
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const result = solve(p.sketch);
  return { result, s: statusSentences(p.sketch, result)[0] };
}

describe("a mechanism the loads do not drive, in words", () => {
  it("a beam on two pads and a hold-down, lifted at one end: the tie takes over, and nothing resists x is said", () => {
    // statics (common practice): 3 kN up at x = −1, 1 kN down at x = 1; the left pad at x = 0 would
    // have to pull, so it lifts and the hold-down at x = 0.5 engages. Moments about the right pad
    // (x = 2): T·1.5 = 3·3 − 1·1 → T = 5.333 kN; the right pad B = 1 + 5.333 − 3 = 3.333 kN
    const { result, s } = sentence(3000);
    expect(result.bodies.b.status).toBe("lifts");
    expect(result.reactions.T.n).toBeCloseTo(5333.33, 1);
    expect(result.reactions.B.n).toBeCloseTo(3333.33, 1);
    expect(result.reactions.A.state).toBe("lifted");
    expect(s.headline).toBe("Lifts off at the left pad — the right pad and the hold-down still hold the body");
    expect(s.details).toContain("Nothing resists motion in x, but the loads do not push that way; any load that does will move it.");
  });

  it("without the uplift the hold-down goes slack (the pads carry 0.5 kN each), and the same line is there", () => {
    const { result, s } = sentence(0);
    expect(result.reactions.A.n).toBeCloseTo(500, 6);
    expect(result.reactions.T.state).toBe("slack");
    expect(s.details).toContain("Nothing resists motion in x, but the loads do not push that way; any load that does will move it.");
  });

  it("a body that holds says it in the headline only, not twice", () => {
    const p = parseSketch({ ...doc(0), supports: doc(0).supports.slice(0, 2) });
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const [s] = statusSentences(p.sketch, solve(p.sketch));
    expect(s.headline).toBe("Holds only as drawn — nothing resists motion in x, but the loads do not push that way; any load that does will move it");
    expect(s.details.join(" ")).not.toMatch(/Nothing resists/);
  });
});

describe("a body free to move in x says the acceleration found", () => {
  it("a 100 kg block on two frictionless pads pushed by 500 N: ax = F/m = 5 m/s² (Newton's second law)", () => {
    const p = parseSketch({
      format: "counterpoise.sketch",
      version: 1,
      title: "Cart",
      parameters: {},
      bodies: [{ id: "b", label: "Cart", outline: [[0, 0], [2, 0], [2, 2], [0, 2]], mass: 100, cg: [1, 1] }],
      supports: [
        { id: "A", body: "b", kind: "contact", at: [0, 0], angle: 90, label: "rear wheel" },
        { id: "B", body: "b", kind: "contact", at: [2, 0], angle: 90, label: "front wheel" },
      ],
      loads: [{ id: "F", body: "b", kind: "force", at: [0, 1.5], fx: 500, fy: 0 }],
      ports: [],
      massSources: [],
      motion: { freeX: true },
    });
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const result = solve(p.sketch);
    expect(result.bodies.b.acceleration.ax).toBeCloseTo(5, 12);
    // d'Alembert, moments about the rear wheel: B·2 = W·1 + F·1.5 − m·ax·1 = 980.7 + 750 − 500 → B = 615.3 N
    expect(result.reactions.B.n).toBeCloseTo(615.3325, 3);
    const [si] = statusSentences(p.sketch, result);
    expect(si.details).toContain("Free to move in x: the loads accelerate it at ax = 5 m/s² (its inertial force −m·ax acts at its centre of gravity).");
    // 5 m/s² / 0.3048 m/ft = 16.40 ft/s² (NIST SP 811: 1 ft = 0.3048 m)
    const [us] = statusSentences(p.sketch, result, "US");
    expect(us.details).toContain("Free to move in x: the loads accelerate it at ax = 16.4 ft/s² (its inertial force −m·ax acts at its centre of gravity).");
  });
});
