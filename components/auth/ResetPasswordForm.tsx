"use client";
import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { authClient } from "@/lib/auth-client";
import { passwordSchema } from "@/lib/schemas";
import { authErrorMessage } from "./messages";

export function ResetPasswordForm({ token }: { token: string }) {
  const [password, setPassword] = useState("");
  const [repeat, setRepeat] = useState("");
  const [errors, setErrors] = useState<{ password?: string; repeat?: string }>({});
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
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
    setBusy(false);
    if (err) setError(authErrorMessage(err));
    else setDone(true);
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
