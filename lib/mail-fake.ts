// The local SMTP fake: accepts any mail on loopback and stores it in the dev_mail table, where
// /dev/mailbox lists it. Run by scripts/local-services.ts (and by API tests in-process).
// Relative imports and no `server-only`: this runs under tsx, outside Next.
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { SMTPServer } from "smtp-server";
import { devMail } from "../db/tables/dev-mail";
import { parseMail } from "./mime";

export type ReceivedMail = { from: string; to: string[]; subject: string; text: string; html: string | null };

const MAX_MESSAGE_BYTES = 2 * 1024 * 1024;

/** Start an SMTP server on host:port; every message is parsed and handed to `onMail`. Resolves a stop function. */
export async function startMailFake(opts: {
  port: number;
  host?: string;
  onMail: (mail: ReceivedMail) => Promise<void>;
}): Promise<() => Promise<void>> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    banner: "Counterpoise local mail (nothing leaves this machine)",
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("error", callback);
      stream.on("end", () => {
        const parsed = parseMail(Buffer.concat(chunks));
        const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
        const mail: ReceivedMail = {
          from: parsed.from || envelopeFrom,
          to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
          subject: parsed.subject,
          text: parsed.text,
          html: parsed.html,
        };
        opts.onMail(mail).then(
          () => callback(),
          (err: unknown) => {
            console.error("[mail] could not store a received message:", err instanceof Error ? err.message : err);
            callback(new Error("local mailbox could not store the message"));
          },
        );
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, opts.host ?? "127.0.0.1", () => {
      server.off("error", reject);
      // A client that drops its connection (a test process ending mid-session resets the socket)
      // is reported here; unheard, the error would end the process and every local service in it.
      server.on("error", (err: Error) => console.error("[mail] a connection to the local SMTP fake failed:", err.message));
      resolve();
    });
  });
  return () => new Promise<void>((resolve) => server.close(() => resolve()));
}

/** Store received mail in the dev_mail table of the given database. */
export function devMailStore(databaseUrl: string): { save: (mail: ReceivedMail) => Promise<void>; close: () => Promise<void> } {
  const pool = new Pool({ connectionString: databaseUrl, max: 2 });
  const db = drizzle(pool, { casing: "snake_case" });
  return {
    async save(mail) {
      await db.insert(devMail).values(mail);
    },
    close: () => pool.end(),
  };
}
