"use client";
// A version's comment threads: pinned to an element, a point or the whole version; replies;
// resolve and reopen; edit and delete your own; @mentions offered as you type.
import { useMutation, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useEffect, useRef, useState } from "react";
import { Button, EmptyState, Notice } from "@/components/shell/controls";
import { formatDateTime } from "@/components/workspaces/format";
import { apiFetch, ApiError } from "@/lib/api-client";
import type { Member } from "@/lib/review/comment-text";
import { pinWords } from "@/lib/review/pin-words";
import { AttachmentList, attachEach, FilePicker, MAX_COMMENT_FILES, removeAttachment, type Attachment, type PendingFile } from "./Attachments";
import { CommentText } from "./CommentText";
import type { PickedPin } from "./ReviewDrawing";

export type CommentPin = { kind: "element"; elementId: string } | { kind: "point"; at: [number, number] };
export type CommentItem = { id: string; authorId: string | null; authorName: string | null; body: string; deleted: boolean; editedAt: string | null; createdAt: string; attachments?: Attachment[] };
export type ThreadItem = { id: string; pin: CommentPin | null; resolvedAt: string | null; resolvedByName: string | null; comments: CommentItem[] };
export type CommentsData = {
  threads: ThreadItem[];
  /** open threads on earlier versions that are not approved, per version, oldest first */
  earlierOpen: Array<{ number: number; open: number }>;
  /** the same on later versions (the sign-off counts both ways); absent from an older answer */
  laterOpen?: Array<{ number: number; open: number }>;
  members: Member[];
  locked: boolean;
  canComment: boolean;
};

/** Open threads on other versions of the sketch, each version linked to its comments. */
function OtherOpen({ testId, lead, list, tail, versionHref }: { testId: string; lead: string; list: ReadonlyArray<{ number: number; open: number }>; tail: string; versionHref: (n: number) => string }) {
  const shown = list.filter((e) => e.open > 0);
  if (!shown.length) return null;
  return (
    <p className="rounded-md border border-caution/40 bg-caution/5 px-2.5 py-1.5 text-xs text-ink-soft" data-testid={testId}>
      {lead}:{" "}
      {shown.map((e, i) => (
        <span key={e.number}>
          {i ? ", " : ""}
          <Link href={`${versionHref(e.number)}#comments`} className="font-medium text-ink underline decoration-ink/30 underline-offset-2 hover:decoration-ink">
            v{e.number}
          </Link>{" "}
          ({e.open} thread{e.open === 1 ? "" : "s"})
        </span>
      ))}
      . {tail}
    </p>
  );
}

/** The @mention being typed at the end of `text` (the words after “@”, "" right after it), or null when it does not end in one. */
export function mentionQuery(text: string): string | null {
  const m = /(^|\s)@([\p{L}\p{N} ]{0,30})$/u.exec(text);
  if (!m) return null;
  return m[2] === "" || !/\s{2}|\s$/.test(m[2]) ? m[2] : null;
}

