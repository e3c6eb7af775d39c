// Signing out leaves the page only when the server has ended the session: a sign-out that fails
// says the person is still signed in (on a shared machine, "signed out" must be true).
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { router } from "../support/navigation";

const signOut = vi.hoisted(() => vi.fn());
vi.mock("@/lib/auth-client", () => ({ authClient: { signOut } }));
const { AccountMenu } = await import("@/components/shell/AccountMenu");

beforeEach(() => vi.clearAllMocks());

async function pressSignOut() {
  const user = userEvent.setup();
  render(<AccountMenu name="Olivia Owner" email="olivia@example.com" />);
  await user.click(screen.getByRole("button", { name: "Account: Olivia Owner" }));
  await user.click(screen.getByRole("button", { name: "Sign out" }));
  return user;
}

describe("signing out from the account menu", () => {
  it("goes to the sign-in page once the server has ended the session", async () => {
    signOut.mockResolvedValue({ data: { success: true }, error: null });
    await pressSignOut();
    await vi.waitFor(() => expect(router.push).toHaveBeenCalledWith("/sign-in"));
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("stays, and says so, when the server refused or could not be reached", async () => {
    signOut.mockResolvedValueOnce({ data: null, error: { status: 500, message: "Internal Server Error" } });
    const user = await pressSignOut();
    expect((await screen.findByRole("alert")).textContent).toBe("You are still signed in: the sign-out did not reach the server. Try again.");
    expect(router.push).not.toHaveBeenCalled();

    signOut.mockRejectedValueOnce(new TypeError("Failed to fetch"));
    await user.click(screen.getByRole("button", { name: "Sign out" }));
    await screen.findByRole("alert");
    expect(router.push).not.toHaveBeenCalled();
    expect(signOut).toHaveBeenCalledTimes(2);
  });
});
