"use client";
// A sketch's page: its title, tags and origin, the actions on it, and its version history.
import { useMutation, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { ActivityFeed } from "@/components/review/ActivityFeed";
import { ReviewBadge } from "@/components/review/SignOff";
import { Button, Crumb, Notice, Panel, buttonClass } from "@/components/shell/controls";
import { Dialog } from "@/components/versions/Dialog";
import { editorHref, VersionHistory, type VersionItem } from "@/components/versions/VersionHistory";
import { RestoreDialog, type Restored } from "@/components/versions/RestoreDialog";
import { formatDateTime } from "@/components/workspaces/format";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { can, type Role } from "@/lib/roles";
import type { SketchStatus } from "@/lib/sketch-schemas";
import { ForkDialog, useForkTargets } from "./ForkDialog";
import { ForkedFrom, type ForkOrigin } from "./ForkedFrom";
import { formatForceCell } from "./format";
import { useUnitsPreference } from "./useUnitsPreference";
import { SketchDetailsForm } from "./SketchDetailsForm";
import { StatusMark } from "./StatusMark";

export { ForkedFrom, type ForkOrigin };

export type SketchData = {
  sketch: {
    id: string;
    workspaceId: string;
    workspaceName: string;
    title: string;
    description: string;
    tags: string[];
    latestVersion: number;
    createdAt: string;
    createdBy: string | null;
    updatedAt: string;
    updatedBy: string | null;
    role: Role;
    forkedFrom: ForkOrigin | null;
    approvedVersion: number | null;
  };
  latest: { number: number; status: SketchStatus | null; largestReaction: number | null; warnings: string[]; message: string } | null;
};


export function SketchScreen({ initial }: { initial: SketchData }) {
  const [units] = useUnitsPreference();
  const router = useRouter();
  const path = `/api/sketches/${initial.sketch.id}`;
  const q = useQuery({ queryKey: apiKey(path), queryFn: () => apiFetch<SketchData>(path), initialData: initial });
  const { sketch, latest } = q.data;
  const role = sketch.role;
  const targets = useForkTargets();
  const canFork = (targets.data?.length ?? 0) > 0;
  const [editing, setEditing] = useState(false);
  // closed again (saved or cancelled), the keyboard goes back to "Edit details"
  const editButton = useRef<HTMLButtonElement>(null);
  const wasEditing = useRef(false);
  useEffect(() => {
    if (wasEditing.current && !editing) editButton.current?.focus();
    wasEditing.current = editing;
  }, [editing]);
  const [forking, setForking] = useState<number | null>(null);
  const [deleting, setDeleting] = useState(false);
  const [restoring, setRestoring] = useState<VersionItem | null>(null);
  const [restored, setRestored] = useState<Restored | null>(null);
  const base = `/workspaces/${sketch.workspaceId}/sketches/${sketch.id}`;

  const remove = useMutation({
    mutationFn: () => apiFetch(path, { method: "DELETE" }),
    onSuccess: () => {
      router.push(`/workspaces/${sketch.workspaceId}`);
      router.refresh();
    },
  });

  // deleted (or the reader removed from the workspace) since the page was opened: say so in the
  // server's words (to a member, who deleted it and when) and offer nothing more to do on it
  const gone = q.error instanceof ApiError && q.error.status === 404 ? q.error : null;
  if (gone)
    return (
      <div className="space-y-6">
        <div className="space-y-2">
          <Crumb href={`/workspaces/${sketch.workspaceId}`} parent={sketch.workspaceName} here="Sketch" />
          <h1 className="text-2xl font-semibold tracking-tight">{sketch.title}</h1>
        </div>
        <div data-testid="sketch-gone">
          <Notice tone="error" title="This sketch is no longer here">
            <p>{gone.message}</p>
            <p className="mt-2">
              <Link href={`/workspaces/${sketch.workspaceId}`} className="font-medium underline underline-offset-2">
                Back to {sketch.workspaceName}
              </Link>
            </p>
          </Notice>
        </div>
      </div>
    );

  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <Crumb href={`/workspaces/${sketch.workspaceId}`} parent={sketch.workspaceName} here="Sketch" />
        <div className="flex flex-wrap items-start justify-between gap-4">
          <div className="min-w-0 space-y-1.5">
            <h1 className="text-2xl font-semibold tracking-tight">{sketch.title}</h1>
            {latest ? (
              <p className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-ink-soft" data-testid="latest-summary">
                <span>Latest: v{latest.number}</span>
                <StatusMark status={latest.status} warnings={latest.warnings} />
                <span>largest reaction {formatForceCell(latest.largestReaction, units)}</span>
                {sketch.approvedVersion ? (
                  <Link href={`${base}/versions/${sketch.approvedVersion}`} className="font-medium text-reaction underline decoration-reaction/40 underline-offset-2" data-testid="approved-version">
                    ✓✓ v{sketch.approvedVersion} approved
                  </Link>
                ) : null}
              </p>
            ) : null}
            {sketch.forkedFrom ? <ForkedFrom origin={sketch.forkedFrom} /> : null}
          </div>
          <div className="flex flex-wrap gap-2">
            <Link href={editorHref(sketch.id, sketch.latestVersion, sketch.latestVersion)} className={buttonClass()}>
              {can(role, "version.save") ? "Open in the editor" : "Open (read only)"}
            </Link>
            {canFork ? (
              <Button tone="secondary" onClick={() => setForking(sketch.latestVersion)}>
                Fork
              </Button>
            ) : null}
            {can(role, "sketch.edit") && !editing ? (
              <Button ref={editButton} tone="secondary" onClick={() => setEditing(true)}>
                Edit details
              </Button>
            ) : null}
            {can(role, "sketch.delete") ? (
              <Button tone="danger" onClick={() => setDeleting(true)}>
                Delete
              </Button>
            ) : null}
          </div>
        </div>
        {sketch.description && !editing ? <p className="max-w-3xl whitespace-pre-line text-sm text-ink-soft">{sketch.description}</p> : null}
        {sketch.tags.length && !editing ? (
          <ul className="flex flex-wrap gap-1" aria-label="Tags">
            {sketch.tags.map((t) => (
              <li key={t} className="rounded border border-rule bg-paper-deep/60 px-1.5 py-0.5 text-xs text-ink-soft">
                {t}
              </li>
            ))}
          </ul>
        ) : null}
        <p className="text-xs text-ink-faint">
          Created {formatDateTime(sketch.createdAt)}
          {sketch.createdBy ? ` by ${sketch.createdBy}` : ""} · updated {formatDateTime(sketch.updatedAt)}
          {sketch.updatedBy ? ` by ${sketch.updatedBy}` : ""}
        </p>
      </div>

      {editing ? (
        <Panel title="Details">
          <SketchDetailsForm sketchId={sketch.id} title={sketch.title} description={sketch.description} tags={sketch.tags} onDone={() => setEditing(false)} />
        </Panel>
      ) : null}

      <Panel title="History" description="Every saved version, newest first. Saved versions never change; a new save makes a new version.">
        <VersionHistory
          sketchId={sketch.id}
          latest={sketch.latestVersion}
          canFork={canFork}
          onFork={setForking}
          reviewCell={(v) => <ReviewBadge state={v.reviewState} />}
          reviewHref={(n) => `${base}/versions/${n}`}
          compareHref={(a, b) => `${base}/compare?from=${a}&to=${b}`}
          onRestore={can(role, "version.save") ? setRestoring : undefined}
        />
        {restored ? (
          <div className="pt-3" data-testid="restored-notice">
            <Notice tone="success">
              Saved v{restored.number} with the drawing of v{restored.restoredFrom}: it is the latest version now.{" "}
              <Link href={`${base}/compare?from=${restored.number - 1}&to=${restored.number}`} className="font-medium underline underline-offset-2">
                What it changed from v{restored.number - 1}
              </Link>
            </Notice>
          </div>
        ) : null}
      </Panel>
      <Panel title="Activity" description="Saves, forks, comments and sign-off steps, newest first.">
        <ActivityFeed sketchId={sketch.id} />
      </Panel>

      {forking !== null ? (
        <ForkDialog
          open
          onClose={() => setForking(null)}
          sketchId={sketch.id}
          sketchTitle={sketch.title}
          version={forking}
          defaultWorkspaceId={sketch.workspaceId}
          onForked={(made) => router.push(`/workspaces/${made.sketch.workspaceId}/sketches/${made.sketch.id}`)}
        />
      ) : null}
      {restoring ? (
        <RestoreDialog
          sketchId={sketch.id}
          sketchTitle={sketch.title}
          version={restoring}
          latest={sketch.latestVersion}
          onClose={() => setRestoring(null)}
          onRestored={(made) => {
            setRestoring(null);
            setRestored(made);
          }}
        />
      ) : null}
      <Dialog open={deleting} onClose={() => setDeleting(false)} title={`Delete “${sketch.title}”?`} testId="delete-dialog">
        <div className="space-y-4 text-sm">
          <p className="text-ink-soft">
            {sketch.latestVersion === 1 ? "Its one version goes" : `All ${sketch.latestVersion} versions go`} with it, for everyone in {sketch.workspaceName}
            {sketch.approvedVersion ? ` — v${sketch.approvedVersion}, the approved version, and its sign-off record too` : ""}. Forks keep their own copies. This cannot be undone.
          </p>
          {remove.error ? <Notice tone="error">{remove.error instanceof ApiError ? remove.error.message : "Nothing was deleted."}</Notice> : null}
          <div className="flex justify-end gap-2">
            <Button tone="quiet" onClick={() => setDeleting(false)}>
              Keep it
            </Button>
            <Button tone="danger" busy={remove.isPending} onClick={() => remove.mutate()}>
              Delete the sketch
            </Button>
          </div>
        </div>
      </Dialog>
    </div>
  );
}
