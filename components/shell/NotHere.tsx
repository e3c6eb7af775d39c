import Link from "next/link";
import type { ReactNode } from "react";
import { deletionSentence } from "@/components/sketches/format";
import { pageTarget, type DeletedSketch } from "@/lib/page-target";
import { EmptyState, buttonClass } from "./controls";

/**
 * The not-found pages inside a workspace: what is missing, why it may be (the same words whether it
 * never existed or the reader may not see it, so nothing leaks), and the way back.
 */
export function NotHere({ title, children, back }: { title: string; children: ReactNode; back?: { href: string; label: string } }) {
  return (
    <div className="mx-auto max-w-xl py-8">
      <EmptyState
        title={title}
        action={
          <Link href={back?.href ?? "/workspaces"} className={buttonClass()}>
            {back?.label ?? "Your workspaces"}
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

/**
 * A sketch address that leads nowhere: unknown, deleted, in another workspace, or in a workspace the
 * reader is not a member of (the same words for all, so nothing leaks). A member of the workspace it
 * was deleted from is told who deleted it and when, and led back to that workspace: `deleted` as the
 * caller found it (null: nothing to tell), else asked of the address (a page's own not-found, met on
 * a move inside the app, where the workspace's layout did not run).
 */
export async function NoSuchSketch({ deleted }: { deleted?: DeletedSketch | null } = {}) {
  if (deleted === undefined) {
    const target = await pageTarget();
    deleted = target.kind === "no-sketch" ? (target.deleted ?? null) : null;
  }
  if (deleted)
    return (
      <NotHere title="This sketch was deleted" back={{ href: `/workspaces/${deleted.workspaceId}`, label: `Back to ${deleted.workspaceName}` }}>
        <span data-testid="sketch-deleted">{deletionSentence(deleted)}</span>
      </NotHere>
    );
  return (
    <NotHere title="No such sketch here">
      It does not exist in this workspace: it may have been deleted, or the link is wrong — or you are not a member of the
      workspace that holds it. If you expected to see it, ask the person who sent the link, or one of the workspace&apos;s owners.
    </NotHere>
  );
}
