// A sketch's activity, one sentence per event (after the name of whoever did it). Browser-safe.
import { plainText } from "@/lib/review/comment-text";
export type ActivityEvent = { id: number; at: string; action: string; actorName: string | null; detail: Record<string, unknown> };

const s = (v: unknown) => (typeof v === "string" ? v : "");
const n = (v: unknown) => (typeof v === "number" ? `v${v}` : "a version");
const quote = (v: unknown, max = 90) => {
  // formatting marks (**bold**, *italic*, _italic_, `code`) read as noise in a one-line quote
  const t = plainText(s(v));
  return t ? `: “${t.length > max ? `${t.slice(0, max - 1)}…` : t}”` : "";
};

/** ["description", "tags"] → "description and tags" (what a sketch.edit changed). */
export const fieldList = (v: unknown) => {
  const f = Array.isArray(v) ? v.filter((x): x is string => typeof x === "string") : [];
  return f.length ? (f.length === 1 ? f[0] : `${f.slice(0, -1).join(", ")} and ${f[f.length - 1]}`) : "details";
};

export function activitySentence(e: ActivityEvent): string {
  const d = e.detail ?? {};
  switch (e.action) {
    case "sketch.create":
      return "created the sketch";
    case "sketch.save":
      // a restore is a save with an older version's drawing: said as such, with its own message
      return typeof d.restoredFrom === "number" ? `restored ${n(d.restoredFrom)} as ${n(d.number)}${quote(d.message)}` : `saved ${n(d.number)}${quote(d.message)}`;
    case "sketch.rename":
      return s(d.from) && s(d.from) !== s(d.title) ? `renamed it from “${s(d.from)}” to “${s(d.title)}”` : "edited its details";
    case "sketch.edit":
      return `edited its ${fieldList(d.changed)}`;
    case "sketch.fork":
      if (!d.origin) return `started it as a fork of ${n(d.fromVersion)} of ${s(d.fromTitle) ? `“${s(d.fromTitle)}”` : "another sketch"}`;
      return d.elsewhere ? `forked ${n(d.fromVersion)} into another workspace` : `forked ${n(d.fromVersion)} as “${s(d.forkTitle)}”`;
    case "comment.create":
      return `${d.reply ? "replied on" : "commented on"} ${n(d.number)}${quote(d.note)}`;
    case "comment.edit":
      return `edited ${d.reply ? "a reply" : "a comment"} on ${n(d.number)}${quote(d.note)}`;
    case "comment.delete":
      return `deleted ${d.reply ? "a reply" : "a comment"} on ${n(d.number)}`;
    case "comment.resolve":
      return `resolved a thread on ${n(d.number)}`;
    case "comment.reopen":
      return `reopened a thread on ${n(d.number)}`;
    case "signoff.submit":
      return `submitted ${n(d.number)} for checking${quote(d.note)}`;
    case "signoff.check":
      return `checked ${n(d.number)}${quote(d.note)}`;
    case "signoff.return":
      return `returned ${n(d.number)}${quote(d.note)}`;
    case "signoff.approve":
      return `approved ${n(d.number)}${quote(d.note)}`;
    case "signoff.withdraw":
      return `withdrew the approval of ${n(d.number)}${quote(d.note)}`;
    case "upload.create":
      return d.purpose === "attachment" ? `attached “${s(d.name) || "a file"}” to a comment on ${n(d.number)}` : `uploaded “${s(d.name) || "a drawing"}” to trace over`;
    case "upload.delete":
      return d.purpose === "attachment" ? `removed the attachment “${s(d.name) || "a file"}” from a comment` : `deleted the uploaded drawing “${s(d.name) || "a drawing"}”`;
    default:
      return e.action;
  }
}
