// The "Largest reaction" column of the workspace's sketches and of a sketch's version history is
// written in one unit down the page, as the result tables are: "0.9500 kN" under "38.23 kN", not
// "950.0 N" (a column read down at a glance must not switch prefix from row to row).
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { forceColumnUnit, formatForceCell } from "@/components/sketches/format";
import { SketchesTable, type SketchRow } from "@/components/sketches/SketchesTable";
import { VersionHistory, type VersionItem } from "@/components/versions/VersionHistory";

const answer = (body: unknown) => vi.stubGlobal("fetch", vi.fn(async () => new Response(JSON.stringify(body), { status: 200, headers: { "content-type": "application/json" } })));
const withQuery = (ui: ReactNode) => render(<QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>{ui}</QueryClientProvider>);
function largestCell(row: HTMLElement): string {
  const column = [...document.querySelectorAll("thead th")].findIndex((th) => th.textContent?.includes("Largest reaction"));
  return row.querySelectorAll("td")[column].textContent ?? "";
}
const at = "2024-05-01T10:00:00.000Z";

afterEach(() => {
  vi.unstubAllGlobals();
  window.localStorage.clear();
});

describe("one unit down the Largest reaction column", () => {
  it("chooses it as the result tables do: N only when every value is below 1 kN; kip from 10 kip", () => {
    expect(forceColumnUnit([38_230, 950, null])).toBe("kN");
    expect(forceColumnUnit([950, 52])).toBe("N");
    expect(forceColumnUnit([0, null])).toBe("kN");
    // 10 kip = 44 482 N (1 lbf = 4.448 221 615 260 5 N exactly, NIST SP 811)
    expect(forceColumnUnit([44_500, 900], "US")).toBe("kip");
    expect(forceColumnUnit([44_000], "US")).toBe("lbf");
    expect(formatForceCell(950, "SI", "kN")).toBe("0.9500 kN");
  });

  it("the workspace's sketches: a 950 N sketch under a 38.23 kN one reads 0.9500 kN", async () => {
    const row = (title: string, largestReaction: number | null): SketchRow => ({ id: title, title, tags: [], latestVersion: 1, status: "holds", largestReaction, warnings: [], latestMessage: "", updatedAt: at, updatedBy: null, forked: false });
    answer({ items: [row("Bend", 38_230), row("Cart", 950), row("Empty", null)], total: 3, page: 1, pageSize: 20, tags: [] });
    withQuery(<SketchesTable workspaceId="w1" canCreate />);
    expect(largestCell(await screen.findByTestId("sketch-row-Bend"))).toBe("38.23 kN");
    expect(largestCell(screen.getByTestId("sketch-row-Cart"))).toBe("0.9500 kN");
    expect(screen.getByTestId("sketch-row-Cart").textContent).toContain("largest 0.9500 kN");
    expect(largestCell(screen.getByTestId("sketch-row-Empty"))).toBe("—");
  });

  it("a sketch's history: v1 at 950 N beside v2 at 1.062 kN reads 0.9500 kN; all below 1 kN stays in N", async () => {
    const version = (number: number, largestReaction: number): VersionItem => ({ id: `v${number}`, number, message: `v${number}`, authorId: null, authorName: "Eddie", createdAt: at, status: "holds", largestReaction, warnings: [], reviewState: "draft" });
    answer({ versions: [version(2, 1_062), version(1, 950)] });
    const { unmount } = withQuery(<VersionHistory sketchId="s1" latest={2} canFork={false} onFork={() => {}} />);
    expect(largestCell(await screen.findByTestId("version-row-2"))).toBe("1.062 kN");
    expect(largestCell(screen.getByTestId("version-row-1"))).toBe("0.9500 kN");
    unmount();
    answer({ versions: [version(2, 833.6), version(1, 950)] });
    withQuery(<VersionHistory sketchId="s2" latest={2} canFork={false} onFork={() => {}} />);
    expect(largestCell(await screen.findByTestId("version-row-2"))).toBe("833.6 N");
    expect(largestCell(screen.getByTestId("version-row-1"))).toBe("950.0 N");
  });
});
