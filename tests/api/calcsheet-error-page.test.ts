// The calc sheet link opened without JavaScript: a failure is a small page in words (same status,
// the error, a link back to the sketch), while API clients keep the JSON error.
import { beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/sketches/[id]/versions/[number]/calc-sheet/route";
import { wantsHtml } from "@/lib/calcsheet/error-page";
import { createSketch } from "@/lib/sketches";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { parsedFixture } from "./sketch-fixtures";

// what Chromium and Firefox send on a navigation to a link
const BROWSER = "text/html,application/xhtml+xml,application/xml;q=0.9,image/avif,image/webp,*/*;q=0.8";

describe("which requests get the page", () => {
  const req = (accept?: string) => new Request("http://x/", { headers: accept === undefined ? {} : { accept } });
  it("a browser navigation does; fetch's default, JSON and no Accept do not", () => {
    expect(wantsHtml(req(BROWSER))).toBe(true);
    expect(wantsHtml(req("text/html"))).toBe(true);
    expect(wantsHtml(req())).toBe(false);
    expect(wantsHtml(req("*/*"))).toBe(false);
    expect(wantsHtml(req("application/json"))).toBe(false);
    expect(wantsHtml(req("application/json, text/html;q=0.5"))).toBe(false);
    expect(wantsHtml(req("text/html;q=0"))).toBe(false);
  });
});

describe("GET …/calc-sheet when the sheet cannot be made", () => {
  let owner: Person;
  let sketchId: string;
  let brokenId: string;
  beforeAll(async () => {
    owner = await makeAccount("calc-page-owner");
    const ws = await makeWorkspace("Calc sheet pages", [[owner, "owner"]]);
    const parsed = parsedFixture("pipe-bend-anchor");
    sketchId = (await createSketch(ws, owner, { title: "Bend for pages", document: parsed, message: "first" })).sketch.id;
    // a saved document this release no longer reads (its support names a body that is not there):
    // stored as it was, as an older release might have saved it
    const file = { ...parsed.file, supports: parsed.file.supports.map((s, i) => (i === 0 ? { ...s, body: "gone-body" } : s)) };
    brokenId = (await createSketch(ws, owner, { title: "Bend that no longer reads", document: { ...parsed, file }, message: "old" })).sketch.id;
  }, 60000);

  const ask = (id: string, n: string, headers: Record<string, string>, cookie?: string, query = "") =>
    call(GET as never, { params: { id, number: n }, cookie, headers, path: `/api/sketches/${id}/versions/${n}/calc-sheet${query}` });

  it("a missing version: the browser reads a 404 page with the words and a link back; JSON and no Accept keep the JSON", async () => {
    const page = await ask(sketchId, "9", { accept: BROWSER }, owner.cookie);
    expect(page.status).toBe(404);
    expect(page.res.headers.get("content-type")).toBe("text/html; charset=utf-8");
    const html = page.body as string;
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).toContain("<h1>There is no such calc sheet for you</h1>");
    expect(html).toContain("<p>This sketch has no version 9.</p>");
    expect(html).toContain("The server answered 404");
    expect(html).toContain(`<a href="/sketches/${sketchId}">Back to the sketch</a>`);
    expect(html).not.toContain("Sign in");
    for (const headers of [{ accept: "application/json" }, {}, { accept: "*/*" }] as Record<string, string>[]) {
      const api = await ask(sketchId, "9", headers, owner.cookie);
      expect(api.status).toBe(404);
      expect(api.res.headers.get("content-type")).toMatch(/^application\/json/);
      expect(api.body).toMatchObject({ error: { code: "not_found", message: "This sketch has no version 9." } });
    }
  });

  it("a saved sketch that does not parse: a 500 that says why, naming the field, as a page and as JSON", async () => {
    const page = await ask(brokenId, "1", { accept: BROWSER }, owner.cookie);
    expect(page.status).toBe(500);
    const html = page.body as string;
    expect(html).toContain("<h1>The calc sheet could not be made</h1>");
    expect(html).toMatch(/<p>Version 1&#39;s saved sketch does not read \(supports\[0\]\.body: names body &quot;gone-body&quot;, .*\), so its calc sheet cannot be made\. Open the sketch, put it right and save a new version\.<\/p>/);
    expect(html).toContain("The server answered 500.");
    expect(html).toContain(`<a href="/sketches/${brokenId}">Back to the sketch</a>`);
    const api = await ask(brokenId, "1", { accept: "application/json" }, owner.cookie);
    expect(api.status).toBe(500);
    expect((api.body as { error: { code: string; message: string } }).error).toMatchObject({ code: "internal" });
    expect((api.body as { error: { message: string } }).error.message).toMatch(/^Version 1's saved sketch does not read \(supports\[0\]\.body: /);
  });

  it("signed out: a 401 page offers to sign in and come back to the sketch", async () => {
    const page = await ask(sketchId, "1", { accept: BROWSER });
    expect(page.status).toBe(401);
    const html = page.body as string;
    expect(html).toContain("<p>Sign in to continue.</p>");
    expect(html).toContain(`<a href="/sign-in?next=${encodeURIComponent(`/sketches/${sketchId}`)}">Sign in</a>`);
    expect(html).toContain(`<a href="/sketches/${sketchId}">Back to the sketch</a>`);
  });

  it("a bad units value: the page lists the field and its message", async () => {
    const page = await ask(sketchId, "1", { accept: BROWSER }, owner.cookie, "?units=cgs");
    expect(page.status).toBe(400);
    expect(page.body as string).toContain("<li><code>query.units</code>: units must be SI or US</li>");
  });

  it("text in the error is escaped, never markup", async () => {
    const page = await ask(sketchId, "<b>", { accept: BROWSER }, owner.cookie);
    expect(page.status).toBe(404);
    expect(page.body as string).not.toContain("<b>");
    // a path that names no sketch links to the workspaces instead
    const odd = await call(GET as never, { params: { id: "not-a-uuid", number: "1" }, cookie: owner.cookie, headers: { accept: BROWSER } });
    expect(odd.status).toBe(404);
    expect(odd.body as string).toContain('<a href="/workspaces">Back to the sketch</a>');
  });

  it("a sheet that is made is still the PDF for a browser", async () => {
    const ok = await ask(sketchId, "1", { accept: BROWSER }, owner.cookie);
    expect(ok.status).toBe(200);
    expect(ok.res.headers.get("content-type")).toBe("application/pdf");
  }, 60000);
});
