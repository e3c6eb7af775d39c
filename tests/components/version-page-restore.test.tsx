// An older version's page offers to make it the latest again, to those who may save: the dialog
// asks on top of the latest the server knows now (a save since the page was made counts), and once
// saved the page says so with a link to the new version. A reader is not offered it.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { VersionReview } from "@/components/review/VersionReview";
import { parseSketch } from "@/solver";
import { fixture } from "../api/sketch-fixtures";
import { withModalDialogs } from "./dialog-support";

const parsed = parseSketch(fixture("pump-skid-discharge"));
if (!parsed.ok) throw new Error("fixture does not parse");
const document = parsed.file;

beforeAll(() => withModalDialogs());
afterEach(() => vi.unstubAllGlobals());

/** The server: v1's page; the sketch's latest is `latest`; a restore answers v(latest + 1). */
function serve(latest: number, posts: { url: string; body: unknown }[]) {
  const body = (url: string) => {
    if (url.endsWith("/signoff")) return { state: "draft", sentence: "Prepared; not yet submitted for checking.", entries: [], titleBlock: { prepared: null, checked: null, approved: null }, allowed: [] };
    if (url.endsWith("/comments")) return { threads: [], earlierOpen: [], members: [], locked: false, canComment: false };
    if (url === "/api/sketches/s1") return { sketch: { approvedVersion: null, latestVersion: latest } };
    return { version: { id: "v", number: 1, message: "as quoted", authorName: "Eddie Editor", createdAt: "2026-11-30T10:00:00Z", status: "holds", largestReaction: 1000, warnings: [], document } };
  };
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string, init?: RequestInit) => {
      if (init?.method === "POST") {
        posts.push({ url, body: JSON.parse(String(init.body)) });
        return new Response(JSON.stringify({ version: { number: latest + 1, restoredFrom: 1, message: "Restored v1 — as quoted" } }), { status: 201, headers: { "content-type": "application/json" } });
      }
      return new Response(JSON.stringify(body(String(url))), { status: 200, headers: { "content-type": "application/json" } });
    }),
  );
}

const show = (canEdit: boolean) =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <VersionReview workspaceId="w1" sketchId="s1" sketchTitle="Skid" number={1} latest={3} viewerId="u1" canEdit={canEdit} />
    </QueryClientProvider>,
  );

describe("making an older version the latest from its page", () => {
  it("restores on top of the latest the server knows now, and links to the new version", async () => {
    const posts: { url: string; body: unknown }[] = [];
    // someone saved v4 after the page was made with latest 3
    serve(4, posts);
    show(true);
    expect(await screen.findByRole("link", { name: "v4 is newer" })).toHaveAttribute("href", "/workspaces/w1/sketches/s1/versions/4");
    await userEvent.click(screen.getByRole("button", { name: "Make v1 the latest again…" }));
    const dialog = screen.getByTestId("restore-dialog");
    await userEvent.click(within(dialog).getByRole("button", { name: "Save as v5" }));
    expect(posts).toEqual([{ url: "/api/sketches/s1/versions/1/restore", body: { baseVersion: 4 } }]);
    const notice = await screen.findByTestId("restored-notice");
    expect(notice.textContent).toContain("Saved v5 with the drawing of v1: it is the latest version now.");
    expect(within(notice).getByRole("link", { name: "Open v5" })).toHaveAttribute("href", "/workspaces/w1/sketches/s1/versions/5");
  });

  it("is not offered to a reader", async () => {
    serve(3, []);
    show(false);
    await screen.findByRole("link", { name: "v3 is newer" });
    expect(screen.queryByRole("button", { name: /latest again/ })).toBeNull();
  });
});
