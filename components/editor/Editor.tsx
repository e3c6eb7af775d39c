"use client";
// The sketch editor: the tray and element list on the left, the canvas in the middle with the
// results under it, properties and parameters on the right. The sketch is loaded from and kept
// by a SketchPersistence (local storage for the scratch sketch; the versions API later).
import dynamic from "next/dynamic";
import Link from "next/link";
import { useCallback, useEffect, useLayoutEffect, useRef, useState, type KeyboardEvent as ReactKeyboardEvent, type ReactNode } from "react";
import { EditorProvider, useEditor, useStores } from "@/canvas/context";
import { createEditorStore, type EditorStore } from "@/canvas/store";
import { keepHistory, restoreHistory, type HistoryStorage } from "@/canvas/keptHistory";
import { createInteractionStore } from "@/canvas/konva/interaction";
import type { PointerController } from "@/canvas/konva/pointer";
import { noticesFollowTool, toolHint, type ActionContext } from "@/canvas/actions";
import type { SketchPersistence } from "@/canvas/persistence";
import type { SketchFile } from "@/solver/schema";
import { startAutosave } from "@/canvas/autosave";
import { exampleById, type Example } from "@/canvas/examples";
import { emptySketch } from "@/canvas/model/elements";
import { replaceSketch } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import { readSnapPreference, readUnitsPreference, writeSnapPreference, writeUnitsPreference } from "@/components/sketches/format";
import { ResultsDock } from "@/components/results/ResultsDock";
import { ImportErrorDialog } from "./ImportErrorDialog";
import { Outline } from "./Outline";
import { CanvasSummary } from "./CanvasSummary";
import { ResultAnnouncer } from "./ResultAnnouncer";
import { PropertiesPanel } from "./PropertiesPanel";
import { KeysDialog } from "./KeysDialog";
import { CsvSubject } from "@/components/studies/csv";
import { Toolbar } from "./Toolbar";
import { Tray } from "./Tray";
import { ActionContextCtx, useActionContext } from "./useActions";
import { PersistenceCtx } from "./usePersistence";
import { useFileOps } from "./useFileOps";
import { useShortcuts } from "./useShortcuts";
import { OtherTabNotice, useOtherTab, type AutosaveHold } from "./OtherTab";

const SketchCanvas = dynamic(() => import("@/canvas/konva/SketchCanvas"), {
  ssr: false,
  loading: () => <div className="flex h-full items-center justify-center text-sm text-ink-faint">Preparing the drawing…</div>,
});


/** The result downloads are named after the sketch ("DN150-bend-reactions.csv"), and so is the
 *  browser's tab: several sketches open at once are told apart. */
function EditorCsvSubject({ children }: { children: ReactNode }) {
  const title = useEditor((s) => s.sketch.title) ?? "";
  useEffect(() => {
    if (!title.trim()) return;
    const before = document.title;
    document.title = `${title.trim()} · Counterpoise`;
    return () => void (document.title = before);
  }, [title]);
  return <CsvSubject.Provider value={title}>{children}</CsvSubject.Provider>;
}

/** A phone or a tablet: a touch screen's words (taps, Done) show instead of the keys' (Shift, Esc). */
const KEYS_ONLY = "max-md:hidden pointer-coarse:hidden";
const TOUCH_ONLY = "hidden max-md:inline pointer-coarse:inline";

/** Words for a keyboard and a mouse, or for a touch screen, whichever the layout shows. */
function KeysOrTouch({ keys, touch }: { keys: string; touch: string }) {
  if (keys === touch) return <>{keys}</>;
  return (
    <>
      <span className={KEYS_ONLY}>{keys}</span>
      <span className={TOUCH_ONLY}>{touch}</span>
    </>
  );
}

/**
 * Ends the tool in use: a polygon with three corners or more is closed, any other tool put down
 * (a touch screen has no Esc).
 */
function useStopTool() {
  const getCtx = useActionContext();
  return () => {
    const ctx = getCtx();
    const t = ctx.stores.editor.getState().tool;
    if (t.kind === "body" && t.shape === "polygon" && t.points.length >= 3 && ctx.controller) ctx.controller.finishPolygon();
    else if (!ctx.controller?.cancel()) ctx.stores.editor.getState().setTool({ kind: "select" });
  };
}

