// What a script driving the API (and an owner inviting the team) meets on the way: reading an
// invitation link (200 while open; 410 once expired, used or withdrawn, naming whom to ask; 404
// for a link nobody sent), a save on a base version the sketch never had (400 naming
// `baseVersion`, not a 409 saying someone saved "since"), and the mail of an invitation sent
// again saying it replaces the earlier one. Nothing is written by any refusal.
import { count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as invitationRoute from "@/app/api/invitations/[token]/route";
import * as invitationsRoute from "@/app/api/workspaces/[id]/invitations/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as solveRoute from "@/app/api/solve/route";
import { db } from "@/db";
import { invitation, membership, sketchVersion } from "@/db/schema";
import { hashInvitationToken, newInvitationToken } from "@/lib/invitations";
import { createSketch } from "@/lib/sketches";
import { invitationTokenOf, call, withMailFake, makeAccount, makeWorkspace, uniqueEmail, waitForMail, type Person } from "./helpers";
import { fixture as sketchFile, parsedFixture } from "./sketch-fixtures";

let owner: Person;
let ws = "";

withMailFake();
beforeAll(async () => {
  owner = await makeAccount("walk-owner", { name: "Wanda Owner" });
  ws = await makeWorkspace("Pier 7 anchors", [[owner, "owner"]]);
});

async function link(state: "pending" | "expired" | "used" | "withdrawn", email = uniqueEmail("walk-invitee")): Promise<string> {
  const token = newInvitationToken();
  const expiresAt = new Date(Date.now() + (state === "expired" ? -60_000 : 3600_000));
  await db.insert(invitation).values({
    workspaceId: ws,
    email,
    role: "checker",
    tokenHash: hashInvitationToken(token),
    invitedBy: owner.id,
    expiresAt,
    ...(state === "used" ? { acceptedAt: new Date() } : {}),
    ...(state === "withdrawn" ? { withdrawnAt: new Date() } : {}),
  });
  return token;
}

const members = async () => Number((await db.select({ n: count() }).from(membership).where(eq(membership.workspaceId, ws)))[0].n);

describe("GET /api/invitations/:token", () => {
  it("an open link: 200 with the workspace, the address, the role, the inviter and the expiry; no sign-in needed", async () => {
    const email = uniqueEmail("walk-open");
    const { status, body } = await call(invitationRoute.GET, { params: { token: await link("pending", email) } });
    expect(status).toBe(200);
    expect(body.invitation).toMatchObject({ workspaceName: "Pier 7 anchors", email, role: "checker", inviterName: "Wanda Owner", status: "pending" });
    expect(new Date(body.invitation.expiresAt).getTime()).toBeGreaterThan(Date.now());
  });

  const refused = [
    ["expired", "invitation_expired", 'This invitation has expired. Invitation links work for a limited time. Ask Wanda Owner, who invited you, or another owner of "Pier 7 anchors" to send the invitation again; the new mail has a fresh link.'],
    ["used", "invitation_used", 'This invitation has already been used. Each invitation link works once. If you joined with it, sign in to find the workspace; otherwise ask Wanda Owner, who invited you, or another owner of "Pier 7 anchors" for a new invitation.'],
    ["withdrawn", "invitation_withdrawn", 'This invitation was withdrawn. An owner of the workspace withdrew it, or sent a newer one that replaces it. Use the newest invitation mail, or ask Wanda Owner, who invited you, or another owner of "Pier 7 anchors".'],
  ] as const;
  for (const [state, code, message] of refused) {
    it(`${state === "expired" ? "an" : "a"} ${state} link: 410 ${code}, saying what to do and whom to ask, and joins nobody`, async () => {
      const before = await members();
      const { status, body } = await call(invitationRoute.GET, { params: { token: await link(state) } });
      expect(status).toBe(410);
      expect(body).toEqual({ error: { code, message, invitationStatus: state, workspaceName: "Pier 7 anchors", inviterName: "Wanda Owner" } });
      expect(await members()).toBe(before);
    });
  }

  it("a link nobody sent: 404 in the same shape, naming nothing", async () => {
    const { status, body } = await call(invitationRoute.GET, { params: { token: newInvitationToken() } });
    expect(status).toBe(404);
    expect(body).toEqual({ error: { code: "not_found", message: "This invitation link is not valid. Check that the whole link was copied." } });
  });
});

describe("a save on a base version the sketch never had", () => {
  it("is a 400 naming baseVersion and the newest version, not a conflict with someone who saved 'since'; nothing is written", async () => {
    const sketchId = (await createSketch(ws, owner, { title: "Bend at pier 7", document: parsedFixture("pipe-bend-anchor") })).sketch.id;
    const versions = async () => Number((await db.select({ n: count() }).from(sketchVersion).where(eq(sketchVersion.sketchId, sketchId)))[0].n);

    const { status, body } = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: owner.cookie, body: { baseVersion: 7, message: "counted wrong", document: sketchFile("pipe-bend-anchor") } });
    expect(status).toBe(400);
    expect(body.error).toMatchObject({
      code: "validation_failed",
      message: "This sketch has no version 7: its newest is version 1. Save on the version you started from.",
      fields: [{ path: "baseVersion", message: "There is no version 7; the newest is 1." }],
      latest: { number: 1, authorName: "Wanda Owner" },
    });
    expect(await versions()).toBe(1);

    // an older base is still the 409 of a real conflict
    const edited = { ...sketchFile("pipe-bend-anchor"), description: "anchor bolts M24" };
    expect((await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: owner.cookie, body: { baseVersion: 1, document: edited } })).status).toBe(201);
    const stale = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: owner.cookie, body: { baseVersion: 1, document: { ...edited, description: "M30" } } });
    expect([stale.status, stale.body.error.code, stale.body.error.latest.number]).toEqual([409, "version_conflict", 2]);
    expect(await versions()).toBe(2);
  });
});

