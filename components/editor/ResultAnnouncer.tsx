"use client";
// The result said to a screen reader, politely and once it has settled: after a drag ends, or a
// short pause in typing, not on every pointer move or key (the results panel changes on each).
import { useEffect, useMemo, useState } from "react";
import { useAnalysis, useEditor } from "@/canvas/context";
import { statusSentences } from "@/components/results/statusSentence";
import { useResultForceUnit } from "@/components/results/useHeldScale";

/** How long the result must stay the same before it is said (ms). */
export const SETTLE_MS = 700;

export function ResultAnnouncer({ settleMs = SETTLE_MS }: { settleMs?: number }) {
  const shown = useAnalysis((s) => s.shown);
  const numeric = useAnalysis((s) => s.shownSketch);
  // the factors of safety too: a body short of one is said so first, as in the results panel
  const stability = useAnalysis((s) => s.shownStability);
  const stale = useAnalysis((s) => s.stale);
  const units = useEditor((s) => s.units);
  // forces in the unit the results panel writes them in
  const forceUnit = useResultForceUnit(units);
  const dragging = useEditor((s) => s.gesture !== null);
  const hasBody = useEditor((s) => s.sketch.bodies.length > 0);
  const words = useMemo(() => {
    if (!hasBody || !shown || !numeric) return "";
    const said = statusSentences(numeric, shown, units, forceUnit, stability ?? undefined).map((s) => s.headline);
    return said.length ? `${stale ? "Last good result, the input has errors: " : ""}${said.join(" ")}` : "";
  }, [hasBody, shown, numeric, units, forceUnit, stale, stability]);
  const [said, setSaid] = useState("");
  useEffect(() => {
    if (dragging) return;
    const t = window.setTimeout(() => setSaid(words), settleMs);
    return () => window.clearTimeout(t);
  }, [words, dragging, settleMs]);
  return (
    <p role="status" className="sr-only" data-testid="result-announcer">
      {said}
    </p>
  );
}
