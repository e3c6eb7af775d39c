import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/AuthFrame";
import { ForgotPasswordForm } from "@/components/auth/ForgotPasswordForm";
import { MailboxHint } from "@/components/auth/MailboxHint";
import { SignedInNote } from "@/components/auth/SignedInNote";
import { currentSession } from "@/lib/session";

export const metadata: Metadata = { title: "Reset your password" };

const footLink = "font-semibold text-ink underline decoration-rule underline-offset-2";

export default async function ForgotPasswordPage({ searchParams }: { searchParams: Promise<{ email?: string }> }) {
  const { email } = await searchParams;
  // signed in: the link still works (for this account or another), but a known password is changed
  // in the settings, and the way back is to the workspaces, not to a sign-in that would only bounce
  const session = await currentSession();
  return (
    <AuthCard
      title="Reset your password"
      lead="Enter the address you sign in with. We send a link to choose a new password."
      foot={
        session ? (
          <Link href="/workspaces" className={footLink}>
            Back to your workspaces
          </Link>
        ) : (
          <Link href="/sign-in" className={footLink}>
            Back to sign-in
          </Link>
        )
      }
    >
      {session ? (
        <div className="mb-5">
          <SignedInNote email={session.user.email}>
            Know your current password? Change it in Account settings instead. A new password set through the link signs its account out on every device.
          </SignedInNote>
        </div>
      ) : null}
      <ForgotPasswordForm defaultEmail={email ?? session?.user.email ?? ""} />
      <MailboxHint />
    </AuthCard>
  );
}
