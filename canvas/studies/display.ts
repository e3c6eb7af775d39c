// The display unit of each swept quantity: forces in kN / lbf, a fixed support's moment in
// kN·m / lbf·ft (N, N·m for a plot that stays below a kilonewton), the friction needed as a plain ratio. The chart, the limit finder's target and
// the calc sheet all convert through here, so a moment is never shown or converted as a force.
// Also the words a sweep says of its supports' states (a contact off the ground, a friction margin
// left out where its body is not held), shared by the Sweep tab, a version's page and the calc sheet.
import type { QuantityComponent } from "@/solver/quantity";
import { columnUnit } from "@/solver/report";
import { evaluateTyped, toFieldNumber } from "@/solver/expressions";
import { FLOW_FACTOR } from "@/solver/sweep";
import { convert, formatNumber, prettyUnit, type Quantity, type UnitSystem } from "@/solver/units";
import type { PointStretch, SweepData } from "./run";

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
  // a plain number is said as typed, its sign the true minus the tables and plots write
  return { si: fromDisplay(v, component, system, largest), shown: `${String(v).replace(/^-/, "−")}${unit ? ` ${unit}` : ""}` };
}

/** Only a margin crossing zero means something happened: a contact lifts, a tie goes slack, or
 *  friction is used up. A moment or a force changing sign is no event. */
export const marksZero = (component: QuantityComponent): boolean => component === "margin" || component === "frictionMargin";

/** The swept parameter as the words call it: the built-in flow factor by its name in words. */
export const parameterWords = (parameter: string): string => (parameter === FLOW_FACTOR ? "flow factor" : parameter);

/** Stretches of a sweep's points (a support off its seat, a body not held) said one by one; more are counted. */
export const MAX_STRETCHES = 4;

/** Where a stretch of a sweep's points lies, in words: "over the whole range (theta from −58 to 0 deg)",
 *  "at theta = −55 deg", "from theta = −55 to 0 deg". */
export function stretchWords(o: PointStretch, parameter: string, unit: string): string {
  const label = parameterWords(parameter);
  const u = unit ? ` ${prettyUnit(unit)}` : "";
  if (o.whole) return `over the whole range (${label} from ${formatNumber(o.from, 4)} to ${formatNumber(o.to, 4)}${u})`;
  if (o.points === 1) return `at ${label} = ${formatNumber(o.from, 4)}${u}`;
  return `from ${label} = ${formatNumber(o.from, 4)} to ${formatNumber(o.to, 4)}${u}`;
}

/** What a sweep's words read of it: its plotted quantities and where their supports are off their seat or their bodies not held. */
export type SweepStates = Pick<SweepData, "parameter" | "unit" | "quantities" | "off" | "notHeld" | "slips">;

/** A line of a sweep's words about its supports' states: a support off its seat ("off"), a contact
 *  short of friction ("slips"), a friction margin left out where its body is not held ("notHeld"),
 *  or how many more stretches there are ("more"). */
export interface SweepStateLine {
  kind: "off" | "notHeld" | "slips" | "more";
  words: string;
}

/**
 * Where a plotted contact is off the ground (a tie slack) over the range or a part of it, where a
 * plotted friction margin is below zero (the contact slips), and where a plotted friction margin is
 * left out because its body tips or is unrestrained, in words: the Sweep tab, a version's page
 * and the calc sheet say the same. At most `max` stretches where a body is not held and twice as
 * many off their seat (or slipping); the rest are counted.
 */
export function sweepStateLines(data: SweepStates, names: Readonly<Record<string, string>>, max = MAX_STRETCHES): SweepStateLine[] {
  const friction = (support: string) => data.quantities.some((q) => q.support === support && (q.component === "frictionMargin" || q.component === "frictionRatio"));
  const margin = (support: string) => data.quantities.some((q) => q.support === support && q.component === "margin");
  const where = (o: PointStretch) => stretchWords(o, data.parameter, data.unit);
  const off = data.off ?? [];
  const notHeld = data.notHeld ?? [];
  const lines: SweepStateLine[] = off.slice(0, max * 2).map((o) => {
    const why = [
      o.whole && margin(o.support) ? "its margin stays below zero, so no crossing is marked" : "",
      friction(o.support) ? "it has no friction margin there, and none is plotted" : "",
    ].filter(Boolean);
    return { kind: "off", words: `${names[o.support] ?? o.support} is ${o.kind === "tie" ? "slack" : "off the ground"} ${where(o)}${why.length ? `: ${why.join("; ")}` : ""}.` };
  });
  const slips = data.slips ?? [];
  for (const o of slips.slice(0, max * 2))
    lines.push({ kind: "slips", words: `${names[o.support] ?? o.support} slips ${where(o)}: it needs more friction than μ·n gives there (its friction margin is below zero).` });
  for (const o of notHeld.slice(0, max))
    lines.push({
      kind: "notHeld",
      words: `The friction margin at ${names[o.support] ?? o.support} is not plotted ${where(o)}, where ${names[o.body] ?? o.body} ${o.status === "tips" ? "tips" : "is unrestrained"}: a body that is not held has no friction margin (its reactions are only what would hold it).`,
    });
  const hidden = Math.max(0, off.length - max * 2) + Math.max(0, slips.length - max * 2) + Math.max(0, notHeld.length - max);
  if (hidden > 0) lines.push({ kind: "more", words: `… and ${hidden} more stretches where a support is off its seat or slips, or its body is not held.` });
  return lines;
}
