// The editor on a touch screen: a phone (390 × 844) and a tablet (820 × 1180). The page does not
// scroll sideways, every toolbar control is on screen and a finger's tap target (40 px at least,
// as are the properties panel's buttons and fields), and the properties toggle is reachable.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, launchBrowser, shot } from "./browser";

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function openOnTouch(width: number, height: number): Promise<Page> {
  const ctx = await browser.newContext({ viewport: { width, height }, hasTouch: true, isMobile: true });
  const page = await ctx.newPage();
  await page.goto(`${BASE_URL}/sketches/new?example=pump-skid`);
  await page.locator("[data-testid=sketch-canvas] canvas").first().waitFor();
  await page.getByRole("button", { name: "Fit", exact: true }).click();
  return page;
}

/** The toolbar's visible controls that are off screen or smaller than 40 px either way (the page's
 *  own, the version bar's, are its own concern: on screen is checked for them, not the size). */
async function smallOrOffScreen(page: Page, width: number): Promise<string[]> {
  return page.evaluate((w) => {
    const out: string[] = [];
    const header = document.querySelector("header")!;
    for (const el of Array.from(header.querySelectorAll<HTMLElement>("button, a, label"))) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0) continue;
      // a button inside a label or a radio group is measured as its own target
      const name = el.getAttribute("aria-label") ?? el.getAttribute("data-testid") ?? (el.textContent ?? "").trim();
      if (r.left < 0 || r.right > w) out.push(`${name}: off screen`);
      if (el.closest("[data-toolbar-extra]")) continue;
      if (r.width < 40 || r.height < 40) out.push(`${name}: ${Math.round(r.width)}×${Math.round(r.height)}`);
    }
    return out;
  }, width);
}

describe("the editor on a touch screen", () => {
  for (const [name, width, height] of [
    ["phone", 390, 844],
    ["tablet", 820, 1180],
  ] as const) {
    it(`on a ${name} (${width} px) nothing scrolls sideways, and every toolbar control and the properties panel's are 40 px targets on screen`, async () => {
      const page = await openOnTouch(width, height);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
      expect(await smallOrOffScreen(page, width)).toEqual([]);
      // the properties panel's toggle is reachable, and opens the panel
      const toggle = page.getByTestId("toggle-properties");
      const box = (await toggle.boundingBox())!;
      expect(box.x + box.width).toBeLessThanOrEqual(width);
      await toggle.tap();
      await expect.poll(() => toggle.getAttribute("aria-expanded")).toBe("true");
      // the panel's buttons and fields (with nothing selected: the sketch's own, and the parameters) are 40 px tall
      const small = await page.evaluate(() =>
        Array.from(document.querySelectorAll<HTMLElement>("#properties-panel button, #properties-panel input:not([type=checkbox]):not([type=radio]), #properties-panel select"))
          .filter((el) => el.getBoundingClientRect().height > 0)
          .filter((el) => el.getBoundingClientRect().height < 40)
          .map((el) => `${el.getAttribute("aria-label") ?? el.getAttribute("data-testid") ?? el.textContent?.trim()}: ${Math.round(el.getBoundingClientRect().height)}`),
      );
      expect(small).toEqual([]);
      await shot(page, `editor-touch-${name}`);
      await page.context().close();
    });
  }
});