/**
 * Whether a clamped line's text runs past what it shows (its two lines), measured after each
 * change of `text` and of the line's width: a notice cut short gets its "More" button.
 */
function useCutShort(text: string | null) {
  const ref = useRef<HTMLParagraphElement>(null);
  const [cut, setCut] = useState(false);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el || text === null) return setCut(false);
    const measure = () => setCut(el.scrollHeight > el.clientHeight + 1);
    measure();
    if (typeof ResizeObserver === "undefined") return;
    const watch = new ResizeObserver(measure);
    watch.observe(el);
    return () => watch.disconnect();
  }, [text]);
  return { ref, cut };
}

function StatusLine() {
  const notice = useEditor((s) => s.notice);
  const tool = useEditor((s) => s.tool);
  const readOnly = useEditor((s) => s.readOnly);
  const stopTool = useStopTool();
  // while a tool is on, its own words lead the line (unless something newer was said), and go with it
  const keysTool = toolHint(tool);
  const touchTool = toolHint(tool, true);
  // short enough to be read whole beside a notice; a phone gets its gestures (? lists every key)
  const hint = readOnly
    ? "Read only: click an element to see its values · Space+drag: pan · wheel: zoom"
    : tool.kind === "select"
      ? "Drag: move · handles: turn, reshape · Shift+click: add to selection · Alt: no snap · Space+drag: pan · wheel: zoom"
      : "Esc: back to selecting · Alt: no snapping";
  const touchHint = tool.kind === "select" && !readOnly ? "Drag: move · two fingers: zoom and pan · ? lists the rest" : tool.kind === "select" ? hint : "two fingers: zoom and pan";
  const said = notice !== null || keysTool !== null;
  const saying = notice ?? (keysTool !== null && touchTool !== null ? <KeysOrTouch keys={keysTool} touch={touchTool} /> : null);
  // a notice longer than the line's two lines: "More" opens the whole of it over the drawing, for
  // keyboard and touch users too (a tooltip is for a mouse only); the line itself never grows, so
  // the drawing does not move while a drag keeps saying things
  const { ref: noticeRef, cut } = useCutShort(notice ?? keysTool);
  const [whole, setWhole] = useState(false);
  // a notice that fits again closes it: the next long one starts folded
  if (whole && !cut) setWhole(false);
  const showWhole = whole && cut;
  const moreRef = useRef<HTMLButtonElement>(null);
  const closeOnEscape = (e: ReactKeyboardEvent) => {
    if (e.key !== "Escape" || !showWhole) return;
    // the editor's own Escape (put the tool down, clear the selection) is not for this press
    e.preventDefault();
    e.stopPropagation();
    setWhole(false);
    moreRef.current?.focus();
  };
  return (
    // two lines tall, always (a notice coming and going must not resize the drawing): a notice may
    // take both, and on a narrow window it takes the whole width from the hint
    <div className="relative flex h-9 shrink-0 items-center gap-3 border-t border-rule bg-paper px-3 text-[11.5px] leading-[15px] pointer-coarse:h-12" id="canvas-help" onKeyDown={closeOnEscape}>
      <p ref={noticeRef} className="line-clamp-2 min-w-0 flex-1 text-ink-soft" aria-live="polite" data-testid="notice" title={notice ?? keysTool ?? undefined}>
        {saying}
      </p>
      {cut ? (
        <button
          ref={moreRef}
          type="button"
          onClick={() => setWhole(!showWhole)}
          aria-expanded={showWhole}
          aria-controls="notice-whole"
          aria-label={showWhole ? "Less of the message" : "More of the message"}
          className="h-7 shrink-0 rounded border border-ink/20 px-2 text-[12px] font-medium text-ink hover:border-ink/45 pointer-coarse:h-10 pointer-coarse:px-3"
          data-testid="notice-more"
        >
          {showWhole ? "Less" : "More"}
        </button>
      ) : null}
      {showWhole ? (
        // over the foot of the drawing, not in the line: nothing below or beside it moves
        <div
          id="notice-whole"
          role="region"
          aria-label="The whole message"
          className="absolute bottom-full left-0 right-0 z-20 max-h-48 overflow-y-auto border-t border-rule bg-paper px-3 py-2 text-[12.5px] leading-snug text-ink shadow-[0_-6px_18px_rgb(var(--shade)/0.12)]"
          data-testid="notice-whole"
        >
          <p className="max-w-[80ch] whitespace-pre-line">{saying}</p>
        </div>
      ) : null}
      <p className={`line-clamp-2 min-w-0 text-right text-ink-faint ${said ? "max-w-[45%] max-md:hidden" : "max-w-[70%]"}`} title={hint}>
        <KeysOrTouch keys={hint} touch={touchHint} />
      </p>
      {tool.kind !== "select" ? (
        <button
          type="button"
          onClick={stopTool}
          className="h-7 shrink-0 rounded border border-ink/20 px-2.5 text-[12.5px] font-medium text-ink hover:border-ink/45 pointer-coarse:h-10"
          title={tool.kind === "body" && tool.shape === "polygon" && tool.points.length >= 3 ? "Close the polygon" : "Back to selecting (Esc)"}
          data-testid="stop-tool"
        >
          Done
        </button>
      ) : null}
    </div>
  );
}

