// The editor on a touch screen: a phone (390 × 844) and a tablet (820 × 1180). The page does not
// scroll sideways, every toolbar control is on screen and a finger's tap target (40 px at least,
// as are the properties panel's buttons and fields, and the results dock's tabs, switch and CSV
// button), and the properties toggle is reachable. On a saved sketch the version bar's buttons are
// 40 px too, and on a phone its items flow in the toolbar's rows.
import { readFileSync } from "node:fs";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSketch } from "@/lib/sketches";
import { takeSignOffStep } from "@/lib/review/signoff";
import { parseSketch } from "@/solver";
import { makeAccount, makeWorkspace } from "../api/helpers";
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
 *  own, the version bar's: on screen is checked here, their size by `smallTargets`). */
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

/** The visible controls matched by `selector` smaller than 40 px either way. */
async function smallTargets(page: Page, selector: string): Promise<string[]> {
  return page.evaluate((sel) => {
    const out: string[] = [];
    for (const el of Array.from(document.querySelectorAll<HTMLElement>(sel))) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0) continue;
      const name = el.getAttribute("aria-label") ?? el.getAttribute("data-testid") ?? (el.textContent ?? "").trim();
      if (r.width < 40 || r.height < 40) out.push(`${name}: ${Math.round(r.width)}×${Math.round(r.height)}`);
    }
    return out;
  }, selector);
}

/** The results dock's controls on its Reactions tab: the tabs, the CSV button and the force-on-the-body / load-on-the-support switch. */
const DOCK_CONTROLS = "[data-testid=results-dock] [role=tab], [data-testid=results-dock] [data-testid=sense] button, [data-testid=results-dock] button[aria-label='Download the reactions as CSV']";

describe("the editor on a touch screen", () => {
  for (const [name, width, height] of [
    ["phone", 390, 844],
    ["tablet", 820, 1180],
  ] as const) {
    it(`on a ${name} (${width} px) nothing scrolls sideways, and every toolbar control and the properties panel's are 40 px targets on screen`, async () => {
      const page = await openOnTouch(width, height);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
      expect(await smallOrOffScreen(page, width)).toEqual([]);
      // the page's own controls in the toolbar: the scratch sketch's "Save to a workspace"
      expect(await page.getByTestId("save-to-workspace").isVisible()).toBe(true);
      expect(await smallTargets(page, "header [data-toolbar-extra] button, header [data-toolbar-extra] a")).toEqual([]);
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
      // the results dock's tabs, its CSV button and its switch: four tabs, CSV, two sides of the switch
      expect(await page.locator(DOCK_CONTROLS).count()).toBe(7);
      expect(await smallTargets(page, DOCK_CONTROLS)).toEqual([]);
      await shot(page, `editor-touch-${name}`);
      await page.context().close();
    });
  }

  describe("a saved sketch", () => {
    let sketchId = "";
    let cookie = "";

    beforeAll(async () => {
      const tag = Date.now().toString(36).slice(-5);
      const editor = await makeAccount(`touch-${tag}`);
      cookie = editor.cookie;
      const ws = await makeWorkspace(`Touch ${tag} yard`, [[editor, "editor"]]);
      const parsed = parseSketch(JSON.parse(readFileSync("tests/fixtures/sketches/fire-monitor-trailer.json", "utf8")));
      if (!parsed.ok) throw new Error("fixture");
      sketchId = (await createSketch(ws, editor, { title: `Monitor trailer ${tag}`, document: parsed, message: "as surveyed" })).sketch.id;
      // submitted for checking: the version bar says so ("v1 · submitted"), its longest label
      await takeSignOffStep(sketchId, 1, editor, { step: "submit" });
    });

    for (const [name, width, height] of [
      ["phone", 390, 844],
      ["tablet", 820, 1180],
    ] as const) {
      it(`on a ${name} the version bar's buttons are 40 px targets on screen${width < 640 ? ", and its items share the toolbar's rows" : ""}`, async () => {
        const ctx = await browser.newContext({ viewport: { width, height }, hasTouch: true, isMobile: true });
        await ctx.addCookies(cookie.split("; ").map((c) => ({ name: c.slice(0, c.indexOf("=")), value: c.slice(c.indexOf("=") + 1), url: BASE_URL })));
        const page = await ctx.newPage();
        await page.goto(`${BASE_URL}/sketches/${sketchId}`);
        // (on a phone the bar's box is its items', in the toolbar's flow: it still reads as shown, as `openEditor` waits for it)
        await page.getByTestId("version-bar").waitFor();
        await page.getByTestId("version-review-state").waitFor();
        expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
        expect(await smallOrOffScreen(page, width)).toEqual([]);
        // Save version and History (the calc sheet link is in the File menu below 1280 px)
        const bar = "[data-testid=version-bar] button, [data-testid=version-bar] a";
        expect(await page.locator(bar).filter({ visible: true }).count()).toBe(2);
        expect(await smallTargets(page, bar)).toEqual([]);
        if (width < 640) {
          // the controls in three rows (the title has one of its own under them): the bar is no
          // block of its own that would take a row, and push the Add and Properties buttons to a fourth
          const rows = await page.evaluate(() => {
            const tops = new Set<number>();
            for (const el of Array.from(document.querySelectorAll<HTMLElement>("header button, header a, header label, header [data-testid=version-label]"))) {
              const r = el.getBoundingClientRect();
              if (r.width && r.height) tops.add(Math.round(r.top + r.height / 2));
            }
            return [...tops].sort((a, b) => a - b);
          });
          expect(rows.length, `rows at ${rows.join(", ")}`).toBeLessThanOrEqual(3);
        }
        await shot(page, `editor-touch-saved-${name}`);
        await ctx.close();
      });
    }
  });
});
