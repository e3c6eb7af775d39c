// A body that tips says how it would move (freeMotion), and the motion is one its supports allow:
// bilateral supports do not move, no contact that stays closed is pushed into or slid along
// (friction), no contact or tie is pushed or pulled the wrong way, and the loads do work on it.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solve, type SketchFileInput, type Sketch, type SolveResult, type Vec2 } from "@/solver";
import { G0 } from "@/solver/constants";
import { box, loadFixture, parsed, sketch } from "./helpers";

/** Why `freeMotion` is not a motion the supports allow (null when it is). */
function inadmissible(sk: Sketch, res: SolveResult, bodyId: string): string | null {
  const fm = res.bodies[bodyId].freeMotion;
  if (!fm) return "no freeMotion";
  // velocity of a point for a unit rate w (a rotation's sense is not reported: the loads pick it)
  const vel = (p: Vec2, w: number): Vec2 => {
    if (fm.kind === "translation") {
      const a = (fm.angle * Math.PI) / 180;
      return [w * Math.cos(a), w * Math.sin(a)];
    }
    return [-w * (p[1] - fm.about[1]), w * (p[0] - fm.about[0])];
  };
  // power of every known load: forces, couples, weight, pressure, inertia, less the momentum flux
  const eq = res.equations[bodyId];
  const power = (w: number) => {
    let s = 0;
    for (const t of eq.forces) {
      if (t.kind === "reaction") continue;
      if (t.at) {
        const v = vel(t.at, w);
        s += t.fx * v[0] + t.fy * v[1];
      }
      if (fm.kind === "rotation") s += t.m * w;
    }
    for (const t of eq.momentum) {
      const v = vel(t.at!, w);
      s -= t.fx * v[0] + t.fy * v[1];
    }
    return s;
  };
  const w = power(1) >= power(-1) ? 1 : -1;
  if (!(power(w) > 0)) return "the loads do no work on it";
  const reach = Math.max(...sk.bodies.flatMap((b) => b.outline.flat().map(Math.abs)), 1);
  const eps = 1e-6 * (fm.kind === "rotation" ? reach + Math.hypot(...fm.about) : 1);
  for (const s of sk.supports.filter((x) => x.body === bodyId)) {
    const v = vel(s.at, w);
    const along = (deg: number) => v[0] * Math.cos((deg * Math.PI) / 180) + v[1] * Math.sin((deg * Math.PI) / 180);
    if (s.kind === "pin" && Math.hypot(...v) > eps) return `pin ${s.id} moves`;
    if (s.kind === "fixed" && (fm.kind === "rotation" || Math.hypot(...v) > eps)) return `fixed support ${s.id} moves`;
    if (s.kind === "roller" && Math.abs(along(s.angle)) > eps) return `roller ${s.id} moves along its line`;
    if (s.kind === "contact" && along(s.angle) < -eps) return `contact ${s.id} is pushed into`;
    if (s.kind === "tie" && along(s.angle) < -eps) return `tie ${s.id} is stretched`;
    // a closed friction contact may slide only where the result says friction cannot hold it
    const slips = res.warnings.some((x) => x.code === "SLIP" && x.ids.includes(s.id) && x.message.includes("slides along"));
    if (s.kind === "contact" && s.mu !== undefined && !slips && along(s.angle) <= eps && Math.abs(along(s.angle + 90)) > eps) return `contact ${s.id} slides while closed`;
  }
  return null;
}

type Pt = [number, number];
type Kind = "pin" | "roller" | "contact" | "tie" | "fixed";
const tenth = fc.integer({ min: 0, max: 10 }).map((i) => i / 10);
const angle = fc.integer({ min: 0, max: 359 });
/** A random box on up to four supports of the given kinds, with forces and a couple. */
const scenarioOf = (kinds: Kind[]) =>
  fc.record({
    w: fc.integer({ min: 5, max: 30 }).map((x) => x / 10),
    h: fc.integer({ min: 5, max: 30 }).map((x) => x / 10),
    mass: fc.integer({ min: 0, max: 2000 }),
    supports: fc.array(fc.record({ kind: fc.constantFrom(...kinds), at: fc.tuple(tenth, tenth), angle, friction: fc.boolean() }), { minLength: 1, maxLength: 4 }),
    forces: fc.array(fc.record({ at: fc.tuple(tenth, tenth), magnitude: fc.integer({ min: 0, max: 5000 }), angle }), { maxLength: 3 }),
    couple: fc.integer({ min: -3000, max: 3000 }),
  });
