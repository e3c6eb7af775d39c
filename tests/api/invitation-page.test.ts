// The page an invitation link opens, rendered on the server as the app does: an expired, a used
// and a withdrawn link each get a page that says which and what to do, never the sign-up form.
import { eq } from "drizzle-orm";
import { renderToStaticMarkup } from "react-dom/server";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { invitation } from "@/db/schema";
import { hashInvitationToken, newInvitationToken } from "@/lib/invitations";
import { makeAccount, makeBareUser, makeWorkspace, uniqueEmail, type Person } from "./helpers";

// rendered outside a request: nobody is signed in, unless a test sets who is
const signedIn = vi.hoisted(() => ({ as: null as null | { user: { id: string; email: string; name: string } } }));
vi.mock("@/lib/session", () => ({ currentSession: async () => signedIn.as }));
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

async function link(state: "pending" | "expired" | "used" | "withdrawn", email = uniqueEmail("invitee")): Promise<string> {
  const token = newInvitationToken();
  const [row] = await db
    .insert(invitation)
    .values({ workspaceId: ws, email, role: "checker", tokenHash: hashInvitationToken(token), invitedBy: owner.id, expiresAt: new Date(Date.now() + 3600_000) })
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

describe("the invitation page's next step on an open link", () => {
  const as = (u: { id: string; email: string; name: string } | null) => (signedIn.as = u ? { user: u } : null);
  afterEach(() => as(null));

  it("signed out, to an address with no account: the form that creates it with the invited address filled in, then joins", async () => {
    const email = uniqueEmail("newcomer");
    const html = await page(await link("pending", email));
    const out = text(html);
    expect(out).toContain("Create your account to join");
    expect(out).toContain(`Page Owner invited ${email} to the workspace Invitation page bay`);
    // the invited address, filled in and not to be changed: the link vouches for it
    const input = html.match(/<input id="invite-email"[^>]*>/)?.[0] ?? "";
    expect(input).toContain(`value="${email}"`);
    expect(input).toContain('readOnly=""');
    expect(out).toContain("Create account and join");
    expect(out).toMatch(/Expires \w{3}, \d\d \w{3} \d{4} \d\d:\d\d UTC/);
    expect(out).not.toContain("Sign in");
  });

  it("signed out, to an address that has an account (in any case of letters): sign in with the address filled in, back to the invitation", async () => {
    const person = await makeBareUser("member-to-be");
    const token = await link("pending", person.email);
    // the account was made as "Member-To-Be…": the invitation's address is stored lower-case
    const { user } = await import("@/db/schema");
    const { eq } = await import("drizzle-orm");
    await db.update(user).set({ email: person.email.toUpperCase() }).where(eq(user.id, person.id));
    const html = await page(token);
    const out = text(html);
    expect(out).toContain("Join the workspace");
    expect(out).toContain(`Sign in as ${person.email} to join`);
    expect(html).toContain(`href="/sign-in?next=${encodeURIComponent(`/invite/${token}`)}&amp;email=${encodeURIComponent(person.email)}"`);
    expect(out).toMatch(/Expires .* UTC/);
    expect(out).not.toMatch(/password/i);
  });

  it("signed in as the invited address: one button to join, nothing to sign in to", async () => {
    const person = await makeBareUser("joiner");
    const token = await link("pending", person.email);
    as(person);
    const out = text(await page(token));
    expect(out).toContain("Join the workspace");
    expect(out).toContain("Join Invitation page bay");
    expect(out).not.toMatch(/Sign in|Sign out|password/i);
  });

  it("signed in as someone else: says so plainly, and the invited address's own next step (create its account, or sign in)", async () => {
    const other = await makeBareUser("someone-else");
    as(other);
    const fresh = uniqueEmail("no-account-yet");
    // (the markup's tags leave a space before a full stop)
    const out = text(await page(await link("pending", fresh))).replace(/ \./g, ".");
    expect(out).toContain("This invitation is for another address");
    expect(out).toContain(`You are signed in as ${other.email}. Only ${fresh} can accept this invitation, and it has no account yet: sign out, then create one.`);
    expect(out).toContain(`To join as ${other.email} instead, ask Page Owner to invite that address.`);
    expect(out).toContain(`Sign out and create the account for ${fresh}`);
    expect(out).not.toMatch(/sign in/i);

    const member = await makeBareUser("has-account");
    const again = text(await page(await link("pending", member.email))).replace(/ \./g, ".");
    expect(again).toContain(`Only ${member.email} can accept this invitation: sign out, then sign in with that address.`);
    expect(again).toContain(`Sign out and sign in as ${member.email}`);
    expect(again).not.toMatch(/no account|create/);
  });
});
