import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/AuthFrame";
import { MailboxHint } from "@/components/auth/MailboxHint";
import { ResendVerificationForm } from "@/components/auth/ResendVerificationForm";
import { SignedInNote } from "@/components/auth/SignedInNote";
import { Notice } from "@/components/shell/controls";
import { DEFAULT_NEXT, withNext } from "@/components/auth/nextPath";
import { currentSession, safeNext } from "@/lib/session";

export const metadata: Metadata = { title: "Confirm your e-mail" };

type Search = Promise<{ sent?: string; confirmed?: string; error?: string; next?: string }>;

const primary = "inline-flex w-full justify-center rounded-md bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink-soft";

export default async function VerifyPage({ searchParams }: { searchParams: Search }) {
  const search = await searchParams;
  const { sent, confirmed, error } = search;
  // the page the user was on before "Create an account" (a scratch sketch to save), kept for the sign-in
  const next = safeNext(search.next);
  // signed in already: a confirmation link opened here is for another account (an account signs in
  // only once confirmed), so the page says whose session this is and how to use the other one
  const session = await currentSession();
  const signedIn = session ? (
    <SignedInNote email={session.user.email} signOut={{ label: "Sign out to use another account", to: withNext("/sign-in", next) }} />
  ) : null;

  if (error) {
    const expired = error === "TOKEN_EXPIRED";
    return (
      <AuthCard title={expired ? "This link has expired" : "This link does not work"}>
        <div className="space-y-5">
          <Notice tone="error">
            {expired
              ? "Confirmation links work for one hour. Send yourself a new one below."
              : "The confirmation link is not valid: it may have been used already, or copied only in part."}
          </Notice>
          <ResendVerificationForm next={next} />
          <MailboxHint />
          {signedIn}
        </div>
      </AuthCard>
    );
  }

  if (confirmed && session) {
    return (
      <AuthCard title="E-mail address confirmed">
        <div className="space-y-4">
          <Notice tone="success">The account is ready.</Notice>
          <SignedInNote email={session.user.email} signOut={{ label: "Sign out, then sign in with the confirmed address", to: withNext("/sign-in", next) }}>
            To use the account you just confirmed, sign out first.
          </SignedInNote>
          <Link href={next} className={`${primary} text-center [overflow-wrap:anywhere]`}>
            {next === DEFAULT_NEXT ? `Carry on as ${session.user.name}` : `Carry on where you left off, as ${session.user.name}`}
          </Link>
        </div>
      </AuthCard>
    );
  }

  if (confirmed) {
    return (
      <AuthCard title="E-mail address confirmed">
        <div className="space-y-4">
          <Notice tone="success">{next === DEFAULT_NEXT ? "Your account is ready. Sign in to open your personal workspace." : "Your account is ready. Sign in to carry on where you left off."}</Notice>
          <Link href={withNext("/sign-in", next)} className={primary}>
            Sign in
          </Link>
        </div>
      </AuthCard>
    );
  }

  return (
    <AuthCard
      title="Check your inbox"
      lead={
        sent ? (
          <>
            We sent a confirmation link to <strong className="text-ink [overflow-wrap:anywhere]">{sent}</strong>. Open it to finish setting up your account; it works for one hour.
            {/* an address with an account already gets a mail that says so (lib/auth.ts), not a link */}{" "}
            If the address already has an account, the mail says so instead, with a link to sign in.
          </>
        ) : (
          "We sent you a confirmation link. Open it to finish setting up your account; it works for one hour."
        )
      }
    >
      <div className="space-y-4">
        <p className="text-sm text-ink-soft">Nothing arrived after a few minutes? Check the spam folder, or send the link again.</p>
        <ResendVerificationForm defaultEmail={sent ?? ""} label="Send the link again" next={next} />
        <MailboxHint />
        {signedIn}
      </div>
    </AuthCard>
  );
}
