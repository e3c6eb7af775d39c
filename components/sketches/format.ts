// Numbers and words the sketch screens share. Browser-safe.
import { LBF_N } from "@/solver/constants";
import { formatQuantity, type UnitSystem } from "@/solver/units";
import { formatDateTime } from "@/components/workspaces/format";

/** Where the browser keeps the reader's choice of SI or US customary units (editor and review screens). */
export const UNITS_KEY = "counterpoise:units";

export function readUnitsPreference(): UnitSystem {
  if (typeof window === "undefined") return "SI";
  return window.localStorage.getItem(UNITS_KEY) === "US" ? "US" : "SI";
}

export function writeUnitsPreference(units: UnitSystem): void {
  if (typeof window !== "undefined") window.localStorage.setItem(UNITS_KEY, units);
}

/** Where the browser keeps whether the editor snaps to the grid and to outlines (on unless turned off). */
export const SNAP_KEY = "counterpoise:snap";

export function readSnapPreference(): boolean {
  return typeof window === "undefined" || window.localStorage.getItem(SNAP_KEY) !== "off";
}

export function writeSnapPreference(on: boolean): void {
  if (typeof window !== "undefined") window.localStorage.setItem(SNAP_KEY, on ? "on" : "off");
}

/** A force with 3–4 significant figures ("4.62 kN", "1,039 lbf"), or a dash. */
export function formatForce(newtons: number | null | undefined, units: UnitSystem = "SI"): string {
  return newtons === null || newtons === undefined || !Number.isFinite(newtons) ? "—" : formatQuantity(newtons, "force", units);
}

/** A force in a table column: 4 significant figures with their trailing zeros ("11.50 kN"), or a
 *  dash; in `unit` when given (the column's one unit, `forceColumnUnit`). */
export function formatForceCell(newtons: number | null | undefined, units: UnitSystem = "SI", unit?: string): string {
  return newtons === null || newtons === undefined || !Number.isFinite(newtons) ? "—" : formatQuantity(newtons, "force", units, { keepZeros: true, unit });
}

/**
 * One unit for a column of forces, as the result tables choose it (solver/report's `columnUnit`):
 * kN, or N when every value stays below 1 kN; lbf, or kip once one reaches 10 kip. So a listing
 * reads "0.9500 kN" under "38.23 kN", not "950.0 N".
 */
export function forceColumnUnit(newtons: Iterable<number | null | undefined>, units: UnitSystem = "SI"): string {
  let largest = 0;
  for (const v of newtons) if (v !== null && v !== undefined && Number.isFinite(v)) largest = Math.max(largest, Math.abs(v));
  if (units === "US") return largest / LBF_N >= 9999.5 ? "kip" : "lbf";
  return largest > 0 && largest < 999.95 ? "N" : "kN";
}

/** "just now", "5 min ago", "3 h ago", "2 days ago" (then the date). */
export function timeAgo(value: string | Date, now = Date.now()): string | null {
  const s = Math.round((now - new Date(value).getTime()) / 1000);
  if (s < 45) return "just now";
  if (s < 3600) return `${Math.round(s / 60)} min ago`;
  if (s < 86_400) return `${Math.round(s / 3600)} h ago`;
  if (s < 7 * 86_400) {
    const d = Math.round(s / 86_400);
    return `${d} day${d === 1 ? "" : "s"} ago`;
  }
  return null;
}

/**
 * A fork's default title: "Riser bend (fork)", and for a fork of that "Riser bend (fork 2)", then 3…;
 * the original's words are shortened, never the suffix, to keep within `max` characters.
 */
export function forkTitle(title: string, max = 120): string {
  const trimmed = title.trim();
  const m = /^(.*\S) \(fork(?: (\d+))?\)$/.exec(trimmed);
  const base = m ? m[1] : trimmed;
  const suffix = m ? ` (fork ${m[2] ? Number(m[2]) + 1 : 2})` : " (fork)";
  return `${base.slice(0, Math.max(0, max - suffix.length)).trimEnd()}${suffix}`;
}

/** The sentence a member of its workspace reads about a deleted sketch: the API's 404, the sketch's
 *  pages and the editor's address say the same. */
export function deletionSentence(gone: { title: string; deletedBy: string | null; deletedAt: Date | string; withWorkspace?: boolean }): string {
  const by = gone.deletedBy ? ` by ${gone.deletedBy}` : "";
  if (gone.withWorkspace) return `“${gone.title}” was deleted${by} on ${formatDateTime(gone.deletedAt)} with the workspace it was in, and all its versions. Forks of it in other workspaces keep their own copies.`;
  return `“${gone.title}” was deleted${by} on ${formatDateTime(gone.deletedAt)}, with all its versions. Forks of it keep their own copies.`;
}
