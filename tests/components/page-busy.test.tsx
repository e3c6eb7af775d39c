// A page whose server work could not reach the database in time (the error carries the busy digest
// the page helpers give it) says the server is busy, that nothing was lost, and offers a retry that
// fetches the page again; any other failure keeps the general words. A workspace page's "Try again"
// asks the server again too (a reset alone would draw the same failed answer).
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { BUSY_DIGEST } from "@/lib/db-unavailable";
import { router } from "../support/navigation";

const { default: AuthPageError } = await import("@/app/(auth)/error");
const { default: PageError } = await import("@/app/error");
const { default: WorkspaceError } = await import("@/app/workspaces/[id]/error");

const busy = () => Object.assign(new Error("An error occurred in the Server Components render."), { digest: BUSY_DIGEST });

beforeEach(() => router.refresh.mockClear());

describe("a page the busy database could not serve", () => {
  for (const [name, Page] of [
    ["the root error page", PageError],
    ["the signed-out pages' error page", AuthPageError],
  ] as const) {
    it(`${name}: says the server is busy, nothing was lost, and Try again fetches the page again`, async () => {
      const reset = vi.fn();
      render(<Page error={busy()} reset={reset} />);
      expect(screen.getByRole("heading", { level: 1 }).textContent).toBe("Try again in a moment");
      const notice = screen.getByRole("status").textContent ?? "";
      expect(notice).toContain("The server is busy");
      expect(notice).toContain("Nothing was changed and no work is lost");
      expect(notice).not.toContain(BUSY_DIGEST);
      await userEvent.setup().click(screen.getByRole("button", { name: "Try again" }));
      expect(router.refresh).toHaveBeenCalledTimes(1);
      expect(reset).toHaveBeenCalledTimes(1);
    });
  }

  it("a workspace page: the busy words inside the workspace's frame", () => {
    render(<WorkspaceError error={busy()} reset={vi.fn()} />);
    expect(screen.getByRole("status").textContent).toContain("The server is busy");
    expect(screen.queryByText("This page could not be shown")).toBeNull();
  });

  it("another failure keeps the general words", () => {
    render(<PageError error={Object.assign(new Error("boom"), { digest: "3176229222" })} reset={vi.fn()} />);
    expect(screen.getByRole("heading", { level: 1 }).textContent).toBe("This page could not be shown");
    expect(screen.queryByText(/The server is busy/)).toBeNull();
  });
});

describe("a workspace page that failed for another reason", () => {
  it("Try again asks the server for the page again, and the reference is shown", async () => {
    const reset = vi.fn();
    render(<WorkspaceError error={Object.assign(new Error("boom"), { digest: "3176229222" })} reset={reset} />);
    expect(screen.getByRole("alert").textContent).toContain("Reference: 3176229222");
    await userEvent.setup().click(screen.getByRole("button", { name: "Try again" }));
    expect(router.refresh).toHaveBeenCalledTimes(1);
    expect(reset).toHaveBeenCalledTimes(1);
    expect(screen.getByRole("link", { name: "All workspaces" }).getAttribute("href")).toBe("/workspaces");
  });
});
