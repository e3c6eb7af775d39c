import { auditActionLabel } from "@/lib/audit-actions";

export type AuditEntry = {
  id: number;
  at: string;
  action: string;
  actorName: string | null;
  actorEmail: string | null;
  targetType: string | null;
  targetId: string | null;
  targetName: string | null;
  detail: Record<string, unknown>;
};

const str = (v: unknown) => (typeof v === "string" ? v : "");

/** What happened, as the rest of a sentence that starts with who did it. */
export function auditSentence(e: AuditEntry): string {
  const d = e.detail ?? {};
  const who = e.targetName || str(d.name) || str(d.email) || "a member";
  switch (e.action) {
    case "invitation.create":
      return `invited ${str(d.email)} as ${str(d.role)}`;
    case "invitation.withdraw":
      return `withdrew the invitation of ${str(d.email)}`;
    case "invitation.accept":
      return d.alreadyMember ? "used an invitation (already a member)" : `joined as ${str(d.role)} through an invitation`;
    case "member.role_change":
      return `changed the role of ${who} from ${str(d.from)} to ${str(d.to)}`;
    case "member.remove":
      return `removed ${who}${d.role ? ` (${str(d.role)})` : ""}`;
    case "workspace.create":
      return `created the workspace "${str(d.name)}"`;
    case "workspace.rename":
      return `renamed the workspace to "${str(d.name)}"`;
    default:
      return auditActionLabel(e.action);
  }
}
