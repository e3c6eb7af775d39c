// Invariants of the method on random sketches (fast-check, seeded so failures repeat).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solve, type SketchFileInput, type SolveResult } from "@/solver";
import { G0 } from "@/solver/constants";
import { parsed, sketch } from "./helpers";

type Pt = [number, number];
const coord = fc.integer({ min: -300, max: 300 }).map((x) => x / 100);
// Points on a tenth-of-the-body grid: exact coincidences (a mechanism) happen, near-coincidences
// (an ill-conditioned body a designer would not draw) do not.
const tenth = fc.integer({ min: 0, max: 10 }).map((i) => i / 10);
const inBox = (w: number, h: number) => fc.tuple(tenth, tenth).map(([a, b]): Pt => [a * w, b * h]);
const angle = fc.integer({ min: 0, max: 359 });

interface Raw {
  w: number;
  h: number;
  mass: number;
  supports: Array<{ kind: "pin" | "roller" | "contact" | "fixed" | "tie"; at: Pt; angle: number; mu?: number; stiffness: number }>;
  forces: Array<{ at: Pt; magnitude: number; angle: number }>;
  couples: number[];
  dist: Array<{ from: Pt; to: Pt; w1: number; w2: number; angle: number }>;
  ports: Array<{ kind: "inlet" | "outlet"; at: Pt; angle: number; massFlow: number; velocity: number; pressure: number; area: number }>;
}

const raw: fc.Arbitrary<Raw> = fc
  .record({ w: fc.integer({ min: 5, max: 40 }).map((x) => x / 10), h: fc.integer({ min: 5, max: 40 }).map((x) => x / 10) })
  .chain(({ w, h }) =>
    fc.record({
      w: fc.constant(w),
      h: fc.constant(h),
      mass: fc.integer({ min: 0, max: 2000 }),
      supports: fc.array(
        fc.record({
          kind: fc.constantFrom("pin", "roller", "contact", "fixed", "tie") as fc.Arbitrary<Raw["supports"][number]["kind"]>,
          at: inBox(w, h),
          angle,
          mu: fc.option(fc.constantFrom(0.3, 0.6), { nil: undefined }),
          stiffness: fc.double({ min: 1e7, max: 1e9, noNaN: true }),
        }),
        { minLength: 1, maxLength: 4 },
      ),
      forces: fc.array(fc.record({ at: inBox(w, h), magnitude: fc.integer({ min: 0, max: 5000 }), angle }), { maxLength: 3 }),
      couples: fc.array(fc.integer({ min: -3000, max: 3000 }), { maxLength: 1 }),
      dist: fc.array(fc.record({ from: inBox(w, h), to: inBox(w, h), w1: fc.integer({ min: -500, max: 2000 }), w2: fc.integer({ min: -500, max: 2000 }), angle }), { maxLength: 1 }),
      ports: fc.array(
        fc.record({
          kind: fc.constantFrom("inlet", "outlet") as fc.Arbitrary<"inlet" | "outlet">,
          at: inBox(w, h),
          angle,
          massFlow: fc.integer({ min: 0, max: 50 }),
          velocity: fc.integer({ min: 0, max: 60 }),
          pressure: fc.integer({ min: -50e3, max: 500e3 }),
          area: fc.integer({ min: 1, max: 100 }).map((x) => x / 1e4),
        }),
        { maxLength: 3 },
      ),
    }),
  );

