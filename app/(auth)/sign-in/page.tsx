import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/AuthFrame";
import { OtherAddressNote } from "@/components/auth/SignedInNote";
import { SignInForm } from "@/components/auth/SignInForm";
import { Notice } from "@/components/shell/controls";
import { withNext } from "@/components/auth/nextPath";
import { sessionForOtherAddress } from "@/components/auth/signedInPage";
import { safeNext } from "@/lib/session";

export const metadata: Metadata = { title: "Sign in" };

type Search = Promise<{ next?: string; email?: string; account?: string }>;

export default async function SignInPage({ searchParams }: { searchParams: Search }) {
  const { next, email, account } = await searchParams;
  const target = safeNext(next);
  const session = await sessionForOtherAddress(email, target);
  if (session) {
    return (
      <AuthCard title="Sign in">
        <OtherAddressNote signedInAs={session.user.email} name={session.user.name} email={email ?? ""} action="sign in" signOutTo={withNext(`/sign-in?email=${encodeURIComponent(email ?? "")}`, target)} carryOnTo={target} />
      </AuthCard>
    );
  }
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
      {account === "deleted" ? (
        <div className="mb-4">
          <Notice tone="success">Your account was deleted, and a mail to its address says so. What you did in shared workspaces stays on their record, marked as a former member’s.</Notice>
        </div>
      ) : null}
      <SignInForm next={target} defaultEmail={email ?? ""} />
    </AuthCard>
  );
}
