// The frame of the sign-in, sign-up, confirmation, reset and invitation pages: a signed-out visitor is
// offered a sketch without an account; a signed-in one (an invitation's Join page, a reset link opened
// while signed in) is led to their workspaces instead, never told they have no account.
import { renderToStaticMarkup } from "react-dom/server";
import { afterEach, describe, expect, it, vi } from "vitest";
import AuthLayout from "@/app/(auth)/layout";

const signedIn = vi.hoisted(() => ({ as: null as null | { user: { id: string; email: string; name: string } } | Error }));
vi.mock("@/lib/session", () => ({
  currentSession: async () => {
    if (signedIn.as instanceof Error) throw signedIn.as;
    return signedIn.as;
  },
}));

const header = async () => {
  const html = renderToStaticMarkup(await AuthLayout({ children: "the page" }));
  return /<nav[^>]*aria-label="Main"[^>]*>([\s\S]*?)<\/nav>/.exec(html)?.[1] ?? "";
};

afterEach(() => {
  signedIn.as = null;
});

describe("the signed-out pages' header", () => {
  it("offers a signed-out visitor a sketch without an account", async () => {
    const nav = await header();
    expect(nav).toContain('href="/sketches/new"');
    expect(nav).toContain("Try a sketch<span");
    expect(nav).toContain(" without an account</span>");
    expect(nav).not.toContain("Your workspaces");
  });

  it("leads a signed-in visitor to their workspaces, with no word of being without an account", async () => {
    signedIn.as = { user: { id: "u1", email: "cho@example.com", name: "Cho Checker" } };
    const nav = await header();
    expect(nav).toMatch(/href="\/workspaces"[^>]*>Your workspaces<\/a>/);
    expect(nav).not.toContain("without an account");
    expect(nav).not.toContain("/sketches/new");
  });

  it("still draws the page when the session cannot be read (the page itself says what failed)", async () => {
    signedIn.as = new Error("database busy");
    const nav = await header();
    expect(nav).toContain('href="/sketches/new"');
  });
});

describe("the header of an address the app does not have", () => {
  const notFoundHeader = async () => {
    const { default: NotFound } = await import("@/app/not-found");
    const html = renderToStaticMarkup(await NotFound());
    return /<nav[^>]*aria-label="Main"[^>]*>([\s\S]*?)<\/nav>/.exec(html)?.[1] ?? "";
  };

  it("leads a signed-in visitor to their workspaces, and offers a signed-out one a sketch", async () => {
    signedIn.as = { user: { id: "u1", email: "cho@example.com", name: "Cho Checker" } };
    expect(await notFoundHeader()).toMatch(/href="\/workspaces"[^>]*>Your workspaces<\/a>/);
    expect(await notFoundHeader()).not.toContain("without an account");
    signedIn.as = null;
    expect(await notFoundHeader()).toContain('href="/sketches/new"');
  });
});
