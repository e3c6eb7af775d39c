// What the calc sheet's title block reads for a version: workspace, sketch, number, message,
// saved date, and the sign-off of the current round, for members only.
import { beforeAll, describe, expect, it } from "vitest";
import { getVersionForCalcSheet } from "@/db/queries/review";
import { takeSignOffStep } from "@/lib/review/signoff";
import { createSketch } from "@/lib/sketches";
import { withMailFake, makeAccount, makeWorkspace, type Person } from "./helpers";
import { parsedFixture } from "./sketch-fixtures";

let prep: Person;
let chk: Person;
let lead: Person;
let outsider: Person;
withMailFake();
beforeAll(async () => {
  prep = await makeAccount("prep", { name: "Pat Preparer" });
  chk = await makeAccount("chk", { name: "Cam Checker" });
  lead = await makeAccount("lead", { name: "Lee Lead" });
  outsider = await makeAccount("outsider");
});

describe("getVersionForCalcSheet", () => {
  it("returns the title block's facts and the sign-off entries with names and dates", async () => {
    const ws = await makeWorkspace("Calc sheet bay", [
      [prep, "editor"],
      [chk, "checker"],
      [lead, "owner"],
    ]);
    const parsed = parsedFixture("pipe-bend-anchor");
    const made = await createSketch(ws, prep, { title: "Bend anchor", document: parsed, message: "As designed" });
    const sketchId = made.sketch.id;

    const draft = await getVersionForCalcSheet(made.version.id, lead.id);
    expect(draft).toMatchObject({ workspaceName: "Calc sheet bay", sketchTitle: "Bend anchor", versionNumber: 1, message: "As designed", authorName: "Pat Preparer", reviewState: "draft" });
    expect(draft!.signOff).toEqual([{ role: "prepared", name: "Pat Preparer", date: made.version.createdAt }]);
    expect(draft!.document.title).toBe(parsed.file.title);

    await takeSignOffStep(sketchId, 1, prep, { step: "submit" });
    const checked = await takeSignOffStep(sketchId, 1, chk, { step: "check" });
    const approved = await takeSignOffStep(sketchId, 1, lead, { step: "approve" });
    const sheet = await getVersionForCalcSheet(made.version.id, chk.id);
    expect(sheet!.reviewState).toBe("approved");
    expect(sheet!.signOff).toEqual([
      { role: "prepared", name: "Pat Preparer", date: made.version.createdAt },
      { role: "checked", name: "Cam Checker", date: checked.entry.at },
      { role: "approved", name: "Lee Lead", date: approved.entry.at },
    ]);
    expect(sheet!.savedAt).toEqual(made.version.createdAt);
    expect(draft!.review).toBe("prepared, not yet submitted for checking");
    expect(sheet!.review).toBe(`approved by Lee Lead, ${approved.entry.at.toISOString().slice(0, 10)}`);

    // an approval withdrawn: the title block no longer shows an approver, and says who withdrew it and why
    const withdrawn = await takeSignOffStep(sketchId, 1, lead, { step: "withdraw", note: "Anchor bolts changed to M20" });
    const after = await getVersionForCalcSheet(made.version.id, chk.id);
    expect(after!.signOff.map((s) => s.role)).toEqual(["prepared", "checked"]);
    expect(after!.review).toBe(`approval withdrawn by Lee Lead, ${withdrawn.entry.at.toISOString().slice(0, 10)}: Anchor bolts changed to M20`);

    expect(await getVersionForCalcSheet(made.version.id, outsider.id)).toBeNull();
  });
});
