"use client";
// Everything that happened to a sketch, newest first: saves, forks, comments, sign-off steps.
import { useInfiniteQuery } from "@tanstack/react-query";
import { Button, Notice, Skeleton } from "@/components/shell/controls";
import { formatDateTime } from "@/components/workspaces/format";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { activitySentence, type ActivityEvent } from "./activitySentence";

type Page = { events: ActivityEvent[]; nextBefore: number | null };

export function ActivityFeed({ sketchId }: { sketchId: string }) {
  const path = `/api/sketches/${sketchId}/activity`;
  const q = useInfiniteQuery({
    queryKey: apiKey(path),
    queryFn: ({ pageParam }) => apiFetch<Page>(pageParam ? `${path}?before=${pageParam}` : path),
    initialPageParam: 0,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });
  if (q.isPending) return <Skeleton className="h-24 w-full" />;
  if (q.isError) return <Notice tone="error">{q.error instanceof ApiError ? q.error.message : "The activity could not be loaded."}</Notice>;
  const events = q.data.pages.flatMap((p) => p.events);
  return (
    <div className="space-y-3">
      <ol className="space-y-2" aria-label="Activity, newest first" data-testid="activity">
        {events.map((e) => (
          <li key={e.id} className="flex flex-wrap items-baseline gap-x-2 border-b border-rule-soft pb-2 text-sm last:border-0">
            <span className="font-medium text-ink">{e.actorName ?? "A deleted account"}</span>
            <span className="text-ink-soft">{activitySentence(e)}</span>
            <span className="num ml-auto text-xs text-ink-faint">{formatDateTime(e.at)}</span>
          </li>
        ))}
      </ol>
      {q.hasNextPage ? (
        <Button size="sm" tone="secondary" busy={q.isFetchingNextPage} onClick={() => q.fetchNextPage()}>
          Show older activity
        </Button>
      ) : null}
    </div>
  );
}
