// The sketch page when the sketch is deleted while it is open (another tab, a colleague): the page
// says so in the server's words (who deleted it and when) and offers no action on it; and the delete
// dialog says when an approved version, with its sign-off record, goes with the sketch.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SketchScreen, type SketchData } from "@/components/sketches/SketchScreen";
import { withModalDialogs } from "./dialog-support";

withModalDialogs();


const initial = (approvedVersion: number | null): SketchData => ({
  sketch: {
    id: "s1",
    workspaceId: "w1",
    workspaceName: "Pier 7",
    title: "Riser bend",
    description: "",
    tags: [],
    latestVersion: 3,
    createdAt: "2026-11-30T10:00:00Z",
    createdBy: "Eddie Editor",
    updatedAt: "2026-11-30T10:00:00Z",
    updatedBy: "Eddie Editor",
    role: "owner",
    forkedFrom: null,
    approvedVersion,
  },
  latest: { number: 3, status: "holds", largestReaction: 1000, warnings: [], message: "ballast" },
});

const DELETED = "“Riser bend” was deleted by Olivia Owner on 5 Dec 2026, 12:47 UTC, with all its versions. Forks of it keep their own copies.";

function answers(sketch: (url: string) => Response) {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (input: string) => {
      const url = String(input);
      const ok = (body: unknown) => new Response(JSON.stringify(body), { status: 200, headers: { "content-type": "application/json" } });
      if (url === "/api/sketches/s1") return sketch(url);
      if (url.startsWith("/api/workspaces")) return ok({ workspaces: [{ id: "w1", name: "Pier 7", role: "owner", personal: false }] });
      if (url.includes("/activity")) return ok({ events: [], nextBefore: null });
      return ok({ versions: [] });
    }),
  );
}

const show = (data: SketchData) =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <SketchScreen initial={data} />
    </QueryClientProvider>,
  );

afterEach(() => vi.unstubAllGlobals());

describe("the sketch page", () => {
  it("says the sketch was deleted since it was opened, in the server's words, and offers nothing to do on it", async () => {
    answers(() => new Response(JSON.stringify({ error: { code: "not_found", message: DELETED, deleted: { title: "Riser bend" } } }), { status: 404, headers: { "content-type": "application/json" } }));
    show(initial(null));
    const gone = await screen.findByTestId("sketch-gone");
    expect(gone).toHaveTextContent(DELETED);
    expect(screen.getByRole("link", { name: "Back to Pier 7" })).toHaveAttribute("href", "/workspaces/w1");
    for (const name of ["Fork", "Edit details", "Delete"]) expect(screen.queryByRole("button", { name })).toBeNull();
    expect(screen.queryByRole("link", { name: "Open in the editor" })).toBeNull();
  });

  it("the delete dialog says the approved version and its sign-off go too", async () => {
    answers(() => new Response(JSON.stringify(initial(2)), { status: 200, headers: { "content-type": "application/json" } }));
    show(initial(2));
    fireEvent.click(screen.getByRole("button", { name: "Delete" }));
    const dialog = await screen.findByTestId("delete-dialog");
    expect(dialog).toHaveTextContent("All 3 versions go with it, for everyone in Pier 7 — v2, the approved version, and its sign-off record too.");
  });
});
