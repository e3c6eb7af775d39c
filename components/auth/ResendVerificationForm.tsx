"use client";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { authClient } from "@/lib/auth-client";
import { emailSchema } from "@/lib/schemas";
import { authErrorMessage } from "./messages";
import { withNext } from "./nextPath";

/** Ask for a new confirmation link (the old one expired or was used). */
export function ResendVerificationForm({ defaultEmail = "", label = "Send a new link", next }: { defaultEmail?: string; label?: string; next?: string }) {
  const [email, setEmail] = useState(defaultEmail);
  const [state, setState] = useState<{ kind: "idle" | "sent" | "error"; text?: string }>({ kind: "idle" });
  const [fieldError, setFieldError] = useState<{ "resend-email"?: string }>({});
  const [busy, setBusy] = useState(false);
  useFocusFirstError(fieldError);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const parsed = emailSchema.safeParse(email);
    // a malformed address is said at the field, as every other form does
    setFieldError({ "resend-email": parsed.error?.issues[0]?.message });
    if (!parsed.success) {
      setState({ kind: "idle" });
      return;
    }
    setBusy(true);
    const { error } = await authClient.sendVerificationEmail({ email: parsed.data, callbackURL: withNext("/verify?confirmed=1", next) });
    setBusy(false);
    setState(error ? { kind: "error", text: authErrorMessage(error) } : { kind: "sent", text: parsed.data });
  }

  return (
    <form onSubmit={onSubmit} className="space-y-3" noValidate>
      {state.kind === "sent" ? <Notice tone="success">A new link is on its way to {state.text} (if it has an account waiting for confirmation).</Notice> : null}
      {state.kind === "error" ? <Notice tone="error">{state.text}</Notice> : null}
      <Field id="resend-email" type="email" label="E-mail address" autoComplete="email" value={email} onChange={(e) => setEmail(e.target.value)} error={fieldError["resend-email"]} />
      <Button type="submit" tone="secondary" busy={busy} className="w-full">
        {label}
      </Button>
    </form>
  );
}
