import type { Metadata } from "next";
import Link from "next/link";
import { AppShell } from "@/components/shell/AppShell";
import { EmptyState, Notice, Panel } from "@/components/shell/controls";
import { RoleBadge } from "@/components/workspaces/RoleBadge";
import { CreateWorkspaceForm } from "@/components/workspaces/WorkspaceForms";
import { listWorkspacesForUser } from "@/db/queries/workspaces";
import { getWorkspaceDeletion } from "@/db/queries/workspace-deletion";
import { workspaceDeletionSentence } from "@/components/workspaces/format";
import { isUuid } from "@/lib/schemas";
import { orBusy } from "@/lib/db-unavailable";
import { leftWorkspaceName } from "@/lib/members";
import { requirePageSession } from "@/lib/session";

export const metadata: Metadata = { title: "Workspaces" };

export default async function WorkspacesPage({ searchParams }: { searchParams: Promise<{ left?: string | string[]; deleted?: string | string[] }> }) {
  const session = await requirePageSession("/workspaces");
  const workspaces = await listWorkspacesForUser(session.user.id);
  // after "Leave" on the members page: say it happened (not once they are back in it)
  const { left, deleted } = await searchParams;
  // after deleting one: say it happened (only to someone who was a member of it)
  const gone = typeof deleted === "string" && isUuid(deleted) ? await orBusy(getWorkspaceDeletion(deleted, session.user.id)) : null;
  const leftId = typeof left === "string" && !workspaces.some((w) => w.id === left) ? left : undefined;
  const leftName = leftId ? await orBusy(leftWorkspaceName(session.user.id, leftId)) : null;
  return (
    <AppShell next="/workspaces">
      <div className="space-y-8">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Workspaces</h1>
          <p className="mt-1 text-ink-soft">Each workspace holds sketches and the people who prepare, check and approve them.</p>
        </div>
        {gone ? (
          <Notice tone="success">
            <span className="[overflow-wrap:anywhere]" data-testid="workspace-deleted-notice">
              {workspaceDeletionSentence(gone)}
            </span>
          </Notice>
        ) : null}
        {leftName ? (
          <Notice tone="success">
            <span className="[overflow-wrap:anywhere]">
              You left <strong>{leftName}</strong>. To join it again, ask one of its owners to invite you.
            </span>
          </Notice>
        ) : null}
        {workspaces.length ? (
          <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {workspaces.map((w) => (
              <li key={w.id}>
                <Link href={`/workspaces/${w.id}`} className="block h-full rounded-lg border border-rule bg-paper-card px-4 py-3.5 shadow-[0_1px_0_rgb(var(--rule-soft))] hover:border-ink/40">
                  <span className="flex items-start justify-between gap-3">
                    <span className="font-semibold text-ink">{w.name}</span>
                    <RoleBadge role={w.role} />
                  </span>
                  <span className="mt-2 block text-sm text-ink-soft">
                    {w.personal ? "Personal · " : ""}
                    <span className="num">{w.memberCount}</span> {w.memberCount === 1 ? "member" : "members"}
                  </span>
                </Link>
              </li>
            ))}
          </ul>
        ) : (
          <EmptyState title="You are not in any workspace">Create one below, or ask a colleague to invite you to theirs.</EmptyState>
        )}
        <div id="new">
          <Panel title="New workspace" description="For a project or a team. You become its owner and can invite colleagues.">
            <CreateWorkspaceForm />
          </Panel>
        </div>
      </div>
    </AppShell>
  );
}
