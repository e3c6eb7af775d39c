import Link from "next/link";
import type { ReactNode } from "react";
import { EmptyState, buttonClass } from "./controls";

/**
 * The not-found pages inside a workspace: what is missing, why it may be (the same words whether it
 * never existed or the reader may not see it, so nothing leaks), and the way back.
 */
export function NotHere({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="mx-auto max-w-xl py-8">
      <EmptyState
        title={title}
        action={
          <Link href="/workspaces" className={buttonClass()}>
            Your workspaces
          </Link>
        }
      >
        {children}
      </EmptyState>
    </div>
  );
}
