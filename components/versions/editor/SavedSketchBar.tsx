"use client";
// The saved sketch's corner of the editor's toolbar: which version is open, whether there are
// unsaved changes, the Save button, and the save, conflict and kept-work dialogs.
import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useEffect, useMemo, useRef, useState } from "react";
import { useStore } from "zustand";
import { useAnalysis, useEditor, useStores } from "@/canvas/context";
import { useFileMenuLink } from "@/components/editor/fileMenuLinks";
import { useActionRunner } from "@/components/editor/useActions";
import { inputErrorsInWords } from "@/components/results/errorPlace";
import { Providers } from "@/components/shell/Providers";
import { formatDateTime } from "@/components/workspaces/format";
import { ApiError, apiFetch, apiKey } from "@/lib/api-client";
import { STATE_WORDS, type ReviewState } from "@/lib/review/rules";
import { can } from "@/lib/roles";
import { BEAT_MS, discardDraft, draftsOpenElsewhere, isTabOpenKey, keepDraft, keepTabOpen, readDraft, type Draft } from "./drafts";
import { ForkDialog, useForkTargets, type ForkResult } from "@/components/sketches/ForkDialog";
import { ConflictDialog, ForkAndSave, SaveDialog, saveVersionRequest, type LatestVersion } from "./SaveDialogs";
import { reviewNote } from "./reviewNote";
import { announceSaved, watchSaved, type SavedElsewhere } from "./savedElsewhere";
import { sameDocument, type SaveFlow } from "./savedPersistence";
import { mergedHereNotice, mergeOntoNewest } from "./restoreDraft";
import { replaceSketch } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import { NarrowLabel } from "@/components/editor/NarrowLabel";
import { CalcSheetLink } from "@/components/versions/CalcSheetLink";
import { RestoreDialog, type Restored } from "@/components/versions/RestoreDialog";
import type { VersionItem } from "@/components/versions/VersionHistory";

// on a touch screen 40 px tall, a finger's tap target (as the toolbar's own controls: components/editor/ui.ts)
const CHIP = "h-7 pointer-coarse:h-10 whitespace-nowrap rounded px-2.5 text-[12.5px] font-medium";
const CARD = "rounded-lg border p-3 text-[13px] text-ink shadow-[0_6px_24px_rgb(var(--shade)/0.14)]";
/** a card's plain button ("Got it", "Stay here", "Discard"…) */
const CARD_BUTTON = "rounded-md border border-ink/25 bg-paper-card px-2.5 py-1 font-medium hover:border-ink/50";

/** The editor is on the latest version now: a reload opens the latest, not the version once named in the address. */
function dropVersionFromAddress() {
  const url = new URL(window.location.href);
  if (!url.searchParams.has("version")) return;
  url.searchParams.delete("version");
  window.history.replaceState(window.history.state, "", url);
}

/** What the editor says once an older version is the latest again: "v5 is now the latest: a copy of v2." */
export function latestAgainWords(made: Pick<Restored, "number" | "restoredFrom">): string {
  return `v${made.number} is now the latest: a copy of v${made.restoredFrom}.`;
}

function KeptWork({ draft, latest, workspaceId, onDiscard }: { draft: Draft; latest: number; workspaceId: string; onDiscard: () => void }) {
  return (
    <div role="status" data-testid="kept-work" className={`${CARD} border-caution/40 bg-caution-soft`}>
      <p className="font-semibold">Your unsaved changes are kept in this browser</p>
      <p className="mt-1 text-ink-soft">
        Made on v{draft.baseVersion}, kept {formatDateTime(draft.keptAt)}. The editor shows v{latest}.
      </p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Link href={`/workspaces/${workspaceId}/sketches/${draft.sketchId}/compare?from=${latest}&to=draft&draft=${encodeURIComponent(draft.tab ?? "")}`} className="rounded-md bg-ink px-2.5 py-1 font-medium text-paper hover:bg-ink-soft">
          Compare v{latest} with them
        </Link>
        <a href={`/sketches/${draft.sketchId}?restore=1&draft=${encodeURIComponent(draft.tab ?? "")}`} className={CARD_BUTTON}>
          Bring them back
        </a>
        <button type="button" onClick={onDiscard} className="rounded-md px-2 py-1 text-ink-soft hover:text-ink">
          Discard
        </button>
      </div>
    </div>
  );
}

