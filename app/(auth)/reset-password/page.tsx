import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/AuthFrame";
import { ResetPasswordForm } from "@/components/auth/ResetPasswordForm";
import { Notice } from "@/components/shell/controls";
import { currentSession } from "@/lib/session";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; error?: string }> }) {
  const { token, error } = await searchParams;
  // a reset link opened while signed in: it may be for this account or another one (a colleague's
  // shared machine, a second account); the page says who is signed in and what the reset changes
  const session = await currentSession();
  if (error || !token) {
    return (
      <AuthCard title="This link does not work">
        <div className="space-y-4">
          <Notice tone="error" title={error ? "The reset link has expired or was already used." : "The link is missing its token."}>
            Reset links work once, for one hour. Ask for a new one and use the newest mail.
          </Notice>
          <Link href="/forgot-password" className="inline-flex w-full justify-center rounded-md bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink-soft">
            Send a new reset link
          </Link>
          {session ? (
            <p className="text-center text-sm">
              <Link href="/workspaces" className="font-semibold text-ink underline decoration-rule underline-offset-2">
                Back to your workspaces
              </Link>
            </p>
          ) : null}
        </div>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Choose a new password" lead={session ? undefined : "After this, every device signed in to your account is signed out."}>
      <ResetPasswordForm token={token} signedInAs={session?.user.email} />
    </AuthCard>
  );
}