/** Build a sketch file, with a transform of points and angles and a scale of every load. */
function toFile(r: Raw, opts: { shift?: Pt; turnDeg?: number; scale?: number; gravity?: number; stiffnessScale?: number[] } = {}): SketchFileInput {
  const s = opts.scale ?? 1;
  const phi = ((opts.turnDeg ?? 0) * Math.PI) / 180;
  const [dx, dy] = opts.shift ?? [0, 0];
  const P = ([x, y]: Pt): Pt => [x * Math.cos(phi) - y * Math.sin(phi) + dx, x * Math.sin(phi) + y * Math.cos(phi) + dy];
  const A = (a: number) => a + (opts.turnDeg ?? 0);
  const balance = r.ports.reduce((acc, p) => acc + (p.kind === "outlet" ? p.massFlow : -p.massFlow), 0);
  return sketch({
    gravity: opts.gravity,
    bodies: [{ id: "b", outline: [P([0, 0]), P([r.w, 0]), P([r.w, r.h]), P([0, r.h])], mass: r.mass * s }],
    supports: r.supports.map((x, i) => {
      const k = x.stiffness * (opts.stiffnessScale?.[i] ?? 1);
      const base = { id: `s${i}`, body: "b", at: P(x.at), stiffness: k };
      if (x.kind === "pin") return { ...base, kind: "pin" as const };
      // An explicit rotational stiffness: the default k·L² uses the outline's axis-aligned
      // bounding box, which a rotation of the sketch changes.
      if (x.kind === "fixed") return { ...base, kind: "fixed" as const, rotationalStiffness: k * 2 };
      if (x.kind === "contact") return { ...base, kind: "contact" as const, angle: A(x.angle), ...(x.mu ? { mu: x.mu } : {}) };
      return { ...base, kind: x.kind, angle: A(x.angle) };
    }),
    loads: [
      ...r.forces.map((f, i) => ({ id: `f${i}`, body: "b", kind: "force" as const, at: P(f.at), magnitude: f.magnitude * s, angle: A(f.angle) })),
      ...r.couples.map((c, i) => ({ id: `c${i}`, body: "b", kind: "couple" as const, value: c * s })),
      ...r.dist
        .filter((d) => d.from[0] !== d.to[0] || d.from[1] !== d.to[1])
        .map((d, i) => ({ id: `d${i}`, body: "b", kind: "distributed" as const, from: P(d.from), to: P(d.to), w1: d.w1 * s, w2: d.w2 * s, angle: A(d.angle) })),
    ],
    ports: r.ports.map((p, i) => ({
      id: `p${i}`,
      body: "b",
      kind: p.kind,
      at: P(p.at),
      angle: A(p.angle),
      massFlow: p.massFlow * s,
      velocity: p.velocity,
      pressure: p.pressure * s,
      area: p.area,
    })),
    massSources: balance > 0 ? [{ id: "src", body: "b", massFlow: balance * s }] : [],
  });
}

const loadScale = (res: SolveResult) =>
  res.equations.b.forces.concat(res.equations.b.momentum).reduce((acc, t) => acc + Math.abs(t.fx) + Math.abs(t.fy) + Math.abs(t.m), 0) || 1;

const RUNS = { numRuns: 400 };

