// The calc sheet's check record: the version's sign-off steps with their notes, and its comment
// threads — what each is on, who said what and when, open or resolved by whom — and the threads
// still open on the sketch's other versions, earlier and later, so the printed sheet carries its own
// checking history. Pure: the route reads the rows, this words them.
import { plainText } from "@/lib/review/comment-text";
import { pinWords, type PinLike } from "@/lib/review/pin-words";
import { STEP_RECORD, type SignOffStep } from "@/lib/review/rules";
import { threadsOf } from "@/lib/review/threads";

export interface RecordStep {
  step: SignOffStep;
  actorName: string;
  at: Date;
  note: string;
}

export interface RecordComment {
  id: string;
  parentId: string | null;
  authorName: string | null;
  body: string;
  pin: PinLike | null;
  resolvedAt: Date | null;
  resolvedByName: string | null;
  editedAt: Date | null;
  deletedAt: Date | null;
  createdAt: Date;
}

export interface CheckRecordInput {
  steps: RecordStep[];
  /** the version's comments, oldest first (first comments and replies) */
  comments: RecordComment[];
  /** open threads left on earlier versions that are not approved (`openThreadsBesides`) */
  earlierOpen?: Array<{ number: number; open: number }>;
  /** open threads on later versions that are not approved: the sign-off counts them too */
  laterOpen?: Array<{ number: number; open: number }>;
}

export interface RecordThread {
  /** "1. On front bearer — open" */
  heading: string;
  open: boolean;
  /** "Chen Checker, 2026-11-27 02:15 UTC: the text" */
  lines: string[];
}

export interface CheckRecord {
  /** one sentence on where the threads stand */
  summary: string;
  steps: string[];
  threads: RecordThread[];
  /** a line on open threads of earlier versions, when there are any */
  earlier: string | null;
  /** a line on open threads of later versions, when there are any */
  later: string | null;
}

const stamp = (d: Date) => d.toISOString().slice(0, 16).replace("T", " ") + " UTC";
const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Sign-off steps in order, and threads numbered as on the review screen (oldest first). */
export function checkRecord(input: CheckRecordInput, labels: Record<string, string>): CheckRecord {
  const steps = input.steps.map((s) => `${stamp(s.at)} · ${s.actorName} ${STEP_RECORD[s.step]}${s.note.trim() ? `: “${s.note.trim()}”` : ""}`);
  const threads: RecordThread[] = [];
  // numbered as on the review screen
  for (const { first, all } of threadsOf(input.comments)) {
    const open = first.resolvedAt === null;
    const state = open ? "open" : `resolved by ${first.resolvedByName ?? "a deleted account"}, ${stamp(first.resolvedAt!)}`;
    const on = pinWords(first.pin, labels);
    threads.push({
      heading: `${threads.length + 1}. ${on[0].toUpperCase()}${on.slice(1)} — ${state}`,
      open,
      lines: all.map((c) => `${c.authorName ?? "A deleted account"}, ${stamp(c.createdAt)}: ${c.deletedAt ? "(comment deleted)" : plainText(c.body)}${c.editedAt && !c.deletedAt ? " (edited)" : ""}`),
    });
  }
  const openCount = threads.filter((t) => t.open).length;
  const summary = threads.length
    ? `${plural(threads.length, "comment thread", "comment threads")} on this version: ${openCount ? `${openCount} open` : "none open"}${threads.length > openCount ? `, ${threads.length - openCount} resolved` : ""}.`
    : "No comments on this version.";
  return { summary, steps, threads, earlier: openLine("earlier", input.earlierOpen), later: openLine("later", input.laterOpen) };
}

/** "Still open on later versions: v4 (1 thread), v5 (2 threads).", as the comments panel says it; null with none open. */
function openLine(which: "earlier" | "later", list: CheckRecordInput["earlierOpen"]): string | null {
  const open = (list ?? []).filter((e) => e.open > 0);
  return open.length ? `Still open on ${which} versions: ${open.map((e) => `v${e.number} (${plural(e.open, "thread", "threads")})`).join(", ")}.` : null;
}
