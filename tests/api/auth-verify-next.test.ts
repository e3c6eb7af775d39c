// An account not yet confirmed signs in from a page that asked to come back somewhere (an
// invitation to join): the refusal mails a fresh confirmation link, and that link must still lead
// back there (through /verify and the sign-in it offers), or the invitation is lost on the way.
import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { user } from "@/db/schema";
import { withVerifyCallback } from "@/lib/auth";
import { appOrigin } from "@/lib/env";
import { withMailFake, firstLink, makeAccount, PASSWORD, waitForMail } from "./helpers";
import { authPoster } from "./auth-setup";

const signInFrom = (referer: string | null, email: string) => authPoster("10.9.8.77")("/sign-in/email", { email, password: PASSWORD }, referer ? { referer } : {});

const callbackOf = (link: string) => new URL(link).searchParams.get("callbackURL");

describe("the confirmation link a sign-in resends", () => {
  withMailFake();

  it("keeps the sign-in page's next: confirmed, then signed in, it ends at the invitation", async () => {
    const person = await makeAccount("unconfirmed-invitee", { signIn: false });
    await db.update(user).set({ emailVerified: false }).where(eq(user.id, person.id));
    const res = await signInFrom(`${appOrigin()}/sign-in?next=%2Finvite%2Fabc123&email=${encodeURIComponent(person.email)}`, person.email);
    expect(res.status).toBe(403);
    expect((await res.json()).code).toBe("EMAIL_NOT_VERIFIED");
    const mail = await waitForMail(person.email, { subject: /Confirm your e-mail/ });
    expect(callbackOf(firstLink(mail.text))).toBe("/verify?confirmed=1&next=%2Finvite%2Fabc123");
  });

  it("without a next (or from another site) it is the plain confirmation page", async () => {
    const person = await makeAccount("unconfirmed-plain", { signIn: false });
    await db.update(user).set({ emailVerified: false }).where(eq(user.id, person.id));
    await signInFrom(null, person.email);
    const first = await waitForMail(person.email, { subject: /Confirm your e-mail/ });
    expect(callbackOf(firstLink(first.text))).toBe("/verify?confirmed=1");
  });
});

describe("withVerifyCallback", () => {
  const link = (callback: string) => `${appOrigin()}/api/auth/verify-email?token=t&callbackURL=${encodeURIComponent(callback)}`;
  it("takes next only from this app's own sign-in page, and only a path inside the app", () => {
    expect(callbackOf(withVerifyCallback(link("/"), `${appOrigin()}/sign-in?next=%2Fsketches%2Fnew%3Fsave%3D1`))).toBe("/verify?confirmed=1&next=%2Fsketches%2Fnew%3Fsave%3D1");
    expect(callbackOf(withVerifyCallback(link("/"), "https://elsewhere.example/sign-in?next=%2Finvite%2Fx"))).toBe("/verify?confirmed=1");
    expect(callbackOf(withVerifyCallback(link("/"), `${appOrigin()}/sign-up?next=%2Finvite%2Fx`))).toBe("/verify?confirmed=1");
    expect(callbackOf(withVerifyCallback(link("/"), `${appOrigin()}/sign-in?next=%2F%2Fevil.example`))).toBe("/verify?confirmed=1");
    expect(callbackOf(withVerifyCallback(link("/"), `${appOrigin()}/sign-in?next=%2Fworkspaces`))).toBe("/verify?confirmed=1");
    expect(callbackOf(withVerifyCallback(link("/"), "not a url"))).toBe("/verify?confirmed=1");
  });
  it("leaves a callback the sign-up chose alone", () => {
    expect(callbackOf(withVerifyCallback(link("/verify?confirmed=1&next=%2Finvite%2Fy"), `${appOrigin()}/sign-in?next=%2Finvite%2Fz`))).toBe("/verify?confirmed=1&next=%2Finvite%2Fy");
  });
});
