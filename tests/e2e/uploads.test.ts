// Tracing over a drawing in Chromium: the editor uploads a marked drawing as the sketch's
// underlay, sets its scale by clicking the two marks and typing "2.0 m", locks it, traces the
// skid as a body, saves, reloads — the underlay and its scale are still there. A viewer sees it
// read-only; someone outside the workspace gets 404 for the file. A checker attaches a photo to
// a comment and sees its thumbnail.
import { randomBytes } from "node:crypto";
import type { BrowserContext, Page } from "playwright-core";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSketch } from "@/lib/sketches";
import { emptySketchFile } from "@/lib/sketch-document";
import { parseSketch } from "@/solver";
import { MARKED, markedDrawing, png } from "../fixtures/uploads";
import { BASE_URL, shot } from "./browser";
import { dragFromTo } from "./editor-helpers";
import { makeCast, openEditor, saveVersion, signInAs, type Cast } from "./versions-helpers";

const tag = randomBytes(3).toString("hex");

type Px = [number, number];

/** Where an image pixel of the underlay is on the page, from the view and the underlay the editor shows. */
async function pixelOnPage(page: Page, p: Px): Promise<{ x: number; y: number }> {
  const canvas = page.getByTestId("sketch-canvas");
  const box = (await canvas.boundingBox())!;
  const [scale, vx, vy] = (await canvas.getAttribute("data-view"))!.split(" ").map(Number);
  const [ox, oy] = (await page.getByTestId("underlay-controls").getAttribute("data-origin"))!.split(" ").map(Number);
  const mpp = Number(await page.getByTestId("underlay-mpp").getAttribute("data-mpp"));
  const wx = ox + p[0] * mpp;
  const wy = oy - p[1] * mpp;
  return { x: box.x + vx + wx * scale, y: box.y + vy - wy * scale };
}

async function version(page: Page, sketchId: string, n: number) {
  return page.evaluate(async (url) => (await fetch(url)).json(), `/api/sketches/${sketchId}/versions/${n}`);
}

/** The colour of the page at a point (from a screenshot of the canvas). */
async function colourAt(page: Page, at: { x: number; y: number }): Promise<[number, number, number]> {
  const box = (await page.getByTestId("sketch-canvas").boundingBox())!;
  const png = await page.getByTestId("sketch-canvas").screenshot();
  const { data, info } = await sharp(png).raw().toBuffer({ resolveWithObject: true });
  const x = Math.round(at.x - box.x);
  const y = Math.round(at.y - box.y);
  const i = (y * info.width + x) * info.channels;
  return [data[i], data[i + 1], data[i + 2]];
}

