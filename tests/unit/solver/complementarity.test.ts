// One-sided supports: the answer is the unique equilibrium with n ≥ 0, gap ≥ 0, n·gap = 0 at every
// contact and tie. Checked against brute force: every engagement of the one-sided supports is
// tried, and the consistent one(s) must be what `solve` returns; when none is, the body tips —
// unless friction contacts are what spoils every engagement (engaged, the tangential spring makes
// one pull) and normal forces alone hold the body: then that answer, with t = 0, is returned; or
// Coulomb's law holds it with contacts sliding at the limit, which the result says.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solve } from "@/solver";
import { solveEngaged } from "@/solver/contact";
import { dot3, norm3 } from "@/solver/linalg";
import { buildBodyModel } from "@/solver/model";
import { parsed, sketch } from "./helpers";

const pointOnBox = fc.tuple(fc.integer({ min: 0, max: 3 }), fc.double({ min: 0, max: 1, noNaN: true })).map(([edge, t]): [number, number] =>
  edge === 0 ? [2 * t, 0] : edge === 1 ? [2, 3 * t] : edge === 2 ? [2 * t, 3] : [0, 3 * t],
);
const support = (friction: boolean) =>
  fc.record({
    kind: fc.constantFrom("contact", "contact", "tie") as fc.Arbitrary<"contact" | "tie">,
    at: pointOnBox,
    angle: fc.integer({ min: 0, max: 359 }),
    mu: friction ? fc.option(fc.constant(0.5), { nil: undefined }) : fc.constant(undefined),
    stiffness: fc.option(fc.double({ min: 2e7, max: 1.2e8, noNaN: true }), { nil: undefined }),
  });
const scenario = (friction: boolean) =>
  fc.record({
    supports: fc.array(support(friction), { minLength: 2, maxLength: 5 }),
    roller: fc.option(fc.record({ at: pointOnBox, angle: fc.integer({ min: 0, max: 359 }) }), { nil: undefined }),
    load: fc.record({ at: pointOnBox, fx: fc.integer({ min: -2000, max: 2000 }), fy: fc.integer({ min: -1000, max: 1000 }) }),
  });

type Scenario = ReturnType<typeof scenario> extends fc.Arbitrary<infer T> ? T : never;

function build(s: Scenario) {
  const supports = s.supports.map((x, i) => ({
    id: `s${i}`,
    body: "b",
    kind: x.kind,
    at: x.at,
    angle: x.angle,
    ...(x.kind === "contact" && x.mu !== undefined ? { mu: x.mu } : {}),
    ...(x.stiffness !== undefined ? { stiffness: x.stiffness } : {}),
  }));
  if (s.roller) supports.push({ id: "r", body: "b", kind: "roller" as never, at: s.roller.at, angle: s.roller.angle });
  return parsed(
    sketch({
      bodies: [{ id: "b", outline: [[0, 0], [2, 0], [2, 3], [0, 3]], mass: 50 }],
      supports,
      loads: [{ id: "P", body: "b", kind: "force", at: s.load.at, fx: s.load.fx, fy: s.load.fy }],
    }),
  );
}

function consistentEngagements(sk: ReturnType<typeof parsed>, frictionless = false): string[] {
  const built = buildBodyModel(sk, sk.bodies[0], new Map());
  // normal forces only: the friction springs carry nothing
  const m = frictionless ? { ...built, springs: built.springs.map((x) => (x.role === "t" ? { ...x, k: 0 } : x)) } : built;
  const tol = 1e-7 * m.scale;
  const out: string[] = [];
  for (let mask = 0; mask < 1 << m.groups.length; mask++) {
    const e = m.groups.map((_, gi) => (mask & (1 << gi)) !== 0);
    const sol = solveEngaged(m, e);
    if (norm3(sol.unbalanced) > tol) continue;
    const ok = m.groups.every((g, gi) => {
      const sp = m.springs[g.normal];
      return e[gi] ? sol.r[g.normal] >= -tol : sp.k * dot3(sp.g, sol.q) >= -tol;
    });
    if (ok) out.push(e.map(Number).join(""));
  }
  return out;
}

const engagementOf = (sk: ReturnType<typeof parsed>, r: ReturnType<typeof solve>) =>
  sk.supports
    .filter((s) => s.kind === "contact" || s.kind === "tie")
    .map((s) => (["bearing", "taut"].includes(r.reactions[s.id].state) ? 1 : 0))
    .join("");

for (const friction of [false, true]) {
  describe(`complementarity by brute force (${friction ? "with" : "without"} friction contacts)`, () => {
    it("solve returns the consistent engagement, or tips exactly when there is none", () => {
      fc.assert(
        fc.property(scenario(friction), (s) => {
          const sk = build(s);
          const r = solve(sk);
          const status = r.bodies.b.status;
          if (status === "unrestrained") return;
          const consistent = consistentEngagements(sk);
          if (status === "tips") expect(consistent).toEqual([]);
          else if (friction && consistent.length === 0) {
            const atLimit = r.warnings.find((w) => w.code === "INDETERMINATE" && /friction limit/.test(w.message));
            if (!atLimit) {
              // held by normal forces alone
              expect(consistentEngagements(sk, true)).toContain(engagementOf(sk, r));
              for (const sup of sk.supports) if (sup.kind === "contact") expect(r.reactions[sup.id].t).toBe(0);
            } else {
              // held by Coulomb's law with the named contacts sliding: equilibrium, n ≥ 0, |t| ≤ μ·n,
              // and |t| = μ·n where it slides
              expect(r.bodies.b.residual).toEqual({ fx: 0, fy: 0, m: 0 });
              for (const sup of sk.supports) {
                const x = r.reactions[sup.id];
                if (x.state === "bearing" || x.state === "taut") expect(x.n!).toBeGreaterThanOrEqual(-1e-6);
                if (sup.kind !== "contact" || sup.mu === undefined) continue;
                const limit = sup.mu * x.n!;
                expect(Math.abs(x.t!)).toBeLessThanOrEqual(limit * (1 + 1e-9) + 1e-6);
                if (atLimit.ids.includes(sup.id)) expect(Math.abs(x.t!)).toBeCloseTo(limit, 6);
              }
            }
          } else {
            expect(consistent).toContain(engagementOf(sk, r));
            // without friction the solution is unique (a strictly convex problem)
            if (!friction) expect(consistent).toHaveLength(1);
            for (const sup of sk.supports) {
              const x = r.reactions[sup.id];
              if (x.state === "bearing" || x.state === "taut") expect(x.n!).toBeGreaterThanOrEqual(-1e-6);
              if (x.state === "lifted" || x.state === "slack") {
                expect(x.n).toBe(0);
                expect(x.margin!).toBeLessThanOrEqual(1e-6);
              }
            }
          }
        }),
        { seed: friction ? 4242 : 1701, numRuns: 1500 },
      );
    }, 120_000);
  });
}
