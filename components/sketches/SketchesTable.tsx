"use client";
// The workspace's sketches: search, filter by tag and status, sort by column, page through.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useSearchParams } from "next/navigation";
import { useEffect, useState } from "react";
import { Button, EmptyState, Notice, Select, Skeleton } from "@/components/shell/controls";
import { formatDate, formatDateTime } from "@/components/workspaces/format";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { STATUS_FILTERS, type SketchSort, type SketchStatus } from "@/lib/sketch-schemas";
import { ForkGlyph } from "./ForkGlyph";
import { forceColumnUnit, formatForceCell, timeAgo } from "./format";
import { STATE_WORDS, type ReviewState } from "@/lib/review/rules";
import { useUnitsPreference } from "./useUnitsPreference";
import { LowFactorChip, StatusMark, type LowFactorMark } from "./StatusMark";

export type SketchRow = {
  id: string;
  title: string;
  tags: string[];
  latestVersion: number;
  status: SketchStatus | null;
  largestReaction: number | null;
  warnings: string[];
  latestMessage: string;
  updatedAt: string;
  updatedBy: { id: string; name: string } | null;
  forked: boolean;
  approvedVersion?: number | null;
  latestReviewState?: ReviewState;
  lowestFactor?: LowFactorMark | null;
};

/** The sign-off states a lead looks for in the list: what is waiting for someone (a withdrawn
 *  approval needs attention as a returned version does). */
const IN_REVIEW: Partial<Record<ReviewState, string>> = {
  submitted: "border-caution/50 text-caution",
  returned: "border-accent/50 text-accent-deep",
  checked: "border-reaction/40 text-reaction",
  withdrawn: "border-accent/50 text-accent-deep",
};

type Page = { items: SketchRow[]; total: number; page: number; pageSize: number; tags: string[] };
type Filters = { q: string; tag: string; status: string; sort: SketchSort; dir: "asc" | "desc"; page: number };

const PAGE_SIZE = 20;

/** The orders a phone offers in one menu, where the table has no room for its sortable headers. */
export const SORT_CHOICES: ReadonlyArray<{ sort: SketchSort; dir: "asc" | "desc"; label: string }> = [
  { sort: "updated", dir: "desc", label: "Updated, newest first" },
  { sort: "updated", dir: "asc", label: "Updated, oldest first" },
  { sort: "title", dir: "asc", label: "Title, A to Z" },
  { sort: "title", dir: "desc", label: "Title, Z to A" },
  { sort: "status", dir: "desc", label: "Status, worst first" },
  { sort: "status", dir: "asc", label: "Status, holds first" },
  { sort: "created", dir: "desc", label: "Created, newest first" },
  { sort: "created", dir: "asc", label: "Created, oldest first" },
];

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

function SortHeader({ label, sort, filters, onSort, className = "" }: { label: string; sort: SketchSort; filters: Filters; onSort: (s: SketchSort) => void; className?: string }) {
  const active = filters.sort === sort;
  const ariaSort = active ? (filters.dir === "asc" ? "ascending" : "descending") : "none";
  return (
    <th scope="col" aria-sort={ariaSort} className={`py-2 pr-3 font-semibold ${className}`}>
      <button type="button" onClick={() => onSort(sort)} className="inline-flex items-center gap-1 uppercase tracking-wider hover:text-ink">
        {label}
        <span aria-hidden="true" className={active ? "text-ink" : "text-rule"}>
          {active && filters.dir === "asc" ? "▲" : "▼"}
        </span>
      </button>
    </th>
  );
}

/** What an address past the last page is told: how many sketches there are, on how many pages. */
function pastTheEnd(total: number, pageSize: number, filtered: boolean): string {
  const pages = Math.ceil(total / pageSize);
  const count = `${total} sketch${total === 1 ? "" : "es"}`;
  const on = pages === 1 ? "on one page" : `on ${pages} pages`;
  return filtered ? `${count} match${total === 1 ? "es" : ""}, ${on}.` : `This workspace has ${count}, ${on}.`;
}

const DEFAULT_FILTERS: Filters = { q: "", tag: "", status: "", sort: "updated", dir: "desc", page: 1 };
const SORTS: readonly SketchSort[] = ["updated", "title", "status", "created"];

/** The list's view as the address keeps it (?q=&tag=&status=&sort=&dir=&page=), defaults left out,
 *  so a view can be reloaded, bookmarked and sent to a colleague. */
