"use client";
import { BUSY_DIGEST } from "@/lib/db-unavailable";
import { Notice } from "./controls";
import { RetryButton } from "./RetryButton";

/** Whether a page's error is the database being busy for a moment (its digest says so), not a fault. */
export function isBusy(error: { digest?: string }): boolean {
  return error.digest === BUSY_DIGEST;
}

/**
 * The words of a page whose server work could not reach the database in time: the server is busy,
 * nothing was lost, try again — and a retry that fetches the page again from the server.
 */
export function BusyNotice({ reset }: { reset: () => void }) {
  return (
    <div className="space-y-4">
      <Notice tone="info" title="The server is busy">
        It could not reach its database in time to show this page. Nothing was changed and no work is lost: try again in a few seconds.
      </Notice>
      <RetryButton reset={reset} />
    </div>
  );
}
