"use client";
import { useRouter } from "next/navigation";
import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { authClient } from "@/lib/auth-client";
import { emailSchema } from "@/lib/schemas";
import { authErrorMessage } from "./messages";

type Errors = Partial<Record<"email" | "password", string>>;

export function SignInForm({ next, defaultEmail = "" }: { next: string; defaultEmail?: string }) {
  const router = useRouter();
  const [email, setEmail] = useState(defaultEmail);
  const [password, setPassword] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<Errors>({});
  useFocusFirstError(fieldErrors);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    // a blank or malformed field is named at the field, and spends none of the sign-in budget
    const checks: Errors = {
      email: email.trim() ? emailSchema.safeParse(email).error?.issues[0]?.message : "Enter your e-mail address.",
      password: password ? undefined : "Enter your password.",
    };
    setFieldErrors(checks);
    if (checks.email || checks.password) {
      setError(null);
      return;
    }
    setBusy(true);
    setError(null);
    let retryAfter: number | null = null;
    const { error: err } = await authClient.signIn.email(
      { email: email.trim(), password },
      { onError: (ctx) => void (retryAfter = Number(ctx.response.headers.get("x-retry-after")) || null) },
    );
    if (err) {
      setBusy(false);
      setError(authErrorMessage(err, { email: email.trim(), retryAfter }));
      return;
    }
    // A full load, so every server component renders with the new session cookie.
    router.push(next);
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <Field id="email" name="email" type="email" label="E-mail address" autoComplete="email" required value={email} onChange={(e) => setEmail(e.target.value)} error={fieldErrors.email} />
      <div className="space-y-1">
        <Field id="password" name="password" type="password" label="Password" autoComplete="current-password" required value={password} onChange={(e) => setPassword(e.target.value)} error={fieldErrors.password} />
        <p className="text-right text-xs">
          <Link href={`/forgot-password${email ? `?email=${encodeURIComponent(email.trim())}` : ""}`} className="font-medium text-ink-soft underline decoration-rule underline-offset-2 hover:text-ink">
            Forgot your password?
          </Link>
        </p>
      </div>
      <Button type="submit" busy={busy} className="w-full">
        Sign in
      </Button>
    </form>
  );
}
