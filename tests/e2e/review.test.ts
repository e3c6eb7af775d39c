// Review in Chromium: the author submits v2; the checker pins a comment on a support (mentioning
// the owner) and returns it; the author saves v3 and submits it; the checker checks it; the
// owner approves it; v3 shows locked with the title block; the owner's mention mail is in the
// local mailbox.
import { randomBytes } from "node:crypto";
import type { Page } from "playwright-core";
import { beforeAll, describe, expect, it } from "vitest";
import { createSketch, saveVersion as saveVersionApi } from "@/lib/sketches";
import { fixture } from "../api/sketch-fixtures";
import { atViewport, BASE_URL, shot } from "./browser";
import { browsersClosedAfterAll } from "./session";
import { makeCast, openEditor, parsed, retitle, saveVersion, type Cast } from "./versions-helpers";

const tag = randomBytes(3).toString("hex");

describe("review of a calculation in the browser", () => {
  let cast: Cast;
  let ws = "";
  let sketchId = "";
  const pages = {} as Record<"editor" | "checker" | "owner", Page>;
  const browsers = browsersClosedAfterAll();
  const review = (n: number) => `${BASE_URL}/workspaces/${ws}/sketches/${sketchId}/versions/${n}`;
  const stepButton = (page: Page, step: string) => page.getByTestId(`signoff-${step}`);

  async function takeStep(page: Page, step: string, note?: string) {
    await stepButton(page, step).click();
    const dialog = page.getByTestId("signoff-dialog");
    if (note) await dialog.getByRole("textbox").fill(note);
    await dialog.locator("button[type=submit]").click();
    await dialog.waitFor({ state: "detached" });
  }

  beforeAll(async () => {
    ({ cast, ws } = await makeCast(tag, { editor: "Edda Preparer", checker: "Chet Checkley", owner: "Orla Approver" }));
    const v1 = fixture("pump-skid-discharge");
    const made = await createSketch(ws, cast.editor, { title: `Skid ${tag}`, document: parsed(v1), message: "As drawn" });
    sketchId = made.sketch.id;
    await saveVersionApi(sketchId, cast.editor, { baseVersion: 1, message: "Duty flow 12 → 15 kg/s", document: parsed({ ...v1, parameters: { mdot: "15 kg/s" } }) });
    for (const who of ["editor", "checker", "owner"] as const) pages[who] = await browsers.signIn(cast[who]);
  });

  it("the author submits v2 for checking", async () => {
    const page = pages.editor;
    await page.goto(review(2));
    await stepButton(page, "submit").waitFor();
    expect(await page.getByTestId("title-block-prepared").textContent()).toContain("Edda Preparer");
    await takeStep(page, "submit", "Ready for a check of the feet.");
    await page.locator('[data-review-state="submitted"]').first().waitFor();
    await shot(page, "review-01-submitted");
  });

  it("the checker pins a comment on a support, mentions the owner, and returns the version", async () => {
    const page = pages.checker;
    await page.goto(review(2));
    await stepButton(page, "return").waitFor();
    await page.getByRole("button", { name: "Pin to the drawing" }).click();
    await page.locator('[data-testid="review-drawing"] g[data-id="rear"]').click();
    expect(await page.getByTestId("new-comment-pin").textContent()).toBe("Pinned on rear foot");
    const box = page.getByLabel("New comment");
    await box.fill("Rear foot friction: is μ = 0.4 right on a wet slab? @Orla");
    // the list offers the match as the active option; Enter puts it in (the keyboard's way: no mouse)
    expect(await page.getByRole("option", { name: "@Orla Approver" }).getAttribute("aria-selected")).toBe("true");
    await box.press("Enter");
    expect(await box.inputValue()).toBe("Rear foot friction: is μ = 0.4 right on a wet slab? @Orla Approver ");
    await page.getByRole("button", { name: "Comment", exact: true }).click();
    const thread = page.getByTestId("thread-1");
    await thread.waitFor();
    expect(await thread.textContent()).toContain("on rear foot");
    expect(await thread.locator("[data-mention]").textContent()).toBe("@Orla Approver");
    await page.locator('[data-testid="review-drawing"] [data-thread]').first().waitFor();

    // a point of the drawing: on the ground line between the two feet, a little below the body
    await page.getByRole("button", { name: "Pin to the drawing" }).click();
    // (the mouse clicks in the window: the feet, and the ground under them, are brought into it first)
    await page.locator('[data-testid="review-drawing"] g[data-id="rear"]').evaluate((el) => el.scrollIntoView({ block: "center" }));
    const rear = (await page.locator('[data-testid="review-drawing"] g[data-id="rear"]').boundingBox())!;
    const front = (await page.locator('[data-testid="review-drawing"] g[data-id="front"]').boundingBox())!;
    // (each foot's box holds its symbol and, to its right, its label: their left edges are alike)
    await page.mouse.click((rear.x + front.x) / 2 + 6, Math.max(rear.y + rear.height, front.y + front.height) + 12);
    const where = (await page.getByTestId("new-comment-pin").textContent()) ?? "";
    const m = /^Pinned at \(([−-]?[\d.]+), ([−-]?[\d.]+)\) m$/.exec(where.replace(/−/g, "-"));
    expect(m, where).not.toBeNull();
    // the feet stand at x = 0.2 m and 2.8 m on the ground (y = 0): half way is 1.5 m (clicked a little
    // left of it, by the symbols' half width), below is y < 0
    expect(Number(m![1])).toBeGreaterThan(1.2);
    expect(Number(m![1])).toBeLessThan(1.8);
    expect(Number(m![2])).toBeLessThan(0);
    await box.fill("Where does the drain channel run?");
    await page.getByRole("button", { name: "Comment", exact: true }).click();
    await page.getByTestId("thread-2").waitFor();
    expect(await page.locator('[data-testid="review-drawing"] [data-thread]').count()).toBe(2);
    // without a mouse: Escape stops pinning; the element list pins on an element. While pinning
    // with nothing chosen, the button says the comment would go on the whole version
    await page.getByRole("button", { name: "Pin to the drawing" }).click();
    await page.getByLabel("New comment").fill("draft");
    expect(await page.getByRole("button", { name: "Comment on the whole version" }).count()).toBe(1);
    await page.getByLabel("New comment").fill("");
    await page.getByRole("button", { name: "Stop pinning" }).focus();
    await page.keyboard.press("Escape");
    expect(await page.getByTestId("new-comment-pin").textContent()).toBe("Pinned on the whole version");
    await page.getByRole("button", { name: "Pin to the drawing" }).click();
    await page.getByLabel("Pin to an element").selectOption({ label: "front foot" });
    expect(await page.getByTestId("new-comment-pin").textContent()).toBe("Pinned on front foot");
    await page.getByRole("button", { name: "Unpin" }).click();
    // a pin on the drawing opens its thread
    await page.locator('[data-testid="review-drawing"] [data-thread]').first().click();
    await page.locator('[data-testid="thread-1"][data-selected]').waitFor();
    // and by keyboard: each pin is a button named by its number, author and first words (outside the
    // drawing's image, so a screen reader finds it); Enter opens its thread and moves the focus there
    const second = page.getByRole("button", { name: "Comment 2 by Chet Checkley: Where does the drain channel run?" });
    await second.focus();
    // (arrived at by Tab, as a keyboard would: its ring shows)
    await page.keyboard.press("Shift+Tab");
    await page.keyboard.press("Tab");
    expect(await second.evaluate((el) => el === document.activeElement)).toBe(true);
    expect(await second.evaluate((el) => getComputedStyle(el).boxShadow)).not.toBe("none");
    await page.keyboard.press("Enter");
    await page.locator('[data-testid="thread-2"][data-selected]').waitFor();
    await page.waitForFunction(() => document.activeElement?.getAttribute("data-testid") === "thread-2");
    await page.locator('[data-testid="thread-1"]').click();
    await page.locator('[data-testid="thread-1"][data-selected]').waitFor();
    await shot(page, "review-02-pinned-comment");

    await takeStep(page, "return", "See the pinned comment on the rear foot.");
    await page.locator('[data-review-state="returned"]').first().waitFor();
    expect(await page.getByText("See the pinned comment on the rear foot.").count()).toBe(1);
    await shot(page, "review-03-returned");
  });

  it("the author saves v3 in the editor and submits it", async () => {
    const page = pages.editor;
    await openEditor(page, sketchId);
    await retitle(page, "Skid with μ = 0.3 on the wet slab");
    await saveVersion(page, "Friction 0.3 on a wet slab, as the checker asked; the front foot and the drain channel left as drawn");
    await page.getByText("✓ saved").waitFor();
    await page.goto(review(3));
    await stepButton(page, "submit").waitFor();
    await takeStep(page, "submit");
    await page.locator('[data-review-state="submitted"]').first().waitFor();
  });

  it("the checker checks v3, and the owner approves it: it shows locked with the title block", async () => {
    const checker = pages.checker;
    await checker.goto(review(3));
    await stepButton(checker, "check").waitFor();
    expect(await stepButton(checker, "approve").count()).toBe(0);
    // v2's two threads were never resolved: v3 says so beside its comments and in the check dialog
    const earlier = checker.getByTestId("earlier-open");
    await earlier.waitFor();
    expect(await earlier.textContent()).toBe("Still open on earlier versions: v2 (2 threads). Answer or resolve them there if this version settles them.");
    expect(await earlier.getByRole("link", { name: "v2" }).getAttribute("href")).toBe(`/workspaces/${ws}/sketches/${sketchId}/versions/2#comments`);
    await stepButton(checker, "check").click();
    // said once, and the check is not taken without a note saying why v3 stands with them open
    expect(await checker.getByTestId("signoff-open-threads").textContent()).toBe(
      "2 comment threads are still open (2 on v2): resolve them, or say in the note why the version stands checked with them open.",
    );
    expect(await checker.getByTestId("signoff-dialog").getByTestId("signoff-concerns").count()).toBe(0);
    await shot(checker, "review-035-earlier-threads");
    await checker.getByTestId("signoff-dialog").getByRole("button", { name: "Cancel" }).click();
    await takeStep(checker, "check", "Friction demand now well inside μ = 0.3; the drain question stays open for site.");
    await checker.locator('[data-review-state="checked"]').first().waitFor();

    const owner = pages.owner;
    await owner.goto(review(3));
    await stepButton(owner, "approve").waitFor();
    // v2's threads are still open: the approval is not taken without a note saying why it stands
    await stepButton(owner, "approve").click();
    const approving = owner.getByTestId("signoff-dialog");
    expect(await approving.getByTestId("signoff-open-threads").textContent()).toBe(
      "2 comment threads are still open (2 on v2): resolve them, or say in the note why the version stands approved with them open.",
    );
    expect(await approving.locator("button[type=submit]").isDisabled()).toBe(true);
    await approving.getByRole("button", { name: "Cancel" }).click();
    await takeStep(owner, "approve", "The drain question stays open for site, as the check says.");
    await owner.locator('[data-review-state="approved"]').first().waitFor();
    expect(await owner.getByTestId("title-block-prepared").textContent()).toContain("Edda Preparer");
    expect(await owner.getByTestId("title-block-checked").textContent()).toContain("Chet Checkley");
    expect(await owner.getByTestId("title-block-approved").textContent()).toContain("Orla Approver");
    // the comments refetch after the step: wait for the lock notice before counting it
    await owner.getByText("Approved: locked").waitFor();
    expect(await owner.getByText("Approved: locked").count()).toBe(1);
    expect(await owner.getByLabel("New comment").count()).toBe(0);
    expect(await stepButton(owner, "withdraw").count()).toBe(1);
    await shot(owner, "review-04-approved-locked");

    await owner.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}`);
    await owner.getByTestId("approved-version").waitFor();
    expect(await owner.getByTestId("approved-version").textContent()).toContain("v3 approved");
    expect(await owner.getByTestId("version-row-3").textContent()).toContain("approved");
    expect(await owner.getByTestId("version-row-2").textContent()).toContain("returned");
    const activity = await owner.getByTestId("activity").textContent();
    for (const words of ["approved v3", "checked v3", "submitted v3 for checking", "returned v2", "commented on v2"]) expect(activity).toContain(words);
    await shot(owner, "review-05-history-activity");

    await owner.goto(`${BASE_URL}/workspaces/${ws}/sketches/${sketchId}/compare?from=2&to=3`);
    await owner.getByTestId("reaction-changes").waitFor();
    expect(await owner.getByTestId("compare-summary").textContent()).toContain("1 change in the inputs");
    await shot(owner, "review-06-compare");
    // side by side, the two drawings start level even where one side's caption wraps (two columns from 1024 px)
    await atViewport(owner, { width: 1024, height: 800 }, async () => {
      const tops = await owner.getByTestId("compare-side-by-side").locator("figure > figcaption + *").evaluateAll((els) => els.map((e) => Math.round(e.getBoundingClientRect().top)));
      expect(tops).toHaveLength(2);
      expect(tops[1]).toBe(tops[0]);
    });
    // the two drawings laid over each other at one scale, and the tables in US customary units
    await owner.getByRole("radio", { name: "Overlaid" }).click();
    await owner.getByTestId("compare-overlay").waitFor();
    expect(await owner.getByTestId("compare-overlay").locator("svg").count()).toBe(2);
    await owner.getByTestId("compare-units").getByRole("radio", { name: "US" }).click();
    await owner.waitForFunction(() => /lbf|kip/.test(document.querySelector("[data-testid=reaction-changes]")?.textContent ?? ""));
    expect(await owner.getByTestId("reaction-changes").textContent()).not.toContain("kN");
    await shot(owner, "review-06b-compare-overlaid-us");
    // the choice of units is the reader's: put it back for the next screens
    await owner.getByTestId("compare-units").getByRole("radio", { name: "SI" }).click();
  });

  it("the owner's mention mail is in the local mailbox", async () => {
    const page = pages.owner;
    const deadline = Date.now() + 15_000;
    for (;;) {
      await page.goto(`${BASE_URL}/dev/mailbox?to=${encodeURIComponent(cast.owner.email)}`);
      const link = page.getByRole("link", { name: /Chet Checkley mentioned you on v2/ });
      if (await link.count()) {
        await link.first().click();
        await page.waitForURL(/\/dev\/mailbox\/\d+$/);
        break;
      }
      if (Date.now() > deadline) throw new Error("no mention mail for the owner");
      await page.waitForTimeout(400);
    }
    const mail = (await page.locator("pre").textContent()) ?? "";
    expect(mail).toContain("Rear foot friction: is μ = 0.4 right on a wet slab?");
    await shot(page, "review-07-mention-mail");
    // the mail's link opens the version with that thread selected
    const url = /https?:\/\/\S+\/versions\/2#thread-[\w-]+/.exec(mail)?.[0];
    if (!url) throw new Error(`no thread link in the mail: ${mail}`);
    await page.goto(url.replace(/^https?:\/\/[^/]+/, BASE_URL));
    const selected = page.locator("article[data-selected]");
    await selected.waitFor();
    expect(await selected.textContent()).toContain("Rear foot friction");
  });
});
