// Upload checks: type sniffed from the bytes, size and dimension caps, metadata stripped, PDFs
// rendered to their first page.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { processUpload, UPLOAD_LIMITS } from "@/lib/uploads/process";
import { pdf, png } from "../../fixtures/uploads";

describe("processUpload", () => {
  it("keeps a PNG as PNG with its size, a checksum and a thumbnail", async () => {
    const out = await processUpload(await png(800, 600));
    expect(out).toMatchObject({ sourceMime: "image/png", mime: "image/png", ext: "png", width: 800, height: 600 });
    expect(out.checksum).toMatch(/^[0-9a-f]{64}$/);
    const t = await sharp(out.thumbnail).metadata();
    expect([t.width, t.height]).toEqual([320, 240]);
  });

  it("strips EXIF and GPS from a JPEG (read back from the stored bytes)", async () => {
    const withExif = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#808080" } })
      .jpeg()
      .withMetadata({ exif: { IFD0: { Copyright: "Site photo", Make: "SomeCamera" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1" } } })
      .toBuffer();
    expect((await sharp(withExif).metadata()).exif).toBeDefined();
    const out = await processUpload(withExif);
    expect(out.mime).toBe("image/jpeg");
    const meta = await sharp(out.bytes).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.icc).toBeUndefined();
    expect(out.bytes.includes(Buffer.from("SomeCamera"))).toBe(false);
  });

  it("renders a PDF's first page to PNG at 150 dpi", async () => {
    const out = await processUpload(pdf(2));
    expect(out.sourceMime).toBe("application/pdf");
    expect(out.mime).toBe("image/png");
    // 200 × 150 pt at 150 dpi
    expect([out.width, out.height]).toEqual([Math.round((200 * 150) / 72), Math.round((150 * 150) / 72)]);
  });

  it("refuses a PDF with no pages", async () => {
    await expect(processUpload(pdf(0))).rejects.toMatchObject({ code: "validation_failed", message: "The PDF has no pages." });
  });

  it("refuses a .png that is really text: the type comes from the bytes", async () => {
    await expect(processUpload(Buffer.from("just some text pretending to be an image\n"))).rejects.toMatchObject({
      code: "unsupported_media_type",
      message: "This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says).",
    });
  });

  it("refuses a file over 10 MB before reading it", async () => {
    await expect(processUpload(Buffer.alloc(UPLOAD_LIMITS.maxBytes + 1))).rejects.toMatchObject({ code: "payload_too_large", message: /limited to 10 MB/ });
  });

  it("refuses an image too large in pixels", async () => {
    const wide = await sharp({ create: { width: 12001, height: 10, channels: 3, background: "#000" } }).png().toBuffer();
    await expect(processUpload(wide)).rejects.toMatchObject({ code: "validation_failed", message: /12001 × 10 pixels/ });
  });

  it("refuses another known type by name", async () => {
    const gif = Buffer.from("R0lGODlhAQABAAAAACw=", "base64");
    await expect(processUpload(gif)).rejects.toMatchObject({ code: "unsupported_media_type", message: /This file is image\/gif/ });
  });
});
