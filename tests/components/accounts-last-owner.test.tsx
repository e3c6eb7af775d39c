// The only owner of a workspace cannot leave it or step down (the server refuses with last_owner).
// The table says so in words they can read, not only in a tooltip on a disabled control that a
// keyboard or a touch screen never shows, and says what to do instead.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { MembersTable, type Member } from "@/components/workspaces/MembersTable";

const orla: Member = { userId: "u-owner", name: "Orla Owner", email: "orla@example.com", role: "owner", joinedAt: "2026-11-01T00:00:00Z" };
const eli: Member = { userId: "u-eli", name: "Eli Editor", email: "eli@example.com", role: "editor", joinedAt: "2026-11-02T00:00:00Z" };

function table(members: Member[], viewerId: string, viewerRole: Member["role"]) {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <MembersTable workspaceId="w1" members={members} viewerRole={viewerRole} viewerId={viewerId} loading={false} />
    </QueryClientProvider>,
  );
}

const NOTE = /You are the only owner, so you cannot leave this workspace or give up the owner role\./;

describe("the last owner", () => {
  it("sees why their role cannot change and they cannot leave, and what to do: make another member an owner", () => {
    table([orla, eli], "u-owner", "owner");
    const note = screen.getByText(NOTE);
    expect(note.textContent).toContain("To do either, make another member an owner first.");
    const select = screen.getByLabelText("Role of Orla Owner") as HTMLSelectElement;
    expect(select.disabled).toBe(true);
    // the disabled control points at the words, for a screen reader that lands on it
    expect(select.getAttribute("aria-describedby")).toBe(note.id);
    expect(screen.queryByRole("button", { name: "Leave this workspace" })).toBeNull();
  });

  it("alone in the workspace: invite a colleague first", () => {
    table([orla], "u-owner", "owner");
    expect(screen.getByText(NOTE).textContent).toContain("To do either, invite a colleague, then make them an owner.");
  });

  it("is not told to anyone else, nor once there is a second owner", () => {
    const { unmount } = table([orla, eli], "u-eli", "editor");
    expect(screen.queryByText(NOTE)).toBeNull();
    expect(screen.getByRole("button", { name: "Leave this workspace" })).toBeTruthy();
    unmount();
    table([orla, { ...eli, role: "owner" }], "u-owner", "owner");
    expect(screen.queryByText(NOTE)).toBeNull();
    expect(screen.getByRole("button", { name: "Leave this workspace" })).toBeTruthy();
  });
});
