// Debian's Chromium driven by playwright-core (never a downloaded browser).
import { mkdirSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

export const BASE_URL = process.env.E2E_BASE_URL || "http://127.0.0.1:3100";
export const SHOTS_DIR = join(process.cwd(), "test-results", "screenshots");

export async function openBrowser(): Promise<BrowserContext> {
  const dir = mkdtempSync(join(tmpdir(), "cp-chromium-"));
  return chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH || "/usr/bin/chromium",
    headless: true,
    viewport: { width: 1440, height: 900 },
    acceptDownloads: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

export async function shot(page: Page, name: string): Promise<string> {
  mkdirSync(SHOTS_DIR, { recursive: true });
  const path = join(SHOTS_DIR, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
