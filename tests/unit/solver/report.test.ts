// Result tables shared by the panel, the CSV export and the calc sheet.
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { caseReactionTable, envelopeTable, handCheckTable, inputsTable, parametersTable, parseSketch, reactionTable, solve, solveCases, stabilityTable, tableToCsv } from "@/solver";
import { LBF_N } from "@/solver/constants";
import { designLoadTable } from "@/solver/report";
import { loadFixture } from "./helpers";

const parsedFixture = (name: string) => {
  const p = parseSketch(loadFixture(name));
  if (!p.ok) throw new Error();
  return p;
};

describe("result tables", () => {
  it("reactions in kN, and the load on the support is the same with its sign reversed", () => {
    const r = solve(parsedFixture("thrust-stand-tips.json").sketch);
    const onBody = reactionTable(r, "SI");
    const onSupport = reactionTable(r, "SI", { onSupport: true });
    const fx = onBody.columns.findIndex((c) => c.key === "fx");
    expect(onBody.columns[fx].unit).toBe("kN");
    expect(onBody.rows[0][0]).toBe("front");
    expect(onBody.rows[0][fx]).toBeCloseTo(r.reactions.front.fx / 1000, 12);
    expect(onSupport.rows[0][fx]).toBeCloseTo(-r.reactions.front.fx / 1000, 12);
    expect(onSupport.notes![0]).toMatch(/sign reversed/);
  });

  it("a body that is not held (tips, or free to move) is named under its reactions: the rows are what equilibrium would need", () => {
    const tips = solve(parsedFixture("thrust-stand-tips.json").sketch);
    expect(Object.values(tips.bodies)[0].status).toBe("tips");
    const id = Object.keys(tips.bodies)[0];
    expect(reactionTable(tips, "SI", { names: { [id]: "Test stand" } }).notes).toEqual([
      "Not held: Test stand. Its supports' rows are the forces equilibrium would need, not loads the supports carry; the margins mean nothing until the body is held.",
    ]);
    const free = solve(parsedFixture("skid-on-rollers-unrestrained.json").sketch);
    expect(reactionTable(free, "SI").notes?.[0]).toMatch(/^Not held: /);
    // a body that holds: no such note
    expect(reactionTable(solve(parsedFixture("pump-skid-discharge.json").sketch), "SI").notes).toBeUndefined();
  });

  it("the state column says what the panel says: a contact over its μ slips, one a tipping body would need to pull 'would pull', in the CSV too", () => {
    // pump-skid-slip: both feet need more than μ = 0.02 (|t|/n = 0.023 and 0.027)
    const slip = solve(parsedFixture("pump-skid-slip.json").sketch);
    const t = reactionTable(slip, "SI");
    const state = t.columns.findIndex((c) => c.key === "state");
    for (const row of t.rows) expect(row[state], String(row[0])).toBe("slips");
    const csv = Papa.parse<string[]>(tableToCsv(t, Papa.unparse)).data;
    expect(csv[1][state]).toBe("slips");
    // thrust-stand-tips: the rear pad would have to pull, so it is drawn lifted (dashed); its row
    // gives the pull it would need, and says so rather than "lifts" beside a force it cannot give
    const tips = solve(parsedFixture("thrust-stand-tips.json").sketch);
    expect(tips.bodies[Object.keys(tips.bodies)[0]].status).toBe("tips");
    const rows = reactionTable(tips, "SI").rows;
    const words = rows.map((row) => row[state]);
    expect(Object.values(tips.reactions).map((r) => r.state)).toContain("lifted");
    expect(words).toContain("would pull");
    expect(words).not.toContain("lifts");
    // a contact that lifts while the body still holds on its other supports: "lifts" (statics)
    const held = solve(parsedFixture("pump-set-hold-down.json").sketch);
    expect(Object.values(held.bodies)[0].status).toBe("lifts");
    expect(reactionTable(held, "SI").rows.map((row) => row[state])).toContain("lifts");
  });

  it("US customary columns in lbf", () => {
    const r = solve(parsedFixture("thrust-stand-tips.json").sketch);
    const t = reactionTable(r, "US");
    const fx = t.columns.findIndex((c) => c.key === "fx");
    expect(t.columns[fx].unit).toBe("lbf");
    expect(t.rows[0][fx]).toBeCloseTo(r.reactions.front.fx / LBF_N, 9);
  });

  it("the hand-check table closes: the two sums print alike and the imbalance is zero or said to be rounding", () => {
    const r = solve(parsedFixture("pump-skid-discharge.json").sketch);
    const t = handCheckTable(r, "skid", [2, 1], "SI");
    // titled by the body's id, or by the name the drawing gives it
    expect(t.title).toMatch(/^Hand check of skid: ΣF = /);
    expect(handCheckTable(r, "skid", [2, 1], "SI", { name: "Pump skid" }).title).toMatch(/^Hand check of Pump skid: ΣF = /);
    const last = t.rows[t.rows.length - 1];
    expect(last[1]).toMatch(/imbalance/);
    // rounding noise of the sums is not a figure, nor is it hidden as a bare 0: each difference is
    // exactly zero or its noise in e-notation, marked as rounding; the two sums then print alike
    const [forces, momentum] = t.rows.slice(-3, -1);
    // (the cell holds the number, so a CSV reads it as one; the sheet prints its mark's words)
    const marks = t.marks?.[t.rows.length - 1] ?? {};
    for (const [k, key] of [[2, "fx"], [3, "fy"], [5, "m"]] as const) {
      expect(typeof last[k]).toBe("number");
      const shown = marks[key]?.shown;
      expect(last[k] === 0 ? shown === undefined : /^−?\d(\.\d)?e-\d+ \(rounding\)$/.test(String(shown)), `${last[k]} ${shown}`).toBe(true);
      expect(forces[k]).toBe(momentum[k]);
    }
    expect(t.notes!.join(" ")).toContain("The two sides agree to 4 significant figures in ΣFx, ΣFy and ΣM");
    expect(t.figures).toBe(4);
    expect(t.rows.some((row) => row[1] === "momentum out at “discharge”")).toBe(true);
    // the point is named with its unit, in the title and the moment column; points use a true minus;
    // its coordinates follow the check's one rule (4 significant figures, zeros kept)
    expect(t.title).toMatch(/ΣM about \(2\.000, 1\.000\) m$/);
    expect(t.columns[5].label).toBe("M about (2.000, 1.000) m");
    expect(t.rows.map((row) => String(row[4])).filter((a) => a.startsWith("("))).toContain("(0.2000, 0)");
    expect(t.rows.map((row) => String(row[4])).join(" ")).not.toMatch(/-/);
    // one unit family: kN with kN·m, never kN beside N·m
    expect([t.columns[2].unit, t.columns[5].unit]).toEqual(["kN", "kN·m"]);
  });

  it("a hand check about a point in US units names it in feet: (3.281, 0) ft for (1, 0) m (NIST SP 811)", () => {
    const r = solve(parsedFixture("pump-skid-discharge.json").sketch);
    const t = handCheckTable(r, "skid", [1, 0], "US");
    expect(t.columns[5].label).toBe("M about (3.281, 0) ft");
  });

  it("an inlet's term reads as what it is on the right-hand side: minus the momentum in", () => {
    // ΣF = Σ(ṁV)out − Σ(ṁV)in (the momentum equation of a control volume, common practice): the
    // inlet's row is −ṁV along its flow, here the bend's inlet flowing +x
    const r = solve(parsedFixture("pipe-bend-anchor.json").sketch);
    const row = handCheckTable(r, "bend", [0, 0], "SI").rows.find((x) => String(x[1]).startsWith("momentum in at"))!;
    expect(row).toBeDefined();
    expect(String(row[1])).toMatch(/^momentum in at .*, as −ṁV$/);
    expect(row[2] as number).toBeLessThan(0);
  });

  it("case, envelope and stability tables, and CSV with units in the header", () => {
    const doc = loadFixture("fire-monitor-trailer.json");
    doc.cases = [
      { id: "low", name: "Low", parameters: { theta: "15 deg" } },
      { id: "high", name: "High", parameters: { theta: "60 deg" } },
    ];
    const p = parseSketch(doc);
    if (!p.ok) throw new Error();
    const study = solveCases(p.file);
    const cases = caseReactionTable(study, "SI");
    expect(cases.rows).toHaveLength(6);
    const env = envelopeTable(study, "SI");
    // three friction contacts: Fx, Fy, n, t and the margin of each, no moment
    // named by their labels, as the drawing and the results panel name them
    expect(env.rows.map((r) => `${r[0]} ${r[1]}`)).toEqual(["rear stabiliser leg", "wheel", "front jack"].flatMap((s) => ["Fx", "Fy", "Normal n", "Tangential t", "Margin"].map((c) => `${s} ${c}`)));
    expect(new Set(cases.rows.map((r) => r[1]))).toEqual(new Set(["rear stabiliser leg", "wheel", "front jack"]));
    const st = stabilityTable(study);
    expect(st.rows.filter((r) => r[2] === "overturning")).toHaveLength(2);
    const design = designLoadTable(study, "SI");
    const csv = tableToCsv(design, Papa.unparse);
    expect(csv.split("\r\n")[0]).toBe("Support,Design load (kN),at angle (°),Fx (kN),Fy (kN),M (kN·m),from case");
    const back = Papa.parse<string[]>(csv).data;
    expect(Number(back[1][1])).toBeCloseTo(study.envelope.leg.design.resultant / 1000, 4);
  });

  it("inputs as typed and as evaluated", () => {
    const p = parsedFixture("pipe-bend-anchor.json");
    const t = inputsTable(p);
    const out = t.rows.find((r) => r[0] === "out")!;
    expect(out[1]).toBe("outlet");
    expect(out[4]).toContain("angle theta = 60°");
    expect(out[4]).toContain("at (0.6 * cos(theta) = 0.3, 0.6 * sin(theta) = 0.51962) m");
    expect(t.rows[0]).toEqual(["gravity", "", "", "", "0 m/s² (acts in −y)"]);
    const params = parametersTable(p);
    expect(params.rows.find((r) => r[0] === "p1")).toEqual(["p1", "600 kPa", "600 kPa"]);
    // a US sheet gives the value in US customary units too: 600 kPa / 6894.757 Pa/psi = 87.02 psi (NIST SP 811)
    expect(parametersTable(p, "US").rows.find((r) => r[0] === "p1")).toEqual(["p1", "600 kPa", "600 kPa (87.02 psi)"]);
    // written in a US unit already, a value is not repeated beside itself
    const gpm = parseSketch({ ...loadFixture("pipe-bend-anchor.json"), parameters: { ...loadFixture("pipe-bend-anchor.json").parameters, flow: "2000 gpm", p2: "40 psi" } });
    if (!gpm.ok) throw new Error(JSON.stringify(gpm.errors));
    const us = parametersTable(gpm, "US").rows;
    expect(us.find((r) => r[0] === "flow")).toEqual(["flow", "2000 gpm", "2,000 gpm"]);
    expect(us.find((r) => r[0] === "p2")).toEqual(["p2", "40 psi", "40 psi"]);
  });

  it("a parameter's value: a true minus and grouped thousands; angles and ratios have no US twin", async () => {
    const { exampleById } = await import("@/canvas/examples");
    const p = parseSketch(exampleById("pipe-bend-anchor")!.sketch);
    if (!p.ok) throw new Error();
    const rows = new Map(parametersTable(p, "US").rows.map((r) => [r[0], r[2]]));
    // π/4 × (150 mm)² = 17,671.5 mm² = 27.39 in² (1 in = 25.4 mm exactly, NIST SP 811)
    expect(rows.get("A_pipe")).toBe("17,671.5 mm² (27.39 in²)");
    const cart = parseSketch(exampleById("washing-cart")!.sketch);
    if (!cart.ok) throw new Error();
    expect(new Map(parametersTable(cart, "US").rows.map((r) => [r[0], r[2]])).get("theta")).toBe("−75 deg");
  });

  it("writes values as the rest of the sheet does: a true minus, thousands grouped, kPa for pascals, 90° for angles", async () => {
    const { exampleById } = await import("@/canvas/examples");
    const p = parseSketch(exampleById("pump-skid")!.sketch);
    if (!p.ok) throw new Error();
    const t = inputsTable(p);
    // 1 bar = 100 kPa (SI Brochure, 9th ed., Table 8)
    expect(t.rows.find((r) => r[0] === "suction")![4]).toContain("pressure -0.4 bar = −40 kPa");
    expect(t.rows.find((r) => r[0] === "discharge")![4]).toContain("pressure 2.5 bar = 250 kPa");
    expect(t.rows.find((r) => r[0] === "rear")![4]).toContain("angle 90°; mu 0.4");
  });

  it("a US sheet's inputs give the US customary value beside the SI one", () => {
    // 600 kPa / 6894.757 Pa/psi = 87.02 psi; 0.3 m / 0.3048 m/ft = 0.9843 ft (NIST SP 811)
    const t = inputsTable(parsedFixture("pipe-bend-anchor.json"), "US");
    const inlet = t.rows.find((r) => r[0] === "in")!;
    expect(inlet[4]).toContain("pressure p1 = 600 kPa (87.02 psi)");
    const out = t.rows.find((r) => r[0] === "out")!;
    expect(out[4]).toContain("at (0.6 * cos(theta) = 0.3, 0.6 * sin(theta) = 0.51962) m = (0.9843, 1.705) ft");
    expect(t.title).toMatch(/US customary in brackets/);
    // angles stay in degrees, with no second value
    expect(out[4]).toContain("angle theta = 60°;");
  });
});

