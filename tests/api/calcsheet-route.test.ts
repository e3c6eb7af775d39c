// The calc sheet route: a PDF of a saved version for its readers, in SI or US units; 404 across
// workspaces; a clear 400 for a bad units value.
import { beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/sketches/[id]/versions/[number]/calc-sheet/route";
import { createSketch, saveVersion } from "@/lib/sketches";
import { appOrigin } from "@/lib/env";
import { addComment, resolveThread } from "@/lib/review/comments";
import { takeSignOffStep } from "@/lib/review/signoff";
import { call, withMailFake, makeAccount, makeWorkspace, type Person } from "./helpers";
import { parsedFixture } from "./sketch-fixtures";
import { pdfText } from "../support/pdf-text";

/** The text of version `n`'s calc sheet as its reader gets it, white space collapsed. */
async function sheetText(id: string, n: number, cookie: string): Promise<string> {
  const res = await (GET as unknown as (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>)(
    new Request(`${appOrigin()}/api/sketches/${id}/versions/${n}/calc-sheet`, { headers: { cookie } }),
    { params: Promise.resolve({ id, number: String(n) }) },
  );
  expect(res.status).toBe(200);
  return (await pdfText(await res.arrayBuffer())).text.replace(/\s+/g, " ");
}

describe("GET /api/sketches/[id]/versions/[number]/calc-sheet", () => {
  let owner: Person;
  let outsider: Person;
  let sketchId: string;
  withMailFake();
  beforeAll(async () => {
    owner = await makeAccount("calc-owner");
    outsider = await makeAccount("calc-outsider");
    const ws = await makeWorkspace("Calc sheet works", [[owner, "owner"]]);
    const parsed = parsedFixture("pipe-bend-anchor");
    const made = await createSketch(ws, owner, { title: "Bend on an anchor", document: parsed, message: "first" });
    sketchId = made.sketch.id;
  }, 60000);

  it("answers a PDF attachment named after the sketch, version and units", async () => {
    const { status, res } = await call(GET as never, { params: { id: sketchId, number: "1" }, cookie: owner.cookie, path: `/api/sketches/${sketchId}/versions/1/calc-sheet?units=US` });
    expect(status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="Bend-on-an-anchor-v1-calc-sheet-US.pdf"');
  }, 60000);

  it("is not found for someone outside the workspace, and for a missing version", async () => {
    expect((await call(GET as never, { params: { id: sketchId, number: "1" }, cookie: outsider.cookie })).status).toBe(404);
    const missing = await call(GET as never, { params: { id: sketchId, number: "9" }, cookie: owner.cookie });
    expect(missing.status).toBe(404);
    expect((missing.body as { error: { message: string } }).error.message).toBe("This sketch has no version 9.");
  });

  it("prints the version's check record: its sign-off steps with notes and its comment threads", async () => {
    const first = await addComment(sketchId, 1, owner, { body: "Is the **anchor** bolted to the plinth?", pin: { kind: "element", elementId: "anchor" } });
    await addComment(sketchId, 1, owner, { body: "Yes, four M20.", parentId: first.id });
    await resolveThread(first.id, owner, true);
    await addComment(sketchId, 1, owner, { body: "Add the hydrotest case." });
    await takeSignOffStep(sketchId, 1, owner, { step: "submit", note: "Ready for checking" });
    const text = await sheetText(sketchId, 1, owner.cookie);
    expect(text).toContain("2 comment threads on this version: 1 open, 1 resolved.");
    expect(text).toMatch(/UTC · Calc-owner Tester submitted it for checking: “Ready for checking”/);
    // the pin names the element by its label in the saved file
    expect(text).toMatch(/1\. On anchor block — resolved by Calc-owner Tester, \d{4}-\d\d-\d\d \d\d:\d\d UTC/);
    expect(text).toContain("Is the anchor bolted to the plinth?");
    expect(text).toContain("Yes, four M20.");
    expect(text).toContain("2. On the whole version — open");
    // the latest version is not called superseded
    expect(text).not.toContain("Superseded");
  }, 60000);

  it("lists the open threads of the other versions, earlier and later, as the sign-off counts them; an approved version's are left out", async () => {
    const prep = await makeAccount("calc-open-prep", { name: "Pia Preparer" });
    const chk = await makeAccount("calc-open-chk", { name: "Otto Checker" });
    const ws = await makeWorkspace("Open threads bay", [
      [owner, "owner"],
      [prep, "editor"],
      [chk, "checker"],
    ]);
    const parsed = parsedFixture("pipe-bend-anchor");
    const id = (await createSketch(ws, prep, { title: "Bend with questions", document: parsed, message: "first" })).sketch.id;
    await addComment(id, 1, chk, { body: "Which plinth concrete?" });
    await saveVersion(id, prep, { baseVersion: 1, message: "plinth grade noted", document: parsed });
    await saveVersion(id, prep, { baseVersion: 2, message: "anchor bolts", document: parsed });
    await addComment(id, 3, chk, { body: "Bolt grade?" });
    const resolved = await addComment(id, 3, chk, { body: "Edge distance?" });
    await resolveThread(resolved.id, chk, true);
    await addComment(id, 3, chk, { body: "Show the grout pad." });
    await saveVersion(id, prep, { baseVersion: 3, message: "grout pad", document: parsed });
    // v4 approved with a thread open: its approval stands, its thread is not asked of v2
    await addComment(id, 4, chk, { body: "Pad thickness fine by me." });
    await takeSignOffStep(id, 4, prep, { step: "submit" });
    await takeSignOffStep(id, 4, chk, { step: "check", note: "Pad note is a remark only." });
    await takeSignOffStep(id, 4, owner, { step: "approve", note: "Pad note is a remark only." });
    const text = await sheetText(id, 2, owner.cookie);
    expect(text).toContain("No comments on this version.");
    expect(text).toContain("Still open on earlier versions: v1 (1 thread).");
    expect(text).toContain("Still open on later versions: v3 (2 threads).");
    expect(text).not.toMatch(/v4 \(\d thread/);
  }, 60000);

  it("a revision of an approved version says the approval does not carry over; the approved one does not say it", async () => {
    const prep = await makeAccount("calc-rev-prep", { name: "Ria Preparer" });
    const chk = await makeAccount("calc-rev-chk", { name: "Rob Checker" });
    const ws = await makeWorkspace("Revision bay", [
      [prep, "editor"],
      [chk, "checker"],
      [owner, "owner"],
    ]);
    const parsed = parsedFixture("pipe-bend-anchor");
    const made = await createSketch(ws, prep, { title: "Bend revised", document: parsed, message: "as built" });
    const id = made.sketch.id;
    await takeSignOffStep(id, 1, prep, { step: "submit" });
    await takeSignOffStep(id, 1, chk, { step: "check" });
    await takeSignOffStep(id, 1, owner, { step: "approve" });
    await saveVersion(id, prep, { baseVersion: 1, message: "thicker plinth", document: parsed });
    const v2 = await sheetText(id, 2, owner.cookie);
    expect(v2).toContain("Revision: v1 is the approved version of this sketch. This sheet is of v2, which is not approved: v1's approval does not carry over to it.");
    const v1 = await sheetText(id, 1, owner.cookie);
    expect(v1).not.toContain("Revision:");
    // v2 is an unapproved draft: v1's sheet says it still governs, not that it is superseded
    expect(v1).toContain("Later versions: v2 is the latest version of this sketch. No later version is approved, so this one, v1, remains the approved design.");
    expect(v1).not.toContain("Superseded");
    // once v2 is approved too, v1's sheet is superseded by it
    await takeSignOffStep(id, 2, prep, { step: "submit" });
    await takeSignOffStep(id, 2, chk, { step: "check" });
    await takeSignOffStep(id, 2, owner, { step: "approve" });
    expect(await sheetText(id, 1, owner.cookie)).toContain("Superseded: v2, the latest version of this sketch, is approved.");
  }, 60000);

  it("refuses units other than SI and US, naming the field", async () => {
    const r = await call(GET as never, { params: { id: sketchId, number: "1" }, cookie: owner.cookie, path: `/api/sketches/${sketchId}/versions/1/calc-sheet?units=cgs` });
    expect(r.status).toBe(400);
    expect(JSON.stringify(r.body)).toMatch(/units must be SI or US/);
  });
});
