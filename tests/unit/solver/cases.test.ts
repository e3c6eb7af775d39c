// Operating cases, combinations, the envelope, stability factors and the flow factor.
import { describe, expect, it } from "vitest";
import { findLimit, parseSketch, solve, solveCases, type SketchFileInput } from "@/solver";
import { caseWarnings } from "@/solver/cases";
import { G0 } from "@/solver/constants";
import { box, expectRel, loadFixture, parsed, sketch } from "./helpers";

const fileOf = (doc: unknown) => {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
};

const trailer = (): SketchFileInput => {
  const doc = loadFixture("fire-monitor-trailer.json");
  doc.cases = [
    { id: "low", name: "Low throw 15°", parameters: { theta: "15 deg" } },
    { id: "high", name: "High throw 60°", parameters: { theta: "60 deg" } },
    { id: "half", name: "Half flow", flowFactor: 0.5 },
    { id: "parked", name: "Parked, no flow", factors: { flow: 0 } },
  ];
  return doc;
};

describe("operating cases", () => {
  it("the case table equals the cases solved one by one", () => {
    const doc = trailer();
    const study = solveCases(fileOf(doc));
    expect(study.runs.map((r) => r.id)).toEqual(["low", "high", "half", "parked"]);
    // one by one: a fresh sketch with the override, or with the scaling applied by hand
    const one = (over: Partial<SketchFileInput>, scaling?: { factors?: Record<string, number>; flowFactor?: number }) => {
      const sk = parsed({ ...doc, ...over, cases: undefined });
      if (scaling) sk.scaling = scaling;
      return solve(sk);
    };
    const expected = {
      low: one({ parameters: { ...doc.parameters, theta: "15 deg" } }),
      high: one({ parameters: { ...doc.parameters, theta: "60 deg" } }),
      half: one({}, { flowFactor: 0.5 }),
      parked: one({ ports: [], massSources: [] }),
    };
    for (const run of study.runs) {
      if (!run.ok) throw new Error(JSON.stringify(run.errors));
      const e = expected[run.id as keyof typeof expected];
      for (const id of ["leg", "wheel", "jack"]) {
        expect(run.result.reactions[id].fx).toBeCloseTo(e.reactions[id].fx, 6);
        expect(run.result.reactions[id].fy).toBeCloseTo(e.reactions[id].fy, 6);
        expect(run.result.reactions[id].state).toBe(e.reactions[id].state);
      }
    }
  });

  it("the flow factor scales the momentum flux by f²", () => {
    const study = solveCases(fileOf(trailer()));
    const half = study.runs.find((r) => r.id === "half")!;
    const base = solve(parsed(loadFixture("fire-monitor-trailer.json")));
    if (!half.ok) throw new Error();
    expectRel(half.result.bodies.trailer.momentum.fx, base.bodies.trailer.momentum.fx / 4, 1e-12);
  });

  it("the governing case of each component is the one with the largest magnitude, and the design load is the largest resultant", () => {
    const study = solveCases(fileOf(trailer()));
    const env = study.envelope.leg;
    const byCase = Object.fromEntries(study.runs.map((r) => [r.id, r.ok ? r.result.reactions.leg : null]));
    const fxs = Object.entries(byCase).map(([id, r]) => [id, r!.fx] as const);
    const gov = fxs.reduce((a, b) => (Math.abs(b[1]) > Math.abs(a[1]) ? b : a));
    expect(env.governing.fx).toBe(gov[0]);
    const res = Object.entries(byCase).map(([id, r]) => [id, Math.hypot(r!.fx, r!.fy)] as const);
    const big = res.reduce((a, b) => (b[1] > a[1] ? b : a));
    expect(env.design.case).toBe(big[0]);
    expectRel(env.design.resultant, big[1], 1e-12);
    expect(env.components.n!.max.value).toBe(Math.max(...Object.values(byCase).map((r) => r!.n!)));
  });

  it("an unknown parameter or case is an error naming the field", () => {
    const doc = trailer();
    doc.cases![0].parameters = { phi: "3 deg" };
    doc.combinations = [{ id: "k", name: "K", terms: [{ case: "nope", factor: 1 }] }];
    const p = parseSketch(doc);
    expect(p.ok).toBe(false);
    if (!p.ok)
      expect(p.errors).toEqual([
        { path: "cases[0].parameters.phi", message: 'the sketch has no parameter "phi" to override' },
        { path: "combinations[0].terms[0].case", message: 'names case "nope", which does not exist' },
      ]);
  });
});

