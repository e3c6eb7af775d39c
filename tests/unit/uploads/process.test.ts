// Upload checks: type sniffed from the bytes, size and dimension caps, metadata stripped, PDFs
// rendered to their first page.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { firstPageBox, firstPageOfPdf, pdfRenderDpi, withoutDocumentMetadata } from "@/lib/uploads/pdf";
import { processUpload, UPLOAD_LIMITS } from "@/lib/uploads/process";
import { PDF_AUTHOR, PDF_XMP_CREATOR, pdf, png } from "../../fixtures/uploads";

/**
 * Checks a refusal's code and its message against a pattern. (A pattern inside
 * `rejects.toMatchObject({ message })` is not tested against an error's message: such a check
 * passes whatever the message says.)
 */
async function refusedWith(pending: Promise<unknown>, code: string, message: RegExp) {
  const err = await pending.then(
    () => null,
    (e: unknown) => e as Error & { code?: string },
  );
  expect(err, "the upload should have been refused").toBeInstanceOf(Error);
  expect(err?.code).toBe(code);
  expect(() => {
    throw err;
  }).toThrow(message);
}

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
    await refusedWith(processUpload(Buffer.alloc(UPLOAD_LIMITS.maxBytes + 1)), "payload_too_large", /limited to 10 MB/);
  });

  it("refuses an image too large in pixels", async () => {
    const wide = await sharp({ create: { width: 12001, height: 10, channels: 3, background: "#000" } }).png().toBuffer();
    await refusedWith(processUpload(wide), "validation_failed", /12001 × 10 pixels/);
  });

  it("refuses another known type by name", async () => {
    const gif = Buffer.from("R0lGODlhAQABAAAAACw=", "base64");
    await refusedWith(processUpload(gif), "unsupported_media_type", /This file is image\/gif/);
  });
});

describe("a PDF's first page is sized before it is drawn", () => {
  it("reads the page size and turn from pdfinfo's page lines", () => {
    const out = "Pages:           3\nPage    1 size:  595.276 x 841.89 pts (A4)\nPage    1 rot:   270\n";
    expect(firstPageBox(out)).toEqual({ widthPt: 595.276, heightPt: 841.89, rotationDeg: 270 });
    expect(firstPageBox("Pages: 1\n")).toBeNull();
  });

  it("draws at 150 dpi while the caps allow, lower for a larger drawing, and refuses beyond 72 dpi", () => {
    // ISO 216 A0 is 841 × 1189 mm = 2384 × 3370 pt: at 150 dpi 4967 × 7022 px = 34.9 MP, within the caps
    expect(pdfRenderDpi({ widthPt: 2384, heightPt: 3370, rotationDeg: 0 }, UPLOAD_LIMITS)).toBe(150);
    // a 3 m × 1.5 m sheet (8504 × 4252 pt): 12000 px a side allows 12000 × 72 / 8504 = 101.6 dpi,
    // 60 MP allows √(60e6 × 72² / (8504 × 4252)) = 92.75 dpi, the lower
    expect(pdfRenderDpi({ widthPt: 8504, heightPt: 4252, rotationDeg: 0 }, UPLOAD_LIMITS)).toBeCloseTo(92.75, 1);
    // a 4 m × 0.5 m strip (11339 × 1417 pt): the side cap, 12000 × 72 / 11339 = 76.2 dpi, is the lower
    expect(pdfRenderDpi({ widthPt: 11339, heightPt: 1417, rotationDeg: 0 }, UPLOAD_LIMITS)).toBeCloseTo(76.2, 1);
    // the largest page a PDF may have, 200 in = 14400 pt square: 72 dpi would be 14400 px a side
    expect(() => pdfRenderDpi({ widthPt: 14400, heightPt: 14400, rotationDeg: 0 }, UPLOAD_LIMITS)).toThrow(
      "The PDF's first page is 5080 × 5080 mm, too large to draw: pages up to 4233 mm a side and 7.5 m² are accepted. Export the part you need as a smaller page or an image.",
    );
    // 2 × 2 pt is 4 px at 150 dpi
    expect(() => pdfRenderDpi({ widthPt: 2, heightPt: 2, rotationDeg: 0 }, UPLOAD_LIMITS)).toThrow("The PDF's first page is 1 × 1 mm, too small to trace over.");
  });

  it("refuses a tiny file with a huge page at once, without drawing it", async () => {
    const huge = pdf(1, { page: "/MediaBox [0 0 14400 14400]" });
    expect(huge.length).toBeLessThan(500);
    const t0 = Date.now();
    await refusedWith(processUpload(huge), "validation_failed", /^The PDF's first page is 5080 × 5080 mm, too large to draw/);
    // drawing it at 150 dpi would take poppler seconds and gigabytes; reading its size takes milliseconds
    expect(Date.now() - t0).toBeLessThan(3000);
    await refusedWith(processUpload(pdf(1, { page: "/MediaBox [0 0 8000 8000]" })), "validation_failed", /2822 × 2822 mm, too large/);
  });

  it("draws the crop box that was measured, not a larger media box, and turns a rotated page", async () => {
    const cropped = await processUpload(pdf(1, { page: "/MediaBox [0 0 14400 14400] /CropBox [0 0 200 150]" }));
    expect([cropped.width, cropped.height]).toEqual([417, 313]);
    const turned = await processUpload(pdf(1, { page: "/MediaBox [0 0 200 150] /Rotate 90" }));
    expect([turned.width, turned.height]).toEqual([313, 417]);
  });

  it("draws a page too large for 150 dpi at the resolution that fits", async () => {
    // caps scaled down so the test draws little: 2000 × 1000 pt at most 1000 px a side is 36 dpi
    const limits = { ...UPLOAD_LIMITS, maxSide: 1000, pdfMinDpi: 20 };
    const png = await firstPageOfPdf(pdf(1, { page: "/MediaBox [0 0 2000 1000]" }), limits);
    const meta = await sharp(png).metadata();
    expect([meta.width, meta.height]).toEqual([1000, 500]);
    await refusedWith(firstPageOfPdf(pdf(1, { page: "/MediaBox [0 0 2000 1000]" }), { ...limits, pdfMinDpi: 72 }), "validation_failed", /too large to draw/);
  });
});

describe("an attached PDF loses its document metadata", () => {
  it("drops the Info dictionary and the XMP stream, and keeps the pages", async () => {
    const sent = pdf(2, { meta: true });
    expect(sent.includes(Buffer.from(PDF_AUTHOR))).toBe(true);
    const kept = await withoutDocumentMetadata(sent);
    expect(kept).not.toBeNull();
    for (const s of [PDF_AUTHOR, PDF_XMP_CREATOR, "/Author", "/Metadata", "Pump data sheet"]) expect(kept!.includes(Buffer.from(s))).toBe(false);
    const again = await processUpload(kept!);
    expect([again.width, again.height]).toEqual([417, 313]);
    expect(kept!.toString("latin1")).toMatch(/\/Count 2\b/);
  });

  it("answers null for what poppler will not rewrite", async () => {
    expect(await withoutDocumentMetadata(Buffer.from("%PDF-1.4\nnot really\n"))).toBeNull();
  });
});
