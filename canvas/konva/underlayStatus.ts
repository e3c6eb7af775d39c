// What the underlay's frame says while its file is not drawn: loading (a large drawing on a slow
// link takes seconds, and the scale's marks should not be clicked on an empty canvas), or failed.
// Pure, so the words are tested without a canvas.

export type UnderlayLoad = { img: unknown; failed: boolean } | null;

export const UNDERLAY_LOADING = "Loading the drawing…";
export const UNDERLAY_FAILED = "The drawing cannot be shown: it could not be fetched (check the connection and reload), or it was deleted, or it belongs to a workspace you cannot read.";

/** The words in the underlay's dashed frame, or null once the image is drawn (or while it is hidden). */
export function underlayFrameNote(load: UnderlayLoad, hidden: boolean): string | null {
  if (hidden) return null;
  if (!load) return UNDERLAY_LOADING;
  return load.failed ? UNDERLAY_FAILED : null;
}
