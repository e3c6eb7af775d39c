// Leaving a workspace from its members table goes to the workspaces list with the workspace's id,
// where the page says which workspace was left (lib/members.ts leftWorkspaceName).
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { router } from "../support/navigation";

const apiFetch = vi.hoisted(() => vi.fn());
vi.mock("@/lib/api-client", async (original) => ({ ...(await original<typeof import("@/lib/api-client")>()), apiFetch }));
const { MembersTable } = await import("@/components/workspaces/MembersTable");

describe("leaving a workspace", () => {
  it("goes to the workspaces list naming the workspace left", async () => {
    apiFetch.mockResolvedValue({ userId: "u-me", removed: true });
    const user = userEvent.setup();
    render(
      <QueryClientProvider client={new QueryClient()}>
        <MembersTable
          workspaceId="6d656d6f-0000-4000-8000-000000000001"
          members={[
            { userId: "u-owner", name: "Orla Owner", email: "orla@example.com", role: "owner", joinedAt: "2026-11-01T00:00:00Z" },
            { userId: "u-me", name: "Eli Editor", email: "eli@example.com", role: "editor", joinedAt: "2026-11-02T00:00:00Z" },
          ]}
          viewerRole="editor"
          viewerId="u-me"
          loading={false}
        />
      </QueryClientProvider>,
    );
    await user.click(screen.getByRole("button", { name: "Leave this workspace" }));
    await user.click(screen.getByRole("button", { name: "Yes, leave" }));
    await vi.waitFor(() => expect(router.push).toHaveBeenCalledWith("/workspaces?left=6d656d6f-0000-4000-8000-000000000001"));
    expect(apiFetch).toHaveBeenCalledWith("/api/workspaces/6d656d6f-0000-4000-8000-000000000001/members/u-me", { method: "DELETE" });
  });
});
