// Accounts in Chromium: sign up, confirm through the local mailbox, sign in; invite a colleague
// as checker, who signs up from the link and sees the workspace; the owner makes them a viewer;
// a used link is refused; a password reset through the mailbox works; the owner reads the audit log.
import { randomBytes } from "node:crypto";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, openBrowser, shot } from "./browser";

const tag = randomBytes(3).toString("hex");
const owner = { name: "Ada Lovell", email: `ada.${tag}@e2e.counterpoise.local`, password: "owner-password-1" };
const colleague = { name: "Chen Colleague", email: `chen.${tag}@e2e.counterpoise.local`, password: "checker-password-1" };
const workspaceName = `Pier 7 Pump Skid ${tag}`;

/** Open the newest mail to `to` whose subject matches, in the local mailbox (mail is sent in the background). */
async function openMail(page: Page, to: string, subject: RegExp): Promise<void> {
  const deadline = Date.now() + 15_000;
  for (;;) {
    await page.goto(`${BASE_URL}/dev/mailbox?to=${encodeURIComponent(to)}`);
    const link = page.getByRole("link", { name: subject }).first();
    if (await link.count()) {
      await link.click();
      await page.waitForURL(/\/dev\/mailbox\/\d+$/);
      return;
    }
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${subject}`);
    await page.waitForTimeout(400);
  }
}

/** Wait until the page's main area shows `text` (content streams in behind a loading skeleton), then return all of it. */
async function mainText(page: Page, text: string): Promise<string> {
  await page.locator("main", { hasText: text }).waitFor();
  return (await page.locator("main").textContent()) ?? "";
}

async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/workspaces$/);
}

describe("accounts, workspaces and roles in the browser", () => {
  let ownerCtx: BrowserContext;
  let colleagueCtx: BrowserContext;
  let ownerPage: Page;
  let colleaguePage: Page;
  let workspaceUrl = "";
  let invitationUrl = "";

  beforeAll(async () => {
    ownerCtx = await openBrowser();
    colleagueCtx = await openBrowser();
    ownerPage = await ownerCtx.newPage();
    colleaguePage = await colleagueCtx.newPage();
  });
  afterAll(async () => {
    await ownerCtx?.close();
    await colleagueCtx?.close();
  });

  it("signs up, confirms the address from the local mailbox, and signs in", async () => {
    const page = ownerPage;
    await page.goto(`${BASE_URL}/sign-up`);
    await shot(page, "accounts-01-sign-up");
    await page.getByRole("button", { name: "Create account" }).click();
    expect(await page.getByText("Enter your name.").isVisible()).toBe(true);
    await page.getByLabel("Your name").fill(owner.name);
    await page.getByLabel("Work e-mail address").fill(owner.email);
    await page.getByLabel("Password").fill(owner.password);
    await page.getByRole("button", { name: "Create account" }).click();
    await page.waitForURL(/\/verify\?sent=/);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Check your inbox");
    expect(await mainText(page, owner.email)).toContain(owner.email);
    await shot(page, "accounts-02-check-inbox");

    // Signing in before confirming is refused with words that say why.
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByLabel("E-mail address").fill(owner.email);
    await page.getByLabel("Password", { exact: true }).fill(owner.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.locator("[data-notice=error]").waitFor();
    expect(await page.locator("[data-notice=error]").textContent()).toContain(`Confirm your e-mail address first: we have sent a new link to ${owner.email}.`);
    await shot(page, "accounts-02a-sign-in-unconfirmed");

    await openMail(page, owner.email, /Confirm your e-mail address/);
    await shot(page, "accounts-03-mailbox-verification");
    await page.getByRole("link", { name: "Open the link in this mail" }).click();
    await page.waitForURL(/\/verify\?confirmed=1/);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("E-mail address confirmed");

    await signIn(page, owner.email, owner.password);
    await page.getByRole("link", { name: /Ada's workspace/ }).waitFor();
    expect(await page.getByRole("link", { name: /Ada's workspace/ }).count()).toBe(1);
    await shot(page, "accounts-04-workspaces");
  });

  it("creates a shared workspace and invites a colleague as checker", async () => {
    const page = ownerPage;
    await page.getByLabel("Name").fill(workspaceName);
    await page.getByRole("button", { name: "Create workspace" }).click();
    await page.waitForURL(/\/workspaces\/[0-9a-f-]{36}\/members$/);
    workspaceUrl = page.url().replace(/\/members$/, "");
    await page.getByTestId(`member-${owner.email}`).waitFor();
    expect(await page.getByTestId(`member-${owner.email}`).textContent()).toContain("Last owner");

    await page.getByLabel("E-mail address").fill(colleague.email);
    await page.getByLabel("Role", { exact: true }).selectOption("checker");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation sent to ${colleague.email}`).waitFor();
    invitationUrl = await page.getByLabel("Invitation link").inputValue();
    expect(invitationUrl).toMatch(new RegExp(`^${BASE_URL}/invite/[A-Za-z0-9_-]{40,}$`));
    await page.getByTestId(`invitation-${colleague.email}`).waitFor();
    expect(await page.getByTestId(`invitation-${colleague.email}`).textContent()).toContain("Checker");
    await shot(page, "accounts-05-members-invited");
  });

  it("the colleague signs up from the mailed link and sees the workspace as checker", async () => {
    const page = colleaguePage;
    await openMail(page, colleague.email, /invited you to/);
    expect(await page.locator("pre").textContent()).toContain(`as checker: Reads, comments and checks versions prepared by others.`);
    await page.getByRole("link", { name: "Open the link in this mail" }).click();
    await page.waitForURL(/\/invite\//);
    expect(page.url()).toBe(invitationUrl);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Create your account to join");
    await shot(page, "accounts-06-invitation");

    await page.getByLabel("Your name").fill(colleague.name);
    await page.getByLabel("Choose a password").fill(colleague.password);
    await page.getByRole("button", { name: "Create account and join" }).click();
    await page.waitForURL(workspaceUrl);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe(workspaceName);
    expect(await mainText(page, "You are ✓Checker")).toContain("You are ✓Checker");
    await shot(page, "accounts-07a-workspace-as-checker");
    // A checker sees no owner tabs and no invite form.
    expect(await page.getByRole("link", { name: "Audit log" }).count()).toBe(0);
    await page.getByRole("link", { name: "Members", exact: true }).click();
    await page.getByTestId(`member-${colleague.email}`).waitFor();
    expect(await page.getByRole("button", { name: "Send invitation" }).count()).toBe(0);
    await shot(page, "accounts-07-colleague-members");
  });

  it("the owner makes the colleague a viewer, and the colleague sees it on the next page", async () => {
    const page = ownerPage;
    await page.goto(`${workspaceUrl}/members`);
    const select = page.getByLabel(`Role of ${colleague.name}`);
    await select.waitFor();
    expect(await select.inputValue()).toBe("checker");
    expect(await page.getByText("No open invitations").isVisible()).toBe(true);
    await select.selectOption("viewer");
    await page.getByText(`${colleague.name} is now viewer.`).waitFor();
    await shot(page, "accounts-08-role-changed");

    await colleaguePage.goto(workspaceUrl);
    expect(await mainText(colleaguePage, "You are ○Viewer")).toContain("You are ○Viewer");
    expect(await colleaguePage.getByRole("link", { name: "Start a sketch" }).count()).toBe(0);
  });

  it("a used invitation link is refused with a clear page", async () => {
    await colleaguePage.goto(invitationUrl);
    expect(await colleaguePage.getByRole("heading", { level: 1 }).textContent()).toBe("This invitation has already been used");
    await shot(colleaguePage, "accounts-09-invitation-used");
  });

  it("resets a forgotten password through the local mailbox", async () => {
    const page = colleaguePage;
    await page.goto(workspaceUrl);
    await page.getByRole("button", { name: `Account: ${colleague.name}` }).click();
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/\/sign-in$/);

    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await page.waitForURL(/\/forgot-password/);
    await page.getByLabel("E-mail address").fill(colleague.email);
    await page.getByRole("button", { name: "Send reset link" }).click();
    await page.getByText("Check your inbox").waitFor();
    await shot(page, "accounts-10-reset-requested");

    await openMail(page, colleague.email, /Choose a new Counterpoise password/);
    await page.getByRole("link", { name: "Open the link in this mail" }).click();
    await page.waitForURL(/\/reset-password\?token=/);
    await page.getByLabel("New password", { exact: true }).fill("a-new-checker-password");
    await page.getByLabel("New password, again").fill("a-new-checker-password");
    await page.getByRole("button", { name: "Set new password" }).click();
    await page.getByText("Password changed").waitFor();
    await shot(page, "accounts-11-reset-done");

    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByLabel("E-mail address").fill(colleague.email);
    await page.getByLabel("Password", { exact: true }).fill(colleague.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.locator("[data-notice=error]").waitFor();
    expect(await page.locator("[data-notice=error]").textContent()).toContain("That e-mail address and password do not match an account.");
    await signIn(page, colleague.email, "a-new-checker-password");
    await page.getByRole("link", { name: new RegExp(workspaceName) }).waitFor();
    expect(await page.getByRole("link", { name: new RegExp(workspaceName) }).count()).toBe(1);
  });

  it("the owner reads the audit log and switches workspaces from the header", async () => {
    const page = ownerPage;
    await page.goto(`${workspaceUrl}/audit`);
    await page.getByRole("table").waitFor();
    const log = await page.getByRole("table").textContent();
    expect(log).toContain(`invited ${colleague.email} as checker`);
    expect(log).toContain("joined as checker through an invitation");
    expect(log).toContain(`changed the role of ${colleague.name} from checker to viewer`);
    expect(log).toContain(`created the workspace "${workspaceName}"`);
    await shot(page, "accounts-12-audit-log");

    await page.getByRole("button", { name: /Switch workspace/ }).click();
    await shot(page, "accounts-13-switcher");
    await page.getByRole("link", { name: /Ada's workspace/ }).click();
    await page.waitForURL((u) => u.pathname !== new URL(workspaceUrl).pathname && /\/workspaces\/[0-9a-f-]{36}$/.test(u.pathname));
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Ada's workspace");

    await page.goto(`${BASE_URL}/account`);
    expect(await page.getByLabel("Current e-mail address").inputValue()).toBe(owner.email);
    await shot(page, "accounts-14-account");
  });
});
