"use client";
// "Results", under the drawing: the status in words, the reactions (force on the body or load on
// the support), the hand check, and the cautions and assumptions beside them.
import { Activity, useEffect, useRef, useState, type RefObject } from "react";
import { radioKeys } from "@/components/shell/controls";
import { useTabList } from "@/components/shell/Tabs";
import { useAnalysis, useEditor } from "@/canvas/context";
import { elementNames } from "@/solver/cases";
import { CasesPanel } from "@/components/studies/CasesPanel";
import { downloadCsv, useCsvName } from "@/components/studies/csv";
import { reactionTable } from "@/solver/report";
import { SweepPanel } from "@/components/studies/SweepPanel";
import { CautionsAside, CautionsLine } from "./CautionsAside";
import { HandCheckView } from "./HandCheckView";
import { ReactionsTable, type Sense } from "./ReactionsTable";
import { StatusBanner } from "./StatusBanner";
import { STALE_CSV } from "./staleCsv";
import { useResultScale } from "./useHeldScale";

type Tab = "reactions" | "hand" | "cases" | "sweep";
const TABS = [
  ["reactions", "Reactions"],
  ["hand", "Hand check"],
  ["cases", "Cases"],
  ["sweep", "Sweep"],
] as const;
const TAB_IDS = TABS.map(([id]) => id);

/** The dock's height the user dragged to (px), kept for the next visit; none: the tab's own height. */
const HEIGHT_KEY = "counterpoise:results-height";
const MIN_HEIGHT = 150;

/** What a wide window's toolbar and the drawing's hint line take above and below the drawing (px). */
const WIDE_CHROME = 84;
/** On a short window the drawing keeps this much height first (px): room for the body and, around
 *  it, the labels and arrows drawn at a fixed size on screen (about 285 px of them for a pump skid). */
export const DRAWING_KEEPS = 340;
/** The least the dock's own height gets on a short window: its status words, caution and tabs. */
const SHORT_MIN = 160;

/**
 * The reactions' own height in a window this tall: 292 px on a laptop, more of a taller screen (up
 * to 420 px) so the table's rows show under the words, never more than 38% of it. On a short window
 * (below about 720 px: a laptop with its browser's bars, a landscape tablet) the drawing first keeps
 * DRAWING_KEEPS, down to a dock of 160 px; the line above the dock gives either more.
 */
export function ownHeight(windowHeight: number): number {
  const own = Math.max(292, Math.min(420, Math.round(windowHeight * 0.38)));
  return Math.max(SHORT_MIN, Math.min(own, windowHeight - WIDE_CHROME - DRAWING_KEEPS));
}

/** Below this window width (Tailwind's `sm`) the drawing and the dock share one narrow column: a phone. */
export const NARROW_WIDTH = 640;
/** On a narrow screen, the least part of the window's height the drawing keeps, whatever tab is open. */
export const DRAWING_SHARE = 0.45;
/** On a phone, what the toolbar, the sketch's name and the hint line under the drawing take, while unmeasured. */
const NARROW_CHROME = 190;
/** The least a narrow screen's dock keeps: its tabs and a line or two, scrolled. */
const NARROW_MIN = 120;

/**
 * The most the dock may take of a window this tall (and this wide): the drawing keeps room to be
 * drawn in. On a narrow screen it keeps at least DRAWING_SHARE of the window: `room` is the height
 * the drawing and the dock share (the window less the toolbar and the hint line), measured on the
 * page; without it, the toolbar's usual height on a phone is taken.
 */
export function dockLimit(windowHeight: number, windowWidth = Infinity, room: number | null = null): number {
  if (windowWidth >= NARROW_WIDTH) return Math.max(MIN_HEIGHT, windowHeight - 260);
  const shared = room ?? windowHeight - NARROW_CHROME;
  return Math.max(NARROW_MIN, Math.floor(shared - DRAWING_SHARE * windowHeight));
}

/** The window's size, followed as it changes (a saved height is held to the window it is shown in). */
function useWindowSize(): { width: number; height: number } {
  const read = () => (typeof window === "undefined" ? { width: 1280, height: 900 } : { width: window.innerWidth, height: window.innerHeight });
  const [size, setSize] = useState(read);
  useEffect(() => {
    const on = () => setSize((prev) => {
      const next = read();
      return next.width === prev.width && next.height === prev.height ? prev : next;
    });
    window.addEventListener("resize", on);
    return () => window.removeEventListener("resize", on);
  }, []);
  return size;
}

