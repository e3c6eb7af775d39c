// The account page's "Recent account activity", read through GET /api/account/activity: a person
// sees their own sign-ins (with the browser that made them), sign-outs (one device, every other,
// everywhere), password and address changes, newest first, the last 20; never another person's,
// whatever the request asks for; and a new account's list holds only its first sign-in. The sign-in
// that started the asking session is marked thisDevice: its audit row keeps a hash of the session id,
// never the id or the token.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import * as activityRoute from "@/app/api/account/activity/route";
import * as auditRoute from "@/app/api/workspaces/[id]/audit/route";
import { db } from "@/db";
import { auditEvent, session } from "@/db/schema";
import { sessionAuditKey } from "@/lib/account-activity";
import { recordAudit } from "@/lib/audit";
import { authPoster } from "./auth-setup";
import { call, cookieHeader, makeAccount, makeWorkspace, PASSWORD, signIn, type Json } from "./helpers";

const post = authPoster("10.9.8.73");
const FIREFOX = "Mozilla/5.0 (Windows NT 10.0; Win64; x64; rv:126.0) Gecko/20100101 Firefox/126.0";
const SAFARI_PHONE = "Mozilla/5.0 (iPhone; CPU iPhone OS 17_4 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.4 Mobile/15E148 Safari/604.1";

async function signInWith(email: string, userAgent: string): Promise<string> {
  const res = await post("/sign-in/email", { email, password: PASSWORD }, { "user-agent": userAgent });
  expect(res.status).toBe(200);
  return cookieHeader(res.headers.getSetCookie());
}

const activityOf = async (cookie: string, path = "/api/account/activity") => {
  const res = await call(activityRoute.GET, { cookie, path });
  expect(res.status).toBe(200);
  return res.body.events as Json[];
};

