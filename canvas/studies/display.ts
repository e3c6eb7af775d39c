// The display unit of each swept quantity: forces in kN / lbf, a fixed support's moment in
// kN·m / lbf·ft (N, N·m for a plot that stays below a kilonewton), the friction needed as a plain ratio. The chart, the limit finder's target and
// the calc sheet all convert through here, so a moment is never shown or converted as a force.
// Also the words a sweep says of its supports' states (a contact off the ground, a friction margin
// left out where its body is not held) and of its bodies' own (one slides as a whole, tips), shared
// by the Sweep tab (its lines and its hover), a version's page and the calc sheet.
import type { QuantityComponent } from "@/solver/quantity";
import { columnUnit } from "@/solver/report";
import { evaluateTyped, toFieldNumber } from "@/solver/expressions";
import { FLOW_FACTOR } from "@/solver/sweep";
import { resolveFile } from "@/solver/parse";
import { convert, formatNumber, prettyUnit, type Quantity, type UnitSystem } from "@/solver/units";
import type { PointStretch, SweepData } from "./run";
import { bodyLimits, bodyStateIn, type BodyState } from "@/solver/studySweep";
import type { SketchFile } from "@/solver/schema";
import type { SolveResult, Support } from "@/solver/types";

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

/** A value as a case writes it (-75, "-75 deg", "theta0 - 5 deg") in words beside figures the app
 *  writes: its minus signs the true minus (−75 deg) that formatNumber, the tables and the plots
 *  write. Only the words change: the case keeps the text as typed (and − reads back as minus). */
export const typedValueWords = (v: number | string): string => String(v).replace(/-/g, "−");

/** The swept parameter as the words call it: the built-in flow factor by its name in words. */
export const parameterWords = (parameter: string): string => (parameter === FLOW_FACTOR ? "flow factor" : parameter);

/**
 * The unit a sketch writes `parameter` in, the unit a kept sweep's From and To are in ("bar",
 * "deg"); "" for the flow factor, a plain number, or a parameter that does not evaluate. For words
 * said once (a delete's notice, a comparison), not per point: it reads the whole sketch.
 */
export function sweptUnitIn(file: SketchFile, parameter: string): string {
  if (parameter === FLOW_FACTOR) return "";
  try {
    const v = resolveFile(file).parameterValues[parameter];
    return v && !("error" in v) ? v.unit : "";
  } catch {
    // a file from elsewhere that does not read as a sketch: its words go without the unit
    return "";
  }
}

/**
 * A swept range in words with its unit, wherever a sweep's range is said (the Sweep tab's kept
 * list, the status line, a version's page, a comparison, the calc sheet): "theta from 0 to 30 deg",
 * "p from 0 to 10 bar", "flow factor from 0.5 to 1.5" (a plain factor: no unit).
 */
export function sweepRangeWords(parameter: string, from: number, to: number, unit: string, digits = 6): string {
  return `${parameterWords(parameter)} from ${formatNumber(from, digits)} to ${formatNumber(to, digits)}${unit ? ` ${prettyUnit(unit)}` : ""}`;
}

/** `x` in the unit `was`, written in `now` (20, "m / s", "km / hr" → 72), the float's noise off;
 *  null when either is no unit or they are of different kinds. */
export function inOtherUnit(x: number, was: string, now: string): number | null {
  if (!was || !now) return null;
  try {
    const v = evaluateTyped(`${x} ${was}`);
    if (typeof v === "number") return null;
    return Number(v.toNumber(now).toPrecision(12));
  } catch {
    return null;
  }
}

/**
 * The kept sweeps of `parameter` once the sketch writes it in `now` instead of `was` ("30 m/s"
 * edited to "108 km/hr"): a kept sweep's ends are numbers in the parameter's unit, so left alone
 * 20 to 45 m/s would silently become 20 to 45 km/hr. Their ends are rewritten as the same values
 * in the new unit, with the status line's words; null when no kept sweep changes (the same unit,
 * a plain number on either side, units of another kind, or no sweep of it).
 */
export function sweepsInNewUnit(file: Pick<SketchFile, "sweeps">, parameter: string, was: string, now: string): { sweeps: NonNullable<SketchFile["sweeps"]>; words: string } | null {
  if (!was || !now || was === now || parameter === FLOW_FACTOR) return null;
  const inNow = (x: number) => inOtherUnit(x, was, now);
  const said: string[] = [];
  const sweeps = (file.sweeps ?? []).map((w) => {
    if (w.parameter !== parameter) return w;
    const from = inNow(w.from);
    const to = inNow(w.to);
    if (from === null || to === null) return w;
    said.push(`the kept sweep of ${sweepRangeWords(parameter, w.from, w.to, was)} now runs from ${formatNumber(from, 6)} to ${formatNumber(to, 6)} ${prettyUnit(now)}`);
    return { ...w, from, to };
  });
  if (!said.length) return null;
  const text = said.join("; ");
  return { sweeps, words: `${text[0].toUpperCase()}${text.slice(1)}: the same values, in the unit ${parameter} is written in now.` };
}

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