describe("one unit per table, chosen by its largest value", () => {
  /** A 4 kg bench cart on two wheels, a 30 N jet pushing it back at 0.2 m (small test rig, invented). */
  const cart = (mass: number, jet: number) => {
    const p = parseSketch({
      format: "counterpoise.sketch",
      version: 1,
      bodies: [{ id: "cart", outline: [[0, 0], [0.6, 0], [0.6, 0.3], [0, 0.3]], mass }],
      supports: [
        { id: "rear", body: "cart", kind: "pin", at: [0, 0] },
        { id: "front", body: "cart", kind: "contact", at: [0.6, 0], angle: 90 },
      ],
      loads: [{ id: "jet", body: "cart", kind: "force", at: [0.6, 0.2], magnitude: jet, angle: 180 }],
    });
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    return solve(p.sketch);
  };

  it("a small rig's table is in N and N·m (not 0.03 kN); a skid's stays in kN; US stays in lbf", () => {
    const r = cart(4, 30);
    const t = reactionTable(r, "SI");
    const col = (key: string) => t.columns.findIndex((c) => c.key === key);
    expect(t.columns[col("fx")].unit).toBe("N");
    expect(t.columns[col("m")].unit).toBe("N·m");
    const rear = t.rows.find((row) => row[0] === "rear")!;
    // ΣFx = 0: the pin takes the whole 30 N jet, in N (statics, common practice)
    expect(rear[col("fx")]).toBeCloseTo(30, 9);
    // ΣM about the rear pin: W·0.3 − 30·0.2 = n·0.6 → n = (4·9.80665·0.3 − 6)/0.6 = 9.6133 N
    const front = t.rows.find((row) => row[0] === "front")!;
    expect(front[col("n")]).toBeCloseTo((4 * 9.80665 * 0.3 - 6) / 0.6, 6);
    // the hand check of the same rig: N, and its notes in N too
    const h = handCheckTable(r, "cart", [0, 0], "SI");
    expect(h.columns.find((c) => c.key === "fx")!.unit).toBe("N");
    expect(h.notes![0]).toMatch(/ΣFx = 0 N/);
    // a kilonewton somewhere: the whole table goes to kN
    const big = reactionTable(cart(4, 2000), "SI");
    expect(big.columns[col("fx")].unit).toBe("kN");
    expect(big.rows.find((row) => row[0] === "rear")![col("fx")]).toBeCloseTo(2, 9);
    expect(reactionTable(r, "US").columns[col("fx")].unit).toBe("lbf");
  });

  it("a US table with 10 kip or more is in kip and kip·ft, as the canvas labels are; below, lbf", () => {
    // 1 kip = 1000 lbf and 1 lbf = 4.448 221 615 260 5 N exactly (NIST SP 811, appendix B)
    const pushed = cart(4, 60_000); // a 60 kN jet on the small rig: 13.49 kip at the pin
    const t = reactionTable(pushed, "US");
    const col = (key: string) => t.columns.findIndex((c) => c.key === key);
    expect(t.columns[col("fx")].unit).toBe("kip");
    expect(t.columns[col("m")].unit).toBe("kip·ft");
    expect(t.rows.find((row) => row[0] === "rear")![col("fx")]).toBeCloseTo(60_000 / LBF_N / 1000, 9);
    // 9,000 lbf (40.03 kN) stays in lbf: kip only from 10 kip
    const under = reactionTable(cart(4, 9000 * LBF_N), "US");
    expect(under.columns[col("fx")].unit).toBe("lbf");
    expect(under.rows.find((row) => row[0] === "rear")![col("fx")]).toBeCloseTo(9000, 6);
  });

  it("one US family per table: a force under 10 kip and a moment under 10 kip·ft stay lbf and lbf·ft", async () => {
    // The DN150 bend example on its anchor at 10 bar: some 4 kip of force and 1.3 kip·ft of moment,
    // each under 10 of its kip unit, so lbf with lbf·ft (not lbf beside kip·ft). 1 lbf·ft =
    // 1.355 817 948 331 4 N·m (NIST SP 811, appendix B).
    const { exampleById } = await import("@/canvas/examples");
    const p = parseSketch(exampleById("pipe-bend-anchor")!.sketch);
    if (!p.ok) throw new Error();
    const t = reactionTable(solve(p.sketch), "US");
    const col = (key: string) => t.columns.findIndex((c) => c.key === key);
    expect([t.columns[col("fx")].unit, t.columns[col("m")].unit]).toEqual(["lbf", "lbf·ft"]);
    const si = reactionTable(solve(p.sketch), "SI");
    expect(si.columns[col("m")].unit).toBe("kN·m");
    expect(t.rows[0][col("m")] as number).toBeCloseTo(((si.rows[0][col("m")] as number) * 1000) / (LBF_N * 0.3048), 6);
    // a moment of 10 kip·ft or more takes the table to kip and kip·ft, forces included
    const big = { ...solve(p.sketch) };
    big.reactions = Object.fromEntries(Object.entries(big.reactions).map(([id, r]) => [id, { ...r, m: 20_000 }]));
    const k = reactionTable(big, "US");
    expect([k.columns[col("fx")].unit, k.columns[col("m")].unit]).toEqual(["kip", "kip·ft"]);
  });
});

