// Short phrases shared by warnings and status sentences.
import { formatNumber, formatQuantity } from "./units";
import type { FreeMotion, Reaction, Support } from "./types";

const KIND_WORD: Record<Support["kind"], string> = {
  pin: "Pin",
  roller: "Roller",
  contact: "Contact",
  fixed: "Fixed support",
  tie: "Tie",
};

/** A friction contact needs more than its μ (the tolerance keeps a contact at exactly μ from warning). */
export function overMu(needed: number, mu: number): boolean {
  return needed > mu * (1 + 1e-9) + 1e-12;
}

/**
 * An element named with its kind in front ("Inlet p1", "Body Beam"), unless the name already
 * starts with that word: a body labelled "Body 1" is "Body 1", not "Body Body 1" (any case, and
 * only as a whole word: "Bodywork" still gets its kind).
 */
export function kindAndName(kind: string, name: string): string {
  const starts = name.toLowerCase().startsWith(kind.toLowerCase()) && !/[\p{L}\p{N}_]/u.test(name.charAt(kind.length));
  return starts ? name : `${kind} ${name}`;
}

/** "Contact s2 (rear foot)" or "Contact s2" */
/** "Contact s1 (rear foot)"; a label that already starts with the id stands alone: "Contact axle (both wheels)". */
export function describeSupport(s: Pick<Support, "kind" | "id" | "label">): string {
  if (!s.label) return `${KIND_WORD[s.kind]} ${s.id}`;
  const startsWithId = s.label.toLowerCase().startsWith(s.id.toLowerCase()) && !/[\p{L}\p{N}_]/u.test(s.label.charAt(s.id.length));
  return startsWithId ? `${KIND_WORD[s.kind]} ${s.label}` : `${KIND_WORD[s.kind]} ${s.id} (${s.label})`;
}

export function fmtForce(n: number): string {
  return formatQuantity(n, "force", "SI");
}

/** "nothing resists motion in x", "nothing resists rotation about pin A (0, 1.5)" */
export function describeFreeMotion(fm: FreeMotion, supports: Pick<Support, "kind" | "id" | "label" | "at">[] = []): string {
  if (fm.kind === "translation") {
    const a = ((fm.angle % 180) + 180) % 180;
    const along = a < 1e-6 || Math.abs(a - 180) < 1e-6 ? "in x" : Math.abs(a - 90) < 1e-6 ? "in y" : `along ${Number(fm.angle.toFixed(1))}°`;
    return `nothing resists motion ${along}`;
  }
  const [x, y] = fm.about;
  const at = supports.find((s) => Math.hypot(s.at[0] - x, s.at[1] - y) < 1e-6);
  const point = `(${Number(x.toFixed(3))}, ${Number(y.toFixed(3))})`;
  return `nothing resists rotation about ${at ? `${describeSupport(at).replace(/^\w/, (c) => c.toLowerCase())} ${point}` : point}`;
}

/** How far gravity at `angle` (degrees from +x) is turned off −y, 0 to 180; 0 when it acts down the page. */
export function degreesOffDown(angle: number): number {
  return Math.abs(((((angle + 90) % 360) + 540) % 360) - 180);
}

/** "at −65° from +x, 25° off −y"-style words for a turned gravity, or null when it acts down the page (or is not given). */
function turnWords(angle: number | undefined, fromX: string): string | null {
  if (angle === undefined || !Number.isFinite(angle)) return null;
  const off = degreesOffDown(angle);
  return off < 1e-9 ? null : `at ${formatNumber(angle)}°${fromX}, ${formatNumber(off)}° off −y`;
}

/** "gravity at −65°, 25° off −y", or null when gravity acts down the page (or is not given). */
export function gravityNote(angle: number | undefined): string | null {
  const words = turnWords(angle, "");
  return words && `gravity ${words}`;
}

/** "acts at −65° from +x, 25° off −y", or "acts in −y". */
export function gravityActs(angle: number): string {
  const words = turnWords(angle, " from +x");
  return words ? `acts ${words}` : "acts in −y";
}

/**
 * A contact that has lifted off or a tie that has gone slack on a body that is held: it carries
 * nothing, and it has no margin to show. The solver's `margin` there (−stiffness × gap, the
 * contract's) only keeps the side of zero continuous for sweeps and the limit finder: its size
 * follows the ratio of the support stiffnesses, not any load. How much more load would make it
 * engage is no single number either (it depends on which load changes): the limit finder answers
 * it for the parameter the user picks. On a body that tips the row is the force it would need.
 */
export function carriesNothing(r: Pick<Reaction, "state">, bodyStatus: string | undefined): boolean {
  return (r.state === "lifted" || r.state === "slack") && (bodyStatus === "holds" || bodyStatus === "lifts");
}
