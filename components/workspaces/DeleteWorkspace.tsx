"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button, Field } from "@/components/shell/controls";
import { Dialog } from "@/components/versions/Dialog";
import { apiFetch, ApiError } from "@/lib/api-client";
import { ExportLink } from "./ExportWorkspace";
import { nameConfirms } from "./format";

export type DeletionContents = { sketches: number; versions: number; approved: number; comments: number; uploads: number; members: number };

const counted = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** What goes with the workspace, in one sentence per kind that has any. */
export function whatGoes(c: DeletionContents): string[] {
  const lines: string[] = [];
  if (c.sketches) lines.push(`${counted(c.sketches, "sketch", "sketches")} with ${counted(c.versions, "version", "versions")}${c.approved ? `, ${counted(c.approved, "of them approved", "of them approved")}, with their sign-off records` : ""}`);
  if (c.comments) lines.push(counted(c.comments, "comment", "comments"));
  if (c.uploads) lines.push(`${counted(c.uploads, "uploaded file", "uploaded files")} (drawings traced over, attachments)`);
  const others = c.members - 1;
  if (others > 0) lines.push(`the membership of ${counted(others, "other person", "other people")}, who will be told by mail`);
  return lines;
}

/**
 * Owners delete the workspace: at once and for good (no grace period: the server deletes the
 * sketches and files in the same request, and only the audit record stays). So the dialog says
 * that first, then what goes, offers the workspace's export right there, and asks for the
 * workspace's name typed again (the button waits for it; the server checks it too).
 */
export function DeleteWorkspace({ workspaceId, name, contents }: { workspaceId: string; name: string; contents: DeletionContents }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [typed, setTyped] = useState("");
  const [error, setError] = useState<string | undefined>();
  const remove = useMutation({
    mutationFn: () => apiFetch(`/api/workspaces/${workspaceId}`, { method: "DELETE", body: { confirmName: typed } }),
    onSuccess: () => router.push(`/workspaces?deleted=${workspaceId}`),
    onError: (err) => setError(err instanceof ApiError ? (err.field("confirmName") ?? err.message) : "Nothing was deleted: the server could not be reached."),
  });
  const goes = whatGoes(contents);
  const matches = nameConfirms(typed, name);
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    if (!matches) {
      setError(`Type “${name}” to confirm.`);
      return;
    }
    setError(undefined);
    remove.mutate();
  }
  return (
    <div className="space-y-2 border-t border-rule-soft pt-4">
      <h3 className="text-sm font-semibold text-ink">Delete this workspace</h3>
      <p className="text-sm text-ink-soft">Everything in it goes at once, for everyone, and cannot be brought back.</p>
      <Button tone="danger" onClick={() => setOpen(true)} data-testid="delete-workspace">
        Delete workspace…
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} title={`Delete “${name}”?`} testId="delete-workspace-dialog" wide>
        <form onSubmit={onSubmit} className="space-y-4 text-sm" noValidate>
          <p className="font-medium text-ink" data-testid="delete-workspace-final">
            This happens at once and cannot be undone: there is no bin to restore it from, for you or anyone else.
          </p>
          {goes.length ? (
            <div>
              <p className="text-ink">These go with it:</p>
              <ul className="mt-1 list-disc space-y-0.5 pl-5 text-ink-soft" data-testid="delete-workspace-contents">
                {goes.map((line) => (
                  <li key={line}>{line}</li>
                ))}
              </ul>
            </div>
          ) : (
            <p className="text-ink-soft">It holds no sketches, comments or files.</p>
          )}
          {contents.sketches ? (
            <section aria-labelledby="delete-workspace-copy" className="space-y-2 rounded-md border border-rule-soft px-3.5 py-3" data-testid="delete-workspace-copy">
              <h4 id="delete-workspace-copy" className="font-semibold text-ink">
                Keep a copy first
              </h4>
              <p className="text-ink-soft">Download every sketch, the latest version of each, in one JSON file that opens again with File › Import JSON. For a version you must keep as issued, download its calc sheet (PDF) from its version page.{contents.uploads ? " Uploaded files are not in the JSON file." : ""}</p>
              <ExportLink workspaceId={workspaceId} />
            </section>
          ) : null}
          <p className="text-ink-soft">The audit log keeps a record that you deleted it and what it held. Links to its sketches will say they were deleted.</p>
          <Field
            id="delete-workspace-name"
            label={`Type the workspace’s name, “${name}”, to confirm`}
            value={typed}
            autoComplete="off"
            spellCheck={false}
            onChange={(e) => {
              setTyped(e.target.value);
              setError(undefined);
            }}
            error={error}
          />
          <div className="flex justify-end gap-2">
            <Button type="button" tone="quiet" onClick={() => setOpen(false)}>
              Keep it
            </Button>
            <Button type="submit" tone="danger" busy={remove.isPending}>
              Delete the workspace
            </Button>
          </div>
        </form>
      </Dialog>
    </div>
  );
}
