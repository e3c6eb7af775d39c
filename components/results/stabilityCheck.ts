// The factors of safety as a hand check: every load's moment about the pivot, split into the part
// that restores and the part that overturns, and every bearing contact's μ·n against the
// tangential force it carries — so the factor the status quotes can be added up by hand.
import { pivotWords, type BodyStability } from "@/solver/stability";
import type { Reaction, Sketch, Support } from "@/solver/types";
import { supportName } from "./statusSentence";

export interface TurningLine {
  id: string;
  label: string;
  restoring: number;
  overturning: number;
}

export interface OverturningLines {
  /** "the front caster, turning clockwise" */
  about: string;
  lines: TurningLine[];
  restoring: number;
  overturning: number;
  factor: number;
  required: number;
  pass: boolean;
}

export interface FrictionLine {
  id: string;
  name: string;
  mu: number;
  n: number;
  /** μ·n: what the contact can give (signed when the body is taken as a whole: its share of μ·Σn) */
  available: number;
  /** the tangential force it must give (signed, along the contact's tangent) */
  t: number;
  /** |t| more than μ·n: this contact alone would slip */
  over: boolean;
}

export interface SlidingLines {
  lines: FrictionLine[];
  available: number;
  driving: number;
  factor: number;
  required: number;
  pass: boolean;
  wholeBody: boolean;
}

export interface StabilityLines {
  overturning: OverturningLines | { notApplicable: string };
  sliding: SlidingLines | { notApplicable: string };
  /** contacts that carry more friction than μ·n, whether or not sliding is assessed */
  overMu: FrictionLine[];
}

/** The friction lines of a body's contacts with a μ that bear (or, for a body that tips, all its contacts). */
function frictionLines(sketch: Sketch, body: string, reactions: Record<string, Reaction>, all: boolean): FrictionLine[] {
  const out: FrictionLine[] = [];
  for (const s of sketch.supports) {
    if (s.body !== body || s.kind !== "contact" || s.mu === undefined) continue;
    const r = reactions[s.id];
    if (!r || (!all && r.state !== "bearing")) continue;
    const n = r.n ?? 0;
    const t = r.t ?? 0;
    // a body taken as a whole counts μ·n of every contact with its sign, as μ·Σn does by hand
    // (μ·W on level ground): a contact that would have to pull takes off its share, and the column
    // adds up to the Σ under it; contact by contact a pull gives no friction
    const available = all ? s.mu * n : s.mu * Math.max(n, 0);
    out.push({ id: s.id, name: supportName(s), mu: s.mu, n, available, t, over: r.state === "bearing" && Math.abs(t) > available * (1 + 1e-9) + 1e-9 });
  }
  return out;
}

export function stabilityLines(sketch: Sketch, body: string, reactions: Record<string, Reaction>, st: BodyStability | undefined): StabilityLines | null {
  const names = new Map<string, Support>(sketch.supports.map((s) => [s.id, s]));
  const bearing = frictionLines(sketch, body, reactions, false);
  const overMu = bearing.filter((l) => l.over);
  if (!st) return overMu.length ? { overturning: { notApplicable: "" }, sliding: { notApplicable: "" }, overMu } : null;
  const o = st.overturning;
  const overturning: StabilityLines["overturning"] =
    "notApplicable" in o
      ? o
      : {
          about: `${pivotWords(o, (id) => (names.has(id) ? supportName(names.get(id)!) : id))}${o.with === undefined ? "" : " (where their lines of action meet)"}, turning ${o.sense > 0 ? "counter-clockwise" : "clockwise"}`,
          lines: o.terms.map((t) => ({ ...t })),
          restoring: o.restoring,
          overturning: o.overturning,
          factor: o.factor,
          required: o.required,
          pass: o.pass,
        };
  const sl = st.sliding;
  let sliding: StabilityLines["sliding"];
  if ("notApplicable" in sl) sliding = sl;
  else {
    // a body taken as a whole counts all its contacts; else the bearing ones, as found above
    const lines = sl.wholeBody ? frictionLines(sketch, body, reactions, true) : bearing;
    sliding = { lines, available: sl.available, driving: sl.driving, factor: sl.factor, required: sl.required, pass: sl.pass, wholeBody: !!sl.wholeBody };
  }
  return { overturning, sliding, overMu };
}
