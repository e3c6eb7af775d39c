// The calc sheet's check record: the sign-off steps with their notes and the comment threads of
// the version, worded as the review screen words them and printed in the PDF (read back with
// pdfjs-dist), so a printed sheet carries its checking history. Common practice: a checked
// calculation keeps the checker's comments and how each was closed with it.
import { writeFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { checkRecord, type CheckRecordInput } from "@/lib/calcsheet/record";
import { openThreadsBesides } from "@/lib/review/rules";
import { loadFixture } from "../solver/helpers";
import { pdfText } from "../../support/pdf-text";

const at = (s: string) => new Date(`${s}Z`);
const comment = (c: Partial<CheckRecordInput["comments"][number]> & { id: string; body: string; createdAt: Date }) => ({
  parentId: null,
  authorName: "Chen Checker",
  pin: null,
  resolvedAt: null,
  resolvedByName: null,
  editedAt: null,
  deletedAt: null,
  ...c,
});

const record: CheckRecordInput = {
  steps: [
    { step: "submit", actorName: "Eddie Editor", at: at("2026-11-30T10:00"), note: "" },
    { step: "return", actorName: "Chen Checker", at: at("2026-11-30T12:00"), note: "The foot slips: add a chock." },
    { step: "submit", actorName: "Eddie Editor", at: at("2026-11-30T14:00"), note: "Chock added." },
    { step: "check", actorName: "Chen Checker", at: at("2026-11-30T15:30"), note: "" },
  ],
  comments: [
    comment({ id: "t1", body: "Is **μ = 0.55** right for wet asphalt?", pin: { kind: "element", elementId: "leg" }, createdAt: at("2026-11-30T11:00"), resolvedAt: at("2026-11-30T15:00"), resolvedByName: "Chen Checker" }),
    comment({ id: "r1", parentId: "t1", authorName: "Eddie Editor", body: "Yes: tyre on wet asphalt, see @Chen Checker's note.", createdAt: at("2026-11-30T11:30"), editedAt: at("2026-11-30T11:35") }),
    comment({ id: "t2", body: "Show the jack plate size.", pin: { kind: "point", at: [3.8, 0.35] }, createdAt: at("2026-11-30T11:10") }),
    comment({ id: "t3", body: "gone", createdAt: at("2026-11-30T11:20"), deletedAt: at("2026-11-30T11:21") }),
    comment({ id: "t4", body: "Whole sheet reads well.", createdAt: at("2026-11-30T15:20"), authorName: null }),
    comment({ id: "r4", parentId: "t4", body: "x", createdAt: at("2026-11-30T15:25"), deletedAt: at("2026-11-30T15:26") }),
  ],
  earlierOpen: [
    { number: 1, open: 2 },
    { number: 2, open: 0 },
  ],
  laterOpen: [
    { number: 3, open: 1 },
    { number: 5, open: 3 },
  ],
};

describe("the check record", () => {
  it("words the steps (an approval withdrawn with its reason), the threads (a deleted first comment with no replies is left out) and the open threads of earlier and later versions", () => {
    const rec = checkRecord(record, { leg: "rear stabiliser leg" });
    expect(rec.steps).toEqual([
      "2026-11-30 10:00 UTC · Eddie Editor submitted it for checking",
      "2026-11-30 12:00 UTC · Chen Checker returned it: “The foot slips: add a chock.”",
      "2026-11-30 14:00 UTC · Eddie Editor submitted it for checking: “Chock added.”",
      "2026-11-30 15:30 UTC · Chen Checker checked it",
    ]);
    expect(rec.threads.map((t) => t.heading)).toEqual([
      "1. On rear stabiliser leg — resolved by Chen Checker, 2026-11-30 15:00 UTC",
      "2. At (3.8, 0.35) m — open",
      "3. On the whole version — open",
    ]);
    expect(rec.threads[0].lines).toEqual([
      "Chen Checker, 2026-11-30 11:00 UTC: Is μ = 0.55 right for wet asphalt?",
      "Eddie Editor, 2026-11-30 11:30 UTC: Yes: tyre on wet asphalt, see @Chen Checker's note. (edited)",
    ]);
    expect(rec.threads[2].lines).toEqual(["A deleted account, 2026-11-30 15:20 UTC: Whole sheet reads well.", "Chen Checker, 2026-11-30 15:25 UTC: (comment deleted)"]);
    expect(rec.summary).toBe("3 comment threads on this version: 2 open, 1 resolved.");
    expect(rec.earlier).toBe("Still open on earlier versions: v1 (2 threads).");
    expect(rec.later).toBe("Still open on later versions: v3 (1 thread), v5 (3 threads).");
    expect(checkRecord({ steps: [{ step: "withdraw", actorName: "Olivia Owner", at: at("2026-12-01T09:00"), note: "Wrong μ" }], comments: [] }, {}).steps).toEqual([
      "2026-12-01 09:00 UTC · Olivia Owner withdrew the approval: “Wrong μ”",
    ]);
    // all open: no "0 resolved"
    expect(checkRecord({ steps: [], comments: [record.comments[2]] }, {}).summary).toBe("1 comment thread on this version: 1 open.");
    expect(checkRecord({ steps: [], comments: [] }, {})).toEqual({ summary: "No comments on this version.", steps: [], threads: [], earlier: null, later: null });
    // only later ones open: no line on earlier versions
    expect(checkRecord({ steps: [], comments: [], earlierOpen: [{ number: 1, open: 0 }], laterOpen: [{ number: 4, open: 1 }] }, {})).toMatchObject({ earlier: null, later: "Still open on later versions: v4 (1 thread)." });
  });

  it("splits the sketch's open threads (approved versions already left out by the query) into the other versions, earlier and later, as the sign-off counts them", () => {
    // v2's sheet: its own 2 are its threads (printed above), v1 and v4 are the others; v3 has none open
    const open = [
      { number: 1, open: 1 },
      { number: 2, open: 2 },
      { number: 3, open: 0 },
      { number: 4, open: 3 },
    ];
    expect(openThreadsBesides(open, 2)).toEqual({ earlierOpen: [{ number: 1, open: 1 }], laterOpen: [{ number: 4, open: 3 }] });
    expect(openThreadsBesides(open, 1)).toEqual({ earlierOpen: [], laterOpen: [{ number: 2, open: 2 }, { number: 4, open: 3 }] });
    expect(openThreadsBesides(open, 5)).toEqual({ earlierOpen: [{ number: 1, open: 1 }, { number: 2, open: 2 }, { number: 4, open: 3 }], laterOpen: [] });
    expect(openThreadsBesides([], 3)).toEqual({ earlierOpen: [], laterOpen: [] });
  });

  it("is printed on the calc sheet, which says when a newer version supersedes it", async () => {
    const buf = await buildCalcSheet({
      workspace: "W",
      sketchTitle: "Monitor trailer",
      version: 2,
      latestVersion: 4,
      savedAt: at("2026-11-30T09:00"),
      signoff: [],
      file: loadFixture("fire-monitor-trailer.json"),
      record,
    });
    if (process.env.KEEP_PDF) writeFileSync(process.env.KEEP_PDF, buf);
    const { text } = await pdfText(buf);
    expect(text).toContain("Check record");
    // a sheet of an earlier version says so under its title block
    expect(text).toContain("Superseded: v4 is the latest version of this sketch.");
    expect(text).toContain("3 comment threads on this version: 2 open, 1 resolved.");
    expect(text).toContain("Chen Checker returned it: “The foot slips: add a chock.”");
    // the pin names the element by its label in the saved file
    expect(text).toContain("1. On rear stabiliser leg — resolved by Chen Checker, 2026-11-30 15:00 UTC");
    expect(text).toContain("2. At (3.8, 0.35) m — open");
    expect(text).toContain("Eddie Editor, 2026-11-30 11:30 UTC: Yes: tyre on wet asphalt");
    expect(text).toContain("Still open on earlier versions: v1 (2 threads).");
    expect(text).toContain("Still open on later versions: v3 (1 thread), v5 (3 threads).");
    expect(text.indexOf("Still open on earlier versions")).toBeLessThan(text.indexOf("Still open on later versions"));
    // the record comes before the method
    expect(text.indexOf("Check record")).toBeLessThan(text.indexOf("Method"));
  }, 60000);
});
