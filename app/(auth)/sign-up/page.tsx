import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/AuthFrame";
import { OtherAddressNote } from "@/components/auth/SignedInNote";
import { SignUpForm } from "@/components/auth/SignUpForm";
import { withNext } from "@/components/auth/nextPath";
import { sessionForOtherAddress } from "@/components/auth/signedInPage";
import { safeNext } from "@/lib/session";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ email?: string; next?: string }> }) {
  const { email, next } = await searchParams;
  const target = safeNext(next);
  const session = await sessionForOtherAddress(email, target);
  if (session) {
    return (
      <AuthCard title="Create an account">
        <OtherAddressNote signedInAs={session.user.email} name={session.user.name} email={email ?? ""} action="create an account" signOutTo={withNext(`/sign-up?email=${encodeURIComponent(email ?? "")}`, target)} carryOnTo={target} />
      </AuthCard>
    );
  }
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
