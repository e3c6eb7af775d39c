// The result in words, one sentence per body, leading with what matters: slip first (the status
// stays "holds" but a contact cannot hold what it must), then tipping, lift-off and the rest.
// Pure: the results panel, the calc sheet and the tests all use it.
import { carriesNothing, describeFreeMotion, overMu } from "@/solver/words";
import { portDirectionNotes } from "@/solver/ports";
import { nearestOnOutline, pointInPolygon, polygonDiameter } from "@/solver/geometry";
import { formatQuantity, type UnitSystem } from "@/solver/units";
import type { BodyResult, Reaction, Sketch, SolveResult, Support, Vec2 } from "@/solver/types";
import { pivotWords, type BodyStability } from "@/solver/stability";
import { tipSlide } from "@/canvas/render/tipSlide";
import type { SketchFile } from "@/solver/schema";
import { warningInWords } from "./errorPlace";

/** "strained": the body holds as a whole, but one contact needs more friction than its own μ gives */
export type Tone = "holds" | "strained" | "lifts" | "slips" | "tips" | "unrestrained";

export interface StatusSentence {
  body: string;
  tone: Tone;
  /** the sentence: "Tips about the front contact — the rear contact would have to pull 2.4 kN" */
  headline: string;
  /** further facts, each a sentence */
  details: string[];
  /** a body that tips and slides as a whole as well: the badge says both */
  alsoSlips?: boolean;
  /** of a body that tips and slides, which comes first by the factors of safety (when they say) */
  first?: "tips" | "slides";
  /** a "lifts" body whose only released supports are ties gone slack: no contact has lifted off,
   *  so the badge says "Slack", not "Lifts" (an anchor bolt slack on the far side of a moment) */
  slackOnly?: boolean;
  /** a body that holds (or holds with a tie slack, or one contact over its μ, or with a contact lifted
   *  off) but falls short of a required factor of safety: the headline leads with the governing
   *  check, the badge says "FoS short" ("FoS short, lifts" with a contact lifted off: the headline
   *  says the lift-off after the check) */
  short?: "overturning" | "sliding";
}

const KIND_WORD: Record<Support["kind"], string> = { pin: "pin", roller: "roller", contact: "contact", fixed: "fixed support", tie: "tie" };

/** "the rear stabiliser foot", "Front jack", or "contact s2" */
export function supportName(s: Pick<Support, "kind" | "id" | "label">): string {
  if (!s.label) return `${KIND_WORD[s.kind]} ${s.id}`;
  return /^[a-z]/.test(s.label) ? `the ${s.label}` : s.label;
}

const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
/** A friction coefficient to 3 significant figures, as the calc sheet and the solver's words give it. */
const ratio = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : "∞");
/** A friction coefficient needed beside the one there is, with the digits it takes to tell them
 *  apart (0.554 against 0.55 is never written "needs 0.55, has 0.55"). */
function ratios(needed: number, has: number): [string, string] {
  if (!Number.isFinite(needed) || needed <= has) return [ratio(needed), ratio(has)];
  for (let d = 3; d <= 6; d++) {
    const [n, h] = [Number(needed.toPrecision(d)), Number(has.toPrecision(d))];
    if (n > h) return [String(n), String(h)];
  }
  return [String(needed), String(has)];
}