/**
 * Another tab of this browser, still open, has unsaved changes to this sketch: they are that tab's
 * work in progress, not work to bring back here, so they are named, not offered (once that tab
 * closes they are offered here as kept work).
 */
function OpenInAnotherTab({ drafts, onDismiss }: { drafts: Draft[]; onDismiss: () => void }) {
  const d = drafts[0];
  const more = drafts.length > 1 ? ` (and ${drafts.length - 1} more tab${drafts.length > 2 ? "s" : ""})` : "";
  return (
    <div role="status" data-testid="open-in-another-tab" className={`${CARD} border-ink/15 bg-paper-card`}>
      <p className="font-semibold">Another tab of this browser has unsaved changes to this sketch{more}</p>
      <p className="mt-1 text-ink-soft">
        Made on v{d.baseVersion}, kept {formatDateTime(d.keptAt)}. They stay with that tab: save or discard them there. Once that tab is closed, they are offered here.
      </p>
      <div className="mt-2 flex flex-wrap gap-2">
        <button type="button" onClick={onDismiss} className={CARD_BUTTON}>
          Got it
        </button>
      </div>
    </div>
  );
}

/**
 * Another tab of this browser saved a newer version of the sketch open here: said calmly, with
 * what Save will do; with no unsaved changes here, the newest version is one click away.
 */
function SavedInAnotherTab({ saved, base, dirty, onOpen, onDismiss }: { saved: SavedElsewhere; base: number; dirty: boolean; onOpen: () => void; onDismiss: () => void }) {
  return (
    <div role="status" data-testid="saved-elsewhere" className={`${CARD} border-ink/15 bg-paper-card`}>
      <p>
        <span className="font-semibold">v{saved.version} was saved in another tab</span>
        {saved.at ? ` (${formatDateTime(saved.at)})` : ""}
        {dirty
          ? `; this tab’s work is based on v${base}. Save will offer to fork it or to reload and compare.`
          : `; this tab shows v${base} and has no unsaved changes.`}
      </p>
      <div className="mt-2 flex flex-wrap gap-2">
        {dirty ? null : (
          <button type="button" onClick={onOpen} className="rounded-md bg-ink px-2.5 py-1 font-medium text-paper hover:bg-ink-soft">
            Open v{saved.version}
          </button>
        )}
        <button type="button" onClick={onDismiss} className={CARD_BUTTON}>
          Got it
        </button>
      </div>
    </div>
  );
}

/**
 * Keeps the editor's unsaved changes in this browser as they are made (a moment after the last
 * one, and as the page is hidden or left), so a reload, a closed tab or a crash loses nothing: the
 * next visit offers them back (<KeptWork>). Back to the version as saved, there is nothing to
 * keep. Paused while an earlier visit's kept changes wait for the user's choice (`waiting`), so
 * they are never written over; only people who may save keep anything.
 */
