"use client";
import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { authClient } from "@/lib/auth-client";
import { passwordSchema } from "@/lib/schemas";
import { authErrorMessage } from "./messages";
import { SignedInNote } from "./SignedInNote";

/**
 * `signedInAs`: the page was opened while signed in. A reset of that account signs it out (as every
 * device); a reset of another account leaves this session, so the page says whose it still is and
 * offers to sign out before signing in with the new password.
 */
export function ResetPasswordForm({ token, signedInAs }: { token: string; signedInAs?: string }) {
  const [password, setPassword] = useState("");
  const [repeat, setRepeat] = useState("");
  const [errors, setErrors] = useState<{ password?: string; repeat?: string }>({});
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const [stillSignedIn, setStillSignedIn] = useState(false);
  const [busy, setBusy] = useState(false);
  useFocusFirstError(errors);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const next = {
      password: passwordSchema.safeParse(password).error?.issues[0]?.message,
      repeat: password !== repeat ? "The two passwords are not the same." : undefined,
    };
    setErrors(next);
    if (next.password || next.repeat) return;
    setBusy(true);
    setError(null);
    const { error: err } = await authClient.resetPassword({ newPassword: password, token });
    if (!err && signedInAs) {
      const { data } = await authClient.getSession().catch(() => ({ data: null }));
      setStillSignedIn(Boolean(data));
    }
    setBusy(false);
    if (err) setError(authErrorMessage(err));
    else setDone(true);
  }

  if (done && stillSignedIn && signedInAs) {
    return (
      <div className="space-y-4">
        <Notice tone="success" title="Password changed">
          The new password is set for the account the link was mailed to, and every device signed in to that account has been signed out.
        </Notice>
        <SignedInNote email={signedInAs} signOut={{ label: "Sign out, then sign in with the new password", to: "/sign-in" }}>
          That is another account, so you are still signed in here.
        </SignedInNote>
      </div>
    );
  }
  if (done) {
    return (
      <div className="space-y-4">
        <Notice tone="success" title="Password changed">
          Your new password is set, and every device that was signed in has been signed out.
        </Notice>
        <Link href="/sign-in" className="inline-flex w-full justify-center rounded-md bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink-soft">
          Sign in with the new password
        </Link>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {signedInAs ? <SignedInNote email={signedInAs}>The new password is for the account this link was mailed to: setting it signs that account out on every device.</SignedInNote> : null}
      {error ? (
        <Notice tone="error">
          {error}{" "}
          <Link href="/forgot-password" className="font-semibold underline">
            Request a new link
          </Link>
        </Notice>
      ) : null}
      <Field id="password" name="password" type="password" label="New password" autoComplete="new-password" value={password} onChange={(e) => setPassword(e.target.value)} error={errors.password} hint="At least 8 characters." />
      <Field id="repeat" name="repeat" type="password" label="New password, again" autoComplete="new-password" value={repeat} onChange={(e) => setRepeat(e.target.value)} error={errors.repeat} />
      <Button type="submit" busy={busy} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
