// A body that tips and slides as well. Taken as a whole, as its factor of safety against sliding
// takes it (`contactSums` in solver/stability.ts: on contacts alone, one μ and one base direction,
// μ·Σn against |Σt| of the forces that would hold it), it needs more friction than its contacts
// give. Shared by the status sentence and the drawing, so the words and the slide mark agree.
// Which of the two starts first is the factors of safety's to say (`tipSlideOrder`,
// components/results/statusSentence.ts).
import { contactSums, type SlideSupport as Held } from "@/solver/stability";
import { overMu } from "@/solver/words";
import type { SolveResult } from "@/solver/types";

/** What the check needs of a support: the sketch's (numbers) or the scene's (whose other items are passed over). */
export interface SlideSupport extends Held {
  body: string;
}

export interface TipSlide {
  /** Σ n and Σ t of the body's contacts (N), the μ they share, and |Σt| / Σn */
  n: number;
  t: number;
  mu: number;
  needed: number;
}

const SUPPORT_KINDS = new Set(["pin", "roller", "contact", "fixed", "tie"]);

/** The body tips and, taken as a whole, slides too: its sums; else null (it only tips, holds, or cannot be taken as a whole). */
export function tipSlide(supports: readonly SlideSupport[], result: SolveResult, body: string): TipSlide | null {
  if (result.bodies[body]?.status !== "tips") return null;
  // the body's supports only (a scene's items hold its loads and ports too)
  const sums = contactSums(
    supports.filter((s) => s.body === body && SUPPORT_KINDS.has(s.kind)),
    result.reactions,
  );
  if ("why" in sums) return null;
  const needed = sums.n > 0 ? Math.abs(sums.t) / sums.n : Infinity;
  return overMu(needed, sums.mu) ? { ...sums, needed } : null;
}
