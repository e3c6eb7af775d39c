// Helpers for driving the sketch editor in Chromium: world coordinates on the canvas, fields in
// the properties panel, the tray, and reading a download.
import { readFileSync } from "node:fs";
import type { Locator, Page } from "playwright-core";
import { BASE_URL } from "./browser";

/** Open the scratch sketch page (with an optional query such as "?example=…") and wait for its canvas. */
export async function openScratch(page: Page, query = "") {
  await page.goto(BASE_URL + "/sketches/new" + query);
  await page.getByTestId("sketch-canvas").waitFor();
  await page.locator("[data-testid=sketch-canvas] canvas").first().waitFor();
}

export interface CanvasMap {
  at: (x: number, y: number) => { x: number; y: number };
}

/**
 * Screen position of a world point for the view a new, empty sketch opens with (120 px/m, the
 * origin 30% in from the left and 70% down), as the canvas holds it: the results under the drawing
 * take the height their content needs on a tall window, so the canvas's height may have changed
 * since the view was set, and the view is read rather than worked out from today's height.
 */
export async function emptySketchView(page: Page): Promise<CanvasMap> {
  const canvas = page.getByTestId("sketch-canvas");
  const box = (await canvas.boundingBox())!;
  const [scale, x, y] = ((await canvas.getAttribute("data-view")) ?? "").split(" ").map(Number);
  if (scale !== 120) throw new Error(`the empty sketch's view is not at 120 px/m but at ${scale}`);
  return { at: (wx, wy) => ({ x: box.x + x + wx * scale, y: box.y + y - wy * scale }) };
}

export async function clickAt(page: Page, p: { x: number; y: number }) {
  await page.mouse.move(p.x, p.y);
  await page.mouse.down();
  await page.mouse.up();
}

/** Drag with many small moves, like a hand. */
export async function dragFromTo(page: Page, a: { x: number; y: number }, b: { x: number; y: number }, steps = 12) {
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  await page.mouse.move(b.x, b.y, { steps });
  await page.mouse.up();
}

export function form(page: Page): Locator {
  return page.getByTestId("element-form");
}

/** Replace a field's text (label text as shown in the panel). */
export async function fill(scope: Locator, testId: string, value: string) {
  const input = scope.getByTestId(testId);
  await input.click();
  await input.fill(value);
  await input.press("Enter");
}

export async function tray(page: Page, name: string) {
  await page.getByTestId(`tray-${name}`).click();
}

export async function addParameter(page: Page, name: string, expression: string) {
  await page.getByLabel("New parameter name").fill(name);
  await page.getByLabel("New parameter expression").fill(expression);
  await page.getByTestId("parameters").getByRole("button", { name: "Add" }).click();
}

export async function download(page: Page, run: () => Promise<void>): Promise<{ name: string; text: string; path: string }> {
  const [dl] = await Promise.all([page.waitForEvent("download"), run()]);
  const path = await dl.path();
  return { name: dl.suggestedFilename(), text: readFileSync(path, "utf8"), path };
}
