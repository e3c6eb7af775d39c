// An earlier version's page leads to the latest: "v3 is newer" links to it, and a comparison from
// this version to the latest is one click away (as "Compare with v1" is on a later version).
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { VersionReview } from "@/components/review/VersionReview";
import { parseSketch } from "@/solver";
import { fixture } from "../api/sketch-fixtures";

// stored as the server keeps it: validated, with its defaults filled in
const parsed = parseSketch(fixture("pump-skid-discharge"));
if (!parsed.ok) throw new Error("fixture does not parse");
const document = parsed.file;


function answers(number: number) {
  const body = (url: string) => {
    if (url.endsWith("/signoff"))
      return { state: "draft", sentence: "Prepared; not yet submitted for checking.", entries: [], titleBlock: { prepared: { name: "Eddie Editor", date: "2026-11-30T10:00:00Z" }, checked: null, approved: null }, allowed: [] };
    if (url.endsWith("/comments")) return { threads: [], earlierOpen: [], members: [], locked: false, canComment: false };
    return {
      version: { id: "v", number, message: "first", authorName: "Eddie Editor", createdAt: "2026-11-30T10:00:00Z", status: "holds", largestReaction: 1000, warnings: [], document },
    };
  };
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string) => new Response(JSON.stringify(body(String(url))), { status: 200, headers: { "content-type": "application/json" } })),
  );
}

const show = (number: number, latest: number) =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <VersionReview workspaceId="w1" sketchId="s1" sketchTitle="Skid" number={number} latest={latest} viewerId="u1" canEdit={false} />
    </QueryClientProvider>,
  );

afterEach(() => vi.unstubAllGlobals());

describe("an earlier version's links to the latest", () => {
  it("v1 of three: 'v3 is newer' opens v3, and 'Compare with v3 (latest)' compares v1 with v3", async () => {
    answers(1);
    show(1, 3);
    const newer = await screen.findByRole("link", { name: "v3 is newer" });
    expect(newer).toHaveAttribute("href", "/workspaces/w1/sketches/s1/versions/3");
    expect(screen.getByRole("link", { name: "Compare with v3 (latest)" })).toHaveAttribute("href", "/workspaces/w1/sketches/s1/compare?from=1&to=3");
    // v1 has nothing before it
    expect(screen.queryByRole("link", { name: /Compare with v0/ })).toBeNull();
  });

  it("the latest version offers only the comparison with the one before it", async () => {
    answers(3);
    show(3, 3);
    expect(await screen.findByRole("link", { name: "Compare with v2" })).toHaveAttribute("href", "/workspaces/w1/sketches/s1/compare?from=2&to=3");
    expect(screen.queryByRole("link", { name: /latest/ })).toBeNull();
    expect(screen.queryByText(/is newer/)).toBeNull();
  });
});