export function filtersFromSearch(search: string): Filters {
  const p = new URLSearchParams(search);
  const sort = SORTS.includes(p.get("sort") as SketchSort) ? (p.get("sort") as SketchSort) : DEFAULT_FILTERS.sort;
  const dir = p.get("dir") === "asc" || p.get("dir") === "desc" ? (p.get("dir") as "asc" | "desc") : sort === "title" ? "asc" : "desc";
  const page = Math.max(1, Math.floor(Number(p.get("page")) || 1));
  // a status the list does not know (an old or mistyped address) is dropped, not sent on to fail
  const status = (STATUS_FILTERS as readonly string[]).includes(p.get("status") ?? "") ? p.get("status")! : "";
  // a tag is filed in lower case, trimmed (as the server reads it), so the Tag box can show it
  return { q: p.get("q") ?? "", tag: (p.get("tag") ?? "").trim().toLowerCase(), status, sort, dir, page };
}

export function searchOfFilters(f: Filters): string {
  const p = new URLSearchParams();
  if (f.q.trim()) p.set("q", f.q.trim());
  if (f.tag) p.set("tag", f.tag);
  if (f.status) p.set("status", f.status);
  if (f.sort !== DEFAULT_FILTERS.sort || f.dir !== DEFAULT_FILTERS.dir) {
    p.set("sort", f.sort);
    p.set("dir", f.dir);
  }
  if (f.page > 1) p.set("page", String(f.page));
  const qs = p.toString();
  return qs ? `?${qs}` : "";
}

