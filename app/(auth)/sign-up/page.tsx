import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthCard } from "@/components/auth/AuthFrame";
import { SignUpForm } from "@/components/auth/SignUpForm";
import { currentSession } from "@/lib/session";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ email?: string }> }) {
  const { email } = await searchParams;
  if (await currentSession()) redirect("/workspaces");
  return (
    <AuthCard
      title="Create an account"
      lead="You get a personal workspace at once; colleagues can invite you to theirs."
      foot={
        <>
          Have an account?{" "}
          <Link href="/sign-in" className="font-semibold text-ink underline decoration-rule underline-offset-2">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm defaultEmail={email ?? ""} />
    </AuthCard>
  );
}
