// A busy button refuses presses (no second request) but keeps the keyboard's focus: a disabled one
// would drop it to the page's start while a sign-in or a password change is on its way.
import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { Button } from "@/components/shell/controls";

describe("a busy button", () => {
  it("stays focused and enabled, says it is busy, and neither submits nor clicks", () => {
    const submit = vi.fn((e: { preventDefault: () => void }) => e.preventDefault());
    const click = vi.fn();
    const { rerender } = render(
      <form onSubmit={submit}>
        <Button type="submit" onClick={click}>
          Sign in
        </Button>
      </form>,
    );
    const button = screen.getByRole("button", { name: "Sign in" });
    button.focus();
    fireEvent.click(button);
    expect(submit).toHaveBeenCalledTimes(1);
    expect(click).toHaveBeenCalledTimes(1);
    rerender(
      <form onSubmit={submit}>
        <Button type="submit" onClick={click} busy>
          Sign in
        </Button>
      </form>,
    );
    expect(document.activeElement).toBe(button);
    expect(button).not.toBeDisabled();
    expect(button).toHaveAttribute("aria-disabled", "true");
    expect(button).toHaveAttribute("aria-busy", "true");
    fireEvent.click(button);
    expect(submit).toHaveBeenCalledTimes(1);
    expect(click).toHaveBeenCalledTimes(1);
  });
});
