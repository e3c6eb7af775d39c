// Design studies in Chromium: two operating cases run at once with the governing case of each
// support; a sweep with its plot, the crossing and the limit found; the calc sheet downloaded
// from the saved version.
import { readFileSync } from "node:fs";
import type { Page } from "playwright-core";
import { beforeAll, describe, expect, it } from "vitest";
import { createSketch } from "@/lib/sketches";
import { parseSketch, solveCases } from "@/solver";
import { shot, BASE_URL } from "./browser";
import { browsersClosedAfterAll } from "./session";
import { makeCast, openEditor, saveVersion, type Cast } from "./versions-helpers";

const tag = Date.now().toString(36).slice(-5);
const trailer = () => JSON.parse(readFileSync("tests/fixtures/sketches/fire-monitor-trailer.json", "utf8"));

describe("design studies", () => {
  let cast: Cast;
  let ws: string;
  let sketchId: string;
  const browsers = browsersClosedAfterAll();
  let page: Page;

  beforeAll(async () => {
    ({ cast, ws } = await makeCast(`studies-${tag}`, { editor: "Ines Study" }));
    const parsed = parseSketch(trailer());
    if (!parsed.ok) throw new Error("fixture");
    const made = await createSketch(ws, cast.editor, { title: `Monitor trailer ${tag}`, document: parsed, message: "as surveyed" });
    sketchId = made.sketch.id;
    page = await browsers.signIn(cast.editor);
  });

  it("adds two cases, runs them and shows the governing case", async () => {
    await openEditor(page, sketchId);
    await page.getByRole("tab", { name: "Cases" }).click();
    await page.getByRole("button", { name: "Add a case" }).click();
    await page.getByRole("button", { name: "Add a case" }).click();
    const changes = page.getByRole("textbox", { name: /Parameter changes of/ });
    await changes.nth(0).fill("theta = 15 deg");
    await changes.nth(0).press("Enter");
    await changes.nth(1).fill("theta = 60 deg");
    await changes.nth(1).press("Enter");
    const names = page.getByRole("textbox", { name: /Name of case/ });
    await names.nth(0).fill("Low forward throw");
    await names.nth(0).press("Enter");
    await names.nth(1).fill("High throw");
    await names.nth(1).press("Enter");
    await page.getByRole("button", { name: "Run all cases" }).click();
    const table = page.getByTestId("case-reactions");
    await table.waitFor();
    // independently: the same cases solved here
    const doc = trailer();
    doc.cases = [
      { id: "normal-operation", name: "Low forward throw", parameters: { theta: "15 deg" } },
      { id: "case-2", name: "High throw", parameters: { theta: "60 deg" } },
    ];
    const p = parseSketch(doc);
    if (!p.ok) throw new Error();
    const study = solveCases(p.file);
    for (const [support, env] of Object.entries(study.envelope)) {
      const caseName = study.runs.find((r) => r.id === env.design.case)!.name;
      // rows name the supports by their labels
      const label = p.file.supports.find((s) => s.id === support)!.label || support;
      const row = table.locator("tr", { has: page.locator("td[data-col=support]", { hasText: new RegExp(`^${label.replace(/[()]/g, "\\$&")}$`) }) }).filter({ hasText: "design load" });
      // each case heads its group of rows (the table fits the panel without a Case column)
      expect(await row.getAttribute("data-group")).toBe(caseName);
    }
    // the jack lifts in the low throw, and bears in the high one
    expect(await table.locator('tr[data-group="Low forward throw"]').filter({ hasText: "jack" }).locator("td[data-col=state]").textContent()).toBe("lifts");
    expect(await page.getByTestId("stability").textContent()).toMatch(/overturning/);
    await shot(page, "studies-01-cases");
  });

  it("runs a sweep of the throw angle, marks where the jack lifts and finds the limit", async () => {
    await page.getByRole("tab", { name: "Sweep" }).click();
    await page.getByRole("combobox", { name: "Parameter to sweep" }).selectOption("theta");
    await page.getByRole("textbox", { name: "From" }).fill("0");
    await page.getByRole("textbox", { name: "To" }).fill("80");
    await page.getByRole("textbox", { name: "Points" }).fill("161");
    await page.getByRole("button", { name: "Run the sweep" }).click();
    const crossings = page.getByTestId("crossings");
    await crossings.waitFor();
    expect(await crossings.textContent()).toMatch(/margin at front jack crosses zero between theta = 18 and 18\.5 deg/);
    expect(await page.getByTestId("sweep-chart").locator("path.recharts-curve").count()).toBeGreaterThan(0);
    await page.getByRole("combobox", { name: "Quantity for the limit" }).selectOption({ label: "margin at front jack" });
    await page.getByRole("button", { name: "Find" }).click();
    const answer = page.getByTestId("limit-answer");
    await answer.waitFor();
    expect(await answer.textContent()).toMatch(/^The margin at front jack reaches 0 kN at theta = 18\.1\d deg \(to 4 significant figures\)\.$/);
    // the same search in every case, in the page's worker: both cases set theta, which the sweep's
    // values stand in for, so both lift where the sketch does: equal first, and both are named
    await page.getByRole("button", { name: "In every case" }).click();
    const every = page.getByTestId("limit-everywhere");
    await every.waitFor();
    const rows = await every.locator("tbody tr").allTextContents();
    expect(rows).toHaveLength(2);
    for (const r of rows) expect(r).toMatch(/theta = 18\.1\d+ deg/);
    expect(await every.getByRole("status").textContent()).toMatch(/^The margin at front jack reaches 0 kN first in Low forward throw and High throw: equal first, each at theta = 18\.1\d deg\.$/);
    // hover shows the values
    const chart = page.getByTestId("sweep-chart");
    await chart.scrollIntoViewIfNeeded();
    const box = await chart.boundingBox();
    await page.mouse.move(box!.x + box!.width * 0.45, box!.y + box!.height * 0.4);
    await page.mouse.move(box!.x + box!.width * 0.5, box!.y + box!.height * 0.4, { steps: 5 });
    await page.locator(".recharts-tooltip-wrapper").filter({ hasText: "theta =" }).waitFor();
    expect(await page.locator(".recharts-tooltip-wrapper").textContent()).toMatch(/margin at front jack : [−\d.,]+ kN/);
    await shot(page, "studies-02-sweep");
    await page.getByRole("button", { name: "Keep on the calc sheet" }).click();
  });

  it("saves the version and downloads its calc sheet", async () => {
    await saveVersion(page, "low and high throw cases, angle sweep");
    await page.getByText("✓ saved").waitFor();
    await page.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}/versions/2`);
    // the kept sweep is plotted on the version's page too, with the limit finder's crossing
    const kept = page.getByTestId("version-sweeps");
    await kept.getByTestId("sweep-chart").waitFor();
    expect(await kept.textContent()).toMatch(/theta from 0 to 80 deg — as drawn.*Crossing: front jack: lift-off \(its normal force reaches zero\) at theta = 18\.1\d deg \(to 4 significant figures\)\./);
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Calc sheet (PDF)" }).click()]);
    expect(download.suggestedFilename()).toBe(`Monitor-trailer-${tag}-v2-calc-sheet-SI.pdf`);
    const path = await download.path();
    const bytes = readFileSync(path!);
    expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
    const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
    const pdf = await pdfjs.getDocument({ data: new Uint8Array(bytes), isEvalSupported: false }).promise;
    let text = "";
    for (let i = 1; i <= pdf.numPages; i++) text += (await (await pdf.getPage(i)).getTextContent()).items.map((it) => ("str" in it ? it.str : "")).join(" ");
    expect(text).toContain(`Monitor trailer ${tag}`);
    expect(text).toContain("Low forward throw");
    expect(text).toContain("Sweep of theta");
    expect(text).toMatch(/Prepared by\s+Ines Study/);
    await shot(page, "studies-03-version-page");
    // in US customary units: the version's table, and a calc sheet in lbf
    await page.getByTestId("version-units").getByRole("radio", { name: "US" }).click();
    await page.waitForFunction(() => /lbf|kip/.test(document.querySelector("[data-testid=version-reactions]")?.textContent ?? ""));
    expect(await page.getByRole("link", { name: "Calc sheet (PDF)" }).getAttribute("href")).toMatch(/units=US$/);
    await page.getByTestId("version-units").getByRole("radio", { name: "SI" }).click();
  });
});
