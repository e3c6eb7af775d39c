// Where a comment is pinned, in words: "on front bearer", "at (1.2, 0.4) m", "on the whole version".
// Browser-safe: the review screen and the calc sheet's check record say it the same way.
import { formatNumber } from "@/solver/units";

export type PinLike = { kind: "element"; elementId: string } | { kind: "point"; at: [number, number] };

export function pinWords(pin: PinLike | null, labels: Record<string, string>): string {
  if (!pin) return "on the whole version";
  if (pin.kind === "element") return `on ${labels[pin.elementId] ?? pin.elementId}`;
  return `at (${formatNumber(pin.at[0], 3)}, ${formatNumber(pin.at[1], 3)}) m`;
}

/** Every element's label by id (its id when it has none): what a pin names. */
export function elementLabels(doc: { bodies: Item[]; supports: Item[]; loads: Item[]; ports: Item[]; massSources: Item[] }): Record<string, string> {
  const out: Record<string, string> = {};
  for (const e of [...doc.bodies, ...doc.supports, ...doc.loads, ...doc.ports, ...doc.massSources]) out[e.id] = e.label || e.id;
  return out;
}
type Item = { id: string; label?: string };
