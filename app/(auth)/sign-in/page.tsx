import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthCard } from "@/components/auth/AuthFrame";
import { SignInForm } from "@/components/auth/SignInForm";
import { withNext } from "@/components/auth/nextPath";
import { currentSession, safeNext } from "@/lib/session";

export const metadata: Metadata = { title: "Sign in" };

type Search = Promise<{ next?: string; email?: string }>;

export default async function SignInPage({ searchParams }: { searchParams: Search }) {
  const { next, email } = await searchParams;
  const target = safeNext(next);
  if (await currentSession()) redirect(target);
  return (
    <AuthCard
      title="Sign in"
      lead="Open your workspaces: sketches, their versions, and the calcs waiting for your check."
      foot={
        <>
          New to Counterpoise?{" "}
          <Link href={withNext("/sign-up", target)} className="font-semibold text-ink underline decoration-rule underline-offset-2">
            Create an account
          </Link>
        </>
      }
    >
      <SignInForm next={target} defaultEmail={email ?? ""} />
    </AuthCard>
  );
}