/**
 * The height the drawing and the dock share: the drawing's box (the first box of the dock's
 * column) and the dock's own, together; what else the column holds (the hint line) is left out.
 * It stays the same as the dock grows or shrinks (the drawing gives or takes the difference), and
 * changes with the window. Null until measured, or when the dock has no drawing above it.
 */
function useSharedRoom(dock: RefObject<HTMLElement | null>): number | null {
  const [room, setRoom] = useState<number | null>(null);
  useEffect(() => {
    const el = dock.current;
    const drawing = el?.parentElement?.firstElementChild;
    if (!el || !drawing || drawing === el) return;
    const measure = () => {
      const h = Math.round(drawing.getBoundingClientRect().height + el.getBoundingClientRect().height);
      setRoom(h > 0 ? h : null);
    };
    measure();
    const ro = typeof ResizeObserver === "undefined" ? null : new ResizeObserver(measure);
    ro?.observe(drawing);
    ro?.observe(el);
    window.addEventListener("resize", measure);
    return () => {
      ro?.disconnect();
      window.removeEventListener("resize", measure);
    };
  }, [dock]);
  return room;
}

/** A tab's own height on a tall window never goes below the laptop's (px): the dock does not jump
 *  as a sketch gains its first few supports. */
const FITTED_FLOOR = 292;

/** How long the dock's content stays unchanged before its height is measured (ms). */
const SETTLE_MS = 120;

/**
 * The height the open tab's content needs in the dock (px): the column's fixed part (status,
 * caution line, tabs) plus what the panel holds, and the dock's top border. Null until measured
 * (or where nothing is laid out, as under jsdom); followed as the content changes.
 */
function useContentHeight(column: RefObject<HTMLElement | null>, panel: RefObject<HTMLElement | null>): number | null {
  const [need, setNeed] = useState<number | null>(null);
  useEffect(() => {
    const col = column.current;
    const pan = panel.current;
    if (!col || !pan || typeof ResizeObserver === "undefined") return;
    const measure = () => {
      const colH = col.getBoundingClientRect().height;
      if (!(colH > 0)) return setNeed(null);
      const inner = Array.from(pan.children).reduce((h, c) => h + c.getBoundingClientRect().height, 0);
      const style = getComputedStyle(pan);
      const pad = parseFloat(style.paddingTop) + parseFloat(style.paddingBottom) || 0;
      const h = Math.ceil(colH - pan.getBoundingClientRect().height + inner + pad + 1);
      setNeed((prev) => (prev === h ? prev : h));
    };
    // measured once things settle, not in the frame that changed them: a drag re-renders the table
    // every frame, and a layout read there (and the dock's height following it) would cost each
    // frame a whole layout and a redraw of the canvas
    const observed = new Set<Element>();
    let timer: ReturnType<typeof setTimeout> | undefined;
    const settle = () => {
      clearTimeout(timer);
      timer = setTimeout(() => {
        // newly mounted children only: observing one again would notify again, and loop
        for (const c of observed) {
          if (!c.isConnected) {
            ro.unobserve(c);
            observed.delete(c);
          }
        }
        for (const c of [col, ...Array.from(col.children), ...Array.from(pan.children)]) {
          if (!observed.has(c)) {
            observed.add(c);
            ro.observe(c);
          }
        }
        measure();
      }, SETTLE_MS);
    };
    const ro = new ResizeObserver(settle);
    const mo = new MutationObserver(settle);
    mo.observe(col, { childList: true });
    mo.observe(pan, { childList: true });
    settle();
    return () => {
      clearTimeout(timer);
      ro.disconnect();
      mo.disconnect();
    };
  }, [column, panel]);
  return need;
}

/**
 * The dock's height with no height chosen: the tab's own height for the window (`ownHeight`), or
 * less on a tall window when the open tab needs less (a sketch with a few supports), never below
 * the laptop's 292 px; the drawing takes the rest rather than the results leaving a gap.
 */
export function fittedHeight(own: number, content: number | null): number {
  if (content === null) return own;
  return Math.min(own, Math.max(Math.min(own, FITTED_FLOOR), content));
}

function readHeight(): number | null {
  if (typeof window === "undefined") return null;
  const v = Number(window.localStorage?.getItem(HEIGHT_KEY));
  return Number.isFinite(v) && v >= MIN_HEIGHT ? v : null;
}

