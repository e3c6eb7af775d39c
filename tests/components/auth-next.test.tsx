// A newcomer saving a scratch sketch is sent to sign in with `next=/sketches/new?save=1`; choosing
// "Create an account" instead must not lose it: the sign-up form sends it on to the confirmation
// page and into the e-mail's link, whose page sends it on to the sign-in.
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { router } from "../support/navigation";

const { push } = router;
const auth = vi.hoisted(() => ({ signUp: { email: vi.fn() }, sendVerificationEmail: vi.fn() }));
vi.mock("@/lib/auth-client", () => ({ authClient: auth }));

const { SignUpForm } = await import("@/components/auth/SignUpForm");
const { ResendVerificationForm } = await import("@/components/auth/ResendVerificationForm");
const { withNext } = await import("@/components/auth/nextPath");

const SAVE = "/sketches/new?save=1";

beforeEach(() => {
  vi.clearAllMocks();
  auth.signUp.email.mockResolvedValue({ error: null });
  auth.sendVerificationEmail.mockResolvedValue({ error: null });
});

describe("the page to come back to, through sign-up and confirmation", () => {
  it("withNext adds it to a path with or without a query, and leaves the default off", () => {
    expect(withNext("/sign-up", SAVE)).toBe("/sign-up?next=%2Fsketches%2Fnew%3Fsave%3D1");
    expect(withNext("/verify?confirmed=1", SAVE)).toBe("/verify?confirmed=1&next=%2Fsketches%2Fnew%3Fsave%3D1");
    expect(withNext("/sign-in", "/workspaces")).toBe("/sign-in");
    expect(withNext("/sign-in", undefined)).toBe("/sign-in");
  });

  it("the sign-up form puts it in the e-mail's link and in the page it opens next", async () => {
    const user = userEvent.setup();
    render(<SignUpForm next={SAVE} />);
    await user.type(screen.getByLabelText("Your name"), "Nina Newcomer");
    await user.type(screen.getByLabelText("Work e-mail address"), "nina@example.test");
    await user.type(screen.getByLabelText("Password"), "a-long-enough-password");
    await user.click(screen.getByRole("button", { name: "Create account" }));
    expect(auth.signUp.email).toHaveBeenCalledWith(expect.objectContaining({ callbackURL: "/verify?confirmed=1&next=%2Fsketches%2Fnew%3Fsave%3D1" }));
    expect(push).toHaveBeenCalledWith("/verify?sent=nina%40example.test&next=%2Fsketches%2Fnew%3Fsave%3D1");
  });

  it("a new confirmation link keeps it too", async () => {
    const user = userEvent.setup();
    render(<ResendVerificationForm defaultEmail="nina@example.test" next={SAVE} />);
    await user.click(screen.getByRole("button", { name: "Send a new link" }));
    expect(auth.sendVerificationEmail).toHaveBeenCalledWith({ email: "nina@example.test", callbackURL: "/verify?confirmed=1&next=%2Fsketches%2Fnew%3Fsave%3D1" });
  });
});
