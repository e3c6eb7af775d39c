"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Button, EmptyState, Notice, Skeleton } from "@/components/shell/controls";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import type { Role } from "@/lib/roles";
import { formatDate, relativeExpiry } from "./format";
import { RoleBadge } from "./RoleBadge";

type Invitation = { id: string; email: string; role: Role; invitedBy: string | null; createdAt: string; expiresAt: string; status: "pending" | "expired" };

/** Open invitations (owners): who, which role, by whom, until when; withdraw or send again. */
/** How long the invitation's link still works, or that it no longer does. */
function Expiry({ inv }: { inv: Invitation }) {
  return inv.status === "expired" ? (
    <span className="font-medium text-accent-deep">✕ Expired {relativeExpiry(inv.expiresAt).replace("expired ", "")}</span>
  ) : (
    <span className="text-ink-soft">Expires {relativeExpiry(inv.expiresAt)}</span>
  );
}

export function InvitationsTable({ workspaceId }: { workspaceId: string }) {
  const qc = useQueryClient();
  const path = `/api/workspaces/${workspaceId}/invitations`;
  const query = useQuery({ queryKey: apiKey(path), queryFn: () => apiFetch<{ invitations: Invitation[] }>(path) });
  const refresh = () => qc.invalidateQueries({ queryKey: apiKey(path) });
  const withdraw = useMutation({ mutationFn: (id: string) => apiFetch(`${path}/${id}`, { method: "DELETE" }), onSettled: refresh });
  const resend = useMutation({ mutationFn: (inv: Invitation) => apiFetch(path, { method: "POST", body: { email: inv.email, role: inv.role } }), onSettled: refresh });

  if (query.isPending) {
    return (
      <div className="space-y-2" role="status" aria-label="Loading the invitations">
        <Skeleton className="h-4 w-2/3" />
        <Skeleton className="h-4 w-1/2" />
      </div>
    );
  }
  if (query.isError && !query.data) {
    return (
      <Notice tone="error" title="The invitations could not be loaded">
        {query.error instanceof ApiError ? query.error.message : "Try again in a moment."}
      </Notice>
    );
  }
  // a failed refresh keeps the list as last loaded on screen
  const stale = query.isError ? (
    <Notice tone="error" title="The invitations could not be refreshed">
      {query.error instanceof ApiError ? query.error.message : "Try again in a moment."} The list shows them as last loaded.
    </Notice>
  ) : null;
  const rows = query.data.invitations;
  if (!rows.length) {
    return (
      <div className="space-y-3">
        {stale}
        <EmptyState title="No open invitations">Invitations you send appear here until they are accepted, withdrawn or replaced.</EmptyState>
      </div>
    );
  }
  const failure = withdraw.error ?? resend.error;
  return (
    <div className="space-y-3">
      {stale}
      {failure ? <Notice tone="error">{failure instanceof ApiError ? failure.message : "That did not work. Try again."}</Notice> : null}
      {resend.isSuccess ? <Notice tone="success">A new link was sent; the old one no longer works.</Notice> : null}
      <div className="relative overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Open invitations</caption>
          <thead>
            <tr className="border-b border-rule text-left text-xs uppercase tracking-wider text-ink-faint">
              <th scope="col" className="py-2 pr-3 font-semibold">E-mail</th>
              <th scope="col" className="py-2 pr-3 font-semibold max-sm:hidden">Role</th>
              <th scope="col" className="py-2 pr-3 font-semibold max-sm:hidden">Invited</th>
              <th scope="col" className="py-2 pr-3 font-semibold max-sm:hidden">Link</th>
              <th scope="col" className="py-2 text-right font-semibold"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {rows.map((inv) => (
              <tr key={inv.id} className="border-b border-rule-soft last:border-0" data-testid={`invitation-${inv.email}`}>
                <td className="py-2.5 pr-3 font-medium text-ink [overflow-wrap:anywhere]">
                  {inv.email}
                  {/* a phone has no room for the columns: the role and the link's life go under the address */}
                  <span className="mt-1 flex flex-wrap items-center gap-x-2 gap-y-1 text-xs font-normal sm:hidden" data-testid="invitation-summary">
                    <RoleBadge role={inv.role} />
                    <Expiry inv={inv} />
                  </span>
                </td>
                <td className="py-2.5 pr-3 max-sm:hidden"><RoleBadge role={inv.role} /></td>
                <td className="num py-2.5 pr-3 text-ink-soft max-sm:hidden">
                  {formatDate(inv.createdAt)}
                  {inv.invitedBy ? <span className="block text-xs text-ink-faint">by {inv.invitedBy}</span> : null}
                </td>
                <td className="whitespace-nowrap py-2.5 pr-3 max-sm:hidden">
                  <Expiry inv={inv} />
                </td>
                <td className="py-2 text-right">
                  <span className="inline-flex gap-1.5 max-sm:flex-col max-sm:items-end">
                    <Button size="sm" tone="secondary" busy={resend.isPending && resend.variables?.id === inv.id} onClick={() => resend.mutate(inv)}>
                      Send again
                    </Button>
                    <Button size="sm" tone="danger" busy={withdraw.isPending && withdraw.variables === inv.id} onClick={() => withdraw.mutate(inv.id)} aria-label={`Withdraw the invitation of ${inv.email}`}>
                      Withdraw
                    </Button>
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
