import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { mailFrom, smtpSettings } from "./env";

export type Mail = { to: string; subject: string; text: string; html: string };

const globalForMail = globalThis as unknown as { counterpoiseMailer?: Transporter };

/** Real SMTP from SMTP_* when SMTP_HOST is set, otherwise the local fake on 127.0.0.1:SMTP_PORT. */
function transporter(): Transporter {
  if (globalForMail.counterpoiseMailer) return globalForMail.counterpoiseMailer;
  const s = smtpSettings();
  const t =
    s.kind === "real"
      ? nodemailer.createTransport({
          host: s.host,
          port: s.port,
          secure: s.secure,
          auth: s.user ? { user: s.user, pass: s.password ?? "" } : undefined,
        })
      : nodemailer.createTransport({ host: s.host, port: s.port, secure: false, ignoreTLS: true, connectionTimeout: 5000 });
  globalForMail.counterpoiseMailer = t;
  return t;
}

/** Send one mail. Throws when the SMTP server refuses or does not answer. */
export async function sendMail(mail: Mail): Promise<void> {
  await transporter().sendMail({ from: mailFrom(), to: mail.to, subject: mail.subject, text: mail.text, html: mail.html });
}

/**
 * Send without making the caller wait or fail (auth flows answer the same whether or not an
 * account exists, so the time to send must not show); failures go to the server log.
 */
export function sendMailInBackground(mail: Mail): void {
  sendMail(mail).catch((err: unknown) => {
    console.error(`[mail] could not send "${mail.subject}" to ${mail.to}:`, err instanceof Error ? err.message : err);
  });
}
