import type { Metadata } from "next";
import { AccountActivity } from "@/components/auth/AccountActivity";
import { ChangeEmailForm, ChangePasswordForm, NotificationsForm, ProfileForm } from "@/components/auth/AccountForms";
import { DeleteAccount } from "@/components/auth/DeleteAccount";
import { DevicesPanel } from "@/components/auth/DevicesPanel";
import { AppShell } from "@/components/shell/AppShell";
import { Notice, Panel } from "@/components/shell/controls";
import { accountActivity } from "@/lib/account-activity";
import { accountDeletionPlan } from "@/lib/account-deletion";
import { activeSessions } from "@/lib/account-sessions";
import { requirePageSession } from "@/lib/session";

export const metadata: Metadata = { title: "Account settings" };

export default async function AccountPage({ searchParams }: { searchParams: Promise<{ email?: string; error?: string }> }) {
  const { user, session } = await requirePageSession("/account");
  // the user's id comes from the session, never from the request: only their own events
  const [devices, activity, plan] = await Promise.all([activeSessions(user.id, session.id), accountActivity(user.id, session.id), accountDeletionPlan(user.id)]);
  const held = (list: typeof plan.left) => list.map((w) => ({ id: w.id, name: w.name, members: w.members }));
  // back from the link mailed to a new address (better-auth adds `error` when the link failed)
  const { email: emailStep, error } = await searchParams;
  return (
    <AppShell next="/account">
      <div className="mx-auto max-w-3xl space-y-6">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Account settings</h1>
          <p className="mt-1 text-ink-soft">Your name, your sign-in address and password, where you are signed in, and the mail you get.</p>
        </div>
        {emailStep === "changed" && !error ? (
          <Notice tone="success">
            <span className="[overflow-wrap:anywhere]">You now sign in with {user.email}.</span>
          </Notice>
        ) : null}
        {emailStep === "changed" && error ? <Notice tone="error">That link did not change your address: it has expired or was used already. Ask for a new one below.</Notice> : null}
        <Panel title="Profile">
          <ProfileForm name={user.name} />
        </Panel>
        <Panel title="E-mail address">
          <ChangeEmailForm email={user.email} />
        </Panel>
        <Panel title="Password" description="Changing it keeps you signed in here.">
          <ChangePasswordForm />
        </Panel>
        <Panel title="Signed-in devices" description="Every browser where your account is signed in now. One you do not know? Sign it out, then change your password.">
          <DevicesPanel sessions={devices} />
        </Panel>
        <Panel title="Recent account activity" description="Your last 20 sign-ins, sign-outs and changes of password or address, newest first. One you did not make? Sign out everywhere, then change your password.">
          <AccountActivity events={activity} />
        </Panel>
        <Panel title="Notifications">
          <NotificationsForm enabled={user.emailNotifications !== false} />
        </Panel>
        <Panel title="Delete your account">
          <DeleteAccount name={user.name} plan={{ blocking: held(plan.blocking), deleted: held(plan.deleted), left: held(plan.left) }} />
        </Panel>
      </div>
    </AppShell>
  );
}
