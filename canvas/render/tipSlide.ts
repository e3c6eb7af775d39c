// A body that tips and slides as well. Taken as a whole, as its factor of safety against sliding
// takes it (`wholeBodySliding` in solver/stability.ts: on contacts alone, one μ and one base
// direction, μ·Σn against |Σt| of the forces that would hold it), it needs more friction than its
// contacts give. Shared by the status sentence and the drawing, so the words and the slide mark
// agree. The solver does not say which of the two would start first.
import { overMu } from "@/solver/words";
import type { SolveResult } from "@/solver/types";

/** What the check needs of a support: the sketch's (numbers) or the scene's (whose other items are passed over). */
export interface SlideSupport {
  id: string;
  body: string;
  kind: string;
  angle?: number;
  mu?: number;
}

export interface TipSlide {
  /** Σ n and Σ t of the body's contacts (N), the μ they share, and |Σt| / Σn */
  n: number;
  t: number;
  mu: number;
  needed: number;
}

const SUPPORT_KINDS = new Set(["pin", "roller", "contact", "fixed", "tie"]);
const turn = (a: number, from: number) => ((((a - from) % 360) + 540) % 360) - 180;

/** The body tips and, taken as a whole, slides too: its sums; else null (it only tips, holds, or cannot be taken as a whole). */
export function tipSlide(supports: readonly SlideSupport[], result: SolveResult, body: string): TipSlide | null {
  if (result.bodies[body]?.status !== "tips") return null;
  // the body's supports only (a scene's items hold its loads and ports too)
  const own = supports.filter((s) => s.body === body && SUPPORT_KINDS.has(s.kind));
  const first = own[0];
  if (!first || first.kind !== "contact" || first.mu === undefined || first.angle === undefined) return null;
  const mu = first.mu;
  const angle = first.angle;
  if (!own.every((s) => s.kind === "contact" && s.mu === mu && s.angle !== undefined && Math.abs(turn(s.angle, angle)) < 1e-9 && result.reactions[s.id])) return null;
  let n = 0;
  let t = 0;
  for (const s of own) {
    n += result.reactions[s.id].n ?? 0;
    t += result.reactions[s.id].t ?? 0;
  }
  const needed = n > 0 ? Math.abs(t) / n : Infinity;
  return overMu(needed, mu) ? { n, t, mu, needed } : null;
}
