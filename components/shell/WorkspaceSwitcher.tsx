"use client";
import Link from "next/link";
import { RoleBadge } from "@/components/workspaces/RoleBadge";
import type { Role } from "@/lib/roles";
import { Disclosure } from "./Disclosure";

export type SwitcherWorkspace = { id: string; name: string; personal: boolean; role: Role };

/** The app header's workspace picker: the current one, and every other one the user belongs to. */
export function WorkspaceSwitcher({ workspaces, currentId }: { workspaces: SwitcherWorkspace[]; currentId?: string | null }) {
  const current = workspaces.find((w) => w.id === currentId) ?? null;
  return (
    <Disclosure
      width="w-80"
      // the name starts with the words on the button, so speech input can say what it sees
      label={current ? `Workspace: ${current.name}. Switch workspace` : "Workspace: Choose a workspace"}
      button={
        <span className="flex min-w-0 flex-col leading-tight">
          <span className="text-[11px] font-medium uppercase tracking-wider text-ink-faint">{"Workspace "}</span>
          <span className="max-w-[18rem] truncate text-sm font-semibold text-ink max-sm:max-w-[10rem]">{current ? current.name : "Choose a workspace"}</span>
        </span>
      }
    >
      {(close) => (
        <nav aria-label="Your workspaces">
          <p className="px-2.5 pb-1 pt-1.5 text-[11px] font-semibold uppercase tracking-wider text-ink-faint">Your workspaces</p>
          <ul className="max-h-80 overflow-y-auto">
            {workspaces.map((w) => (
              <li key={w.id}>
                <Link
                  href={`/workspaces/${w.id}`}
                  onClick={close}
                  aria-current={w.id === current?.id ? "page" : undefined}
                  className="flex items-center justify-between gap-3 rounded-md px-2.5 py-2 text-sm hover:bg-paper-deep aria-[current=page]:bg-paper-deep"
                >
                  <span className="min-w-0">
                    <span className="block truncate font-medium text-ink">
                      {w.id === current?.id ? <span aria-hidden="true" className="mr-1 text-accent">●</span> : null}
                      {w.name}
                    </span>
                    {w.personal ? <span className="text-xs text-ink-faint">Personal</span> : null}
                  </span>
                  <RoleBadge role={w.role} />
                </Link>
              </li>
            ))}
          </ul>
          <div className="mt-1 border-t border-rule-soft pt-1">
            <Link href="/workspaces" onClick={close} className="block rounded-md px-2.5 py-2 text-sm text-ink-soft hover:bg-paper-deep hover:text-ink">
              All workspaces · new workspace
            </Link>
          </div>
        </nav>
      )}
    </Disclosure>
  );
}
