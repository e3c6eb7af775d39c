// Short phrases shared by warnings and status sentences.
import { formatQuantity } from "./units";
import type { Support } from "./types";

const KIND_WORD: Record<Support["kind"], string> = {
  pin: "Pin",
  roller: "Roller",
  contact: "Contact",
  fixed: "Fixed support",
  tie: "Tie",
};

/** "Contact s2 (rear foot)" or "Contact s2" */
export function describeSupport(s: Pick<Support, "kind" | "id" | "label">): string {
  return s.label ? `${KIND_WORD[s.kind]} ${s.id} (${s.label})` : `${KIND_WORD[s.kind]} ${s.id}`;
}

export function fmtForce(n: number): string {
  return formatQuantity(n, "force", "SI");
}
