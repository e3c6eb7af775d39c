// The calc sheet of a demo version read as a checker reads it: every reaction printed is the solve's,
// in the sheet's unit family, to 4 significant figures with trailing zeros kept; the hand-check
// lines print the same sums; the equations printed are the ones solved; the cautions are there.
// (Invented demo scenarios; the reactions themselves are worked by hand in demo-hand-checks.test.ts.)
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { DEMO_SKETCHES, demoVersions } from "@/db/seed-sketches";
import { CAUTIONS, parseSketch, solve, type SolveResult } from "@/solver";
import { LBF_N } from "@/solver/constants";
import { formatNumber } from "@/solver/units";
import { pdfText } from "../../support/pdf-text";

const LBF_FT = LBF_N * 0.3048; // N·m in one lbf·ft (NIST SP 811)
const fig = (x: number) => formatNumber(x, 4, { keepZeros: true });

async function sheetOf(id: string, version: number, units: "SI" | "US" = "SI") {
  const doc = demoVersions(DEMO_SKETCHES.find((s) => s.id.endsWith(id))!)[version - 1].doc;
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const result: SolveResult = solve(p.sketch);
  const buf = await buildCalcSheet({
    workspace: "Demo",
    sketchTitle: String(doc.title),
    version,
    versionMessage: "check",
    savedAt: new Date("2026-11-30T10:00:00Z"),
    generatedAt: new Date("2026-12-01T08:00:00Z"),
    signoff: [],
    file: doc as never,
    units,
  });
  return { text: (await pdfText(buf)).text, result };
}

describe("the calc sheet of the DN150 bend at its hydrotest (demo a4, v2)", () => {
  it("in SI: the anchor's row is the solve's reaction in kN and kN·m, and the hand check's sums", async () => {
    const { text, result } = await sheetOf("a4", 2);
    const a = result.reactions.anchor;
    // −26.62 kN, 27.43 kN, resultant 38.23 kN, −2.566 kN·m (worked by hand in demo-hand-checks.test.ts)
    expect(text).toContain(`anchor ${fig(a.fx / 1000)} ${fig(a.fy / 1000)} ${fig(Math.hypot(a.fx, a.fy) / 1000)} ${fig(a.m / 1000)} — — holds`.replace(/-/g, "−"));
    expect(fig(a.fx / 1000)).toBe("−26.62");
    expect(fig(a.m / 1000)).toBe("−2.566");
    // the hand check: the momentum side equals Σ(ṁV)out − Σ(ṁV)in of the solve, −0.1144 and 0.1144 kN
    const m = result.bodies.bend.momentum;
    expect(text).toContain(`ΣFx = ${fig(m.fx / 1000)} kN and Σ(ṁV)x = ${fig(m.fx / 1000)} kN`);
    expect(text).toContain(`ΣFy = ${fig(m.fy / 1000)} kN and Σ(ṁV)y = ${fig(m.fy / 1000)} kN`);
    // the equations printed are those solved
    expect(text).toContain("ΣF(reactions) + ΣF(loads) + W + ΣF(pressure) − m·a = Σ(ṁV)out − Σ(ṁV)in");
    expect(text).toContain("p·A along the flow at an inlet, against it at an outlet");
    for (const c of CAUTIONS) expect(text).toContain(c);
  });

  it("in US customary units: lbf and lbf·ft from the same reactions, and the conventions do not say the hand check's lengths are in m", async () => {
    const { text, result } = await sheetOf("a4", 2, "US");
    const a = result.reactions.anchor;
    // 26 621.6 N / 4.448 222 N/lbf = 5 985 lbf; 2 566.3 N·m / 1.355 818 N·m per lbf·ft = 1 893 lbf·ft (NIST SP 811)
    expect(text).toContain(`anchor ${fig(a.fx / LBF_N)} ${fig(a.fy / LBF_N)} ${fig(Math.hypot(a.fx, a.fy) / LBF_N)} ${fig(a.m / LBF_FT)} — — holds`);
    expect(fig(a.fx / LBF_N)).toBe("−5,985");
    expect(fig(a.m / LBF_FT)).toBe("−1,893");
    // the hand check's points are in ft: (0.09, 0) m is (0.2953, 0) ft
    expect(text).toContain("M about (0.2953, 0) ft (lbf·ft)");
    expect(text).not.toContain("lengths in m from the sketch's origin");
  });
});

describe("the calc sheet of the monitor trailer with ballast (demo a2, v3)", () => {
  it("each contact's n and t, and the stability figures worked from them", async () => {
    const { text, result } = await sheetOf("a2", 3);
    const r = result.reactions;
    for (const [id, label] of [
      ["foot", "rear stabiliser foot"],
      ["axle", "axle (both wheels)"],
    ] as const) {
      const x = r[id];
      const state = id === "axle" ? "slips" : "bearing";
      expect(text).toContain(`${label} ${fig(x.fx / 1000)} ${fig(x.fy / 1000)} ${fig(Math.hypot(x.fx, x.fy) / 1000)} ${fig(x.n! / 1000)} ${fig(x.t! / 1000).replace(/^-/, "−")} ${state}`);
    }
    // sliding: Σμ·n of the bearing friction contacts over |Σt| = 0.55·(10.65 + 6.240)/8.684 = 1.070
    const available = 0.55 * (r.foot.n! + r.axle.n!);
    const driving = Math.abs(r.foot.t! + r.axle.t!);
    expect(text).toContain(`Monitor trailer sliding ${fig(available / 1000)} ${fig(driving / 1000)} kN ${fig(available / driving)} 1.500 FAIL`);
    expect(fig(available / driving)).toBe("1.070");
  });
});

describe("the calc sheet of the thrust stand that tips (demo a3, v1)", () => {
  it("the rear pad's pull, and the pin named by its label where the sheet says it resists sliding", async () => {
    const { text } = await sheetOf("a3", 1);
    // n = (W·0.8 − 2200·1.5)/1.6 = −1.082 kN (demo-hand-checks.test.ts)
    expect(text).toContain("rear pad 0 −1.082 1.082 −1.082 0 would pull");
    expect(text).toContain("sliding is resisted by the “front pin”");
  });
});
