"use client";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { authClient } from "@/lib/auth-client";
import { emailSchema, passwordSchema, personNameSchema } from "@/lib/schemas";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { authErrorMessage } from "./messages";
import { withNext } from "./nextPath";

type Errors = Partial<Record<"name" | "email" | "password", string>>;

/** `next`: the page to come back to once the address is confirmed and the user signs in. */
export function SignUpForm({ defaultEmail = "", next }: { defaultEmail?: string; next?: string }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [email, setEmail] = useState(defaultEmail);
  const [password, setPassword] = useState("");
  const [fieldErrors, setFieldErrors] = useState<Errors>({});
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  useFocusFirstError(fieldErrors);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const checks: Errors = {
      name: personNameSchema.safeParse(name).error?.issues[0]?.message,
      email: emailSchema.safeParse(email).error?.issues[0]?.message,
      password: passwordSchema.safeParse(password).error?.issues[0]?.message,
    };
    setFieldErrors(checks);
    if (Object.values(checks).some(Boolean)) return;
    setBusy(true);
    setError(null);
    const address = email.trim().toLowerCase();
    const { error: err } = await authClient.signUp.email({ name: name.trim(), email: address, password, callbackURL: withNext("/verify?confirmed=1", next) });
    if (err) {
      setBusy(false);
      setError(authErrorMessage(err, { email: address }));
      return;
    }
    router.push(withNext(`/verify?sent=${encodeURIComponent(address)}`, next));
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <Field id="name" name="name" label="Your name" autoComplete="name" value={name} onChange={(e) => setName(e.target.value)} error={fieldErrors.name} hint="Shown to colleagues on versions you prepare, check or approve." />
      <Field id="email" name="email" type="email" label="Work e-mail address" autoComplete="email" value={email} onChange={(e) => setEmail(e.target.value)} error={fieldErrors.email} />
      <Field id="password" name="password" type="password" label="Password" autoComplete="new-password" value={password} onChange={(e) => setPassword(e.target.value)} error={fieldErrors.password} hint="At least 8 characters." />
      <Button type="submit" busy={busy} className="w-full">
        Create account
      </Button>
    </form>
  );
}