/**
 * The line between the drawing and the results: drag it (or focus it and press ↑/↓) to give one
 * or the other more room; a double click goes back to the tab's own height.
 */
function Resizer({ height, limit, onChange }: { height: number; limit: number; onChange: (h: number | null) => void }) {
  const clamp = (h: number) => Math.round(Math.max(Math.min(MIN_HEIGHT, limit), Math.min(h, limit)));
  return (
    <div
      role="separator"
      aria-orientation="horizontal"
      aria-label="Resize the results (drag, or ↑ and ↓)"
      aria-valuenow={Math.round(height)}
      tabIndex={0}
      data-testid="results-resizer"
      className="absolute inset-x-0 -top-[4px] z-10 h-[8px] cursor-row-resize focus-visible:bg-accent/30 hover:bg-accent/15"
      onPointerDown={(e) => {
        e.preventDefault();
        const el = e.currentTarget;
        el.setPointerCapture?.(e.pointerId);
        const y0 = e.clientY;
        const h0 = height;
        const move = (ev: PointerEvent) => onChange(clamp(h0 + (y0 - ev.clientY)));
        const up = () => {
          el.removeEventListener("pointermove", move);
          el.removeEventListener("pointerup", up);
        };
        el.addEventListener("pointermove", move);
        el.addEventListener("pointerup", up);
      }}
      onDoubleClick={() => onChange(null)}
      onKeyDown={(e) => {
        if (e.key === "ArrowUp" || e.key === "ArrowDown") {
          e.preventDefault();
          onChange(clamp(height + (e.key === "ArrowUp" ? 24 : -24)));
        }
      }}
    />
  );
}

