// The display unit of each swept quantity: forces in kN / lbf, a fixed support's moment in
// kN·m / lbf·ft (N, N·m for a plot that stays below a kilonewton), the friction needed as a plain ratio. The chart, the limit finder's target and
// the calc sheet all convert through here, so a moment is never shown or converted as a force.
import type { QuantityComponent } from "@/solver/quantity";
import { columnUnit } from "@/solver/report";
import { evaluateTyped, toFieldNumber } from "@/solver/expressions";
import { convert, formatNumber, type Quantity, type UnitSystem } from "@/solver/units";

export type DisplayKind = Extract<Quantity, "force" | "moment" | "ratio">;

export function displayKind(component: QuantityComponent): DisplayKind {
  if (component === "m") return "moment";
  if (component === "frictionRatio") return "ratio";
  return "force";
}

/** "kN", "kN·m", "lbf", "lbf·ft", or "" for a ratio. Given `largest` (SI), a plot whose forces
 *  (moments) all stay below 1 kN (1 kN·m) is drawn in N (N·m), as the tables are. */
export function displayUnit(component: QuantityComponent, system: UnitSystem, largest?: number): string {
  const kind = displayKind(component);
  return kind === "ratio" ? "" : columnUnit(kind, system, largest);
}

/** A value in SI (N, N·m) in the display unit (of a plot whose largest value is `largest`). */
export function toDisplay(valueSI: number, component: QuantityComponent, system: UnitSystem, largest?: number): number {
  const kind = displayKind(component);
  if (kind === "ratio") return valueSI;
  return valueSI * convert(1, kind, system, columnUnit(kind, system, largest)).value;
}

/** The largest magnitude of each kind of quantity over a sweep's series, for its plot's units. */
export function largestByKind(components: readonly QuantityComponent[], series: ReadonlyArray<ReadonlyArray<number | null>>): Record<DisplayKind, number> {
  const out: Record<DisplayKind, number> = { force: 0, moment: 0, ratio: 0 };
  series.forEach((ys, s) => {
    const kind = displayKind(components[s]);
    for (const y of ys) if (y !== null && Number.isFinite(y)) out[kind] = Math.max(out[kind], Math.abs(y));
  });
  return out;
}

/** A value typed in the display unit, back in SI. */
export function fromDisplay(value: number, component: QuantityComponent, system: UnitSystem, largest?: number): number {
  return value / toDisplay(1, component, system, largest);
}

/**
 * A limit's target as typed: a plain number is in the display unit (as the label beside it says),
 * or a value with its own unit ("2 kN", "450 lbf", "1.2 kN m"). Returns it in SI (N, N·m, or the
 * ratio) and as it reads in the answer, in the display unit like every other figure beside it
 * ("20 N·m"; "100 lbf" typed on a screen in SI reads "444.8 N"); throws an error in words when
 * the text is not a value of that kind.
 */
export function parseTarget(text: string, component: QuantityComponent, system: UnitSystem, largest?: number): { si: number; shown: string } {
  const v = evaluateTyped(text);
  const unit = displayUnit(component, system, largest);
  if (typeof v !== "number") {
    const si = toFieldNumber(v, displayKind(component));
    return { si, shown: `${formatNumber(toDisplay(si, component, system, largest), 4)}${unit ? ` ${unit}` : ""}` };
  }
  return { si: fromDisplay(v, component, system, largest), shown: `${v}${unit ? ` ${unit}` : ""}` };
}

/** Only a margin crossing zero means something happened: a contact lifts, a tie goes slack, or
 *  friction is used up. A moment or a force changing sign is no event. */
export const marksZero = (component: QuantityComponent): boolean => component === "margin" || component === "frictionMargin";
