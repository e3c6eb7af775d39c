// A refused form takes the keyboard (and a screen reader) to its first field in error, which is
// described by its message — not by the hint the message replaced on screen. Every account and
// workspace form does it, and a blank or malformed entry never reaches the server.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { ReactElement } from "react";
import { beforeEach, describe, expect, it, vi } from "vitest";

const auth = vi.hoisted(() => ({
  signUp: { email: vi.fn() },
  signIn: { email: vi.fn() },
  changePassword: vi.fn(),
  resetPassword: vi.fn(),
  requestPasswordReset: vi.fn(),
  sendVerificationEmail: vi.fn(),
  updateUser: vi.fn(),
}));
vi.mock("@/lib/auth-client", () => ({ authClient: auth }));
const apiFetch = vi.hoisted(() => vi.fn());
vi.mock("@/lib/api-client", async (original) => ({ ...(await original<typeof import("@/lib/api-client")>()), apiFetch }));

const { SignUpForm } = await import("@/components/auth/SignUpForm");
const { SignInForm } = await import("@/components/auth/SignInForm");
const { ChangePasswordForm, ProfileForm } = await import("@/components/auth/AccountForms");
const { ResetPasswordForm } = await import("@/components/auth/ResetPasswordForm");
const { ForgotPasswordForm } = await import("@/components/auth/ForgotPasswordForm");
const { ResendVerificationForm } = await import("@/components/auth/ResendVerificationForm");
const { InvitationSignUpForm } = await import("@/components/auth/InvitationActions");
const { CreateWorkspaceForm, RenameWorkspaceForm } = await import("@/components/workspaces/WorkspaceForms");

function withQuery(ui: ReactElement) {
  return render(<QueryClientProvider client={new QueryClient()}>{ui}</QueryClientProvider>);
}

/** The field is focused, marked invalid and described by its own message. */
function expectRefused(field: HTMLElement, message: string) {
  expect(document.activeElement).toBe(field);
  expect(field).toHaveAttribute("aria-invalid", "true");
  expect(document.getElementById(field.getAttribute("aria-describedby") ?? "")?.textContent).toBe(message);
}

beforeEach(() => {
  vi.clearAllMocks();
});

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

describe("a refused sign-in form", () => {
  it("names a blank e-mail and a blank password at their fields, without asking the server", async () => {
    const user = userEvent.setup();
    render(<SignInForm next="/workspaces" />);
    await user.click(screen.getByRole("button", { name: "Sign in" }));
    expectRefused(screen.getByLabelText("E-mail address"), "Enter your e-mail address.");
    expect(document.getElementById("password-error")?.textContent).toBe("Enter your password.");
    expect(auth.signIn.email).not.toHaveBeenCalled();

    await user.type(screen.getByLabelText("E-mail address"), "olivia@example.com");
    await user.click(screen.getByRole("button", { name: "Sign in" }));
    expectRefused(screen.getByLabelText("Password"), "Enter your password.");
    expect(screen.getByLabelText("E-mail address")).not.toHaveAttribute("aria-invalid");
    expect(auth.signIn.email).not.toHaveBeenCalled();
  });

  it("names a malformed address at its field", async () => {
    const user = userEvent.setup();
    render(<SignInForm next="/workspaces" />);
    await user.type(screen.getByLabelText("E-mail address"), "olivia");
    await user.type(screen.getByLabelText("Password"), "counterpoise-demo");
    await user.click(screen.getByRole("button", { name: "Sign in" }));
    expectRefused(screen.getByLabelText("E-mail address"), "Enter an e-mail address like name@company.com.");
    expect(auth.signIn.email).not.toHaveBeenCalled();
  });

  it("sends a filled form, and a wrong password is said above the fields", async () => {
    auth.signIn.email.mockResolvedValue({ error: { status: 401, code: "INVALID_EMAIL_OR_PASSWORD" } });
    const user = userEvent.setup();
    render(<SignInForm next="/workspaces" />);
    await user.type(screen.getByLabelText("E-mail address"), " olivia@example.com ");
    await user.type(screen.getByLabelText("Password"), "wrong-password");
    await user.click(screen.getByRole("button", { name: "Sign in" }));
    expect(auth.signIn.email).toHaveBeenCalledWith({ email: "olivia@example.com", password: "wrong-password" }, expect.anything());
    expect((await screen.findByRole("alert")).textContent).toContain("That e-mail address and password do not match an account.");
  });
});

describe("a sign-in refused for too many attempts", () => {
  it("says how long to wait, from the server's Retry-After", async () => {
    auth.signIn.email.mockImplementation(async (_body: unknown, opts: { onError: (ctx: { response: Response }) => void }) => {
      opts.onError({ response: new Response(null, { status: 429, headers: { "x-retry-after": "42" } }) });
      return { error: { status: 429, message: "Too many requests. Please try again later." } };
    });
    const user = userEvent.setup();
    render(<SignInForm next="/workspaces" />);
    await user.type(screen.getByLabelText("E-mail address"), "olivia@example.com");
    await user.type(screen.getByLabelText("Password"), "guess-number-9");
    await user.click(screen.getByRole("button", { name: "Sign in" }));
    expect((await screen.findByRole("alert")).textContent).toBe("!Too many attempts from this connection. Wait 42 seconds and try again.");
  });
});

