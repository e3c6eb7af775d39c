// Copy and paste in Chromium with the real keys: a body copied with Ctrl+C goes onto the system
// clipboard as text, Ctrl+V pastes a second one beside it, and the same text pastes into a new sketch
// with the parameters its expressions read.
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openPage, shot } from "./browser";
import { openScratch } from "./editor-helpers";

describe("copy and paste", () => {
  let ctx: BrowserContext;
  let page: Page;
  beforeAll(async () => {
    ({ ctx, page } = await openPage({ permissions: ["clipboard-read", "clipboard-write"] }));
  });
  afterAll(() => ctx?.close());

  const count = async () => Number(/\((\d+)\)/.exec((await page.getByRole("heading", { name: /Elements/ }).textContent()) ?? "")?.[1]);
  const elements = () => page.getByRole("list", { name: "Elements of the sketch" });

  it("Ctrl+C on a body, Ctrl+V: a second body with its supports and ports, selected, beside the first", async () => {
    await openScratch(page, "?example=pump-skid");
    const before = await count();
    await elements().getByRole("button", { name: /^Body/ }).first().click();
    await page.keyboard.press("Control+c");
    await expect.poll(() => page.getByTestId("notice").textContent()).toMatch(/Copied \d+ elements/);
    const text = await page.evaluate(() => navigator.clipboard.readText());
    const copied = JSON.parse(text);
    expect(copied.format).toBe("counterpoise.elements");
    const n = ["bodies", "supports", "loads", "ports", "massSources"].reduce((t, g) => t + copied[g].length, 0);
    expect(n).toBe(before); // the example's elements all sit on its one body
    await page.keyboard.press("Control+v");
    await expect.poll(count).toBe(2 * before);
    await expect.poll(() => page.getByTestId("notice").textContent()).toMatch(new RegExp(`Pasted ${n} elements`));
    // the copy is solved as a body of its own: two status sentences, the same reactions twice; its
    // labels, taken here already, are the next free ones
    await expect.poll(() => page.getByTestId("status").textContent()).toMatch(/Pump skid: Holds[\s\S]*at the front bearer[\s\S]*Pump skid 2: Holds[\s\S]*at the front bearer 2/);
    await shot(page, "clipboard-01-pasted-beside");
  });

  it("the same clipboard pastes into a new sketch, with the parameters it reads", async () => {
    await page.getByRole("button", { name: /^File/ }).click();
    await page.getByRole("menuitem", { name: /New sketch/ }).click();
    await expect.poll(count).toBe(0);
    await page.getByTestId("sketch-canvas").focus();
    await page.keyboard.press("Control+v");
    await expect.poll(count).toBeGreaterThan(0);
    const copied = JSON.parse(await page.evaluate(() => navigator.clipboard.readText()));
    const names = Object.keys(copied.parameters);
    expect(names.length).toBeGreaterThan(0);
    const table = page.getByTestId("parameters");
    const typed = await table.locator("input").evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));
    for (const name of names) expect(typed).toContain(name);
    // and it solves: the status names no error
    await expect.poll(() => page.getByTestId("status").textContent()).toMatch(/Holds|Slips|Lifts|Tips/);
    await shot(page, "clipboard-02-new-sketch");
  });
});
