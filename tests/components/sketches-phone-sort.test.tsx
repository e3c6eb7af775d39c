// A phone hides the list's sortable column headers; its Sort menu asks the same orders of the API
// (and the row's summary keeps who updated it and its tags, which the hidden columns showed).
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { fireEvent, render, screen, waitFor } from "@testing-library/react";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SketchesTable, SORT_CHOICES, type SketchRow } from "@/components/sketches/SketchesTable";
import { SKETCH_SORTS } from "@/lib/sketch-schemas";

function withQuery(ui: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(<QueryClientProvider client={client}>{ui}</QueryClientProvider>);
}

const row: SketchRow = {
  id: "s1",
  title: "Skid A",
  tags: ["pumps", "pier 7"],
  latestVersion: 2,
  status: "holds",
  largestReaction: 11_500,
  warnings: [],
  latestMessage: "moved the rear foot",
  updatedAt: "2024-05-01T10:00:00.000Z",
  updatedBy: { id: "u1", name: "Eddie Editor" },
  forked: false,
};

afterEach(() => {
  vi.unstubAllGlobals();
  window.history.replaceState(null, "", "/");
});

describe("sorting the sketches on a phone", () => {
  it("offers every order the API sorts by, both ways, and asks the API for the one chosen", async () => {
    expect(new Set(SORT_CHOICES.map((c) => c.sort))).toEqual(new Set(SKETCH_SORTS));
    expect(SORT_CHOICES).toHaveLength(SKETCH_SORTS.length * 2);
    const fetch = vi.fn(async () => new Response(JSON.stringify({ items: [row], total: 1, page: 1, pageSize: 20, tags: ["pier 7", "pumps"] }), { status: 200, headers: { "content-type": "application/json" } }));
    vi.stubGlobal("fetch", fetch);
    withQuery(<SketchesTable workspaceId="w1" canCreate />);
    await screen.findByTestId("sketch-row-Skid A");
    const sort = screen.getByLabelText("Sort") as HTMLSelectElement;
    expect(sort.value).toBe("updated:desc");
    fireEvent.change(sort, { target: { value: "status:desc" } });
    await waitFor(() => expect(String(fetch.mock.calls.at(-1)?.[0 as never])).toContain("sort=status&dir=desc"));
    // the address keeps it, as a header's click does
    expect(window.location.search).toContain("sort=status");
    fireEvent.change(sort, { target: { value: "created:asc" } });
    await waitFor(() => expect(String(fetch.mock.calls.at(-1)?.[0 as never])).toContain("sort=created&dir=asc"));
  });

  it("the row's summary under the title says who updated it and its tags", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify({ items: [row], total: 1, page: 1, pageSize: 20, tags: [] }), { status: 200, headers: { "content-type": "application/json" } })));
    withQuery(<SketchesTable workspaceId="w1" canCreate />);
    await screen.findByTestId("sketch-row-Skid A");
    const summary = screen.getByTestId("sketch-row-summary").textContent!;
    expect(summary).toContain("by Eddie Editor");
    expect(summary).toContain("pumps · pier 7");
  });
});
