import "server-only";
// What waits for the signed-in person in a workspace's sign-off: versions submitted that they may
// check or return, versions checked that they may approve, and their own returned versions (or
// versions whose approval was withdrawn) that nothing newer has replaced yet. One table decides (the sign-off rules), as for the buttons.
import { listVersionsInReview } from "@/db/queries/review";
import type { Role } from "@/lib/roles";
import { allowedSteps, newerThan, type ReviewState } from "./rules";

export type QueueAction = "check" | "approve" | "revise";
export type QueueItem = {
  sketchId: string;
  sketchTitle: string;
  number: number;
  state: ReviewState;
  authorName: string | null;
  since: string;
  action: QueueAction;
  /** the sketch's latest version when a newer one was saved since (a check or approval is of this version only) */
  newer: number | null;
};

export async function reviewQueueFor(workspaceId: string, userId: string, role: Role): Promise<QueueItem[]> {
  const rows = await listVersionsInReview(workspaceId);
  const out: QueueItem[] = [];
  for (const r of rows) {
    const isAuthor = r.authorId === userId;
    const steps = allowedSteps({ role, isAuthor, isChecker: r.checkedBy === userId, state: r.state, newer: newerThan(r) });
    let action: QueueAction | null = null;
    if (r.state === "submitted" && steps.includes("check")) action = "check";
    else if (r.state === "checked" && steps.includes("approve")) action = "approve";
    // a returned version, or one whose approval was withdrawn, is its author's to revise until a
    // newer version of the sketch is saved
    else if ((r.state === "returned" || r.state === "withdrawn") && isAuthor && r.number === r.latestVersion) action = "revise";
    if (action) out.push({ sketchId: r.sketchId, sketchTitle: r.sketchTitle, number: r.number, state: r.state, authorName: r.authorName, since: r.since.toISOString(), action, newer: newerThan(r) });
  }
  return out;
}
