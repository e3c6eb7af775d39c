// The editor in Chromium: the pipe bend of the fixture built from an empty sketch with the mouse
// and the properties panel, exported, and solved by `npm run solve` to the fixture's answer;
// undo and redo; a bad file refused; dragging from the tray; the whole sketch mirrored.
import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { solveFile, type SolveResult } from "@/solver/index";
import { BASE_URL, openPage, shot } from "./browser";
import { addParameter, clickAt, download, dragFromTo, emptySketchView, fill, form, openScratch, tray } from "./editor-helpers";

const FIXTURE = "tests/fixtures/sketches/pipe-bend-anchor.json";

function npmSolve(path: string): SolveResult {
  const out = execFileSync(process.execPath, ["node_modules/.bin/tsx", "--no-warnings", "solver/cli.ts", path], { encoding: "utf8" });
  return JSON.parse(out);
}

describe("sketch editor", () => {
  let ctx: BrowserContext;
  let page: Page;
  beforeAll(async () => {
    ({ ctx, page } = await openPage());
  });
  afterAll(() => ctx?.close());

  it("builds the pipe bend from an empty sketch; the exported file solves to the fixture's answer", async () => {
    const fixture = JSON.parse(readFileSync(FIXTURE, "utf8"));
    await openScratch(page);
    expect(await page.getByRole("heading", { name: /Elements/ }).textContent()).toMatch(/\(0\)/);

    // the sketch: title, no gravity (a plan view), the fixture's parameters
    await page.getByLabel("Title").fill("Reducing bend on a thrust anchor");
    await fill(page.getByTestId("sketch-form"), "field-gravity", "0");
    for (const [name, expr] of Object.entries(fixture.parameters as Record<string, string>)) await addParameter(page, name, expr);
    await expect.poll(() => page.getByTestId("parameters").textContent()).toMatch(/594\.2 kPa/);

    // the body: a polygon, corner by corner
    const map = await emptySketchView(page);
    await tray(page, "polygon");
    for (const [x, y] of [[-0.6, -0.2], [0.2, -0.2], [0.6, 0.4], [0.4, 0.6], [-0.2, 0.2], [-0.6, 0.2]]) await clickAt(page, map.at(x, y));
    await clickAt(page, map.at(-0.6, -0.2));
    await expect.poll(() => page.getByRole("heading", { name: /Elements/ }).textContent()).toMatch(/\(1\)/);
    await fill(form(page), "field-mass", "0");

    // the anchor: a fixed support where the pipe axes meet
    await tray(page, "fixed");
    await clickAt(page, map.at(0, 0));
    await expect.poll(() => form(page).textContent()).toMatch(/Fixed support s1/);
    await fill(form(page), "field-label", "anchor block");

    // the inlet on the left edge: it points into the body by itself
    await tray(page, "inlet");
    await clickAt(page, map.at(-0.6, 0));
    await expect.poll(() => form(page).textContent()).toMatch(/Inlet p1/);
    expect(await form(page).getByTestId("field-angle").inputValue()).toBe("0");
    for (const [k, v] of [["massFlow", ""], ["velocity", ""], ["density", "rho"], ["volumeFlow", "Q"], ["area", "A1"], ["pressure", "p1"]]) await fill(form(page), `field-${k}`, v);

    // the outlet: placed near, then positioned and turned by expressions
    await tray(page, "outlet");
    await clickAt(page, map.at(0.4, 0.4));
    await expect.poll(() => form(page).textContent()).toMatch(/Outlet p2/);
    await fill(form(page), "field-at-x", "0.6 * cos(theta)");
    await fill(form(page), "field-at-y", "0.6 * sin(theta)");
    await expect.poll(() => form(page).textContent()).toMatch(/= 0\.3 m/);
    for (const [k, v] of [["angle", "theta"], ["massFlow", ""], ["velocity", ""], ["density", "rho"], ["volumeFlow", "Q"], ["area", "A2"], ["pressure", "p2"]]) await fill(form(page), `field-${k}`, v);
    await expect.poll(() => form(page).textContent()).toMatch(/Resolved: ṁ = 119\.8 kg\/s/);
    await page.keyboard.press("Escape");
    await shot(page, "editor-pipe-bend-built");

    // export, and solve the file with the command line
    const file = await download(page, async () => {
      await page.getByTestId("menu-file").click();
      await page.getByRole("menuitem", { name: "Export JSON" }).click();
    });
    expect(file.name).toBe("reducing-bend-on-a-thrust-anchor.counterpoise.json");
    const mine = npmSolve(file.path);
    const theirs = solveFile(fixture) as SolveResult;
    expect(mine.ok && theirs.ok).toBe(true);
    const r = mine.reactions.s1;
    const f = theirs.reactions.anchor;
    expect(mine.bodies.b1.status).toBe("holds");
    for (const k of ["fx", "fy", "m"] as const) expect(r[k]).toBeCloseTo(f[k], 6);
    expect(Math.hypot(r.fx, r.fy)).toBeGreaterThan(30_000);
  });

  it("undoes and redoes: the outlet goes and comes back", async () => {
    const count = () => page.getByRole("heading", { name: /Elements/ }).textContent();
    const undos = async (n: number) => {
      for (let i = 0; i < n; i++) await page.keyboard.press("Control+z");
    };
    await page.getByTestId("sketch-canvas").focus();
    // the outlet's field edits and moves, then its placement: undone one step at a time until it goes
    let steps = 0;
    while (!/\(3\)/.test((await count()) ?? "") && steps < 20) {
      await undos(1);
      steps++;
      // the list redraws after the undo: read it once it has
      await page.waitForTimeout(150);
    }
    await expect.poll(count).toMatch(/\(3\)/);
    // its edits were undone first, each its own step
    expect(steps).toBeGreaterThan(3);
    await page.keyboard.press("Control+Shift+z");
    await expect.poll(count).toMatch(/\(4\)/);
    await page.getByTestId("redo").click();
    await page.getByTestId("undo").click();
    await page.getByTestId("redo").click();
    await expect.poll(count).toMatch(/\(4\)/);
  });

  it("drags an element from the tray onto the body, and moves it with the mouse", async () => {
    const map = await emptySketchView(page);
    const canvasBox = (await page.getByTestId("sketch-canvas").boundingBox())!;
    const drop = map.at(-0.42, 0.04);
    await page.getByTestId("tray-force").dragTo(page.getByTestId("sketch-canvas"), { targetPosition: { x: drop.x - canvasBox.x, y: drop.y - canvasBox.y } });
    await expect.poll(() => page.getByRole("heading", { name: /Elements/ }).textContent()).toMatch(/\(5\)/);
    await expect.poll(() => form(page).textContent()).toMatch(/Point force l1/);
    expect(await form(page).getByTestId("field-at-x").inputValue()).toBe("-0.4");
    expect(await form(page).getByTestId("field-at-y").inputValue()).toBe("0");
    await dragFromTo(page, map.at(-0.4, 0), map.at(-0.19, -0.13));
    await expect.poll(() => form(page).getByTestId("field-at-x").inputValue()).toBe("-0.2");
    expect(await form(page).getByTestId("field-at-y").inputValue()).toBe("-0.2");
    await shot(page, "editor-force-dragged");
  });

  it("refuses a bad file with its reasons, and nothing changes", async () => {
    const title = await page.getByTestId("sketch-title").textContent();
    await page.getByTestId("import-input").setInputFiles({ name: "not-a-sketch.json", mimeType: "application/json", buffer: Buffer.from('{"format":"counterpoise.sketch","version":1,"supports":[{"id":"s1","kind":"pin"}]}') });
    const dialog = page.getByRole("alertdialog");
    await dialog.waitFor();
    expect(await dialog.textContent()).toMatch(/could not be opened/);
    expect(await dialog.textContent()).toMatch(/supports\[0\]\.body/);
    await shot(page, "editor-import-error");
    await dialog.getByRole("button", { name: "Close" }).click();
    expect(await page.getByTestId("sketch-title").textContent()).toBe(title);
    expect(await page.getByRole("heading", { name: /Elements/ }).textContent()).toMatch(/\(5\)/);
  });

  it("keeps the scratch sketch in the browser across a reload", async () => {
    await page.waitForTimeout(600);
    await page.reload();
    await page.getByTestId("sketch-canvas").waitFor();
    expect(await page.getByTestId("sketch-title").textContent()).toBe("Reducing bend on a thrust anchor");
    expect(await page.getByRole("heading", { name: /Elements/ }).textContent()).toMatch(/\(5\)/);
  });

  it("mirrors the whole bend left–right with Shift+H; the exported file solves to the mirrored reactions, and Ctrl+Z undoes it", async () => {
    const exportJson = () =>
      download(page, async () => {
        await page.getByTestId("menu-file").click();
        await page.getByRole("menuitem", { name: "Export JSON" }).click();
      });
    const before = await exportJson();
    await page.keyboard.press("Escape");
    await page.getByTestId("sketch-canvas").focus();
    await page.keyboard.press("Shift+H");
    await expect.poll(() => page.getByTestId("notice").textContent()).toMatch(/^Nothing was selected: mirrored the whole sketch left–right about x = /);
    await shot(page, "editor-pipe-bend-mirrored");
    const after = await exportJson();
    // the outlet's direction a is now 180° − a
    const outlet = (text: string) => JSON.parse(text).ports.find((p: { id: string }) => p.id === "p2");
    const a = Number(outlet(before.text).angle);
    expect(Number(outlet(after.text).angle)).toBeCloseTo(((((180 - a) % 360) + 540) % 360) - 180, 6);
    // reflection symmetry of statics (common practice): Fx and M change sign, Fy stays
    const r0 = npmSolve(before.path);
    const r1 = npmSolve(after.path);
    expect(r0.ok && r1.ok).toBe(true);
    const [f, r] = [r0.reactions.s1, r1.reactions.s1];
    expect(Math.abs(f.fx)).toBeGreaterThan(1000);
    expect(r.fx).toBeCloseTo(-f.fx, 6);
    expect(r.fy).toBeCloseTo(f.fy, 6);
    expect(r.m).toBeCloseTo(-f.m, 6);
    await page.keyboard.press("Control+z");
    await expect.poll(() => page.getByTestId("notice").textContent()).toBe("Undid: Mirror the whole sketch left–right");
  });

  it("says clearly when a saved sketch cannot be opened", async () => {
    await page.goto(BASE_URL + "/sketches/does-not-exist");
    const msg = page.getByTestId("unavailable-message");
    await msg.waitFor();
    expect(await msg.textContent()).toMatch(/Sign in to open this sketch|does not exist|There is no sketch/);
    // signing in comes back to the sketch asked for
    expect(await page.getByRole("link", { name: "Sign in" }).getAttribute("href")).toBe(`/sign-in?next=${encodeURIComponent("/sketches/does-not-exist")}`);
  });
});
