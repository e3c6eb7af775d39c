// Factors of safety per body (common practice):
//  - against overturning: the restoring over the overturning moment of the applied loads about
//    the support the body would tip about (a contact, or a pin or roller once the other
//    contacts lift), or about the instant centre of two contacts or rollers whose lines of
//    action meet (a wheel that climbs a chock turns about the point where the rear wheel's
//    normal and the chock's meet, not about either support), each load resolved across and
//    along the base it stands on (so a weight on a slope restores by W·cos θ and overturns by
//    W·sin θ, and an inclined jet's two components count apart) (each such support and each
//    sense of turning is tried; a mode counts only if every other support lets it happen: other
//    contacts open, nothing bilateral or pulling holds it), the smallest ratio governs;
//  - against sliding: the friction the bearing contacts can give, Σ μ·n, over the tangential
//    force they must resist, |Σ t|. Only for bodies held by contacts and ties alone. A body that
//    tips has no reactions of its own (the ones shown would need a contact to pull), so it is
//    taken as a whole, as by hand: μ·Σn over |Σt| of all its contacts (μ·W over P on level
//    ground), when its contacts share one base and one μ; otherwise sliding is not assessed.
import { dot3 } from "./linalg";
import { elementName, type BodyModel } from "./model";
import { direction, momentOf } from "./geometry";
import type { BodyResult, ContactSupport, EquationTerm, Reaction, Support, Vec2 } from "./types";

export interface OverturningCheck {
  factor: number;
  /** the support it would tip about: a contact, or a pin or roller once the contacts lift; with
   *  `with`, the first of two contacts or rollers that stay closed while the body turns about
   *  their instant centre (`pivot`, where their lines of action meet) */
  about: string;
  /** the second support of an instant-centre mode (see `about`) */
  with?: string;
  pivot: Vec2;
  /** turning sense: +1 counter-clockwise, −1 clockwise */
  sense: 1 | -1;
  restoring: number;
  overturning: number;
  /** each load's share about the pivot (N·m, both ≥ 0): a hand check adds them up to the two sums */
  terms: TurningTerm[];
  required: number;
  pass: boolean;
}

export interface TurningTerm {
  id: string;
  /** as in the equations: "weight of “Cart”", "pressure at p1"; a flux as the body feels it: "outflow at “lance tip”, on the body −ṁV" */
  label: string;
  restoring: number;
  overturning: number;
}

export interface SlidingCheck {
  factor: number;
  available: number;
  driving: number;
  required: number;
  pass: boolean;
  /** the body tips: taken as a whole (μ·Σn over |Σt| of all its contacts), not contact by contact */
  wholeBody?: boolean;
}

export interface BodyStability {
  overturning: OverturningCheck | { notApplicable: string };
  sliding: SlidingCheck | { notApplicable: string };
}

export interface Requirements {
  overturning: number;
  sliding: number;
}

/**
 * A support as a note names it, its label in quotes as the equations' terms write it: "the “front
 * pin”" (a label that names its kind stands alone), "the fixed support “anchor”"; without a
 * label, "the pin front".
 */
function supportWords(s: Support): string {
  const kind = s.kind === "fixed" ? "fixed support" : s.kind;
  const named = !!s.label && new RegExp(`(^|[^\\p{L}\\p{N}_])${kind}($|[^\\p{L}\\p{N}_])`, "iu").test(s.label);
  return named ? `the ${elementName(s)}` : `the ${kind} ${elementName(s)}`;
}

/** 1.5 for each is common practice (from memory). */
export const DEFAULT_REQUIREMENTS: Requirements = { overturning: 1.5, sliding: 1.5 };

/** A sketch's required factors of safety: its own where it sets them, else the defaults. */
export const requirementsOf = (file: { stability?: Partial<Requirements> }): Requirements => ({ ...DEFAULT_REQUIREMENTS, ...(file.stability ?? {}) });

