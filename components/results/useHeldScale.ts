"use client";
// A table's units are chosen by its largest value (N below 1 kN, kip from 10 kip). While a drag
// runs, the units stay those the table had when it began, so a value crossing 1 kN does not
// flip the whole table between N and kN under the pointer; they are chosen afresh on release.
import { useState } from "react";
import type { Scale } from "@/solver/report";
import { useEditor } from "@/canvas/context";

export function useHeldScale(scale: Scale | undefined): Scale | undefined {
  const dragging = useEditor((s) => s.gesture !== null);
  const [held, setHeld] = useState<Scale | undefined>(undefined);
  // state from the render before: set while rendering, as React's docs do for derived state
  if (dragging && !held && scale) setHeld(scale);
  if (!dragging && held) setHeld(undefined);
  return dragging && held ? held : scale;
}
