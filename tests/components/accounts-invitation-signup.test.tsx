// The invitation's sign-up form when the invited address already has an account: the refusal
// carries the way on, a link to sign in with that address filled in and the invitation to come
// back to, not a dead end.
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { ApiError } from "@/lib/api-client";
import { router } from "../support/navigation";

vi.mock("@/lib/auth-client", () => ({ authClient: { signOut: vi.fn() } }));
const apiFetch = vi.hoisted(() => vi.fn());
vi.mock("@/lib/api-client", async (original) => ({ ...(await original<typeof import("@/lib/api-client")>()), apiFetch }));
const { InvitationSignUpForm } = await import("@/components/auth/InvitationActions");

beforeEach(() => vi.clearAllMocks());

async function submit() {
  const user = userEvent.setup();
  await user.type(screen.getByLabelText("Your name"), "Eddie Editor");
  await user.type(screen.getByLabelText("Choose a password"), "a-good-password");
  await user.click(screen.getByRole("button", { name: "Create account and join" }));
}

describe("the invitation sign-up form", () => {
  it("an address that has an account: says so and links to the sign-in for it, coming back to the invitation", async () => {
    const signIn = "/sign-in?next=%2Finvite%2Ftok&email=eddie%40example.com";
    apiFetch.mockRejectedValue(
      new ApiError(409, "conflict", "An account for eddie@example.com already exists. Sign in with it to accept the invitation.", [], { code: "conflict", signIn }),
    );
    render(<InvitationSignUpForm token="tok" email="eddie@example.com" />);
    await submit();
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toContain("An account for eddie@example.com already exists. Sign in with it to accept the invitation.");
    const link = screen.getByRole("link", { name: "Sign in as eddie@example.com to join" });
    expect(link.getAttribute("href")).toBe(signIn);
    expect(router.push).not.toHaveBeenCalled();
    // the button is ready again (nothing left spinning)
    expect((screen.getByRole("button", { name: "Create account and join" }) as HTMLButtonElement).disabled).toBe(false);
  });

  it("any other refusal shows its words with no sign-in link (a link elsewhere is only the server's to give)", async () => {
    apiFetch.mockRejectedValue(new ApiError(410, "invitation_expired", "This invitation has expired. Ask an owner of the workspace to send a new one."));
    render(<InvitationSignUpForm token="tok" email="eddie@example.com" />);
    await submit();
    expect((await screen.findByRole("alert")).textContent).toContain("This invitation has expired.");
    expect(screen.queryByRole("link")).toBeNull();
  });
});
