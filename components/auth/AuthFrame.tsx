import Link from "next/link";
import type { ReactNode } from "react";
import { CautionFooter } from "@/components/site/CautionFooter";
import { Wordmark } from "@/components/site/Wordmark";

/**
 * The frame of the signed-out pages: the mark, one card on the drafting grid, the cautions below.
 * `signedIn`: the visitor has an account and a session (an invitation's Join page), so the header
 * leads to their workspaces instead of offering a sketch without an account.
 */
export function AuthFrame({ children, signedIn = false }: { children: ReactNode; signedIn?: boolean }) {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b border-rule/70">
        <nav className="mx-auto flex max-w-6xl items-center justify-between px-6 py-4" aria-label="Main">
          <Wordmark />
          {signedIn ? (
            <Link href="/workspaces" className="whitespace-nowrap text-sm font-medium text-ink-soft hover:text-ink">
              Your workspaces
            </Link>
          ) : (
            // a phone has room beside the mark for the short words only; two lines would crowd it
            <Link href="/sketches/new" className="whitespace-nowrap text-sm font-medium text-ink-soft hover:text-ink">
              Try a sketch<span className="max-sm:hidden"> without an account</span>
            </Link>
          )}
        </nav>
      </header>
      <main className="drafting-grid flex flex-1 items-start justify-center px-4 py-12 md:py-16">{children}</main>
      <CautionFooter />
    </div>
  );
}

/** One titled card of the signed-out pages. */
export function AuthCard({ title, lead, children, foot }: { title: string; lead?: ReactNode; children: ReactNode; foot?: ReactNode }) {
  return (
    <div className="w-full max-w-[420px]">
      <div className="rounded-lg border border-rule bg-paper-card px-7 py-7 shadow-[0_1px_0_rgb(var(--rule)),0_12px_32px_-18px_rgb(var(--shade)/0.35)]">
        <h1 className="text-2xl font-semibold tracking-tight text-ink">{title}</h1>
        {lead ? <div className="mt-1.5 text-sm leading-relaxed text-ink-soft">{lead}</div> : null}
        <div className="mt-6">{children}</div>
      </div>
      {foot ? <div className="mt-4 text-center text-sm text-ink-soft">{foot}</div> : null}
    </div>
  );
}
