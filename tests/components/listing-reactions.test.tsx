// The "Largest reaction" column of the workspace's sketches and of a sketch's history is a table
// column: 4 significant figures with their trailing zeros, so 11.50 kN sits beside 14.28 kN.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { fireEvent, render, screen, within } from "@testing-library/react";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { formatForce, formatForceCell } from "@/components/sketches/format";
import { filtersFromSearch, searchOfFilters, SketchesTable, type SketchRow } from "@/components/sketches/SketchesTable";
import { StatusMark } from "@/components/sketches/StatusMark";
import { VersionHistory, type VersionItem } from "@/components/versions/VersionHistory";

function answer(body: unknown) {
  vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify(body), { status: 200, headers: { "content-type": "application/json" } })));
}

function withQuery(ui: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(<QueryClientProvider client={client}>{ui}</QueryClientProvider>);
}

/** The cell under the "Largest reaction" header of a row. */
function largestCell(row: HTMLElement): string {
  const headers = [...document.querySelectorAll("thead th")];
  const column = headers.findIndex((th) => th.textContent?.includes("Largest reaction"));
  return row.querySelectorAll("td")[column].textContent ?? "";
}

const at = "2024-05-01T10:00:00.000Z";

afterEach(() => {
  vi.unstubAllGlobals();
  window.localStorage.clear();
});