function useKeepUnsaved(flow: SaveFlow, waiting: boolean) {
  const stores = useStores();
  const revision = useEditor((s) => s.revision);
  useEffect(() => {
    const { info, base } = flow.getState();
    if (waiting || !info || base === null || !can(info.role, "version.save")) return;
    const keep = () => {
      const { info: now, base: on, baseDoc, restored, tab } = flow.getState();
      if (!now || on === null) return;
      const e = stores.editor.getState();
      // mid-drag, what the drag started from
      const sketch = e.gesture ? e.gesture.origin : e.sketch;
      // this tab's own draft: another tab's of the same sketch is never written over
      const prior = readDraft(now.sketchId, tab);
      const same = prior?.baseVersion === on;
      if (!restored && baseDoc && sameDocument(sketch, baseDoc)) {
        if (same) discardDraft(now.sketchId, tab);
        return;
      }
      // a draft the save dialogs kept (a conflict, an ended session) keeps its message and what it knew
      keepDraft({ sketchId: now.sketchId, tab, baseVersion: on, latestVersion: Math.max(now.latest, same ? prior.latestVersion : 0), message: same ? prior.message : "", sketch });
    };
    const timer = setTimeout(keep, 500);
    window.addEventListener("pagehide", keep);
    return () => {
      clearTimeout(timer);
      window.removeEventListener("pagehide", keep);
    };
  }, [flow, stores, revision, waiting]);
}

/**
 * Whether the editor's sketch differs from the version as saved (`baseDoc`, set on load and on
 * each save): undoing back to it clears the mark, redoing brings it back. A reference check
 * first; the structural one runs only when the sketch settles on another document (an edit, an
 * undo, a redo), never for the frames of a drag, which re-render on every pointer move.
 */
function useDirty(flow: SaveFlow, restored: boolean): boolean {
  const stores = useStores();
  const baseDoc = useStore(flow, (s) => s.baseDoc);
  // without a saved document to compare with: the sketch as the bar found it
  const [opened] = useState(() => stores.editor.getState().sketch);
  const clean = baseDoc ?? opened;
  const sketch = useEditor((s) => s.sketch);
  const dragging = useEditor((s) => s.gesture !== null);
  const same = useMemo(() => sketch === clean || (!dragging && sameDocument(sketch, clean)), [sketch, clean, dragging]);
  return restored || !same;
}

/**
 * The sign-off state of the version open here (`null` until known, or when it cannot be read):
 * an approved or checked version is said beside its number, and the save dialog says that a new
 * version starts its own review.
 */
function useReviewState(sketchId: string | undefined, base: number | null): ReviewState | null {
  const path = sketchId && base !== null ? `/api/sketches/${sketchId}/versions/${base}/signoff` : null;
  const q = useQuery({
    queryKey: apiKey(path ?? "/none"),
    queryFn: () => apiFetch<{ state: ReviewState }>(path as string),
    enabled: path !== null,
  });
  return q.data?.state ?? null;
}

/**
 * What "Make vN the latest again" asks on top of: the newest version the server knows (a save
 * since the editor opened counts; the restore dialog refreshes it after a 409), and, once asked,
 * the facts of vN the dialog names (message, author, date).
 */
function useRestoreFacts(sketchId: string | undefined, base: number | null, asking: boolean, known: number) {
  const sketchPath = sketchId ? `/api/sketches/${sketchId}` : "/none";
  const sketchQ = useQuery({ queryKey: apiKey(sketchPath), queryFn: () => apiFetch<{ sketch: { latestVersion: number } }>(sketchPath), enabled: asking && !!sketchId });
  const versionPath = sketchId && base !== null ? `/api/sketches/${sketchId}/versions/${base}` : "/none";
  const versionQ = useQuery({
    queryKey: apiKey(versionPath),
    queryFn: () => apiFetch<{ version: Pick<VersionItem, "number" | "message" | "authorName" | "createdAt"> }>(versionPath),
    enabled: asking && base !== null && !!sketchId,
  });
  return {
    latest: Math.max(known, sketchQ.data?.sketch.latestVersion ?? 0),
    version: versionQ.data?.version ?? null,
    failed: sketchQ.isError || versionQ.isError,
    retry: () => {
      if (sketchQ.isError) void sketchQ.refetch();
      if (versionQ.isError) void versionQ.refetch();
    },
  };
}