/** The tray of element kinds, or (for a role that may not edit) why there is none. */
function TrayOrReadOnly() {
  const readOnly = useEditor((s) => s.readOnly);
  if (!readOnly) return <Tray />;
  return (
    <div className="border-b border-rule px-3 py-3" role="note" data-testid="read-only-note">
      <p className="text-[12.5px] font-semibold text-ink">Read only — your role may not edit</p>
      <p className="mt-1 text-[12px] leading-snug text-ink-soft">You can select elements, read their properties and the results, and take moments about any point; nothing you do here changes the sketch.</p>
    </div>
  );
}

function Workspace({ persistence, saved, toolbarExtra, notice }: { persistence: SketchPersistence; saved: string | null; toolbarExtra?: ReactNode; notice?: ReactNode }) {
  const stores = useStores();
  const [interaction] = useState(createInteractionStore);
  // the properties panel on screens too narrow to show it beside the drawing (see the aside below)
  const [panelOpen, setPanelOpen] = useState(false);
  // the tray and the element list on phone-width screens
  const [trayOpen, setTrayOpen] = useState(false);
  // one panel over the drawing at a time; Escape closes it (a field's own Escape blurs it first)
  const openOverlay = (which: "panel" | "tray" | null) => {
    setPanelOpen(which === "panel");
    setTrayOpen(which === "tray");
  };
  useEffect(() => {
    if (!panelOpen && !trayOpen) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== "Escape" || e.defaultPrevented) return;
      const overPanel = panelOpen && window.matchMedia("(max-width: 1179px)").matches;
      const overTray = trayOpen && window.matchMedia("(max-width: 639px)").matches;
      if (!overPanel && !overTray) return;
      setPanelOpen(false);
      setTrayOpen(false);
      document.querySelector<HTMLElement>(`[data-testid=${overPanel ? "toggle-properties" : "toggle-tray"}]`)?.focus();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [panelOpen, trayOpen]);
  // choosing something to place closes the tray there, so the tap that places it lands on the drawing
  useEffect(
    () =>
      stores.editor.subscribe((s, prev) => {
        if (s.tool.kind !== prev.tool.kind && s.tool.kind !== "select") setTrayOpen(false);
      }),
    [stores],
  );
  // setting the underlay's scale on a narrow screen: the panel steps aside while the two marks are
  // tapped on the drawing, and comes back, with the focus at the distance, once both are down
  const panelOpenNow = useRef(panelOpen);
  useEffect(() => {
    panelOpenNow.current = panelOpen;
  }, [panelOpen]);
  useEffect(() => {
    let aside = false;
    return stores.editor.subscribe((s) => {
      const picking = s.tool.kind === "calibrate" && s.tool.points.length < 2;
      if (picking && panelOpenNow.current && window.matchMedia?.("(max-width: 1179px)").matches) {
        aside = true;
        setPanelOpen(false);
      } else if (!picking && aside) {
        aside = false;
        setPanelOpen(true);
        // the distance field (or the scale's button) mounted while the panel was hidden
        requestAnimationFrame(() => document.querySelector<HTMLElement>("#underlay-distance, [data-testid=underlay-calibrate]")?.focus());
      }
    });
  }, [stores]);
  // the notice line speaks for the tool in use: a change of tool takes its words away
  useEffect(() => noticesFollowTool(stores.editor), [stores]);
  const [keysOpen, setKeysOpen] = useState(false);
  const controllerRef = useRef<PointerController | null>(null);
  const setController = useCallback((c: PointerController | null) => {
    controllerRef.current = c;
  }, []);
  const inputRef = useRef<HTMLInputElement>(null);
  const files = useFileOps(stores, inputRef);
  const filesRef = useRef(files);
  useEffect(() => {
    filesRef.current = files;
  });

  const getCtx = useCallback(
    (): ActionContext => ({
      stores,
      controller: controllerRef.current,
      ui: {
        openImport: () => filesRef.current.openImport(),
        exportJson: () => filesRef.current.exportJson(),
        exportSvg: () => filesRef.current.exportSvg(),
        exportPng: () => void filesRef.current.exportPng(),
        newSketch: () => {
          stores.editor.getState().apply(replaceSketch({ sketch: emptySketch(), label: "New sketch" }) as Command<unknown>);
          stores.editor.getState().notify("A new, empty sketch. Undo brings the previous one back.");
        },
        save: () => {
          void persistence.save(stores.editor.getState().sketch);
          // a saved sketch asks for the version's message first: its dialog and the save say the rest
          if (persistence.kind === "scratch") stores.editor.getState().notify("Kept in this browser. Sign in to save it to a workspace.");
        },
        showKeys: () => setKeysOpen(true),
      },
    }),
    [stores, persistence],
  );
  useShortcuts(getCtx, interaction);

  const openExample = (id: string) => {
    const ex = exampleById(id);
    if (ex) openExampleOver(stores.editor, ex, "your sketch");
  };

  return (
    <PersistenceCtx.Provider value={persistence}>
      <ActionContextCtx.Provider value={getCtx}>
        <div className="flex h-screen min-h-[560px] flex-col bg-paper text-ink">
          <Toolbar
            where={(title) => persistence.describe(title)}
            saved={saved}
            onOpenExample={openExample}
            extra={toolbarExtra}
            panel={{ open: panelOpen, toggle: () => openOverlay(panelOpen ? null : "panel") }}
            tray={{ open: trayOpen, toggle: () => openOverlay(trayOpen ? null : "tray") }}
          />
          {notice}
          <div className="relative flex min-h-0 flex-1">
            <aside
              id="tray-panel"
              className={`flex w-[232px] shrink-0 flex-col border-r border-rule bg-paper sm:relative max-sm:absolute max-sm:inset-y-0 max-sm:left-0 max-sm:z-30 max-sm:shadow-[8px_0_24px_rgb(var(--shade)/0.14)] ${trayOpen ? "" : "max-sm:hidden"}`}
              aria-label="Add and elements"
            >
              <TrayOrReadOnly />
              <Outline />
            </aside>
            <main className="flex min-w-0 flex-1 flex-col" aria-label="Drawing and results">
              <div className="paper-sheet relative min-h-0 flex-1">
                <SketchCanvas interaction={interaction} onController={setController} />
                <CanvasSummary />
                <ResultAnnouncer />
              </div>
              <StatusLine />
              <EditorCsvSubject>
                <ResultsDock />
              </EditorCsvSubject>
            </main>
            {/* beside the drawing on wide screens; on narrower ones a panel over the drawing's right side, opened from the toolbar */}
            <aside
              id="properties-panel"
              className={`w-[336px] shrink-0 overflow-y-auto border-l border-rule bg-paper min-[1180px]:relative max-[1179px]:absolute max-[1179px]:inset-y-0 max-[1179px]:right-0 max-[1179px]:z-30 max-[1179px]:max-w-[90vw] max-[1179px]:shadow-[-8px_0_24px_rgb(var(--shade)/0.14)] ${panelOpen ? "" : "max-[1179px]:hidden"}`}
              aria-label="Properties and parameters"
            >
              <div className="flex items-center justify-end border-b border-rule px-3 py-1.5 min-[1180px]:hidden">
                <button type="button" onClick={() => setPanelOpen(false)} className="rounded px-2 py-0.5 text-[12.5px] font-medium text-ink-soft hover:bg-paper-deep hover:text-ink pointer-coarse:min-h-10 pointer-coarse:px-3" data-testid="close-properties">
                  Close ×
                </button>
              </div>
              <PropertiesPanel />
            </aside>
          </div>
          <input ref={inputRef} type="file" accept=".json,application/json" className="hidden" aria-label="Import a sketch file" data-testid="import-input" onChange={(e) => void files.onFile(e.target.files?.[0])} />
          {files.problem && <ImportErrorDialog problem={files.problem} onClose={files.clearProblem} />}
          <KeysDialog open={keysOpen} onClose={() => setKeysOpen(false)} />
        </div>
      </ActionContextCtx.Provider>
    </PersistenceCtx.Provider>
  );
}

