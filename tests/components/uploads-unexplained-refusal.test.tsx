// An upload refused by something in front of the app (a proxy's HTML 413, a gateway's 502) or
// never sent at all says what happened in words, names the file, and says nothing was kept,
// rather than "The server answered 413."
import { afterEach, describe, expect, it, vi } from "vitest";
import { uploadFile } from "@/components/uploads/uploadFile";

afterEach(() => vi.unstubAllGlobals());

/** The error an upload ends in (a test fails if it is stored instead). */
async function refusal(path: string): Promise<Error> {
  const out = await uploadFile(path, photo()).catch((e: Error) => e);
  if (!(out instanceof Error)) throw new Error("the upload was not refused");
  return out;
}

const photo = () => new File([new Uint8Array(2 * 1048576)], "skid from the north.jpg", { type: "image/jpeg" });
const html = (status: number, title: string) => vi.fn(async () => new Response(`<html><head><title>${status} ${title}</title></head><body><h1>${title}</h1></body></html>`, { status, headers: { "content-type": "text/html" } }));

describe("an upload refused without the app's own words", () => {
  it("a proxy's 413 for a file under the app's cap: refused as too large before the app saw it", async () => {
    vi.stubGlobal("fetch", html(413, "Request Entity Too Large"));
    const err = await refusal("/api/sketches/s1/uploads");
    expect(err).toMatchObject({ status: 413 });
    expect(err.message).toMatch(/^“skid from the north\.jpg”: The server in front of the app refused the file as too large \(HTTP 413\) before the app saw it/);
    expect(err.message).toContain("Nothing was kept.");
  });

  it("a gateway's 502: the app did not answer, try again", async () => {
    vi.stubGlobal("fetch", html(502, "Bad Gateway"));
    const err = await refusal("/api/sketches/s1/uploads");
    expect(err.message).toBe("“skid from the north.jpg”: The app did not answer in time (HTTP 502). Nothing was kept; try again shortly.");
  });

  it("no connection: the message names the file that was not sent", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => Promise.reject(new TypeError("Failed to fetch"))));
    const err = await refusal("/api/comments/c1/attachments");
    expect(err).toMatchObject({ status: 0, code: "network" });
    expect(err.message).toBe("“skid from the north.jpg” was not sent: the app could not be reached. Check the connection and try again.");
  });
});