function list(names: string[]): string {
  if (names.length <= 1) return names.join("");
  return `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
}

interface Context {
  id: string;
  body: BodyResult;
  supports: Support[];
  reactions: Array<[Support, Reaction]>;
  result: SolveResult;
  units: UnitSystem;
  /** a force unit every figure is given in (a calc sheet's one family), else each its own */
  forceUnit?: string;
  name: string;
}

const force = (c: Context, v: number) => formatQuantity(Math.abs(v), "force", c.units, { unit: c.forceUnit });

/** The contacts over their μ, the most overloaded first. */
function overloaded(c: Context): Array<[Support, Reaction]> {
  const out = c.reactions.filter(([, r]) => r.friction && r.state === "bearing" && overMu(r.friction.needed, r.friction.mu));
  return out.sort((a, b) => b[1].friction!.needed / Math.max(b[1].friction!.mu, 1e-12) - a[1].friction!.needed / Math.max(a[1].friction!.mu, 1e-12));
}

/** "Slips at the skid foot — needs 0.31, has μ = 0.25 (and at …)" */
function contactSlip(slipping: Array<[Support, Reaction]>): string {
  const [s, r] = slipping[0];
  const more = slipping.length > 1 ? ` (and at ${list(slipping.slice(1).map(([x]) => supportName(x)))})` : "";
  const [needs, has] = ratios(r.friction!.needed, r.friction!.mu);
  return `Slips at ${supportName(s)} — needs ${needs}, has μ = ${has}${more}`;
}

/**
 * Slip leads: the body as a whole first (more friction needed than all its friction contacts give:
 * it slides, whatever the share between them), then a contact over its own μ.
 */
function slipSentence(c: Context): { headline: string; details: string[]; strained?: boolean } | null {
  const ids = new Set(c.supports.map((s) => s.id));
  const slips = c.result.warnings.filter((w) => w.code === "SLIP" && w.ids.some((i) => ids.has(i)));
  if (!slips.length) return null;
  const slipping = overloaded(c);
  const f = c.body.friction;
  const bearing = c.reactions.filter(([, r]) => r.friction && r.state === "bearing");
  const sumN = bearing.reduce((a, [, r]) => a + (r.n ?? 0), 0);
  if (f && sumN > 0 && f.needed > f.available * (1 + 1e-9)) {
    const [needs, has] = ratios(f.needed, f.available);
    return {
      headline: `Slips as a whole — its friction contacts must resist ${force(c, f.needed * sumN)} and can give ${force(c, f.available * sumN)} (needs μ = ${needs} as a whole, has ${has})`,
      details: slipping.length ? [`${contactSlip(slipping)}.`] : [],
    };
  }
  // one contact over its own μ while the body as a whole has friction to spare: the body holds,
  // and the headline leads with that, so nobody reads the contact's slip as the body sliding away
  if (slipping.length && f && sumN > 0) {
    const [s, r] = slipping[0];
    const [needs, has] = ratios(r.friction!.needed, r.friction!.mu);
    const more = slipping.length > 1 ? ` (and ${list(slipping.slice(1).map(([x]) => supportName(x)))})` : "";
    return {
      strained: true,
      headline: `Holds as a whole, with friction to spare (needs μ = ${ratio(f.needed)}, has ${ratio(f.available)}) — but ${supportName(s)} alone needs ${needs}, more than its μ = ${has}${more}`,
      details: [],
    };
  }
  if (slipping.length) return { headline: contactSlip(slipping), details: [] };
  return { headline: "Slips as a whole — the friction contacts cannot hold it", details: [] };
}

/**
 * A contact over its μ while the body as a whole has friction to spare: the friction is shared as
 * the supports' stiffnesses share it (the file format's rule), and a small slip at that contact
 * would pass load to the others, which the analysis does not follow. Said, so a checker is not
 * left to think the body slides away.
 */
function sharedFrictionNote(c: Context): string | null {
  const f = c.body.friction;
  if (!f || !overloaded(c).length || f.needed > f.available * (1 + 1e-9)) return null;
  return `As a whole the body needs a friction coefficient of ${ratio(f.needed)} and its friction contacts give ${ratio(f.available)}: the friction is shared as the supports' stiffnesses share it, and a small slip at the overloaded contact may pass the rest to the others (this analysis does not follow that).`;
}

/**
 * A support left outside its body's outline (dragged, nudged or duplicated off it: it stays the
 * body's): the solver takes it where it is, as if on a rigid arm, which a drawing of a foot in the
 * air does not make plain. Said, with how far, so nobody trusts a reaction at a point the body
 * does not reach. The tolerance is the port check's (a thousandth of the body's size).
 */
function supportOffOutline(s: Support, outline: Vec2[], units: UnitSystem): string | null {
  if (outline.length < 3 || !Number.isFinite(s.at[0]) || !Number.isFinite(s.at[1])) return null;
  const eps = 1e-3 * Math.max(polygonDiameter(outline), 1e-6);
  const d = nearestOnOutline(s.at, outline).distance;
  if (d <= eps || pointInPolygon(s.at, outline)) return null;
  const away = formatQuantity(d, "length", units);
  return `${cap(supportName(s))} is ${away} outside its body's outline: it acts there, as if joined to the body by a rigid arm. If it bears on the body, move it onto the outline.`;
}

