import "server-only";
// Checks and cleans an uploaded file before anything is stored: the type is sniffed from the
// bytes (never the name or the client's header), images are capped in size, turned upright and
// re-encoded without their metadata (EXIF, GPS), and a PDF's first page is rendered to PNG with
// Debian's poppler-utils (sharp reads no PDF). Each refusal is an AppError with a clear message.
import { execFile } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { promisify } from "node:util";
import { fileTypeFromBuffer } from "file-type";
import sharp, { type Metadata, type OutputInfo } from "sharp";
import { AppError } from "../errors";

const run = promisify(execFile);

export const UPLOAD_LIMITS = {
  /** bytes */
  maxBytes: 10 * 1024 * 1024,
  /** pixels on the longer side */
  maxSide: 12000,
  /** pixels in all */
  maxPixels: 60e6,
  /** resolution of a PDF's first page, dots per inch */
  pdfDpi: 150,
};

const ACCEPTED = {
  "image/png": "png",
  "image/jpeg": "jpg",
  "image/webp": "webp",
  "application/pdf": "pdf",
} as const;
export type AcceptedMime = keyof typeof ACCEPTED;

export interface ProcessedUpload {
  /** the sniffed type of what was sent */
  sourceMime: AcceptedMime;
  /** what is stored: the cleaned image, or the PDF's first page as PNG */
  mime: "image/png" | "image/jpeg" | "image/webp";
  ext: "png" | "jpg" | "webp";
  bytes: Buffer;
  width: number;
  height: number;
  /** sha256 of the stored bytes, hex */
  checksum: string;
  /** a small PNG preview (at most 320 px on the longer side) */
  thumbnail: Buffer;
}

export async function processUpload(input: Buffer): Promise<ProcessedUpload> {
  if (input.length === 0) throw new AppError("validation_failed", "The file is empty.");
  if (input.length > UPLOAD_LIMITS.maxBytes)
    throw new AppError("payload_too_large", `The file is ${(input.length / 1048576).toFixed(1)} MB; uploads are limited to ${UPLOAD_LIMITS.maxBytes / 1048576} MB.`);
  const sniffed = await fileTypeFromBuffer(input);
  const mime = sniffed?.mime as AcceptedMime | undefined;
  if (!mime || !(mime in ACCEPTED)) {
    throw new AppError(
      "unsupported_media_type",
      sniffed ? `This file is ${sniffed.mime}, whatever its name says; upload a PNG, JPEG or WebP image, or a PDF.` : "This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says).",
    );
  }
  const image = mime === "application/pdf" ? await firstPageOfPdf(input) : input;
  return cleanImage(image, mime);
}

async function cleanImage(input: Buffer, sourceMime: AcceptedMime): Promise<ProcessedUpload> {
  let meta: Metadata;
  try {
    meta = await sharp(input, { limitInputPixels: false }).metadata();
  } catch {
    throw new AppError("validation_failed", "The image could not be read: the file is damaged or incomplete.");
  }
  const w = meta.width ?? 0;
  const h = meta.height ?? 0;
  if (Math.max(w, h) > UPLOAD_LIMITS.maxSide || w * h > UPLOAD_LIMITS.maxPixels) {
    throw new AppError("validation_failed", `The image is ${w} × ${h} pixels; the limit is ${UPLOAD_LIMITS.maxSide} pixels a side and ${UPLOAD_LIMITS.maxPixels / 1e6} megapixels.`);
  }
  const format = sourceMime === "image/jpeg" ? "jpeg" : sourceMime === "image/webp" ? "webp" : "png";
  // rotate() applies the EXIF orientation; sharp writes no metadata unless asked to.
  let pipeline = sharp(input).rotate();
  pipeline = format === "jpeg" ? pipeline.jpeg({ quality: 90 }) : format === "webp" ? pipeline.webp({ quality: 90 }) : pipeline.png();
  let bytes: Buffer;
  let info: OutputInfo;
  try {
    ({ data: bytes, info } = await pipeline.toBuffer({ resolveWithObject: true }));
  } catch {
    throw new AppError("validation_failed", "The image could not be read: the file is damaged or incomplete.");
  }
  const thumbnail = await sharp(bytes).resize(320, 320, { fit: "inside", withoutEnlargement: true }).png().toBuffer();
  return {
    sourceMime,
    mime: format === "jpeg" ? "image/jpeg" : format === "webp" ? "image/webp" : "image/png",
    ext: format === "jpeg" ? "jpg" : format === "webp" ? "webp" : "png",
    bytes,
    width: info.width,
    height: info.height,
    checksum: createHash("sha256").update(bytes).digest("hex"),
    thumbnail,
  };
}

/** The first page of a PDF as PNG (pdfinfo counts the pages, pdftoppm renders page 1). */
async function firstPageOfPdf(pdf: Buffer): Promise<Buffer> {
  const dir = await mkdtemp(join(tmpdir(), "cp-pdf-"));
  try {
    const src = join(dir, "in.pdf");
    await writeFile(src, pdf);
    let pages = 0;
    try {
      const { stdout } = await run("pdfinfo", [src], { timeout: 20000 });
      pages = Number(/^Pages:\s+(\d+)/m.exec(stdout)?.[1] ?? 0);
    } catch (err) {
      // poppler refuses a document whose page tree is empty ("Invalid page count 0")
      if (/page count 0|last page \(0\)/.test(String((err as { stderr?: string }).stderr ?? ""))) pages = 0;
      else throw new AppError("validation_failed", "The PDF could not be read: it is damaged, encrypted or not really a PDF.");
    }
    if (pages < 1) throw new AppError("validation_failed", "The PDF has no pages.");
    try {
      await run("pdftoppm", ["-f", "1", "-l", "1", "-r", String(UPLOAD_LIMITS.pdfDpi), "-png", "-singlefile", src, join(dir, "page")], { timeout: 60000 });
    } catch {
      throw new AppError("validation_failed", "The PDF's first page could not be drawn.");
    }
    return await readFile(join(dir, "page.png"));
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
