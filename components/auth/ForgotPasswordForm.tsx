"use client";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { authClient } from "@/lib/auth-client";
import { emailSchema } from "@/lib/schemas";
import { authErrorMessage } from "./messages";

export function ForgotPasswordForm({ defaultEmail = "" }: { defaultEmail?: string }) {
  const [email, setEmail] = useState(defaultEmail);
  const [fieldError, setFieldError] = useState<{ email?: string }>({});
  const [error, setError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  useFocusFirstError(fieldError);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const parsed = emailSchema.safeParse(email);
    setFieldError({ email: parsed.error?.issues[0]?.message });
    if (!parsed.success) return;
    setBusy(true);
    setError(null);
    const { error: err } = await authClient.requestPasswordReset({ email: parsed.data, redirectTo: "/reset-password" });
    setBusy(false);
    if (err) setError(authErrorMessage(err));
    else setSentTo(parsed.data);
  }

  if (sentTo) {
    return (
      <Notice tone="success" title="Check your inbox">
        If an account uses <strong>{sentTo}</strong>, a link to choose a new password is on its way. It works once, for one hour.
      </Notice>
    );
  }
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <Field id="email" name="email" type="email" label="E-mail address" autoComplete="email" value={email} onChange={(e) => setEmail(e.target.value)} error={fieldError.email} />
      <Button type="submit" busy={busy} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
