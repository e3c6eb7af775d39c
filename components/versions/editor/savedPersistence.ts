// The editor's persistence for a saved sketch, over the versions API: load a version, and save
// the next one on top of it. Saving asks for a message first and may meet a conflict; those
// steps are shown by <SavedSketchBar>, which reads and answers the controller's state.
import { createStore, type StoreApi } from "zustand/vanilla";
import type { LoadOutcome, SaveOutcome, SketchPersistence } from "@/canvas/persistence";
import { readUnitsPreference } from "@/components/sketches/format";
import { uploadFile } from "@/components/uploads/uploadFile";
import { apiFetch, ApiError } from "@/lib/api-client";
import { can, type Role } from "@/lib/roles";
import type { SketchFile } from "@/solver/schema";
import { discardDraft, keepDraft, newTabId, readDraft } from "./drafts";
import type { SavedElsewhere } from "./savedElsewhere";
import { SKETCH_NOT_FOUND_MESSAGE } from "./notFound";
import equal from "fast-deep-equal";
import { current, draftOnNewest, restoredNotice } from "./restoreDraft";

export type SketchInfo = { sketchId: string; workspaceId: string; workspaceName: string; title: string; role: Role; latest: number };

export type SaveFlowState = {
  info: SketchInfo | null;
  /** this tab's name for its drafts (`drafts.ts`): another tab's unsaved work is never written over */
  tab: string;
  /** a newer version another tab of this browser saved while this one has the sketch open */
  savedElsewhere?: SavedElsewhere;
  /** the version the editor's sketch is based on (the next save names it) */
  base: number | null;
  /** a save the user started: the message dialog is open until it resolves */
  pending: { sketch: SketchFile; resolve: (o: SaveOutcome) => void } | null;
  /** the document of `base` as saved: a save of the very same document is refused in words */
  baseDoc?: SketchFile;
  /** the last version saved from this page */
  lastSaved: { number: number; at: string } | null;
  /** the editor shows kept work (restored draft) instead of a saved version */
  restored: boolean;
  /** what to say once the kept work is shown (merged onto the newest version, any clashes named) */
  restoredNotice?: string;
  /** the editor's status line (set by the toolbar slot once it is mounted) */
  notice?: (text: string) => void;
};

export type SaveFlow = StoreApi<SaveFlowState>;

type SketchResponse = { sketch: { id: string; workspaceId: string; workspaceName: string; title: string; role: Role; latestVersion: number } };
type VersionResponse = { version: { number: number; document: SketchFile } };

export function createSaveFlow(): SaveFlow {
  return createStore<SaveFlowState>(() => ({ info: null, tab: newTabId(), base: null, pending: null, lastSaved: null, restored: false }));
}

/** The same document, whatever order its keys come in (the database keeps its own) and whatever format version it was saved in. */
export function sameDocument(a: SketchFile, b: SketchFile): boolean {
  return equal(current(a), current(b));
}

function loadFailure(err: unknown): LoadOutcome {
  if (err instanceof ApiError && err.status === 401) return { ok: false, reason: "signed-out", message: "Sign in to open this sketch." };
  if (err instanceof ApiError && err.status === 404)
    return {
      ok: false,
      reason: "not-found",
      // a member of the workspace it was deleted from is told who deleted it and when (`error.deleted`)
      message: err.detail.deleted ? err.message : SKETCH_NOT_FOUND_MESSAGE,
    };
  return { ok: false, reason: "unavailable", message: err instanceof ApiError ? err.message : "The sketch could not be loaded. Try again in a moment." };
}

/**
 * `version`: open that version instead of the latest. `restore`: open the work kept in this
 * browser (after a conflict) on top of the latest version: that tab's draft (`draft`), or the
 * newest of any tab's.
 */
export function savedPersistence(sketchId: string, flow: SaveFlow, opts: { version?: number; restore?: boolean; draft?: string } = {}): SketchPersistence {
  return {
    kind: "saved",
    autosave: false,
    historyKey: `sketch:${sketchId}`,
    describe(title) {
      const info = flow.getState().info;
      if (!info) return "Saved sketch";
      // the sketch's name only where the drawing's title differs from it (renamed in its details)
      return title?.trim() === info.title ? info.workspaceName : `${info.title} · ${info.workspaceName}`;
    },
    async load() {
      try {
        const { sketch: s } = await apiFetch<SketchResponse>(`/api/sketches/${sketchId}`);
        const info: SketchInfo = { sketchId, workspaceId: s.workspaceId, workspaceName: s.workspaceName, title: s.title, role: s.role, latest: s.latestVersion };
        const draft = opts.restore ? (readDraft(sketchId, opts.draft) ?? readDraft(sketchId)) : null;
        if (draft) {
          // merged into the newest version: a colleague's save since the draft's base stays
          const merged = await draftOnNewest(draft, s.latestVersion);
          // this tab keeps the draft from now on (under its own name: the tab that kept it, if
          // still open, goes on writing its own)
          const { tab } = flow.getState();
          if (draft.tab !== tab && keepDraft({ ...draft, tab })) discardDraft(sketchId, draft.tab ?? "");
          flow.setState({ info, base: s.latestVersion, restored: true, restoredNotice: restoredNotice(merged, draft.baseVersion, readUnitsPreference()) });
          return { ok: true, sketch: merged.sketch, version: s.latestVersion, readOnly: !can(s.role, "version.save") };
        }
        const number = opts.version && opts.version <= s.latestVersion ? opts.version : s.latestVersion;
        const { version } = await apiFetch<VersionResponse>(`/api/sketches/${sketchId}/versions/${number}`);
        flow.setState({ info, base: version.number, baseDoc: version.document, restored: false });
        return { ok: true, sketch: version.document, version: version.number, readOnly: !can(s.role, "version.save") };
      } catch (err) {
        return loadFailure(err);
      }
    },
    save(sketch) {
      const { info, pending } = flow.getState();
      if (!info) return Promise.resolve({ ok: false, reason: "error", message: "The sketch has not finished loading." });
      if (!can(info.role, "version.save")) {
        const message = `Not saved: as ${info.role} in ${info.workspaceName} you read sketches but do not save versions.`;
        // after the editor's own "Saving…", which it writes once this call returns
        setTimeout(() => flow.getState().notice?.(message), 0);
        return Promise.resolve({ ok: false, reason: "forbidden", message });
      }
      if (pending) return Promise.resolve({ ok: false, reason: "error", message: "A save is already waiting for its message." });
      const { baseDoc, base, restored } = flow.getState();
      if (!restored && baseDoc && sameDocument(sketch, baseDoc)) {
        const message = `Nothing to save: the sketch is as v${base} has it. Change something first.`;
        setTimeout(() => flow.getState().notice?.(message), 0);
        return Promise.resolve({ ok: false, reason: "invalid", message });
      }
      return new Promise<SaveOutcome>((resolve) => flow.setState({ pending: { sketch, resolve } }));
    },
    async uploadUnderlay(file) {
      const info = flow.getState().info;
      if (!info) throw new Error("The sketch has not finished loading.");
      if (!can(info.role, "upload.underlay")) throw new Error(`As ${info.role} in ${info.workspaceName} you may not upload drawings to this sketch.`);
      const u = await uploadFile(`/api/sketches/${sketchId}/uploads`, file);
      return { id: u.id, width: u.width, height: u.height, name: u.name };
    },
  };
}