/** A stretch of a sweep's points where a body itself tips (about a support, when it turns about
 *  one), is unrestrained, or slides as a whole (`bodyStateIn`, solver/studySweep.ts). */
export interface BodyStretch extends PointStretch {
  body: string;
  state: BodyState;
  /** the support a tipping body turns about */
  about?: string;
}

/**
 * The bodies' own states over a sweep: each body watched (one that may tip or slide as a whole,
 * `bodyLimits`) with its supports, and where it does not hold. A stretch where one contact slips
 * and its body is watched with no "slides" stretch there is one where the body as a whole holds.
 */
export interface BodyStates {
  watched: Array<{ body: string; supports: string[] }>;
  stretches: BodyStretch[];
}

/**
 * Gathers the bodies' own states point by point as a sweep solves them (`add`: a point's result, or
 * null where it did not solve), then says them as stretches (`states`). Engineering judgement, said
 * here once: a contact slipping alone (its own μ·n short of its |t|) is a local slip whose share
 * the other friction contacts take up; the body itself moves only where they cannot together, Σμ·n
 * below |Σt| (Coulomb friction, common practice) — that, and where it tips, is what an anchor's
 * designer needs beside each contact's slip.
 */
export function watchBodies(file: Pick<SketchFile, "bodies" | "supports">, at: ReadonlyArray<Pick<Support, "id" | "at">> = []) {
  const bodies = [...new Set(bodyLimits(file).map((l) => l.body))];
  const keys = new Map<string, Array<string | null>>(bodies.map((b) => [b, []]));
  return {
    add(result: SolveResult | null): void {
      for (const b of bodies) {
        const st = result ? bodyStateIn(result, b, at) : null;
        keys.get(b)!.push(st ? `${st.state}${st.about ? ` ${st.about}` : ""}` : null);
      }
    },
    states(xs: readonly number[]): BodyStates {
      return {
        watched: bodies.map((body) => ({ body, supports: file.supports.filter((s) => s.body === body).map((s) => s.id) })),
        stretches: bodies.flatMap((body) =>
          stretchesOf(xs, keys.get(body)!).map(({ key, ...s }) => {
            const [state, about] = key.split(" ");
            return { ...s, body, state: state as BodyState, ...(about ? { about } : {}) };
          }),
        ),
      };
    },
  };
}

/** Stretches of neighbouring points with the same key (null: none there), in sweep order. */
export function stretchesOf(xs: readonly number[], keys: ReadonlyArray<string | null>): Array<PointStretch & { key: string }> {
  const out: Array<PointStretch & { key: string }> = [];
  keys.forEach((key, i) => {
    if (key === null) return;
    const last = out[out.length - 1];
    if (last && i > 0 && keys[i - 1] === key) {
      last.to = xs[i];
      last.points++;
    } else out.push({ key, from: xs[i], to: xs[i], points: 1, whole: false });
  });
  for (const s of out) s.whole = s.points === xs.length;
  return out;
}

/** What a sweep's words read of it: its plotted quantities and where their supports are off their
 *  seat or their bodies not held; and the bodies' own states, where the sweep kept them. */
export type SweepStates = Pick<SweepData, "parameter" | "unit" | "quantities" | "off" | "notHeld" | "slips"> & { bodies?: BodyStates };

/** What a body itself does over a stretch, in the calc sheet's limits table's words: "slides as a
 *  whole", "tips about front pad", "is unrestrained". */
export function bodyStateWords(o: Pick<BodyStretch, "state" | "about">, names: Readonly<Record<string, string>>): string {
  if (o.state === "slides") return "slides as a whole";
  if (o.state === "tips") return o.about ? `tips about ${names[o.about] ?? o.about}` : "tips";
  return "is unrestrained";
}

const overlaps = (a: PointStretch, b: PointStretch) => Math.max(Math.min(a.from, a.to), Math.min(b.from, b.to)) <= Math.min(Math.max(a.from, a.to), Math.max(b.from, b.to));

/** What the body of a slipping contact does over the stretch it slips: it holds (its other friction
 *  contacts take up the rest), slides as a whole there too, or over a part of it. */
function slipBodyWords(o: PointStretch & { support: string }, data: SweepStates, names: Readonly<Record<string, string>>): string {
  const watched = data.bodies?.watched.find((w) => w.supports.includes(o.support));
  if (!watched) return "";
  const name = names[watched.body] ?? watched.body;
  const slides = data.bodies!.stretches.filter((b) => b.body === watched.body && b.state === "slides" && overlaps(b, o));
  const points = slides.reduce((n, b) => n + b.points, 0);
  if (!slides.length) return ` ${name} as a whole holds there: its friction contacts together give the friction it needs (Σμ·n ≥ |Σt|), the others taking up what this one cannot.`;
  if (points >= o.points) return ` ${name} slides as a whole there too (Σμ·n − |Σt| below zero).`;
  return ` ${name} slides as a whole over part of it (${slides.map((b) => stretchWords(b, data.parameter, data.unit)).join("; ")}) and holds over the rest.`;
}

