"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState, type FormEvent } from "react";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { Button, Field, Notice, Select } from "@/components/shell/controls";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { ROLE_INFO, ROLES, type Role } from "@/lib/roles";
import { inviteInput } from "@/lib/schemas";

type Created = { invitation: { email: string; role: Role; url: string; mailSent: boolean } };

/** Owners invite a colleague by e-mail with a role; the link is shown too, in case the mail is slow. */
export function InviteForm({ workspaceId }: { workspaceId: string }) {
  const qc = useQueryClient();
  const [email, setEmail] = useState("");
  const [role, setRole] = useState<Role>("editor");
  const [fieldErrors, setFieldErrors] = useState<{ email?: string; role?: string }>({});
  useFocusFirstError(fieldErrors, (k) => `invite-${k}`);
  const [copied, setCopied] = useState(false);

  const invite = useMutation({
    mutationFn: (body: { email: string; role: Role }) => apiFetch<Created>(`/api/workspaces/${workspaceId}/invitations`, { method: "POST", body }),
    onSuccess: () => {
      setEmail("");
      setCopied(false);
      qc.invalidateQueries({ queryKey: apiKey(`/api/workspaces/${workspaceId}/invitations`) });
    },
    onError: (err) => {
      if (err instanceof ApiError && err.fields.length) setFieldErrors({ email: err.field("email"), role: err.field("role") });
    },
  });

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const parsed = inviteInput.safeParse({ email, role });
    if (!parsed.success) {
      const f = parsed.error.issues;
      setFieldErrors({ email: f.find((i) => i.path[0] === "email")?.message, role: f.find((i) => i.path[0] === "role")?.message });
      return;
    }
    setFieldErrors({});
    invite.mutate(parsed.data);
  }

  const done = invite.data?.invitation;
  return (
    <div className="space-y-4">
      <form onSubmit={onSubmit} className="grid gap-3 sm:grid-cols-[1fr_11rem_auto] sm:items-start" noValidate>
        <Field id="invite-email" type="email" label="E-mail address" placeholder="colleague@company.com" autoComplete="off" value={email} onChange={(e) => setEmail(e.target.value)} error={fieldErrors.email} />
        <Select id="invite-role" label="Role" value={role} onChange={(e) => setRole(e.target.value as Role)}>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_INFO[r].label}
            </option>
          ))}
        </Select>
        <div className="sm:pt-6">
          <Button type="submit" busy={invite.isPending} className="w-full sm:w-auto">
            Send invitation
          </Button>
        </div>
      </form>
      <p className="text-xs text-ink-faint">{ROLE_INFO[role].label}: {ROLE_INFO[role].summary}</p>
      {invite.isError && !(invite.error instanceof ApiError && invite.error.fields.length) ? (
        <Notice tone="error">{invite.error instanceof ApiError ? invite.error.message : "The invitation was not sent."}</Notice>
      ) : null}
      {done ? (
        <Notice tone={done.mailSent ? "success" : "error"} title={done.mailSent ? `Invitation sent to ${done.email}` : `The mail to ${done.email} could not be sent`}>
          <p>
            {done.mailSent ? "They can also use this link, once:" : "The invitation exists; pass this link on yourself. It works once:"}
          </p>
          <div className="mt-2 flex gap-2">
            <input readOnly value={done.url} aria-label="Invitation link" onFocus={(e) => e.currentTarget.select()} className="min-w-0 flex-1 rounded border border-rule bg-paper-card px-2 py-1 font-mono text-xs text-ink" />
            <Button
              type="button"
              size="sm"
              tone="secondary"
              onClick={async () => {
                await navigator.clipboard?.writeText(done.url).catch(() => undefined);
                setCopied(true);
              }}
            >
              {copied ? "Copied" : "Copy"}
            </Button>
          </div>
        </Notice>
      ) : null}
    </div>
  );
}
