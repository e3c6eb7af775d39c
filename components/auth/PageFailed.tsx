"use client";
import Link from "next/link";
import { Notice, buttonClass } from "@/components/shell/controls";
import { BusyNotice, isBusy } from "@/components/shell/BusyNotice";
import { RetryButton } from "@/components/shell/RetryButton";
import { AuthCard } from "./AuthFrame";

/**
 * A signed-out or account page whose server work failed: in the product's own frame, with the
 * reason in words and a way to try again, never the framework's bare error page. A database busy
 * for a moment (the page helpers' busy digest) says so; anything else gives its reference.
 */
export function PageFailed({ reset, digest }: { reset: () => void; digest?: string }) {
  if (isBusy({ digest })) {
    return (
      <AuthCard title="Try again in a moment">
        <BusyNotice reset={reset} />
      </AuthCard>
    );
  }
  return (
    <AuthCard title="This page could not be shown">
      <div className="space-y-4">
        <Notice tone="error">
          Something went wrong on our side while loading it. Nothing was changed, and links from your mail still work: try again in a moment.
          {digest ? <span className="mt-1 block text-xs opacity-80">Reference: {digest}</span> : null}
        </Notice>
        <div className="flex flex-wrap gap-2">
          <RetryButton reset={reset} />
          <Link href="/" className={buttonClass("secondary")}>
            Home page
          </Link>
        </div>
      </div>
    </AuthCard>
  );
}