type Scenario = ReturnType<typeof scenarioOf> extends fc.Arbitrary<infer T> ? T : never;
const build = (r: Scenario, withFriction: boolean): SketchFileInput => {
  const P = ([a, b]: Pt): Pt => [a * r.w, b * r.h];
  return sketch({
    bodies: [{ id: "b", outline: box(r.w, r.h), mass: r.mass }],
    supports: r.supports.map((s, i) => {
      const base = { id: `s${i}`, body: "b", at: P(s.at) };
      if (s.kind === "pin" || s.kind === "fixed") return { ...base, kind: s.kind };
      if (s.kind === "contact") return { ...base, kind: "contact" as const, angle: s.angle, ...(withFriction && s.friction ? { mu: 0.5 } : {}) };
      return { ...base, kind: s.kind, angle: s.angle };
    }),
    loads: [
      ...r.forces.map((f, i) => ({ id: `f${i}`, body: "b", kind: "force" as const, at: P(f.at), magnitude: f.magnitude, angle: f.angle })),
      { id: "c", body: "b", kind: "couple" as const, value: r.couple },
    ],
  });
};

describe("a body that tips says how it moves", () => {
  // The thrust stand (tests/fixtures/sketches/thrust-stand-tips.json) with its rear pad raised to
  // y = 0.2: tipping about the front pin at (1.6, 0) moves the pad up and sideways, so a pad
  // with friction opens while it slides. Moments about the pin (statics): the pad would have to
  // pull, so the stand tips; the pin is the only point that stays put.
  for (const mu of [0.5, 0, undefined]) {
    it(`the raised rear pad${mu === undefined ? " without friction" : ` with μ = ${mu}`}: rotation about the front pin`, () => {
      const doc = loadFixture("thrust-stand-tips.json");
      const rear = doc.supports!.find((s) => s.id === "rear")!;
      Object.assign(rear, { at: [0, 0.2] }, mu === undefined ? {} : { mu });
      const sk = parsed(doc);
      const res = solve(sk);
      expect(res.bodies.stand.status).toBe("tips");
      expect(res.bodies.stand.freeMotion).toEqual({ kind: "rotation", about: [1.6, 0] });
      expect(inadmissible(sk, res, "stand")).toBeNull();
      expect(res.reactions.rear.state).toBe("lifted");
    });
  }

  const scenario = scenarioOf(["pin", "roller", "contact", "contact", "tie"]);

  it("without friction contacts, every tips result has a freeMotion the supports allow", () => {
    let tips = 0;
    fc.assert(
      fc.property(scenario, (r) => {
        const sk = parsed(build(r, false));
        const res = solve(sk);
        if (res.bodies.b.status !== "tips") return;
        tips++;
        expect(inadmissible(sk, res, "b")).toBeNull();
      }),
      { seed: 2718, numRuns: 600 },
    );
    expect(tips).toBeGreaterThan(50); // the property was exercised
  }, 120_000);

  it("with friction contacts, a reported freeMotion is one the supports allow", () => {
    let withMotion = 0;
    fc.assert(
      fc.property(scenario, (r) => {
        const sk = parsed(build(r, true));
        const res = solve(sk);
        if (res.bodies.b.status !== "tips" || !res.bodies.b.freeMotion) return;
        withMotion++;
        expect(inadmissible(sk, res, "b")).toBeNull();
      }),
      { seed: 3141, numRuns: 600 },
    );
    expect(withMotion).toBeGreaterThan(50);
  }, 120_000);
});

describe("friction never makes a held body tip", () => {
  // Friction only adds restraint: whatever normal forces alone hold, the same body with friction
  // holds too (t = 0 meets equilibrium, n ≥ 0, the gaps and |t| ≤ μ·n) — common practice of
  // rigid-body statics. A fixed support alone resists any load, so a body on one never tips.
  const scenario = scenarioOf(["pin", "roller", "contact", "contact", "tie", "fixed"]);

  it("held without friction ⇒ held with it; on a fixed support ⇒ held", () => {
    let compared = 0;
    fc.assert(
      fc.property(scenario, (r) => {
        if (!r.supports.some((s) => s.kind === "contact" && s.friction)) return;
        const without = solve(parsed(build(r, false))).bodies.b.status;
        const withFriction = solve(parsed(build(r, true))).bodies.b.status;
        if (without === "holds" || without === "lifts") {
          compared++;
          expect(["holds", "lifts"]).toContain(withFriction);
        }
        if (r.supports.some((s) => s.kind === "fixed")) expect(["holds", "lifts"]).toContain(withFriction);
      }),
      { seed: 1618, numRuns: 1500 },
    );
    expect(compared).toBeGreaterThan(200); // the property was exercised
  }, 120_000);
});

describe("reactions of a frictionless contact", () => {
  it("report n and t, with t = 0", () => {
    // a 4 m × 1 m, 1000 kg block on three level frictionless contacts: t = 0 at each (there is
    // no tangential reaction), and Σ n = W (statics)
    const res = solve(
      parsed(
        sketch({
          bodies: [{ id: "b", outline: box(4, 1), mass: 1000 }],
          supports: [0, 2, 4].map((x, i) => ({ id: `c${i}`, body: "b", kind: "contact" as const, at: [x, 0] as Vec2, angle: 90 })),
        }),
      ),
    );
    for (const id of ["c0", "c1", "c2"]) expect(res.reactions[id].t).toBe(0);
    expect(res.reactions.c0.n! + res.reactions.c1.n! + res.reactions.c2.n!).toBeCloseTo(1000 * G0, 6);
  });
});
