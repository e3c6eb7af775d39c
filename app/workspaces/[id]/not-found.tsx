import Link from "next/link";
import { EmptyState } from "@/components/shell/controls";

export default function WorkspaceNotFound() {
  return (
    <div className="mx-auto max-w-xl py-8">
      <EmptyState
        title="No such workspace here"
        action={
          <Link href="/workspaces" className="rounded-md bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink-soft">
            Your workspaces
          </Link>
        }
      >
        It does not exist, or you are not a member of it (any more). If you expected to see it, ask one of its owners to invite you.
      </EmptyState>
    </div>
  );
}