export function overturningCheck(model: BodyModel, required: number): BodyStability["overturning"] {
  const { supports, springs, groups, origin, L } = model;
  const contacts = groups.filter((g) => g.kind === "contact");
  if (contacts.length === 0) return { notApplicable: "no contacts to tip about" };
  // the pivots: each contact, and each pin or roller (a stand pinned at one edge tips about the
  // pin once its other contacts open: the pin holds it in place, not upright)
  const pivots: Array<{ s: Support; si: number; P: Vec2; other?: number }> = supports
    .map((s, si) => ({ s, si, P: s.at }))
    .filter(({ s, si }) => s.kind === "pin" || s.kind === "roller" || contacts.some((g) => g.support === si));
  // two contacts (or a contact and a roller, or two rollers) whose lines of action meet: the body
  // can turn about that point with both staying closed, each sliding along its face (a front wheel
  // climbing a chock) — a mode no single support's point shows
  for (let i = 0; i < supports.length; i++) {
    for (let j = i + 1; j < supports.length; j++) {
      const a = supports[i];
      const b = supports[j];
      if ((a.kind !== "contact" && a.kind !== "roller") || (b.kind !== "contact" && b.kind !== "roller")) continue;
      const P = linesMeet(a.at, a.angle, b.at, b.angle, L);
      if (P) pivots.push({ s: a, si: i, P, other: j });
    }
  }
  let best: OverturningCheck | null = null;
  let blockedBy: Support | null = null;
  let free = false;
  for (const { s, si, P, other } of pivots) {
    for (const sense of [1, -1] as const) {
      // rotation about P: displacement of the reference point and scaled turn
      const d = [sense * (P[1] - origin[1]), sense * (origin[0] - P[0]), sense * L];
      let valid = true;
      const eps = 1e-9 * L;
      /** the contacts this turn lifts off their bases */
      const opening: ContactSupport[] = [];
      for (let i = 0; i < springs.length; i++) {
        const sp = springs[i];
        if (sp.support === si || sp.support === other) continue;
        const v = dot3(sp.g, d);
        const grp = sp.group >= 0 ? groups[sp.group] : null;
        // another contact or tie must open (or stay); a bilateral support must not move at all;
        // the friction spring of a contact that opens does not matter
        const blocks = grp === null ? Math.abs(v) > eps : grp.normal === i ? v < -eps : false;
        if (blocks) {
          valid = false;
          blockedBy = supports[sp.support];
          break;
        }
        if (grp?.kind === "contact" && grp.normal === i && v > eps) opening.push(supports[sp.support] as ContactSupport);
      }
      // about a pin or a roller the body tips only by lifting a contact off (with nothing to
      // lift, it would turn freely: unrestrained, not a tipping mode)
      // about an instant centre likewise: with nothing lifting, the two supports leave a free turn
      if (!valid || ((s.kind !== "contact" || other !== undefined) && opening.length === 0)) continue;
      free = true;
      const n = baseNormal(s.kind === "contact" && other === undefined ? [s] : opening);
      const terms = turningTerms(model, P, sense, n);
      let restoring = 0;
      let overturning = 0;
      for (const t of terms) {
        restoring += t.restoring;
        overturning += t.overturning;
      }
      if (overturning <= 1e-12 * (restoring + 1)) continue;
      const factor = restoring / overturning;
      if (!best || factor < best.factor) {
        best = { factor, about: s.id, ...(other === undefined ? {} : { with: supports[other].id }), pivot: [P[0], P[1]], sense, restoring, overturning, terms, required, pass: factor >= required };
      }
    }
  }
  if (best) return best;
  // a body free to tip about some support, with no load tending to: say that, not which support
  // blocks the other ways it could turn
  return { notApplicable: blockedBy && !free ? `tipping is prevented by ${supportWords(blockedBy)}` : "no load tends to tip it" };
}

/**
 * Where the lines of action through `a` (angle `ta`, degrees) and `b` (angle `tb`) meet, or null when
 * they are parallel or meet farther than 1000 body sizes `L` away (a turn about so far a point is a
 * translation, which the sliding check covers).
 */
