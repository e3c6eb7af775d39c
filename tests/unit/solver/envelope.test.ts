// The envelope and the tables built on it: the governing case of each component (named beside
// each max and min, marked by shape in the cases table), runs whose body tips left out, load
// groups counted twice in a combination, and the figures behind each factor of safety.
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { parseSketch, solveCases, tableToCsv, type SketchFileInput } from "@/solver";
import { combinationOverlaps, combinationWarnings } from "@/solver/cases";
import { caseReactionTable, designLoadTable, envelopeTable, excludedWords, slipWords, stabilityTable } from "@/solver/report";
import { G0 } from "@/solver/constants";
import { box, expectRel, sketch } from "./helpers";

const fileOf = (doc: unknown) => {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
};

// A stand (200 kg, weight at x = 1 m) on a front pin at x = 2 m and a rear contact at x = 0, with
// a thrust T in +x at 1.2 m in its own load group. Statics by hand (common practice), moments
// about the pin: rear n·2 = (weight factor)·W·1 − (thrust factor)·T·1.2.
const W = 200 * G0;
const T = 500;
const stand = (extra: Partial<SketchFileInput> = {}): SketchFileInput =>
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
    combinations: [{ id: "ult", name: "Ultimate", terms: [{ case: "dead", factor: 1.2 }, { case: "push", factor: 1.5 }] }],
    ...extra,
  });

