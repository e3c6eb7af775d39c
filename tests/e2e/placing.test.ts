// Placing elements in Chromium without drawing them: a rectangle dragged from the tray onto an
// empty canvas, a pin added with the keyboard alone, an outlet clicked just inside an edge, the
// shortcut that needs a body first, and an example link opened over a scratch sketch that Undo
// brings back.
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { atViewport, openPage, PHONE, shot } from "./browser";
import { clickAt, emptySketchView, form, openScratch } from "./editor-helpers";

const SCRATCH_KEY = "counterpoise:scratch-sketch:v1";
const MY_TITLE = "Gearbox on two bearers";
/** The new body's row in the element list: its id, then the name it is given ("Body 1"). */
const BODY_ROW = "Body b1, Body 1";

/** The scratch sketch as the browser keeps it (null until the first autosave). */
async function storedSketch(page: Page): Promise<SketchFile | null> {
  const text = await page.evaluate((key) => window.localStorage.getItem(key), SCRATCH_KEY);
  return text ? (JSON.parse(text) as { sketch: SketchFile }).sketch : null;
}

const elementCount = (page: Page) => page.getByRole("heading", { name: /Elements/ }).textContent();
const row = (page: Page, name: string) => page.getByRole("list", { name: "Elements of the sketch" }).getByRole("button", { name, exact: true });

