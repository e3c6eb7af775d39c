// The account page's signed-in devices: this one first and marked; signing out the others keeps
// this one and says how many went; signing out everywhere opens the sign-in; a refusal says
// nothing changed and stays.
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import type { DeviceSession } from "@/lib/account-sessions";
import { router } from "../support/navigation";

const auth = vi.hoisted(() => ({ revokeOtherSessions: vi.fn(), revokeSessions: vi.fn() }));
vi.mock("@/lib/auth-client", () => ({ authClient: auth }));
const { DevicesPanel } = await import("@/components/auth/DevicesPanel");

const HERE: DeviceSession = { id: "s1", current: true, signedInAt: "2026-03-04T08:00:00Z", lastSeenAt: "2026-03-05T09:30:00Z", ipAddress: "203.0.113.5", userAgent: "Mozilla/5.0 (X11; Linux x86_64) Chrome/124.0 Safari/537.36" };
const PHONE: DeviceSession = { id: "s2", current: false, signedInAt: "2026-03-01T12:00:00Z", lastSeenAt: "2026-03-01T12:00:00Z", ipAddress: null, userAgent: "Mozilla/5.0 (iPhone; CPU iPhone OS 17_4 like Mac OS X) Version/17.4 Mobile Safari/604.1" };
const TOOL: DeviceSession = { ...PHONE, id: "s3", userAgent: "curl/8.5.0" };

beforeEach(() => vi.clearAllMocks());

describe("the signed-in devices", () => {
  it("lists each with its words, when it signed in and from where, this device marked", () => {
    render(<DevicesPanel sessions={[HERE, PHONE]} />);
    const rows = within(screen.getByRole("list", { name: "Signed-in devices" })).getAllByRole("listitem");
    expect(rows.map((r) => r.textContent)).toEqual([
      "Chrome on LinuxThis deviceSigned in 4 Mar 2026, 08:00 UTC from 203.0.113.5 · last active 5 Mar 2026, 09:30 UTC",
      "Safari on iOSSigned in 1 Mar 2026, 12:00 UTC",
    ]);
  });

  it("signing out the other devices keeps this one, says how many went and reloads the list", async () => {
    auth.revokeOtherSessions.mockResolvedValue({ data: { status: true }, error: null });
    render(<DevicesPanel sessions={[HERE, PHONE, TOOL]} />);
    await userEvent.setup().click(screen.getByRole("button", { name: "Sign out every other device" }));
    expect(await screen.findByText("The 2 other devices were signed out.")).toBeTruthy();
    expect(auth.revokeSessions).not.toHaveBeenCalled();
    expect(router.refresh).toHaveBeenCalledTimes(1);
    expect(router.push).not.toHaveBeenCalled();
  });

  it("signing out everywhere ends this session too and opens the sign-in", async () => {
    auth.revokeSessions.mockResolvedValue({ data: { status: true }, error: null });
    render(<DevicesPanel sessions={[HERE, PHONE]} />);
    await userEvent.setup().click(screen.getByRole("button", { name: "Sign out everywhere, this device too" }));
    await vi.waitFor(() => expect(router.push).toHaveBeenCalledWith("/sign-in"));
  });

  it("a refusal says the devices are still signed in, and why, and stays", async () => {
    auth.revokeOtherSessions.mockResolvedValue({ data: null, error: { status: 429 } });
    render(<DevicesPanel sessions={[HERE, PHONE]} />);
    await userEvent.setup().click(screen.getByRole("button", { name: "Sign out every other device" }));
    expect((await screen.findByRole("alert")).textContent).toContain("The other devices are still signed in: Too many attempts from this connection. Wait a few seconds and try again.");
    expect(router.refresh).not.toHaveBeenCalled();
  });

  it("alone: the other-devices button is off and the page says no other device is signed in", () => {
    render(<DevicesPanel sessions={[HERE]} />);
    expect((screen.getByRole("button", { name: "Sign out every other device" }) as HTMLButtonElement).disabled).toBe(true);
    expect(screen.getByText("No other device is signed in to your account.")).toBeTruthy();
  });
});
