// An upload the server refuses names the file in its message, as the browser's own size check does.
import { afterEach, describe, expect, it, vi } from "vitest";
import { uploadFile } from "@/components/uploads/uploadFile";

afterEach(() => vi.unstubAllGlobals());

describe("a refused upload", () => {
  it("names the file in the server's refusal", async () => {
    const refusal = "This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says).";
    vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify({ error: { code: "unsupported_media_type", message: refusal } }), { status: 415 })));
    await expect(uploadFile("/api/sketches/s1/uploads", new File(["not an image"], "site notes.png"))).rejects.toMatchObject({
      status: 415,
      message: `“site notes.png”: ${refusal}`,
    });
  });
});
