// Numbers and words the sketch screens share. Browser-safe.
import { formatQuantity } from "@/solver/units";

/** A force in SI with 3–4 significant figures ("4.62 kN"), or a dash. */
export function formatForce(newtons: number | null | undefined): string {
  return newtons === null || newtons === undefined || !Number.isFinite(newtons) ? "—" : formatQuantity(newtons, "force", "SI");
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