describe("an underlay to trace over, in the browser", () => {
  let cast: Cast;
  let ws = "";
  let sketchId = "";
  let uploadId = "";
  const contexts: BrowserContext[] = [];
  let page: Page;

  beforeAll(async () => {
    ({ cast, ws } = await makeCast(tag));
    const doc = parseSketch(emptySketchFile(`Skid over its GA ${tag}`));
    if (!doc.ok) throw new Error("empty sketch does not parse");
    sketchId = (await createSketch(ws, cast.editor, { title: `Skid over its GA ${tag}`, document: doc })).sketch.id;
    const s = await signInAs(cast.editor);
    contexts.push(s.ctx);
    page = s.page;
  });
  afterAll(async () => {
    for (const c of contexts) await c.close();
  });

  it("uploads the drawing: it lies under the sketch, fitted into view", async () => {
    await openEditor(page, sketchId);
    await page.getByTestId("underlay-input").setInputFiles({ name: "GA skid rev B.png", mimeType: "image/png", buffer: await markedDrawing() });
    await page.getByTestId("underlay-controls").waitFor();
    expect(await page.getByTestId("underlay-controls").getAttribute("data-size")).toBe("1000 600");
    expect(await page.getByTestId("notice").textContent()).toContain("“GA skid rev B.png” is under the sketch");
    await page.waitForTimeout(300);
    // the skid's dark outline is drawn where the drawing says (image at 60 % opacity on paper)
    const edge = await colourAt(page, await pixelOnPage(page, [MARKED.skid.x, MARKED.skid.y + 100]));
    expect(Math.max(...edge)).toBeLessThan(150);
    await shot(page, "uploads-01-underlay");
  });

  it("sets the scale by clicking the two marks and typing 2.0 m", async () => {
    await page.getByTestId("underlay-calibrate").click();
    for (const mark of [MARKED.a, MARKED.b]) {
      const p = await pixelOnPage(page, mark);
      await page.mouse.click(p.x, p.y);
    }
    await page.getByTestId("underlay-distance").fill("2.0 m");
    expect(await page.getByTestId("underlay-scale").textContent()).toMatch(/= 2 m, so 5(\.0\d*)? mm a pixel/);
    await shot(page, "uploads-02-marks");
    await page.getByTestId("underlay-set-scale").click();
    const mpp = Number(await page.getByTestId("underlay-mpp").getAttribute("data-mpp"));
    // clicks land on screen pixels: the marks are found within a fraction of an image pixel
    expect(Math.abs(mpp - 0.005)).toBeLessThan(0.005 * 0.004);
    expect(await page.getByTestId("underlay-scale").textContent()).toContain("from 2.0 m between two marks");
  });

  it("locks it and traces the skid as a body of the drawing's size", async () => {
    await page.getByTestId("underlay-locked").check();
    await page.getByTestId("underlay-opacity").fill("0.45");
    // trace freely (no grid snapping), corner to corner
    await page.getByRole("checkbox", { name: "Snap" }).uncheck();
    await page.getByTestId("tray-body").click();
    const { x, y, w, h } = MARKED.skid;
    await dragFromTo(page, await pixelOnPage(page, [x, y + h]), await pixelOnPage(page, [x + w, y]));
    await page.getByRole("checkbox", { name: "Snap" }).check();
    await page.keyboard.press("Escape");
    await shot(page, "uploads-03-traced");
    await saveVersion(page, "Traced the skid over its GA drawing");
    await page.getByText("✓ saved").waitFor();
    const v2 = (await version(page, sketchId, 2)).version.document;
    const u = v2.underlay;
    uploadId = u.upload;
    expect(u).toMatchObject({ width: 1000, height: 600, rotation: 0, opacity: 0.45, locked: true, calibration: { distance: "2.0 m" } });
    const outline = v2.bodies[0].outline as Px[];
    const xs = outline.map((p) => p[0]);
    const ys = outline.map((p) => p[1]);
    // 600 × 240 px at 5 mm a pixel: 3.0 m × 1.2 m, within about a pixel of the drawing (clicks land on whole screen pixels)
    expect(Math.abs(Math.max(...xs) - Math.min(...xs) - 3.0)).toBeLessThan(1.5 * u.metresPerPixel);
    expect(Math.abs(Math.max(...ys) - Math.min(...ys) - 1.2)).toBeLessThan(1.5 * u.metresPerPixel);
  });

  it("after a reload the underlay and its scale are still there", async () => {
    const before = await page.getByTestId("underlay-mpp").getAttribute("data-mpp");
    await page.reload();
    await page.getByTestId("version-bar").waitFor();
    await page.getByTestId("underlay-controls").waitFor();
    expect(await page.getByTestId("underlay-mpp").getAttribute("data-mpp")).toBe(before);
    expect(await page.getByTestId("underlay-scale").textContent()).toContain("from 2.0 m between two marks");
    expect(await page.getByTestId("underlay-locked").isChecked()).toBe(true);
    await page.waitForTimeout(300);
    await shot(page, "uploads-04-reloaded");
    // the drawing shows through the traced body: its circle (a pump's suction) is darker than the body around it
    const circle = await colourAt(page, await pixelOnPage(page, [MARKED.skid.x + 60, MARKED.skid.y + 120]));
    const inside = await colourAt(page, await pixelOnPage(page, [MARKED.skid.x + 120, MARKED.skid.y + 120]));
    expect(inside[0] - circle[0]).toBeGreaterThan(25);
  });

  it("a viewer sees the drawing read-only; someone outside the workspace gets 404 for the file", async () => {
    const viewer = await signInAs(cast.viewer);
    contexts.push(viewer.ctx);
    await openEditor(viewer.page, sketchId);
    await viewer.page.getByTestId("read-only-note").waitFor();
    expect(await viewer.page.getByTestId("read-only-note").textContent()).toContain("Read only — your role may not edit");
    expect(await viewer.page.getByTestId("tray-body").count()).toBe(0);
    expect(await viewer.page.getByTestId("underlay-calibrate").isDisabled()).toBe(true);
    expect((await viewer.page.request.get(`${BASE_URL}/api/uploads/${uploadId}`)).status()).toBe(200);
    // dragging on the drawing changes nothing
    const canvas = (await viewer.page.getByTestId("sketch-canvas").boundingBox())!;
    await dragFromTo(viewer.page, { x: canvas.x + canvas.width / 2, y: canvas.y + canvas.height / 2 }, { x: canvas.x + canvas.width / 2 + 80, y: canvas.y + canvas.height / 2 + 40 });
    expect(await viewer.page.getByTestId("undo").isDisabled()).toBe(true);
    await shot(viewer.page, "uploads-05-viewer");

    const outsider = await signInAs(cast.outsider);
    contexts.push(outsider.ctx);
    for (const path of [`/api/uploads/${uploadId}`, `/api/uploads/${uploadId}/thumbnail`]) {
      const res = await outsider.page.request.get(`${BASE_URL}${path}`);
      expect(res.status()).toBe(404);
      expect((await res.json()).error.code).toBe("not_found");
    }
  });

  it("a checker attaches a photo to a comment and sees its thumbnail", async () => {
    const checker = await signInAs(cast.checker);
    contexts.push(checker.ctx);
    const p = checker.page;
    await p.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}/versions/2`);
    await p.getByLabel("New comment").fill("The foot as built, from site:");
    await p.getByTestId("new-comment-files").setInputFiles({ name: "foot as built.png", mimeType: "image/png", buffer: await png(900, 600, "#8fa3b5") });
    await p.getByRole("button", { name: "Comment", exact: true }).click();
    const thumb = p.getByTestId("thread-1").getByTestId("attachment");
    await thumb.waitFor();
    expect(await thumb.textContent()).toContain("foot as built.png");
    const href = await thumb.getByRole("link").getAttribute("href");
    const img = thumb.getByRole("img");
    await p.waitForFunction((el) => (el as HTMLImageElement).complete && (el as HTMLImageElement).naturalWidth > 0, await img.elementHandle());
    expect(await img.evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBe(320);
    const full = await p.request.get(`${BASE_URL}${href}`);
    expect(full.status()).toBe(200);
    expect(full.headers()["content-type"]).toBe("image/png");
    await shot(p, "uploads-06-attachment");
  });
});
