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

/** A workspace address that leads nowhere: unknown, or the reader is not a member (any more). */
export function NoSuchWorkspace() {
  return (
    <NotHere title="No such workspace here">
      It does not exist, or you are not a member of it (any more). If you expected to see it, ask one of its owners to invite you.
    </NotHere>
  );
}

/** A sketch address that leads nowhere: unknown, deleted, in another workspace, or in a workspace the
 *  reader is not a member of (the same words for all, so nothing leaks). */
export function NoSuchSketch() {
  return (
    <NotHere title="No such sketch here">
      It does not exist in this workspace: it may have been deleted, or the link is wrong — or you are not a member of the
      workspace that holds it. If you expected to see it, ask the person who sent the link, or one of the workspace&apos;s owners.
    </NotHere>
  );
}