function pivotName(c: Context, about: Vec2): string {
  const near = c.supports.find((s) => Math.hypot(s.at[0] - about[0], s.at[1] - about[1]) < 1e-6 * Math.max(1, Math.hypot(about[0], about[1])) + 1e-9);
  if (near) return supportName(near);
  const L = c.units === "SI" ? "m" : "ft";
  const k = c.units === "SI" ? 1 : 1 / 0.3048;
  const point = `the point (${Number((about[0] * k).toPrecision(3))}, ${Number((about[1] * k).toPrecision(3))}) ${L}`;
  // a turn about no support's point is about the instant centre of two that stay closed (a front
  // wheel climbing a chock turns where the rear wheel's and the chock's lines of action meet): name them
  const through = c.supports.filter((s) => "angle" in s && lineMisses(s.at, s.angle, about) < 1e-6 * Math.max(1, Math.hypot(about[0], about[1])) && c.result.reactions[s.id]?.state === "bearing");
  return through.length === 2 ? `${point}, where the lines of action of ${supportName(through[0])} and ${supportName(through[1])} meet` : point;
}

/** How far the point p lies off the line through `at` at `angle` degrees (m). */
function lineMisses(at: Vec2, angle: number, p: Vec2): number {
  const t = (angle * Math.PI) / 180;
  return Math.abs((p[0] - at[0]) * Math.sin(t) - (p[1] - at[1]) * Math.cos(t));
}

/** A factor of safety as the order sentence compares it: never with a "<" between two equal-looking numbers. */
function twoFactors(a: number, b: number): [string, string] {
  for (let d = 3; d <= 6; d++) {
    const [x, y] = [Number(a.toPrecision(d)), Number(b.toPrecision(d))];
    if (x !== y) return [String(x), String(y)];
  }
  return [String(a), String(b)];
}

type Factor = { factor: number; wholeBody?: boolean } | { notApplicable: string };

export interface TipSlideOrder {
  first: "tips" | "slides";
  /** "It tips before it slides: overturning factor 0.613 < sliding factor 0.735 (…)" */
  text: string;
}

/**
 * Of a body that tips and slides, which starts first. Each factor of safety is the multiple of the
 * loads that drive it at which that failure starts, when those loads grow in proportion while the
 * weight that holds the body stays as it is (common practice: the smaller factor governs); so the
 * smaller factor comes first, and the words say that assumption. Only for a body whose factors are
 * both under 1 and whose sliding is taken as a whole (the headline's "slides"); null otherwise, or
 * when the two are equal to six figures.
 */
export function tipSlideOrder(overturning: Factor | undefined, sliding: Factor | undefined): TipSlideOrder | null {
  if (!overturning || !sliding || "notApplicable" in overturning || "notApplicable" in sliding || !sliding.wholeBody) return null;
  const [o, s] = [overturning.factor, sliding.factor];
  if (!(o < 1) || !(s < 1) || Math.abs(o - s) <= 1e-6 * Math.max(o, s)) return null;
  const assumption = "the smaller factor is reached first if the loads that drive it grow in proportion while its weight stays as it is";
  if (o < s) {
    const [a, b] = twoFactors(o, s);
    return { first: "tips", text: `It tips before it slides: overturning factor ${a} < sliding factor ${b} (${assumption})` };
  }
  const [a, b] = twoFactors(s, o);
  return { first: "slides", text: `It slides before it tips: sliding factor ${a} < overturning factor ${b} (${assumption})` };
}

/**
 * A body that tips and slides too (`tipSlide`, canvas/render/tipSlide.ts: the body taken as a
 * whole, as its factor of safety against sliding takes it). Where it cannot be taken as a whole, a
 * bearing contact over its own μ in the forces shown is said instead. Null when it only tips.
 * Which of the two starts first is the factors of safety's to say (`tipSlideOrder`).
 */
function tipSlipWords(c: Context): { words: string; wholeBody: boolean } | null {
  const whole = tipSlide(c.supports, c.result, c.id);
  if (whole) {
    const [needs, has] = ratios(whole.needed, whole.mu);
    return { words: `sliding, it must resist ${force(c, Math.abs(whole.t))} and can give ${force(c, whole.mu * Math.max(whole.n, 0))} (needs μ = ${needs} as a whole, has ${has})`, wholeBody: true };
  }
  const slipping = overloaded(c);
  if (!slipping.length) return null;
  const [s, r] = slipping[0];
  const [needs, has] = ratios(r.friction!.needed, r.friction!.mu);
  const more = slipping.length > 1 ? ` (and ${list(slipping.slice(1).map(([x]) => supportName(x)))})` : "";
  return { words: `${supportName(s)} would slip too, needing ${needs} with μ = ${has}${more}`, wholeBody: false };
}