describe("combinations are solved as their own factored load set", () => {
  // A stand on a front pin and a rear contact. Case A: its weight; case B: a thrust T at h.
  const doc = (T: number): SketchFileInput =>
    sketch({
      bodies: [{ id: "s", outline: box(2, 1.5), mass: 200, cg: [1, 0.7] }],
      supports: [
        { id: "front", body: "s", kind: "pin", at: [2, 0] },
        { id: "rear", body: "s", kind: "contact", at: [0, 0], angle: 90 },
      ],
      loads: [{ id: "thrust", body: "s", kind: "force", at: [0, 1.2], fx: T, fy: 0, group: "thrust" }],
      cases: [
        { id: "dead", name: "Dead", factors: { thrust: 0 } },
        { id: "push", name: "Thrust", factors: { dead: 0 } },
      ],
      combinations: [{ id: "ult", name: "1.2 dead + 1.5 thrust", terms: [{ case: "dead", factor: 1.2 }, { case: "push", factor: 1.5 }] }],
    });

  it("while every support holds, the combination equals the factored sum of the cases", () => {
    const study = solveCases(fileOf(doc(500)));
    const [d, p, k] = study.runs;
    if (!d.ok || !p.ok || !k.ok) throw new Error();
    // the thrust alone would lift the rear (it pulls), but combined with the weight it bears
    for (const id of ["front", "rear"]) {
      expectRel(k.result.reactions[id].fy, 1.2 * d.result.reactions[id].fy + 1.5 * p.result.reactions[id].fy, 1e-9);
    }
    expect(k.result.bodies.s.status).toBe("holds");
  });

  it("once the rear contact lifts, adding results would be wrong; the factored load set is right", () => {
    const T = 3000;
    const study = solveCases(fileOf(doc(T)));
    const [d, p, k] = study.runs;
    if (!d.ok || !p.ok || !k.ok) throw new Error();
    const W = 200 * G0;
    // combined: about the pin, rear·(−2)·N + 1.2·W·1 − 1.5·T·1.2 = 0 → N = (1.2·W − 1.8·T)/2 < 0: tips
    const N = (1.2 * W * 1 - 1.5 * T * 1.2) / 2;
    expect(N).toBeLessThan(0);
    expect(k.result.bodies.s.status).toBe("tips");
    expectRel(k.result.reactions.rear.n!, N, 1e-9);
    // the thrust case alone tips too, and its "required" pull added to the dead case is not a result anyone should use
    expect(p.result.bodies.s.status).toBe("tips");
    expect(k.result.equations.s.forces.some((t) => t.label.startsWith("1.5 × [Thrust] force thrust"))).toBe(true);
  });
});

