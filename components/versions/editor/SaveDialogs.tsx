"use client";
// The editor's save dialog (a message for the new version) and the conflict dialog (someone
// saved since: save as a fork, or keep the work here, reload the latest and compare).
import { useState } from "react";
import { ForkDialog, type ForkResult } from "@/components/sketches/ForkDialog";
import { formatDateTime } from "@/components/workspaces/format";
import { inputErrorsInWords, refusedInWords } from "@/components/results/errorPlace";
import { Button, Notice } from "@/components/shell/controls";
import { apiFetch, ApiError } from "@/lib/api-client";
import type { SketchFile } from "@/solver/schema";
import { Dialog } from "../Dialog";

/** `byYou`: the newer version is the user's own save, from another tab or window (or a script). */
export type LatestVersion = { number: number; message: string; authorName: string | null; createdAt: string; byYou?: boolean };
/** `sketchTitle`: the sketch's name after the save (it follows the drawing's title when that changed). */
export type SavedVersion = { number: number; createdAt: string; sketchTitle?: string };

export function saveVersionRequest(sketchId: string, baseVersion: number, message: string, document: SketchFile) {
  return apiFetch<{ version: SavedVersion }>(`/api/sketches/${sketchId}/versions`, { method: "POST", body: { baseVersion, message, document } });
}

/** Field errors of a refused sketch, as lines people can read: "Inlet p1 — area: must be more than
 *  zero", the element and field in the editor's words (`sketch`: the document that was sent). */
export function problemLines(err: ApiError, sketch: SketchFile | null = null): string[] {
  return refusedInWords(sketch, err.fields.slice(0, 6));
}

