// An address past the last page of the workspace's sketches (a link kept from before some were
// deleted, or a page typed in) is not told "No sketches saved here yet" while the workspace has
// some: it is told how many there are, on how many pages, and taken back to the last one.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SketchesTable, type SketchRow } from "@/components/sketches/SketchesTable";

const row = (title: string): SketchRow => ({ id: title, title, tags: [], latestVersion: 1, status: "holds", largestReaction: 1_000, warnings: [], latestMessage: "", updatedAt: "2024-05-01T10:00:00.000Z", updatedBy: null, forked: false });

afterEach(() => {
  vi.unstubAllGlobals();
  window.localStorage.clear();
});

describe("a page past the end of the sketches", () => {
  it("says how many sketches there are, not that there are none, and Go to the last page shows them", async () => {
    const asked: string[] = [];
    vi.stubGlobal(
      "fetch",
      vi.fn(async (path: string) => {
        asked.push(path);
        const page = Number(new URL(path, "http://x").searchParams.get("page"));
        // 21 sketches at 20 a page: page 2 holds the last one; the first answer is for page 5
        const body = asked.length === 1 ? { items: [], total: 21, page: 5, pageSize: 20, tags: [] } : { items: page === 2 ? [row("Last skid")] : [], total: 21, page, pageSize: 20, tags: [] };
        return new Response(JSON.stringify(body), { status: 200, headers: { "content-type": "application/json" } });
      }),
    );
    render(
      <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
        <SketchesTable workspaceId="w1" canCreate />
      </QueryClientProvider>,
    );
    expect(await screen.findByText("There is no page 5")).toBeInTheDocument();
    expect(screen.getByText("This workspace has 21 sketches, on 2 pages.")).toBeInTheDocument();
    expect(screen.queryByText("No sketches saved here yet")).toBeNull();
    await userEvent.setup().click(screen.getByRole("button", { name: "Go to the last page" }));
    expect(await screen.findByTestId("sketch-row-Last skid")).toBeInTheDocument();
    expect(asked.at(-1)).toContain("page=2");
  });
});