describe("stability factors (common practice)", () => {
  // A block of weight W, base b, on two friction contacts, pushed by P at height h.
  const W = 800 * G0;
  const b = 1.2;
  const h = 1.5;
  const mu = 0.45;
  const P = 1400;
  const doc = sketch({
    bodies: [{ id: "blk", outline: box(b, 2), mass: 800, cg: [b / 2, 1] }],
    supports: [
      { id: "heel", body: "blk", kind: "contact", at: [0, 0], angle: 90, mu },
      { id: "toe", body: "blk", kind: "contact", at: [b, 0], angle: 90, mu },
    ],
    loads: [{ id: "P", body: "blk", kind: "force", at: [0, h], fx: P, fy: 0 }],
    stability: { overturning: 1.5, sliding: 1.5 },
  });

  it("against overturning: W·b/2 over P·h, about the toe", () => {
    const run = solveCases(fileOf(doc)).runs[0];
    if (!run.ok) throw new Error();
    const ot = run.stability.blk.overturning;
    if ("notApplicable" in ot) throw new Error(ot.notApplicable);
    expect(ot.about).toBe("toe");
    expectRel(ot.factor, (W * b) / 2 / (P * h), 1e-9);
    expectRel(ot.restoring, (W * b) / 2, 1e-9);
    expectRel(ot.overturning, P * h, 1e-9);
    expect(ot.pass).toBe((W * b) / 2 / (P * h) >= 1.5);
  });

  it("against sliding: μ·W over P", () => {
    const run = solveCases(fileOf(doc)).runs[0];
    if (!run.ok) throw new Error();
    const sl = run.stability.blk.sliding;
    if ("notApplicable" in sl) throw new Error(sl.notApplicable);
    expectRel(sl.factor, (mu * W) / P, 1e-9);
    expect(sl.pass).toBe((mu * W) / P >= 1.5);
  });

  it("an inclined push counts by its components: the part pressing down restores, the part pushing over overturns (as an inclined thrust on a retaining wall is resolved — common practice)", () => {
    const F = 3000;
    const alpha = (30 * Math.PI) / 180; // 30° below horizontal, toward the toe
    const inclined = sketch({
      bodies: [{ id: "blk", outline: box(b, 2), mass: 800, cg: [b / 2, 1] }],
      supports: [
        { id: "heel", body: "blk", kind: "contact", at: [0, 0], angle: 90, mu },
        { id: "toe", body: "blk", kind: "contact", at: [b, 0], angle: 90, mu },
      ],
      loads: [{ id: "F", body: "blk", kind: "force", at: [0, h], magnitude: F, angle: -30 }],
    });
    const run = solveCases(fileOf(inclined)).runs[0];
    if (!run.ok) throw new Error();
    const ot = run.stability.blk.overturning;
    if ("notApplicable" in ot) throw new Error(ot.notApplicable);
    expect(ot.about).toBe("toe");
    // restoring: W·b/2 + F·sin α·b (the downward part acts at the heel, b from the toe); overturning: F·cos α·h
    expectRel(ot.restoring, (W * b) / 2 + F * Math.sin(alpha) * b, 1e-9);
    expectRel(ot.overturning, F * Math.cos(alpha) * h, 1e-9);
  });

  it("a body pinned at one edge cannot slide, but tips about the pin once its pad lifts: W·d over T·h", () => {
    // The stand (tests/fixtures/sketches/thrust-stand-tips.json): 200 kg, cg 0.8 m behind the front
    // pin, jet thrust T = 2.2 kN at h = 1.5 m. Turning clockwise about the pin lifts the rear pad;
    // the weight restores W·0.8, the thrust overturns T·1.5 (common practice, as for a block on
    // its toe). The pin holds the stand in place, not upright.
    const W = 200 * G0;
    const run = solveCases(fileOf(loadFixture("thrust-stand-tips.json"))).runs[0];
    if (!run.ok) throw new Error();
    // the pin goes by its label, "front pin", as in the tables (not by its id, "pin front")
    expect(run.stability.stand.sliding).toEqual({ notApplicable: "sliding is resisted by the “front pin”" });
    const ot = run.stability.stand.overturning;
    if ("notApplicable" in ot) throw new Error(ot.notApplicable);
    expect([ot.about, ot.sense, ot.pivot]).toEqual(["front", -1, [1.6, 0]]);
    expectRel(ot.restoring, W * 0.8, 1e-9);
    expectRel(ot.overturning, 2200 * 1.5, 1e-9);
    expect(ot.pass).toBe(false);
  });

  it("…and on a slope, about the pin, resolves the weight across and along the pad's base", () => {
    // The same stand with the jet at 0.6 m and gravity turned 3° toward the pin: W·cos 3°·0.8
    // restores, T·0.6 + W·sin 3°·0.7 (the cg 0.7 m above the base) overturns.
    const file = loadFixture("thrust-stand-tips.json");
    file.ports![0].at = [0, 0.6];
    file.parameters!.slope = "3 deg";
    file.gravityAngle = "-90 deg + slope";
    const run = solveCases(fileOf(file)).runs[0];
    if (!run.ok) throw new Error();
    const ot = run.stability.stand.overturning;
    if ("notApplicable" in ot) throw new Error(ot.notApplicable);
    const W = 200 * G0;
    const a = 3 * (Math.PI / 180);
    expect(ot.about).toBe("front");
    expectRel(ot.restoring, W * Math.cos(a) * 0.8, 1e-9);
    expectRel(ot.overturning, 2200 * 0.6 + W * Math.sin(a) * 0.7, 1e-9);
    expectRel(ot.factor, 1.126, 1e-3);
  });

  it("a body held by a pin and a roller does not tip: the roller holds it down too", () => {
    const file = loadFixture("thrust-stand-tips.json");
    file.supports![1] = { id: "rear", label: "rear roller", body: "stand", kind: "roller", at: [0, 0], angle: 90 };
    file.supports!.push({ id: "pad", body: "stand", kind: "contact", at: [0.8, 0], angle: 90 });
    const run = solveCases(fileOf(file)).runs[0];
    if (!run.ok) throw new Error();
    expect(run.stability.stand.overturning).toEqual({ notApplicable: "tipping is prevented by the “front pin”" });
  });

  it("a support in these notes goes by its label, with its kind when the label does not say it; by its kind and id without one", () => {
    const stand = (front: Record<string, unknown>) => {
      const file = loadFixture("thrust-stand-tips.json");
      file.supports![0] = { ...file.supports![0], ...front } as never;
      const run = solveCases(fileOf(file)).runs[0];
      if (!run.ok) throw new Error();
      return run.stability.stand.sliding;
    };
    expect(stand({ label: undefined })).toEqual({ notApplicable: "sliding is resisted by the pin front" });
    expect(stand({ label: "hinge A" })).toEqual({ notApplicable: "sliding is resisted by the pin “hinge A”" });
    expect(stand({ label: "Pin at the nose" })).toEqual({ notApplicable: "sliding is resisted by the “Pin at the nose”" });
    expect(stand({ kind: "fixed", label: "anchor" })).toEqual({ notApplicable: "sliding is resisted by the fixed support “anchor”" });
    expect(stand({ label: "spinner" })).toEqual({ notApplicable: "sliding is resisted by the pin “spinner”" });
  });

  it("a body on contacts under its weight alone: nothing tends to tip it (a contact that only pushes prevents nothing)", () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [{ id: "dead", name: "Dead", factors: { flow: 0, loads: 0 } }];
    const run = solveCases(fileOf(file)).runs[0];
    if (!run.ok) throw new Error();
    expect(run.stability.trailer.overturning).toEqual({ notApplicable: "no load tends to tip it" });
  });
});