function tipSentence(c: Context, slip: { words: string; wholeBody: boolean } | null, first?: TipSlideOrder["first"]): string {
  const pulling = c.reactions.filter(([, r]) => r.state === "lifted" || r.state === "slack").sort((a, b) => Math.abs(b[1].n ?? 0) - Math.abs(a[1].n ?? 0));
  const fm = c.body.freeMotion;
  const turns = fm?.kind === "rotation" ? `Tips about ${pivotName(c, fm.about)}` : fm ? `Would move along ${Number(fm.angle.toFixed(1))}°` : "Tips";
  const pull = pulling.length ? `${supportName(pulling[0][0])} would have to ${pulling[0][0].kind === "tie" ? "push" : "pull"} ${force(c, pulling[0][1].n ?? Math.hypot(pulling[0][1].fx, pulling[0][1].fy))}` : "";
  // both named in the headline, the one that starts first leading (when the factors say which):
  // a body that tips and slides is not to be read as one that only tips
  if (slip?.wholeBody && first === "slides" && turns.startsWith("Tips")) return `Slides before it ${turns.charAt(0).toLowerCase()}${turns.slice(1)} — ${slip.words}${pull ? `; ${pull}` : ""}`;
  const head = slip?.wholeBody ? `${turns} ${first === "tips" && turns.startsWith("Tips") ? "before it slides" : "and slides"}` : turns;
  const also = slip ? `; ${slip.words}` : "";
  if (!pull) return `${head}${slip ? ` — ${slip.words}` : ""}`;
  return `${head} — ${pull}${also}`;
}

/** A lift-off in its two halves: what is released ("Lifts off at the near foot; the rear tie goes
 *  slack") and what still holds the body ("the far foot still holds the body", "" when nothing). */
function liftParts(c: Context): { released: string; holding: string } {
  const off = c.reactions.filter(([, r]) => r.state === "lifted" || r.state === "slack");
  const holding = c.reactions.filter(([, r]) => r.state !== "lifted" && r.state !== "slack").map(([s]) => supportName(s));
  const lifted = off.filter(([s]) => s.kind === "contact").map(([s]) => supportName(s));
  const slack = off.filter(([s]) => s.kind === "tie").map(([s]) => supportName(s));
  const parts: string[] = [];
  if (lifted.length) parts.push(`Lifts off at ${list(lifted)}`);
  if (slack.length) parts.push(`${list(slack)} ${slack.length === 1 ? "goes" : "go"} slack`);
  return { released: cap(parts.join("; ")), holding: holding.length ? `${list(holding)} still ${holding.length === 1 ? "holds" : "hold"} the body` : "" };
}

function liftSentence(c: Context): string {
  const { released, holding } = liftParts(c);
  return holding ? `${released} — ${holding}` : released;
}

function holdSentence(c: Context): string {
  const mech = c.result.warnings.find((w) => w.code === "MECHANISM" && w.ids.includes(c.id));
  if (mech) {
    // in equilibrium only while nothing pushes the free way: balanced, not restrained
    const words = mech.message.slice(mech.message.indexOf(": ") + 2);
    return `Holds only as drawn — ${words}; any load that does will move it`;
  }
  let best: [Support, Reaction] | undefined;
  for (const pair of c.reactions) if (!best || Math.hypot(pair[1].fx, pair[1].fy) > Math.hypot(best[1].fx, best[1].fy)) best = pair;
  if (!best) return "Holds — all supports within their limits";
  return `Holds — all supports within their limits; the largest reaction is ${force(c, Math.hypot(best[1].fx, best[1].fy))} at ${supportName(best[0])}`;
}

const FIELD_OF_ELEMENT = /^(bodies|supports|loads|ports|massSources)\[(\d+)\]/;

/**
 * A warning that starts with a field's file path ("loads[0].fy: sin(30) reads 30 as radians: …"),
 * in the form's words ("Point force F — Fy: …") when `file` holds the field it names: the element
 * at that place is the one warned about, or the parameter is there (a result kept on screen from
 * before an edit may be of a file whose elements have moved since). Otherwise as the solver said it.
 */
