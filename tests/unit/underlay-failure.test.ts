// When the underlay's file does not arrive, the frame on the canvas says why, from the answer to
// its address (an <img> alone sees no status): the file store down is said as such and fetched
// again on its own; a deleted file or another workspace's is not retried and says what to do.
import { describe, expect, it, vi } from "vitest";
import { fetchUnderlayFile, UNDERLAY_FAILED, UNDERLAY_RETRY_MS, underlayFailureNote, underlayFrameNote, underlayRetryMs } from "@/canvas/konva/underlayStatus";

const answer = (status: number, message?: string) =>
  vi.fn(async () => new Response(message ? JSON.stringify({ error: { code: "x", message } }) : "", { status, headers: message ? { "content-type": "application/json" } : {} })) as unknown as typeof fetch;

describe("the underlay's file, fetched", () => {
  it("the file store down (503): said as such, and fetched again after a while", async () => {
    const got = await fetchUnderlayFile("/api/uploads/u1", answer(503, "The file store is not answering. Try again shortly."));
    expect(got).toEqual({ ok: false, failure: { status: 503, message: "The file store is not answering. Try again shortly." } });
    if (got.ok) return;
    expect(underlayRetryMs(got.failure)).toBe(UNDERLAY_RETRY_MS);
    const note = underlayFrameNote({ img: null, failed: true, reason: got.failure }, false);
    expect(note).toBe("The drawing cannot be shown yet: the file store is not answering. It is fetched again every 15 s; the sketch itself is not affected.");
  });

  it("no connection at all: said, and fetched again", async () => {
    const got = await fetchUnderlayFile("/api/uploads/u1", vi.fn(async () => Promise.reject(new TypeError("Failed to fetch"))) as unknown as typeof fetch);
    expect(got).toEqual({ ok: false, failure: { status: 0 } });
    if (got.ok) return;
    expect(underlayRetryMs(got.failure)).toBe(UNDERLAY_RETRY_MS);
    expect(underlayFailureNote(got.failure)).toMatch(/^The drawing cannot be shown: the app could not be reached\. Check the connection\./);
  });

  it("deleted or another workspace's (404): not retried, says what to do", async () => {
    const got = await fetchUnderlayFile("/api/uploads/u1", answer(404, "No such file, or you are not a member of its workspace."));
    if (got.ok) throw new Error("a 404 is not a file");
    expect(underlayRetryMs(got.failure)).toBeNull();
    expect(underlayFailureNote(got.failure)).toBe("The drawing cannot be shown: its file was deleted, or it belongs to a workspace you cannot read. Upload the drawing again, or remove the underlay.");
  });

  it("the object missing from the store (410) and an ended session (401): not retried, each in its own words", () => {
    expect(underlayRetryMs({ status: 410 })).toBeNull();
    expect(underlayFailureNote({ status: 410, message: "This file's contents are missing from the file store." })).toMatch(/^The drawing cannot be shown: This file's contents are missing from the file store\. Upload the drawing again/);
    expect(underlayRetryMs({ status: 401 })).toBeNull();
    expect(underlayFailureNote({ status: 401 })).toBe("The drawing cannot be shown: your session has ended. Sign in again to see it.");
  });

  it("a file that arrives is handed over as bytes", async () => {
    const got = await fetchUnderlayFile("/api/uploads/u1", vi.fn(async () => new Response(new Uint8Array([137, 80, 78, 71]), { status: 200, headers: { "content-type": "image/png" } })) as unknown as typeof fetch);
    expect(got.ok).toBe(true);
    if (got.ok) expect(got.blob.size).toBe(4);
  });

  it("a failure with no reason known keeps the general words", () => {
    expect(underlayFrameNote({ img: null, failed: true }, false)).toBe(UNDERLAY_FAILED);
  });
});
