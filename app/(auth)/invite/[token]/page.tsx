import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { cache } from "react";
import { AuthCard } from "@/components/auth/AuthFrame";
import { AcceptInvitationButton, InvitationSignUpForm, SwitchAccountButton } from "@/components/auth/InvitationActions";
import { RoleBadge } from "@/components/workspaces/RoleBadge";
import { Notice } from "@/components/shell/controls";
import { orBusy } from "@/lib/db-unavailable";
import { accountExists, invitationPath, invitationRefusal, invitationSignInPath, lookUpInvitation } from "@/lib/invitations";
import { ROLE_INFO } from "@/lib/roles";
import { currentSession } from "@/lib/session";

export const dynamic = "force-dynamic";

// once per request: the tab's title and the page read the same lookup. A database busy for a
// moment shows "busy, try again" (the error page reads the digest), not a failure
const lookUp = cache((token: string) => orBusy(lookUpInvitation(token)));

/**
 * The tab says what happened to a refused link, as its card does. The page itself answers 200: an
 * App Router page can answer 404 (an unknown link, `notFound()`) but not 410; the API says 410.
 */
export async function generateMetadata({ params }: { params: Promise<{ token: string }> }): Promise<Metadata> {
  const view = await lookUp((await params).token);
  const refused = view ? invitationRefusal(view) : null;
  return { title: refused?.title ?? "Invitation", robots: { index: false, follow: false } };
}

const primary = "inline-flex w-full justify-center rounded-md bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink-soft";

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const view = await lookUp(token);
  const session = await currentSession();
  const here = invitationPath(token);

  // an unknown link answers 404 (its page: not-found.tsx); nothing streams before this check
  if (!view) notFound();

  const r = invitationRefusal(view);
  if (r) {
    return (
      <AuthCard title={r.title} lead={<>Workspace: <strong className="text-ink">{view.workspaceName}</strong></>}>
        <div className="space-y-4">
          <Notice tone="error">{r.body}</Notice>
          <Link href={session ? "/workspaces" : "/sign-in"} className={primary}>
            {session ? "Go to your workspaces" : "Sign in"}
          </Link>
        </div>
      </AuthCard>
    );
  }

  // a long address wraps anywhere rather than running out of the card
  const lead = (
    <div className="space-y-3">
      <p className="[overflow-wrap:anywhere]">
        {view.inviterName ?? "An owner"} invited <strong className="text-ink">{view.email}</strong> to the workspace{" "}
        <strong className="text-ink">{view.workspaceName}</strong>.
      </p>
      <p className="flex items-center gap-2">
        <RoleBadge role={view.role} />
        <span>{ROLE_INFO[view.role].summary}</span>
      </p>
    </div>
  );

  const expires = <>Expires {view.expiresAt.toUTCString().replace(/:\d\d GMT$/, " UTC")}</>;

  if (session && session.user.email.toLowerCase() === view.email) {
    return (
      <AuthCard title="Join the workspace" lead={lead} foot={expires}>
        <AcceptInvitationButton token={token} workspaceName={view.workspaceName} />
      </AuthCard>
    );
  }

  // whoever holds the link is the invitee: telling them whether their address has an account yet is
  // the next step they need, not something a stranger learns (the link is a secret sent to them)
  const hasAccount = await orBusy(accountExists(view.email));

  if (session) {
    // signed in as someone else: say so plainly, and offer the invited address's own next step
    return (
      <AuthCard title="This invitation is for another address" lead={lead} foot={expires}>
        <div className="space-y-4">
          <Notice tone="info">
            <span className="[overflow-wrap:anywhere]">
              You are signed in as <strong>{session.user.email}</strong>. Only {view.email} can accept this invitation
              {hasAccount ? ": sign out, then sign in with that address." : ", and it has no account yet: sign out, then create one."} To join as{" "}
              {session.user.email} instead, ask {view.inviterName ?? "an owner of the workspace"} to invite that address.
            </span>
          </Notice>
          <SwitchAccountButton next={here} email={view.email} hasAccount={hasAccount} />
        </div>
      </AuthCard>
    );
  }

  if (hasAccount) {
    return (
      <AuthCard title="Join the workspace" lead={lead} foot={expires}>
        <Link href={invitationSignInPath(token, view.email)} className={`${primary} text-center [overflow-wrap:anywhere]`}>
          Sign in as {view.email} to join
        </Link>
      </AuthCard>
    );
  }

  return (
    <AuthCard title="Create your account to join" lead={lead} foot={expires}>
      <InvitationSignUpForm token={token} email={view.email} />
    </AuthCard>
  );
}