function warningText(file: SketchFile | null | undefined, w: SolveResult["warnings"][number]): string {
  if (!file) return w.message;
  const at = FIELD_OF_ELEMENT.exec(w.message);
  if (at) {
    const el = (file[at[1] as "bodies"] as Array<{ id: string }> | undefined)?.[Number(at[2])];
    if (!el || !w.ids.includes(el.id)) return w.message;
  } else {
    const param = /^parameters\.([A-Za-z_][A-Za-z0-9_]*):/.exec(w.message);
    if (param && file.parameters?.[param[1]] === undefined) return w.message;
  }
  return warningInWords(file, w.message);
}

/**
 * One sentence per body of a solved sketch; `forceUnit` puts every force in one unit (a calc
 * sheet's; the results panel's, `unitFamily(units, resultScale(result, stability)).force`, the unit
 * its table, hand check and drawing write), else each force its own. With the bodies' factors of
 * safety, a body that tips and slides says which comes first.
 * `file`: the sketch file that was solved, so a warning about a field names it as the properties
 * form does ("Point force F — Fy"); without it the warning keeps the file's path ("loads[0].fy").
 */
export function statusSentences(
  sketch: Sketch,
  result: SolveResult,
  units: UnitSystem = "SI",
  forceUnit?: string,
  stability?: Record<string, BodyStability>,
  file?: SketchFile | null,
): StatusSentence[] {
  const out: StatusSentence[] = [];
  const portNotes = portDirectionNotes(sketch);
  for (const b of sketch.bodies) {
    const body = result.bodies[b.id];
    if (!body) continue;
    const supports = sketch.supports.filter((s) => s.body === b.id);
    const reactions = supports.filter((s) => result.reactions[s.id]).map((s) => [s, result.reactions[s.id]] as [Support, Reaction]);
    const c: Context = { id: b.id, body, supports, reactions, result, units, forceUnit, name: b.label || b.id };
    let tone: Tone = body.status;
    let headline: string;
    let alsoSlips = false;
    let order: TipSlideOrder | null = null;
    const slip = body.status === "holds" || body.status === "lifts" ? slipSentence(c) : null;
    if (body.status === "unrestrained") {
      headline = body.freeMotion ? `Unrestrained — ${describeFreeMotion(body.freeMotion, supports)}; add a support or a tie` : "Unrestrained — add a support or a tie";
      if (!supports.length) headline = "Unrestrained — the body has no supports yet; add a support or a tie";
    } else if (body.status === "tips") {
      const slides = tipSlipWords(c);
      alsoSlips = !!slides?.wholeBody;
      const st = stability?.[b.id];
      order = alsoSlips ? tipSlideOrder(st?.overturning, st?.sliding) : null;
      headline = tipSentence(c, slides, order?.first);
    }
    else if (slip && !(slip.strained && body.status === "lifts")) {
      tone = slip.strained ? "strained" : "slips";
      headline = slip.headline;
    } else if (body.status === "lifts") headline = liftSentence(c);
    else headline = holdSentence(c);
    // a motion nothing resists, the loads not driving it: the "holds" headline says it; any other
    // (a lift-off, a tip, a slip) leaves it to a line of its own, never unsaid
    const mech = result.warnings.find((w) => w.code === "MECHANISM" && w.ids.includes(b.id));
    const mechSaid = !!mech && !headline.startsWith("Holds only as drawn");

    // a port drawn against its kind is likely a slip of the input: said before anything else
    const details: string[] = portNotes.filter((n) => n.body === b.id).map((n) => n.message);
    if (order) details.push(`${order.text}.`);
    for (const s of supports) {
      const off = supportOffOutline(s, b.outline, units);
      if (off) details.push(off);
    }
    if (body.status === "tips") {
      // the contacts the turn lifts besides the one named: still bearing in the forces shown (every
      // support able to pull), below zero in the margins, which carry on from the body last held
      const also = reactions.filter(([s, r]) => s.kind === "contact" && r.state === "bearing" && r.margin !== undefined && r.margin < 0).map(([s]) => supportName(s));
      if (also.length)
        details.push(`${cap(list(also))} ${also.length === 1 ? "lifts" : "lift"} off as well as it turns (below zero in the Margin column); the forces shown are those that would hold it with every support able to pull.`);
    }
    if (slip) details.push(...slip.details);
    // a lift-off leads over one contact being over its μ: the contact's words follow it
    if (slip?.strained && body.status === "lifts") details.push(`${slip.headline.replace(/^Holds as a whole/, "As a whole it holds")}.`);
    else if (slip && body.status === "lifts") details.push(`${liftSentence(c)}.`);
    const shared = slip ? sharedFrictionNote(c) : null;
    if (shared) details.push(shared);
    // free to move in x: the ax found is a result of its own (the sketch's inputs only ask for it)
    const ax = body.acceleration?.ax;
    if (sketch.motion?.freeX && body.status !== "unrestrained" && Number.isFinite(ax))
      details.push(`Free to move in x: the loads accelerate it at ax = ${formatQuantity(ax, "acceleration", units)} (its inertial force −m·ax acts at its centre of gravity).`);
    if (mech && mechSaid) details.push(`${cap(mech.message.slice(mech.message.indexOf(": ") + 2))}; any load that does will move it.`);
    // whether the reactions depend on the stiffnesses: the supports that carry load say (a lifted
    // contact or a slack tie carries nothing), not the supports as drawn
    const solved = body.activeDeterminacy ?? body.determinacy;
    const idle = body.activeDeterminacy ? reactions.filter(([, r]) => carriesNothing(r, body.status)).map(([s]) => supportName(s)) : [];
    if (solved.kind === "indeterminate")
      details.push(`Statically indeterminate (degree ${solved.degree}${idle.length ? ` with the supports that carry load, ${list(idle)} left out` : ""}): the reactions depend on the support stiffnesses.`);
    else if (body.determinacy.kind === "indeterminate" && solved.kind === "determinate")
      details.push(`Statically determinate as solved: ${list(idle)} ${idle.length > 1 ? "carry" : "carries"} nothing, and the reactions of the supports that do follow from equilibrium alone, whatever their stiffnesses (as drawn, every support engaged, indeterminate of degree ${body.determinacy.degree}).`);
    else {
      // free to move one way, yet more supports than the other directions need
      const over = result.warnings.find((w) => w.code === "INDETERMINATE" && w.ids.some((i) => supports.some((s) => s.id === i)));
      if (over) details.push(`${over.message}.`);
    }
    const ids = new Set([b.id, ...supports.map((s) => s.id), ...sketch.ports.filter((p) => p.body === b.id).map((p) => p.id), ...sketch.massSources.filter((m) => m.body === b.id).map((m) => m.id)]);
    for (const w of result.warnings) {
      if (w.code === "MASS_IMBALANCE" || w.code === "PORT_INCONSISTENT") {
        if (w.ids.some((i) => ids.has(i))) details.push(w.message.endsWith(".") ? w.message : `${w.message}.`);
      }
    }
    const slackOnly = tone === "lifts" && reactions.some(([s, r]) => s.kind === "tie" && r.state === "slack") && !reactions.some(([, r]) => r.state === "lifted");
    // held, but short of a required factor of safety: the failing check leads, never "Holds"; what
    // the headline said of the supports follows as the first detail
    const short = tone === "holds" || tone === "strained" || tone === "lifts" ? shortfall(sketch, stability?.[b.id]) : null;
    if (short && tone === "lifts" && !slackOnly) {
      // a contact lifted off is a finding of its own: said in the headline after the governing
      // check (the badge and the screen reader's words too), what still holds the body following
      const { released, holding } = liftParts(c);
      if (holding) details.unshift(`${cap(holding)}.`);
      headline = `${short.text}; it ${released.charAt(0).toLowerCase()}${released.slice(1)}`;
    } else if (short) {
      details.unshift(`${headline.replace(/^Holds/, "It holds")}.`);
      headline = short.text;
    }
    out.push({ body: b.id, tone, headline, details, ...(alsoSlips ? { alsoSlips, ...(order ? { first: order.first } : {}) } : {}), ...(slackOnly ? { slackOnly } : {}), ...(short ? { short: short.check } : {}) });
  }
  // warnings that belong to no body (unitless trigonometry in a parameter)
  const general = result.warnings
    .filter((w) => w.code === "TRIG_UNITLESS")
    .map((w) => warningText(file, w))
    .map((m) => (/[.?!]$/.test(m) ? m : `${m}.`));
  if (general.length && out.length) out[0].details.push(...general);
  if (sketch.bodies.length > 1) for (const s of out) s.headline = `${sketch.bodies.find((b) => b.id === s.body)?.label || s.body}: ${s.headline}`;
  return out;
}

