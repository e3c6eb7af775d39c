// Deleting one's account from the account page: blocked while the person is the only owner of a
// workspace others are in (each named, with the way past it); otherwise a dialog says what goes and
// what stays, and deletes with the password; a wrong password is said under its field.
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { ApiError } from "@/lib/api-client";
import { withModalDialogs } from "./dialog-support";

const apiFetch = vi.hoisted(() => vi.fn());
vi.mock("@/lib/api-client", async (original) => ({ ...(await original<typeof import("@/lib/api-client")>()), apiFetch }));
const { DeleteAccount } = await import("@/components/auth/DeleteAccount");

withModalDialogs();
const ws = (id: string, name: string, members: number) => ({ id, name, members });

beforeEach(() => {
  apiFetch.mockReset();
});

describe("deleting your account", () => {
  it("while the only owner of a shared workspace, names it and leads to its members and settings, with no delete button", () => {
    render(<DeleteAccount name="Olivia Lead" plan={{ blocking: [ws("w1", "Penstock 3", 3)], deleted: [], left: [] }} />);
    const box = screen.getByTestId("delete-account-blocked");
    expect(box.textContent).toContain("Penstock 3");
    expect(within(box).getByRole("link", { name: "Hand over ownership of Penstock 3" }).getAttribute("href")).toBe("/workspaces/w1/members");
    expect(within(box).getByRole("link", { name: "Delete the workspace Penstock 3" }).getAttribute("href")).toBe("/workspaces/w1");
    expect(screen.queryByRole("button", { name: /Delete my account/ })).toBeNull();
  });

  it("says which workspaces go with it, which it leaves, and the name that stays on the record", async () => {
    const user = userEvent.setup();
    render(<DeleteAccount name="Eddie Drafter" plan={{ blocking: [], deleted: [ws("w2", "Eddie's workspace", 1)], left: [ws("w1", "Penstock 3", 3)] }} />);
    await user.click(screen.getByRole("button", { name: "Delete my account…" }));
    const effects = screen.getByTestId("delete-account-effects").textContent!;
    expect(effects).toContain("Deleted with it, as only you are in it, with every sketch, version and file: “Eddie's workspace”.");
    expect(effects).toContain("You leave “Penstock 3”; the other members keep everything in it.");
    expect(effects).toContain("under the name “former member: Eddie Drafter”");
    expect(effects).toContain("It happens at once and cannot be undone.");
    // a copy of each workspace that goes, offered there; none of one it leaves
    const copy = screen.getByRole("region", { name: "Keep a copy first" });
    expect(within(copy).getAllByRole("link").map((a) => [a.textContent, a.getAttribute("href")])).toEqual([["Download the sketches of “Eddie's workspace” (JSON)", "/api/workspaces/w2/export"]]);
  });

  it("asks for the password before sending anything", async () => {
    const user = userEvent.setup();
    render(<DeleteAccount name="Eddie Drafter" plan={{ blocking: [], deleted: [], left: [] }} />);
    await user.click(screen.getByRole("button", { name: "Delete my account…" }));
    await user.click(screen.getByRole("button", { name: "Delete my account" }));
    expect(apiFetch).not.toHaveBeenCalled();
    const field = screen.getByLabelText("Your password");
    expect(field.getAttribute("aria-invalid")).toBe("true");
    expect(document.getElementById(field.getAttribute("aria-describedby")!)!.textContent).toBe("Type your password to confirm.");
  });

  it("says a wrong password under the field, keeping what was typed", async () => {
    apiFetch.mockImplementation(async () => {
      throw new ApiError(400, "validation_failed", "That is not your password: nothing was deleted.", [{ path: "password", message: "That is not your password." }]);
    });
    const go = vi.fn();
    const user = userEvent.setup();
    render(<DeleteAccount name="Eddie Drafter" plan={{ blocking: [], deleted: [], left: [] }} go={go} />);
    await user.click(screen.getByRole("button", { name: "Delete my account…" }));
    const field = screen.getByLabelText("Your password") as HTMLInputElement;
    await user.type(field, "guess-one");
    await user.click(screen.getByRole("button", { name: "Delete my account" }));
    expect(await screen.findByText("That is not your password.")).toBeTruthy();
    expect(field.getAttribute("aria-invalid")).toBe("true");
    expect(document.getElementById(field.getAttribute("aria-describedby")!)!.textContent).toBe("That is not your password.");
    expect(field.value).toBe("guess-one");
    expect(go).not.toHaveBeenCalled();
  });

  it("says a refusal that names no field (became the last owner meanwhile) above the field", async () => {
    apiFetch.mockImplementation(async () => {
      throw new ApiError(409, "last_owner", "You are the only owner of “Penstock 3”, which has other members: make one of them an owner, or delete the workspace, before deleting your account.");
    });
    const user = userEvent.setup();
    render(<DeleteAccount name="Eddie Drafter" plan={{ blocking: [], deleted: [], left: [ws("w1", "Penstock 3", 3)] }} go={vi.fn()} />);
    await user.click(screen.getByRole("button", { name: "Delete my account…" }));
    await user.type(screen.getByLabelText("Your password"), "correct-horse");
    await user.click(screen.getByRole("button", { name: "Delete my account" }));
    await vi.waitFor(() => expect(screen.getByTestId("delete-account-dialog").textContent).toContain("You are the only owner of “Penstock 3”"));
  });

  it("deletes with the password and goes to the sign-in page, which says so", async () => {
    apiFetch.mockResolvedValue({ account: { deleted: true } });
    const go = vi.fn();
    const user = userEvent.setup();
    render(<DeleteAccount name="Eddie Drafter" plan={{ blocking: [], deleted: [], left: [] }} go={go} />);
    await user.click(screen.getByRole("button", { name: "Delete my account…" }));
    await user.type(screen.getByLabelText("Your password"), "correct-horse");
    await user.click(screen.getByRole("button", { name: "Delete my account" }));
    await vi.waitFor(() => expect(go).toHaveBeenCalledWith("/sign-in?account=deleted"));
    expect(apiFetch).toHaveBeenCalledWith("/api/account", { method: "DELETE", body: { password: "correct-horse" } });
  });
});