function useAutosave(store: EditorStore, persistence: SketchPersistence, ready: boolean) {
  const [saved, setSaved] = useState<string | null>(null);
  // held while another tab's sketch waits for the user's choice (OtherTab.tsx)
  const control = useRef<AutosaveHold | null>(null);
  useEffect(() => {
    if (!ready || !persistence.autosave) return;
    const autosave = startAutosave(store, persistence, {
      onSaved: (out) => {
        if (out.ok) setSaved(new Date(out.savedAt).toLocaleTimeString([], { hour: "2-digit", minute: "2-digit", second: "2-digit" }));
      },
    });
    control.current = autosave;
    window.addEventListener("pagehide", autosave.flush);
    return () => {
      window.removeEventListener("pagehide", autosave.flush);
      autosave.flush();
      autosave.stop();
      control.current = null;
    };
  }, [store, persistence, ready]);
  return { saved, control };
}

/**
 * `signedOut`: the reader is not signed in, so signing in is the way on (and back to this sketch);
 * a signed-in reader would only be sent back here by the sign-in page, so is offered their workspaces.
 */
/** `back`: the way back when there is a better one than the workspaces list (the workspace a deleted sketch was in). */
export function SketchUnavailable({ message, signedOut, back }: { message: string; signedOut: boolean; back?: { href: string; label: string } }) {
  const [here] = useState(() => (typeof window === "undefined" ? "/sketches/new" : window.location.pathname + window.location.search));
  return (
    <div className="drafting-grid flex min-h-screen items-center justify-center px-6">
      <div className="max-w-md rounded-lg border border-rule bg-paper-card p-6 shadow-[0_1px_0_rgb(var(--rule))]">
        <h1 className="text-lg font-semibold">This sketch cannot be opened</h1>
        <p className="mt-2 text-[14px] leading-relaxed text-ink-soft" data-testid="unavailable-message">
          {message}
        </p>
        <div className="mt-5 flex gap-3 text-sm">
          {signedOut ? (
            // back to this sketch once signed in
            <Link href={`/sign-in?next=${encodeURIComponent(here)}`} className="rounded-md bg-ink px-3.5 py-1.5 font-medium text-paper hover:bg-ink-soft">
              Sign in
            </Link>
          ) : (
            <Link href={back?.href ?? "/workspaces"} className="rounded-md bg-ink px-3.5 py-1.5 font-medium text-paper hover:bg-ink-soft">
              {back?.label ?? "Your workspaces"}
            </Link>
          )}
          <Link href="/sketches/new" className="rounded-md border border-ink/20 px-3.5 py-1.5 font-medium hover:border-ink/40">
            Open a scratch sketch
          </Link>
        </div>
      </div>
    </div>
  );
}

