"use client";
import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { Dialog } from "@/components/versions/Dialog";
import { ExportLink } from "@/components/workspaces/ExportWorkspace";
import { apiFetch, ApiError } from "@/lib/api-client";

type Held = { id: string; name: string; members: number };
export type AccountDeletionView = { blocking: Held[]; deleted: Held[]; left: Held[] };

const names = (list: Held[]) => list.map((w) => `“${w.name}”`).join(", ");

/**
 * The account page's last panel: while the person is the only owner of a workspace others are in,
 * it says which and how to get past it (hand over ownership, or delete the workspace); otherwise a
 * dialog says what goes and what stays, and deletes with the password typed again.
 */
export function DeleteAccount({ name, plan, go = (to: string) => window.location.assign(to) }: { name: string; plan: AccountDeletionView; go?: (to: string) => void }) {
  const [open, setOpen] = useState(false);
  const [password, setPassword] = useState("");
  const [error, setError] = useState<string | undefined>();
  const [refusal, setRefusal] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  if (plan.blocking.length) {
    return (
      <div className="space-y-3 text-sm" data-testid="delete-account-blocked">
        <p className="text-ink-soft">
          You are the only owner of {plan.blocking.length === 1 ? "a workspace" : "workspaces"} other people are in. Before you can delete your account, make one of them an owner, or delete the workspace:
        </p>
        <ul className="space-y-1.5">
          {plan.blocking.map((w) => (
            <li key={w.id} className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <span className="font-medium text-ink [overflow-wrap:anywhere]">{w.name}</span>
              <span className="text-ink-faint">
                <span className="num">{w.members}</span> members
              </span>
              <Link href={`/workspaces/${w.id}/members`} aria-label={`Hand over ownership of ${w.name}`} className="font-medium text-ink-soft underline decoration-rule underline-offset-2 hover:text-ink">
                Hand over ownership
              </Link>
              <Link href={`/workspaces/${w.id}`} aria-label={`Delete the workspace ${w.name}`} className="font-medium text-ink-soft underline decoration-rule underline-offset-2 hover:text-ink">
                Delete the workspace
              </Link>
            </li>
          ))}
        </ul>
      </div>
    );
  }

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    if (!password) {
      setError("Type your password to confirm.");
      return;
    }
    setBusy(true);
    setError(undefined);
    setRefusal(null);
    try {
      await apiFetch("/api/account", { method: "DELETE", body: { password } });
      go("/sign-in?account=deleted");
    } catch (err) {
      setBusy(false);
      const field = err instanceof ApiError ? err.field("password") : undefined;
      if (field) setError(field);
      else setRefusal(err instanceof ApiError ? err.message : "Nothing was deleted: the server could not be reached.");
    }
  }

  return (
    <div className="space-y-2 text-sm">
      <p className="text-ink-soft">You can no longer sign in, and you leave every workspace. This cannot be undone.</p>
      <Button tone="danger" onClick={() => setOpen(true)}>
        Delete my account…
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} title="Delete your account?" testId="delete-account-dialog" wide>
        <form onSubmit={onSubmit} className="space-y-4 text-sm" noValidate>
          <ul className="list-disc space-y-1 pl-5 text-ink-soft" data-testid="delete-account-effects">
            <li>It happens at once and cannot be undone. You can no longer sign in; every device is signed out.</li>
            {plan.deleted.length ? <li>Deleted with it, as only you are in {plan.deleted.length === 1 ? "it" : "them"}, with every sketch, version and file: {names(plan.deleted)}.</li> : null}
            {plan.left.length ? <li>You leave {names(plan.left)}; the other members keep everything in {plan.left.length === 1 ? "it" : "them"}.</li> : null}
            <li>
              What you did stays on the record of shared workspaces (versions, comments, sign-offs), under the name “former member: {name}”.
            </li>
          </ul>
          {plan.deleted.length ? (
            <section aria-labelledby="delete-account-copy" className="space-y-2 rounded-md border border-rule-soft px-3.5 py-3" data-testid="delete-account-copy">
              <h4 id="delete-account-copy" className="font-semibold text-ink">
                Keep a copy first
              </h4>
              <p className="text-ink-soft">Each workspace’s sketches, the latest version of each, come in one JSON file that opens again with File › Import JSON. Download the calc sheets (PDF) you must keep from their version pages.</p>
              <ul className="space-y-2">
                {plan.deleted.map((w) => (
                  <li key={w.id}>
                    <ExportLink workspaceId={w.id} label={`Download the sketches of “${w.name}” (JSON)`} />
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
          {refusal ? <Notice tone="error">{refusal}</Notice> : null}
          <Field
            id="delete-account-password"
            type="password"
            label="Your password"
            autoComplete="current-password"
            value={password}
            onChange={(e) => {
              setPassword(e.target.value);
              setError(undefined);
            }}
            error={error}
          />
          <div className="flex justify-end gap-2">
            <Button type="button" tone="quiet" onClick={() => setOpen(false)}>
              Keep my account
            </Button>
            <Button type="submit" tone="danger" busy={busy}>
              Delete my account
            </Button>
          </div>
        </form>
      </Dialog>
    </div>
  );
}
