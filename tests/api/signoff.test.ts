// The sign-off rules through the API, row by row: every step, by every role, as the version's
// author, as its checker or as neither, from every state. The expected answer of each case
// comes from the same rules table the server enforces (lib/review/rules.ts), so the two cannot
// drift apart; the spot checks below pin the table itself to what the trade expects.
import { and, count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import { db } from "@/db";
import { auditEvent, signOff, sketch, sketchVersion } from "@/db/schema";
import { decideSignOff, REVIEW_STATES, SIGN_OFF_RULES, SIGN_OFF_STEPS, type ReviewState, type SignOffStep } from "@/lib/review/rules";
import { ROLES, type Role } from "@/lib/roles";
import { summarizeSolve } from "@/lib/sketch-document";
import { parseSketch } from "@/solver";
import { call, withMailFake, makeAccount, makeWorkspace, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";

type Relation = "neither" | "author" | "checker";
const RELATIONS: Relation[] = ["neither", "author", "checker"];

let ws: string;
const actors = {} as Record<Role, Person>;
let prep: Person;
let chk: Person;
const parsed = parseSketch(fixture("pipe-bend-anchor"));
if (!parsed.ok) throw new Error("fixture does not parse");
const summary = summarizeSolve(parsed);


withMailFake();
beforeAll(async () => {
  for (const r of ROLES) actors[r] = await makeAccount(`signoff-${r}`);
  prep = await makeAccount("signoff-prep");
  chk = await makeAccount("signoff-chk");
  ws = await makeWorkspace("Sign-off rules", [...ROLES.map((r) => [actors[r], r] as [Person, Role]), [prep, "editor"], [chk, "checker"]]);
});

/** A sketch with one version in `state`, prepared by `authorId` and checked by `checkedBy`. */
async function versionIn(state: ReviewState, authorId: string, checkedBy: string | null): Promise<{ sketchId: string; versionId: string }> {
  const [s] = await db.insert(sketch).values({ workspaceId: ws, title: `In state ${state}`, latestVersion: 1, createdBy: authorId }).returning({ id: sketch.id });
  const [v] = await db
    .insert(sketchVersion)
    .values({ sketchId: s.id, number: 1, message: "v1", document: parsed.ok ? parsed.file : ({} as never), formatVersion: 1, status: summary.status, largestReaction: summary.largestReaction, summary, authorId, reviewState: state, checkedBy })
    .returning({ id: sketchVersion.id });
  return { sketchId: s.id, versionId: v.id };
}

async function stateOf(versionId: string) {
  const [v] = await db.select({ state: sketchVersion.reviewState, checkedBy: sketchVersion.checkedBy }).from(sketchVersion).where(eq(sketchVersion.id, versionId));
  const [{ n }] = await db.select({ n: count() }).from(signOff).where(eq(signOff.versionId, versionId));
  return { ...v, entries: Number(n) };
}

const take = (sketchId: string, who: Person, step: SignOffStep, note = "Reason given in the test.") =>
  call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: who.cookie, body: { step, note } });

describe("the sign-off table, every step by every kind of person from every state", () => {
  for (const step of SIGN_OFF_STEPS) {
    for (const role of ROLES) {
      for (const relation of RELATIONS) {
        for (const state of REVIEW_STATES) {
          const expected = decideSignOff({ step, role, isAuthor: relation === "author", isChecker: relation === "checker", state });
          const label = `${step} by ${role}${relation === "neither" ? "" : ` (${relation})`} from ${state} → ${expected.ok ? `200, ${expected.to}` : expected.status}`;
          it(label, async () => {
            const me = actors[role];
            const { sketchId, versionId } = await versionIn(state, relation === "author" ? me.id : prep.id, relation === "checker" ? me.id : chk.id);
            const res = await take(sketchId, me, step);
            const after = await stateOf(versionId);
            if (expected.ok) {
              expect(res.status).toBe(200);
              expect(res.body.state).toBe(expected.to);
              expect(after.state).toBe(expected.to);
              expect(after.entries).toBe(1);
              expect(res.body.entry).toMatchObject({ step, fromState: state, toState: expected.to, actorId: me.id, actorName: me.name });
            } else {
              expect(res.status).toBe(expected.status);
              expect(res.body.error).toMatchObject({ code: expected.code, message: expected.reason, state });
              expect(after).toMatchObject({ state, entries: 0 });
            }
          });
        }
      }
    }
  }
});

describe("the table says what the trade expects", () => {
  const decide = (step: SignOffStep, role: Role, relation: Relation, state: ReviewState) => decideSignOff({ step, role, isAuthor: relation === "author", isChecker: relation === "checker", state });

  it("no self-check: the author may not check, return or approve their own version, whatever their role", () => {
    for (const role of ROLES) for (const step of ["check", "return", "approve"] as const) expect(decide(step, role, "author", SIGN_OFF_RULES[step].from[0]).ok).toBe(false);
    expect(decide("check", "owner", "author", "submitted")).toMatchObject({ status: 403, reason: "You prepared this version: someone else must check it." });
  });

  it("the checker of a version may not approve it; another owner may, once it is checked", () => {
    expect(decide("approve", "owner", "checker", "checked")).toMatchObject({ ok: false, status: 403, reason: "You checked this version: another owner must approve it." });
    expect(decide("approve", "owner", "neither", "checked")).toEqual({ ok: true, to: "approved" });
    expect(decide("approve", "owner", "neither", "submitted")).toMatchObject({ ok: false, status: 409 });
    expect(decide("approve", "editor", "neither", "checked")).toMatchObject({ ok: false, status: 403 });
  });

  it("submit: the author whatever their role, or an editor or owner; never twice in a round", () => {
    expect(decide("submit", "checker", "author", "draft")).toEqual({ ok: true, to: "submitted" });
    expect(decide("submit", "checker", "neither", "draft")).toMatchObject({ ok: false, status: 403 });
    expect(decide("submit", "editor", "neither", "returned")).toEqual({ ok: true, to: "submitted" });
    for (const state of ["submitted", "checked", "approved"] as const) expect(decide("submit", "owner", "author", state)).toMatchObject({ ok: false, status: 409 });
  });

  it("withdraw: owners only, and only an approved version", () => {
    expect(decide("withdraw", "owner", "author", "approved")).toEqual({ ok: true, to: "withdrawn" });
    expect(decide("withdraw", "owner", "neither", "checked")).toMatchObject({ ok: false, status: 409 });
    expect(decide("withdraw", "checker", "neither", "approved")).toMatchObject({ ok: false, status: 403 });
  });
});

