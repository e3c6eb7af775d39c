import { bigint, index, pgTable, text, timestamp } from "drizzle-orm/pg-core";

/**
 * Mail received by the local SMTP fake (scripts/local-services.ts), listed at /dev/mailbox.
 * Empty wherever real SMTP is configured.
 */
export const devMail = pgTable(
  "dev_mail",
  {
    id: bigint("id", { mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
    receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
    from: text("from").notNull(),
    to: text("to").array().notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
  },
  (t) => [index("dev_mail_received_idx").on(t.receivedAt)],
);