describe("runs whose body is not held stay out of the envelope", () => {
  const study = solveCases(fileOf(stand()));
  // dead: n = W/2; the thrust alone needs the rear to pull (n = −T·1.2/2 = −300 N): it tips;
  // 1.2 dead + 1.5 thrust: n = (1.2·W − 1.5·T·1.2)/2, still bearing
  const nDead = W / 2;
  const nUlt = (1.2 * W - 1.5 * T * 1.2) / 2;

  it("the thrust case tips and is listed as left out", () => {
    const push = study.runs.find((r) => r.id === "push")!;
    if (!push.ok) throw new Error();
    expect(push.result.bodies.s.status).toBe("tips");
    expectRel(push.result.reactions.rear.n!, (-T * 1.2) / 2, 1e-9);
    expect(study.excluded).toEqual([{ case: "push", body: "s", status: "tips" }]);
    expect(excludedWords(study)).toEqual([
      "Thrust — s tips: not in the envelope or the design loads; the body is not held in this case (its reactions would need every support to pull).",
    ]);
  });

  it("max and min come from the held runs only, each with its case", () => {
    const rear = study.envelope.rear;
    expectRel(rear.components.n!.max.value, nDead, 1e-9);
    expect(rear.components.n!.max.case).toBe("dead");
    // with the tipping run the minimum would be −300 N from "push"
    expectRel(rear.components.n!.min.value, nUlt, 1e-9);
    expect(rear.components.n!.min.case).toBe("ult");
    // the margin's governing case is its smallest: where the rear comes closest to lifting
    expect(rear.governing.margin).toBe("ult");
    // the pin resists the factored thrust: Fx = −1.5·T in "ult", 0 in "dead"
    const fx = study.envelope.front.components.fx!;
    expectRel(fx.min.value, -1.5 * T, 1e-9);
    expect(fx.min.case).toBe("ult");
    expect(study.envelope.front.governing.fx).toBe("ult");
  });

  it("the envelope table names the case beside each max and min, with n, t and the margin", () => {
    const t = envelopeTable(study, "SI");
    expect(t.columns.map((c) => c.label)).toEqual(["Support", "Component", "Unit", "Max", "Case of max", "Min", "Case of min", "Governing case"]);
    const row = (support: string, comp: string) => t.rows.find((r) => r[0] === support && r[1] === comp)!;
    const n = row("rear", "Normal n");
    expect(n[2]).toBe("kN");
    expect(n[3]).toBeCloseTo(nDead / 1000, 12);
    expect(n[4]).toBe("Dead");
    expect(n[5]).toBeCloseTo(nUlt / 1000, 12);
    expect(n[6]).toBe("Ultimate");
    expect(n[7]).toBe("Dead");
    expect(row("rear", "Margin")[7]).toBe("Ultimate");
    expect(row("front", "Fx")[7]).toBe("Ultimate");
    // a pin carries no moment: no M row; nothing of the tipping case anywhere
    expect(t.rows.some((r) => r[1] === "M")).toBe(false);
    expect(t.rows.some((r) => r.includes("Thrust"))).toBe(false);
    expect(t.notes![1]).toBe("A case in which the body tips or is unrestrained is not in the envelope or the design loads (see the note above the tables).");
    const csv = tableToCsv(t, Papa.unparse).split("\r\n");
    // the headings of the number columns carry the unit of their rows (here forces only: a pin and a contact)
    expect(csv[0]).toBe("Support,Component,Unit,Max (kN),Case of max,Min (kN),Case of min,Governing case");
    // every number at full precision: what the table holds, to the last bit
    const line = csv.find((l) => l.startsWith("rear,Normal n,kN,"))!.split(",");
    const rearN = t.rows.find((r) => r[0] === "rear" && r[1] === "Normal n")!;
    expect(line).toEqual(["rear", "Normal n", "kN", String(rearN[3]), "Dead", String(rearN[5]), "Ultimate", "Dead"]);
    expect(Number(line[3])).toBeCloseTo(nDead / 1000, 12);
    expect(Number(line[5])).toBeCloseTo(nUlt / 1000, 12);
  });

  it("design loads only from held runs", () => {
    const t = designLoadTable(study, "SI");
    const front = t.rows.find((r) => r[0] === "front")!;
    // ult: Fx = −750 N, Fy = 1.2·W − n_ult; dead: Fy = W/2. The larger resultant is ult's.
    expectRel(front[1] as number, Math.hypot(1.5 * T, 1.2 * W - nUlt) / 1000, 1e-9);
    expect(front[6]).toBe("Ultimate");
    expect(t.rows.find((r) => r[0] === "rear")![6]).toBe("Dead");
  });

  it("the cases table marks the governing cell by shape and names it in words", () => {
    const t = caseReactionTable(study, "SI");
    const at = (caseName: string, support: string) => t.rows.findIndex((r) => r[0] === caseName && r[1] === support);
    const gov = t.columns.findIndex((c) => c.key === "governs");
    const ultFront = at("Ultimate", "front");
    expect(t.marks![ultFront]!.fx).toEqual({ symbol: "▼", text: "governing case of Fx: the largest magnitude over the cases (its minimum)" });
    expect(t.rows[ultFront][gov]).toBe("design load; governs Fx ▼, Fy ▲");
    const deadRear = at("Dead", "rear");
    expect(t.marks![deadRear]!.n.symbol).toBe("▲");
    expect(t.rows[deadRear][gov]).toBe("design load; governs Fy ▲, Normal n ▲");
    expect(t.rows[at("Ultimate", "rear")][gov]).toBe("least margin (closest to lifting)");
    expect(t.rows[at("Thrust", "rear")][gov]).toBe("not in the envelope: s tips");
    expect(t.marks![at("Thrust", "rear")]).toBeUndefined();
  });
});

describe("load groups counted more than once in a combination", () => {
  it("cases of one load group each: nothing to warn about", () => {
    const file = fileOf(stand());
    expect(combinationOverlaps(file, file.combinations![0])).toEqual([]);
  });

  it("1.2 normal + 1.5 test of two whole cases counts the weight 2.7 times", () => {
    const file = fileOf(
      stand({
        cases: [
          { id: "normal", name: "Normal" },
          { id: "test", name: "Test", factors: { thrust: 2 } },
        ],
        combinations: [{ id: "k", name: "K", terms: [{ case: "normal", factor: 1.2 }, { case: "test", factor: 1.5 }] }],
      }),
    );
    const k = file.combinations![0];
    expect(combinationOverlaps(file, k)).toEqual([
      { group: "dead", terms: [{ case: "normal", factor: 1.2 }, { case: "test", factor: 1.5 }], total: 2.7 },
      { group: "thrust", terms: [{ case: "normal", factor: 1.2 }, { case: "test", factor: 3 }], total: 4.2 },
    ]);
    expect(combinationWarnings(file, k)[0]).toBe(
      'Load group "dead" (the weights) is in normal (× 1.2) and test (× 1.5): it is counted 2.7 times. Give each case of a combination its own load groups (set the others to 0 in the case) so each load is counted once.',
    );
  });
});