describe("a body that tips about one contact of three", () => {
  // The monitor trailer (an invented scenario) on its rear foot, axle and front jack: as the flow
  // grows the jack lifts first, then the axle unloads until the trailer turns about the rear foot
  // alone. Past that the forces shown are those every support able to pull would need (the file
  // format's rule: there the jack pulls and the axle still pushes), but the axle too leaves its base.
  async function trailerAt(Q: string) {
    const { exampleById } = await import("@/canvas/examples");
    const { statusSentences } = await import("@/components/results/statusSentence");
    const { supportStates } = await import("@/canvas/render/results");
    const file = exampleById("fire-monitor-trailer")!.sketch;
    const p = parseSketch({ ...file, parameters: { ...file.parameters, Q } });
    if (!p.ok) throw new Error("the trailer parses");
    const result = solve(p.sketch);
    const rows = reactionTable(result, "SI").rows;
    const state = (id: string) => rows.find((r) => r[0] === id)![9];
    return { result, state, sentence: statusSentences(p.sketch, result)[0], drawn: supportStates(result) };
  }

  it("says the axle lifts as it tips, in the words, the table and the drawing, as its margin has said since it crossed zero", async () => {
    const held = await trailerAt("2200 gpm");
    expect(held.result.bodies.trailer.status).toBe("lifts");
    expect(held.result.reactions.axle.margin!).toBeGreaterThan(0);
    const tipped = await trailerAt("2930 gpm");
    expect(tipped.result.bodies.trailer.status).toBe("tips");
    // the contract's forces: the axle still pushes, the jack would pull
    expect(tipped.result.reactions.axle.n!).toBeGreaterThan(0);
    expect(tipped.result.reactions.jack.n!).toBeLessThan(0);
    // …but the axle's margin (the last engagement that held the trailer, carried on) is below zero
    expect(tipped.result.reactions.axle.margin!).toBeLessThan(0);
    expect(tipped.sentence.headline).toMatch(/^Tips about the rear stabiliser foot — the front jack .* would have to pull/);
    expect(tipped.sentence.details[0]).toBe(
      "The axle (both wheels) lifts off as well as it turns (below zero in the Margin column); the forces shown are those that would hold it with every support able to pull.",
    );
    expect(tipped.state("axle")).toBe("lifts as it tips");
    expect(tipped.state("foot")).toBe("bearing");
    expect(tipped.state("jack")).toBe("would pull");
    expect(tipped.drawn.get("axle")).toBe("lifted");
    expect(tipped.drawn.get("foot")).toBe("bearing");
  });
});
