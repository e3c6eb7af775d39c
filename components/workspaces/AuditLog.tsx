"use client";
import { useInfiniteQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Button, EmptyState, Notice, Skeleton } from "@/components/shell/controls";
import { setAddressParam } from "@/lib/address";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { auditSentence, type AuditEntry } from "./auditSentence";
import { formatDateTime } from "./format";
import Link from "next/link";

/** `targetDeleted`: the sketch the entry is about has since been deleted (its address is a 404). */
type LogEntry = AuditEntry & { targetDeleted?: boolean };
type Page = { events: LogEntry[]; nextBefore: number | null };

/** Where an entry about a sketch leads: its version's page when it names one, else the sketch's
 *  (nothing for a deletion: the sketch is gone). */
export function entryHref(workspaceId: string, e: AuditEntry): string | null {
  if (e.targetType !== "sketch" || !e.targetId || e.action === "sketch.delete") return null;
  const number = typeof e.detail?.number === "number" ? e.detail.number : null;
  const base = `/workspaces/${workspaceId}/sketches/${e.targetId}`;
  return number !== null && (e.action.startsWith("signoff.") || e.action.startsWith("comment.") || e.action === "sketch.save") ? `${base}/versions/${number}` : base;
}

function EntryLink({ workspaceId, entry }: { workspaceId: string; entry: LogEntry }) {
  const href = entryHref(workspaceId, entry);
  // a sketch deleted since: its address leads to a 404, so the entry says so instead of offering it
  if (href && entry.targetDeleted)
    return (
      <span className="ml-2 whitespace-nowrap text-xs text-ink-faint" data-testid="audit-since-deleted">
        since deleted
      </span>
    );
  const title = typeof entry.detail?.title === "string" ? entry.detail.title : "the sketch";
  const version = href?.includes("/versions/") ? ` v${String(entry.detail.number)}` : "";
  return href ? (
    <Link href={href} aria-label={`Open “${title}”${version}`} className="ml-2 whitespace-nowrap text-xs text-ink-soft underline decoration-rule underline-offset-2 hover:decoration-ink">
      Open
    </Link>
  ) : null;
}

/** The owners' audit log, newest first, fifty at a time. */
export function AuditLog({ workspaceId, showSignIns = true }: { workspaceId: string; showSignIns?: boolean }) {
  const path = `/api/workspaces/${workspaceId}/audit`;
  // sign-ins are most of the rows: they can step aside so the changes read on their own
  // the page's address keeps the choice (?signIns=hide), so a reload or a shared link shows the same rows
  const [signIns, setSignIns] = useState(showSignIns);
  const choose = (show: boolean) => {
    setSignIns(show);
    setAddressParam("signIns", show ? null : "hide");
  };
  const q = useInfiniteQuery({
    queryKey: [...apiKey(path), signIns],
    queryFn: ({ pageParam }) => {
      const params = new URLSearchParams(signIns ? {} : { signIns: "hide" });
      if (pageParam) params.set("before", String(pageParam));
      const qs = params.toString();
      return apiFetch<Page>(qs ? `${path}?${qs}` : path);
    },
    initialPageParam: 0,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });

  const toggle = (
    <label className="flex items-center gap-2 text-sm text-ink-soft">
      <input type="checkbox" className="accent-accent" checked={signIns} onChange={(e) => choose(e.target.checked)} />
      Show sign-ins
    </label>
  );

  if (q.isPending) {
    return (
      <div className="space-y-3" role="status" aria-label="Loading the audit log">
        {[0, 1, 2, 3].map((i) => (
          <Skeleton key={i} className="h-5 w-full" />
        ))}
      </div>
    );
  }
  // a failed "Show older entries" keeps the rows already read (they are in q.data): only a first
  // page that never came replaces the table
  if (q.isError && !q.data) {
    return (
      <Notice tone="error" title="The audit log could not be loaded">
        {q.error instanceof ApiError ? q.error.message : "Try again in a moment."}
      </Notice>
    );
  }
  const events = q.data.pages.flatMap((p) => p.events);
  if (!events.length)
    return (
      <div className="space-y-4">
        {signIns ? null : toggle}
        <EmptyState title="Nothing recorded yet">Sign-ins, invitations, role changes and removals appear here.</EmptyState>
      </div>
    );

  return (
    <div className="space-y-4">
      {toggle}
      <div className="relative overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Audit log, newest first</caption>
          <thead>
            <tr className="border-b border-rule text-left text-xs uppercase tracking-wider text-ink-faint">
              <th scope="col" className="w-52 py-2 pr-4 font-semibold max-sm:hidden">When</th>
              <th scope="col" className="w-56 py-2 pr-4 font-semibold max-sm:hidden">Who</th>
              <th scope="col" className="py-2 font-semibold">What</th>
            </tr>
          </thead>
          <tbody>
            {events.map((e) => (
              <tr key={e.id} className="border-b border-rule-soft align-top last:border-0">
                <td className="num whitespace-nowrap py-2.5 pr-4 text-ink-soft max-sm:hidden">{formatDateTime(e.at)}</td>
                <td className="py-2.5 pr-4 max-sm:hidden">
                  <span className="font-medium text-ink">{e.actorName ?? "Deleted account"}</span>
                  {e.actorEmail ? <span className="block text-xs text-ink-faint">{e.actorEmail}</span> : null}
                </td>
                <td className="py-2.5 text-ink">
                  {/* a phone has no room for the time's and the person's columns: they go above the sentence */}
                  <span className="block text-xs text-ink-soft sm:hidden" data-testid="audit-when-who">
                    <span className="num">{formatDateTime(e.at)}</span> · <span className="font-medium text-ink">{e.actorName ?? "Deleted account"}</span>
                  </span>
                  {auditSentence(e)}
                  <EntryLink workspaceId={workspaceId} entry={e} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {q.isFetchNextPageError ? (
        <Notice tone="error" title="The older entries could not be loaded">
          {q.error instanceof ApiError ? q.error.message : "Try again in a moment."}
        </Notice>
      ) : null}
      {q.hasNextPage ? (
        <Button tone="secondary" busy={q.isFetchingNextPage} onClick={() => q.fetchNextPage()}>
          Show older entries
        </Button>
      ) : (
        <p className="text-xs text-ink-faint">That is everything recorded for this workspace.</p>
      )}
    </div>
  );
}
