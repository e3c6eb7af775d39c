import "server-only";

/**
 * better-auth answers errors as `{ code, message }` at the top level; every other API address
 * answers `{ error: { code, message, fields? } }`. Its refusals get the app's shape beside its own
 * (its client reads the top level, a script reads `error`), with its field named when it says one
 * (`[body.password] Invalid input…` → `fields: [{ path: "password", … }]`). Headers (Set-Cookie,
 * Retry-After) are kept.
 */
export async function withAppErrorShape(res: Response): Promise<Response> {
  if (res.status < 400 || !/^application\/json\b/i.test(res.headers.get("content-type") ?? "")) return res;
  let body: unknown;
  try {
    body = await res.clone().json();
  } catch {
    return res;
  }
  if (!body || typeof body !== "object" || Array.isArray(body) || "error" in body) return res;
  const own = body as { code?: unknown; message?: unknown };
  const message = typeof own.message === "string" && own.message ? own.message : res.statusText || "The request was refused.";
  const code = typeof own.code === "string" && own.code ? own.code.toLowerCase() : res.status === 429 ? "rate_limited" : `http_${res.status}`;
  const fields = [...message.matchAll(/\[body\.([\w.]+)\]\s*([^;\[]+)/g)].map((m) => ({ path: m[1], message: m[2].trim() }));
  const headers = new Headers(res.headers);
  headers.delete("content-length");
  return new Response(JSON.stringify({ ...own, error: { code, message, ...(fields.length ? { fields } : {}) } }), { status: res.status, statusText: res.statusText, headers });
}
