// Leaving (or removing someone) asks first, inline: the keyboard goes to "Yes", Escape or Cancel
// takes the question back and returns the focus to the button that asked it.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { MembersTable } from "@/components/workspaces/MembersTable";

const members = [
  { userId: "u-owner", name: "Orla Owner", email: "orla@example.com", role: "owner" as const, joinedAt: "2026-11-01T00:00:00Z" },
  { userId: "u-me", name: "Eli Editor", email: "eli@example.com", role: "editor" as const, joinedAt: "2026-11-02T00:00:00Z" },
];

describe("the inline question before leaving", () => {
  it("takes the keyboard to Yes, and Escape or Cancel back to Leave", async () => {
    const user = userEvent.setup();
    render(
      <QueryClientProvider client={new QueryClient()}>
        <MembersTable workspaceId="w1" members={members} viewerRole="editor" viewerId="u-me" loading={false} />
      </QueryClientProvider>,
    );
    await user.click(screen.getByRole("button", { name: "Leave this workspace" }));
    expect(document.activeElement).toBe(screen.getByRole("button", { name: "Yes, leave" }));
    await user.keyboard("{Escape}");
    expect(screen.queryByRole("button", { name: "Yes, leave" })).toBeNull();
    expect(document.activeElement).toBe(screen.getByRole("button", { name: "Leave this workspace" }));
    await user.click(screen.getByRole("button", { name: "Leave this workspace" }));
    await user.click(screen.getByRole("button", { name: "Cancel" }));
    expect(document.activeElement).toBe(screen.getByRole("button", { name: "Leave this workspace" }));
  });
});
