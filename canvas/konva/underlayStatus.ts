// What the underlay's frame says while its file is not drawn: loading (a large drawing on a slow
// link takes seconds, and the scale's marks should not be clicked on an empty canvas), or why it
// failed. The file is fetched (not handed to an <img>, which sees no status), so the frame can say
// whether the file store is down (tried again on its own), the file is gone, or the session ended.
// Pure, or with the fetch passed in, so the words and the retries are tested without a canvas.

export type UnderlayFailure = { status: number; message?: string };
export type UnderlayLoad = { img: unknown; failed: boolean; reason?: UnderlayFailure } | null;

export const UNDERLAY_LOADING = "Loading the drawing…";
export const UNDERLAY_FAILED = "The drawing cannot be shown: it could not be fetched (check the connection and reload), or it was deleted, or it belongs to a workspace you cannot read.";

/** How long to wait before fetching the drawing again, after a failure that may pass. */
export const UNDERLAY_RETRY_MS = 15000;

/** Whether a failure may pass on its own (the store or the app out of reach): then the file is fetched again. */
export function underlayRetryMs(f: UnderlayFailure): number | null {
  return f.status === 0 || f.status === 429 || f.status >= 500 ? UNDERLAY_RETRY_MS : null;
}

/** The words for why the drawing's file did not arrive, from the answer to its address. */
export function underlayFailureNote(f: UnderlayFailure): string {
  const again = `It is fetched again every ${UNDERLAY_RETRY_MS / 1000} s; the sketch itself is not affected.`;
  if (f.status === 200) return "The drawing cannot be shown: its file arrived, but this browser could not draw it. Upload it again as PNG.";
  if (f.status === 0) return `The drawing cannot be shown: the app could not be reached. Check the connection. ${again}`;
  if (f.status === 401) return "The drawing cannot be shown: your session has ended. Sign in again to see it.";
  if (f.status === 404) return "The drawing cannot be shown: its file was deleted, or it belongs to a workspace you cannot read. Upload the drawing again, or remove the underlay.";
  if (f.status === 410) return `The drawing cannot be shown: ${f.message ?? "its file is missing from the file store."} Upload the drawing again (Replace… keeps the scale of a drawing the same size).`;
  // the server's own 503 words end in "try again shortly": the frame says it is tried again instead
  if (f.status === 503) return `The drawing cannot be shown yet: the file store is not answering. ${again}`;
  if (underlayRetryMs(f)) return `The drawing cannot be shown yet: the server answered HTTP ${f.status}. ${again}`;
  return `${UNDERLAY_FAILED} (HTTP ${f.status})`;
}

/** The words in the underlay's dashed frame, or null once the image is drawn (or while it is hidden). */
export function underlayFrameNote(load: UnderlayLoad, hidden: boolean): string | null {
  if (hidden) return null;
  if (!load) return UNDERLAY_LOADING;
  if (!load.failed) return null;
  return load.reason ? underlayFailureNote(load.reason) : UNDERLAY_FAILED;
}

/** Fetch the drawing's file: its bytes, or the failure with the server's own message when it sent one. */
export async function fetchUnderlayFile(src: string, fetchFn: typeof fetch = fetch): Promise<{ ok: true; blob: Blob } | { ok: false; failure: UnderlayFailure }> {
  let res: Response;
  try {
    res = await fetchFn(src, { credentials: "same-origin" });
  } catch {
    return { ok: false, failure: { status: 0 } };
  }
  if (res.ok) {
    try {
      return { ok: true, blob: await res.blob() };
    } catch {
      // the connection dropped while the file came in
      return { ok: false, failure: { status: 0 } };
    }
  }
  const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
  return { ok: false, failure: { status: res.status, ...(body?.error?.message ? { message: body.error.message } : {}) } };
}