describe("a group whose loads come to nothing in a case is not in it", () => {
  it("the exhaust stack's uplift check, its cases stopping the flow and the duct's pressure by their values: the flow group is counted nowhere", async () => {
    const { exampleById } = await import("@/canvas/examples");
    const stack = exampleById("exhaust-stack")!.sketch;
    // the demo zeroes the groups by factors; here each case turns its flow off (× 0) and its duct's pressure to 0 instead
    const byValues = (pDuct: string) =>
      fileOf({
        ...stack,
        cases: [
          { id: "weight", name: "Weight only", parameters: { p_duct: pDuct }, factors: { wind: 0 }, flowFactor: 0, onlyInCombinations: true },
          { id: "wind-30", name: "Wind only", parameters: { v: "30 m/s", p_duct: pDuct }, factors: { dead: 0 }, flowFactor: 0, onlyInCombinations: true },
        ],
      });
    const k = stack.combinations!.find((c) => c.id === "uplift")! as Parameters<typeof combinationOverlaps>[1];
    expect(combinationOverlaps(byValues("0 kPa"), k)).toEqual([]);
    // with the duct's 2 kPa left in both cases, its p·A is in each (the flow factor scales ṁ and V, not pressure)
    expect(combinationOverlaps(byValues("2 kPa"), k)).toEqual([{ group: "flow", terms: [{ case: "weight", factor: 0.9 }, { case: "wind-30", factor: 1.5 }], total: 2.4 }]);
    // and the demo as shipped, by group factors, is clean too
    const demo = fileOf(stack);
    expect(combinationOverlaps(demo, demo.combinations![0])).toEqual([]);
  });
});

describe("factors of safety with their figures (common practice)", () => {
  // A block of weight W, base b, on two friction contacts, pushed by P at height h:
  // overturning W·b/2 over P·h about the toe; sliding μ·W over P.
  const Wb = 800 * G0;
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
  });

  it("restoring and overturning moments, friction available and driving force, in kN·m and kN", () => {
    const t = stabilityTable(solveCases(fileOf(doc)), "SI");
    expect(t.columns.map((c) => c.key)).toEqual(["case", "body", "check", "resisting", "acting", "unit", "factor", "required", "verdict", "note"]);
    const [ot, sl] = t.rows;
    expect(ot[2]).toBe("overturning");
    expectRel(ot[3] as number, (Wb * b) / 2 / 1000, 1e-9);
    expectRel(ot[4] as number, (P * h) / 1000, 1e-9);
    expect(ot[5]).toBe("kN·m");
    // the factor unrounded, as every other number of the table (the page rounds it to show it)
    expectRel(ot[6] as number, (Wb * b) / 2 / (P * h), 1e-9);
    // the support the body would tip about, under its own heading
    // (or, for a factor without bound, the words the number column cannot hold)
    expect(t.columns[9].label).toBe("Tips about, or note");
    expect(ot[9]).toBe("toe");
    expect(sl[2]).toBe("sliding");
    expectRel(sl[3] as number, (mu * Wb) / 1000, 1e-9);
    expectRel(sl[4] as number, P / 1000, 1e-9);
    expect(sl[5]).toBe("kN");
  });

  it("a block that tips is taken as a whole against sliding: μ·W over P, not the one contact left bearing", () => {
    // P·h > W·b/2: it tips about the toe; the heel would have to pull
    const Pbig = 4000;
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    const tipping: any = structuredClone(doc);
    tipping.loads[0].fx = Pbig;
    const study = solveCases(fileOf(tipping));
    const run = study.runs[0];
    if (!run.ok) throw new Error("did not solve");
    expect(run.result.bodies.blk.status).toBe("tips");
    const sl = run.stability.blk.sliding;
    if ("notApplicable" in sl) throw new Error(sl.notApplicable);
    expectRel(sl.available, mu * Wb, 1e-9);
    expectRel(sl.driving, Pbig, 1e-9);
    expectRel(sl.factor, (mu * Wb) / Pbig, 1e-9);
    expect(sl.wholeBody).toBe(true);
    expect(stabilityTable(study, "SI").rows[1][2]).toBe("sliding (as a whole: it tips)");
    // with a different μ at the heel the sums depend on how the contacts share the load: not assessed
    tipping.supports[0].mu = 0.3;
    const mixed = solveCases(fileOf(tipping)).runs[0];
    if (!mixed.ok) throw new Error("did not solve");
    expect(mixed.stability.blk.sliding).toEqual({ notApplicable: "the body tips; its contacts differ in μ or direction, so sliding is not assessed apart from it" });
  });

  it("in US units the moments are in lbf·ft (1 lbf·ft = 1.3558179483 N·m, NIST SP 811)", () => {
    const t = stabilityTable(solveCases(fileOf(doc)), "US");
    const [ot, sl] = t.rows;
    expect(ot[5]).toBe("lbf·ft");
    expectRel(ot[3] as number, (Wb * b) / 2 / 1.3558179483, 1e-9);
    expect(sl[5]).toBe("lbf");
    expectRel(sl[4] as number, P / 4.4482216152605, 1e-9);
  });
});

