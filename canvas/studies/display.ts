// The display unit of each swept quantity: forces in kN / lbf, a fixed support's moment in
// kN·m / lbf·ft, the friction needed as a plain ratio. The chart, the limit finder's target and
// the calc sheet all convert through here, so a moment is never shown or converted as a force.
import type { QuantityComponent } from "@/solver/quantity";
import { columnUnit } from "@/solver/report";
import { convert, type Quantity, type UnitSystem } from "@/solver/units";

export type DisplayKind = Extract<Quantity, "force" | "moment" | "ratio">;

export function displayKind(component: QuantityComponent): DisplayKind {
  if (component === "m") return "moment";
  if (component === "frictionRatio") return "ratio";
  return "force";
}

/** "kN", "kN·m", "lbf", "lbf·ft", or "" for a ratio. */
export function displayUnit(component: QuantityComponent, system: UnitSystem): string {
  const kind = displayKind(component);
  return kind === "ratio" ? "" : columnUnit(kind, system);
}

/** A value in SI (N, N·m) in the display unit. */
export function toDisplay(valueSI: number, component: QuantityComponent, system: UnitSystem): number {
  const kind = displayKind(component);
  if (kind === "ratio") return valueSI;
  return valueSI * convert(1, kind, system, columnUnit(kind, system)).value;
}

/** A value typed in the display unit, back in SI. */
export function fromDisplay(value: number, component: QuantityComponent, system: UnitSystem): number {
  return value / toDisplay(1, component, system);
}

/** Only a margin crossing zero means something happened: a contact lifts, a tie goes slack, or
 *  friction is used up. A moment or a force changing sign is no event. */
export const marksZero = (component: QuantityComponent): boolean => component === "margin" || component === "frictionMargin";
