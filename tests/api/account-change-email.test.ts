// Changing the sign-in address from the account page: a link goes to the new address (with words
// for a change, not a sign-up), the address changes only when the link is opened, and then the
// new address signs in and the old one does not. An address that has an account gets no mail and
// changes nothing.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import * as authRoute from "@/app/api/auth/[...all]/route";
import { db } from "@/db";
import { auditEvent, devMail, user } from "@/db/schema";
import { isEmailChangeLink } from "@/lib/auth";
import { appOrigin } from "@/lib/env";
import { firstLink, makeAccount, PASSWORD, uniqueEmail, waitForMail, withMailFake } from "./helpers";
import { authPoster } from "./auth-setup";

const post = authPoster("10.9.8.63");

describe("changing the e-mail address", () => {
  withMailFake();

  it("mails the new address a link; opening it makes the change, and the new address signs in", async () => {
    const ada = await makeAccount("change-ada", { name: "Ada Mover" });
    const next = uniqueEmail("change-ada-new");
    const res = await post("/change-email", { newEmail: next, callbackURL: "/account?email=changed" }, { cookie: ada.cookie });
    expect(res.status).toBe(200);
    // nothing changes before the link is opened
    expect((await db.select({ email: user.email }).from(user).where(eq(user.id, ada.id)))[0].email).toBe(ada.email);

    const mail = await waitForMail(next, { subject: /new e-mail address/ });
    expect(mail.subject).toBe("Confirm your new e-mail address for Counterpoise");
    expect(mail.text).toContain("Hello Ada Mover,");
    expect(mail.text).toContain("until then the old address stays");
    const link = firstLink(mail.text);
    expect(isEmailChangeLink(link)).toBe(true);

    const opened = await authRoute.GET(new Request(link, { headers: { "x-forwarded-for": "10.9.8.63" } }));
    expect(opened.status).toBe(302);
    const to = new URL(opened.headers.get("location")!, appOrigin());
    expect(`${to.pathname}${to.search}`).toBe("/account?email=changed");

    const [row] = await db.select({ email: user.email, verified: user.emailVerified }).from(user).where(eq(user.id, ada.id));
    expect(row).toEqual({ email: next, verified: true });
    expect((await post("/sign-in/email", { email: next, password: PASSWORD })).status).toBe(200);
    expect((await post("/sign-in/email", { email: ada.email, password: PASSWORD })).status).toBe(401);

    // the old address is told, and the audit log keeps both addresses
    const notice = await waitForMail(ada.email, { subject: /sign-in address was changed/ });
    expect(notice.text).toContain(`Your Counterpoise account now signs in with ${next}, not with this address.`);
    expect(notice.text).toContain("If you did not make this change, someone else may hold your account");
    const [audit] = await db.select().from(auditEvent).where(and(eq(auditEvent.actorId, ada.id), eq(auditEvent.action, "auth.email_change")));
    expect(audit.detail).toEqual({ from: ada.email, to: next });
  });

  it("an address that has an account: the same answer, no mail to it, no change", async () => {
    const bo = await makeAccount("change-bo");
    const taken = await makeAccount("change-taken", { signIn: false });
    const before = await db.select({ id: devMail.id }).from(devMail);
    const res = await post("/change-email", { newEmail: taken.email, callbackURL: "/account?email=changed" }, { cookie: bo.cookie });
    expect(res.status).toBe(200);
    // a mail, had one been sent, is in the table by the time a later one to bo arrives
    await post("/request-password-reset", { email: bo.email, redirectTo: "/reset-password" });
    await waitForMail(bo.email, { subject: /new Counterpoise password/ });
    const after = await db.select({ id: devMail.id, to: devMail.to }).from(devMail);
    const fresh = after.filter((m) => !before.some((b) => b.id === m.id));
    expect(fresh.some((m) => m.to.includes(taken.email))).toBe(false);
    expect((await db.select({ email: user.email }).from(user).where(eq(user.id, bo.id)))[0].email).toBe(bo.email);
  });

  it("a sign-up's confirmation link is not taken for a change of address, and tells no old address", async () => {
    const email = uniqueEmail("change-signup");
    expect((await post("/sign-up/email", { email, password: PASSWORD, name: "Cy Signup", callbackURL: "/verify?confirmed=1" })).status).toBe(200);
    const mail = await waitForMail(email);
    expect(mail.subject).toBe("Confirm your e-mail address for Counterpoise");
    expect(isEmailChangeLink(firstLink(mail.text))).toBe(false);
    const opened = await authRoute.GET(new Request(firstLink(mail.text), { headers: { "x-forwarded-for": "10.9.8.63" } }));
    expect(opened.status).toBe(302);
    const [row] = await db.select({ id: user.id, verified: user.emailVerified }).from(user).where(eq(user.email, email));
    expect(row.verified).toBe(true);
    expect(await db.select().from(auditEvent).where(and(eq(auditEvent.actorId, row.id), eq(auditEvent.action, "auth.email_change")))).toEqual([]);
  });
});
