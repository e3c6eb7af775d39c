// Browsers a describe block's tests share, opened before its first test and closed after its last
// (vitest's hooks, so only for test files; scripts use ./browser directly).
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll } from "vitest";
import type { Person } from "../api/helpers";
import { openBrowser } from "./browser";

/** Call inside a describe block: one signed-out browser for its tests; `newPage(viewport?)` opens a
 *  page in it, at the desktop window (1440 × 900) unless a viewport is given. */
export function sharedBrowser(): { newPage: (viewport?: { width: number; height: number }) => Promise<Page> } {
  let ctx: BrowserContext | undefined;
  beforeAll(async () => {
    ctx = await openBrowser();
  });
  afterAll(async () => {
    await ctx?.close();
  });
  return {
    newPage: async (viewport) => {
      if (!ctx) throw new Error("sharedBrowser(): the browser opens in beforeAll; open pages inside tests or later hooks");
      const page = await ctx.newPage();
      if (viewport) await page.setViewportSize(viewport);
      return page;
    },
  };
}

/** Call inside a describe block: browsers opened while it runs, each closed after its tests.
 *  `signIn(person)` signs someone in, in a browser of their own, and gives back their page;
 *  `keep(ctx)` adds a browser opened some other way (a signed-out reader's). */
export function browsersClosedAfterAll(): { signIn: (person: Person) => Promise<Page>; keep: (ctx: BrowserContext) => BrowserContext } {
  const open: BrowserContext[] = [];
  afterAll(async () => {
    for (const c of open) await c.close();
  });
  const keep = (ctx: BrowserContext) => {
    open.push(ctx);
    return ctx;
  };
  return {
    keep,
    signIn: async (person) => {
      // loaded here, so that signed-out stories never load the database's modules
      const { signInAs } = await import("./versions-helpers");
      const { ctx, page } = await signInAs(person);
      keep(ctx);
      return page;
    },
  };
}
