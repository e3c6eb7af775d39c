import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/AppShell";

export default async function WorkspaceLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const { id } = await params;
  return (
    <AppShell workspaceId={id} next={`/workspaces/${id}`}>
      {children}
    </AppShell>
  );
}
