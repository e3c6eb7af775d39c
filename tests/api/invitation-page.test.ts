// The page an invitation link opens, rendered on the server as the app does: an expired, a used
// and a withdrawn link each get a page that says which and what to do, never the sign-up form.
import { eq } from "drizzle-orm";
import { renderToStaticMarkup } from "react-dom/server";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { invitation } from "@/db/schema";
import { hashInvitationToken, newInvitationToken } from "@/lib/invitations";
import { makeAccount, makeWorkspace, uniqueEmail, type Person } from "./helpers";

// rendered outside a request: nobody is signed in
vi.mock("@/lib/session", () => ({ currentSession: async () => null }));
// the open link's form is a client component that asks for the router
vi.mock("next/navigation", () => ({
  useRouter: () => ({ push: () => undefined, refresh: () => undefined, replace: () => undefined }),
  // as Next's: thrown, so the page answers 404 with the segment's not-found page
  notFound: () => {
    throw new Error("NEXT_NOT_FOUND");
  },
}));

let owner: Person;
let ws: string;

beforeAll(async () => {
  owner = await makeAccount("invite-page-owner", { name: "Page Owner" });
  ws = await makeWorkspace("Invitation page bay", [[owner, "owner"]]);
});

async function link(state: "pending" | "expired" | "used" | "withdrawn"): Promise<string> {
  const token = newInvitationToken();
  const [row] = await db
    .insert(invitation)
    .values({ workspaceId: ws, email: uniqueEmail("invitee"), role: "checker", tokenHash: hashInvitationToken(token), invitedBy: owner.id, expiresAt: new Date(Date.now() + 3600_000) })
    .returning({ id: invitation.id });
  if (state === "expired") await db.update(invitation).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(invitation.id, row.id));
  if (state === "used") await db.update(invitation).set({ acceptedAt: new Date() }).where(eq(invitation.id, row.id));
  if (state === "withdrawn") await db.update(invitation).set({ withdrawnAt: new Date() }).where(eq(invitation.id, row.id));
  return token;
}

async function page(token: string): Promise<string> {
  const { default: InvitationPage } = await import("@/app/(auth)/invite/[token]/page");
  return renderToStaticMarkup(await InvitationPage({ params: Promise.resolve({ token }) }));
}

const text = (html: string) => html.replace(/<[^>]+>/g, " ").replace(/&#x27;/g, "'").replace(/&quot;/g, '"').replace(/\s+/g, " ");

describe("the invitation page", () => {
  const cases = [
    ["expired", "This invitation has expired", 'Ask Page Owner, who invited you, or another owner of "Invitation page bay" to send the invitation again'],
    ["used", "This invitation has already been used", "Each invitation link works once"],
    ["withdrawn", "This invitation was withdrawn", "Use the newest invitation mail"],
  ] as const;
  for (const [state, title, advice] of cases) {
    it(`${state === "expired" ? "an" : "a"} ${state} link: "${title}", what to do, the workspace's name, and no sign-up form`, async () => {
      const out = text(await page(await link(state)));
      expect(out).toContain(title);
      expect(out).toContain(advice);
      expect(out).toContain("Invitation page bay");
      expect(out).not.toMatch(/password/i);
    });
  }

  it("the tab's title says what happened to a refused link, and no refused or open link is indexed", async () => {
    const { generateMetadata } = await import("@/app/(auth)/invite/[token]/page");
    const titleOf = async (token: string) => generateMetadata({ params: Promise.resolve({ token }) });
    expect(await titleOf(await link("expired"))).toEqual({ title: "This invitation has expired", robots: { index: false, follow: false } });
    expect((await titleOf(await link("used"))).title).toBe("This invitation has already been used");
    expect((await titleOf(await link("withdrawn"))).title).toBe("This invitation was withdrawn");
    expect((await titleOf(await link("pending"))).title).toBe("Invitation");
  });

  it("an open link offers the sign-up form (so the refusals above are real)", async () => {
    expect(text(await page(await link("pending")))).toMatch(/password/i);
  });

  it("a link that never existed answers 404, with its own page: not valid, check the whole address was copied", async () => {
    await expect(page("made-up-token-made-up-token")).rejects.toThrow("NEXT_NOT_FOUND");
    const { default: InvitationNotFound } = await import("@/app/(auth)/invite/[token]/not-found");
    const out = text(renderToStaticMarkup(await InvitationNotFound()));
    expect(out).toContain("This invitation link is not valid");
    expect(out).toContain("Check that the whole address from the mail was copied");
    expect(out).toContain("Sign in");
  });
});
