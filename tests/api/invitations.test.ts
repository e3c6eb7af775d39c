// Invitations end to end on the API: the mailed link, signing up from it, single use, expiry,
// withdrawal, the wrong account, and a removed member losing access on their next request.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as acceptRoute from "@/app/api/invitations/[token]/accept/route";
import * as signUpRoute from "@/app/api/invitations/[token]/sign-up/route";
import * as auditRoute from "@/app/api/workspaces/[id]/audit/route";
import * as invitationsRoute from "@/app/api/workspaces/[id]/invitations/route";
import * as memberRoute from "@/app/api/workspaces/[id]/members/[userId]/route";
import * as membersRoute from "@/app/api/workspaces/[id]/members/route";
import { db } from "@/db";
import { invitation, user } from "@/db/schema";
import { appOrigin } from "@/lib/env";
import { hashInvitationToken, lookUpInvitation } from "@/lib/invitations";
import { invitationTokenOf, call, cookieHeader, withMailFake, makeAccount, makeWorkspace, roleOf, uniqueEmail, waitForMail, type Person } from "./helpers";


describe("invitations", () => {
  let owner: Person;
  let ws: string;

  withMailFake();
  beforeAll(async () => {
    owner = await makeAccount("olga");
    ws = await makeWorkspace("Harbour Intake Screens", [[owner, "owner"]]);
  });

  async function invite(email: string, role: string) {
    const res = await call(invitationsRoute.POST, { method: "POST", params: { id: ws }, cookie: owner.cookie, body: { email, role } });
    expect(res.status).toBe(201);
    return res.body.invitation as { id: string; url: string; email: string; mailSent: boolean };
  }

  it("mails a link to the invitee; signing up from it joins the workspace verified and signed in; the link then refuses a second use", async () => {
    const email = uniqueEmail("colleague");
    const inv = await invite(email.toUpperCase(), "checker");
    expect(inv.email).toBe(email);
    expect(inv.mailSent).toBe(true);
    const mail = await waitForMail(email, { subject: /invited you to "Harbour Intake Screens"/ });
    expect(mail.text).toContain("as checker: Reads, comments and checks versions prepared by others.");
    expect(mail.text).toContain(inv.url);
    expect(inv.url.startsWith(`${appOrigin()}/invite/`)).toBe(true);

    const token = invitationTokenOf(inv.url);
    const stored = await db.select({ tokenHash: invitation.tokenHash }).from(invitation).where(eq(invitation.id, inv.id));
    expect(stored[0].tokenHash).toBe(hashInvitationToken(token));
    expect(stored[0].tokenHash).not.toContain(token);

    const signUp = await call(signUpRoute.POST, { method: "POST", params: { token }, body: { name: "Chidi Colleague", password: "checker-password-1" } });
    expect(signUp.status).toBe(201);
    expect(signUp.body.workspaceId).toBe(ws);
    const cookie = cookieHeader(signUp.res.headers.getSetCookie());
    expect(cookie).toMatch(/counterpoise\.session_token=/);

    const [u] = await db.select().from(user).where(eq(user.email, email));
    expect(u.emailVerified).toBe(true);
    expect(await roleOf(ws, u.id)).toBe("checker");
    const members = await call(membersRoute.GET, { params: { id: ws }, cookie });
    expect(members.status).toBe(200);
    expect(members.body.members.map((m: { email: string; role: string }) => [m.email, m.role])).toEqual([
      [owner.email, "owner"],
      [email, "checker"],
    ]);

    const reuse = await call(signUpRoute.POST, { method: "POST", params: { token }, body: { name: "Someone Else", password: "another-password" } });
    expect(reuse.status).toBe(410);
    expect(reuse.body.error).toMatchObject({ code: "invitation_used", invitationStatus: "used", workspaceName: "Harbour Intake Screens", inviterName: owner.name });
    expect(reuse.body.error.message).toMatch(/^This invitation has already been used\. Each invitation link works once\./);
    const reaccept = await call(acceptRoute.POST, { method: "POST", params: { token }, cookie });
    expect(reaccept.status).toBe(410);
    expect((await lookUpInvitation(token))!.status).toBe("used");
  });

  it("refuses an expired link with 410 and says to ask for a new one", async () => {
    const existing = await makeAccount("late");
    const inv = await invite(existing.email, "viewer");
    await db.update(invitation).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(invitation.id, inv.id));
    const res = await call(acceptRoute.POST, { method: "POST", params: { token: invitationTokenOf(inv.url) }, cookie: existing.cookie });
    expect(res.status).toBe(410);
    expect(res.body.error).toEqual({
      code: "invitation_expired",
      message: `This invitation has expired. Invitation links work for a limited time. Ask ${owner.name}, who invited you, or another owner of "Harbour Intake Screens" to send the invitation again; the new mail has a fresh link.`,
      invitationStatus: "expired",
      workspaceName: "Harbour Intake Screens",
      inviterName: owner.name,
    });
    expect(await roleOf(ws, existing.id)).toBeNull();
  });

  it("an existing account accepts once; a second invitation to the same address withdraws the first link", async () => {
    const existing = await makeAccount("eddie");
    const first = await invite(existing.email, "viewer");
    const second = await invite(existing.email, "editor");
    const withdrawn = await call(acceptRoute.POST, { method: "POST", params: { token: invitationTokenOf(first.url) }, cookie: existing.cookie });
    expect(withdrawn.status).toBe(410);
    expect(withdrawn.body.error.code).toBe("invitation_withdrawn");

    const ok = await call(acceptRoute.POST, { method: "POST", params: { token: invitationTokenOf(second.url) }, cookie: existing.cookie });
    expect(ok.status).toBe(200);
    expect(ok.body).toEqual({ workspaceId: ws, role: "editor" });
    expect(await roleOf(ws, existing.id)).toBe("editor");
  });

  it("refuses to invite a current member (409) and an account signed in with another address (403)", async () => {
    const again = await call(invitationsRoute.POST, { method: "POST", params: { id: ws }, cookie: owner.cookie, body: { email: owner.email, role: "viewer" } });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe("already_member");

    const inv = await invite(uniqueEmail("intended"), "viewer");
    const stranger = await makeAccount("stranger");
    const res = await call(acceptRoute.POST, { method: "POST", params: { token: invitationTokenOf(inv.url) }, cookie: stranger.cookie });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("email_mismatch");
    expect(res.body.error.message).toContain(inv.email);
  });

  it("two acceptances of one link at once: exactly one succeeds", async () => {
    const existing = await makeAccount("twice");
    const inv = await invite(existing.email, "checker");
    const token = invitationTokenOf(inv.url);
    const results = await Promise.all([1, 2, 3].map(() => call(acceptRoute.POST, { method: "POST", params: { token }, cookie: existing.cookie })));
    expect(results.map((r) => r.status).sort()).toEqual([200, 410, 410]);
    expect(await roleOf(ws, existing.id)).toBe("checker");
  });

  it("answers 404 for a link that never existed", async () => {
    const res = await call(signUpRoute.POST, { method: "POST", params: { token: "made-up-token-made-up-token" }, body: { name: "X", password: "whatever-long" } });
    expect(res.status).toBe(404);
  });

  it("writes invitation, acceptance, role change and removal to the audit log, newest first", async () => {
    const res = await call(auditRoute.GET, { params: { id: ws }, cookie: owner.cookie });
    expect(res.status).toBe(200);
    const actions = res.body.events.map((e: { action: string }) => e.action);
    expect(actions).toContain("invitation.create");
    expect(actions).toContain("invitation.accept");
    expect(actions).toContain("auth.sign_in");
    const ids = res.body.events.map((e: { id: number }) => e.id);
    expect([...ids].sort((a, b) => b - a)).toEqual(ids);
  });
});

