"use client";
// Save the scratch sketch of /sketches/new into a workspace: signed in, pick the workspace (one
// where you may create sketches), a title and a message; signed out, sign in first (the
// scratch sketch waits in this browser) and come back with the dialog open.
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { useStores } from "@/canvas/context";
import { SCRATCH_KEY, scratchPersistence, type SketchPersistence } from "@/canvas/persistence";
import { useForkTargets } from "@/components/sketches/ForkDialog";
import { Button, Field, Notice, Select } from "@/components/shell/controls";
import { Providers } from "@/components/shell/Providers";
import { apiFetch, ApiError } from "@/lib/api-client";
import { withNext } from "@/components/auth/nextPath";
import { Dialog } from "../Dialog";
import { problemLines } from "./SaveDialogs";
import { NarrowLabel } from "@/components/editor/NarrowLabel";

type Created = { sketch: { id: string; workspaceId: string; title: string } };

type StorageLike = { getItem(key: string): string | null; setItem(key: string, value: string): void; removeItem(key: string): void };

/**
 * The scratch sketch of /sketches/new, and `forget`: once it is saved to a workspace (that save
 * succeeded; not a failed or cancelled one) its copy in this browser goes, and this page keeps
 * nothing more (not even a last autosave as the page is left), so the next "Start a sketch"
 * opens an empty sketch rather than the one now saved. Unsaved work stays for the next visit.
 */
export function savableScratch(storage: StorageLike | null = typeof window !== "undefined" ? window.localStorage : null, key = SCRATCH_KEY): { persistence: SketchPersistence; forget: () => void } {
  const inner = scratchPersistence(storage, key);
  let saved = false;
  const persistence: SketchPersistence = {
    ...inner,
    save: (sketch, opts) => (saved ? Promise.resolve({ ok: true, savedAt: new Date().toISOString() }) : inner.save(sketch, opts)),
  };
  return {
    persistence,
    forget: () => {
      saved = true;
      try {
        storage?.removeItem(key);
      } catch {
        // a browser that will not let go of it: the next visit shows it, as before
      }
    },
  };
}

