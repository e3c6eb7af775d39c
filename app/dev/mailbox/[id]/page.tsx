import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { LinkedText, MailboxFrame } from "@/components/auth/MailboxFrame";
import { formatDateTime } from "@/components/workspaces/format";
import { getDevMail } from "@/db/queries/mailbox";
import { mailboxEnabled } from "@/lib/env";
import { linksIn } from "@/lib/mime";

export const metadata: Metadata = { title: "Local mailbox" };
export const dynamic = "force-dynamic";

export default async function MailPage({ params }: { params: Promise<{ id: string }> }) {
  if (!mailboxEnabled((await headers()).get("host"))) notFound();
  const { id } = await params;
  const mail = /^\d{1,15}$/.test(id) ? await getDevMail(Number(id)) : null;
  if (!mail) notFound();
  const links = linksIn(mail.text);
  return (
    <MailboxFrame>
      <article className="rounded-lg border border-rule bg-paper-card">
        <header className="space-y-1 border-b border-rule-soft px-4 py-4 text-sm sm:px-6">
          <h1 className="text-xl font-semibold tracking-tight text-ink">{mail.subject}</h1>
          <dl className="grid grid-cols-[5rem_minmax(0,1fr)] gap-y-0.5 text-ink-soft [&>dd]:[overflow-wrap:anywhere]">
            <dt>From</dt>
            <dd>{mail.from}</dd>
            <dt>To</dt>
            <dd>{mail.to.join(", ")}</dd>
            <dt>Received</dt>
            <dd className="num">{formatDateTime(mail.receivedAt)}</dd>
          </dl>
        </header>
        {links.length ? (
          <div className="flex flex-wrap gap-2 border-b border-rule-soft bg-paper-deep/40 px-4 py-3 sm:px-6">
            <span className="self-center text-xs font-semibold uppercase tracking-wider text-ink-faint">Open</span>
            {links.map((href, i) => (
              <a key={href} href={href} className="rounded-md bg-ink px-3 py-1.5 text-sm font-medium text-paper hover:bg-ink-soft">
                {links.length === 1 ? "Open the link in this mail" : `Link ${i + 1}`}
              </a>
            ))}
          </div>
        ) : null}
        <pre className="whitespace-pre-wrap break-words px-4 py-5 font-sans text-[15px] leading-relaxed text-ink sm:px-6">
          <LinkedText text={mail.text} />
        </pre>
      </article>
    </MailboxFrame>
  );
}
