"use client";
import Link from "next/link";
import { Button, Notice } from "@/components/shell/controls";

export default function WorkspaceError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="mx-auto max-w-lg space-y-4 py-8">
      <Notice tone="error" title="This page could not be shown">
        Something went wrong while loading it. Your work is not affected; try again, or go back to your workspaces.
      </Notice>
      <div className="flex gap-2">
        <Button onClick={reset}>Try again</Button>
        <Link href="/workspaces" className="rounded-md border border-ink/20 bg-paper-card px-4 py-2 text-sm font-medium hover:border-ink/45">
          All workspaces
        </Link>
      </div>
    </div>
  );
}
