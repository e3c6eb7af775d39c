// The dashboard's "Waiting for you": the versions whose next sign-off step is the reader's — to
// check, to approve, or (their own, returned or with its approval withdrawn) to revise — each
// linked to its review page.
import Link from "next/link";
import { Panel } from "@/components/shell/controls";
import { formatDateTime } from "@/components/workspaces/format";
import type { QueueAction, QueueItem } from "@/lib/review/queue";

const ACTION: Record<QueueAction, { verb: string; since: string; tone: string }> = {
  check: { verb: "Check", since: "submitted", tone: "border-reaction/40 text-reaction" },
  approve: { verb: "Approve", since: "checked", tone: "border-ink/30 text-ink" },
  revise: { verb: "Revise", since: "returned", tone: "border-caution/50 text-caution" },
};

export function ReviewQueue({ workspaceId, items }: { workspaceId: string; items: QueueItem[] }) {
  if (!items.length) return null;
  return (
    <Panel title="Waiting for you" description="Versions whose next sign-off step is yours.">
      <ul className="divide-y divide-rule-soft text-sm" data-testid="review-queue">
        {items.map((i) => {
          const a = ACTION[i.action];
          return (
            <li key={`${i.sketchId}-${i.number}`} className="flex flex-wrap items-baseline gap-x-3 gap-y-0.5 py-2" data-testid={`queue-${i.action}-${i.sketchTitle}`}>
              <span className={`w-[4.75rem] shrink-0 rounded border px-1.5 text-center text-[11.5px] font-semibold ${a.tone}`}>{a.verb}</span>
              <Link href={`/workspaces/${workspaceId}/sketches/${i.sketchId}/versions/${i.number}`} className="font-medium text-ink underline decoration-rule underline-offset-2 hover:decoration-ink">
                {i.sketchTitle} v{i.number}
              </Link>
              <span className="text-xs text-ink-soft">
                prepared by {i.authorName ?? "a deleted account"} · {i.state === "withdrawn" ? "approval withdrawn" : a.since} {formatDateTime(i.since)}
              </span>
              {i.newer ? (
                <span className="text-xs text-caution" data-testid="queue-newer">
                  v{i.newer} was saved since: {i.action === "approve" ? "an approval" : "a check"} here is of v{i.number} only
                </span>
              ) : null}
            </li>
          );
        })}
      </ul>
    </Panel>
  );
}
