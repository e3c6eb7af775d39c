import type { Metadata } from "next";
import Link from "next/link";
import { Panel } from "@/components/shell/controls";
import { SketchesTable } from "@/components/sketches/SketchesTable";
import { RoleBadge } from "@/components/workspaces/RoleBadge";
import { DeleteWorkspace } from "@/components/workspaces/DeleteWorkspace";
import { ExportWorkspace } from "@/components/workspaces/ExportWorkspace";
import { RenameWorkspaceForm } from "@/components/workspaces/WorkspaceForms";
import { workspaceContents } from "@/db/queries/workspace-deletion";
import { getWorkspaceForMember, listMembers } from "@/db/queries/workspaces";
import { can, ROLE_INFO } from "@/lib/roles";
import { requirePageRole } from "@/lib/session";
import { reviewQueueFor } from "@/lib/review/queue";
import { ReviewQueue } from "@/components/review/ReviewQueue";

export const metadata: Metadata = { title: "Workspace" };

export default async function WorkspacePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { session, role } = await requirePageRole(id, `/workspaces/${id}`);
  const [ws, members, queue] = await Promise.all([getWorkspaceForMember(id, session.user.id), listMembers(id, session.user.id), reviewQueueFor(id, session.user.id, role)]);
  if (!ws) return null;
  const contents = can(role, "workspace.delete") ? await workspaceContents(id) : null;
  const shown = members.slice(0, 6);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-xs font-semibold uppercase tracking-[0.16em] text-ink-faint">{ws.personal ? "Personal workspace" : "Workspace"}</p>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight">{ws.name}</h1>
          <p className="mt-1.5 flex flex-wrap items-center gap-x-2 gap-y-1 text-sm text-ink-soft">
            <span className="inline-flex items-center gap-2 whitespace-nowrap">
              You are <RoleBadge role={role} />
            </span>
            <span>{ROLE_INFO[role].summary}</span>
          </p>
        </div>
        {can(role, "sketch.create") ? (
          <Link href={`/sketches/new?workspace=${id}`} className="rounded-md bg-accent px-4 py-2 text-sm font-medium text-on-accent hover:bg-accent-deep">
            Start a sketch
          </Link>
        ) : null}
      </div>

      <ReviewQueue workspaceId={id} items={queue} />
      <Panel title="Sketches" description="Free-body diagrams with their control volumes, saved in versions.">
        <SketchesTable workspaceId={id} canCreate={can(role, "sketch.create")} />
      </Panel>
      <div className="grid gap-6 md:grid-cols-2">
        <Panel
          title="People"
          aside={
            <Link href={`/workspaces/${id}/members`} className="text-sm font-medium text-ink-soft underline decoration-rule underline-offset-2 hover:text-ink">
              {can(role, "invitations.create") ? "Manage" : "All members"}
            </Link>
          }
        >
          <ul className="space-y-2 text-sm">
            {shown.map((m) => (
              <li key={m.userId} className="flex items-center justify-between gap-2">
                <span className="truncate text-ink">{m.name}</span>
                <RoleBadge role={m.role} />
              </li>
            ))}
          </ul>
          {members.length > shown.length ? <p className="mt-2 text-xs text-ink-faint">and {members.length - shown.length} more</p> : null}
        </Panel>
        {can(role, "workspace.rename") ? (
          <Panel title="Settings">
            <RenameWorkspaceForm workspaceId={id} name={ws.name} />
            {contents && can(role, "workspace.export") ? <ExportWorkspace workspaceId={id} sketches={contents.sketches} /> : null}
            {contents ? <DeleteWorkspace workspaceId={id} name={ws.name} contents={contents} /> : null}
          </Panel>
        ) : null}
      </div>
    </div>
  );
}
