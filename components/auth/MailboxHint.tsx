import Link from "next/link";
import { mailboxEnabled } from "@/lib/env";

/** On a local run, mail goes to the local mailbox page instead of the internet: say where. */
export function MailboxHint() {
  if (!mailboxEnabled()) return null;
  return (
    <p className="mt-4 rounded-md border border-dashed border-rule px-3 py-2 text-xs text-ink-soft">
      Local run: mail is not sent out. Open the{" "}
      <Link href="/dev/mailbox" className="font-semibold text-ink underline underline-offset-2">
        local mailbox
      </Link>{" "}
      to read it.
    </p>
  );
}
