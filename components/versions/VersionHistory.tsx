"use client";
// The version history of a sketch: newest first, with each version's message, author, time,
// solve status and largest reaction, and the actions on it (review, open, restore as the latest,
// fork, compare).
import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState, type ReactNode } from "react";
import { forceColumnUnit, formatForceCell, timeAgo } from "@/components/sketches/format";
import { useUnitsPreference } from "@/components/sketches/useUnitsPreference";
import { StatusMark } from "@/components/sketches/StatusMark";
import { Button, Notice, Skeleton } from "@/components/shell/controls";
import { formatDate, formatDateTime } from "@/components/workspaces/format";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import type { ReviewState } from "@/lib/review/rules";
import type { SketchStatus } from "@/lib/sketch-schemas";

export type VersionItem = {
  id: string;
  number: number;
  message: string;
  authorId: string | null;
  authorName: string | null;
  createdAt: string;
  status: SketchStatus | null;
  largestReaction: number | null;
  warnings: string[];
  reviewState: ReviewState;
};

export function useVersions(sketchId: string) {
  const path = `/api/sketches/${sketchId}/versions`;
  return useQuery({ queryKey: apiKey(path), queryFn: () => apiFetch<{ versions: VersionItem[] }>(path) });
}

/** Where the editor opens a version. */
export const editorHref = (sketchId: string, number: number, latest: number) => (number === latest ? `/sketches/${sketchId}` : `/sketches/${sketchId}?version=${number}`);