function SaveToWorkspace({ onClose, onSaved }: { onClose: () => void; onSaved?: () => void }) {
  const stores = useStores();
  const router = useRouter();
  const params = useSearchParams();
  const targets = useForkTargets();
  const sketch = stores.editor.getState().sketch;
  const [workspaceId, setWorkspaceId] = useState(params.get("workspace") ?? "");
  const [title, setTitle] = useState(sketch.title?.trim() || "Untitled sketch");
  const [message, setMessage] = useState("First version");
  const chosen = targets.data?.some((w) => w.id === workspaceId) ? workspaceId : (targets.data?.[0]?.id ?? "");
  const create = useMutation({
    mutationFn: () =>
      apiFetch<Created>(`/api/workspaces/${chosen}/sketches`, {
        method: "POST",
        // the drawing carries the name given here (the editor, the calc sheet and the listings agree)
        body: { title: title.trim(), message: message.trim(), document: { ...stores.editor.getState().sketch, title: title.trim() } },
      }),
    onSuccess: (made) => {
      // it is in the workspace now: the copy kept in this browser goes
      onSaved?.();
      router.push(`/sketches/${made.sketch.id}`);
    },
  });
  const signedOut = targets.error instanceof ApiError && targets.error.status === 401;
  const err = create.error instanceof ApiError ? create.error : null;

  // back here with the dialog open (and the workspace asked for, if one was) after signing in,
  // or after creating an account, confirming it and signing in
  const workspace = params.get("workspace");
  const back = `/sketches/new?save=1${workspace ? `&workspace=${encodeURIComponent(workspace)}` : ""}`;

  if (targets.isPending) {
    // nothing to choose yet, nor known whether there is anyone to choose for: no form until then
    return (
      <Dialog open onClose={onClose} title="Save to a workspace" testId="scratch-save-dialog">
        <div className="space-y-4 text-sm">
          <p role="status" className="text-ink-soft" data-testid="scratch-save-finding">
            Finding your workspaces…
          </p>
          <div className="flex justify-end">
            <Button tone="quiet" onClick={onClose}>
              Cancel
            </Button>
          </div>
        </div>
      </Dialog>
    );
  }
  if (signedOut) {
    return (
      <Dialog open onClose={onClose} title="Sign in to save this sketch" testId="scratch-save-dialog">
        <div className="space-y-4 text-sm">
          <p className="text-ink-soft">Saved sketches live in a workspace, with versions your colleagues can check. Your sketch stays in this browser while you sign in or create an account.</p>
          <div className="flex flex-wrap items-center justify-end gap-2">
            <Button tone="quiet" onClick={onClose}>
              Not now
            </Button>
            <Link href={withNext("/sign-up", back)} className="rounded-md px-4 py-2 font-medium text-ink underline decoration-rule underline-offset-2 hover:text-ink-soft">
              Create an account
            </Link>
            <Link href={withNext("/sign-in", back)} className="rounded-md bg-ink px-4 py-2 font-medium text-paper hover:bg-ink-soft">
              Sign in
            </Link>
          </div>
        </div>
      </Dialog>
    );
  }
  if (targets.isError) {
    // the workspaces could not be read (the server or the connection): say so, and offer it again
    return (
      <Dialog open onClose={onClose} title="Save to a workspace" testId="scratch-save-dialog">
        <div className="space-y-4 text-sm">
          <Notice tone="error" title="Your workspaces could not be loaded">
            {targets.error instanceof ApiError ? targets.error.message : "The server did not answer."} Your sketch stays in this browser.
          </Notice>
          <div className="flex justify-end gap-2">
            <Button tone="quiet" onClick={onClose}>
              Cancel
            </Button>
            <Button onClick={() => void targets.refetch()} busy={targets.isFetching}>
              Try again
            </Button>
          </div>
        </div>
      </Dialog>
    );
  }
  return (
    <Dialog open onClose={onClose} title="Save to a workspace" testId="scratch-save-dialog">
      <form
        className="space-y-4"
        onSubmit={(e) => {
          e.preventDefault();
          create.mutate();
        }}
      >
        {targets.data && targets.data.length === 0 ? (
          <Notice tone="info">
            You are not an editor or owner of any workspace yet. Create one from{" "}
            <Link href="/workspaces" className="font-semibold underline underline-offset-2">
              your workspaces page
            </Link>
            .
          </Notice>
        ) : (
          <Select id="save-workspace" label="Workspace" value={chosen} onChange={(e) => setWorkspaceId(e.target.value)} disabled={!targets.data}>
            {(targets.data ?? []).map((w) => (
              <option key={w.id} value={w.id}>
                {w.name}
                {w.personal ? " (personal)" : ""}
              </option>
            ))}
          </Select>
        )}
        <Field id="save-title" label="Title" value={title} maxLength={120} onChange={(e) => setTitle(e.target.value)} error={err?.field("title")} />
        <Field id="save-message" label="Message of version 1" value={message} maxLength={500} onChange={(e) => setMessage(e.target.value)} error={err?.field("message")} />
        {err && !err.field("title") && !err.field("message") ? (
          <Notice tone="error" title="The sketch was not saved">
            {err.fields.length ? problemLines(err, sketch).join("; ") : err.message}
          </Notice>
        ) : null}
        <div className="flex justify-end gap-2">
          <Button type="button" tone="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" busy={create.isPending} disabled={!chosen}>
            Save as version 1
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

function ScratchSaveButton({ onSaved }: { onSaved?: () => void }) {
  const params = useSearchParams();
  const [open, setOpen] = useState(params.get("save") === "1");
  return (
    <div className="ml-3">
      <button type="button" onClick={() => setOpen(true)} className="h-7 whitespace-nowrap rounded bg-ink px-2.5 text-[12.5px] font-medium text-paper hover:bg-ink-soft pointer-coarse:h-10" data-testid="save-to-workspace" aria-label="Save to a workspace">
        <NarrowLabel full="Save to a workspace" short="Save…" />
      </button>
      {open ? <SaveToWorkspace onClose={() => setOpen(false)} onSaved={onSaved} /> : null}
    </div>
  );
}

/** The scratch sketch's corner of the editor's toolbar; `onSaved`: once it is saved to a workspace (see `savableScratch`). */
export function ScratchSave({ onSaved }: { onSaved?: () => void } = {}) {
  return (
    <Providers>
      <ScratchSaveButton onSaved={onSaved} />
    </Providers>
  );
}
