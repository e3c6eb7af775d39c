import type { Metadata } from "next";
import { Notice } from "@/components/shell/controls";
import { AuditLog } from "@/components/workspaces/AuditLog";
import { requirePageRole } from "@/lib/session";

export const metadata: Metadata = { title: "Audit log" };

export default async function AuditPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ signIns?: string | string[] }>;
}) {
  const { id } = await params;
  const { signIns } = await searchParams;
  const { allowed } = await requirePageRole(id, `/workspaces/${id}/audit`, "audit.read");
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Audit log</h1>
        <p className="mt-1 text-ink-soft">Who did what in this workspace: its members’ sign-ins, invitations, role changes and removals, and the work on its sketches (saves, forks, comments, sign-off steps). Times are UTC.</p>
      </div>
      {allowed ? (
        <AuditLog workspaceId={id} showSignIns={signIns !== "hide"} />
      ) : (
        <Notice tone="info" title="Only owners can see the audit log">
          Ask an owner of this workspace if you need to know who changed what.
        </Notice>
      )}
    </div>
  );
}
