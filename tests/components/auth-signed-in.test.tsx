// The signed-out pages opened by someone who is signed in: each says as whom, leads back to their
// workspaces (never "Back to sign-in", which would only bounce), and offers signing out where using
// another account is what the page is for. Signed out, the pages stay as they were.
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { ReactElement } from "react";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { router } from "../support/navigation";

const auth = vi.hoisted(() => ({ signOut: vi.fn(), resetPassword: vi.fn(), getSession: vi.fn(), requestPasswordReset: vi.fn() }));
vi.mock("@/lib/auth-client", () => ({ authClient: auth }));
const signedIn = vi.hoisted(() => ({ as: null as null | { user: { id: string; email: string; name: string } } }));
vi.mock("@/lib/session", async (original) => ({ ...(await original<typeof import("@/lib/session")>()), currentSession: async () => signedIn.as }));

const { default: ForgotPasswordPage } = await import("@/app/(auth)/forgot-password/page");
const { default: ResetPasswordPage } = await import("@/app/(auth)/reset-password/page");
const { default: VerifyPage } = await import("@/app/(auth)/verify/page");
const { default: SignInPage } = await import("@/app/(auth)/sign-in/page");
const { default: SignUpPage } = await import("@/app/(auth)/sign-up/page");

const OLIVIA = { user: { id: "u1", email: "olivia@example.com", name: "Olivia" } };
const search = <T extends object>(s: T) => ({ searchParams: Promise.resolve(s) });
const show = async (page: Promise<ReactElement>) => render(await page);
/** The words of the "You are signed in" notice (its address is in bold, so the text is in parts). */
const note = () => screen.getByText("You are signed in").closest("[role=status]")?.textContent ?? "";

beforeEach(() => {
  vi.clearAllMocks();
  signedIn.as = OLIVIA;
  auth.signOut.mockResolvedValue({ data: { success: true }, error: null });
});

describe("the forgot-password page", () => {
  it("signed in: says as whom, points to the settings, fills in the address, and leads back to the workspaces, not to sign-in", async () => {
    await show(ForgotPasswordPage(search({})));
    expect(note()).toContain("As olivia@example.com.");
    expect(note()).toContain("Change it in Account settings instead");
    const box = screen.getByText("You are signed in").closest("[role=status]") as HTMLElement;
    expect(within(box).getByRole("link", { name: "Account settings" }).getAttribute("href")).toBe("/account");
    expect(within(box).getByRole("link", { name: "Your workspaces" }).getAttribute("href")).toBe("/workspaces");
    expect(screen.getByRole("link", { name: "Back to your workspaces" }).getAttribute("href")).toBe("/workspaces");
    expect(screen.queryByRole("link", { name: "Back to sign-in" })).toBeNull();
    expect((screen.getByLabelText("E-mail address") as HTMLInputElement).value).toBe("olivia@example.com");
    // the link works for any address: no sign-out needed here
    expect(screen.queryByRole("button", { name: /sign out/i })).toBeNull();
  });

  it("signed in, with an address in the link: the form keeps that address", async () => {
    await show(ForgotPasswordPage(search({ email: "second@example.com" })));
    expect((screen.getByLabelText("E-mail address") as HTMLInputElement).value).toBe("second@example.com");
  });

  it("signed out: no note, and the way back is the sign-in", async () => {
    signedIn.as = null;
    await show(ForgotPasswordPage(search({})));
    expect(screen.queryByText("You are signed in")).toBeNull();
    expect(screen.getByRole("link", { name: "Back to sign-in" }).getAttribute("href")).toBe("/sign-in");
    expect((screen.getByLabelText("E-mail address") as HTMLInputElement).value).toBe("");
  });
});

