// The dark theme follows the operating system: with prefers-color-scheme dark the page is the dark
// paper and the text the dark ink, the drawings stay light sheets, print stays light, and axe finds no
// colour-contrast failure. On a phone the home page's diagram takes its narrow layout, labels readable.
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { seriousViolations } from "./axe";
import { BASE_URL, PHONE, shot } from "./browser";
import { sharedBrowser } from "./session";

// the palettes of app/globals.css as the browser computes them
const DARK_PAPER = "rgb(27, 32, 37)";
const DARK_INK = "rgb(233, 229, 219)";
const LIGHT_PAPER = "rgb(246, 243, 236)";
const LIGHT_INK = "rgb(29, 35, 41)";
const LIGHT_CARD = "rgb(251, 250, 246)";

/** axe's colour-contrast findings (WCAG 2.x AA, 4.5:1 for body text), one line per element, once the fonts have settled. */
async function contrastFindings(page: Page): Promise<string[]> {
  await page.evaluate(() => document.fonts.ready);
  return seriousViolations(page, ["color-contrast"]);
}

const colours = (page: Page, selector: string) =>
  page.locator(selector).first().evaluate((el) => ({ background: getComputedStyle(el).backgroundColor, color: getComputedStyle(el).color }));

describe("dark theme (prefers-color-scheme: dark)", () => {
  const browser = sharedBrowser();

  it("the home page: dark paper, light ink, its diagram on a light sheet, no contrast failures; print and light stay light", async () => {
    const page = await browser.newPage();
    await page.emulateMedia({ colorScheme: "dark" });
    await page.goto(`${BASE_URL}/`);
    await page.getByRole("heading", { level: 1 }).waitFor();
    expect(await colours(page, "body")).toEqual({ background: DARK_PAPER, color: DARK_INK });
    expect(await page.evaluate(() => getComputedStyle(document.documentElement).colorScheme)).toBe("dark");
    // the diagram's card is a drawing sheet: light in every theme, its words in the light ink
    const sheet = page.locator(".paper-sheet").filter({ has: page.getByRole("img", { name: /Free-body diagram of a pump skid/ }) });
    expect(await sheet.evaluate((el) => getComputedStyle(el).backgroundColor)).toBe(LIGHT_CARD);
    expect(await sheet.locator("p").evaluate((el) => getComputedStyle(el).color)).toBe("rgb(95, 105, 116)");
    expect(await contrastFindings(page)).toEqual([]);
    await shot(page, "dark-home");
    // print forces the light palette, whatever the screen's theme
    await page.emulateMedia({ media: "print", colorScheme: "dark" });
    expect(await colours(page, "body")).toEqual({ background: LIGHT_PAPER, color: LIGHT_INK });
    // and the light theme is the light theme
    await page.emulateMedia({ media: "screen", colorScheme: "light" });
    expect(await colours(page, "body")).toEqual({ background: LIGHT_PAPER, color: LIGHT_INK });
    await page.close();
  });

  it("the editor: dark shell around a light drawing sheet, the tray's icons in the dark ink, no contrast failures", async () => {
    const page = await browser.newPage();
    await page.emulateMedia({ colorScheme: "dark" });
    await page.goto(`${BASE_URL}/sketches/new?example=pump-skid`);
    await page.getByTestId("sketch-canvas").locator("canvas").first().waitFor();
    await page.getByTestId("status-sentence").first().waitFor();
    expect(await colours(page, "body")).toEqual({ background: DARK_PAPER, color: DARK_INK });
    // the canvas draws in the light palette, so its wrapper keeps the light sheet
    expect((await colours(page, '[data-testid="sketch-canvas"]')).background).toBe(LIGHT_CARD);
    // the Add tray's symbols are drawn in the theme's ink, not the sheet's
    const stroke = await page.locator('svg.drawn-in-ink [stroke="#1d2329"]').first().evaluate((el) => getComputedStyle(el).stroke);
    expect(stroke).toBe(DARK_INK);
    expect(await contrastFindings(page)).toEqual([]);
    await shot(page, "dark-editor");
    await page.close();
  });
});

describe("the home page's diagram on a phone (390 × 844)", () => {
  const browser = sharedBrowser();

  it("takes its narrow layout, whose labels are at least 12 px on screen; a wide window keeps the wide one", async () => {
    const page = await browser.newPage(PHONE);
    await page.goto(`${BASE_URL}/`);
    const compact = page.getByTestId("hero-diagram-compact");
    await compact.waitFor();
    expect(await page.getByTestId("hero-diagram-wide").isVisible()).toBe(false);
    // a label's size on screen: its font size in the view's units times the drawing's scale
    const sizes = await compact.evaluate((svg) => {
      const scale = svg.getBoundingClientRect().width / (svg as SVGSVGElement).viewBox.baseVal.width; // px per unit of the view
      return [...svg.querySelectorAll("text")].map((t) => ({ text: t.textContent, px: parseFloat(getComputedStyle(t).fontSize) * scale }));
    });
    expect(sizes.map((s) => s.text)).toEqual(expect.arrayContaining(["R₁ = 4.51 kN", "R₂ = 4.27 kN", "W = 8.34 kN", "ṁV = 440 N", "control volume"]));
    for (const s of sizes) expect(s.px, s.text ?? "").toBeGreaterThanOrEqual(s.text === "pump" ? 11 : 12);
    // every label lies inside the drawing
    const outside = await compact.evaluate((svg) => {
      const box = svg.getBoundingClientRect();
      return [...svg.querySelectorAll("text")].filter((t) => {
        const r = t.getBoundingClientRect();
        return r.left < box.left - 0.5 || r.right > box.right + 0.5 || r.top < box.top - 0.5 || r.bottom > box.bottom + 0.5;
      }).map((t) => t.textContent);
    });
    expect(outside).toEqual([]);
    await shot(page, "home-phone-diagram");
    await page.setViewportSize({ width: 1440, height: 900 });
    await page.getByTestId("hero-diagram-wide").waitFor();
    expect(await compact.isVisible()).toBe(false);
    await page.close();
  });
});
