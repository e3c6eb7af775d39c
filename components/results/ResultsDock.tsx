"use client";
// "Results", under the drawing: the status in words, the reactions (force on the body or load on
// the support), the hand check, and the cautions and assumptions beside them.
import { useEffect, useState } from "react";
import { radioKeys } from "@/components/shell/controls";
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

type Tab = "reactions" | "hand" | "cases" | "sweep";

/** The dock's height the user dragged to (px), kept for the next visit; none: the tab's own height. */
const HEIGHT_KEY = "counterpoise:results-height";
const MIN_HEIGHT = 150;

/** The reactions' own height in a window this tall: 292 px on a laptop, more of a taller screen (up to 420 px) so the table's rows show under the words, never more than 38% of it. */
export function ownHeight(windowHeight: number): number {
  return Math.max(292, Math.min(420, Math.round(windowHeight * 0.38)));
}

/** The most the dock may take of a window this tall: the drawing keeps room to be drawn in. */
export function dockLimit(windowHeight: number): number {
  return Math.max(MIN_HEIGHT, windowHeight - 260);
}

/** The window's height, followed as it changes (a saved height is held to the window it is shown in). */
function useWindowHeight(): number {
  const [h, setH] = useState(() => (typeof window === "undefined" ? 900 : window.innerHeight));
  useEffect(() => {
    const on = () => setH(window.innerHeight);
    window.addEventListener("resize", on);
    return () => window.removeEventListener("resize", on);
  }, []);
  return h;
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
function Resizer({ height, onChange }: { height: number; onChange: (h: number | null) => void }) {
  const clamp = (h: number) => Math.round(Math.max(MIN_HEIGHT, Math.min(h, dockLimit(window.innerHeight))));
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
  const [sense, setSense] = useState<Sense>("body");
  const flows = useEditor((s) => s.sketch.ports.length > 0);
  const [chosen, setChosen] = useState<number | null>(readHeight);
  const study = tab === "cases" || tab === "sweep";
  // the studies need room: the dock grows while one of them is open, leaving the drawing half the window
  const windowHeight = useWindowHeight();
  // a height saved in a taller window (or another device's) is held to this one, never past the drawing's room
  const height = Math.min(chosen ?? (study ? Math.min(560, Math.round(windowHeight * 0.5)) : ownHeight(windowHeight)), dockLimit(windowHeight));
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
    <section aria-label="Results" className="relative flex shrink-0 border-t border-rule bg-paper" style={{ height }} data-testid="results-dock">
      <Resizer height={height} onChange={choose} />
      <div className="flex min-w-0 flex-1 flex-col px-3 pt-2">
        <StatusBanner />
        <CautionsLine flows={flows} />
        {/* on a narrow screen the switch goes under the tabs, never breaking a label over lines */}
        <div className="mt-2 flex flex-wrap items-center gap-x-1 border-b border-rule">
          <div role="tablist" aria-label="Results views" className="flex">
            {(
              [
                ["reactions", "Reactions"],
                ["hand", "Hand check"],
                ["cases", "Cases"],
                ["sweep", "Sweep"],
              ] as const
            ).map(([id, label]) => (
              <button
                key={id}
                type="button"
                role="tab"
                id={`tab-${id}`}
                aria-selected={tab === id}
                aria-controls={`panel-${id}`}
                onClick={() => setTab(id)}
                className={`-mb-px whitespace-nowrap border-b-2 px-3 py-1 text-[12.5px] font-medium ${tab === id ? "border-accent text-ink" : "border-transparent text-ink-faint hover:text-ink"}`}
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
                  className={`rounded px-2 py-0.5 ${sense === id ? "bg-reaction-soft font-semibold text-reaction" : "text-ink-soft hover:text-ink"}`}
                >
                  {label}
                </button>
              ))}
            </div>
          )}
        </div>
        <div id={`panel-${tab}`} role="tabpanel" aria-labelledby={`tab-${tab}`} className="relative min-h-0 flex-1 overflow-auto py-2">
          {tab === "reactions" ? <ReactionsTable sense={sense} /> : tab === "hand" ? <HandCheckView /> : tab === "cases" ? <CasesPanel /> : <SweepPanel />}
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
  return (
    <button
      type="button"
      className="order-last ml-2 pb-1 text-[12px] text-ink-soft hover:text-ink disabled:opacity-40"
      disabled={!shown}
      aria-label="Download the reactions as CSV"
      // the supports by their labels, as the table on screen names them
      onClick={() => shown && downloadCsv(reactionTable(shown, units, { onSupport: sense === "support", names: elementNames(sketch) }), csvName(sense === "support" ? "loads-on-supports" : "reactions"))}
    >
      CSV
    </button>
  );
}
