"use client";
// Fork a version into a workspace where the user may fork: pick the workspace and a title.
import { useMutation, useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Button, Field, Notice, Select } from "@/components/shell/controls";
import { Dialog } from "@/components/versions/Dialog";
import { apiFetch, ApiError } from "@/lib/api-client";
import { can, type Role } from "@/lib/roles";
import { forkTitle } from "./format";

export type WorkspaceChoice = { id: string; name: string; role: Role; personal: boolean };
export type ForkResult = { sketch: { id: string; workspaceId: string; title: string; latestVersion: number } };

/** The workspaces the user may fork into (editor or owner), for the pickers. */
export function useForkTargets() {
  return useQuery({
    queryKey: ["api", "workspaces"],
    queryFn: () => apiFetch<{ workspaces: WorkspaceChoice[] }>("/api/workspaces"),
    select: (d) => d.workspaces.filter((w) => can(w.role, "sketch.fork")),
  });
}

export function ForkDialog({
  open,
  onClose,
  sketchId,
  sketchTitle,
  version,
  defaultWorkspaceId,
  onForked,
  intro,
}: {
  open: boolean;
  onClose: () => void;
  sketchId: string;
  sketchTitle: string;
  version: number;
  defaultWorkspaceId?: string;
  onForked: (made: ForkResult) => void | Promise<void>;
  intro?: string;
}) {
  const targets = useForkTargets();
  const [workspaceId, setWorkspaceId] = useState<string>("");
  const [title, setTitle] = useState(forkTitle(sketchTitle));
  const chosen = workspaceId || (targets.data?.find((w) => w.id === defaultWorkspaceId) ?? targets.data?.[0])?.id || "";
  const fork = useMutation({
    mutationFn: () => apiFetch<ForkResult>(`/api/sketches/${sketchId}/fork`, { method: "POST", body: { workspaceId: chosen, version, title: title.trim() } }),
    onSuccess: (made) => onForked(made),
  });
  const err = fork.error instanceof ApiError ? fork.error : null;
  return (
    <Dialog open={open} onClose={onClose} title={`Fork v${version} of “${sketchTitle}”`} testId="fork-dialog">
      <form
        className="space-y-4"
        onSubmit={(e) => {
          e.preventDefault();
          fork.mutate();
        }}
      >
        <p className="text-sm text-ink-soft">
          {intro ?? "A fork is a new sketch that starts from this version. The original stays as it is; the fork shows where it came from."}
        </p>
        {targets.isError ? (
          // nothing typed is lost: the dialog stays, and the list can be asked for again
          <Notice tone="error" title="Your workspaces could not be loaded">
            {targets.error instanceof ApiError ? targets.error.message : "The server did not answer."}{" "}
            <button type="button" className="font-medium underline underline-offset-2" onClick={() => void targets.refetch()}>
              Try again
            </button>
          </Notice>
        ) : targets.data && targets.data.length === 0 ? (
          <Notice tone="info">You are not an editor or owner of any workspace, so there is nowhere to fork into.</Notice>
        ) : (
          <Select id="fork-workspace" label="Into the workspace" value={chosen} onChange={(e) => setWorkspaceId(e.target.value)} disabled={!targets.data}>
            {targets.data ? null : <option value="">Loading your workspaces…</option>}
            {(targets.data ?? []).map((w) => (
              <option key={w.id} value={w.id}>
                {w.name}
                {w.personal ? " (personal)" : ""}
              </option>
            ))}
          </Select>
        )}
        <Field id="fork-title" label="Title of the fork" value={title} maxLength={120} onChange={(e) => setTitle(e.target.value)} error={err?.field("title")} />
        {err && !err.field("title") ? <Notice tone="error">{err.message}</Notice> : null}
        <div className="flex justify-end gap-2">
          <Button type="button" tone="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" busy={fork.isPending} disabled={!chosen || !title.trim()}>
            Fork
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
