import "server-only";
// Checks and cleans an uploaded file before anything is stored: the type is sniffed from the
// bytes (never the name or the client's header), images are capped in size, turned upright and
// re-encoded without their metadata (EXIF, GPS), and a PDF's first page is measured, then drawn
// to PNG (pdf.ts) and cleaned like an image. Each refusal is an AppError with a clear message.
import { createHash } from "node:crypto";
import { fileTypeFromBuffer } from "file-type";
import sharp, { type Metadata, type OutputInfo } from "sharp";
import { AppError } from "../errors";
import { firstPageOfPdf } from "./pdf";

export const UPLOAD_LIMITS: UploadLimits = {
  /** bytes */
  maxBytes: 10 * 1024 * 1024,
  /** pixels on the longer side */
  maxSide: 12000,
  /** pixels in all */
  maxPixels: 60e6,
  /** resolution of a PDF's first page, dots per inch */
  pdfDpi: 150,
  /** the lowest resolution a large page is drawn at to fit the caps; a larger page is refused */
  pdfMinDpi: 72,
  /** pixels on the shorter side of a drawn page, below which it shows nothing to trace */
  pdfMinSide: 8,
};

export type UploadLimits = {
  maxBytes: number;
  maxSide: number;
  maxPixels: number;
  pdfDpi: number;
  pdfMinDpi: number;
  pdfMinSide: number;
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

/**
 * What to do with a file of a kind people often have at hand but that is not taken: a phone's HEIC
 * photo, a scanner's TIFF, an office document. Null for the rest (the general words do).
 */
export function whatToDoWith(mime: string): string | null {
  if (/^image\/hei[cf]/.test(mime)) return "a photo in the HEIC format phones save by default. Export or share it as JPEG (or set the camera to save JPEG), then upload that.";
  if (mime === "image/tiff") return "a TIFF image, as scanners save. Save it as PNG (a drawing) or JPEG (a photo), then upload that.";
  if (/^image\/(gif|bmp|avif|jxl)$/.test(mime)) return `a ${mime.slice(6).toUpperCase()} image. Save it as PNG, then upload that.`;
  if (/officedocument|msword|ms-excel|ms-powerpoint|opendocument/.test(mime)) return "an office document. Print or export it to PDF, then upload the PDF.";
  return null;
}

/**
 * A refusal of the uploaded file names its field, `file` (the form field it is sent in), as every
 * other refusal of the API names the field it is about; the message stays the same.
 */
export function onTheFile(err: unknown): unknown {
  if (!(err instanceof AppError) || err.fields?.length || err.status >= 500) return err;
  return new AppError(err.code, err.message, { fields: [{ path: "file", message: err.message }], headers: err.headers, extra: err.extra });
}

export async function processUpload(input: Buffer): Promise<ProcessedUpload> {
  try {
    return await checkAndClean(input);
  } catch (err) {
    throw onTheFile(err);
  }
}

async function checkAndClean(input: Buffer): Promise<ProcessedUpload> {
  if (input.length === 0) throw new AppError("validation_failed", "The file is empty.");
  if (input.length > UPLOAD_LIMITS.maxBytes)
    throw new AppError("payload_too_large", `The file is ${(input.length / 1048576).toFixed(1)} MB; uploads are limited to ${UPLOAD_LIMITS.maxBytes / 1048576} MB.`);
  const sniffed = await fileTypeFromBuffer(input);
  const mime = sniffed?.mime as AcceptedMime | undefined;
  if (!mime || !(mime in ACCEPTED)) {
    throw new AppError(
      "unsupported_media_type",
      sniffed
        ? `This file is ${sniffed.mime}, whatever its name says${whatToDoWith(sniffed.mime) ? `: ${whatToDoWith(sniffed.mime)}` : "; upload a PNG, JPEG or WebP image, or a PDF."}`
        : "This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says).",
    );
  }
  const image = mime === "application/pdf" ? await firstPageOfPdf(input, UPLOAD_LIMITS) : input;
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
