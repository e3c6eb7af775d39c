import { describe, expect, it } from "vitest";
import { BASE_URL, PHONE, shot } from "./browser";
import { sharedBrowser } from "./session";

describe("first page", () => {
  const browser = sharedBrowser();

  it("shows the product, the entry points and the cautions in the shipped font", async () => {
    const page = await browser.newPage();
    const failed: string[] = [];
    page.on("response", (r) => {
      if (r.status() >= 400) failed.push(`${r.status()} ${r.url()}`);
    });
    page.on("console", (m) => {
      if (m.type() === "error") failed.push(m.text());
    });
    const res = await page.goto(BASE_URL + "/");
    expect(res?.status()).toBe(200);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toContain("What holds it in place");
    expect(await page.getByRole("link", { name: "Sign in", exact: true }).getAttribute("href")).toBe("/sign-in");
    expect(await page.getByRole("link", { name: "Try a sketch", exact: true }).getAttribute("href")).toBe("/sketches/new");
    const footer = await page.locator("footer").textContent();
    expect(footer).toMatch(/reviewed by a qualified engineer/);
    expect(footer).toMatch(/Local codes, standards and licensed engineering practice govern/);
    // The font comes from the app itself: loaded, and nothing requested from another host.
    await page.evaluate(() => document.fonts.ready);
    const fontLoaded = await page.evaluate(() =>
      [...document.fonts].some((f) => f.status === "loaded" && /Inter|sans/i.test(f.family)),
    );
    expect(fontLoaded).toBe(true);
    const family = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(family).toMatch(/sans/i);
    // the product mark is the tab's icon, and the page asks for nothing that is missing
    const icon = await page.locator('link[rel="icon"]').first().getAttribute("href");
    expect(icon).toMatch(/^\/icon\.svg/);
    const iconRes = await page.request.get(BASE_URL + icon);
    expect(iconRes.status()).toBe(200);
    expect(iconRes.headers()["content-type"]).toContain("image/svg+xml");
    await page.waitForLoadState("networkidle");
    expect(failed).toEqual([]);
    await shot(page, "home");
  });

  it("at phone width the signed-out pages keep the header's link on one line, clear of the mark", async () => {
    const page = await browser.newPage(PHONE);
    for (const path of ["/sign-in", "/sign-up", "/forgot-password"]) {
      await page.goto(BASE_URL + path);
      const nav = page.getByRole("navigation", { name: "Main" });
      const mark = await nav.getByRole("link", { name: "Counterpoise home" }).boundingBox();
      const link = nav.getByRole("link", { name: /^Try a sketch/ });
      expect(await link.textContent()).toBe("Try a sketch without an account");
      const box = await link.boundingBox();
      const lineHeight = await link.evaluate((el) => parseFloat(getComputedStyle(el).lineHeight));
      // one line (14 px text on a 20 px line), beside the mark with room between them
      expect(box!.height).toBeLessThanOrEqual(lineHeight + 1);
      expect(box!.x - (mark!.x + mark!.width)).toBeGreaterThanOrEqual(16);
    }
    await shot(page, "home-phone-sign-in");
  });

  it("reports the database as up", async () => {
    const page = await browser.newPage();
    const res = await page.goto(BASE_URL + "/api/health");
    expect(res?.status()).toBe(200);
    expect(await res?.json()).toEqual({ ok: true, db: "up" });
  });
});