describe("invariants", () => {
  it("the reported reactions balance the loads, summed here from the input (holds, lifts and tips)", () => {
    // The control-volume momentum equations of the contract, assembled from the raw input and
    // not from the solver's load vector (so an error in the solver's load assembly shows):
    //   ΣF(reactions) + ΣF(forces, distributed) + W + ΣF(pressure) = Σ_out ṁV − Σ_in ṁV
    // and the same for moments about the origin (M = x·Fy − y·Fx, plus couples).
    fc.assert(
      fc.property(raw, (r) => {
        const file = toFile(r);
        const res = solve(parsed(file));
        const b = res.bodies.b;
        if (b.status === "unrestrained") return; // its residual is the unbalanced load, by design
        let fx = 0;
        let fy = 0;
        let m = 0;
        let size = 0;
        const add = (at: Pt, x: number, y: number, couple = 0) => {
          fx += x;
          fy += y;
          m += at[0] * y - at[1] * x + couple;
          size += Math.abs(x) + Math.abs(y) + Math.abs(couple) / (r.w + r.h);
        };
        const dir = (deg: number): Pt => [Math.cos((deg * Math.PI) / 180), Math.sin((deg * Math.PI) / 180)];
        // weight at the rectangle's centre
        add([r.w / 2, r.h / 2], 0, -r.mass * G0);
        for (const f of r.forces) add(f.at, f.magnitude * dir(f.angle)[0], f.magnitude * dir(f.angle)[1]);
        for (const c of r.couples) add([0, 0], 0, 0, c);
        // a linear load is two triangles, each w·ℓ/2 at a third of the way from its own end
        for (const d of r.dist) {
          const len = Math.hypot(d.to[0] - d.from[0], d.to[1] - d.from[1]);
          if (len === 0) continue;
          const e = dir(d.angle);
          const third = (k: number): Pt => [d.from[0] + (k * (d.to[0] - d.from[0])) / 3, d.from[1] + (k * (d.to[1] - d.from[1])) / 3];
          add(third(1), ((d.w1 * len) / 2) * e[0], ((d.w1 * len) / 2) * e[1]);
          add(third(2), ((d.w2 * len) / 2) * e[0], ((d.w2 * len) / 2) * e[1]);
        }
        for (const p of r.ports) {
          const e = dir(p.angle);
          // gauge pressure pushes inward at both kinds: along the flow at an inlet, against it at an outlet
          const pa = p.pressure * p.area * (p.kind === "inlet" ? 1 : -1);
          add(p.at, pa * e[0], pa * e[1]);
          // the momentum flux moves to the force side with its sign changed
          const flux = p.massFlow * p.velocity * (p.kind === "outlet" ? -1 : 1);
          add(p.at, flux * e[0], flux * e[1]);
        }
        for (const s of file.supports!) {
          const x = res.reactions[s.id];
          add(s.at as Pt, x.fx, x.fy, x.m);
        }
        expect(Math.abs(fx)).toBeLessThanOrEqual(1e-9 * size);
        expect(Math.abs(fy)).toBeLessThanOrEqual(1e-9 * size);
        expect(Math.abs(m)).toBeLessThanOrEqual(1e-9 * size * (r.w + r.h));
      }),
      { seed: 101, ...RUNS },
    );
  }, 120_000);

  it("a determinate body's reactions do not depend on the support stiffnesses", () => {
    fc.assert(
      fc.property(raw, fc.array(fc.double({ min: 0.05, max: 20, noNaN: true }), { minLength: 4, maxLength: 4 }), (r, ks) => {
        const a = solve(parsed(toFile(r)));
        if (a.bodies.b.determinacy.kind !== "determinate" || a.bodies.b.status === "unrestrained") return;
        const b = solve(parsed(toFile(r, { stiffnessScale: ks })));
        const scale = loadScale(a);
        for (const id of Object.keys(a.reactions)) {
          expect(Math.abs(a.reactions[id].fx - b.reactions[id].fx)).toBeLessThanOrEqual(1e-8 * scale);
          expect(Math.abs(a.reactions[id].fy - b.reactions[id].fy)).toBeLessThanOrEqual(1e-8 * scale);
          expect(Math.abs(a.reactions[id].m - b.reactions[id].m)).toBeLessThanOrEqual(1e-8 * scale * (r.w + r.h));
        }
      }),
      { seed: 202, ...RUNS },
    );
  }, 120_000);

  it("translating the whole sketch changes no reaction", () => {
    fc.assert(
      fc.property(raw, fc.tuple(coord, coord), (r, shift) => {
        const a = solve(parsed(toFile(r)));
        const b = solve(parsed(toFile(r, { shift })));
        expect(b.bodies.b.status).toBe(a.bodies.b.status);
        const scale = loadScale(a);
        for (const id of Object.keys(a.reactions)) {
          for (const k of ["fx", "fy", "m"] as const) expect(Math.abs(a.reactions[id][k] - b.reactions[id][k])).toBeLessThanOrEqual(1e-7 * scale * (r.w + r.h));
          expect(b.reactions[id].state).toBe(a.reactions[id].state);
        }
      }),
      { seed: 303, ...RUNS },
    );
  }, 120_000);

  it("rotating the sketch with gravity 0 rotates the reactions and keeps their magnitudes", () => {
    fc.assert(
      fc.property(raw, angle, (r, turn) => {
        const a = solve(parsed(toFile(r, { gravity: 0 })));
        const b = solve(parsed(toFile(r, { gravity: 0, turnDeg: turn })));
        expect(b.bodies.b.status).toBe(a.bodies.b.status);
        const phi = (turn * Math.PI) / 180;
        const scale = loadScale(a);
        for (const id of Object.keys(a.reactions)) {
          const ra = a.reactions[id];
          const rb = b.reactions[id];
          const fx = ra.fx * Math.cos(phi) - ra.fy * Math.sin(phi);
          const fy = ra.fx * Math.sin(phi) + ra.fy * Math.cos(phi);
          expect(Math.abs(rb.fx - fx)).toBeLessThanOrEqual(1e-6 * scale);
          expect(Math.abs(rb.fy - fy)).toBeLessThanOrEqual(1e-6 * scale);
          expect(Math.abs(rb.m - ra.m)).toBeLessThanOrEqual(1e-6 * scale * (r.w + r.h));
          if (ra.n !== undefined) expect(Math.abs(rb.n! - ra.n)).toBeLessThanOrEqual(1e-6 * scale);
        }
      }),
      { seed: 404, ...RUNS },
    );
  }, 120_000);

  it("scaling every force, mass, pressure and mass flow by s scales every reaction by s", () => {
    fc.assert(
      fc.property(raw, fc.constantFrom(0.01, 0.5, 3, 250), (r, s) => {
        // a scaled suction stays a gauge pressure a real port can have: above a full vacuum
        fc.pre(r.ports.every((p) => p.pressure * s >= -101325));
        const a = solve(parsed(toFile(r)));
        const b = solve(parsed(toFile(r, { scale: s })));
        expect(b.bodies.b.status).toBe(a.bodies.b.status);
        const scale = loadScale(a) * s;
        for (const id of Object.keys(a.reactions)) {
          for (const k of ["fx", "fy", "m"] as const) expect(Math.abs(b.reactions[id][k] - s * a.reactions[id][k])).toBeLessThanOrEqual(1e-8 * scale * (r.w + r.h));
        }
      }),
      { seed: 505, ...RUNS },
    );
  }, 120_000);
});
