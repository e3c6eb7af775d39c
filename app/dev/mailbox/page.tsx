import type { Metadata } from "next";
import Link from "next/link";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { MailboxFrame } from "@/components/auth/MailboxFrame";
import { EmptyState } from "@/components/shell/controls";
import { formatDateTime } from "@/components/workspaces/format";
import { listDevMail } from "@/db/queries/mailbox";
import { mailboxEnabled } from "@/lib/env";

export const metadata: Metadata = { title: "Local mailbox" };
export const dynamic = "force-dynamic";

export default async function MailboxPage({ searchParams }: { searchParams: Promise<{ to?: string }> }) {
  if (!mailboxEnabled((await headers()).get("host"))) notFound();
  const { to } = await searchParams;
  const mails = await listDevMail({ to: to || undefined, limit: 200 });
  return (
    <MailboxFrame>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Local mailbox</h1>
          <p className="mt-1 max-w-2xl text-sm text-ink-soft">
            Every mail the app sent on this machine: nothing leaves it. With real SMTP settings (SMTP_HOST), mail goes out and this page is off.
          </p>
        </div>
        {/* on a phone the field takes the line's room, so Filter and Refresh stay on screen */}
        <form className="flex w-full items-end gap-2 sm:w-auto" action="/dev/mailbox">
          <label className="min-w-0 flex-1 text-sm sm:flex-none">
            <span className="mb-1 block font-medium">To</span>
            <input name="to" defaultValue={to ?? ""} placeholder="any address" className="w-full rounded-md border border-rule bg-paper-card px-2.5 py-1.5 text-sm sm:w-64" />
          </label>
          <button className="rounded-md border border-ink/20 bg-paper-card px-3 py-1.5 text-sm font-medium hover:border-ink/45">Filter</button>
          <Link href={to ? `/dev/mailbox?to=${encodeURIComponent(to)}` : "/dev/mailbox"} className="rounded-md px-3 py-1.5 text-sm font-medium text-ink-soft hover:bg-paper-deep">
            Refresh
          </Link>
        </form>
      </div>
      <div className="mt-6">
        {mails.length ? (
          <div className="overflow-hidden rounded-lg border border-rule bg-paper-card">
            <table className="w-full text-sm">
              <caption className="sr-only">Received mail, newest first</caption>
              <thead>
                <tr className="border-b border-rule text-left text-xs uppercase tracking-wider text-ink-faint">
                  <th scope="col" className="px-4 py-2 font-semibold max-sm:hidden">Received</th>
                  <th scope="col" className="px-4 py-2 font-semibold max-sm:hidden">To</th>
                  <th scope="col" className="px-4 py-2 font-semibold">Subject</th>
                </tr>
              </thead>
              <tbody>
                {mails.map((m) => (
                  <tr key={m.id} className="border-b border-rule-soft last:border-0 hover:bg-paper-deep/50">
                    <td className="num whitespace-nowrap px-4 py-2.5 text-ink-soft max-sm:hidden">{formatDateTime(m.receivedAt)}</td>
                    <td className="px-4 py-2.5 text-ink-soft [overflow-wrap:anywhere] max-sm:hidden">{m.to.join(", ")}</td>
                    <td className="px-4 py-2.5">
                      <Link href={`/dev/mailbox/${m.id}`} className="font-medium text-ink underline decoration-rule underline-offset-2 hover:decoration-ink">
                        {m.subject}
                      </Link>
                      {/* a phone has no room for the columns: their words go under the subject */}
                      <span className="mt-0.5 block text-xs text-ink-soft [overflow-wrap:anywhere] sm:hidden" data-testid="mail-row-summary">
                        {m.to.join(", ")} · <span className="num whitespace-nowrap">{formatDateTime(m.receivedAt)}</span>
                      </span>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        ) : (
          <EmptyState title={to ? `No mail to ${to} yet` : "No mail yet"}>
            Sign up, ask for a password reset or invite someone: the mail appears here within a second or two. Refresh to look again.
          </EmptyState>
        )}
      </div>
    </MailboxFrame>
  );
}
