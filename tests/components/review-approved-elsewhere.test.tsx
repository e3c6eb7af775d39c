// A later revision of an approved design is not read as approved: its page names the version that
// stands approved, as its calc sheet's "Revision" line does; the approved version itself and a
// sketch with no approved version say nothing of it.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { VersionReview } from "@/components/review/VersionReview";
import { parseSketch } from "@/solver";
import { fixture } from "../api/sketch-fixtures";

const parsed = parseSketch(fixture("pump-skid-discharge"));
if (!parsed.ok) throw new Error("fixture does not parse");
const document = parsed.file;


function answers(number: number, state: "draft" | "approved", approvedVersion: number | null) {
  const body = (url: string) => {
    if (url.endsWith("/signoff"))
      return { state, sentence: state === "approved" ? "Approved." : "Prepared; not yet submitted for checking.", entries: [], titleBlock: { prepared: { name: "Eddie Editor", date: "2026-11-30T10:00:00Z" }, checked: null, approved: null }, allowed: [] };
    if (url.endsWith("/comments")) return { threads: [], earlierOpen: [], members: [], locked: false, canComment: false };
    if (url.endsWith("/api/sketches/s1")) return { sketch: { id: "s1", title: "Skid", latestVersion: 2, approvedVersion }, latest: null };
    return { version: { id: "v", number, message: "ballast", authorName: "Eddie Editor", createdAt: "2026-11-30T10:00:00Z", status: "holds", largestReaction: 1000, warnings: [], document } };
  };
  vi.stubGlobal("fetch", vi.fn(async (url: string) => new Response(JSON.stringify(body(String(url))), { status: 200, headers: { "content-type": "application/json" } })));
}

const show = (number: number) =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <VersionReview workspaceId="w1" sketchId="s1" sketchTitle="Skid" number={number} latest={2} viewerId="u1" canEdit={false} />
    </QueryClientProvider>,
  );

afterEach(() => vi.unstubAllGlobals());

describe("a version's page when another version stands approved", () => {
  it("v2, saved after v1 was approved, names v1 as the approved version and says its approval does not carry over", async () => {
    answers(2, "draft", 1);
    show(2);
    const line = await screen.findByTestId("approved-elsewhere");
    expect(line).toHaveTextContent("v1 is the approved version of this sketch. This version is not approved: v1's approval does not carry over to it.");
    expect(screen.getByRole("link", { name: "v1 is the approved version" })).toHaveAttribute("href", "/workspaces/w1/sketches/s1/versions/1");
  });

  it("the approved version itself, and a sketch with none approved, say nothing of it", async () => {
    answers(1, "approved", 1);
    const first = show(1);
    await screen.findByText("Approved.");
    expect(screen.queryByTestId("approved-elsewhere")).toBeNull();
    first.unmount();
    answers(2, "draft", null);
    show(2);
    await screen.findByText("Prepared; not yet submitted for checking.");
    expect(screen.queryByTestId("approved-elsewhere")).toBeNull();
  });
});