function linesMeet(a: Vec2, ta: number, b: Vec2, tb: number, L: number): Vec2 | null {
  const ea = direction(ta);
  const eb = direction(tb);
  const cross = ea[0] * eb[1] - ea[1] * eb[0];
  if (Math.abs(cross) < 1e-9) return null;
  // a + s·ea = b + u·eb  →  s = ((b − a) × eb) / (ea × eb)
  const s = ((b[0] - a[0]) * eb[1] - (b[1] - a[1]) * eb[0]) / cross;
  if (Math.abs(s) > 1000 * L) return null;
  return [a[0] + s * ea[0], a[1] + s * ea[1]];
}

/**
 * What an overturning check turns about, in words: the support's name ("the chock"), or for an
 * instant-centre mode "the instant centre of rear wheel and chock". `nameOf` names a support id.
 */
export function pivotWords(check: Pick<OverturningCheck, "about" | "with">, nameOf: (id: string) => string): string {
  return check.with === undefined ? nameOf(check.about) : `the instant centre of ${nameOf(check.about)} and ${nameOf(check.with)}`;
}

/**
 * Each load's moment about the pivot P for a turn of the given sense, split into the part that
 * restores and the part that overturns. Each force counts by its components across and along the
 * base the body stands on (normal n: the contact's, or about a pin or a roller the base of the
 * contacts it lifts), as an inclined thrust or a weight on a slope is resolved by hand: the part
 * pressing the body down restores, the part pushing it over overturns. Momentum flux terms sit on
 * the other side of the equation: the body feels −ṁV.
 */
function turningTerms(model: BodyModel, P: Vec2, sense: 1 | -1, n: Vec2): TurningTerm[] {
  const tan: Vec2 = [-n[1], n[0]];
  const out: TurningTerm[] = [];
  const term = (t: { id: string; label: string; fx: number; fy: number; m: number; at?: Vec2 }, sign: number) => {
    let restoring = 0;
    let overturning = 0;
    const add = (work: number) => (work > 0 ? (overturning += work) : (restoring -= work));
    if (t.at) {
      const rx = t.at[0] - P[0];
      const ry = t.at[1] - P[1];
      const fn = t.fx * n[0] + t.fy * n[1];
      const ft = t.fx * tan[0] + t.fy * tan[1];
      add(sign * sense * momentOf(rx, ry, fn * n[0], fn * n[1]));
      add(sign * sense * momentOf(rx, ry, ft * tan[0], ft * tan[1]));
    }
    if (sign > 0) add(sense * t.m);
    if (restoring || overturning) out.push({ id: t.id, label: t.label, restoring, overturning });
  };
  for (const t of model.forceTerms) term(t, 1);
  // the flux terms named as the body feels them: an outlet's jet pushes it back (−ṁV), an inflow on (+ṁV)
  for (const t of model.momentumTerms) term({ ...t, label: asTheBodyFeelsIt(t) }, -1);
  return out;
}

/**
 * A momentum term as the body feels it, from the term's data (never its label's words): "outflow at
 * “lance tip”, on the body −ṁV", "inflow at p1, on the body +βṁV × 1.35".
 */
export function asTheBodyFeelsIt(t: Pick<EquationTerm, "id" | "name" | "flow" | "beta" | "factor">): string {
  const out = t.flow === "out";
  const factor = t.factor === undefined || t.factor === 1 ? "" : ` × ${Number(t.factor.toPrecision(6))}`;
  return `${out ? "outflow" : "inflow"} at ${t.name ?? t.id}, on the body ${out ? "−" : "+"}${t.beta === undefined || t.beta === 1 ? "" : "β"}ṁV${factor}`;
}

/** The normal of the base the contacts stand on: theirs when they agree, else the sketch's +y. */
function baseNormal(on: readonly ContactSupport[]): Vec2 {
  const n = direction(on[0].angle);
  const agree = on.every((c) => {
    const m = direction(c.angle);
    return Math.abs(m[0] - n[0]) < 1e-9 && Math.abs(m[1] - n[1]) < 1e-9;
  });
  return agree ? n : [0, 1];
}

