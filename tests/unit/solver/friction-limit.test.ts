// Bodies the gripping-friction model cannot settle (no engagement is consistent: engaged, a
// friction contact's grip makes it pull; released, the body closes it), and the margin through
// the onset of tipping. Each class was found by a seeded random search of boxes on contacts.
import { describe, expect, it } from "vitest";
import { solve, type SketchFileInput } from "@/solver";
import { G0 } from "@/solver/constants";
import { box, expectRel, parsed, sketch } from "./helpers";

const sind = (d: number) => Math.sin((d * Math.PI) / 180);
const cosd = (d: number) => Math.cos((d * Math.PI) / 180);

describe("friction that only Coulomb's law settles", () => {
  it("held with a contact sliding at the friction limit: statics gives its force, and the answer says it depends on the loading", () => {
    // A 2 m × 3 m box of 50 kg. On its right corner (2, 0) a contact with μ = 0.5 pushes at 1°
    // (right and a little up); at its left corner (0, 0) two contacts push left, one with μ = 0.5.
    // A force (35, −249) N acts at (2, 0). Gripping, the right contact would have to pull;
    // released, the box closes on it. Coulomb's law: it presses and slides, t = μ·n (common
    // practice). Moments about (0, 0), where the left contacts act (statics):
    //   2·(n·sin 1° + μ·n·cos 1°) = 2·249 + 1·W   →   n = (498 + W) / (2·(sin 1° + μ·cos 1°)).
    const W = 50 * G0;
    const res = solve(
      parsed(
        sketch({
          bodies: [{ id: "b", outline: box(2, 3), mass: 50 }],
          supports: [
            { id: "A", body: "b", kind: "contact", at: [2, 0], angle: 1, mu: 0.5 },
            { id: "B", body: "b", kind: "contact", at: [0, 0], angle: 180 },
            { id: "C", body: "b", kind: "contact", at: [0, 0], angle: 180, mu: 0.5 },
          ],
          loads: [{ id: "P", body: "b", kind: "force", at: [2, 0], fx: 35, fy: -249 }],
        }),
      ),
    );
    expect(res.bodies.b.status).toBe("holds");
    expect(res.bodies.b.residual).toEqual({ fx: 0, fy: 0, m: 0 });
    const nA = (498 + W) / (2 * (sind(1) + 0.5 * cosd(1)));
    expectRel(res.reactions.A.n!, nA, 1e-9);
    expectRel(res.reactions.A.t!, 0.5 * nA, 1e-9);
    for (const id of ["A", "B", "C"]) expect(res.reactions[id].n!).toBeGreaterThanOrEqual(0);
    expect(Math.abs(res.reactions.C.t!)).toBeLessThanOrEqual(0.5 * res.reactions.C.n! * (1 + 1e-9));
    const w = res.warnings.find((x) => x.code === "INDETERMINATE" && x.ids.includes("A"));
    expect(w?.message).toMatch(/sliding at the friction limit.*order of loading/);
    expect(res.warnings.map((x) => x.code)).not.toContain("SLIP");
  });

  it("friction that cannot balance the loads: the body slides, and the result says how it moves", () => {
    // A 3 m × 1.9 m box of 683 kg with a 1734 N·m couple, on two contacts with μ = 0.5 that push
    // at 3° and at −8° (both nearly +x). Along x only the contacts act:
    //   n₁(cos 3° − μ·sin 3°) + n₂(cos 8° − μ·sin 8°) ≤ Σ x-forces = 0,
    // both brackets are positive, so n₁ = n₂ = 0, no friction, and nothing carries the weight
    // (statics with Coulomb friction: a contact grips only as hard as it is pressed).
    const res = solve(
      parsed(
        sketch({
          bodies: [{ id: "b", outline: box(3, 1.9), mass: 683 }],
          supports: [
            { id: "s0", body: "b", kind: "contact", at: [1.2, 0.38], angle: 3, mu: 0.5 },
            { id: "s1", body: "b", kind: "contact", at: [1.5, 0], angle: 352, mu: 0.5 },
          ],
          loads: [{ id: "c", body: "b", kind: "couple", value: 1734 }],
        }),
      ),
    );
    expect(res.bodies.b.status).toBe("tips");
    expect(res.bodies.b.freeMotion).toBeDefined();
    const w = res.warnings.find((x) => x.code === "SLIP" && x.ids.length === 2);
    expect(w?.ids).toEqual(["s0", "s1"]);
    expect(w?.message).toMatch(/cannot balance the loads/);
  });

  it("jamming: friction could hold it under a preload, so the answer says it depends on stiffness and order of loading", () => {
    // A massless 1 m × 2 m box pinned at (0.5, 2), on a contact with μ = 0.5 straight below the
    // pin at (0.5, 0), pulled up by 1000 N on that line and turned by a 500 N·m couple.
    // Rigid statics: the pin and the contact act on one line, so n is not fixed by statics, and
    // any n ≥ 500 / (2·μ) = 500 N would let friction at 2 m from the pin hold the couple (a
    // jammed body, common practice). Loaded from zero, equal springs on one line share the
    // 1000 N pull equally (common practice): the contact would have to pull 500 N, so it lifts
    // and the couple turns the box about the pin.
    const res = solve(
      parsed(
        sketch({
          bodies: [{ id: "b", outline: box(1, 2), mass: 0 }],
          supports: [
            { id: "pin", body: "b", kind: "pin", at: [0.5, 2] },
            { id: "foot", body: "b", kind: "contact", at: [0.5, 0], angle: 90, mu: 0.5 },
          ],
          loads: [
            { id: "F", body: "b", kind: "force", at: [0.5, 1], fx: 0, fy: 1000 },
            { id: "C", body: "b", kind: "couple", value: 500 },
          ],
        }),
      ),
    );
    expect(res.bodies.b.status).toBe("tips");
    expect(res.bodies.b.freeMotion).toEqual({ kind: "rotation", about: [0.5, 2] });
    expectRel(res.reactions.foot.n!, -500, 1e-9);
    const w = res.warnings.find((x) => x.code === "SLIP" && x.ids.includes("foot"));
    expect(w?.message).toMatch(/preload could jam it.*stiffnesses and the order of loading/);
  });
});