describe("largest reaction in the listings", () => {
  it("keeps trailing zeros in a cell, not in prose (11 500 N, 2 400 N, 14 280 N)", () => {
    expect(formatForceCell(11_500)).toBe("11.50 kN");
    expect(formatForceCell(2_400)).toBe("2.400 kN");
    expect(formatForceCell(950)).toBe("950.0 N");
    expect(formatForceCell(null)).toBe("—");
    expect(formatForce(11_500)).toBe("11.5 kN");
  });

  it("the workspace's sketches", async () => {
    const row = (title: string, largestReaction: number | null): SketchRow => ({
      id: title,
      title,
      tags: [],
      latestVersion: 1,
      status: "holds",
      largestReaction,
      warnings: [],
      latestMessage: "",
      updatedAt: at,
      updatedBy: null,
      forked: false,
    });
    answer({ items: [row("Skid A", 11_500), row("Skid B", 14_280), row("Skid C", null)], total: 3, page: 1, pageSize: 20, tags: [] });
    withQuery(<SketchesTable workspaceId="w1" canCreate />);
    const a = await screen.findByTestId("sketch-row-Skid A");
    expect(largestCell(a)).toBe("11.50 kN");
    expect(within(a).getByTestId("sketch-row-summary").textContent).toContain("largest 11.50 kN");
    expect(largestCell(screen.getByTestId("sketch-row-Skid B"))).toBe("14.28 kN");
    expect(largestCell(screen.getByTestId("sketch-row-Skid C"))).toBe("—");
  });

  it("the workspace's sketches say which latest versions wait in the sign-off (submitted, returned, checked, approval withdrawn), not the drafts", async () => {
    const row = (title: string, latestReviewState: SketchRow["latestReviewState"]): SketchRow => ({
      id: title,
      title,
      tags: [],
      latestVersion: 3,
      status: "holds",
      largestReaction: 1000,
      warnings: [],
      latestMessage: "",
      updatedAt: at,
      updatedBy: null,
      forked: false,
      latestReviewState,
    });
    answer({ items: [row("Trailer", "submitted"), row("Stand", "returned"), row("Bend", "checked"), row("Skid", "draft"), row("Cart", "approved"), row("Monitor", "withdrawn")], total: 6, page: 1, pageSize: 20, tags: [] });
    withQuery(<SketchesTable workspaceId="w1" canCreate />);
    const chip = async (title: string) => within(await screen.findByTestId(`sketch-row-${title}`)).queryByTestId("review-state")?.textContent ?? null;
    expect(await chip("Trailer")).toBe("v3 submitted");
    expect(await chip("Stand")).toBe("v3 returned");
    expect(await chip("Bend")).toBe("v3 checked");
    expect(await chip("Monitor")).toBe("v3 approval withdrawn");
    // a draft waits for nobody; an approval has its own mark
    expect(await chip("Skid")).toBeNull();
    expect(await chip("Cart")).toBeNull();
  });

  it("a sketch that holds yet is short of a required factor of safety says so beside its status", async () => {
    const low = { check: "sliding" as const, body: "Monitor trailer", factor: 1.2134, required: 1.5, run: "As drawn" };
    const row = (title: string, lowestFactor: SketchRow["lowestFactor"]): SketchRow => ({ id: title, title, tags: [], latestVersion: 2, status: "holds", largestReaction: 1000, warnings: [], latestMessage: "", updatedAt: at, updatedBy: null, forked: false, lowestFactor });
    answer({ items: [row("Short", low), row("Fine", null)], total: 2, page: 1, pageSize: 20, tags: [] });
    withQuery(<SketchesTable workspaceId="w1" canCreate />);
    const marks = within(await screen.findByTestId("sketch-row-Short")).getAllByTestId("low-factor");
    // the column and the phone's line under the title
    expect(marks.map((m) => m.textContent)).toEqual(["FoS 1.21 < 1.5", "FoS 1.21 < 1.5"]);
    expect(marks[0].getAttribute("title")).toBe("Factor of safety against sliding of Monitor trailer is 1.213, below the required 1.5 (As drawn)");
    expect(within(screen.getByTestId("sketch-row-Fine")).queryByTestId("low-factor")).toBeNull();
  });

  it("keeps the list's view in the address: read back as written, defaults left out, nonsense ignored", async () => {
    const view = { q: "bend", tag: "pipework", status: "slips", sort: "status" as const, dir: "asc" as const, page: 2 };
    expect(searchOfFilters(view)).toBe("?q=bend&tag=pipework&status=slips&sort=status&dir=asc&page=2");
    expect(filtersFromSearch(searchOfFilters(view))).toEqual(view);
    expect(searchOfFilters(filtersFromSearch(""))).toBe("");
    expect(filtersFromSearch("?sort=colour&dir=up&page=-3&status=bogus")).toEqual({ q: "", tag: "", status: "", sort: "updated", dir: "desc", page: 1 });
    expect(filtersFromSearch("?sort=title")).toMatchObject({ sort: "title", dir: "asc" });
    // the list asks for what the address says, and writes a new view back into it
    const fetch = vi.fn(async (_url: string) => new Response(JSON.stringify({ items: [], total: 0, page: 1, pageSize: 20, tags: [] }), { status: 200, headers: { "content-type": "application/json" } }));
    vi.stubGlobal("fetch", fetch);
    window.history.replaceState(null, "", "/workspaces/w1?status=slips&sort=title&dir=desc");
    withQuery(<SketchesTable workspaceId="w1" canCreate />);
    await vi.waitFor(() => expect(fetch).toHaveBeenCalled());
    const asked = new URL(String(fetch.mock.calls[0][0]), "http://x").searchParams;
    expect([asked.get("status"), asked.get("sort"), asked.get("dir")]).toEqual(["slips", "title", "desc"]);
    expect((screen.getByLabelText("Status") as HTMLSelectElement).value).toBe("slips");
    fireEvent.change(screen.getByLabelText("Status"), { target: { value: "lifts" } });
    await vi.waitFor(() => expect(window.location.search).toBe("?status=lifts&sort=title&dir=desc"));
    expect(window.location.pathname).toBe("/workspaces/w1");
    window.history.replaceState(null, "", "/");
  });

  it("a sketch's version history", async () => {
    const version = (number: number, largestReaction: number): VersionItem => ({
      id: `v${number}`,
      number,
      message: `v${number}`,
      authorId: null,
      authorName: "Eddie",
      createdAt: at,
      status: "holds",
      largestReaction,
      warnings: [],
      reviewState: "draft",
    });
    answer({ versions: [version(2, 11_500), version(1, 14_280)] });
    withQuery(<VersionHistory sketchId="s1" latest={2} canFork={false} onFork={() => {}} />);
    const v2 = await screen.findByTestId("version-row-2");
    expect(largestCell(v2)).toBe("11.50 kN");
    expect(within(v2).getByTestId("version-row-summary").textContent).toContain("largest 11.50 kN");
    expect(largestCell(screen.getByTestId("version-row-1"))).toBe("14.28 kN");
  });
});

describe("the status mark of a body that needs more friction than its contacts give", () => {
  it("reads 'slips' alone when every contact bears (never 'holds'), and 'slips · lifts' beside another status", () => {
    const { container, rerender } = render(<StatusMark status="holds" warnings={["SLIP"]} />);
    const mark = container.querySelector("[data-status]")!;
    expect([mark.getAttribute("data-status"), mark.textContent]).toEqual(["slips", "slips"]);
    expect(mark.getAttribute("title")).toMatch(/^Slips: more friction is needed than the contacts give/);
    rerender(<StatusMark status="lifts" warnings={["SLIP"]} />);
    expect(container.querySelector("[data-status]")!.textContent).toBe("slips ·lifts");
    rerender(<StatusMark status="holds" warnings={[]} />);
    expect(container.querySelector("[data-status]")!.textContent).toBe("holds");
    // one contact over its own μ, the body with friction to spare: it holds, over μ beside it
    rerender(<StatusMark status="holds" warnings={["OVER_MU"]} />);
    const over = container.querySelector("[data-status]")!;
    expect([over.getAttribute("data-status"), over.textContent]).toEqual(["holds", "holds· over μ"]);
    expect(over.getAttribute("title")).toMatch(/the body as a whole has friction to spare/);
  });
});