describe("placing elements from the tray and the keyboard", () => {
  let ctx: BrowserContext;
  let page: Page;
  beforeAll(async () => {
    ({ ctx, page } = await openPage());
  });
  afterAll(() => ctx?.close());

  it("says to draw a body first when the pin shortcut is pressed on an empty sketch", async () => {
    await openScratch(page);
    expect(await elementCount(page)).toMatch(/\(0\)/);
    expect(await page.getByTestId("tray-pin").getAttribute("aria-disabled")).toBe("true");
    await page.getByTestId("sketch-canvas").focus();
    await page.keyboard.press("p");
    await expect.poll(() => page.getByTestId("notice").textContent()).toBe("Draw a body first: supports, loads and ports belong to a body.");
    expect(await elementCount(page)).toMatch(/\(0\)/);
    await shot(page, "placing-pin-needs-body");
  });

  it("drops a 2 m × 1 m body, selected, where the rectangle is dragged onto the empty canvas", async () => {
    const map = await emptySketchView(page);
    const canvasBox = (await page.getByTestId("sketch-canvas").boundingBox())!;
    // (1, 1) is on the grid at every step the default zoom may use, so the body is centred there
    const drop = map.at(1, 1);
    await page.getByTestId("tray-body").dragTo(page.getByTestId("sketch-canvas"), { targetPosition: { x: drop.x - canvasBox.x, y: drop.y - canvasBox.y } });
    await expect.poll(() => elementCount(page)).toMatch(/\(1\)/);
    expect(await row(page, BODY_ROW).getAttribute("aria-pressed")).toBe("true");
    await expect.poll(() => form(page).textContent()).toMatch(/Body b1/);

    // the corners in the properties panel: 2 m × 1 m around the drop point (the default body at 120 px/m)
    const corner = async (i: number, k: "x" | "y") => Number(await form(page).getByLabel(`Corner ${i} ${k}`, { exact: true }).inputValue());
    const corners: number[][] = [];
    for (let i = 1; i <= 4; i++) corners.push([await corner(i, "x"), await corner(i, "y")]);
    expect(await form(page).getByLabel("Corner 5 x", { exact: true }).count()).toBe(0);
    const xs = corners.map((c) => c[0]);
    const ys = corners.map((c) => c[1]);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(2, 6);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(1, 6);
    expect((Math.max(...xs) + Math.min(...xs)) / 2).toBeCloseTo(1, 6);
    expect((Math.max(...ys) + Math.min(...ys)) / 2).toBeCloseTo(1, 6);

    // the same outline is what the browser keeps
    await expect.poll(async () => (await storedSketch(page))?.bodies.length).toBe(1);
    const kept = (await storedSketch(page))!.bodies[0];
    expect(kept).toMatchObject({ id: "b1", label: "Body 1" });
    const keptCorners = kept.outline.map((p) => p.map(Number)).sort((a, b) => a[0] - b[0] || a[1] - b[1]);
    [[0, 0.5], [0, 1.5], [2, 0.5], [2, 1.5]].forEach(([x, y], i) => {
      expect(keptCorners[i][0]).toBeCloseTo(x, 6);
      expect(keptCorners[i][1]).toBeCloseTo(y, 6);
    });

    // and on screen it spans 0 … 2 m: a click just inside either end selects it, just outside does not
    const selected = () => row(page, BODY_ROW).getAttribute("aria-pressed");
    for (const [inside, outside] of [[[0.2, 1.25], [-0.25, 1.25]], [[1.8, 1.25], [2.25, 1.25]]]) {
      await clickAt(page, map.at(outside[0], outside[1]));
      await expect.poll(selected).toBe("false");
      await clickAt(page, map.at(inside[0], inside[1]));
      await expect.poll(selected).toBe("true");
    }
    expect(await elementCount(page)).toMatch(/\(1\)/);
    await shot(page, "placing-body-dropped");
  });

  it("adds a pin to the body with the keyboard alone: Enter on the tray's Pin", async () => {
    expect(await row(page, BODY_ROW).getAttribute("aria-pressed")).toBe("true");
    const pin = page.getByTestId("tray-pin");
    expect(await pin.getAttribute("aria-disabled")).toBe("false");
    await pin.focus();
    await page.keyboard.press("Enter");
    await expect.poll(() => elementCount(page)).toMatch(/\(2\)/);
    await row(page, "Pin s1").waitFor();
    await expect.poll(() => form(page).textContent()).toMatch(/Pin s1/);
    expect(await form(page).getByLabel("Belongs to").inputValue()).toBe("b1");
    await expect.poll(() => page.getByTestId("notice").textContent()).toMatch(/^Pin added to Body 1 near the left end of its bottom edge \(x = 0\.25 m, y = 0\.5 m\)\./);
    // Enter was not also a click on the button: no place tool waiting for a click on the canvas
    expect(await pin.getAttribute("aria-pressed")).toBe("false");

    // kept attached to the body, an eighth of its bottom edge in from its left corner (a second
    // support goes as far in from the right one, so a pair stands on three quarters of the base)
    await expect.poll(async () => (await storedSketch(page))?.supports.length).toBe(1);
    const s = (await storedSketch(page))!.supports[0];
    expect(s).toMatchObject({ id: "s1", kind: "pin", body: "b1" });
    expect(Number(s.at[0])).toBeCloseTo(0.25, 6);
    expect(Number(s.at[1])).toBeCloseTo(0.5, 6);
    await shot(page, "placing-pin-by-keyboard");
  });

  it("puts an outlet clicked just inside the body's top edge on that edge, flowing out of it", async () => {
    const map = await emptySketchView(page);
    await page.getByTestId("tray-outlet").click();
    // 20 px under the top edge (y = 1.5 m at 120 px/m): too far in to snap to it, so the grid takes
    // the click inside the body; a port cannot be there, and goes up onto the edge
    await clickAt(page, map.at(1.6, 1.5 - 20 / 120));
    await expect.poll(() => elementCount(page)).toMatch(/\(3\)/);
    await expect.poll(() => form(page).textContent()).toMatch(/Outlet p1/);
    expect(Number(await form(page).getByTestId("field-at-x").inputValue())).toBeCloseTo(1.6, 6);
    expect(Number(await form(page).getByTestId("field-at-y").inputValue())).toBeCloseTo(1.5, 6);
    expect(await form(page).getByTestId("field-angle").inputValue()).toBe("90");
    // on the control surface: solved (its 10 kg/s has no inlet yet), with no warning that it sits inside its body
    await expect.poll(() => page.getByTestId("results-dock").textContent()).toMatch(/differs from mass out \(10 kg\/s\)/);
    expect(await page.getByTestId("results-dock").textContent()).not.toMatch(/inside its body/);
    await shot(page, "placing-outlet-onto-edge");
    // the sketch as it was, for what follows
    await page.getByTestId("undo").click();
    await expect.poll(() => elementCount(page)).toMatch(/\(2\)/);
  });

  it("opens an example over the scratch sketch as one undo step: Undo brings the sketch back", async () => {
    // nothing selected: the panel shows the sketch's own fields
    await page.getByTestId("sketch-canvas").focus();
    await page.keyboard.press("Escape");
    await page.getByTestId("sketch-form").waitFor();
    await page.getByLabel("Title").fill(MY_TITLE);
    await page.getByLabel("Title").press("Enter");
    await expect.poll(async () => (await storedSketch(page))?.title).toBe(MY_TITLE);

    await openScratch(page, "?example=pump-skid");
    await expect.poll(() => page.getByTestId("sketch-title").textContent()).toBe("Dewatering pump skid, discharge test");
    // the skid, its two bearers, the suction and the discharge
    await expect.poll(() => elementCount(page)).toMatch(/\(5\)/);
    await expect.poll(() => page.getByTestId("notice").textContent()).toMatch(/Undo \(Ctrl\+Z\) returns to the sketch you had here/);
    await expect.poll(() => page.getByTestId("undo").isEnabled()).toBe(true);
    await shot(page, "placing-example-opened");

    await page.getByTestId("undo").click();
    await expect.poll(() => page.getByTestId("sketch-title").textContent()).toBe(MY_TITLE);
    await expect.poll(() => elementCount(page)).toMatch(/\(2\)/);
    await row(page, "Pin s1").waitFor();
    // and the browser keeps that sketch again, not the example
    await expect.poll(async () => (await storedSketch(page))?.title).toBe(MY_TITLE);
    expect((await storedSketch(page))!.supports.map((x) => x.id)).toEqual(["s1"]);
    await shot(page, "placing-example-undone");

    // Redo opens the example again
    await page.keyboard.press("Control+Shift+z");
    await expect.poll(() => page.getByTestId("sketch-title").textContent()).toBe("Dewatering pump skid, discharge test");

    // the link has done its work: the address drops it, and a reload opens the sketch kept here
    // (undone back to mine), not the example over it again
    expect(new URL(page.url()).searchParams.has("example")).toBe(false);
    await page.getByTestId("undo").click();
    await expect.poll(async () => (await storedSketch(page))?.title).toBe(MY_TITLE);
    await page.reload();
    await expect.poll(() => page.getByTestId("sketch-title").textContent()).toBe(MY_TITLE);
  });

  it("a drawing left as fitted is fitted again when the canvas changes size; one the user zoomed stays put", async () => {
    const scale = async () => Number(((await page.getByLabel("Drawing scale").textContent()) ?? "").replace(/[^\d.]/g, ""));
    try {
      await openScratch(page, "?example=exhaust-stack");
      await expect.poll(() => page.getByTestId("sketch-title").textContent()).toBe("Temporary exhaust stack on a skid");
      const tall = await scale();
      expect(tall).toBeGreaterThan(0);
      // a shorter window: the tall stack is fitted into the shorter canvas, so at a smaller scale
      await page.setViewportSize({ width: 1440, height: 760 });
      await expect.poll(scale).toBeLessThan(tall * 0.9);
      // the user zooms in: from then on the view is theirs
      await page.getByRole("button", { name: "Zoom in" }).click();
      const zoomed = await scale();
      await page.setViewportSize({ width: 1440, height: 900 });
      await page.waitForTimeout(300);
      expect(await scale()).toBe(zoomed);
      // Fit hands it back to the fit
      await page.getByRole("button", { name: "Fit", exact: true }).click();
      await expect.poll(scale).not.toBe(zoomed);
      expect(Math.abs((await scale()) - tall) / tall).toBeLessThan(0.1);
    } finally {
      await page.setViewportSize({ width: 1440, height: 900 });
    }
  });

  it("on a window too narrow for three columns, the properties open over the drawing from the toolbar", async () => {
    await atViewport(page, { width: 820, height: 1000 }, async () => {
      await openScratch(page, "?example=pump-skid");
      await expect.poll(() => page.getByTestId("sketch-title").textContent()).toBe("Dewatering pump skid, discharge test");
      const panel = page.getByRole("complementary", { name: "Properties and parameters" });
      expect(await panel.isVisible()).toBe(false);
      // the drawing has the room the panel would take, and the whole toolbar fits the window
      expect((await page.getByTestId("sketch-canvas").boundingBox())!.width).toBeGreaterThan(820 - 232 - 8);
      const save = (await page.getByTestId("save-to-workspace").boundingBox())!;
      expect(save.x + save.width).toBeLessThanOrEqual(820);
      const toggle = (await page.getByTestId("toggle-properties").boundingBox())!;
      expect(toggle.x + toggle.width).toBeLessThanOrEqual(820);

      await page.getByTestId("toggle-properties").click();
      await expect.poll(() => panel.isVisible()).toBe(true);
      expect(await page.getByTestId("toggle-properties").getAttribute("aria-expanded")).toBe("true");
      await row(page, "Contact rear, rear bearer").click();
      await expect.poll(() => form(page).isVisible()).toBe(true);
      await shot(page, "placing-narrow-properties");
      await page.getByTestId("close-properties").click();
      await expect.poll(() => panel.isVisible()).toBe(false);
      // Escape closes it too, from a field inside it, and gives the focus back to its button
      await page.getByTestId("toggle-properties").click();
      await expect.poll(() => panel.isVisible()).toBe(true);
      await panel.locator("input").first().focus();
      await page.keyboard.press("Escape");
      await page.keyboard.press("Escape");
      await expect.poll(() => panel.isVisible()).toBe(false);
      expect(await page.evaluate(() => document.activeElement?.getAttribute("data-testid"))).toBe("toggle-properties");
    });
  });

  it("on a phone-width window the toolbar wraps inside it and the tray opens over the drawing, closing when a kind is chosen", async () => {
    await atViewport(page, PHONE, async () => {
      await openScratch(page, "?example=pump-skid");
      await expect.poll(() => page.getByTestId("sketch-title").textContent()).toBe("Dewatering pump skid, discharge test");
      // every toolbar control is inside the window
      for (const b of await page.locator("header button").all()) {
        if (!(await b.isVisible())) continue;
        const box = (await b.boundingBox())!;
        expect(box.x + box.width, (await b.getAttribute("aria-label")) ?? (await b.textContent()) ?? "").toBeLessThanOrEqual(390);
      }
      const tray = page.getByRole("complementary", { name: "Add and elements" });
      expect(await tray.isVisible()).toBe(false);
      expect((await page.getByTestId("sketch-canvas").boundingBox())!.width).toBeGreaterThan(380);

      await page.getByTestId("toggle-tray").click();
      await expect.poll(() => tray.isVisible()).toBe(true);
      await shot(page, "placing-phone-tray");
      await page.getByTestId("tray-body").click();
      await expect.poll(() => tray.isVisible()).toBe(false);
      await page.keyboard.press("Escape");

      // the keys-and-gestures list has its button here too, the two-finger gestures first
      expect(await page.getByTestId("show-keys").isVisible()).toBe(false);
      await page.getByTestId("show-keys-narrow").click();
      const keys = page.getByTestId("keys-dialog");
      await keys.waitFor();
      const pointerTop = (await keys.getByRole("region", { name: "Pointer" }).boundingBox())!.y;
      const addTop = (await keys.getByRole("region", { name: "Add" }).boundingBox())!.y;
      expect(pointerTop).toBeLessThan(addTop);
      expect(await keys.textContent()).toContain("drag two fingers");
      await page.keyboard.press("Escape");
      await expect.poll(() => keys.isVisible()).toBe(false);
    });
  });
});
