import "server-only";
// Serving an uploaded file or its thumbnail to a reader of its workspace, streamed from object
// storage. Everyone else gets the same 404 as for a file that does not exist. Answers are
// private to the browser (never a shared cache) and carry the stored type, never a sniffed one;
// images are shown inline, PDFs downloaded.
import { GetObjectCommand } from "@aws-sdk/client-s3";
import { getUploadForReader } from "@/db/queries/uploads";
import { storageSettings } from "../env";
import { AppError } from "../errors";
import { s3 } from "../storage";
import { downloadName } from "./names";

const NOT_FOUND = "No such file, or you are not a member of its workspace.";

/** `Content-Disposition` with the display name (ASCII fallback and the UTF-8 form). */
function disposition(kind: "inline" | "attachment", name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

export async function serveUpload(req: Request, uploadId: string, userId: string, which: "file" | "thumbnail"): Promise<Response> {
  const u = await getUploadForReader(uploadId, userId);
  if (!u) throw new AppError("not_found", NOT_FOUND);
  const etag = `"${u.checksum.slice(0, 32)}${which === "thumbnail" ? "-t" : ""}"`;
  const headers: Record<string, string> = {
    "Cache-Control": "private, max-age=3600",
    Vary: "Cookie",
    ETag: etag,
    "X-Content-Type-Options": "nosniff",
  };
  // An image is shown, never run. A PDF is handed over as a download: shown inline it would run
  // in the app's origin in whatever viewer the browser has (scripts and forms included), and the
  // sandbox stops it running anything should a browser open it anyway.
  const pdf = which === "file" && u.storedType === "application/pdf";
  headers["Content-Security-Policy"] = pdf ? "sandbox; default-src 'none'" : "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'";
  if (req.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers });
  const key = which === "thumbnail" ? u.thumbnailKey : u.storageKey;
  let body: ReadableStream;
  let length: number | undefined;
  try {
    const res = await s3().send(new GetObjectCommand({ Bucket: storageSettings().bucket, Key: key }));
    body = res.Body!.transformToWebStream();
    length = res.ContentLength;
  } catch (err) {
    const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404) {
      console.error("[uploads] the object of an upload is missing", uploadId, key);
      throw new AppError("gone", "This file's contents are missing from the file store.");
    }
    console.error("[uploads] storage did not answer", err);
    throw new AppError("unavailable", "The file store is not answering. Try again shortly.");
  }
  const name = downloadName(u.originalName, u.storedType, which);
  return new Response(body, {
    status: 200,
    headers: {
      ...headers,
      "Content-Type": which === "thumbnail" ? "image/png" : u.storedType,
      ...(length !== undefined ? { "Content-Length": String(length) } : {}),
      "Content-Disposition": disposition(pdf ? "attachment" : "inline", name),
    },
  });
}
