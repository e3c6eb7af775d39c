"use client";
// "Results", under the drawing: the status in words, the reactions (force on the body or load on
// the support), the hand check, and the cautions and assumptions beside them.
import { useState } from "react";
import { useAnalysis, useEditor } from "@/canvas/context";
import { CasesPanel } from "@/components/studies/CasesPanel";
import { downloadCsv } from "@/components/studies/csv";
import { reactionTable } from "@/solver/report";
import { SweepPanel } from "@/components/studies/SweepPanel";
import { CautionsAside, CautionsLine } from "./CautionsAside";
import { HandCheckView } from "./HandCheckView";
import { ReactionsTable, type Sense } from "./ReactionsTable";
import { StatusBanner } from "./StatusBanner";

type Tab = "reactions" | "hand" | "cases" | "sweep";

export function ResultsDock() {
  const [tab, setTab] = useState<Tab>("reactions");
  const [sense, setSense] = useState<Sense>("body");
  const flows = useEditor((s) => s.sketch.ports.length > 0);
  return (
    // the studies need room: the dock grows while one of them is open
    <section aria-label="Results" className={`flex shrink-0 border-t border-rule bg-paper ${tab === "cases" || tab === "sweep" ? "h-[min(600px,64vh)]" : "h-[292px]"}`}>
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
              ).map(([id, label]) => (
                <button
                  key={id}
                  type="button"
                  role="radio"
                  aria-checked={sense === id}
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
  const shown = useAnalysis((s) => s.shown);
  const units = useEditor((s) => s.units);
  return (
    <button
      type="button"
      className="order-last ml-2 pb-1 text-[12px] text-ink-soft hover:text-ink disabled:opacity-40"
      disabled={!shown}
      aria-label="Download the reactions as CSV"
      onClick={() => shown && downloadCsv(reactionTable(shown, units, { onSupport: sense === "support" }), sense === "support" ? "loads-on-supports" : "reactions")}
    >
      CSV
    </button>
  );
}
