import type { Metadata } from "next";
import { Notice } from "@/components/shell/controls";
import { AuditLog } from "@/components/workspaces/AuditLog";
import { requirePageRole } from "@/lib/session";

export const metadata: Metadata = { title: "Audit log" };

export default async function AuditPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { allowed } = await requirePageRole(id, `/workspaces/${id}/audit`, "audit.read");
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Audit log</h1>
        <p className="mt-1 text-ink-soft">Who did what in this workspace: sign-ins of its members, invitations, role changes and removals. Times are UTC.</p>
      </div>
      {allowed ? (
        <AuditLog workspaceId={id} />
      ) : (
        <Notice tone="info" title="Only owners can see the audit log">
          Ask an owner of this workspace if you need to know who changed what.
        </Notice>
      )}
    </div>
  );
}
