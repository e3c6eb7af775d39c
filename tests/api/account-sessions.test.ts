// The account page's list of signed-in devices, read from the real session table: only this
// account's sessions that have not expired, the current one first; and signing out every other
// device through better-auth's route leaves exactly the current one. Signing out everywhere ends
// every session of the account at once; it, the other-devices sign-out and a password change go
// into the audit log, the sign-outs shown to the owners of the person's workspaces.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import * as auditRoute from "@/app/api/workspaces/[id]/audit/route";
import * as workspacesRoute from "@/app/api/workspaces/route";
import { auditEvent, session } from "@/db/schema";
import { activeSessions } from "@/lib/account-sessions";
import { getAuth } from "@/lib/auth";
import { authPoster } from "./auth-setup";
import { call, sessionTokenOf, makeAccount, makeWorkspace, PASSWORD, signIn, type Json } from "./helpers";

const post = authPoster("10.9.8.61");
const idOf = async (cookie: string) => (await db.select({ id: session.id }).from(session).where(eq(session.token, sessionTokenOf(cookie))))[0].id;

describe("activeSessions", () => {
  it("lists the account's live sessions, the current one first and marked; expired and other people's are left out", async () => {
    const ada = await makeAccount("devices-ada");
    const laptop = ada.cookie;
    const phone = await signIn(ada.email);
    const old = await signIn(ada.email);
    await db.update(session).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(session.token, sessionTokenOf(old)));
    await makeAccount("devices-bob");

    const list = await activeSessions(ada.id, await idOf(laptop));
    expect(list).toHaveLength(2);
    expect(list.map((s) => s.current)).toEqual([true, false]);
    expect(list[0].id).toBe(await idOf(laptop));
    expect(list[1].id).toBe(await idOf(phone));
    // never the token itself: the page is HTML a script could read
    expect(JSON.stringify(list)).not.toContain(sessionTokenOf(laptop));
  });

  it("after 'sign out every other device', only the current session is left, and it still works", async () => {
    const cy = await makeAccount("devices-cy");
    await signIn(cy.email);
    await signIn(cy.email);
    expect(await activeSessions(cy.id, await idOf(cy.cookie))).toHaveLength(3);
    const res = await post("/revoke-other-sessions", {}, { cookie: cy.cookie });
    expect(res.status).toBe(200);
    const left = await activeSessions(cy.id, await idOf(cy.cookie));
    expect(left.map((s) => s.current)).toEqual([true]);
    const still = await getAuth().api.getSession({ headers: new Headers({ cookie: cy.cookie }) });
    expect(still?.user.email).toBe(cy.email);
  });
});

const eventsOf = (userId: string, action: string) => db.select().from(auditEvent).where(and(eq(auditEvent.actorId, userId), eq(auditEvent.action, action)));

describe("signing out everywhere", () => {
  it("ends every session of the account at once: each device's next request is 401; other people stay signed in", async () => {
    const dee = await makeAccount("devices-dee");
    const phone = await signIn(dee.email);
    const tablet = await signIn(dee.email);
    const eve = await makeAccount("devices-eve");
    expect((await call(workspacesRoute.GET, { cookie: phone })).status).toBe(200);

    const res = await post("/revoke-sessions", {}, { cookie: dee.cookie });
    expect(res.status).toBe(200);
    for (const cookie of [dee.cookie, phone, tablet]) {
      const after = await call(workspacesRoute.GET, { cookie });
      expect(after.status).toBe(401);
      expect(after.body.error.code).toBe("unauthenticated");
    }
    expect(await db.select().from(session).where(eq(session.userId, dee.id))).toEqual([]);
    expect((await call(workspacesRoute.GET, { cookie: eve.cookie })).status).toBe(200);
    // a new sign-in works as before
    expect((await call(workspacesRoute.GET, { cookie: await signIn(dee.email) })).status).toBe(200);
  });

  it("goes into the audit log, and the owners of the person's workspace see it (with the sign-ins shown or hidden)", async () => {
    const owner = await makeAccount("devices-owner");
    const fay = await makeAccount("devices-fay");
    const ws = await makeWorkspace("Dam gallery", [
      [owner, "owner"],
      [fay, "editor"],
    ]);
    await signIn(fay.email);
    expect((await post("/revoke-other-sessions", {}, { cookie: fay.cookie })).status).toBe(200);
    expect((await post("/revoke-sessions", {}, { cookie: fay.cookie })).status).toBe(200);
    const others = await eventsOf(fay.id, "auth.sign_out_others");
    const all = await eventsOf(fay.id, "auth.sign_out_all");
    expect(others).toHaveLength(1);
    expect(all).toHaveLength(1);
    expect(all[0]).toMatchObject({ actorEmail: fay.email, workspaceId: null, targetType: "user", targetId: fay.id });

    const path = `/api/workspaces/${ws}/audit`;
    for (const query of ["", "?signIns=hide"]) {
      const log = await call(auditRoute.GET, { params: { id: ws }, cookie: owner.cookie, path: `${path}${query}` });
      expect(log.status).toBe(200);
      const fays = log.body.events.filter((e: Json) => e.actorEmail === fay.email && e.action !== "auth.sign_in").map((e: Json) => e.action);
      expect(fays).toEqual(["auth.sign_out_all", "auth.sign_out_others"]);
    }
    // a signed-out request records nothing
    expect((await post("/revoke-sessions", {}, { cookie: fay.cookie })).status).toBe(401);
    expect(await eventsOf(fay.id, "auth.sign_out_all")).toHaveLength(1);
  });
});

describe("changing the password", () => {
  it("refuses a wrong current password and records nothing; with the right one the new password signs in, the old does not, and other devices can be signed out", async () => {
    const gus = await makeAccount("devices-gus");
    const laptop = await signIn(gus.email);
    const NEW = "a-longer-new-password";
    const wrong = await post("/change-password", { currentPassword: "not-my-password", newPassword: NEW }, { cookie: gus.cookie });
    expect(wrong.status).toBe(400);
    expect(await eventsOf(gus.id, "auth.password_change")).toEqual([]);

    const res = await post("/change-password", { currentPassword: PASSWORD, newPassword: NEW, revokeOtherSessions: true }, { cookie: gus.cookie });
    expect(res.status).toBe(200);
    expect((await call(workspacesRoute.GET, { cookie: laptop })).status).toBe(401);
    await expect(signIn(gus.email)).rejects.toThrow();
    expect((await call(workspacesRoute.GET, { cookie: await signIn(gus.email, NEW) })).status).toBe(200);
    const [event] = await eventsOf(gus.id, "auth.password_change");
    expect(event.detail).toEqual({ signedOutOthers: true });
  });
});
