// A case in which one contact slips while its body as a whole holds, but with less friction to spare
// than the required factor against sliding: the case table still marks the contact's "slips" and
// says the body holds (the stability table says the factor falls short), as a sweep's words say it.
import { describe, expect, it } from "vitest";
import { solveCases } from "@/solver";
import { caseReactionTable } from "@/solver/report";
import { G0 } from "@/solver/constants";
import { slipsWithFrictionToSpare, withSlipNote, SLIP_NOTE } from "@/components/studies/slipNote";
import { caseStateFindings } from "@/components/review/concerns";
import { fileOf, jetPushedBlock } from "../../support/jet-pushed-block";

/**
 * The 500 kg block (W = 500·g0, base 2 m) on the rear pad (μr = 0.2) and the front pad (μf = 0.5),
 * pushed +x at h = 1 m by a water jet of P = ρ·Q²/A = 1e5·Q² N. At Q = 0.12 m³/s, P = 1440 N
 * (rigid block, Coulomb friction: common practice; no source):
 *  - nr = (W − P)/2 = 1731.7 N, nf = (W + P)/2 = 3171.7 N, and each pad takes t = P/2 = 720 N;
 *  - the rear pad needs 720 N and has μr·nr = 346.3 N: it slips;
 *  - together they have μr·nr + μf·nf = 346.3 + 1585.8 = 1932.2 N against |Σt| = 1440 N: the block
 *    holds, with a factor against sliding of 1932.2 / 1440 = 1.342, short of the required 1.5.
 * With more push, Q = 0.16 m³/s (P = 2560 N): 0.35·W + 0.15·P = 2100.2 N < 2560 N, it slides.
 */
const W = 500 * G0;
function study(Q: string) {
  const doc = jetPushedBlock(0.5, { cases: [{ id: "c", name: "Test flow", parameters: { Q } }] }, "volume flow");
  (doc.supports![0] as { mu?: number }).mu = 0.2;
  return solveCases(fileOf(doc));
}

describe("a contact that slips while its body as a whole holds, short of the required factor", () => {
  it("is marked and explained, with the factor the stability table gives", () => {
    const s = study("0.12 m^3/s");
    const run = s.runs[0];
    if (!run.ok) throw new Error("did not solve");
    const P = 1e5 * 0.12 ** 2;
    const sliding = run.stability.blk.sliding;
    if (!sliding || "notApplicable" in sliding) throw new Error("no sliding check");
    expect(sliding.factor).toBeCloseTo((0.2 * (W - P) / 2 + 0.5 * (W + P) / 2) / P, 6); // hand calculation above: 1.342
    expect(sliding.pass).toBe(false);
    expect([...slipsWithFrictionToSpare(s)]).toEqual(["Test flow\u0000rear pad"]);
    const table = withSlipNote(caseReactionTable(s, "SI"), s);
    const state = table.columns.findIndex((c) => c.key === "state");
    expect(table.rows.map((r) => r[state])).toEqual(["slips *", "bearing"]);
    expect(table.notes?.at(-1)).toBe(`* ${SLIP_NOTE}`);
    // the sign-off concerns say it too, as the case table does
    expect(caseStateFindings(s)).toEqual(["Test flow — rear pad needs more friction than its own μ gives (the body as a whole holds: its other contacts take up the rest)"]);
  });

  it("is not marked where the body slides as a whole", () => {
    // hand calculation above: at Q = 0.16 m³/s the block itself slides
    const s = study("0.16 m^3/s");
    expect(slipsWithFrictionToSpare(s).size).toBe(0);
    expect(caseStateFindings(s)).toEqual([]);
  });
});
