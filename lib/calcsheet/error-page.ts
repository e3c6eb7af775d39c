// The calc sheet's link is a plain link, so without JavaScript a failure is what the browser
// shows. A browser navigation (it asks for text/html) gets a small page in words with the same
// status and a way back; an API client (application/json, or no Accept) keeps the JSON error.
import type { ErrorBody } from "../errors";

/** Media-range weights of an Accept header (`text/html;q=0.9` → 0.9; no q → 1). */
function weights(accept: string): Map<string, number> {
  const out = new Map<string, number>();
  for (const part of accept.split(",")) {
    const [range, ...params] = part.trim().toLowerCase().split(";");
    if (!range) continue;
    const q = params.map((p) => /^\s*q\s*=\s*([\d.]+)\s*$/.exec(p)?.[1]).find((v) => v !== undefined);
    const w = q === undefined ? 1 : Number(q);
    out.set(range.trim(), Number.isFinite(w) ? w : 0);
  }
  return out;
}

/**
 * Whether the request is a page the browser opens: it names text/html, and names JSON no higher
 * (a browser sends `text/html,…,*\/*;q=0.8`; `fetch` sends `*\/*` and a script `application/json`).
 */
export function wantsHtml(req: Request): boolean {
  const w = weights(req.headers.get("accept") ?? "");
  const html = w.get("text/html") ?? 0;
  return html > 0 && html >= (w.get("application/json") ?? 0);
}

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

/** What to say first, by status: the server's own message follows. */
function headline(status: number): string {
  if (status === 401) return "Sign in to get this calc sheet";
  if (status === 404) return "There is no such calc sheet for you";
  if (status === 503) return "The calc sheet could not be made just now";
  return "The calc sheet could not be made";
}

/**
 * The JSON error `res` as a plain HTML page with the same status (and Retry-After), its message
 * and field errors in words, and links back to the sketch (and to sign in, for a 401).
 */
export async function calcSheetErrorPage(res: Response, to: { sketchPath: string; signInPath: string }): Promise<Response> {
  let error: Partial<ErrorBody["error"]> = {};
  try {
    error = ((await res.clone().json()) as Partial<ErrorBody>).error ?? {};
  } catch {
    // not the JSON error shape: the status alone speaks
  }
  const message = typeof error.message === "string" && error.message ? error.message : "The server could not make it.";
  const fields = Array.isArray(error.fields) ? error.fields : [];
  const status = res.status;
  const links = [
    status === 401 ? `<a href="${escapeHtml(to.signInPath)}">Sign in</a>` : "",
    `<a href="${escapeHtml(to.sketchPath)}">Back to the sketch</a>`,
  ].filter(Boolean);
  const html = `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(headline(status))} — Counterpoise</title>
<style>
:root { color-scheme: light dark; }
body { margin: 0; font: 15px/1.5 system-ui, sans-serif; background: #f6f3ec; color: #1d2329; }
main { max-width: 36rem; margin: 12vh auto; padding: 1.5rem 1.75rem; background: #fbfaf6; border: 1px solid #d8d2c4; border-radius: 6px; }
h1 { font-size: 1.2rem; margin: 0 0 .75rem; }
p, ul { margin: 0 0 .9rem; }
.status { color: #5f6974; font-size: 13px; }
a { color: inherit; text-underline-offset: 3px; }
a:focus-visible { outline: 2px solid currentColor; outline-offset: 3px; border-radius: 2px; }
nav a + a { margin-left: 1.25rem; }
@media (prefers-color-scheme: dark) {
  body { background: #1b2025; color: #e9e5db; }
  main { background: #222930; border-color: #3d4650; }
  .status { color: #a39f95; }
}
</style>
</head>
<body>
<main>
<h1>${escapeHtml(headline(status))}</h1>
<p>${escapeHtml(message)}</p>
${fields.length ? `<ul>${fields.map((f) => `<li><code>${escapeHtml(String(f.path))}</code>: ${escapeHtml(String(f.message))}</li>`).join("")}</ul>\n` : ""}<p class="status">The server answered ${status}${res.statusText ? ` ${escapeHtml(res.statusText)}` : ""}.</p>
<nav>${links.join("")}</nav>
</main>
</body>
</html>
`;
  const headers = new Headers({ "content-type": "text/html; charset=utf-8", "cache-control": "no-store", vary: "Accept" });
  for (const name of ["retry-after", "allow"]) {
    const v = res.headers.get(name);
    if (v) headers.set(name, v);
  }
  return new Response(html, { status, headers });
}
