"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { apiFetch, ApiError } from "@/lib/api-client";
import { passwordSchema, personNameSchema } from "@/lib/schemas";
import { useSignOut } from "./useSignOut";

const path = (token: string, action: string) => `/api/invitations/${encodeURIComponent(token)}/${action}`;

/** Signed in with the invited address: one button to join. */
export function AcceptInvitationButton({ token, workspaceName }: { token: string; workspaceName: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function accept() {
    setBusy(true);
    setError(null);
    try {
      const r = await apiFetch<{ workspaceId: string }>(path(token, "accept"), { method: "POST" });
      router.push(`/workspaces/${r.workspaceId}`);
      router.refresh();
    } catch (err) {
      setBusy(false);
      setError(err instanceof ApiError ? err.message : "Something went wrong. Try again.");
    }
  }
  return (
    <div className="space-y-3">
      {error ? <Notice tone="error">{error}</Notice> : null}
      <Button onClick={accept} busy={busy} className="w-full">
        Join {workspaceName}
      </Button>
    </div>
  );
}

/** No account yet: name and password, and the link itself vouches for the e-mail address. */
export function InvitationSignUpForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [password, setPassword] = useState("");
  const [errors, setErrors] = useState<{ name?: string; password?: string }>({});
  const [error, setError] = useState<string | null>(null);
  // the address has an account already: the server names the sign-in that comes back here
  const [signIn, setSignIn] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  useFocusFirstError(errors);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const next = {
      name: personNameSchema.safeParse(name).error?.issues[0]?.message,
      password: passwordSchema.safeParse(password).error?.issues[0]?.message,
    };
    setErrors(next);
    if (next.name || next.password) return;
    setBusy(true);
    setError(null);
    setSignIn(null);
    try {
      const r = await apiFetch<{ workspaceId: string }>(path(token, "sign-up"), { method: "POST", body: { name: name.trim(), password } });
      router.push(`/workspaces/${r.workspaceId}`);
      router.refresh();
    } catch (err) {
      setBusy(false);
      if (err instanceof ApiError && err.fields.length) setErrors({ name: err.field("name"), password: err.field("password") });
      else setError(err instanceof ApiError ? err.message : "Something went wrong. Try again.");
      const to = err instanceof ApiError ? err.detail.signIn : undefined;
      setSignIn(typeof to === "string" && to.startsWith("/sign-in?") ? to : null);
    }
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error ? (
        <Notice tone="error">
          <span className="[overflow-wrap:anywhere]">{error}</span>
          {signIn ? (
            <Link href={signIn} className="mt-2 block font-semibold underline underline-offset-2 [overflow-wrap:anywhere]">
              Sign in as {email} to join
            </Link>
          ) : null}
        </Notice>
      ) : null}
      <Field id="invite-email" label="E-mail address" value={email} readOnly disabled hint="The invitation was sent here, so it needs no separate confirmation." />
      <Field id="name" name="name" label="Your name" autoComplete="name" value={name} onChange={(e) => setName(e.target.value)} error={errors.name} />
      <Field id="password" name="password" type="password" label="Choose a password" autoComplete="new-password" value={password} onChange={(e) => setPassword(e.target.value)} error={errors.password} hint="At least 8 characters." />
      <Button type="submit" busy={busy} className="w-full">
        Create account and join
      </Button>
    </form>
  );
}

/**
 * Signed in as someone else: sign out, then sign in with the invited address (`next`: the invitation,
 * to come back to) — or, when that address has no account yet, back to the invitation page, which
 * then offers the form that creates it and joins.
 */
export function SwitchAccountButton({ next, email, hasAccount }: { next: string; email: string; hasAccount: boolean }) {
  const { busy, failed, signOut } = useSignOut();
  return (
    <div className="space-y-3">
      {failed ? <Notice tone="error">Signing out did not work. Try again.</Notice> : null}
      <Button tone="secondary" onClick={() => signOut(hasAccount ? `/sign-in?next=${encodeURIComponent(next)}&email=${encodeURIComponent(email)}` : next)} busy={busy} className="w-full">
        {/* a long address wraps inside the button rather than running out of it */}
        <span className="min-w-0 whitespace-normal text-center [overflow-wrap:anywhere]">
          {hasAccount ? `Sign out and sign in as ${email}` : `Sign out and create the account for ${email}`}
        </span>
      </Button>
    </div>
  );
}
