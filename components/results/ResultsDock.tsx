"use client";
// The results under the canvas (expanded with the live results work).
import { useAnalysis } from "@/canvas/context";
import { CAUTION_SHORT } from "@/solver/cautions";

export function ResultsDock() {
  const shown = useAnalysis((s) => s.shown);
  const statuses = shown ? Object.entries(shown.bodies).map(([id, b]) => `${id}: ${b.status}`) : [];
  return (
    <section aria-label="Results" className="h-[240px] shrink-0 overflow-auto border-t border-rule bg-paper px-3 py-2 text-[13px]">
      <p data-testid="status">{statuses.join(" · ") || "Draw a body with supports to see its reactions."}</p>
      <p className="mt-2 text-[11.5px] text-caution">{CAUTION_SHORT}</p>
    </section>
  );
}