describe("a whole round through the API", () => {
  it("submit, return with a comment, submit again, check, approve, withdraw; the title block follows, the audit records each step", async () => {
    const { sketchId, versionId } = await versionIn("draft", prep.id, null);
    expect((await take(sketchId, prep, "submit")).status).toBe(200);
    const noNote = await call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: chk.cookie, body: { step: "return" } });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields).toEqual([{ path: "note", message: "Say what needs to change." }]);
    expect((await take(sketchId, chk, "return", "The anchor's moment is missing its lever arm.")).status).toBe(200);
    expect((await take(sketchId, prep, "submit")).status).toBe(200);
    expect((await take(sketchId, chk, "check")).status).toBe(200);
    expect(await stateOf(versionId)).toMatchObject({ state: "checked", checkedBy: chk.id });
    expect((await take(sketchId, actors.owner, "approve")).status).toBe(200);

    const read = await call(signoffRoute.GET, { params: { id: sketchId, number: "1" }, cookie: actors.viewer.cookie });
    expect(read.status).toBe(200);
    expect(read.body.state).toBe("approved");
    expect(read.body.titleBlock.prepared.name).toBe(prep.name);
    expect(read.body.titleBlock.checked.name).toBe(chk.name);
    expect(read.body.titleBlock.approved.name).toBe(actors.owner.name);
    expect(read.body.entries.map((e: { step: string }) => e.step)).toEqual(["submit", "return", "submit", "check", "approve"]);
    expect(read.body.entries[1].note).toBe("The anchor's moment is missing its lever arm.");
    expect(read.body.allowed).toEqual([]);

    const ownerView = await call(signoffRoute.GET, { params: { id: sketchId, number: "1" }, cookie: actors.owner.cookie });
    expect(ownerView.body.allowed).toEqual(["withdraw"]);
    expect((await take(sketchId, actors.owner, "withdraw", "Wrong flow rate used.")).status).toBe(200);
    const after = await call(signoffRoute.GET, { params: { id: sketchId, number: "1" }, cookie: prep.cookie });
    expect(after.body.titleBlock.approved).toBeNull();
    expect(after.body.allowed).toEqual(["submit"]);

    const audit = await db.select({ action: auditEvent.action }).from(auditEvent).where(and(eq(auditEvent.targetId, sketchId), eq(auditEvent.targetType, "sketch"))).orderBy(auditEvent.id);
    expect(audit.map((a) => a.action)).toEqual(["signoff.submit", "signoff.return", "signoff.submit", "signoff.check", "signoff.approve", "signoff.withdraw"]);
    // the record cannot be rewritten, even from SQL
    await expect(db.update(signOff).set({ note: "rewritten" }).where(eq(signOff.versionId, versionId))).rejects.toThrow();
  });

  it("a superseded version is not put forward: once v2 is saved, v1 cannot be submitted (409, naming v2), and its page offers no submit", async () => {
    const { sketchId, versionId } = await versionIn("draft", prep.id, null);
    await db.insert(sketchVersion).values({ sketchId, number: 2, message: "v2", document: parsed.ok ? parsed.file : ({} as never), formatVersion: 1, status: summary.status, largestReaction: summary.largestReaction, summary, authorId: prep.id });
    await db.update(sketch).set({ latestVersion: 2 }).where(eq(sketch.id, sketchId));
    const refused = await take(sketchId, prep, "submit");
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toBe("v2 is newer than this version: submit the latest version for checking (a superseded version is not put forward).");
    expect(await stateOf(versionId)).toMatchObject({ state: "draft" });
    const read = await call(signoffRoute.GET, { params: { id: sketchId, number: "1" }, cookie: prep.cookie });
    expect(read.body.allowed).toEqual([]);
    expect(read.body.newer).toBe(2);
    // the latest version goes forward as usual
    const latest = await call(signoffRoute.GET, { params: { id: sketchId, number: "2" }, cookie: prep.cookie });
    expect(latest.body.allowed).toEqual(["submit"]);
    expect(latest.body.newer).toBeNull();
    expect((await call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "2" }, cookie: prep.cookie, body: { step: "submit" } })).status).toBe(200);
  });

  it("an outsider is told the version does not exist; a version number that does not exist is 404", async () => {
    const outsider = await makeAccount("signoff-outsider");
    const { sketchId } = await versionIn("draft", prep.id, null);
    expect((await take(sketchId, outsider, "submit")).status).toBe(404);
    const none = await call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "7" }, cookie: prep.cookie, body: { step: "submit" } });
    expect(none.status).toBe(404);
  });
});