/** A factor of safety in words: to 3 significant figures, never rounded up to what is required (1.4996 is not "1.50"). */
function factorText(factor: number, required: number): string {
  if (!Number.isFinite(factor)) return "∞";
  for (const d of [3, 4, 6]) {
    const shown = Number(factor.toPrecision(d));
    if (factor >= required || shown < required) return String(shown);
  }
  return String(factor);
}

/**
 * The governing failing factor of safety of a body, as a headline: "Short of the required factor
 * of safety against overturning about the far foot: 1.23 < 1.5" (the check furthest below its
 * required value first; the other after it when it falls short too). Null when none falls short.
 */
export function shortfall(sketch: Sketch, st: BodyStability | undefined): { text: string; check: "overturning" | "sliding" } | null {
  if (!st) return null;
  const names = new Map(sketch.supports.map((s) => [s.id, supportName(s)]));
  const failing = (
    [
      ["overturning", st.overturning],
      ["sliding", st.sliding],
    ] as const
  )
    .flatMap(([against, c]) => ("notApplicable" in c || c.pass || !Number.isFinite(c.factor) ? [] : [{ against, c, ratio: c.factor / c.required }]))
    .sort((a, b) => a.ratio - b.ratio);
  if (!failing.length) return null;
  const words = failing.map(({ against, c }) => {
    const about = "about" in c ? ` about ${pivotWords(c, (id) => names.get(id) ?? id)}` : "";
    const whole = "wholeBody" in c && c.wholeBody ? " (as a whole)" : "";
    // the figures kept on one line with their sign: "1.13 < 1.5", never broken at the "<"
    return `against ${against}${about}${whole}: ${factorText(c.factor, c.required)}\u00a0<\u00a0${c.required}${c.factor < 1 ? ` (${BELOW_ONE[against]})` : ""}`;
  });
  const [first, ...more] = words;
  return { text: `Short of the required factor of safety ${first}${more.length ? `; also ${more.join("; ")}` : ""}`, check: failing[0].against };
}