describe("a load case solved only in combinations", () => {
  const doc = (): SketchFileInput => {
    const d = trailer();
    d.cases = [
      { id: "dead", name: "Dead", factors: { flow: 0 }, onlyInCombinations: true },
      { id: "jet", name: "Jet", factors: { dead: 0 }, onlyInCombinations: true },
      { id: "low", name: "Low throw 15°", parameters: { theta: "15 deg" } },
    ];
    d.combinations = [{ id: "k", name: "0.9 dead + 1.4 jet", terms: [{ case: "dead", factor: 0.9 }, { case: "jet", factor: 1.4 }] }];
    return d;
  };

  it("is left out of the runs, the envelope and the findings, and its combination solves exactly as with the case on its own", () => {
    const seen: Array<[number, number]> = [];
    const study = solveCases(fileOf(doc()), (done, total) => seen.push([done, total]));
    expect(study.runs.map((r) => r.id)).toEqual(["low", "k"]);
    expect(seen).toEqual([[1, 2], [2, 2]]);
    // the same file with the flags off: the combination's reactions are the same numbers
    const plain = doc();
    plain.cases = plain.cases!.map(({ onlyInCombinations: _, ...c }) => c);
    const all = solveCases(fileOf(plain));
    expect(all.runs.map((r) => r.id)).toEqual(["dead", "jet", "low", "k"]);
    const a = study.runs.find((r) => r.id === "k")!;
    const b = all.runs.find((r) => r.id === "k")!;
    if (!a.ok || !b.ok) throw new Error();
    expect(a.result.reactions).toEqual(b.result.reactions);
    // the jet case alone tips the trailer (no weight): with the flag it is no finding
    expect(all.excluded.map((e) => e.case)).toContain("jet");
    expect(study.excluded.map((e) => e.case)).not.toContain("jet");
    for (const env of Object.values(study.envelope)) for (const e of Object.values(env.components)) expect(["low", "k"]).toContain(e!.max.case);
  });

  it("is warned of when no combination names it, and a case that does not read still shows its error", () => {
    const d = doc();
    d.combinations = [];
    const file = fileOf(d);
    expect(caseWarnings(file, file.cases![0])).toEqual(["Case Dead is solved only in combinations, and no combination names it: it is solved nowhere."]);
    const broken = doc();
    broken.cases![0] = { ...broken.cases![0], parameters: { theta: "15 kg" } };
    const study = solveCases(fileOf(broken));
    expect(study.runs.map((r) => [r.id, r.ok])).toEqual([["dead", false], ["low", true], ["k", false]]);
  });

  it("a combination's own required factors of safety stand for it alone", () => {
    const d = doc();
    d.combinations![0].stability = { overturning: 1 };
    const study = solveCases(fileOf(d));
    const k = study.runs.find((r) => r.id === "k")!;
    const low = study.runs.find((r) => r.id === "low")!;
    if (!k.ok || !low.ok) throw new Error();
    const ot = k.stability.trailer.overturning;
    const sl = k.stability.trailer.sliding;
    const lowOt = low.stability.trailer.overturning;
    expect("required" in ot && ot.required).toBe(1);
    expect("required" in sl && sl.required).toBe(1.5);
    expect("required" in lowOt && lowOt.required).toBe(1.5);
    if ("factor" in ot) expect(ot.pass).toBe(ot.factor >= 1);
    const bad = doc();
    bad.combinations![0].stability = { overturning: 0 };
    expect(parseSketch(bad)).toMatchObject({ ok: false, errors: [{ path: "combinations[0].stability.overturning", message: "must be more than zero" }] });
  });

  it("must be true or false, named in the error", () => {
    const d = doc();
    (d.cases![0] as Record<string, unknown>).onlyInCombinations = "yes";
    expect(parseSketch(d)).toMatchObject({ ok: false, errors: [{ path: "cases[0].onlyInCombinations", message: "must be true or false" }] });
  });
});

describe("the flow factor in the limit finder", () => {
  it("finds the flow at which the rear contact lifts: f = √(W·d / (h·ṁV))", () => {
    // A cart on a front pin and a rear contact, a jet at height h leaving rearward: thrust ṁV·f².
    const m = 300;
    const d = 0.9;
    const h = 1.1;
    const mdot = 4;
    const V = 60;
    const doc = sketch({
      bodies: [{ id: "c", outline: box(2, 1.4), mass: m, cg: [2 - d, 0.6] }],
      supports: [
        { id: "front", body: "c", kind: "pin", at: [2, 0] },
        { id: "rear", body: "c", kind: "contact", at: [0, 0], angle: 90 },
      ],
      ports: [{ id: "jet", body: "c", kind: "outlet", at: [0, h], angle: 180, massFlow: mdot, velocity: V }],
      massSources: [{ id: "feed", body: "c", massFlow: mdot }],
    });
    const lim = findLimit(parsed(doc), "flowFactor", [0, 5], { support: "rear", component: "margin" });
    expect(lim.found).toBe(true);
    if (lim.found) expectRel(lim.value, Math.sqrt((m * G0 * d) / (h * mdot * V)), 1e-8);
  });
});