function Bar({ flow }: { flow: SaveFlow }) {
  const { info, base, pending, lastSaved, restored, restoredNotice, tab, savedElsewhere } = useStore(flow);
  const stores = useStores();
  const run = useActionRunner();
  const units = useEditor((s) => s.units);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const [conflict, setConflict] = useState<{ latest: LatestVersion; message: string } | null>(null);
  const [forking, setForking] = useState(false);
  // the conflict's "stay": v{latest} merged into the changes here (busy, failed, done)
  const [staying, setStaying] = useState(false);
  const [stayError, setStayError] = useState<string | null>(null);
  const [mergedHere, setMergedHere] = useState<string | null>(null);
  // "Make vN the latest again…" on an older version (as on its page): asked, and done
  const [restoring, setRestoring] = useState(false);
  const [madeLatest, setMadeLatest] = useState<Restored | null>(null);
  const restoreFacts = useRestoreFacts(info?.sketchId, base, restoring, info?.latest ?? 0);
  // the Bar mounts once the sketch has loaded, so `info` is known here
  // (only a closed tab's: a tab still open keeps its own, named by <OpenInAnotherTab>)
  const [draft, setDraft] = useState<Draft | null>(() => (info && !restored ? readDraft(info.sketchId) : null));
  const [elsewhere, setElsewhere] = useState<Draft[]>(() => (info && !restored ? draftsOpenElsewhere(info.sketchId, tab) : []));
  const [elsewhereSeen, setElsewhereSeen] = useState(false);
  // a draft offered once another tab closed, while this one may have work of its own in progress:
  // this tab's own keeping goes on (it writes under its own name, never over the one offered)
  const [offeredLate, setOfferedLate] = useState(false);
  // the "● unsaved" mark and the leave-page prompt: the sketch is not the version as saved
  const dirty = useDirty(flow, restored);
  const review = useReviewState(info?.sketchId, base);
  // the sketch's input errors, said in the save dialog before anything is sent
  const analysed = useAnalysis((s) => s.sketch);
  const analysisErrors = useAnalysis((s) => s.core?.errors);
  const inputErrors = useMemo(() => inputErrorsInWords(analysed, analysisErrors ?? []), [analysed, analysisErrors]);
  // the calc sheet of the version open here, as saved (a PDF made on the server): a toolbar link
  // from 1280 px, and in the File menu at every width
  const calcSheet = info && base !== null ? `/api/sketches/${info.sketchId}/versions/${base}/calc-sheet?units=${units}` : null;
  const calcSheetWords = dirty ? `The calc sheet (PDF) of v${base} as saved: your unsaved changes are not in it` : `The calc sheet (PDF) of v${base}`;
  useFileMenuLink("file.calcSheet", calcSheet ? { label: "Calc sheet (PDF)", href: calcSheet, detail: dirty ? `v${base} as saved: your unsaved changes are not in it` : `v${base} as saved` } : null);
  // an older version, as saved, with nothing changed here: "Make vN the latest again…" (with
  // changes, Save offers a fork or reload and compare instead); below 1280 px in the File menu
  const askRestore = () => {
    setRestoring(true);
    if (restoreFacts.failed) restoreFacts.retry();
  };
  const offerLatest = !!info && base !== null && can(info.role, "version.save") && base < info.latest && !restored && !dirty && !madeLatest;
  useFileMenuLink(
    "file.makeLatest",
    offerLatest ? { label: `Make v${base} the latest again…`, detail: `v${base}'s drawing saved as a new version; nothing is deleted`, onSelect: askRestore } : null,
  );
  // "Fork this sketch…" (as on the History page): the version open here, as saved; the fork's own
  // editor is then one click away, and nothing here changes
  const [forkAsked, setForkAsked] = useState(false);
  const [forked, setForked] = useState<(ForkResult["sketch"] & { from: number }) | null>(null);
  // as on the History page: anyone who may fork into some workspace (a viewer here who owns a
  // workspace of their own too); the list is the fork dialog's own, asked for once
  const forkTargets = useForkTargets();
  const offerFork = !!info && base !== null && (can(info.role, "sketch.fork") || (forkTargets.data?.length ?? 0) > 0);
  useFileMenuLink(
    "file.fork",
    offerFork
      ? { label: "Fork this sketch…", detail: dirty ? `A new sketch from v${base} as saved: your unsaved changes are not in it` : `A new sketch starting from v${base}`, onSelect: () => setForkAsked(true) }
      : null,
  );
  const leaving = useRef(false);
  const leave = (href: string) => {
    leaving.current = true;
    window.location.assign(href);
  };

  useEffect(() => {
    flow.setState({ notice: (text) => stores.editor.getState().notify(text) });
  }, [flow, stores]);
  useKeepUnsaved(flow, !!draft && !offeredLate);
  // a newer version saved in another tab of this browser: said here, and Save knows it is newer
  const sketchId = info?.sketchId;
  // this tab is open: its drafts are not offered to other tabs as kept work meanwhile
  useEffect(() => keepTabOpen(tab), [tab]);
  // while another open tab's draft is named here: once that tab closes (or, crashed, stops saying
  // it is open), its draft is offered
  const watchElsewhere = !!sketchId && elsewhere.length > 0 && !draft && !restored;
  useEffect(() => {
    if (!watchElsewhere || !sketchId) return;
    const look = () => {
      setElsewhere(draftsOpenElsewhere(sketchId, tab));
      const d = readDraft(sketchId);
      if (d && d.tab !== tab) {
        setOfferedLate(true);
        setDraft(d);
      }
    };
    const heard = (e: StorageEvent) => {
      if (isTabOpenKey(e.key)) look();
    };
    window.addEventListener("storage", heard);
    const timer = setInterval(look, BEAT_MS);
    return () => {
      window.removeEventListener("storage", heard);
      clearInterval(timer);
    };
  }, [watchElsewhere, sketchId, tab]);
  useEffect(() => {
    if (!sketchId) return;
    return watchSaved(sketchId, (saved) => {
      const { base: on, info: now } = flow.getState();
      if (on === null || !now || saved.version <= on) return;
      flow.setState({ savedElsewhere: saved, info: { ...now, latest: Math.max(now.latest, saved.version) } });
    });
  }, [flow, sketchId]);
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => {
      if (!leaving.current) e.preventDefault();
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);

  if (!info || base === null) return null;
  const canSave = can(info.role, "version.save");
  // vN made the latest again as v{made}: the drawing open here, unchanged (the offer is only made
  // with nothing changed), is what v{made} holds, so the editor goes on as v{made}, the latest, and
  // the address stops naming vN (a reload opens the latest). The restore keeps the sketch's present
  // name: an older version's own title is brought up to it, without a step in the undo history.
  const onLatestAgain = (made: Restored) => {
    const editor = stores.editor.getState();
    const doc = editor.sketch.title === info.title ? editor.sketch : { ...editor.sketch, title: info.title };
    if (doc !== editor.sketch) editor.reset(doc);
    const at = made.createdAt ?? new Date().toISOString();
    flow.setState({ base: made.number, baseDoc: doc, lastSaved: { number: made.number, at }, info: { ...info, latest: made.number }, savedElsewhere: undefined });
    announceSaved(info.sketchId, { version: made.number, at });
    dropVersionFromAddress();
    editor.notify(latestAgainWords(made));
  };
  const settle = (outcome: Parameters<NonNullable<typeof pending>["resolve"]>[0]) => {
    pending?.resolve(outcome);
    flow.setState({ pending: null });
  };

  const save = async (message: string) => {
    if (!pending) return;
    setBusy(true);
    setError(null);
    try {
      const { version } = await saveVersionRequest(info.sketchId, base, message, pending.sketch);
      flow.setState({ base: version.number, baseDoc: pending.sketch, lastSaved: { number: version.number, at: version.createdAt }, info: { ...info, latest: version.number, title: version.sketchTitle ?? info.title }, restored: false });
      // saved: this tab's kept work is in the version now (an older draft the user has not
      // chosen about yet, and other tabs' drafts, stay until they are dealt with)
      discardDraft(info.sketchId, tab);
      announceSaved(info.sketchId, { version: version.number, at: version.createdAt });
      stores.editor.getState().notify(`Saved as v${version.number}.`);
      settle({ ok: true, version: version.number, savedAt: version.createdAt });
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, "network", "The sketch could not be saved.");
      if (e.code === "version_conflict") {
        setConflict({ latest: e.detail.latest as LatestVersion, message });
      } else if (e.status === 401) {
        keepDraft({ sketchId: info.sketchId, tab, baseVersion: base, latestVersion: base, message, sketch: pending.sketch });
        setError(new ApiError(401, "unauthenticated", "Your session has ended. Your changes are kept in this browser: sign in again and bring them back."));
      } else setError(e);
    } finally {
      setBusy(false);
    }
  };

  // the conflict's "stay": v{latest}'s changes since the base merged into the work here, as one
  // undoable step; the editor goes on based on v{latest} (the next save goes on top of it), and
  // the address stops naming an older version
  const stayAndMerge = async () => {
    if (!conflict || !pending) return;
    const newest = conflict.latest.number;
    setStaying(true);
    setStayError(null);
    try {
      const editor = stores.editor.getState();
      const mine = editor.sketch;
      const merged = await mergeOntoNewest(info.sketchId, base, mine, newest);
      if (!sameDocument(merged.sketch, mine)) editor.apply(replaceSketch({ sketch: merged.sketch, label: `Bring v${newest} in` }) as Command<unknown>);
      flow.setState({ base: newest, baseDoc: merged.theirs, info: { ...info, latest: Math.max(info.latest, newest) }, savedElsewhere: undefined });
      dropVersionFromAddress();
      const words = mergedHereNotice(newest, base, merged, editor.units);
      setConflict(null);
      setMergedHere(words);
      editor.notify(words);
      settle({ ok: false, reason: "conflict", message: `Not saved yet: v${newest} is merged into your changes.`, latestVersion: newest });
    } catch (err) {
      setStayError(`v${newest} could not be read to merge it (${err instanceof ApiError ? err.message : "no answer from the server"}). Nothing here changed: try again, or choose another way.`);
    } finally {
      setStaying(false);
    }
  };

  return (
    // on a phone its items flow in the toolbar's rows (the bar is no block of its own that cannot
    // wrap), so a submitted version's toolbar packs into fewer rows
    <div className="ml-3 flex items-center gap-2 max-sm:contents" data-testid="version-bar">
      <span className="num whitespace-nowrap text-[12px] text-ink-faint max-sm:ml-2 max-sm:mr-1" data-testid="version-label">
        {restored ? `kept changes on v${base}` : `v${base}${base < info.latest ? ` of ${info.latest}` : ""}`}
        {review && review !== "draft" && !restored ? (
          <span title={STATE_WORDS[review].sentence} data-testid="version-review-state" data-review-state={review}>
            {` · ${STATE_WORDS[review].label}`}
          </span>
        ) : null}
        {dirty && canSave ? (
          <span className="ml-1.5 text-caution" title="Changes not yet saved as a version">
            ●<span className="max-lg:sr-only"> unsaved</span>
          </span>
        ) : null}
        {lastSaved && !dirty ? <span className="ml-1.5">✓ saved</span> : null}
      </span>
      {canSave ? (
        <button type="button" onClick={() => run("file.save")} className={`${CHIP} bg-ink text-paper hover:bg-ink-soft`} data-testid="save-version" aria-label="Save version">
          <NarrowLabel full="Save version" short="Save…" />
        </button>
      ) : (
        // a statement, not a control: plain text, no border or fill that would read as a button
        <span className="inline-flex items-center px-1 text-[12px] italic text-ink-soft" title="Your role reads sketches but does not save versions" data-testid="read-only">
          Read only · {info.role}
        </span>
      )}
      {/* below 1280 px the toolbar has no room for it: the File menu has it (useFileMenuLink above) */}
      {calcSheet ? (
        <CalcSheetLink
          href={calcSheet}
          className={`${CHIP} inline-flex items-center border border-ink/20 text-ink hover:border-ink/45 max-xl:hidden`}
          title={calcSheetWords}
          label="Calc sheet (PDF)"
          testId="calc-sheet-link"
          onError={(message) => stores.editor.getState().notify(message)}
        >
          Calc sheet
        </CalcSheetLink>
      ) : null}
      <Link href={`/workspaces/${info.workspaceId}/sketches/${info.sketchId}`} className={`${CHIP} inline-flex items-center border border-ink/20 text-ink hover:border-ink/45`}>
        History
      </Link>
      {/* below 1280 px the toolbar has no room for it: the File menu has it (offerLatest above) */}
      {offerLatest ? (
        <button
          type="button"
          onClick={askRestore}
          className={`${CHIP} inline-flex items-center border border-ink/20 text-ink hover:border-ink/45 max-xl:hidden`}
          title={`Save v${base}'s drawing as a new version on top of v${info.latest}; nothing is deleted`}
          data-testid="make-latest"
        >
          Make v{base} the latest again…
        </button>
      ) : null}
      {restoring && restoreFacts.failed ? (
        <span role="alert" className="text-[12px] font-medium text-accent-deep">
          v{base} could not be read to restore it: nothing was saved. Try again in a moment.
        </span>
      ) : null}
      {restoring && restoreFacts.version ? (
        <RestoreDialog
          sketchId={info.sketchId}
          sketchTitle={info.title}
          version={restoreFacts.version}
          latest={restoreFacts.latest}
          onClose={() => setRestoring(false)}
          onRestored={(made) => {
            setRestoring(false);
            setMadeLatest(made);
            onLatestAgain(made);
          }}
        />
      ) : null}

      {pending && !conflict && !forking ? (
        <SaveDialog
          open
          base={base}
          latest={info.latest}
          title={info.title}
          busy={busy}
          error={error}
          sketch={pending.sketch}
          inputErrors={inputErrors}
          reviewNote={reviewNote(review, base)}
          onSave={save}
          onCancel={() => {
            setError(null);
            stores.editor.getState().notify("Not saved; your changes are still here.");
            settle({ ok: false, reason: "error", message: "Not saved; your changes are still here." });
          }}
        />
      ) : null}
      {conflict && pending && !forking ? (
        <ConflictDialog
          open
          base={base}
          latest={conflict.latest}
          onFork={() => setForking(true)}
          onStay={() => void stayAndMerge()}
          staying={staying}
          stayError={stayError}
          compareHref={`/workspaces/${info.workspaceId}/sketches/${info.sketchId}/compare?from=${conflict.latest.number}&to=draft&draft=${encodeURIComponent(tab)}&open=1`}
          onCompare={() => keepDraft({ sketchId: info.sketchId, tab, baseVersion: base, latestVersion: conflict.latest.number, message: conflict.message, sketch: pending.sketch })}
          onReload={() => {
            keepDraft({ sketchId: info.sketchId, tab, baseVersion: base, latestVersion: conflict.latest.number, message: conflict.message, sketch: pending.sketch });
            leave(`/sketches/${info.sketchId}`);
          }}
          onKeepEditing={() => {
            setConflict(null);
            setStayError(null);
            stores.editor.getState().notify(`Not saved: v${conflict.latest.number} is newer than the v${base} you are editing. Your changes are still here.`);
            settle({ ok: false, reason: "conflict", message: "Not saved: someone saved a newer version.", latestVersion: conflict.latest.number });
          }}
        />
      ) : null}
      {forking && pending ? (
        <ForkAndSave
          open
          sketchId={info.sketchId}
          title={info.title}
          base={base}
          sketch={pending.sketch}
          message={conflict?.message ?? ""}
          defaultWorkspaceId={info.workspaceId}
          onClose={() => setForking(false)}
          onDone={(made) => {
            leave(`/sketches/${made.sketch.id}`);
          }}
        />
      ) : null}
      {forkAsked ? (
        <ForkDialog
          open
          onClose={() => setForkAsked(false)}
          sketchId={info.sketchId}
          sketchTitle={info.title}
          version={base}
          defaultWorkspaceId={info.workspaceId}
          intro={
            dirty
              ? `The fork is a new sketch that starts from v${base} as saved. Your unsaved changes are not in it: they stay here, in this editor (save them first to fork with them). The original stays as it is.`
              : undefined
          }
          onForked={(made) => {
            setForkAsked(false);
            setForked({ ...made.sketch, from: base });
            stores.editor.getState().notify(`Forked v${base} as “${made.sketch.title}”.`);
          }}
        />
      ) : null}
      <div className="fixed bottom-10 right-4 z-40 flex max-w-sm flex-col gap-2">
      {savedElsewhere && savedElsewhere.version > base ? (
        <SavedInAnotherTab saved={savedElsewhere} base={base} dirty={dirty} onOpen={() => leave(`/sketches/${info.sketchId}`)} onDismiss={() => flow.setState({ savedElsewhere: undefined })} />
      ) : null}
      {!draft && !restored && !elsewhereSeen && elsewhere.length ? <OpenInAnotherTab drafts={elsewhere} onDismiss={() => setElsewhereSeen(true)} /> : null}
      {draft && !restored ? (
        <KeptWork
          draft={draft}
          latest={info.latest}
          workspaceId={info.workspaceId}
          onDiscard={() => {
            discardDraft(info.sketchId, draft.tab ?? "");
            setDraft(null);
          }}
        />
      ) : null}
      {forked ? (
        <div role="status" data-testid="forked-notice" className={`${CARD} border-ink/15 bg-paper-card`}>
          <p>
            <strong>“{forked.title}”</strong> is a new sketch, forked from v{forked.from} of this one. This editor stays on “{info.title}”.
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            {/* a plain link: with unsaved changes here, the browser asks before leaving (and they are kept) */}
            <a href={`/sketches/${forked.id}`} className="rounded-md bg-ink px-2.5 py-1 font-medium text-paper hover:bg-ink-soft">
              Open the fork
            </a>
            <button type="button" onClick={() => setForked(null)} className={CARD_BUTTON}>
              Stay here
            </button>
          </div>
        </div>
      ) : null}
      {madeLatest ? (
        <div role="status" data-testid="made-latest" className={`${CARD} border-ink/15 bg-paper-card`}>
          <p>
            <strong>v{madeLatest.number}</strong> is now the latest: a copy of v{madeLatest.restoredFrom}. The editor shows v{madeLatest.number}; v{madeLatest.restoredFrom} stays in the history.
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            <button type="button" onClick={() => setMadeLatest(null)} className={CARD_BUTTON}>
              Got it
            </button>
          </div>
        </div>
      ) : null}
      {mergedHere ? (
        <div role="status" data-testid="merged-here" className={`${CARD} border-caution/40 bg-caution-soft`}>
          <p>{mergedHere}</p>
          <button type="button" onClick={() => setMergedHere(null)} className={`mt-2 ${CARD_BUTTON}`}>
            Got it
          </button>
        </div>
      ) : null}
            {restored && restoredNotice ? (
        <div role="status" data-testid="restored-work" className={`${CARD} border-caution/40 bg-caution-soft`}>
          <p>{restoredNotice}</p>
          <button type="button" onClick={() => flow.setState({ restoredNotice: undefined })} className={`mt-2 ${CARD_BUTTON}`}>
            Got it
          </button>
        </div>
      ) : null}
      </div>
    </div>
  );
}

/** The toolbar slot of a saved sketch (its own query client: the editor page has none). */
export function SavedSketchBar({ flow }: { flow: SaveFlow }) {
  return (
    <Providers>
      <Bar flow={flow} />
    </Providers>
  );
}
