// Shared class names of the editor's panels: one look for headings, inputs and small buttons.
// On a touch screen (a coarse pointer) inputs and buttons are 40 px tall, a finger's tap target.
export const HEADING = "text-[11px] font-semibold uppercase tracking-[0.14em] text-ink-faint";
export const INPUT =
  "num h-7 w-full pointer-coarse:h-10 rounded border border-rule bg-paper-field px-2 text-[13px] text-ink placeholder:text-ink-faint/70 focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/25 aria-[invalid=true]:border-caution aria-[invalid=true]:bg-caution-soft/40 disabled:cursor-not-allowed disabled:bg-paper disabled:text-ink-soft";
export const BUTTON =
  "inline-flex h-7 pointer-coarse:h-10 items-center gap-1.5 rounded border border-rule bg-paper-card px-2.5 text-[12.5px] font-medium text-ink-soft hover:border-ink/30 hover:text-ink disabled:cursor-not-allowed disabled:opacity-40";
export const ICON_BUTTON =
  "inline-flex h-7 min-w-7 pointer-coarse:h-10 pointer-coarse:min-w-10 items-center justify-center rounded px-1.5 text-[13px] text-ink-soft hover:bg-paper-deep hover:text-ink disabled:cursor-not-allowed disabled:opacity-35";
export const LABEL = "text-[12px] font-medium text-ink-soft";
export const PRIMARY_BUTTON =
  "inline-flex h-7 pointer-coarse:h-10 items-center gap-1.5 rounded bg-ink px-3 text-[12.5px] font-medium text-paper hover:bg-ink-soft disabled:cursor-not-allowed disabled:opacity-40";

/**
 * Enter in a field: commit as leaving it would (one undo step a visit) and, with a keyboard, keep
 * the focus there (not thrown back to the top of the page). On a touch screen Enter is the on-screen
 * keyboard's Done: the field is left, so that keyboard goes and the drawing shows again.
 */
export function endVisitHere(field: HTMLElement) {
  field.blur();
  const touch = typeof window !== "undefined" && typeof window.matchMedia === "function" && window.matchMedia("(pointer: coarse)").matches;
  if (!touch && field.isConnected) field.focus();
}

/** Below this width the properties panel lies over the drawing (see the editor's aside). */
export const PANEL_OVER_DRAWING = "(max-width: 1179px)";

/**
 * Escape leaves a field of the properties panel for the drawing, so the focus stays visible and
 * the keys go on to the selection (the arrows move it, the next Escape clears it), instead of the
 * focus falling to the page. Where the panel lies over the drawing (a narrow window) the field is
 * only left: the next Escape closes the panel and puts the focus on its button.
 */
export function leaveField(field: HTMLElement) {
  field.blur();
  const over = typeof window.matchMedia === "function" && window.matchMedia(PANEL_OVER_DRAWING).matches;
  if (over) return;
  document.querySelector<HTMLElement>('[data-testid="sketch-canvas"]')?.focus({ preventScroll: true });
}
