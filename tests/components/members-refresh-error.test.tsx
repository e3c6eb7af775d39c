// The members page keeps what it has shown when a later refresh fails: a role change whose
// follow-up reload meets a busy server leaves the members and the open invitations on screen,
// with a notice that they are as last loaded, instead of swapping the tables for an error.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";

const { MembersScreen } = await import("@/components/workspaces/MembersScreen");

const W = "6d656d6f-0000-4000-8000-000000000001";
const members = [
  { userId: "u-owner", name: "Orla Owner", email: "orla@example.com", role: "owner", joinedAt: "2026-11-01T00:00:00Z" },
  { userId: "u-chen", name: "Chen Checker", email: "chen@example.com", role: "checker", joinedAt: "2026-11-02T00:00:00Z" },
];
const invitation = { id: "i1", email: "pat@example.com", role: "editor", invitedBy: "Orla Owner", createdAt: "2026-11-03T00:00:00Z", expiresAt: "2099-11-10T00:00:00Z", status: "pending" };
const busy = () => Response.json({ error: { code: "unavailable", message: "The database is busy. Try again in a moment." } }, { status: 503 });

afterEach(() => vi.unstubAllGlobals());

describe("a members page whose refresh fails", () => {
  it("keeps the members and the invitations on screen and says they are as last loaded", async () => {
    let down = false;
    vi.stubGlobal(
      "fetch",
      vi.fn(async (path: string, init?: RequestInit) => {
        if (init?.method === "PATCH") return Response.json({ userId: "u-chen", role: "viewer" });
        if (down) return busy();
        if (path.endsWith("/members")) return Response.json({ role: "owner", members });
        if (path.endsWith("/invitations")) return Response.json({ invitations: [invitation] });
        return busy();
      }),
    );
    render(
      <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
        <MembersScreen workspaceId={W} workspaceName="Pier 7" viewerId="u-owner" viewerRole="owner" />
      </QueryClientProvider>,
    );
    await screen.findByTestId("member-chen@example.com");
    await screen.findByTestId("invitation-pat@example.com");

    down = true;
    await userEvent.setup().selectOptions(screen.getByLabelText("Role of Chen Checker"), "viewer");
    expect(await screen.findByText("Chen Checker is now viewer.")).toBeTruthy();
    expect(await screen.findByText("The members could not be refreshed")).toBeTruthy();
    expect(await screen.findByText("The invitations could not be refreshed")).toBeTruthy();
    // nothing already shown is taken away
    expect(screen.getByTestId("member-orla@example.com")).toBeTruthy();
    expect(within(screen.getByTestId("member-chen@example.com")).getByText("Chen Checker")).toBeTruthy();
    // the change went through, so the table shows it, though the reload after it did not
    expect(screen.getByLabelText("Role of Chen Checker")).toHaveValue("viewer");
    expect(screen.getByTestId("invitation-pat@example.com")).toBeTruthy();
    expect(screen.queryByText("The members could not be loaded")).toBeNull();
  });

  it("a removal that went through takes the row away, though the reload after it fails", async () => {
    let down = false;
    vi.stubGlobal(
      "fetch",
      vi.fn(async (path: string, init?: RequestInit) => {
        if (init?.method === "DELETE") return Response.json({ userId: "u-chen", removed: true });
        if (down) return busy();
        if (path.endsWith("/members")) return Response.json({ role: "owner", members });
        return Response.json({ invitations: [] });
      }),
    );
    render(
      <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
        <MembersScreen workspaceId={W} workspaceName="Pier 7" viewerId="u-owner" viewerRole="owner" />
      </QueryClientProvider>,
    );
    await screen.findByTestId("member-chen@example.com");
    down = true;
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Remove Chen Checker" }));
    await user.click(screen.getByRole("button", { name: "Yes, remove Chen" }));
    expect(await screen.findByText("Chen Checker was removed from the workspace.")).toBeTruthy();
    expect(await screen.findByText("The members could not be refreshed")).toBeTruthy();
    expect(screen.queryByTestId("member-chen@example.com")).toBeNull();
    expect(screen.getByTestId("member-orla@example.com")).toBeTruthy();
  });

  it("a first load that fails still says so in place of the table", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => busy()));
    render(
      <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
        <MembersScreen workspaceId={W} workspaceName="Pier 7" viewerId="u-owner" viewerRole="owner" />
      </QueryClientProvider>,
    );
    expect(await screen.findByText("The members could not be loaded")).toBeTruthy();
    // the members' notice and the invitations' both give the server's reason
    expect(await screen.findAllByText("The database is busy. Try again in a moment.")).toHaveLength(2);
    expect(screen.queryByRole("table", { name: "Members of this workspace" })).toBeNull();
  });
});
