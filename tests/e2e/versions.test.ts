// Versions in Chromium: an editor saves a scratch sketch into a workspace (v1) and a change (v2)
// and sees the history; a checker reads but cannot save; a viewer has no way to edit; an
// outsider gets the not-found page; two people saving on the same version meet the conflict
// dialog, and "save as a fork" keeps the second person's work.
import { randomBytes } from "node:crypto";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PASSWORD } from "../api/helpers";
import { BASE_URL, openBrowser, shot } from "./browser";
import { makeCast, openEditor, retitle, saveVersion, signInAs, type Cast } from "./versions-helpers";

const tag = randomBytes(3).toString("hex");

describe("versioned sketches in the browser", () => {
  let cast: Cast;
  let ws = "";
  let sketchId = "";
  const open: BrowserContext[] = [];
  const as = async (who: keyof Cast): Promise<Page> => {
    const s = await signInAs(cast[who]);
    open.push(s.ctx);
    return s.page;
  };

  beforeAll(async () => {
    ({ cast, ws } = await makeCast(tag, { editor: "Eddie Drafter", owner: "Olive Lead" }));
  });
  afterAll(async () => {
    for (const c of open) await c.close();
  });

  it("saves the scratch sketch into a workspace as v1, then a change as v2, and shows the history", async () => {
    const page = await as("editor");
    await page.goto(`${BASE_URL}/workspaces/${ws}`);
    await page.getByRole("link", { name: "Start a sketch" }).click();
    await page.waitForURL(/\/sketches\/new\?workspace=/);
    await page.getByTestId("menu-examples").click();
    await page.getByTestId("menu-example-pipe-bend-anchor").click();
    await page.getByTestId("save-to-workspace").click();
    const dialog = page.getByTestId("scratch-save-dialog");
    await dialog.locator(`option[value="${ws}"]`).waitFor({ state: "attached" });
    expect(await dialog.getByLabel("Workspace").inputValue()).toBe(ws);
    await dialog.getByLabel("Title").fill(`Bend on anchor ${tag}`);
    await shot(page, "versions-01-save-scratch");
    await dialog.getByRole("button", { name: "Save as version 1" }).click();
    await page.waitForURL(/\/sketches\/[0-9a-f-]{36}$/);
    sketchId = page.url().split("/").pop()!;
    await page.getByTestId("version-bar").waitFor();
    expect(await page.getByTestId("version-label").textContent()).toBe("v1");

    await retitle(page, `Bend at hydrotest ${tag}`);
    expect(await page.getByTestId("version-label").textContent()).toContain("unsaved");
    await page.getByTestId("save-version").click();
    await page.getByTestId("save-dialog").getByLabel("What changed").fill("Hydrotest case: 9 bar at the inlet");
    await shot(page, "versions-02-save-dialog");
    await page.getByTestId("save-dialog").getByRole("button", { name: "Save v2" }).click();
    await page.getByText("✓ saved").waitFor();
    expect(await page.getByTestId("version-label").textContent()).toBe("v2✓ saved");
    await shot(page, "versions-03-saved-v2");

    await page.getByRole("link", { name: "History" }).click();
    await page.waitForURL(new RegExp(`/workspaces/${ws}/sketches/${sketchId}$`));
    await page.getByTestId("version-row-2").waitFor();
    expect(await page.getByTestId("version-row-2").textContent()).toContain("Hydrotest case: 9 bar at the inlet");
    expect(await page.getByTestId("version-row-2").textContent()).toContain("Eddie Drafter");
    expect(await page.getByTestId("version-row-1").textContent()).toContain("First version");
    await shot(page, "versions-04-history");

    await page.goto(`${BASE_URL}/workspaces/${ws}`);
    // the drawing's title changed in v2, and the sketch took it as its name
    const row = page.getByTestId(`sketch-row-Bend at hydrotest ${tag}`);
    await row.waitFor();
    expect(await row.textContent()).toContain("v2");
    expect(await row.textContent()).toContain("holds");
    await shot(page, "versions-05-dashboard");
  });

  it("unsaved changes survive a reload: kept in the browser, offered back, restored", async () => {
    const page = await as("editor");
    await openEditor(page, sketchId);
    await retitle(page, "Bend, before the reload");
    expect(await page.getByTestId("version-label").textContent()).toContain("unsaved");
    // the tab is reloaded (or closed and opened again) before anything is saved
    page.on("dialog", (d) => void d.accept());
    await page.waitForTimeout(800);
    await page.reload();
    await page.getByTestId("kept-work").waitFor();
    expect(await page.getByTestId("kept-work").textContent()).toContain("Made on v2");
    expect(await page.getByTestId("sketch-form").getByLabel("Title").inputValue()).toBe(`Bend at hydrotest ${tag}`);
    await shot(page, "versions-05b-kept-after-reload");
    await page.getByRole("link", { name: "Bring them back" }).click();
    await page.getByTestId("restored-work").waitFor();
    expect(await page.getByTestId("sketch-form").getByLabel("Title").inputValue()).toBe("Bend, before the reload");
    // discarded, then a change taken back to the version as saved: nothing is kept, and the
    // next visit offers nothing
    await page.goto(`${BASE_URL}/sketches/${sketchId}`);
    await page.getByTestId("kept-work").getByRole("button", { name: "Discard" }).click();
    await retitle(page, "Bend, a passing thought");
    await page.waitForTimeout(800);
    await retitle(page, `Bend at hydrotest ${tag}`);
    await page.waitForTimeout(800);
    await page.reload();
    await page.getByTestId("version-bar").waitFor();
    await page.waitForTimeout(600);
    expect(await page.getByTestId("kept-work").count()).toBe(0);
  });

  it("a signed-out reader of a link (a review mail's) signs in and lands on that very page", async () => {
    const ctx = await openBrowser();
    open.push(ctx);
    const page = await ctx.newPage();
    const history = `/workspaces/${ws}/sketches/${sketchId}`;
    await page.goto(`${BASE_URL}${history}?tab=versions`);
    await page.waitForURL(/\/sign-in\?next=/);
    expect(new URL(page.url()).searchParams.get("next")).toBe(`${history}?tab=versions`);
    await page.getByLabel("E-mail address").fill(cast.checker.email);
    await page.getByLabel("Password", { exact: true }).fill(PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => u.pathname === history);
    await page.getByTestId("version-row-2").waitFor();
    // the editor's own sign-in link comes back to the sketch too
    await ctx.clearCookies();
    await page.goto(`${BASE_URL}/sketches/${sketchId}`);
    const link = page.getByRole("link", { name: "Sign in" });
    await link.waitFor();
    expect(await link.getAttribute("href")).toBe(`/sign-in?next=${encodeURIComponent(`/sketches/${sketchId}`)}`);
  });

  it("a checker reads the sketch but cannot save a version", async () => {
    const page = await as("checker");
    await page.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}`);
    await page.getByTestId("version-row-2").waitFor();
    expect(await page.getByRole("button", { name: "Edit details" }).count()).toBe(0);
    await page.getByRole("link", { name: "Open (read only)" }).click();
    await page.getByTestId("version-bar").waitFor();
    expect(await page.getByTestId("read-only").textContent()).toBe("Read only · checker");
    expect(await page.getByTestId("save-version").count()).toBe(0);
    await page.keyboard.press("ControlOrMeta+s");
    await page.getByTestId("notice").getByText("Not saved: as checker").waitFor();
    expect(await page.getByTestId("save-dialog").count()).toBe(0);
    await shot(page, "versions-06-checker-read-only");
  });

  it("a viewer has no way to edit or save", async () => {
    const page = await as("viewer");
    await page.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}`);
    await page.getByTestId("version-row-2").waitFor();
    for (const name of ["Edit details", "Delete"]) expect(await page.getByRole("button", { name, exact: true }).count()).toBe(0);
    // forking is still open to them: into their own personal workspace, where they are the owner
    await page.getByRole("button", { name: "Fork", exact: true }).click();
    const fork = page.getByTestId("fork-dialog");
    await fork.locator("option").first().waitFor({ state: "attached" });
    expect(await fork.getByLabel("Into the workspace").locator("option").allTextContents()).toEqual([expect.stringContaining("(personal)")]);
    await fork.getByRole("button", { name: "Cancel" }).click();
    await openEditor(page, sketchId);
    expect(await page.getByTestId("read-only").textContent()).toBe("Read only · viewer");
    expect(await page.getByTestId("save-version").count()).toBe(0);
  });

  it("an outsider gets the not-found page and an editor that cannot open the sketch", async () => {
    const page = await as("outsider");
    const res = await page.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}`);
    expect(res?.status()).toBe(404);
    await page.getByText("No such sketch here").waitFor();
    expect(await page.content()).not.toContain(`hydrotest ${tag}`);
    // the editor's own address answers 404 too, with the same words (the check is on the server)
    expect((await page.goto(`${BASE_URL}/sketches/${sketchId}`))?.status()).toBe(404);
    await page.getByTestId("unavailable-message").waitFor();
    expect(await page.getByTestId("unavailable-message").textContent()).toContain("you are not a member of its workspace");
    // signed in already: the way on is their workspaces (the sign-in page would send them back here)
    expect(await page.getByRole("link", { name: "Your workspaces" }).getAttribute("href")).toBe("/workspaces");
    expect(await page.getByRole("link", { name: "Sign in" }).count()).toBe(0);
    expect((await page.goto(`${BASE_URL}/sketches/not-a-sketch`))?.status()).toBe(404);
    await page.getByTestId("unavailable-message").waitFor();
    await shot(page, "versions-07-outsider");
  });

  it("an address that names nothing answers 404 with words for what is missing; one that names something answers 200", async () => {
    const page = await as("owner");
    const base = `${BASE_URL}/workspaces/${ws}`;
    const nobody = "00000000-0000-4000-8000-000000000000";
    const status = async (path: string) => (await page.goto(`${base}${path}`))?.status();
    for (const path of ["", "/members", `/sketches/${sketchId}`, `/sketches/${sketchId}/versions/2`, `/sketches/${sketchId}/compare?from=1&to=2`]) {
      expect([path, await status(path)]).toEqual([path, 200]);
    }
    expect(await status(`/sketches/${nobody}`)).toBe(404);
    await page.getByText("No such sketch here").waitFor();
    // the workspace's tabs stay: it is only the sketch that is missing
    await page.getByRole("link", { name: "Members" }).waitFor();
    expect(await status(`/sketches/${sketchId}/versions/9`)).toBe(404);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("No version v9 of this sketch");
    expect(await status(`/sketches/${sketchId}/compare?from=abc&to=7`)).toBe(404);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("No versions “abc” and v7 of this sketch");
    expect((await page.goto(`${BASE_URL}/workspaces/${nobody}`))?.status()).toBe(404);
    await page.getByText("No such workspace here").waitFor();
    expect((await page.goto(`${BASE_URL}/workspaces/not-a-workspace/sketches/${sketchId}`))?.status()).toBe(404);
    await page.getByText("No such sketch here").waitFor();

    // signed out: still sent to sign in and back, never told what exists
    const anon = await openBrowser();
    open.push(anon);
    const stranger = await anon.newPage();
    const res = await stranger.goto(`${base}/sketches/${sketchId}/versions/9`);
    expect(res?.status()).toBe(200);
    expect(new URL(stranger.url()).pathname).toBe("/sign-in");
    expect(new URL(stranger.url()).searchParams.get("next")).toBe(`/workspaces/${ws}/sketches/${sketchId}/versions/9`);
  });

  it("two people saving on v2: the second meets the conflict dialog and keeps the work as a fork", async () => {
    const lead = await as("owner");
    const drafter = await as("editor");
    await openEditor(lead, sketchId);
    await openEditor(drafter, sketchId);

    await retitle(lead, "Bend, lead's revision");
    await saveVersion(lead, "Anchor block enlarged");
    await lead.getByText("✓ saved").waitFor();

    await retitle(drafter, "Bend, drafter's revision");
    await saveVersion(drafter, "Thicker wall at the outlet");
    const conflict = drafter.getByTestId("conflict-dialog");
    await conflict.waitFor();
    expect(await conflict.textContent()).toContain("Olive Lead saved v3");
    expect(await conflict.textContent()).toContain("Anchor block enlarged");
    await shot(drafter, "versions-08-conflict");

    await conflict.getByRole("button", { name: "Save as a fork" }).click();
    const fork = drafter.getByTestId("fork-dialog");
    await fork.getByLabel("Title of the fork").fill(`Drafter's bend ${tag}`);
    await shot(drafter, "versions-09-fork-dialog");
    await fork.getByRole("button", { name: "Fork" }).click();
    await drafter.waitForURL((u) => /\/sketches\/[0-9a-f-]{36}$/.test(u.pathname) && !u.pathname.endsWith(sketchId));
    await drafter.getByTestId("version-bar").waitFor();
    expect(await drafter.getByTestId("version-label").textContent()).toBe("v2");
    // the drawing takes the name just given to the fork
    expect(await drafter.getByTestId("sketch-form").getByLabel("Title").inputValue()).toBe(`Drafter's bend ${tag}`);

    await drafter.getByRole("link", { name: "History" }).click();
    await drafter.getByTestId("forked-from").waitFor();
    expect(await drafter.getByTestId("forked-from").textContent()).toContain(`Bend, lead's revision v2`);
    expect(await drafter.getByTestId("version-row-2").textContent()).toContain("Thicker wall at the outlet");
    await shot(drafter, "versions-10-fork-history");

    // the original is untouched by the drafter: v3 is the lead's
    await lead.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}`);
    await lead.getByTestId("version-row-3").waitFor();
    expect(await lead.getByTestId("version-row-3").textContent()).toContain("Anchor block enlarged");
    expect(await lead.getByTestId("version-row-4").count()).toBe(0);
  });

  it("reload and compare, then bring the kept work back: the colleague's newer save stays, and so do yours", async () => {
    const lead = await as("owner");
    const drafter = await as("editor");
    await openEditor(lead, sketchId);
    await openEditor(drafter, sketchId);
    // nothing changed yet: no empty version, and the status line says why
    await lead.getByTestId("save-version").click();
    await lead.getByTestId("notice").filter({ hasText: "Nothing to save: the sketch is as v3 has it." }).waitFor();
    expect(await lead.getByTestId("save-dialog").count()).toBe(0);

    // the lead renames and saves v4; the drafter, still on v3, writes the notes
    await retitle(lead, "Bend, lead's second revision");
    await saveVersion(lead, "Renamed for the tender");
    await lead.getByText("✓ saved").waitFor();
    await drafter.keyboard.press("Escape");
    const notes = drafter.getByTestId("sketch-form").getByLabel("Notes");
    await notes.fill("Wall thickness checked at the outlet weld.");
    await notes.press("Tab");
    await saveVersion(drafter, "Notes on the outlet weld");
    const conflict = drafter.getByTestId("conflict-dialog");
    await conflict.waitFor();
    await conflict.getByRole("button", { name: "Reload and compare" }).click();

    await drafter.getByTestId("kept-work").waitFor();
    await drafter.getByRole("link", { name: /Compare v4 with them/ }).click();
    await drafter.getByText(/your kept changes \(made on v3, brought onto v4\)/).first().waitFor();
    await drafter.getByRole("link", { name: "Bring my changes back on top of the newest version" }).click();
    await drafter.getByTestId("restored-work").waitFor();
    expect(await drafter.getByTestId("restored-work").textContent()).toContain("back on top of v4; what was saved since v3 is kept too");
    const form = drafter.getByTestId("sketch-form");
    expect(await form.getByLabel("Title").inputValue()).toBe("Bend, lead's second revision");
    expect(await form.getByLabel("Notes").inputValue()).toBe("Wall thickness checked at the outlet weld.");
    await shot(drafter, "versions-11-kept-work-merged");
  });
  it("the lead makes v2 the latest again from the history: a new version with v2's drawing, the sketch's name kept", async () => {
    const lead = await as("owner");
    await lead.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}`);
    await lead.getByTestId("version-row-2").waitFor();
    const before = (await (await lead.request.get(`${BASE_URL}/api/sketches/${sketchId}`)).json()).sketch;
    const next = before.latestVersion + 1;
    await lead.getByRole("button", { name: "Restore version 2" }).click();
    const dialog = lead.getByTestId("restore-dialog");
    expect(await dialog.getByTestId("restore-what").textContent()).toContain(`saved as a new version, v${next}, on top of v${before.latestVersion}`);
    await dialog.getByLabel("Why (the new version's message)").fill("Back to v2 for the tender");
    await dialog.getByRole("button", { name: `Save as v${next}` }).click();
    await lead.getByTestId("restored-notice").waitFor();
    await lead.getByTestId(`version-row-${next}`).waitFor();
    expect(await lead.getByTestId(`version-row-${next}`).textContent()).toContain("Back to v2 for the tender");
    await shot(lead, "versions-12-restored");
    const version = async (n: number) => (await (await lead.request.get(`${BASE_URL}/api/sketches/${sketchId}/versions/${n}`)).json()).version;
    const [v2, made] = [await version(2), await version(next)];
    // the same drawing as v2, under the name the sketch has now
    expect({ ...made.document, title: v2.document.title }).toEqual(v2.document);
    expect(made.document.title).toBe(before.title);
    expect(made.largestReaction).toBe(v2.largestReaction);
  });
});
