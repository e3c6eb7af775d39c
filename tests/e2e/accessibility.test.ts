// Accessibility in Chromium: axe-core, run inside each main screen against the WCAG 2.1 A and AA
// rules, finds no serious or critical violation. Screens are checked once they have drawn their
// data (a sketch with two versions, a workspace with it), signed in where the screen needs it.
import { randomBytes } from "node:crypto";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSketch, saveVersion } from "@/lib/sketches";
import { addComment, resolveThread } from "@/lib/review/comments";
import { parseSketch } from "@/solver";
import { makeWorkspace } from "../api/helpers";
import { fixture } from "../api/sketch-fixtures";
import { seriousViolations } from "./axe";
import { BASE_URL, openBrowser, shot } from "./browser";
import { makeCast, signInAs, type Cast } from "./versions-helpers";

const tag = randomBytes(3).toString("hex");

async function expectAccessible(page: Page, name: string, rules?: string[]): Promise<void> {
  await page.waitForLoadState("networkidle");
  // the page settles (fonts, transitions) before colours are measured
  await page.evaluate(() => document.fonts.ready);
  const found = await seriousViolations(page, rules);
  if (found.length) await shot(page, `a11y-${name}`);
  expect(found, `${name}:\n${found.join("\n")}`).toEqual([]);
}

function parsed(doc: unknown) {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error("fixture does not parse");
  return p;
}

