"use client";
import { useQuery } from "@tanstack/react-query";
import { Notice, Panel } from "@/components/shell/controls";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { can, ROLE_INFO, ROLES, type Role } from "@/lib/roles";
import { InvitationsTable } from "./InvitationsTable";
import { InviteForm } from "./InviteForm";
import { MembersTable, type Member } from "./MembersTable";
import { RoleBadge } from "./RoleBadge";

/** The members page: everyone sees who is in the workspace; owners also invite and manage. */
export function MembersScreen({ workspaceId, workspaceName, viewerId, viewerRole }: { workspaceId: string; workspaceName: string; viewerId: string; viewerRole: Role }) {
  const path = `/api/workspaces/${workspaceId}/members`;
  const members = useQuery({ queryKey: apiKey(path), queryFn: () => apiFetch<{ role: Role; members: Member[] }>(path) });
  const role = members.data?.role ?? viewerRole;
  const owner = can(role, "invitations.create");

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_17rem]">
      <div className="min-w-0 space-y-6">
        {owner ? (
          <Panel title="Invite a colleague" description={`They get a mail with a link to join ${workspaceName}. The link works once.`}>
            <InviteForm workspaceId={workspaceId} />
          </Panel>
        ) : null}
        <Panel title="Members" description={owner ? "Change a role and it applies to their next request." : "Only owners change roles and invite people."}>
          {members.isError && !members.data ? (
            <Notice tone="error" title="The members could not be loaded">
              {members.error instanceof ApiError ? members.error.message : "Try again in a moment."}
            </Notice>
          ) : (
            <div className="space-y-3">
              {/* a failed refresh keeps the list as last loaded on screen */}
              {members.isError ? (
                <Notice tone="error" title="The members could not be refreshed">
                  {members.error instanceof ApiError ? members.error.message : "Try again in a moment."} The list shows them as last loaded.
                </Notice>
              ) : null}
              <MembersTable workspaceId={workspaceId} members={members.data?.members} viewerRole={role} viewerId={viewerId} loading={members.isPending} />
            </div>
          )}
        </Panel>
        {owner ? (
          <Panel title="Open invitations" description="Not yet accepted. Sending again replaces the old link.">
            <InvitationsTable workspaceId={workspaceId} />
          </Panel>
        ) : null}
      </div>
      <aside className="space-y-3 text-sm" aria-label="What each role may do">
        <h2 className="text-xs font-semibold uppercase tracking-wider text-ink-faint">What each role may do</h2>
        <ul className="space-y-3">
          {ROLES.map((r) => (
            <li key={r} className="rounded-md border border-rule-soft bg-paper-card px-3 py-2.5">
              <RoleBadge role={r} />
              <p className="mt-1.5 leading-snug text-ink-soft">{ROLE_INFO[r].summary}</p>
            </li>
          ))}
        </ul>
      </aside>
    </div>
  );
}
