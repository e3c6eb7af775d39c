// The account page's change of address: a blank, malformed or unchanged address is named at the
// field (and nothing is sent); a sent link says where it went and that the old address stays until
// it is opened; a refusal keeps what was typed.
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";

const auth = vi.hoisted(() => ({ changeEmail: vi.fn() }));
vi.mock("@/lib/auth-client", () => ({ authClient: auth }));
const { ChangeEmailForm } = await import("@/components/auth/AccountForms");

beforeEach(() => vi.clearAllMocks());

async function submit(typed: string) {
  const user = userEvent.setup();
  render(<ChangeEmailForm email="ada@example.com" />);
  if (typed) await user.type(screen.getByLabelText("New e-mail address"), typed);
  await user.click(screen.getByRole("button", { name: "Send the link" }));
}

describe("changing the e-mail address", () => {
  it("blank: asks for it at the field, which takes the focus", async () => {
    await submit("");
    expect(screen.getByText("Enter the new e-mail address.")).toBeTruthy();
    expect(document.activeElement?.id).toBe("new-email");
    expect(auth.changeEmail).not.toHaveBeenCalled();
  });

  it("the current address, in any case: says so, sends nothing", async () => {
    await submit("Ada@Example.com");
    expect(screen.getByText("That is the address you sign in with now.")).toBeTruthy();
    expect(auth.changeEmail).not.toHaveBeenCalled();
  });

  it("malformed: the address rule at the field", async () => {
    await submit("ada.at.example");
    expect(screen.getByText("Enter an e-mail address like name@company.com.")).toBeTruthy();
    expect(auth.changeEmail).not.toHaveBeenCalled();
  });

  it("sent: asks for the change with the page to come back to, says where the link went and that the old address stays", async () => {
    auth.changeEmail.mockResolvedValue({ data: { status: true }, error: null });
    await submit("ada.new@example.com");
    expect(auth.changeEmail).toHaveBeenCalledWith({ newEmail: "ada.new@example.com", callbackURL: "/account?email=changed" });
    const done = await screen.findByRole("status");
    expect(done.textContent).toContain("We sent a link to ada.new@example.com.");
    expect(done.textContent).toContain("until then you sign in with ada@example.com");
    expect((screen.getByLabelText("New e-mail address") as HTMLInputElement).value).toBe("");
  });

  it("refused: says why and keeps what was typed", async () => {
    auth.changeEmail.mockResolvedValue({ data: null, error: { status: 429 } });
    await submit("ada.new@example.com");
    expect((await screen.findByRole("alert")).textContent).toContain("Too many attempts from this connection.");
    expect((screen.getByLabelText("New e-mail address") as HTMLInputElement).value).toBe("ada.new@example.com");
  });
});
