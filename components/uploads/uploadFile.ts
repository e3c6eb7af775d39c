// Browser side of an upload: a form post of one file, refused here already when it is over the
// server's cap (so a 40 MB photo never leaves the machine); errors come back as ApiError.
import { ApiError } from "@/lib/api-client";
import type { ErrorCode, FieldError } from "@/lib/errors";

/** The server's cap (lib/uploads/process.ts UPLOAD_LIMITS.maxBytes; a test keeps them equal). */
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;
export const ACCEPT_UPLOADS = "image/png,image/jpeg,image/webp,application/pdf,.png,.jpg,.jpeg,.webp,.pdf";

export type UploadAnswer = {
  id: string;
  name: string;
  purpose: "underlay" | "attachment";
  sourceType: string;
  storedType: string;
  size: number;
  width: number;
  height: number;
  url: string;
  thumbnailUrl: string;
};

/**
 * Words for a refusal that did not come from the app (no JSON error): a proxy or load balancer in
 * front of it refusing the size, or not reaching it. Nothing was kept in either case.
 */
export function withoutOurAnswer(status: number): string {
  if (status === 413)
    return `The server in front of the app refused the file as too large (HTTP 413) before the app saw it, though uploads up to ${MAX_UPLOAD_BYTES / 1048576} MB are allowed: ask whoever runs the server to let ${MAX_UPLOAD_BYTES / 1048576} MB through. Nothing was kept.`;
  if (status === 502 || status === 503 || status === 504) return `The app did not answer in time (HTTP ${status}). Nothing was kept; try again shortly.`;
  return `The server answered HTTP ${status} without saying why. Nothing was kept; try again, and if it persists tell whoever runs the server.`;
}

export async function uploadFile(path: string, file: File): Promise<UploadAnswer> {
  if (file.size > MAX_UPLOAD_BYTES) {
    throw new ApiError(413, "payload_too_large", `“${file.name}” is ${(file.size / 1048576).toFixed(1)} MB; uploads are limited to ${MAX_UPLOAD_BYTES / 1048576} MB.`);
  }
  const form = new FormData();
  form.set("file", file, file.name);
  let res: Response;
  try {
    res = await fetch(path, { method: "POST", body: form, credentials: "same-origin", cache: "no-store" });
  } catch {
    throw new ApiError(0, "network", `“${file.name}” was not sent: the app could not be reached. Check the connection and try again.`);
  }
  const data = (await res.json().catch(() => null)) as { upload?: UploadAnswer; error?: { code?: ErrorCode; message?: string; fields?: FieldError[] } } | null;
  if (!res.ok || !data?.upload) {
    const message = data?.error?.message ?? withoutOurAnswer(res.status);
    // the refusal names the file, as the size check above does (several may be sent at once)
    const named = message.includes(file.name) ? message : `“${file.name}”: ${message}`;
    throw new ApiError(res.status, data?.error?.code ?? "internal", named, data?.error?.fields ?? []);
  }
  return data.upload;
}
