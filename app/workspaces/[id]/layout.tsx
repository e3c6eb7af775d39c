import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/AppShell";
import { pageTarget } from "@/lib/page-target";
import { requirePageSession } from "@/lib/session";

/**
 * Every workspace page's frame. What the address names (the workspace, a sketch in it, a version) is
 * checked here, above the loading skeleton: once the skeleton has streamed the status is 200, so a
 * missing one must be found before it to answer 404 (its words: `app/workspaces/not-found.tsx`).
 * Pages still check access themselves (a client-side move between pages does not run this layout).
 */
export default async function WorkspaceLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requirePageSession(`/workspaces/${id}`);
  const target = await pageTarget();
  if (target.kind !== "found" && target.kind !== "unknown") notFound();
  return (
    <AppShell workspaceId={id} next={`/workspaces/${id}`}>
      {children}
    </AppShell>
  );
}
