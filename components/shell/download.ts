"use client";
import { useRef, useState, type MouseEvent } from "react";
// A file the server makes (a calc sheet's PDF, a workspace's export), fetched before it is saved:
// a failure is said in words where the person clicked, and an error reply is never kept as the file.

/** The file name the route gives in its content-disposition, or `fallback`. */
export function attachmentName(disposition: string | null, fallback: string): string {
  const m = disposition ? /filename="([^"]+)"/.exec(disposition) : null;
  return m?.[1] ?? fallback;
}

/** The message of the app's JSON error in a reply's body, with a full stop; undefined when there is none. */
export function serverMessage(body: string): string | undefined {
  let said: string | undefined;
  try {
    said = (JSON.parse(body) as { error?: { message?: string } })?.error?.message;
  } catch {
    said = undefined;
  }
  return said ? said.replace(/\.?$/, ".") : undefined;
}

export type Fetched = { ok: true; name: string } | { ok: false; status: number; body: string; brokeOff?: true };

/**
 * Fetch `href` and save it under the name the server gives (`fallback` without one) when `isFile`
 * accepts the reply; otherwise its status (0: the app could not be reached, or a streamed file
 * broke off part-way, then with `brokeOff`: nothing is saved) and body.
 */
export async function fetchAndSave(href: string, fallback: string, isFile: (res: Response) => boolean): Promise<Fetched> {
  let res: Response;
  try {
    res = await fetch(href, { credentials: "same-origin", cache: "no-store" });
  } catch {
    return { ok: false, status: 0, body: "" };
  }
  if (!res.ok || !isFile(res)) return { ok: false, status: res.ok ? 500 : res.status, body: await res.text().catch(() => "") };
  const name = attachmentName(res.headers.get("content-disposition"), fallback);
  let blob: Blob;
  try {
    blob = await res.blob();
  } catch {
    return { ok: false, status: 0, body: "", brokeOff: true };
  }
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  // the browser has taken the file once the click is handled
  setTimeout(() => URL.revokeObjectURL(url), 1000);
  return { ok: true, name };
}

/**
 * A link's click that runs `fetchThen` instead of following the link (one at a time; `busy`
 * meanwhile). A new tab or window, or the browser's own save, is left to the plain link.
 */
export function useFetchOnClick(fetchThen: () => Promise<void>): { busy: boolean; onClick: (e: MouseEvent<HTMLAnchorElement>) => Promise<void> } {
  const [busy, setBusy] = useState(false);
  const running = useRef(false);
  const onClick = async (e: MouseEvent<HTMLAnchorElement>) => {
    if (e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey) return;
    e.preventDefault();
    if (running.current) return;
    running.current = true;
    setBusy(true);
    try {
      await fetchThen();
    } finally {
      running.current = false;
      setBusy(false);
    }
  };
  return { busy, onClick };
}