/** A text box that offers the workspace's members after “@”: ↑/↓ pick one, Enter or Tab puts it in, Escape closes the list. */
function MentionBox({ id, value, onChange, members, placeholder, rows = 3, label }: { id: string; value: string; onChange: (v: string) => void; members: Member[]; placeholder?: string; rows?: number; label: string }) {
  const ref = useRef<HTMLTextAreaElement>(null);
  // where the caret was when the person last typed (null: the list is closed); the query is read
  // from the text as it is now, so a text changed from outside (emptied once the comment is
  // posted) closes the list unless it still ends in an @mention there
  const [typedAt, setTypedAt] = useState<number | null>(null);
  const [active, setActive] = useState(0);
  const query = typedAt === null || typedAt > value.length ? null : mentionQuery(value.slice(0, typedAt));
  const matches = query === null ? [] : members.filter((m) => m.name.toLowerCase().startsWith(query.toLowerCase()) || m.name.toLowerCase().includes(` ${query.toLowerCase()}`)).slice(0, 5);
  const current = matches.length ? Math.min(active, matches.length - 1) : -1;
  const listId = `${id}-mentions`;
  const track = (text: string, at: number) => {
    setTypedAt(mentionQuery(text.slice(0, at)) === null ? null : at);
    setActive(0);
  };
  const insert = (name: string) => {
    const el = ref.current;
    const caret = el?.selectionStart ?? value.length;
    const before = value.slice(0, caret).replace(/@([\p{L}\p{N} ]{0,30})$/u, `@${name} `);
    onChange(before + value.slice(caret));
    setTypedAt(null);
    requestAnimationFrame(() => {
      el?.focus();
      el?.setSelectionRange(before.length, before.length);
    });
  };
  return (
    <div className="relative">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <textarea
        id={id}
        ref={ref}
        rows={rows}
        value={value}
        placeholder={placeholder}
        maxLength={4000}
        role="combobox"
        aria-autocomplete="list"
        aria-expanded={matches.length > 0}
        aria-controls={matches.length ? listId : undefined}
        aria-activedescendant={current >= 0 ? `${listId}-${current}` : undefined}
        onChange={(e) => {
          onChange(e.target.value);
          track(e.target.value, e.target.selectionStart);
        }}
        onKeyDown={(e) => {
          if (!matches.length) return;
          if (e.key === "ArrowDown" || e.key === "ArrowUp") {
            e.preventDefault();
            const step = e.key === "ArrowDown" ? 1 : -1;
            setActive((current + step + matches.length) % matches.length);
          } else if ((e.key === "Enter" && !e.shiftKey && !e.ctrlKey && !e.metaKey) || (e.key === "Tab" && !e.shiftKey)) {
            e.preventDefault();
            insert(matches[current].name);
          } else if (e.key === "Escape") {
            e.preventDefault();
            e.stopPropagation();
            setTypedAt(null);
          }
        }}
        className="block w-full rounded-md border border-rule bg-paper-card px-3 py-2 text-[13.5px] text-ink outline-none placeholder:text-ink-faint focus:border-ink focus:ring-2 focus:ring-accent/25"
      />
      {matches.length ? (
        <ul id={listId} className="absolute left-2 top-full z-20 mt-1 w-56 rounded-md border border-rule bg-paper-card py-1 shadow-[0_6px_24px_rgb(var(--shade)/0.14)]" role="listbox" aria-label="Mention a member">
          {matches.map((m, i) => (
            <li
              key={m.id}
              id={`${listId}-${i}`}
              role="option"
              aria-selected={i === current}
              onMouseDown={(e) => e.preventDefault()}
              onMouseEnter={() => setActive(i)}
              onClick={() => insert(m.name)}
              className="block w-full cursor-pointer px-3 py-1 text-left text-[13px] aria-selected:bg-paper-deep"
            >
              @{m.name}
            </li>
          ))}
          <li role="presentation" className="border-t border-rule-soft px-3 pt-1 text-[11px] text-ink-faint">
            ↑ ↓ to choose · Enter to mention · Esc to close
          </li>
        </ul>
      ) : null}
    </div>
  );
}

/**
 * A mutation that runs once at a time: a second `mutate` while one is on its way (a double-click,
 * before the button shows itself busy) is dropped, so a comment is never posted twice.
 */
export function useOneAtATime<R extends { mutate: (vars: never, opts?: never) => void }>(mutation: R): R {
  const running = useRef(false);
  const mutate = ((vars: never, opts?: { onSettled?: (...a: unknown[]) => void }) => {
    if (running.current) return;
    running.current = true;
    mutation.mutate(vars, {
      ...opts,
      onSettled: (...a: unknown[]) => {
        running.current = false;
        opts?.onSettled?.(...a);
      },
    } as never);
  }) as R["mutate"];
  return { ...mutation, mutate };
}

function useCommentMutations(commentsPath: string, onChanged: () => void) {
  const qc = useQueryClient();
  const done = () => {
    void qc.invalidateQueries({ queryKey: ["api", "sketches"] });
    onChanged();
  };
  // files waiting to be attached to a comment, by its id: the ones that failed once it was posted
  // (with their reasons), or ones chosen by its "Attach files…"; shown under that comment
  const [waiting, setWaiting] = useState<Record<string, PendingFile[]>>({});
  const wait = (commentId: string, files: PendingFile[] | null) =>
    setWaiting((w) => {
      const next = { ...w };
      if (files) next[commentId] = files;
      else delete next[commentId];
      return next;
    });
  return {
    waiting,
    wait,
    // the comment first, then its files (each attached to the comment that now exists)
    post: useOneAtATime(
      useMutation({
        mutationFn: async ({ files, ...body }: { body: string; pin?: CommentPin | null; parentId?: string; files?: File[] }) => {
          const made = await apiFetch<{ comment: { id: string } }>(commentsPath, { method: "POST", body });
          return { commentId: made.comment.id, failed: files?.length ? await attachEach(made.comment.id, files) : [] };
        },
        onSuccess: (out) => {
          // what failed waits under the comment it was for, with its reasons, to be sent again
          if (out.failed.length) wait(out.commentId, out.failed);
          done();
        },
      }),
    ),
    attach: useOneAtATime(
      useMutation({
        mutationFn: ({ commentId, files }: { commentId: string; files: File[] }) => attachEach(commentId, files),
        onSuccess: (failed, v) => {
          wait(v.commentId, failed.length ? failed : null);
          done();
        },
      }),
    ),
    unattach: useOneAtATime(useMutation({ mutationFn: removeAttachment, onSuccess: done })),
    patch: useOneAtATime(useMutation({ mutationFn: (v: { id: string; body: { body?: string; resolved?: boolean } }) => apiFetch(`/api/comments/${v.id}`, { method: "PATCH", body: v.body }), onSuccess: done })),
    remove: useOneAtATime(useMutation({ mutationFn: (id: string) => apiFetch(`/api/comments/${id}`, { method: "DELETE" }), onSuccess: done })),
  };
}

