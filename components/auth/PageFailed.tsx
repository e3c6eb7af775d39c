"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { startTransition } from "react";
import { Button, Notice, buttonClass } from "@/components/shell/controls";
import { AuthCard } from "./AuthFrame";

/**
 * A signed-out or account page whose server work failed (most often the database busy for a
 * moment): in the product's own frame, with the reason in words and a way to try again, never
 * the framework's bare error page.
 */
export function PageFailed({ reset, digest }: { reset: () => void; digest?: string }) {
  const router = useRouter();
  return (
    <AuthCard title="This page could not be shown">
      <div className="space-y-4">
        <Notice tone="error">
          Something went wrong on our side while loading it. Nothing was changed, and links from your mail still work: try again in a moment.
          {digest ? <span className="mt-1 block text-xs opacity-80">Reference: {digest}</span> : null}
        </Notice>
        <div className="flex flex-wrap gap-2">
          <Button
            onClick={() =>
              // the failure was on the server: fetch the page again, then draw it
              startTransition(() => {
                router.refresh();
                reset();
              })
            }
          >
            Try again
          </Button>
          <Link href="/" className={buttonClass("secondary")}>
            Home page
          </Link>
        </div>
      </div>
    </AuthCard>
  );
}
