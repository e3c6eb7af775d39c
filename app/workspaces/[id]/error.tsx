"use client";
import Link from "next/link";
import { Notice, buttonClass } from "@/components/shell/controls";
import { BusyNotice, isBusy } from "@/components/shell/BusyNotice";
import { RetryButton } from "@/components/shell/RetryButton";

/**
 * A workspace page whose server work failed, inside the workspace's frame. "Try again" fetches the
 * page again from the server; a database busy for a moment says so.
 */
export default function WorkspaceError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  if (isBusy(error)) {
    return (
      <div className="mx-auto max-w-lg py-8">
        <BusyNotice reset={reset} />
      </div>
    );
  }
  return (
    <div className="mx-auto max-w-lg space-y-4 py-8">
      <Notice tone="error" title="This page could not be shown">
        Something went wrong while loading it. Your work is not affected; try again, or go back to your workspaces.
        {error.digest ? <span className="mt-1 block text-xs opacity-80">Reference: {error.digest}</span> : null}
      </Notice>
      <div className="flex gap-2">
        <RetryButton reset={reset} />
        <Link href="/workspaces" className={buttonClass("secondary")}>
          All workspaces
        </Link>
      </div>
    </div>
  );
}
