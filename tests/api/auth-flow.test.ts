// Sign-up, e-mail verification, sign-in, the personal workspace, the sign-in audit row and the
// cookie attributes, through better-auth's own HTTP handler as a browser would call it.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import * as workspacesRoute from "@/app/api/workspaces/route";
import { db } from "@/db";
import { auditEvent, membership, user, workspace } from "@/db/schema";
import { appOrigin } from "@/lib/env";
import { call, cookieHeader, withMailFake, firstLink, PASSWORD, uniqueEmail, waitForMail } from "./helpers";
import { authPoster } from "./auth-setup";
import * as authRoute from "@/app/api/auth/[...all]/route";

const post = authPoster("10.9.8.7");

describe("sign-up, verification and sign-in", () => {
  withMailFake();

  const email = uniqueEmail("newcomer");

  it("signs up without a session, makes a personal workspace and mails a verification link", async () => {
    const res = await post("/sign-up/email", { email, password: PASSWORD, name: "Nadia Newcomer", callbackURL: "/verify?confirmed=1" });
    expect(res.status).toBe(200);
    expect(res.headers.getSetCookie().some((c) => c.startsWith("counterpoise.session_token="))).toBe(false);

    const [u] = await db.select().from(user).where(eq(user.email, email));
    expect(u.emailVerified).toBe(false);
    expect(u.emailNotifications).toBe(true);
    const personal = await db
      .select({ name: workspace.name, role: membership.role })
      .from(workspace)
      .innerJoin(membership, eq(membership.workspaceId, workspace.id))
      .where(and(eq(workspace.personalOf, u.id), eq(membership.userId, u.id)));
    expect(personal).toEqual([{ name: "Nadia's workspace", role: "owner" }]);

    const mail = await waitForMail(email, { subject: /Confirm your e-mail/ });
    expect(mail.text).toContain("Hello Nadia Newcomer,");
    expect(firstLink(mail.text)).toMatch(new RegExp(`^${appOrigin()}/api/auth/verify-email\\?token=.+&callbackURL=%2Fverify%3Fconfirmed%3D1$`));
  });

  it("refuses to sign in before the address is confirmed (403 EMAIL_NOT_VERIFIED) and mails a fresh link that also leads to /verify", async () => {
    const before = await waitForMail(email, { subject: /Confirm your e-mail/ });
    const res = await post("/sign-in/email", { email, password: PASSWORD });
    expect(res.status).toBe(403);
    expect((await res.json()).code).toBe("EMAIL_NOT_VERIFIED");
    const fresh = await waitForMail(email, { subject: /Confirm your e-mail/, after: before.id });
    expect(firstLink(fresh.text)).toMatch(/&callbackURL=%2Fverify%3Fconfirmed%3D1$/);
  });

  it("confirms the address from the mailed link and redirects to /verify", async () => {
    const mail = await waitForMail(email, { subject: /Confirm your e-mail/ });
    const link = new URL(firstLink(mail.text));
    const res = await authRoute.GET(new Request(link.toString(), { headers: { "x-forwarded-for": "10.9.8.7" } }));
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toBe("/verify?confirmed=1");
    const [u] = await db.select({ v: user.emailVerified }).from(user).where(eq(user.email, email));
    expect(u.v).toBe(true);
  });

  it("a used or forged link redirects with an error", async () => {
    const res = await authRoute.GET(
      new Request(`${appOrigin()}/api/auth/verify-email?token=not-a-token&callbackURL=%2Fverify%3Fconfirmed%3D1`, { headers: { "x-forwarded-for": "10.9.8.7" } }),
    );
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toBe("/verify?confirmed=1&error=INVALID_TOKEN");
  });

  it("signs in with an httpOnly, SameSite=Lax cookie that is not Secure over http, and records the sign-in", async () => {
    const res = await post("/sign-in/email", { email, password: PASSWORD });
    expect(res.status).toBe(200);
    const cookies = res.headers.getSetCookie();
    const sessionCookie = cookies.find((c) => c.startsWith("counterpoise.session_token="))!;
    expect(sessionCookie).toMatch(/; HttpOnly/i);
    expect(sessionCookie).toMatch(/; SameSite=Lax/i);
    expect(sessionCookie).not.toMatch(/; Secure/i);

    const { status, body } = await call(workspacesRoute.GET, { cookie: cookieHeader(cookies) });
    expect(status).toBe(200);
    expect(body.workspaces).toHaveLength(1);
    expect(body.workspaces[0]).toMatchObject({ name: "Nadia's workspace", role: "owner", personal: true, memberCount: 1 });

    const [u] = await db.select({ id: user.id }).from(user).where(eq(user.email, email));
    const rows = await db.select().from(auditEvent).where(and(eq(auditEvent.actorId, u.id), eq(auditEvent.action, "auth.sign_in")));
    expect(rows).toHaveLength(1);
    expect(rows[0].workspaceId).toBeNull();
  });

  it("refuses a sign-in posted from another site", async () => {
    const res = await post("/sign-in/email", { email, password: PASSWORD }, { origin: "https://elsewhere.example" });
    expect(res.status).toBe(403);
  });

  it("mails a password reset link that leads to /reset-password with a token, and the new password works", async () => {
    const res = await post("/request-password-reset", { email, redirectTo: "/reset-password" });
    expect(res.status).toBe(200);
    const mail = await waitForMail(email, { subject: /new Counterpoise password/ });
    const link = firstLink(mail.text);
    const redirect = await authRoute.GET(new Request(link, { headers: { "x-forwarded-for": "10.9.8.7" } }));
    expect(redirect.status).toBe(302);
    const location = new URL(redirect.headers.get("location")!, appOrigin());
    expect(location.pathname).toBe("/reset-password");
    const token = location.searchParams.get("token")!;
    expect(token.length).toBeGreaterThan(10);

    const reset = await post("/reset-password", { newPassword: "a-brand-new-secret", token });
    expect(reset.status).toBe(200);
    expect((await post("/sign-in/email", { email, password: PASSWORD })).status).toBe(401);
    expect((await post("/sign-in/email", { email, password: "a-brand-new-secret" })).status).toBe(200);
    const again = await post("/reset-password", { newPassword: "yet-another-secret", token });
    expect(again.status).toBe(400);
  });
});