describe("a case that slides stays in the envelope, and says so", () => {
  it("names the case and the body, and only that one", async () => {
    // The monitor trailer example (950 kg): at its rated 2000 gpm its contacts together need more
    // friction than μ = 0.55 gives (it slides as a whole), at 1250 gpm they do not.
    const { exampleById } = await import("@/canvas/examples");
    const file = structuredClone(exampleById("fire-monitor-trailer")!.sketch) as SketchFileInput;
    file.cases = [
      { id: "low", name: "Low flow 1250 gpm", parameters: { Q: "1250 gpm" } },
      { id: "rated", name: "Rated 2000 gpm", parameters: { Q: "2000 gpm" } },
    ];
    const study = solveCases(fileOf(file));
    const rated = study.runs.find((r) => r.id === "rated")!;
    if (!rated.ok) throw new Error();
    expect(rated.result.warnings.some((w) => w.code === "SLIP")).toBe(true);
    expect(study.excluded).toEqual([]);
    const words = slipWords(study);
    expect(words).toHaveLength(1);
    expect(words[0]).toMatch(/^Rated 2000 gpm — Monitor trailer slides: in the envelope and the design loads with the friction its contacts would need to hold it, more than μ·n gives in all\./);
    // one contact over its own μ while the body has friction to spare is not a slide: the
    // ballasted trailer (1250 kg) at 2000 gpm, whose wheels slip while the foot has friction left
    file.bodies![0] = { ...file.bodies![0], mass: "1250 kg", cg: [2.1, 0.85] };
    const ballasted = solveCases(fileOf(file));
    const r = ballasted.runs.find((x) => x.id === "rated")!;
    if (!r.ok) throw new Error();
    expect(r.result.warnings.some((w) => w.code === "SLIP")).toBe(true);
    expect(slipWords(ballasted)).toEqual([]);
  });
});

