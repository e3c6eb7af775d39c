import Link from "next/link";
import type { ReactNode } from "react";
import { Wordmark } from "@/components/site/Wordmark";

/** The local mailbox's page frame: plainly a development tool, not part of the product. */
export function MailboxFrame({ children }: { children: ReactNode }) {
  return (
    <div className="min-h-screen">
      <header className="border-b border-dashed border-caution/50 bg-caution-soft/50">
        <div className="mx-auto flex max-w-5xl items-center justify-between gap-4 px-4 py-3 sm:px-6">
          <div className="flex items-center gap-3">
            <Wordmark />
            <span className="rounded border border-caution/40 px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wider text-caution">Local mailbox</span>
          </div>
          <Link href="/dev/mailbox" className="text-sm font-medium text-ink-soft hover:text-ink">
            All mail
          </Link>
        </div>
      </header>
      <main className="mx-auto max-w-5xl px-4 py-6 sm:px-6 sm:py-8">{children}</main>
    </div>
  );
}

/** Mail text with its web addresses as links (the text stays text: nothing is rendered as HTML). */
export function LinkedText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"')\]]+)/g);
  return (
    <>
      {parts.map((p, i) =>
        i % 2 === 1 ? (
          <a key={i} href={p} className="break-all font-medium text-reaction underline underline-offset-2">
            {p}
          </a>
        ) : (
          <span key={i}>{p}</span>
        ),
      )}
    </>
  );
}
