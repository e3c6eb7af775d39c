// Creating an account with an address that already has one: better-auth answers as for a new
// address (so a stranger cannot learn who has an account), and the page says a mail was sent. The
// mail must then come, to the owner of the address, with the way in: sign in (the address filled
// in) or, for a password forgotten, choose a new one. Without it the person waits for nothing.
import { describe, expect, it } from "vitest";
import { appOrigin } from "@/lib/env";
import { withMailFake, firstLink, makeAccount, PASSWORD, uniqueEmail, waitForMail } from "./helpers";
import { authPoster } from "./auth-setup";

const post = authPoster("10.9.8.42");

describe("sign-up with an address that has an account", () => {
  withMailFake();

  it("answers as for a new address, and mails the owner a sign-in link with the address filled in", async () => {
    const existing = await makeAccount("already-here", { signIn: false, name: "Ada Already" });
    const res = await post("/sign-up/email", { email: existing.email, password: "a-different-password", name: "Ada Again", callbackURL: "/verify?confirmed=1" });
    expect(res.status).toBe(200);
    expect(res.headers.getSetCookie().some((c) => c.startsWith("counterpoise.session_token="))).toBe(false);

    const mail = await waitForMail(existing.email, { subject: /^You already have a Counterpoise account$/ });
    expect(mail.text).toContain("Hello Ada Already,");
    expect(mail.text).toContain("Someone tried to create a Counterpoise account with this address, which already has one.");
    expect(firstLink(mail.text)).toBe(`${appOrigin()}/sign-in?email=${encodeURIComponent(existing.email)}`);
    expect(mail.text).toContain("Forgot your password?");
    expect(mail.text).toContain("If it was not you, ignore this mail: your account and its password are unchanged.");
  });

  it("a new address still gets its confirmation mail, not this one", async () => {
    const email = uniqueEmail("brand-new");
    const res = await post("/sign-up/email", { email, password: PASSWORD, name: "Bram New", callbackURL: "/verify?confirmed=1" });
    expect(res.status).toBe(200);
    const mail = await waitForMail(email);
    expect(mail.subject).toBe("Confirm your e-mail address for Counterpoise");
  });
});
