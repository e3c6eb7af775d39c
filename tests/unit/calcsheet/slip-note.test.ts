// A contact over its own μ in a combination whose body passes its sliding check: the calc sheet
// marks its "slips" and says why under the reactions per case, as the Cases tab and a version's
// page do, so a signing engineer does not read "slips" beside a passing sliding factor as a
// contradiction; and a case in which a contact lifts or is over its μ while the body holds is said
// on the sheet's first page and in the sign-off concerns, as the sketch as drawn says it of itself.
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { parseSketch, solveCases } from "@/solver";
import { caseReactionTable, nameIn } from "@/solver/report";
import { caseStateFindings, versionConcerns } from "@/components/review/concerns";
import { loadFixture } from "../solver/helpers";
import { SLIP_NOTE, slipsWithFrictionToSpare, withSlipNote } from "@/components/studies/slipNote";
import { pdfText } from "../../support/pdf-text";
import { pushedTallBlock } from "./pushed-tall-block";

describe("a contact over its μ in a body with friction to spare, on the calc sheet", () => {
  it("marks the upwind pad's state in the uplift check and prints the note under the table", async () => {
    const parsed = parseSketch(pushedTallBlock());
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const study = solveCases(parsed.file);
    const run = study.runs.find((r) => r.id === "uplift")!;
    if (!run.ok) throw new Error("the uplift check did not solve");
    // the hand figures above
    expect(run.result.reactions.up.n).toBeCloseTo(246.3, 0);
    expect(Math.abs(run.result.reactions.up.t!)).toBeCloseTo(1500, 0);
    const sliding = run.stability.block.sliding;
    if (!sliding || "notApplicable" in sliding) throw new Error("no sliding check");
    expect(sliding.factor).toBeCloseTo(1.471, 3);
    expect(sliding.pass).toBe(true);
    expect([...slipsWithFrictionToSpare(study)]).toEqual(["Uplift check\u0000upwind pad"]);

    const table = withSlipNote(caseReactionTable(study, "SI"), study);
    const state = table.columns.findIndex((c) => c.key === "state");
    expect(table.rows.map((r) => r[state])).toEqual(["slips *", "bearing"]);
    expect(table.notes?.at(-1)).toBe(`* ${SLIP_NOTE}`);

    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Block", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file: pushedTallBlock(), units: "SI" });
    const { text } = await pdfText(buf);
    expect(text).toMatch(/slips \*/);
    expect(text).toContain("but its body as a whole holds: all its contacts together give the friction it needs");
  }, 60000);

  it("leaves a table without such a state as it was", () => {
    const file = pushedTallBlock();
    file.parameters.P = "1 kN";
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error();
    const study = solveCases(parsed.file);
    const table = caseReactionTable(study, "SI");
    expect(withSlipNote(table, study)).toBe(table);
  });
});

describe("a case in which a contact is not as drawn, on the sheet's first page and in the sign-off concerns", () => {
  it("the uplift check's upwind pad, over its own μ while the block has friction to spare", async () => {
    const line = "Uplift check — upwind pad needs more friction than its own μ gives (the body as a whole holds: its other contacts take up the rest)";
    expect(versionConcerns(pushedTallBlock())).toContain(line);
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Block", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file: pushedTallBlock(), units: "SI" });
    const { text } = await pdfText(buf);
    expect(text).toContain("In the cases and combinations:");
    expect(text).toContain(`• ${line}`);
  }, 60000);

  it("the monitor trailer's jack lifts off in the low throw while the wheels hold the trailer", async () => {
    const file = loadFixture("fire-monitor-trailer.json");
    file.cases = [
      { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
      { id: "high", name: "High throw", parameters: { theta: "60 deg" } },
    ];
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error();
    const study = solveCases(parsed.file);
    const low = study.runs.find((r) => r.id === "low")!;
    if (!low.ok) throw new Error();
    expect(low.result.reactions.jack.state).toBe("lifted");
    expect(low.result.bodies[low.result.reactions.jack.body].status).toBe("lifts");
    const jack = nameIn(study, "jack");
    expect(caseStateFindings(study)).toEqual([`Low throw — ${jack} lifts off (its body is held by the other supports)`]);
    expect(versionConcerns(file)).toContain(`Low throw — ${jack} lifts off (its body is held by the other supports)`);
  });
});