describe("a removed member", () => {
  it("loses access on the very next request, and a demoted member loses the demoted rights at once", async () => {
    const owner = await makeAccount("rosa");
    const member = await makeAccount("milo");
    const ws = await makeWorkspace("Cooling Tower Bay", [
      [owner, "owner"],
      [member, "owner"],
    ]);
    expect((await call(invitationsRoute.GET, { params: { id: ws }, cookie: member.cookie })).status).toBe(200);

    const demote = await call(memberRoute.PATCH, { method: "PATCH", params: { id: ws, userId: member.id }, cookie: owner.cookie, body: { role: "viewer" } });
    expect(demote.status).toBe(200);
    const refused = await call(invitationsRoute.GET, { params: { id: ws }, cookie: member.cookie });
    expect(refused.status).toBe(403);
    expect((await call(membersRoute.GET, { params: { id: ws }, cookie: member.cookie })).status).toBe(200);

    const remove = await call(memberRoute.DELETE, { method: "DELETE", params: { id: ws, userId: member.id }, cookie: owner.cookie });
    expect(remove.status).toBe(200);
    const after = await call(membersRoute.GET, { params: { id: ws }, cookie: member.cookie });
    expect(after.status).toBe(404);
    expect(after.body.error.code).toBe("not_found");

    const audit = await call(auditRoute.GET, { params: { id: ws }, cookie: owner.cookie });
    const [removal, change] = audit.body.events.filter((e: { action: string }) => e.action.startsWith("member."));
    expect(removal).toMatchObject({ action: "member.remove", targetId: member.id, targetName: member.name, actorEmail: owner.email });
    expect(change).toMatchObject({ action: "member.role_change", detail: { from: "owner", to: "viewer", email: member.email } });
  });
});