describe("the margin goes through zero where the body starts to tip", () => {
  // A 1 m wide, 3 m tall block of 1000 kg (cg at x = 0.5) on level contacts with μ = 0.8, pushed
  // in +x at h = 2 m. It tips about its front corner (x = b = 1) at P = W·b/(2h) (common practice).
  const W = 1000 * G0;
  const b = 1;
  const h = 2;
  const Pc = (W * b) / (2 * h);
  const block = (xs: number[], P: number): SketchFileInput =>
    sketch({
      bodies: [{ id: "b", outline: box(b, 3), mass: 1000, cg: [b / 2, 1.5] }],
      supports: xs.map((x, i) => ({ id: `c${i}`, body: "b", kind: "contact" as const, at: [x, 0] as [number, number], angle: 90, mu: 0.8 })),
      loads: [{ id: "P", body: "b", kind: "force", at: [0, h], fx: P, fy: 0 }],
    });
  const factors = [0.99, 0.999, 0.9999, 1.0001, 1.001, 1.01];

  it("on its two corners: the rear margin is W/2 − P·h/b on both sides", () => {
    // moments about the front corner (statics): n_rear·b = W·b/2 − P·h
    for (const f of factors) {
      const res = solve(parsed(block([0, b], f * Pc)));
      expect(res.bodies.b.status).toBe(f < 1 ? "holds" : "tips");
      expectRel(res.reactions.c0.margin!, W / 2 - (f * Pc * h) / b, 1e-6);
    }
  });

  it("on three contacts: the middle one's margin is W − 2·P·h/b on both sides, with no jump", () => {
    // The rear contact has lifted already; the block stands on the middle (x = b/2) and the
    // front. Moments about the front corner (statics): n_mid·b/2 = W·b/2 − P·h.
    const margins: number[] = [];
    for (const f of factors) {
      const res = solve(parsed(block([0, b / 2, b], f * Pc)));
      expect(res.bodies.b.status).toBe(f < 1 ? "lifts" : "tips");
      expect(res.reactions.c0.margin!).toBeLessThan(0);
      expectRel(res.reactions.c1.margin!, W - (2 * f * Pc * h) / b, 1e-6);
      margins.push(res.reactions.c1.margin!);
    }
    // it approaches 0 from both sides: the last point before and the first after are within 0.02 % of W
    expect(Math.abs(margins[2])).toBeLessThan(2e-4 * W);
    expect(Math.abs(margins[3])).toBeLessThan(2e-4 * W);
    expect(margins[2]).toBeGreaterThan(0);
    expect(margins[3]).toBeLessThan(0);
  });
});
