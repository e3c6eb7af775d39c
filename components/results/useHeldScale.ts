"use client";
// A table's units are chosen by its largest value (N below 1 kN, kip from 10 kip). While a drag
// runs, the units stay those the table had when it began, so a value crossing 1 kN does not
// flip the whole table between N and kN under the pointer; they are chosen afresh on release.
import { useDeferredValue, useMemo, useState } from "react";
import { resultScale, unitFamily, type Scale } from "@/solver/report";
import type { UnitSystem } from "@/solver/units";
import { useAnalysis, useEditor } from "@/canvas/context";

export function useHeldScale(scale: Scale | undefined): Scale | undefined {
  const dragging = useEditor((s) => s.gesture !== null);
  const [held, setHeld] = useState<Scale | undefined>(undefined);
  // state from the render before: set while rendering, as React's docs do for derived state
  if (dragging && !held && scale) setHeld(scale);
  if (!dragging && held) setHeld(undefined);
  return dragging && held ? held : scale;
}

/**
 * The scale of the result shown (`resultScale`, with its factors of safety), held while a drag
 * runs: the reactions, the hand check, the factors of safety and the status sentences all write
 * their forces and moments in the one family it chooses, as the drawing does.
 */
export function useResultScale(): Scale | undefined {
  const shown = useDeferredValue(useAnalysis((s) => s.shown));
  const stability = useDeferredValue(useAnalysis((s) => s.shownStability));
  return useHeldScale(useMemo(() => (shown ? resultScale(shown, stability) : undefined), [shown, stability]));
}

/** The force unit of the result shown (`useResultScale`), for sentences written beside its tables. */
export function useResultForceUnit(units: UnitSystem): string | undefined {
  const scale = useResultScale();
  return scale ? unitFamily(units, scale).force : undefined;
}