export function SketchesTable({ workspaceId, canCreate }: { workspaceId: string; canCreate: boolean }) {
  const [units] = useUnitsPreference();
  // the address holds the view: read when the page opens, written as it changes
  const search = useSearchParams();
  // (outside the app's router, as in a test, the window's address)
  const [filters, setFilters] = useState<Filters>(() => filtersFromSearch(search ? search.toString() : typeof window === "undefined" ? "" : window.location.search));
  const q = useDebounced(filters.q.trim(), 250);
  useEffect(() => {
    const next = searchOfFilters({ ...filters, q });
    if (next !== window.location.search) window.history.replaceState(window.history.state, "", `${window.location.pathname}${next}${window.location.hash}`);
  }, [filters, q]);
  const path = `/api/workspaces/${workspaceId}/sketches`;
  const params = new URLSearchParams({ sort: filters.sort, dir: filters.dir, page: String(filters.page), pageSize: String(PAGE_SIZE) });
  if (q) params.set("q", q);
  if (filters.tag) params.set("tag", filters.tag);
  if (filters.status) params.set("status", filters.status);
  const query = useQuery({
    queryKey: [...apiKey(path), Object.fromEntries(params)],
    queryFn: () => apiFetch<Page>(`${path}?${params}`),
    placeholderData: keepPreviousData,
  });

  const set = (patch: Partial<Filters>) => setFilters((f) => ({ ...f, page: 1, ...patch }));
  const onSort = (sort: SketchSort) =>
    setFilters((f) => ({ ...f, page: 1, sort, dir: f.sort === sort ? (f.dir === "asc" ? "desc" : "asc") : sort === "title" ? "asc" : "desc" }));
  const filtered = Boolean(q || filters.tag || filters.status);
  const data = query.data;
  // one unit down the "Largest reaction" column, as the result tables write theirs
  const forceUnit = data ? forceColumnUnit(data.items.map((s) => s.largestReaction), units) : undefined;

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3" role="search" aria-label="Find sketches">
        <div className="min-w-[14rem] flex-1 space-y-1">
          <label htmlFor="sketch-search" className="block text-sm font-medium text-ink">
            Search
          </label>
          <input
            id="sketch-search"
            type="search"
            value={filters.q}
            placeholder="Title, description or tag"
            onChange={(e) => set({ q: e.target.value })}
            className="block w-full rounded-md border border-rule bg-paper-card px-3 py-2 text-sm text-ink outline-none placeholder:text-ink-faint focus:border-ink focus:ring-2 focus:ring-accent/25"
          />
        </div>
        <div className="w-40 max-sm:w-full">
          <Select id="sketch-tag" label="Tag" value={filters.tag} onChange={(e) => set({ tag: e.target.value })}>
            <option value="">Any tag</option>
            {/* a tag from the address that no sketch has (any more) stays in view, not hidden behind "Any tag" */}
            {filters.tag && !(data?.tags ?? []).includes(filters.tag) ? <option value={filters.tag}>{data ? `${filters.tag} (no sketch has it)` : filters.tag}</option> : null}
            {(data?.tags ?? []).map((t) => (
              <option key={t} value={t}>
                {t}
              </option>
            ))}
          </Select>
        </div>
        <div className="w-40 max-sm:w-full">
          <Select id="sketch-status" label="Status" value={filters.status} onChange={(e) => set({ status: e.target.value })}>
            <option value="">Any status</option>
            {STATUS_FILTERS.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </Select>
        </div>
        {/* a phone hides the sortable column headers: the same orders from one menu */}
        <div className="w-full sm:hidden">
          <Select
            id="sketch-sort"
            label="Sort"
            value={`${filters.sort}:${filters.dir}`}
            onChange={(e) => {
              const [sort, dir] = e.target.value.split(":") as [SketchSort, "asc" | "desc"];
              set({ sort, dir });
            }}
          >
            {SORT_CHOICES.map((c) => (
              <option key={`${c.sort}:${c.dir}`} value={`${c.sort}:${c.dir}`}>
                {c.label}
              </option>
            ))}
          </Select>
        </div>
        {filtered ? (
          <Button tone="quiet" onClick={() => set({ q: "", tag: "", status: "" })}>
            Clear filters
          </Button>
        ) : null}
      </div>

      {query.isError ? (
        <Notice tone="error" title="The sketches could not be loaded">
          {query.error instanceof ApiError ? query.error.message : "Try again in a moment."}
        </Notice>
      ) : query.isPending ? (
        <div className="space-y-2" role="status" aria-label="Loading the sketches">
          {[0, 1, 2].map((i) => (
            <Skeleton key={i} className="h-9 w-full" />
          ))}
        </div>
      ) : data && data.items.length === 0 && data.total > 0 ? (
        // an address past the last page (a link kept from before some sketches were deleted, or typed)
        <EmptyState
          title={`There is no page ${data.page}`}
          action={
            <Button tone="secondary" onClick={() => setFilters((f) => ({ ...f, page: Math.max(1, Math.ceil(data.total / data.pageSize)) }))}>
              Go to the last page
            </Button>
          }
        >
          {pastTheEnd(data.total, data.pageSize, filtered)}
        </EmptyState>
      ) : data && data.items.length === 0 ? (
        filtered ? (
          <EmptyState title="No sketch matches">Nothing here has that text, tag and status. Clear the filters to see every sketch.</EmptyState>
        ) : (
          <EmptyState title="No sketches saved here yet">
            {canCreate
              ? "Start a sketch, then save it into this workspace. Its versions, checks and approvals will be listed here."
              : "When an editor saves a sketch into this workspace, it will be listed here for you to read."}
          </EmptyState>
        )
      ) : data ? (
        <>
          <div className="relative overflow-x-auto">
            <table className="w-full text-sm" aria-busy={query.isFetching || undefined}>
              <caption className="sr-only">Sketches in this workspace</caption>
              <thead>
                <tr className="border-b border-rule text-left text-xs text-ink-faint">
                  <SortHeader label="Title" sort="title" filters={filters} onSort={onSort} />
                  <SortHeader label="Status" sort="status" filters={filters} onSort={onSort} className="w-40 max-sm:hidden" />
                  <th scope="col" className="w-28 py-2 pr-3 text-right font-semibold uppercase tracking-wider max-sm:hidden">Largest reaction</th>
                  <SortHeader label="Updated" sort="updated" filters={filters} onSort={onSort} className="w-44 max-sm:hidden" />
                  <th scope="col" className="py-2 font-semibold uppercase tracking-wider max-sm:hidden">Tags</th>
                </tr>
              </thead>
              <tbody>
                {data.items.map((s) => (
                  <tr key={s.id} className="border-b border-rule-soft align-top last:border-0" data-testid={`sketch-row-${s.title}`}>
                    <td className="py-2.5 pr-3">
                      <Link href={`/workspaces/${workspaceId}/sketches/${s.id}`} className="font-medium text-ink underline decoration-rule underline-offset-2 hover:decoration-ink">
                        {s.title}
                      </Link>
                      <span className="ml-2 text-xs text-ink-faint">v{s.latestVersion}</span>
                      {s.approvedVersion ? (
                        <span className="ml-2 rounded border border-reaction/40 px-1 text-[11px] font-medium text-reaction" title={`Version ${s.approvedVersion} is approved`}>
                          ✓✓ v{s.approvedVersion} approved
                        </span>
                      ) : null}
                      {s.latestReviewState && IN_REVIEW[s.latestReviewState] ? (
                        <span
                          className={`ml-2 whitespace-nowrap rounded border px-1 text-[11px] font-medium ${IN_REVIEW[s.latestReviewState]}`}
                          title={`Version ${s.latestVersion}: ${STATE_WORDS[s.latestReviewState].sentence}`}
                          data-testid="review-state"
                        >
                          v{s.latestVersion} {STATE_WORDS[s.latestReviewState].label}
                        </span>
                      ) : null}
                      {s.forked ? (
                        <span className="ml-2 inline-flex items-center gap-0.5 text-[11px] text-ink-faint" title="Forked from another sketch">
                          <ForkGlyph /> fork
                        </span>
                      ) : null}
                      {s.latestMessage ? <span className="block truncate text-xs text-ink-faint max-sm:whitespace-normal">{s.latestMessage}</span> : null}
                      {/* a phone has no room for the columns: their words go under the title */}
                      <span className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-0.5 text-xs text-ink-soft sm:hidden" data-testid="sketch-row-summary">
                        <span>
                          <StatusMark status={s.status} warnings={s.warnings} />
                          {s.lowestFactor ? <LowFactorChip low={s.lowestFactor} /> : null}
                        </span>
                        {s.largestReaction !== null ? <span className="num">largest {formatForceCell(s.largestReaction, units, forceUnit)}</span> : null}
                        <span>
                          {timeAgo(s.updatedAt) ?? formatDate(s.updatedAt)}
                          {s.updatedBy ? ` by ${s.updatedBy.name}` : ""}
                        </span>
                        {s.tags.length ? <span className="text-ink-faint">{s.tags.join(" · ")}</span> : null}
                      </span>
                    </td>
                    <td className="py-2.5 pr-3 max-sm:hidden">
                      <StatusMark status={s.status} warnings={s.warnings} />
                      {s.lowestFactor ? (
                        <span className="block">
                          <LowFactorChip low={s.lowestFactor} />
                        </span>
                      ) : null}
                    </td>
                    <td className="num py-2.5 pr-3 text-right text-ink max-sm:hidden">{formatForceCell(s.largestReaction, units, forceUnit)}</td>
                    <td className="py-2.5 pr-3 text-ink-soft max-sm:hidden">
                      <span title={formatDateTime(s.updatedAt)}>{timeAgo(s.updatedAt) ?? formatDate(s.updatedAt)}</span>
                      {s.updatedBy ? <span className="block text-xs text-ink-faint">by {s.updatedBy.name}</span> : null}
                    </td>
                    <td className="py-2 max-sm:hidden">
                      <ul className="flex max-w-[14rem] flex-wrap gap-1">
                        {s.tags.map((t) => (
                          <li key={t}>
                            <button
                              type="button"
                              onClick={() => set({ tag: t })}
                              className="whitespace-nowrap rounded border border-rule bg-paper-deep/60 px-1.5 py-0.5 text-xs text-ink-soft hover:border-ink/40 hover:text-ink"
                              title={`Show sketches tagged “${t}”`}
                            >
                              {t}
                            </button>
                          </li>
                        ))}
                      </ul>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="flex items-center justify-between gap-3 text-xs text-ink-faint">
            <p aria-live="polite">
              {(data.page - 1) * data.pageSize + 1}–{Math.min(data.page * data.pageSize, data.total)} of {data.total}
            </p>
            <div className="flex gap-2">
              <Button size="sm" tone="secondary" disabled={data.page <= 1} onClick={() => setFilters((f) => ({ ...f, page: f.page - 1 }))}>
                Previous
              </Button>
              <Button size="sm" tone="secondary" disabled={data.page * data.pageSize >= data.total} onClick={() => setFilters((f) => ({ ...f, page: f.page + 1 }))}>
                Next
              </Button>
            </div>
          </div>
        </>
      ) : null}
    </div>
  );
}
