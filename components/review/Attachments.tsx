"use client";
// Files on comments: thumbnails that open the whole file (served only to readers of the
// workspace), a picker for the files of a comment being written, and sending them once the
// comment exists. A PDF is downloaded whole; its thumbnail is its first page.
import { useEffect, useRef, useState } from "react";
import { ACCEPT_UPLOADS, MAX_UPLOAD_BYTES, uploadFile } from "@/components/uploads/uploadFile";
import { apiFetch } from "@/lib/api-client";

export type Attachment = { id: string; name: string; storedType: string; sourceType: string; size: number; width: number; height: number; url: string; thumbnailUrl: string };

export function sizeWords(bytes: number): string {
  return bytes >= 1048576 ? `${(bytes / 1048576).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

/** The thumbnails of a comment's files: an image opens whole in a new tab, a PDF downloads. */
export function AttachmentList({ files, onRemove }: { files: Attachment[]; onRemove?: (a: Attachment) => void }) {
  if (!files.length) return null;
  return (
    <ul className="flex flex-wrap gap-2 pt-0.5" aria-label="Attached files" data-testid="attachments">
      {files.map((a) => (
        <li key={a.id} className="group relative w-[104px]" data-testid="attachment">
          <a
            href={a.url}
            // the server hands a PDF over as a download (never shown in the app's origin), under the
            // name it gives it (lib/uploads/names.ts: ending in .pdf even when uploaded without)
            {...(a.storedType === "application/pdf" ? { download: true } : { target: "_blank", rel: "noopener" })}
            className="block overflow-hidden rounded border border-rule bg-paper-card hover:border-ink/40 focus-visible:outline-2 focus-visible:outline-accent"
            title={a.storedType === "application/pdf" ? `Download ${a.name || "the file"} (PDF, ${sizeWords(a.size)})` : `Open ${a.name || "the file"} (${a.width} × ${a.height} px, ${sizeWords(a.size)})`}
          >
            {/* eslint-disable-next-line @next/next/no-img-element -- a private file behind a role check, not a static asset */}
            <img src={a.thumbnailUrl} alt={a.name ? `Thumbnail of ${a.name}` : "Thumbnail of an attached file"} className="h-[72px] w-full object-contain paper-sheet bg-paper-card" loading="lazy" />
            <span className="block truncate border-t border-rule-soft px-1.5 py-0.5 text-[11px] text-ink-soft">
              {a.storedType === "application/pdf" ? "PDF · " : ""}
              {a.name || "file"}
            </span>
          </a>
          {onRemove ? (
            <button
              type="button"
              onClick={() => window.confirm(`Remove ${a.name || "this file"} from the comment?`) && onRemove(a)}
              className="absolute right-1 top-1 hidden h-5 w-5 items-center justify-center rounded-full bg-paper-card/95 text-[11px] text-ink-soft shadow group-hover:flex group-focus-within:flex hover:text-accent-deep"
              aria-label={`Remove ${a.name || "the file"}`}
            >
              ✕
            </button>
          ) : null}
        </li>
      ))}
    </ul>
  );
}

/** The files a comment may carry (the server's cap: lib/uploads/service.ts; a test keeps them equal). */
export const MAX_COMMENT_FILES = 8;

/**
 * Files chosen for a comment not sent yet: a button to add, their names to take back. A file that
 * failed to attach stays, marked, with the reason it was refused (`problems`), to be sent again
 * or taken off.
 */
export function FilePicker({
  files,
  onChange,
  id,
  problems,
  max = MAX_COMMENT_FILES,
  addLabel = "Attach files…",
  openOnMount = false,
}: {
  files: File[];
  onChange: (files: File[]) => void;
  id: string;
  problems?: ReadonlyMap<File, string>;
  /** how many files the comment still takes (a comment that has some already takes fewer) */
  max?: number;
  addLabel?: string;
  /** open the browser's file chooser as it appears (it appeared on a click meaning "choose files") */
  openOnMount?: boolean;
}) {
  const input = useRef<HTMLInputElement>(null);
  const [left, setLeft] = useState<string[]>([]);
  const opened = useRef(false);
  useEffect(() => {
    if (!openOnMount || opened.current) return;
    opened.current = true;
    input.current?.click();
  }, [openOnMount]);
  const over = files.filter((f) => f.size > MAX_UPLOAD_BYTES);
  const refused = files.flatMap((f) => (problems?.get(f) ? [problems.get(f)!] : []));
  return (
    <div className="min-w-0 space-y-1 text-xs">
      <div className="flex min-w-0 flex-wrap items-center gap-1.5">
        <button type="button" className="rounded border border-rule bg-paper-card px-2 py-0.5 text-ink-soft hover:border-ink/30 hover:text-ink" onClick={() => input.current?.click()} data-testid={`${id}-attach`}>
          {addLabel}
        </button>
        <input
          ref={input}
          type="file"
          multiple
          accept={ACCEPT_UPLOADS}
          className="hidden"
          aria-label="Attach images or PDFs"
          data-testid={`${id}-files`}
          onChange={(e) => {
            const all = [...files, ...Array.from(e.target.files ?? [])];
            // a comment takes MAX_COMMENT_FILES: the rest are named, never dropped unsaid
            setLeft(all.slice(Math.max(0, max)).map((f) => f.name));
            onChange(all.slice(0, Math.max(0, max)));
            e.target.value = "";
          }}
        />
        {files.map((f, i) => (
          <span
            key={`${f.name}-${i}`}
            title={problems?.get(f)}
            className={`inline-flex max-w-[12rem] items-center gap-1 rounded-full px-2 py-0.5 ${f.size > MAX_UPLOAD_BYTES || problems?.has(f) ? "bg-caution-soft text-caution" : "bg-paper-deep text-ink-soft"}`}
          >
            <span className="truncate">{f.name}</span>
            <button type="button" aria-label={`Do not attach ${f.name}`} className="text-ink-faint hover:text-ink" onClick={() => onChange(files.filter((_, j) => j !== i))}>
              ✕
            </button>
          </span>
        ))}
        {over.length ? <span className="text-caution">over {MAX_UPLOAD_BYTES / 1048576} MB: it will not be attached</span> : null}
        {left.length ? (
          <span className="text-caution" role="status" data-testid={`${id}-left-out`}>
            {max === MAX_COMMENT_FILES ? `${MAX_COMMENT_FILES} files at most on a comment` : `This comment takes ${max} more file${max === 1 ? "" : "s"}`}: {left.map((n) => `“${n}”`).join(", ")} not added
          </span>
        ) : null}
      </div>
      {refused.length ? (
        <ul className="space-y-0.5 text-caution" data-testid={`${id}-problems`}>
          {refused.map((p, i) => (
            <li key={i}>{p}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

/** A file to attach, and why it was refused when it was last sent. */
export type PendingFile = { file: File; problem?: string };

/** Send files to a comment one by one; the ones that failed come back with their reasons. */
export async function attachEach(commentId: string, files: File[]): Promise<Required<PendingFile>[]> {
  const failed: Required<PendingFile>[] = [];
  for (const file of files) {
    try {
      await uploadFile(`/api/comments/${commentId}/attachments`, file);
    } catch (err) {
      // uploadFile's words already name the file (“a.png”: …)
      failed.push({ file, problem: (err as Error).message });
    }
  }
  return failed;
}

/** Send files to a comment one by one; what failed comes back in words. */
export async function attachFiles(commentId: string, files: File[]): Promise<string[]> {
  return (await attachEach(commentId, files)).map((f) => f.problem);
}

export const removeAttachment = (a: Attachment) => apiFetch(`/api/uploads/${a.id}`, { method: "DELETE" });
