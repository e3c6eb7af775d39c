import type { Metadata } from "next";
import { MembersScreen } from "@/components/workspaces/MembersScreen";
import { getWorkspaceForMember } from "@/db/queries/workspaces";
import { requirePageRole } from "@/lib/session";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { session, role } = await requirePageRole(id, `/workspaces/${id}/members`);
  const ws = await getWorkspaceForMember(id, session.user.id);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Members</h1>
        <p className="mt-1 text-ink-soft">Who is in {ws?.name ?? "this workspace"}, and what each person may do.</p>
      </div>
      <MembersScreen workspaceId={id} workspaceName={ws?.name ?? ""} viewerId={session.user.id} viewerRole={role} />
    </div>
  );
}
