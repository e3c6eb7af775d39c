"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { useFocusFirstError } from "@/components/shell/useFocusFirstError";
import { apiFetch, ApiError } from "@/lib/api-client";
import { workspaceNameSchema } from "@/lib/schemas";

/** A workspace name field whose refusal takes the keyboard to it (`id` is the input's). */
function useNameField(id: string, initial = "") {
  const [name, setName] = useState(initial);
  const [refusal, setRefusal] = useState<{ name?: string }>({});
  useFocusFirstError(refusal, () => id);
  const setError = (message: string | undefined) => setRefusal({ name: message });
  const check = () => {
    const parsed = workspaceNameSchema.safeParse(name);
    setError(parsed.error?.issues[0]?.message);
    return parsed.success ? parsed.data : null;
  };
  return { name, setName, error: refusal.name, setError, check };
}

/** A new shared workspace; the creator is its owner. */
export function CreateWorkspaceForm() {
  const router = useRouter();
  const f = useNameField("workspace-name");
  const create = useMutation({
    mutationFn: (name: string) => apiFetch<{ workspace: { id: string } }>("/api/workspaces", { method: "POST", body: { name } }),
    onSuccess: (r) => router.push(`/workspaces/${r.workspace.id}/members`),
    onError: (err) => f.setError(err instanceof ApiError ? (err.field("name") ?? err.message) : "The workspace was not created."),
  });
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const name = f.check();
    if (name) create.mutate(name);
  }
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-3 sm:flex-row sm:items-start" noValidate>
      <div className="flex-1">
        <Field id="workspace-name" label="Name" placeholder="e.g. Booster Station 4 upgrade" value={f.name} onChange={(e) => f.setName(e.target.value)} error={f.error} />
      </div>
      <div className="sm:pt-6">
        <Button type="submit" busy={create.isPending}>
          Create workspace
        </Button>
      </div>
    </form>
  );
}

/** Owners rename the workspace. */
export function RenameWorkspaceForm({ workspaceId, name }: { workspaceId: string; name: string }) {
  const router = useRouter();
  const f = useNameField("rename", name);
  const rename = useMutation({
    mutationFn: (next: string) => apiFetch(`/api/workspaces/${workspaceId}`, { method: "PATCH", body: { name: next } }),
    onSuccess: () => router.refresh(),
    onError: (err) => f.setError(err instanceof ApiError ? (err.field("name") ?? err.message) : "The name was not changed."),
  });
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const next = f.check();
    if (next) rename.mutate(next);
  }
  return (
    <form onSubmit={onSubmit} className="space-y-3" noValidate>
      {rename.isSuccess ? <Notice tone="success">Renamed.</Notice> : null}
      <Field id="rename" label="Workspace name" value={f.name} onChange={(e) => f.setName(e.target.value)} error={f.error} />
      <Button type="submit" tone="secondary" busy={rename.isPending} disabled={f.name.trim() === name}>
        Rename
      </Button>
    </form>
  );
}