describe("GET /api/account/activity", () => {
  it("lists the person's own account events newest first, with the browser of each sign-in and sign-out", async () => {
    const ada = await makeAccount("activity-ada");
    const laptop = await signInWith(ada.email, FIREFOX);
    const phone = await signInWith(ada.email, SAFARI_PHONE);
    expect((await post("/sign-out", {}, { cookie: phone, "user-agent": SAFARI_PHONE })).status).toBe(200);
    expect((await post("/change-password", { currentPassword: PASSWORD, newPassword: "another-long-password" }, { cookie: laptop })).status).toBe(200);
    expect((await post("/revoke-other-sessions", {}, { cookie: laptop })).status).toBe(200);

    const events = await activityOf(laptop);
    expect(events.map((e) => e.action)).toEqual(["auth.sign_out_others", "auth.password_change", "auth.sign_out", "auth.sign_in", "auth.sign_in", "auth.sign_in"]);
    expect(events[2]).toMatchObject({ userAgent: SAFARI_PHONE, ip: "10.9.8.73" });
    expect(events[3]).toMatchObject({ userAgent: SAFARI_PHONE, ip: "10.9.8.73" });
    expect(events[4]).toMatchObject({ userAgent: FIREFOX, ip: "10.9.8.73" });
    expect(events[1]).toMatchObject({ signedOutOthers: false });
    // newest first: the times never go forward down the list
    const times = events.map((e) => Date.parse(e.at));
    expect([...times].sort((a, b) => b - a)).toEqual(times);
  });

  it("marks the sign-in of the asking session as this device, from a hash of its session id kept in the audit row", async () => {
    const eve = await makeAccount("activity-eve");
    const owner = await makeAccount("activity-eve-owner");
    const ws = await makeWorkspace("Spillway gate", [
      [owner, "owner"],
      [eve, "editor"],
    ]);
    const laptop = await signInWith(eve.email, FIREFOX);
    const phone = await signInWith(eve.email, SAFARI_PHONE);

    const fromLaptop = await activityOf(laptop);
    // newest first: the phone's sign-in, the laptop's, the one that made the account
    expect(fromLaptop.map((e) => e.action)).toEqual(["auth.sign_in", "auth.sign_in", "auth.sign_in"]);
    expect(fromLaptop.slice(0, 2).map((e) => e.userAgent)).toEqual([SAFARI_PHONE, FIREFOX]);
    expect(fromLaptop.map((e) => e.thisDevice)).toEqual([false, true, false]);
    const fromPhone = await activityOf(phone);
    expect(fromPhone.map((e) => e.thisDevice)).toEqual([true, false, false]);
    // nothing of the hash reaches the browser
    expect(JSON.stringify(fromPhone)).not.toContain("sessionHash");

    // the audit rows hold the hash of each session's id, and neither the id nor the token
    const sessions = await db.select({ id: session.id, token: session.token }).from(session).where(eq(session.userId, eve.id));
    const rows = await db.select({ detail: auditEvent.detail }).from(auditEvent).where(and(eq(auditEvent.actorId, eve.id), eq(auditEvent.action, "auth.sign_in")));
    expect(rows).toHaveLength(3);
    expect(rows.map((r) => (r.detail as { sessionHash?: string }).sessionHash).sort()).toEqual(sessions.map((x) => sessionAuditKey(x.id)).sort());
    const stored = JSON.stringify(rows);
    for (const x of sessions) {
      expect(stored).not.toContain(x.id);
      expect(stored).not.toContain(x.token);
    }

    // the owners' log lists her sign-ins (browser, address) without the hash: only her own page uses it
    const log = await call(auditRoute.GET, { params: { id: ws }, cookie: owner.cookie, path: `/api/workspaces/${ws}/audit` });
    expect(log.status).toBe(200);
    const eves = log.body.events.filter((e: Json) => e.actorEmail === eve.email && e.action === "auth.sign_in");
    expect(eves.map((e: Json) => e.detail.userAgent)).toEqual([SAFARI_PHONE, FIREFOX]);
    expect(eves.every((e: Json) => !("sessionHash" in e.detail))).toBe(true);

    // signed out on the laptop: its sign-in is no longer this device for anyone, the phone's still is
    expect((await post("/sign-out", {}, { cookie: laptop, "user-agent": FIREFOX })).status).toBe(200);
    const after = await activityOf(phone);
    expect(after.map((e) => [e.action, e.thisDevice])).toEqual([
      ["auth.sign_out", false],
      ["auth.sign_in", true],
      ["auth.sign_in", false],
      ["auth.sign_in", false],
    ]);
  });

  it("never shows another person's events, whatever the address asks for", async () => {
    const bo = await makeAccount("activity-bo");
    const cy = await makeAccount("activity-cy");
    await signIn(cy.email);
    expect((await post("/revoke-sessions", {}, { cookie: cy.cookie })).status).toBe(200);
    await recordAudit({ action: "auth.email_change", actorId: cy.id, actorEmail: "cy-new@example.test", detail: { from: cy.email, to: "cy-new@example.test" } });

    // asking for someone else's by the address is refused, naming what was not expected
    const asked = await call(activityRoute.GET, { cookie: bo.cookie, path: `/api/account/activity?userId=${encodeURIComponent(cy.id)}` });
    expect(asked.status).toBe(400);
    expect(JSON.stringify(asked.body)).toContain("userId");
    expect(JSON.stringify(asked.body)).not.toContain(cy.email);
    const bos = await activityOf(bo.cookie);
    expect(bos.map((e) => e.action)).toEqual(["auth.sign_in"]);
    expect(JSON.stringify(bos)).not.toContain(cy.email);
    const cys = await activityOf(await signIn(cy.email));
    expect(cys.map((e) => e.action)).toEqual(["auth.sign_in", "auth.email_change", "auth.sign_out_all", "auth.sign_in", "auth.sign_in"]);
    expect(cys[1]).toMatchObject({ from: cy.email, to: "cy-new@example.test" });
  });

  it("keeps the last 20 and leaves out workspace events", async () => {
    const di = await makeAccount("activity-di");
    const ws = await makeWorkspace("Weir flap", [[di, "owner"]]);
    for (let i = 0; i < 22; i++) await recordAudit({ action: "auth.sign_in", actorId: di.id, detail: { ip: `192.0.2.${i}`, userAgent: FIREFOX } });
    await recordAudit({ action: "workspace.rename", actorId: di.id, workspaceId: ws, detail: { name: "Weir flap 2" } });
    const events = await activityOf(di.cookie);
    expect(events).toHaveLength(20);
    expect(events[0].ip).toBe("192.0.2.21");
    expect(events[19].ip).toBe("192.0.2.2");
    expect(events.every((e) => e.action === "auth.sign_in")).toBe(true);
  });

  it("answers 401 when signed out", async () => {
    const res = await call(activityRoute.GET, {});
    expect(res.status).toBe(401);
  });
});
