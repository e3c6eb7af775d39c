// A signed-out or account page that fails on the server (the database busy for a moment) shows
// the product's own card: what happened, that nothing changed, a retry that fetches the page
// again, and a way home. The root error page (account settings and every page without its own) also
// keeps the frame with the engineering cautions.
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { router } from "../support/navigation";

const { default: AuthPageError } = await import("@/app/(auth)/error");
const { default: PageError } = await import("@/app/error");

describe("the error page of the signed-out pages", () => {
  it("says what happened, and Try again asks the server for the page again", async () => {
    const reset = vi.fn();
    render(<AuthPageError error={Object.assign(new Error("Connection terminated"), { digest: "3176229222" })} reset={reset} />);
    expect(screen.getByRole("heading", { level: 1 }).textContent).toBe("This page could not be shown");
    const notice = screen.getByRole("alert").textContent ?? "";
    expect(notice).toContain("Nothing was changed, and links from your mail still work");
    expect(notice).toContain("Reference: 3176229222");
    // the server's own words never reach the page
    expect(notice).not.toContain("Connection terminated");
    await userEvent.setup().click(screen.getByRole("button", { name: "Try again" }));
    expect(router.refresh).toHaveBeenCalledTimes(1);
    expect(reset).toHaveBeenCalledTimes(1);
    expect(screen.getByRole("link", { name: "Home page" }).getAttribute("href")).toBe("/");
  });
});

describe("the error page of every other page (account settings, the workspace list, the mailbox)", () => {
  it("keeps the product's frame and its cautions", () => {
    render(<PageError error={new Error("boom")} reset={vi.fn()} />);
    expect(screen.getByRole("heading", { level: 1 }).textContent).toBe("This page could not be shown");
    expect(screen.getByRole("link", { name: "Counterpoise home" })).toBeTruthy();
    expect(screen.getByRole("contentinfo").textContent).toMatch(/reviewed by a qualified engineer/);
  });
});
