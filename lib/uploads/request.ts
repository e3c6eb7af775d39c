import "server-only";
// Reading an upload's request body: multipart/form-data (a `file` field, as a browser form sends
// it) or the raw bytes (any other content type, as `curl --data-binary` sends them). The cap is
// enforced while the body streams in: a declared length over it is refused before reading, and
// reading stops at the first byte over it, so nothing larger is ever held in memory.
import { z } from "zod";
import { readBytesCapped } from "../api";
import { AppError } from "../errors";
import { UPLOAD_LIMITS } from "./process";

/** Room for a multipart body's boundaries and part headers around a file at the cap. */
const MULTIPART_OVERHEAD = 64 * 1024;

/** The query an upload address reads: `?name=` for raw bytes' display name (nothing else). */
export const uploadQuery = z.object({ name: z.string().optional() });

export type UploadBody = { bytes: Buffer; name: string };

function tooLarge(): AppError {
  const message = `The file is larger than the ${UPLOAD_LIMITS.maxBytes / 1048576} MB an upload may be.`;
  return new AppError("payload_too_large", message, { fields: [{ path: "file", message }] });
}

const readCapped = (req: Request, max: number) => readBytesCapped(req, max, tooLarge);

/** A file name for display: no folders, no control characters, at most 200 characters. */
export function displayName(raw: string | null | undefined): string {
  const base = (raw ?? "").split(/[\\/]/).pop() ?? "";
  return base.replace(/[\u0000-\u001f\u007f]/g, "").trim().slice(0, 200);
}

function headerName(req: Request): string {
  const url = new URL(req.url);
  const raw = url.searchParams.get("name") ?? req.headers.get("x-file-name") ?? "";
  try {
    return displayName(decodeURIComponent(raw));
  } catch {
    return displayName(raw);
  }
}

/** The uploaded file's bytes and its display name, or a clear 4xx. */
export async function readUploadBody(req: Request): Promise<UploadBody> {
  const type = req.headers.get("content-type") ?? "";
  if (/^multipart\/form-data\b/i.test(type)) {
    const raw = await readCapped(req, UPLOAD_LIMITS.maxBytes + MULTIPART_OVERHEAD);
    let form: FormData;
    try {
      form = await new Response(new Uint8Array(raw), { headers: { "content-type": type } }).formData();
    } catch {
      throw new AppError("bad_request", "The form data could not be read: send the file in a field named “file”.");
    }
    const file = form.get("file");
    if (!file || typeof file === "string") throw new AppError("validation_failed", "Send the file in a form field named “file”.", { fields: [{ path: "file", message: "Missing." }] });
    if (file.size > UPLOAD_LIMITS.maxBytes) throw tooLarge();
    return { bytes: Buffer.from(await file.arrayBuffer()), name: displayName(file.name) };
  }
  const bytes = await readCapped(req, UPLOAD_LIMITS.maxBytes);
  return { bytes, name: headerName(req) };
}
