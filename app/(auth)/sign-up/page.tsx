import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthCard } from "@/components/auth/AuthFrame";
import { SignUpForm } from "@/components/auth/SignUpForm";
import { withNext } from "@/components/auth/nextPath";
import { currentSession, safeNext } from "@/lib/session";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ email?: string; next?: string }> }) {
  const { email, next } = await searchParams;
  const target = safeNext(next);
  if (await currentSession()) redirect(target);
  return (
    <AuthCard
      title="Create an account"
      lead="You get a personal workspace at once; colleagues can invite you to theirs."
      foot={
        <>
          Have an account?{" "}
          <Link href={withNext("/sign-in", target)} className="font-semibold text-ink underline decoration-rule underline-offset-2">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm defaultEmail={email ?? ""} next={target} />
    </AuthCard>
  );
}