// Cases that give a governing value alike are all named and all marked: a 100 kg block (weight at
// x = 1.5 m) on a pin at x = 1 m and a contact at x = 2 m, pushed sideways at the pin's height by P
// (no moment about the pin). Statics by hand (common practice): the pin takes Fx = −P and
// Fy = W/2, the contact n = W·0.5 m / 1 m = W/2, whatever P is.
describe("governing cases that tie, named and marked in every table", () => {
  const Wb = 100 * G0;
  const pushed = () =>
    solveCases(
      fileOf(
        sketch({
          parameters: { P: "100 N" },
          bodies: [{ id: "b", outline: box(2, 1), mass: 100, cg: [1.5, 0.5] }],
          supports: [
            { id: "pin", label: "pin", body: "b", kind: "pin", at: [1, 0] },
            { id: "foot", label: "foot", body: "b", kind: "contact", at: [2, 0], angle: 90 },
          ],
          loads: [{ id: "p", body: "b", kind: "force", at: [0, 0], fx: "P", fy: 0 }],
          cases: [
            { id: "east", name: "Push east", parameters: { P: "100 N" } },
            { id: "west", name: "Push west", parameters: { P: "-100 N" } },
            { id: "light", name: "Light push", parameters: { P: "50 N" } },
          ],
        }),
      ),
    );

  it("the envelope's governing case names every case of a tie", () => {
    const s = pushed();
    const t = envelopeTable(s, "SI");
    const row = (support: string, component: string) => t.rows.find((r) => r[0] === support && r[1] === component)!;
    const gov = t.columns.findIndex((c) => c.key === "governs");
    // |Fx| = 100 N pushed either way: east gives −100 N, west +100 N
    expect(row("pin", "Fx")[3]).toBeCloseTo(100, 9);
    expect(row("pin", "Fx")[5]).toBeCloseTo(-100, 9);
    expect(row("pin", "Fx")[gov]).toBe("Push east and Push west (equal)");
    // Fy = W/2 = 490.3 N in all three: a tie of three
    expectRel(row("pin", "Fy")[3] as number, Wb / 2, 1e-9);
    expect(row("pin", "Fy")[gov]).toBe("Push east, Push west and Light push (equal)");
    expect(row("foot", "Margin")[gov]).toBe("Push east, Push west and Light push (equal)");
    // the pin's largest resultant, √(100² + (W/2)²) = 500.4 N, east and west alike
    const d = designLoadTable(s, "SI").rows.find((r) => r[0] === "pin")!;
    expectRel(d[1] as number, Math.hypot(100, Wb / 2), 1e-9);
    expect(d[6]).toBe("Push east and Push west (equal)");
  });

  it("the cases table marks each case of a tie, by the end its own value is at", () => {
    const s = pushed();
    const t = caseReactionTable(s, "SI");
    const at = (caseName: string) => t.rows.findIndex((r) => r[0] === caseName && r[1] === "pin");
    const gov = t.columns.findIndex((c) => c.key === "governs");
    // east's Fx is the minimum (−100 N, ▼), west's the maximum (+100 N, ▲): both govern
    expect(t.marks![at("Push east")]!.fx.symbol).toBe("▼");
    expect(t.marks![at("Push west")]!.fx.symbol).toBe("▲");
    expect(t.marks![at("Light push")]?.fx).toBeUndefined();
    expect(t.rows[at("Push east")][gov]).toBe("design load; governs Fx ▼, Fy ▲");
    expect(t.rows[at("Push west")][gov]).toBe("design load; governs Fx ▲, Fy ▲");
    // the light push governs Fy alike (W/2 in every case), not Fx
    expect(t.rows[at("Light push")][gov]).toBe("governs Fy ▲");
  });
});

/** A 200 kg beam (weight at x = 1 m) on a pin at x = 0, a pad (a contact facing up) at x = 2 m
 *  and an anchor bolt (a tie pulling down) at x = 1 m. */
const beamOnBolt = (extra: Partial<SketchFileInput>): SketchFileInput =>
  sketch({
    bodies: [{ id: "s", outline: box(2, 0.5), mass: 200, cg: [1, 0.25] }],
    supports: [
      { id: "pin", body: "s", kind: "pin", at: [0, 0] },
      { id: "pad", body: "s", kind: "contact", at: [2, 0], angle: 90 },
      { id: "bolt", body: "s", kind: "tie", at: [1, 0], angle: -90 },
    ],
    ...extra,
  });

