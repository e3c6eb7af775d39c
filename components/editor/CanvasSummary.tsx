"use client";
// The drawing in words, for a screen reader: what is drawn (each body with what is on it) and the
// result, read as the description of the drawing when it takes the focus. Not a live region: the
// words follow the sketch without being announced on every change.
import { useDeferredValue, useMemo } from "react";
import { useAnalysis, useEditor } from "@/canvas/context";
import { describeElement, GROUPS, kindOf, type AnyElement, type Attached } from "@/canvas/model/elements";
import type { SketchFile } from "@/solver/schema";
import { statusSentences } from "@/components/results/statusSentence";
import { useResultForceUnit } from "@/components/results/useHeldScale";

/** What is drawn, body by body: "Body b1 (Beam), with Pin s1 (left pin), Contact s2." */
export function drawnWords(sketch: SketchFile): string {
  const bodies = sketch.bodies;
  if (!bodies.length) return "Nothing drawn yet.";
  const on = new Map<string, string[]>(bodies.map((b) => [b.id, []]));
  const loose: string[] = [];
  for (const g of GROUPS) {
    if (g === "bodies") continue;
    for (const el of sketch[g] as AnyElement[]) {
      const words = describeElement({ kind: kindOf(g, el), el } as Parameters<typeof describeElement>[0]);
      const list = on.get((el as Attached).body);
      if (list) list.push(words);
      else loose.push(words);
    }
  }
  const lines = bodies.map((b) => {
    const list = on.get(b.id)!;
    return `${describeElement({ kind: "body", el: b } as Parameters<typeof describeElement>[0])}, ${list.length ? `with ${list.join(", ")}` : "with nothing on it yet"}.`;
  });
  if (loose.length) lines.push(`On no body: ${loose.join(", ")}.`);
  return lines.join(" ");
}

export function CanvasSummary() {
  const sketch = useDeferredValue(useEditor((s) => s.sketch));
  const shown = useDeferredValue(useAnalysis((s) => s.shown));
  const numeric = useDeferredValue(useAnalysis((s) => s.shownSketch));
  const stability = useDeferredValue(useAnalysis((s) => s.shownStability));
  const stale = useAnalysis((s) => s.stale);
  const units = useEditor((s) => s.units);
  // forces in the unit the results panel writes them in
  const forceUnit = useResultForceUnit(units);
  const result = useMemo(() => {
    if (!shown || !numeric) return "No result yet.";
    const said = statusSentences(numeric, shown, units, forceUnit, stability ?? undefined).map((s) => s.headline);
    if (!said.length) return "No result yet.";
    return `${stale ? "Last good result (the input has errors): " : "Result: "}${said.join(" ")}`;
  }, [shown, numeric, units, forceUnit, stale, stability]);
  const drawn = useMemo(() => drawnWords(sketch), [sketch]);
  return (
    <p id="canvas-summary" className="sr-only" data-testid="canvas-summary">
      {sketch.bodies.length ? `${drawn} ${result}` : drawn}
    </p>
  );
}
