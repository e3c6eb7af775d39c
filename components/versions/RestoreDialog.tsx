"use client";
// "Make this version the latest again": a new version on top of the latest, with an older
// version's drawing. Nothing is deleted or overwritten (the versions in between stay), and the
// sketch keeps its present name. A colleague's save in the meantime is said (409), and the
// history refreshed, so the question is asked again on top of their version.
import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button, Notice } from "@/components/shell/controls";
import { formatDateTime } from "@/components/workspaces/format";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { Dialog } from "./Dialog";
import type { VersionItem } from "./VersionHistory";

export type Restored = { number: number; restoredFrom: number; message: string; createdAt?: string };

export function RestoreDialog({
  sketchId,
  sketchTitle,
  version,
  latest,
  onClose,
  onRestored,
}: {
  sketchId: string;
  sketchTitle: string;
  /** the version to make the latest again */
  version: Pick<VersionItem, "number" | "message" | "authorName" | "createdAt">;
  latest: number;
  onClose: () => void;
  onRestored: (made: Restored) => void;
}) {
  const qc = useQueryClient();
  const [message, setMessage] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const n = version.number;
  const fallback = `Restored v${n}${version.message ? ` — ${version.message}` : ""}`;

  const restore = async () => {
    setBusy(true);
    setError(null);
    try {
      const { version: made } = await apiFetch<{ version: Restored }>(`/api/sketches/${sketchId}/versions/${n}/restore`, {
        method: "POST",
        body: { baseVersion: latest, ...(message.trim() ? { message: message.trim() } : {}) },
      });
      await qc.invalidateQueries({ queryKey: apiKey(`/api/sketches/${sketchId}`) });
      onRestored(made);
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, "network", "The app could not be reached. Check the connection and try again.");
      setError(e);
      // someone saved since: the history (and the latest number asked on top of) is brought up to date
      if (e.code === "version_conflict") void qc.invalidateQueries({ queryKey: apiKey(`/api/sketches/${sketchId}`) });
    } finally {
      setBusy(false);
    }
  };

  return (
    <Dialog open onClose={onClose} title={`Make v${n} the latest again?`} testId="restore-dialog">
      <form
        className="space-y-4 text-sm"
        onSubmit={(e) => {
          e.preventDefault();
          void restore();
        }}
      >
        <p className="text-ink">
          <strong>v{n}</strong>
          {version.message ? <> — {version.message}</> : null}
          <span className="block text-ink-soft">
            saved by {version.authorName ?? "a deleted account"}, {formatDateTime(version.createdAt)}
          </span>
        </p>
        <p className="text-ink-soft" data-testid="restore-what">
          Its drawing is saved as a new version, <strong className="text-ink">v{latest + 1}</strong>, on top of v{latest}. {latest - n === 1 ? `v${latest} stays` : `v${n + 1} to v${latest} stay`} in the history: nothing is
          deleted. The sketch keeps its name, “{sketchTitle}”. The new version starts its own sign-off.
        </p>
        <div className="space-y-1">
          <label htmlFor="restore-message" className="block font-medium text-ink">
            Why (the new version&apos;s message)
          </label>
          <textarea
            id="restore-message"
            rows={2}
            maxLength={500}
            value={message}
            autoFocus
            placeholder={fallback}
            aria-describedby="restore-message-hint"
            onChange={(e) => setMessage(e.target.value)}
            className="block w-full rounded-md border border-rule bg-paper-card px-3 py-2 text-sm text-ink outline-none placeholder:text-ink-faint focus:border-ink focus:ring-2 focus:ring-accent/25"
          />
          <p id="restore-message-hint" className="text-xs text-ink-faint">
            Left empty, the message is “{fallback}”.
          </p>
        </div>
        {error ? (
          <Notice tone="error" title={error.code === "version_conflict" ? "Someone saved a newer version" : "Nothing was saved"}>
            {error.field("message") ?? error.message}
            {error.code === "version_conflict" ? " The history is up to date now: ask again to restore on top of it." : ""}
          </Notice>
        ) : null}
        <div className="flex justify-end gap-2">
          <Button type="button" tone="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" busy={busy} data-testid="restore-confirm">
            Save as v{latest + 1}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