describe("a tie slack in every case carries nothing: no margin, no design load", () => {
  // A 200 kg beam (weight at x = 1 m) on a pin at x = 0 and a contact at x = 2 m, with an anchor
  // bolt (a tie pulling down) at x = 1 m. Statics by hand (common practice): the weight presses
  // the beam down, so the bolt would have to push and goes slack in every case; the contact
  // carries n = W/2 (moments about the pin), 1.5·W/2 in the heavy case.
  const doc = beamOnBolt({
    cases: [
      { id: "dead", name: "Dead" },
      { id: "heavy", name: "Heavy", factors: { dead: 1.5 } },
    ],
  });
  const study = solveCases(fileOf(doc));

  it("says no case governs the slack bolt's margin or is its design load; the bearing pad's least margin is closest to lifting", () => {
    const t = caseReactionTable(study, "SI");
    const gov = t.columns.findIndex((c) => c.key === "governs");
    const row = (caseName: string, support: string) => t.rows.find((r) => r[0] === caseName && r[1] === support)!;
    for (const run of study.runs) {
      if (!run.ok) throw new Error();
      expect(run.result.reactions.bolt.state).toBe("slack");
      // the solver's margin (−k·gap) stays below zero for sweeps; the envelope counts it 0
      expect(run.result.reactions.bolt.margin).toBeLessThan(0);
    }
    expect(study.envelope.bolt.components.margin).toMatchObject({ max: { value: 0 }, min: { value: 0 } });
    const dead = study.runs.find((r) => r.id === "dead")!;
    if (!dead.ok) throw new Error();
    expectRel(dead.result.reactions.pad.n!, W / 2, 1e-6);
    const boltWords = ["Dead", "Heavy"].map((c) => String(row(c, "bolt")[gov])).join(" | ");
    expect(boltWords).not.toMatch(/design load|closest to going slack|least margin/);
    expect(String(row("Dead", "pad")[gov])).toContain("least margin (closest to lifting)");
    expect(String(row("Heavy", "pad")[gov])).toContain("design load");
  });

  it("the design-load table gives the bolt no case and no direction", () => {
    const t = designLoadTable(study, "SI");
    const r = t.rows.find((x) => x[0] === "bolt")!;
    const col = (k: string) => t.columns.findIndex((c) => c.key === k);
    expect(r[col("design")]).toBe(0);
    expect(r[col("angle")]).toBeNull();
    expect(r[col("case")]).toBe("none: carries nothing in any case");
    // the pad: W/2 up in Dead, 1.5·W/2 in Heavy (kN)
    const pad = t.rows.find((x) => x[0] === "pad")!;
    expectRel(pad[col("design")] as number, (1.5 * W) / 2 / 1000, 1e-6);
    expect(pad[col("angle")]).toBeCloseTo(90, 9);
    expect(pad[col("case")]).toBe("Heavy");
  });
});

describe("a tie slack in one case and taut in another: its least margin is where it is slack, said as carrying nothing", () => {
  // The same beam with an uplift P = 4000 N up at x = 1.5 m in the "Uplift" case. With the pad
  // lifted, the pin and the bolt are determinate; moments about the pin (common practice):
  // P·1.5 − W·1 − T·1 = 0 → T = 1.5·P − W = 4038.7 N. In "Dead" (P × 0) the bolt is slack as above.
  const P = 4000;
  const doc = beamOnBolt({
    loads: [{ id: "up", body: "s", kind: "force", at: [1.5, 0.5], fx: 0, fy: P }],
    cases: [
      { id: "dead", name: "Dead", factors: { loads: 0 } },
      { id: "uplift", name: "Uplift" },
    ],
  });
  const study = solveCases(fileOf(doc));

  it("takes T = 1.5·P − W in Uplift, and names Dead (slack: carries nothing) as the least margin", () => {
    const up = study.runs.find((r) => r.id === "uplift")!;
    if (!up.ok) throw new Error();
    expect(up.result.reactions.pad.state).toBe("lifted");
    expectRel(up.result.reactions.bolt.n!, 1.5 * P - W, 1e-9);
    // pin, pad lifted and bolt taut: determinate as solved, though three supports as drawn are not
    expect(up.result.bodies.s.determinacy).toEqual({ kind: "indeterminate", degree: 1 });
    expect(up.result.bodies.s.activeDeterminacy).toEqual({ kind: "determinate", degree: 0 });
    expect(up.result.warnings.map((w) => w.code)).toEqual(["LIFTOFF"]);
    expect(study.envelope.bolt.components.margin).toMatchObject({ min: { value: 0, case: "dead" } });
    const t = caseReactionTable(study, "SI");
    const gov = t.columns.findIndex((c) => c.key === "governs");
    const row = (caseName: string, support: string) => String(t.rows.find((r) => r[0] === caseName && r[1] === support)![gov]);
    expect(row("Dead", "bolt")).toContain("least margin (slack: carries nothing)");
    expect(row("Uplift", "bolt")).toContain("design load");
    expect(row("Uplift", "pad")).toContain("least margin (lifted off: carries nothing)");
  });
});