describe("the reset-password page", () => {
  async function setPassword() {
    const user = userEvent.setup();
    await show(ResetPasswordPage(search({ token: "tok" })));
    await user.type(screen.getByLabelText("New password"), "a-new-long-password");
    await user.type(screen.getByLabelText("New password, again"), "a-new-long-password");
    await user.click(screen.getByRole("button", { name: "Set new password" }));
    return user;
  }

  it("signed in: says as whom and that the reset signs the link's account out everywhere", async () => {
    await show(ResetPasswordPage(search({ token: "tok" })));
    expect(note()).toContain("As olivia@example.com. The new password is for the account this link was mailed to: setting it signs that account out on every device.");
    // the card's own lead ("your account") would contradict it: left off while signed in
    expect(screen.queryByText("After this, every device signed in to your account is signed out.")).toBeNull();
  });

  it("a link for another account: after the reset, says the session is still Olivia's and signs out to the sign-in", async () => {
    auth.resetPassword.mockResolvedValue({ data: { status: true }, error: null });
    auth.getSession.mockResolvedValue({ data: OLIVIA, error: null });
    const user = await setPassword();
    expect(await screen.findByText("Password changed")).toBeTruthy();
    expect(note()).toContain("As olivia@example.com. That is another account, so you are still signed in here.");
    expect(screen.queryByRole("link", { name: "Sign in with the new password" })).toBeNull();
    await user.click(screen.getByRole("button", { name: "Sign out, then sign in with the new password" }));
    expect(auth.signOut).toHaveBeenCalledTimes(1);
    await vi.waitFor(() => expect(router.push).toHaveBeenCalledWith("/sign-in"));
  });

  it("a link for the signed-in account: the reset ended the session, so the page offers the sign-in", async () => {
    auth.resetPassword.mockResolvedValue({ data: { status: true }, error: null });
    auth.getSession.mockResolvedValue({ data: null, error: null });
    await setPassword();
    expect((await screen.findByRole("link", { name: "Sign in with the new password" })).getAttribute("href")).toBe("/sign-in");
  });

  it("signed out: says what the reset does, and asks no session after it", async () => {
    signedIn.as = null;
    await show(ResetPasswordPage(search({ token: "tok" })));
    expect(screen.getByText("After this, every device signed in to your account is signed out.")).toBeTruthy();
    cleanup();
    auth.resetPassword.mockResolvedValue({ data: { status: true }, error: null });
    await setPassword();
    expect(await screen.findByRole("link", { name: "Sign in with the new password" })).toBeTruthy();
    expect(auth.getSession).not.toHaveBeenCalled();
  });

  it("an expired link, signed in: a new link, or back to the workspaces", async () => {
    await show(ResetPasswordPage(search({ error: "INVALID_TOKEN" })));
    expect(screen.getByRole("link", { name: "Send a new reset link" }).getAttribute("href")).toBe("/forgot-password");
    expect(screen.getByRole("link", { name: "Back to your workspaces" }).getAttribute("href")).toBe("/workspaces");
  });
});

describe("the confirmation page", () => {
  it("confirmed while signed in as someone else: no bare 'Sign in', but carry on as Olivia or sign out to use the new account", async () => {
    const user = userEvent.setup();
    await show(VerifyPage(search({ confirmed: "1", next: "/sketches/new?save=1" })));
    expect(screen.queryByRole("link", { name: "Sign in" })).toBeNull();
    expect(screen.getByRole("link", { name: "Carry on where you left off, as Olivia" }).getAttribute("href")).toBe("/sketches/new?save=1");
    await user.click(screen.getByRole("button", { name: "Sign out, then sign in with the confirmed address" }));
    await vi.waitFor(() => expect(router.push).toHaveBeenCalledWith("/sign-in?next=%2Fsketches%2Fnew%3Fsave%3D1"));
  });

  it("a sign-out the server did not take stays on the page and says so", async () => {
    auth.signOut.mockResolvedValue({ data: null, error: { message: "network" } });
    const user = userEvent.setup();
    await show(VerifyPage(search({ confirmed: "1" })));
    await user.click(screen.getByRole("button", { name: "Sign out, then sign in with the confirmed address" }));
    expect((await screen.findByRole("alert")).textContent).toContain("You are still signed in: the sign-out did not reach the server. Try again.");
    expect(router.push).not.toHaveBeenCalled();
  });

  it("confirmed, signed out: the sign-in, as before", async () => {
    signedIn.as = null;
    await show(VerifyPage(search({ confirmed: "1" })));
    expect(screen.getByRole("link", { name: "Sign in" }).getAttribute("href")).toBe("/sign-in");
    expect(screen.queryByText("You are signed in")).toBeNull();
  });

  it("'check your inbox' while signed in: says as whom, with the way to sign out", async () => {
    await show(VerifyPage(search({ sent: "new@example.com" })));
    expect(note()).toContain("As olivia@example.com.");
    expect(screen.getByRole("button", { name: "Sign out to use another account" })).toBeTruthy();
  });
});

describe("sign-in and sign-up while signed in", () => {
  it("with no address, or one's own address in any case: straight on to the page asked for", async () => {
    await expect(SignInPage(search({ next: "/account" }))).rejects.toThrow("NEXT_REDIRECT /account");
    await expect(SignInPage(search({ email: "Olivia@Example.com" }))).rejects.toThrow("NEXT_REDIRECT /workspaces");
    await expect(SignUpPage(search({}))).rejects.toThrow("NEXT_REDIRECT /workspaces");
  });

  it("a sign-in link for another address: says whose session this is; signing out opens the sign-in with that address and the same next", async () => {
    const user = userEvent.setup();
    await show(SignInPage(search({ email: "eddie@example.com", next: "/invite/tok" })));
    expect(screen.getByText(/This link is for/).textContent).toContain("eddie@example.com");
    expect(screen.getByRole("link", { name: "Carry on as Olivia" }).getAttribute("href")).toBe("/invite/tok");
    await user.click(screen.getByRole("button", { name: "Sign out to sign in as eddie@example.com" }));
    await vi.waitFor(() => expect(router.push).toHaveBeenCalledWith("/sign-in?email=eddie%40example.com&next=%2Finvite%2Ftok"));
  });

  it("a sign-up link for another address: signing out opens the sign-up with it", async () => {
    const user = userEvent.setup();
    await show(SignUpPage(search({ email: "nina@example.com" })));
    await user.click(screen.getByRole("button", { name: "Sign out to create an account as nina@example.com" }));
    await vi.waitFor(() => expect(router.push).toHaveBeenCalledWith("/sign-up?email=nina%40example.com"));
  });
});