/** Anything drawn or typed: an empty scratch sketch may simply be replaced. */
function hasContent(sketch: SketchFile): boolean {
  return sketch.bodies.length + sketch.supports.length + sketch.loads.length + sketch.ports.length + sketch.massSources.length > 0 || Object.keys(sketch.parameters ?? {}).length > 0;
}

/**
 * An example in place of the sketch, as one undo step; the notice leads with the undo hint (the
 * notice line is cut to the window's width). `yours` names what Undo brings back.
 */
function openExampleOver(store: EditorStore, ex: Example, yours: string) {
  // refused on a read-only sketch: the read-only notice stays, and nothing claims to have opened
  if (!store.getState().apply(replaceSketch({ sketch: ex.sketch, label: `Open the example “${ex.title}”` }) as Command<unknown>)) return;
  store.getState().notify(`Opened “${ex.title}”. Undo (Ctrl+Z) returns to ${yours}. ${ex.summary}`);
}

function dropExampleFromAddress() {
  const url = new URL(window.location.href);
  if (!url.searchParams.has("example")) return;
  url.searchParams.delete("example");
  window.history.replaceState(window.history.state, "", url);
}

/** The tab's session storage, or none where the browser refuses it. */
function sessionStore(): HistoryStorage | null {
  try {
    return typeof window !== "undefined" ? window.sessionStorage : null;
  } catch {
    return null;
  }
}

