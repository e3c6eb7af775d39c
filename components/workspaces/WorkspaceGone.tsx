"use client";
import Link from "next/link";
import { ApiError } from "@/lib/api-client";
import { workspaceDeletionSentence } from "./format";

export type WorkspaceGone = { name: string; deletedBy: string | null; deletedAt: string };

/** The deletion a refused request names (`error.workspaceDeleted`: the workspace of an open page was deleted), or null. */
export function workspaceGoneOf(err: unknown): WorkspaceGone | null {
  if (!(err instanceof ApiError) || err.status !== 404) return null;
  const d = err.detail?.workspaceDeleted as Partial<WorkspaceGone> | undefined;
  return d && typeof d.name === "string" && typeof d.deletedAt === "string" ? { name: d.name, deletedBy: d.deletedBy ?? null, deletedAt: d.deletedAt } : null;
}

/**
 * Said over an open page once one of its requests learns its workspace was deleted: the page stays
 * as it is (nothing typed is thrown away), but nothing can be saved there any more.
 */
export function WorkspaceGoneBanner({ gone }: { gone: WorkspaceGone }) {
  return (
    <div role="alert" data-testid="workspace-gone" className="fixed inset-x-0 top-0 z-50 border-b border-accent/40 bg-accent-soft px-4 py-2.5 text-sm text-ink shadow-[0_2px_8px_rgb(var(--shade)/0.14)]">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-1">
        <p className="min-w-0 flex-1 [overflow-wrap:anywhere]">
          {workspaceDeletionSentence(gone)} Nothing here can be saved any more; what is on screen stays so you can copy it.
        </p>
        <Link href="/workspaces" className="font-medium underline decoration-rule underline-offset-2">
          Your workspaces
        </Link>
      </div>
    </div>
  );
}