export function ResultsDock() {
  const [tab, setTab] = useState<Tab>("reactions");
  // the studies, once opened, are kept hidden (React's Activity) while another tab is shown: a
  // sweep's plot, its limit and the case table are there again on coming back. Hidden, their
  // updates wait for idle time (a drag is not slowed) and their effects stop: a run in progress is
  // stopped, as its Stop button would
  const [kept, setKept] = useState<ReadonlySet<Tab>>(() => new Set());
  const open = (id: Tab) => {
    setTab(id);
    if (id === "cases" || id === "sweep") setKept((k) => (k.has(id) ? k : new Set(k).add(id)));
  };
  // manual activation: the arrows move the focus and Enter or Space opens the tab. Opening Cases
  // or Sweep grows the dock and starts its panel, so the keyboard passing over a tab must not open it
  const tabList = useTabList({ tabs: TAB_IDS, selected: tab, onSelect: open, activation: "manual" });
  const [sense, setSense] = useState<Sense>("body");
  const flows = useEditor((s) => s.sketch.ports.length > 0);
  const [chosen, setChosen] = useState<number | null>(readHeight);
  const study = tab === "cases" || tab === "sweep";
  // the studies need room: the dock grows while one of them is open, leaving the drawing half the window
  const { width: windowWidth, height: windowHeight } = useWindowSize();
  const ref = useRef<HTMLElement>(null);
  const room = useSharedRoom(ref);
  const columnRef = useRef<HTMLDivElement>(null);
  const panelRef = useRef<HTMLDivElement>(null);
  const content = useContentHeight(columnRef, panelRef);
  // a height saved in a taller window (or another device's) is held to this one, never past the
  // drawing's room; on a phone the drawing keeps DRAWING_SHARE of the screen and the dock scrolls
  const limit = dockLimit(windowHeight, windowWidth, room);
  // the reactions and the hand check take what they need on a tall window, up to their own height;
  // a phone's column scrolls as a whole and keeps its own
  const own = windowWidth >= NARROW_WIDTH && !study ? fittedHeight(ownHeight(windowHeight), content) : ownHeight(windowHeight);
  const height = Math.min(chosen ?? (study ? Math.min(560, Math.round(windowHeight * 0.5)) : own), limit);
  const choose = (h: number | null) => {
    setChosen(h);
    try {
      if (h === null) window.localStorage?.removeItem(HEIGHT_KEY);
      else window.localStorage?.setItem(HEIGHT_KEY, String(h));
    } catch {
      // a browser that keeps nothing: the height lasts this visit
    }
  };
  return (
    <section ref={ref} aria-labelledby="results-heading" className="relative flex shrink-0 border-t border-rule bg-paper" style={{ height }} data-testid="results-dock">
      {/* the views' own headings (h3) sit under this one, whatever panels a phone folds away */}
      <h2 id="results-heading" className="sr-only">
        Results
      </h2>
      <Resizer height={height} limit={limit} onChange={choose} />
      {/* on a narrow screen the whole column scrolls (the status and the cautions take much of a
          phone's dock), the tabs held at its top; wider, only the open tab's panel scrolls */}
      <div ref={columnRef} className="flex min-w-0 flex-1 flex-col px-3 pt-2 max-sm:overflow-y-auto max-sm:overscroll-contain max-sm:pt-0" data-testid="results-column">
        {/* the column's top padding, inside the scrolling box: the tabs held at its top leave no gap above them */}
        <div className="h-2 shrink-0 sm:hidden" aria-hidden="true" />
        <StatusBanner />
        <CautionsLine flows={flows} />
        {/* on a narrow screen the switch goes under the tabs, never breaking a label over lines */}
        <div className="mt-2 flex flex-wrap items-center gap-x-1 border-b border-rule max-sm:sticky max-sm:top-0 max-sm:z-[1] max-sm:bg-paper">
          <div {...tabList.listProps("Results views")} className="flex">
            {TABS.map(([id, label]) => (
              <button
                key={id}
                {...tabList.tabProps(id)}
                className={`-mb-px whitespace-nowrap border-b-2 px-3 py-1 text-[12.5px] font-medium pointer-coarse:min-h-10 ${tab === id ? "border-accent text-ink" : "border-transparent text-ink-faint hover:text-ink"}`}
              >
                {label}
              </button>
            ))}
          </div>
          {tab === "reactions" && <ReactionsCsv sense={sense} />}
          {tab === "reactions" && (
            <div role="radiogroup" aria-label="Show the reactions as" className="ml-auto flex items-center gap-0.5 whitespace-nowrap pb-1 text-[12px]" data-testid="sense">
              {(
                [
                  ["body", "Force on the body"],
                  ["support", "Load on the support"],
                ] as const
              ).map(([id, label], i) => (
                <button
                  key={id}
                  type="button"
                  role="radio"
                  aria-checked={sense === id}
                  {...radioKeys(i, 2, sense === id, (k) => setSense(k === 0 ? "body" : "support"))}
                  onClick={() => setSense(id)}
                  className={`rounded px-2 py-0.5 pointer-coarse:min-h-10 ${sense === id ? "bg-reaction-soft font-semibold text-reaction" : "text-ink-soft hover:text-ink"}`}
                >
                  {label}
                </button>
              ))}
            </div>
          )}
        </div>
        <div ref={panelRef} {...tabList.panelProps()} className="relative min-h-0 flex-1 overflow-auto py-2 outline-none focus-visible:ring-2 focus-visible:ring-inset focus-visible:ring-accent/60 max-sm:flex-none max-sm:overflow-visible">
          {tab === "reactions" ? <ReactionsTable sense={sense} /> : tab === "hand" ? <HandCheckView /> : null}
          {kept.has("cases") && (
            <Activity mode={tab === "cases" ? "visible" : "hidden"}>
              <CasesPanel />
            </Activity>
          )}
          {kept.has("sweep") && (
            <Activity mode={tab === "sweep" ? "visible" : "hidden"}>
              <SweepPanel />
            </Activity>
          )}
        </div>
      </div>
      <CautionsAside flows={flows} />
    </section>
  );
}

/** The reactions as CSV, in the sense and units on screen. */
function ReactionsCsv({ sense }: { sense: Sense }) {
  const csvName = useCsvName();
  const shown = useAnalysis((s) => s.shown);
  const units = useEditor((s) => s.units);
  const sketch = useEditor((s) => s.sketch);
  const scale = useResultScale();
  // the result shown is an earlier sketch's: a file carries no fading, so none is offered
  const stale = useAnalysis((s) => s.stale);
  return (
    <button
      type="button"
      className="order-last ml-2 pb-1 text-[12px] text-ink-soft hover:text-ink disabled:opacity-40 pointer-coarse:min-h-10 pointer-coarse:min-w-10"
      disabled={!shown || stale}
      title={stale ? STALE_CSV : undefined}
      aria-label="Download the reactions as CSV"
      // the supports by their labels, as the table on screen names them
      onClick={() => shown && downloadCsv(reactionTable(shown, units, { onSupport: sense === "support", names: elementNames(sketch), scale }), csvName(sense === "support" ? "loads-on-supports" : "reactions"))}
    >
      CSV
    </button>
  );
}
