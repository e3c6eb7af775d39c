// Dates in one unambiguous form on every screen (UTC, so server and browser render alike).
const DATE = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const TIME = new Intl.DateTimeFormat("en-GB", { hour: "2-digit", minute: "2-digit", hour12: false, timeZone: "UTC" });

export function formatDate(value: string | Date): string {
  return DATE.format(new Date(value));
}

export function formatDateTime(value: string | Date): string {
  const d = new Date(value);
  return `${DATE.format(d)}, ${TIME.format(d)} UTC`;
}

/** "in 6 days", "in 5 hours", "expired 2 days ago". */
export function relativeExpiry(value: string | Date, now = Date.now()): string {
  const ms = new Date(value).getTime() - now;
  const abs = Math.abs(ms);
  const unit = abs >= 86_400_000 ? ["day", 86_400_000] : abs >= 3_600_000 ? ["hour", 3_600_000] : ["minute", 60_000];
  const n = Math.max(1, Math.round(abs / (unit[1] as number)));
  const text = `${n} ${unit[0]}${n === 1 ? "" : "s"}`;
  return ms > 0 ? `in ${text}` : `expired ${text} ago`;
}

/** What a former member is told of a deleted workspace (its pages, the API's 404). */
export function workspaceDeletionSentence(gone: { name: string; deletedBy: string | null; deletedAt: Date | string }): string {
  const by = gone.deletedBy ? ` by ${gone.deletedBy}` : "";
  return `The workspace “${gone.name}” was deleted${by} on ${formatDateTime(gone.deletedAt)}, with its sketches, their versions, comments and files.`;
}

/** The name typed to confirm a deletion matches the workspace's: same characters, outer spaces and runs of spaces aside. */
export function nameConfirms(typed: string, name: string): boolean {
  const norm = (s: string) => s.trim().replace(/\s+/g, " ");
  return norm(typed) === norm(name);
}