export function slidingCheck(model: BodyModel, reactions: Record<string, Reaction>, required: number, status?: BodyResult["status"]): BodyStability["sliding"] {
  const holder = model.supports.find((s) => s.kind === "pin" || s.kind === "fixed" || s.kind === "roller");
  if (holder) return { notApplicable: `sliding is resisted by ${supportWords(holder)}` };
  if (status === "tips" || status === "unrestrained") return wholeBodySliding(model, reactions, required, status);
  let available = 0;
  let tx = 0;
  let ty = 0;
  let any = false;
  for (const s of model.supports) {
    if (s.kind !== "contact" || s.mu === undefined) continue;
    const r = reactions[s.id];
    if (!r || r.state !== "bearing") continue;
    any = true;
    available += s.mu * Math.max(r.n ?? 0, 0);
    const e = direction(s.angle + 90);
    tx += (r.t ?? 0) * e[0];
    ty += (r.t ?? 0) * e[1];
  }
  if (!any) return { notApplicable: "no bearing contact with friction" };
  const driving = Math.hypot(tx, ty);
  const factor = driving > 1e-12 ? available / driving : Infinity;
  return { factor, available, driving, required, pass: factor >= required };
}

/**
 * Sliding of a body that tips (or is unrestrained), taken as a whole: its contacts' normal and
 * tangential reactions summed, as equilibrium would need them with every contact able to pull.
 * The sums do not depend on how the contacts share the load when they share one base direction
 * and one μ, so μ·Σn over |Σt| is the hand calculation's μ·N over the sliding force.
 */
/** What the whole-body sliding check needs of a support (a sketch's, or a drawing's with numbers). */
export interface SlideSupport {
  id: string;
  kind: string;
  angle?: number;
  mu?: number;
}

/**
 * A body on contacts alone, all of one μ and one base direction, taken as a whole: Σn and Σt of
 * their reactions and the μ they share. Otherwise why it cannot be taken so: "not-contacts" (some
 * other support holds it), "differ" (μ or direction differ), "unsolved" (a reaction is missing).
 */
export function contactSums(supports: readonly SlideSupport[], reactions: Record<string, Reaction>): { n: number; t: number; mu: number } | { why: "not-contacts" | "differ" | "unsolved" } {
  const first = supports[0];
  if (!first || supports.some((s) => s.kind !== "contact")) return { why: "not-contacts" };
  const { mu, angle } = first;
  const turn = (a: number) => ((((a - angle!) % 360) + 540) % 360) - 180;
  if (mu === undefined || angle === undefined || supports.some((c) => c.mu !== mu || c.angle === undefined || Math.abs(turn(c.angle)) > 1e-9)) return { why: "differ" };
  let n = 0;
  let t = 0;
  for (const c of supports) {
    const r = reactions[c.id];
    if (!r) return { why: "unsolved" };
    n += r.n ?? 0;
    t += r.t ?? 0;
  }
  return { n, t, mu };
}

function wholeBodySliding(model: BodyModel, reactions: Record<string, Reaction>, required: number, status: "tips" | "unrestrained"): BodyStability["sliding"] {
  const why = status === "tips" ? "the body tips" : "the body is unrestrained";
  const sums = contactSums(model.supports, reactions);
  if ("why" in sums) {
    if (sums.why === "not-contacts") return { notApplicable: `${why}, and not on contacts alone: sliding is not assessed apart from it` };
    if (sums.why === "differ") return { notApplicable: `${why}; its contacts differ in μ or direction, so sliding is not assessed apart from it` };
    return { notApplicable: `${why}: sliding is not assessed` };
  }
  const available = sums.mu * Math.max(sums.n, 0);
  const driving = Math.abs(sums.t);
  const factor = driving > 1e-12 ? available / driving : Infinity;
  return { factor, available, driving, required, pass: factor >= required, wholeBody: true };
}

export function bodyStability(model: BodyModel, result: { reactions: Record<string, Reaction>; bodies: Record<string, BodyResult> }, req: Requirements): BodyStability {
  // a body nothing holds has no factor against anything: the free motion is the finding
  if (result.bodies[model.body.id]?.status === "unrestrained") {
    const why = "the body is unrestrained: nothing holds it, so no factor of safety applies";
    return { overturning: { notApplicable: why }, sliding: { notApplicable: why } };
  }
  return { overturning: overturningCheck(model, req.overturning), sliding: slidingCheck(model, result.reactions, req.sliding, result.bodies[model.body.id]?.status) };
}
