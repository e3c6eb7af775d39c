// The name a served file is saved under: the name it was uploaded with, ending in the extension of
// what is actually stored. A JPEG sent as "site.png" is saved as "site.jpg", a PDF's page drawn for
// an underlay as "GA.png", a file sent without a name or extension gets one, so the saved file
// opens in the program its contents need. Pure, for the route and the tests.

const EXT: Record<string, string> = { "image/png": "png", "image/jpeg": "jpg", "image/webp": "webp", "application/pdf": "pdf" };

/** Extensions of the kinds of file people upload (or try to), taken off before the right one is put on. */
const KNOWN_EXT = /\.(png|jpe?g|jfif|webp|pdf|gif|tiff?|bmp|heic|heif|avif|svg)$/i;

/** The extension for a stored type: "jpg" for image/jpeg. */
export function extensionFor(mime: string): string {
  return EXT[mime] ?? mime.split("/").pop()!.replace(/[^a-z0-9]/gi, "");
}

/** The download name of an upload's file or its thumbnail (a PNG), from its display name and stored type. */
export function downloadName(originalName: string, storedType: string, which: "file" | "thumbnail"): string {
  const base = originalName.replace(KNOWN_EXT, "").trim() || "file";
  if (which === "thumbnail") return `${base}-thumbnail.png`;
  const ext = extensionFor(storedType);
  const own = KNOWN_EXT.exec(originalName)?.[1]?.toLowerCase();
  // the name as uploaded when its extension already says what is stored ("photo.JPEG" stays)
  if (own && extensionFor(storedType) === (own === "jpeg" || own === "jfif" ? "jpg" : own)) return originalName;
  return `${base}.${ext}`;
}
