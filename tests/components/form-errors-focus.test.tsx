// A refused form takes the keyboard (and a screen reader) to its first field in error, which is
// described by its message — not by the hint the message replaced on screen.
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";

vi.mock("next/navigation", () => ({ useRouter: () => ({ push: vi.fn(), refresh: vi.fn() }) }));
vi.mock("@/lib/auth-client", () => ({ authClient: { signUp: { email: vi.fn() } } }));

const { SignUpForm } = await import("@/components/auth/SignUpForm");

describe("a refused sign-up form", () => {
  it("focuses the first field in error, described by its message", async () => {
    const user = userEvent.setup();
    render(<SignUpForm />);
    const name = screen.getByLabelText("Your name");
    expect(name.getAttribute("aria-describedby")).toBe("name-hint");
    await user.click(screen.getByRole("button", { name: "Create account" }));
    expect(document.activeElement).toBe(name);
    expect(name).toHaveAttribute("aria-invalid", "true");
    expect(name.getAttribute("aria-describedby")).toBe("name-error");
    expect(document.getElementById("name-error")?.textContent).toBeTruthy();
    // a name given, the next field in error takes the focus on the next try
    await user.type(name, "Dana Drafter");
    await user.click(screen.getByRole("button", { name: "Create account" }));
    expect(document.activeElement).toBe(screen.getByLabelText("Work e-mail address"));
  });
});
