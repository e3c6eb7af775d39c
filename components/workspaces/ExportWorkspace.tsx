"use client";
// The owners' download of every sketch in the workspace (the latest version of each) as one JSON
// file, fetched first (components/shell/download.ts) so a failure is said here in words; without
// JavaScript the plain link downloads it (the route answers it as an attachment). The server
// streams it; one that breaks off part-way is not saved.
import { useState } from "react";
import { fetchAndSave, serverMessage, useFetchOnClick } from "@/components/shell/download";

/** The words for an export that could not be had. */
export function exportFailure(status: number, body: string, brokeOff = false): string {
  if (brokeOff) return "Nothing was saved: the download broke off part-way, and a part of the file would not open. Try again.";
  if (status === 0) return "Nothing was downloaded: the app could not be reached. Check the connection and try again.";
  if (status === 401) return "Nothing was downloaded: your session has ended. Sign in again, then ask again.";
  return `Nothing was downloaded (the server answered ${status}): ${serverMessage(body) ?? "the export could not be made."}${status >= 500 ? " Try again in a moment." : ""}`;
}

/**
 * The download link with what came of it under it: fetched first, so a refusal, an unreachable app
 * or a download that broke off is said here in words and nothing is saved.
 */
export function ExportLink({ workspaceId, label = "Download all sketches (JSON)" }: { workspaceId: string; label?: string }) {
  const href = `/api/workspaces/${workspaceId}/export`;
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { busy, onClick } = useFetchOnClick(async () => {
    setError(null);
    setDone(null);
    const got = await fetchAndSave(href, "workspace-sketches.json", (res) => res.headers.get("content-disposition") !== null);
    if (got.ok) setDone(`Downloaded ${got.name}.`);
    else setError(exportFailure(got.status, got.body, got.brokeOff));
  });
  return (
    <div className="space-y-2">
      <a
        href={href}
        onClick={onClick}
        aria-busy={busy || undefined}
        className="inline-flex items-center rounded-md border border-ink/25 px-3 py-1.5 font-medium text-ink hover:border-ink/50 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-accent"
      >
        {busy ? "Preparing the file…" : label}
      </a>
      {error ? (
        <p role="alert" className="text-sm font-medium text-accent-deep">
          {error}
        </p>
      ) : null}
      {done ? (
        <p role="status" className="text-xs text-ink-soft">
          {done}
        </p>
      ) : null}
    </div>
  );
}

export function ExportWorkspace({ workspaceId, sketches }: { workspaceId: string; sketches: number }) {
  return (
    <div className="mt-6 space-y-2 border-t border-rule-soft pt-4 text-sm" data-testid="export-workspace">
      <h3 className="font-medium text-ink">Export the sketches</h3>
      <p className="text-ink-soft">
        {sketches === 0
          ? "There are no sketches to export yet."
          : `All ${sketches === 1 ? "1 sketch" : `${sketches} sketches`}, the latest version of each, in one JSON file. Each sketch's drawing opens again with File › Import JSON.`}
      </p>
      {sketches > 0 ? <ExportLink workspaceId={workspaceId} /> : null}
    </div>
  );
}
