import type { ReviewState } from "@/lib/review/rules";

/**
 * What the save dialog says about the sign-off of the version the changes are made on: a saved
 * version never changes, so its check and approval stay with it, and the new version starts its
 * own review (it begins prepared, not submitted). `null` when there is nothing to say: the version
 * is only prepared, returned, withdrawn, or its state is not known.
 */
export function reviewNote(state: ReviewState | null, base: number): string | null {
  switch (state) {
    case "approved":
      return `v${base} is approved. Its approval stays with v${base}: the new version is a draft that needs checking and approval of its own before it replaces v${base} on a job.`;
    case "checked":
      return `v${base} is checked and waiting for approval. The check and the approval stay with v${base}: the new version needs its own check, so tell the checker and the approver.`;
    case "submitted":
      return `v${base} is submitted for checking. The checker reads v${base}, not the new version: tell them, and submit the new version when it is ready.`;
    default:
      return null;
  }
}