export function VersionHistory({
  sketchId,
  latest,
  canFork,
  onFork,
  reviewHref,
  reviewCell,
  compareHref,
  onRestore,
}: {
  sketchId: string;
  latest: number;
  canFork: boolean;
  onFork: (number: number) => void;
  /** the review page of a version (comments and sign-off), when there is one */
  reviewHref?: (number: number) => string;
  /** the sign-off state of a version, shown in its own column */
  reviewCell?: (v: VersionItem) => ReactNode;
  /** the comparison of two versions */
  compareHref?: (from: number, to: number) => string;
  /** make an older version the latest again (for those who may save versions) */
  onRestore?: (v: VersionItem) => void;
}) {
  const [units] = useUnitsPreference();
  const q = useVersions(sketchId);
  const [picked, setPicked] = useState<number[]>([]);
  if (q.isPending) return <Skeleton className="h-32 w-full" />;
  if (q.isError)
    return (
      <Notice tone="error" title="The versions could not be loaded">
        {q.error instanceof ApiError ? q.error.message : "Try again in a moment."}
      </Notice>
    );
  const toggle = (n: number) => setPicked((p) => (p.includes(n) ? p.filter((x) => x !== n) : [...p.slice(-1), n]));
  const [from, to] = [...picked].sort((a, b) => a - b);
  // one unit down the "Largest reaction" column, as the result tables write theirs
  const forceUnit = forceColumnUnit(q.data.versions.map((v) => v.largestReaction), units);
  return (
    <div className="space-y-3">
      {compareHref ? (
        <div className="flex flex-wrap items-center gap-3 text-sm">
          <p className="text-ink-soft">{picked.length < 2 ? "Tick two versions to compare them." : `Compare v${from} with v${to}.`}</p>
          {picked.length === 2 ? (
            <Link href={compareHref(from, to)} className="rounded-md bg-ink px-3 py-1.5 text-[13px] font-medium text-paper hover:bg-ink-soft" data-testid="compare-picked">
              Compare v{from} → v{to}
            </Link>
          ) : null}
        </div>
      ) : null}
      <div className="relative overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Version history, newest first</caption>
          <thead>
            <tr className="border-b border-rule text-left text-xs uppercase tracking-wider text-ink-faint">
              {compareHref ? (
                <th scope="col" className="w-10 py-2 pr-2 font-semibold">
                  <span className="sr-only">Compare</span>
                </th>
              ) : null}
              <th scope="col" className="w-16 py-2 pr-3 font-semibold">Version</th>
              <th scope="col" className="py-2 pr-3 font-semibold">Message</th>
              <th scope="col" className="w-36 py-2 pr-3 font-semibold max-sm:hidden">Saved</th>
              <th scope="col" className="w-32 py-2 pr-3 font-semibold max-sm:hidden">Status</th>
              <th scope="col" className="w-28 py-2 pr-3 text-right font-semibold max-sm:hidden">Largest reaction</th>
              {reviewCell ? <th scope="col" className="w-32 py-2 pr-3 font-semibold max-sm:hidden">Sign-off</th> : null}
              <th scope="col" className="py-2 text-right font-semibold">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {q.data.versions.map((v) => (
              <tr key={v.number} className="border-b border-rule-soft align-top last:border-0" data-testid={`version-row-${v.number}`}>
                {compareHref ? (
                  <td className="py-2.5 pr-2">
                    <input type="checkbox" className="accent-accent" checked={picked.includes(v.number)} onChange={() => toggle(v.number)} aria-label={`Compare version ${v.number}`} />
                  </td>
                ) : null}
                <td className="num py-2.5 pr-3 font-semibold text-ink">
                  v{v.number}
                  {v.number === latest ? <span className="block text-[11px] font-normal text-ink-faint">latest</span> : null}
                </td>
                <td className="py-2.5 pr-3 text-ink">
                  {v.message || <span className="text-ink-faint">(no message)</span>}
                  {/* a phone has no room for the columns: their words go under the message */}
                  <span className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-xs text-ink-soft sm:hidden" data-testid="version-row-summary">
                    <span>
                      {timeAgo(v.createdAt) ?? formatDate(v.createdAt)} by {v.authorName ?? "a deleted account"}
                    </span>
                    <StatusMark status={v.status} warnings={v.warnings} />
                    <span className="num whitespace-nowrap">largest {formatForceCell(v.largestReaction, units, forceUnit)}</span>
                    {reviewCell ? <span data-testid="version-row-signoff">{reviewCell(v)}</span> : null}
                  </span>
                </td>
                <td className="py-2.5 pr-3 text-ink-soft max-sm:hidden">
                  <span title={formatDateTime(v.createdAt)}>{timeAgo(v.createdAt) ?? formatDate(v.createdAt)}</span>
                  <span className="block text-xs text-ink-faint">by {v.authorName ?? "a deleted account"}</span>
                </td>
                <td className="py-2.5 pr-3 max-sm:hidden">
                  <StatusMark status={v.status} warnings={v.warnings} />
                </td>
                <td className="num py-2.5 pr-3 text-right max-sm:hidden">{formatForceCell(v.largestReaction, units, forceUnit)}</td>
                {reviewCell ? <td className="py-2.5 pr-3 max-sm:hidden">{reviewCell(v)}</td> : null}
                <td className="py-2 text-right">
                  <span className="inline-flex justify-end gap-1.5 whitespace-nowrap max-sm:flex-col max-sm:items-end">
                    {reviewHref ? (
                      <Link href={reviewHref(v.number)} className="rounded-md border border-ink/20 px-2.5 py-1 text-[13px] font-medium hover:border-ink/45" aria-label={`Review version ${v.number}`}>
                        Review
                      </Link>
                    ) : null}
                    <Link href={editorHref(sketchId, v.number, latest)} className="rounded-md border border-ink/20 px-2.5 py-1 text-[13px] font-medium hover:border-ink/45" aria-label={`Open version ${v.number}`}>
                      Open
                    </Link>
                    {onRestore && v.number !== latest ? (
                      <Button size="sm" tone="secondary" onClick={() => onRestore(v)} aria-label={`Restore version ${v.number}`} title={`Save v${v.number}'s drawing as a new latest version (nothing is deleted)`}>
                        Restore
                      </Button>
                    ) : null}
                    {canFork ? (
                      <Button size="sm" tone="secondary" onClick={() => onFork(v.number)} aria-label={`Fork version ${v.number}`}>
                        Fork
                      </Button>
                    ) : null}
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
