// A tag in the list's address (a bookmark, a link from a colleague) is the filter the Tag box shows:
// written in any case it is the tag the server files it under, and one no sketch has any more
// (removed since, or mistyped) stays shown, said to match nothing, instead of "Any tag" over an empty list.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SketchesTable, type SketchRow } from "@/components/sketches/SketchesTable";

const row = (title: string): SketchRow => ({ id: title, title, tags: ["pumps"], latestVersion: 1, status: "holds", largestReaction: 1_000, warnings: [], latestMessage: "", updatedAt: "2024-05-01T10:00:00.000Z", updatedBy: null, forked: false });

function answers(items: SketchRow[]) {
  const asked: string[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string) => {
      asked.push(path);
      return new Response(JSON.stringify({ items, total: items.length, page: 1, pageSize: 20, tags: ["anchors", "pumps"] }), { status: 200, headers: { "content-type": "application/json" } });
    }),
  );
  return asked;
}

const show = (search: string) => {
  window.history.replaceState(null, "", `/workspaces/w1${search}`);
  return render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <SketchesTable workspaceId="w1" canCreate />
    </QueryClientProvider>,
  );
};

afterEach(() => {
  vi.unstubAllGlobals();
  window.localStorage.clear();
  window.history.replaceState(null, "", "/");
});

describe("a tag in the list's address", () => {
  it("written in capitals is the lower-case tag, shown in the Tag box and asked for", async () => {
    const asked = answers([row("Skid")]);
    show("?tag=%20Pumps");
    expect(await screen.findByTestId("sketch-row-Skid")).toBeInTheDocument();
    expect((screen.getByLabelText("Tag") as HTMLSelectElement).value).toBe("pumps");
    expect(new URL(asked[0], "http://x").searchParams.get("tag")).toBe("pumps");
  });

  it("that no sketch has stays shown in the Tag box, said to match none", async () => {
    answers([]);
    show("?tag=hydrotest");
    await screen.findByText("No sketch matches");
    const select = screen.getByLabelText("Tag") as HTMLSelectElement;
    await waitFor(() => expect(select.selectedOptions[0].textContent).toBe("hydrotest (no sketch has it)"));
    expect(select.value).toBe("hydrotest");
  });
});
