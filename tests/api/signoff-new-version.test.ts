// What a save does to the sign-off: a new version is saved through the save route on top of one
// that is approved, or submitted for checking. The earlier version keeps its state, its record
// and its title block (a saved version never changes); the new one starts prepared, with an
// empty record, and goes through its own check and approval; listings go on naming the approved one.
import { and, eq, like } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { db } from "@/db";
import { auditEvent } from "@/db/schema";
import { call, withMailFake, makeTeam, type Json, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let owner: Person;
let author: Person;
let checker: Person;
let viewer: Person;
let ws: string;

withMailFake();
beforeAll(async () => {
  ({ ws, owner, author, checker, viewer } = await makeTeam("New version bay", { owner: "owner", author: "editor", checker: "checker", viewer: "viewer" }, { prefix: "newver" }));
});

const step = (sketchId: string, number: number, who: Person, s: string, note?: string) =>
  call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: String(number) }, cookie: who.cookie, body: { step: s, ...(note ? { note } : {}) } });
const signOff = (sketchId: string, number: number, who: Person) => call(signoffRoute.GET, { params: { id: sketchId, number: String(number) }, cookie: who.cookie });
const comment = (sketchId: string, number: number, who: Person, body: string) =>
  call(commentsRoute.POST, { method: "POST", params: { id: sketchId, number: String(number) }, cookie: who.cookie, body: { body } });

/** Save the next version as the author: the anchor's bend turned by `theta`. */
async function saveOnTop(sketchId: string, base: number, theta: string) {
  const document = { ...fixture("pipe-bend-anchor"), parameters: { ...(fixture("pipe-bend-anchor").parameters as Json), theta } };
  const res = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: author.cookie, body: { baseVersion: base, message: `bend at ${theta}`, document } });
  expect(res.status).toBe(201);
  expect(res.body.version.number).toBe(base + 1);
}

describe("a version saved on top of one in sign-off", () => {
  it("on top of an approved v1: v1 stays approved and locked with its title block; v2 starts prepared and takes comments and its own round", async () => {
    const sketchId = await postSketch(ws, author, `Anchor approved then revised ${Date.now()}`, "pipe-bend-anchor");
    for (const [who, s] of [[author, "submit"], [checker, "check"], [owner, "approve"]] as const) expect((await step(sketchId, 1, who, s)).status).toBe(200);
    const approved = (await signOff(sketchId, 1, viewer)).body;

    await saveOnTop(sketchId, 1, "75 deg");

    // v1 is exactly as it was: state, record and title block
    const v1 = (await signOff(sketchId, 1, viewer)).body;
    expect(v1.state).toBe("approved");
    expect(v1.entries).toEqual(approved.entries);
    expect(v1.titleBlock).toEqual(approved.titleBlock);
    expect(v1.titleBlock.approved.name).toBe(owner.name);
    expect(v1.newer).toBe(2);
    // still locked: no comment, and the owner may still only withdraw it
    const late = await comment(sketchId, 1, checker, "One more remark on v1");
    expect(late.status).toBe(409);
    expect((await signOff(sketchId, 1, owner)).body.allowed).toEqual(["withdraw"]);

    // v2 carries nothing over: prepared by its author, nobody has checked or approved it
    const v2 = (await signOff(sketchId, 2, author)).body;
    expect(v2.state).toBe("draft");
    expect(v2.entries).toEqual([]);
    expect(v2.titleBlock.prepared.name).toBe(author.name);
    expect(v2.titleBlock.checked).toBeNull();
    expect(v2.titleBlock.approved).toBeNull();
    expect(v2.allowed).toEqual(["submit"]);
    expect(v2.newer).toBeNull();
    // the checker cannot check what was never submitted
    const early = await step(sketchId, 2, checker, "check");
    expect(early.status).toBe(409);
    expect(early.body.error.message).toBe("Only a submitted version can be checked; this one is prepared.");
    expect((await comment(sketchId, 2, checker, "The bend is at 75° now: is the anchor still enough?")).status).toBe(201);

    // the listing and the sketch name v1 as the approved version while v2 is the latest
    const listed = (await call(sketchesRoute.GET, { params: { id: ws }, cookie: viewer.cookie })).body.items.find((s: Json) => s.id === sketchId);
    expect(listed).toMatchObject({ latestVersion: 2, approvedVersion: 1 });
    expect((await call(sketchRoute.GET, { params: { id: sketchId }, cookie: viewer.cookie })).body.sketch).toMatchObject({ latestVersion: 2, approvedVersion: 1 });

    // v2's own round; once approved, the listing names v2 (the newest approved version)
    // the checker's question on v2 stands open: the check and the approval say why (a note is required over open threads)
    for (const [who, s, note] of [[author, "submit", undefined], [checker, "check", "The anchor holds at 75°: see the reactions."], [owner, "approve", "Answered by the check note."]] as const)
      expect((await step(sketchId, 2, who, s, note)).status).toBe(200);
    const after = (await call(sketchesRoute.GET, { params: { id: ws }, cookie: viewer.cookie })).body.items.find((s: Json) => s.id === sketchId);
    expect(after.approvedVersion).toBe(2);
    expect((await signOff(sketchId, 1, viewer)).body.state).toBe("approved");

    // the save itself is no sign-off step: the audit has exactly the six steps, in order
    const steps = await db
      .select({ action: auditEvent.action, number: auditEvent.detail })
      .from(auditEvent)
      .where(and(eq(auditEvent.targetId, sketchId), like(auditEvent.action, "signoff.%")))
      .orderBy(auditEvent.id);
    expect(steps.map((s) => `${s.action} v${(s.number as { number: number }).number}`)).toEqual([
      "signoff.submit v1",
      "signoff.check v1",
      "signoff.approve v1",
      "signoff.submit v2",
      "signoff.check v2",
      "signoff.approve v2",
    ]);
  });

  it("on top of a submitted v1: v1 stays submitted and its checker may still decide it (the superseded version is named); v1 cannot be submitted again, v2 can", async () => {
    const sketchId = await postSketch(ws, author, `Anchor revised while in check ${Date.now()}`, "pipe-bend-anchor");
    expect((await step(sketchId, 1, author, "submit")).status).toBe(200);

    await saveOnTop(sketchId, 1, "70 deg");

    const v1 = (await signOff(sketchId, 1, checker)).body;
    expect(v1.state).toBe("submitted");
    expect(v1.entries.map((e: Json) => e.step)).toEqual(["submit"]);
    expect(v1.newer).toBe(2);
    expect(v1.allowed).toEqual(["check", "return"]);
    expect((await signOff(sketchId, 2, author)).body).toMatchObject({ state: "draft", entries: [], allowed: ["submit"] });

    // the checker returns the superseded v1, and its author may not put it forward again
    expect((await step(sketchId, 1, checker, "return", "Superseded by v2; checking that one.")).status).toBe(200);
    const again = await step(sketchId, 1, author, "submit");
    expect(again.status).toBe(409);
    expect(again.body.error.message).toBe("v2 is newer than this version: submit the latest version for checking (a superseded version is not put forward).");
    expect((await step(sketchId, 2, author, "submit")).status).toBe(200);
    expect((await signOff(sketchId, 2, checker)).body.allowed).toEqual(["check", "return"]);
    // each version kept its own record
    expect((await signOff(sketchId, 1, viewer)).body.entries.map((e: Json) => e.step)).toEqual(["submit", "return"]);
    expect((await signOff(sketchId, 2, viewer)).body.entries.map((e: Json) => e.step)).toEqual(["submit"]);
  });
});
