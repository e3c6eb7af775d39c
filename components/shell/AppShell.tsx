import type { ReactNode } from "react";
import { Wordmark } from "@/components/site/Wordmark";
import { listWorkspacesForUser } from "@/db/queries/workspaces";
import { orBusy } from "@/lib/db-unavailable";
import { requirePageSession } from "@/lib/session";
import { CAUTION_SHORT } from "@/solver/cautions";
import { AccountMenu } from "./AccountMenu";
import { Providers } from "./Providers";
import { WorkspaceNav } from "./WorkspaceNav";
import { WorkspaceSwitcher } from "./WorkspaceSwitcher";

/**
 * The frame of every signed-in page: the mark, the workspace switcher, the account menu, the
 * workspace's tabs when a workspace is open, and the short caution at the foot. Use it in a
 * layout (`<AppShell workspaceId={id} next={path}>`). Pages still check access themselves.
 */
export async function AppShell({ children, workspaceId, next }: { children: ReactNode; workspaceId?: string; next: string }) {
  const session = await requirePageSession(next);
  // a database busy for a moment: the error page says so (lib/db-unavailable.ts), not a bare failure
  const workspaces = await orBusy(listWorkspacesForUser(session.user.id));
  const current = workspaces.find((w) => w.id === workspaceId) ?? null;
  return (
    <Providers>
      <div className="flex min-h-screen flex-col">
        <a href="#main" className="sr-only z-50 rounded-md bg-ink px-3 py-2 text-sm text-paper focus:not-sr-only focus:absolute focus:left-3 focus:top-3">
          Skip to the content
        </a>
        <header className="border-b border-rule bg-paper-card/70">
          <div className="mx-auto flex max-w-6xl items-center gap-2 px-4 py-2.5 sm:gap-3 sm:px-6">
            <Wordmark href="/workspaces" compact />
            <span aria-hidden="true" className="mx-1 h-7 w-px shrink-0 bg-rule" />
            <WorkspaceSwitcher workspaces={workspaces} currentId={current?.id} />
            <div className="flex-1" />
            <AccountMenu name={session.user.name} email={session.user.email} />
          </div>
          {current ? <WorkspaceNav workspaceId={current.id} role={current.role} /> : null}
        </header>
        <main id="main" tabIndex={-1} className="mx-auto w-full min-w-0 max-w-6xl flex-1 px-4 py-8 outline-none sm:px-6">{children}</main>
        <footer className="border-t border-rule bg-paper-deep/50">
          <p className="mx-auto max-w-6xl px-4 py-3 text-xs text-ink-faint sm:px-6">
            <span className="font-semibold text-caution">Caution:</span> {CAUTION_SHORT}
          </p>
        </footer>
      </div>
    </Providers>
  );
}
