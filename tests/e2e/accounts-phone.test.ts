// The owners' workspace pages on a phone (390 px): nothing runs off the side, and the audit log's
// sentences (what was done) are on screen, with the time and the person above each.
import { randomBytes } from "node:crypto";
import type { Page } from "playwright-core";
import { beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, PHONE, shot } from "./browser";
import { browsersClosedAfterAll } from "./session";
import { makeCast } from "./versions-helpers";

const tag = randomBytes(3).toString("hex");

describe("members and audit log at phone width", () => {
  const browsers = browsersClosedAfterAll();
  let page: Page;
  let ws = "";
  let ownerName = "";

  beforeAll(async () => {
    const made = await makeCast(`ph${tag}`);
    ws = made.ws;
    ownerName = made.cast.owner.name;
    page = await browsers.signIn(made.cast.owner);
    await page.setViewportSize(PHONE);
  });

  /** No element wider than the screen: the page does not scroll sideways. */
  async function expectNoSideScroll(p: Page) {
    expect(await p.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  }

  it("the audit log shows what was done on screen, the time and the person above it", async () => {
    await page.goto(`${BASE_URL}/workspaces/${ws}/audit`);
    const row = page.getByRole("row").filter({ hasText: "signed in" }).first();
    await row.waitFor();
    const sentence = row.getByRole("cell").filter({ hasText: "signed in" }).last();
    const box = (await sentence.boundingBox())!;
    expect(box.x).toBeGreaterThanOrEqual(0);
    expect(box.x + box.width).toBeLessThanOrEqual(390);
    const whenWho = row.getByTestId("audit-when-who");
    expect(await whenWho.isVisible()).toBe(true);
    expect(await whenWho.textContent()).toContain(ownerName);
    // the wide screen's own columns are not there to push it aside
    expect(await page.getByRole("columnheader", { name: "When" }).isVisible()).toBe(false);
    await expectNoSideScroll(page);
    await shot(page, "accounts-phone-audit");
  });

  it("the members table keeps every role on screen", async () => {
    await page.goto(`${BASE_URL}/workspaces/${ws}/members`);
    const select = page.getByRole("combobox", { name: /^Role of / }).first();
    await select.waitFor();
    const box = (await select.boundingBox())!;
    expect(box.x + box.width).toBeLessThanOrEqual(390);
    await expectNoSideScroll(page);
    await shot(page, "accounts-phone-members");
  });
});
