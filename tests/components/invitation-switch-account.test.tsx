// Signed in as someone else on an invitation: the button signs out, then takes the invited address
// to its own next step — sign in with it (filled in), or, with no account yet, back to the
// invitation, whose page then offers the form that creates the account and joins.
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { router } from "../support/navigation";

const signOut = vi.hoisted(() => vi.fn());
vi.mock("@/lib/auth-client", () => ({ authClient: { signOut } }));
const { SwitchAccountButton } = await import("@/components/auth/InvitationActions");

beforeEach(() => vi.clearAllMocks());

describe("the invitation's switch-account button", () => {
  it("with no account for the invited address: signs out and comes back to the invitation, not to a sign-in it cannot pass", async () => {
    signOut.mockResolvedValue({ data: { success: true }, error: null });
    render(<SwitchAccountButton next="/invite/tok" email="new.person@example.com" hasAccount={false} />);
    await userEvent.setup().click(screen.getByRole("button", { name: "Sign out and create the account for new.person@example.com" }));
    expect(signOut).toHaveBeenCalledTimes(1);
    expect(router.push).toHaveBeenCalledWith("/invite/tok");
  });

  it("with an account: signs out and opens the sign-in with the address filled in, back to the invitation after", async () => {
    signOut.mockResolvedValue({ data: { success: true }, error: null });
    render(<SwitchAccountButton next="/invite/tok" email="eddie@example.com" hasAccount />);
    await userEvent.setup().click(screen.getByRole("button", { name: "Sign out and sign in as eddie@example.com" }));
    expect(router.push).toHaveBeenCalledWith("/sign-in?next=%2Finvite%2Ftok&email=eddie%40example.com");
  });

  it("when signing out fails: says so and stays (signed in as the wrong person, the next page would not help)", async () => {
    signOut.mockResolvedValue({ data: null, error: { message: "network" } });
    render(<SwitchAccountButton next="/invite/tok" email="eddie@example.com" hasAccount />);
    await userEvent.setup().click(screen.getByRole("button", { name: "Sign out and sign in as eddie@example.com" }));
    expect(await screen.findByText("Signing out did not work. Try again.")).toBeTruthy();
    expect(router.push).not.toHaveBeenCalled();
  });
});