describe("the account and password forms", () => {
  it("change password: a blank current password takes the focus, then a mismatched repeat", async () => {
    const user = userEvent.setup();
    render(<ChangePasswordForm />);
    await user.click(screen.getByRole("button", { name: "Change password" }));
    expectRefused(screen.getByLabelText("Current password"), "Enter your current password.");
    await user.type(screen.getByLabelText("Current password"), "old-password");
    await user.type(screen.getByLabelText("New password"), "new-password-1");
    await user.type(screen.getByLabelText("New password, again"), "new-password-2");
    await user.click(screen.getByRole("button", { name: "Change password" }));
    expectRefused(screen.getByLabelText("New password, again"), "The two new passwords are not the same.");
    expect(auth.changePassword).not.toHaveBeenCalled();
  });

  it("change password: a wrong current password comes back to its field", async () => {
    auth.changePassword.mockResolvedValue({ error: { status: 400, code: "INVALID_PASSWORD" } });
    const user = userEvent.setup();
    render(<ChangePasswordForm />);
    await user.type(screen.getByLabelText("Current password"), "not-it");
    await user.type(screen.getByLabelText("New password"), "new-password-1");
    await user.type(screen.getByLabelText("New password, again"), "new-password-1");
    await user.click(screen.getByRole("button", { name: "Change password" }));
    await screen.findByText("The current password is not right.");
    expectRefused(screen.getByLabelText("Current password"), "The current password is not right.");
  });

  it("profile: a blank name takes the focus", async () => {
    const user = userEvent.setup();
    render(<ProfileForm name="Olivia Owner" />);
    await user.clear(screen.getByLabelText("Name"));
    await user.click(screen.getByRole("button", { name: "Save name" }));
    expectRefused(screen.getByLabelText("Name"), "Enter your name.");
    expect(auth.updateUser).not.toHaveBeenCalled();
  });

  it("reset password: a short password takes the focus", async () => {
    const user = userEvent.setup();
    render(<ResetPasswordForm token="t0ken" />);
    await user.type(screen.getByLabelText("New password"), "short");
    await user.click(screen.getByRole("button", { name: "Set new password" }));
    expectRefused(screen.getByLabelText("New password"), "Use at least 8 characters.");
    expect(auth.resetPassword).not.toHaveBeenCalled();
  });

  it("forgot password: a malformed address takes the focus", async () => {
    const user = userEvent.setup();
    render(<ForgotPasswordForm />);
    await user.type(screen.getByLabelText("E-mail address"), "olivia@");
    await user.click(screen.getByRole("button", { name: "Send reset link" }));
    expectRefused(screen.getByLabelText("E-mail address"), "Enter an e-mail address like name@company.com.");
    expect(auth.requestPasswordReset).not.toHaveBeenCalled();
  });

  it("a new confirmation link: a malformed address is named at its field", async () => {
    const user = userEvent.setup();
    render(<ResendVerificationForm />);
    await user.click(screen.getByRole("button", { name: "Send a new link" }));
    expectRefused(screen.getByLabelText("E-mail address"), "Enter an e-mail address like name@company.com.");
    expect(screen.queryByRole("alert")).toBeNull();
    expect(auth.sendVerificationEmail).not.toHaveBeenCalled();
  });

  it("joining from an invitation: a blank name takes the focus", async () => {
    const user = userEvent.setup();
    render(<InvitationSignUpForm token="t0ken-t0ken" email="chen@example.com" />);
    await user.click(screen.getByRole("button", { name: "Create account and join" }));
    expectRefused(screen.getByLabelText("Your name"), "Enter your name.");
    expect(apiFetch).not.toHaveBeenCalled();
  });
});

describe("the workspace name forms", () => {
  it("a new workspace: a one-letter name takes the focus", async () => {
    const user = userEvent.setup();
    withQuery(<CreateWorkspaceForm />);
    await user.type(screen.getByLabelText("Name"), "P");
    await user.click(screen.getByRole("button", { name: "Create workspace" }));
    expectRefused(screen.getByLabelText("Name"), "Give the workspace a name of at least 2 characters.");
    expect(apiFetch).not.toHaveBeenCalled();
  });

  it("renaming: the server's refusal comes back to the field", async () => {
    const { ApiError } = await import("@/lib/api-client");
    apiFetch.mockRejectedValue(new ApiError(400, "validation_failed", "Some fields are not valid.", [{ path: "name", message: "Keep the workspace name under 80 characters." }]));
    const user = userEvent.setup();
    withQuery(<RenameWorkspaceForm workspaceId="6d656d6f-0000-4000-8000-000000000001" name="Pier 7" />);
    await user.type(screen.getByLabelText("Workspace name"), " skid");
    await user.click(screen.getByRole("button", { name: "Rename" }));
    await screen.findByText("Keep the workspace name under 80 characters.");
    expectRefused(screen.getByLabelText("Workspace name"), "Keep the workspace name under 80 characters.");
  });
});
