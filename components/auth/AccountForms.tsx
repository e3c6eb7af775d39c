"use client";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { authClient } from "@/lib/auth-client";
import { emailSchema, passwordSchema, personNameSchema } from "@/lib/schemas";
import { authErrorMessage } from "./messages";

type Status = { tone: "success" | "error"; text: string } | null;

export function ProfileForm({ name: initial }: { name: string }) {
  const router = useRouter();
  const [name, setName] = useState(initial);
  const [error, setError] = useState<{ name?: string }>({});
  const [status, setStatus] = useState<Status>(null);
  const [busy, setBusy] = useState(false);
  useFocusFirstError(error, () => "profile-name");
  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const parsed = personNameSchema.safeParse(name);
    setError({ name: parsed.error?.issues[0]?.message });
    if (!parsed.success) return;
    setBusy(true);
    const { error: err } = await authClient.updateUser({ name: parsed.data });
    setBusy(false);
    setStatus(err ? { tone: "error", text: authErrorMessage(err) } : { tone: "success", text: "Name saved." });
    if (!err) router.refresh();
  }
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {status ? <Notice tone={status.tone}>{status.text}</Notice> : null}
      <Field id="profile-name" label="Name" autoComplete="name" value={name} onChange={(e) => setName(e.target.value)} error={error.name} hint="Shown on versions you prepare, check or approve." />
      <Button type="submit" tone="secondary" busy={busy} disabled={name.trim() === initial}>
        Save name
      </Button>
    </form>
  );
}

/**
 * A new sign-in address: better-auth mails a link to it, and the change is made when it is opened
 * (the page comes back with `?email=changed`). Until then the current address stays.
 */
export function ChangeEmailForm({ email }: { email: string }) {
  const [next, setNext] = useState("");
  const [error, setError] = useState<{ email?: string }>({});
  const [status, setStatus] = useState<Status>(null);
  const [busy, setBusy] = useState(false);
  useFocusFirstError(error, () => "new-email");
  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const parsed = emailSchema.safeParse(next);
    const same = parsed.success && parsed.data.toLowerCase() === email.toLowerCase();
    setError({ email: !next.trim() ? "Enter the new e-mail address." : same ? "That is the address you sign in with now." : parsed.error?.issues[0]?.message });
    if (!parsed.success || same) return;
    setBusy(true);
    setStatus(null);
    const { error: err } = await authClient.changeEmail({ newEmail: parsed.data, callbackURL: "/account?email=changed" });
    setBusy(false);
    if (err) {
      if (err.code === "INVALID_EMAIL") setError({ email: authErrorMessage(err) });
      else setStatus({ tone: "error", text: authErrorMessage(err) });
      return;
    }
    setStatus({ tone: "success", text: `We sent a link to ${parsed.data}. Open it within an hour to sign in with that address from then on; until then you sign in with ${email}. An address that already has an account gets no link.` });
    setNext("");
  }
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {status ? <Notice tone={status.tone}><span className="[overflow-wrap:anywhere]">{status.text}</span></Notice> : null}
      <Field id="profile-email" label="Current e-mail address" value={email} readOnly disabled hint="You sign in with this address; it is confirmed." />
      <Field id="new-email" type="email" label="New e-mail address" autoComplete="email" value={next} onChange={(e) => setNext(e.target.value)} error={error.email} hint="We send a link to it; the change is made when you open it." />
      <Button type="submit" tone="secondary" busy={busy}>
        Send the link
      </Button>
    </form>
  );
}

export function ChangePasswordForm() {
  const [current, setCurrent] = useState("");
  const [next, setNext] = useState("");
  const [repeat, setRepeat] = useState("");
  const [signOutOthers, setSignOutOthers] = useState(true);
  const [errors, setErrors] = useState<{ current?: string; next?: string; repeat?: string }>({});
  const [status, setStatus] = useState<Status>(null);
  const [busy, setBusy] = useState(false);
  useFocusFirstError(errors, (k) => ({ current: "current-password", next: "new-password", repeat: "repeat-password" })[k] ?? k);

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const found = {
      current: current ? undefined : "Enter your current password.",
      next: passwordSchema.safeParse(next).error?.issues[0]?.message,
      repeat: next !== repeat ? "The two new passwords are not the same." : undefined,
    };
    setErrors(found);
    if (found.current || found.next || found.repeat) return;
    setBusy(true);
    setStatus(null);
    const { error } = await authClient.changePassword({ currentPassword: current, newPassword: next, revokeOtherSessions: signOutOthers });
    setBusy(false);
    if (error) {
      if (error.code === "INVALID_PASSWORD") setErrors({ current: authErrorMessage(error) });
      else setStatus({ tone: "error", text: authErrorMessage(error) });
      return;
    }
    setCurrent("");
    setNext("");
    setRepeat("");
    setStatus({ tone: "success", text: signOutOthers ? "Password changed. Other devices were signed out." : "Password changed." });
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {status ? <Notice tone={status.tone}>{status.text}</Notice> : null}
      <Field id="current-password" type="password" label="Current password" autoComplete="current-password" value={current} onChange={(e) => setCurrent(e.target.value)} error={errors.current} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field id="new-password" type="password" label="New password" autoComplete="new-password" value={next} onChange={(e) => setNext(e.target.value)} error={errors.next} hint="At least 8 characters." />
        <Field id="repeat-password" type="password" label="New password, again" autoComplete="new-password" value={repeat} onChange={(e) => setRepeat(e.target.value)} error={errors.repeat} />
      </div>
      <label className="flex items-center gap-2 text-sm text-ink-soft">
        <input type="checkbox" checked={signOutOthers} onChange={(e) => setSignOutOthers(e.target.checked)} className="h-4 w-4 accent-ink" />
        Sign out every other device
      </label>
      <Button type="submit" busy={busy}>
        Change password
      </Button>
    </form>
  );
}

export function NotificationsForm({ enabled: initial }: { enabled: boolean }) {
  const [enabled, setEnabled] = useState(initial);
  const [status, setStatus] = useState<Status>(null);
  const [busy, setBusy] = useState(false);
  async function toggle(value: boolean) {
    setEnabled(value);
    setBusy(true);
    const { error } = await authClient.updateUser({ emailNotifications: value });
    setBusy(false);
    if (error) {
      setEnabled(!value);
      setStatus({ tone: "error", text: authErrorMessage(error) });
    } else setStatus({ tone: "success", text: value ? "You will get these mails." : "You will not get these mails." });
  }
  return (
    <div className="space-y-3">
      <label className="flex items-start gap-3 text-sm">
        <input type="checkbox" checked={enabled} disabled={busy} onChange={(e) => toggle(e.target.checked)} className="mt-0.5 h-4 w-4 accent-ink" />
        <span>
          <span className="font-medium text-ink">E-mail me about my calcs</span>
          <span className="block text-ink-soft">When someone mentions me in a comment, a version waits for my check or my approval, or a version I prepared or checked is returned, approved or withdrawn.</span>
        </span>
      </label>
      {status ? <Notice tone={status.tone}>{status.text}</Notice> : null}
    </div>
  );
}
