// An owner who may not approve a checked version is told why on its sign-off panel: they prepared
// (or checked) it, and, when no other owner could approve it, how to get someone who can.
import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import type { SignOffData } from "@/components/review/SignOff";
import { showSignOff } from "./signoff-support";

const checked = (over: Partial<SignOffData>): SignOffData => ({
  state: "checked",
  sentence: "Checked; waiting for approval.",
  entries: [],
  titleBlock: { prepared: { name: "Olivia Owner", date: "2026-11-30T10:00:00Z" }, checked: { name: "Chen Checker", date: "2026-12-01T09:00:00Z" }, approved: null },
  allowed: [],
  ...over,
});

const show = (d: SignOffData) => showSignOff(d, undefined, 1);

describe("why an owner may not approve a checked version", () => {
  it("the sole owner who prepared it: the reason, and the Members page to make another owner", () => {
    show(
      checked({
        approval: {
          reason: "You prepared this version: another owner must approve it.",
          remedy: "This workspace has no other owner: make a colleague an owner on the Members page to approve it.",
          membersPath: "/workspaces/w1/members",
        },
      }),
    );
    expect(screen.getByText("Checked; waiting for approval.")).toBeInTheDocument();
    const note = screen.getByTestId("signoff-approval");
    const [reason, remedy] = note.querySelectorAll("p");
    expect(reason.textContent).toBe("You prepared this version: another owner must approve it.");
    expect(remedy.textContent).toBe("This workspace has no other owner: make a colleague an owner on the Members page to approve it.");
    expect(within(note).getByRole("link", { name: "the Members page" })).toHaveAttribute("href", "/workspaces/w1/members");
    expect(screen.queryByRole("button", { name: "Approve" })).toBeNull();
  });

  it("with another owner to approve it: only the reason", () => {
    show(checked({ approval: { reason: "You prepared this version: another owner must approve it.", remedy: null, membersPath: "/workspaces/w1/members" } }));
    const note = screen.getByTestId("signoff-approval");
    expect(note.textContent).toBe("You prepared this version: another owner must approve it.");
    expect(within(note).queryByRole("link")).toBeNull();
  });

  it("says nothing more to a reader the server gives no reason (an approver, an editor, a viewer)", () => {
    show(checked({ allowed: ["approve"] }));
    expect(screen.queryByTestId("signoff-approval")).toBeNull();
    expect(screen.getByRole("button", { name: "Approve" })).toBeInTheDocument();
  });
});