/** A factor below 1 is no margin short but the thing itself: said, for each check (both, when both are). */
export const BELOW_ONE = { overturning: "under 1: it tips", sliding: "under 1: it slides" } as const;

/**
 * One body's factors of safety as drawn, in a sentence under its status: "Factors of safety as
 * drawn: against overturning about the upwind edge 1.37, below the required 1.5; against sliding
 * 2.4 (1.5 required)". `pass` is false when one falls short. Null when neither applies.
 */
export function stabilitySentence(sketch: Sketch, body: string, st: BodyStability | undefined): { text: string; pass: boolean } | null {
  if (!st) return null;
  const names = new Map(sketch.supports.map((s) => [s.id, supportName(s)]));
  const bits: string[] = [];
  let pass = true;
  for (const [against, c] of [["overturning", st.overturning], ["sliding", st.sliding]] as const) {
    if ("notApplicable" in c) continue;
    const about = "about" in c ? ` about ${pivotWords(c, (id) => names.get(id) ?? id)}` : "";
    const whole = "wholeBody" in c && c.wholeBody ? " (as a whole)" : "";
    const f = factorText(c.factor, c.required);
    // no load tends to turn or slide it: no ratio to write, "∞" tells nobody that
    if (!Number.isFinite(c.factor)) bits.push(`against ${against}${about}${whole}: no load tends to ${against === "sliding" ? "slide" : "tip"} it`);
    else if (c.pass) bits.push(`against ${against}${about}${whole} ${f} (${c.required} required)`);
    else {
      pass = false;
      bits.push(`against ${against}${about}${whole} ${f}, below the required ${c.required}${c.factor < 1 ? ` (${BELOW_ONE[against]})` : ""}`);
    }
  }
  if (!bits.length) return null;
  const several = sketch.bodies.length > 1 ? ` of ${sketch.bodies.find((b) => b.id === body)?.label || body}` : "";
  return { text: `Factors of safety${several} as drawn: ${bits.join("; ")}`, pass };
}
