// Every version page of a fork says where the fork came from — the origin sketch and the version
// forked, linked to that version for a reader of it — while the page's review (threads, sign-off)
// is the fork's own (what a fork carries: tests/api/fork-carries.test.ts).
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { VersionReview } from "@/components/review/VersionReview";
import { parseSketch } from "@/solver";
import { fixture } from "../api/sketch-fixtures";

// stored as the server keeps it: validated, with its defaults filled in
const parsed = parseSketch(fixture("pipe-bend-anchor"));
if (!parsed.ok) throw new Error("the fixture does not parse");
const document = parsed.file;

function answers(forkedFrom: unknown) {
  const body = (url: string) => {
    if (url.endsWith("/signoff"))
      return { state: "draft", sentence: "Prepared; not yet submitted for checking.", entries: [], titleBlock: { prepared: { name: "Eddie Editor", date: "2026-11-30T10:00:00Z" }, checked: null, approved: null }, allowed: [], openThreads: [] };
    if (url.endsWith("/comments")) return { threads: [], earlierOpen: [], members: [], locked: false, canComment: false };
    if (url === "/api/sketches/s9") return { sketch: { latestVersion: 3, approvedVersion: null, forkedFrom } };
    return { version: { id: "v", number: 3, message: "wall 8 mm", authorName: "Eddie Editor", createdAt: "2026-11-30T10:00:00Z", status: "holds", largestReaction: 1000, warnings: [], document } };
  };
  vi.stubGlobal("fetch", vi.fn(async (url: string) => new Response(JSON.stringify(body(String(url))), { status: 200, headers: { "content-type": "application/json" } })));
}

const show = () =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <VersionReview workspaceId="w2" sketchId="s9" sketchTitle="Bend at pier 8" number={3} latest={3} viewerId="u1" canEdit={false} />
    </QueryClientProvider>,
  );

afterEach(() => vi.unstubAllGlobals());

describe("a fork's version page", () => {
  it("names the origin and the version forked, linked to that version", async () => {
    answers({ visible: true, sketchId: "s1", title: "Bend at pier 7", workspaceId: "w1", versionNumber: 2 });
    show();
    const line = await screen.findByTestId("forked-from");
    expect(line.textContent?.trim()).toBe("Forked from Bend at pier 7 v2");
    expect(screen.getByRole("link", { name: "Bend at pier 7 v2" }).getAttribute("href")).toBe("/workspaces/w1/sketches/s1/versions/2");
  });

  it("a sketch that is no fork says nothing of the kind", async () => {
    answers(null);
    show();
    await screen.findByText("wall 8 mm", { exact: false });
    expect(screen.queryByTestId("forked-from")).toBeNull();
  });
});
