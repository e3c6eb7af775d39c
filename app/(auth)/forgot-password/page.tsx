import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/AuthFrame";
import { ForgotPasswordForm } from "@/components/auth/ForgotPasswordForm";
import { MailboxHint } from "@/components/auth/MailboxHint";

export const metadata: Metadata = { title: "Reset your password" };

export default async function ForgotPasswordPage({ searchParams }: { searchParams: Promise<{ email?: string }> }) {
  const { email } = await searchParams;
  return (
    <AuthCard
      title="Reset your password"
      lead="Enter the address you sign in with. We send a link to choose a new password."
      foot={
        <Link href="/sign-in" className="font-semibold text-ink underline decoration-rule underline-offset-2">
          Back to sign-in
        </Link>
      }
    >
      <ForgotPasswordForm defaultEmail={email ?? ""} />
      <MailboxHint />
    </AuthCard>
  );
}
