// A saved sketch that cannot be opened: the way on fits the reader. Signed out, signing in (and
// back here); signed in but not a member, their workspaces — the sign-in page would only send a
// signed-in reader back to this same page.
import { render, screen } from "@testing-library/react";
import { beforeAll, describe, expect, it } from "vitest";
import { Editor } from "@/components/editor/Editor";
import { unavailablePersistence } from "@/canvas/persistence";
import { withResizeObserver } from "./dialog-support";

beforeAll(() => {
  withResizeObserver();
});

describe("a sketch that cannot be opened", () => {
  it("signed out: offers to sign in and come back to this sketch", async () => {
    render(<Editor persistence={unavailablePersistence("sk1", "signed-out")} />);
    await screen.findByTestId("unavailable-message");
    expect(screen.getByRole("link", { name: "Sign in" }).getAttribute("href")).toBe(`/sign-in?next=${encodeURIComponent(window.location.pathname)}`);
    expect(screen.queryByRole("link", { name: "Your workspaces" })).toBeNull();
  });

  it("signed in, not there for them: offers their workspaces, not a sign-in that would bring them back here", async () => {
    render(<Editor persistence={unavailablePersistence("sk1", "not-found")} />);
    await screen.findByTestId("unavailable-message");
    expect(screen.getByRole("link", { name: "Your workspaces" }).getAttribute("href")).toBe("/workspaces");
    expect(screen.queryByRole("link", { name: "Sign in" })).toBeNull();
    expect(screen.getByRole("link", { name: "Open a scratch sketch" }).getAttribute("href")).toBe("/sketches/new");
  });
});
