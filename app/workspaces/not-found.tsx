import { NoSuchVersion } from "@/components/review/NoSuchVersion";
import { AppShell } from "@/components/shell/AppShell";
import { NoSuchSketch, NoSuchWorkspace } from "@/components/shell/NotHere";
import { WorkspaceDeleted } from "@/components/workspaces/WorkspaceDeleted";
import { pageTarget } from "@/lib/page-target";

/**
 * What the workspace layout found missing (it answers 404 before the page streams): a workspace,
 * a sketch (to a member of its workspace: who deleted it and when), or a version of a sketch, in
 * the app's frame. Nothing is drawn when nothing is missing.
 */
export default async function WorkspacesNotFound() {
  const target = await pageTarget();
  if (target.kind === "found" || target.kind === "unknown") return <NoSuchWorkspace />;
  if (target.kind === "workspace-deleted") {
    return (
      <AppShell next="/workspaces">
        <WorkspaceDeleted deleted={target.deleted} />
      </AppShell>
    );
  }
  const workspaceId = target.kind === "no-workspace" ? undefined : (target.workspaceId ?? undefined);
  return (
    <AppShell workspaceId={workspaceId} next={workspaceId ? `/workspaces/${workspaceId}` : "/workspaces"}>
      {target.kind === "no-workspace" ? (
        <NoSuchWorkspace />
      ) : target.kind === "no-sketch" ? (
        <NoSuchSketch deleted={target.deleted ?? null} />
      ) : (
        <NoSuchVersion workspaceId={target.workspaceId} sketchId={target.sketchId} sketchTitle={target.sketchTitle} latest={target.latest} asked={target.asked} here={target.here} />
      )}
    </AppShell>
  );
}
