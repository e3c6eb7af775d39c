"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { can, type Permission, type Role } from "@/lib/roles";

/** The tabs of a workspace. Later screens (sketches, review) add their tab here. */
export const WORKSPACE_TABS: Array<{ label: string; path: string; permission: Permission }> = [
  { label: "Overview", path: "", permission: "workspace.read" },
  { label: "Members", path: "/members", permission: "members.list" },
  { label: "Audit log", path: "/audit", permission: "audit.read" },
];

export function WorkspaceNav({ workspaceId, role }: { workspaceId: string; role: Role }) {
  const pathname = usePathname();
  const base = `/workspaces/${workspaceId}`;
  return (
    // scrolls sideways on a phone; never up and down (the tabs' underline reaches 1 px past it)
    <nav aria-label="Workspace" className="mx-auto flex max-w-6xl gap-1 overflow-x-auto overflow-y-hidden px-4 sm:px-6">
      {WORKSPACE_TABS.filter((t) => can(role, t.permission)).map((t) => {
        const href = base + t.path;
        // the overview holds the sketches: their pages (history, versions, comparisons) are under it
        const active = t.path === "" ? pathname === base || pathname.startsWith(`${base}/sketches`) : pathname.startsWith(href);
        return (
          <Link
            key={t.label}
            href={href}
            aria-current={active ? "page" : undefined}
            className="-mb-px border-b-2 border-transparent px-3 pb-2.5 pt-1 text-sm font-medium text-ink-soft hover:text-ink aria-[current=page]:border-accent aria-[current=page]:text-ink"
          >
            {t.label}
          </Link>
        );
      })}
    </nav>
  );
}
