"use client";
// The reader's SI / US choice on the review screens, kept in the browser with the editor's and
// followed across tabs. The server renders SI; the browser's choice applies once hydrated.
import { useCallback, useSyncExternalStore } from "react";
import type { UnitSystem } from "@/solver/units";
import { readUnitsPreference, UNITS_KEY, writeUnitsPreference } from "./format";

const CHANGED = "counterpoise:units-changed";

function subscribe(onChange: () => void) {
  const onStorage = (e: StorageEvent) => e.key === UNITS_KEY && onChange();
  window.addEventListener("storage", onStorage);
  window.addEventListener(CHANGED, onChange);
  return () => {
    window.removeEventListener("storage", onStorage);
    window.removeEventListener(CHANGED, onChange);
  };
}

export function useUnitsPreference(): [UnitSystem, (units: UnitSystem) => void] {
  const units = useSyncExternalStore(subscribe, readUnitsPreference, () => "SI" as const);
  const set = useCallback((next: UnitSystem) => {
    writeUnitsPreference(next);
    window.dispatchEvent(new Event(CHANGED));
  }, []);
  return [units, set];
}

/** The two choices of the SI / US switch on the review screens. */
export const UNIT_OPTIONS = [
  { value: "SI", label: "SI", title: "SI units (kN, m, kPa)" },
  { value: "US", label: "US", title: "US customary units (lbf, ft, psi)" },
] as const satisfies ReadonlyArray<{ value: UnitSystem; label: string; title: string }>;
