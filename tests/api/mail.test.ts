// Mail: the MIME reader on what nodemailer writes, and a round trip through the local SMTP
// fake into the table /dev/mailbox lists.
import nodemailer from "nodemailer";
import { describe, expect, it } from "vitest";
import { getDevMail, listDevMail } from "@/db/queries/mailbox";
import { sendMail } from "@/lib/mail";
import { invitationMail, passwordResetMail } from "@/lib/mail-templates";
import { linksIn, parseMail } from "@/lib/mime";
import { withMailFake, uniqueEmail, waitForMail } from "./helpers";

async function compose(opts: { subject: string; text: string; html?: string; textEncoding?: "base64" | "quoted-printable" }): Promise<Buffer> {
  const t = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: "windows" });
  const info = await t.sendMail({ from: "Counterpoise <no-reply@counterpoise.local>", to: "a@b.c", ...opts });
  return info.message as Buffer;
}

describe("MIME reader", () => {
  it("reads subject, text and html of a multipart message with non-ASCII text", async () => {
    const text = `Mass flow ṁ = 14.2 kg/s, ΔF = 0.44 kN — a line long enough to be wrapped by quoted-printable encoding at seventy-six characters.\nNext: https://calc.example.com/invite/abc_DEF-123`;
    const raw = await compose({ subject: "Prüfung: ṁ und Δp für Pumpe 3", text, html: "<p>ṁ = 14.2 kg/s</p>", textEncoding: "quoted-printable" });
    const m = parseMail(raw);
    expect(m.subject).toBe("Prüfung: ṁ und Δp für Pumpe 3");
    expect(m.from).toBe("Counterpoise <no-reply@counterpoise.local>");
    expect(m.text).toBe(text);
    expect(m.html).toBe("<p>ṁ = 14.2 kg/s</p>");
    expect(linksIn(m.text)).toEqual(["https://calc.example.com/invite/abc_DEF-123"]);
  });

  it("reads a base64 text part", async () => {
    const raw = await compose({ subject: "Plain", text: "Reaction R₁ = 4.51 kN", textEncoding: "base64" });
    expect(parseMail(raw).text).toBe("Reaction R₁ = 4.51 kN");
    expect(parseMail(raw).html).toBeNull();
  });
});

describe("mail through the local SMTP fake", () => {
  withMailFake();

  it("stores what the app sends, readable by the mailbox queries", async () => {
    const to = uniqueEmail("mailbox");
    const url = "http://127.0.0.1:3000/invite/tok-123";
    await sendMail(invitationMail({ to, inviterName: "Olivia Owner", workspaceName: "Demo: Riverside Pump Station", role: "checker", url, expiresAt: new Date("2030-01-02T03:04:00Z") }));
    const stored = await waitForMail(to);
    expect(stored.subject).toBe('Olivia Owner invited you to "Demo: Riverside Pump Station" on Counterpoise');
    expect(stored.to).toEqual([to]);
    expect(stored.text).toContain("The link works once, until Wed, 02 Jan 2030 03:04 UTC.");
    expect(linksIn(stored.text)).toEqual([url]);
    expect(stored.html).toContain(`href="${url}"`);

    const listed = await listDevMail({ to: to.toUpperCase() });
    expect(listed.map((m) => m.id)).toEqual([stored.id]);
    expect((await getDevMail(stored.id))?.subject).toBe(stored.subject);
  });

  it("escapes names in the HTML part", () => {
    const mail = passwordResetMail({ to: "x@y.z", name: "<b>Bobby</b>", url: "http://127.0.0.1:3000/r?a=1&b=2" });
    expect(mail.html).toContain("Hello &lt;b&gt;Bobby&lt;/b&gt;,");
    expect(mail.html).toContain('href="http://127.0.0.1:3000/r?a=1&amp;b=2"');
    expect(mail.text).toContain("Choose a new password: http://127.0.0.1:3000/r?a=1&b=2");
  });
});