export function SaveDialog({
  open,
  base,
  latest = base,
  title,
  busy,
  error,
  sketch = null,
  inputErrors = null,
  reviewNote = null,
  onSave,
  onCancel,
}: {
  open: boolean;
  base: number;
  /** the sketch's newest version: newer than `base` when an older version was opened */
  latest?: number;
  title: string;
  busy: boolean;
  error: ApiError | null;
  /** the document being saved: a refusal names its elements in words */
  sketch?: SketchFile | null;
  /** the sketch's input errors as the editor has them (`inputErrorsInWords`), said before saving */
  inputErrors?: ReturnType<typeof inputErrorsInWords>;
  /** what the sign-off of v{base} means for the new version (`reviewNote`), when it is under review or approved */
  reviewNote?: string | null;
  onSave: (message: string) => void;
  onCancel: () => void;
}) {
  const [message, setMessage] = useState("");
  return (
    <Dialog open={open} onClose={onCancel} title={latest > base ? `Save your changes to v${base} of “${title}”` : `Save version ${base + 1} of “${title}”`} testId="save-dialog">
      <form
        className="space-y-4"
        onSubmit={(e) => {
          e.preventDefault();
          onSave(message.trim());
        }}
      >
        {latest > base ? (
          <p className="rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-sm text-ink" data-testid="save-older">
            You opened v{base}, and v{latest} is newer: a version goes on top of the newest only. Saving asks you next whether to fork a new sketch from your changes or to bring them onto v{latest}.
          </p>
        ) : null}
        {reviewNote ? (
          <p className="rounded-md border border-ink/20 bg-paper-card px-3 py-2 text-sm text-ink" data-testid="save-review-note">
            {reviewNote}
          </p>
        ) : null}
        {inputErrors && !error ? (
          // the server refuses a sketch with input errors: said before the message is written, not after
          <p className="rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-sm text-ink" data-testid="save-input-errors">
            This sketch has {inputErrors.words}. A version is saved only without input errors: fix {inputErrors.count === 1 ? "it" : "them"} first, or the save is refused.
          </p>
        ) : null}
        <p className="text-sm text-ink-soft">
          The new version goes on top of v{base}. Saved versions never change, so say what this one changes: the checker reads it in the history.
        </p>
        <div className="space-y-1">
          <label htmlFor="version-message" className="block text-sm font-medium text-ink">
            What changed
          </label>
          <textarea
            id="version-message"
            rows={3}
            maxLength={500}
            value={message}
            autoFocus
            placeholder="e.g. moved the anchor 0.3 m east"
            onChange={(e) => setMessage(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === "Enter" && (e.metaKey || e.ctrlKey)) onSave(message.trim());
            }}
            className="block w-full rounded-md border border-rule bg-paper-card px-3 py-2 text-sm text-ink outline-none placeholder:text-ink-faint focus:border-ink focus:ring-2 focus:ring-accent/25"
          />
        </div>
        {error ? (
          <Notice tone="error" title={error.fields.length ? "The sketch was not saved: some fields are not valid" : "The sketch was not saved"}>
            {error.fields.length ? (
              <ul className="list-disc pl-4">
                {problemLines(error, sketch).map((l) => (
                  <li key={l}>{l}</li>
                ))}
              </ul>
            ) : (
              error.message
            )}
          </Notice>
        ) : null}
        <div className="flex justify-end gap-2">
          <Button type="button" tone="quiet" onClick={onCancel}>
            Cancel
          </Button>
          {/* on an older version the save makes no v{base + 1} (it exists): the next question decides */}
          <Button type="submit" busy={busy}>
            {latest > base ? "Choose how to save…" : `Save v${base + 1}`}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

export function ConflictDialog({
  open,
  base,
  latest,
  onFork,
  onStay,
  staying = false,
  stayError = null,
  compareHref,
  onCompare,
  onReload,
  onKeepEditing,
}: {
  open: boolean;
  base: number;
  latest: LatestVersion;
  onFork: () => void;
  /** stay in this editor and merge v{latest} into the changes (nothing saved, nothing lost) */
  onStay: () => void;
  staying?: boolean;
  /** why the merge could not be made (nothing here changed) */
  stayError?: string | null;
  /** the comparison of v{latest} with the changes, opened in a new tab while this one stays */
  compareHref: string;
  /** before the comparison opens: the changes are kept where it reads them */
  onCompare: () => void;
  onReload: () => void;
  onKeepEditing: () => void;
}) {
  return (
    <Dialog open={open} onClose={onKeepEditing} title={latest.byYou ? "You saved a newer version elsewhere" : "Someone saved a newer version"} testId="conflict-dialog" wide>
      <div className="space-y-4 text-sm">
        <p className="text-ink">
          {latest.byYou ? (
            // the user's own save: their own name here would read as a colleague's
            <>
              You saved <strong>v{latest.number}</strong> on {formatDateTime(latest.createdAt)} in another tab or window (or a script did, signed in as you), after v{base} was
              opened here
            </>
          ) : (
            <>
              <strong>{latest.authorName ?? "Someone"}</strong> saved <strong>v{latest.number}</strong> on {formatDateTime(latest.createdAt)}, after you opened v{base}
            </>
          )}
          {latest.message ? (
            <>
              : <q>{latest.message}</q>
            </>
          ) : null}
          .
        </p>
        <p className="text-ink-soft">Nothing was overwritten, and your changes are still here. Choose what to do with them:</p>
        <ul className="space-y-3">
          <li className="rounded-md border border-rule p-3">
            <Button onClick={onFork}>Save as a fork</Button>
            <p className="mt-1.5 text-ink-soft">A new sketch that starts from v{base} and saves your changes as its next version. This sketch stays as it is.</p>
          </li>
          <li className="rounded-md border border-rule p-3" data-testid="conflict-stay">
            <div className="flex flex-wrap items-center gap-x-3 gap-y-2">
              <Button tone="secondary" onClick={onStay} busy={staying}>
                Stay and bring v{latest.number} in
              </Button>
              <a
                href={compareHref}
                target="_blank"
                rel="noopener"
                onClick={onCompare}
                className="rounded font-medium text-ink underline decoration-ink/30 underline-offset-2 outline-none hover:decoration-ink focus-visible:ring-2 focus-visible:ring-accent/40"
              >
                Compare v{latest.number} with my changes <span className="sr-only">(opens in a new tab)</span>
                <span aria-hidden="true"> ↗</span>
              </a>
            </div>
            <p className="mt-1.5 text-ink-soft">
              You stay here with everything you typed: what v{latest.number} changed since v{base} is merged into your changes (where you both changed a field, yours is kept and named), and the next save goes on top of v{latest.number}. Nothing is saved until you save; Undo takes the merge back out. The comparison opens beside this tab and changes nothing here.
            </p>
            {stayError ? (
              <div className="mt-2" role="alert">
                <Notice tone="error">{stayError}</Notice>
              </div>
            ) : null}
          </li>
          <li className="rounded-md border border-rule p-3">
            <Button tone="secondary" onClick={onReload}>
              Reload and compare
            </Button>
            <p className="mt-1.5 text-ink-soft">Your changes are kept in this browser; the editor opens v{latest.number}, and you can compare the two and bring your changes back on top.</p>
          </li>
        </ul>
        <div className="flex justify-end">
          <Button tone="quiet" onClick={onKeepEditing}>
            Keep editing without saving
          </Button>
        </div>
      </div>
    </Dialog>
  );
}

/** Fork the version the edits started from, then save the edits as the fork's v2. */
export function ForkAndSave({
  open,
  sketchId,
  title,
  base,
  sketch,
  message,
  defaultWorkspaceId,
  onClose,
  onDone,
}: {
  open: boolean;
  sketchId: string;
  title: string;
  base: number;
  sketch: SketchFile;
  message: string;
  defaultWorkspaceId: string;
  onClose: () => void;
  onDone: (made: ForkResult, version: SavedVersion) => void;
}) {
  const [error, setError] = useState<string | null>(null);
  return (
    <>
      <ForkDialog
        open={open}
        onClose={onClose}
        sketchId={sketchId}
        sketchTitle={title}
        version={base}
        defaultWorkspaceId={defaultWorkspaceId}
        intro={`The fork starts from v${base}, the version your changes were made on, and your changes become its v2. This sketch stays as it is.`}
        onForked={async (made) => {
          try {
            // under the name just given to the fork (the drawing's title names the sketch)
            const saved = await saveVersionRequest(made.sketch.id, 1, message || "My changes, saved as a fork after a conflict", { ...sketch, title: made.sketch.title });
            onDone(made, saved.version);
          } catch (err) {
            setError(`The fork was made, but your changes could not be saved into it: ${err instanceof ApiError ? err.message : "try again"}. They are still in the editor.`);
          }
        }}
      />
      {error ? (
        <Dialog open onClose={() => setError(null)} title="Your changes are still here">
          <Notice tone="error">{error}</Notice>
        </Dialog>
      ) : null}
    </>
  );
}
