// A fire-fighting monitor on a two-axle trailer (our own scenario) built from an empty sketch with
// the mouse and the keyboard: parameters typed whole ("Q = 1500 gpm"), a polygon body clicked
// corner by corner, a pin and a roller at the axles, the hose inlet at 100 psi gauge and the nozzle
// at theta, fields with units. The reactions table shows the axle reactions of the hand calculation
// in tests/unit/canvas/monitor-trailer.test.ts (control-volume momentum, Fox & McDonald ch. 4 —
// from memory): rear axle Fx −5.621 kN, Fy 10.49 kN, front axle 9.370 kN. The hand check's P typed
// at the nozzle goes with the whole sketch mirrored (Shift+H) and comes back with Ctrl+Z.
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openPage, shot } from "./browser";
import { clickAt, emptySketchView, fill, form, openScratch, tray } from "./editor-helpers";

describe("a monitor trailer built from an empty sketch", () => {
  let ctx: BrowserContext;
  let page: Page;
  beforeAll(async () => {
    ({ ctx, page } = await openPage());
  });
  afterAll(() => ctx?.close());

  it("gives the hand calculation's axle reactions; P goes with a mirror of the whole sketch", async () => {
    await openScratch(page);
    await page.getByLabel("Title").fill("Monitor trailer, 1500 gpm");
    // each parameter typed whole in the name box, Enter adds it
    const name = page.getByLabel("New parameter name");
    for (const line of ["Q = 1500 gpm", "theta = 30 deg", "p_in = 100 psi", "rho = 998 kg/m^3"]) {
      await name.fill(line);
      await name.press("Enter");
    }
    await expect.poll(() => page.getByTestId("parameters").textContent()).toMatch(/94\.64 L\/s.*689\.5 kPa/);

    // the trailer: deck 5 m × 1.4 m (wheels inside the control volume) with a riser for the monitor
    const map = await emptySketchView(page);
    await tray(page, "polygon");
    for (const [x, y] of [[0, 0], [5, 0], [5, 1.4], [3.2, 1.4], [3, 2.2], [2.2, 2.2], [2, 1.4], [0, 1.4]]) await clickAt(page, map.at(x, y));
    await clickAt(page, map.at(0, 0));
    await expect.poll(() => page.getByRole("heading", { name: /Elements/ }).textContent()).toMatch(/\(1\)/);
    await fill(form(page), "field-label", "Trailer");
    await fill(form(page), "field-mass", "1800 kg");
    await form(page).getByRole("button", { name: "Give it" }).click();
    await fill(form(page), "field-cg-x", "2.4");
    await fill(form(page), "field-cg-y", "1");

    // the axles: a pin (braked rear axle) and a roller
    await tray(page, "pin");
    await clickAt(page, map.at(1.2, 0));
    await expect.poll(() => form(page).textContent()).toMatch(/Pin s1/);
    await fill(form(page), "field-label", "rear axle");
    await tray(page, "roller");
    await clickAt(page, map.at(3.8, 0));
    await expect.poll(() => form(page).textContent()).toMatch(/Roller s2/);
    await fill(form(page), "field-label", "front axle");

    // the supply hose from behind, 5 in, at p_in; the nozzle, 2 in, a free jet at theta
    await tray(page, "inlet");
    await clickAt(page, map.at(0, 1));
    await expect.poll(() => form(page).textContent()).toMatch(/Inlet p1/);
    for (const [k, v] of [["label", "supply hose"], ["at-y", "0.9"], ["massFlow", ""], ["velocity", ""], ["density", "rho"], ["volumeFlow", "Q"], ["area", "pi/4 * (5 in)^2"], ["pressure", "p_in"]]) await fill(form(page), `field-${k}`, v);
    await expect.poll(() => form(page).textContent()).toMatch(/pressure force pA = 8\.734 kN inward/);
    await tray(page, "outlet");
    await clickAt(page, map.at(2.6, 2.2));
    await expect.poll(() => form(page).textContent()).toMatch(/Outlet p2/);
    for (const [k, v] of [["label", "nozzle"], ["angle", "theta"], ["massFlow", ""], ["velocity", ""], ["density", "rho"], ["volumeFlow", "Q"], ["area", "pi/4 * (2 in)^2"]]) await fill(form(page), `field-${k}`, v);
    await expect.poll(() => form(page).textContent()).toMatch(/V = 46\.69 m\/s/);
    await page.keyboard.press("Escape");
    await page.getByRole("button", { name: "Fit" }).click();

    const rows = page.getByRole("tabpanel").getByRole("table").first().locator("tbody tr");
    await expect.poll(() => rows.nth(0).textContent()).toMatch(/rear axle\s*−5\.621\s*10\.49/);
    await expect.poll(() => rows.nth(1).textContent()).toMatch(/front axle\s*0\s*9\.370/);
    await shot(page, "monitor-trailer-built");

    // the hand check about the nozzle; Shift+H mirrors the whole sketch and P with it
    await page.getByRole("tab", { name: "Hand check" }).click();
    await page.getByLabel("Moment point x").fill("2.6");
    await page.getByLabel("Moment point x").press("Tab");
    await page.getByLabel("Moment point y").fill("2.2");
    await page.getByLabel("Moment point y").press("Enter");
    await expect.poll(() => page.getByLabel("Moment point x").inputValue()).toBe("2.6");
    const box = (await page.getByTestId("sketch-canvas").boundingBox())!;
    await clickAt(page, { x: box.x + 20, y: box.y + box.height - 20 });
    await page.keyboard.press("Shift+H");
    await expect.poll(() => page.getByTestId("notice").textContent()).toMatch(/The hand check's point P went with it, to \(2\.4 m, 2\.2 m\)\./);
    await expect.poll(() => page.getByLabel("Moment point x").inputValue()).toBe("2.4");
    // mirrored: the rear axle's Fx changes sign, the vertical reactions stay
    await page.getByRole("tab", { name: "Reactions" }).click();
    await expect.poll(() => rows.nth(0).textContent()).toMatch(/rear axle\s*5\.621\s*10\.49/);
    await shot(page, "monitor-trailer-mirrored");
    await page.keyboard.press("Control+z");
    await expect.poll(() => rows.nth(0).textContent()).toMatch(/rear axle\s*−5\.621\s*10\.49/);
    await page.getByRole("tab", { name: "Hand check" }).click();
    await expect.poll(() => page.getByLabel("Moment point x").inputValue()).toBe("2.6");
  }, 120_000);
});