/** `toolbarExtra`: what the page adds at the toolbar's end (the versions work: save, version, history). */

export function Editor({ persistence, example, toolbarExtra }: { persistence: SketchPersistence; example?: string; toolbarExtra?: ReactNode }) {
  const [store] = useState(() => createEditorStore());
  const [phase, setPhase] = useState<{ kind: "loading" } | { kind: "ready" } | { kind: "failed"; message: string; signedOut: boolean }>({ kind: "loading" });
  const { saved, control } = useAutosave(store, persistence, phase.kind === "ready");
  const ready = phase.kind === "ready";
  const otherTab = useOtherTab(store, persistence, control, ready);
  // the undo history, kept for a reload of this tab once the sketch is open
  useEffect(() => (ready && persistence.historyKey && !store.getState().readOnly ? keepHistory(store, persistence.historyKey, sessionStore()) : undefined), [ready, persistence, store]);

  useEffect(() => {
    let live = true;
    store.getState().setUnits(readUnitsPreference());
    // snapping turned off while tracing stays off after a reload, as the units do
    store.getState().setSnap(readSnapPreference());
    const unsub = store.subscribe((s, p) => {
      if (s.units !== p.units) writeUnitsPreference(s.units);
      if (s.snap !== p.snap) writeSnapPreference(s.snap);
    });
    void persistence.load().then((out) => {
      if (!live) return;
      if (!out.ok && out.reason !== "invalid") {
        setPhase({ kind: "failed", message: out.message, signedOut: out.reason === "signed-out" });
        return;
      }
      const ex = example ? exampleById(example) : undefined;
      const kept = out.ok && out.sketch ? out : null;
      if (kept) store.getState().reset(kept.sketch);
      if (ex && kept && !kept.readOnly && hasContent(kept.sketch)) {
        // an example link never throws away the sketch kept here: opening it is one undo step
        openExampleOver(store, ex, "the sketch you had here");
      } else if (ex) store.getState().reset(ex.sketch);
      store.getState().setReadOnly(Boolean(out.ok && out.sketch && out.readOnly));
      // the example is kept at once, as any change is: the address loses ?example= below, so a
      // reload opens what is kept (over a kept sketch, Undo still goes back to it after the reload)
      if (ex && persistence.autosave && !store.getState().readOnly) void persistence.save(store.getState().sketch);
      // the undo history of this tab from before a reload, when it leads to the sketch opened
      if (kept && !ex && !kept.readOnly && persistence.historyKey) restoreHistory(store, persistence.historyKey, sessionStore());
      if (!out.ok) store.getState().notify(out.message);
      else if (example && !ex) store.getState().notify(`No example called “${example}”: pick one from “Open an example”.`);
      // the link has done its work: a reload must open the sketch as it now is, not the example again
      if (example) dropExampleFromAddress();
      setPhase({ kind: "ready" });
    });
    return () => {
      live = false;
      unsub();
    };
  }, [persistence, store, example]);

  if (phase.kind === "failed") return <SketchUnavailable message={phase.message} signedOut={phase.signedOut} />;
  if (phase.kind === "loading") return <div className="flex min-h-screen items-center justify-center text-sm text-ink-faint">Opening the sketch…</div>;
  return (
    <EditorProvider editor={store}>
      <Workspace persistence={persistence} saved={saved} toolbarExtra={toolbarExtra} notice={<OtherTabNotice {...otherTab} />} />
    </EditorProvider>
  );
}
