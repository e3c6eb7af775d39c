// Debian's Chromium driven by playwright-core (never a downloaded browser).
import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";

export const BASE_URL = process.env.E2E_BASE_URL || "http://127.0.0.1:3100";
export const SHOTS_DIR = join(process.cwd(), "test-results", "screenshots");
/** The desktop window every browser opens with, and a phone's (CSS pixels). */
export const DESKTOP = { width: 1440, height: 900 };
export const PHONE = { width: 390, height: 844 };

const CHROMIUM_PATH = process.env.CHROMIUM_PATH || "/usr/bin/chromium";
const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/** A browser without a profile, for tests that open their own contexts (a phone's, a tablet's). */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_ARGS });
}

export async function openBrowser(): Promise<BrowserContext> {
  const dir = mkdtempSync(join(tmpdir(), "cp-chromium-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    viewport: DESKTOP,
    acceptDownloads: true,
    args: CHROMIUM_ARGS,
  });
  // the profile folder (~15 MB) goes once the browser has exited; never fail a test over it
  const close = context.close.bind(context);
  context.close = async (...args: Parameters<BrowserContext["close"]>) => {
    await close(...args);
    try {
      rmSync(dir, { recursive: true, force: true, maxRetries: 5, retryDelay: 100 });
    } catch {
      // a folder left in the temp dir is harmless
    }
  };
  return context;
}

/** A fresh browser (1440 × 900) with one page open: the set-up of a story told in one window.
 *  `permissions` (such as the clipboard's) are granted for the app's origin before the page opens. */
export async function openPage(opts: { permissions?: string[] } = {}): Promise<{ ctx: BrowserContext; page: Page }> {
  const ctx = await openBrowser();
  if (opts.permissions) await ctx.grantPermissions(opts.permissions, { origin: BASE_URL });
  return { ctx, page: await ctx.newPage() };
}

/** Fills in the sign-in form the page shows and sends it (where it leads is the caller's to wait for). */
export async function fillSignIn(page: Page, email: string, password: string): Promise<void> {
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

/** Runs `story` with the page's window at `viewport`, then gives it the desktop window back, pass or fail. */
export async function atViewport(page: Page, viewport: { width: number; height: number }, story: () => Promise<void>): Promise<void> {
  await page.setViewportSize(viewport);
  try {
    await story();
  } finally {
    await page.setViewportSize(DESKTOP);
  }
}

export async function shot(page: Page, name: string): Promise<string> {
  mkdirSync(SHOTS_DIR, { recursive: true });
  const path = join(SHOTS_DIR, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
