// People and workspaces for the versions and review stories, made directly in the test database
// (sign-up by mail has its own story), then signed in through the browser like anyone else.
import type { BrowserContext, Page } from "playwright-core";
import { parseSketch } from "@/solver";
import { makeAccount, makeWorkspace, PASSWORD, type Person } from "../api/helpers";
import { BASE_URL, fillSignIn, openBrowser } from "./browser";

export type Cast = Record<"owner" | "editor" | "checker" | "viewer" | "outsider", Person>;

export async function makeCast(tag: string, names: Partial<Record<keyof Cast, string>> = {}): Promise<{ cast: Cast; ws: string }> {
  const cast = {} as Cast;
  for (const r of ["owner", "editor", "checker", "viewer", "outsider"] as const) {
    cast[r] = await makeAccount(`${r}-${tag}`, { signIn: false, name: names[r] });
  }
  const ws = await makeWorkspace(`Pier ${tag} pump station`, [
    [cast.owner, "owner"],
    [cast.editor, "editor"],
    [cast.checker, "checker"],
    [cast.viewer, "viewer"],
  ]);
  return { cast, ws };
}

/** A sketch document as the server stores it (`parseSketch`'s result), for `createSketch` and `saveVersion`. */
export function parsed(doc: unknown): Extract<ReturnType<typeof parseSketch>, { ok: true }> {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error("fixture does not parse");
  return p;
}

export async function signInAs(person: Person): Promise<{ ctx: BrowserContext; page: Page }> {
  const ctx = await openBrowser();
  const page = await ctx.newPage();
  await page.goto(`${BASE_URL}/sign-in`);
  await fillSignIn(page, person.email, PASSWORD);
  await page.waitForURL(/\/workspaces$/);
  return { ctx, page };
}

/** Open a saved sketch in the editor and wait until its version bar shows. */
export async function openEditor(page: Page, sketchId: string, query = ""): Promise<void> {
  await page.goto(`${BASE_URL}/sketches/${sketchId}${query}`);
  await page.getByTestId("version-bar").waitFor();
}

/** Change the sketch's title in the editor's properties (nothing selected). */
export async function retitle(page: Page, title: string): Promise<void> {
  await page.keyboard.press("Escape");
  const field = page.getByTestId("sketch-form").getByLabel("Title");
  await field.fill(title);
  await field.press("Enter");
}

/** Save a version through the toolbar's Save button and the message dialog. */
export async function saveVersion(page: Page, message: string): Promise<void> {
  await page.getByTestId("save-version").click();
  const dialog = page.getByTestId("save-dialog");
  await dialog.getByLabel("What changed").fill(message);
  // "Choose how to save…" when this tab knows a newer version than it opened (the conflict dialog follows)
  await dialog.getByRole("button", { name: /^(Save v\d+|Choose how to save…)$/ }).click();
}