function OneComment({ c, viewerId, members, writable, m }: { c: CommentItem; viewerId: string; members: Member[]; writable: boolean; m: ReturnType<typeof useCommentMutations> }) {
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(c.body);
  // as the server allows (lib/uploads/service.ts attachable): its author, not deleted, not approved
  const mine = c.authorId === viewerId && !c.deleted && writable;
  const waiting = mine ? m.waiting[c.id] : undefined;
  const room = MAX_COMMENT_FILES - (c.attachments?.length ?? 0);
  // the box appeared on "Attach files…": the browser's chooser opens at once
  const [choosing, setChoosing] = useState(false);
  return (
    <li className="space-y-1" data-testid="comment">
      <p className="text-xs text-ink-faint">
        <span className="font-semibold text-ink">{c.authorName ?? "A deleted account"}</span> · <span className="num">{formatDateTime(c.createdAt)}</span>
        {c.editedAt ? " · edited" : ""}
      </p>
      {c.deleted ? (
        <p className="text-[13px] italic text-ink-faint">This comment was deleted.</p>
      ) : editing ? (
        <div className="space-y-1.5">
          <MentionBox id={`edit-${c.id}`} label="Edit the comment" value={text} onChange={setText} members={members} />
          <div className="flex gap-2">
            <Button size="sm" busy={m.patch.isPending} disabled={!text.trim()} onClick={() => m.patch.mutate({ id: c.id, body: { body: text } }, { onSuccess: () => setEditing(false) })}>
              Save
            </Button>
            <Button size="sm" tone="quiet" onClick={() => setEditing(false)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : (
        <CommentText text={c.body} members={members} />
      )}
      {!c.deleted ? <AttachmentList files={c.attachments ?? []} onRemove={mine ? (a) => m.unattach.mutate(a) : undefined} /> : null}
      {waiting ? (
        <div role="group" aria-label="Attach files to this comment" className="space-y-1.5 rounded border border-rule-soft bg-paper p-2" data-testid={`attach-${c.id}-waiting`}>
          <FilePicker
            id={`attach-${c.id}`}
            files={waiting.map((w) => w.file)}
            problems={new Map(waiting.flatMap((w) => (w.problem ? [[w.file, w.problem] as const] : [])))}
            max={room}
            addLabel="Add files…"
            openOnMount={choosing}
            onChange={(files) => m.wait(c.id, files.map((f) => waiting.find((w) => w.file === f) ?? { file: f }))}
          />
          <div className="flex gap-2">
            <Button size="sm" busy={m.attach.isPending} disabled={!waiting.length} onClick={() => m.attach.mutate({ commentId: c.id, files: waiting.map((w) => w.file) })}>
              {waiting.length ? `Attach ${waiting.length} file${waiting.length === 1 ? "" : "s"}` : "Attach"}
            </Button>
            <Button
              size="sm"
              tone="quiet"
              onClick={() => {
                m.wait(c.id, null);
                setChoosing(false);
              }}
            >
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
      {mine && !editing ? (
        <p className="flex gap-3 text-xs">
          <button type="button" className="text-ink-soft hover:text-ink" onClick={() => setEditing(true)}>
            Edit
          </button>
          {!waiting && room > 0 ? (
            <button
              type="button"
              className="text-ink-soft hover:text-ink"
              onClick={() => {
                setChoosing(true);
                m.wait(c.id, []);
              }}
            >
              Attach files…
            </button>
          ) : null}
          <button type="button" className="text-ink-soft hover:text-accent-deep" onClick={() => window.confirm("Delete this comment?") && m.remove.mutate(c.id)}>
            Delete
          </button>
        </p>
      ) : null}
    </li>
  );
}

function ThreadView({ t, n, labels, data, viewerId, selected, onSelect, m }: { t: ThreadItem; n: number; labels: Record<string, string>; data: CommentsData; viewerId: string; selected: boolean; onSelect: () => void; m: ReturnType<typeof useCommentMutations> }) {
  const [reply, setReply] = useState("");
  const [replyFiles, setReplyFiles] = useState<File[]>([]);
  const [replying, setReplying] = useState(false);
  const ref = useRef<HTMLElement>(null);
  useEffect(() => {
    if (selected) ref.current?.scrollIntoView({ block: "center", behavior: "smooth" });
  }, [selected]);
  const writable = !data.locked && data.canComment;
  return (
    <article ref={ref} id={`thread-${t.id}`} tabIndex={-1} onClick={onSelect} data-testid={`thread-${n}`} data-selected={selected || undefined} className={`space-y-2 rounded-md border p-3 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-accent ${selected ? "border-accent bg-accent-soft/20" : t.resolvedAt ? "border-dashed border-rule bg-paper" : "border-rule bg-paper-card"}`}>
      <header className="flex items-center justify-between gap-2 text-xs">
        <span className="flex items-center gap-1.5 font-semibold text-ink">
          <span className={`inline-flex h-5 min-w-5 items-center justify-center rounded-full px-1 text-[11px] ${t.resolvedAt ? "bg-rule-soft text-ink-soft" : "bg-ink text-paper"}`}>{t.resolvedAt ? `✓${n}` : n}</span>
          {pinWords(t.pin, labels)}
        </span>
        {t.resolvedAt ? <span className="text-ink-faint">resolved by {t.resolvedByName ?? "someone"}</span> : null}
      </header>
      <ul className="space-y-2.5">
        {t.comments.map((c) => (
          <OneComment key={c.id} c={c} viewerId={viewerId} members={data.members} writable={writable} m={m} />
        ))}
      </ul>
      {writable ? (
        <div className="flex flex-wrap items-center gap-2 text-xs">
          {replying ? (
            <div className="w-full space-y-1.5">
              <MentionBox id={`reply-${t.id}`} label="Reply" value={reply} onChange={setReply} members={data.members} rows={2} placeholder="Reply…" />
              <FilePicker id={`reply-${t.id}`} files={replyFiles} onChange={setReplyFiles} />
              <div className="flex gap-2">
                <Button size="sm" busy={m.post.isPending} disabled={!reply.trim()} onClick={() => m.post.mutate({ body: reply, parentId: t.id, files: replyFiles }, { onSuccess: () => (setReply(""), setReplyFiles([]), setReplying(false)) })}>
                  Reply
                </Button>
                <Button size="sm" tone="quiet" onClick={() => setReplying(false)}>
                  Cancel
                </Button>
              </div>
            </div>
          ) : (
            <Button size="sm" tone="secondary" onClick={() => setReplying(true)}>
              Reply
            </Button>
          )}
          {!replying ? (
            // busy while this thread's resolve or reopen is on its way: a press that shows nothing invites a second
            <Button size="sm" tone="quiet" busy={m.patch.isPending && m.patch.variables?.id === t.id && m.patch.variables.body.resolved !== undefined} onClick={() => m.patch.mutate({ id: t.id, body: { resolved: !t.resolvedAt } })}>
              {t.resolvedAt ? "Reopen" : "Resolve"}
            </Button>
          ) : null}
        </div>
      ) : null}
    </article>
  );
}

export function CommentsPanel({
  data,
  commentsPath,
  viewerId,
  labels,
  pin,
  picking,
  onPicking,
  onClearPin,
  onPin,
  selected,
  onSelect,
  onChanged,
  versionHref,
}: {
  data: CommentsData;
  commentsPath: string;
  viewerId: string;
  labels: Record<string, string>;
  pin: PickedPin | null;
  picking: boolean;
  onPicking: (on: boolean) => void;
  onClearPin: () => void;
  /** pin chosen without the drawing (the element list beside the form: the keyboard's way) */
  onPin: (pin: PickedPin) => void;
  selected: string | null;
  onSelect: (id: string) => void;
  onChanged: () => void;
  /** the review page of another version of this sketch */
  versionHref: (n: number) => string;
}) {
  const m = useCommentMutations(commentsPath, onChanged);
  const [text, setText] = useState("");
  const [files, setFiles] = useState<File[]>([]);
  const err = [m.post.error, m.patch.error, m.remove.error, m.unattach.error, m.attach.error].find((e) => e instanceof ApiError) as ApiError | undefined;
  // the files of the comment just posted that did not attach, while they still wait under it
  const posted = m.post.data?.commentId;
  const attachProblems = posted ? (m.waiting[posted] ?? []).flatMap((f) => (f.problem ? [f.problem] : [])) : [];
  const open = data.threads.filter((t) => !t.resolvedAt).length;
  // Escape gives up pinning, wherever the focus is
  useEffect(() => {
    if (!picking) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") onPicking(false);
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, [picking, onPicking]);
  return (
    <div className="space-y-3">
      {data.locked ? <Notice tone="info" title="Approved: locked">This version takes no new comments. Comment on a newer version, or ask an owner to withdraw the approval.</Notice> : null}
      {data.canComment ? (
        <form
          className="space-y-2 rounded-md border border-rule bg-paper-card p-3"
          aria-label="Write a comment"
          onSubmit={(e) => {
            e.preventDefault();
            const body = pin ? { body: text, pin: pin.kind === "element" ? { kind: "element" as const, elementId: pin.elementId } : { kind: "point" as const, at: pin.at } } : { body: text };
            m.post.mutate({ ...body, files }, { onSuccess: () => (setText(""), setFiles([]), onClearPin(), onPicking(false)) });
          }}
        >
          <MentionBox id="new-comment" label="New comment" value={text} onChange={setText} members={data.members} placeholder="Comment… (@name mentions a colleague; **bold**, *italic*, `code`)" />
          <FilePicker id="new-comment" files={files} onChange={setFiles} />
          <div className="flex flex-wrap items-center gap-2 text-xs">
            <span className="text-ink-soft" data-testid="new-comment-pin">
              {picking ? "Click an element or a point on the drawing (Esc stops), or choose one:" : `Pinned ${pinWords(pin, labels)}`}
            </span>
            {picking ? (
              <select
                aria-label="Pin to an element"
                className="rounded-md border border-rule bg-paper-card px-1.5 py-1 text-xs"
                value=""
                onChange={(e) => {
                  const id = e.target.value;
                  if (!id) return;
                  onPin({ kind: "element", elementId: id, label: labels[id] ?? id });
                  onPicking(false);
                }}
              >
                <option value="">an element…</option>
                {Object.entries(labels).map(([id, label]) => (
                  <option key={id} value={id}>
                    {label}
                  </option>
                ))}
              </select>
            ) : null}
            {pin ? (
              <button type="button" className="text-ink-faint hover:text-ink" onClick={onClearPin} aria-label="Unpin">
                ✕
              </button>
            ) : null}
            <Button type="button" size="sm" tone="secondary" onClick={() => onPicking(!picking)}>
              {picking ? "Stop pinning" : "Pin to the drawing"}
            </Button>
            <span className="flex-1" />
            <Button type="submit" size="sm" busy={m.post.isPending} disabled={!text.trim()}>
              {/* still choosing where to pin, nothing chosen: the button says where the comment goes */}
              {picking && !pin ? "Comment on the whole version" : "Comment"}
            </Button>
          </div>
        </form>
      ) : null}
      {err ? <Notice tone="error">{err.fields[0]?.message ?? err.message}</Notice> : null}
      {attachProblems.length ? (
        <Notice tone="error" title="The comment was posted, but not every file was attached">
          <ul data-testid="attach-problems">
            {attachProblems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
          <p className="mt-1">They wait under the comment: attach them again from there, or take them off.</p>
        </Notice>
      ) : null}
      <p className="text-xs text-ink-faint">
        {data.threads.length} thread{data.threads.length === 1 ? "" : "s"}, {open} open
      </p>
      <OtherOpen
        testId="earlier-open"
        lead="Still open on earlier versions"
        list={data.earlierOpen}
        tail="Answer or resolve them there if this version settles them."
        versionHref={versionHref}
      />
      <OtherOpen
        testId="later-open"
        lead="Still open on later versions"
        list={data.laterOpen ?? []}
        tail={
          data.locked
            ? "Asked of the drawing as it went on."
            : "Asked of the drawing as it went on. A check or an approval of this version counts them too: resolve them there, or say in its note why they do not apply here."
        }
        versionHref={versionHref}
      />
      {data.threads.length === 0 ? (
        data.canComment && !data.locked ? (
          <EmptyState title="No comments yet">Pin a comment to a support, a port or a point, or comment on the whole version.</EmptyState>
        ) : (
          <p className="text-sm text-ink-soft">No comments on this version.</p>
        )
      ) : null}
      <div className="space-y-2">
        {data.threads.map((t, i) => (
          <ThreadView key={t.id} t={t} n={i + 1} labels={labels} data={data} viewerId={viewerId} selected={selected === t.id} onSelect={() => onSelect(t.id)} m={m} />
        ))}
      </div>
    </div>
  );
}