describe("main screens meet WCAG 2.1 AA (no serious or critical axe findings)", () => {
  let cast: Cast;
  let ws = "";
  let sketchId = "";
  let singleId = "";
  let anon: BrowserContext;
  let owner: Page;
  const contexts: BrowserContext[] = [];

  beforeAll(async () => {
    ({ cast, ws } = await makeCast(tag, { owner: "Ada Lead", editor: "Ed Drafter" }));
    const v1 = fixture("pump-skid-discharge");
    const made = await createSketch(ws, cast.editor, { title: `Skid ${tag}`, document: parsed(v1), message: "As drawn" });
    sketchId = made.sketch.id;
    await saveVersion(sketchId, cast.editor, { baseVersion: 1, message: "Duty flow 12 → 15 kg/s", document: parsed({ ...v1, parameters: { mdot: "15 kg/s" } }) });
    singleId = (await createSketch(ws, cast.editor, { title: `Bend ${tag}`, document: parsed(fixture("pipe-bend-anchor")), message: "As drawn" })).sketch.id;
    // a review under way on v2: a resolved thread with a mention, and an open one (their faded and plain looks both read)
    const asked = await addComment(sketchId, 2, cast.checker, { body: "@Ed Drafter is the discharge bend's **flange** rated for 15 kg/s?" });
    await addComment(sketchId, 2, cast.editor, { body: "Yes, PN16.", parentId: asked.id });
    await resolveThread(asked.id, cast.checker, true);
    await addComment(sketchId, 2, cast.checker, { body: "Please add the bearer packing to the notes." });
    anon = await openBrowser();
    contexts.push(anon);
    const s = await signInAs(cast.owner);
    contexts.push(s.ctx);
    owner = s.page;
  });
  afterAll(async () => {
    for (const c of contexts) await c.close();
  });

  it("the home page", async () => {
    const page = await anon.newPage();
    await page.goto(`${BASE_URL}/`);
    await page.getByRole("heading", { level: 1 }).waitFor();
    await expectAccessible(page, "home");
  });

  it("sign-in and sign-up", async () => {
    const page = await anon.newPage();
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByLabel("E-mail address").waitFor();
    await expectAccessible(page, "sign-in");
    await page.goto(`${BASE_URL}/sign-up`);
    await page.getByLabel("E-mail address").waitFor();
    await expectAccessible(page, "sign-up");
  });

  it("the editor with an example open", async () => {
    const page = await anon.newPage();
    await page.goto(`${BASE_URL}/sketches/new?example=pump-skid`);
    await page.getByTestId("sketch-canvas").locator("canvas").first().waitFor();
    await page.getByTestId("status-sentence").first().waitFor();
    await expectAccessible(page, "editor");
    // the drawing has a name and points to its text alternatives: what is drawn and the result in
    // words, then the element list
    const canvas = page.getByRole("application", { name: "Drawing of the free-body diagram" });
    expect(await canvas.getAttribute("aria-describedby")).toBe("canvas-summary canvas-alt canvas-help");
    await expect.poll(() => page.locator("#canvas-summary").textContent()).toMatch(/^Body skid \(Pump skid\), with Contact rear \(rear bearer\), .*Result: /);
    expect(await page.locator("#canvas-alt").textContent()).toContain("listed under Elements");
    await page.getByRole("list", { name: "Elements of the sketch" }).getByRole("button", { name: "Body skid, Pump skid" }).waitFor();
  });

  it("the editor with a long reactions table (its panel scrolls, and the keyboard reaches it) and on a phone (its narrow words name its controls; headings in order)", async () => {
    const page = await anon.newPage();
    await page.setViewportSize({ width: 1280, height: 800 });
    await page.goto(`${BASE_URL}/sketches/new?example=fire-monitor-trailer`);
    await page.getByTestId("status-sentence").first().waitFor();
    await expectAccessible(page, "editor-long-table");
    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByRole("button", { name: "Open an example" }).waitFor();
    expect((await page.getByTestId("menu-examples").innerText()).replace("▾", "").trim()).toBe("Example");
    for (const tab of ["Reactions", "Hand check", "Cases", "Sweep"]) {
      await page.getByRole("tab", { name: tab }).click();
      await page.getByRole("tab", { name: tab, selected: true }).waitFor();
      await expectAccessible(page, `editor-phone-${tab}`);
      await expectAccessible(page, `editor-phone-${tab}-headings`, ["heading-order"]);
    }
  });

  it("the workspace dashboard, signed in", async () => {
    await owner.goto(`${BASE_URL}/workspaces/${ws}`);
    await owner.getByTestId(`sketch-row-Skid ${tag}`).waitFor();
    await expectAccessible(owner, "dashboard");
  });

  it("a sketch with its history", async () => {
    await owner.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}`);
    await owner.getByTestId("version-row-2").waitFor();
    await expectAccessible(owner, "history");
  });

  it("a version page, with a resolved thread and an open one", async () => {
    await owner.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}/versions/2`);
    await owner.getByTestId("review-drawing").waitFor();
    await owner.getByText(`resolved by ${cast.checker.name}`).waitFor();
    await owner.getByText("Please add the bearer packing").waitFor();
    await expectAccessible(owner, "version");
  });

  it("the compare page", async () => {
    await owner.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}/compare?from=1&to=2`);
    await owner.getByTestId("compare-summary").waitFor();
    await expectAccessible(owner, "compare");
  });

  it("the members page", async () => {
    await owner.goto(`${BASE_URL}/workspaces/${ws}/members`);
    await owner.getByRole("cell", { name: cast.viewer.email, exact: true }).waitFor();
    await expectAccessible(owner, "members");
  });

  it("every signed-in page fits a phone's width (390 px): tables scroll inside their boxes, the page never sideways", async () => {
    await owner.setViewportSize({ width: 390, height: 844 });
    try {
      const pages = ["", "/members", "/audit", `/sketches/${sketchId}`, `/sketches/${sketchId}/versions/2`, `/sketches/${sketchId}/compare?from=1&to=2`].map((p) => `${BASE_URL}/workspaces/${ws}${p}`);
      for (const url of [...pages, `${BASE_URL}/account`, `${BASE_URL}/workspaces`]) {
        await owner.goto(url);
        await owner.waitForLoadState("networkidle");
        const wide = await owner.evaluate(() => document.documentElement.scrollWidth);
        if (wide > 390) await shot(owner, "phone-too-wide");
        expect(wide, url).toBeLessThanOrEqual(390);
      }
      // on a phone the history keeps each version's status under its message
      await owner.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}`);
      await owner.getByTestId("version-row-2").getByTestId("version-row-summary").waitFor();
      // the first Tab stop skips the header to the page's content
      await owner.keyboard.press("Tab");
      expect(await owner.evaluate(() => document.activeElement?.textContent)).toBe("Skip to the content");
    } finally {
      await owner.setViewportSize({ width: 1440, height: 900 });
    }
  });

  it("the account page", async () => {
    await owner.goto(`${BASE_URL}/account`);
    await owner.getByRole("heading", { level: 1 }).waitFor();
    await expectAccessible(owner, "account");
    // the header's two menus keep the names people and tests find them by
    expect(await owner.getByRole("button", { name: "Account: Ada Lead" }).count()).toBe(1);
    await owner.goto(`${BASE_URL}/workspaces/${ws}`);
    expect(await owner.getByRole("button", { name: `Workspace: Pier ${tag} pump station. Switch workspace` }).count()).toBe(1);
  });

  it("empty and error states are designed pages, and accessible too", async () => {
    const empty = await makeWorkspace(`Empty ${tag}`, [[cast.owner, "owner"]]);
    await owner.goto(`${BASE_URL}/workspaces/${empty}`);
    await owner.getByText("No sketches saved here yet").waitFor();
    await expectAccessible(owner, "dashboard-empty");

    const single = `${BASE_URL}/workspaces/${ws}/sketches/${singleId}`;
    await owner.goto(`${single}/compare`);
    await owner.getByTestId("nothing-to-compare").getByText("Only one version so far").waitFor();
    await expectAccessible(owner, "compare-one-version");

    await owner.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}/compare?from=abc&to=7`);
    expect(await owner.getByRole("heading", { level: 1 }).textContent()).toBe("No versions “abc” and v7 of this sketch");
    expect(await owner.getByTestId("no-such-version").textContent()).toContain("it has versions v1 to v2");
    await expectAccessible(owner, "compare-bad-query");

    await owner.goto(`${single}/versions/9`);
    expect(await owner.getByRole("heading", { level: 1 }).textContent()).toBe("No version v9 of this sketch");
    expect(await owner.getByRole("link", { name: "Review v1" }).getAttribute("href")).toBe(`/workspaces/${ws}/sketches/${singleId}/versions/1`);

    const page = await anon.newPage();
    const res = await page.goto(`${BASE_URL}/no-such-page`);
    expect(res?.status()).toBe(404);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("No page at this address");
    await expectAccessible(page, "not-found");
  });
});
