"use client";
// The link to a version's calc sheet (a PDF the server makes). Without JavaScript it is a plain
// link: the PDF downloads (the route answers it as an attachment) and a failure shows the route's
// error page. With JavaScript the sheet is fetched first, so a failure (503 while the database is
// out of reach, 404 for a version that is gone, a session that ended) is said beside the link in
// words, and only a PDF is ever saved: an error reply is never kept as a "PDF".
import { useRef, useState, type MouseEvent, type ReactNode } from "react";

/** The words for a calc sheet that could not be had: what the server said, and its status. */
export function calcSheetFailure(status: number, body: string): string {
  if (status === 0) return "The calc sheet could not be fetched: the app could not be reached. Check the connection and try again.";
  if (status === 401) return "The calc sheet could not be made: your session has ended. Sign in again, then ask for it again.";
  let said: string | undefined;
  try {
    said = (JSON.parse(body) as { error?: { message?: string } })?.error?.message;
  } catch {
    said = undefined;
  }
  const why = said ? said.replace(/\.?$/, ".") : status === 503 ? "the server is not available just now." : "the server could not make it.";
  return `The calc sheet could not be made (the server answered ${status}): ${why}${status >= 500 ? " Try again in a moment." : ""}`;
}

/** The file name the route gives in its content-disposition, or `fallback`. */
export function attachmentName(disposition: string | null, fallback: string): string {
  const m = disposition ? /filename="([^"]+)"/.exec(disposition) : null;
  return m?.[1] ?? fallback;
}

/** `onError`: where a failure is said (the editor's notice line); by default beside the link. */
export function CalcSheetLink({
  href,
  className,
  title,
  label,
  testId,
  children,
  onError,
}: {
  href: string;
  className: string;
  title?: string;
  label?: string;
  testId?: string;
  children: ReactNode;
  onError?: (message: string) => void;
}) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const running = useRef(false);

  const fail = (message: string) => {
    if (onError) onError(message);
    else setError(message);
  };

  const open = async (e: MouseEvent<HTMLAnchorElement>) => {
    // a new tab or window, or the browser's own save: the plain link does it
    if (e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey) return;
    e.preventDefault();
    if (running.current) return;
    running.current = true;
    setBusy(true);
    setError(null);
    try {
      let res: Response;
      try {
        res = await fetch(href, { credentials: "same-origin", cache: "no-store" });
      } catch {
        fail(calcSheetFailure(0, ""));
        return;
      }
      if (!res.ok || !(res.headers.get("content-type") ?? "").startsWith("application/pdf")) {
        fail(calcSheetFailure(res.ok ? 500 : res.status, await res.text().catch(() => "")));
        return;
      }
      const blob = await res.blob();
      const url = URL.createObjectURL(blob);
      const a = document.createElement("a");
      a.href = url;
      a.download = attachmentName(res.headers.get("content-disposition"), "calc-sheet.pdf");
      document.body.appendChild(a);
      a.click();
      a.remove();
      // the browser has taken the file once the click is handled
      setTimeout(() => URL.revokeObjectURL(url), 1000);
    } finally {
      running.current = false;
      setBusy(false);
    }
  };

  return (
    <>
      <a href={href} onClick={open} className={className} title={title} aria-label={label} aria-busy={busy || undefined} data-testid={testId} data-busy={busy || undefined}>
        {busy ? <span aria-hidden="true">Making…</span> : children}
        {busy ? <span className="sr-only">Making the calc sheet</span> : null}
      </a>
      {error ? (
        <span role="alert" className="order-last basis-full text-sm text-caution" data-testid="calc-sheet-error">
          {error}
        </span>
      ) : null}
    </>
  );
}
