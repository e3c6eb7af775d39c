import "server-only";
import { db } from "@/db";
import { auditEvent } from "@/db/schema";
import type { DbOrTx } from "@/db/queries/tx";
import type { AuditAction } from "./audit-actions";

export type AuditInput = {
  action: AuditAction;
  actorId: string | null;
  actorEmail?: string | null;
  workspaceId?: string | null;
  targetType?: "user" | "invitation" | "workspace" | (string & {});
  targetId?: string | null;
  detail?: Record<string, unknown>;
};

/**
 * Append one row to the audit log. Pass the transaction that made the change so the row
 * commits (or rolls back) with it.
 */
export async function recordAudit(input: AuditInput, tx: DbOrTx = db): Promise<void> {
  await tx.insert(auditEvent).values({
    action: input.action,
    actorId: input.actorId,
    actorEmail: input.actorEmail ?? null,
    workspaceId: input.workspaceId ?? null,
    targetType: input.targetType ?? null,
    targetId: input.targetId ?? null,
    detail: input.detail ?? {},
  });
}
