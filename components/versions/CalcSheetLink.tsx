"use client";
// The link to a version's calc sheet (a PDF the server makes). Without JavaScript it is a plain
// link: the PDF downloads (the route answers it as an attachment) and a failure shows the route's
// error page. With JavaScript the sheet is fetched first, so a failure (503 while the database is
// out of reach, 404 for a version that is gone, a session that ended, a download that broke off
// part-way) is said beside the link in words, and only a whole PDF is ever saved: an error reply or
// a part of the file is never kept as a "PDF".
import { useState, type ReactNode } from "react";
import { attachmentName, fetchAndSave, serverMessage, useFetchOnClick } from "@/components/shell/download";

/**
 * The words for a calc sheet that could not be had: what the server said, and its status; a
 * download that broke off part-way (`brokeOff`, `fetchAndSave`) is not an app out of reach.
 */
export function calcSheetFailure(status: number, body: string, brokeOff = false): string {
  if (brokeOff) return "The calc sheet was not saved: its download broke off part-way, and a part of the PDF would not open. Try again.";
  if (status === 0) return "The calc sheet could not be fetched: the app could not be reached. Check the connection and try again.";
  if (status === 401) return "The calc sheet could not be made: your session has ended. Sign in again, then ask for it again.";
  const why = serverMessage(body) ?? (status === 503 ? "the server is not available just now." : "the server could not make it.");
  return `The calc sheet could not be made (the server answered ${status}): ${why}${status >= 500 ? " Try again in a moment." : ""}`;
}

export { attachmentName };

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
  const [error, setError] = useState<string | null>(null);

  const fail = (message: string) => {
    if (onError) onError(message);
    else setError(message);
  };

  const { busy, onClick: open } = useFetchOnClick(async () => {
    setError(null);
    const got = await fetchAndSave(href, "calc-sheet.pdf", (res) => (res.headers.get("content-type") ?? "").startsWith("application/pdf"));
    if (!got.ok) fail(calcSheetFailure(got.status, got.body, got.brokeOff));
  });

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