/** A line of a sweep's words about its supports' states: a support off its seat ("off"), a contact
 *  short of friction ("slips"), a friction margin left out where its body is not held ("notHeld"),
 *  or how many more stretches there are ("more"). */
export interface SweepStateLine {
  kind: "off" | "notHeld" | "slips" | "body" | "more";
  words: string;
}

/**
 * Where a plotted contact is off the ground (a tie slack) over the range or a part of it, where a
 * plotted friction margin is below zero (the contact slips), and where a plotted friction margin is
 * left out because its body tips or is unrestrained, in words: the Sweep tab, a version's page
 * and the calc sheet say the same. Where the sweep kept its bodies' own states (`bodies`), each
 * contact's slip also says whether its body as a whole holds there or slides, and each body's own
 * stretches follow in the calc sheet's limits table's words ("slides as a whole", "tips about …").
 * At most `max` stretches where a body is not held (and of each body's own), twice as many off
 * their seat (or slipping); the rest are counted.
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
    lines.push({ kind: "slips", words: `${names[o.support] ?? o.support} slips ${where(o)}: it needs more friction than μ·n gives there (its friction margin is below zero).${slipBodyWords(o, data, names)}` });
  // the bodies' own stretches: where one slides as a whole, tips or is unrestrained
  const own = data.bodies?.stretches ?? [];
  // the solve checks friction but does not enforce it: a body that tips after it already slides as
  // a whole tips there only if it is kept from sliding, as the limit finder's answers say
  const slidBefore = (o: BodyStretch) => {
    const first = own.find((b) => b.body === o.body && b.state === "slides" && own.indexOf(b) < own.indexOf(o));
    return first ? ` (while it is held against sliding: it already slides as a whole ${where(first)})` : "";
  };
  for (const o of own.slice(0, max))
    lines.push({
      kind: "body",
      words: `${names[o.body] ?? o.body} ${bodyStateWords(o, names)} ${where(o)}: ${
        o.state === "slides"
          ? "its friction contacts together cannot give the friction it needs (Σμ·n − |Σt| below zero), so the body itself moves along its base"
          : o.state === "tips"
            ? `no set of its contacts and ties holds it${slidBefore(o)}`
            : "its supports leave it free to move"
      }.`,
    });
  for (const o of notHeld.slice(0, max))
    lines.push({
      kind: "notHeld",
      words: `The friction margin at ${names[o.support] ?? o.support} is not plotted ${where(o)}, where ${names[o.body] ?? o.body} ${o.status === "tips" ? "tips" : "is unrestrained"}: a body that is not held has no friction margin (its reactions are only what would hold it).`,
    });
  const hidden = Math.max(0, off.length - max * 2) + Math.max(0, slips.length - max * 2) + Math.max(0, notHeld.length - max) + Math.max(0, own.length - max);
  if (hidden > 0) lines.push({ kind: "more", words: `… and ${hidden} more stretches where a support is off its seat or slips, or its body is not held or slides as a whole.` });
  return lines;
}

/**
 * What the plot's hover says of a plotted value at `x` instead of a number, or null: a contact's
 * margin where it has lifted off (a tie's where it is slack) and its body is held carries nothing
 * (`carriesNothing` in solver/words.ts); the line runs on below zero only to show the crossing.
 */
export function releasedWords(data: Pick<SweepData, "quantities" | "idle">, quantity: number, x: number): string | null {
  const q = data.quantities[quantity];
  if (!q || q.component !== "margin") return null;
  const o = (data.idle ?? []).find((s) => s.support === q.support && within(s, x));
  return o ? `carries nothing (${o.kind === "tie" ? "slack" : "lifted off"})` : null;
}

const within = (o: PointStretch, x: number) => x >= Math.min(o.from, o.to) && x <= Math.max(o.from, o.to);

/**
 * What happens at one swept value, for the plot's hover: each body's own state where the sweep kept
 * them ("Block holds", "Block slides as a whole", "Block tips about front pad"), else a body that
 * tips or is unrestrained there (`statuses`); then each plotted support off its seat or slipping
 * ("rear pad slips"). Empty where nothing is said of the point.
 */
export function pointStateWords(data: SweepStates & Pick<SweepData, "xs" | "statuses">, x: number, names: Readonly<Record<string, string>>): string {
  const out: string[] = [];
  if (data.bodies) {
    for (const w of data.bodies.watched) {
      const o = data.bodies.stretches.find((b) => b.body === w.body && within(b, x));
      out.push(`${names[w.body] ?? w.body} ${o ? bodyStateWords(o, names) : "holds"}`);
    }
  } else {
    const status = data.statuses[data.xs.indexOf(x)];
    if (status === "tips") out.push("a body tips");
    if (status === "unrestrained") out.push("a body is unrestrained");
  }
  for (const o of data.off ?? []) if (within(o, x)) out.push(`${names[o.support] ?? o.support} ${o.kind === "tie" ? "slack" : "off the ground"}`);
  for (const o of data.slips ?? []) if (within(o, x)) out.push(`${names[o.support] ?? o.support} slips`);
  return out.join("; ");
}
