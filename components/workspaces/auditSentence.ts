import { fieldList } from "@/components/review/activitySentence";
import { auditActionLabel } from "@/lib/audit-actions";
import { plainText } from "@/lib/review/comment-text";

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
const num = (v: unknown) => (typeof v === "number" ? String(v) : "?");

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
    case "member.leave":
      return d.accountDeleted ? "left the workspace: they deleted their account" : "left the workspace";
    case "member.remove":
      return `removed ${who}${d.role ? ` (${str(d.role)})` : ""}`;
    case "workspace.create":
      return `created the workspace "${str(d.name)}"`;
    case "workspace.export":
      return `exported the workspace's sketches (${num(d.sketches)}, the latest version of each)`;
    case "workspace.rename":
      return `renamed the workspace to "${str(d.name)}"`;
    case "sketch.create":
      return `created the sketch "${str(d.title)}"`;
    case "sketch.save":
      return `saved v${num(d.number)} of "${str(d.title)}"${d.message ? `: ${str(d.message)}` : ""}`;
    case "sketch.fork":
      if (d.origin) return d.elsewhere ? `forked v${num(d.fromVersion)} of "${str(d.title)}" into another workspace` : `forked v${num(d.fromVersion)} of "${str(d.title)}" as "${str(d.forkTitle)}"`;
      return `made "${str(d.title)}" as a fork of another sketch's v${num(d.fromVersion)}`;
    case "sketch.rename":
      return str(d.from) && str(d.from) !== str(d.title) ? `renamed the sketch "${str(d.from)}" to "${str(d.title)}"` : `edited the details of "${str(d.title)}"`;
    case "sketch.edit":
      return `edited the ${fieldList(d.changed)} of "${str(d.title)}"`;
    case "sketch.delete":
      return `deleted the sketch "${str(d.title)}" with its ${num(d.versions)} version${d.versions === 1 ? "" : "s"}`;
    case "upload.create":
    case "upload.delete":
      return `${auditActionLabel(e.action)} "${str(d.title)}": ${str(d.name) || "a file"} (${d.purpose === "attachment" ? "a comment's attachment" : "an underlay"})`;
    case "signoff.submit":
      return `submitted v${num(d.number)} of "${str(d.title)}" for checking${str(d.note) ? `: ${str(d.note)}` : ""}`;
    case "comment.create":
      // a reply reads as one, as in the sketch's own activity
      return `${d.reply ? "replied on" : "commented on"} v${num(d.number)} of "${str(d.title)}"${str(d.note) ? `: ${plainText(str(d.note))}` : ""}`;
    default:
      if (e.action.startsWith("signoff.") || e.action.startsWith("comment.")) {
        // a comment's words without their formatting marks (**bold** reads as bold, not as stars)
        const note = e.action.startsWith("comment.") ? plainText(str(d.note)) : str(d.note);
        return `${auditActionLabel(e.action)} v${num(d.number)} of "${str(d.title)}"${note ? `: ${note}` : ""}`;
      }
      return auditActionLabel(e.action);
  }
}