describe("sending an invitation again", () => {
  it("the new mail says it replaces the earlier one, whose link no longer works; a first invitation says nothing of the kind", async () => {
    const email = uniqueEmail("walk-resend");
    const send = async () => {
      const res = await call(invitationsRoute.POST, { method: "POST", params: { id: ws }, cookie: owner.cookie, body: { email, role: "viewer" } });
      expect(res.status).toBe(201);
      return res.body.invitation as { url: string };
    };
    const first = await send();
    const firstMail = await waitForMail(email);
    expect(firstMail.text).toContain(first.url);
    expect(firstMail.text).not.toContain("replaces");
    expect(firstMail.subject).toBe('Wanda Owner invited you to "Pier 7 anchors" on Counterpoise');

    const second = await send();
    const secondMail = await waitForMail(email, { after: firstMail.id });
    expect(secondMail.text).toContain(second.url);
    expect(secondMail.text).toContain("This invitation replaces the one sent to you earlier: the link in that mail no longer works, use this one.");
    expect(secondMail.html).toContain("This invitation replaces the one sent to you earlier");
    // two mails with one subject in an inbox: the newer says it is the new link
    expect(secondMail.subject).toBe('New link: Wanda Owner invited you to "Pier 7 anchors" on Counterpoise');

    const old = await call(invitationRoute.GET, { params: { token: invitationTokenOf(first.url) } });
    expect([old.status, old.body.error.code]).toEqual([410, "invitation_withdrawn"]);
  });
});

describe("a query parameter sent to an address that reads none", () => {
  it("POST /api/solve?units=US is refused by name (it would answer in SI without a word), and solves without it", async () => {
    const headers = { "x-forwarded-for": "192.0.2.91" };
    const refused = await call(solveRoute.POST, { method: "POST", path: "/api/solve?units=US", body: sketchFile("pipe-bend-anchor"), headers });
    expect(refused.status).toBe(400);
    expect(refused.body.error).toEqual({
      code: "validation_failed",
      message: "Some query parameters are not valid.",
      fields: [{ path: "query.units", message: "Is not a query parameter here: this address reads none." }],
    });
    const solved = await call(solveRoute.POST, { method: "POST", path: "/api/solve", body: sketchFile("pipe-bend-anchor"), headers });
    expect([solved.status, solved.body.ok]).toEqual([200, true]);
  });

  it("a read names each stray parameter once", async () => {
    const id = (await createSketch(ws, owner, { title: "Bend, read with a query", document: parsedFixture("pipe-bend-anchor") })).sketch.id;
    const { status, body } = await call(sketchRoute.GET, { path: `/api/sketches/${id}?version=2&version=3&units=US`, params: { id }, cookie: owner.cookie });
    expect(status).toBe(400);
    expect(body.error.fields.map((f: { path: string }) => f.path)).toEqual(["query.version", "query.units"]);
  });
});

describe("better-auth's refusals read like every other address's", () => {
  it("a wrong password: 401 with error.code and error.message beside better-auth's own code and message", async () => {
    const auth = await import("@/app/api/auth/[...all]/route");
    const { status, body } = await call(auth.POST, { method: "POST", path: "/api/auth/sign-in/email", body: { email: owner.email, password: "not-the-password" }, headers: { "x-forwarded-for": "192.0.2.92" } });
    expect(status).toBe(401);
    expect(body).toEqual({ code: "INVALID_EMAIL_OR_PASSWORD", message: "Invalid email or password", error: { code: "invalid_email_or_password", message: "Invalid email or password" } });
  });

  it("a missing password is named as a field, as the app's own routes name theirs", async () => {
    const auth = await import("@/app/api/auth/[...all]/route");
    const { status, body } = await call(auth.POST, { method: "POST", path: "/api/auth/sign-in/email", body: { email: owner.email }, headers: { "x-forwarded-for": "192.0.2.93" } });
    expect(status).toBe(400);
    expect(body.error.code).toBe("validation_error");
    expect(body.error.fields).toEqual([{ path: "password", message: expect.stringMatching(/^Invalid input/) }]);
  });
});

describe("an invitation with its role left out", () => {
  it("says the role is required, and which roles there are; a wrong role keeps the plain choice", async () => {
    const missing = await call(invitationsRoute.POST, { method: "POST", params: { id: ws }, cookie: owner.cookie, body: { email: uniqueEmail("walk-norole") } });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toEqual([{ path: "role", message: "Required: choose owner, editor, checker or viewer." }]);
    const wrong = await call(invitationsRoute.POST, { method: "POST", params: { id: ws }, cookie: owner.cookie, body: { email: uniqueEmail("walk-boss"), role: "boss" } });
    expect(wrong.body.error.fields).toEqual([{ path: "role", message: "Choose owner, editor, checker or viewer." }]);
  });
});
